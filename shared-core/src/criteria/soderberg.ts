/**
 * Soderberg line `S_a / S + S_m / Sy = 1` (S = Se, or S_f at N for finite life).
 * Compressive mean: the horizontal line `S_a = S` (Shigley, Fig. 6-27 discussion).
 */
import type { MethodNote } from '../computed';
import { classicalFunctions } from './classicalFunctions';
import { STATIC_FAILURE } from './solveFactor';
import type { ClassicalCriterion } from './types';

export const SODERBERG_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12 (Soderberg line S_a/S_e + S_m/S_y = 1, 1/n = sigma_a/S_e + sigma_m/S_y)";

export const soderbergModel: ClassicalCriterion = {
  key: 'soderberg',
  label: 'Soderberg',
  source: SODERBERG_SOURCE,
  tensileOnly: false,
  meanIntercept: (s) => s.Sy,
  amplitudeAt: (m, s) => (m <= 0 ? s.S : Math.max(0, s.S * (1 - m / s.Sy))),
  meanAt: (a, s) => Math.max(0, s.Sy * (1 - a / s.S)),
  proportional: (a, m, s) => 1 / (a / s.S + m / s.Sy),
  reversed: (a, m, s) => {
    const amp = Math.abs(a);
    if (m <= 0) return amp;
    if (m >= s.Sy) return STATIC_FAILURE;
    return amp / (1 - m / s.Sy);
  },
  formulas: {
    proportional: 'n_f = 1 / (sigma_a/S + sigma_m/Sy)',
    constantMean: 'n_f = S * (1 - sigma_m/Sy) / sigma_a',
    constantAmplitude: 'n_f = Sy * (1 - sigma_a/S) / sigma_m',
    reversed: 'sigma_ar = sigma_a / (1 - sigma_m/Sy)',
    amplitude: 'S_a = S * (1 - sigma_m/Sy)',
  },
};

const DOMAIN_NOTE: MethodNote = {
  code: 'criterion-domain',
  message:
    'Soderberg is defined for a tensile mean stress; at a compressive mean the limiting answer (the horizontal line S_a = S) is used.',
  severity: 'information',
};

export const { allowableAmplitude, equivalentReversed, haighCurve } = classicalFunctions(
  soderbergModel,
  SODERBERG_SOURCE,
  'Sy',
  DOMAIN_NOTE,
);
