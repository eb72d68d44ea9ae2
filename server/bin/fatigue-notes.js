#!/usr/bin/env node
// `--version` is answered before the bundle loads: a checker's script asks it often, and
// the version is the package's (server/test/check-cli.test.ts holds the two equal).
const first = process.argv[2];
if (first === '--version' || first === '-v') {
  process.stdout.write(`${require('../package.json').version}\n`);
} else if (first === 'cycles') {
  // Counting a history needs only the rainflow module: a bundle of its own (cli/cyclesMain.ts).
  require('../dist/cycles.js');
} else if (first === 'check') {
  // `check` without the language server's libraries: a bundle of its own (cli/checkMain.ts).
  require('../dist/check.js');
} else {
  require('../dist/cli.js');
}
