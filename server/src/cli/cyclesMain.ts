/**
 * Entry of `fatigue-notes cycles` alone (server/dist/cycles.js): the rainflow module and
 * nothing else of the core, so that counting a history does not first load the language,
 * mathjs and the language server. server/bin/fatigue-notes.js sends `cycles` here; the
 * whole command line (main.ts) runs the same command.
 */
import { runCyclesCommand } from './cycles';
import { processIo } from './io';

runCyclesCommand(process.argv.slice(3), processIo).then(
  (code) => {
    process.exitCode = code;
  },
  (e) => {
    process.stderr.write(`fatigue-notes: ${e instanceof Error ? e.stack : String(e)}\n`);
    process.exitCode = 2;
  },
);
