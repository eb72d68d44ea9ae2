/**
 * `fatigue/summary` as the language server builds it for an open note: the diagrams drawn as
 * SVG, the names each view shows, and a damage check driven by a load-history file read by
 * the server. The Markdown preview renders this very record, so it shows what the editor
 * shows, history included. Expected values are the core's own records and the command
 * line's evaluation of the same file (`check`, which reads the history from disk).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { checkDiagrams, shownNames } from '@fatigue-notes/core';
import { describe, expect, it } from 'vitest';
import { renderCheck } from '../../client/src/preview';
import { evaluateFile } from '../src/cli/check';
import { NoteDocuments } from '../src/lsp/documents';
import { DEFAULT_SETTINGS } from '../src/lsp/settings';
import { summaryOf } from '../src/lsp/summary';

const ROOT = join(__dirname, '../..');
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

function openNote(path: string) {
  const errors: string[] = [];
  const docs = new NoteDocuments({
    settings: () => DEFAULT_SETTINGS,
    workspaceFolders: () => [ROOT],
    allowHistoryReads: () => true,
    onEvaluated: () => undefined,
    onError: (m) => errors.push(m),
  });
  const uri = pathToFileURL(path).href;
  docs.open(uri, 'markdown', 7, readFileSync(path, 'utf8'));
  const view = docs.view(uri)!;
  return { docs, uri, view, errors };
}

describe('fatigue/summary of an open note', () => {
  it('carries every diagram as SVG text, drawn by the core for that check, without a style element', () => {
    const path = join(ROOT, 'samples/ferry-ramp-hoist-shafts.md');
    const { docs, uri, view, errors } = openNote(path);
    const s = summaryOf(view);
    expect(s.uri).toBe(uri);
    expect(s.version).toBe(7);
    expect(errors).toEqual([]);
    expect(s.checks.length).toBeGreaterThan(0);
    for (const [i, c] of s.checks.entries()) {
      const core = view.result.checks[i];
      expect(c.diagrams).toEqual(
        checkDiagrams(core, { embedStyle: false, unitSystem: core.unitSystem, digits: 4 }),
      );
      for (const d of c.diagrams) {
        expect(d.svg.startsWith('<svg')).toBe(true);
        expect(d.svg).not.toContain('<style');
        expect(d.svg).not.toMatch(/<script|href=/i);
      }
      expect(c.shown).toEqual(shownNames(core));
    }
    // A stress-life check with a mean stress has its Haigh and S-N diagrams.
    const kinds = s.checks.map((c) => c.diagrams.map((d) => d.kind).join(','));
    expect(kinds).toContain('haigh,sn');
    docs.close(uri);
  });

  it('a damage check driven by a history file: the server reads it, and the preview shows the damage the command line computes', () => {
    const path = join(ROOT, 'samples/ferry-ramp-hoist-damage.md');
    const { docs, uri, view } = openNote(path);
    const s = summaryOf(view);
    const cli = evaluateFile(path);
    const logged = s.checks.find((c) => c.id === 'hub_fillet_logged')!;
    const fromCli = cli.checks.find((c) => c.id === 'hub_fillet_logged')!;
    // Counted from the CSV file by the server, as by `fatigue-notes check`.
    expect(logged.values.cycles_counted.display).toBe(fromCli.values.cycles_counted.display);
    expect(logged.values.D_sum.display).toBe(fromCli.values.D_sum.display);
    expect(logged.diagnostics.errors).toBe(0);
    expect(logged.diagrams.map((d) => d.kind)).toContain('histogram');
    const html = renderCheck(logged, esc);
    expect(html).toContain(
      `<th scope="row"><code>D_sum</code></th><td class="fatigue-notes-num">${fromCli.values.D_sum.display}</td>`,
    );
    expect(html).toContain(
      `<th scope="row"><code>repeats</code></th><td class="fatigue-notes-num">${fromCli.values.repeats.display}</td>`,
    );
    docs.close(uri);
  });
});
