/**
 * Smith-Watson-Topper mean-stress correction: `sigma_ar = sqrt(sigma_max * sigma_a)` with
 * `sigma_max = sigma_m + |sigma_a| > 0`; a cycle whose maximum is not tensile is predicted to do
 * no damage (sigma_ar = 0).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA } from '../computed';

export const SWT_SOURCE =
  'Dowling, Mechanical Behavior of Materials, 4th ed., Sec. 9.7, Eq. 9.18 (Smith, Watson & Topper: sigma_ar = sqrt(sigma_max * sigma_a), sigma_max > 0); Example 9.3';

/** Numeric kernel (Pa); 0 when `sigma_max <= 0` (no damage predicted). */
export function reversedKernel(sigma_a: number, sigma_m: number): number {
  const a = Math.abs(sigma_a);
  const max = sigma_m + a;
  if (max <= 0) return 0;
  return Math.sqrt(max * a);
}

/** Equivalent fully reversed stress after SWT, Pa. */
export function equivalentReversed(sigma_a: number, sigma_m: number): Computed {
  const formula = 'sigma_ar = sqrt(sigma_max * sigma_a), sigma_max = sigma_m + sigma_a';
  if (!isFiniteNumber(sigma_a) || !isFiniteNumber(sigma_m))
    return computed(0, formula, SWT_SOURCE, undefined, [
      { code: 'input', message: 'sigma_a and sigma_m must be finite numbers.', severity: 'error' },
    ]);
  const a = Math.abs(sigma_a);
  const max = sigma_m + a;
  const notes: MethodNote[] = [];
  if (max <= 0) {
    notes.push({
      code: 'criterion-domain',
      message:
        'sigma_max <= 0: the SWT parameter predicts no fatigue damage for a cycle that is never tensile.',
      severity: 'information',
    });
  } else if (sigma_m < 0) {
    notes.push({
      code: 'compressive-mean',
      message:
        'Compressive mean: the SWT parameter credits a benefit (sigma_ar < sigma_a), as published by Dowling.',
      severity: 'information',
    });
  }
  const v = reversedKernel(sigma_a, sigma_m);
  return computed(
    v,
    formula,
    SWT_SOURCE,
    [
      { name: 'sigma_a', value: a / MPA, unit: 'MPa' },
      { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
      { name: 'sigma_max', value: max / MPA, unit: 'MPa' },
      { name: 'sigma_ar', value: v / MPA, unit: 'MPa' },
    ],
    notes,
  );
}

/** Allowable amplitude at a mean for a fully reversed strength S: the root of `(sigma_m + x) x = S^2`, Pa. */
export function allowableAmplitude(sigma_m: number, S: number): Computed {
  const formula = 'S_a = (-sigma_m + sqrt(sigma_m^2 + 4 S^2)) / 2';
  if (!isFiniteNumber(sigma_m) || !isFiniteNumber(S) || !(S > 0))
    return computed(0, formula, SWT_SOURCE, undefined, [
      { code: 'input', message: 'sigma_m must be finite and S positive.', severity: 'error' },
    ]);
  const v = stableAmplitude(sigma_m, S);
  return computed(v, formula, SWT_SOURCE, [
    { name: 'S', value: S / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'S_a', value: v / MPA, unit: 'MPa' },
  ]);
}

/** `(-m + sqrt(m^2 + 4 S^2)) / 2` without cancellation for large tensile m. */
function stableAmplitude(m: number, S: number): number {
  const root = Math.hypot(m, 2 * S);
  return m > 0 ? (2 * S * S) / (m + root) : (root - m) / 2;
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the SWT curve from zero mean to `sigma_m_max`. */
export function haighCurve(S: number, sigma_m_max: number, n = 64): Array<[number, number]> {
  if (!(S > 0) || !(sigma_m_max > 0) || !isFiniteNumber(S) || !isFiniteNumber(sigma_m_max)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (sigma_m_max * i) / (count - 1);
    pts.push([m, stableAmplitude(m, S)]);
  }
  return pts;
}
