/** Public surface of the fatigue-notes core. Pure: no editor, no file system, no console. */
export * from './computed';
export type { HistoryChunkReader } from './context/checkContext';
export * from './context/types';
export {
  editDistance,
  INPUT_NAMES,
  nameInfo,
  nearest,
  OPTIONS,
  optionInfo,
  RESULT_NAMES,
  wordOwners,
} from './context/vocabulary';
export {
  centreCrackFiniteWidth,
  constantGeometry,
  criticalCrackSize,
  type GeometryFactor,
  geometryFactorAt,
  inspectionInterval,
  KSI_SQRT_IN_IN_MPA_SQRT_M,
  PARIS_SOURCE,
  type ParisInput,
  parisConstantFromInch,
  parisConstantNotes,
  parisLife,
  singleEdgeCrackFiniteWidth,
  TADA_HANDBOOK,
} from './crack';
export {
  cyclesToFailure,
  type DamageContributor,
  type DamageCycle,
  equivalentCycles,
  MINER_SOURCE,
  MinerAccumulator,
  type MinerResult,
  type MinerRule,
  minerDamage,
  N1_LOW_CYCLE,
  repeatsToFailure,
  type SnLine as MinerSnLine,
} from './damage';
export * from './design';
export * from './diagrams';
export type { EvaluateOptions } from './language/checkScope';
export { compileExpression, ExpressionError, evaluateExpression } from './language/expressions';
export { headlineRank, headlineValues, shownNames } from './language/headline';
export { type BlockSource, findFatigueBlocks, splitLines } from './language/markdownBlocks';
export { parseLine, parseStatements, type Statement } from './language/statements';
export { findMaterial, MATERIALS } from './materials';
export { type CrackGrowthMarks, crackGrowthDiagram } from './methods/crack-growth/diagram';
export {
  type CheckDiagram,
  checkDiagrams,
  defaultMethod,
  methodModule,
  methods,
  methodTemplates,
  methodViews,
  registerMethod,
  templateSnippetOf,
} from './methods/registry';
export { TEMPLATE_UNITS } from './methods/templateParts';
export type {
  DiagramSource,
  MethodDiagram,
  MethodExtras,
  MethodHeadline,
  MethodModule,
  MethodTemplate,
  TemplateUnits,
} from './methods/types';
export { evaluateNote } from './note/evaluateNote';
export {
  type HistogramBin,
  type HistogramLimits,
  type HistoryCsvOptions,
  HistoryCsvReader,
  type HistoryDelimiter,
  type HistoryIssue,
  histogramLimitsFor,
  isTimeColumnName,
  parseHistoryNumber,
  RAINFLOW_SOURCE,
  RainflowCounter,
  type RainflowCycle,
  type RainflowOptions,
  type RainflowResult,
  RangeMeanHistogram as RainflowHistogram,
  rainflow,
  TurningPointDetector,
  turningPoints,
} from './rainflow';
export * from './review';
export * from './session';
export type { DimKey } from './units/dimensions';
export { formatNumber, formatValue, type UnitSystem } from './units/format';
