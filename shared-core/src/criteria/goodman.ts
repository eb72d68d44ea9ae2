/**
 * Modified Goodman line `S_a / S + S_m / Sut = 1` (S = Se, or S_f at N for finite life).
 * Compressive mean: the horizontal line `S_a = S` (Shigley, Fig. 6-27 discussion).
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';
import type { ClassicalCriterion, StrengthSet } from './loadLine';
import { STATIC_FAILURE } from './solveFactor';

export const GOODMAN_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, Table 6-6 (modified Goodman line S_a/S_e + S_m/S_ut = 1)";
export const COMPRESSIVE_MEAN_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, discussion of Fig. 6-27: for a compressive midrange stress failure occurs when sigma_a = S_e";

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

/** Allowable amplitude on the Goodman line at mean `sigma_m`, Pa (S for a compressive mean). */
export function allowableAmplitude(sigma_m: number, s: StrengthSet): Computed {
  const formula =
    sigma_m < 0 ? 'S_a = S (compressive mean: horizontal line)' : goodmanModel.formulas.amplitude;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_m is not finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, GOODMAN_SOURCE, undefined, [p]);
  const v = goodmanModel.amplitudeAt(sigma_m, s);
  return computed(v, formula, sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : GOODMAN_SOURCE, [
    { name: 'S', value: s.S / MPA, unit: 'MPa' },
    { name: 'Sut', value: s.Sut / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'S_a', value: v / MPA, unit: 'MPa' },
  ]);
}

/** Equivalent fully reversed stress on the Goodman line, Pa (sigma_a itself for a compressive mean). */
export function equivalentReversed(sigma_a: number, sigma_m: number, s: StrengthSet): Computed {
  const formula = sigma_m < 0 ? 'sigma_ar = sigma_a (compressive mean)' : goodmanModel.formulas.reversed;
  const p =
    problem(s) ??
    (isFiniteNumber(sigma_a) && isFiniteNumber(sigma_m)
      ? null
      : ({ code: 'input', message: 'sigma_a and sigma_m must be finite.', severity: 'error' } as MethodNote));
  if (p) return computed(0, formula, GOODMAN_SOURCE, undefined, [p]);
  const terms = [
    { name: 'sigma_a', value: Math.abs(sigma_a) / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'Sut', value: s.Sut / MPA, unit: 'MPa' },
  ];
  if (sigma_m >= s.Sut) {
    return infinite(formula, GOODMAN_SOURCE, terms, [
      {
        code: 'criterion-domain',
        message: 'The mean stress reaches Sut: static failure, the equivalent reversed stress is unbounded.',
        severity: 'warning',
      },
    ]);
  }
  const v = goodmanModel.reversed(sigma_a, sigma_m, s);
  return computed(v, formula, sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : GOODMAN_SOURCE, [
    ...terms,
    { name: 'sigma_ar', value: v / MPA, unit: 'MPa' },
  ]);
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the Goodman line, tensile side, 0 .. Sut. */
export function haighCurve(s: StrengthSet, n = 64): Array<[number, number]> {
  if (problem(s)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (s.Sut * i) / (count - 1);
    pts.push([m, goodmanModel.amplitudeAt(m, s)]);
  }
  return pts;
}
