/**
 * `method: damage` blocks, end to end: the Miner sums of whole checks against sums computed
 * here from the published formulas, a rainflow-counted history (the ASTM E1049 example) read
 * through a fake history reader, and the diagnostics of bad inputs on their lines.
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { historyReader } from '../../server/src/files/historyReader';
import { type CheckResult, evaluateNote, type HistoryChunkReader } from '../../shared-core/src';
import { diag, lineOf, MPA, si } from './helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function note(lines: string[], id = 'c'): string {
  return ['```fatigue ' + id, ...lines, '```', ''].join('\n');
}

function evaluate(lines: string[], histories?: HistoryChunkReader): { c: CheckResult; text: string[] } {
  const text = note(lines);
  const r = evaluateNote(text, histories ? { histories } : {});
  return { c: r.checks[0], text: text.split('\n') };
}

/** A reader that serves files from memory, in small chunks (to cross chunk boundaries). */
function fakeReader(files: Record<string, string>, chunk = 7): HistoryChunkReader & { reads: string[] } {
  const reads: string[] = [];
  return {
    reads,
    read(path, onChunk) {
      reads.push(path);
      const body = files[path];
      if (body === undefined)
        return { ok: false, code: 'history-missing', message: `history file \`${path}\` not found` };
      for (let i = 0; i < body.length; i += chunk) onChunk(body.slice(i, i + chunk));
      return { ok: true };
    },
  };
}

function expectAllFinite(c: CheckResult) {
  for (const [name, v] of Object.entries(c.values)) {
    if (v.si === null) expect(v.infinite, `${name} is null but not infinite`).toBe(true);
    else expect(Number.isFinite(v.si), `${name} = ${v.si}`).toBe(true);
    expect(v.display, name).not.toMatch(/NaN|Infinity/);
  }
  for (const t of c.tables ?? [])
    for (const row of t.rows) for (const cell of row) expect(cell).not.toMatch(/NaN|Infinity/);
  for (const p of c.sn?.points ?? []) expect(Number.isFinite(p.sigma_ar)).toBe(true);
  for (const row of c.histogram?.counts ?? []) for (const n of row) expect(Number.isFinite(n)).toBe(true);
}

/**
 * A section whose S-N line is fixed by stated numbers only: Se = Se_prime = 200 MPa (all
 * Marin factors 1), f Sut = 0.9 * 600 = 540 MPa, no notch.
 */
const SECTION = [
  'method: damage',
  'Sut = 600 MPa',
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
];

/**
 * The S-N line of Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-7, Eqs. (6-14) to (6-16):
 * a = (f Sut)^2 / Se, b = -(1/3) log10(f Sut / Se), N = (sigma_rev / a)^(1/b).
 */
const Sut = 600;
const Se = 200;
const fSut = 0.9 * Sut;
const a = fSut ** 2 / Se;
const b = -Math.log10(fSut / Se) / 3;
const life = (s: number) => (s / a) ** (1 / b);
/** Goodman equivalent fully reversed stress, sigma_rev = sigma_a / (1 - sigma_m / Sut) (Shigley 10th ed., Sec. 6-12, Example 6-12; sigma_a itself for a compressive mean, the horizontal Goodman branch of Sec. 6-12, from memory). */
const goodman = (sa: number, sm: number) => (sm > 0 ? sa / (1 - sm / Sut) : sa);

describe('damage of a spectrum, Miner sums checked by hand', () => {
  const levels = [
    'spectrum: sigma_a = 300 MPa, sigma_m = 100 MPa, n = 2000',
    'spectrum: sigma_a = 250 MPa, sigma_m = 0 MPa, n = 1e4',
    'spectrum: sigma_a = 150 MPa, n = 1e6',
  ];
  // Level 1: sigma_rev = 300 / (1 - 100/600) = 360 MPa; level 2: 250 MPa; level 3: 150 MPa < Se.
  const d1 = 2000 / life(360);
  const d2 = 1e4 / life(250);

  it('original rule: D = n1/N1 + n2/N2, the level below Se does no damage (Miner 1945; Shigley 10th ed. Sec. 6-15, Eq. 6-57, from memory)', () => {
    const { c } = evaluate([...SECTION, ...levels]);
    expect(c.status).toBe('unchecked');
    expect(rel(si(c, 'Se'), Se * MPA)).toBeLessThan(1e-12);
    expect(rel(si(c, 'D_sum'), d1 + d2)).toBeLessThan(1e-9);
    expect(rel(si(c, 'repeats'), 1 / (d1 + d2))).toBeLessThan(1e-9);
    // N_eq: the cycles at the largest level (360 MPa) that do the same damage.
    expect(rel(si(c, 'N_eq'), (d1 + d2) * life(360))).toBeLessThan(1e-9);
    expect(si(c, 'cycles_counted')).toBe(2000 + 1e4 + 1e6);
    expect(rel(si(c, 'sigma_ar_max'), 360 * MPA)).toBeLessThan(1e-9);
    expect(c.tables?.[0].rows).toHaveLength(3);
    expect(c.sn?.points.map((p) => p.count)).toEqual([2000, 1e4, 1e6]);
    expect(c.sn?.points[2].N).toBeNull();
    // D's derivation lists the largest contributor first: level 1 does most of the damage here.
    expect(d1).toBeGreaterThan(d2);
    expect(c.values.D_sum.notes?.join(' ')).toMatch(/largest contributors: sigma_ar 360 MPa/);
    expect(c.values.D_sum.assumption).toMatch(/original/);
    expectAllFinite(c);
  });

  it('elementary rule: the S-N line continued below Se adds n3/N3 (Haibach, Betriebsfestigkeit, 3rd ed., "Miner elementar", as in the core; hand sum)', () => {
    const { c } = evaluate([...SECTION, 'miner: elementary', ...levels]);
    expect(rel(si(c, 'D_sum'), d1 + d2 + 1e6 / life(150))).toBeLessThan(1e-9);
  });

  it('Haibach rule: below the knee N = N2 (Se/S)^(2k-1), k = -1/b (Haibach, Betriebsfestigkeit, 3rd ed. 2006, eq. 3.21-61; hand sum)', () => {
    const { c } = evaluate([...SECTION, 'miner: haibach', ...levels]);
    const k = -1 / b;
    const N3 = 1e6 * (Se / 150) ** (2 * k - 1);
    expect(rel(si(c, 'D_sum'), d1 + d2 + 1e6 / N3)).toBeLessThan(1e-9);
  });

  it('a moment spectrum goes through the section: sigma = 32 M / (pi d^3), times Kf (Shigley 10th ed. Sec. 3-10; exact beam theory)', () => {
    const d = 0.03;
    const { c } = evaluate([
      ...SECTION.filter((l) => l !== 'feature: none'),
      'd = 30 mm',
      'Kf = 1.5',
      'spectrum: M_a = 400 N*m, M_m = 150 N*m, n = 5000',
      'spectrum: M_max = 500 N*m, M_min = -300 N*m, n = 800',
    ]);
    const s = (M: number) => (1.5 * 32 * M) / (Math.PI * d ** 3) / MPA;
    // The shaft rotates (the default): each level's largest moment |M_m| + |M_a| is fully
    // reversed at every fibre (Shigley 10th ed., Sec. 6-14, Ex. 7-1). The second level:
    // amplitude (500 + 300)/2 = 400, mean (500 - 300)/2 = 100, largest moment 500.
    const D = 5000 / life(goodman(s(550), 0)) + 800 / life(goodman(s(500), 0));
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
    expectAllFinite(c);
  });
});

/** ASTM E1049-85 (Reapproved 2017), Fig. 6: the rainflow example history (peaks and valleys, units). */
const ASTM_FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];
/**
 * Its counted cycles as the standard tabulates them (range 3: 0.5, 4: 1.5, 6: 0.5, 8: 1.0,
 * 9: 0.5), with their means: one full cycle (4, mean 1); half cycles (3, -0.5), (4, -1),
 * (8, 1), (6, 1), (8, 0), (9, 0.5).
 */
const ASTM_FIG6_CYCLES: Array<[number, number, number]> = [
  [4, 1, 1],
  [3, -0.5, 0.5],
  [4, -1, 0.5],
  [8, 1, 0.5],
  [6, 1, 0.5],
  [8, 0, 0.5],
  [9, 0.5, 0.5],
];
const FIG6_CSV = `time [s],stress\n${ASTM_FIG6.map((x, i) => `${i * 0.1},${x}`).join('\n')}\n`;

describe('damage of a history: the ASTM E1049 example as a logger file', () => {
  const lines = [
    ...SECTION,
    'history: loads/fig6.csv',
    'history-column: stress',
    'history-load: stress',
    'history_scale = 50 MPa',
    'miner: elementary',
  ];

  it('counts the Fig. 6 cycles and sums their damage: sigma_a = 50 * range / 2, sigma_m = 50 * mean, Goodman, elementary Miner (ASTM E1049-85 (2017) Fig. 6; Shigley 10th ed. Eqs. 6-14 to 6-16)', () => {
    const reader = fakeReader({ 'loads/fig6.csv': FIG6_CSV });
    const { c } = evaluate(lines, reader);
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    let D = 0;
    for (const [range, mean, count] of ASTM_FIG6_CYCLES) D += count / life(goodman(25 * range, 50 * mean));
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
    expect(si(c, 'cycles_counted')).toBe(4);
    // The largest cycle: range 9, mean 0.5 -> 225 / (1 - 25/600).
    expect(rel(si(c, 'sigma_ar_max'), goodman(225, 25) * MPA)).toBeLessThan(1e-9);
    // The file is read twice (extremes, then counting), in chunks.
    expect(reader.reads).toEqual(['loads/fig6.csv', 'loads/fig6.csv']);
    expectAllFinite(c);
  });

  it('keeps every counted cycle in the range-mean histogram, in the load unit (ASTM E1049-85 (2017) Fig. 6: 4 cycles in all)', () => {
    const { c } = evaluate(lines, fakeReader({ 'loads/fig6.csv': FIG6_CSV }));
    const h = c.histogram!;
    expect(h.unit).toBe('MPa');
    expect(h.rangeEdges[h.rangeEdges.length - 1]).toBeCloseTo(450, 9); // range 9 * 50 MPa
    expect(h.meanEdges[0]).toBeCloseTo(-200, 9); // smallest sample -4 * 50 MPa
    expect(h.meanEdges[h.meanEdges.length - 1]).toBeCloseTo(250, 9); // largest 5 * 50 MPa
    expect(h.counts.flat().reduce((s, x) => s + x, 0)).toBe(4);
    // Damage per range bin: the bins' cycles add up to the history's.
    const rows = c.tables![0].rows;
    expect(rows.reduce((s, r) => s + Number(r[1]), 0)).toBe(4);
  });

  it("the original rule leaves out the cycles below Se: the range-6 cycle at 163.6 MPa (Goodman) does no damage (Miner's rule as stated; hand sum)", () => {
    const { c } = evaluate(
      lines.map((l) => (l === 'miner: elementary' ? 'miner: original' : l)),
      fakeReader({ 'loads/fig6.csv': FIG6_CSV }),
    );
    let D = 0;
    for (const [range, mean, count] of ASTM_FIG6_CYCLES) {
      const s = goodman(25 * range, 50 * mean);
      if (s >= Se) D += count / life(s);
    }
    expect(goodman(150, 50)).toBeLessThan(Se);
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
  });

  it('a bending-moment history goes through the section like M: sigma = 32 M / (pi d^3) (the same D as the stress history scaled by it)', () => {
    const d = 0.025;
    const perNm = 32 / (Math.PI * d ** 3); // Pa per N*m
    const scale = (50 * MPA) / perNm; // N*m giving 50 MPa
    const { c } = evaluate(
      [
        ...SECTION,
        'd = 25 mm',
        'history: loads/fig6.csv',
        'history-load: bending',
        `history_scale = ${scale} N*m`,
        'miner: elementary',
      ],
      fakeReader({ 'loads/fig6.csv': FIG6_CSV }),
    );
    // The shaft rotates (the default): each counted cycle's largest moment is fully reversed
    // at every fibre (Shigley 10th ed., Sec. 6-14, Ex. 7-1), with the rotating-history warning.
    let D = 0;
    for (const [range, mean, count] of ASTM_FIG6_CYCLES)
      D += count / life(goodman(25 * range + 50 * Math.abs(mean), 0));
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
    expect(rel(si(c, 'sigma_unit'), 50 * MPA)).toBeLessThan(1e-12);
    expect(c.diagnostics.map((x) => x.code)).toContain('rotating-history');
  });

  it('a gate of 3.5 units drops the opening rise -2 -> 1 (range 3): 8 turning points, 3.5 cycles (gate rule of the turning-point detector, common practice, no source; (points - 1) / 2 cycles, ASTM E1049-85 (2017) 5.4.4)', () => {
    const { c } = evaluate([...lines, 'history_gate = 175 MPa'], fakeReader({ 'loads/fig6.csv': FIG6_CSV }));
    // Gated turning points: 1, -3, 5, -1, 3, -4, 4, -2 (the start -2 is within 3.5 of 1).
    expect(si(c, 'cycles_counted')).toBe(3.5);
  });
});

describe('damage diagnostics on their lines', () => {
  const historyLines = [...SECTION, 'history: loads/h.csv', 'history-load: stress', 'history_scale = 50 MPa'];

  it('no history reader: history-unavailable on the history line', () => {
    const { c, text } = evaluate(historyLines);
    expect(diag(c, 'history-unavailable').range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
    expect(c.status).toBe('error');
  });

  it('file missing: the reader says so, on the history line', () => {
    const { c, text } = evaluate(historyLines, fakeReader({}));
    const d = diag(c, 'history-missing');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
  });

  it('column missing: the available columns are listed', () => {
    const { c, text } = evaluate(
      [...historyLines, 'history-column: force'],
      fakeReader({ 'loads/h.csv': FIG6_CSV.replace('time [s],stress', 'time [s],strain') }),
    );
    const d = diag(c, 'csv-column-missing');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
    expect(d.message).toContain('"time [s]"');
    expect(d.message).toContain('"strain"');
    expect(c.values.D_sum).toBeUndefined();
  });

  it('a non-numeric row: its file line is named', () => {
    const csv = FIG6_CSV.split('\n');
    csv[4] = '0.3,n/a'; // file line 5
    const { c, text } = evaluate(historyLines, fakeReader({ 'loads/h.csv': csv.join('\n') }));
    const d = diag(c, 'csv-non-numeric');
    expect(d.severity).toBe('error');
    expect(d.message).toContain('line 5');
    expect(d.range.start.line).toBe(lineOf(text, 'history: loads/h.csv'));
  });

  it('fewer than three points', () => {
    const { c } = evaluate(historyLines, fakeReader({ 'loads/h.csv': 'stress\n1\n2\n' }));
    expect(diag(c, 'history-too-few-points').severity).toBe('error');
    expect(c.values.D_sum).toBeUndefined();
  });

  it('a path out of the workspace is refused by the server reader and nothing is read', () => {
    const root = mkdtempSync(join(tmpdir(), 'fn-damage-'));
    mkdirSync(join(root, 'notes'));
    writeFileSync(join(root, 'outside.csv'), FIG6_CSV);
    const notePath = join(root, 'notes', 'n.md');
    const inner = historyReader(notePath, join(root, 'notes'));
    const { c, text } = evaluate(
      [...SECTION, 'history: ../outside.csv', 'history-load: stress', 'history_scale = 50 MPa'],
      inner,
    );
    expect(diag(c, 'history-outside').range.start.line).toBe(lineOf(text, 'history: ../outside.csv'));
    expect(c.values.D_sum).toBeUndefined();
  });

  it('D stated as a length is the larger diameter of the shoulder, as in every check; the damage is D_sum', () => {
    // The same section and load level in a stress-life check (whose shoulder-fillet fit is
    // checked against Peterson's charts in the concentration tests) gives the same Kt and Kf.
    const geometry = [
      'material-family: steel',
      'Sut = 600 MPa',
      'Sy = 450 MPa',
      'surface: machined',
      'd = 40 mm',
      'D = 50 mm',
      'r = 2 mm',
      'feature: shoulder-fillet',
    ];
    const dmg = evaluate([
      'method: damage',
      ...geometry,
      'criterion: goodman',
      'spectrum: M_a = 1200 N*m, n = 1000',
    ]).c;
    const sl = evaluate([...geometry, 'M_a = 1200 N*m', 'N = 1000']).c;
    expect(dmg.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(dmg.values.D.dim).toBe('length');
    expect(dmg.values.D.si).toBeCloseTo(0.05, 12);
    expect(dmg.values.Kt.si).toBe(sl.values.Kt.si);
    expect(dmg.values.Kf.si).toBe(sl.values.Kf.si);
    expect(dmg.values.D_sum.dim).toBe('one');
    expect(dmg.values.D_sum.si).toBeGreaterThan(0);
  });

  it('the old name D of the damage still works in require:, with a renamed-result hint and its fix', () => {
    const { c, text } = evaluate([...SECTION, 'spectrum: sigma_a = 300 MPa, n = 1000', 'require: D <= 0.5']);
    const d = diag(c, 'renamed-result');
    const line = lineOf(text, 'require: D');
    expect(d.severity).toBe('hint');
    expect(d.range.start.line).toBe(line);
    expect(text[line].slice(d.range.start.character, d.range.end.character)).toBe('D');
    expect(d.fixes?.[0].edits[0].newText).toBe('D_sum');
    expect(c.requirements[0].actualDisplay).toBe(c.values.D_sum.display);
    expect(c.requirements[0].met).toBe(c.values.D_sum.si! <= 0.5);
    expect(c.values.D).toBeUndefined();
  });

  it('a damage check that states the diameter D and requires `D <= 0.5`: the dimension error points to D_sum', () => {
    const { c } = evaluate([
      ...SECTION,
      'D = 72 mm',
      'spectrum: sigma_a = 300 MPa, n = 1000',
      'require: D <= 0.5',
    ]);
    const d = diag(c, 'wrong-dimension');
    expect(d.message).toMatch(/now `D_sum`/);
    expect(d.fixes?.[0].edits[0].newText).toBe('D_sum');
  });

  it('another check reading the damage by its old name `id.D` gets the same value and a hint', () => {
    const text = [
      note([...SECTION, 'spectrum: sigma_a = 300 MPa, n = 1000'], 'dmg'),
      '```fatigue total',
      'method: damage',
      ...SECTION.slice(1),
      'spectrum: sigma_a = 300 MPa, n = 1000',
      'D_before = dmg.D',
      'require: D_sum <= 1 - D_before',
      '```',
      '',
    ].join('\n');
    const r = evaluateNote(text);
    const [first, second] = r.checks;
    const d = diag(second, 'renamed-result');
    const lines = text.split('\n');
    const line = lines.findIndex((l) => l.startsWith('D_before'));
    expect(d.range.start.line).toBe(line);
    expect(lines[line].slice(d.range.start.character, d.range.end.character)).toBe('dmg.D');
    expect(d.fixes?.[0].edits[0].newText).toBe('dmg.D_sum');
    expect(second.values.D_before.si).toBe(first.values.D_sum.si);
    expect(second.requirements[0].met).toBe(first.values.D_sum.si! + second.values.D_sum.si! <= 1);
  });

  it('spectrum item with the wrong dimension: the error sits on that item', () => {
    const { c, text } = evaluate([...SECTION, 'spectrum: M_a = 300 MPa, n = 1000']);
    const d = diag(c, 'wrong-dimension');
    const line = lineOf(text, 'spectrum: M_a');
    expect(d.range.start.line).toBe(line);
    expect(text[line].slice(d.range.start.character, d.range.end.character)).toBe('300 MPa');
  });

  it('spectrum level without n, with an unknown name, or with max but no min', () => {
    const { c, text } = evaluate([
      ...SECTION,
      'spectrum: sigma_a = 300 MPa',
      'spectrum: sigma_a = 200 MPa, x_a = 3, n = 10',
      'spectrum: M_max = 300 N*m, n = 10',
    ]);
    expect(diag(c, 'missing-cycles').range.start.line).toBe(lineOf(text, 'spectrum: sigma_a = 300 MPa'));
    const u = diag(c, 'unknown-spectrum-name');
    expect(text[u.range.start.line].slice(u.range.start.character, u.range.end.character)).toBe('x_a');
    const m = diag(c, 'missing-load-pair');
    expect(m.range.start.line).toBe(lineOf(text, 'spectrum: M_max'));
  });

  it('history and spectrum both, history_scale of the wrong dimension, history-load missing', () => {
    const both = evaluate([...historyLines, 'spectrum: sigma_a = 300 MPa, n = 10'], fakeReader({}));
    expect(diag(both.c, 'history-and-spectrum').range.start.line).toBe(lineOf(both.text, 'history:'));
    const dim = evaluate(
      [...SECTION, 'history: loads/h.csv', 'history-load: bending', 'history_scale = 50 MPa'],
      fakeReader({ 'loads/h.csv': FIG6_CSV }),
    );
    expect(diag(dim.c, 'wrong-dimension').range.start.line).toBe(lineOf(dim.text, 'history_scale'));
    const noLoad = evaluate(
      [...SECTION, 'history: loads/h.csv', 'history_scale = 50 MPa'],
      fakeReader({ 'loads/h.csv': FIG6_CSV }),
    );
    expect(diag(noLoad.c, 'missing-option').range.start.line).toBe(lineOf(noLoad.text, 'history:'));
  });

  it('no loads at all, and stated stress-life loads that a damage check ignores', () => {
    const none = evaluate(SECTION);
    expect(diag(none.c, 'missing-history').severity).toBe('error');
    const ignored = evaluate([...SECTION, 'sigma_a = 100 MPa', 'spectrum: sigma_a = 300 MPa, n = 10']);
    expect(diag(ignored.c, 'ignored-input').range.start.line).toBe(lineOf(ignored.text, 'sigma_a = 100 MPa'));
  });

  it('a mean stress at the static limit is an error, never an infinite damage', () => {
    const { c } = evaluate([...SECTION, 'spectrum: sigma_a = 10 MPa, sigma_m = 700 MPa, n = 10']);
    expect(diag(c, 'static-failure').severity).toBe('error');
    expectAllFinite(c);
  });

  it('nothing below the knee: D = 0 and repeats infinite, not a division by zero', () => {
    const { c } = evaluate([...SECTION, 'spectrum: sigma_a = 100 MPa, n = 1e9']);
    expect(si(c, 'D_sum')).toBe(0);
    expect(c.values.repeats.infinite).toBe(true);
    expectAllFinite(c);
  });
});
