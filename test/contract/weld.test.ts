/**
 * `method: weld` blocks, end to end: whole checks against the published equations of
 * EN 1993-1-9:2005 and the IIW recommendations (Hobbacher), worked here by hand, and the
 * diagnostics of bad inputs on their lines.
 */
import { describe, expect, it } from 'vitest';
import { type CheckResult, evaluateNote, type HistoryChunkReader } from '../../shared-core/src';
import { checkDiagrams } from '../../shared-core/src/methods/registry';
import { diag, KSI, lineOf, MPA, si } from './helpers';

const IN = 0.0254;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function note(lines: string[], id = 'c'): string {
  return ['```fatigue ' + id, ...lines, '```', ''].join('\n');
}

function evaluate(lines: string[], histories?: HistoryChunkReader): { c: CheckResult; text: string[] } {
  const text = note(lines);
  const r = evaluateNote(text, histories ? { histories } : {});
  return { c: r.checks[0], text: text.split('\n') };
}

function fakeReader(files: Record<string, string>): HistoryChunkReader {
  return {
    read(path, onChunk) {
      const body = files[path];
      if (body === undefined) return { ok: false, code: 'history-missing', message: `no ${path}` };
      for (let i = 0; i < body.length; i += 5) onChunk(body.slice(i, i + 5));
      return { ok: true };
    },
  };
}

const codes = (c: CheckResult) => c.diagnostics.map((d) => d.code);
const errorsOf = (c: CheckResult) => c.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code);

/** EN 1993-1-9 Eqs. 7.1 to 7.3 by hand: life of a range (Pa) on the design curve of class C / gammaMf. */
function enLife(range: number, C: number, gammaMf: number, variable: boolean): number {
  const c = C / gammaMf;
  const dD = (2 / 5) ** (1 / 3) * c;
  const dL = (5 / 100) ** (1 / 5) * dD;
  if (range >= dD) return 2e6 * (c / range) ** 3;
  if (!variable || range < dL) return Number.POSITIVE_INFINITY;
  return 5e6 * (dD / range) ** 5;
}

/** The factors stated so that no default is taken (EN 1993-1-9 Table 3.1: safe life, high consequence). */
const FACTORS = ['gamma_Ff = 1.0', 'gamma_Mf = 1.35'];

describe('EN 1993-1-9 curves through a weld check (Sec. 7.1, Eqs. 7.1 to 7.3, Fig. 7.1)', () => {
  // Nussbaumer, Borges & Davaine, Fatigue Design of Steel and Composite Structures (ECCS
  // Eurocode Design Manual, 2011), table of the EN 1993-1-9 curve constants (from memory):
  // Delta sigma_D at 5e6 and Delta sigma_L at 1e8, to 0.1 MPa.
  const published: Array<[number, number, number]> = [
    [90, 66.3, 36.4],
    [80, 58.9, 32.4],
    [71, 52.3, 28.7],
    [36, 26.5, 14.6],
  ];
  for (const [C, D5, L8] of published)
    it(`category ${C}: ${D5} MPa at 5e6, ${L8} MPa at 1e8; N(2e6) at Delta sigma_C (ECCS design manual 2011, from memory; to 0.05 MPa)`, () => {
      const { c } = evaluate([
        'method: weld',
        'standard: en-1993-1-9',
        `delta_sigma_C = ${C} MPa`,
        `delta_sigma = ${C} MPa`,
        'N = 2e6',
        'gamma_Ff = 1.0',
        'gamma_Mf = 1.0',
        'Sy = 355 MPa',
      ]);
      expect(errorsOf(c)).toEqual([]);
      expect(Math.abs(si(c, 'delta_sigma_D') / MPA - D5)).toBeLessThanOrEqual(0.05 + 1e-9);
      expect(Math.abs(si(c, 'delta_sigma_L') / MPA - L8)).toBeLessThanOrEqual(0.05 + 1e-9);
      // Exactly: (2/5)^(1/3) C and (5/100)^(1/5) (2/5)^(1/3) C (Eqs. 7.2, 7.3).
      expect(rel(si(c, 'delta_sigma_D'), (2 / 5) ** (1 / 3) * C * MPA)).toBeLessThan(1e-12);
      expect(rel(si(c, 'delta_sigma_L'), (5 / 100) ** (1 / 5) * (2 / 5) ** (1 / 3) * C * MPA)).toBeLessThan(
        1e-12,
      );
      // 2e6 cycles at the class: D = 1, the equivalent range is the class, u = 1.
      expect(si(c, 'D_sum')).toBeCloseTo(1, 10);
      expect(si(c, 'u_fat')).toBeCloseTo(1, 10);
      expect(si(c, 'N_f')).toBeCloseTo(2e6, 0);
    });

  it('constant amplitude below the fatigue limit does no damage; above, N = 2e6 (C/(gamma_Mf gamma_Ff Delta sigma))^3', () => {
    const below = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 50 MPa',
      'N = 1e8',
      ...FACTORS,
    ]).c;
    // 50 MPa against Delta sigma_D = 0.737 * 71 / 1.35 = 38.8 MPa: damage on m = 3.
    expect(rel(si(below, 'D_sum'), 1e8 / enLife(50 * MPA, 71 * MPA, 1.35, false))).toBeLessThan(1e-9);
    const under = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 35 MPa',
      'N = 1e8',
      ...FACTORS,
    ]).c;
    expect(si(under, 'D_sum')).toBe(0);
    expect(under.values.N_f.infinite).toBe(true);
  });
});

describe('a spectrum on EN 1993-1-9 (Annex A, Eq. A.1 with Eqs. 7.1 to 7.3; the sums worked here)', () => {
  const levels: Array<[number, number]> = [
    [110, 2e4],
    [75, 1e5],
    [40, 1e6],
    [20, 1e7],
  ];
  const lines = [
    'method: weld',
    'standard: en-1993-1-9',
    'delta_sigma_C = 80 MPa',
    ...FACTORS,
    'D_allow = 1.0',
    'Sy = 355 MPa',
    ...levels.map(([r, n]) => `spectrum: delta_sigma = ${r} MPa, n = ${n}`),
    'require: u_fat <= 1',
  ];
  it('D_sum, the equivalent range at 2e6, u and the life equal the hand sums (40 MPa on m = 5, 20 MPa below the cut-off)', () => {
    const { c } = evaluate(lines);
    expect(errorsOf(c)).toEqual([]);
    const D = levels.reduce((s, [r, n]) => s + n / enLife(r * MPA, 80 * MPA, 1.35, true), 0);
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
    // Delta sigma_E,2 = (Delta sigma_C / gamma_Mf) D^(1/3) / gamma_Ff (EN 1993-1-9 Eq. 8.2 with D on the design curve).
    expect(rel(si(c, 'delta_sigma_E2'), (80 / 1.35) * MPA * D ** (1 / 3))).toBeLessThan(1e-9);
    expect(rel(si(c, 'u_fat'), D ** (1 / 3))).toBeLessThan(1e-9);
    const total = levels.reduce((s, [, n]) => s + n, 0);
    expect(rel(si(c, 'N_f'), total / D)).toBeLessThan(1e-9);
    // The safety factor on stress range: D(s ranges) = 1, found here by an independent bisection.
    const Dat = (s: number) =>
      levels.reduce((a, [r, n]) => a + n / enLife(s * r * MPA, 80 * MPA, 1.35, true), 0);
    let lo = 0.1;
    let hi = 10;
    for (let i = 0; i < 200; i++) {
      const mid = Math.sqrt(lo * hi);
      if (Dat(mid) <= 1) lo = mid;
      else hi = mid;
    }
    expect(rel(si(c, 'n_range'), lo)).toBeLessThan(1e-6);
    expect(c.weldSn?.[0].points.length).toBe(4);
  });

  it('defaulted partial factors and damage sum are warnings naming what they assume', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 80 MPa',
      'Sy = 355 MPa',
      'spectrum: delta_sigma = 75 MPa, n = 1e5',
      'spectrum: delta_sigma = 40 MPa, n = 1e6',
    ]);
    const g = c.diagnostics.filter((d) => d.code === 'defaulted-partial-factor');
    expect(g.map((d) => d.severity)).toEqual(['warning', 'warning']);
    expect(g.some((d) => /safe-life \/ high-consequence/.test(d.message))).toBe(true);
    expect(diag(c, 'defaulted-damage-sum').severity).toBe('warning');
    // gamma_Mf = 1.35 taken (EN 1993-1-9 Table 3.1, safe life, high consequence).
    expect(si(c, 'gamma_Mf')).toBe(1.35);
    // gamma_Ff on the standard's line, gamma_Mf on the header (no assessment concept stated).
    expect(g.map((d) => d.range.start.line).sort()).toEqual(
      [lineOf(text, '```fatigue'), lineOf(text, 'standard:')].sort(),
    );
  });
});

describe('a rainflow-counted history (counted at each 1 % band`s largest range)', () => {
  // Ranges 99.9 and 100.6 MPa lie in one 1 % band of the counter (ranges in Pa, bands
  // [1.01^k, 1.01^(k+1)): k = 1851, 99.75 to 100.75 MPa): every cycle of the band is counted at
  // its largest range, 100.6 MPa, never below.
  const csv = 'sigma\n0\n99.9\n0\n100.6\n0\n99.9\n0\n100.6\n0\n';
  const lines = [
    'method: weld',
    'standard: en-1993-1-9',
    'delta_sigma_C = 71 MPa',
    ...FACTORS,
    'D_allow = 1.0',
    'Sy = 355 MPa',
    'history: h.csv',
    'history-load: stress',
    'history_scale = 1 MPa',
  ];
  it('D_sum = cycles counted / N(100.6 MPa): the band`s upper edge, above the exact sum', () => {
    const { c } = evaluate(lines, fakeReader({ 'h.csv': csv }));
    expect(errorsOf(c)).toEqual([]);
    const n = si(c, 'cycles_counted');
    expect(n).toBeGreaterThan(2);
    const upper = n / enLife(100.6 * MPA, 71 * MPA, 1.35, true);
    expect(rel(si(c, 'D_sum'), upper)).toBeLessThan(1e-9);
    // Whatever the split between the two ranges, the exact sum is no larger.
    expect(si(c, 'D_sum')).toBeGreaterThanOrEqual(n / enLife(99.9 * MPA, 71 * MPA, 1.35, true) - 1e-15);
    expect(si(c, 'delta_sigma_max')).toBeCloseTo(100.6 * MPA, 3);
    expect(Math.floor(Math.log(99.9e6) / Math.log(1.01))).toBe(
      Math.floor(Math.log(100.6e6) / Math.log(1.01)),
    );
  });
  it('a compressive history (the same ranges below zero) gives the same damage: as welded, the full range counts', () => {
    const neg = csv.replace(/^(\d)/gm, '-$1').replace('-0\n', '0\n');
    const a = evaluate(lines, fakeReader({ 'h.csv': csv })).c;
    const b = evaluate(lines, fakeReader({ 'h.csv': neg })).c;
    expect(si(b, 'D_sum')).toBeCloseTo(si(a, 'D_sum'), 12);
  });
});

describe('IIW curves through a weld check (Hobbacher, IIW recommendations 2008 and 2016, Sec. 3.2; from memory)', () => {
  it('FAT 90, 2008, a spectrum: 120 MPa on m = 3, 40 MPa below the knee 52.6 MPa on m2 = 5; D_allow 0.5 in u', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: iiw-2008',
      'delta_sigma_C = 90 MPa',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'D_allow = 0.5',
      'spectrum: delta_sigma = 120 MPa, n = 1e5',
      'spectrum: delta_sigma = 40 MPa, n = 1e7',
    ]);
    expect(errorsOf(c)).toEqual([]);
    const dD = 90 * (2e6 / 1e7) ** (1 / 3);
    const D = 1e5 / (2e6 * (90 / 120) ** 3) + 1e7 / (1e7 * (dD / 40) ** 5);
    expect(rel(si(c, 'D_sum'), D)).toBeLessThan(1e-9);
    expect(rel(si(c, 'delta_sigma_D'), dD * MPA)).toBeLessThan(1e-12);
    // u = 1 exactly when D_sum = D_allow: (D / 0.5)^(1/3).
    expect(rel(si(c, 'u_sigma'), (D / 0.5) ** (1 / 3))).toBeLessThan(1e-9);
    expect(rel(si(c, 'repeats'), 0.5 / D)).toBeLessThan(1e-9);
  });
  it('FAT 90, 2016: m = 22 beyond the knee, so 40 MPa does far less damage than under 2008', () => {
    const base = [
      'method: weld',
      'delta_sigma_C = 90 MPa',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'D_allow = 0.5',
      'spectrum: delta_sigma = 40 MPa, n = 1e7',
      'spectrum: delta_sigma = 120 MPa, n = 1e5',
    ];
    const d16 = si(evaluate([...base, 'standard: iiw-2016']).c, 'D_sum');
    const dD = 90 * (2e6 / 1e7) ** (1 / 3);
    expect(rel(d16, 1e5 / (2e6 * (90 / 120) ** 3) + 1e7 / (1e7 * (dD / 40) ** 22))).toBeLessThan(1e-9);
    const c16 = evaluate([...base, 'standard: iiw-2016']).c;
    const d08 = si(evaluate([...base, 'standard: iiw-2008']).c, 'D_sum');
    expect(d16).toBeLessThan(d08);
    // The 2016 check says what the more onerous 2008 slope gives.
    const w = diag(c16, 'knee-slope-edition');
    expect(w.severity).toBe('warning');
    expect(w.message).toContain(d08.toPrecision(4));
  });
  it('constant amplitude reads the curve itself (D_allow = 1): FAT 90 at 100 MPa, N = 1e6', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'delta_sigma_C = 90 MPa',
      'delta_sigma = 100 MPa',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]);
    const N = 2e6 * (90 / 100) ** 3;
    expect(rel(si(c, 'N_f'), N)).toBeLessThan(1e-9);
    expect(si(c, 'D_allow')).toBe(1);
    expect(codes(c)).not.toContain('defaulted-damage-sum');
  });
  it('hot spot: 1.67 sigma(0.4t) - 0.67 sigma(1.0t) on the IIW hot-spot class FAT 100 (non-load-carrying)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'stress-type: hot-spot',
      'joint: non-load-carrying',
      'hot-spot-scheme: a-linear',
      'sigma_x1 = 100 MPa',
      'sigma_x2 = 80 MPa',
      't = 20 mm',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]);
    expect(errorsOf(c)).toEqual([]);
    expect(si(c, 'delta_sigma_hs')).toBeCloseTo((1.67 * 100 - 0.67 * 80) * MPA, 3);
    expect(si(c, 'delta_sigma_C')).toBe(100 * MPA);
    expect(rel(si(c, 'N_f'), 2e6 * (100 / 113.4) ** 3)).toBeLessThan(1e-9);
  });
  it('quadratic type a (2.52, -2.24, 0.72) and type b (3, -3, 1) through the check', () => {
    const qa = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'stress-type: hot-spot',
      'joint: load-carrying',
      'hot-spot-scheme: a-quadratic',
      'sigma_x1 = 100 MPa',
      'sigma_x2 = 85 MPa',
      'sigma_x3 = 78 MPa',
      't = 20 mm',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]).c;
    expect(si(qa, 'delta_sigma_hs')).toBeCloseTo((2.52 * 100 - 2.24 * 85 + 0.72 * 78) * MPA, 3);
    const qb = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'stress-type: hot-spot',
      'joint: load-carrying',
      'hot-spot-scheme: b-quadratic',
      'sigma_x1 = 100 MPa',
      'sigma_x2 = 85 MPa',
      'sigma_x3 = 78 MPa',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]).c;
    expect(si(qb, 'delta_sigma_hs')).toBeCloseTo((3 * 100 - 3 * 85 + 78) * MPA, 3);
  });
});

describe('thickness, throat, interaction', () => {
  it('EN size effect: a transverse butt weld 90 at t = 40 mm -> 90 (25/40)^0.2 = 81.93 MPa (EN 1993-1-9 Table 8.3, ks)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'detail: transverse-butt-as-welded',
      't = 40 mm',
      'delta_sigma = 60 MPa',
      'N = 2e6',
      ...FACTORS,
      'Sy = 355 MPa',
    ]);
    expect(errorsOf(c)).toEqual([]);
    expect(rel(si(c, 'delta_sigma_C_eff'), 90 * (25 / 40) ** 0.2 * MPA)).toBeLessThan(1e-12);
    const thin = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'detail: transverse-butt-as-welded',
      't = 10 mm',
      'delta_sigma = 60 MPa',
      'N = 2e6',
      ...FACTORS,
    ]).c;
    // No benefit below 25 mm (EN 1993-1-9: ks for t > 25 mm only).
    expect(si(thin, 'delta_sigma_C_eff')).toBe(90 * MPA);
  });
  it('IIW thickness: n = 0.3 for a toe as welded: FAT 80 at t = 50 mm -> 80 * 0.5^0.3 (Hobbacher 2016 Table 3.5-1, from memory)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'delta_sigma_C = 80 MPa',
      'thickness-group: toe-as-welded',
      't = 50 mm',
      'delta_sigma = 60 MPa',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]);
    expect(rel(si(c, 'delta_sigma_C_eff'), 80 * 0.5 ** 0.3 * MPA)).toBeLessThan(1e-12);
  });
  it('throat of a load-carrying fillet weld: one throat unless n_w is stated (warning), 36* for root failure', () => {
    const one = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'dF_perp = 300 N/mm',
      'a_w = 5 mm',
      'N = 1e6',
      ...FACTORS,
    ]);
    expect(si(one.c, 'delta_sigma')).toBeCloseTo(60 * MPA, 3);
    const d = diag(one.c, 'defaulted-throats');
    expect(d.severity).toBe('warning');
    expect(d.range.start.line).toBe(lineOf(one.text, 'dF_perp'));
    const two = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'dF_perp = 300 N/mm',
      'a_w = 5 mm',
      'n_w = 2',
      'N = 1e6',
      ...FACTORS,
    ]).c;
    expect(si(two, 'delta_sigma')).toBeCloseTo(30 * MPA, 3);
    expect(codes(two)).not.toContain('defaulted-throats');
    expect(si(two, 'delta_sigma_C')).toBe(36 * MPA);
    const wrong = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'dF_perp = 300 N',
      'a_w = 5 mm',
      'n_w = 2',
      'N = 1e6',
      ...FACTORS,
    ]);
    expect(diag(wrong.c, 'wrong-dimension').range.start.line).toBe(lineOf(wrong.text, 'dF_perp'));
  });
  it('EN interaction (Eq. 8.3): (gamma Delta sigma_E2 / (C/gamma_Mf))^3 + (gamma Delta tau_E2 / (C_tau/gamma_Mf))^5', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_tau_C = 80 MPa',
      'delta_sigma = 40 MPa',
      'delta_tau = 45 MPa',
      'N = 2e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.15',
      'Sy = 355 MPa',
    ]);
    expect(errorsOf(c)).toEqual([]);
    // At 2e6 cycles the equivalent ranges are the ranges themselves (constant amplitude):
    // u_sigma = 40 / (71/1.15) (40 MPa is below the fatigue limit 45.5 MPa, yet Eq. 8.2 holds it),
    // u_tau = 45 / (80/1.15).
    const us = 40 / (71 / 1.15);
    const ut = 45 / (80 / 1.15);
    expect(rel(si(c, 'u_sigma'), us)).toBeLessThan(1e-9);
    expect(rel(si(c, 'u_tau'), ut)).toBeLessThan(1e-9);
    expect(rel(si(c, 'u_fat'), us ** 3 + ut ** 5)).toBeLessThan(1e-9);
  });
  it('constant amplitude beyond the knee: u = gamma_Ff gamma_Mf Delta sigma / Delta sigma_D (the fatigue limit), 1 / n_range', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 40 MPa',
      'N = 1e8',
      ...FACTORS,
    ]);
    const dD = (2 / 5) ** (1 / 3) * 71;
    expect(rel(si(c, 'u_fat'), (1.35 * 40) / dD)).toBeLessThan(1e-9);
    expect(rel(si(c, 'u_fat'), 1 / si(c, 'n_range'))).toBeLessThan(1e-9);
  });
  it('IIW comparison value: ((u_sigma)^2 + (u_tau)^2) / CV, CV = 0.5 non-proportional (Hobbacher 2016 Sec. 4.3.3, from memory)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'normal-shear: non-proportional',
      'delta_sigma_C = 71 MPa',
      'delta_tau_C = 80 MPa',
      'delta_sigma = 50 MPa',
      'delta_tau = 45 MPa',
      'N = 2e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'D_allow = 1',
    ]);
    const us = 50 / 71;
    const ut = 45 / 80;
    expect(rel(si(c, 'u_fat'), (us ** 2 + ut ** 2) / 0.5)).toBeLessThan(1e-9);
  });
  it('stress-relieved: EN takes 60 % of the compressive part of the range (Sec. 7.2.1), the IIW f(R) on the class, never both', () => {
    const en = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'residual-stress: stress-relieved',
      'delta_sigma_C = 71 MPa',
      'sigma_max = 40 MPa',
      'sigma_min = -60 MPa',
      'N = 1e6',
      ...FACTORS,
    ]).c;
    expect(si(en, 'delta_sigma')).toBeCloseTo((40 + 0.6 * 60) * MPA, 3);
    // IIW case I (Hobbacher 2016 Sec. 3.3.4, from memory): R = -1.5 < -1 -> f(R) = 1.6; the full range 100 MPa.
    const iiw = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'residual-stress: stress-relieved',
      'delta_sigma_C = 71 MPa',
      'sigma_max = 40 MPa',
      'sigma_min = -60 MPa',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]).c;
    expect(si(iiw, 'delta_sigma')).toBeCloseTo(100 * MPA, 3);
    expect(si(iiw, 'f_R')).toBeCloseTo(1.6, 10);
    // As welded: the full range and no enhancement, in both.
    const aw = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'delta_sigma_C = 71 MPa',
      'sigma_max = 40 MPa',
      'sigma_min = -60 MPa',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]).c;
    expect(si(aw, 'f_R')).toBe(1);
    expect(si(aw, 'delta_sigma_C_eff')).toBe(71 * MPA);
  });
  it('a class stated on the throat with a root-failure detail needs no force: cruciform-root, delta_sigma on the throat', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'detail: cruciform-root',
      'delta_sigma = 30 MPa',
      'N = 1e6',
      ...FACTORS,
    ]);
    expect(errorsOf(c)).toEqual([]);
    expect(si(c, 'delta_sigma_C')).toBe(36 * MPA);
  });
  it('a class in the wrong unit (71 Pa) is an error, no curve', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 Pa',
      'delta_sigma = 30 MPa',
      'N = 1e6',
      ...FACTORS,
    ]);
    expect(c.status).toBe('error');
    expect(c.values.D_sum).toBeUndefined();
  });
});

describe('loads: compressive, zero mean, US units', () => {
  const base = ['method: weld', 'standard: en-1993-1-9', 'delta_sigma_C = 71 MPa', 'N = 1e6', ...FACTORS];
  it('sigma_max/sigma_min below zero, fully reversed and a stated range of the same size give one answer (as welded)', () => {
    const a = evaluate([...base, 'delta_sigma = 80 MPa']).c;
    const b = evaluate([...base, 'sigma_max = -20 MPa', 'sigma_min = -100 MPa']).c;
    const z = evaluate([...base, 'sigma_max = 40 MPa', 'sigma_min = -40 MPa']).c;
    for (const c of [b, z]) expect(si(c, 'D_sum')).toBeCloseTo(si(a, 'D_sum'), 12);
    expect(rel(si(a, 'D_sum'), 1e6 / enLife(80 * MPA, 71 * MPA, 1.35, false))).toBeLessThan(1e-9);
  });
  it('from the loads on a plate W x t: |dF| / (W t) + 6 |dM| / (W t^2) at the face where they add; a load needs its pair', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'F_max = 50 kN',
      'F_min = -10 kN',
      'M_max = -100 N*m',
      'M_min = 200 N*m',
      'W = 100 mm',
      't = 10 mm',
      'N = 1e6',
      ...FACTORS,
    ]);
    // 60 kN / 1000 mm^2 = 60 MPa; 6 * 300 N*m / (100 mm * 100 mm^2) = 180 MPa: 240 MPa at one face.
    expect(si(c, 'delta_sigma')).toBeCloseTo(240 * MPA, 3);
    const half = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'F_max = 50 kN',
      'W = 100 mm',
      't = 10 mm',
      'N = 1e6',
      ...FACTORS,
    ]);
    const d = diag(half.c, 'missing-load-pair');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(half.text, 'F_max'));
  });
  it('ksi and in give the answer of MPa and mm converted (t = 1.5 in = 38.1 mm: ks = (25/38.1)^0.2)', () => {
    const si_ = evaluate([...base, 'delta_sigma = 80 MPa', 't = 38.1 mm']).c;
    const us = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      `delta_sigma_C = ${71 / (KSI / MPA)} ksi`,
      'N = 1e6',
      ...FACTORS,
      `delta_sigma = ${80 / (KSI / MPA)} ksi`,
      `t = ${38.1e-3 / IN} in`,
    ]).c;
    expect(us.unitSystem).toBe('US');
    expect(rel(si(us, 'D_sum'), si(si_, 'D_sum'))).toBeLessThan(1e-9);
    expect(rel(si(si_, 'delta_sigma_C_eff'), 71 * (25 / 38.1) ** 0.2 * MPA)).toBeLessThan(1e-12);
  });
});

describe('diagnostics of a weld check, on their lines', () => {
  it('no class: error on the method line, no results', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma = 80 MPa',
      'N = 1e6',
      ...FACTORS,
    ]);
    const d = diag(c, 'missing-weld-class');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'method:'));
    expect(c.values.D_sum).toBeUndefined();
    expect(c.status).toBe('error');
  });
  it('no standard: error with a fix per standard', () => {
    const { c } = evaluate(['method: weld', 'delta_sigma_C = 71 MPa', 'delta_sigma = 80 MPa', 'N = 1e6']);
    const d = diag(c, 'missing-standard');
    expect(d.severity).toBe('error');
    expect(d.fixes?.length).toBe(3);
  });
  it('a mean-stress criterion or a Marin factor: not applicable, with the reason, on its line', () => {
    const { c, text } = evaluate([
      ...[
        'method: weld',
        'standard: en-1993-1-9',
        'delta_sigma_C = 71 MPa',
        'delta_sigma = 80 MPa',
        'N = 1e6',
        ...FACTORS,
      ],
      'criterion: goodman',
      'ka = 0.8',
    ]);
    const ds = c.diagnostics.filter((d) => d.code === 'not-for-welds');
    expect(ds.map((d) => d.range.start.line).sort()).toEqual(
      [lineOf(text, 'criterion:'), lineOf(text, 'ka =')].sort(),
    );
    expect(ds.find((d) => d.range.start.line === lineOf(text, 'criterion:'))?.message).toMatch(
      /residual stress/,
    );
    expect(ds.find((d) => d.range.start.line === lineOf(text, 'ka ='))?.message).toMatch(/detail class/);
    // The numbers are the weld check's own: unchanged by the words it does not use.
    const plain = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 80 MPa',
      'N = 1e6',
      ...FACTORS,
    ]).c;
    expect(si(c, 'D_sum')).toBe(si(plain, 'D_sum'));
  });
  it('a range beyond 1.5 fy (normal) or 1.5 fy / sqrt(3) (shear): error, no S-N results (EN 1993-1-9 Eq. 8.1)', () => {
    const n = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 540 MPa',
      'Sy = 355 MPa',
      'N = 1e4',
      ...FACTORS,
    ]);
    const d = diag(n.c, 'stress-range-limit');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(n.text, 'delta_sigma ='));
    expect(n.c.values.D_sum).toBeUndefined();
    // 532 MPa is below 1.5 * 355 = 532.5: no error.
    const ok = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 532 MPa',
      'Sy = 355 MPa',
      'N = 1e4',
      ...FACTORS,
    ]).c;
    expect(codes(ok)).not.toContain('stress-range-limit');
    // Shear: 1.5 * 355 / sqrt(3) = 307.4 MPa.
    const t = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_tau_C = 80 MPa',
      'delta_sigma = 50 MPa',
      'delta_tau = 310 MPa',
      'Sy = 355 MPa',
      'N = 1e4',
      ...FACTORS,
    ]);
    expect(diag(t.c, 'stress-range-limit').range.start.line).toBe(lineOf(t.text, 'delta_tau ='));
    expect(t.c.values.u_fat).toBeUndefined();
  });
  it('a nominal class with a hot-spot stress: wrong-stress-type on the detail line', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'stress-type: hot-spot',
      'hot-spot-scheme: a-linear',
      'detail: transverse-butt-as-welded',
      'sigma_x1 = 100 MPa',
      'sigma_x2 = 80 MPa',
      't = 20 mm',
      'N = 1e6',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
    ]);
    const d = diag(c, 'wrong-stress-type');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'detail:'));
    expect(c.values.D_sum).toBeUndefined();
  });
  it('a thickness factor above 1 for a plate thinner than 25 mm: error, the class is not raised', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      't = 10 mm',
      'k_s = 1.15',
      'delta_sigma = 50 MPa',
      'N = 1e6',
      ...FACTORS,
    ]);
    const d = diag(c, 'thickness-benefit');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'k_s'));
    expect(c.values.D_sum).toBeUndefined();
  });
  it('no loading, or two: errors', () => {
    const none = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 80 MPa',
    ]).c;
    expect(errorsOf(none)).toContain('missing-weld-loading');
    const two = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'N = 1e6',
      'spectrum: delta_sigma = 50 MPa, n = 1e5',
    ]).c;
    expect(errorsOf(two)).toContain('history-and-spectrum');
  });
  it('EN 1993-1-9 with an aluminium family: error (the standard covers steel only)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'material-family: aluminium-wrought',
      'delta_sigma_C = 36 MPa',
      'delta_sigma = 30 MPa',
      'N = 1e6',
    ]);
    expect(errorsOf(c)).toContain('weld-standard-material');
  });
  it('a shear range with a spectrum: error on its line (leaving it out could pass a failing interaction)', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_tau_C = 80 MPa',
      'delta_tau = 30 MPa',
      ...FACTORS,
      'spectrum: delta_sigma = 50 MPa, n = 1e6',
    ]);
    const d = diag(c, 'shear-variable-amplitude');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'delta_tau ='));
    expect(c.values.u_fat).toBeUndefined();
  });
  it('a library steel gives Sy for the range limit (ASTM A36, Sy = 250 MPa: 1.5 fy = 375 MPa)', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'material: astm-a36',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 380 MPa',
      'N = 1e4',
      ...FACTORS,
    ]);
    expect(si(c, 'Sy')).toBe(250 * MPA);
    expect(errorsOf(c)).toContain('stress-range-limit');
    const ti = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'material-family: titanium',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 80 MPa',
      'N = 1e4',
    ]).c;
    expect(errorsOf(ti)).toContain('weld-standard-material');
  });
  it('the S-N diagram: design curve, knee, cut-off and the spectrum ranges at their lives', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 80 MPa',
      ...FACTORS,
      'D_allow = 1',
      'spectrum: delta_sigma = 110 MPa, n = 2e4',
      'spectrum: delta_sigma = 40 MPa, n = 1e6',
    ]);
    const d = checkDiagrams(c).find((x) => x.kind === 'weld-sn');
    expect(d).toBeDefined();
    for (const role of ['design-curve', 'knee', 'cut-off', 'level'])
      expect(d!.svg).toContain(`data-role="${role}"`);
    expect(d!.svg.match(/data-role="level"/g)?.length).toBe(2);
    // The data it draws: the design curve (class / gamma_Mf) and the ranges x gamma_Ff with their lives.
    const w = c.weldSn![0];
    expect(rel(w.deltaC, (80 / 1.35) * MPA)).toBeLessThan(1e-12);
    expect(rel(w.points[0].N!, enLife(110 * MPA, 80 * MPA, 1.35, true))).toBeLessThan(1e-9);
  });
  it('every value is finite or marked infinite, and the S-N diagram draws', () => {
    const { c } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'delta_sigma_C = 71 MPa',
      'delta_sigma = 30 MPa',
      'N = 1e9',
      ...FACTORS,
    ]);
    for (const [name, v] of Object.entries(c.values)) {
      if (v.si === null) expect(v.infinite, name).toBe(true);
      else expect(Number.isFinite(v.si), name).toBe(true);
    }
    expect(c.weldSn?.[0].m2).toBeNull();
  });
});

describe('weld: a shear range takes part in the life and the safety factor (independent hand check)', () => {
  // EN 1993-1-9 Sec. 7.1: normal m = 3 to 5e6 (Delta sigma_D = 0.737 C), m = 5 to 1e8; shear
  // m = 5 to 1e8 (Delta tau_L = 0.457 C). Constant amplitude: Delta R(N) on those curves, flat
  // beyond the constant-amplitude limit (normal) or the cut-off (shear). Eq. 8.3 interaction:
  // (gFf Ds / (DR_s(N)/gMf))^3 + (gFf Dt / (DR_t(N)/gMf))^5 <= 1.
  const normalR = (C: number, N: number) => {
    const ND = 5e6;
    const D = C * (2e6 / ND) ** (1 / 3);
    return N <= ND ? C * (2e6 / N) ** (1 / 3) : D;
  };
  const shearR = (C: number, N: number) => C * (2e6 / Math.min(N, 1e8)) ** (1 / 5);
  const u = (x: number, N: number, ds: number, dt: number, gMf: number) =>
    ((x * ds) / (normalR(71, N) / gMf)) ** 3 + ((x * dt) / (shearR(80, N) / gMf)) ** 5;
  const bisect = (f: (x: number) => number, lo: number, hi: number) => {
    for (let i = 0; i < 200; i++) {
      const m = Math.sqrt(lo * hi);
      if (f(m) >= 1) hi = m;
      else lo = m;
    }
    return hi;
  };
  const lines = (ds: number, dt: number, gMf: number, N: string) => [
    'method: weld',
    'standard: en-1993-1-9',
    'delta_sigma_C = 71 MPa',
    'delta_tau_C = 80 MPa',
    `delta_sigma = ${ds} MPa`,
    `delta_tau = ${dt} MPa`,
    't = 20 mm',
    'Sy = 355 MPa',
    'gamma_Ff = 1.0',
    `gamma_Mf = ${gMf}`,
    `N = ${N}`,
  ];

  it('n_range scales both ranges until Eq. 8.3 reaches 1 (was the normal range alone: 1.296 for 1.189)', () => {
    const { c } = evaluate(lines(60, 50, 1.15, '1e6'));
    const s = bisect((x) => u(x, 1e6, 60, 50, 1.15), 1e-3, 1e3);
    expect(Math.abs(c.values.n_range.si! / s - 1)).toBeLessThan(1e-6);
    expect(s).toBeLessThan(60 ** -1 * (normalR(71, 1e6) / 1.15));
  });

  it('N_f is the cycles at which Eq. 8.3 reaches 1 with the stated ranges (shear counts)', () => {
    const { c } = evaluate(lines(30, 35, 1.15, '5e7'));
    const N = bisect((n) => u(1, n, 30, 35, 1.15), 1, 1e15);
    expect(Math.abs(c.values.N_f.si! / N - 1)).toBeLessThan(1e-6);
    expect(c.values.repeats.si! * 5e7).toBeCloseTo(c.values.N_f.si!, 0);
  });

  it('a shear range alone (normal range 0): n_range from the shear curve, not infinite', () => {
    const { c } = evaluate(lines(0, 30, 1.0, '2e8'));
    // Beyond 1e8 the shear range is checked against the cut-off Delta tau_L = 0.457 x 80 MPa.
    const s = (0.457 * 80) / 30;
    expect(Math.abs(c.values.n_range.si! / s - 1)).toBeLessThan(2e-3);
    expect(c.values.N_f.infinite).toBe(true);
  });
});

describe('weld: the throat stress with a hot-spot stress type (independent hand check)', () => {
  it('stress-type: hot-spot with the forces on a throat is wrong-stress-type on the option line, no results', () => {
    // IIW 2016 Sec. 3.3.x (from memory): the throat of a load-carrying fillet weld is rated by
    // its own class (FAT 36 steel) on the nominal throat stress, not by a hot-spot class.
    const { c, text } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'stress-type: hot-spot',
      'dF_perp = 150 N/mm',
      'a_w = 5 mm',
      'n_w = 2',
      'Sy = 355 MPa',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'N = 2e6',
    ]);
    expect(diag(c, 'wrong-stress-type').range.start.line).toBe(lineOf(text, 'stress-type:'));
    expect(c.values.u_fat).toBeUndefined();
  });
});

describe('weld: a root detail with its range stated (independent hand check)', () => {
  it('detail: cruciform-root with delta_sigma stated: read on the throat, with a warning on that line', () => {
    const { c, text } = evaluate([
      'method: weld',
      'standard: en-1993-1-9',
      'detail: cruciform-root',
      'delta_sigma = 30 MPa',
      'Sy = 355 MPa',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'N = 2e6',
    ]);
    expect(diag(c, 'throat-range-stated').range.start.line).toBe(lineOf(text, 'delta_sigma'));
  });
});

describe('weld: a stated damage sum above the IIW recommendation (independent hand check)', () => {
  it('D_allow = 1.0 under IIW: damage-sum-above-recommended on its line, once', () => {
    // IIW recommendations (Hobbacher 2016) Sec. 4.3.1: D = 0.5 for variable amplitude, 0.2
    // for non-proportional loading (from memory).
    const { c, text } = evaluate([
      'method: weld',
      'standard: iiw-2016',
      'delta_sigma_C = 71 MPa',
      't = 20 mm',
      'Sy = 355 MPa',
      'gamma_Ff = 1.0',
      'gamma_Mf = 1.0',
      'D_allow = 1.0',
      'spectrum: delta_sigma = 90 MPa, n = 2e5',
      'spectrum: delta_sigma = 40 MPa, n = 1e6',
    ]);
    const found = c.diagnostics.filter((d) => d.code === 'damage-sum-above-recommended');
    expect(found).toHaveLength(1);
    expect(found[0].range.start.line).toBe(lineOf(text, 'D_allow'));
  });
});
