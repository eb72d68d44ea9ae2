/**
 * `fatigue-notes check PATH... [--format text|json|sarif] [--jobs N]`: evaluates every check
 * of the Markdown notes given (folders searched for *.md), on N worker threads (default: one
 * per core for 4 notes or more and 256 KiB or more, else the main thread; cli/checkJobs.ts),
 * printed in the order of the files whatever the number of threads. Exit 0: no error and no failed
 * requirement; 1: an error or a failed requirement; 2: usage error or unreadable file.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { evaluateNote, type NoteResult } from '@fatigue-notes/core';
import { decodeNote } from '../files/decode';
import { historyReader, workspaceOf } from '../files/historyReader';
import { automaticJobs, type CheckFormat, evaluateFiles, type FileOutcome } from './checkJobs';
import { cliHistoryOptions, type HistoryLimits } from './historyLimits';
import type { Io } from './io';
import { jsonOf, toSarif } from './output';
import { VERSION } from './version';

const SKIP = new Set(['node_modules', '.git', 'dist', '.tools', 'test-output']);

export function collectMarkdown(path: string, out: string[]): void {
  const st = statSync(path);
  if (st.isFile()) {
    out.push(path);
    return;
  }
  if (!st.isDirectory()) return;
  for (const name of readdirSync(path).sort()) {
    if (SKIP.has(name) || name.startsWith('.')) continue;
    const p = join(path, name);
    let s: ReturnType<typeof statSync>;
    try {
      s = statSync(p);
    } catch {
      continue;
    }
    if (s.isDirectory()) collectMarkdown(p, out);
    else if (name.toLowerCase().endsWith('.md')) out.push(p);
  }
}

export function evaluateFile(path: string, limits?: HistoryLimits): NoteResult {
  const text = decodeNote(readFileSync(path));
  return evaluateNote(text, cliHistoryOptions(historyReader(resolve(path), workspaceOf(path)), limits));
}

export async function runCheckCommand(args: string[], io: Io): Promise<number> {
  let format = 'text';
  let jobs: number | undefined;
  const paths: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--format' || a === '-f') {
      format = args[++i] ?? '';
    } else if (a.startsWith('--format=')) format = a.slice(9);
    else if (a === '--jobs' || a === '-j' || a.startsWith('--jobs=')) {
      const v = a.startsWith('--jobs=') ? a.slice(7) : (args[++i] ?? '');
      const n = Number(v);
      if (!/^\d+$/.test(v) || n < 1 || n > 256) {
        io.stderr(`fatigue-notes check: --jobs must be a whole number from 1 to 256 (got "${v}")\n`);
        return 2;
      }
      jobs = n;
    } else if (a === '--help' || a === '-h') {
      io.stdout(`usage: fatigue-notes check PATH... [--format text|json|sarif] [--jobs N]\n`);
      return 0;
    } else if (a.startsWith('-')) {
      io.stderr(`fatigue-notes check: unknown option ${a}\n`);
      return 2;
    } else paths.push(a);
  }
  if (!['text', 'json', 'sarif'].includes(format)) {
    io.stderr(`fatigue-notes check: --format must be text, json or sarif (got "${format}")\n`);
    return 2;
  }
  if (paths.length === 0) {
    io.stderr('usage: fatigue-notes check PATH... [--format text|json|sarif] [--jobs N]\n');
    return 2;
  }
  const files: string[] = [];
  for (const p of paths) {
    try {
      collectMarkdown(resolve(io.cwd, p), files);
    } catch (e) {
      io.stderr(`fatigue-notes check: cannot read ${p}: ${(e as Error).message}\n`);
      return 2;
    }
  }
  if (files.length === 0) {
    // A CI job pointed at the wrong folder must not pass.
    io.stderr(`fatigue-notes check: no Markdown note (*.md) in ${paths.join(', ')}\n`);
    return 2;
  }
  let bytes = 0;
  for (const f of files) {
    try {
      bytes += statSync(f).size;
    } catch {
      // an unreadable note is reported below, where it is read
    }
  }
  const replies = await evaluateFiles(
    // Inside the working folder as a relative path, elsewhere as given in full.
    files.map((f) => {
      const rel = relative(io.cwd, f);
      return { file: f, rel: rel && !rel.startsWith('..') ? rel : f };
    }),
    format as CheckFormat,
    jobs ?? automaticJobs(files.length, bytes),
    io.historyLimits,
  );
  const reports: FileOutcome[] = [];
  for (let i = 0; i < replies.length; i++) {
    const r = replies[i];
    if ('error' in r) {
      io.stderr(`fatigue-notes check: cannot read ${files[i]}: ${r.error}\n`);
      return 2;
    }
    reports.push(r.outcome);
  }
  const failed = reports.some((r) => r.failed);
  if (format === 'json')
    io.stdout(
      `${JSON.stringify(jsonOf(reports.map((r) => r.json as NonNullable<FileOutcome['json']>)), null, 2)}\n`,
    );
  else if (format === 'sarif')
    io.stdout(
      `${JSON.stringify(
        toSarif(
          reports.map((r) => ({ path: r.path, result: { diagnostics: r.diagnostics ?? [] } })),
          VERSION,
        ),
        null,
        2,
      )}\n`,
    );
  else {
    const lines: string[] = [];
    let nChecks = 0;
    const tally = { pass: 0, fail: 0, error: 0, unchecked: 0 };
    for (const r of reports) {
      for (const k of ['pass', 'fail', 'error', 'unchecked'] as const) {
        tally[k] += r.tally[k];
        nChecks += r.tally[k];
      }
      lines.push(...(r.checkLines ?? []));
    }
    for (const r of reports) {
      for (const d of r.diagnostics ?? []) {
        lines.push(
          `${r.path}:${d.range.start.line + 1}:${d.range.start.character + 1} ${d.severity} ${d.code} ${d.message}`,
        );
      }
    }
    lines.push(
      `${files.length} note(s), ${nChecks} check(s): ${tally.pass} pass, ${tally.fail} fail, ${tally.error} error, ${tally.unchecked} unchecked`,
    );
    io.stdout(`${lines.join('\n')}\n`);
  }
  return failed ? 1 : 0;
}
