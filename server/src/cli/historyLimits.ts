/**
 * The command line's budget for a history file (docs/language.md, "Limits"): a check may
 * spend at most 120 s reading its history (both passes together), and a history file may
 * have at most 1 GiB; past either, the check reports `history-time-budget` or
 * `history-too-large` on its `history:` line and gives no damage, and `fatigue-notes
 * cycles` stops with the same diagnostic and exit code 1. Memory is bounded by the reader
 * itself (one line of at most 2^20 characters, a residue of at most 2^23 points).
 * Reading short lines runs at 10 to 25 MB/s on a shared 2-core machine (measured for issue
 * 16), so a damage check of a history near 1 GiB (two passes) may meet the time budget first.
 */
import type { EvaluateOptions, HistoryChunkReader } from '@fatigue-notes/core';

export interface HistoryLimits {
  ms: number;
  bytes: number;
}

export const CLI_HISTORY_LIMITS: HistoryLimits = { ms: 120_000, bytes: 1024 * 1024 * 1024 };

/** The evaluation options of a note on the command line: its histories, within the budget. */
export function cliHistoryOptions(
  histories: HistoryChunkReader,
  limits: HistoryLimits = CLI_HISTORY_LIMITS,
): Pick<EvaluateOptions, 'histories' | 'historyBudgetMs' | 'historyBudgetBytes' | 'historyBudgetBy'> {
  return {
    histories,
    historyBudgetMs: limits.ms,
    historyBudgetBytes: limits.bytes,
    historyBudgetBy: 'command line',
  };
}
