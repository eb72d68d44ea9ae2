/**
 * The feature functions in-process, on the core's result of a small note: the contexts of
 * completion, what navigation counts as a use of a name, and what the inline hints show.
 * Expected values are the core's own records (`evaluateNote` of the same text).
 */
import { evaluateNote } from '@fatigue-notes/core';
import { describe, expect, it } from 'vitest';
import { completionsAt } from '../src/lsp/completion';
import { diagnosticsOf } from '../src/lsp/diagnostics';
import { inlayHintsFor } from '../src/lsp/inlayHints';
import { type NoteView, wordAt } from '../src/lsp/locate';
import { referencesAt, renameAt } from '../src/lsp/navigation';
import { DEFAULT_SETTINGS, readSettings } from '../src/lsp/settings';

const TEXT = [
  '# Screw conveyor',
  '',
  '```fatigue screw_shaft',
  'Sut = 600 MPa',
  'Sy = 450 MPa',
  'surface: machined',
  'd = 40 mm',
  'load_factor = 1.25',
  'M_max = load_factor * 200 N*m',
  'M_min = -load_factor * 200 N*m',
  'N = 1e6',
  'F_a = 250 N',
  'require: n_f >= 1.5',
  '```',
  '',
  '```fatigue end_pin',
  'Sut = screw_shaft.Sut',
  'Sy = screw_shaft.Sy',
  'd = 20 mm',
  'surface: ground',
  'M_a = screw_shaft.load_factor * 50 N*m',
  '```',
  '',
].join('\n');
const LINES = TEXT.split('\n');

function view(text = TEXT, settings = DEFAULT_SETTINGS): NoteView {
  const lines = text.split('\n');
  return {
    uri: 'file:///note.md',
    version: 1,
    result: evaluateNote(text),
    lineCount: lines.length,
    line: (n) => lines[n] ?? '',
    settings,
    timings: [],
  };
}

const line = (has: string) => LINES.findIndex((l) => l.startsWith(has));
const labels = (v: NoteView, l: number, c: number) =>
  completionsAt(v, { line: l, character: c }).map((i) => i.label);

describe('locate', () => {
  it('reads `id.name`, option words and skips units glued to numbers', () => {
    expect(wordAt('M_a = screw_shaft.load_factor * 50', 10)?.check?.text).toBe('screw_shaft');
    expect(wordAt('M_a = screw_shaft.load_factor * 50', 20)?.member?.text).toBe('load_factor');
    expect(wordAt('surface: cold-drawn', 12)?.text).toBe('cold-drawn');
    expect(wordAt('d = 35mm', 6)).toBeUndefined();
  });
});

describe('completion', () => {
  const v = view();
  it('offers the units of the stated name, the check system first', () => {
    const l = line('d = 40 mm');
    expect(labels(v, l, 7).slice(0, 3)).toEqual(['mm', 'm', 'cm']);
    expect(labels(v, line('F_a = 250 N'), 10)).toContain('kN');
  });
  it('offers the results of the check after `require:`', () => {
    const l = line('require:');
    const got = labels(v, l, 'require: '.length);
    expect(got).toContain('n_f');
    expect(got).not.toContain('Sut');
  });
  it('offers the members of another check after its id and a dot', () => {
    const l = line('M_a = screw_shaft.');
    expect(labels(v, l, 'M_a = screw_shaft.'.length)).toContain('load_factor');
  });
  it('offers names stated above and checks above inside an expression', () => {
    const l = line('M_a = screw_shaft.');
    const got = labels(v, l, 'M_a = '.length);
    expect(got).toEqual(expect.arrayContaining(['Sut', 'd', 'screw_shaft']));
    expect(got).not.toContain('end_pin');
  });
  it('offers snippets at the start of a line outside blocks (a fence too), nothing inside prose text', () => {
    expect(labels(v, line('```fatigue end_pin'), 3)).toHaveLength(3);
    expect(labels(v, 0, 5)).toEqual([]);
  });
});

describe('navigation', () => {
  const v = view();
  it('counts uses of a name, not the unit N after a number', () => {
    const l = line('load_factor = 1.25');
    const refs = referencesAt(v, { line: l, character: 2 }, true);
    // the statement, two uses in screw_shaft, one `screw_shaft.load_factor` in end_pin
    expect(refs.map((r) => r.range.start.line)).toEqual([l, l + 1, l + 2, line('M_a = screw_shaft')]);
    const nLine = line('N = 1e6');
    const nRefs = referencesAt(v, { line: nLine, character: 0 }, true);
    expect(nRefs.map((r) => r.range.start.line)).toEqual([nLine]); // `250 N` is newtons
  });
  it('renames a name of the note with its references, and refuses a reserved name', () => {
    const l = line('load_factor = 1.25');
    const edit = renameAt(v, { line: l, character: 2 }, 'service_factor');
    expect(edit.changes?.['file:///note.md']).toHaveLength(4);
    expect(() => renameAt(v, { line: line('d = 40 mm'), character: 0 }, 'dia')).toThrow(/reserved/);
    expect(() => renameAt(v, { line: l, character: 2 }, 'Sut')).toThrow(/reserved/);
  });
});

describe('inlay hints and diagnostics', () => {
  it('shows the tool value beside nothing stated, and the key results beside the criterion', () => {
    const v = view();
    const hints = inlayHintsFor(v, {
      start: { line: 0, character: 0 },
      end: { line: LINES.length, character: 0 },
    });
    const c = v.result.checks[0];
    const surface = hints.find((h) => h.position.line === line('surface: machined'));
    expect(surface?.label).toContain(`ka ${c.values.ka.display}`);
    const req = hints.find((h) => h.position.line === line('require:'));
    expect(req?.label).toBe(`${c.requirements[0].met ? '✓' : '✗'} ${c.values.n_f.display}`);
  });

  it("beside a stated value, names what the tool would compute and why, never a bare 'tool'", () => {
    const text = [
      '```fatigue stated_kt',
      'Sut = 600 MPa',
      'Sy = 400 MPa',
      'd = 30 mm',
      'Kt = 1.85',
      'M_max = 100 N*m',
      'M_min = -100 N*m',
      '```',
      '',
      '```fatigue stated_fillet',
      'Sut = 600 MPa',
      'Sy = 400 MPa',
      'feature: shoulder-fillet',
      'd = 30 mm',
      'D = 36 mm',
      'r = 2 mm',
      'Kt = 1.85',
      'M_max = 100 N*m',
      'M_min = -100 N*m',
      '```',
      '',
    ].join('\n');
    const v = view(text);
    const lines = text.split('\n');
    const hints = inlayHintsFor(v, {
      start: { line: 0, character: 0 },
      end: { line: lines.length, character: 0 },
    });
    const at = (n: number) => hints.filter((h) => h.position.line === n).map((h) => String(h.label));
    const [plain, fillet] = lines.flatMap((l, i) => (l === 'Kt = 1.85' ? [i] : []));
    // No stress raiser stated: Kt = 1 by definition of the elastic stress concentration.
    expect(at(plain)).toEqual([
      `fit 1: no notch feature stated · Kf ${v.result.checks[0].values.Kf.display}`,
    ]);
    const tool = v.result.checks[1].values.Kt.tool!;
    expect(at(fillet)[0].split(' · ')[0]).toBe(`fit ${tool.display} from D = 36 mm, d = 30 mm, r = 2 mm`);
    for (const h of hints) expect(String(h.label)).not.toMatch(/\btool\b/);
  });

  it('adds the no-requirement hint only when the default factor is set', () => {
    const v = view();
    expect(diagnosticsOf(v).some((d) => d.code === 'no-requirement')).toBe(false);
    const withFactor = view(TEXT, readSettings({ defaultRequiredSafetyFactor: 2 }));
    const hint = diagnosticsOf(withFactor).filter((d) => d.code === 'no-requirement');
    expect(hint.map((d) => d.range.start.line)).toEqual([line('```fatigue end_pin')]);
  });

  it('reads settings defensively', () => {
    expect(readSettings({ units: 'metric', significantDigits: 99, lints: { x: false, y: 'no' } })).toEqual({
      units: 'auto',
      significantDigits: 10,
      defaultRequiredSafetyFactor: null,
      lints: { x: false },
    });
  });
});
