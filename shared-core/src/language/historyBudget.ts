/**
 * A time budget on reading history files (issue 7). The language server evaluates while the
 * engineer types, so a damage check may read its history files for at most so many
 * milliseconds; the command line sets no budget and reads to the end. Reading stops at the
 * next chunk after the budget and the read answers an error `history-time-budget`, which the
 * damage check reports on its `history:` line. The clock is the platform's monotonic
 * `performance.now()` (read only, no other effect).
 */
import type { HistoryChunkReader } from './checkContext';

class BudgetExceeded extends Error {}

const now: () => number =
  typeof globalThis.performance?.now === 'function' ? () => globalThis.performance.now() : () => Date.now();

/**
 * `reader` limited to `budgetMs` of reading in total, across every read made through the
 * returned reader (one per check evaluation: its passes over the file share the budget).
 */
export function budgetedReader(
  reader: HistoryChunkReader,
  budgetMs: number,
  clock: () => number = now,
): HistoryChunkReader {
  let spent = 0;
  return {
    read(relativePath, onChunk) {
      const t0 = clock();
      const over = () => spent + (clock() - t0) > budgetMs;
      try {
        if (spent > budgetMs) throw new BudgetExceeded();
        return reader.read(relativePath, (chunk) => {
          if (over()) throw new BudgetExceeded();
          onChunk(chunk);
        });
      } catch (e) {
        if (!(e instanceof BudgetExceeded)) throw e;
        return {
          ok: false,
          code: 'history-time-budget',
          message: `reading \`${relativePath}\` took more than ${(budgetMs / 1000).toFixed(1)} s, the editor's budget for a history: it is not counted here (run \`fatigue-notes check\` for the full count)`,
        };
      } finally {
        spent += clock() - t0;
      }
    },
  };
}

/** The options of one block evaluation: its history reads limited when `historyBudgetMs` is set. */
export function historyBudget<T extends { histories?: HistoryChunkReader; historyBudgetMs?: number }>(
  options: T,
): T {
  const ms = options.historyBudgetMs;
  if (!options.histories || ms === undefined || !(ms >= 0)) return options;
  return { ...options, histories: budgetedReader(options.histories, ms) };
}
