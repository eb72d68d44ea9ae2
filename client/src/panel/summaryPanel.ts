/**
 * The summary panel (a webview beside the editor): shows the checks of the note the
 * SummaryService follows, and reveals a block when a row is chosen.
 */
import * as vscode from 'vscode';
import type { SummaryService, SummaryState } from '../summaryService';
import { DIAGRAM_STYLE_FILE, makeNonce, panelHtml } from './html';
import { buildPanelModel } from './model';
import type { FromPanel, ToPanel } from './protocol';

export const PANEL_VIEW_TYPE = 'fatigueNotes.summary';

export class SummaryPanel implements vscode.Disposable {
  private static current: SummaryPanel | undefined;
  private readonly disposables: vscode.Disposable[] = [];
  private ready = false;
  /** A check to select once the note it belongs to is shown. */
  private select: { uri: string; id: string } | undefined;

  /** Opens (or reveals) the panel; `select` names a check to select (from the lens above its block). */
  static show(
    context: vscode.ExtensionContext,
    service: SummaryService,
    select?: { uri: string; id: string },
  ): SummaryPanel {
    const doc = vscode.window.activeTextEditor?.document;
    if (doc && doc.languageId === 'markdown') service.follow(doc);
    else service.refresh();
    if (SummaryPanel.current) {
      SummaryPanel.current.select = select;
      SummaryPanel.current.post(service.current);
      SummaryPanel.current.panel.reveal(vscode.ViewColumn.Beside, true);
      return SummaryPanel.current;
    }
    const panel = vscode.window.createWebviewPanel(
      PANEL_VIEW_TYPE,
      'Fatigue checks',
      { viewColumn: vscode.ViewColumn.Beside, preserveFocus: true },
      {
        enableScripts: true,
        retainContextWhenHidden: false,
        localResourceRoots: [
          vscode.Uri.joinPath(context.extensionUri, 'dist'),
          vscode.Uri.joinPath(context.extensionUri, 'media'),
        ],
      },
    );
    panel.iconPath = vscode.Uri.joinPath(context.extensionUri, 'media', 'icon.png');
    SummaryPanel.current = new SummaryPanel(panel, context, service);
    SummaryPanel.current.select = select;
    return SummaryPanel.current;
  }

  private constructor(
    private readonly panel: vscode.WebviewPanel,
    context: vscode.ExtensionContext,
    private readonly service: SummaryService,
  ) {
    const webview = panel.webview;
    webview.html = panelHtml({
      cspSource: webview.cspSource,
      nonce: makeNonce(),
      scriptUri: webview
        .asWebviewUri(vscode.Uri.joinPath(context.extensionUri, 'dist', 'panel.js'))
        .toString(),
      styleUri: webview
        .asWebviewUri(vscode.Uri.joinPath(context.extensionUri, 'media', 'panel.css'))
        .toString(),
      diagramStyleUri: webview
        .asWebviewUri(vscode.Uri.joinPath(context.extensionUri, 'dist', DIAGRAM_STYLE_FILE))
        .toString(),
    });
    this.disposables.push(
      webview.onDidReceiveMessage((m: FromPanel) => this.onMessage(m)),
      service.onDidChange((s) => this.post(s)),
      panel.onDidChangeViewState((e) => {
        // A hidden webview loses its page; it says `ready` again when shown.
        if (!e.webviewPanel.visible) this.ready = false;
      }),
      panel.onDidDispose(() => this.dispose()),
    );
  }

  private post(s: SummaryState): void {
    if (!this.ready) return;
    const model = buildPanelModel(s.document, s.checks, s.error);
    const msg: ToPanel = { type: 'model', model };
    if (
      this.select &&
      s.document?.uri.toString() === this.select.uri &&
      model.rows.some((r) => r.key === this.select?.id)
    ) {
      msg.select = this.select.id;
      this.select = undefined;
    }
    void this.panel.webview.postMessage(msg);
    this.panel.title = s.document ? `Fatigue checks: ${s.document.fileName}` : 'Fatigue checks';
  }

  private async onMessage(m: FromPanel): Promise<void> {
    switch (m.type) {
      case 'ready':
        this.ready = true;
        this.post(this.service.current);
        break;
      case 'reveal':
        await this.reveal(m.index);
        break;
      default:
        break;
    }
  }

  /** Shows the block of the check in its editor, keeping the keyboard in the panel. */
  private async reveal(index: number): Promise<void> {
    const s = this.service.current;
    const check = s.checks[index];
    if (!check || !s.document) return;
    const doc = await vscode.workspace.openTextDocument(s.document.uri);
    const visible = vscode.window.visibleTextEditors.find((e) => e.document === doc);
    const editor = await vscode.window.showTextDocument(doc, {
      viewColumn: visible?.viewColumn ?? vscode.ViewColumn.One,
      preserveFocus: true,
      preview: false,
    });
    const r = check.headerRange;
    const range = new vscode.Range(r.start.line, r.start.character, r.end.line, r.end.character);
    editor.selection = new vscode.Selection(range.start, range.end);
    editor.revealRange(
      new vscode.Range(check.range.start.line, 0, check.range.end.line, 0),
      vscode.TextEditorRevealType.InCenterIfOutsideViewport,
    );
  }

  dispose(): void {
    SummaryPanel.current = undefined;
    for (const d of this.disposables) d.dispose();
    this.disposables.length = 0;
    this.panel.dispose();
  }
}
