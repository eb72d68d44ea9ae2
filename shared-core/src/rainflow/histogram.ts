/**
 * Range-mean histogram of rainflow cycles (the "range-mean matrix" of cycle counting), in
 * bounded memory: rangeBins x meanBins counts, whatever the length of the history.
 *
 * Bins are equal width. Range bins cover [0, rangeMax], mean bins [meanMin, meanMax]; a bin
 * is closed on the left and open on the right except the last, which also takes its upper
 * edge. A cycle outside the limits goes to `outside` (it is not lost from the totals).
 * Binning is common practice, no source; the counts are whatever the counter reports
 * (ASTM E1049-85 (2017) section 5.4.4 rainflow: 1 or 0.5 per cycle).
 */
export interface HistogramLimits {
  rangeBins: number;
  meanBins: number;
  rangeMax: number;
  meanMin: number;
  meanMax: number;
}

export interface HistogramBin {
  rangeLow: number;
  rangeHigh: number;
  meanLow: number;
  meanHigh: number;
  count: number;
}

export class RangeMeanHistogram {
  readonly rangeBins: number;
  readonly meanBins: number;
  readonly rangeMax: number;
  readonly meanMin: number;
  readonly meanMax: number;
  /** Row-major counts: index = rangeIndex * meanBins + meanIndex. */
  readonly counts: Float64Array;
  total = 0;
  outside = 0;
  private readonly rangeScale: number;
  private readonly meanScale: number;

  constructor(limits: HistogramLimits) {
    this.rangeBins = clampBins(limits.rangeBins);
    this.meanBins = clampBins(limits.meanBins);
    const rMax = Number.isFinite(limits.rangeMax) && limits.rangeMax > 0 ? limits.rangeMax : 1;
    let mMin = Number.isFinite(limits.meanMin) ? limits.meanMin : 0;
    let mMax = Number.isFinite(limits.meanMax) ? limits.meanMax : 0;
    if (mMax < mMin) [mMin, mMax] = [mMax, mMin];
    if (mMax === mMin) {
      // A single mean level: give the bins a width so that they are well defined.
      const half = Math.max(Math.abs(mMin) * 1e-9, 0.5);
      mMin -= half;
      mMax += half;
    }
    this.rangeMax = rMax;
    this.meanMin = mMin;
    this.meanMax = mMax;
    this.rangeScale = this.rangeBins / rMax;
    this.meanScale = this.meanBins / (mMax - mMin);
    this.counts = new Float64Array(this.rangeBins * this.meanBins);
  }

  /** Adds `count` cycles of the given range and mean (the signature of `RainflowOptions.onCycle`). */
  add(range: number, mean: number, count: number): void {
    this.total += count;
    if (!(range >= 0 && range <= this.rangeMax && mean >= this.meanMin && mean <= this.meanMax)) {
      this.outside += count;
      return;
    }
    let i = Math.floor(range * this.rangeScale);
    if (i >= this.rangeBins) i = this.rangeBins - 1;
    let j = Math.floor((mean - this.meanMin) * this.meanScale);
    if (j >= this.meanBins) j = this.meanBins - 1;
    if (j < 0) j = 0;
    this.counts[i * this.meanBins + j] += count;
  }

  rangeEdges(): number[] {
    return edges(0, this.rangeMax, this.rangeBins);
  }

  meanEdges(): number[] {
    return edges(this.meanMin, this.meanMax, this.meanBins);
  }

  /** The bins with a non-zero count, by range then mean. */
  nonEmpty(): HistogramBin[] {
    const r = this.rangeEdges();
    const m = this.meanEdges();
    const out: HistogramBin[] = [];
    for (let i = 0; i < this.rangeBins; i++) {
      for (let j = 0; j < this.meanBins; j++) {
        const count = this.counts[i * this.meanBins + j];
        if (count !== 0)
          out.push({ rangeLow: r[i], rangeHigh: r[i + 1], meanLow: m[j], meanHigh: m[j + 1], count });
      }
    }
    return out;
  }

  /** Counts as rows (range bins) of columns (mean bins). */
  matrix(): number[][] {
    const rows: number[][] = [];
    for (let i = 0; i < this.rangeBins; i++) {
      rows.push(Array.from(this.counts.subarray(i * this.meanBins, (i + 1) * this.meanBins)));
    }
    return rows;
  }
}

/**
 * Histogram limits that hold every cycle of a history whose samples lie in [min, max]:
 * a rainflow range never exceeds max - min and a mean lies between min and max.
 */
export function histogramLimitsFor(min: number, max: number, bins: number): HistogramLimits {
  const lo = Math.min(min, max);
  const hi = Math.max(min, max);
  return { rangeBins: bins, meanBins: bins, rangeMax: hi - lo, meanMin: lo, meanMax: hi };
}

function clampBins(n: number): number {
  if (!Number.isFinite(n) || n < 1) return 1;
  return Math.min(Math.floor(n), 10_000);
}

function edges(lo: number, hi: number, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i <= n; i++) out.push(i === n ? hi : lo + ((hi - lo) * i) / n);
  return out;
}
