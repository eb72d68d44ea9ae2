/**
 * "Check every note in the workspace": runs the bundled checker over the workspace's
 * Markdown files and lists what it finds in the Problems view. Notes open in an editor are
 * left to the language server (their problems are already live), so nothing is listed twice.
 */
import * as vscode from 'vscode';
import { runCli } from './runCli';

const EXCLUDE = '{**/node_modules/**,**/.git/**,**/dist/**,**/.tools/**,**/test-output/**}';
const BATCH = 80;

interface CheckJson {
  files: Array<{
    path: string;
    checks: Array<{ id: string | null; status: string }>;
    diagnostics: Array<{
      line: number;
      column: number;
      endLine: number;
      endColumn: number;
      severity: 'error' | 'warning' | 'information' | 'hint';
      code: string;
      message: string;
      check?: string | null;
    }>;
  }>;
}

const SEVERITY: Record<string, vscode.DiagnosticSeverity> = {
  error: vscode.DiagnosticSeverity.Error,
  warning: vscode.DiagnosticSeverity.Warning,
  information: vscode.DiagnosticSeverity.Information,
  hint: vscode.DiagnosticSeverity.Hint,
};

export class WorkspaceCheck implements vscode.Disposable {
  private readonly collection = vscode.languages.createDiagnosticCollection('fatigue-notes (workspace)');
  private readonly subscriptions: vscode.Disposable[] = [];

  constructor(private readonly serverModule: string) {
    // Once a note is open, the language server's live diagnostics replace these.
    this.subscriptions.push(vscode.workspace.onDidOpenTextDocument((d) => this.collection.delete(d.uri)));
  }

  async run(): Promise<void> {
    if (!vscode.workspace.isTrusted) {
      void vscode.window.showWarningMessage(
        'fatigue-notes: checking every note from disk reads load-history files, so it needs a trusted workspace. Open notes are still checked as you type.',
      );
      return;
    }
    const folders = vscode.workspace.workspaceFolders ?? [];
    if (folders.length === 0) {
      void vscode.window.showInformationMessage('fatigue-notes: open a folder to check every note in it.');
      return;
    }
    const summary = await vscode.window.withProgress(
      {
        location: vscode.ProgressLocation.Notification,
        title: 'fatigue-notes: checking the notes of the workspace',
        cancellable: true,
      },
      async (progress, token) => {
        const files = (await vscode.workspace.findFiles('**/*.md', EXCLUDE, 5000, token)).filter(
          (u) => u.scheme === 'file',
        );
        const open = new Set(vscode.workspace.textDocuments.map((d) => d.uri.toString()));
        this.collection.clear();
        const abort = new AbortController();
        token.onCancellationRequested(() => abort.abort());
        let checks = 0;
        let failed = 0;
        let errors = 0;
        let notesWithChecks = 0;
        for (let i = 0; i < files.length && !token.isCancellationRequested; i += BATCH) {
          const batch = files.slice(i, i + BATCH);
          progress.report({
            message: `${Math.min(i + BATCH, files.length)} of ${files.length} files`,
            increment: (batch.length / files.length) * 100,
          });
          const res = await runCli(
            this.serverModule,
            ['check', ...batch.map((u) => u.fsPath), '--format', 'json'],
            {
              cwd: folders[0].uri.fsPath,
              signal: abort.signal,
            },
          ).catch((e: unknown) => ({
            code: -1,
            stdout: '',
            stderr: e instanceof Error ? e.message : String(e),
          }));
          let json: CheckJson;
          try {
            json = JSON.parse(res.stdout) as CheckJson;
          } catch {
            if (token.isCancellationRequested) return undefined;
            void vscode.window.showErrorMessage(
              `fatigue-notes: the checker did not answer (${firstLine(res.stderr) || `exit code ${res.code}`}).`,
            );
            return undefined;
          }
          for (const f of json.files ?? []) {
            const uri = vscode.Uri.file(
              f.path.startsWith('/') ? f.path : vscode.Uri.joinPath(folders[0].uri, f.path).fsPath,
            );
            if (f.checks.length > 0) notesWithChecks++;
            checks += f.checks.length;
            failed += f.checks.filter((c) => c.status === 'fail').length;
            errors += f.checks.filter((c) => c.status === 'error').length;
            if (open.has(uri.toString())) continue;
            this.collection.set(
              uri,
              f.diagnostics.map((d) => {
                const r = new vscode.Range(d.line - 1, d.column - 1, d.endLine - 1, d.endColumn - 1);
                const diag = new vscode.Diagnostic(
                  r,
                  d.message,
                  SEVERITY[d.severity] ?? vscode.DiagnosticSeverity.Warning,
                );
                diag.code = d.code;
                diag.source = 'fatigue-notes';
                return diag;
              }),
            );
          }
        }
        return `fatigue-notes: ${checks} check${checks === 1 ? '' : 's'} in ${notesWithChecks} note${notesWithChecks === 1 ? '' : 's'}: ${failed} failed, ${errors} with errors.`;
      },
    );
    // The progress ends with the check; the totals stay until the engineer dismisses them.
    if (!summary) return;
    const action = await vscode.window.showInformationMessage(summary, 'Show Problems');
    if (action) await vscode.commands.executeCommand('workbench.actions.view.problems');
  }

  dispose(): void {
    for (const s of this.subscriptions) s.dispose();
    this.collection.dispose();
  }
}

export function firstLine(s: string): string {
  return s.trim().split('\n')[0]?.trim() ?? '';
}
