/**
 * The strain-life check of a notch end to end: nominal loading -> Neuber (or Glinka) on the cyclic
 * and Masing curves -> loops -> life per loop -> Palmgren-Miner (Miner, J. Appl. Mech. 12 (1945)).
 * Every number is recomputed in the test by an independent chain (bisection for the notch root
 * and for the life, equations written here).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial } from '../../src/materials';
import {
  constantAmplitudeStrainLife,
  historyStrainLife,
  type MeanStressModel,
  type NotchStrainLifeInput,
  type StrainLifeMaterial,
  spectrumStrainLife,
} from '../../src/strainlife';
import { type Curve, cmb, type Life, lifeByBisection, neuberPoint, neuberRange } from './independent';

// AISI 4340 (aircraft quality), all seven constants from the library: sigma_f', b from Dowling,
// Mechanical Behavior of Materials, 4th ed., Table 9.1 (looked up); E, eps_f', c, K', n' from
// Table 14.1 (from memory). Sy = 1103 MPa (Table 9.1).
const lib = findMaterial('aisi-4340-aircraft')!;
const material: StrainLifeMaterial = { ...lib.cyclic! };
const ref: Curve = { E: material.E, K: material.K_prime, n: material.n_prime };
const L: Life = {
  E: material.E,
  sf: material.sigma_f_prime,
  b: material.b,
  ef: material.eps_f_prime,
  c: material.c,
};
const Kt = 3;
const base: NotchStrainLifeInput = {
  material,
  rule: 'neuber',
  K: Kt,
  factor: 'Kt',
  model: 'swt',
  Sy: lib.Sy,
};

/** Independent chain for constant amplitude S_max, S_min (largest absolute first). */
function byHand(Smax: number, Smin: number, model: MeanStressModel) {
  const peak = Math.abs(Smin) > Math.abs(Smax) ? Smin : Smax;
  const p = neuberPoint(ref, Kt * peak);
  const r = neuberRange(ref, Kt * (Smax - Smin));
  const other = peak === Smax ? p.sigma - r.dSigma : p.sigma + r.dSigma;
  const sigma_max = Math.max(p.sigma, other);
  const sigma_m = (p.sigma + other) / 2;
  const eps_a = r.dEps / 2;
  const { E, sf, b, ef, c } = L;
  let twoN: number;
  if (model === 'swt')
    twoN = lifeByBisection((n) => (sf * sf * n ** (2 * b)) / E + sf * ef * n ** (b + c), sigma_max * eps_a);
  else if (model === 'morrow-elastic')
    twoN = lifeByBisection((n) => ((sf - sigma_m) / E) * n ** b + ef * n ** c, eps_a);
  else if (model === 'morrow-full')
    twoN = lifeByBisection(
      (n) => ((sf - sigma_m) / E) * n ** b + ef * ((sf - sigma_m) / sf) ** (c / b) * n ** c,
      eps_a,
    );
  else twoN = lifeByBisection((n) => cmb(L, n), eps_a);
  return { eps_a, sigma_max, sigma_m, N: twoN / 2 };
}

describe('constant amplitude at a notch', () => {
  for (const model of ['none', 'morrow-elastic', 'morrow-full', 'swt'] as MeanStressModel[]) {
    it(`R = 0 and R = -1, ${model}: eps_a, sigma_max, sigma_m and N_f as the independent chain in the test`, () => {
      for (const [Smax, Smin] of [
        [500, 0],
        [400, -400],
        [700, 100],
      ]) {
        const r = constantAmplitudeStrainLife(Smax * MPA, Smin * MPA, { ...base, model });
        const h = byHand(Smax * MPA, Smin * MPA, model);
        expect(r.eps_a.value / h.eps_a).toBeCloseTo(1, 9);
        expect(r.sigma_max.value / MPA).toBeCloseTo(h.sigma_max / MPA, 5);
        expect(r.sigma_m.value / MPA).toBeCloseTo(h.sigma_m / MPA, 5);
        expect(r.N_f.value / h.N).toBeCloseTo(1, 7);
        expect(r.repeats.value).toBeCloseTo(r.N_f.value, 3);
        expect(r.D.value * r.N_f.value).toBeCloseTo(1, 9);
      }
    });
  }

  it('an R = 0 notch loop has a tensile local mean that is smaller than the elastic Kt S_m (the root yields and relaxes the mean)', () => {
    const r = constantAmplitudeStrainLife(600 * MPA, 0, base);
    expect(r.sigma_m.value).toBeGreaterThan(0);
    expect(r.sigma_m.value).toBeLessThan(Kt * 300 * MPA);
  });

  it('shows the transition life and the path point by point in the derivation', () => {
    const r = constantAmplitudeStrainLife(500 * MPA, 0, base);
    expect(r.transition.value).toBeCloseTo(
      ((material.eps_f_prime * material.E) / material.sigma_f_prime) ** (1 / (material.b - material.c)),
      6,
    );
    expect(r.steps.length).toBe(3);
    expect(r.steps[1]).toMatch(/Masing branch from point 1/);
    expect(r.eps_a.terms?.some((t) => t.name === 'sigma_1')).toBe(true);
    expect(r.eps_a.source).toMatch(/ASTM E1049/);
    expect(r.N_f.source).toMatch(/Smith, Watson & Topper/);
  });

  it("Glinka's rule gives a longer life than Neuber's at the same load (smaller local strain)", () => {
    const n = constantAmplitudeStrainLife(600 * MPA, -200 * MPA, base);
    const g = constantAmplitudeStrainLife(600 * MPA, -200 * MPA, { ...base, rule: 'glinka' });
    expect(g.eps_a.value).toBeLessThan(n.eps_a.value);
    expect(g.N_f.value).toBeGreaterThan(n.N_f.value);
  });

  it('a static load: no cycles, infinite life; general yield: an error on every result', () => {
    const s = constantAmplitudeStrainLife(300 * MPA, 300 * MPA, base);
    expect(s.N_f.infinite).toBe(true);
    expect(s.notes.some((n) => n.code === 'no-stress-range')).toBe(true);
    const y = constantAmplitudeStrainLife(1150 * MPA, 0, base);
    expect(y.notes.some((n) => n.code === 'general-yield' && n.severity === 'error')).toBe(true);
    expect(y.N_f.notes?.some((n) => n.code === 'general-yield')).toBe(true);
  });
});

describe('variable amplitude: history, repeats, spectrum', () => {
  const history = [0, 600, -200, 400, 100, 500, -300, 0].map((x) => x * MPA);

  it("D per block is the sum of 1/N_f of the closed loops (each by the test's bisection on the SWT equation)", () => {
    const r = historyStrainLife(history, { ...base, repeats: 1 });
    const { E, sf, b, ef, c } = L;
    let D = 0;
    for (const l of r.loops) {
      const twoN = lifeByBisection(
        (n) => (sf * sf * n ** (2 * b)) / E + sf * ef * n ** (b + c),
        l.sigma_max * l.eps_a,
      );
      D += 1 / (twoN / 2);
    }
    expect(r.D.value / D).toBeCloseTo(1, 7);
    expect(r.repeats.value * D).toBeCloseTo(1, 7);
    expect(r.N_f.value / (r.loops.length / D)).toBeCloseTo(1, 7);
    // The governing loop is the most damaging one.
    const g = r.loops[r.governing];
    for (const l of r.loops) expect(l.damage).toBeLessThanOrEqual(g.damage);
    expect(r.eps_a.value).toBe(g.eps_a);
  });

  it('repeats multiply the damage; the repeats to failure do not change', () => {
    const one = historyStrainLife(history, base);
    const many = historyStrainLife(history, { ...base, repeats: 250 });
    expect(many.D.value / one.D.value).toBeCloseTo(250, 9);
    expect(many.repeats.value).toBeCloseTo(one.repeats.value, 6);
  });

  it('a spectrum whose envelope no single level spans counts the envelope cycle (independent hand check)', () => {
    // Levels 250/-50 and 100/-200 MPa, once each per block: the repeated block 250, -50, 100,
    // -200 holds by rainflow (ASTM E1049-85 (2017) 5.4.4, memory of Masing loops) one cycle
    // -50 -> 100 and one 250 -> -200; hanging each level from the envelope counted two 300 MPa
    // loops and never the 450 MPa one (4.1 times the life, found by a hand check of the docs).
    const levels = [
      { S_max: 250 * MPA, S_min: -50 * MPA, count: 1 },
      { S_max: 100 * MPA, S_min: -200 * MPA, count: 1 },
    ];
    const r = spectrumStrainLife(levels, base);
    expect(r.loops.map((l) => Math.round(l.dS / MPA))).toEqual([450, 150]);
    const h = historyStrainLife(
      [250, -50, 100, -200].map((x) => x * MPA),
      base,
    );
    expect(r.D.value / h.D.value).toBeCloseTo(1, 9);
  });

  it('a spectrum level counts n times', () => {
    const levels = [
      { S_max: 600 * MPA, S_min: -200 * MPA, count: 1 },
      { S_max: 300 * MPA, S_min: 0, count: 1000 },
    ];
    const r = spectrumStrainLife(levels, base);
    expect(r.loops.map((l) => l.count)).toEqual([1, 1000]);
    expect(r.D.value).toBeCloseTo(r.loops[0].damage + r.loops[1].damage, 15);
    expect(r.loops[1].damage).toBeCloseTo(1000 / (r.loops[1].reversals / 2), 12);
  });

  it('SWT: a history that stays compressive at the notch does no damage (infinite repeats), with the note', () => {
    const r = historyStrainLife(
      [-100, -300, -100].map((x) => x * MPA),
      { ...base, K: 1.5 },
    );
    expect(r.loops.length).toBe(1);
    expect(r.loops[0].sigma_max).toBeLessThan(0);
    expect(r.D.value).toBe(0);
    expect(r.repeats.infinite).toBe(true);
    expect(r.notes.some((n) => n.code === 'swt-no-tension')).toBe(true);
  });

  it('bad input: errors, finite numbers, no throw', () => {
    for (const r of [
      historyStrainLife([Number.NaN, Number.NaN], base),
      historyStrainLife(history, { ...base, K: Number.NaN }),
      historyStrainLife(history, { ...base, material: { ...material, c: 0.2 } }),
      historyStrainLife(history, { ...base, repeats: -3 }),
    ]) {
      expect(r.notes.some((n) => n.severity === 'error')).toBe(true);
      for (const v of [r.eps_a, r.sigma_max, r.sigma_m, r.N_f, r.D, r.repeats, r.transition])
        expect(Number.isFinite(v.value)).toBe(true);
    }
  });
});

describe('properties (fast-check)', () => {
  // Metals in the published range (Dowling Table 14.1 ranges, from memory), cyclic curve by compatibility.
  const metal = fc
    .record({
      E: fc.double({ min: 68e9, max: 210e9, noNaN: true }),
      sigma_f_prime: fc.double({ min: 600e6, max: 2500e6, noNaN: true }),
      b: fc.double({ min: -0.15, max: -0.05, noNaN: true }),
      eps_f_prime: fc.double({ min: 0.1, max: 2.5, noNaN: true }),
      c: fc.double({ min: -0.9, max: -0.4, noNaN: true }),
    })
    .map((k) => {
      const n = k.b / k.c;
      return { ...k, n_prime: n, K_prime: k.sigma_f_prime / k.eps_f_prime ** n };
    });
  const model = fc.constantFrom<MeanStressModel>('none', 'morrow-elastic', 'morrow-full', 'swt');
  const R = fc.constantFrom(-1, 0, 0.3);

  it('life never increases when the nominal load range increases (fixed R, any model, either rule)', () => {
    fc.assert(
      fc.property(
        metal,
        model,
        R,
        fc.constantFrom<'neuber' | 'glinka'>('neuber', 'glinka'),
        fc.double({ min: 0.02, max: 0.9, noNaN: true }),
        fc.double({ min: 1.001, max: 1.5, noNaN: true }),
        (mat, mdl, ratio, rule, f, grow) => {
          const input: NotchStrainLifeInput = { material: mat, rule, K: 2.5, factor: 'Kt', model: mdl };
          const Sy = mat.K_prime * 0.002 ** mat.n_prime;
          const S1 = f * Sy;
          const S2 = Math.min(S1 * grow, Sy);
          const a = constantAmplitudeStrainLife(S1, ratio * S1, input);
          const b = constantAmplitudeStrainLife(S2, ratio * S2, input);
          const life = (r: typeof a) => (r.N_f.infinite ? Number.POSITIVE_INFINITY : r.N_f.value);
          expect(life(b)).toBeLessThanOrEqual(life(a) * (1 + 1e-9));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('never NaN or Infinity for any history and any constants (even absurd ones)', () => {
    const num = fc.oneof(fc.double({ noNaN: false }), fc.constant(0), fc.constant(-1));
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -2e9, max: 2e9, noNaN: false }), { maxLength: 30 }),
        fc.tuple(num, num, num, num),
        model,
        (h, [K, n, sf, Kp], mdl) => {
          const mat = { ...material, n_prime: n, sigma_f_prime: sf, K_prime: Kp };
          const r = historyStrainLife(h, { ...base, K, material: mat, model: mdl });
          for (const v of [r.eps_a, r.sigma_max, r.sigma_m, r.N_f, r.D, r.repeats, r.transition])
            expect(Number.isFinite(v.value)).toBe(true);
          for (const p of r.path.points)
            expect(Number.isFinite(p.sigma) && Number.isFinite(p.eps)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });
});
