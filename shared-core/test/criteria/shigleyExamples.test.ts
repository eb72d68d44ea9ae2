/**
 * Published safety factors. "SM 8th" = Budynas & Nisbett, Shigley's Mechanical Engineering
 * Design, 8th ed., Instructor's Solutions Manual, Chapter 6 (answers to 2 decimals, so checked to
 * +-0.006); the criteria's closed forms (Tables 6-6, 6-7, 6-8) are the same in the 10th ed.
 */
import { describe, expect, it } from 'vitest';
import { KSI, MPA } from '../../src/computed';
import {
  type CriterionKey,
  fatigueSafetyFactor,
  firstCycleYieldFactor,
  type StrengthSet,
} from '../../src/criteria';
import { equivalentStresses } from '../../src/stress';

const SM8: StrengthSet = { S: 276 * MPA, Sut: 551 * MPA, Sy: 413 * MPA };

function nf(c: CriterionKey, sa: number, sm: number, s: StrengthSet = SM8) {
  return fatigueSafetyFactor(c, 'proportional', sa * MPA, sm * MPA, s).value;
}
function within(actual: number, published: number, tol: number) {
  expect(Math.abs(actual - published)).toBeLessThanOrEqual(tol);
}

function combined(p: { sigma_a?: number; tau_a?: number; tau_m?: number; sigma_m?: number }) {
  return equivalentStresses({
    Kf: 1,
    Kf_ax: 1,
    Kfs: 1,
    Kfm: 1,
    Kf_axm: 1,
    Kfsm: 1,
    sigma_a: (p.sigma_a ?? 0) * MPA,
    sigma_m: (p.sigma_m ?? 0) * MPA,
    sigma_ax_a: 0,
    sigma_ax_m: 0,
    tau_a: (p.tau_a ?? 0) * MPA,
    tau_m: (p.tau_m ?? 0) * MPA,
  });
}

describe('SM 8th Prob. 6-12 (sigma_a = 172 MPa bending, tau_m = 103 MPa; Se 276, Sut 551, Sy 413 MPa)', () => {
  const e = combined({ sigma_a: 172, tau_m: 103 });
  const sa = e.sigma_a_eq.value / MPA;
  const sm = e.sigma_m_eq.value / MPA;
  it('Goodman n_f = 1.06', () => within(nf('goodman', sa, sm), 1.06, 0.006));
  it('Gerber n_f = 1.31', () => within(nf('gerber', sa, sm), 1.31, 0.006));
  it('ASME elliptic n_f = 1.32', () => within(nf('asme-elliptic', sa, sm), 1.32, 0.006));
  it('Langer n_y = 1.67', () =>
    within(firstCycleYieldFactor(413 * MPA, e.sigma_max_eq.value).value, 1.67, 0.006));
});

describe('SM 8th Prob. 6-13 (sigma_a = 69 MPa, tau_m = 138 MPa)', () => {
  const e = combined({ sigma_a: 69, tau_m: 138 });
  const sa = e.sigma_a_eq.value / MPA;
  const sm = e.sigma_m_eq.value / MPA;
  it('Goodman n_f = 1.46', () => within(nf('goodman', sa, sm), 1.46, 0.006));
  it('Gerber n_f = 1.73', () => within(nf('gerber', sa, sm), 1.73, 0.006));
  it('ASME elliptic n_f = 1.59', () => within(nf('asme-elliptic', sa, sm), 1.59, 0.006));
  it('Langer n_y = 1.66', () =>
    within(firstCycleYieldFactor(413 * MPA, e.sigma_max_eq.value).value, 1.66, 0.006));
});

describe('SM 8th Prob. 6-14 (sigma_a = 83, tau_a = 69, tau_m = 103 MPa)', () => {
  const e = combined({ sigma_a: 83, tau_a: 69, tau_m: 103 });
  const sa = e.sigma_a_eq.value / MPA;
  const sm = e.sigma_m_eq.value / MPA;
  it('Goodman n_f = 1.18', () => within(nf('goodman', sa, sm), 1.18, 0.006));
  it('Gerber n_f = 1.47', () => within(nf('gerber', sa, sm), 1.47, 0.006));
  it('ASME elliptic n_f = 1.47', () => within(nf('asme-elliptic', sa, sm), 1.47, 0.006));
  it('Langer n_y = 1.34', () =>
    within(firstCycleYieldFactor(413 * MPA, e.sigma_max_eq.value).value, 1.34, 0.006));
});

describe('SM 8th Prob. 6-15 (tau_a = 207 MPa, zero mean): every criterion gives Se/sigma_a = 0.77', () => {
  const e = combined({ tau_a: 207 });
  it('sigma_a_eq = sqrt(3) 207 = 358.5 MPa', () => within(e.sigma_a_eq.value / MPA, 358.5, 0.05));
  for (const c of ['goodman', 'gerber', 'asme-elliptic'] as const) {
    it(`${c} n_f = 0.77 (Gerber at zero mean works as the limit, the SM uses Eq. 6-47)`, () =>
      within(nf(c, e.sigma_a_eq.value / MPA, e.sigma_m_eq.value / MPA), 0.77, 0.006));
  }
  it('Langer n_y = 1.15', () =>
    within(firstCycleYieldFactor(413 * MPA, e.sigma_max_eq.value).value, 1.15, 0.006));
});

describe('SM 8th Prob. 6-16: sigma_max_eq = 206 MPa gives n_y = 2.00', () => {
  it('n_y = 413/206', () => within(firstCycleYieldFactor(413 * MPA, 206 * MPA).value, 2.0, 0.006));
});

describe('Shigley MED, Ex. 6-10 (10th ed.; answers from memory; inputs Se = 34.1, Sut = 100, Sy = 84 kpsi, Kf = 1.85 as restated at homework.zookal.com)', () => {
  const s: StrengthSet = { S: 34.1 * KSI, Sut: 100 * KSI, Sy: 84 * KSI };
  it('Gerber n_f = 3.68 at sigma_a = sigma_m = 8.38 kpsi', () =>
    within(fatigueSafetyFactor('gerber', 'proportional', 8.38 * KSI, 8.38 * KSI, s).value, 3.68, 0.006));
  it('Langer n_y = 84 / (8.38 + 8.38) = 5.01', () =>
    within(firstCycleYieldFactor(84 * KSI, 16.76 * KSI).value, 5.01, 0.006));
});

describe('Shigley MED 9th ed., Ex. 6-11, Fig. 6-30 (cam-follower spring: Se = 28, Sut = 150 kpsi, sigma_a = 10.99 kpsi fixed)', () => {
  const s: StrengthSet = { S: 28 * KSI, Sut: 150 * KSI, Sy: 127 * KSI };
  it('Gerber limit along the constant-amplitude line: S_m = 116.9 kpsi (Fig. 6-30b) for the 2-in and 5-in preloads', () => {
    for (const sm of [10.99 * 3, 10.99 * 6]) {
      const n = fatigueSafetyFactor('gerber', 'constant-amplitude', 10.99 * KSI, sm * KSI, s).value;
      within(n * sm, 116.9, 0.05);
    }
  });
  it('sigma_m = 33 and 65.9 kpsi give n_f = 116.9/33 = 3.54 and 116.9/65.9 = 1.77 (ratios of the figure values)', () => {
    within(
      fatigueSafetyFactor('gerber', 'constant-amplitude', 10.99 * KSI, 32.97 * KSI, s).value,
      3.55,
      0.01,
    );
    within(
      fatigueSafetyFactor('gerber', 'constant-amplitude', 10.99 * KSI, 65.94 * KSI, s).value,
      1.77,
      0.006,
    );
  });
});
