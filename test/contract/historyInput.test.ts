/**
 * Histories that break the rules (issue 16), end to end through `method: damage`: samples
 * that cannot be read as finite loads, values whose ranges overflow, encodings, line
 * structures. The expectations are the language's rules (docs/language.md, "Limits" and
 * the damage method; docs/diagnostics.md), not published values: a check never passes on
 * a history it could not read whole, and never shows NaN, Infinity or an internal error.
 */

import { describe, expect, it } from 'vitest';
import { type CheckResult, evaluateNote, type HistoryChunkReader } from '../../shared-core/src';
import { diag, lineOf } from './helpers';

function note(lines: string[], id = 'c'): string {
  return ['```fatigue ' + id, ...lines, '```', ''].join('\n');
}

function evaluate(lines: string[], histories: HistoryChunkReader): { c: CheckResult; text: string[] } {
  const text = note(lines);
  const r = evaluateNote(text, { histories });
  return { c: r.checks[0], text: text.split('\n') };
}

/** A reader that serves files from memory, in small chunks (to cross chunk boundaries). */
function fakeReader(files: Record<string, string | Uint8Array>, chunk = 7): HistoryChunkReader {
  return {
    read(path, onChunk) {
      const body = files[path];
      if (body === undefined)
        return { ok: false, code: 'history-missing', message: `history file \`${path}\` not found` };
      for (let i = 0; i < body.length; i += chunk)
        onChunk(typeof body === 'string' ? body.slice(i, i + chunk) : body.subarray(i, i + chunk));
      return { ok: true };
    },
  };
}

function expectNothingNonFinite(c: CheckResult) {
  expect(c.diagnostics.map((d) => d.code)).not.toContain('internal');
  for (const [name, v] of Object.entries(c.values)) {
    if (v.si === null) expect(v.infinite, `${name} is null but not infinite`).toBe(true);
    else expect(Number.isFinite(v.si), `${name} = ${v.si}`).toBe(true);
    expect(v.display, name).not.toMatch(/NaN|Infinity/);
  }
  // (The file's own text, quoted, may say `NaN`: the rest of a message may not.)
  for (const d of c.diagnostics)
    expect(d.message.replace(/"[^"]*"/g, '""'), d.code).not.toMatch(/NaN|Infinity|undefined|null/);
  for (const t of c.tables ?? [])
    for (const row of t.rows) for (const cell of row) expect(cell).not.toMatch(/NaN|Infinity/);
  for (const row of c.histogram?.counts ?? []) for (const n of row) expect(Number.isFinite(n)).toBe(true);
}

/** A section fixed by stated numbers only (as in damage.test.ts): Se = 200 MPa, f Sut = 540 MPa. */
const SECTION = [
  'method: damage',
  'Sut = 600 MPa',
  'material-family: steel',
  'Sy = 450 MPa',
  'Se_prime = 200 MPa',
  'f = 0.9',
  'ka = 1',
  'kb = 1',
  'kc = 1',
  'kd = 1',
  'ke = 1',
  'feature: none',
  'criterion: goodman',
  'miner: elementary',
];
const HISTORY = [...SECTION, 'history: loads/h.csv', 'history-load: stress', 'history_scale = 50 MPa'];

/** ASTM E1049-85 (Reapproved 2017) Fig. 6 history; its largest peak is 5 (file line 5 below). */
const ASTM_FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];
const csvOf = (xs: Array<number | string>) => `stress\n${xs.join('\n')}\n`;

describe('samples that cannot be read as finite loads are errors and withhold the damage (issue 16, item 1)', () => {
  it('the whole Fig. 6 history gives a damage (the baseline the cases below are measured against)', () => {
    const { c } = evaluate(HISTORY, fakeReader({ 'loads/h.csv': csvOf(ASTM_FIG6) }));
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(c.values.D_sum?.si).toBeGreaterThan(0);
  });

  const cases: Array<[string, string]> = [
    ['1e309', 'history-non-finite'],
    ['-1e309', 'history-non-finite'],
    ['inf', 'history-non-finite'],
    ['-Infinity', 'history-non-finite'],
    ['nan', 'history-non-finite'],
    ['NaN', 'history-non-finite'],
    ['n/a', 'csv-non-numeric'],
    ['overload', 'csv-non-numeric'],
  ];
  for (const [bad, code] of cases)
    it(`the largest peak written \`${bad}\`: ${code} on the history line naming file line 5, no D, status error`, () => {
      const xs: Array<number | string> = [...ASTM_FIG6];
      xs[3] = bad; // the peak 5, file line 5 (line 1 is the header)
      const { c, text } = evaluate(HISTORY, fakeReader({ 'loads/h.csv': csvOf(xs) }));
      const errs = c.diagnostics.filter((d) => d.severity === 'error');
      expect(errs).toHaveLength(1);
      expect(errs[0].code).toBe(code);
      expect(errs[0].range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
      expect(errs[0].message).toContain('line 5');
      expect(c.values.D_sum).toBeUndefined();
      expect(c.values.repeats).toBeUndefined();
      expect(diag(c, 'results-withheld').message).toContain('largest load');
      expect(c.status).toBe('error');
      expectNothingNonFinite(c);
    });

  it('the first few rows are named, the rest counted; a requirement on the damage is not evaluated', () => {
    const xs: Array<number | string> = [];
    for (let i = 0; i < 40; i++) xs.push(i % 2 ? 1 : -1);
    for (const k of [3, 9, 17, 21, 30, 33, 38]) xs[k] = '1e400';
    const { c } = evaluate([...HISTORY, 'require: repeats >= 1'], fakeReader({ 'loads/h.csv': csvOf(xs) }));
    const d = diag(c, 'history-non-finite');
    for (const line of [5, 11, 19, 23, 32]) expect(d.message).toContain(`line ${line}:`);
    expect(d.message).toContain('(2 more)');
    expect(c.values.D_sum).toBeUndefined();
    expect(c.requirements[0].met).toBeNull();
    expect(c.status).toBe('error');
  });

  it('blank lines and a header row stay fine (information only)', () => {
    const { c } = evaluate(HISTORY, fakeReader({ 'loads/h.csv': `stress\n\n${ASTM_FIG6.join('\n\n')}\n\n` }));
    expect(c.diagnostics.filter((d) => d.severity !== 'information')).toEqual([]);
    expect(diag(c, 'csv-blank-rows').severity).toBe('information');
    expect(c.values.D_sum?.si).toBeGreaterThan(0);
  });
});

describe('values whose ranges or stresses overflow (issue 16, item 2)', () => {
  it('values near 1e308 of both signs: history-overflow on the history line, no internal error, no D', () => {
    const { c, text } = evaluate(
      HISTORY,
      fakeReader({ 'loads/h.csv': csvOf([0, 1.5e308, -1.5e308, 1e308, 0]) }),
    );
    const d = diag(c, 'history-overflow');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
    expect(c.values.D_sum).toBeUndefined();
    expect(c.status).toBe('error');
    expectNothingNonFinite(c);
  });

  it('a history_scale that makes the stresses overflow: history-overflow on the history_scale line', () => {
    // 1e300 MPa per 1.0, samples up to 5000: stresses of 1e309 Pa and more.
    const lines = HISTORY.map((l) => (l.startsWith('history_scale') ? 'history_scale = 1e300 MPa' : l));
    const { c, text } = evaluate(lines, fakeReader({ 'loads/h.csv': csvOf(ASTM_FIG6.map((x) => x * 1000)) }));
    const d = diag(c, 'history-overflow');
    expect(d.range.start.line).toBe(lineOf(text, 'history_scale'));
    expect(c.values.D_sum).toBeUndefined();
    expectNothingNonFinite(c);
  });

  it('a history_scale so small that the stresses round to zero: absurd-value on its line, not a pass with D = 0', () => {
    const lines = HISTORY.map((l) => (l.startsWith('history_scale') ? 'history_scale = 1e-320 Pa' : l));
    const { c, text } = evaluate(
      [...lines, 'require: repeats >= 1'],
      fakeReader({ 'loads/h.csv': csvOf(ASTM_FIG6) }),
    );
    const d = diag(c, 'absurd-value');
    expect(d.range.start.line).toBe(lineOf(text, 'history_scale'));
    expect(c.values.D_sum).toBeUndefined();
    expect(c.status).toBe('error');
    expectNothingNonFinite(c);
  });

  it('finite stresses whose Miner sum overflows: damage-overflow, no D, no repeats of 0', () => {
    // Zero-mean cycles of 1e150 Pa: no static limit of the mean is reached, but the lives
    // (sigma/a)^(1/b) underflow to zero and n/N overflows.
    const lines = HISTORY.map((l) => (l.startsWith('history_scale') ? 'history_scale = 1e150 Pa' : l));
    const { c, text } = evaluate(lines, fakeReader({ 'loads/h.csv': csvOf([1, -1, 1, -1, 1]) }));
    const d = diag(c, 'damage-overflow');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
    expect(c.values.D_sum).toBeUndefined();
    expect(c.values.repeats).toBeUndefined();
    expectNothingNonFinite(c);
  });

  it('a tiny history_scale with a gate: the gate in file units overflows to an infinite gate, which drops every reversal', () => {
    const lines = HISTORY.map((l) => (l.startsWith('history_scale') ? 'history_scale = 1e-300 Pa' : l));
    const { c } = evaluate(
      [...lines, 'history_gate = 1e10 Pa'],
      fakeReader({ 'loads/h.csv': csvOf(ASTM_FIG6) }),
    );
    expect(c.values.cycles_counted?.si).toBe(0);
    expectNothingNonFinite(c);
  });
});

describe('encodings and giant lines through a damage check (issue 16, items 3 and 4)', () => {
  it('a UTF-16 BE history with a byte-order mark gives the D of the UTF-8 one, and the information names the encoding', () => {
    const csv = csvOf(ASTM_FIG6);
    const be = new Uint8Array(2 + csv.length * 2);
    be.set([0xfe, 0xff]);
    for (let i = 0; i < csv.length; i++) be[3 + 2 * i] = csv.charCodeAt(i); // ASCII: high byte 0
    const u8 = evaluate(HISTORY, fakeReader({ 'loads/h.csv': csv })).c;
    const u16 = evaluate(HISTORY, fakeReader({ 'loads/h.csv': be }, 5)).c;
    expect(u16.values.D_sum?.si).toBe(u8.values.D_sum?.si);
    expect(diag(u16, 'csv-column').message).toContain('Decoded as UTF-16 BE with a byte-order mark');
  });

  it('a history written on one line of 2 MB: history-line-too-long on the history line, no D', () => {
    const line = ASTM_FIG6.join(',').repeat(100_000);
    const { c, text } = evaluate(HISTORY, fakeReader({ 'loads/h.csv': `stress\n${line}\n` }, 65_536));
    const d = diag(c, 'history-line-too-long');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
    expect(d.message).toContain('line 2');
    expect(c.values.D_sum).toBeUndefined();
    expectNothingNonFinite(c);
  });
});
