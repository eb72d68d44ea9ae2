import type { HistoryLimits } from './historyLimits';

export interface Io {
  /** Writes text; may return false when the consumer is slower (then wait for `drain`). */
  stdout: (s: string) => unknown;
  stderr: (s: string) => void;
  cwd: string;
  /** Resolves when stdout has room again (backpressure of a slow pipe). */
  drain?: () => Promise<void>;
  /** The budget for a history file (tests set a small one); default `CLI_HISTORY_LIMITS`. */
  historyLimits?: HistoryLimits;
  /** A monotonic clock in ms for the time budget of `cycles` (tests set a fake one). */
  clock?: () => number;
}

export const processIo: Io = {
  stdout: (s) => process.stdout.write(s),
  stderr: (s) => process.stderr.write(s),
  cwd: process.cwd(),
  drain: () => new Promise((resolve) => process.stdout.once('drain', () => resolve())),
};
