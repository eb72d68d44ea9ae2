/** Reviewing: the assumptions register of a note and the comparison of two versions. */
export { ASSUMPTION_CODES, type AssumptionEntry, assumptionsRegister, isAssumptionCode } from './assumptions';
export {
  type CheckChange,
  type CheckSummary,
  type CompareOptions,
  compareNotes,
  type NoteComparison,
  type RequirementChange,
  type RequirementState,
  relativeText,
  type ValueChange,
  type ValueSnapshot,
} from './compareNotes';
