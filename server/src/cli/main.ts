/** Entry of the `fatigue-notes` command: check, cycles, lsp, report, compare. */

import { isParseWorker, runParseWorker } from '../lsp/parseWorker';
import { startServer } from '../lsp/server';
import { runCheckCommand } from './check';
import { isCheckWorker, runCheckWorker } from './checkJobs';
import { runCompareCommand } from './compare';
import { runCyclesCommand } from './cycles';
import { type Io, processIo } from './io';
import { runReportCommand } from './report';
import { VERSION } from './version';

const USAGE = `fatigue-notes ${VERSION}: evaluate fatigue design-check blocks in Markdown calc notes

usage:
  fatigue-notes check PATH... [--format text|json|sarif] [--jobs N]
  fatigue-notes cycles FILE.csv [--column N|NAME] [--format text|json] [--gate RANGE] [--bins N]
  fatigue-notes lsp --stdio
  fatigue-notes report NOTE.md [-o NOTE.html]
  fatigue-notes compare OLD.md NEW.md [--format text|json]   (either may be REV:path)

The tool assists a qualified engineer; local codes, standards and licensed practice govern.
`;

const LSP_USAGE = `usage: fatigue-notes lsp --stdio
  Runs the language server over standard input and output (an editor starts it; see README).
  Also --node-ipc, --socket=PORT or --pipe=NAME, as vscode-languageserver accepts them.
`;

export async function main(argv: string[], io: Io): Promise<number> {
  const [cmd, ...rest] = argv;
  switch (cmd) {
    case 'check':
      return runCheckCommand(rest, io);
    case 'cycles':
      return runCyclesCommand(rest, io);
    case 'report':
      return runReportCommand(rest, io);
    case 'compare':
      return runCompareCommand(rest, io);
    case 'lsp':
      if (rest.includes('--version') || rest.includes('-v')) {
        io.stdout(`${VERSION}\n`);
        return 0;
      }
      if (rest.includes('--help') || rest.includes('-h')) {
        io.stdout(LSP_USAGE);
        return 0;
      }
      // The connection needs its transport named; without one it would throw.
      if (
        !rest.some(
          (a) =>
            a === '--stdio' || a === '--node-ipc' || a.startsWith('--socket=') || a.startsWith('--pipe='),
        )
      ) {
        io.stderr(`fatigue-notes lsp: say how the editor talks to the server\n${LSP_USAGE}`);
        return 2;
      }
      // A static import: a dynamic import() makes the bundler wrap every module in a lazy
      // initialiser, which defeats tree-shaking (platform-notes.md).
      startServer();
      return -1;
    case '--version':
    case '-v':
      io.stdout(`${VERSION}\n`);
      return 0;
    case undefined:
    case '--help':
    case '-h':
    case 'help':
      io.stdout(USAGE);
      return cmd === undefined ? 2 : 0;
    default:
      io.stderr(`fatigue-notes: unknown command "${cmd}"\n${USAGE}`);
      return 2;
  }
}

// The language server runs this same bundle as its parse worker (lsp/parseWorker.ts), and
// `check --jobs N` as its check workers (cli/checkJobs.ts).
if (isParseWorker()) runParseWorker();
else if (isCheckWorker()) runCheckWorker();
else
  main(process.argv.slice(2), processIo).then(
    (code) => {
      if (code >= 0) process.exitCode = code;
    },
    (e) => {
      process.stderr.write(`fatigue-notes: ${e instanceof Error ? e.stack : String(e)}\n`);
      process.exitCode = 2;
    },
  );
