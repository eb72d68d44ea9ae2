/**
 * Walker mean-stress correction: `sigma_ar = sigma_max^(1 - gamma) * sigma_a^gamma`,
 * `sigma_max = sigma_m + |sigma_a| > 0` (no damage predicted otherwise). gamma = 0.5 is SWT,
 * gamma = 1 ignores the mean stress. When no gamma is stated, Dowling's correlation for steels
 * `gamma = -0.0002 * Sut[MPa] + 0.8818` estimates it; aluminium alloys take about 0.65.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA } from '../computed';
import { solveFactor } from '../criteria/solveFactor';

export const WALKER_SOURCE =
  'Dowling, Mechanical Behavior of Materials, 4th ed., Sec. 9.7, Eq. 9.19 (Walker: sigma_ar = sigma_max^(1-gamma) * sigma_a^gamma)';
export const WALKER_GAMMA_SOURCE =
  "Dowling, Calhoun & Arcari, 'Mean stress effects in stress-life fatigue and the Walker equation', Fatigue Fract. Engng Mater. Struct. 32 (2009) 163-179; Dowling, Mechanical Behavior of Materials, 4th ed., Sec. 9.7 (steels: gamma = -0.0002 sigma_u + 0.8818, sigma_u in MPa; coefficients from memory)";

/** Average gamma for aluminium alloys (from memory; the 2009 paper gives about 0.5 for high-strength and higher values for low-strength alloys). */
export const WALKER_GAMMA_ALUMINIUM = 0.65;

/** Numeric kernel (Pa); 0 when `sigma_max <= 0`. */
export function reversedKernel(sigma_a: number, sigma_m: number, gamma: number): number {
  const a = Math.abs(sigma_a);
  const max = sigma_m + a;
  if (max <= 0 || a === 0) return 0;
  return max ** (1 - gamma) * a ** gamma;
}

function gammaProblem(gamma: number): MethodNote | null {
  if (!isFiniteNumber(gamma) || gamma < 0 || gamma > 1)
    return { code: 'input', message: 'gamma_walker must lie between 0 and 1.', severity: 'error' };
  return null;
}

/** Equivalent fully reversed stress after Walker, Pa. */
export function equivalentReversed(sigma_a: number, sigma_m: number, gamma: number): Computed {
  const formula = 'sigma_ar = sigma_max^(1 - gamma) * sigma_a^gamma, sigma_max = sigma_m + sigma_a';
  if (!isFiniteNumber(sigma_a) || !isFiniteNumber(sigma_m))
    return computed(0, formula, WALKER_SOURCE, undefined, [
      { code: 'input', message: 'sigma_a and sigma_m must be finite numbers.', severity: 'error' },
    ]);
  const gp = gammaProblem(gamma);
  if (gp) return computed(0, formula, WALKER_SOURCE, undefined, [gp]);
  const a = Math.abs(sigma_a);
  const max = sigma_m + a;
  const notes: MethodNote[] = [];
  if (max <= 0) {
    notes.push({
      code: 'criterion-domain',
      message:
        'sigma_max <= 0: the Walker equation predicts no fatigue damage for a cycle that is never tensile.',
      severity: 'information',
    });
  } else if (sigma_m < 0) {
    notes.push({
      code: 'compressive-mean',
      message:
        'Compressive mean: the Walker equation credits a benefit (sigma_ar < sigma_a), as published by Dowling.',
      severity: 'information',
    });
  }
  const v = reversedKernel(sigma_a, sigma_m, gamma);
  return computed(
    v,
    formula,
    WALKER_SOURCE,
    [
      { name: 'sigma_a', value: a / MPA, unit: 'MPa' },
      { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
      { name: 'sigma_max', value: max / MPA, unit: 'MPa' },
      { name: 'gamma', value: gamma, unit: '' },
      { name: 'sigma_ar', value: v / MPA, unit: 'MPa' },
    ],
    notes,
  );
}

function amplitudeAt(sigma_m: number, S: number, gamma: number): number {
  const sol = solveFactor((x) => reversedKernel(x * S, sigma_m, gamma), S);
  return sol.kind === 'root' ? sol.n * S : 0;
}

/** Allowable amplitude at a mean for a fully reversed strength S (root of the Walker equation), Pa. */
export function allowableAmplitude(sigma_m: number, S: number, gamma: number): Computed {
  const formula = 'S_a solves (sigma_m + S_a)^(1 - gamma) * S_a^gamma = S';
  if (!isFiniteNumber(sigma_m) || !isFiniteNumber(S) || !(S > 0))
    return computed(0, formula, WALKER_SOURCE, undefined, [
      { code: 'input', message: 'sigma_m must be finite and S positive.', severity: 'error' },
    ]);
  const gp = gammaProblem(gamma);
  if (gp) return computed(0, formula, WALKER_SOURCE, undefined, [gp]);
  const v = amplitudeAt(sigma_m, S, gamma);
  return computed(v, formula, WALKER_SOURCE, [
    { name: 'S', value: S / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: sigma_m / MPA, unit: 'MPa' },
    { name: 'gamma', value: gamma, unit: '' },
    { name: 'S_a', value: v / MPA, unit: 'MPa' },
  ]);
}

/** Haigh-diagram points [sigma_m, sigma_a] (Pa) of the Walker curve from zero mean to `sigma_m_max`. */
export function haighCurve(S: number, sigma_m_max: number, gamma: number, n = 64): Array<[number, number]> {
  if (!(S > 0) || !(sigma_m_max > 0) || !isFiniteNumber(S) || !isFiniteNumber(sigma_m_max)) return [];
  if (gammaProblem(gamma)) return [];
  const count = Math.max(2, Math.floor(isFiniteNumber(n) ? n : 64));
  const pts: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const m = (sigma_m_max * i) / (count - 1);
    pts.push([m, amplitudeAt(m, S, gamma)]);
  }
  return pts;
}

/** Dowling's estimate of gamma for steels from the ultimate strength (clamped to 0..1). */
export function walkerGammaSteel(Sut: number): Computed {
  const formula = 'gamma = -0.0002 * Sut[MPa] + 0.8818';
  if (!isFiniteNumber(Sut) || Sut <= 0)
    return computed(0.5, formula, WALKER_GAMMA_SOURCE, undefined, [
      { code: 'input', message: 'Sut must be a positive stress; gamma = 0.5 (SWT) used.', severity: 'error' },
    ]);
  const raw = -0.0002 * (Sut / MPA) + 0.8818;
  const notes: MethodNote[] = [];
  let g = raw;
  if (raw < 0 || raw > 1) {
    g = Math.min(1, Math.max(0, raw));
    notes.push({
      code: 'fit-range',
      message: `The correlation gives gamma = ${raw.toFixed(3)} outside 0..1 for this Sut; clamped to ${g}.`,
      severity: 'warning',
    });
  }
  return computed(
    g,
    formula,
    WALKER_GAMMA_SOURCE,
    [
      { name: 'Sut', value: Sut / MPA, unit: 'MPa' },
      { name: 'gamma', value: g, unit: '' },
    ],
    notes,
  );
}

/** Default gamma by material class: the steel correlation, or the aluminium average. */
export function defaultWalkerGamma(materialClass: 'steel' | 'aluminium', Sut: number): Computed {
  if (materialClass === 'aluminium') {
    return computed(WALKER_GAMMA_ALUMINIUM, 'gamma = 0.65 (aluminium alloys)', WALKER_GAMMA_SOURCE, [
      { name: 'gamma', value: WALKER_GAMMA_ALUMINIUM, unit: '' },
    ]);
  }
  return walkerGammaSteel(Sut);
}
