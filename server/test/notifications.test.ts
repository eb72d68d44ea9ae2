/**
 * Notifications with malformed params (issue 16, item 6), driven in-process through a real
 * JSON-RPC connection: a `didOpen` whose text is `null`, changes without a version or with
 * ranges of the wrong type, closes and configuration changes of the wrong shape. Each is
 * logged as ignored (a notification has no answer), nothing throws (an uncaught error in a
 * handler or a timer fails this test run), and the open documents stay as they were: the
 * server then answers and publishes exactly what the core gives for their text. Shapes are
 * those of the Language Server Protocol 3.17.
 */
import { PassThrough } from 'node:stream';
import { evaluateNote } from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createMessageConnection,
  type MessageConnection,
  StreamMessageReader,
  StreamMessageWriter,
} from 'vscode-jsonrpc/node';
import { type Connection, createConnection, ProposedFeatures } from 'vscode-languageserver/node';
import type { Hover, PublishDiagnosticsParams } from 'vscode-languageserver-protocol';
import { listen } from '../src/lsp/server';

const URI = 'file:///tmp/fatigue-notes-notify/note.md';
const TEXT = [
  '# n',
  '',
  '```fatigue shaft',
  'Sut = 600 MPa',
  'surface: machined',
  'd = 20 mm',
  '```',
  '',
].join('\n');

let client: MessageConnection;
let server: Connection;
const logged: string[] = [];
const published: PublishDiagnosticsParams[] = [];

function waitFor<T>(pred: () => T | undefined, timeoutMs = 10_000): Promise<T> {
  return new Promise((resolve, reject) => {
    const t0 = Date.now();
    const poll = () => {
      const hit = pred();
      if (hit !== undefined) return resolve(hit);
      if (Date.now() - t0 > timeoutMs) return reject(new Error('timed out'));
      setTimeout(poll, 5);
    };
    poll();
  });
}

const notify = (method: string, params: unknown) => client.sendNotification(method, params);
const latest = (uri: string) => [...published].reverse().find((p) => p.uri === uri);
/** Waits until the server has dealt with everything sent before (a request is answered in order). */
const settle = () => client.sendRequest('textDocument/documentSymbol', { textDocument: { uri: URI } });

beforeAll(async () => {
  const up = new PassThrough();
  const down = new PassThrough();
  server = createConnection(ProposedFeatures.all, new StreamMessageReader(up), new StreamMessageWriter(down));
  listen(server);
  server.listen();
  client = createMessageConnection(new StreamMessageReader(down), new StreamMessageWriter(up));
  client.onNotification('window/logMessage', (p: { message: string }) => {
    logged.push(p.message);
  });
  client.onNotification('textDocument/publishDiagnostics', (p: PublishDiagnosticsParams) => {
    published.push(p);
  });
  client.listen();
  await client.sendRequest('initialize', {
    processId: null,
    rootUri: null,
    capabilities: { workspace: { workspaceFolders: true } },
  });
  await notify('initialized', {});
  await notify('textDocument/didOpen', {
    textDocument: { uri: URI, languageId: 'markdown', version: 1, text: TEXT },
  });
  await waitFor(() => latest(URI)?.version === 1 || undefined);
});

afterAll(() => {
  client?.dispose();
  server?.dispose();
});

describe('malformed notifications are logged and ignored (issue 16, item 6)', () => {
  const cases: Array<[string, string, unknown, RegExp]> = [
    [
      'didOpen',
      'textDocument/didOpen',
      { textDocument: { uri: 'file:///b.md', languageId: 'markdown', version: 1, text: null } },
      /didOpen ignored: textDocument\.text must be a string, not null/,
    ],
    [
      'didOpen',
      'textDocument/didOpen',
      { textDocument: { uri: URI, languageId: 'markdown', version: 9, text: null } },
      /textDocument\.text must be a string, not null/,
    ],
    [
      'didOpen',
      'textDocument/didOpen',
      { textDocument: { uri: URI, languageId: 'markdown', version: '2', text: 'x' } },
      /textDocument\.version must be a whole number, not a string/,
    ],
    [
      'didOpen',
      'textDocument/didOpen',
      { textDocument: { uri: 42, version: 1, text: 'x' } },
      /textDocument\.uri must be a string, not number 42/,
    ],
    ['didOpen', 'textDocument/didOpen', null, /didOpen ignored: the params must be an object, not null/],
    ['didOpen', 'textDocument/didOpen', { textDocument: [] }, /textDocument must be an object, not an array/],
    [
      'didChange',
      'textDocument/didChange',
      { textDocument: { uri: URI, version: 2 }, contentChanges: null },
      /didChange ignored: contentChanges must be an array, not null/,
    ],
    [
      'didChange',
      'textDocument/didChange',
      { textDocument: { uri: URI, version: 2 }, contentChanges: [{ text: null }] },
      /contentChanges\[0\]\.text must be a string, not null/,
    ],
    [
      'didChange',
      'textDocument/didChange',
      { textDocument: { uri: URI }, contentChanges: [{ text: 'x' }] },
      /textDocument\.version must be a whole number, not undefined/,
    ],
    [
      'didChange',
      'textDocument/didChange',
      {
        textDocument: { uri: URI, version: 2 },
        contentChanges: [
          { text: 'x', range: { start: { line: 'a', character: 0 }, end: { line: 0, character: 0 } } },
        ],
      },
      /range\.start\.line must be a whole number >= 0, not a string/,
    ],
    [
      'didChange',
      'textDocument/didChange',
      {
        textDocument: { uri: URI, version: 2 },
        contentChanges: [
          { text: 'x', range: { start: { line: 3, character: 0 }, end: { line: 1, character: 0 } } },
        ],
      },
      /range ends before it starts/,
    ],
    [
      'didChange',
      'textDocument/didChange',
      {
        textDocument: { uri: URI, version: 2 },
        contentChanges: [
          { text: 'ok' },
          { text: 'x', range: { start: { line: -1, character: 0 }, end: { line: 0, character: 0 } } },
        ],
      },
      /contentChanges\[1\]\.range\.start\.line must be a whole number >= 0, not number -1/,
    ],
    [
      'didClose',
      'textDocument/didClose',
      {},
      /didClose ignored: textDocument must be an object, not undefined/,
    ],
    ['didClose', 'textDocument/didClose', null, /didClose ignored: the params must be an object, not null/],
    [
      'didChangeConfiguration',
      'workspace/didChangeConfiguration',
      null,
      /didChangeConfiguration ignored: the params must be an object, not null/,
    ],
    [
      'didChangeWorkspaceFolders',
      'workspace/didChangeWorkspaceFolders',
      { event: { added: null, removed: [] } },
      /didChangeWorkspaceFolders ignored: event\.added must be an array, not null/,
    ],
  ];

  for (const [name, method, params, expected] of cases)
    it(`${name} ${JSON.stringify(params)}: logged as ignored, the note unchanged`, async () => {
      const before = logged.length;
      await notify(method, params);
      await settle();
      const said = logged.slice(before);
      expect(
        said.some((m) => expected.test(m)),
        said.join('\n'),
      ).toBe(true);
      expect(said.filter((m) => /failed/.test(m))).toEqual([]);
      // The note is still the one opened: hover answers from its text, diagnostics are its own.
      const h = await client.sendRequest<Hover | null>('textDocument/hover', {
        textDocument: { uri: URI },
        position: { line: 4, character: 2 },
      });
      expect(JSON.stringify(h)).toContain('surface finish');
      expect(latest(URI)?.version).toBe(1);
    });

  it('the server goes on: a valid change is applied and published as the core evaluates its text', async () => {
    const next = TEXT.replace('d = 20 mm', 'd = 25 mm\nrequire: n_f >= 1.5');
    await notify('textDocument/didChange', {
      textDocument: { uri: URI, version: 2 },
      contentChanges: [
        {
          range: { start: { line: 5, character: 0 }, end: { line: 5, character: 9 } },
          text: 'd = 25 mm\nrequire: n_f >= 1.5',
        },
      ],
    });
    const p = await waitFor(() => (latest(URI)?.version === 2 ? latest(URI) : undefined));
    const core = evaluateNote(next).diagnostics.map((d) => [d.range.start.line, d.code, d.message]);
    expect(p.diagnostics.map((d) => [d.range.start.line, d.code, d.message])).toEqual(core);
  });

  it('a document opened with a null text was never opened: requests on it answer as for any unknown note', async () => {
    expect(
      await client.sendRequest('textDocument/hover', {
        textDocument: { uri: 'file:///b.md' },
        position: { line: 0, character: 0 },
      }),
    ).toBeNull();
    await expect(client.sendRequest('fatigue/summary', { uri: 'file:///b.md' })).rejects.toMatchObject({
      code: -32602,
    });
    expect(published.some((p) => p.uri === 'file:///b.md')).toBe(false);
  });

  it('a valid close then clears the note', async () => {
    await notify('textDocument/didClose', { textDocument: { uri: URI } });
    await waitFor(() => (latest(URI)?.diagnostics.length === 0 ? true : undefined));
    expect(logged.filter((m) => /failed/.test(m))).toEqual([]);
  });
});
