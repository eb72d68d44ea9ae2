/**
 * Modified Goodman line `S_a / S + S_m / Sut = 1` (S = Se, or S_f at N for finite life).
 * Compressive mean: the horizontal line `S_a = S` (Shigley, Fig. 6-27 discussion).
 */
import { classicalFunctions } from './classicalFunctions';
import { STATIC_FAILURE } from './solveFactor';
import type { ClassicalCriterion } from './types';

export const GOODMAN_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, Table 6-6 (modified Goodman line S_a/S_e + S_m/S_ut = 1)";
export { COMPRESSIVE_MEAN_SOURCE } from './classicalFunctions';

export const goodmanModel: ClassicalCriterion = {
  key: 'goodman',
  label: 'Modified Goodman',
  source: GOODMAN_SOURCE,
  tensileOnly: false,
  meanIntercept: (s) => s.Sut,
  amplitudeAt: (m, s) => (m <= 0 ? s.S : Math.max(0, s.S * (1 - m / s.Sut))),
  meanAt: (a, s) => Math.max(0, s.Sut * (1 - a / s.S)),
  proportional: (a, m, s) => 1 / (a / s.S + m / s.Sut),
  reversed: (a, m, s) => {
    const amp = Math.abs(a);
    if (m <= 0) return amp;
    if (m >= s.Sut) return STATIC_FAILURE;
    return amp / (1 - m / s.Sut);
  },
  formulas: {
    proportional: 'n_f = 1 / (sigma_a/S + sigma_m/Sut)',
    constantMean: 'n_f = S * (1 - sigma_m/Sut) / sigma_a',
    constantAmplitude: 'n_f = Sut * (1 - sigma_a/S) / sigma_m',
    reversed: 'sigma_ar = sigma_a / (1 - sigma_m/Sut)',
    amplitude: 'S_a = S * (1 - sigma_m/Sut)',
  },
};

export const { allowableAmplitude, equivalentReversed, haighCurve } = classicalFunctions(
  goodmanModel,
  GOODMAN_SOURCE,
  'Sut',
);
