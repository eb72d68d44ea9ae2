/**
 * Runs inside the VS Code extension host (@vscode/test-electron calls `run`). Opens the
 * real-editor test's notes and checks what the engineer would see, through VS Code's own
 * provider commands. Plain `node:assert`: no test framework is needed here.
 */
import assert from 'node:assert/strict';
import * as vscode from 'vscode';

const EXTENSION_ID = 'fatigue-notes.fatigue-notes';

async function waitFor<T>(
  fn: () => T | undefined | Promise<T | undefined>,
  what: string,
  ms = 30_000,
): Promise<T> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    const v = await fn();
    if (v) return v;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`timed out waiting for ${what}`);
}

async function open(name: string): Promise<vscode.TextDocument> {
  const [uri] = await vscode.workspace.findFiles(name);
  assert.ok(uri, `${name} is in the test workspace`);
  const doc = await vscode.workspace.openTextDocument(uri);
  await vscode.window.showTextDocument(doc);
  return doc;
}

function lineOf(doc: vscode.TextDocument, text: string): number {
  for (let i = 0; i < doc.lineCount; i++) if (doc.lineAt(i).text.includes(text)) return i;
  throw new Error(`no line with ${text}`);
}

const tests: Array<[string, () => Promise<void>]> = [
  [
    'activates on Markdown and registers its commands',
    async () => {
      await open('shaft-clean.md');
      const ext = vscode.extensions.getExtension(EXTENSION_ID);
      assert.ok(ext, 'extension present');
      await waitFor(() => ext.isActive || undefined, 'activation');
      const commands = await vscode.commands.getCommands(true);
      for (const c of [
        'fatigueNotes.showSummary',
        'fatigueNotes.checkWorkspace',
        'fatigueNotes.insertCheck',
        'fatigueNotes.exportReport',
      ])
        assert.ok(commands.includes(c), c);
    },
  ],
  [
    'flags the mistakes of a note',
    async () => {
      const doc = await open('shaft-with-mistakes.md');
      const diags = await waitFor(() => {
        const d = vscode.languages.getDiagnostics(doc.uri);
        return d.some((x) => x.severity === vscode.DiagnosticSeverity.Error) ? d : undefined;
      }, 'diagnostics');
      const codes = diags.map((d) => String(typeof d.code === 'object' ? d.code.value : d.code));
      assert.ok(codes.includes('missing-unit'), `missing-unit in ${codes.join(', ')}`);
      assert.ok(codes.includes('requirement-not-met'), `requirement-not-met in ${codes.join(', ')}`);
    },
  ],
  [
    'shows inline results and a hover with the derivation',
    async () => {
      const doc = await open('shaft-with-mistakes.md');
      const range = new vscode.Range(0, 0, doc.lineCount, 0);
      const hints = await waitFor(async () => {
        const h = await vscode.commands.executeCommand<vscode.InlayHint[]>(
          'vscode.executeInlayHintProvider',
          doc.uri,
          range,
        );
        return h && h.length > 0 ? h : undefined;
      }, 'inlay hints');
      const labels = hints.map((h) =>
        typeof h.label === 'string' ? h.label : h.label.map((p) => p.value).join(''),
      );
      assert.ok(
        labels.some((l) => l.includes('n_f 0.646')),
        labels.join(' | '),
      );
      const line = lineOf(doc, 'require: n_f >= 2');
      const hovers = await vscode.commands.executeCommand<vscode.Hover[]>(
        'vscode.executeHoverProvider',
        doc.uri,
        new vscode.Position(line, doc.lineAt(line).text.indexOf('n_f') + 1),
      );
      const text = hovers
        .flatMap((h) => h.contents)
        .map((c) => (typeof c === 'string' ? c : 'value' in c ? c.value : ''))
        .join('\n');
      assert.match(text, /n_f = 1 \/ \(sigma_a\/S \+ sigma_m\/Sut\)/);
      assert.match(text, /Shigley/);
    },
  ],
  [
    'opens the summary panel',
    async () => {
      await open('shaft-clean.md');
      await vscode.commands.executeCommand('fatigueNotes.showSummary');
      await waitFor(
        () =>
          vscode.window.tabGroups.all
            .flatMap((g) => g.tabs)
            .find((t) => t.label.startsWith('Fatigue checks')),
        'the panel tab',
      );
    },
  ],
];

export async function run(): Promise<void> {
  const failures: string[] = [];
  for (const [name, fn] of tests) {
    try {
      await fn();
      console.log(`  ok   ${name}`);
    } catch (e) {
      failures.push(name);
      console.log(`  FAIL ${name}: ${e instanceof Error ? e.message : String(e)}`);
    }
  }
  if (failures.length > 0) throw new Error(`${failures.length} of ${tests.length} failed`);
}
