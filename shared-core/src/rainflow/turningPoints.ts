/**
 * Streaming peak-valley (turning point) extraction with an optional hysteresis gate.
 *
 * ASTM E1049-85 (Reapproved 2017), "Standard Practices for Cycle Counting in Fatigue
 * Analysis", counts ranges between successive peaks and valleys (sections 3.1.5-3.1.6 and
 * 5.4.4); this detector turns a raw sample stream into that peak/valley sequence, one
 * sample at a time, holding three numbers of state.
 *
 * Rules (documented here because the standard leaves the sampling details to the user):
 * - The first turning point is the start of the history (with a gate: the extreme of the
 *   initial excursion that first exceeds the gate). The last sample's extreme is the last
 *   turning point, emitted by `finish()`.
 * - Plateaus (repeated equal samples) and non-finite samples do not make turning points.
 * - Gate (hysteresis filter, common practice, no source): a reversal is confirmed only when
 *   the signal has come back from the running extreme by at least `gate` (and by more than
 *   zero). Every range between two emitted turning points is then >= gate. `gate = 0`
 *   keeps every reversal.
 */
export class TurningPointDetector {
  /** The turning point confirmed by the last `push` that returned true (or by `finish`). */
  point = 0;
  private readonly gate: number;
  /** 0: no direction yet; +1: rising (cand is a running maximum); -1: falling. */
  private dir = 0;
  private cand = 0;
  private lo = 0;
  private hi = 0;
  private started = false;
  private finished = false;

  constructor(gate = 0) {
    // NaN or a negative gate is no gate; an infinite gate (a gate over a vanishing scale) drops every reversal.
    this.gate = Number.isNaN(gate) ? 0 : Math.max(gate, 0);
  }

  /** Feeds one sample; returns true when it confirms a turning point (then read `point`). */
  push(x: number): boolean {
    // Non-finite samples are ignored.
    if (!Number.isFinite(x)) return false;
    const dir = this.dir;
    if (dir > 0) {
      if (x >= this.cand) {
        this.cand = x;
        return false;
      }
      if (this.cand - x >= this.gate) {
        this.point = this.cand;
        this.dir = -1;
        this.cand = x;
        return true;
      }
      return false;
    }
    if (dir < 0) {
      if (x <= this.cand) {
        this.cand = x;
        return false;
      }
      if (x - this.cand >= this.gate) {
        this.point = this.cand;
        this.dir = 1;
        this.cand = x;
        return true;
      }
      return false;
    }
    return this.opening(x);
  }

  /**
   * No direction yet: track the extremes of the opening excursion. When their span first
   * exceeds the gate, the extreme not being extended now is the first turning point.
   */
  private opening(x: number): boolean {
    if (!this.started) {
      this.started = true;
      this.lo = x;
      this.hi = x;
      return false;
    }
    if (x > this.hi) {
      this.hi = x;
      const span = this.hi - this.lo;
      if (span > 0 && span >= this.gate) {
        this.point = this.lo;
        this.dir = 1;
        this.cand = this.hi;
        return true;
      }
    } else if (x < this.lo) {
      this.lo = x;
      const span = this.hi - this.lo;
      if (span > 0 && span >= this.gate) {
        this.point = this.hi;
        this.dir = -1;
        this.cand = this.lo;
        return true;
      }
    }
    return false;
  }

  /** Ends the stream; returns true when the last extreme is a turning point (then read `point`). */
  finish(): boolean {
    if (this.finished) return false;
    this.finished = true;
    if (this.dir !== 0) {
      this.point = this.cand;
      return true;
    }
    return false;
  }

  /** True once at least one finite sample has been seen. */
  get hasSamples(): boolean {
    return this.started;
  }
}

/** Convenience for tests and small inputs: the turning points of a whole array. */
export function turningPoints(xs: ArrayLike<number>, gate = 0): number[] {
  const d = new TurningPointDetector(gate);
  const out: number[] = [];
  for (let i = 0; i < xs.length; i++) if (d.push(xs[i])) out.push(d.point);
  if (d.finish()) out.push(d.point);
  return out;
}
