/**
 * The open notes: their text (kept with LSP incremental sync), an incremental evaluation
 * session each, and the scheduling of their evaluation: at once when a note is opened,
 * debounced while it is edited, sliced, and abandoned when a newer version arrives. Requests that need the current result call `view()`,
 * which finishes any pending evaluation first.
 *
 * Large notes (issue 7): the Markdown parse of a note of `LARGE_NOTE_CHARS` or more runs on
 * the parse worker (`parseWorker.ts`) and its blocks are then evaluated in slices here, so
 * that the server keeps answering; requests on such a note are answered from its last
 * evaluated version instead of waiting for the one in progress.
 */
import { fileURLToPath } from 'node:url';
import type { HistoryChunkReader, NoteResult } from '@fatigue-notes/core';
import { NoteSession, type SessionJob, type TextChange } from '@fatigue-notes/core';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { historyReader, isInside, workspaceOf } from '../files/historyReader';
import { debounceDelay } from './diagnostics';
import type { NoteView } from './locate';
import { ParseWorker } from './parseWorker';
import { evaluateOptionsOf, type FatigueSettings } from './settings';

/** Milliseconds of evaluation per slice before the server looks at its queue again. */
const SLICE_MS = 15;
/** Beyond this many pending changes the hints are dropped (the session diffs the text itself). */
const MAX_PENDING_CHANGES = 200;
/** Notes at least this long are parsed off the main thread and never finished by a request. */
export const LARGE_NOTE_CHARS = 256 * 1024;
/** Largest note parsed on the main thread when the parse worker failed on it. */
const MAIN_THREAD_PARSE_CHARS = 2 * 1024 * 1024;
/** Milliseconds a check may read history files while the engineer types (the command line has its own budget, cli/historyLimits.ts). */
export const HISTORY_BUDGET_MS = 3000;

interface OpenNote {
  doc: TextDocument;
  session: NoteSession;
  /** Changes since the session's committed text, in order. */
  pending: TextChange[];
  /** True when `pending` no longer describes the change (too many): the session diffs the text. */
  pendingOverflow: boolean;
  timer?: ReturnType<typeof setTimeout>;
  job?: { job: SessionJob; version: number; pendingCount: number; busyMs: number };
  /** A parse of a large note in flight on the parse worker, for this version. */
  parse?: { version: number };
  evaluatedVersion: number;
  lastCostMs: number;
}

export interface DocumentsHost {
  settings(): FatigueSettings;
  workspaceFolders(): string[];
  allowHistoryReads(): boolean;
  /** Called with every newly evaluated version. */
  onEvaluated(uri: string, version: number, view: NoteView): void;
  onError(message: string): void;
}

export class NoteDocuments {
  private readonly notes = new Map<string, OpenNote>();
  private readonly parser: ParseWorker;

  constructor(private readonly host: DocumentsHost) {
    this.parser = new ParseWorker((m) => host.onError(m));
  }

  has(uri: string): boolean {
    return this.notes.has(uri);
  }

  uris(): string[] {
    return [...this.notes.keys()];
  }

  open(uri: string, languageId: string, version: number, text: string): void {
    // (The server checks a notification's params first; this keeps the state whole if not.)
    if (typeof text !== 'string' || typeof uri !== 'string')
      throw new TypeError('open needs a uri and a text');
    this.close(uri);
    const doc = TextDocument.create(uri, languageId, version, text);
    const note: OpenNote = {
      doc,
      session: this.newSession(uri),
      pending: [],
      pendingOverflow: false,
      evaluatedVersion: -1,
      lastCostMs: 0,
    };
    this.notes.set(uri, note);
    // No debounce on open: the first slice runs now, and a small note is published at once.
    this.startJob(uri, note);
  }

  change(uri: string, version: number, changes: Array<{ range?: TextChange['range']; text: string }>): void {
    const note = this.notes.get(uri);
    if (!note) return;
    note.doc = TextDocument.update(note.doc, changes, version);
    for (const c of changes) {
      if (c.range) note.pending.push({ range: c.range, text: c.text });
      else note.pendingOverflow = true;
    }
    if (note.pending.length > MAX_PENDING_CHANGES) note.pendingOverflow = true;
    note.job = undefined; // stale: its slices stop
    this.schedule(uri, debounceDelay(note.lastCostMs));
  }

  close(uri: string): boolean {
    const note = this.notes.get(uri);
    if (!note) return false;
    if (note.timer) clearTimeout(note.timer);
    note.session.reset(); // supersedes a running job
    note.parse = undefined;
    this.notes.delete(uri);
    return true;
  }

  /** Settings or files changed: evaluate every open note again from scratch. */
  reevaluateAll(): void {
    for (const [uri, note] of this.notes) {
      note.session = this.newSession(uri);
      note.pending = [];
      note.pendingOverflow = false;
      note.job = undefined;
      note.parse = undefined;
      note.evaluatedVersion = -1; // a request now evaluates first instead of reading the empty session
      this.schedule(uri, 0);
    }
  }

  /** The note evaluated at its current version (finishing pending work now), or undefined. */
  view(uri: string): NoteView | undefined {
    const note = this.notes.get(uri);
    if (!note) return undefined;
    // A large note is not finished here: its last evaluated version answers meanwhile.
    if ((note.evaluatedVersion !== note.doc.version || note.job || note.parse) && !isLarge(note))
      this.runNow(uri, note);
    return this.viewOf(uri, note);
  }

  private viewOf(uri: string, note: OpenNote): NoteView {
    const session = note.session;
    return {
      uri,
      version: note.evaluatedVersion,
      result: session.result(),
      lineCount: session.lineCount(),
      line: (n) => session.lineAt(n),
      settings: this.host.settings(),
      timings: session.timings(),
    };
  }

  private newSession(uri: string): NoteSession {
    const options = evaluateOptionsOf(this.host.settings(), this.historiesFor(uri));
    return new NoteSession({ ...options, historyBudgetMs: HISTORY_BUDGET_MS });
  }

  private historiesFor(uri: string): HistoryChunkReader | undefined {
    if (!uri.startsWith('file:')) return undefined;
    let path: string;
    try {
      path = fileURLToPath(uri);
    } catch {
      return undefined;
    }
    const folders = this.host.workspaceFolders().filter((f) => isInside(f, path));
    folders.sort((a, b) => b.length - a.length);
    const root = folders[0] ?? workspaceOf(path);
    return historyReader(path, root, this.host.allowHistoryReads());
  }

  private schedule(uri: string, delay: number): void {
    const note = this.notes.get(uri);
    if (!note) return;
    if (note.timer) clearTimeout(note.timer);
    note.timer = setTimeout(() => {
      note.timer = undefined;
      // A timer has no caller to catch for it: a failure is logged and the note starts over.
      try {
        this.startJob(uri, note);
      } catch (e) {
        this.failed(uri, note, e);
      }
    }, delay);
  }

  private failed(uri: string, note: OpenNote, e: unknown): void {
    this.host.onError(`evaluation of ${uri} failed: ${e instanceof Error ? e.stack : String(e)}`);
    note.job = undefined;
    note.parse = undefined;
    note.session = this.newSession(uri);
    note.pending = [];
    note.pendingOverflow = false;
    note.evaluatedVersion = -1;
  }

  private startJob(uri: string, note: OpenNote): void {
    if (this.notes.get(uri) !== note) return;
    const text = note.doc.getText();
    const version = note.doc.version;
    const pendingCount = note.pending.length;
    const changes = note.pendingOverflow ? undefined : note.pending.slice();
    note.parse = undefined;
    if (isLarge(note) && this.parser.available() && note.session.needsFullParse(text, changes)) {
      const marker = { version };
      note.parse = marker;
      const current = () => this.notes.get(uri) === note && note.parse === marker;
      this.parser.parse(uri, text).then(
        (blocks) => {
          if (!current()) return;
          note.parse = undefined;
          // Skipped: a newer text of this note is being parsed and will be evaluated.
          try {
            if (blocks)
              this.runJob(uri, note, note.session.start(text, changes, blocks), version, pendingCount);
          } catch (e) {
            this.failed(uri, note, e);
          }
        },
        (e: Error) => {
          if (!current()) return;
          note.parse = undefined;
          // Parsing here what the worker could not would risk the server itself (its memory):
          // only a note of moderate size is parsed here instead.
          const here = text.length <= MAIN_THREAD_PARSE_CHARS;
          this.host.onError(
            `parse of ${uri} on the worker failed (${e.message})${here ? ': parsing it here' : ': it is not evaluated'}`,
          );
          if (here) this.runJob(uri, note, note.session.start(text, changes), version, pendingCount);
        },
      );
      return;
    }
    this.runJob(uri, note, note.session.start(text, changes), version, pendingCount);
  }

  /** Evaluate in slices of `SLICE_MS`, then commit (dropped when a newer version takes over). */
  private runJob(uri: string, note: OpenNote, job: SessionJob, version: number, pendingCount: number): void {
    const running = { job, version, pendingCount, busyMs: 0 };
    note.job = running;
    const slice = () => {
      // A newer version, a close or a synchronous finish took over: drop this work.
      if (this.notes.get(uri) !== note || note.job !== running || job.closed) return;
      const t0 = performance.now();
      let more = true;
      try {
        while (more && performance.now() - t0 < SLICE_MS) more = job.step();
      } catch (e) {
        this.host.onError(`evaluation of ${uri} failed: ${e instanceof Error ? e.stack : String(e)}`);
        note.job = undefined;
        note.session = this.newSession(uri);
        note.evaluatedVersion = -1;
        return;
      }
      running.busyMs += performance.now() - t0;
      if (more) setImmediate(slice);
      else this.commit(uri, note);
    };
    slice();
  }

  /** Finish the note's evaluation synchronously (a request needs the current result). */
  private runNow(uri: string, note: OpenNote): void {
    if (note.timer) {
      clearTimeout(note.timer);
      note.timer = undefined;
    }
    note.parse = undefined;
    if (!note.job || note.job.version !== note.doc.version || note.job.job.closed) {
      const text = note.doc.getText();
      const job = note.session.start(text, note.pendingOverflow ? undefined : note.pending);
      note.job = { job, version: note.doc.version, pendingCount: note.pending.length, busyMs: 0 };
    }
    this.commit(uri, note);
  }

  private commit(uri: string, note: OpenNote): NoteResult | undefined {
    const running = note.job;
    if (!running) return undefined;
    const t0 = performance.now();
    let result: NoteResult;
    try {
      result = running.job.finish();
    } catch (e) {
      note.job = undefined;
      this.host.onError(`evaluation of ${uri} failed: ${e instanceof Error ? e.stack : String(e)}`);
      // Start over from scratch next time: the session may be behind the text.
      note.session = this.newSession(uri);
      note.pending = [];
      note.pendingOverflow = false;
      note.evaluatedVersion = -1;
      return undefined;
    }
    note.lastCostMs = running.busyMs + performance.now() - t0;
    note.job = undefined;
    note.pending.splice(0, running.pendingCount);
    if (note.pending.length === 0) note.pendingOverflow = false;
    note.evaluatedVersion = running.version;
    this.host.onEvaluated(uri, running.version, this.viewOf(uri, note));
    if (running.version !== note.doc.version && !note.timer) this.schedule(uri, 0);
    return result;
  }
}

function isLarge(note: OpenNote): boolean {
  return note.doc.getText().length >= LARGE_NOTE_CHARS;
}
