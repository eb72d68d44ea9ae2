/**
 * The verification of a welded detail: the utilisation of the stress-range check at 2e6 cycles,
 * the interaction of normal and shear ranges, the damage utilisation, the stress-range limit
 * relative to yield, and the safety factor on stress range under constant amplitude.
 */
import { type Computed, computed, infinite, type MethodNote, MPA } from '../computed';
import { type WeldLoading, type WeldSnCurve, type WeldStandard, weldStrengthAtLife } from './snCurve';
import {
  EN_RANGE_LIMIT_SOURCE,
  EN_VERIFICATION_SOURCE,
  IIW_INTERACTION_SOURCE,
  IIW_RANGE_LIMIT_SOURCE,
} from './sources';
import { inputError, isFiniteNumber, isPositive, mpaTerm, mpaText, numTerm } from './weldNotes';

function val(x: number | Computed): number {
  return typeof x === 'number' ? x : x.value;
}

/** Utilisation gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf); <= 1 passes. */
export function rangeUtilisation(
  deltaE2: number | Computed,
  deltaC: number,
  gammaFf = 1,
  gammaMf = 1,
): Computed {
  const e = val(deltaE2);
  const formula = 'u = gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf)';
  const terms = [
    mpaTerm('Delta sigma_E,2', isFiniteNumber(e) ? e : 0),
    mpaTerm('Delta sigma_C', isFiniteNumber(deltaC) ? deltaC : 0),
    numTerm('gamma_Ff', gammaFf),
    numTerm('gamma_Mf', gammaMf),
  ];
  if (!(isFiniteNumber(e) && e >= 0) || !isPositive(deltaC) || !isPositive(gammaFf) || !isPositive(gammaMf))
    return computed(0, formula, EN_VERIFICATION_SOURCE, terms, [
      inputError('The equivalent range must be non-negative, the class and the partial factors positive.'),
    ]);
  const u = (gammaFf * e) / (deltaC / gammaMf);
  if (!Number.isFinite(u))
    return computed(0, formula, EN_VERIFICATION_SOURCE, terms, [
      inputError('The utilisation overflows: check the inputs.'),
    ]);
  return computed(u, formula, EN_VERIFICATION_SOURCE, terms);
}

/** Damage utilisation D / D_allow; <= 1 passes. */
export function damageUtilisation(D: number | Computed, Dallow: number | Computed): Computed {
  const d = val(D);
  const a = val(Dallow);
  const formula = 'u_D = D / D_allow';
  const terms = [numTerm('D', isFiniteNumber(d) ? d : 0), numTerm('D_allow', isFiniteNumber(a) ? a : 0)];
  if (!(isFiniteNumber(d) && d >= 0) || !isPositive(a))
    return computed(0, formula, 'Palmgren-Miner rule', terms, [
      inputError('D must be non-negative and D_allow positive.'),
    ]);
  return computed(d / a, formula, 'Palmgren-Miner rule (Miner, J. Appl. Mech. 12, 1945)', terms);
}

/**
 * EN 1993-1-9 Eq. (8.3): u_sigma^3 + u_tau^5 <= 1, with u the utilisations of Eq. (8.2) (each
 * gamma_Ff Delta_E,2 / (Delta_C / gamma_Mf)).
 */
export function enInteraction(uSigma: number | Computed, uTau: number | Computed): Computed {
  const s = val(uSigma);
  const t = val(uTau);
  const formula =
    '(gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf))^3 + (gamma_Ff Delta tau_E,2 / (Delta tau_C / gamma_Mf))^5';
  const terms = [numTerm('u_sigma', isFiniteNumber(s) ? s : 0), numTerm('u_tau', isFiniteNumber(t) ? t : 0)];
  if (!(isFiniteNumber(s) && s >= 0 && isFiniteNumber(t) && t >= 0 && s <= 1e6 && t <= 1e6))
    return computed(0, formula, EN_VERIFICATION_SOURCE, terms, [
      inputError('Both utilisations must be finite, non-negative and at most 1e6.'),
    ]);
  const notes: MethodNote[] = [];
  if (s > 1 || t > 1)
    notes.push({
      code: 'interaction-single',
      severity: 'warning',
      message: 'One of the ranges fails its own verification (Eq. 8.2) before the interaction is considered.',
    });
  return computed(s ** 3 + t ** 5, formula, EN_VERIFICATION_SOURCE, terms, notes);
}

/**
 * IIW comparison: (u_sigma^2 + u_tau^2) / CV <= 1, CV = 1.0 proportional, 0.5 non-proportional.
 */
export function iiwInteraction(
  uSigma: number | Computed,
  uTau: number | Computed,
  proportional: boolean,
): Computed {
  const s = val(uSigma);
  const t = val(uTau);
  const CV = proportional ? 1 : 0.5;
  const formula = '((Delta sigma_S,d / Delta sigma_R,d)^2 + (Delta tau_S,d / Delta tau_R,d)^2) / CV';
  const terms = [
    numTerm('u_sigma', isFiniteNumber(s) ? s : 0),
    numTerm('u_tau', isFiniteNumber(t) ? t : 0),
    numTerm('CV', CV),
  ];
  if (!(isFiniteNumber(s) && s >= 0 && isFiniteNumber(t) && t >= 0 && s <= 1e6 && t <= 1e6))
    return computed(0, formula, IIW_INTERACTION_SOURCE, terms, [
      inputError('Both utilisations must be finite, non-negative and at most 1e6.'),
    ]);
  return computed((s ** 2 + t ** 2) / CV, formula, IIW_INTERACTION_SOURCE, terms, [
    {
      code: 'from-memory',
      severity: 'information',
      message:
        'The IIW comparison values rest on a recalled copy of the recommendations: check them against the edition in use.',
    },
  ]);
}

export type WeldStressType = 'nominal' | 'hot-spot' | 'notch' | 'throat';

/**
 * Stress range against the standard's limit relative to yield: value = Delta / limit; above 1 an
 * error (the detail yields in each cycle and the curves do not apply).
 */
export function stressRangeLimit(
  standard: WeldStandard,
  range: number,
  fy: number,
  stress: 'normal' | 'shear',
  stressType: WeldStressType = 'nominal',
): Computed {
  const source = standard === 'EN 1993-1-9' ? EN_RANGE_LIMIT_SOURCE : IIW_RANGE_LIMIT_SOURCE;
  const k =
    stress === 'shear' ? 1.5 / Math.sqrt(3) : standard === 'IIW' && stressType === 'hot-spot' ? 2 : 1.5;
  const formula = stress === 'shear' ? 'Delta tau / (1.5 fy / sqrt(3))' : `Delta sigma / (${k} fy)`;
  const terms = [
    mpaTerm('Delta', isFiniteNumber(range) ? range : 0),
    mpaTerm('fy', isFiniteNumber(fy) ? fy : 0),
  ];
  if (!(isFiniteNumber(range) && range >= 0) || !isPositive(fy) || fy < 10 * MPA || fy > 3000 * MPA)
    return computed(0, formula, source, terms, [
      inputError('The range must be non-negative and fy a yield strength between 10 and 3000 MPa.'),
    ]);
  const limit = k * fy;
  terms.push(mpaTerm('limit', limit));
  const notes: MethodNote[] = [];
  if (stressType === 'notch')
    notes.push({
      code: 'range-limit-type',
      severity: 'information',
      message:
        'A notch stress is a fictitious elastic stress: the yield limit of nominal ranges does not apply to it; the limit shown is for the nominal range.',
    });
  if (range > limit)
    notes.push({
      code: 'stress-range-limit',
      severity: 'error',
      message: `The range ${mpaText(range)} exceeds the limit ${mpaText(limit)} relative to yield: the detail yields every cycle and the S-N curves do not apply.`,
    });
  return computed(range / limit, formula, source, terms, notes);
}

/**
 * Safety factor on stress range for constant amplitude: the design range at the required cycles
 * over the applied range, s = Delta sigma_R(N) / (gamma_Mf gamma_Ff Delta sigma).
 */
export function constantAmplitudeSafetyFactor(
  curve: WeldSnCurve,
  range: number,
  N: number,
  loading: WeldLoading = 'constant',
  gammaFf = 1,
  gammaMf = 1,
): Computed {
  const R = weldStrengthAtLife(curve, N, loading);
  const formula = 's = Delta sigma_R(N) / (gamma_Mf gamma_Ff Delta sigma)';
  const terms = [
    mpaTerm('Delta sigma_R(N)', R.value),
    mpaTerm('Delta sigma', isFiniteNumber(range) ? range : 0),
    numTerm('N', N),
    numTerm('gamma_Ff', gammaFf),
    numTerm('gamma_Mf', gammaMf),
  ];
  const errors = (R.notes ?? []).filter((n) => n.severity === 'error');
  if (!(isFiniteNumber(range) && range >= 0))
    errors.push(inputError('The stress range must be finite and non-negative.'));
  if (!isPositive(gammaFf) || !isPositive(gammaMf))
    errors.push(inputError('The partial factors must be positive.'));
  if (errors.length > 0) return computed(0, formula, curve?.source ?? '', terms, errors);
  if (range === 0)
    return infinite(formula, curve.source, terms, [
      {
        code: 'no-damage',
        severity: 'information',
        message: 'No stress range: the safety factor is unbounded.',
      },
    ]);
  return computed(R.value / (gammaMf * gammaFf * range), formula, curve.source, terms, R.notes);
}
