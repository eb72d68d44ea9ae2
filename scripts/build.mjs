// One build for the whole repository: esbuild bundles the command line / language server
// (server/dist/cli.js) and the VS Code client (client/dist/extension.js, when present).
// The extension is minified and holds no copy of the core: the language server evaluates,
// and the diagrams' stylesheet is written into client/dist/diagrams.css from the core here.
import { copyFileSync, existsSync, mkdirSync, writeFileSync } from 'node:fs';
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
// `check` alone: the core without the language server's protocol libraries (cold start).
await build({ ...common, entryPoints: ['server/src/cli/checkMain.ts'], outfile: 'server/dist/check.js' });
if (existsSync('client/src/extension.ts')) {
  await build({
    ...common,
    entryPoints: ['client/src/extension.ts'],
    outfile: 'client/dist/extension.js',
    external: ['vscode'],
    minify: true,
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
  // The diagrams' stylesheet: the core's DIAGRAM_STYLE, copied at build time for the panel.
  const style = await build({
    entryPoints: ['shared-core/src/diagrams/svg.ts'],
    bundle: true,
    platform: 'node',
    format: 'cjs',
    write: false,
    logLevel: 'warning',
  });
  const mod = { exports: {} };
  new Function('module', 'exports', style.outputFiles[0].text)(mod, mod.exports);
  writeFileSync('client/dist/diagrams.css', mod.exports.DIAGRAM_STYLE.trim() + '\n');
  mkdirSync('client/dist/syntaxes', { recursive: true });
  copyFileSync('server/dist/cli.js', 'client/dist/server.js');
  copyFileSync(
    'syntaxes/fatigue-block.tmLanguage.json',
    'client/dist/syntaxes/fatigue-block.tmLanguage.json',
  );
}
