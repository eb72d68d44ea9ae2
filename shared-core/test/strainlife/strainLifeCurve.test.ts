/**
 * Life on the strain-life curve: Coffin-Manson-Basquin, Morrow (elastic and full) and
 * Smith-Watson-Topper, checked by substituting the solved life back into each equation (written
 * in the test), by an independent bisection in log(2N), and at the transition life.
 * Equations: Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14 (from memory for the
 * equation numbers); Smith, Watson & Topper, J. Materials 5 (1970).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial } from '../../src/materials';
import {
  cyclicStress,
  type MeanStressModel,
  reversalsKernel,
  type StrainLifeConstants,
  strainAmplitudeAt,
  strainLife,
  strainLifeCurvePoints,
  transitionLife,
} from '../../src/strainlife';
import { cmb, type Life, lifeByBisection } from './independent';

// AISI 4340 (aircraft quality): sigma_f' = 1758 MPa, b = -0.0977 (Dowling Table 9.1, looked up);
// E = 207 GPa, eps_f' = 2.12, c = -0.774 (Dowling Table 14.1, from memory).
const m = findMaterial('aisi-4340-aircraft')!.cyclic!;
const k: StrainLifeConstants = {
  E: m.E,
  sigma_f_prime: m.sigma_f_prime,
  b: m.b,
  eps_f_prime: m.eps_f_prime,
  c: m.c,
};
const L: Life = { E: k.E, sf: k.sigma_f_prime, b: k.b, ef: k.eps_f_prime, c: k.c };

const lives = [10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8];

describe('Coffin-Manson-Basquin, no mean stress', () => {
  it("solves eps_a = (sigma_f'/E)(2N)^b + eps_f'(2N)^c: the life substituted back gives eps_a, 10 to 1e8 reversals", () => {
    for (const twoN of lives) {
      const eps_a = cmb(L, twoN);
      const r = strainLife(k, 'none', { eps_a });
      expect(r.reversals / twoN).toBeCloseTo(1, 9);
      expect(r.value).toBeCloseTo(r.reversals / 2, 6);
      expect(cmb(L, r.reversals) / eps_a).toBeCloseTo(1, 12);
    }
  });

  it("transition life 2N_t = (eps_f' E / sigma_f')^(1/(b - c)): the elastic and plastic parts are equal there", () => {
    const t = transitionLife(k).value;
    expect((k.sigma_f_prime / k.E) * t ** k.b).toBeCloseTo(k.eps_f_prime * t ** k.c, 14);
    // And the solver lands on it from its strain amplitude.
    const r = strainLife(k, 'none', { eps_a: cmb(L, t) });
    expect(r.reversals / t).toBeCloseTo(1, 9);
    expect(t / ((k.eps_f_prime * k.E) / k.sigma_f_prime) ** (1 / (k.b - k.c))).toBeCloseTo(1, 12);
  });

  it('agrees with an independent bisection in log(2N)', () => {
    for (const eps_a of [0.05, 0.01, 0.005, 0.003, 0.0075]) {
      const r = strainLife(k, 'none', { eps_a });
      expect(r.reversals / lifeByBisection((n) => cmb(L, n), eps_a)).toBeCloseTo(1, 8);
    }
  });

  it('strainAmplitudeAt and the curve points follow the same equation', () => {
    expect(strainAmplitudeAt(k, 1e4).value).toBeCloseTo(cmb(L, 1e4), 15);
    const pts = strainLifeCurvePoints(k, 9);
    expect(pts[0][0]).toBe(1);
    expect(pts[8][0]).toBeCloseTo(1e8, -1);
    for (const [n, e] of pts) expect(e).toBeCloseTo(cmb(L, n), 15);
  });
});

describe('Morrow and Smith-Watson-Topper', () => {
  const sm = 300 * MPA;
  it("Morrow elastic: eps_a = ((sigma_f' - sigma_m)/E)(2N)^b + eps_f'(2N)^c holds at the solved life", () => {
    for (const twoN of lives) {
      const eps_a = ((k.sigma_f_prime - sm) / k.E) * twoN ** k.b + k.eps_f_prime * twoN ** k.c;
      const r = strainLife(k, 'morrow-elastic', { eps_a, sigma_m: sm });
      expect(r.reversals / twoN).toBeCloseTo(1, 9);
    }
  });

  it("Morrow full: the plastic term scaled by ((sigma_f' - sigma_m)/sigma_f')^(c/b) holds at the solved life", () => {
    const f = (k.sigma_f_prime - sm) / k.sigma_f_prime;
    for (const twoN of lives) {
      const eps_a =
        ((k.sigma_f_prime - sm) / k.E) * twoN ** k.b + k.eps_f_prime * f ** (k.c / k.b) * twoN ** k.c;
      const r = strainLife(k, 'morrow-full', { eps_a, sigma_m: sm });
      expect(r.reversals / twoN).toBeCloseTo(1, 9);
    }
  });

  it("SWT: sigma_max eps_a = (sigma_f'^2/E)(2N)^(2b) + sigma_f' eps_f'(2N)^(b+c) holds at the solved life", () => {
    const smax = 900 * MPA;
    for (const twoN of lives) {
      const P =
        (k.sigma_f_prime ** 2 / k.E) * twoN ** (2 * k.b) +
        k.sigma_f_prime * k.eps_f_prime * twoN ** (k.b + k.c);
      const r = strainLife(k, 'swt', { eps_a: P / smax, sigma_max: smax });
      expect(r.reversals / twoN).toBeCloseTo(1, 9);
    }
  });

  it('at zero mean, Morrow gives the Coffin-Manson-Basquin life', () => {
    for (const model of ['morrow-elastic', 'morrow-full'] as MeanStressModel[]) {
      expect(strainLife(k, model, { eps_a: 0.004, sigma_m: 0 }).reversals).toBeCloseTo(
        strainLife(k, 'none', { eps_a: 0.004 }).reversals,
        3,
      );
    }
  });

  it("at zero mean with a compatible cyclic curve (n' = b/c, K' = sigma_f'/eps_f'^n'), SWT gives the Coffin-Manson-Basquin life (sigma_a = sigma_f'(2N)^b on that curve; identity derived in the test)", () => {
    const n = k.b / k.c;
    const curve = { E: k.E, K_prime: k.sigma_f_prime / k.eps_f_prime ** n, n_prime: n };
    for (const eps_a of [0.02, 0.006, 0.003]) {
      const sa = cyclicStress(curve, eps_a);
      const swt = strainLife(k, 'swt', { eps_a, sigma_max: sa });
      expect(swt.reversals / strainLife(k, 'none', { eps_a }).reversals).toBeCloseTo(1, 7);
    }
  });

  it('a tensile mean shortens and a compressive mean lengthens the life (Morrow), with a note for the credit', () => {
    const base = strainLife(k, 'morrow-elastic', { eps_a: 0.004, sigma_m: 0 }).reversals;
    expect(strainLife(k, 'morrow-elastic', { eps_a: 0.004, sigma_m: 200 * MPA }).reversals).toBeLessThan(
      base,
    );
    const comp = strainLife(k, 'morrow-elastic', { eps_a: 0.004, sigma_m: -200 * MPA });
    expect(comp.reversals).toBeGreaterThan(base);
    expect(comp.notes?.some((n) => n.code === 'compressive-mean')).toBe(true);
  });
});

describe('ends of the curve and the method rules', () => {
  it('beyond 1e12 reversals: infinite, with a warning that suggests the stress-life method', () => {
    const r = strainLife(k, 'none', { eps_a: 1e-5 });
    expect(r.infinite).toBe(true);
    expect(r.value).toBe(0);
    expect(r.notes?.find((n) => n.code === 'strain-life-beyond')?.message).toMatch(/stress-life/);
  });

  it('between 2e7 and 1e12 reversals: a finite life with a warning that the data rarely hold there', () => {
    const r = strainLife(k, 'none', { eps_a: cmb(L, 1e10) });
    expect(r.reversals / 1e10).toBeCloseTo(1, 8);
    expect(r.notes?.some((n) => n.code === 'strain-life-range')).toBe(true);
  });

  it('above the curve at one reversal: fracture on first loading, an error', () => {
    const r = strainLife(k, 'none', { eps_a: 3 });
    expect(r.status).toBe('first-reversal');
    expect(r.notes?.some((n) => n.code === 'first-reversal-fracture' && n.severity === 'error')).toBe(true);
  });

  it('SWT with sigma_max <= 0: no damage per the method (infinite), with a note', () => {
    const r = strainLife(k, 'swt', { eps_a: 0.004, sigma_max: -50 * MPA });
    expect(r.infinite).toBe(true);
    expect(r.notes?.some((n) => n.code === 'swt-no-tension')).toBe(true);
  });

  it("Morrow with sigma_m >= sigma_f': static failure, an error", () => {
    const r = strainLife(k, 'morrow-full', { eps_a: 0.004, sigma_m: 1.1 * k.sigma_f_prime });
    expect(r.notes?.some((n) => n.code === 'static-failure' && n.severity === 'error')).toBe(true);
    expect(Number.isFinite(r.value)).toBe(true);
  });

  it('zero amplitude: no damage; CMB with a sizeable mean warns that it is ignored', () => {
    expect(strainLife(k, 'none', { eps_a: 0 }).infinite).toBe(true);
    expect(
      strainLife(k, 'none', { eps_a: 0.004, sigma_m: 400 * MPA }).notes?.some(
        (n) => n.code === 'mean-stress-ignored',
      ),
    ).toBe(true);
  });

  it('bad constants or inputs: an error and a finite value', () => {
    for (const bad of [
      { ...k, b: 0.1 },
      { ...k, c: -0.05 },
      { ...k, eps_f_prime: Number.NaN },
    ]) {
      const r = strainLife(bad, 'none', { eps_a: 0.004 });
      expect(r.notes?.some((n) => n.code === 'strain-life-constants-invalid')).toBe(true);
      expect(Number.isFinite(r.value)).toBe(true);
    }
    expect(strainLife(k, 'swt', { eps_a: 0.004 }).notes?.some((n) => n.code === 'invalid-input')).toBe(true);
    expect(strainLife(k, 'none', { eps_a: Number.NaN }).notes?.some((n) => n.code === 'invalid-input')).toBe(
      true,
    );
  });
});

describe('properties (fast-check): the solver over the published range of constants', () => {
  // Published metals: sigma_f' about 500 to 2500 MPa, b -0.05 to -0.15, eps_f' 0.1 to 2.5,
  // c -0.4 to -0.9 (Dowling Table 14.1 ranges, from memory).
  const constants = fc.record({
    E: fc.double({ min: 68e9, max: 210e9, noNaN: true }),
    sigma_f_prime: fc.double({ min: 500e6, max: 2500e6, noNaN: true }),
    b: fc.double({ min: -0.15, max: -0.05, noNaN: true }),
    eps_f_prime: fc.double({ min: 0.1, max: 2.5, noNaN: true }),
    c: fc.double({ min: -0.9, max: -0.4, noNaN: true }),
  });
  const model = fc.constantFrom<MeanStressModel>('none', 'morrow-elastic', 'morrow-full', 'swt');

  it('converges for lives from 10 to 1e8 reversals (the life found reproduces the target)', () => {
    fc.assert(
      fc.property(
        constants,
        model,
        fc.double({ min: 1, max: 8, noNaN: true }),
        fc.double({ min: -0.3, max: 0.3, noNaN: true }),
        (kk, mdl, u, mr) => {
          const twoN = 10 ** u;
          const sm = mr * kk.sigma_f_prime;
          const f = (kk.sigma_f_prime - sm) / kk.sigma_f_prime;
          let eps_a: number;
          let smax = 0;
          if (mdl === 'none')
            eps_a = (kk.sigma_f_prime / kk.E) * twoN ** kk.b + kk.eps_f_prime * twoN ** kk.c;
          else if (mdl === 'morrow-elastic')
            eps_a = ((kk.sigma_f_prime - sm) / kk.E) * twoN ** kk.b + kk.eps_f_prime * twoN ** kk.c;
          else if (mdl === 'morrow-full')
            eps_a =
              ((kk.sigma_f_prime - sm) / kk.E) * twoN ** kk.b +
              kk.eps_f_prime * f ** (kk.c / kk.b) * twoN ** kk.c;
          else {
            smax = 0.2 * kk.sigma_f_prime + Math.abs(sm);
            const P =
              (kk.sigma_f_prime ** 2 / kk.E) * twoN ** (2 * kk.b) +
              kk.sigma_f_prime * kk.eps_f_prime * twoN ** (kk.b + kk.c);
            eps_a = P / smax;
          }
          const out = reversalsKernel(kk, mdl, { eps_a, sigma_m: sm, sigma_max: smax });
          expect(out.status).toBe('finite');
          expect(out.converged).toBe(true);
          expect(Math.abs(Math.log10(out.reversals) - u)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('a larger strain amplitude never gives a longer life', () => {
    fc.assert(
      fc.property(
        constants,
        model,
        fc.double({ min: 1e-4, max: 0.05, noNaN: true }),
        fc.double({ min: 1.0001, max: 3, noNaN: true }),
        (kk, mdl, e, f) => {
          const load = { sigma_m: 100e6, sigma_max: 400e6 };
          const a = reversalsKernel(kk, mdl, { eps_a: e, ...load });
          const b = reversalsKernel(kk, mdl, { eps_a: e * f, ...load });
          const life = (x: typeof a) => (x.status === 'beyond' ? Number.POSITIVE_INFINITY : x.reversals);
          expect(life(b)).toBeLessThanOrEqual(life(a));
        },
      ),
      { numRuns: 300 },
    );
  });
});
