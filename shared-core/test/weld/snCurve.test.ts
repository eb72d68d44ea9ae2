import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import {
  cutOffRange,
  enCurve,
  iiwCurve,
  kneeRange,
  type WeldLoading,
  type WeldSnCurve,
  weldLife,
  weldStrengthAtLife,
} from '../../src/weld';

/**
 * Constant-amplitude fatigue limit and cut-off of the EN 1993-1-9 detail categories, as tabulated
 * (rounded to 0.1 MPa) in Nussbaumer, Borges & Davaine, Fatigue Design of Steel and Composite
 * Structures, ECCS Eurocode Design Manual, 1st ed. 2011, in its table of the fatigue strength curves
 * (table number not recalled; values from memory); the same numbers follow from EN 1993-1-9 Eq. (7.2)
 * and the cut-off rule of Sec. 7.1.
 */
const EN_TABLE: Array<[number, number, number]> = [
  [160, 117.9, 64.8],
  [125, 92.1, 50.6],
  [90, 66.3, 36.4],
  [80, 58.9, 32.4],
  [71, 52.3, 28.7],
  [56, 41.3, 22.7],
  [36, 26.5, 14.6],
];

describe('EN 1993-1-9 curves (Sec. 7.1, Eqs. 7.1 to 7.3)', () => {
  for (const [c, d, l] of EN_TABLE) {
    it(`category ${c}: Delta sigma_D = ${d} MPa at 5e6, Delta sigma_L = ${l} MPa at 1e8 (ECCS design manual 2011, table of curve constants, from memory; rounding 0.05 MPa)`, () => {
      const { curve } = enCurve(c * MPA);
      expect(kneeRange(curve).value / MPA).toBeCloseTo(d, 1);
      expect(cutOffRange(curve).value / MPA).toBeCloseTo(l, 1);
      expect(Math.abs(kneeRange(curve).value / MPA - d)).toBeLessThanOrEqual(0.05 + 1e-9);
      expect(Math.abs(cutOffRange(curve).value / MPA - l)).toBeLessThanOrEqual(0.05 + 1e-9);
    });
  }

  it('ratios 0.737 and 0.549 (EN 1993-1-9 Eq. 7.2 and Fig. 7.1 annotations, 0.737 Delta sigma_C and 0.549 Delta sigma_D; from memory)', () => {
    const { curve } = enCurve(100 * MPA);
    expect(curve.deltaD / curve.deltaC).toBeCloseTo(0.737, 3);
    expect((curve.deltaL ?? 0) / curve.deltaD).toBeCloseTo(0.549, 3);
  });

  it('shear: Delta tau_L = 0.457 Delta tau_C at 1e8 (EN 1993-1-9 Fig. 7.2): categories 100 and 80 give 45.7 and 36.6 MPa', () => {
    expect(cutOffRange(enCurve(100 * MPA, 'shear').curve).value / MPA).toBeCloseTo(45.7, 1);
    expect(cutOffRange(enCurve(80 * MPA, 'shear').curve).value / MPA).toBeCloseTo(36.6, 1);
  });

  it('category 71 lives by hand from Eqs. 7.1 and 7.3: 100 MPa -> 2e6 (71/100)^3 = 715 822; 40 MPa variable -> 5e6 (52.33/40)^5; constant amplitude below Delta sigma_D and any range below Delta sigma_L: infinite', () => {
    const { curve } = enCurve(71 * MPA);
    expect(weldLife(curve, 100 * MPA, 'constant').value).toBeCloseTo(2e6 * 0.71 ** 3, 3);
    const dD = 71 * (2 / 5) ** (1 / 3);
    expect(weldLife(curve, 40 * MPA, 'variable').value).toBeCloseTo(5e6 * (dD / 40) ** 5, 0);
    expect(weldLife(curve, 40 * MPA, 'constant').infinite).toBe(true);
    expect(weldLife(curve, 25 * MPA, 'variable').infinite).toBe(true);
    expect(weldLife(curve, 25 * MPA, 'variable').notes?.[0].code).toBe('below-cut-off');
  });

  it('the branches meet: N(Delta sigma_D) = 5e6 on both, N(Delta sigma_L) = 1e8 (continuity of Fig. 7.1)', () => {
    const { curve } = enCurve(90 * MPA);
    expect(weldLife(curve, curve.deltaD, 'variable').value).toBeCloseTo(5e6, 0);
    expect(weldLife(curve, curve.deltaD * (1 - 1e-12), 'variable').value / 5e6).toBeCloseTo(1, 9);
    expect(weldLife(curve, curve.deltaL ?? 0, 'variable').value / 1e8).toBeCloseTo(1, 9);
    expect(weldStrengthAtLife(curve, 2e6, 'variable').value / MPA).toBeCloseTo(90, 9);
    expect(weldStrengthAtLife(curve, 1e9, 'variable').value).toBeCloseTo(curve.deltaL ?? 0, 6);
    expect(weldStrengthAtLife(curve, 1e9, 'constant').value).toBeCloseTo(curve.deltaD, 6);
  });

  it('a class that is not a stress range is an error with a finite value', () => {
    for (const bad of [0, -71e6, Number.NaN, Number.POSITIVE_INFINITY, 5e9]) {
      const r = enCurve(bad);
      expect(Number.isFinite(r.value)).toBe(true);
      expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
      expect(Number.isFinite(weldLife(r.curve, 100e6, 'variable').value)).toBe(true);
    }
  });
});

describe('IIW curves (Hobbacher 2016 Sec. 3.2; 2008 Sec. 3.2 and 4.3.1; from memory)', () => {
  it('FAT 90, normal stress: knee at 1e7, Delta sigma_D = 90 (2e6/1e7)^(1/3) = 52.63 MPa (hand computation from the published slope and knee)', () => {
    const { curve } = iiwCurve(90 * MPA, '2016');
    expect(curve.ND).toBe(1e7);
    expect(curve.deltaD / MPA).toBeCloseTo(90 * 0.2 ** (1 / 3), 9);
    expect(curve.deltaD / MPA).toBeCloseTo(52.63, 2);
  });

  it('2016: m = 22 beyond the knee, about 10 % per decade: FAT 90 at 1e8 = 52.63 * 0.1^(1/22) = 47.40 MPa', () => {
    const { curve } = iiwCurve(90 * MPA, '2016');
    const r = weldStrengthAtLife(curve, 1e8, 'constant').value / MPA;
    expect(r).toBeCloseTo(90 * 0.2 ** (1 / 3) * 0.1 ** (1 / 22), 9);
    expect(r / (curve.deltaD / MPA)).toBeCloseTo(0.9006, 4);
  });

  it('2008: no damage below the knee at constant amplitude, m2 = 5 below it at variable amplitude', () => {
    const { curve } = iiwCurve(80 * MPA, '2008');
    const s = 0.8 * curve.deltaD;
    expect(weldLife(curve, s, 'constant').infinite).toBe(true);
    expect(weldLife(curve, s, 'variable').value).toBeCloseTo(1e7 * (1 / 0.8) ** 5, 0);
  });

  it('shear FAT 80: m = 5, knee at 1e8, Delta tau_D = 80 (2e6/1e8)^(1/5) = 36.6 MPa', () => {
    const { curve } = iiwCurve(80 * MPA, '2016', { stress: 'shear' });
    expect(curve.m1).toBe(5);
    expect(curve.deltaD / MPA).toBeCloseTo(36.58, 2);
  });

  it('aluminium FAT 36 follows the same shape: life at 50 MPa = 2e6 (36/50)^3', () => {
    const { curve } = iiwCurve(36 * MPA, '2016', { material: 'aluminium' });
    expect(weldLife(curve, 50 * MPA, 'variable').value).toBeCloseTo(2e6 * 0.72 ** 3, 3);
  });

  it('the edition is stated: an unknown one is an error', () => {
    // @ts-expect-error deliberate bad edition
    const r = iiwCurve(90 * MPA, '1996');
    expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
  });
});

const curves = (): WeldSnCurve[] => [
  enCurve(71 * MPA).curve,
  enCurve(100 * MPA, 'shear').curve,
  iiwCurve(90 * MPA, '2016').curve,
  iiwCurve(90 * MPA, '2008').curve,
  iiwCurve(80 * MPA, '2008', { stress: 'shear' }).curve,
  iiwCurve(36 * MPA, '2016', { material: 'aluminium' }).curve,
];

const lifeOf = (c: WeldSnCurve, s: number, l: WeldLoading) => {
  const r = weldLife(c, s, l);
  return r.infinite ? Number.POSITIVE_INFINITY : r.value;
};

describe('properties', () => {
  it('life never increases with range, every curve and loading', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 5 }),
        fc.boolean(),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (i, ca, a, b) => {
          const c = curves()[i];
          const l: WeldLoading = ca ? 'constant' : 'variable';
          const [lo, hi] = a < b ? [a, b] : [b, a];
          expect(lifeOf(c, hi * MPA, l)).toBeLessThanOrEqual(lifeOf(c, lo * MPA, l));
        },
      ),
    );
  });

  it('range at a life and life at a range are inverse on the sloped branches', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5 }), fc.double({ min: 1e4, max: 9e7, noNaN: true }), (i, N) => {
        const c = curves()[i];
        const s = weldStrengthAtLife(c, N, 'variable').value;
        const back = weldLife(c, s, 'variable');
        if (!back.infinite) expect(back.value / N).toBeCloseTo(1, 8);
      }),
    );
  });

  it('never NaN or Infinity in a value, whatever the range', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5 }), fc.double(), fc.double(), (i, s, N) => {
        const c = curves()[i];
        for (const l of ['constant', 'variable'] as const) {
          expect(Number.isFinite(weldLife(c, s, l).value)).toBe(true);
          expect(Number.isFinite(weldStrengthAtLife(c, N, l).value)).toBe(true);
        }
      }),
    );
  });
});
