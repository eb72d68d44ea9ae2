import { describe, expect, it } from 'vitest';
import { shoulderFilletKt } from '../../src/notch/shoulderFillet';

const MM = 1e-3;
/** Kt at D/d and r/d with d = 1 m (the fits depend on ratios only). */
const kt = (load: 'bending' | 'torsion' | 'axial', Dd: number, rd: number) =>
  shoulderFilletKt(load, Dd, 1, rd).value;
const rel = (x: number, ref: number) => Math.abs(x - ref) / ref;

describe('shoulderFilletKt: chart points', () => {
  it('bending, Shigley 10th ed. Example 6-6 (D = 38, d = 32, r = 3 mm; Kt = 1.65 read from Fig. A-15-9, value from memory), chart precision +-0.05', () => {
    const r = shoulderFilletKt('bending', 38 * MM, 32 * MM, 3 * MM);
    expect(Math.abs(r.value - 1.65)).toBeLessThan(0.05);
    expect(r.notes ?? []).toHaveLength(0);
  });

  // Norton, Machine Design: An Integrated Approach, 2nd ed. (Prentice-Hall 2000), Appendix E,
  // Figs. E-1 (axial), E-2 (bending), E-3 (torsion): Kt ~= A (r/d)^b, an independent fit of the
  // same Peterson charts. Two digitisations of one chart: tolerance 5 %.
  const norton: Array<['axial' | 'bending' | 'torsion', number, number, number, number]> = [
    // load, D/d, A, b, r/d
    ['axial', 1.5, 0.99957, -0.28221, 0.05],
    ['axial', 1.5, 0.99957, -0.28221, 0.1],
    ['axial', 1.5, 0.99957, -0.28221, 0.2],
    ['axial', 1.2, 0.96272, -0.25527, 0.1],
    ['axial', 2.0, 1.0147, -0.30035, 0.15],
    ['bending', 1.5, 0.93836, -0.25759, 0.1],
    ['bending', 2.0, 0.90879, -0.28598, 0.1],
    ['bending', 2.0, 0.90879, -0.28598, 0.2],
    ['bending', 3.0, 0.89334, -0.3086, 0.15],
    ['torsion', 1.2, 0.83425, -0.21649, 0.05],
    ['torsion', 1.2, 0.83425, -0.21649, 0.1],
    ['torsion', 1.2, 0.83425, -0.21649, 0.2],
    ['torsion', 1.33, 0.84897, -0.23161, 0.1],
    ['torsion', 2.0, 0.86331, -0.23865, 0.1],
  ];
  for (const [load, Dd, A, b, rd] of norton) {
    it(`${load}, D/d = ${Dd}, r/d = ${rd}: within 5 % of Norton 2nd ed. Fig. E (A = ${A}, b = ${b})`, () => {
      expect(rel(kt(load, Dd, rd), A * rd ** b)).toBeLessThan(0.05);
    });
  }

  // Gere, Mechanics of Materials, Fig. 3-48 (stepped shaft in torsion, full quarter-circular
  // fillet R = (D2 - D1)/2), values read in the solutions of Problems 3.11-3 and 3.11-5:
  // (D1, D2, K). Chart read to about +-0.03: tolerance 4 %.
  const gere: Array<[number, number, number]> = [
    [0.7, 1.0, 1.2],
    [0.8, 1.0, 1.29],
    [0.9, 1.0, 1.41],
    [1.3, 1.5, 1.38],
    [1.4, 1.5, 1.46],
  ];
  for (const [D1, D2, K] of gere) {
    it(`torsion, D2/D1 = ${(D2 / D1).toFixed(3)}, quarter-circle fillet: Gere Fig. 3-48 K = ${K}`, () => {
      const r = shoulderFilletKt('torsion', D2, D1, (D2 - D1) / 2);
      expect(rel(r.value, K)).toBeLessThan(0.04);
    });
  }
});

describe('shoulderFilletKt: properties', () => {
  it('the two published h/r ranges meet at h/r = 2 within 2 % (Pilkey Charts 3.4, 3.10)', () => {
    for (const load of ['axial', 'bending'] as const) {
      for (const Dd of [1.1, 1.5, 2, 3]) {
        const h = (Dd - 1) / 2;
        const below = shoulderFilletKt(load, Dd, 1, h / 1.999999).value;
        const above = shoulderFilletKt(load, Dd, 1, h / 2.000001).value;
        expect(rel(above, below)).toBeLessThan(0.02);
      }
    }
  });

  it('Kt >= 1 and Kt falls as the fillet radius grows (fixed D, d), all loads', () => {
    for (const load of ['axial', 'bending', 'torsion'] as const) {
      for (const Dd of [1.02, 1.2, 1.5, 2, 3]) {
        let prev = Number.POSITIVE_INFINITY;
        for (let rd = 0.005; rd <= 0.5; rd *= 1.25) {
          const v = kt(load, Dd, rd);
          expect(v).toBeGreaterThanOrEqual(1);
          expect(Number.isFinite(v)).toBe(true);
          expect(v).toBeLessThanOrEqual(prev + 1e-12);
          prev = v;
        }
      }
    }
  });

  it('bending above torsion for the same geometry (Peterson charts, Shigley Figs. A-15-8/9)', () => {
    for (const [Dd, rd] of [
      [1.2, 0.05],
      [1.5, 0.1],
      [2, 0.1],
    ]) {
      expect(kt('bending', Dd, rd)).toBeGreaterThan(kt('torsion', Dd, rd));
    }
  });

  it('outside the h/r range: still an answer, with a fit-range note', () => {
    const sharp = shoulderFilletKt('torsion', 2, 1, 0.02); // h/r = 25 > 4
    expect(sharp.notes?.some((n) => n.code === 'fit-range')).toBe(true);
    // never below the value at the range limit (h/r = 4 -> r = 0.125)
    expect(sharp.value).toBeGreaterThanOrEqual(shoulderFilletKt('torsion', 2, 1, 0.125).value - 1e-12);
    const blunt = shoulderFilletKt('bending', 1.01, 1, 0.5); // h/r = 0.01 < 0.1
    expect(blunt.notes?.some((n) => n.code === 'fit-range')).toBe(true);
    expect(blunt.value).toBeGreaterThanOrEqual(1);
  });

  it('degenerate geometry gives Kt = 1 with an error note, never NaN', () => {
    for (const [D, d, r] of [
      [1, 1, 0.1],
      [0.9, 1, 0.1],
      [1.2, 1, 0],
      [1.2, 1, -0.1],
      [Number.NaN, 1, 0.1],
      [1.2, 0, 0.1],
    ]) {
      const res = shoulderFilletKt('bending', D, d, r);
      expect(res.value).toBe(1);
      expect(res.notes?.[0]?.severity).toBe('error');
    }
  });
});
