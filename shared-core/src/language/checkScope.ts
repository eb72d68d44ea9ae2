/** What a block is evaluated with, and what a finished check leaves for the checks after it. */

import type { HistoryChunkReader } from '../context/checkContext';
import type { CheckResult } from '../context/types';
import type { UnitSystem } from '../units/format';
import type { Unit } from '../units/mathInstance';

export interface EvaluateOptions {
  /** Display units; 'auto' follows the units the note is written in. */
  unitSystem?: UnitSystem | 'auto';
  significantDigits?: number;
  /** Reads history files for `method: damage`; without it such checks say the file cannot be read here. */
  histories?: HistoryChunkReader;
  /** Per-lint switches by diagnostic code (false turns a lint off). */
  lints?: Record<string, boolean>;
  /**
   * Milliseconds a check may spend reading its history files (the language server sets 3 s,
   * the command line 120 s; unset reads to the end). See `historyBudget.ts`.
   */
  historyBudgetMs?: number;
  /** Bytes one read of a history file may pass on (the command line sets 1 GiB; unset: no limit). */
  historyBudgetBytes?: number;
  /** Who sets the budgets, for the messages; default `editor`. */
  historyBudgetBy?: 'editor' | 'command line';
}

/** Raw mathjs values of a finished check, for `check.name` references in later checks. */
export interface CheckScopeEntry {
  result: CheckResult;
  raw: Map<string, Unit | number>;
}
