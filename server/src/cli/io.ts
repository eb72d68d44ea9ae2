export interface Io {
  /** Writes text; may return false when the consumer is slower (then wait for `drain`). */
  stdout: (s: string) => unknown;
  stderr: (s: string) => void;
  cwd: string;
  /** Resolves when stdout has room again (backpressure of a slow pipe). */
  drain?: () => Promise<void>;
}

export const processIo: Io = {
  stdout: (s) => process.stdout.write(s),
  stderr: (s) => process.stderr.write(s),
  cwd: process.cwd(),
  drain: () => new Promise((resolve) => process.stdout.once('drain', () => resolve())),
};
