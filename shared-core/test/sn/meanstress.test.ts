import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { fatigueSafetyFactor, type StrengthSet } from '../../src/criteria';
import {
  defaultWalkerGamma,
  estimateSigmaFPrimeSteel,
  morrow,
  swt,
  walker,
  walkerGammaSteel,
} from '../../src/meanstress';
import { lifeAtStress, snLineFromBasquin, strengthAtLife } from '../../src/sn';

function rel(actual: number, published: number, tol: number) {
  expect(Math.abs(actual / published - 1)).toBeLessThanOrEqual(tol);
}

// AISI 4340 steel, Dowling 4th ed. Example 9.3: sigma_f' = 1758 MPa, b = -0.0977.
const line4340 = snLineFromBasquin(1758 * MPA, -0.0977);

describe('Dowling, Mechanical Behavior of Materials, 4th ed., Example 9.3 (AISI 4340, sigma_m = 200, sigma_a = 450 MPa)', () => {
  it('Morrow: sigma_ar = 507.8 MPa and N_f = 166 000 cycles', () => {
    const r = morrow.equivalentReversed(450 * MPA, 200 * MPA, 1758 * MPA);
    expect(r.value / MPA).toBeCloseTo(507.8, 1);
    rel(lifeAtStress(line4340, r.value).value, 166_000, 0.005);
  });

  it('SWT (second solution, sigma_max = 650 MPa): N_f = 86 900 cycles', () => {
    const r = swt.equivalentReversed(450 * MPA, 200 * MPA);
    rel(lifeAtStress(line4340, r.value).value, 86_900, 0.005);
  });

  it('Walker with gamma = 0.5 reproduces the SWT answer of the same example', () => {
    const r = walker.equivalentReversed(450 * MPA, 200 * MPA, 0.5);
    rel(lifeAtStress(line4340, r.value).value, 86_900, 0.005);
  });

  it('Morrow safety factor on the constant-mean line at N_f = 166 000 is 1 (Eq. 9.23, sigma_a = (sigma_f - sigma_m)(2N)^b)', () => {
    const Sf = strengthAtLife(line4340, 165_850).value;
    const s: StrengthSet = { S: Sf, Sut: 1172 * MPA, Sy: 1103 * MPA, sigma_f_prime: 1758 * MPA };
    expect(fatigueSafetyFactor('morrow', 'constant-mean', 450 * MPA, 200 * MPA, s).value).toBeCloseTo(1, 3);
  });
});

describe('Dowling, Mechanical Behavior of Materials, 4th ed., Example 9.5 (AISI 4340 test at sigma_a = 379, sigma_m = 621 MPa)', () => {
  it('Morrow with sigma_f_prime = 1758 MPa: sigma_ar = 586.0 MPa', () => {
    expect(morrow.equivalentReversed(379 * MPA, 621 * MPA, 1758 * MPA).value / MPA).toBeCloseTo(586.0, 1);
  });
});

describe('mean-stress model identities and limits', () => {
  it('zero mean: every model returns sigma_a', () => {
    expect(morrow.equivalentReversed(300, 0, 1000).value).toBeCloseTo(300, 12);
    expect(swt.equivalentReversed(300, 0).value).toBeCloseTo(300, 12);
    expect(walker.equivalentReversed(300, 0, 0.73).value).toBeCloseTo(300, 12);
  });

  it('Walker gamma = 1 ignores the mean; gamma = 0.5 is SWT (Dowling 4th ed., Sec. 9.7)', () => {
    expect(walker.equivalentReversed(300, 250, 1).value).toBeCloseTo(300, 9);
    expect(walker.equivalentReversed(300, 250, 0.5).value).toBeCloseTo(
      swt.equivalentReversed(300, 250).value,
      9,
    );
  });

  it('SWT and Walker: sigma_max <= 0 predicts no damage (value 0, note)', () => {
    const r = swt.equivalentReversed(100, -150);
    expect(r.value).toBe(0);
    expect(r.notes?.[0].code).toBe('criterion-domain');
    expect(walker.equivalentReversed(100, -100, 0.6).value).toBe(0);
  });

  it('Morrow at sigma_m >= sigma_f_prime: infinite, never Infinity', () => {
    const r = morrow.equivalentReversed(100, 2000, 1000);
    expect(r.infinite).toBe(true);
    expect(r.value).toBe(0);
  });

  it('gamma for steels: -0.0002 Sut[MPa] + 0.8818 (Dowling, Calhoun & Arcari 2009; Dowling 4th ed.; coefficients from memory)', () => {
    expect(walkerGammaSteel(1172 * MPA).value).toBeCloseTo(-0.0002 * 1172 + 0.8818, 12);
    expect(walkerGammaSteel(10_000 * MPA).value).toBe(0);
    expect(walkerGammaSteel(10_000 * MPA).notes?.[0].code).toBe('fit-range');
    expect(defaultWalkerGamma('aluminium', 400 * MPA).value).toBe(0.65);
  });

  it("sigma_f' estimate for steels: Sut + 345 MPa (Shigley MED, Sut + 50 kpsi; from memory)", () => {
    expect(estimateSigmaFPrimeSteel(600 * MPA).value / MPA).toBeCloseTo(945, 9);
  });

  it('allowable amplitudes lie on each model curve', () => {
    const S = 300 * MPA;
    for (const m of [-100 * MPA, 0, 150 * MPA, 600 * MPA]) {
      const a1 = swt.allowableAmplitude(m, S).value;
      expect(swt.equivalentReversed(a1, m).value / S).toBeCloseTo(1, 9);
      const a2 = walker.allowableAmplitude(m, S, 0.7).value;
      expect(walker.equivalentReversed(a2, m, 0.7).value / S).toBeCloseTo(1, 9);
      const a3 = morrow.allowableAmplitude(m, S, 1500 * MPA).value;
      expect(morrow.equivalentReversed(a3, m, 1500 * MPA).value / S).toBeCloseTo(1, 9);
    }
  });
});
