/**
 * The language server over stdio (`fatigue-notes lsp --stdio`): documents in, the core's
 * results out. Each feature is a thin function in its own file; this file only wires them
 * to the protocol, keeps the settings and guards every handler so that a failing request
 * is answered (empty) and logged instead of taking the server down.
 */
import { fileURLToPath } from 'node:url';
import {
  CodeActionKind,
  type Connection,
  createConnection,
  DidChangeConfigurationNotification,
  ErrorCodes,
  type InitializeParams,
  type InitializeResult,
  ProposedFeatures,
  ResponseError,
  TextDocumentSyncKind,
} from 'vscode-languageserver/node';
import { codeActionsFor } from './codeActions';
import { codeLensesFor } from './codeLens';
import { COMPLETION_TRIGGERS, completionsAt } from './completion';
import { publishParams } from './diagnostics';
import { documentSymbolsFor } from './documentSymbols';
import { NoteDocuments } from './documents';
import { foldingRangesFor } from './folding';
import { hoverAt } from './hover';
import { inlayHintsFor } from './inlayHints';
import type { NoteView } from './locate';
import { definitionAt, prepareRenameAt, RenameRefused, referencesAt, renameAt } from './navigation';
import {
  type Checked,
  changeParams,
  closeParams,
  configurationParams,
  openParams,
  workspaceFoldersParams,
} from './notifications';
import {
  DEFAULT_SETTINGS,
  type FatigueSettings,
  readSettings,
  SETTINGS_SECTION,
  sameSettings,
} from './settings';
import { SUMMARY_REQUEST, type SummaryParams, summaryOf } from './summary';
import {
  TEMPLATE_SNIPPET_REQUEST,
  TEMPLATES_REQUEST,
  templateChoices,
  templateSnippetFor,
} from './templates';

export function startServer(): void {
  const connection = createConnection(ProposedFeatures.all);
  // Last line of defence: a bug outside the guarded handlers is logged, the server goes on.
  process.on('uncaughtException', (e) =>
    process.stderr.write(`fatigue-notes lsp: ${e.stack ?? String(e)}\n`),
  );
  process.on('unhandledRejection', (e) => process.stderr.write(`fatigue-notes lsp: ${String(e)}\n`));
  listen(connection);
  connection.listen();
}

function folderPath(uri: string): string | undefined {
  try {
    return uri.startsWith('file:') ? fileURLToPath(uri) : undefined;
  } catch {
    return undefined;
  }
}

/** Wire every feature to a connection (exported for tests that drive the server in-process). */
export function listen(connection: Connection): void {
  let settings: FatigueSettings = DEFAULT_SETTINGS;
  let folders: string[] = [];
  let canPullConfiguration = false;
  let canRegisterConfiguration = false;
  let canRefreshInlayHints = false;
  let canRefreshCodeLens = false;
  let allowHistoryReads = true;
  let canWatchFolders = false;

  const log = (message: string) => connection.console.error(message);
  /** When each note was opened, until its first results are published (logged: the time to first answer). */
  const openedAt = new Map<string, number>();

  const documents = new NoteDocuments({
    settings: () => settings,
    workspaceFolders: () => folders,
    allowHistoryReads: () => allowHistoryReads,
    onEvaluated: (uri, version, view) => {
      try {
        void connection.sendDiagnostics(publishParams(uri, version, view.result, view));
      } catch (e) {
        log(`cannot publish diagnostics of ${uri}: ${String(e)}`);
      }
      const t0 = openedAt.get(uri);
      if (t0 !== undefined) {
        openedAt.delete(uri);
        connection.console.info(
          `${uri.split('/').pop()}: first results published ${(performance.now() - t0).toFixed(0)} ms after it was opened`,
        );
      }
    },
    onError: log,
  });

  /** Run a handler; a bug answers `fallback` and is logged, never thrown at the client. */
  function guard<T>(name: string, fallback: T, fn: () => T): T {
    try {
      return fn();
    } catch (e) {
      if (e instanceof ResponseError) throw e;
      log(`${name} failed: ${e instanceof Error ? e.stack : String(e)}`);
      return fallback;
    }
  }

  /**
   * Run a notification's handler on its checked params: malformed params are logged and
   * ignored (a notification has no answer), and a failing handler is logged, never thrown.
   */
  function notify<T>(
    name: string,
    params: unknown,
    check: (p: unknown) => Checked<T>,
    fn: (p: T) => void,
  ): void {
    guard(name, undefined, () => {
      const c = check(params);
      if (!c.ok) {
        log(`${name} ignored: ${c.why}`);
        return;
      }
      fn(c.value);
    });
  }

  const viewOf = (uri: string): NoteView | undefined => documents.view(uri);

  async function pullSettings(): Promise<void> {
    if (!canPullConfiguration) return;
    try {
      const raw = await connection.workspace.getConfiguration({ section: SETTINGS_SECTION });
      applySettings(readSettings(raw));
    } catch (e) {
      log(`cannot read the settings: ${String(e)}`);
    }
  }

  function applySettings(next: FatigueSettings): void {
    if (sameSettings(next, settings)) return;
    settings = next;
    documents.reevaluateAll();
    if (canRefreshInlayHints) void connection.languages.inlayHint.refresh().catch(() => undefined);
    if (canRefreshCodeLens) void connection.sendRequest('workspace/codeLens/refresh').catch(() => undefined);
  }

  connection.onInitialize((raw: InitializeParams): InitializeResult => {
    const params = (raw && typeof raw === 'object' ? raw : {}) as Partial<InitializeParams>;
    const caps = params.capabilities && typeof params.capabilities === 'object' ? params.capabilities : {};
    canPullConfiguration = caps.workspace?.configuration === true;
    canRegisterConfiguration = caps.workspace?.didChangeConfiguration?.dynamicRegistration === true;
    canRefreshInlayHints = caps.workspace?.inlayHint?.refreshSupport === true;
    canRefreshCodeLens = caps.workspace?.codeLens?.refreshSupport === true;
    canWatchFolders = caps.workspace?.workspaceFolders === true;
    const init = (params.initializationOptions ?? {}) as { settings?: unknown; trustedWorkspace?: unknown };
    if (init.settings) settings = readSettings(init.settings);
    if (init.trustedWorkspace === false) allowHistoryReads = false;
    const given = Array.isArray(params.workspaceFolders) ? params.workspaceFolders : undefined;
    if (given)
      folders = given
        .map((f) => (f && typeof f.uri === 'string' ? folderPath(f.uri) : undefined))
        .filter(isString);
    else if (typeof params.rootUri === 'string') folders = [folderPath(params.rootUri)].filter(isString);
    return {
      capabilities: {
        textDocumentSync: { openClose: true, change: TextDocumentSyncKind.Incremental },
        hoverProvider: true,
        completionProvider: { triggerCharacters: COMPLETION_TRIGGERS, resolveProvider: false },
        definitionProvider: true,
        referencesProvider: true,
        renameProvider: { prepareProvider: true },
        documentSymbolProvider: { label: 'fatigue checks' },
        foldingRangeProvider: true,
        codeActionProvider: {
          codeActionKinds: [CodeActionKind.QuickFix, CodeActionKind.RefactorRewrite],
        },
        codeLensProvider: { resolveProvider: false },
        inlayHintProvider: { resolveProvider: false },
        workspace: { workspaceFolders: { supported: true, changeNotifications: true } },
      },
      serverInfo: { name: 'fatigue-notes' },
    };
  });

  connection.onInitialized(() => {
    if (canRegisterConfiguration)
      void connection.client
        .register(DidChangeConfigurationNotification.type, { section: SETTINGS_SECTION })
        .catch(() => undefined);
    void pullSettings();
    if (canWatchFolders)
      connection.workspace.onDidChangeWorkspaceFolders((e) =>
        notify('didChangeWorkspaceFolders', e, workspaceFoldersParams, ({ added, removed }) => {
          const gone = new Set(removed.map(folderPath));
          folders = [...folders.filter((f) => !gone.has(f)), ...added.map(folderPath).filter(isString)];
          documents.reevaluateAll();
        }),
      );
  });

  connection.onDidChangeConfiguration((change) =>
    notify('didChangeConfiguration', change, configurationParams, ({ settings: given }) => {
      if (canPullConfiguration) void pullSettings();
      else {
        const s =
          given && typeof given === 'object'
            ? (given as Record<string, unknown>)[SETTINGS_SECTION]
            : undefined;
        applySettings(readSettings(s));
      }
    }),
  );

  connection.onDidOpenTextDocument((p) =>
    notify('didOpen', p, openParams, (o) => {
      openedAt.set(o.uri, performance.now());
      documents.open(o.uri, o.languageId, o.version, o.text);
    }),
  );
  connection.onDidChangeTextDocument((p) =>
    notify('didChange', p, changeParams, (c) => documents.change(c.uri, c.version, c.changes)),
  );
  connection.onDidCloseTextDocument((p) =>
    notify('didClose', p, closeParams, ({ uri }) => {
      openedAt.delete(uri);
      if (documents.close(uri)) void connection.sendDiagnostics({ uri, diagnostics: [] });
    }),
  );
  connection.onDidChangeWatchedFiles(() => guard('watchedFiles', undefined, () => documents.reevaluateAll()));

  connection.onHover((p) =>
    guard('hover', null, () => {
      const v = viewOf(p.textDocument.uri);
      return v ? hoverAt(v, p.position) : null;
    }),
  );
  connection.onCompletion((p) =>
    guard('completion', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? completionsAt(v, p.position) : [];
    }),
  );
  connection.onDefinition((p) =>
    guard('definition', null, () => {
      const v = viewOf(p.textDocument.uri);
      return v ? definitionAt(v, p.position) : null;
    }),
  );
  connection.onReferences((p) =>
    guard('references', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? referencesAt(v, p.position, p.context.includeDeclaration) : [];
    }),
  );
  connection.onPrepareRename((p) =>
    guard('prepareRename', null, () => {
      const v = viewOf(p.textDocument.uri);
      if (!v) return null;
      try {
        return prepareRenameAt(v, p.position);
      } catch (e) {
        if (e instanceof RenameRefused) throw new ResponseError(ErrorCodes.InvalidRequest, e.message);
        throw e;
      }
    }),
  );
  connection.onRenameRequest((p) =>
    guard('rename', null, () => {
      const v = viewOf(p.textDocument.uri);
      if (!v) return null;
      try {
        return renameAt(v, p.position, p.newName);
      } catch (e) {
        if (e instanceof RenameRefused) throw new ResponseError(ErrorCodes.InvalidRequest, e.message);
        throw e;
      }
    }),
  );
  connection.onDocumentSymbol((p) =>
    guard('documentSymbol', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? documentSymbolsFor(v) : [];
    }),
  );
  connection.onFoldingRanges((p) =>
    guard('foldingRange', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? foldingRangesFor(v) : [];
    }),
  );
  connection.onCodeAction((p) =>
    guard('codeAction', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? codeActionsFor(v, p.range) : [];
    }),
  );
  connection.onCodeLens((p) =>
    guard('codeLens', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? codeLensesFor(v) : [];
    }),
  );
  connection.languages.inlayHint.on((p) =>
    guard('inlayHint', [], () => {
      const v = viewOf(p.textDocument.uri);
      return v ? inlayHintsFor(v, p.range) : [];
    }),
  );
  connection.onRequest(SUMMARY_REQUEST, (p: SummaryParams) =>
    guard('summary', null, () => {
      const uri = p && typeof p === 'object' ? p.uri : undefined;
      if (typeof uri !== 'string')
        throw new ResponseError(ErrorCodes.InvalidParams, 'params must be { uri }');
      const v = viewOf(uri);
      if (!v) throw new ResponseError(ErrorCodes.InvalidParams, `${uri} is not open`);
      return summaryOf(v);
    }),
  );
  connection.onRequest(TEMPLATES_REQUEST, () => guard('templates', [], () => templateChoices()));
  connection.onRequest(TEMPLATE_SNIPPET_REQUEST, (p: unknown) =>
    guard('templateSnippet', null, () => templateSnippetFor(p)),
  );
}

function isString(x: string | undefined): x is string {
  return typeof x === 'string';
}
