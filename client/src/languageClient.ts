/** Starts the bundled fatigue-notes language server (`dist/server.js lsp --stdio`) for Markdown notes. */
import * as vscode from 'vscode';
import {
  LanguageClient,
  type LanguageClientOptions,
  type ServerOptions,
  TransportKind,
} from 'vscode-languageclient/node';
import { SECTION } from './settings';

export function createLanguageClient(
  context: vscode.ExtensionContext,
  output: vscode.LogOutputChannel,
): LanguageClient {
  const module = context.asAbsolutePath('dist/server.js');
  // TransportKind.stdio appends `--stdio` to the arguments.
  const run = { module, transport: TransportKind.stdio, args: ['lsp'] };
  const serverOptions: ServerOptions = {
    run,
    debug: { ...run, options: { execArgv: ['--nolazy', '--inspect=6019'] } },
  };
  const clientOptions: LanguageClientOptions = {
    documentSelector: [
      { language: 'markdown', scheme: 'file' },
      { language: 'markdown', scheme: 'untitled' },
      { language: 'markdown', scheme: 'vscode-vfs' },
    ],
    synchronize: { configurationSection: SECTION },
    outputChannel: output,
    traceOutputChannel: output,
    initializationOptions: {
      // In an untrusted workspace the server must not read load-history files.
      trustedWorkspace: vscode.workspace.isTrusted,
      settings: vscode.workspace.getConfiguration(SECTION),
    },
  };
  return new LanguageClient('fatigueNotes', 'fatigue-notes', serverOptions, clientOptions);
}
