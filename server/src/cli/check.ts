/**
 * `fatigue-notes check PATH... [--format text|json|sarif]`: evaluates every check of the
 * Markdown notes given (folders searched for *.md). Exit 0: no error and no failed
 * requirement; 1: an error or a failed requirement; 2: usage error or unreadable file.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { evaluateNote, headlineValues, type NoteResult } from '@fatigue-notes/core';
import { decodeNote } from '../files/decode';
import { historyReader, workspaceOf } from '../files/historyReader';
import { cliHistoryOptions, type HistoryLimits } from './historyLimits';
import type { Io } from './io';
import { type FileReport, toJson, toSarif } from './output';
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

function summaryLine(rel: string, r: NoteResult['checks'][number]): string {
  const pick = headlineValues(r).map((v) => `${v.name} ${v.display}`);
  const status = r.status.toUpperCase().padEnd(9);
  return `${status} ${rel}:${r.range.start.line + 1} ${r.id ?? '(no id)'}${r.title ? ` — ${r.title}` : ''}${pick.length ? `  [${pick.join(', ')}]` : ''}`;
}

export async function runCheckCommand(args: string[], io: Io): Promise<number> {
  let format = 'text';
  const paths: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--format' || a === '-f') {
      format = args[++i] ?? '';
    } else if (a.startsWith('--format=')) format = a.slice(9);
    else if (a === '--help' || a === '-h') {
      io.stdout(`usage: fatigue-notes check PATH... [--format text|json|sarif]\n`);
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
    io.stderr('usage: fatigue-notes check PATH... [--format text|json|sarif]\n');
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
  const reports: FileReport[] = [];
  for (const f of files) {
    let result: NoteResult;
    try {
      result = evaluateFile(f, io.historyLimits);
    } catch (e) {
      io.stderr(`fatigue-notes check: cannot read ${f}: ${(e as Error).message}\n`);
      return 2;
    }
    // Inside the working folder as a relative path, elsewhere as given in full.
    const rel = relative(io.cwd, f);
    reports.push({ path: rel && !rel.startsWith('..') ? rel : f, result });
  }
  const failed = reports.some(
    (r) =>
      r.result.diagnostics.some((d) => d.severity === 'error') ||
      r.result.checks.some((c) => c.status === 'fail' || c.status === 'error'),
  );
  if (format === 'json') io.stdout(`${JSON.stringify(toJson(reports), null, 2)}\n`);
  else if (format === 'sarif') io.stdout(`${JSON.stringify(toSarif(reports, VERSION), null, 2)}\n`);
  else {
    const lines: string[] = [];
    let nChecks = 0;
    const tally = { pass: 0, fail: 0, error: 0, unchecked: 0 };
    for (const r of reports) {
      for (const c of r.result.checks) {
        nChecks++;
        tally[c.status]++;
        lines.push(summaryLine(r.path, c));
      }
    }
    for (const r of reports) {
      for (const d of r.result.diagnostics) {
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
