/** Public surface of the fatigue-notes core. Pure: no editor, no file system, no console. */
export * from './computed';
export type { HistoryChunkReader } from './language/checkContext';
export { type EvaluateOptions, evaluateNote } from './language/evaluateNote';
export { compileExpression, ExpressionError, evaluateExpression } from './language/expressions';
export { type BlockSource, findFatigueBlocks, splitLines } from './language/markdownBlocks';
export { parseLine, parseStatements, type Statement } from './language/statements';
export * from './language/types';
export { editDistance, INPUT_NAMES, nameInfo, nearest, OPTIONS, RESULT_NAMES } from './language/vocabulary';
export { findMaterial, MATERIALS } from './materials';
export type { DimKey } from './units/dimensions';
export { formatNumber, formatValue, type UnitSystem } from './units/format';
