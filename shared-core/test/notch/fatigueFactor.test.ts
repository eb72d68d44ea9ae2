import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { fatigueNotchFactor, meanStressNotchFactor } from '../../src/notch/fatigueFactor';

describe('fatigueNotchFactor (Shigley Eq. 6-32)', () => {
  // Worked numbers from Budynas & Nisbett, Shigley's MED 8th ed., solutions manual.
  it('SM Problem 6-23, fillet: Kf = 1 + 0.82 (2.1 - 1) = 1.90', () => {
    expect(fatigueNotchFactor(2.1, 0.82, 'Kf').value).toBeCloseTo(1.9, 2);
  });
  it('SM Problem 6-23, hole: Kf = 1 + 0.85 (2.5 - 1) = 2.28', () => {
    expect(fatigueNotchFactor(2.5, 0.85, 'Kf').value).toBeCloseTo(2.28, 2);
  });
  it('SM Problem 7-2, groove: Kf = 1 + 0.90 (1.9 - 1) = 1.81, Kfs = 1 + 0.97 (1.5 - 1) = 1.485 (printed 1.49)', () => {
    expect(fatigueNotchFactor(1.9, 0.9, 'Kf').value).toBeCloseTo(1.81, 2);
    expect(fatigueNotchFactor(1.5, 0.97, 'Kfs').value).toBeCloseTo(1.485, 3);
  });
  it('SM Chapter 7 keyseat problem: Kf = 1 + 0.75 (2.2 - 1) = 1.9, Kfs = 1 + 0.9 (3.0 - 1) = 2.8', () => {
    expect(fatigueNotchFactor(2.2, 0.75, 'Kf').value).toBeCloseTo(1.9, 2);
    expect(fatigueNotchFactor(3.0, 0.9, 'Kfs').value).toBeCloseTo(2.8, 2);
  });

  it('formula text uses the contract symbols', () => {
    expect(fatigueNotchFactor(2, 0.8, 'Kfs').formula).toBe('Kfs = 1 + qs (Kts - 1)');
    expect(fatigueNotchFactor(2, 0.8, 'Kf_ax').formula).toBe('Kf_ax = 1 + q (Kt_ax - 1)');
  });

  it('q = 0 gives 1, q = 1 gives Kt; q outside [0, 1] is clamped with a note; Kt < 1 is an error', () => {
    expect(fatigueNotchFactor(2.7, 0, 'Kf').value).toBe(1);
    expect(fatigueNotchFactor(2.7, 1, 'Kf').value).toBeCloseTo(2.7, 15);
    const hi = fatigueNotchFactor(2.7, 1.3, 'Kf');
    expect(hi.value).toBeCloseTo(2.7, 15);
    expect(hi.notes?.[0]?.code).toBe('invalid-input');
    const lowKt = fatigueNotchFactor(0.5, 0.8, 'Kf');
    expect(lowKt.value).toBe(1);
    expect(lowKt.notes?.[0]?.severity).toBe('error');
    expect(Number.isFinite(fatigueNotchFactor(Number.NaN, 0.5, 'Kf').value)).toBe(true);
  });
});

describe('meanStressNotchFactor (Dowling nominal mean stress method, Shigley Sec. 6-12; statement from memory)', () => {
  const Sy = 300 * MPA;
  it("'full' returns Kf", () => {
    expect(
      meanStressNotchFactor({ Kf: 2, sigma_a: 100 * MPA, sigma_m: 100 * MPA, Sy, mode: 'full' }).value,
    ).toBe(2);
  });
  it('Kf |sigma_max| < Sy: Kfm = Kf', () => {
    expect(
      meanStressNotchFactor({ Kf: 2, sigma_a: 50 * MPA, sigma_m: 50 * MPA, Sy, mode: 'local-yield' }).value,
    ).toBe(2);
  });
  it('Kf |sigma_max| > Sy: Kfm = (Sy - Kf sigma_a)/|sigma_m| = (300 - 200)/100 = 1.0', () => {
    const r = meanStressNotchFactor({
      Kf: 2,
      sigma_a: 100 * MPA,
      sigma_m: 100 * MPA,
      Sy,
      mode: 'local-yield',
    });
    expect(r.value).toBeCloseTo(1.0, 12);
  });
  it('compressive mean uses |sigma_m|', () => {
    const r = meanStressNotchFactor({
      Kf: 2,
      sigma_a: 100 * MPA,
      sigma_m: -100 * MPA,
      Sy,
      mode: 'local-yield',
    });
    expect(r.value).toBeCloseTo(1.0, 12);
  });
  it('Kf |sigma_max - sigma_min| > 2 Sy: Kfm = 0', () => {
    expect(
      meanStressNotchFactor({ Kf: 2, sigma_a: 200 * MPA, sigma_m: 10 * MPA, Sy, mode: 'local-yield' }).value,
    ).toBe(0);
  });
  it('sigma_m = 0: Kfm = Kf, no division by zero', () => {
    const r = meanStressNotchFactor({ Kf: 2.2, sigma_a: 500 * MPA, sigma_m: 0, Sy, mode: 'local-yield' });
    expect(r.value).toBe(2.2);
  });
  it('continuous at Kf |sigma_max| = Sy and in [0, Kf] throughout', () => {
    const Kf = 1.8;
    const sa = 60 * MPA;
    const smEdge = Sy / Kf - sa;
    const below = meanStressNotchFactor({
      Kf,
      sigma_a: sa,
      sigma_m: smEdge * (1 - 1e-9),
      Sy,
      mode: 'local-yield',
    });
    const above = meanStressNotchFactor({
      Kf,
      sigma_a: sa,
      sigma_m: smEdge * (1 + 1e-9),
      Sy,
      mode: 'local-yield',
    });
    expect(above.value).toBeCloseTo(below.value, 6);
    for (let sm = 1 * MPA; sm < 1000 * MPA; sm *= 1.3) {
      for (let s = 1 * MPA; s < 400 * MPA; s *= 1.4) {
        const v = meanStressNotchFactor({ Kf, sigma_a: s, sigma_m: sm, Sy, mode: 'local-yield' }).value;
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(Kf + 1e-12);
      }
    }
  });
  it('invalid Sy: Kfm = Kf with an error note', () => {
    const r = meanStressNotchFactor({ Kf: 2, sigma_a: 1, sigma_m: 1, Sy: 0, mode: 'local-yield' });
    expect(r.value).toBe(2);
    expect(r.notes?.[0]?.severity).toBe('error');
  });
});
