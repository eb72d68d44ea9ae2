#!/usr/bin/env node
/**
 * The extension's integration suite in a desktop VS Code, for contributors who have one
 * (CI uses test/real-editor/run.mjs instead: no VS Code download is possible there).
 *
 *   npm run build
 *   VSCODE_EXECUTABLE=/path/to/code node client/test-electron/run.mjs
 *
 * VSCODE_EXECUTABLE is the VS Code binary (Linux: /usr/share/code/code, macOS:
 * "/Applications/Visual Studio Code.app/Contents/MacOS/Electron", Windows: Code.exe).
 * Without it, @vscode/test-electron would try to download VS Code.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runTests } from '@vscode/test-electron';
import { build } from 'esbuild';

const here = dirname(fileURLToPath(import.meta.url));
const root = resolve(here, '../..');
const executable = process.env.VSCODE_EXECUTABLE;
if (!executable) {
  process.stderr.write(
    'Set VSCODE_EXECUTABLE to your VS Code binary (see the comment at the top of this file).\n',
  );
  process.exit(2);
}
const out = join(here, 'dist');
await build({
  entryPoints: [join(here, 'suite', 'index.ts')],
  outfile: join(out, 'suite.js'),
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  external: ['vscode'],
  logLevel: 'warning',
});
const userData = mkdtempSync(join(tmpdir(), 'fatigue-electron-'));
try {
  const code = await runTests({
    vscodeExecutablePath: executable,
    extensionDevelopmentPath: join(root, 'client'),
    extensionTestsPath: join(out, 'suite.js'),
    launchArgs: [
      join(root, 'test', 'real-editor', 'workspace'),
      '--disable-extensions',
      '--disable-workspace-trust',
      `--user-data-dir=${userData}`,
    ],
  });
  process.exit(code);
} catch (e) {
  process.stderr.write(`${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
} finally {
  rmSync(userData, { recursive: true, force: true });
}
