/**
 * Rainflow counting (ASTM E1049-85 (2017) section 5.4.4), streaming: turning points found
 * on the fly, only the residue held; CSV load histories read incrementally; range-mean
 * histograms in bounded memory.
 *
 * Benchmark recipe: `const c = new RainflowCounter(); c.pushMany(float64Array); c.finish()`
 * (optionally with `onCycle: histogram.add.bind(histogram)`).
 */
export {
  type HistoryCsvOptions,
  HistoryCsvReader,
  type HistoryDelimiter,
  type HistoryIssue,
  isTimeColumnName,
  MAX_HISTORY_LINE,
  parseHistoryNumber,
} from './csvHistory';
export { type HistogramBin, type HistogramLimits, histogramLimitsFor, RangeMeanHistogram } from './histogram';
export {
  encodingName,
  HistoryDecoder,
  type HistoryEncoding,
  sniffHistoryEncoding,
} from './historyDecoder';
export {
  RAINFLOW_SOURCE,
  RainflowCounter,
  type RainflowCycle,
  type RainflowOptions,
  type RainflowResult,
  rainflow,
} from './rainflowCounter';
export { type ScaledSpreadProblem, scaledSpreadProblem } from './scaledSpread';
export { TurningPointDetector, turningPoints } from './turningPoints';
