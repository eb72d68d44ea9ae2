/**
 * ASME elliptic `(S_a / S)^2 + (S_m / Sy)^2 = 1` (S = Se, or S_f at N for finite life).
 * Defined for a tensile mean; at a compressive mean the limiting answer, the horizontal line
 * `S_a = S`, is used with a `criterion-domain` note.
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';
import { COMPRESSIVE_MEAN_SOURCE } from './goodman';
import type { ClassicalCriterion, StrengthSet } from './loadLine';
import { STATIC_FAILURE } from './solveFactor';

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

function problem(s: StrengthSet): MethodNote | null {
  if (!s || !isFiniteNumber(s.S) || s.S <= 0)
    return {
      code: 'input',
      message: 'The fatigue strength S (Se or S_f) must be positive.',
      severity: 'error',
    };
  if (!isFiniteNumber(s.Sy) || s.Sy <= 0)
    return { code: 'input', message: 'Sy must be a positive stress.', severity: 'error' };
  return null;
}

/** Allowable amplitude on the ASME elliptic curve at mean `sigma_m`, Pa (S for a compressive mean). */
export function allowableAmplitude(sigma_m: number, s: StrengthSet): Computed {
  const formula =
    sigma_m < 0 ? 'S_a = S (compressive mean: horizontal line)' : asmeEllipticModel.formulas.amplitude;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_m is not finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, ASME_ELLIPTIC_SOURCE, undefined, [p]);
  const v = asmeEllipticModel.amplitudeAt(sigma_m, s);
  return computed(
    v,
    formula,
    sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : ASME_ELLIPTIC_SOURCE,
    [
      { name: 'S', value: s.S / MPA, unit: 'MPa' },
      { name: 'Sy', value: s.Sy / MPA, unit: 'MPa' },
      { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
      { name: 'S_a', value: v / MPA, unit: 'MPa' },
    ],
    sigma_m < 0 && asmeEllipticModel.tensileOnly ? [DOMAIN_NOTE] : undefined,
  );
}

/** Equivalent fully reversed stress on the ASME elliptic curve, Pa (sigma_a itself for a compressive mean). */
export function equivalentReversed(sigma_a: number, sigma_m: number, s: StrengthSet): Computed {
  const formula = sigma_m < 0 ? 'sigma_ar = sigma_a (compressive mean)' : asmeEllipticModel.formulas.reversed;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_a) && isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_a and sigma_m must be finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, ASME_ELLIPTIC_SOURCE, undefined, [p]);
  const terms = [
    { name: 'sigma_a', value: Math.abs(sigma_a) / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'Sy', value: s.Sy / MPA, unit: 'MPa' },
  ];
  if (sigma_m >= s.Sy) {
    return infinite(formula, ASME_ELLIPTIC_SOURCE, terms, [
      {
        code: 'criterion-domain',
        message: 'The mean stress reaches Sy: static failure, the equivalent reversed stress is unbounded.',
        severity: 'warning',
      },
    ]);
  }
  const v = asmeEllipticModel.reversed(sigma_a, sigma_m, s);
  return computed(
    v,
    formula,
    sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : ASME_ELLIPTIC_SOURCE,
    [...terms, { name: 'sigma_ar', value: v / MPA, unit: 'MPa' }],
    sigma_m < 0 && asmeEllipticModel.tensileOnly ? [DOMAIN_NOTE] : undefined,
  );
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the ASME elliptic curve, tensile side, 0 .. Sy. */
export function haighCurve(s: StrengthSet, n = 64): Array<[number, number]> {
  if (problem(s)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (s.Sy * i) / (count - 1);
    pts.push([m, asmeEllipticModel.amplitudeAt(m, s)]);
  }
  return pts;
}
