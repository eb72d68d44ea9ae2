/**
 * Library steels with cyclic constants, against the table they come from: Dowling, Mechanical
 * Behavior of Materials, 4th ed., Table 9.1 (yield, ultimate, sigma_f', b; looked up). The other
 * constants (E, eps_f', c, K', n') are his Table 14.1 from memory; they are checked here only for
 * being a usable, self-consistent set (compatibility n' ~ b/c within 10 %, common practice).
 */
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial, MATERIALS } from '../../src/materials';
import { isUsableConstants, isUsableCurve } from '../../src/strainlife';

describe('library: cyclic constants', () => {
  it("AISI 4340 aircraft quality: 1103 / 1172 MPa, sigma_f' = 1758 MPa, b = -0.0977 (Dowling Table 9.1)", () => {
    const m = findMaterial('aisi-4340-aircraft')!;
    expect(m.Sy / MPA).toBeCloseTo(1103, 9);
    expect(m.Sut / MPA).toBeCloseTo(1172, 9);
    expect(m.cyclic!.sigma_f_prime / MPA).toBeCloseTo(1758, 9);
    expect(m.cyclic!.b).toBe(-0.0977);
  });

  it("RQC-100 roller Q & T: 683 / 758 MPa, sigma_f' = 938 MPa, b = -0.0648 (Dowling Table 9.1)", () => {
    const m = findMaterial('rqc-100')!;
    expect(m.Sy / MPA).toBeCloseTo(683, 9);
    expect(m.Sut / MPA).toBeCloseTo(758, 9);
    expect(m.cyclic!.sigma_f_prime / MPA).toBeCloseTo(938, 9);
    expect(m.cyclic!.b).toBe(-0.0648);
  });

  it('every cyclic set is usable, frozen, self-consistent and says what is from memory', () => {
    const withCyclic = MATERIALS.filter((m) => m.cyclic);
    expect(withCyclic.length).toBeGreaterThanOrEqual(2);
    for (const m of withCyclic) {
      const c = m.cyclic!;
      expect(isUsableCurve(c)).toBe(true);
      expect(isUsableConstants(c)).toBe(true);
      expect(c.E).toBe(m.E);
      expect(Object.isFrozen(c)).toBe(true);
      expect(c.n_prime / (c.b / c.c)).toBeGreaterThan(0.9);
      expect(c.n_prime / (c.b / c.c)).toBeLessThan(1.1);
      expect(c.source).toMatch(/from memory/);
      expect(c.source).toMatch(/Table 9\.1/);
    }
  });
});
