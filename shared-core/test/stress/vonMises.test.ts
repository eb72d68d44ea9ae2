import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { type EquivalentStressInput, equivalentStresses, pointEquivalentStresses } from '../../src/stress';

const ONES = { Kf: 1, Kf_ax: 1, Kfs: 1, Kfm: 1, Kf_axm: 1, Kfsm: 1 };
const ZERO = { sigma_a: 0, sigma_m: 0, sigma_ax_a: 0, sigma_ax_m: 0, tau_a: 0, tau_m: 0 };
function eq(p: Partial<EquivalentStressInput>) {
  return equivalentStresses({ ...ONES, ...ZERO, ...p });
}

describe('equivalentStresses (Shigley MED, combined loading)', () => {
  it('Shigley MED 8th ed., Solutions Manual Prob. 6-12: sigma_a = 172, tau_m = 103 MPa -> 172, 178.4, 247.8 MPa', () => {
    const r = eq({ sigma_a: 172 * MPA, tau_m: 103 * MPA });
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(172, 1);
    expect(r.sigma_m_eq.value / MPA).toBeCloseTo(178.4, 1);
    expect(r.sigma_max_eq.value / MPA).toBeCloseTo(247.8, 1);
  });

  it('Shigley MED 8th ed., Solutions Manual Prob. 6-14: sigma_a = 83, tau_a = 69, tau_m = 103 MPa -> 145.5, 178.4, 309.2 MPa', () => {
    const r = eq({ sigma_a: 83 * MPA, tau_a: 69 * MPA, tau_m: 103 * MPA });
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(145.5, 1);
    expect(r.sigma_m_eq.value / MPA).toBeCloseTo(178.4, 1);
    expect(Math.abs(r.sigma_max_eq.value / MPA - 309.2)).toBeLessThan(0.1);
  });

  it('Shigley MED 8th ed., Solutions Manual Prob. 6-16: sigma = tau = 103 MPa peak -> sigma_max_eq = 206 MPa', () => {
    const r = eq({ sigma_m: 103 * MPA, tau_m: 103 * MPA });
    expect(r.sigma_max_eq.value / MPA).toBeCloseTo(206, 0);
  });

  it('Shigley MED 8th ed., Solutions Manual Prob. 6-28: axial amplitude 120.5 / 0.85 with tau_a = 134.5 MPa -> 272.7 MPa', () => {
    const r = eq({ sigma_ax_a: 120.5 * MPA, tau_a: 134.5 * MPA });
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(272.7, 1);
  });

  it('concentration factors multiply their own component; axial peak has no 0.85 (identity)', () => {
    const r = equivalentStresses({
      Kf: 2,
      Kf_ax: 1.5,
      Kfs: 1.4,
      Kfm: 1.8,
      Kf_axm: 1.3,
      Kfsm: 1.2,
      ...ZERO,
      sigma_a: 10,
      sigma_ax_a: 4,
      sigma_m: 5,
      sigma_ax_m: 3,
      tau_a: 2,
      tau_m: 7,
    });
    expect(r.sigma_a_eq.value).toBeCloseTo(Math.sqrt((20 + 6 / 0.85) ** 2 + 3 * 2.8 ** 2), 12);
    expect(r.sigma_m_eq.value).toBeCloseTo(Math.sqrt((9 + 3.9) ** 2 + 3 * 8.4 ** 2), 12);
    expect(r.sigma_max_eq.value).toBeCloseTo(Math.sqrt((12.9 + 20 + 6) ** 2 + 3 * (8.4 + 2.8) ** 2), 12);
  });

  it('a compressive normal mean keeps its sign without a shear mean; with one it earns no credit (Shigley Sec. 6-12 and Eq. 6-67); negative amplitudes count as magnitudes', () => {
    expect(eq({ sigma_m: -100 * MPA }).sigma_m_eq.value / MPA).toBeCloseTo(-100, 9);
    const r = eq({ sigma_m: -100 * MPA, tau_m: 10 * MPA, sigma_a: -50 * MPA });
    expect(r.sigma_m_eq.value / MPA).toBeCloseTo(Math.sqrt(3) * 10, 9);
    // Continuous across a zero normal mean: the shear share of Eq. 6-67 either side.
    expect(eq({ sigma_m: -1, tau_m: 10 * MPA }).sigma_m_eq.value / MPA).toBeCloseTo(Math.sqrt(3) * 10, 6);
    expect(eq({ sigma_m: 1, tau_m: 10 * MPA }).sigma_m_eq.value / MPA).toBeCloseTo(Math.sqrt(3) * 10, 6);
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(50, 9);
    expect(r.sigma_max_eq.value / MPA).toBeCloseTo(Math.sqrt(150 ** 2 + 3 * 10 ** 2), 9);
  });

  it('non-finite input gives error notes and zeros', () => {
    const r = eq({ sigma_a: Number.NaN });
    expect(r.sigma_a_eq.value).toBe(0);
    expect(r.sigma_max_eq.notes?.[0].severity).toBe('error');
  });
});

describe('pointEquivalentStresses (the signed stresses at one point of the section)', () => {
  function pt(p: Partial<EquivalentStressInput>) {
    return pointEquivalentStresses({ ...ONES, ...ZERO, ...p });
  }

  it('equals the magnitude form when the components act with the same sign (Shigley MED 8th ed., Solutions Manual Prob. 6-14 numbers)', () => {
    const p = { sigma_a: 83 * MPA, tau_a: 69 * MPA, tau_m: 103 * MPA };
    const a = pt(p);
    const b = eq(p);
    expect(a.sigma_a_eq.value).toBeCloseTo(b.sigma_a_eq.value, 6);
    expect(a.sigma_m_eq.value).toBeCloseTo(b.sigma_m_eq.value, 6);
    expect(a.sigma_max_eq.value).toBeCloseTo(b.sigma_max_eq.value, 6);
  });

  it('bending and axial of opposite sign at the point: the amplitudes subtract (Shigley 10th ed., Eq. 6-66 with signed components)', () => {
    const r = pt({ Kf: 2, Kf_ax: 1.5, sigma_a: -60 * MPA, sigma_ax_a: 34 * MPA });
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(Math.abs(-120 + (1.5 * 34) / 0.85), 9);
    expect(
      eq({ Kf: 2, Kf_ax: 1.5, sigma_a: -60 * MPA, sigma_ax_a: 34 * MPA }).sigma_a_eq.value / MPA,
    ).toBeCloseTo(120 + (1.5 * 34) / 0.85, 9);
  });

  it('the peak is the larger von Mises stress of the two instants: a compressive peak counts (Shigley 10th ed., Sec. 6-14 sigma_max)', () => {
    // mean -150, amplitude 50: instants -100 and -200 MPa; shear mean 20, amplitude -10: 10 and 30 MPa.
    const r = pt({ sigma_m: -150 * MPA, sigma_a: 50 * MPA, tau_m: 20 * MPA, tau_a: -10 * MPA });
    const vm1 = Math.sqrt(100 ** 2 + 3 * 10 ** 2);
    const vm2 = Math.sqrt(200 ** 2 + 3 * 30 ** 2);
    expect(r.sigma_max_eq.value / MPA).toBeCloseTo(Math.max(vm1, vm2), 9);
    // Compressive normal mean with a shear mean: only the shear share counts (equivalentMean).
    expect(r.sigma_m_eq.value / MPA).toBeCloseTo(Math.sqrt(3) * 20, 9);
    expect(r.sigma_max_eq.notes?.find((n) => n.code === 'peak-instant')?.message).toMatch(/mean - amplitude/);
  });

  it('non-finite input gives error notes and zeros', () => {
    const r = pt({ tau_m: Number.POSITIVE_INFINITY });
    expect(r.sigma_m_eq.value).toBe(0);
    expect(r.sigma_m_eq.notes?.[0].severity).toBe('error');
  });
});
