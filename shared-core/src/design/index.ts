/** Design mode: `solve: NAME for SYMBOL = EXPR` and the root finder behind it. */
export {
  type BrentMinOptions,
  type BrentMinOutcome,
  type BrentOptions,
  type BrentOutcome,
  brentMinimize,
  brentRoot,
} from './brent';
export {
  type BlockRunner,
  type SearchRange,
  SOLVE_BUDGET,
  SOLVE_CLOSEST_SOURCE,
  SOLVE_SOURCE,
  SOLVE_TOLERANCE,
  scanPoints,
  searchRange,
  solveBlock,
  solveStatements,
} from './solve';
