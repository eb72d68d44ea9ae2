/**
 * Notch-root stress and strain from the nominal stress and the stress concentration factor:
 *
 * - Neuber's rule: sigma eps = (K S)^2 / E on the cyclic curve for the first loading, and
 *   Delta sigma Delta eps = (K Delta S)^2 / E on the Masing curve for every reversal.
 * - Glinka's equivalent strain energy density: the energy under the cyclic curve up to the
 *   notch-root point equals the elastic energy (K S)^2 / (2E); for reversals the energy under
 *   the Masing branch equals (K Delta S)^2 / (2E).
 *
 * K is the elastic stress concentration factor Kt (Neuber's rule is derived for it); a fatigue
 * notch factor Kf may be used instead (Topper, Wetzel & Morrow), and a note always says which.
 *
 * Because the Masing branch is the cyclic curve scaled by two in stress and strain, a reversal
 * is the first-loading solution at half the range, doubled: Delta sigma = 2 sigma(K Delta S / 2).
 * The tests check this against the doubled-curve equations solved directly.
 *
 * Sources: H. Neuber, "Theory of stress concentration for shear-strained prismatical bodies with
 * arbitrary nonlinear stress-strain law", J. Appl. Mech. 28 (1961) 544-550; T. H. Topper,
 * R. M. Wetzel & J. Morrow, "Neuber's rule applied to fatigue of notched specimens",
 * J. Materials 4 (1969) 200-209 (ranges, Kf); G. Glinka, "Energy density approach to calculation
 * of inelastic strain-stress near notches and cracks", Eng. Fract. Mech. 22 (1985) 485-508
 * (with K. Molski, Mater. Sci. Eng. 50 (1981) 93-100); Dowling, Mechanical Behavior of
 * Materials, 4th ed., Ch. 14 (notch strain analysis; from memory for the section).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA, type Term } from '../computed';
import {
  type CyclicCurve,
  cyclicCurveNotes,
  cyclicEnergy,
  cyclicStrain,
  cyclicYieldKernel,
  LN_STRAIN_CAP,
  masingStrainRange,
} from './cyclicCurve';
import { increasingRoot } from './monotoneRoot';

export type NotchRule = 'neuber' | 'glinka';
export type NotchFactorKind = 'Kt' | 'Kf';

export const NEUBER_SOURCE =
  'Neuber, J. Appl. Mech. 28 (1961) 544-550; ranges with the Masing curve: Topper, Wetzel & Morrow, J. Materials 4 (1969) 200-209; Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14 (from memory for the section)';
export const GLINKA_SOURCE =
  'Glinka, Eng. Fract. Mech. 22 (1985) 485-508; Molski & Glinka, Mater. Sci. Eng. 50 (1981) 93-100 (equivalent strain energy density); ranges with the Masing curve';

export function notchSource(rule: NotchRule): string {
  return rule === 'glinka' ? GLINKA_SOURCE : NEUBER_SOURCE;
}

/**
 * The root of either rule, solved for x = sigma / e in (0, 1] (the notch-root stress never exceeds
 * the elastic one): dividing by e keeps e^2 from underflowing for tiny loads and from overflowing
 * for absurd ones, so the solver works from 1e-300 Pa to far beyond fracture.
 *
 *   Neuber:  x^2 + x E (x e / K')^(1/n') / e = 1
 *   Glinka:  x^2 + 2 E x (x e / K')^(1/n') / ((1 + n') e) = 1
 *
 * Both left sides increase with x. The plastic term alone reaching 1 bounds x from above:
 * (x e)^(1 + 1/n') = C e^2 K'^(1/n') / E, C = 1 (Neuber) or (1 + n')/2 (Glinka), taken in logs.
 */
function rootStressMagnitude(curve: CyclicCurve, rule: NotchRule, e: number): number {
  if (!(e > 0)) return 0;
  const { E, K_prime: K, n_prime: n } = curve;
  const C = rule === 'glinka' ? (1 + n) / 2 : 1;
  const lnCoef = Math.log(rule === 'glinka' ? (2 * E) / (1 + n) : E) - Math.log(e);
  // The plastic term in logs, capped like the strain itself, so that it stays finite for any load.
  const g = (x: number) =>
    x * x + Math.exp(Math.min(LN_STRAIN_CAP, lnCoef + Math.log(x) + Math.log((x * e) / K) / n)) - 1;
  // ln(sigma_p) = (n ln(C e^2 / E) + ln K') / (1 + n): the plastic bound on the stress, in logs.
  const lnBound = (lnC: number) => (n * (lnC + 2 * Math.log(e) - Math.log(E)) + Math.log(K)) / (1 + n);
  const hi = Math.min(1, Math.exp(lnBound(Math.log(C)) - Math.log(e)));
  const lo = Math.min(Math.SQRT1_2, Math.exp(lnBound(Math.log(C / 2)) - Math.log(e)));
  return e * increasingRoot(g, lo, hi).x;
}

export interface NotchPoint {
  /** Local stress, Pa (signed). */
  sigma: number;
  /** Local strain (signed). */
  eps: number;
}

/** First loading from zero to the elastic notch stress e = K S (signed): the point on the cyclic curve, kernel. */
export function firstLoadingKernel(curve: CyclicCurve, rule: NotchRule, e: number): NotchPoint {
  const s = rootStressMagnitude(curve, rule, Math.abs(e));
  const sigma = e < 0 ? -s : s;
  return { sigma, eps: cyclicStrain(curve, sigma) };
}

export interface NotchRange {
  /** Local stress range, Pa (>= 0). */
  dSigma: number;
  /** Local strain range (>= 0). */
  dEps: number;
}

/** A reversal of elastic notch stress range dE = K Delta S >= 0 on the Masing curve, kernel. */
export function reversalKernel(curve: CyclicCurve, rule: NotchRule, dE: number): NotchRange {
  const dSigma = 2 * rootStressMagnitude(curve, rule, Math.abs(dE) / 2);
  return { dSigma, dEps: masingStrainRange(curve, dSigma) };
}

export interface NotchInput {
  curve: CyclicCurve;
  rule: NotchRule;
  /** Stress concentration factor used (>= 1). */
  K: number;
  /** Which factor K is: the elastic Kt (what Neuber's rule is derived for) or a stated Kf. */
  factor: NotchFactorKind;
  /** Monotonic yield strength of the net section's material, Pa, when known (general-yield check of the first loading). */
  Sy?: number;
}

/** The note that says which concentration factor the rule uses. */
export function notchFactorNote(rule: NotchRule, K: number, factor: NotchFactorKind): MethodNote {
  const name = rule === 'glinka' ? "Glinka's energy rule" : "Neuber's rule";
  return factor === 'Kt'
    ? {
        code: 'notch-factor',
        severity: 'information',
        message: `${name} with the elastic stress concentration factor Kt = ${fmt(K)} (the factor the rule is derived for).`,
      }
    : {
        code: 'notch-factor',
        severity: 'information',
        message: `${name} with the fatigue notch factor Kf = ${fmt(K)} in place of Kt (Topper, Wetzel & Morrow 1969): local values are fatigue-effective, not the elastic-plastic stress at the notch root.`,
      };
}

function fmt(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}

/** Common input checks; errors mean the result must be withheld. */
function inputNotes(input: NotchInput, S: number, name: string): MethodNote[] {
  const notes = cyclicCurveNotes(input.curve);
  if (!isFiniteNumber(S))
    notes.push({ code: 'invalid-input', severity: 'error', message: `${name} must be a finite stress.` });
  if (!isFiniteNumber(input.K) || input.K < 1)
    notes.push({
      code: 'invalid-input',
      severity: 'error',
      message: `The concentration factor must be a number >= 1 (got ${input.K}).`,
    });
  return notes;
}

/**
 * General yielding of the net section: the nominal stress reaches the yield strength, so the
 * notch root is no longer surrounded by elastic material and neither Neuber's nor Glinka's rule
 * applies. `Smax` is the largest nominal |S| of first loading; `dSmax` the largest nominal range.
 * First loading is compared with Sy (or, without it, the cyclic yield strength); ranges with
 * twice the cyclic yield strength (Masing: the net section reverse-yields beyond 2 S'y).
 */
export function generalYieldNotes(
  curve: CyclicCurve,
  Smax: number,
  dSmax: number,
  Sy?: number,
): MethodNote[] {
  const notes: MethodNote[] = [];
  if (!isUsableCurveQuick(curve)) return notes;
  const Syc = cyclicYieldKernel(curve);
  const limit = Sy !== undefined && isFiniteNumber(Sy) && Sy > 0 ? Sy : Syc;
  const limitName =
    limit === Syc
      ? `the cyclic yield strength S'y = K' 0.002^n' = ${fmt(Syc / MPA)} MPa`
      : `Sy = ${fmt(limit / MPA)} MPa`;
  if (Math.abs(Smax) > limit) {
    notes.push({
      code: 'general-yield',
      severity: 'error',
      message: `The nominal net-section stress |S| = ${fmt(Math.abs(Smax) / MPA)} MPa exceeds ${limitName}: the section yields as a whole (general yielding) and the notch rule does not apply. Use an elastic-plastic analysis of the section.`,
    });
  }
  if (dSmax > 2 * Syc) {
    notes.push({
      code: 'general-yield',
      severity: 'error',
      message: `The nominal stress range Delta S = ${fmt(dSmax / MPA)} MPa exceeds 2 S'y = ${fmt((2 * Syc) / MPA)} MPa: the net section yields in reversed loading and the notch rule does not apply.`,
    });
  }
  return notes;
}

function isUsableCurveQuick(curve: CyclicCurve): boolean {
  return !cyclicCurveNotes(curve).some((n) => n.severity === 'error');
}

function curveTerms(curve: CyclicCurve): Term[] {
  return [
    { name: 'E', value: curve.E / 1e9, unit: 'GPa' },
    { name: "K'", value: curve.K_prime / MPA, unit: 'MPa' },
    { name: "n'", value: curve.n_prime, unit: '' },
  ];
}

export type NotchRootResult = Computed & NotchPoint;
export type NotchRangeResult = Computed & NotchRange;

/** Notch-root stress (value) and strain for the first loading to a nominal stress S, with the derivation. */
export function notchRootFirstLoading(input: NotchInput, S: number): NotchRootResult {
  const { curve, rule, K, factor } = input;
  const formula =
    rule === 'glinka'
      ? "sigma^2/(2E) + sigma/(1+n') (sigma/K')^(1/n') = (K S)^2/(2E), eps = sigma/E + (sigma/K')^(1/n')"
      : "sigma eps = (K S)^2/E, eps = sigma/E + (sigma/K')^(1/n')";
  const source = notchSource(rule);
  const notes = inputNotes(input, S, 'S');
  if (notes.some((n) => n.severity === 'error'))
    return { ...computed(0, formula, source, undefined, notes), sigma: 0, eps: 0 };
  notes.push(notchFactorNote(rule, K, factor), ...generalYieldNotes(curve, S, 0, input.Sy));
  const e = K * S;
  const p = firstLoadingKernel(curve, rule, e);
  const terms: Term[] = [
    ...curveTerms(curve),
    { name: 'S', value: S / MPA, unit: 'MPa' },
    { name: factor, value: K, unit: '' },
    { name: `${factor} S`, value: e / MPA, unit: 'MPa' },
    { name: 'sigma', value: p.sigma / MPA, unit: 'MPa' },
    { name: 'eps', value: p.eps, unit: '' },
    rule === 'glinka'
      ? { name: 'W', value: cyclicEnergy(curve, p.sigma) / 1e6, unit: 'MJ/m^3' }
      : { name: 'sigma eps', value: (p.sigma * p.eps) / MPA, unit: 'MPa' },
  ];
  return { ...computed(p.sigma, formula, source, terms, notes), sigma: p.sigma, eps: p.eps };
}

/** Notch-root stress range (value) and strain range for a reversal of nominal range Delta S, with the derivation. */
export function notchRootReversal(input: NotchInput, dS: number): NotchRangeResult {
  const { curve, rule, K, factor } = input;
  const formula =
    rule === 'glinka'
      ? "Delta sigma^2/(2E) + 2 Delta sigma/(1+n') (Delta sigma/(2K'))^(1/n') = (K Delta S)^2/(2E), Delta eps = Delta sigma/E + 2 (Delta sigma/(2K'))^(1/n')"
      : "Delta sigma Delta eps = (K Delta S)^2/E, Delta eps = Delta sigma/E + 2 (Delta sigma/(2K'))^(1/n')";
  const source = notchSource(rule);
  const notes = inputNotes(input, dS, 'Delta S');
  if (isFiniteNumber(dS) && dS < 0)
    notes.push({ code: 'invalid-input', severity: 'error', message: 'Delta S must be a range >= 0.' });
  if (notes.some((n) => n.severity === 'error'))
    return { ...computed(0, formula, source, undefined, notes), dSigma: 0, dEps: 0 };
  notes.push(notchFactorNote(rule, K, factor), ...generalYieldNotes(curve, 0, dS));
  const r = reversalKernel(curve, rule, K * dS);
  const terms: Term[] = [
    ...curveTerms(curve),
    { name: 'Delta S', value: dS / MPA, unit: 'MPa' },
    { name: factor, value: K, unit: '' },
    { name: `${factor} Delta S`, value: (K * dS) / MPA, unit: 'MPa' },
    { name: 'Delta sigma', value: r.dSigma / MPA, unit: 'MPa' },
    { name: 'Delta eps', value: r.dEps, unit: '' },
  ];
  return { ...computed(r.dSigma, formula, source, terms, notes), dSigma: r.dSigma, dEps: r.dEps };
}
