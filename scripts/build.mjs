// One build for the whole repository: esbuild bundles the command line / language server
// (server/dist/cli.js) and the VS Code client (client/dist/extension.js, when present).
import { copyFileSync, existsSync, mkdirSync } from 'node:fs';
import { build } from 'esbuild';

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'cjs',
  sourcemap: true,
  logLevel: 'warning',
};
await build({ ...common, entryPoints: ['server/src/cli/main.ts'], outfile: 'server/dist/cli.js' });
// `cycles` alone: the rainflow module without the language, mathjs or the language server.
await build({ ...common, entryPoints: ['server/src/cli/cyclesMain.ts'], outfile: 'server/dist/cycles.js' });
if (existsSync('client/src/extension.ts')) {
  await build({
    ...common,
    entryPoints: ['client/src/extension.ts'],
    outfile: 'client/dist/extension.js',
    external: ['vscode'],
  });
  // The summary panel's webview script, and what the packaged extension carries with it:
  // the language server (the same bundle as the CLI) and the block grammar.
  await build({
    ...common,
    platform: 'browser',
    target: 'es2022',
    format: 'iife',
    entryPoints: ['client/src/panel/webview/main.ts'],
    outfile: 'client/dist/panel.js',
  });
  mkdirSync('client/dist/syntaxes', { recursive: true });
  copyFileSync('server/dist/cli.js', 'client/dist/server.js');
  copyFileSync(
    'syntaxes/fatigue-block.tmLanguage.json',
    'client/dist/syntaxes/fatigue-block.tmLanguage.json',
  );
}
