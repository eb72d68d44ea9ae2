/**
 * Keeps the summary of the note the engineer is looking at: follows the active Markdown
 * editor, asks the language server for `fatigue/summary` as soon as the note is opened (no
 * debounce) and again once typing has paused, and tells the panel, the status bar and the
 * preview.
 */
import * as vscode from 'vscode';
import { SECTION } from './settings';
import { SUMMARY_REQUEST, type SummaryCheck, type SummaryParams, type SummaryResult } from './summary';

/** Pause after the last keystroke before asking again (the panel must follow within 300 ms). */
export const TYPING_PAUSE_MS = 60;

export interface SummaryState {
  /** The note shown, or undefined when no Markdown note has been opened yet. */
  document?: { uri: vscode.Uri; fileName: string; version: number };
  /** The version of the note the server's results are of (absent until they arrive). */
  version?: number;
  checks: SummaryCheck[];
  /** Why there are no results (server not running, request failed). */
  error?: string;
}

export type SummaryRequester = (params: SummaryParams) => Promise<SummaryResult>;

export class SummaryService implements vscode.Disposable {
  private readonly emitter = new vscode.EventEmitter<SummaryState>();
  readonly onDidChange = this.emitter.event;
  private state: SummaryState = { checks: [] };
  private doc: vscode.TextDocument | undefined;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private sequence = 0;
  private readonly subscriptions: vscode.Disposable[] = [];

  constructor(private readonly request: () => SummaryRequester | undefined) {
    this.subscriptions.push(
      vscode.window.onDidChangeActiveTextEditor((e) => {
        if (e && isNote(e.document)) this.follow(e.document);
      }),
      vscode.workspace.onDidChangeTextDocument((e) => {
        if (this.doc && e.document === this.doc && e.contentChanges.length > 0)
          this.schedule(TYPING_PAUSE_MS);
      }),
      vscode.workspace.onDidCloseTextDocument((d) => {
        if (d === this.doc) {
          const next = vscode.window.activeTextEditor?.document;
          if (next && isNote(next) && next !== d) this.follow(next);
        }
      }),
      vscode.workspace.onDidChangeConfiguration((e) => {
        // The server reads the new settings first; ask a moment later.
        if (e.affectsConfiguration(SECTION)) this.schedule(150);
      }),
    );
    const active = vscode.window.activeTextEditor?.document;
    if (active && isNote(active)) this.doc = active;
  }

  get current(): SummaryState {
    return this.state;
  }

  get document(): vscode.TextDocument | undefined {
    return this.doc;
  }

  /** Show this note (also used when the panel opens on a note that is not active): asks at once. */
  follow(doc: vscode.TextDocument): void {
    if (this.doc !== doc) {
      this.doc = doc;
      this.state = { document: describe(doc), checks: [] };
    }
    this.now();
  }

  /** Ask again now (the server restarted, the panel opened ...). */
  refresh(): void {
    this.now();
  }

  private now(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = undefined;
    void this.fetch();
  }

  private schedule(ms: number): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = undefined;
      void this.fetch();
    }, ms);
  }

  private async fetch(): Promise<void> {
    const doc = this.doc;
    if (!doc) {
      this.publish({ checks: [] });
      return;
    }
    const send = this.request();
    const seq = ++this.sequence;
    if (!send) {
      this.publish({
        document: describe(doc),
        checks: [],
        error: 'The fatigue-notes language server is not running.',
      });
      return;
    }
    try {
      const result = await send({ uri: doc.uri.toString() });
      if (seq !== this.sequence) return; // a newer request is on its way
      const checks = Array.isArray(result?.checks) ? result.checks : [];
      const version = typeof result?.version === 'number' ? result.version : undefined;
      this.publish({ document: describe(doc), checks, ...(version !== undefined ? { version } : {}) });
    } catch (e) {
      if (seq !== this.sequence) return;
      const msg = e instanceof Error ? e.message : String(e);
      this.publish({
        document: describe(doc),
        checks: [],
        error: `The language server did not answer the summary request (${msg}).`,
      });
    }
  }

  private publish(s: SummaryState): void {
    this.state = s;
    this.emitter.fire(s);
  }

  dispose(): void {
    if (this.timer) clearTimeout(this.timer);
    for (const d of this.subscriptions) d.dispose();
    this.emitter.dispose();
  }
}

export function isNote(doc: vscode.TextDocument): boolean {
  return doc.languageId === 'markdown';
}

function describe(doc: vscode.TextDocument): SummaryState['document'] {
  return {
    uri: doc.uri,
    fileName: doc.uri.path.split('/').pop() ?? doc.uri.toString(),
    version: doc.version,
  };
}

export const summaryRequester =
  (send: <R>(method: string, params: unknown) => Promise<R>): SummaryRequester =>
  (params) =>
    send<SummaryResult>(SUMMARY_REQUEST, params);
