import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { RainflowCounter, rainflow } from '../../src/rainflow';
import {
  blocksToLimit,
  constantAmplitudeSafetyFactor,
  cyclesToLimit,
  enCurve,
  equivalentRange,
  iiwCurve,
  permissibleDamage,
  rangeSafetyFactor,
  WeldDamageAccumulator,
  weldDamage,
} from '../../src/weld';

/** A crane-girder-like spectrum (invented levels) on EN 1993-1-9 category 71. */
const SPECTRUM = [
  { range: 120 * MPA, count: 1e4 },
  { range: 60 * MPA, count: 2e5 },
  { range: 40 * MPA, count: 1e6 },
  { range: 20 * MPA, count: 1e7 },
];

/**
 * Independent hand sum from EN 1993-1-9 Eqs. (7.1) to (7.3) written out here, not through the core:
 * N = 2e6 (71/S)^3 above Delta sigma_D = 0.7368 * 71, N = 5e6 (Delta sigma_D / S)^5 down to
 * Delta sigma_L = 0.5493 Delta sigma_D, nothing below.
 */
function enHandSum(levels: Array<{ range: number; count: number }>, C: number, scale = 1): number {
  const D = (2 / 5) ** (1 / 3) * C;
  const L = (5 / 100) ** (1 / 5) * D;
  let sum = 0;
  for (const { range, count } of levels) {
    const s = (range / MPA) * scale;
    if (s >= D) sum += count / (2e6 * (C / s) ** 3);
    else if (s >= L) sum += count / (5e6 * (D / s) ** 5);
  }
  return sum;
}

describe('variable-amplitude damage on EN 1993-1-9 curves (Annex A Eq. A.1; Sec. 7.1)', () => {
  it('category 71 spectrum: the core equals the hand sum (about 0.137); the 20 MPa level is below the cut-off', () => {
    const { curve } = enCurve(71 * MPA);
    const r = weldDamage(curve, SPECTRUM);
    const hand = enHandSum(SPECTRUM, 71);
    expect(r.D).toBeCloseTo(hand, 12);
    expect(hand).toBeCloseTo(0.1367, 3);
    expect(r.notes?.map((n) => n.code)).toContain('below-cut-off');
    expect(r.damagingCycles).toBe(1e4 + 2e5 + 1e6);
    expect(r.contributors[0].share).toBeGreaterThan(0);
  });

  it('partial factors: D(gamma_Ff = 1.1, gamma_Mf = 1.35) = D of the ranges times 1.485 on the characteristic curve (the curve scales as a whole)', () => {
    const { curve } = enCurve(71 * MPA);
    const r = weldDamage(curve, SPECTRUM, { gammaFf: 1.1, gammaMf: 1.35 });
    expect(r.D).toBeCloseTo(enHandSum(SPECTRUM, 71, 1.1 * 1.35), 12);
  });

  it('equivalent range at 2e6: Delta sigma_E,2 = 71 D^(1/3) (about 36.6 MPa); utilisation against 71 is D^(1/3)', () => {
    const { curve } = enCurve(71 * MPA);
    const D = weldDamage(curve, SPECTRUM).D;
    const e = equivalentRange(D, curve);
    expect(e.value / MPA).toBeCloseTo(71 * D ** (1 / 3), 10);
    expect(e.value / MPA).toBeCloseTo(36.6, 1);
  });

  it('a single range is constant amplitude: below Delta sigma_D no damage; several ranges are variable amplitude whatever is asked', () => {
    const { curve } = enCurve(71 * MPA);
    expect(weldDamage(curve, [{ range: 45 * MPA, count: 1e7 }], { loading: 'constant' }).D).toBe(0);
    const mixed = weldDamage(curve, SPECTRUM, { loading: 'constant' });
    expect(mixed.loading).toBe('variable');
    expect(mixed.notes?.map((n) => n.code)).toContain('variable-amplitude');
  });

  it('the accumulator takes the rainflow counter output directly (onCycle), the same damage as the counted cycles', () => {
    const history = [0, 150, 20, 120, -30, 100, 10, 140, 0].map((x) => x * MPA);
    const { curve } = enCurve(56 * MPA);
    const acc = new WeldDamageAccumulator(curve);
    const counter = new RainflowCounter({ onCycle: acc.onCycle });
    counter.pushMany(history);
    counter.finish();
    const cycles = rainflow(history).cycles ?? [];
    expect(cycles.length).toBeGreaterThan(2);
    expect(acc.result().D).toBeCloseTo(weldDamage(curve, cycles).D, 14);
    expect(acc.result().D).toBeCloseTo(enHandSum(cycles, 56), 12);
  });

  it('bad records are ignored with a warning; an unusable curve is an error', () => {
    const { curve } = enCurve(71 * MPA);
    const r = weldDamage(curve, [...SPECTRUM, { range: Number.NaN, count: 1 }, { range: 1e8, count: -1 }]);
    expect(r.D).toBeCloseTo(enHandSum(SPECTRUM, 71), 12);
    expect(r.notes?.find((n) => n.code === 'input-invalid')?.severity).toBe('warning');
    const bad = weldDamage(enCurve(-1).curve, SPECTRUM);
    expect(bad.D).toBe(0);
    expect(bad.notes?.some((n) => n.severity === 'error')).toBe(true);
  });
});

describe('IIW variable amplitude (Hobbacher 2016 Sec. 4.3.1; 2008 Sec. 4.3.1; from memory)', () => {
  it('below the knee 2008 uses m2 = 5 and 2016 m = 22: the same spectrum does far less damage under 2016', () => {
    const below = [{ range: 40 * MPA, count: 5e7 }]; // FAT 90 knee: 52.6 MPa
    const d08 = weldDamage(iiwCurve(90 * MPA, '2008').curve, below).D;
    const d16 = weldDamage(iiwCurve(90 * MPA, '2016').curve, below).D;
    const kD = 90 * 0.2 ** (1 / 3);
    expect(d08).toBeCloseTo(5e7 / (1e7 * (kD / 40) ** 5), 10);
    expect(d16).toBeCloseTo(5e7 / (1e7 * (kD / 40) ** 22), 10);
    expect(d16).toBeLessThan(d08);
  });

  it('permissible damage: IIW 0.5, 0.2 non-proportional, EN 1.0, each defaulted with a warning; stated values win', () => {
    expect(permissibleDamage('IIW').value).toBe(0.5);
    expect(permissibleDamage('IIW', { proportional: false }).value).toBe(0.2);
    expect(permissibleDamage('EN 1993-1-9').value).toBe(1);
    expect(permissibleDamage('IIW').notes?.[0].code).toBe('defaulted-damage-sum');
    expect(permissibleDamage('IIW', { stated: 0.3 }).value).toBe(0.3);
    expect(permissibleDamage('IIW', { stated: 0.8 }).notes?.[0].code).toBe('damage-sum-above-recommended');
    expect(permissibleDamage('EN 1993-1-9', { stated: 1.5 }).notes?.[0].severity).toBe('error');
  });
});

describe('life and safety factor on stress range', () => {
  it('blocks and cycles to the limit: D = 0.25 per block, D_allow = 0.5 -> 2 blocks, 2 * 1.2e6 cycles; D = 0: infinite', () => {
    expect(blocksToLimit(0.25, 0.5).value).toBe(2);
    expect(cyclesToLimit(0.25, 1.2e6, 0.5).value).toBe(2.4e6);
    expect(blocksToLimit(0, 0.5).infinite).toBe(true);
  });

  it('constant amplitude: the bisection equals the closed form Delta sigma_R(N) / Delta sigma (EN 1993-1-9 Eq. 7.1)', () => {
    const { curve } = enCurve(80 * MPA);
    const s = rangeSafetyFactor(curve, [{ range: 70 * MPA, count: 1e6 }], 1, { loading: 'constant' });
    const closed = constantAmplitudeSafetyFactor(curve, 70 * MPA, 1e6);
    expect(closed.value).toBeCloseTo((80 / 70) * 2 ** (1 / 3), 10);
    expect(s.value / closed.value).toBeCloseTo(1, 9);
  });

  it('constant amplitude past the knee: the factor is the fatigue limit over the range (damage jumps there)', () => {
    const { curve } = enCurve(80 * MPA);
    const s = rangeSafetyFactor(curve, [{ range: 40 * MPA, count: 1e8 }], 1, { loading: 'constant' });
    expect(s.value / (curve.deltaD / (40 * MPA))).toBeCloseTo(1, 9);
    expect(
      weldDamage(curve, [{ range: 40 * MPA * s.value, count: 1e8 }], { loading: 'constant' }).D,
    ).toBeLessThanOrEqual(1);
  });

  it('a spectrum on the m = 3 branch: s = (D_allow / D)^(1/3)', () => {
    const { curve } = iiwCurve(71 * MPA, '2016');
    const levels = [
      { range: 150 * MPA, count: 2e4 },
      { range: 100 * MPA, count: 1e5 },
    ];
    const D = weldDamage(curve, levels).D;
    const s = rangeSafetyFactor(curve, levels, 0.5);
    expect(s.value).toBeCloseTo((0.5 / D) ** (1 / 3), 8);
  });

  it('no damage at any factor: infinite', () => {
    const { curve } = enCurve(80 * MPA);
    expect(rangeSafetyFactor(curve, [{ range: 0, count: 1e6 }], 1).infinite).toBe(true);
  });
});

describe('properties', () => {
  const level = fc.record({
    range: fc.double({ min: 5, max: 400, noNaN: true }).map((x) => x * MPA),
    count: fc.double({ min: 1, max: 1e7, noNaN: true }),
  });

  it('the equivalent range reproduces the damage: 2e6 cycles of Delta sigma_E,2 do D (when Delta sigma_E,2 is at or above the knee)', () => {
    fc.assert(
      fc.property(
        fc.array(level, { minLength: 1, maxLength: 8 }),
        fc.constantFrom(36, 71, 112),
        (levels, C) => {
          for (const curve of [
            enCurve(C * MPA).curve,
            iiwCurve(C * MPA, '2016').curve,
            iiwCurve(C * MPA, '2008').curve,
          ]) {
            const D = weldDamage(curve, levels).D;
            const e = equivalentRange(D, curve).value;
            if (e >= curve.deltaD)
              expect(weldDamage(curve, [{ range: e, count: 2e6 }]).D / D).toBeCloseTo(1, 9);
            expect(Number.isFinite(e)).toBe(true);
          }
        },
      ),
    );
  });

  it('damage never falls when every range grows', () => {
    fc.assert(
      fc.property(
        fc.array(level, { minLength: 1, maxLength: 6 }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        (levels, k) => {
          for (const curve of [enCurve(71 * MPA).curve, iiwCurve(71 * MPA, '2016').curve]) {
            const d1 = weldDamage(curve, levels).D;
            const d2 = weldDamage(
              curve,
              levels.map((l) => ({ range: l.range * k, count: l.count })),
            ).D;
            expect(d2).toBeGreaterThanOrEqual(d1 * (1 - 1e-12));
          }
        },
      ),
    );
  });
});
