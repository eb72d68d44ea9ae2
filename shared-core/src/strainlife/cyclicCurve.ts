/**
 * The cyclic stress-strain curve in the Ramberg-Osgood form and the doubled (Masing) curve
 * that describes every branch of a hysteresis loop, measured from the branch's reversal point:
 *
 *   eps = sigma/E + (sigma/K')^(1/n')                       (cyclic curve, amplitudes)
 *   Delta eps = Delta sigma/E + 2 (Delta sigma/(2 K'))^(1/n')  (Masing: the cyclic curve doubled)
 *
 * The cyclic curve is odd (a compressive first loading mirrors the tensile one). Stress from
 * strain has no closed form; it is found by the bracketed root finder of `monotoneRoot.ts`, from
 * strains of 1e-300 to strains far beyond fracture, without iteration limits that could fail.
 *
 * Sources: W. Ramberg & W. R. Osgood, "Description of stress-strain curves by three parameters",
 * NACA TN 902 (1943) (the form); N. E. Dowling, Mechanical Behavior of Materials, 4th ed.,
 * Pearson 2013, Ch. 12 (the cyclic stress-strain curve with H' = K' and n', and Masing's
 * doubling of it for hysteresis loops; section numbers from memory); G. Masing,
 * "Eigenspannungen und Verfestigung beim Messing", Proc. 2nd Int. Congress for Applied
 * Mechanics, Zurich 1926 (the doubling hypothesis).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA, type Term } from '../computed';
import { increasingRoot } from './monotoneRoot';

export interface CyclicCurve {
  /** Young's modulus, Pa. */
  E: number;
  /** Cyclic strength coefficient K' (H' in Dowling), Pa. */
  K_prime: number;
  /** Cyclic strain-hardening exponent n'. */
  n_prime: number;
}

export const CYCLIC_CURVE_SOURCE =
  "Ramberg & Osgood, NACA TN 902 (1943); cyclic curve with K', n': Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 12 (from memory for the section)";
export const MASING_SOURCE =
  'Masing, Proc. 2nd Int. Congress Appl. Mech., Zurich 1926 (branches are the cyclic curve doubled); Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 12 (from memory for the section)';

/** Exponents outside these bounds describe no material (1/n' would overflow or the curve turn linear). */
const N_PRIME_MIN = 0.01;
const N_PRIME_MAX = 0.95;
/** Largest ln of the plastic strain kept: strains beyond e^600 are absurd but stay finite in every product. */
export const LN_STRAIN_CAP = 600;

/** Published cyclic exponents of metals fall in this band (common practice, no source). */
const N_PRIME_LO = 0.03;
const N_PRIME_HI = 0.4;

/** Errors (constants that cannot describe a metal) and warnings (outside the usual band). */
export function cyclicCurveNotes(curve: CyclicCurve): MethodNote[] {
  const notes: MethodNote[] = [];
  const bad: string[] = [];
  if (!isFiniteNumber(curve.E) || !(curve.E > 0)) bad.push('E must be a positive modulus');
  if (!isFiniteNumber(curve.K_prime) || !(curve.K_prime > 0)) bad.push("K' must be a positive stress");
  if (!isFiniteNumber(curve.n_prime) || !(curve.n_prime >= N_PRIME_MIN) || !(curve.n_prime <= N_PRIME_MAX))
    bad.push(`n' must lie between ${N_PRIME_MIN} and ${N_PRIME_MAX}`);
  if (bad.length > 0) {
    notes.push({ code: 'cyclic-constants-invalid', severity: 'error', message: `${bad.join('; ')}.` });
    return notes;
  }
  if (curve.n_prime < N_PRIME_LO || curve.n_prime > N_PRIME_HI) {
    notes.push({
      code: 'cyclic-constants-range',
      severity: 'warning',
      message: `n' = ${curve.n_prime} is outside ${N_PRIME_LO}..${N_PRIME_HI}, the band of published cyclic exponents of metals: check the constants.`,
    });
  }
  if (curve.K_prime < 0.2 * curve.E * 1e-3 || curve.K_prime > 0.05 * curve.E) {
    notes.push({
      code: 'cyclic-constants-range',
      severity: 'warning',
      message: `K' = ${(curve.K_prime / MPA).toPrecision(4)} MPa is far from the range of metals for E = ${(curve.E / 1e9).toPrecision(4)} GPa: check the unit and the constant.`,
    });
  }
  return notes;
}

/** True when the constants can be used at all (no error note). */
export function isUsableCurve(curve: CyclicCurve): boolean {
  return !cyclicCurveNotes(curve).some((n) => n.severity === 'error');
}

/** Plastic part (sigma/K')^(1/n') of the strain at a stress magnitude s >= 0. */
function plasticStrain(curve: CyclicCurve, s: number): number {
  if (!(s > 0)) return 0;
  return Math.exp(Math.min(LN_STRAIN_CAP, Math.log(s / curve.K_prime) / curve.n_prime));
}

/** Strain on the cyclic curve at a signed stress (odd function), kernel. */
export function cyclicStrain(curve: CyclicCurve, sigma: number): number {
  const s = Math.abs(sigma);
  const e = s / curve.E + plasticStrain(curve, s);
  return sigma < 0 ? -e : e;
}

/** Strain range on a Masing branch for a stress range Delta sigma >= 0, kernel. */
export function masingStrainRange(curve: CyclicCurve, dSigma: number): number {
  const d = Math.max(0, dSigma);
  return d / curve.E + 2 * plasticStrain(curve, d / 2);
}

/** Stress on the cyclic curve at a signed strain (odd function), kernel. */
export function cyclicStress(curve: CyclicCurve, eps: number): number {
  const e = Math.abs(eps);
  if (!(e > 0)) return 0;
  // Each term alone reaches e at E e and K' e^n': the root lies between half of the smaller
  // of the two (each term then at most e/2) and the smaller one itself.
  const hi = Math.min(curve.E * e, curve.K_prime * e ** curve.n_prime);
  const lo = Math.min((curve.E * e) / 2, curve.K_prime * (e / 2) ** curve.n_prime);
  const root = increasingRoot((s) => s / curve.E + plasticStrain(curve, s) - e, lo, hi);
  const s = root.x;
  return eps < 0 ? -s : s;
}

/** Stress range on a Masing branch for a strain range Delta eps >= 0, kernel. */
export function masingStressRange(curve: CyclicCurve, dEps: number): number {
  // Delta eps = 2 eps_c(Delta sigma / 2): the branch is the cyclic curve scaled by two.
  return 2 * cyclicStress(curve, Math.max(0, dEps) / 2);
}

/** 0.2 % offset cyclic yield strength K' 0.002^n', Pa (Dowling Ch. 12, from memory). */
export function cyclicYieldKernel(curve: CyclicCurve): number {
  return curve.K_prime * 0.002 ** curve.n_prime;
}

/**
 * Strain energy density under the cyclic curve from 0 to a stress magnitude s:
 * W = s^2/(2E) + s/(1 + n') (s/K')^(1/n') (the integral of sigma d eps), kernel.
 */
export function cyclicEnergy(curve: CyclicCurve, s: number): number {
  const a = Math.abs(s);
  return (a * a) / (2 * curve.E) + (a / (1 + curve.n_prime)) * plasticStrain(curve, a);
}

/** Strain energy density under a Masing branch for a stress range: 4 W(Delta sigma / 2), kernel. */
export function masingEnergy(curve: CyclicCurve, dSigma: number): number {
  return 4 * cyclicEnergy(curve, Math.max(0, dSigma) / 2);
}

function curveTerms(curve: CyclicCurve): Term[] {
  return [
    { name: 'E', value: curve.E / 1e9, unit: 'GPa' },
    { name: "K'", value: curve.K_prime / MPA, unit: 'MPa' },
    { name: "n'", value: curve.n_prime, unit: '' },
  ];
}

function inputNote(name: string): MethodNote {
  return {
    code: 'invalid-input',
    severity: 'error',
    message: `${name} must be a finite number; 0 returned.`,
  };
}

/** Strain on the cyclic curve at a stress amplitude (or a first-loading stress), with its derivation. */
export function cyclicStrainFromStress(curve: CyclicCurve, sigma: number): Computed {
  const formula = "eps = sigma/E + (sigma/K')^(1/n')";
  const notes = cyclicCurveNotes(curve);
  if (notes.some((n) => n.severity === 'error'))
    return computed(0, formula, CYCLIC_CURVE_SOURCE, undefined, notes);
  if (!isFiniteNumber(sigma))
    return computed(0, formula, CYCLIC_CURVE_SOURCE, undefined, [inputNote('sigma')]);
  const eps = cyclicStrain(curve, sigma);
  return computed(
    eps,
    formula,
    CYCLIC_CURVE_SOURCE,
    [
      ...curveTerms(curve),
      { name: 'sigma', value: sigma / MPA, unit: 'MPa' },
      { name: 'eps_e', value: sigma / curve.E, unit: '' },
      { name: 'eps_p', value: eps - sigma / curve.E, unit: '' },
      { name: 'eps', value: eps, unit: '' },
    ],
    notes,
  );
}

/** Stress on the cyclic curve at a strain amplitude, solved for robustly, with its derivation. */
export function cyclicStressFromStrain(curve: CyclicCurve, eps: number): Computed {
  const formula = "sigma from eps = sigma/E + (sigma/K')^(1/n') (solved, bracketed root)";
  const notes = cyclicCurveNotes(curve);
  if (notes.some((n) => n.severity === 'error'))
    return computed(0, formula, CYCLIC_CURVE_SOURCE, undefined, notes);
  if (!isFiniteNumber(eps)) return computed(0, formula, CYCLIC_CURVE_SOURCE, undefined, [inputNote('eps')]);
  const sigma = cyclicStress(curve, eps);
  return computed(
    sigma,
    formula,
    CYCLIC_CURVE_SOURCE,
    [
      ...curveTerms(curve),
      { name: 'eps', value: eps, unit: '' },
      { name: 'sigma', value: sigma / MPA, unit: 'MPa' },
    ],
    notes,
  );
}

/** Strain range of a Masing branch for a stress range. */
export function masingStrainFromStressRange(curve: CyclicCurve, dSigma: number): Computed {
  const formula = "Delta eps = Delta sigma/E + 2 (Delta sigma/(2 K'))^(1/n')";
  const notes = cyclicCurveNotes(curve);
  if (notes.some((n) => n.severity === 'error')) return computed(0, formula, MASING_SOURCE, undefined, notes);
  if (!isFiniteNumber(dSigma) || dSigma < 0)
    return computed(0, formula, MASING_SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Delta sigma must be a finite range >= 0; 0 returned.',
      },
    ]);
  const dEps = masingStrainRange(curve, dSigma);
  return computed(
    dEps,
    formula,
    MASING_SOURCE,
    [
      ...curveTerms(curve),
      { name: 'Delta sigma', value: dSigma / MPA, unit: 'MPa' },
      { name: 'Delta eps', value: dEps, unit: '' },
    ],
    notes,
  );
}

/** Stress range of a Masing branch for a strain range, solved for robustly. */
export function masingStressFromStrainRange(curve: CyclicCurve, dEps: number): Computed {
  const formula =
    "Delta sigma from Delta eps = Delta sigma/E + 2 (Delta sigma/(2 K'))^(1/n') (solved, bracketed root)";
  const notes = cyclicCurveNotes(curve);
  if (notes.some((n) => n.severity === 'error')) return computed(0, formula, MASING_SOURCE, undefined, notes);
  if (!isFiniteNumber(dEps) || dEps < 0)
    return computed(0, formula, MASING_SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Delta eps must be a finite range >= 0; 0 returned.',
      },
    ]);
  const dSigma = masingStressRange(curve, dEps);
  return computed(
    dSigma,
    formula,
    MASING_SOURCE,
    [
      ...curveTerms(curve),
      { name: 'Delta eps', value: dEps, unit: '' },
      { name: 'Delta sigma', value: dSigma / MPA, unit: 'MPa' },
    ],
    notes,
  );
}

/** Cyclic yield strength (0.2 % offset on the cyclic curve), Pa. */
export function cyclicYieldStrength(curve: CyclicCurve): Computed {
  const formula = "S'y = K' 0.002^n'";
  const notes = cyclicCurveNotes(curve);
  if (notes.some((n) => n.severity === 'error'))
    return computed(0, formula, CYCLIC_CURVE_SOURCE, undefined, notes);
  const v = cyclicYieldKernel(curve);
  return computed(
    v,
    formula,
    CYCLIC_CURVE_SOURCE,
    [...curveTerms(curve), { name: "S'y", value: v / MPA, unit: 'MPa' }],
    notes,
  );
}
