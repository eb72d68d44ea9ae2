/**
 * ASME elliptic `(S_a / S)^2 + (S_m / Sy)^2 = 1` (S = Se, or S_f at N for finite life).
 * Defined for a tensile mean; at a compressive mean the limiting answer, the horizontal line
 * `S_a = S`, is used with a `criterion-domain` note.
 */
import type { MethodNote } from '../computed';
import { classicalFunctions } from './classicalFunctions';
import { STATIC_FAILURE } from './solveFactor';
import type { ClassicalCriterion } from './types';

export const ASME_ELLIPTIC_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, Table 6-8 (ASME-elliptic (n sigma_a/S_e)^2 + (n sigma_m/S_y)^2 = 1)";

export const asmeEllipticModel: ClassicalCriterion = {
  key: 'asme-elliptic',
  label: 'ASME elliptic',
  source: ASME_ELLIPTIC_SOURCE,
  tensileOnly: true,
  meanIntercept: (s) => s.Sy,
  amplitudeAt: (m, s) => (m <= 0 ? s.S : s.S * Math.sqrt(Math.max(0, 1 - (m / s.Sy) ** 2))),
  meanAt: (a, s) => s.Sy * Math.sqrt(Math.max(0, 1 - (a / s.S) ** 2)),
  proportional: (a, m, s) => 1 / Math.hypot(a / s.S, m / s.Sy),
  reversed: (a, m, s) => {
    const amp = Math.abs(a);
    if (m <= 0) return amp;
    if (m >= s.Sy) return STATIC_FAILURE;
    return amp / Math.sqrt(1 - (m / s.Sy) ** 2);
  },
  formulas: {
    proportional: 'n_f = 1 / sqrt((sigma_a/S)^2 + (sigma_m/Sy)^2)',
    constantMean: 'n_f = S * sqrt(1 - (sigma_m/Sy)^2) / sigma_a',
    constantAmplitude: 'n_f = Sy * sqrt(1 - (sigma_a/S)^2) / sigma_m',
    reversed: 'sigma_ar = sigma_a / sqrt(1 - (sigma_m/Sy)^2)',
    amplitude: 'S_a = S * sqrt(1 - (sigma_m/Sy)^2)',
  },
};

const DOMAIN_NOTE: MethodNote = {
  code: 'criterion-domain',
  message:
    'ASME elliptic is defined for a tensile mean stress; at a compressive mean the limiting answer (the horizontal line S_a = S) is used.',
  severity: 'information',
};

export const { allowableAmplitude, equivalentReversed, haighCurve } = classicalFunctions(
  asmeEllipticModel,
  ASME_ELLIPTIC_SOURCE,
  'Sy',
  DOMAIN_NOTE,
);
