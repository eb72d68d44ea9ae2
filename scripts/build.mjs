// One build for the whole repository: esbuild bundles the command line / language server
// (server/dist/cli.js) and the VS Code client (client/dist/extension.js, when present).
import { existsSync } from 'node:fs';
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
if (existsSync('client/src/extension.ts')) {
  await build({
    ...common,
    entryPoints: ['client/src/extension.ts'],
    outfile: 'client/dist/extension.js',
    external: ['vscode'],
  });
}
