/**
 * fatigue-notes for VS Code: starts the language server, and adds the summary panel, the
 * status bar item, the Markdown preview results and the commands.
 */
import * as vscode from 'vscode';
import type { LanguageClient } from 'vscode-languageclient/node';
import { WorkspaceCheck } from './commands/checkWorkspace';
import { exportReport } from './commands/exportReport';
import { insertCheck } from './commands/insertCheck';
import { createLanguageClient } from './languageClient';
import { SummaryPanel } from './panel/summaryPanel';
import { fatiguePreviewPlugin, type MarkdownItLike } from './preview';
import { readSettings, SECTION } from './settings';
import { SafetyFactorStatus, SHOW_SUMMARY_COMMAND } from './statusBar';
import { SummaryService, summaryRequester } from './summaryService';

let client: LanguageClient | undefined;

export async function activate(
  context: vscode.ExtensionContext,
): Promise<{ extendMarkdownIt(md: MarkdownItLike): MarkdownItLike }> {
  const output = vscode.window.createOutputChannel('fatigue-notes', { log: true });
  const serverModule = context.asAbsolutePath('dist/server.js');
  let running = false;

  const service = new SummaryService(() =>
    client && running ? summaryRequester((m, p) => client!.sendRequest(m, p)) : undefined,
  );
  const status = new SafetyFactorStatus();
  const workspaceCheck = new WorkspaceCheck(serverModule);
  const updateStatus = () => status.update(service.current, readSettings().statusBar);

  context.subscriptions.push(
    output,
    service,
    status,
    workspaceCheck,
    service.onDidChange(updateStatus),
    vscode.window.onDidChangeActiveTextEditor(updateStatus),
    vscode.workspace.onDidChangeConfiguration((e) => {
      if (e.affectsConfiguration(SECTION)) updateStatus();
    }),
    vscode.commands.registerCommand(SHOW_SUMMARY_COMMAND, () =>
      SummaryPanel.show(context, service, () => readSettings().significantDigits),
    ),
    // The code lens above each block (from the language server) opens the panel.
    vscode.commands.registerCommand('fatigueNotes.showCheck', () =>
      SummaryPanel.show(context, service, () => readSettings().significantDigits),
    ),
    vscode.commands.registerCommand('fatigueNotes.checkWorkspace', () => workspaceCheck.run()),
    vscode.commands.registerCommand('fatigueNotes.insertCheck', () => insertCheck()),
    vscode.commands.registerCommand('fatigueNotes.exportReport', () => exportReport(serverModule)),
  );

  const start = async () => {
    client = createLanguageClient(context, output);
    try {
      await client.start();
      running = true;
    } catch (e) {
      running = false;
      output.appendLine(`The language server could not start: ${e instanceof Error ? e.message : String(e)}`);
    }
    service.refresh();
  };
  await start();

  // Trust granted: restart so that the server may read load-history files.
  context.subscriptions.push(
    vscode.workspace.onDidGrantWorkspaceTrust(async () => {
      running = false;
      await client?.stop().catch(() => undefined);
      await start();
    }),
  );

  return {
    extendMarkdownIt(md: MarkdownItLike) {
      return fatiguePreviewPlugin(md, () => {
        const s = readSettings();
        return {
          enabled: s.preview,
          unitSystem: s.units,
          significantDigits: s.significantDigits,
          lints: s.lints,
        };
      });
    },
  };
}

export async function deactivate(): Promise<void> {
  await client?.stop();
  client = undefined;
}
