/** Design mode: `solve: NAME for SYMBOL = EXPR` and the root finder behind it. */
export { type BrentOptions, type BrentOutcome, brentRoot } from './brent';
export {
  type BlockRunner,
  type SearchRange,
  SOLVE_BUDGET,
  SOLVE_SOURCE,
  scanPoints,
  searchRange,
  solveBlock,
  solveStatements,
} from './solve';
