/** Incremental evaluation of an open note, and the few core helpers the editor features read. */
export { ID_PATTERN } from '../language/markdownBlocks';
export { isReservedWord, stripComment } from '../language/statements';
export type { BlockHead } from '../note/noteLoop';
export { DIM_LABEL } from '../units/dimensions';
export { displayUnit, toDisplayNumber } from '../units/format';
export {
  NoteSession,
  type SessionJob,
  type TextChange,
  type UpdateKind,
  type UpdateStats,
} from './noteSession';
export { dimensionsWithUnits, type UnitChoice, unitChoices } from './unitChoices';
