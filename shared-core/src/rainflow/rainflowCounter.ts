import type { MethodNote } from '../computed';
import { TurningPointDetector } from './turningPoints';

/**
 * Streaming rainflow counter after ASTM E1049-85 (Reapproved 2017), "Standard Practices for
 * Cycle Counting in Fatigue Analysis", section 5.4.4 (rainflow counting), rules 5.4.4.1:
 *
 *   X = range under consideration, Y = previous range adjacent to X, S = starting point.
 *   (1) Read the next peak or valley; if out of data go to (6).
 *   (2) With fewer than three points go to (1). Form X and Y from the three most recent
 *       peaks and valleys not discarded.
 *   (3) If |X| < |Y| go to (1); if |X| >= |Y| go to (4).
 *   (4) If Y contains S go to (5); otherwise count Y as one cycle, discard the peak and
 *       valley of Y, go to (2).
 *   (5) Count Y as one-half cycle, discard the first point of Y, move S to the second
 *       point of Y, go to (2).
 *   (6) Count each range not yet counted as one-half cycle.
 *
 * Turning points are found on the fly (`TurningPointDetector`), so the only memory held is
 * the residue stack (the points not yet discarded); S is always the bottom of that stack,
 * so "Y contains S" is "the stack holds exactly three points".
 *
 * Cycles go to an `onCycle(range, mean, count)` callback and/or are kept in an array
 * (`keepCycles`); totals are always aggregated. No object is allocated per sample.
 *
 * Overflow: every range is a difference of two samples, so every range is finite as long as
 * the spread of the samples (largest minus smallest) is; a mean is taken as a/2 + b/2, which
 * cannot overflow. A sample that would make the spread exceed the largest number (about
 * 1.8e308) stops the count (`overflowAt`, an error note `history-overflow`): nothing after
 * it is counted, and no range or mean is ever NaN or Infinity. The residue held is bounded
 * (`maxResidue`, 2^23 points by default, 64 MiB): a history whose residue grows beyond it
 * (reversals that keep shrinking, a ring-down of millions of cycles) stops the count the
 * same way, so that memory stays bounded whatever the file.
 */
export interface RainflowCycle {
  range: number;
  mean: number;
  /** 1 for a full cycle, 0.5 for a half cycle. */
  count: number;
}

export interface RainflowOptions {
  /** Hysteresis gate: reversals smaller than this range are dropped (history units). Default 0. */
  gate?: number;
  /** Receives every counted cycle as it is counted (counting order). */
  onCycle?: (range: number, mean: number, count: number) => void;
  /** Also collect the cycles into `RainflowResult.cycles` (memory grows with the history). */
  keepCycles?: boolean;
  /** Largest residue held (points); beyond it the count stops with an error. Default 2^23. */
  maxResidue?: number;
}

export interface RainflowResult {
  /** Counted cycles in counting order; present only with `keepCycles`. */
  cycles?: RainflowCycle[];
  /** Sum of counts (full cycles + half cycles / 2). */
  totalCycles: number;
  fullCycles: number;
  halfCycles: number;
  /** Finite samples read. */
  sampleCount: number;
  /** Non-finite samples that could not be counted (an error note says so: the count is incomplete). */
  skippedSamples: number;
  turningPointCount: number;
  /** The residue (points left after the three-point rules), counted as half cycles in step (6). */
  residue: number[];
  maxRange: number;
  /** Extremes of the finite samples (0 when there are none). */
  min: number;
  max: number;
  /** Sum over cycles of count * range (equals half the total variation of the turning points; may be Infinity for ranges near 1e308). */
  sumCountRange: number;
  /** 1-based number of the finite sample that stopped the count (spread overflow or residue limit); 0 when none did. */
  overflowAt: number;
  notes: MethodNote[];
  source: string;
}

export const RAINFLOW_SOURCE =
  'ASTM E1049-85 (Reapproved 2017), Standard Practices for Cycle Counting in Fatigue Analysis, section 5.4.4 (rainflow counting)';

export class RainflowCounter {
  private readonly detector: TurningPointDetector;
  private readonly onCycle?: (range: number, mean: number, count: number) => void;
  private readonly kept?: RainflowCycle[];
  private stack: Float64Array = new Float64Array(64);
  private n = 0;
  private full = 0;
  private half = 0;
  private samples = 0;
  private skipped = 0;
  private points = 0;
  private maxRange = 0;
  private sumCountRange = 0;
  private lo = Number.POSITIVE_INFINITY;
  private hi = Number.NEGATIVE_INFINITY;
  private readonly maxResidue: number;
  private stopped: '' | 'spread' | 'residue' = '';
  private stopAt = 0;
  private stopValue = 0;
  private result?: RainflowResult;

  constructor(opts: RainflowOptions = {}) {
    this.detector = new TurningPointDetector(opts.gate ?? 0);
    this.onCycle = opts.onCycle;
    if (opts.keepCycles) this.kept = [];
    const m = opts.maxResidue;
    this.maxResidue = m !== undefined && m >= 3 ? Math.floor(m) : 1 << 23;
  }

  /**
   * Feeds one sample. Returns false when it is not counted: not finite, or the count has
   * stopped (an overflowing spread or the residue limit; see `overflowAt`), or after `finish()`.
   */
  push(x: number): boolean {
    if (this.result !== undefined) return false;
    if (!Number.isFinite(x)) {
      this.skipped++;
      return false;
    }
    if (this.stopped !== '') return false;
    const lo = Math.min(x, this.lo);
    const hi = Math.max(x, this.hi);
    if (!(hi - lo <= Number.MAX_VALUE)) {
      this.stop('spread', x);
      return false;
    }
    this.samples++;
    this.lo = lo;
    this.hi = hi;
    if (this.detector.push(x)) {
      this.addPoint(this.detector.point);
      // Counted; but the residue may not grow further: the samples after this one are not.
      if (this.n > this.maxResidue) this.stop('residue', x, this.samples);
    }
    return true;
  }

  private stop(why: 'spread' | 'residue', x: number, at = this.samples + 1): void {
    this.stopped = why;
    this.stopAt = at;
    this.stopValue = x;
  }

  /** Feeds many samples (a typed array avoids any boxing). */
  pushMany(xs: ArrayLike<number>): void {
    const len = xs.length;
    for (let i = 0; i < len; i++) this.push(xs[i]);
  }

  /** Step (1)-(5) for one new peak or valley. */
  private addPoint(p: number): void {
    this.points++;
    let n = this.n;
    if (n === this.stack.length) {
      const grown = new Float64Array(n * 2);
      grown.set(this.stack);
      this.stack = grown;
    }
    const s = this.stack;
    s[n++] = p;
    while (n >= 3) {
      const a = s[n - 3];
      const b = s[n - 2];
      const c = s[n - 1];
      const X = c > b ? c - b : b - c;
      const Y = b > a ? b - a : a - b;
      if (X < Y) break;
      if (n === 3) {
        // Y contains the starting point S (the bottom of the stack): half cycle, drop S.
        this.emit(Y, a * 0.5 + b * 0.5, 0.5);
        s[0] = b;
        s[1] = c;
        n = 2;
      } else {
        // Full cycle: discard the peak and valley of Y, keep the newest point.
        this.emit(Y, a * 0.5 + b * 0.5, 1);
        s[n - 3] = c;
        n -= 2;
      }
    }
    this.n = n;
  }

  private emit(range: number, mean: number, count: number): void {
    if (count === 1) this.full++;
    else this.half++;
    if (range > this.maxRange) this.maxRange = range;
    this.sumCountRange += count * range;
    if (this.onCycle !== undefined) this.onCycle(range, mean, count);
    if (this.kept !== undefined) this.kept.push({ range, mean, count });
  }

  /** Step (6): flushes the last extreme, counts the residue as half cycles and returns the totals. */
  finish(): RainflowResult {
    if (this.result !== undefined) return this.result;
    if (this.detector.finish()) this.addPoint(this.detector.point);
    const residue = Array.from(this.stack.subarray(0, this.n));
    for (let i = 0; i + 1 < residue.length; i++) {
      const a = residue[i];
      const b = residue[i + 1];
      this.emit(Math.abs(b - a), a * 0.5 + b * 0.5, 0.5);
    }
    const notes: MethodNote[] = [];
    if (this.samples < 3 && this.stopped === '') {
      notes.push({
        code: 'history-too-few-points',
        severity: 'error',
        message: `The history has ${this.samples} point${this.samples === 1 ? '' : 's'}; rainflow counting needs at least three.`,
      });
    } else if (this.full + this.half === 0) {
      notes.push({
        code: 'history-no-cycles',
        severity: 'warning',
        message: 'No cycles were counted: the history is constant or all its reversals are below the gate.',
      });
    }
    if (this.stopped !== '') {
      const v = Number(this.stopValue.toPrecision(6)).toString();
      notes.push({
        code: 'history-overflow',
        severity: 'error',
        message:
          this.stopped === 'spread'
            ? `Sample ${this.stopAt} (${v}) lies more than the largest number (about 1.8e308) away from another sample: its range cannot be computed, so counting stopped there and the count is incomplete. Write the history in a larger unit.`
            : `After sample ${this.stopAt} the residue of the rainflow count (the peaks and valleys not yet closed into cycles) passed ${this.maxResidue} points: counting stopped there and the count is incomplete (a history whose reversals keep shrinking, such as a long ring-down, keeps every one of them in the residue): count it in parts.`,
      });
    }
    if (this.skipped > 0) {
      // A lost sample may be the largest load of the history: counting without it is not safe.
      notes.push({
        code: 'history-non-finite',
        severity: 'error',
        message: `${this.skipped} sample${this.skipped === 1 ? ' is' : 's are'} not finite (NaN or Infinity) and could not be counted: the count misses them, and they may be the largest loads of the history.`,
      });
    }
    this.result = {
      totalCycles: this.full + this.half * 0.5,
      fullCycles: this.full,
      halfCycles: this.half,
      sampleCount: this.samples,
      skippedSamples: this.skipped,
      turningPointCount: this.points,
      residue,
      maxRange: this.maxRange,
      min: this.samples > 0 ? this.lo : 0,
      max: this.samples > 0 ? this.hi : 0,
      sumCountRange: this.sumCountRange,
      overflowAt: this.stopped !== '' ? this.stopAt : 0,
      notes,
      source: RAINFLOW_SOURCE,
    };
    if (this.kept !== undefined) this.result.cycles = this.kept;
    return this.result;
  }

  /** Points currently held (the live residue); a measure of the memory in use. */
  get residueLength(): number {
    return this.n;
  }
}

/** Counts a whole array at once (tests, small histories); keeps the cycles. */
export function rainflow(
  xs: ArrayLike<number>,
  opts: Omit<RainflowOptions, 'keepCycles'> = {},
): RainflowResult {
  const c = new RainflowCounter({ ...opts, keepCycles: true });
  c.pushMany(xs);
  return c.finish();
}
