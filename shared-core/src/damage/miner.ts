import { type Computed, computed, infinite, type MethodNote, MPA, type Term } from '../computed';

/**
 * Palmgren-Miner linear damage sum D = sum(n_i / N_i) with three treatments of the S-N line
 * below its knee (the endurance limit Se at N2):
 *
 * - `original`: Miner's rule as stated: cycles below the knee do no damage.
 * - `elementary`: the finite-life line continued below the knee (no endurance limit).
 * - `haibach`: below the knee the line continues with the flatter slope k' = 2k - 1, where
 *   k = 1/|b| is the slope exponent of the finite-life line (N = N2 (S2/S)^k above the knee,
 *   N = N2 (S2/S)^(2k-1) below it). E. Haibach, Betriebsfestigkeit, 3rd ed., Springer 2006,
 *   p. 291, eq. (3.21-61) (the lifetime multiple of "Miner modifiziert", as cited by the
 *   pyLife implementation MinerHaibach); the same rule in M. Wächter, C. Müller, A. Esderts,
 *   Angewandter Festigkeitsnachweis nach FKM-Richtlinie, Springer 2017. Eurocode 3
 *   (EN 1993-1-9, Fig. 7.1, from memory) uses the same kind of slope change, m = 3 above and
 *   m = 5 (= 2*3 - 1) below the constant-amplitude limit, with a cut-off at 1e8 cycles that
 *   this rule does not apply.
 *
 * The S-N line is sigma_ar = a N^b (stress in Pa), a finite-life line from N1 = 1e3 to the
 * knee N2 at S2 (Basquin; Budynas and Nisbett, Shigley's Mechanical Engineering Design,
 * 10th ed., sec. 6-7; equation numbers not cited, from memory). `sigma_ar` of each cycle is its fully reversed equivalent
 * amplitude, already corrected for mean stress by the chosen criterion.
 * Cycles above the line's 1e3 end are counted with N from the same line (N < 1e3) and a note.
 */
export type MinerRule = 'original' | 'elementary' | 'haibach';

export interface SnLine {
  /** sigma_ar = a * N^b: coefficient, Pa. */
  a: number;
  /** Exponent (negative). */
  b: number;
  /** Cycles at the knee (e.g. 1e6). */
  N2: number;
  /** Amplitude at the knee (the endurance limit), Pa. */
  S2: number;
  /** False for materials with no endurance limit: the line goes on below N2 whatever the rule. */
  hasKnee: boolean;
}

export interface DamageCycle {
  /** Fully reversed equivalent amplitude, Pa. */
  sigma_ar: number;
  /** Number of cycles (1 or 0.5 from rainflow, any n from a spectrum). */
  count: number;
}

export interface DamageContributor {
  /** Largest amplitude in the contributor's band (the exact level when all its cycles share one), Pa. */
  sigma_ar: number;
  /** Smallest amplitude in the band, Pa. */
  sigma_ar_min: number;
  count: number;
  damage: number;
  /** damage / D. */
  share: number;
}

export type MinerResult = Computed & {
  D: number;
  contributors: DamageContributor[];
  /** Sum of all counts given. */
  cycles: number;
  /** Sum of the counts that did damage. */
  damagingCycles: number;
  /** Largest amplitude seen (the level for N_eq), Pa. */
  sigma_ar_max: number;
};

/** Low-cycle end of the S-N line. */
export const N1_LOW_CYCLE = 1e3;

export const MINER_SOURCE =
  'Palmgren-Miner rule (Miner, Cumulative damage in fatigue, J. Appl. Mech. 12 (1945)); S-N line after Budynas and Nisbett, ' +
  "Shigley's Mechanical Engineering Design, 10th ed., sec. 6-7; Haibach rule: E. Haibach, Betriebsfestigkeit, " +
  '3rd ed., Springer 2006, p. 291, eq. (3.21-61), slope 2k-1 below the knee';

/** Width of a contributor band: amplitudes within 1 % (geometric) are grouped. */
const BAND_LOG = Math.log(1.01);

interface Band {
  sMin: number;
  sMax: number;
  count: number;
  damage: number;
}

function lineErrors(line: SnLine): MethodNote[] {
  const notes: MethodNote[] = [];
  const bad = (what: string) =>
    notes.push({
      code: 'sn-line-invalid',
      severity: 'error',
      message: `The S-N line is not usable: ${what}.`,
    });
  if (!(Number.isFinite(line.a) && line.a > 0)) bad('the coefficient a must be a positive stress');
  if (!(Number.isFinite(line.b) && line.b < 0)) bad('the exponent b must be negative');
  if (line.hasKnee) {
    if (!(Number.isFinite(line.N2) && line.N2 > N1_LOW_CYCLE)) bad('the knee N2 must lie above 1e3 cycles');
    if (!(Number.isFinite(line.S2) && line.S2 > 0)) bad('the knee amplitude S2 must be positive');
  }
  return notes;
}

/** Life at one amplitude under the rule: the per-cycle kernel, no notes. Infinity when no damage. */
function lifeAt(s: number, line: SnLine, rule: MinerRule, k: number): number {
  if (!(s > 0)) return Number.POSITIVE_INFINITY;
  if (line.hasKnee && s < line.S2) {
    if (rule === 'original') return Number.POSITIVE_INFINITY;
    if (rule === 'haibach') return line.N2 * (line.S2 / s) ** (2 * k - 1);
  }
  return (s / line.a) ** (1 / line.b);
}

/**
 * Cycles to failure at one fully reversed amplitude under the chosen rule. Infinite below
 * the knee with the original rule (or for a zero amplitude).
 */
export function cyclesToFailure(sigma_ar: number, line: SnLine, rule: MinerRule = 'original'): Computed {
  const errors = lineErrors(line);
  const k = -1 / line.b;
  const terms: Term[] = [
    { name: 'sigma_ar', value: sigma_ar / MPA, unit: 'MPa' },
    { name: 'a', value: line.a / MPA, unit: 'MPa' },
    { name: 'b', value: line.b, unit: '' },
  ];
  if (errors.length > 0) return computed(0, 'N = (sigma_ar / a)^(1/b)', MINER_SOURCE, terms, errors);
  if (!(Number.isFinite(sigma_ar) && sigma_ar >= 0)) {
    return computed(0, 'N = (sigma_ar / a)^(1/b)', MINER_SOURCE, terms, [
      {
        code: 'input-invalid',
        severity: 'error',
        message: 'The amplitude must be a finite, non-negative stress.',
      },
    ]);
  }
  const below = line.hasKnee && sigma_ar < line.S2;
  const formula =
    below && rule === 'haibach'
      ? 'N = N2 * (S2 / sigma_ar)^(2k - 1), k = -1/b'
      : below && rule === 'original'
        ? 'sigma_ar < S2: no damage (infinite life)'
        : 'N = (sigma_ar / a)^(1/b)';
  if (below)
    terms.push({ name: 'S2', value: line.S2 / MPA, unit: 'MPa' }, { name: 'N2', value: line.N2, unit: '' });
  if (below && rule === 'haibach') terms.push({ name: "k'", value: 2 * k - 1, unit: '' });
  const N = lifeAt(sigma_ar, line, rule, k);
  if (!Number.isFinite(N)) return infinite(formula, MINER_SOURCE, terms);
  const notes: MethodNote[] = [];
  if (N < N1_LOW_CYCLE) notes.push(lowCycleNote(1));
  return computed(N, formula, MINER_SOURCE, terms, notes);
}

function lowCycleNote(count: number): MethodNote {
  return {
    code: 'low-cycle',
    severity: 'warning',
    message: `${formatCount(count)} cycle${count === 1 ? '' : 's'} lie above the S-N line's 1e3-cycle end: counted with N from the same line extrapolated below 1e3 cycles; low-cycle (strain-life) methods apply there.`,
  };
}

function formatCount(n: number): string {
  return Number.isInteger(n) ? String(n) : n.toPrecision(6).replace(/\.?0+$/, '');
}

/**
 * Streaming Miner sum: `add` each counted cycle (or spectrum level); `result()` at the end.
 * Memory is bounded: contributors are grouped into 1 % amplitude bands.
 */
export class MinerAccumulator {
  private readonly line: SnLine;
  private readonly rule: MinerRule;
  private readonly k: number;
  private readonly S1: number;
  private readonly errors: MethodNote[];
  private readonly bands = new Map<number, Band>();
  private D = 0;
  private cycles = 0;
  private damaging = 0;
  private belowKnee = 0;
  private lowCycle = 0;
  private invalid = 0;
  private sMax = 0;

  constructor(line: SnLine, rule: MinerRule = 'original') {
    this.line = line;
    this.rule = rule;
    this.errors = lineErrors(line);
    this.k = -1 / line.b;
    this.S1 = line.a * N1_LOW_CYCLE ** line.b;
  }

  /** Adds `count` cycles of fully reversed amplitude `sigma_ar` (Pa). */
  add(sigma_ar: number, count: number): void {
    if (!(Number.isFinite(sigma_ar) && Number.isFinite(count) && sigma_ar >= 0 && count >= 0)) {
      this.invalid++;
      return;
    }
    if (count === 0) return;
    this.cycles += count;
    if (sigma_ar > this.sMax) this.sMax = sigma_ar;
    if (this.errors.length > 0) return;
    const N = lifeAt(sigma_ar, this.line, this.rule, this.k);
    if (this.line.hasKnee && sigma_ar < this.line.S2 && sigma_ar > 0) this.belowKnee += count;
    if (!Number.isFinite(N)) return;
    if (sigma_ar > this.S1) this.lowCycle += count;
    const d = count / N;
    this.D += d;
    this.damaging += count;
    const key = Math.floor(Math.log(sigma_ar) / BAND_LOG);
    const band = this.bands.get(key);
    if (band === undefined) this.bands.set(key, { sMin: sigma_ar, sMax: sigma_ar, count, damage: d });
    else {
      if (sigma_ar < band.sMin) band.sMin = sigma_ar;
      if (sigma_ar > band.sMax) band.sMax = sigma_ar;
      band.count += count;
      band.damage += d;
    }
  }

  /** The damage sum with its largest contributors (default the 10 largest bands). */
  result(maxContributors = 10): MinerResult {
    const line = this.line;
    const terms: Term[] = [
      { name: 'a', value: line.a / MPA, unit: 'MPa' },
      { name: 'b', value: line.b, unit: '' },
      { name: 'k', value: this.k, unit: '' },
    ];
    if (line.hasKnee) {
      terms.push({ name: 'S2', value: line.S2 / MPA, unit: 'MPa' }, { name: 'N2', value: line.N2, unit: '' });
      if (this.rule === 'haibach') terms.push({ name: "k'", value: 2 * this.k - 1, unit: '' });
    }
    terms.push({ name: 'cycles', value: this.cycles, unit: '' });
    const notes: MethodNote[] = [...this.errors];
    if (this.errors.length === 0) {
      if (line.hasKnee) {
        const onLine = line.a * line.N2 ** line.b;
        if (Math.abs(onLine - line.S2) > 1e-3 * line.S2) {
          notes.push({
            code: 'sn-line-inconsistent',
            severity: 'warning',
            message: `S2 (${(line.S2 / MPA).toPrecision(4)} MPa) is not on the line a*N2^b (${(onLine / MPA).toPrecision(4)} MPa); S2 is used as the knee.`,
          });
        }
      }
      if (this.lowCycle > 0) notes.push(lowCycleNote(this.lowCycle));
      if (this.belowKnee > 0 && this.rule === 'original') {
        notes.push({
          code: 'below-knee',
          severity: 'information',
          message: `${formatCount(this.belowKnee)} cycles below the endurance limit do no damage under Miner's original rule.`,
        });
      }
      if (!line.hasKnee && this.rule !== 'elementary') {
        notes.push({
          code: 'no-knee',
          severity: 'information',
          message:
            'The material has no endurance limit: the S-N line continues below N2, whatever the Miner rule.',
        });
      }
    }
    if (this.invalid > 0) {
      notes.push({
        code: 'input-invalid',
        severity: 'warning',
        message: `${this.invalid} cycle record${this.invalid === 1 ? '' : 's'} with a non-finite or negative amplitude or count ignored.`,
      });
    }
    const D = this.D;
    const contributors = [...this.bands.values()]
      .sort((x, y) => y.damage - x.damage)
      .slice(0, Math.max(0, maxContributors))
      .map((b) => ({
        sigma_ar: b.sMax,
        sigma_ar_min: b.sMin,
        count: b.count,
        damage: b.damage,
        share: D > 0 ? b.damage / D : 0,
      }));
    const formula =
      this.rule === 'haibach'
        ? 'D_sum = sum(n_i / N_i); N_i = (sigma_ar_i / a)^(1/b) above S2, N2 * (S2 / sigma_ar_i)^(2k - 1) below'
        : this.rule === 'elementary'
          ? 'D_sum = sum(n_i / N_i); N_i = (sigma_ar_i / a)^(1/b) at every level'
          : 'D_sum = sum(n_i / N_i); N_i = (sigma_ar_i / a)^(1/b), no damage below S2';
    return {
      ...computed(D, formula, MINER_SOURCE, terms, notes),
      D,
      contributors,
      cycles: this.cycles,
      damagingCycles: this.damaging,
      sigma_ar_max: this.sMax,
    };
  }
}

/** Miner damage of a set of cycles (counted history or spectrum levels). */
export function minerDamage(
  cycles: Iterable<DamageCycle>,
  line: SnLine,
  rule: MinerRule = 'original',
  maxContributors = 10,
): MinerResult {
  const acc = new MinerAccumulator(line, rule);
  for (const c of cycles) acc.add(c.sigma_ar, c.count);
  return acc.result(maxContributors);
}

/** Passes of the history (or spectrum) to failure: 1 / D_sum; infinite when D_sum = 0. */
export function repeatsToFailure(D: number | Computed): Computed {
  const d = typeof D === 'number' ? D : D.value;
  const source = 'Palmgren-Miner rule: failure at D_sum = 1 (Miner 1945)';
  const terms: Term[] = [{ name: 'D_sum', value: d, unit: '' }];
  if (!Number.isFinite(d) || d < 0) {
    return computed(0, 'repeats = 1 / D_sum', source, terms, [
      {
        code: 'input-invalid',
        severity: 'error',
        message: 'The damage sum must be a finite, non-negative number.',
      },
    ]);
  }
  if (d === 0) {
    return infinite('repeats = 1 / D_sum', source, terms, [
      {
        code: 'no-damage',
        severity: 'information',
        message: 'No cycle does damage: the history can be repeated without end.',
      },
    ]);
  }
  return computed(1 / d, 'repeats = 1 / D_sum', source, terms);
}

/**
 * Equivalent number of cycles at a reference amplitude (the largest level of the history):
 * the cycles of amplitude sigma_ref that do the same damage, N_eq = D * N(sigma_ref).
 */
export function equivalentCycles(
  D: number | Computed,
  sigma_ref: number,
  line: SnLine,
  rule: MinerRule = 'original',
): Computed {
  const d = typeof D === 'number' ? D : D.value;
  const formula = 'N_eq = D_sum * N(sigma_ref)';
  const terms: Term[] = [
    { name: 'D_sum', value: d, unit: '' },
    { name: 'sigma_ref', value: sigma_ref / MPA, unit: 'MPa' },
  ];
  if (!Number.isFinite(d) || d < 0) {
    return computed(0, formula, MINER_SOURCE, terms, [
      {
        code: 'input-invalid',
        severity: 'error',
        message: 'The damage sum must be a finite, non-negative number.',
      },
    ]);
  }
  const N = cyclesToFailure(sigma_ref, line, rule);
  if (N.notes?.some((n) => n.severity === 'error')) return computed(0, formula, MINER_SOURCE, terms, N.notes);
  if (N.infinite) {
    return computed(0, formula, MINER_SOURCE, terms, [
      ...(d > 0
        ? [
            {
              code: 'reference-below-knee',
              severity: 'warning' as const,
              message:
                'The reference amplitude does no damage under this rule: no equivalent cycle count at it.',
            },
          ]
        : []),
    ]);
  }
  terms.push({ name: 'N(sigma_ref)', value: N.value, unit: '' });
  return computed(d * N.value, formula, MINER_SOURCE, terms, N.notes);
}
