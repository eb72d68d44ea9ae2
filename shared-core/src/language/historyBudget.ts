/**
 * Budgets on reading history files (issues 7 and 16). The language server evaluates while
 * the engineer types, so a damage check may read its history files for at most so many
 * milliseconds; the command line has a budget of its own, larger, so that no history can
 * keep a CI job busy without end. Reading stops at the next chunk past the budget and the
 * read answers an error, which the damage check reports on its `history:` line:
 * `history-time-budget` when the time is spent (shared by the passes of one check),
 * `history-too-large` when one read passes the budget in bytes. Memory needs no budget of
 * its own here: the reader keeps at most one line (2^20 characters) and the counter its
 * residue (at most 2^23 points), whatever the file. The clock is the platform's monotonic
 * `performance.now()` (read only, no other effect).
 */
import type { HistoryChunkReader } from '../context/checkContext';

class BudgetExceeded extends Error {
  constructor(readonly what: 'time' | 'bytes') {
    super(what);
  }
}

const now: () => number =
  typeof globalThis.performance?.now === 'function' ? () => globalThis.performance.now() : () => Date.now();

export interface HistoryBudgetLimits {
  /** Bytes (or characters of text) one read may pass on; unset: no limit. */
  bytes?: number;
  /** Who sets the budget, for the messages. Default `editor`. */
  by?: 'editor' | 'command line';
}

function sizeText(bytes: number): string {
  const mib = bytes / (1024 * 1024);
  return mib >= 1 ? `${Number(mib.toPrecision(4))} MiB` : `${bytes} bytes`;
}

/**
 * `reader` limited to `budgetMs` of reading in total, across every read made through the
 * returned reader (one per check evaluation: its passes over the file share the budget),
 * and to `limits.bytes` per read.
 */
export function budgetedReader(
  reader: HistoryChunkReader,
  budgetMs: number,
  clock: () => number = now,
  limits: HistoryBudgetLimits = {},
): HistoryChunkReader {
  let spent = 0;
  const by = limits.by ?? 'editor';
  const maxBytes = limits.bytes !== undefined && limits.bytes >= 0 ? limits.bytes : Number.POSITIVE_INFINITY;
  return {
    read(relativePath, onChunk) {
      const t0 = clock();
      const over = () => spent + (clock() - t0) > budgetMs;
      let bytes = 0;
      try {
        if (spent > budgetMs) throw new BudgetExceeded('time');
        return reader.read(relativePath, (chunk) => {
          if (over()) throw new BudgetExceeded('time');
          bytes += chunk.length;
          if (bytes > maxBytes) throw new BudgetExceeded('bytes');
          onChunk(chunk);
        });
      } catch (e) {
        if (!(e instanceof BudgetExceeded)) throw e;
        if (e.what === 'bytes')
          return {
            ok: false,
            code: 'history-too-large',
            message: `\`${relativePath}\` is larger than ${sizeText(maxBytes)}, the ${by}'s budget for a history file: it is not counted (split it into parts and count each)`,
          };
        return {
          ok: false,
          code: 'history-time-budget',
          message:
            by === 'editor'
              ? `reading \`${relativePath}\` took more than ${(budgetMs / 1000).toFixed(1)} s, the editor's budget for a history: it is not counted here (run \`fatigue-notes check\` for the full count)`
              : `reading \`${relativePath}\` took more than ${(budgetMs / 1000).toFixed(1)} s, the command line's budget for a history: it is not counted (split it into parts and count each)`,
        };
      } finally {
        spent += clock() - t0;
      }
    },
  };
}

/**
 * The options of one block evaluation: its history reads limited when `historyBudgetMs`
 * (and `historyBudgetBytes`) is set.
 */
export function historyBudget<
  T extends {
    histories?: HistoryChunkReader;
    historyBudgetMs?: number;
    historyBudgetBytes?: number;
    historyBudgetBy?: 'editor' | 'command line';
  },
>(options: T): T {
  const ms = options.historyBudgetMs;
  const bytes = options.historyBudgetBytes;
  if (!options.histories) return options;
  const timed = ms !== undefined && ms >= 0;
  const sized = bytes !== undefined && bytes >= 0;
  if (!timed && !sized) return options;
  return {
    ...options,
    histories: budgetedReader(options.histories, timed ? ms : Number.POSITIVE_INFINITY, now, {
      ...(sized ? { bytes } : {}),
      by: options.historyBudgetBy ?? 'editor',
    }),
  };
}
