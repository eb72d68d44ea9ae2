/**
 * A large note over stdio (issue 7): its Markdown parse runs on the parse worker, so the
 * server keeps answering requests on other notes meanwhile, and it ends with exactly the
 * core's diagnostics of the note (reference: `evaluateNote` on the same text).
 */
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { evaluateNote } from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Hover, PublishDiagnosticsParams } from 'vscode-languageserver-protocol';
import { LARGE_NOTE_CHARS } from '../src/lsp/documents';
import { buildCli, ROOT, type ServerProcess, startServerProcess } from './helpers/lspProcess';

function check(i: number): string {
  return [
    `Shaft ${i} of the line.`,
    '',
    `\`\`\`fatigue s${i}`,
    'material: aisi-1045-cd',
    'surface: machined',
    `d = ${30 + (i % 12)} mm`,
    `M_max = ${150 + (i % 50)} N*m`,
    `M_min = -${150 + (i % 50)} N*m`,
    'criterion: goodman',
    'require: n_f >= 1.5',
    '```',
    '',
  ].join('\n');
}

const SEVERITY = { error: 1, warning: 2, information: 3, hint: 4 } as const;

let server: ServerProcess;
let dispose: () => void;
const published: PublishDiagnosticsParams[] = [];

describe('a large note over stdio', () => {
  beforeAll(async () => {
    const built = await buildCli();
    dispose = built.dispose;
    server = startServerProcess(built.script);
    server.connection.onNotification('textDocument/publishDiagnostics', (p: PublishDiagnosticsParams) => {
      published.push(p);
    });
    await server.connection.sendRequest('initialize', {
      processId: process.pid,
      rootUri: pathToFileURL(ROOT).href,
      capabilities: {},
    });
    await server.connection.sendNotification('initialized', {});
  });

  afterAll(() => {
    server?.kill();
    server?.connection.dispose();
    dispose?.();
  });

  it('is parsed off the main thread: another note is answered meanwhile; its diagnostics are the core’s', async () => {
    const conn = server.connection;
    const small = check(0);
    const smallUri = pathToFileURL(join(ROOT, 'test-output', 'small-note.md')).href;
    await conn.sendNotification('textDocument/didOpen', {
      textDocument: { uri: smallUri, languageId: 'markdown', version: 1, text: small },
    });
    const parts: string[] = ['# A large note', ''];
    for (let i = 0; parts.join('\n').length < 3 * LARGE_NOTE_CHARS; i++) parts.push(check(i));
    const big = parts.join('\n');
    const bigUri = pathToFileURL(join(ROOT, 'test-output', 'large-note.md')).href;
    await conn.sendNotification('textDocument/didOpen', {
      textDocument: { uri: bigUri, languageId: 'markdown', version: 1, text: big },
    });
    const requireLine = small.split('\n').findIndex((l) => l.startsWith('require:'));
    const latencies: number[] = [];
    const deadline = performance.now() + 120_000;
    while (!published.some((p) => p.uri === bigUri) && performance.now() < deadline) {
      const t0 = performance.now();
      const h = (await conn.sendRequest('textDocument/hover', {
        textDocument: { uri: smallUri },
        position: { line: requireLine, character: 10 },
      })) as Hover | null;
      latencies.push(performance.now() - t0);
      expect(h).not.toBeNull();
      await new Promise((r) => setTimeout(r, 20));
    }
    const p = published.find((x) => x.uri === bigUri);
    expect(p).toBeDefined();
    // Several hovers were answered while the large note was parsed and evaluated, none slowly.
    expect(latencies.length).toBeGreaterThan(3);
    expect(Math.max(...latencies)).toBeLessThan(1000);
    const want = evaluateNote(big).diagnostics.map((d) => ({
      range: d.range,
      severity: SEVERITY[d.severity],
      code: d.code,
      message: d.message,
    }));
    expect(
      p!.diagnostics.map((d) => ({ range: d.range, severity: d.severity, code: d.code, message: d.message })),
    ).toEqual(want);
    // Once evaluated, a request on it is answered from its result.
    const line = big.split('\n').findIndex((l) => l.startsWith('require:'));
    const h = (await conn.sendRequest('textDocument/hover', {
      textDocument: { uri: bigUri },
      position: { line, character: 10 },
    })) as Hover | null;
    expect(h).not.toBeNull();
  }, 180_000);
});
