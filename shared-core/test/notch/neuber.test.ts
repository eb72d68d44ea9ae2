import { describe, expect, it } from 'vitest';
import { INCH, KSI, MPA } from '../../src/computed';
import { fatigueNotchFactor } from '../../src/notch/fatigueFactor';
import { neuberConstant, neuberSensitivity } from '../../src/notch/neuber';

const MM = 1e-3;
const sqrtAIn = (SutKsi: number, load: 'normal' | 'shear') =>
  neuberConstant(SutKsi * KSI, load).terms?.find((t) => t.unit === 'in^0.5')?.value ?? Number.NaN;

describe('neuberConstant', () => {
  it("agrees within 0.001 sqrt(in) with the six-digit Eq. (6-35) of Shigley's MED 9th ed. (0.245799 - 0.307794e-2 Sut + 0.150874e-4 Sut^2 - 0.266978e-7 Sut^3, as printed in the statement of Shigley Example 6-6 on holooly.com)", () => {
    for (let s = 50; s <= 250; s += 10) {
      const ninth = 0.245799 - 0.307794e-2 * s + 0.150874e-4 * s * s - 0.266978e-7 * s ** 3;
      expect(Math.abs(sqrtAIn(s, 'normal') - ninth)).toBeLessThan(1e-3);
    }
  });

  it('Shigley 10th ed. Example 6-6, Sut = 690 MPa (100 kpsi): sqrt(a) = 0.0622 sqrt(in) (value from memory)', () => {
    const r = neuberConstant(690 * MPA, 'normal');
    expect(r.terms?.find((t) => t.unit === 'in^0.5')?.value).toBeCloseTo(0.0622, 3);
  });

  it('units: SI value in sqrt(m); sqrt(mm) and sqrt(in) terms are exact conversions', () => {
    const r = neuberConstant(100 * KSI, 'normal');
    const inch = r.terms?.find((t) => t.unit === 'in^0.5')?.value ?? 0;
    const mm = r.terms?.find((t) => t.unit === 'mm^0.5')?.value ?? 0;
    expect(r.value).toBeCloseTo(inch * Math.sqrt(INCH), 15);
    expect(mm).toBeCloseTo(inch * Math.sqrt(25.4), 12);
  });

  it('torsion constant below bending constant in the fit range (Shigley Eqs. 6-35a/b): steels are more notch sensitive in shear', () => {
    for (let s = 50; s <= 230; s += 20) expect(sqrtAIn(s, 'shear')).toBeLessThan(sqrtAIn(s, 'normal'));
  });

  it('outside 50..250 kpsi: clamped with a fit-range note; torsion fit floored at 0 near 250 kpsi', () => {
    const low = neuberConstant(30 * KSI, 'normal');
    expect(low.notes?.some((n) => n.code === 'fit-range')).toBe(true);
    expect(low.value).toBeCloseTo(neuberConstant(50 * KSI, 'normal').value, 15);
    const high = neuberConstant(300 * KSI, 'shear');
    expect(high.value).toBe(0);
    expect(high.notes?.some((n) => n.code === 'fit-range')).toBe(true);
    const bad = neuberConstant(-1, 'normal');
    expect(bad.value).toBe(0);
    expect(bad.notes?.[0]?.severity).toBe('error');
  });
});

describe('neuberSensitivity', () => {
  // Budynas & Nisbett, Shigley's MED 8th ed., solutions manual Problem 6-23: Sut = 64 kpsi,
  // q read from Fig. 6-20 (chart precision about +-0.03).
  it('Shigley SM Problem 6-23: Sut = 64 kpsi, r = 0.25 in: q = 0.82 (Fig. 6-20), +-0.03', () => {
    expect(Math.abs(neuberSensitivity(0.25 * INCH, 64 * KSI, 'normal').value - 0.82)).toBeLessThan(0.03);
  });
  it('Shigley SM Problem 6-23: Sut = 64 kpsi, r = 0.375 in: q = 0.85 (Fig. 6-20), +-0.03', () => {
    expect(Math.abs(neuberSensitivity(0.375 * INCH, 64 * KSI, 'normal').value - 0.85)).toBeLessThan(0.03);
  });
  it('Shigley SM Problem 7-2: Sut = 1226 MPa, r = 1.69 mm: q = 0.90 (Fig. 6-20), +-0.03', () => {
    expect(Math.abs(neuberSensitivity(1.69 * MM, 1226 * MPA, 'normal').value - 0.9)).toBeLessThan(0.03);
  });
  it('Shigley SM Problem 7-2: Sut = 1226 MPa, r = 1.69 mm: qs = 0.97 (Fig. 6-21), +-0.05 (chart read at its top curve)', () => {
    expect(Math.abs(neuberSensitivity(1.69 * MM, 1226 * MPA, 'shear').value - 0.97)).toBeLessThan(0.05);
  });

  it('Shigley 10th ed. Example 6-6: Sut = 690 MPa, r = 3 mm, Kt = 1.65 -> Kf = 1.55 (from memory)', () => {
    const q = neuberSensitivity(3 * MM, 690 * MPA, 'normal').value;
    expect(fatigueNotchFactor(1.65, q, 'Kf').value).toBeCloseTo(1.55, 2);
  });

  it('q in [0, 1] and increasing with the notch radius', () => {
    for (const load of ['normal', 'shear'] as const) {
      for (const s of [60, 100, 150, 200]) {
        let prev = 0;
        for (let r = 0.01 * MM; r < 20 * MM; r *= 1.5) {
          const q = neuberSensitivity(r, s * KSI, load).value;
          expect(q).toBeGreaterThanOrEqual(0);
          expect(q).toBeLessThanOrEqual(1);
          expect(q).toBeGreaterThan(prev);
          prev = q;
        }
      }
    }
  });

  it('r <= 0: q = 1 with an error note', () => {
    const r = neuberSensitivity(0, 100 * KSI, 'normal');
    expect(r.value).toBe(1);
    expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
  });
});
