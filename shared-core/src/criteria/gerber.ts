/**
 * Gerber parabola `S_a / S + (S_m / Sut)^2 = 1` (S = Se, or S_f at N for finite life).
 * Defined for a tensile mean; at a compressive mean the limiting answer, the horizontal line
 * `S_a = S`, is used with a `criterion-domain` note. At zero mean it gives S like every criterion.
 */
import type { MethodNote } from '../computed';
import { classicalFunctions } from './classicalFunctions';
import { STATIC_FAILURE } from './solveFactor';
import type { ClassicalCriterion } from './types';

export const GERBER_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, Table 6-7 (Gerber parabola n sigma_a/S_e + (n sigma_m/S_ut)^2 = 1)";

export const gerberModel: ClassicalCriterion = {
  key: 'gerber',
  label: 'Gerber',
  source: GERBER_SOURCE,
  tensileOnly: true,
  meanIntercept: (s) => s.Sut,
  amplitudeAt: (m, s) => (m <= 0 ? s.S : Math.max(0, s.S * (1 - (m / s.Sut) ** 2))),
  meanAt: (a, s) => s.Sut * Math.sqrt(Math.max(0, 1 - a / s.S)),
  proportional: (a, m, s) => (2 * s.S) / (a + Math.hypot(a, (2 * s.S * m) / s.Sut)),
  reversed: (a, m, s) => {
    const amp = Math.abs(a);
    if (m <= 0) return amp;
    if (m >= s.Sut) return STATIC_FAILURE;
    return amp / (1 - (m / s.Sut) ** 2);
  },
  formulas: {
    proportional:
      'n_f = (1/2) (Sut/sigma_m)^2 (sigma_a/S) [-1 + sqrt(1 + (2 sigma_m S/(Sut sigma_a))^2)] = 2 S / (sigma_a + sqrt(sigma_a^2 + (2 S sigma_m/Sut)^2))',
    constantMean: 'n_f = S * (1 - (sigma_m/Sut)^2) / sigma_a',
    constantAmplitude: 'n_f = Sut * sqrt(1 - sigma_a/S) / sigma_m',
    reversed: 'sigma_ar = sigma_a / (1 - (sigma_m/Sut)^2)',
    amplitude: 'S_a = S * (1 - (sigma_m/Sut)^2)',
  },
};

const DOMAIN_NOTE: MethodNote = {
  code: 'criterion-domain',
  message:
    'Gerber is defined for a tensile mean stress; at a compressive mean the limiting answer (the horizontal line S_a = S) is used.',
  severity: 'information',
};

export const { allowableAmplitude, equivalentReversed, haighCurve } = classicalFunctions(
  gerberModel,
  GERBER_SOURCE,
  'Sut',
  DOMAIN_NOTE,
);
