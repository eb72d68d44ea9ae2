import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MM, MPA } from '../../src/computed';
import {
  HOT_SPOT_SCHEMES,
  type HotSpotScheme,
  hotSpotClass,
  hotSpotStress,
  notchStressClass,
} from '../../src/weld';

/** Independent computation: the Lagrange polynomial through the points, evaluated at the toe (x = 0). */
function lagrangeAtZero(xs: number[], ys: number[]): number {
  let sum = 0;
  for (let i = 0; i < xs.length; i++) {
    let w = 1;
    for (let j = 0; j < xs.length; j++) if (j !== i) w *= (0 - xs[j]) / (xs[i] - xs[j]);
    sum += w * ys[i];
  }
  return sum;
}

describe('hot-spot extrapolation (Hobbacher 2016 Sec. 2.2.3; the published coefficients)', () => {
  it('type a linear, 0.4t / 1.0t: 1.67 * 200 - 0.67 * 150 = 233.5 MPa (hand computation)', () => {
    expect(hotSpotStress('a-linear', [200 * MPA, 150 * MPA], 20 * MM).value / MPA).toBeCloseTo(233.5, 10);
  });

  it('type a quadratic, 0.4t / 0.9t / 1.4t: 2.52, -2.24, 0.72 equal the exact Lagrange weights; result = Lagrange extrapolation of the same points', () => {
    const ys = [210 * MPA, 170 * MPA, 150 * MPA];
    const t = 16 * MM;
    const ref = lagrangeAtZero([0.4 * t, 0.9 * t, 1.4 * t], ys);
    expect(hotSpotStress('a-quadratic', ys, t).value / ref).toBeCloseTo(1, 12);
  });

  it('type b quadratic, 4 / 8 / 12 mm: 3, -3, 1 are the exact Lagrange weights', () => {
    const ys = [180 * MPA, 140 * MPA, 125 * MPA];
    expect(hotSpotStress('b-quadratic', ys).value / lagrangeAtZero([4, 8, 12], ys)).toBeCloseTo(1, 12);
    expect(hotSpotStress('b-quadratic', ys).value / MPA).toBeCloseTo(3 * 180 - 3 * 140 + 125, 10);
  });

  it('type b linear 5 / 15 mm and type a coarse 0.5t / 1.5t: 1.5 / -0.5, exact linear extrapolation', () => {
    const ys = [160 * MPA, 120 * MPA];
    expect(hotSpotStress('b-linear', ys).value / lagrangeAtZero([5, 15], ys)).toBeCloseTo(1, 12);
    expect(hotSpotStress('a-coarse', ys, 10 * MM).value / lagrangeAtZero([5, 15], ys)).toBeCloseTo(1, 12);
  });

  it('type a linear: the rounded 1.67 / 0.67 differ from the exact 5/3, 2/3 by 0.0033 (sigma1 - sigma2), on the safe side for falling stress', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 400, noNaN: true }),
        fc.double({ min: 0, max: 400, noNaN: true }),
        (a, b) => {
          const ys = [a * MPA, b * MPA];
          const exact = lagrangeAtZero([0.4, 1.0], ys);
          const got = hotSpotStress('a-linear', ys, 10 * MM).value;
          // A stress rising away from the toe: the first point's stress is taken (never less).
          if (b > a && got === ys[0]) return;
          expect(Math.abs(got - exact)).toBeLessThanOrEqual(0.0034 * Math.abs(ys[0] - ys[1]) + 1e-6);
          if (a >= b) expect(got).toBeGreaterThanOrEqual(exact - 1e-6);
        },
      ),
    );
  });

  it('every scheme reproduces a linear surface stress exactly at the toe (1.67/0.67 within 0.2 % of the gradient term)', () => {
    const A = 100 * MPA;
    const B = -4 * MPA; // per mm: the stress falls away from the toe, as at a weld toe
    const t = 20;
    for (const [name, def] of Object.entries(HOT_SPOT_SCHEMES)) {
      const xs = def.positions.map((p) => (def.relative ? p * t : p));
      const ys = xs.map((x) => A + B * x);
      const got = hotSpotStress(name as HotSpotScheme, ys, t * MM).value;
      expect(Math.abs(got - A)).toBeLessThanOrEqual(0.0021 * Math.abs(B) * t + 1e-6);
    }
  });

  it('a stress rising away from the toe is flagged and never lowers the hot spot below the first point; wrong count of points is an error', () => {
    const rising = hotSpotStress('a-linear', [100 * MPA, 150 * MPA], 10 * MM);
    expect(rising.notes?.[0].code).toBe('hot-spot-gradient');
    // 1.67 x 100 - 0.67 x 150 = 66.5 MPa would be below the 100 MPa read nearest the toe.
    expect(rising.value).toBe(100 * MPA);
    const bad = hotSpotStress('a-quadratic', [100 * MPA, 90 * MPA], 10 * MM);
    expect(bad.notes?.[0].severity).toBe('error');
    expect(bad.value).toBe(0);
  });
});

describe('hot-spot and notch-stress classes (IIW 2016 Table 3.3-1 and Sec. 3.4; Fricke IIW XIII-2240r2-08; from memory)', () => {
  it('hot spot FAT 100 / 90 steel, 40 / 36 aluminium', () => {
    expect(hotSpotClass('non-load-carrying', 'steel').value / MPA).toBe(100);
    expect(hotSpotClass('load-carrying', 'steel').value / MPA).toBe(90);
    expect(hotSpotClass('non-load-carrying', 'aluminium').value / MPA).toBe(40);
    expect(hotSpotClass('load-carrying', 'aluminium').value / MPA).toBe(36);
  });

  it('notch r = 1 mm: FAT 225 principal / 200 von Mises steel, 71 / 63 aluminium', () => {
    expect(notchStressClass('steel', 'principal').value / MPA).toBe(225);
    expect(notchStressClass('steel', 'von-mises').value / MPA).toBe(200);
    expect(notchStressClass('aluminium', 'principal').value / MPA).toBe(71);
    expect(notchStressClass('aluminium', 'von-mises').value / MPA).toBe(63);
  });
});
