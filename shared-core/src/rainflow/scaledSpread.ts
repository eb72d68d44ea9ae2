/**
 * Before a history is counted for damage: can every stress of it be computed? A rainflow
 * range never exceeds the spread of the samples (largest minus smallest) and a mean lies
 * between them (ASTM E1049-85 (2017) 5.4.4 counts ranges between samples), so checking the
 * spread and the extremes, once scaled to stresses, bounds every cycle: when they are
 * finite, no range, mean or stress of any cycle can overflow.
 */
export interface ScaledSpreadProblem {
  code: 'history-overflow' | 'absurd-value';
  /** Which line is at fault: the `history:` line (the file) or the `history_scale` line. */
  on: 'history' | 'scale';
  message: string;
}

/** The smallest normal double: below it a stress keeps no precision, and it soon rounds to zero. */
const MIN_NORMAL = 2.2250738585072014e-308;

const fmt = (x: number) => Number(x.toPrecision(4)).toString();

/**
 * `lo`, `hi`: extremes of the file's values; `perRange`: equivalent alternating stress per
 * 1.0 of half range (Pa); `perMean`: equivalent mean stress per 1.0 of mean (Pa).
 */
export function scaledSpreadProblem(
  lo: number,
  hi: number,
  perRange: number,
  perMean: number,
  file: string,
): ScaledSpreadProblem | undefined {
  const spread = hi - lo;
  if (!(spread <= Number.MAX_VALUE))
    return {
      code: 'history-overflow',
      on: 'history',
      message: `\`${file}\`: its values run from ${fmt(lo)} to ${fmt(hi)}, further apart than the largest number (about 1.8e308), so no range of it can be computed: write the file in a larger unit (and \`history_scale\` to match)`,
    };
  const amplitude = perRange * spread * 0.5;
  const mean = Math.abs(perMean) * Math.max(Math.abs(lo), Math.abs(hi));
  if (!Number.isFinite(amplitude) || !Number.isFinite(mean))
    return {
      code: 'history-overflow',
      on: 'scale',
      message: `\`history_scale\` times the values of \`${file}\` (${fmt(lo)} to ${fmt(hi)}) gives stresses beyond the largest number (about 1.8e308 Pa): check \`history_scale\` against the file's unit`,
    };
  if (spread > 0 && !(amplitude >= MIN_NORMAL))
    return {
      code: 'absurd-value',
      on: 'scale',
      message: `\`history_scale\` times the values of \`${file}\` (${fmt(lo)} to ${fmt(hi)}) gives stresses too small to be represented (below 2.2e-308 Pa, they round to zero): check \`history_scale\` against the file's unit`,
    };
  return undefined;
}
