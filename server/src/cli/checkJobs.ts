/**
 * `check` of many notes on several cores: each note is evaluated and turned into the pieces
 * of every output format (`FileOutcome`: its JSON entry, its text lines, its diagnostics for
 * SARIF) by one of `jobs` worker threads running this same bundle; the main thread puts the
 * pieces together in the order of the files, so the output is byte for byte that of one core.
 * A note's result is dropped as soon as its pieces are made, which keeps a run over many large
 * notes within memory. Without a bundle on disk (the command driven in-process by tests) or
 * with one job, the notes are evaluated on the main thread through the same functions.
 */
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { type Diagnostic, headlineValues, type NoteResult } from '@fatigue-notes/core';
import { evaluateFile } from './check';
import type { HistoryLimits } from './historyLimits';
import { jsonFile } from './output';

const ROLE = 'fatigue-notes-check-worker';

export type CheckFormat = 'text' | 'json' | 'sarif';

export interface FileOutcome {
  path: string;
  /** The file's entry of the JSON output (format json). */
  json?: ReturnType<typeof jsonFile>;
  /** One summary line per check (format text). */
  checkLines?: string[];
  /** The diagnostics (text and SARIF). */
  diagnostics?: Diagnostic[];
  tally: { pass: number; fail: number; error: number; unchecked: number };
  failed: boolean;
}

export type JobReply = { index: number; outcome: FileOutcome } | { index: number; error: string };

interface JobRequest {
  index: number;
  file: string;
  rel: string;
}

interface WorkerSetup {
  role: typeof ROLE;
  format: CheckFormat;
  limits?: HistoryLimits;
}

function summaryLine(rel: string, r: NoteResult['checks'][number]): string {
  const pick = headlineValues(r).map((v) => `${v.name} ${v.display}`);
  const status = r.status.toUpperCase().padEnd(9);
  return `${status} ${rel}:${r.range.start.line + 1} ${r.id ?? '(no id)'}${r.title ? ` — ${r.title}` : ''}${pick.length ? `  [${pick.join(', ')}]` : ''}`;
}

/** Evaluates one note and keeps only what `format` prints of it. */
export function fileOutcome(
  file: string,
  rel: string,
  format: CheckFormat,
  limits?: HistoryLimits,
): FileOutcome {
  const result = evaluateFile(file, limits);
  const tally = { pass: 0, fail: 0, error: 0, unchecked: 0 };
  for (const c of result.checks) tally[c.status]++;
  const failed =
    result.diagnostics.some((d) => d.severity === 'error') ||
    result.checks.some((c) => c.status === 'fail' || c.status === 'error');
  const out: FileOutcome = { path: rel, tally, failed };
  if (format === 'json') out.json = jsonFile({ path: rel, result });
  else {
    out.diagnostics = result.diagnostics;
    if (format === 'text') out.checkLines = result.checks.map((c) => summaryLine(rel, c));
  }
  return out;
}

function runOne(req: JobRequest, format: CheckFormat, limits?: HistoryLimits): JobReply {
  try {
    return { index: req.index, outcome: fileOutcome(req.file, req.rel, format, limits) };
  } catch (e) {
    return { index: req.index, error: (e as Error).message };
  }
}

/** True inside a check worker (the bundle's entry then serves notes instead of a command). */
export function isCheckWorker(): boolean {
  return !isMainThread && (workerData as { role?: string } | null)?.role === ROLE;
}

/** The worker's loop: one note per message, answered with its outcome. */
export function runCheckWorker(): void {
  const port = parentPort;
  if (!port) return;
  const setup = workerData as WorkerSetup;
  port.on('message', (req: JobRequest) => port.postMessage(runOne(req, setup.format, setup.limits)));
}

/** The bundle this code runs from, when it is a script a Worker can load. */
function bundlePath(): string | undefined {
  const f = typeof __filename === 'string' ? __filename : undefined;
  return f && /\.c?js$/.test(f) ? f : undefined;
}

/**
 * The number of worker threads when `--jobs` is not given: one per core, at most one per
 * note, and none (the main thread alone) for fewer than 4 notes or under 256 KiB of notes,
 * where starting a thread costs more than it saves.
 */
export function automaticJobs(files: number, bytes: number): number {
  if (files < 4 || bytes < 256 * 1024) return 1;
  return Math.max(1, Math.min(availableParallelism(), files));
}

/**
 * The outcomes of `files` (absolute path and the path printed), in the order given, evaluated
 * by `jobs` threads. A note that cannot be read gives `{ error }` at its place.
 */
export async function evaluateFiles(
  files: Array<{ file: string; rel: string }>,
  format: CheckFormat,
  jobs: number,
  limits?: HistoryLimits,
): Promise<JobReply[]> {
  const bundle = bundlePath();
  const n = Math.min(jobs, files.length);
  if (n <= 1 || !bundle) return files.map((f, index) => runOne({ index, ...f }, format, limits));
  const replies: JobReply[] = new Array(files.length);
  let next = 0;
  const setup: WorkerSetup = { role: ROLE, format, limits };
  await Promise.all(
    Array.from(
      { length: n },
      () =>
        new Promise<void>((done, fail) => {
          const worker = new Worker(bundle, { workerData: setup });
          const feed = () => {
            if (next >= files.length) {
              void worker.terminate().then(() => done());
              return;
            }
            const index = next++;
            worker.postMessage({ index, ...files[index] } satisfies JobRequest);
          };
          worker.on('message', (reply: JobReply) => {
            replies[reply.index] = reply;
            feed();
          });
          worker.on('error', fail);
          feed();
        }),
    ),
  );
  return replies;
}
