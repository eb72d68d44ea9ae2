/**
 * Notch-root stress and strain by Neuber's rule (Neuber, J. Appl. Mech. 28 (1961); ranges:
 * Topper, Wetzel & Morrow, J. Materials 4 (1969)) and Glinka's equivalent strain energy density
 * (Glinka, Eng. Fract. Mech. 22 (1985)): the intersection with the cyclic curve found by an
 * independent bisection in the test, the energy equality checked by numerical integration.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial } from '../../src/materials';
import {
  type CyclicCurve,
  cyclicYieldKernel,
  firstLoadingKernel,
  type NotchInput,
  notchRootFirstLoading,
  notchRootReversal,
  reversalKernel,
} from '../../src/strainlife';
import {
  bisect,
  type Curve,
  energyNumeric,
  masingEnergyNumeric,
  masingStrain,
  neuberPoint,
  neuberRange,
  roStrain,
} from './independent';

// RQC-100 from the library: Dowling, Mechanical Behavior of Materials, 4th ed., Table 9.1
// (683 / 758 MPa, looked up) and Table 14.1 (K' = 903 MPa, n' = 0.0905, E = 200 GPa; from memory).
const rqc = findMaterial('rqc-100')!;
const curve: CyclicCurve = { E: rqc.cyclic!.E, K_prime: rqc.cyclic!.K_prime, n_prime: rqc.cyclic!.n_prime };
const ref: Curve = { E: curve.E, K: curve.K_prime, n: curve.n_prime };
const Kt = 2.5;
const neuber: NotchInput = { curve, rule: 'neuber', K: Kt, factor: 'Kt', Sy: rqc.Sy };
const glinka: NotchInput = { ...neuber, rule: 'glinka' };

// Nominal stresses from tiny to just below general yield of the net section (Sy = 683 MPa).
const loads = [1e-3, 1, 50, 150, 250, 350, 450, 550, 650].map((s) => s * MPA);

describe("Neuber's rule: sigma eps = (Kt S)^2/E on the cyclic curve", () => {
  it('meets the hyperbola where an independent bisection in the test finds it, from 1e-3 MPa to near yield', () => {
    for (const S of loads) {
      const r = notchRootFirstLoading(neuber, S);
      const p = neuberPoint(ref, Kt * S);
      expect(r.sigma / p.sigma).toBeCloseTo(1, 10);
      expect(r.eps / p.eps).toBeCloseTo(1, 9);
      expect(r.value).toBe(r.sigma);
      // On the hyperbola and on the curve.
      expect((r.sigma * r.eps) / ((Kt * S) ** 2 / curve.E)).toBeCloseTo(1, 10);
      expect(r.eps / roStrain(ref, r.sigma)).toBeCloseTo(1, 12);
      expect(r.notes?.some((n) => n.severity === 'error')).toBeFalsy();
    }
  });

  it('is elastic for a tiny load (sigma = Kt S) and yields for a large one (sigma < Kt S, eps > Kt S / E)', () => {
    const tiny = notchRootFirstLoading(neuber, 1e-3 * MPA);
    expect(tiny.sigma / (Kt * 1e-3 * MPA)).toBeCloseTo(1, 12);
    const big = notchRootFirstLoading(neuber, 500 * MPA);
    expect(big.sigma).toBeLessThan(Kt * 500 * MPA);
    expect(big.eps).toBeGreaterThan((Kt * 500 * MPA) / curve.E);
  });

  it('stays exact at loads near underflow (sigma = Kt S at 1e-250 Pa) and finite far beyond fracture (1e13 Pa)', () => {
    for (const rule of ['neuber', 'glinka'] as const) {
      expect(firstLoadingKernel(curve, rule, 1e-250).sigma / 1e-250).toBeCloseTo(1, 12);
      const big = firstLoadingKernel(curve, rule, 1e13);
      expect(Number.isFinite(big.sigma) && Number.isFinite(big.eps) && big.sigma > 0).toBe(true);
      expect(reversalKernel(curve, rule, 1e-250).dSigma / 1e-250).toBeCloseTo(1, 12);
    }
  });

  it('is odd in S: a compressive first loading mirrors the tensile one', () => {
    const t = firstLoadingKernel(curve, 'neuber', 900 * MPA);
    const c = firstLoadingKernel(curve, 'neuber', -900 * MPA);
    expect(c.sigma).toBeCloseTo(-t.sigma, 4);
    expect(c.eps).toBeCloseTo(-t.eps, 14);
  });

  it('on ranges: Delta sigma Delta eps = (Kt Delta S)^2/E with the Masing curve, solved directly on the doubled curve in the test', () => {
    for (const dS of [1, 100, 400, 800, 1300].map((s) => s * MPA)) {
      const r = notchRootReversal(neuber, dS);
      const p = neuberRange(ref, Kt * dS);
      expect(r.dSigma / p.dSigma).toBeCloseTo(1, 10);
      expect(r.dEps / p.dEps).toBeCloseTo(1, 9);
      expect(r.dEps / masingStrain(ref, r.dSigma)).toBeCloseTo(1, 12);
    }
  });
});

describe("Glinka's rule: the energy under the curve equals (Kt S)^2/(2E)", () => {
  it('first loading: Simpson integration of sigma d eps in the test up to the root meets the elastic energy', () => {
    for (const S of loads.slice(1)) {
      const r = notchRootFirstLoading(glinka, S);
      const W = energyNumeric(ref, r.sigma);
      expect(W / ((Kt * S) ** 2 / (2 * curve.E))).toBeCloseTo(1, 6);
      expect(r.eps / roStrain(ref, r.sigma)).toBeCloseTo(1, 12);
    }
  });

  it('reversals: the energy under the Masing branch meets (Kt Delta S)^2/(2E)', () => {
    for (const dS of [100, 600, 1300].map((s) => s * MPA)) {
      const r = notchRootReversal(glinka, dS);
      expect(masingEnergyNumeric(ref, r.dSigma) / ((Kt * dS) ** 2 / (2 * curve.E))).toBeCloseTo(1, 6);
    }
  });

  it("gives less local strain than Neuber's rule once the root yields (Ye, Matsuoka, Suzuki & Maeda, Int. J. Fatigue 26 (2004) 447-455: Neuber's rule is the energy method without dissipation, so it overestimates the strain)", () => {
    for (const S of [300, 450, 600].map((s) => s * MPA)) {
      const g = notchRootFirstLoading(glinka, S);
      const n = notchRootFirstLoading(neuber, S);
      expect(g.eps).toBeLessThan(n.eps);
      expect(g.sigma).toBeLessThan(n.sigma);
    }
  });
});

describe('diagnostics', () => {
  it('general yielding: S above Sy is an error (Neuber does not apply); below, none', () => {
    const over = notchRootFirstLoading(neuber, 1.05 * rqc.Sy);
    expect(over.notes?.some((n) => n.code === 'general-yield' && n.severity === 'error')).toBe(true);
    const under = notchRootFirstLoading(neuber, 0.95 * rqc.Sy);
    expect(under.notes?.some((n) => n.code === 'general-yield')).toBe(false);
  });

  it("without Sy, the cyclic yield strength K' 0.002^n' is the limit, and the message names it", () => {
    const Syc = cyclicYieldKernel(curve);
    const r = notchRootFirstLoading({ ...neuber, Sy: undefined }, 1.01 * Syc);
    const note = r.notes?.find((n) => n.code === 'general-yield');
    expect(note?.message).toMatch(/cyclic yield strength/);
  });

  it("reversed general yielding: a nominal range above 2 S'y is an error", () => {
    const Syc = cyclicYieldKernel(curve);
    expect(notchRootReversal(neuber, 2.05 * Syc).notes?.some((n) => n.code === 'general-yield')).toBe(true);
    expect(notchRootReversal(neuber, 1.95 * Syc).notes?.some((n) => n.code === 'general-yield')).toBe(false);
  });

  it('says which factor is used: the elastic Kt, or Kf in its place', () => {
    expect(
      notchRootFirstLoading(neuber, 100 * MPA).notes?.find((n) => n.code === 'notch-factor')?.message,
    ).toMatch(/elastic stress concentration factor Kt = 2\.5/);
    const kf = notchRootFirstLoading({ ...neuber, K: 2.1, factor: 'Kf' }, 100 * MPA);
    expect(kf.notes?.find((n) => n.code === 'notch-factor')?.message).toMatch(/Kf = 2\.1 in place of Kt/);
  });

  it('bad input gives an error and a finite 0: NaN stress, K < 1, bad curve', () => {
    for (const r of [
      notchRootFirstLoading(neuber, Number.NaN),
      notchRootFirstLoading({ ...neuber, K: 0.5 }, 100 * MPA),
      notchRootFirstLoading({ ...neuber, curve: { ...curve, n_prime: -0.1 } }, 100 * MPA),
      notchRootReversal(neuber, -5 * MPA),
    ]) {
      expect(r.value).toBe(0);
      expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
    }
    expect(notchRootFirstLoading(neuber, 0).value).toBe(0);
  });
});

describe('properties (fast-check)', () => {
  const material = fc.record({
    E: fc.double({ min: 68e9, max: 210e9, noNaN: true }),
    K: fc.double({ min: 400e6, max: 2500e6, noNaN: true }),
    n: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
  });
  it('both rules land on their equation for any metal in the published range and elastic notch stresses from 1e-4 MPa to 5 GPa', () => {
    fc.assert(
      fc.property(material, fc.double({ min: -4, max: Math.log10(5000), noNaN: true }), ({ E, K, n }, le) => {
        const c = { E, K_prime: K, n_prime: n };
        const e = 10 ** le * MPA;
        const N = firstLoadingKernel(c, 'neuber', e);
        expect((N.sigma * N.eps) / ((e * e) / E)).toBeCloseTo(1, 9);
        const G = firstLoadingKernel(c, 'glinka', e);
        const W = G.sigma ** 2 / (2 * E) + (G.sigma / (1 + n)) * (G.sigma / K) ** (1 / n);
        expect(W / ((e * e) / (2 * E))).toBeCloseTo(1, 9);
        expect(G.eps).toBeLessThanOrEqual(N.eps * (1 + 1e-12));
        const R = reversalKernel(c, 'neuber', 2 * e);
        expect((R.dSigma * R.dEps) / ((4 * e * e) / E)).toBeCloseTo(1, 9);
      }),
      { numRuns: 300 },
    );
  });

  it('the test bisection and the core agree on a random Neuber point', () => {
    fc.assert(
      fc.property(material, fc.double({ min: 1, max: 3000, noNaN: true }), ({ E, K, n }, eMPa) => {
        const e = eMPa * MPA;
        const core = firstLoadingKernel({ E, K_prime: K, n_prime: n }, 'neuber', e);
        const target = (e * e) / E;
        const s = bisect((x) => x * roStrain({ E, K, n }, x) - target, 0, e);
        expect(core.sigma / s).toBeCloseTo(1, 9);
      }),
      { numRuns: 200 },
    );
  });
});
