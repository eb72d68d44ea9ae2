/**
 * "Export a report of this note (HTML)…": asks the bundled checker (`fatigue-notes report`)
 * to write a self-contained HTML report, and says plainly when it cannot.
 */
import * as vscode from 'vscode';
import { firstLine } from './checkWorkspace';
import { runCli } from './runCli';

export async function exportReport(serverModule: string): Promise<void> {
  const doc = vscode.window.activeTextEditor?.document;
  if (doc?.languageId !== 'markdown') {
    void vscode.window.showInformationMessage('Open the Markdown note whose report you want to export.');
    return;
  }
  if (doc.uri.scheme !== 'file') {
    void vscode.window.showWarningMessage('fatigue-notes: only a note saved on disk can be exported.');
    return;
  }
  if (doc.isDirty && !(await doc.save())) return;
  const target = await vscode.window.showSaveDialog({
    defaultUri: doc.uri.with({ path: doc.uri.path.replace(/\.md$/i, '') + '.html' }),
    filters: { 'HTML report': ['html'] },
    title: 'Export the fatigue report of this note',
  });
  if (!target) return;
  const res = await vscode.window.withProgress(
    { location: vscode.ProgressLocation.Notification, title: 'fatigue-notes: writing the report' },
    () =>
      runCli(serverModule, ['report', doc.uri.fsPath, '-o', target.fsPath], {
        cwd: vscode.workspace.getWorkspaceFolder(doc.uri)?.uri.fsPath,
      }).catch((e: unknown) => ({
        code: -1,
        stdout: '',
        stderr: e instanceof Error ? e.message : String(e),
      })),
  );
  if (res.code !== 0) {
    const why = firstLine(res.stderr);
    const missing = /unknown command|usage/i.test(res.stderr);
    void vscode.window.showErrorMessage(
      missing
        ? 'fatigue-notes: this version of the checker cannot write reports yet (its `report` command is missing). The note itself is unchanged.'
        : `fatigue-notes: the report could not be written${why ? `: ${why}` : ` (exit code ${res.code})`}.`,
    );
    return;
  }
  const open = await vscode.window.showInformationMessage(
    `Report written to ${vscode.workspace.asRelativePath(target)}.`,
    'Open',
  );
  if (open) await vscode.env.openExternal(target);
}
