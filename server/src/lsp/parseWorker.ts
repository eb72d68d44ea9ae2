/**
 * The Markdown parse of large notes, off the main thread (issue 7: a 10 MB note must not
 * stop the server from answering). remark-parse of a large note takes seconds and cannot be
 * sliced; everything else of an evaluation can (the session evaluates one block per step).
 * So the server hands the parse of a large note to a `worker_threads` Worker running this same
 * bundle, gets the blocks back as plain data (`BlockHead`: lines and columns, no text) and
 * evaluates them in slices on the main thread, where requests keep being answered.
 *
 * One worker serves every large note; a parse superseded by a newer text of the same note
 * before it starts is skipped. The parser's tree of a 10 MB note takes about 2.5 GB of heap:
 * the worker is ended after `IDLE_MS` without work, which gives that memory back, and if it
 * dies (out of memory) only that parse fails, not the server. When no worker can run (no
 * bundle on disk, e.g. the server driven in-process by tests) the host parses on the main
 * thread as before.
 */
import { isMainThread, parentPort, receiveMessageOnPort, Worker, workerData } from 'node:worker_threads';
import { type BlockHead, findFatigueBlocks } from '@fatigue-notes/core';

const ROLE = 'fatigue-notes-parse-worker';
/** Milliseconds without a parse after which the worker is ended (a new one starts on demand). */
const IDLE_MS = 5000;

interface ParseRequest {
  id: number;
  uri: string;
  text: string;
}

type ParseReply =
  | { id: number; uri: string; blocks: BlockHead[] }
  | { id: number; uri: string; error: string }
  | { id: number; uri: string; skipped: true };

/** True inside the parse worker (the bundle's entry then serves parses instead of a command). */
export function isParseWorker(): boolean {
  return !isMainThread && (workerData as { role?: string } | null)?.role === ROLE;
}

/** The worker's loop: parse the latest text of each note asked for, answer the rest as skipped. */
export function runParseWorker(): void {
  const port = parentPort;
  if (!port) return;
  port.on('message', (first: ParseRequest) => {
    // Take whatever else is queued: only the newest text of each note is parsed.
    const queued: ParseRequest[] = [first];
    for (let m = receiveMessageOnPort(port); m; m = receiveMessageOnPort(port))
      queued.push(m.message as ParseRequest);
    const latest = new Map<string, ParseRequest>();
    for (const q of queued) latest.set(q.uri, q);
    for (const q of queued) {
      if (latest.get(q.uri) !== q) {
        port.postMessage({ id: q.id, uri: q.uri, skipped: true } satisfies ParseReply);
        continue;
      }
      try {
        const blocks = findFatigueBlocks(q.text).map(({ lines: _lines, ...head }) => head);
        port.postMessage({ id: q.id, uri: q.uri, blocks } satisfies ParseReply);
      } catch (e) {
        port.postMessage({
          id: q.id,
          uri: q.uri,
          error: e instanceof Error ? e.message : String(e),
        } satisfies ParseReply);
      }
    }
  });
}

/** The bundle this code runs from, when it is a script a Worker can load. */
function bundlePath(): string | undefined {
  const f = typeof __filename === 'string' ? __filename : undefined;
  return f && /\.c?js$/.test(f) ? f : undefined;
}

/** The main thread's side: parse requests as promises; undefined answers mean "skipped". */
export class ParseWorker {
  private worker?: Worker;
  private broken = false;
  private idle?: ReturnType<typeof setTimeout>;
  private nextId = 1;
  private readonly pending = new Map<
    number,
    { resolve: (b: BlockHead[] | undefined) => void; reject: (e: Error) => void }
  >();

  constructor(private readonly log: (message: string) => void) {}

  /** Whether parses can run off the main thread here. */
  available(): boolean {
    return !this.broken && bundlePath() !== undefined;
  }

  /** The blocks of `text` (heads only), or undefined when a newer parse of the same note took over. */
  parse(uri: string, text: string): Promise<BlockHead[] | undefined> {
    const w = this.ensure();
    if (!w) return Promise.reject(new Error('no parse worker'));
    const id = this.nextId++;
    if (this.idle) clearTimeout(this.idle);
    this.idle = undefined;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      w.postMessage({ id, uri, text } satisfies ParseRequest);
    });
  }

  dispose(): void {
    const w = this.worker;
    this.worker = undefined;
    void w?.terminate();
  }

  private ensure(): Worker | undefined {
    if (this.worker) return this.worker;
    const script = bundlePath();
    if (!script || this.broken) return undefined;
    try {
      // The worker's stdout is kept apart (never piped into the protocol stream on stdout).
      const w = new Worker(script, { workerData: { role: ROLE }, stdout: true, stderr: false });
      w.stdout.resume();
      w.unref();
      w.on('message', (r: ParseReply) => {
        const p = this.pending.get(r.id);
        if (!p) return;
        this.pending.delete(r.id);
        if ('blocks' in r) p.resolve(r.blocks);
        else if ('skipped' in r) p.resolve(undefined);
        else p.reject(new Error(r.error));
        if (this.pending.size === 0) {
          this.idle = setTimeout(() => {
            if (this.pending.size === 0 && this.worker === w) this.dispose();
          }, IDLE_MS);
          this.idle.unref();
        }
      });
      // A worker that dies (e.g. out of memory on a huge note) fails its parses; the next parse starts a new one.
      const fail = (why: string) => {
        if (this.worker !== w) return;
        this.log(`the parse worker stopped: ${why}`);
        this.worker = undefined;
        for (const p of this.pending.values()) p.reject(new Error(why));
        this.pending.clear();
      };
      w.on('error', (e) => fail(e instanceof Error ? e.message : String(e)));
      w.on('exit', (code) => fail(`exit ${code}`));
      this.worker = w;
      return w;
    } catch (e) {
      this.broken = true;
      this.log(`cannot start the parse worker: ${String(e)}`);
      return undefined;
    }
  }
}
