import { describe, expect, it } from 'vitest';
import { grooveKt } from '../../src/notch/groove';

const rel = (x: number, ref: number) => Math.abs(x - ref) / ref;

describe('grooveKt: chart tables', () => {
  // Carvill, Mechanical Engineer's Data Handbook (Butterworth-Heinemann 1993), Sec. 1.3,
  // p. 22, "Bending of grooved shaft (values of K)", K = sigma_max/(32M/(pi d^3)).
  // Table from older Peterson charts; tolerance 7 %.
  const bending: Array<[number, number, number]> = [
    [1.1, 0.1, 1.89],
    [1.1, 0.15, 1.69],
    [1.1, 0.2, 1.56],
    [1.2, 0.06, 2.36],
    [1.2, 0.1, 1.98],
    [1.2, 0.15, 1.75],
    [1.3, 0.04, 2.96],
    [1.3, 0.1, 2.02],
  ];
  for (const [Dd, rd, K] of bending) {
    it(`bending D/d = ${Dd}, r/d = ${rd}: Carvill K = ${K} within 7 %`, () => {
      expect(rel(grooveKt('bending', Dd, 1, rd).value, K)).toBeLessThan(0.07);
    });
  }

  // Carvill, same page, "Torsion of grooved shaft (values of K)", K = tau_max/(16T/(pi d^3)).
  // Tolerance 5 %.
  const torsion: Array<[number, number, number]> = [
    [1.05, 0.04, 1.65],
    [1.1, 0.06, 1.63],
    [1.2, 0.04, 1.94],
    [1.2, 0.1, 1.51],
    [1.2, 0.2, 1.32],
    [1.3, 0.06, 1.76],
    [1.3, 0.1, 1.54],
    [2.0, 0.1, 1.57],
  ];
  for (const [Dd, rd, K] of torsion) {
    it(`torsion D/d = ${Dd}, r/d = ${rd}: Carvill K = ${K} within 5 %`, () => {
      expect(rel(grooveKt('torsion', Dd, 1, rd).value, K)).toBeLessThan(0.05);
    });
  }

  it('axial and bending, shallow semicircular groove (h = r, h/D -> 0): Kt -> 3.065, the semicircular edge notch in a semi-infinite body (Pilkey, Peterson SCF 3rd ed., Chart 2.2 equation Kt = 0.855 + 2.21 sqrt(t/r), as quoted in public code; 3 % tolerance)', () => {
    const D = 1;
    const h = 1e-4;
    for (const load of ['axial', 'bending'] as const) {
      expect(rel(grooveKt(load, D, D - 2 * h, h).value, 3.065)).toBeLessThan(0.03);
    }
  });
});

describe('grooveKt: properties', () => {
  it('Kt >= 1, finite, and falls as the groove radius grows at fixed D, d', () => {
    for (const load of ['axial', 'bending', 'torsion'] as const) {
      for (const Dd of [1.02, 1.1, 1.5, 2]) {
        let prev = Number.POSITIVE_INFINITY;
        for (let rd = 0.002; rd <= 0.6; rd *= 1.2) {
          const v = grooveKt(load, Dd, 1, rd).value;
          expect(Number.isFinite(v)).toBe(true);
          expect(v).toBeGreaterThanOrEqual(1);
          expect(v).toBeLessThanOrEqual(prev + 1e-12);
          prev = v;
        }
      }
    }
  });

  it('a groove concentrates more than a shoulder fillet of the same D/d, r/d in bending (Peterson; Shigley Figs. A-15-9 vs A-15-14)', async () => {
    const { shoulderFilletKt } = await import('../../src/notch/shoulderFillet');
    for (const [Dd, rd] of [
      [1.1, 0.05],
      [1.2, 0.1],
      [1.5, 0.1],
    ]) {
      expect(grooveKt('bending', Dd, 1, rd).value).toBeGreaterThan(
        shoulderFilletKt('bending', Dd, 1, rd).value,
      );
    }
  });

  it('out of range and degenerate inputs', () => {
    expect(grooveKt('torsion', 1.5, 1, 0.001).notes?.some((n) => n.code === 'fit-range')).toBe(true); // h/r = 250
    expect(grooveKt('axial', 1.01, 1, 0.5).notes?.some((n) => n.code === 'fit-range')).toBe(true); // h/r = 0.01
    const bad = grooveKt('bending', 1, 1.2, 0.1);
    expect(bad.value).toBe(1);
    expect(bad.notes?.[0]?.severity).toBe('error');
  });
});
