/**
 * The open notes: their text (kept with LSP incremental sync), an incremental evaluation
 * session each, and the scheduling of their evaluation: debounced, sliced, and abandoned
 * when a newer version arrives. Requests that need the current result call `view()`,
 * which finishes any pending evaluation first.
 */
import { fileURLToPath } from 'node:url';
import type { HistoryChunkReader, NoteResult } from '@fatigue-notes/core';
import { NoteSession, type SessionJob, type TextChange } from '@fatigue-notes/core';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { historyReader, isInside, workspaceOf } from '../files/historyReader';
import { debounceDelay } from './diagnostics';
import type { NoteView } from './locate';
import { evaluateOptionsOf, type FatigueSettings } from './settings';

/** Milliseconds of evaluation per slice before the server looks at its queue again. */
const SLICE_MS = 15;
/** Beyond this many pending changes the hints are dropped (the session diffs the text itself). */
const MAX_PENDING_CHANGES = 200;

interface OpenNote {
  doc: TextDocument;
  session: NoteSession;
  /** Changes since the session's committed text, in order. */
  pending: TextChange[];
  /** True when `pending` no longer describes the change (too many): the session diffs the text. */
  pendingOverflow: boolean;
  timer?: ReturnType<typeof setTimeout>;
  job?: { job: SessionJob; version: number; pendingCount: number; busyMs: number };
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

  constructor(private readonly host: DocumentsHost) {}

  has(uri: string): boolean {
    return this.notes.has(uri);
  }

  uris(): string[] {
    return [...this.notes.keys()];
  }

  open(uri: string, languageId: string, version: number, text: string): void {
    this.close(uri);
    const doc = TextDocument.create(uri, languageId, version, text);
    this.notes.set(uri, {
      doc,
      session: this.newSession(uri),
      pending: [],
      pendingOverflow: false,
      evaluatedVersion: -1,
      lastCostMs: 0,
    });
    this.schedule(uri, 0);
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
      note.evaluatedVersion = -1; // a request now evaluates first instead of reading the empty session
      this.schedule(uri, 0);
    }
  }

  /** The note evaluated at its current version (finishing pending work now), or undefined. */
  view(uri: string): NoteView | undefined {
    const note = this.notes.get(uri);
    if (!note) return undefined;
    if (note.evaluatedVersion !== note.doc.version || note.job) this.runNow(uri, note);
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
    return new NoteSession(evaluateOptionsOf(this.host.settings(), this.historiesFor(uri)));
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
      this.startJob(uri, note);
    }, delay);
  }

  private startJob(uri: string, note: OpenNote): void {
    if (this.notes.get(uri) !== note) return;
    const text = note.doc.getText();
    const job = note.session.start(text, note.pendingOverflow ? undefined : note.pending);
    const running = { job, version: note.doc.version, pendingCount: note.pending.length, busyMs: 0 };
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
