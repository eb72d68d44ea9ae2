/**
 * Fatigue stress concentration factors.
 *
 * Kf = 1 + q (Kt - 1): Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed.,
 * Eq. (6-32) (same form for Kfs with qs and Kts, and for the axial Kf_ax).
 *
 * Mean-stress concentration with local yielding (Dowling's "nominal mean stress method", as
 * stated in Shigley, Sec. 6-12 / Eq. (6-56) family; equation number from memory):
 *   Kf |sigma_max| <  Sy:              Kfm = Kf
 *   Kf |sigma_max| >  Sy:              Kfm = (Sy - Kf sigma_a)/|sigma_m|
 *   Kf |sigma_max - sigma_min| > 2 Sy: Kfm = 0
 * with nominal sigma_max = |sigma_m| + sigma_a and range 2 sigma_a. sigma_m = 0 returns Kf
 * (no mean stress to concentrate; no division by zero).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote } from '../computed';

export type KfSymbol = 'Kf' | 'Kfs' | 'Kf_ax';

const SOURCE_KF = "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Eq. (6-32)";
const SOURCE_KFM =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12, nominal mean stress method (Dowling), Eq. (6-56) family (equation number from memory)";

const KT_OF: Record<KfSymbol, string> = { Kf: 'Kt', Kfs: 'Kts', Kf_ax: 'Kt_ax' };
const Q_OF: Record<KfSymbol, string> = { Kf: 'q', Kfs: 'qs', Kf_ax: 'q' };

/** Kf = 1 + q (Kt - 1). q outside [0, 1] and Kt < 1 are clamped with a note. */
export function fatigueNotchFactor(Kt: number, q: number, symbol: KfSymbol): Computed {
  const kt = KT_OF[symbol] ?? 'Kt';
  const qs = Q_OF[symbol] ?? 'q';
  const formula = `${symbol} = 1 + ${qs} (${kt} - 1)`;
  const notes: MethodNote[] = [];
  if (!isFiniteNumber(Kt) || !isFiniteNumber(q)) {
    const v = isFiniteNumber(Kt) && Kt >= 1 ? Kt : 1;
    return computed(v, formula, SOURCE_KF, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: `${kt} and ${qs} must be finite numbers; ${symbol} = ${isFiniteNumber(Kt) && Kt >= 1 ? kt : '1'} returned.`,
      },
    ]);
  }
  let ktU = Kt;
  let qU = q;
  if (ktU < 1) {
    notes.push({
      code: 'invalid-input',
      severity: 'error',
      message: `${kt} = ${Kt} < 1 is not a concentration; 1 used.`,
    });
    ktU = 1;
  }
  if (qU < 0 || qU > 1) {
    qU = Math.min(Math.max(qU, 0), 1);
    notes.push({
      code: 'invalid-input',
      severity: 'warning',
      message: `${qs} = ${q} is outside [0, 1]; ${qU} used.`,
    });
  }
  const kf = 1 + qU * (ktU - 1);
  return computed(
    kf,
    formula,
    SOURCE_KF,
    [
      { name: kt, value: ktU, unit: '' },
      { name: qs, value: qU, unit: '' },
    ],
    notes,
  );
}

/** Fatigue concentration factor to apply to the mean stress. Stresses in Pa (nominal). */
export function meanStressNotchFactor(p: {
  Kf: number;
  sigma_a: number;
  sigma_m: number;
  Sy: number;
  mode: 'full' | 'local-yield';
}): Computed {
  const { Kf, sigma_a, sigma_m, Sy, mode } = p;
  if (mode === 'full') {
    return computed(
      isFiniteNumber(Kf) ? Kf : 1,
      'Kfm = Kf (concentration applied to the mean stress in full, conservative)',
      "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12 (Kf applied to the mean stress)",
      [{ name: 'Kf', value: isFiniteNumber(Kf) ? Kf : 1, unit: '' }],
      isFiniteNumber(Kf)
        ? []
        : [{ code: 'invalid-input', severity: 'error', message: 'Kf must be finite; 1 used.' }],
    );
  }
  const formula =
    'Kfm = Kf if Kf |sigma_max| < Sy; (Sy - Kf sigma_a)/|sigma_m| if Kf |sigma_max| > Sy; 0 if Kf |sigma_max - sigma_min| > 2 Sy';
  if (![Kf, sigma_a, sigma_m, Sy].every(isFiniteNumber) || Kf < 1 || Sy <= 0) {
    return computed(isFiniteNumber(Kf) && Kf >= 1 ? Kf : 1, formula, SOURCE_KFM, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Kf >= 1, finite stresses and Sy > 0 are needed; Kfm = Kf returned (conservative).',
      },
    ]);
  }
  const sa = Math.abs(sigma_a);
  const sm = Math.abs(sigma_m);
  const sMax = sm + sa;
  const range = 2 * sa;
  const terms = [
    { name: 'Kf', value: Kf, unit: '' },
    { name: '|sigma_max|', value: sMax, unit: 'Pa' },
    { name: 'Kf |sigma_max|', value: Kf * sMax, unit: 'Pa' },
    { name: 'Kf |sigma_max - sigma_min|', value: Kf * range, unit: 'Pa' },
    { name: 'Sy', value: Sy, unit: 'Pa' },
  ];
  if (sm === 0) {
    return computed(Kf, formula, SOURCE_KFM, terms, [
      {
        code: 'zero-mean',
        severity: 'information',
        message: 'sigma_m = 0: Kfm = Kf (it multiplies a zero mean stress).',
      },
    ]);
  }
  if (Kf * range > 2 * Sy) {
    return computed(0, formula, SOURCE_KFM, terms, [
      {
        code: 'reversed-yielding',
        severity: 'warning',
        message:
          'Kf |sigma_max - sigma_min| > 2 Sy: the notch yields in both directions each cycle; Kfm = 0 (mean stress relaxed).',
      },
    ]);
  }
  if (Kf * sMax > Sy) {
    const kfm = (Sy - Kf * sa) / sm;
    return computed(kfm, formula, SOURCE_KFM, terms, [
      {
        code: 'local-yield',
        severity: 'information',
        message:
          'Kf |sigma_max| > Sy: the notch yields on the first cycle; Kfm = (Sy - Kf sigma_a)/|sigma_m|.',
      },
    ]);
  }
  return computed(Kf, formula, SOURCE_KFM, terms);
}
