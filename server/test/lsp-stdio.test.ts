/**
 * The language server over stdio, driven by a real JSON-RPC client (vscode-jsonrpc) as an
 * editor would drive it. Expected values come from the core itself (`evaluateNote` on the
 * same text): the server must present the core's records, not compute its own.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { checkDiagrams, evaluateNote, shownNames } from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type {
  CodeAction,
  CompletionItem,
  CompletionList,
  Diagnostic,
  DocumentSymbol,
  FoldingRange,
  Hover,
  InlayHint,
  Location,
  PublishDiagnosticsParams,
  WorkspaceEdit,
} from 'vscode-languageserver-protocol';
import { buildCli, ROOT, type ServerProcess, startServerProcess } from './helpers/lspProcess';

const NOTE_PATH = join(ROOT, 'server/test/fixtures/conveyor-note.md');
const URI = pathToFileURL(NOTE_PATH).href;
const TEXT = readFileSync(NOTE_PATH, 'utf8');
const LINES = TEXT.split('\n');

/** Position of `token` on the first line that contains `lineHas` (and the token). */
function at(lineHas: string, token = lineHas, offset = 0) {
  const line = LINES.findIndex((l) => l.includes(lineHas) && l.includes(token));
  if (line < 0) throw new Error(`no line with ${lineHas}`);
  return { line, character: LINES[line].indexOf(token) + offset };
}

const SEVERITY = { error: 1, warning: 2, information: 3, hint: 4 } as const;

function coreDiagnostics(text: string) {
  return evaluateNote(text).diagnostics.map((d) => ({
    range: d.range,
    severity: SEVERITY[d.severity],
    code: d.code,
    message: d.message,
  }));
}

function plain(ds: Diagnostic[]) {
  return ds.map((d) => ({ range: d.range, severity: d.severity, code: d.code, message: d.message }));
}

let server: ServerProcess;
let disposeBuild: () => void;
const published: PublishDiagnosticsParams[] = [];
const logged: string[] = [];

function waitForDiagnostics(
  pred: (p: PublishDiagnosticsParams) => boolean,
  timeoutMs = 20_000,
): Promise<PublishDiagnosticsParams> {
  return new Promise((resolve, reject) => {
    const t0 = Date.now();
    const poll = () => {
      const hit = [...published].reverse().find(pred);
      if (hit) return resolve(hit);
      if (Date.now() - t0 > timeoutMs) return reject(new Error('no matching publishDiagnostics'));
      setTimeout(poll, 5);
    };
    poll();
  });
}

const req = <T>(method: string, params: unknown) =>
  server.connection.sendRequest(method, params) as Promise<T>;
const doc = { textDocument: { uri: URI } };

describe('language server over stdio', () => {
  beforeAll(async () => {
    const built = await buildCli();
    disposeBuild = built.dispose;
    server = startServerProcess(built.script);
    server.connection.onNotification('textDocument/publishDiagnostics', (p: PublishDiagnosticsParams) => {
      published.push(p);
    });
    server.connection.onNotification('window/logMessage', (p: { message: string }) => {
      logged.push(p.message);
    });
    const init = await req<{ capabilities: Record<string, unknown> }>('initialize', {
      processId: process.pid,
      rootUri: pathToFileURL(ROOT).href,
      workspaceFolders: [{ uri: pathToFileURL(ROOT).href, name: 'repo' }],
      capabilities: {},
    });
    expect(init.capabilities.hoverProvider).toBe(true);
    expect(init.capabilities.inlayHintProvider).toBeTruthy();
    await server.connection.sendNotification('initialized', {});
    await server.connection.sendNotification('textDocument/didOpen', {
      textDocument: { uri: URI, languageId: 'markdown', version: 1, text: TEXT },
    });
  });

  afterAll(() => {
    server?.kill();
    server?.connection.dispose();
    disposeBuild?.();
  });

  it('publishes the core diagnostics of the opened version', async () => {
    const p = await waitForDiagnostics((x) => x.uri === URI && x.version === 1);
    expect(plain(p.diagnostics)).toEqual(coreDiagnostics(TEXT));
    expect(p.diagnostics.every((d) => d.source === 'fatigue-notes')).toBe(true);
  });

  it('hover on a result shows its derivation with formula, inputs and source', async () => {
    const r = evaluateNote(TEXT).checks[0];
    const h = await req<Hover>('textDocument/hover', { ...doc, position: at('require: n_f', 'n_f', 1) });
    const md = (h.contents as { value: string }).value;
    expect(md).toContain(`**${r.values.n_f.display}**`);
    expect(md).toContain(r.values.n_f.formula as string);
    expect(md).toContain(r.values.n_f.source as string);
    for (const i of r.values.n_f.inputs ?? []) expect(md).toContain(`${i.name} = ${i.display}`);
  });

  it('hover on an option key says what it means and what it drives', async () => {
    const h = await req<Hover>('textDocument/hover', {
      ...doc,
      position: at('surface: machined', 'surface', 2),
    });
    const md = (h.contents as { value: string }).value;
    expect(md).toContain('surface finish');
    expect(md).toContain('Drives here: ka =');
  });

  it('hover on other_id.name shows the other check value and where it comes from', async () => {
    const h = await req<Hover>('textDocument/hover', {
      ...doc,
      position: at('Sut = drive_shaft.Sut', 'Sut', 18),
    });
    const md = (h.contents as { value: string }).value;
    const sut = evaluateNote(TEXT).checks[0].values.Sut;
    expect(md).toContain(`**${sut.display}**`);
    expect(md).toContain('from check `drive_shaft`');
  });

  it('hover on a diagnostic says what to do', async () => {
    const h = await req<Hover>('textDocument/hover', {
      ...doc,
      position: at('surfce: machined', 'surfce', 1),
    });
    const md = (h.contents as { value: string }).value;
    expect(md).toContain('unknown-option');
    expect(md).toContain('Change to `surface:`');
  });

  it('inlay hints show what each input drives and the requirement verdicts', async () => {
    const hints = await req<InlayHint[]>('textDocument/inlayHint', {
      ...doc,
      range: { start: { line: 0, character: 0 }, end: { line: LINES.length, character: 0 } },
    });
    const label = (line: number) =>
      hints
        .filter((h) => h.position.line === line)
        .map((h) => h.label as string)
        .join(' | ');
    const c = evaluateNote(TEXT).checks[0];
    expect(label(at('r = 2 mm').line)).toContain(`Kf ${c.values.Kf.display}`);
    expect(label(at('d = 50 mm').line)).toContain(`kb ${c.values.kb.display}`);
    expect(label(at('require: n_f >= 1.5, n_y').line)).toContain(`✓ ${c.values.n_f.display}`);
    expect(label(at('criterion: goodman').line)).toContain(`n_f ${c.values.n_f.display}`);
  });

  it('code lenses give each check its status and safety factor', async () => {
    const lenses = await req<Array<{ command: { title: string } }>>('textDocument/codeLens', doc);
    const checks = evaluateNote(TEXT).checks;
    expect(lenses).toHaveLength(checks.length);
    expect(lenses[0].command.title).toContain('pass');
    expect(lenses[0].command.title).toContain(`n_f ${checks[0].values.n_f.display}`);
    expect(lenses[1].command.title).toContain('error');
  });

  it('document symbols list the checks with their results as children', async () => {
    const symbols = await req<DocumentSymbol[]>('textDocument/documentSymbol', doc);
    expect(symbols.map((s) => s.name)).toEqual(['drive_shaft', 'tail_shaft', 'snub_pin']);
    expect(symbols[0].detail).toContain('Drive shaft');
    expect(symbols[0].children?.map((c) => c.name)).toContain('n_f');
  });

  it('folding ranges cover each block', async () => {
    const folds = await req<FoldingRange[]>('textDocument/foldingRange', doc);
    const checks = evaluateNote(TEXT).checks;
    expect(folds.map((f) => [f.startLine, f.endLine])).toEqual(
      checks.map((c) => [c.range.start.line, c.range.end.line]),
    );
  });

  it('completes option values, materials, units, members and snippets', async () => {
    const labels = async (position: { line: number; character: number }) => {
      const r = await req<CompletionItem[] | CompletionList>('textDocument/completion', { ...doc, position });
      return (Array.isArray(r) ? r : r.items).map((i) => i.label);
    };
    expect(await labels(at('surface: ground', 'ground'))).toContain('machined');
    expect(await labels(at('material: aisi-1045-cd', 'aisi'))).toContain('aisi-1045-cd');
    expect((await labels(at('d = 50 mm', 'mm')))[0]).toBe('mm');
    expect(await labels(at('Sy = drive_shaft.Sy', 'Sy', 17))).toEqual(
      expect.arrayContaining(['Se', 'n_f', 'Kf']),
    );
    expect(await labels({ line: 1, character: 0 })).toEqual([
      'fatigue check: stress-life',
      'fatigue check: damage (spectrum)',
      'fatigue check: crack growth',
    ]);
    expect(await labels(at('reliability = 0.9', 'reliability'))).toEqual(
      expect.arrayContaining(['require:', 'criterion:', 'Kt']),
    );
  });

  it('goes to the definition, finds references and renames a check id', async () => {
    const ref = at('Sut = drive_shaft.Sut', 'drive_shaft', 2);
    const def = await req<Location>('textDocument/definition', { ...doc, position: ref });
    const header = at('```fatigue drive_shaft', 'drive_shaft');
    expect(def.range.start).toEqual(header);
    const refs = await req<Location[]>('textDocument/references', {
      ...doc,
      position: ref,
      context: { includeDeclaration: true },
    });
    expect(refs).toHaveLength(3); // the header and two `drive_shaft.` references
    const edit = await req<WorkspaceEdit>('textDocument/rename', {
      ...doc,
      position: ref,
      newName: 'head_shaft',
    });
    const edits = edit.changes?.[URI] ?? [];
    expect(edits).toHaveLength(3);
    expect(edits.every((e) => e.newText === 'head_shaft')).toBe(true);
    const member = at('Sy = drive_shaft.Sy', 'Sy', 17);
    const memberDef = await req<Location>('textDocument/definition', { ...doc, position: member });
    // drive_shaft takes Sy from its material: the definition is the `material:` line.
    expect(memberDef.range.start.line).toBe(at('material: aisi-1045-cd').line);
    await expect(req('textDocument/rename', { ...doc, position: member, newName: 'x' })).rejects.toThrow(
      /reserved/,
    );
  });

  it('offers the core fixes and a unit conversion as code actions', async () => {
    const line = at('surfce: machined').line;
    const actions = await req<CodeAction[]>('textDocument/codeAction', {
      ...doc,
      range: { start: { line, character: 0 }, end: { line, character: 6 } },
      context: { diagnostics: [] },
    });
    expect(actions.map((a) => a.title)).toContain('Change to `surface:`');
    const ksi = at('Sut = 90 ksi').line;
    const conv = await req<CodeAction[]>('textDocument/codeAction', {
      ...doc,
      range: { start: { line: ksi, character: 0 }, end: { line: ksi, character: 0 } },
      context: { diagnostics: [] },
    });
    const snub = evaluateNote(TEXT).checks[2];
    expect(snub.unitSystem).toBe('SI');
    // 90 ksi = 620.528 MPa (1 psi = 6.894757 kPa, NIST SP 811 (2008), App. B.9).
    expect(conv.map((a) => a.title)).toContain("Convert to 620.528 MPa (the check's SI units)");
  });

  it('answers fatigue/summary with every check record, its diagrams drawn and the names each view shows', async () => {
    const s = await req<{
      version: number;
      checks: Array<{
        id: string;
        status: string;
        values: Record<string, { si: number }>;
        haigh?: unknown;
        diagrams: Array<{ kind: string; title: string; svg: string }>;
        shown: { headline: string[]; table: string[]; life: string | null };
      }>;
    }>('fatigue/summary', { uri: URI });
    const r = evaluateNote(TEXT);
    expect(s.checks.map((c) => [c.id, c.status])).toEqual(r.checks.map((c) => [c.id, c.status]));
    expect(s.checks[0].values.n_f.si).toBe(r.checks[0].values.n_f.si);
    expect(s.checks[0].haigh).toEqual(r.checks[0].haigh);
    // The client draws nothing: the SVG of every diagram comes with the summary.
    for (const [i, c] of s.checks.entries())
      expect(c.diagrams).toEqual(checkDiagrams(r.checks[i], { embedStyle: false, digits: 4 }));
    expect(s.checks[0].diagrams.map((d) => d.kind)).toEqual(['haigh', 'sn']);
    expect(s.checks[0].shown).toEqual(shownNames(r.checks[0]));
  });

  it('takes settings: US display units and the default required safety factor', async () => {
    await server.connection.sendNotification('workspace/didChangeConfiguration', {
      settings: { fatigueNotes: { units: 'US', defaultRequiredSafetyFactor: 2 } },
    });
    const p = await waitForDiagnostics(
      (x) => x.uri === URI && x.diagnostics.some((d) => d.code === 'no-requirement'),
    );
    const hint = p.diagnostics.find((d) => d.code === 'no-requirement');
    expect(hint?.severity).toBe(4);
    const line = at('```fatigue snub_pin').line;
    const actions = await req<CodeAction[]>('textDocument/codeAction', {
      ...doc,
      range: { start: { line, character: 0 }, end: { line, character: 0 } },
      context: { diagnostics: [] },
    });
    expect(actions.map((a) => a.title)).toContain('Add `require: n_f >= 2`');
    const h = await req<Hover>('textDocument/hover', { ...doc, position: at('Sut = 90 ksi', 'Sut', 1) });
    expect((h.contents as { value: string }).value).toContain('**90 ksi**');
    // Back to the defaults for the tests that follow.
    await server.connection.sendNotification('workspace/didChangeConfiguration', {
      settings: { fatigueNotes: {} },
    });
    await waitForDiagnostics(
      (x) => x === published[published.length - 1] && !x.diagnostics.some((d) => d.code === 'no-requirement'),
    );
  });

  it('applies incremental edits and publishes what a fresh evaluation gives', async () => {
    let text = TEXT;
    const edits: Array<{ from: string; to: string }> = [
      { from: 'd = 40\n', to: 'd = 40 mm\n' },
      { from: 'r = 2 mm\n', to: 'r = 2.5 mm\nkmisc = 0.9\n' },
      { from: 'The tail shaft uses', to: 'Added prose.\n\nThe tail shaft uses' },
      { from: 'M_max = 150 N*m', to: 'M_max = 1500 N*m' },
    ];
    let version = 1;
    for (const e of edits) {
      const offset = text.indexOf(e.from);
      const before = text.slice(0, offset).split('\n');
      const start = { line: before.length - 1, character: before[before.length - 1].length };
      const fromLines = e.from.split('\n');
      const end = {
        line: start.line + fromLines.length - 1,
        character: (fromLines.length === 1 ? start.character : 0) + fromLines[fromLines.length - 1].length,
      };
      text = text.slice(0, offset) + e.to + text.slice(offset + e.from.length);
      version++;
      await server.connection.sendNotification('textDocument/didChange', {
        textDocument: { uri: URI, version },
        contentChanges: [{ range: { start, end }, text: e.to }],
      });
    }
    const p = await waitForDiagnostics((x) => x.uri === URI && x.version === version);
    expect(plain(p.diagnostics)).toEqual(coreDiagnostics(text));
    const s = await req<{ version: number; checks: Array<{ values: Record<string, { display: string }> }> }>(
      'fatigue/summary',
      { uri: URI },
    );
    expect(s.version).toBe(version);
    expect(s.checks[0].values.kmisc.display).toBe('0.9');
  });

  it('survives bad requests and still answers', async () => {
    await expect(req('fatigue/noSuchMethod', {})).rejects.toMatchObject({ code: -32601 });
    expect(await req('textDocument/hover', { ...doc, position: { line: 99_999, character: 3 } })).toBeNull();
    expect(await req('textDocument/hover', { ...doc, position: { line: 5, character: 99_999 } })).toBeNull();
    expect(
      await req('textDocument/hover', {
        textDocument: { uri: 'file:///nowhere.md' },
        position: { line: 0, character: 0 },
      }),
    ).toBeNull();
    expect(await req('textDocument/documentSymbol', { textDocument: { uri: 'file:///nowhere.md' } })).toEqual(
      [],
    );
    await expect(req('fatigue/summary', { uri: 'file:///nowhere.md' })).rejects.toMatchObject({
      code: -32602,
    });
    await expect(req('fatigue/summary', null)).rejects.toBeTruthy();
    await server.connection.sendNotification('textDocument/didChange', {
      textDocument: { uri: 'file:///nowhere.md', version: 3 },
      contentChanges: [{ text: 'x' }],
    });
    const h = await req<Hover>('textDocument/hover', {
      ...doc,
      position: at('surface: machined', 'surface', 2),
    });
    expect((h.contents as { value: string }).value).toContain('surface finish');
  });

  it('clears diagnostics on close, then shuts down and exits cleanly', async () => {
    await server.connection.sendNotification('textDocument/didClose', doc);
    await waitForDiagnostics((x) => x.uri === URI && x.diagnostics.length === 0);
    await req('shutdown', null);
    await server.connection.sendNotification('exit');
    expect(await server.exited).toBe(0);
    expect(server.stderr()).not.toMatch(/failed|Error/);
    // No handler failed along the way (the server logs a failing handler to the client).
    expect(logged.filter((m) => /failed/.test(m))).toEqual([]);
  });
});
