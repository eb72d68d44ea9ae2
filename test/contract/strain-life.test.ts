/**
 * `method: strain-life` blocks, end to end: the notch-root state and the life against an
 * independent chain written here (plain bisection on the published equations, no code shared
 * with the core), Glinka's energy equality, rainflow with memory on the ASTM E1049 history,
 * properties over the range of lives, and the diagnostics on their lines.
 *
 * Equations: Ramberg-Osgood cyclic curve and Masing doubling (Dowling, Mechanical Behavior of
 * Materials, 4th ed., Ch. 12); Neuber's rule sigma eps = (Kt S)^2/E and on ranges
 * Delta sigma Delta eps = (Kt Delta S)^2/E (Neuber 1961; Topper, Wetzel & Morrow 1969; Dowling
 * Ch. 14, from memory for the sections); Glinka's rule (Glinka 1985); Coffin-Manson-Basquin,
 * Morrow and Smith-Watson-Topper (Dowling Ch. 14; Bannantine, Comer & Handrock, Fundamentals of
 * Metal Fatigue Analysis, 1990, Ch. 2, from memory for the chapter).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  type CheckResult,
  checkDiagrams,
  evaluateNote,
  type HistoryChunkReader,
} from '../../shared-core/src';
import { diag, KSI, lineOf, MPA, si } from './helpers';

const GPA = 1e9;

/**
 * RQC-100 roller quenched and tempered steel: sigma_f' = 938 MPa, b = -0.0648 (Dowling Table 9.1,
 * looked up for the library); E = 200 GPa, eps_f' = 1.38, c = -0.704, K' = 903 MPa, n' = 0.0905
 * (Dowling Table 14.1, from memory); Sy = 683 MPa (Table 9.1).
 */
const RQC = { E: 200 * GPA, K: 903 * MPA, n: 0.0905, sf: 938 * MPA, b: -0.0648, ef: 1.38, c: -0.704 };
const RQC_LINES = [
  'E = 200 GPa',
  'K_prime = 903 MPa',
  'n_prime = 0.0905',
  'sigma_f_prime = 938 MPa',
  'b_basquin = -0.0648',
  'eps_f_prime = 1.38',
  'c_coffin = -0.704',
  'Sy = 683 MPa',
];

// ---- the independent chain -------------------------------------------------------------

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  const fa0 = f(a);
  for (let i = 0; i < 300; i++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    const fm = f(m);
    if (fm === 0) return m;
    if (Math.sign(fm) === Math.sign(fa0)) a = m;
    else b = m;
  }
  return 0.5 * (a + b);
}
const ro = (s: number) => Math.sign(s) * (Math.abs(s) / RQC.E + (Math.abs(s) / RQC.K) ** (1 / RQC.n));
const masing = (ds: number) => ds / RQC.E + 2 * (ds / (2 * RQC.K)) ** (1 / RQC.n);
/** Neuber on the cyclic curve: sigma with sigma eps(sigma) = e^2/E, e = Kt S. */
const neuber = (e: number) => Math.sign(e) * bisect((s) => s * ro(s) - (e * e) / RQC.E, 0, Math.abs(e));
/** Neuber on the Masing curve: Delta sigma with Delta sigma Delta eps = dE^2/E. */
const neuberRange = (dE: number) => bisect((d) => d * masing(d) - (dE * dE) / RQC.E, 0, dE);
/** Glinka: W(sigma) = e^2/(2E) on the cyclic curve. */
const energy = (s: number) => (s * s) / (2 * RQC.E) + (s / (1 + RQC.n)) * (s / RQC.K) ** (1 / RQC.n);
const glinka = (e: number) => bisect((s) => energy(s) - (e * e) / (2 * RQC.E), 0, Math.abs(e));
/** Reversals 2N from a strain-life equation written as R(2N) = P, bisection in log10(2N) on [0, 14]. */
function reversals(P: number, R: (r: number) => number): number {
  return 10 ** bisect((u) => Math.log(R(10 ** u)) - Math.log(P), 0, 14);
}
const cmb = (r: number) => (RQC.sf / RQC.E) * r ** RQC.b + RQC.ef * r ** RQC.c;
const swt = (r: number) => (RQC.sf ** 2 / RQC.E) * r ** (2 * RQC.b) + RQC.sf * RQC.ef * r ** (RQC.b + RQC.c);

// ---- helpers -----------------------------------------------------------------------------

function evaluate(lines: string[], histories?: HistoryChunkReader): { c: CheckResult; text: string[] } {
  const text = ['```fatigue c', ...lines, '```', ''].join('\n');
  return { c: evaluateNote(text, histories ? { histories } : {}).checks[0], text: text.split('\n') };
}
function expectAllFinite(c: CheckResult) {
  for (const [name, v] of Object.entries(c.values)) {
    if (v.si === null) expect(v.infinite, `${name} is null but not infinite`).toBe(true);
    else expect(Number.isFinite(v.si), `${name} = ${v.si}`).toBe(true);
    expect(v.display, name).not.toMatch(/NaN|Infinity/);
  }
}
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const block = (loads: string[], extra: string[] = []) => [
  'method: strain-life',
  ...RQC_LINES,
  ...loads,
  ...extra,
];

function memoryReader(files: Record<string, string>): HistoryChunkReader {
  return {
    read(path, onChunk) {
      const f = files[path];
      if (f === undefined) return { ok: false, code: 'history-not-found', message: `no ${path}` };
      onChunk(f);
      return { ok: true };
    },
  };
}

// ---- tests ---------------------------------------------------------------------------------

describe("Neuber's rule at the notch root: the block against an independent bisection", () => {
  it('R = -1: local max/min stress, eps_a and N_f (Coffin-Manson-Basquin) as the independent chain', () => {
    const Kt = 2.5;
    const S = 300 * MPA;
    const { c } = evaluate(
      block(['Kt = 2.5', 'sigma_max = 300 MPa', 'sigma_min = -300 MPa', 'mean-stress: none']),
    );
    expectAllFinite(c);
    const s1 = neuber(Kt * S); // first loading to +S on the cyclic curve
    const ds = neuberRange(Kt * 2 * S); // the reversal to -S on the Masing curve
    expect(rel(si(c, 'sigma_max_local'), s1)).toBeLessThan(1e-9);
    expect(rel(si(c, 'sigma_min_local'), s1 - ds)).toBeLessThan(1e-9);
    const epsA = masing(ds) / 2;
    expect(rel(si(c, 'eps_a'), epsA)).toBeLessThan(1e-9);
    // The intersection itself: the Neuber hyperbola meets the Ramberg-Osgood curve there.
    expect(rel(s1 * ro(s1), (Kt * S) ** 2 / RQC.E)).toBeLessThan(1e-9);
    expect(rel(si(c, 'N_f'), reversals(epsA, cmb) / 2)).toBeLessThan(1e-8);
  });

  for (const [word, model] of [
    ['swt', 'swt'],
    ['morrow', 'morrow-full'],
    ['morrow-full', 'morrow-full'],
    ['morrow-elastic', 'morrow-elastic'],
    ['none', 'none'],
  ] as const)
    it(`R = 0 (0 to 400 MPa, Kt = 2), mean-stress: ${word}: the loop's mean and the life as the independent chain`, () => {
      const Kt = 2;
      const S = 400 * MPA;
      const { c } = evaluate(
        block(['Kt = 2', 'sigma_max = 400 MPa', 'sigma_min = 0 MPa', `mean-stress: ${word}`]),
      );
      expectAllFinite(c);
      const smax = neuber(Kt * S);
      const ds = neuberRange(Kt * S);
      const smin = smax - ds;
      const sm = (smax + smin) / 2;
      const epsA = masing(ds) / 2;
      expect(rel(si(c, 'sigma_m_local'), sm)).toBeLessThan(1e-8);
      // The notch root yields on the first loading: the local mean relaxes below the elastic Kt S / 2.
      expect(sm).toBeLessThan((Kt * S) / 2);
      const f = (1 - sm / RQC.sf) as number;
      const life =
        model === 'swt'
          ? reversals(smax * epsA, swt)
          : model === 'none'
            ? reversals(epsA, cmb)
            : reversals(
                epsA,
                (r) =>
                  ((RQC.sf - sm) / RQC.E) * r ** RQC.b +
                  RQC.ef * (model === 'morrow-full' ? f ** (RQC.c / RQC.b) : 1) * r ** RQC.c,
              );
      expect(rel(si(c, 'N_f'), life / 2)).toBeLessThan(1e-8);
      expect(c.values.N_f.formula).toContain(model === 'swt' ? 'sigma_max eps_a' : 'eps_a =');
    });

  it("transition life 2N_t = (eps_f' E / sigma_f')^(1/(b - c)) (Dowling Ch. 14, from memory): 7281 reversals for RQC-100", () => {
    const { c } = evaluate(block(['Kt = 2', 'sigma_max = 200 MPa', 'sigma_min = -200 MPa']));
    const t = ((RQC.ef * RQC.E) / RQC.sf) ** (1 / (RQC.b - RQC.c));
    expect(rel(si(c, 'two_N_t'), t)).toBeLessThan(1e-12);
    expect(Math.round(t)).toBe(7281);
  });
});

describe("Glinka's rule: the energy equality at the notch root", () => {
  it('first loading and range: the energy under the cyclic and Masing curves equals (Kt S)^2/(2E)', () => {
    const Kt = 3;
    const S = 250 * MPA;
    const { c } = evaluate(
      block([
        'Kt = 3',
        'sigma_max = 250 MPa',
        'sigma_min = -250 MPa',
        'notch-rule: glinka',
        'mean-stress: none',
      ]),
    );
    const s1 = si(c, 'sigma_max_local');
    const ds = s1 - si(c, 'sigma_min_local');
    expect(rel(energy(s1), (Kt * S) ** 2 / (2 * RQC.E))).toBeLessThan(1e-9);
    expect(rel(4 * energy(ds / 2), (Kt * 2 * S) ** 2 / (2 * RQC.E))).toBeLessThan(1e-9);
    expect(rel(s1, glinka(Kt * S))).toBeLessThan(1e-9);
    // Glinka's rule gives less local strain than Neuber's once the root yields, so a longer life.
    const n = evaluate(
      block(['Kt = 3', 'sigma_max = 250 MPa', 'sigma_min = -250 MPa', 'mean-stress: none']),
    ).c;
    expect(si(c, 'eps_a')).toBeLessThan(si(n, 'eps_a'));
    expect(si(c, 'N_f')).toBeGreaterThan(si(n, 'N_f'));
  });
});

describe('loads: signs, zero mean, both forms, US units', () => {
  it('sigma_a alone is fully reversed (defaulted-load) and equals sigma_max/sigma_min = +-S', () => {
    const a = evaluate(block(['Kt = 2.5', 'sigma_a = 300 MPa'])).c;
    const b = evaluate(block(['Kt = 2.5', 'sigma_max = 300 MPa', 'sigma_min = -300 MPa'])).c;
    diag(a, 'defaulted-load');
    expect(rel(si(a, 'N_f'), si(b, 'N_f'))).toBeLessThan(1e-12);
  });

  it('a compressive cycle loads the root in compression first: the local minimum is the Neuber point of -S', () => {
    const { c } = evaluate(
      block(['Kt = 2', 'sigma_max = 0 MPa', 'sigma_min = -400 MPa', 'mean-stress: swt']),
    );
    expectAllFinite(c);
    expect(rel(si(c, 'sigma_min_local'), neuber(-2 * 400 * MPA))).toBeLessThan(1e-9);
    // The reversal leaves a tensile local maximum (compressive yielding, residual tension): SWT counts it.
    expect(si(c, 'sigma_max_local')).toBeGreaterThan(0);
    expect(c.values.N_f.si).not.toBeNull();
  });

  it('a fully compressive local loop does no damage under SWT (swt-no-tension, infinite life)', () => {
    const { c, text } = evaluate(
      block(['Kt = 1.2', 'sigma_max = -100 MPa', 'sigma_min = -300 MPa', 'mean-stress: swt']),
    );
    expect(c.values.N_f.infinite).toBe(true);
    expect(diag(c, 'swt-no-tension').range.start.line).toBe(lineOf(text, 'mean-stress:'));
  });

  it('the same note in ksi gives the same numbers (US units)', () => {
    const us = evaluate([
      'method: strain-life',
      `E = ${200e9 / KSI} ksi`,
      `K_prime = ${903e6 / KSI} ksi`,
      'n_prime = 0.0905',
      `sigma_f_prime = ${938e6 / KSI} ksi`,
      'b_basquin = -0.0648',
      'eps_f_prime = 1.38',
      'c_coffin = -0.704',
      `Sy = ${683e6 / KSI} ksi`,
      'Kt = 2',
      `sigma_max = ${400e6 / KSI} ksi`,
      'sigma_min = 0 ksi',
    ]).c;
    const siNote = evaluate(block(['Kt = 2', 'sigma_max = 400 MPa', 'sigma_min = 0 MPa'])).c;
    expect(us.unitSystem).toBe('US');
    for (const n of ['eps_a', 'sigma_max_local', 'sigma_m_local', 'N_f', 'two_N_t'])
      expect(rel(si(us, n), si(siNote, n)), n).toBeLessThan(1e-9);
    expect(us.values.sigma_max_local.display).toMatch(/ksi/);
  });
});

describe('variable amplitude: rainflow with memory on the ASTM E1049 history', () => {
  // ASTM E1049-85 (2017), Fig. 6 (the rainflow example; looked up for the core's tests):
  // -2, 1, -3, 5, -1, 3, -4, 4, -2 units. Re-ordered to start at its largest peak 5 and closed
  // there, the three-point rule counts the ranges 4, 3, 7 and 9 (hand trace in the test of the
  // core's local path). With mean-stress `none` each loop's life depends only on its nominal
  // range, so the damage of a pass is the sum over these four ranges.
  const UNIT = 50 * MPA;
  const csv = ['stress', '-2', '1', '-3', '5', '-1', '3', '-4', '4', '-2'].join('\n');
  const reader = memoryReader({ 'loads/e1049.csv': csv });
  const lines = block(
    ['Kt = 2'],
    [
      'history: loads/e1049.csv',
      'history-load: stress',
      'history_scale = 50 MPa',
      'mean-stress: none',
      'passes = 1000',
      'require: D_sum <= 1',
    ],
  );

  it('four closed loops; D_sum = passes x sum(1/N_f) over the ranges 4, 3, 7, 9 (independent chain)', () => {
    const { c, text } = evaluate(lines, reader);
    expectAllFinite(c);
    expect(si(c, 'cycles_counted')).toBe(4);
    let d = 0;
    let worst = 0;
    for (const r of [4, 3, 7, 9]) {
      const epsA = masing(neuberRange(2 * r * UNIT)) / 2;
      // The method's convention (docs/methods.md): a loop beyond 1e12 reversals does no damage.
      const rev = reversals(epsA, cmb);
      if (rev < 1e12) d += 1 / (rev / 2);
      worst = Math.max(worst, epsA);
    }
    expect(rel(si(c, 'D_sum'), 1000 * d)).toBeLessThan(1e-8);
    expect(rel(si(c, 'repeats'), 1 / d)).toBeLessThan(1e-8);
    expect(rel(si(c, 'N_f'), 4 / d)).toBeLessThan(1e-8);
    expect(rel(si(c, 'eps_a'), worst)).toBeLessThan(1e-9);
    expect(c.requirements[0].met).toBe(true);
    expect(c.tables?.[0].rows.length).toBe(4);
    // The range-3 loop lies beyond the curve's 1e12 reversals: it does no damage, said with N_f
    // (information), not as a warning on every history with small loops.
    expect(c.diagnostics.filter((x) => x.code === 'strain-life-beyond')).toEqual([]);
    expect(c.values.N_f.notes?.some((n) => /1e12 reversals/.test(n))).toBe(true);
    expect(lineOf(text, 'history:')).toBeGreaterThan(0);
  });

  it('the same history as spectrum levels is not the same: the spectrum hangs each level from its envelope', () => {
    const { c } = evaluate(
      block(
        ['Kt = 2'],
        [
          'spectrum: sigma_max = 250 MPa, sigma_min = -200 MPa, n = 1',
          'spectrum: sigma_max = 150 MPa, sigma_min = -50 MPa, n = 1',
          'mean-stress: none',
        ],
      ),
    );
    expectAllFinite(c);
    let d = 0;
    for (const r of [9, 4]) d += 1 / (reversals(masing(neuberRange(2 * r * UNIT)) / 2, cmb) / 2);
    expect(rel(si(c, 'D_sum'), d)).toBeLessThan(1e-8);
  });

  it('draws the loops and the strain-life curve', () => {
    const { c } = evaluate(lines, reader);
    const kinds = checkDiagrams(c).map((d) => d.kind);
    expect(kinds).toEqual(['strain-life-loops', 'strain-life-curve']);
    const loops = checkDiagrams(c)[0].svg;
    // Every reversal and closure point of the path is drawn, the governing loop's two tips marked.
    expect(loops.match(/data-role="reversal"/g)?.length).toBe(c.strainLife?.points.length);
    expect(loops.match(/data-role="governing"/g)?.length).toBe(2);
    expect(loops).toContain('data-role="governing-loop"');
    const curve = checkDiagrams(c)[1].svg;
    for (const role of ['total', 'elastic', 'plastic', 'transition', 'operating'])
      expect(curve, role).toContain(`data-role="${role}"`);
  });
});

describe('properties', () => {
  it('life never increases when the nominal range increases (every rule and mean-stress model)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 300, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: -150, max: 100, noNaN: true }),
        fc.constantFrom('swt', 'morrow-full', 'morrow-elastic', 'none'),
        fc.constantFrom('neuber', 'glinka'),
        (a, da, smin, model, rule) => {
          const life = (amp: number) =>
            evaluate(
              block([
                'Kt = 2.2',
                `sigma_max = ${smin + 2 * amp} MPa`,
                `sigma_min = ${smin} MPa`,
                `mean-stress: ${model}`,
                `notch-rule: ${rule}`,
              ]),
            ).c.values.N_f;
          const n1 = life(a);
          const n2 = life(a + da);
          if (!n1 || !n2) return true; // withheld (general yielding) for both or either
          const v1 = n1.si ?? Number.POSITIVE_INFINITY;
          const v2 = n2.si ?? Number.POSITIVE_INFINITY;
          return v2 <= v1 * (1 + 1e-9);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('the solver converges for lives from 10 to 1e8 reversals: the load made for a life gives that life back', () => {
    // For R = -1 the loop is symmetric with its tips on the cyclic curve (Masing), so Neuber on the
    // range reads 4 sigma_a eps_a = (Kt 2 S)^2/E: the nominal S for a target life follows in closed
    // form from the curve (bisection for sigma_a only). Kt is chosen to keep S at 0.4 S'y (no general yield).
    const Syc = RQC.K * 0.002 ** RQC.n;
    for (let u = 1; u <= 8; u += 0.25) {
      const target = 10 ** u;
      const epsA = cmb(target);
      const sa = bisect((s) => ro(s) - epsA, 0, RQC.E * epsA);
      const KS = Math.sqrt(sa * epsA * RQC.E);
      const S = Math.min(0.4 * Syc, KS);
      const Kt = KS / S;
      const { c } = evaluate(
        block([
          `Kt = ${Kt}`,
          `sigma_max = ${S / MPA} MPa`,
          `sigma_min = ${-S / MPA} MPa`,
          'mean-stress: none',
        ]),
      );
      expect(c.diagnostics.filter((d) => d.code === 'solver-tolerance')).toEqual([]);
      expect(rel(si(c, 'N_f'), target / 2), `2N = 1e${u}`).toBeLessThan(1e-7);
    }
  });
});

describe('diagnostics on the right lines', () => {
  it('missing strain-life constants: error on the method line, no results; the fix offers an estimate', () => {
    const { c, text } = evaluate(['method: strain-life', 'E = 200 GPa', 'Kt = 2', 'sigma_a = 200 MPa']);
    const d = diag(c, 'missing-cyclic-constants');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'method:'));
    expect(d.fixes?.[0].edits[0].newText).toMatch(/^estimate: /);
    expect(c.values.N_f).toBeUndefined();
    expect(c.status).toBe('error');
  });

  it('a library material without cyclic constants is named in the error', () => {
    const { c, text } = evaluate([
      'method: strain-life',
      'material: aisi-1045-cd',
      'Kt = 2',
      'sigma_a = 200 MPa',
    ]);
    const d = diag(c, 'missing-cyclic-constants');
    expect(d.message).toContain('aisi-1045-cd');
    expect(d.range.start.line).toBe(lineOf(text, 'material:'));
  });

  it('estimate: the warning names the estimate and its scatter, on the estimate line; constants shown as results', () => {
    const { c, text } = evaluate([
      'method: strain-life',
      'Sut = 758 MPa',
      'Sy = 683 MPa',
      'E = 200 GPa',
      'material-family: steel',
      'estimate: uniform-material-law',
      'Kt = 2',
      'sigma_a = 250 MPa',
    ]);
    expectAllFinite(c);
    const d = diag(c, 'cyclic-estimate');
    expect(d.severity).toBe('warning');
    expect(d.range.start.line).toBe(lineOf(text, 'estimate:'));
    expect(d.message).toMatch(/uniform material law.*factor/);
    // Baumel & Seeger's steel set (as in the core): sigma_f' = 1.5 Sut, eps_f' = 0.59 psi, psi = 1 at Sut/E <= 0.003.
    expect(rel(si(c, 'sigma_f_prime'), 1.5 * 758 * MPA)).toBeLessThan(1e-12);
    expect(si(c, 'b_basquin')).toBe(-0.087);
    expect(rel(si(c, 'K_prime'), 1.65 * 758 * MPA)).toBeLessThan(1e-12);
    expect(c.values.N_f.si).not.toBeNull();
  });

  it('general yielding: a nominal stress above Sy is an error on the load line and withholds the results', () => {
    const { c, text } = evaluate(block(['Kt = 2', 'sigma_max = 700 MPa', 'sigma_min = 0 MPa']));
    const d = diag(c, 'general-yield');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'sigma_max'));
    expect(c.values.N_f).toBeUndefined();
    expect(c.values.eps_a).toBeUndefined();
    expect(c.diagnostics.filter((x) => x.code === 'general-yield').length).toBeLessThanOrEqual(2);
  });

  it('life beyond the strain-life data: a warning on the load line that suggests the stress-life method', () => {
    const { c, text } = evaluate(block(['Kt = 1.5', 'sigma_a = 120 MPa', 'mean-stress: none']));
    const d = diag(c, 'strain-life-range');
    expect(d.severity).toBe('warning');
    expect(d.range.start.line).toBe(lineOf(text, 'sigma_a'));
    expect(d.message).toMatch(/stress-life/);
    const far = evaluate(block(['Kt = 1', 'sigma_a = 20 MPa', 'mean-stress: none'])).c;
    expect(diag(far, 'strain-life-beyond').message).toMatch(/stress-life/);
    expect(far.values.N_f.infinite).toBe(true);
  });

  it('Kt without a notch root radius: the information says the elastic Kt is used; Kf stated: says Kf is used', () => {
    const { c, text } = evaluate(block(['Kt = 2', 'sigma_a = 200 MPa']));
    const d = diag(c, 'notch-factor');
    expect(d.severity).toBe('information');
    expect(d.range.start.line).toBe(lineOf(text, 'Kt'));
    expect(d.message).toMatch(/elastic stress concentration Kt = 2.*no notch root radius/);
    const f = evaluate(block(['Kf = 1.8', 'sigma_a = 200 MPa']));
    const e = diag(f.c, 'notch-factor');
    expect(e.range.start.line).toBe(lineOf(f.text, 'Kf'));
    expect(e.message).toMatch(/Kf = 1.8 in place of Kt/);
    // Each core note once: no code repeats on one check.
    const codes = c.diagnostics.map((x) => `${x.code}@${x.range.start.line}`);
    expect(new Set(codes).size).toBe(codes.length);
  });

  it('no Kt: an error on the method line; no load: an error; both load forms: an error', () => {
    expect(diag(evaluate(block(['sigma_a = 200 MPa'])).c, 'missing-input').severity).toBe('error');
    expect(diag(evaluate(block(['Kt = 2'])).c, 'missing-load').severity).toBe('error');
    expect(
      diag(evaluate(block(['Kt = 2', 'sigma_a = 1 MPa', 'sigma_max = 2 MPa'])).c, 'load-twice').severity,
    ).toBe('error');
  });

  it('require: works on the results (met, and not met on its line)', () => {
    const ok = evaluate(block(['Kt = 2', 'sigma_a = 250 MPa', 'require: N_f >= 1e3, eps_a <= 0.01'])).c;
    expect(ok.status).toBe('pass');
    const { c, text } = evaluate(block(['Kt = 2', 'sigma_a = 250 MPa', 'N = 1e7', 'require: D_sum <= 0.5']));
    expect(c.status).toBe('fail');
    expect(diag(c, 'requirement-not-met').range.start.line).toBe(lineOf(text, 'require:'));
    expect(rel(si(c, 'D_sum'), 1e7 / si(c, 'N_f'))).toBeLessThan(1e-12);
  });

  it('options of other methods and N in a history are not used, and say so on their lines', () => {
    const { c, text } = evaluate(
      block(['Kt = 2', 'sigma_a = 200 MPa', 'surface: machined', 'criterion: goodman']),
    );
    const lines = c.diagnostics.filter((d) => d.code === 'ignored-input').map((d) => d.range.start.line);
    expect(lines).toEqual([lineOf(text, 'surface:'), lineOf(text, 'criterion:')]);
    expect(c.values.N_f.si).not.toBeNull();
  });

  it('a history with more peaks than the local path keeps is an error on the history line, never a throw', () => {
    const big = ['s', ...Array.from({ length: 140_000 }, (_, i) => (i % 2 ? '100' : '-100'))].join('\n');
    const { c, text } = evaluate(
      block(['Kt = 2'], ['history: loads/big.csv', 'history_scale = 1 MPa']),
      memoryReader({ 'loads/big.csv': big }),
    );
    const d = diag(c, 'history-too-many-peaks');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'history:'));
    expect(c.values.N_f).toBeUndefined();
  });

  it('a static load: information on the load line, N_f infinite; Kt below 1: an error on the Kt line', () => {
    const { c, text } = evaluate(block(['Kt = 2', 'sigma_max = 200 MPa', 'sigma_min = 200 MPa']));
    expect(diag(c, 'no-stress-range').range.start.line).toBe(lineOf(text, 'sigma_max'));
    expect(c.values.N_f.infinite).toBe(true);
    const k = evaluate(block(['Kt = 0.8', 'sigma_a = 200 MPa']));
    const errs = k.c.diagnostics.filter((d) => d.severity === 'error');
    expect(errs.length).toBeGreaterThan(0);
    expect(errs.every((d) => d.range.start.line === lineOf(k.text, 'Kt'))).toBe(true);
    expect(k.c.values.N_f).toBeUndefined();
  });

  it('K_prime without n_prime: an error on its line (no curve mixed from a measured and a compatible constant)', () => {
    const lines = block(['Kt = 2', 'sigma_a = 200 MPa']).filter((l) => !l.startsWith('n_prime'));
    const { c, text } = evaluate(lines);
    expect(diag(c, 'missing-cyclic-constants').range.start.line).toBe(lineOf(text, 'K_prime'));
    expect(c.values.N_f).toBeUndefined();
  });

  it('bad constants: an error on their line, never NaN', () => {
    const lines = block(['Kt = 2', 'sigma_a = 200 MPa']).map((l) =>
      l.startsWith('c_coffin') ? 'c_coffin = 0.5' : l,
    );
    const { c, text } = evaluate(lines);
    const d = diag(c, 'strain-life-constants-invalid');
    expect(d.range.start.line).toBe(lineOf(text, 'c_coffin'));
    expectAllFinite(c);
    expect(c.values.N_f).toBeUndefined();
  });
});

describe('test/fixtures/strain-life-mistakes.md: each mistake on its line', () => {
  const text = readFileSync(new URL('../fixtures/strain-life-mistakes.md', import.meta.url), 'utf8');
  const lines = text.split('\n');
  const result = evaluateNote(text);
  const check = (id: string) => result.checks.find((c) => c.id === id)!;
  /** 0-based line of the first line after the check's fence that starts with `prefix`. */
  const at = (id: string, prefix: string) => {
    const fence = lines.indexOf(`\`\`\`fatigue ${id}`);
    const i = lines.findIndex((l, k) => k > fence && l.startsWith(prefix));
    if (fence < 0 || i < 0) throw new Error(`no ${prefix} in ${id}`);
    return i;
  };
  const has = (id: string, code: string, prefix: string, severity: string) => {
    const d = check(id).diagnostics.find((x) => x.code === code);
    expect(d, `${id}: ${code}`).toBeDefined();
    expect(d!.range.start.line, `${id}: ${code}`).toBe(at(id, prefix));
    expect(d!.severity).toBe(severity);
  };

  it('constants forgotten: error on the material line, no life', () => {
    has('no_constants', 'missing-cyclic-constants', 'material:', 'error');
    expect(check('no_constants').values.N_f).toBeUndefined();
  });
  it('general yielding: error on the sigma_max line, the requirement not evaluated', () => {
    has('general_yield', 'general-yield', 'sigma_max', 'error');
    has('general_yield', 'requirement-not-evaluated', 'require:', 'error');
  });
  it('an estimate: the named warning and the assumed family on the estimate line, with a life', () => {
    has('estimated', 'cyclic-estimate', 'estimate:', 'warning');
    has('estimated', 'assumed-steel', 'estimate:', 'warning');
    expect(check('estimated').values.N_f.si).not.toBeNull();
  });
  it('a misspelt mean-stress word: error on it with the words listed, results withheld', () => {
    has('misspelt_model', 'unknown-option-value', 'mean-stress:', 'error');
    expect(check('misspelt_model').values.N_f).toBeUndefined();
  });
  it('Kf stated: says so on its line; a long life: strain-life-beyond on the load line; surface not used', () => {
    has('kf_stated_long_life', 'notch-factor', 'Kf', 'information');
    has('kf_stated_long_life', 'strain-life-beyond', 'sigma_max', 'warning');
    has('kf_stated_long_life', 'ignored-input', 'surface:', 'warning');
    expect(check('kf_stated_long_life').values.N_f.infinite).toBe(true);
  });
  it('US units with a compressive mean: passes, in ksi, Morrow credits the compressive mean (said with N_f)', () => {
    const c = check('ksi_note');
    expect(c.status).toBe('pass');
    expect(c.values.sigma_m_local.display).toMatch(/-.*ksi/);
    expect(c.values.N_f.notes?.some((n) => /Compressive local mean/.test(n))).toBe(true);
  });
});

describe("Dowling, Mechanical Behavior of Materials, 4th ed., Example 14.3's problem (AISI 4340, Kt = 2.80, S = 50 to 750 MPa)", () => {
  // The problem statement and Table 14.1 (AISI 4340 aircraft quality: sigma_o = 1103, sigma_u =
  // 1172 MPa, E = 207,000 MPa, H' = 1655 MPa, n' = 0.131, sigma_f' = 1758 MPa, b = -0.0977,
  // eps_f' = 2.12, c = -0.774) are looked up (the problem and the table as reproduced at
  // holooly.com, "Question 14.3"); the book's printed answer was not at hand, so the reference is
  // the published method worked here by bisection: Neuber on the cyclic curve to 750 MPa, Neuber on
  // the Masing curve over the 700 MPa range, and the SWT and Morrow lives of that loop.
  const M = { E: 207e9, K: 1655e6, n: 0.131, sf: 1758e6, b: -0.0977, ef: 2.12, c: -0.774 };
  const roM = (s: number) => s / M.E + (s / M.K) ** (1 / M.n);
  const masM = (d: number) => d / M.E + 2 * (d / (2 * M.K)) ** (1 / M.n);
  const s1 = bisect((s) => s * roM(s) - (2.8 * 750e6) ** 2 / M.E, 0, 2.8 * 750e6);
  const ds = bisect((d) => d * masM(d) - (2.8 * 700e6) ** 2 / M.E, 0, 2.8 * 700e6);
  const epsA = masM(ds) / 2;
  const smax = s1;
  const sm = s1 - ds / 2;
  const life = (P: number, R: (r: number) => number) =>
    10 ** bisect((u) => Math.log(R(10 ** u)) - Math.log(P), 0, 14) / 2;

  it('the library entry aisi-4340-aircraft holds the Table 14.1 constants (looked up)', () => {
    const { c } = evaluate([
      'method: strain-life',
      'material: aisi-4340-aircraft',
      'Kt = 2.8',
      'sigma_max = 750 MPa',
      'sigma_min = 50 MPa',
    ]);
    expect(si(c, 'E')).toBe(207e9);
    expect(si(c, 'K_prime')).toBe(1655e6);
    expect(si(c, 'n_prime')).toBe(0.131);
    expect(si(c, 'sigma_f_prime')).toBe(1758e6);
    expect(si(c, 'b_basquin')).toBe(-0.0977);
    expect(si(c, 'eps_f_prime')).toBe(2.12);
    expect(si(c, 'c_coffin')).toBe(-0.774);
    expect(si(c, 'Sy')).toBe(1103e6);
  });

  for (const [word, N] of [
    [
      'swt',
      () => life(smax * epsA, (r) => (M.sf ** 2 / M.E) * r ** (2 * M.b) + M.sf * M.ef * r ** (M.b + M.c)),
    ],
    [
      'morrow',
      () =>
        life(
          epsA,
          (r) => ((M.sf - sm) / M.E) * r ** M.b + M.ef * ((M.sf - sm) / M.sf) ** (M.c / M.b) * r ** M.c,
        ),
    ],
  ] as const)
    it(`mean-stress: ${word}: the local loop and N_f as the method worked by hand`, () => {
      const { c } = evaluate([
        'method: strain-life',
        'material: aisi-4340-aircraft',
        'Kt = 2.8',
        'sigma_max = 750 MPa',
        'sigma_min = 50 MPa',
        `mean-stress: ${word}`,
      ]);
      expectAllFinite(c);
      expect(rel(si(c, 'sigma_max_local'), smax)).toBeLessThan(1e-9);
      expect(rel(si(c, 'sigma_m_local'), sm)).toBeLessThan(1e-8);
      expect(rel(si(c, 'eps_a'), epsA)).toBeLessThan(1e-9);
      expect(rel(si(c, 'N_f'), N())).toBeLessThan(1e-7);
      // The root yields on the first loading: the local peak lies below Kt S_max.
      expect(smax).toBeLessThan(2.8 * 750e6);
    });
});

describe('strain-life: points of an independent hand check from the docs', () => {
  const curveLines = ['method: strain-life', 'E = 202 GPa', 'K_prime = 1258 MPa', 'n_prime = 0.208'];
  const loads = ['Kt = 2.5', 'r = 2 mm', 'sigma_max = 200 MPa', 'sigma_min = -200 MPa'];

  it('a constant that cannot be a strain-life curve is reported on its own line, and 2N_t is withheld', () => {
    const { c, text } = evaluate([
      ...curveLines,
      'sigma_f_prime = 948 MPa',
      'b_basquin = -0.092',
      'eps_f_prime = 0.26',
      'c_coffin = -0.05',
      ...loads,
    ]);
    // c must be steeper than b (Coffin-Manson: the plastic line falls faster; Dowling Ch. 14).
    expect(diag(c, 'strain-life-constants-invalid').range.start.line).toBe(lineOf(text, 'c_coffin'));
    expect(c.values.two_N_t).toBeUndefined();
    expect(c.values.N_f).toBeUndefined();
  });

  it('estimate: hardness works from HB and E alone; Sut is not needed when HB is stated', () => {
    const est = (extra: string[]) =>
      evaluate([
        'method: strain-life',
        'material-family: steel',
        'estimate: hardness',
        'E = 206 GPa',
        'HB = 200',
        ...extra,
        ...loads,
      ]).c;
    const alone = est([]);
    expect(alone.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    // Roessle & Fatemi's hardness method reads HB; a stated Sut beside it changes nothing.
    const withSut = est(['Sut = 700 MPa']);
    expect(alone.values.N_f.si).toBe(withSut.values.N_f.si);
  });
});
