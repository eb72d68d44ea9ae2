/**
 * Damage of a stress-range spectrum on a welded detail's curve: the Palmgren-Miner sum on the
 * design curve (ranges times gamma_Ff, curve divided by gamma_Mf), the equivalent
 * constant-amplitude range at 2e6 cycles, the permissible damage sum, the life and the safety
 * factor on stress range.
 *
 * Cycles come as (range, count) pairs: spectrum levels, or the rainflow counter's cycles
 * (`RainflowCycle` has `range` and `count`; `WeldDamageAccumulator.onCycle` is a ready
 * `RainflowOptions.onCycle`). The knee is treated as the loading says: under constant amplitude
 * a range below the fatigue limit does no damage; under variable amplitude the curve's second
 * slope applies down to its cut-off. A spectrum of more than one range is variable amplitude
 * whatever the caller says.
 */
import { type Computed, computed, infinite, type MethodNote, type Term } from '../computed';
import { lifeKernel, type WeldLoading, type WeldSnCurve, type WeldStandard } from './snCurve';
import { EN_DAMAGE_SOURCE, EQUIVALENT_RANGE_SOURCE, IIW_DAMAGE_SOURCE } from './sources';
import { cyclesText, inputError, isPositive, mpaTerm, mpaText, numTerm } from './weldNotes';

export interface RangeCount {
  /** Stress range, Pa. */
  range: number;
  count: number;
}

export interface WeldDamageOptions {
  /** Default `variable`. */
  loading?: WeldLoading;
  gammaFf?: number;
  gammaMf?: number;
  maxContributors?: number;
}

export interface WeldDamageContributor {
  /** Largest range of the band (the exact level when all its cycles share one), Pa. */
  range: number;
  rangeMin: number;
  count: number;
  damage: number;
  share: number;
}

export type WeldDamageResult = Computed & {
  D: number;
  cycles: number;
  damagingCycles: number;
  /** Largest range seen (before gamma_Ff), Pa. */
  rangeMax: number;
  contributors: WeldDamageContributor[];
  /** The treatment of the knee used. */
  loading: WeldLoading;
};

const BAND_LOG = Math.log(1.01);

interface Band {
  min: number;
  max: number;
  count: number;
  damage: number;
}

function damageSource(curve: WeldSnCurve): string {
  return curve.standard === 'EN 1993-1-9' ? EN_DAMAGE_SOURCE : `${IIW_DAMAGE_SOURCE}; curve: ${curve.source}`;
}

/** Streaming damage sum; memory bounded by 1 % range bands. */
export class WeldDamageAccumulator {
  private readonly design: WeldSnCurve;
  private readonly gammaFf: number;
  private readonly gammaMf: number;
  private readonly requested: WeldLoading;
  private readonly errors: MethodNote[] = [];
  private readonly bands = { constant: new Map<number, Band>(), variable: new Map<number, Band>() };
  private readonly D = { constant: 0, variable: 0 };
  private readonly damaging = { constant: 0, variable: 0 };
  private cycles = 0;
  private invalid = 0;
  private rangeMax = 0;
  private firstRange = Number.NaN;
  private distinct = false;
  private belowCutOff = 0;
  private zeroRange = 0;

  constructor(curve: WeldSnCurve, opts: WeldDamageOptions = {}) {
    this.gammaFf = opts.gammaFf ?? 1;
    this.gammaMf = opts.gammaMf ?? 1;
    this.requested = opts.loading ?? 'variable';
    if (!curve || !(curve.deltaC > 0))
      this.errors.push(inputError('The S-N curve has no usable class: state the detail class.'));
    if (!(isPositive(this.gammaFf) && isPositive(this.gammaMf)))
      this.errors.push(inputError('The partial factors must be positive numbers.'));
    const f = this.errors.length > 0 ? 1 : 1 / this.gammaMf;
    this.design = curve
      ? {
          ...curve,
          deltaC: curve.deltaC * f,
          deltaD: curve.deltaD * f,
          deltaL: curve.deltaL === null ? null : curve.deltaL * f,
        }
      : curve;
  }

  /** `RainflowOptions.onCycle` shape: (range, mean, count). */
  readonly onCycle = (range: number, _mean: number, count: number): void => this.add(range, count);

  add(range: number, count: number): void {
    if (
      !(
        Number.isFinite(range) &&
        Number.isFinite(count) &&
        range >= 0 &&
        count >= 0 &&
        range <= 1e12 &&
        count <= 1e20
      )
    ) {
      this.invalid++;
      return;
    }
    if (count === 0) return;
    this.cycles += count;
    if (range > this.rangeMax) this.rangeMax = range;
    if (Number.isNaN(this.firstRange)) this.firstRange = range;
    else if (range !== this.firstRange) this.distinct = true;
    if (range === 0) this.zeroRange += count;
    if (this.errors.length > 0 || range === 0) return;
    const s = range * this.gammaFf;
    if (this.design.deltaL !== null && s < this.design.deltaL) this.belowCutOff += count;
    for (const loading of ['constant', 'variable'] as const) {
      const N = lifeKernel(this.design, s, loading);
      if (!Number.isFinite(N)) continue;
      const d = count / N;
      this.D[loading] += d;
      this.damaging[loading] += count;
      const key = Math.floor(Math.log(range) / BAND_LOG);
      const map = this.bands[loading];
      const b = map.get(key);
      if (b === undefined) map.set(key, { min: range, max: range, count, damage: d });
      else {
        if (range < b.min) b.min = range;
        if (range > b.max) b.max = range;
        b.count += count;
        b.damage += d;
      }
    }
  }

  result(maxContributors = 10): WeldDamageResult {
    const c = this.design;
    const notes: MethodNote[] = [...this.errors];
    let loading = this.requested;
    if (loading === 'constant' && this.distinct) {
      loading = 'variable';
      notes.push({
        code: 'variable-amplitude',
        severity: 'warning',
        message:
          'The cycles have more than one range: the variable-amplitude treatment of the knee is used (ranges below the constant-amplitude fatigue limit do damage).',
      });
    }
    const D = this.errors.length > 0 ? 0 : this.D[loading];
    const m2 = loading === 'constant' ? c?.m2Constant : c?.m2Variable;
    const terms: Term[] = [];
    if (c) {
      terms.push(
        mpaTerm('Delta sigma_C / gamma_Mf', c.deltaC),
        numTerm('m1', c.m1),
        mpaTerm('Delta sigma_D / gamma_Mf', c.deltaD),
        numTerm('N_D', c.ND),
      );
      if (m2 !== null && m2 !== undefined) terms.push(numTerm('m2', m2));
      if (c.deltaL !== null) terms.push(mpaTerm('Delta sigma_L / gamma_Mf', c.deltaL));
    }
    terms.push(
      numTerm('gamma_Ff', this.gammaFf),
      numTerm('gamma_Mf', this.gammaMf),
      numTerm('cycles', this.cycles),
    );
    if (this.errors.length === 0) {
      if (this.belowCutOff > 0)
        notes.push({
          code: 'below-cut-off',
          severity: 'information',
          message: `${cyclesText(this.belowCutOff)} cycles are below the cut-off ${mpaText(c.deltaL ?? 0)} (design curve) and do no damage.`,
        });
      const belowKnee = this.cycles - this.damaging[loading] - this.belowCutOff - this.zeroRange;
      if (belowKnee > 1e-9 * this.cycles && m2 === null)
        notes.push({
          code: 'below-knee',
          severity: 'information',
          message: `${cyclesText(belowKnee)} cycles are below the ${loading === 'constant' ? 'constant-amplitude fatigue limit' : 'knee'} and do no damage.`,
        });
    }
    if (this.invalid > 0)
      notes.push({
        code: 'input-invalid',
        severity: 'warning',
        message: `${this.invalid} cycle record${this.invalid === 1 ? '' : 's'} with a non-finite, negative or absurd range (above 1e6 MPa) or count (above 1e20) ignored.`,
      });
    const contributors = [...this.bands[loading].values()]
      .sort((x, y) => y.damage - x.damage)
      .slice(0, Math.max(0, maxContributors))
      .map((b) => ({
        range: b.max,
        rangeMin: b.min,
        count: b.count,
        damage: b.damage,
        share: D > 0 ? b.damage / D : 0,
      }));
    const formula =
      m2 === null || m2 === undefined
        ? 'D = sum(n_i / N_i), N_i = N_C (Delta sigma_C,d / (gamma_Ff Delta sigma_i))^m1 above the knee, no damage below'
        : c?.deltaL !== null && c?.deltaL !== undefined
          ? 'D = sum(n_i / N_i), N_i = N_C (Delta sigma_C,d / (gamma_Ff Delta sigma_i))^m1 above Delta sigma_D, N_D (Delta sigma_D,d / (gamma_Ff Delta sigma_i))^m2 down to Delta sigma_L, no damage below'
          : 'D = sum(n_i / N_i), N_i = N_C (Delta sigma_C,d / (gamma_Ff Delta sigma_i))^m1 above Delta sigma_D, N_D (Delta sigma_D,d / (gamma_Ff Delta sigma_i))^m2 below';
    return {
      ...computed(D, formula, c ? damageSource(c) : EN_DAMAGE_SOURCE, terms, notes),
      D,
      cycles: this.cycles,
      damagingCycles: this.errors.length > 0 ? 0 : this.damaging[loading],
      rangeMax: this.rangeMax,
      contributors,
      loading,
    };
  }
}

/** Damage of a set of (range, count) pairs on the detail's design curve. */
export function weldDamage(
  curve: WeldSnCurve,
  cycles: Iterable<RangeCount>,
  opts: WeldDamageOptions = {},
): WeldDamageResult {
  const acc = new WeldDamageAccumulator(curve, opts);
  for (const c of cycles) acc.add(c.range, c.count);
  return acc.result(opts.maxContributors);
}

/**
 * Equivalent constant-amplitude range at N_C = 2e6 cycles from the damage D on the design curve:
 * Delta sigma_E,2 = (Delta sigma_C / (gamma_Mf gamma_Ff)) D^(1/m1). (For shear, m1 = 5.)
 */
export function equivalentRange(
  D: number | Computed,
  curve: WeldSnCurve,
  gammaFf = 1,
  gammaMf = 1,
): Computed {
  const d = typeof D === 'number' ? D : D.value;
  const formula = 'Delta sigma_E,2 = (Delta sigma_C / (gamma_Mf gamma_Ff)) D^(1/m1)';
  const terms: Term[] = [
    numTerm('D', Number.isFinite(d) ? d : 0),
    mpaTerm('Delta sigma_C', curve?.deltaC ?? 0),
    numTerm('m1', curve?.m1 ?? 0),
    numTerm('gamma_Ff', gammaFf),
    numTerm('gamma_Mf', gammaMf),
  ];
  if (!(Number.isFinite(d) && d >= 0))
    return computed(0, formula, EQUIVALENT_RANGE_SOURCE, terms, [
      inputError('The damage sum must be a finite, non-negative number.'),
    ]);
  if (!curve || !(curve.deltaC > 0) || !isPositive(gammaFf) || !isPositive(gammaMf))
    return computed(0, formula, EQUIVALENT_RANGE_SOURCE, terms, [
      inputError('The curve and partial factors must be usable.'),
    ]);
  const v = (curve.deltaC / (gammaMf * gammaFf)) * d ** (1 / curve.m1);
  const notes: MethodNote[] = [];
  if (v * gammaFf < curve.deltaD / gammaMf && d > 0)
    notes.push({
      code: 'equivalent-below-knee',
      severity: 'information',
      message:
        'Delta sigma_E,2 lies below the knee: it is read on the m1 branch extended, as the definition at 2e6 cycles asks; 2e6 cycles of it would do less damage on the curve itself.',
    });
  return computed(v, formula, EQUIVALENT_RANGE_SOURCE, terms, notes);
}

/** Permissible damage sum: EN 1.0; IIW 0.5, 0.2 for non-proportional loading; a stated value wins. */
export function permissibleDamage(
  standard: WeldStandard,
  opts: { proportional?: boolean; stated?: number } = {},
): Computed {
  const source = standard === 'EN 1993-1-9' ? EN_DAMAGE_SOURCE : IIW_DAMAGE_SOURCE;
  if (opts.stated !== undefined) {
    if (!(Number.isFinite(opts.stated) && opts.stated > 0 && opts.stated <= 1))
      return computed(0.5, 'D_allow (stated)', source, undefined, [
        inputError(
          'The permissible damage sum must lie in (0, 1]: above 1 it removes the margin of the Miner rule.',
        ),
      ]);
    const notes: MethodNote[] = [];
    if (standard === 'IIW' && opts.stated > (opts.proportional === false ? 0.2 : 0.5))
      notes.push({
        code: 'damage-sum-above-recommended',
        severity: 'warning',
        message: `D_allow = ${opts.stated} is above the IIW recommendation (${opts.proportional === false ? '0.2 for non-proportional loading' : '0.5'}).`,
      });
    return computed(opts.stated, 'D_allow (stated in the note)', source, undefined, notes);
  }
  if (standard === 'EN 1993-1-9')
    return computed(1, 'D_allow = 1.0', source, undefined, [
      {
        code: 'defaulted-damage-sum',
        severity: 'warning',
        message:
          'D_allow not stated: EN 1993-1-9 verifies D_d <= 1.0 on the design curve. State D_allow to confirm.',
      },
    ]);
  const nonProp = opts.proportional === false;
  return computed(
    nonProp ? 0.2 : 0.5,
    nonProp ? 'D_allow = 0.2 (non-proportional loading)' : 'D_allow = 0.5',
    source,
    undefined,
    [
      {
        code: 'defaulted-damage-sum',
        severity: 'warning',
        message: `D_allow not stated: the IIW recommendation ${nonProp ? '0.2 (non-proportional loading)' : '0.5'} is taken. State D_allow.`,
      },
      {
        code: 'from-memory',
        severity: 'information',
        message:
          'The IIW permissible damage sums rest on a recalled copy of the recommendations: check them against the edition in use.',
      },
    ],
  );
}

/** Repeats of the spectrum (blocks) until the permissible damage: D_allow / D; infinite when D = 0. */
export function blocksToLimit(D: number | Computed, Dallow: number | Computed): Computed {
  const d = typeof D === 'number' ? D : D.value;
  const a = typeof Dallow === 'number' ? Dallow : Dallow.value;
  const formula = 'blocks = D_allow / D';
  const terms = [numTerm('D', Number.isFinite(d) ? d : 0), numTerm('D_allow', Number.isFinite(a) ? a : 0)];
  const source = 'Palmgren-Miner rule: failure when D reaches D_allow (Miner, J. Appl. Mech. 12, 1945)';
  if (!(Number.isFinite(d) && d >= 0) || !isPositive(a))
    return computed(0, formula, source, terms, [
      inputError('D must be finite and non-negative, D_allow positive.'),
    ]);
  if (d === 0)
    return infinite(formula, source, terms, [
      {
        code: 'no-damage',
        severity: 'information',
        message: 'No cycle does damage: the spectrum can be repeated without end.',
      },
    ]);
  const blocks = a / d;
  if (!(blocks < 1e300))
    return infinite(formula, source, terms, [
      {
        code: 'no-damage',
        severity: 'information',
        message: 'The damage is too small to count: treated as none.',
      },
    ]);
  return computed(blocks, formula, source, terms);
}

/** Life in cycles: the spectrum's cycles times its repeats to the permissible damage. */
export function cyclesToLimit(
  D: number | Computed,
  spectrumCycles: number,
  Dallow: number | Computed,
): Computed {
  const blocks = blocksToLimit(D, Dallow);
  const formula = 'N_life = (D_allow / D) sum(n_i)';
  const terms = [
    ...(blocks.terms ?? []),
    numTerm('sum(n_i)', Number.isFinite(spectrumCycles) ? spectrumCycles : 0),
  ];
  if (!(Number.isFinite(spectrumCycles) && spectrumCycles >= 0))
    return computed(0, formula, blocks.source, terms, [
      inputError('The cycle count must be finite and non-negative.'),
    ]);
  if (blocks.notes?.some((n) => n.severity === 'error'))
    return computed(0, formula, blocks.source, terms, blocks.notes);
  if (blocks.infinite) return infinite(formula, blocks.source, terms, blocks.notes);
  return computed(blocks.value * spectrumCycles, formula, blocks.source, terms);
}

/**
 * Safety factor on stress range: the factor s by which every range may grow before the damage on
 * the design curve reaches D_allow (the largest s with D(s) <= D_allow, found by bisection; the
 * damage can jump at the fatigue limit and the cut-off, so the reported s never exceeds the jump).
 */
export function rangeSafetyFactor(
  curve: WeldSnCurve,
  cycles: Iterable<RangeCount>,
  Dallow: number,
  opts: WeldDamageOptions = {},
): Computed {
  const list = [...cycles];
  const formula = 's such that D(s Delta sigma_i) = D_allow on the design curve';
  const source = curve ? damageSource(curve) : EN_DAMAGE_SOURCE;
  const base = weldDamage(curve, list, opts);
  const terms: Term[] = [numTerm('D_allow', isPositive(Dallow) ? Dallow : 0), numTerm('D', base.D)];
  const errors = (base.notes ?? []).filter((n) => n.severity === 'error');
  if (!isPositive(Dallow)) errors.push(inputError('D_allow must be a positive number.'));
  if (errors.length > 0) return computed(0, formula, source, terms, errors);
  const damageAt = (s: number) =>
    weldDamage(
      curve,
      list.map((c) => ({ range: c.range * s, count: c.count })),
      { ...opts, maxContributors: 0 },
    ).D;
  let lo = 1e-6;
  const rangeMax = list.reduce((m, c) => (Number.isFinite(c.range) && c.range > m ? c.range : m), 0);
  let hi = rangeMax > 0 ? Math.min(1e6, 1e12 / rangeMax) : 1e6;
  const dHi = damageAt(hi);
  if (dHi === 0)
    return infinite(formula, source, terms, [
      {
        code: 'no-damage',
        severity: 'information',
        message:
          'No factor on the ranges brings the damage to D_allow (no range does damage): the safety factor is unbounded.',
      },
    ]);
  if (dHi <= Dallow)
    return computed(
      hi,
      formula,
      source,
      [...terms, numTerm('s', hi)],
      [
        {
          code: 'range-factor-bound',
          severity: 'information',
          message: `The damage stays below D_allow up to ranges of 1e6 MPa: the safety factor is at least ${hi.toPrecision(3)}.`,
        },
      ],
    );
  if (damageAt(lo) > Dallow)
    return computed(lo, formula, source, terms, [inputError('The spectrum exceeds D_allow at any factor.')]);
  for (let i = 0; i < 200 && hi / lo > 1 + 1e-12; i++) {
    const mid = Math.sqrt(lo * hi);
    if (damageAt(mid) <= Dallow) lo = mid;
    else hi = mid;
  }
  terms.push(numTerm('s', lo));
  return computed(
    lo,
    formula,
    source,
    terms,
    base.notes?.filter((n) => n.code === 'variable-amplitude'),
  );
}
