/**
 * Continuity of the piecewise fits at each of their range boundaries: the left and right
 * limits (the fit at b(1 - 1e-12) and b(1 + 1e-12)) agree to a stated tolerance, or, for a
 * published equation left as published, differ by exactly its published step.
 */
import { describe, expect, it } from 'vitest';
import { MM } from '../../src/computed';
import { fatigueStrengthFraction } from '../../src/endurance/strengthFraction';
import { sizeFactorRound } from '../../src/marin/size';
import { crossHoleKt } from '../../src/notch/crossHole';
import { JOIN } from '../../src/notch/fitJoin';
import { grooveKt } from '../../src/notch/groove';
import { shoulderFilletKt } from '../../src/notch/shoulderFillet';

const EPS = 1e-12;
/** Left and right limits agree to this (relative), well below any chart's reading accuracy. */
const CONTINUOUS = 1e-9;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const LOADS = ['bending', 'axial', 'torsion'] as const;
const RATIOS = [1.02, 1.1, 1.2, 1.5, 2, 3];

/** Kt of a fit of h/r at D/d (d = 1), r from h/r. */
function limits(fn: typeof shoulderFilletKt, load: (typeof LOADS)[number], Dd: number, hr: number) {
  const h = (Dd - 1) / 2;
  return {
    left: fn(load, Dd, 1, h / (hr * (1 - EPS))).value,
    right: fn(load, Dd, 1, h / (hr * (1 + EPS))).value,
  };
}

/**
 * The published pieces of Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed.,
 * Chart 3.10 (bending of a stepped round bar), typed here from the chart's curve-fit equation:
 * Kt = C1 + C2 t + C3 t^2 + C4 t^3, t = 2h/D, Ci = k0 + k1 sqrt(h/r) + k2 h/r.
 */
const CHART_3_10 = {
  lower: [
    [0.947, 1.206, -0.131],
    [0.022, -3.405, 0.915],
    [0.869, 1.777, -0.555],
    [-0.81, 0.422, -0.26],
  ],
  upper: [
    [1.232, 0.832, -0.008],
    [-3.813, 0.968, -0.26],
    [7.423, -4.868, 0.869],
    [-3.839, 3.07, -0.6],
  ],
};
function chart310(piece: 'lower' | 'upper', Dd: number, hr: number): number {
  const t = (Dd - 1) / Dd;
  const c = CHART_3_10[piece].map(([k0, k1, k2]) => k0 + k1 * Math.sqrt(hr) + k2 * hr);
  return c[0] + c[1] * t + c[2] * t * t + c[3] * t * t * t;
}

describe('shoulder fillet (Pilkey, Peterson SCF 3rd ed., Charts 3.4 tension, 3.10 bending, 3.12 torsion)', () => {
  it('continuous at the h/r = 2 boundary between the two published ranges (tension, bending)', () => {
    for (const load of ['bending', 'axial'] as const)
      for (const Dd of RATIOS) {
        const { left, right } = limits(shoulderFilletKt, load, Dd, 2);
        expect(rel(left, right), `${load} D/d = ${Dd}`).toBeLessThan(CONTINUOUS);
      }
  });

  it('bending: at h/r = 2 the larger of the two published pieces; never below the piece of the range that holds h/r; as published beyond 5 % of the boundary', () => {
    for (const Dd of RATIOS) {
      const h = (Dd - 1) / 2;
      const kt = (hr: number) => shoulderFilletKt('bending', Dd, 1, h / hr).value;
      const atB = Math.max(chart310('lower', Dd, 2), chart310('upper', Dd, 2));
      expect(rel(kt(2), atB)).toBeLessThan(1e-12);
      for (let hr = 1.7; hr <= 2.4; hr += 0.01) {
        const piece = chart310(hr <= 2 ? 'lower' : 'upper', Dd, hr);
        expect(kt(hr), `D/d = ${Dd}, h/r = ${hr}`).toBeGreaterThanOrEqual(piece * (1 - 1e-12));
        if (hr < 2 / JOIN || hr > 2 * JOIN) expect(rel(kt(hr), piece)).toBeLessThan(1e-12);
      }
    }
  });

  it('continuous at the ends of the fit range (clamped below, held above): h/r = 0.1 and 20 (tension, bending), 0.25 and 4 (torsion)', () => {
    for (const load of LOADS)
      for (const hr of load === 'torsion' ? [0.25, 4] : [0.1, 20])
        for (const Dd of RATIOS) {
          const { left, right } = limits(shoulderFilletKt, load, Dd, hr);
          expect(rel(left, right), `${load} D/d = ${Dd} h/r = ${hr}`).toBeLessThan(CONTINUOUS);
        }
  });
});

describe("U-groove (Roark's Formulas for Stress and Strain, 7th/8th ed., Table 17.1)", () => {
  it('continuous at h/r = 0.25, 2 (the two published ranges) and 50, all loads', () => {
    for (const load of LOADS)
      for (const hr of [0.25, 2, 50])
        for (const Dd of RATIOS) {
          const { left, right } = limits(grooveKt, load, Dd, hr);
          expect(rel(left, right), `${load} D/d = ${Dd} h/r = ${hr}`).toBeLessThan(CONTINUOUS);
        }
  });

  it('torsion: at h/r = 2 the larger published piece (here the lower range, so the upper one is lifted); never below the piece of the range that holds h/r; as published beyond 5 %', () => {
    // Roark Table 17.1, U-notch in a circular shaft, torsion, typed here from the table.
    const TABLE = {
      lower: [
        [1.245, 0.264, 0.491],
        [-3.03, 3.269, -3.633],
        [7.199, -11.286, 8.318],
        [-4.414, 7.753, -5.176],
      ],
      upper: [
        [1.651, 0.614, 0.04],
        [-4.794, -0.314, -0.217],
        [8.457, -0.962, 0.389],
        [-4.314, 0.662, -0.212],
      ],
    };
    const roark = (piece: 'lower' | 'upper', Dd: number, hr: number) => {
      const t = (Dd - 1) / Dd;
      const c = TABLE[piece].map(([k0, k1, k2]) => k0 + k1 * Math.sqrt(hr) + k2 * hr);
      return c[0] + c[1] * t + c[2] * t * t + c[3] * t * t * t;
    };
    for (const Dd of RATIOS) {
      const h = (Dd - 1) / 2;
      const kt = (hr: number) => grooveKt('torsion', Dd, 1, h / hr).value;
      expect(roark('lower', Dd, 2)).toBeGreaterThan(roark('upper', Dd, 2));
      expect(rel(kt(2), roark('lower', Dd, 2))).toBeLessThan(1e-12);
      for (let hr = 1.7; hr <= 2.4; hr += 0.01) {
        const piece = roark(hr <= 2 ? 'lower' : 'upper', Dd, hr);
        expect(kt(hr), `D/d = ${Dd}, h/r = ${hr}`).toBeGreaterThanOrEqual(piece * (1 - 1e-12));
        if (hr < 2 / JOIN || hr > 2 * JOIN) expect(rel(kt(hr), piece)).toBeLessThan(1e-12);
      }
    }
  });
});

describe('cross hole (Pilkey, Peterson SCF 3rd ed., Sec. 4, gross-section fits)', () => {
  it('continuous at d_hole/d = 0.4, where the cubic is held (bending, torsion)', () => {
    for (const load of ['bending', 'torsion'] as const) {
      const left = crossHoleKt(load, 1, 0.4 * (1 - EPS)).value;
      const right = crossHoleKt(load, 1, 0.4 * (1 + EPS)).value;
      expect(rel(left, right), load).toBeLessThan(CONTINUOUS);
    }
  });
});

describe("published equations left as published (Budynas & Nisbett, Shigley's MED 9th ed.)", () => {
  const kb = (d: number, unitSystem: 'SI' | 'US') =>
    sizeFactorRound(d, { rotation: 'rotating', load: 'bending', unitSystem }).value;

  it('Eq. 6-20 steps at 51 mm by its published step: 1.24 (51)^-0.107 to 1.51 (51)^-0.157 (+0.041 %)', () => {
    const left = kb(51 * MM * (1 - EPS), 'SI');
    const right = kb(51 * MM * (1 + EPS), 'SI');
    expect(rel(left, 1.24 * 51 ** -0.107)).toBeLessThan(CONTINUOUS);
    expect(rel(right, 1.51 * 51 ** -0.157)).toBeLessThan(CONTINUOUS);
    expect(rel(right, left)).toBeGreaterThan(4e-4);
    expect(rel(right, left)).toBeLessThan(4.2e-4);
  });

  it('Eq. 6-20, inch form, steps at 2 in by 2.3e-6: 0.879 (2)^-0.107 to 0.91 (2)^-0.157', () => {
    const left = kb(2 * 0.0254 * (1 - EPS), 'US');
    const right = kb(2 * 0.0254 * (1 + EPS), 'US');
    expect(rel(left, 0.879 * 2 ** -0.107)).toBeLessThan(CONTINUOUS);
    expect(rel(right, 0.91 * 2 ** -0.157)).toBeLessThan(CONTINUOUS);
    expect(rel(right, left)).toBeLessThan(3e-6);
  });

  it('Eq. 6-20 is held continuously at its upper end, 254 mm', () => {
    expect(rel(kb(254 * MM * (1 - EPS), 'SI'), kb(254 * MM * (1 + EPS), 'SI'))).toBeLessThan(CONTINUOUS);
  });

  it('Fig. 6-18: f = 0.9 below 70 kpsi (9th ed., p. 285), the fit 1.06 - 2.8e-3 Sut + 6.9e-6 Sut^2 = 0.8978 at 70 kpsi: a published step of 0.24 %; continuous at 200 kpsi', () => {
    const KSI = 6.894757293168361e6;
    const f = (s: number) => fatigueStrengthFraction(s * KSI).value;
    expect(f(70 * (1 - EPS))).toBe(0.9);
    expect(rel(f(70 * (1 + EPS)), 1.06 - 2.8e-3 * 70 + 6.9e-6 * 4900)).toBeLessThan(CONTINUOUS);
    expect(rel(f(200 * (1 - EPS)), f(200 * (1 + EPS)))).toBeLessThan(CONTINUOUS);
  });
});
