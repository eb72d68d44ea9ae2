/**
 * fatigue-notes for VS Code: starts the language server, and adds the summary panel, the
 * status bar item, the Markdown preview results and the commands. The language server is
 * the one place that evaluates: everything here presents its results.
 */
import * as vscode from 'vscode';
import type { LanguageClient } from 'vscode-languageclient/node';
import { WorkspaceCheck } from './commands/checkWorkspace';
import { exportReport } from './commands/exportReport';
import { insertCheck } from './commands/insertCheck';
import { createLanguageClient } from './languageClient';
import { SummaryPanel } from './panel/summaryPanel';
import { fatiguePreviewPlugin, type MarkdownItLike } from './preview';
import { PreviewResultStore } from './previewResults';
import { readSettings, SECTION } from './settings';
import { SafetyFactorStatus, SHOW_SUMMARY_COMMAND } from './statusBar';
import { SummaryService, summaryRequester } from './summaryService';

let client: LanguageClient | undefined;

export async function activate(
  context: vscode.ExtensionContext,
): Promise<{ extendMarkdownIt(md: MarkdownItLike): MarkdownItLike }> {
  const t0 = performance.now();
  const output = vscode.window.createOutputChannel('fatigue-notes', { log: true });
  const serverModule = context.asAbsolutePath('dist/server.js');
  let running = false;
  /** Settles when the server has started (or failed to); requests made meanwhile wait for it. */
  let ready: Promise<void> = Promise.resolve();

  const send = async <R>(method: string, params: unknown): Promise<R> => {
    await ready;
    if (!client || !running) throw new Error('the language server is not running');
    return client.sendRequest<R>(method, params);
  };
  const requester = () => (client ? summaryRequester(send) : undefined);
  const service = new SummaryService(requester);
  const previews = new PreviewResultStore(requester, service);
  const status = new SafetyFactorStatus();
  const workspaceCheck = new WorkspaceCheck(serverModule);
  const updateStatus = () => status.update(service.current, readSettings().statusBar);

  context.subscriptions.push(
    output,
    service,
    previews,
    status,
    workspaceCheck,
    service.onDidChange(updateStatus),
    vscode.window.onDidChangeActiveTextEditor(updateStatus),
    vscode.workspace.onDidChangeConfiguration((e) => {
      if (e.affectsConfiguration(SECTION)) updateStatus();
    }),
    vscode.commands.registerCommand(SHOW_SUMMARY_COMMAND, () => SummaryPanel.show(context, service)),
    // The code lens above each block (from the language server) opens the panel.
    vscode.commands.registerCommand('fatigueNotes.showCheck', (uri?: unknown, id?: unknown) =>
      SummaryPanel.show(
        context,
        service,
        typeof uri === 'string' && typeof id === 'string' ? { uri, id } : undefined,
      ),
    ),
    vscode.commands.registerCommand('fatigueNotes.checkWorkspace', () => workspaceCheck.run()),
    vscode.commands.registerCommand('fatigueNotes.insertCheck', () => insertCheck(send)),
    vscode.commands.registerCommand('fatigueNotes.exportReport', () => exportReport(serverModule)),
  );

  const start = async () => {
    const s0 = performance.now();
    client = createLanguageClient(context, output);
    try {
      await client.start();
      running = true;
      output.info(`language server ready in ${(performance.now() - s0).toFixed(0)} ms`);
    } catch (e) {
      running = false;
      output.error(`The language server could not start: ${e instanceof Error ? e.message : String(e)}`);
    }
    service.refresh();
    previews.restarted();
  };
  // The server starts in the background: activation does not wait for it (the preview's
  // first render does not either), and requests made meanwhile are answered once it runs.
  ready = start();

  // Trust granted: restart so that the server may read load-history files.
  context.subscriptions.push(
    vscode.workspace.onDidGrantWorkspaceTrust(() => {
      running = false;
      const previous = client;
      ready = (async () => {
        await previous?.stop().catch(() => undefined);
        await start();
      })();
    }),
  );

  output.info(`activated in ${(performance.now() - t0).toFixed(1)} ms`);
  return {
    extendMarkdownIt(md: MarkdownItLike) {
      return fatiguePreviewPlugin(
        md,
        () => ({ enabled: readSettings().preview }),
        (uri) => previews.lookup(uri),
      );
    },
  };
}

export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
