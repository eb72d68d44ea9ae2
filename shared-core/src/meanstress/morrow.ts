/**
 * Morrow mean-stress correction with the Basquin intercept sigma_f':
 * `sigma_ar = sigma_a / (1 - sigma_m / sigma_f_prime)` (Dowling). A compressive mean lowers
 * sigma_ar (the model credits a benefit); a mean at or above sigma_f' is a static failure.
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';
import { STATIC_FAILURE } from '../criteria/solveFactor';

export const MORROW_SOURCE =
  'Dowling, Mechanical Behavior of Materials, 4th ed., Sec. 9.7, Eq. 9.17(b) solved for sigma_ar as Eq. 9.21 (Morrow with sigma_f_prime); Example 9.3';

/** Shigley's estimate of the fatigue strength coefficient of steels, sigma_f' = Sut + 345 MPa (50 kpsi). */
export const SIGMA_F_PRIME_OFFSET_STEEL = 345e6;
const ESTIMATE_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-7: sigma'_F = Sut + 50 kpsi (Sut + 345 MPa) for steels (from memory)";

/** Numeric kernel (Pa): `|sigma_a| / (1 - sigma_m/sigma_f')`; `STATIC_FAILURE` when `sigma_m >= sigma_f'`. */
export function reversedKernel(sigma_a: number, sigma_m: number, sigma_f_prime: number): number {
  const a = Math.abs(sigma_a);
  if (sigma_m >= sigma_f_prime) return STATIC_FAILURE;
  return a / (1 - sigma_m / sigma_f_prime);
}

function terms(sigma_a: number, sigma_m: number, sigma_f_prime: number) {
  return [
    { name: 'sigma_a', value: Math.abs(sigma_a) / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'sigma_f_prime', value: sigma_f_prime / MPA, unit: 'MPa' },
  ];
}

function inputProblem(values: Record<string, number>, sigma_f_prime: number): MethodNote | null {
  const bad = Object.entries(values)
    .filter(([, v]) => !isFiniteNumber(v))
    .map(([k]) => k);
  if (bad.length > 0)
    return { code: 'input', message: `Not a finite number: ${bad.join(', ')}.`, severity: 'error' };
  if (!(sigma_f_prime > 0))
    return { code: 'input', message: 'sigma_f_prime must be a positive stress.', severity: 'error' };
  return null;
}

/** Equivalent fully reversed stress after Morrow, Pa. */
export function equivalentReversed(sigma_a: number, sigma_m: number, sigma_f_prime: number): Computed {
  const formula = 'sigma_ar = sigma_a / (1 - sigma_m / sigma_f_prime)';
  const problem = inputProblem({ sigma_a, sigma_m, sigma_f_prime }, sigma_f_prime);
  if (problem) return computed(0, formula, MORROW_SOURCE, undefined, [problem]);
  const t = terms(sigma_a, sigma_m, sigma_f_prime);
  if (sigma_m >= sigma_f_prime) {
    return infinite(formula, MORROW_SOURCE, t, [
      {
        code: 'criterion-domain',
        message:
          'The mean stress reaches sigma_f_prime: static failure, the equivalent reversed stress is unbounded.',
        severity: 'warning',
      },
    ]);
  }
  const v = reversedKernel(sigma_a, sigma_m, sigma_f_prime);
  const notes: MethodNote[] = [];
  if (sigma_m < 0) {
    notes.push({
      code: 'compressive-mean',
      message:
        'Compressive mean: the Morrow equation credits a benefit (sigma_ar < sigma_a), as published by Dowling.',
      severity: 'information',
    });
  }
  return computed(
    v,
    formula,
    MORROW_SOURCE,
    [...t, { name: 'sigma_ar', value: v / MPA, unit: 'MPa' }],
    notes,
  );
}

/** Allowable amplitude at a mean stress for a fully reversed strength S: `S (1 - sigma_m/sigma_f')`, Pa. */
export function allowableAmplitude(sigma_m: number, S: number, sigma_f_prime: number): Computed {
  const formula = 'S_a = S * (1 - sigma_m / sigma_f_prime)';
  const problem = inputProblem({ sigma_m, S, sigma_f_prime }, sigma_f_prime);
  if (problem) return computed(0, formula, MORROW_SOURCE, undefined, [problem]);
  const v = Math.max(0, S * (1 - sigma_m / sigma_f_prime));
  return computed(v, formula, MORROW_SOURCE, [
    { name: 'S', value: S / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'sigma_f_prime', value: sigma_f_prime / MPA, unit: 'MPa' },
    { name: 'S_a', value: v / MPA, unit: 'MPa' },
  ]);
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the Morrow line from zero mean to sigma_f'. */
export function haighCurve(S: number, sigma_f_prime: number, n = 64): Array<[number, number]> {
  if (!(S > 0) || !(sigma_f_prime > 0) || !isFiniteNumber(S) || !isFiniteNumber(sigma_f_prime)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (sigma_f_prime * i) / (count - 1);
    pts.push([m, Math.max(0, S * (1 - m / sigma_f_prime))]);
  }
  return pts;
}

/** Default sigma_f' for steels when none is stated: `Sut + 345 MPa` (Shigley), Pa. */
export function estimateSigmaFPrimeSteel(Sut: number): Computed {
  const formula = 'sigma_f_prime = Sut + 345 MPa';
  if (!isFiniteNumber(Sut) || Sut <= 0)
    return computed(0, formula, ESTIMATE_SOURCE, undefined, [
      { code: 'input', message: 'Sut must be a positive stress.', severity: 'error' },
    ]);
  const v = Sut + SIGMA_F_PRIME_OFFSET_STEEL;
  return computed(v, formula, ESTIMATE_SOURCE, [
    { name: 'Sut', value: Sut / MPA, unit: 'MPa' },
    { name: 'sigma_f_prime', value: v / MPA, unit: 'MPa' },
  ]);
}
