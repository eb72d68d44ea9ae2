/**
 * Gerber parabola `S_a / S + (S_m / Sut)^2 = 1` (S = Se, or S_f at N for finite life).
 * Defined for a tensile mean; at a compressive mean the limiting answer, the horizontal line
 * `S_a = S`, is used with a `criterion-domain` note. At zero mean it gives S like every criterion.
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';
import { COMPRESSIVE_MEAN_SOURCE } from './goodman';
import type { ClassicalCriterion, StrengthSet } from './loadLine';
import { STATIC_FAILURE } from './solveFactor';

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

function problem(s: StrengthSet): MethodNote | null {
  if (!s || !isFiniteNumber(s.S) || s.S <= 0)
    return {
      code: 'input',
      message: 'The fatigue strength S (Se or S_f) must be positive.',
      severity: 'error',
    };
  if (!isFiniteNumber(s.Sut) || s.Sut <= 0)
    return { code: 'input', message: 'Sut must be a positive stress.', severity: 'error' };
  return null;
}

/** Allowable amplitude on the Gerber curve at mean `sigma_m`, Pa (S for a compressive mean). */
export function allowableAmplitude(sigma_m: number, s: StrengthSet): Computed {
  const formula =
    sigma_m < 0 ? 'S_a = S (compressive mean: horizontal line)' : gerberModel.formulas.amplitude;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_m is not finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, GERBER_SOURCE, undefined, [p]);
  const v = gerberModel.amplitudeAt(sigma_m, s);
  return computed(
    v,
    formula,
    sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : GERBER_SOURCE,
    [
      { name: 'S', value: s.S / MPA, unit: 'MPa' },
      { name: 'Sut', value: s.Sut / MPA, unit: 'MPa' },
      { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
      { name: 'S_a', value: v / MPA, unit: 'MPa' },
    ],
    sigma_m < 0 && gerberModel.tensileOnly ? [DOMAIN_NOTE] : undefined,
  );
}

/** Equivalent fully reversed stress on the Gerber curve, Pa (sigma_a itself for a compressive mean). */
export function equivalentReversed(sigma_a: number, sigma_m: number, s: StrengthSet): Computed {
  const formula = sigma_m < 0 ? 'sigma_ar = sigma_a (compressive mean)' : gerberModel.formulas.reversed;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_a) && isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_a and sigma_m must be finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, GERBER_SOURCE, undefined, [p]);
  const terms = [
    { name: 'sigma_a', value: Math.abs(sigma_a) / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'Sut', value: s.Sut / MPA, unit: 'MPa' },
  ];
  if (sigma_m >= s.Sut) {
    return infinite(formula, GERBER_SOURCE, terms, [
      {
        code: 'criterion-domain',
        message: 'The mean stress reaches Sut: static failure, the equivalent reversed stress is unbounded.',
        severity: 'warning',
      },
    ]);
  }
  const v = gerberModel.reversed(sigma_a, sigma_m, s);
  return computed(
    v,
    formula,
    sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : GERBER_SOURCE,
    [...terms, { name: 'sigma_ar', value: v / MPA, unit: 'MPa' }],
    sigma_m < 0 && gerberModel.tensileOnly ? [DOMAIN_NOTE] : undefined,
  );
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the Gerber curve, tensile side, 0 .. Sut. */
export function haighCurve(s: StrengthSet, n = 64): Array<[number, number]> {
  if (problem(s)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (s.Sut * i) / (count - 1);
    pts.push([m, gerberModel.amplitudeAt(m, s)]);
  }
  return pts;
}
