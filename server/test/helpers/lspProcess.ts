/**
 * Builds the command line (with the same esbuild options as scripts/build.mjs, into a
 * temporary folder so that tests never race with a build of server/dist) and starts
 * `fatigue-notes lsp --stdio` as a child process driven by a vscode-jsonrpc client.
 */
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { build } from 'esbuild';
import {
  createMessageConnection,
  type MessageConnection,
  StreamMessageReader,
  StreamMessageWriter,
} from 'vscode-jsonrpc/node';

export const ROOT = resolve(__dirname, '../../..');

/** Bundle server/src/cli/main.ts into a fresh folder; returns the script path and a cleanup. */
export async function buildCli(): Promise<{ script: string; dispose: () => void }> {
  const dir = mkdtempSync(join(tmpdir(), 'fatigue-notes-lsp-'));
  const script = join(dir, 'cli.js');
  await build({
    entryPoints: [join(ROOT, 'server/src/cli/main.ts')],
    outfile: script,
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'cjs',
    sourcemap: false,
    logLevel: 'warning',
    absWorkingDir: ROOT,
  });
  return { script, dispose: () => rmSync(dir, { recursive: true, force: true }) };
}

export interface ServerProcess {
  child: ChildProcess;
  connection: MessageConnection;
  stderr: () => string;
  exited: Promise<number | null>;
  kill: () => void;
}

export function startServerProcess(script: string): ServerProcess {
  const child = spawn(process.execPath, [script, 'lsp', '--stdio'], {
    cwd: ROOT,
    stdio: ['pipe', 'pipe', 'pipe'],
  });
  let err = '';
  child.stderr?.on('data', (b: Buffer) => {
    err += b.toString();
  });
  const exited = new Promise<number | null>((res) => child.on('exit', (code) => res(code)));
  const connection = createMessageConnection(
    new StreamMessageReader(child.stdout as NodeJS.ReadableStream),
    new StreamMessageWriter(child.stdin as NodeJS.WritableStream),
  );
  connection.listen();
  return {
    child,
    connection,
    stderr: () => err,
    exited,
    kill: () => {
      if (child.exitCode === null && child.pid !== undefined) child.kill('SIGKILL');
    },
  };
}
