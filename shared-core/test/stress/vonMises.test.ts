import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { type EquivalentStressInput, equivalentStresses } from '../../src/stress';

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

  it('a compressive normal mean keeps its sign; negative amplitudes count as magnitudes', () => {
    const r = eq({ sigma_m: -100 * MPA, tau_m: 10 * MPA, sigma_a: -50 * MPA });
    expect(r.sigma_m_eq.value).toBeLessThan(0);
    expect(r.sigma_m_eq.value / MPA).toBeCloseTo(-Math.sqrt(100 ** 2 + 3 * 10 ** 2), 9);
    expect(r.sigma_a_eq.value / MPA).toBeCloseTo(50, 9);
    expect(r.sigma_max_eq.value / MPA).toBeCloseTo(Math.sqrt(150 ** 2 + 3 * 10 ** 2), 9);
  });

  it('non-finite input gives error notes and zeros', () => {
    const r = eq({ sigma_a: Number.NaN });
    expect(r.sigma_a_eq.value).toBe(0);
    expect(r.sigma_max_eq.notes?.[0].severity).toBe('error');
  });
});
