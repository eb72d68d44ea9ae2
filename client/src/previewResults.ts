/**
 * The language server's results for the notes the Markdown preview shows, by document URI
 * and version: the `fatigue/summary` records the panel receives (shared with the summary
 * service), asked for when the preview renders a version it has none for, and again when
 * the server publishes its evaluation of such a note. When results for the version a
 * preview waits on arrive, the preview is refreshed (`markdown.preview.refresh`).
 */
import * as vscode from 'vscode';
import type { PreviewResults } from './preview';
import type { SummaryCheck } from './summary';
import type { SummaryRequester, SummaryService } from './summaryService';

interface Held {
  version: number;
  checks: SummaryCheck[];
}

export class PreviewResultStore implements vscode.Disposable {
  private readonly held = new Map<string, Held>();
  /** Notes with a request in flight (one at a time per note). */
  private readonly asking = new Set<string>();
  /** The last request that failed, by note: the preview says so instead of waiting. */
  private readonly failed = new Map<string, { version: number; message: string }>();
  /** Notes a preview rendered without results: refresh it when they come. */
  private readonly waiting = new Set<string>();
  /** Notes some preview has rendered: keep their results current. */
  private readonly previewed = new Set<string>();
  private readonly subscriptions: vscode.Disposable[] = [];
  private refreshTimer: ReturnType<typeof setTimeout> | undefined;

  constructor(
    private readonly request: () => SummaryRequester | undefined,
    service: SummaryService,
  ) {
    this.subscriptions.push(
      service.onDidChange((s) => {
        if (s.document && s.version !== undefined && !s.error)
          this.store(s.document.uri.toString(), s.version, s.checks);
      }),
      // A previewed note changed: ask at once, so that the results are often in before the
      // preview renders the new text (one request at a time per note keeps pace with the server).
      vscode.workspace.onDidChangeTextDocument((e) => {
        if (this.previewed.has(e.document.uri.toString()) && e.contentChanges.length > 0)
          this.ask(e.document);
      }),
      // The server publishes diagnostics after every evaluation (a large note finishes later).
      vscode.languages.onDidChangeDiagnostics((e) => {
        for (const u of e.uris) {
          const uri = u.toString();
          if (!this.previewed.has(uri)) continue;
          const doc = openDocument(uri);
          if (doc && this.held.get(uri)?.version !== doc.version) this.ask(doc);
        }
      }),
      vscode.workspace.onDidCloseTextDocument((d) => {
        const uri = d.uri.toString();
        this.held.delete(uri);
        this.failed.delete(uri);
        this.previewed.delete(uri);
        this.waiting.delete(uri);
      }),
    );
  }

  /** What the preview shows for this note now (asks the server when it has nothing current). */
  lookup(uri: string | undefined): PreviewResults {
    if (!uri)
      return { state: 'unavailable', message: 'fatigue-notes shows results for a note open in the editor.' };
    const doc = openDocument(uri);
    if (!doc)
      return { state: 'unavailable', message: 'fatigue-notes shows results for a note open in the editor.' };
    this.previewed.add(uri);
    const held = this.held.get(uri);
    if (held && held.version === doc.version) return { state: 'ready', checks: held.checks };
    const failed = this.failed.get(uri);
    if (failed && failed.version === doc.version) return { state: 'unavailable', message: failed.message };
    this.waiting.add(uri);
    if (!this.request()) return { state: 'evaluating' }; // the server is starting: `restarted()` asks again
    this.ask(doc);
    return { state: 'evaluating' };
  }

  /** The server (re)started: what was held may be of another evaluation; previews ask again. */
  restarted(): void {
    this.held.clear();
    this.asking.clear();
    this.failed.clear();
    if (this.previewed.size > 0) this.refreshSoon();
  }

  private ask(doc: vscode.TextDocument): void {
    const uri = doc.uri.toString();
    if (this.asking.has(uri)) return; // the answer asks again if the note has moved on meanwhile
    const send = this.request();
    if (!send) return;
    const version = doc.version;
    this.asking.add(uri);
    send({ uri }).then(
      (r) => {
        this.asking.delete(uri);
        if (!Array.isArray(r?.checks)) return;
        const got = typeof r.version === 'number' ? r.version : version;
        this.store(uri, got, r.checks);
        const now = openDocument(uri);
        if (now && now.version > got && this.previewed.has(uri) && got >= version) this.ask(now);
      },
      (e: unknown) => {
        this.asking.delete(uri);
        const why = e instanceof Error ? e.message : String(e);
        this.failed.set(uri, {
          version,
          message: `No results from the fatigue-notes language server (${why}).`,
        });
        if (this.waiting.delete(uri)) this.refreshSoon();
      },
    );
  }

  private store(uri: string, version: number, checks: SummaryCheck[]): void {
    const prev = this.held.get(uri);
    if (prev && prev.version > version) return;
    this.held.set(uri, { version, checks });
    const doc = openDocument(uri);
    if (this.waiting.has(uri) && doc && doc.version === version) {
      this.waiting.delete(uri);
      this.refreshSoon();
    }
  }

  private refreshSoon(): void {
    if (this.refreshTimer) return;
    this.refreshTimer = setTimeout(() => {
      this.refreshTimer = undefined;
      void vscode.commands.executeCommand('markdown.preview.refresh').then(undefined, () => undefined);
    }, 0);
  }

  dispose(): void {
    if (this.refreshTimer) clearTimeout(this.refreshTimer);
    for (const d of this.subscriptions) d.dispose();
  }
}

function openDocument(uri: string): vscode.TextDocument | undefined {
  return vscode.workspace.textDocuments.find((d) => d.uri.toString() === uri);
}
