/**
 * `fatigue-notes report NOTE.md [-o NOTE.html]`: writes the reviewer's report of a note as
 * one self-contained HTML file (default: beside the note, `.md` replaced by `.html`).
 *
 * Exit 0 when the report is written (whatever the checks' status: the report shows it);
 * 2 on a usage error, an unreadable note or an unwritable output.
 *
 * The date of the run is the current time, or `SOURCE_DATE_EPOCH` (seconds) when that is
 * set, so that a build can produce the same file twice.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { basename, dirname, extname, join, relative, resolve } from 'node:path';
import { assumptionsRegister, evaluateNote, type NoteResult } from '@fatigue-notes/core';
import { decodeNote } from '../files/decode';
import { historyReader, workspaceOf } from '../files/historyReader';
import { buildReportHtml } from '../report/reportHtml';
import { cliHistoryOptions } from './historyLimits';
import type { Io } from './io';
import { VERSION } from './version';

const USAGE = 'usage: fatigue-notes report NOTE.md [-o NOTE.html]\n';

/** `2025-03-01 14:05 UTC` */
export function formatRunDate(d: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getUTCFullYear()}-${p(d.getUTCMonth() + 1)}-${p(d.getUTCDate())} ${p(d.getUTCHours())}:${p(d.getUTCMinutes())} UTC`;
}

function runDate(): Date {
  const epoch = process.env.SOURCE_DATE_EPOCH;
  if (epoch && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000);
  return new Date();
}

export function defaultReportPath(notePath: string): string {
  const ext = extname(notePath);
  const stem = ext ? basename(notePath, ext) : basename(notePath);
  return join(dirname(notePath), `${stem}.html`);
}

export async function runReportCommand(args: string[], io: Io): Promise<number> {
  let note: string | undefined;
  let out: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '-h' || a === '--help') {
      io.stdout(USAGE);
      return 0;
    }
    if (a === '-o' || a === '--output') {
      out = args[++i];
      if (!out) {
        io.stderr(`fatigue-notes report: ${a} needs a file name\n${USAGE}`);
        return 2;
      }
    } else if (a.startsWith('--output=')) out = a.slice(9);
    else if (a.startsWith('-')) {
      io.stderr(`fatigue-notes report: unknown option ${a}\n${USAGE}`);
      return 2;
    } else if (note === undefined) note = a;
    else {
      io.stderr(`fatigue-notes report: one note at a time (got ${note} and ${a})\n${USAGE}`);
      return 2;
    }
  }
  if (!note) {
    io.stderr(USAGE);
    return 2;
  }
  const notePath = resolve(io.cwd, note);
  let text: string;
  try {
    text = decodeNote(readFileSync(notePath));
  } catch (e) {
    io.stderr(`fatigue-notes report: cannot read ${note}: ${(e as Error).message}\n`);
    return 2;
  }
  const result: NoteResult = evaluateNote(
    text,
    cliHistoryOptions(historyReader(notePath, workspaceOf(notePath)), io.historyLimits),
  );
  const html = buildReportHtml({
    // Inside the working folder the path helps the reader find the note; outside it, the name.
    noteName: relative(io.cwd, notePath).startsWith('..')
      ? basename(notePath)
      : relative(io.cwd, notePath) || basename(notePath),
    result,
    register: assumptionsRegister(result, text),
    toolVersion: VERSION,
    runDate: formatRunDate(runDate()),
  });
  const outPath = out ? resolve(io.cwd, out) : defaultReportPath(notePath);
  try {
    writeFileSync(outPath, html);
  } catch (e) {
    io.stderr(`fatigue-notes report: cannot write ${outPath}: ${(e as Error).message}\n`);
    return 2;
  }
  const tally = { pass: 0, fail: 0, error: 0, unchecked: 0 };
  for (const c of result.checks) tally[c.status]++;
  io.stdout(
    `wrote ${relative(io.cwd, outPath).startsWith('..') ? outPath : relative(io.cwd, outPath) || outPath}: ${result.checks.length} check(s): ${tally.pass} pass, ${tally.fail} fail, ${tally.error} error, ${tally.unchecked} unchecked\n`,
  );
  return 0;
}
