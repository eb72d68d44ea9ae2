import { describe, expect, it } from 'vitest';
import { plateHoleKt } from '../../src/notch/plateHole';

describe('plateHoleKt (net section)', () => {
  it('d/W -> 0: Kt -> 3.0, Kirsch (1898) exact value for an infinite plate', () => {
    expect(plateHoleKt(1, 1e-6).value).toBeCloseTo(3.0, 5);
  });

  it('d/W -> 1: Kt -> 2.0, the limit of Heywood Ktn = 2 + (1 - d/W)^3 (Heywood 1952, as quoted in Pilkey, Peterson SCF 3rd ed., Sec. 4)', () => {
    expect(plateHoleKt(1, 0.999999).value).toBeCloseTo(2.0, 4);
  });

  it('Shigley 8th ed. solutions manual, Problem 6-23: Fig. A-15-1 at d/w = 0.20 gives Kt = 2.5 (chart precision +-0.05)', () => {
    expect(Math.abs(plateHoleKt(3.75, 0.75).value - 2.5)).toBeLessThan(0.05);
  });

  it("within 0.01 of Roark's Table 17.1 central hole, Kt = 3 - 3.13x + 3.66x^2 - 1.53x^3 (Roark 7th/8th ed.)", () => {
    for (let x = 0.05; x < 1; x += 0.05) {
      const roark = 3 - 3.13 * x + 3.66 * x * x - 1.53 * x ** 3;
      expect(Math.abs(plateHoleKt(1, x).value - roark)).toBeLessThan(0.01);
    }
  });

  it('within 2.5 % of Heywood Ktn = 2 + (1 - d/W)^3 (Heywood, Designing by Photoelasticity, 1952; from memory) for d/W <= 0.6', () => {
    for (let x = 0.05; x <= 0.6; x += 0.05) {
      const heywood = 2 + (1 - x) ** 3;
      expect(Math.abs(plateHoleKt(1, x).value - heywood) / heywood).toBeLessThan(0.025);
    }
  });

  it("within 1 % of Peterson's gross-section fit Ktg = 0.284 + 2/(1-x) - 0.600(1-x) + 1.32(1-x)^2, Ktn = Ktg (1 - x) (Peterson, Stress Concentration Factors 1974, Chart 4.1 eq.; as quoted in the pycalculix example hole-kt-study.py)", () => {
    for (let x = 0.05; x <= 0.7; x += 0.05) {
      const ktg = 0.284 + 2 / (1 - x) - 0.6 * (1 - x) + 1.32 * (1 - x) ** 2;
      expect(Math.abs(plateHoleKt(1, x).value - ktg * (1 - x)) / (ktg * (1 - x))).toBeLessThan(0.01);
    }
  });

  it('monotone decreasing in d/W, between 2 and 3', () => {
    let prev = 3 + 1e-12;
    for (let x = 0.01; x < 1; x += 0.01) {
      const v = plateHoleKt(1, x).value;
      expect(v).toBeLessThanOrEqual(prev);
      expect(v).toBeGreaterThanOrEqual(2 - 1e-9);
      prev = v;
    }
  });

  it('invalid geometry: Kt = 1 with an error note', () => {
    for (const [W, d] of [
      [1, 0],
      [1, 1],
      [0, 0.1],
      [1, -0.1],
    ]) {
      const r = plateHoleKt(W, d);
      expect(r.value).toBe(1);
      expect(r.notes?.[0]?.severity).toBe('error');
    }
  });
});
