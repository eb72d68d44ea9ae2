/**
 * The functions every classical criterion (Goodman, Gerber, Soderberg, ASME elliptic)
 * offers around its model: allowable amplitude, equivalent fully reversed stress and the
 * Haigh curve, with the input checks, the compressive-mean rule and the terms shown.
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';
import type { ClassicalCriterion, StrengthSet } from './types';

export const COMPRESSIVE_MEAN_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, discussion of Fig. 6-27: for a compressive midrange stress failure occurs when sigma_a = S_e";

export interface ClassicalFunctions {
  allowableAmplitude(sigma_m: number, s: StrengthSet): Computed;
  equivalentReversed(sigma_a: number, sigma_m: number, s: StrengthSet): Computed;
  haighCurve(s: StrengthSet, n?: number): Array<[number, number]>;
}

/**
 * @param intercept the strength where the curve meets the mean-stress axis (`Sut` or `Sy`)
 * @param shape the word for the curve in the descriptions (`line`, `curve`)
 */
export function classicalFunctions(
  model: ClassicalCriterion,
  source: string,
  intercept: 'Sut' | 'Sy',
  domainNote?: MethodNote,
): ClassicalFunctions {
  const problem = (s: StrengthSet): MethodNote | null => {
    if (!s || !isFiniteNumber(s.S) || s.S <= 0)
      return {
        code: 'input',
        message: 'The fatigue strength S (Se or S_f) must be positive.',
        severity: 'error',
      };
    if (!isFiniteNumber(s[intercept]) || s[intercept] <= 0)
      return { code: 'input', message: `${intercept} must be a positive stress.`, severity: 'error' };
    return null;
  };
  const compressiveNotes = (sigma_m: number) =>
    sigma_m < 0 && model.tensileOnly && domainNote ? [domainNote] : undefined;
  const sourceAt = (sigma_m: number) => (sigma_m < 0 ? COMPRESSIVE_MEAN_SOURCE : source);

  return {
    allowableAmplitude(sigma_m, s) {
      const formula = sigma_m < 0 ? 'S_a = S (compressive mean: horizontal line)' : model.formulas.amplitude;
      const p =
        problem(s) ??
        (isFiniteNumber(sigma_m)
          ? null
          : ({ code: 'input', message: 'sigma_m is not finite.', severity: 'error' } as MethodNote));
      if (p) return computed(0, formula, source, undefined, [p]);
      const v = model.amplitudeAt(sigma_m, s);
      return computed(
        v,
        formula,
        sourceAt(sigma_m),
        [
          { name: 'S', value: s.S / MPA, unit: 'MPa' },
          { name: intercept, value: s[intercept] / MPA, unit: 'MPa' },
          { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
          { name: 'S_a', value: v / MPA, unit: 'MPa' },
        ],
        compressiveNotes(sigma_m),
      );
    },

    equivalentReversed(sigma_a, sigma_m, s) {
      const formula = sigma_m < 0 ? 'sigma_ar = sigma_a (compressive mean)' : model.formulas.reversed;
      const p =
        problem(s) ??
        (isFiniteNumber(sigma_a) && isFiniteNumber(sigma_m)
          ? null
          : ({
              code: 'input',
              message: 'sigma_a and sigma_m must be finite.',
              severity: 'error',
            } as MethodNote));
      if (p) return computed(0, formula, source, undefined, [p]);
      const terms = [
        { name: 'sigma_a', value: Math.abs(sigma_a) / MPA, unit: 'MPa' },
        { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
        { name: intercept, value: s[intercept] / MPA, unit: 'MPa' },
      ];
      if (sigma_m >= s[intercept]) {
        return infinite(formula, source, terms, [
          {
            code: 'criterion-domain',
            message: `The mean stress reaches ${intercept}: static failure, the equivalent reversed stress is unbounded.`,
            severity: 'warning',
          },
        ]);
      }
      const v = model.reversed(sigma_a, sigma_m, s);
      return computed(
        v,
        formula,
        sourceAt(sigma_m),
        [...terms, { name: 'sigma_ar', value: v / MPA, unit: 'MPa' }],
        compressiveNotes(sigma_m),
      );
    },

    haighCurve(s, n = 64) {
      if (problem(s)) return [];
      const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
      const pts: Array<[number, number]> = [];
      for (let i = 0; i < count; i++) {
        const m = (s[intercept] * i) / (count - 1);
        pts.push([m, model.amplitudeAt(m, s)]);
      }
      return pts;
    },
  };
}
