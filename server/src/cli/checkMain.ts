/**
 * Entry of `fatigue-notes check` alone (server/dist/check.js): the core and the command, not
 * the language server and its protocol libraries, so that a checker's CI run loads less before
 * it reads a note. server/bin/fatigue-notes.js sends `check` here; this same bundle is the
 * check workers' script (cli/checkJobs.ts). The whole command line (main.ts) runs the same
 * command.
 */
import { runCheckCommand } from './check';
import { isCheckWorker, runCheckWorker } from './checkJobs';
import { processIo } from './io';

if (isCheckWorker()) runCheckWorker();
else
  runCheckCommand(process.argv.slice(3), processIo).then(
    (code) => {
      process.exitCode = code;
    },
    (e) => {
      process.stderr.write(`fatigue-notes: ${e instanceof Error ? e.stack : String(e)}\n`);
      process.exitCode = 2;
    },
  );
