/** "Insert a new check…": pick a method, get a block with its statements to fill in. */
import * as vscode from 'vscode';
import { readSettings } from '../settings';
import { freshId, TEMPLATE_SNIPPET_REQUEST, TEMPLATES_REQUEST, type TemplateChoice } from '../templates';

export type ServerRequest = <R>(method: string, params: unknown) => Promise<R>;

export async function insertCheck(send: ServerRequest): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  if (editor?.document.languageId !== 'markdown') {
    void vscode.window.showInformationMessage('Open a Markdown note to insert a fatigue check into it.');
    return;
  }
  let choices: TemplateChoice[];
  try {
    choices = await send<TemplateChoice[]>(TEMPLATES_REQUEST, {});
  } catch (e) {
    void vscode.window.showErrorMessage(
      `The language server did not send the check templates (${e instanceof Error ? e.message : String(e)}).`,
    );
    return;
  }
  const pick = await vscode.window.showQuickPick(
    choices.map((c) => ({ label: c.label, detail: c.detail, choice: c })),
    { title: 'Insert a new check', placeHolder: 'Which method does the check use?', matchOnDetail: true },
  );
  if (!pick) return;
  const settings = readSettings(editor.document.uri);
  const system = settings.units === 'US' ? 'US' : 'SI';
  const id = freshId(editor.document.getText(), pick.choice.idStem);
  const pos = editor.selection.active;
  const line = editor.document.lineAt(pos.line);
  // Start the block on a line of its own, with a blank line around it.
  const before = line.isEmptyOrWhitespace
    ? pos.line > 0 && !editor.document.lineAt(pos.line - 1).isEmptyOrWhitespace
      ? '\n'
      : ''
    : '\n\n';
  const at = line.isEmptyOrWhitespace ? line.range.start : line.range.end;
  const { snippet: body } = await send<{ snippet: string }>(TEMPLATE_SNIPPET_REQUEST, {
    kind: pick.choice.kind,
    id,
    system,
  });
  const snippet = new vscode.SnippetString(`${before}${body}\n`);
  await editor.insertSnippet(snippet, at);
}
