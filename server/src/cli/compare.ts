/**
 * `fatigue-notes compare OLD.md NEW.md [--format text|json]`: which checks' results moved
 * between two versions of a note. Either side may be `REV:path`, read with `git show
 * REV:path` in the current folder (git's own rule for the path: from the repository root,
 * or `./path` from the current folder); a file that exists under that name wins.
 *
 * Requirement status changes come first, then checks added, removed and changed (each
 * moved value old -> new with its relative change). Exit 1 when a requirement newly fails
 * or a check goes to error (so a CI job can gate on it), 0 otherwise, 2 on a usage error or
 * an unreadable version.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { isAbsolute, resolve } from 'node:path';
import {
  compareNotes,
  evaluateNote,
  type NoteComparison,
  type NoteResult,
  relativeText,
  type ValueChange,
} from '@fatigue-notes/core';
import { decodeNote } from '../files/decode';
import { historyReader, workspaceOf } from '../files/historyReader';
import { cliHistoryOptions } from './historyLimits';
import type { Io } from './io';

const USAGE = 'usage: fatigue-notes compare OLD.md NEW.md [--format text|json]   (either may be REV:path)\n';

interface Version {
  label: string;
  text: string;
  /** Where the note's relative paths (load histories) are resolved. */
  notePath: string;
}

function git(args: string[], cwd: string): Buffer {
  return execFileSync('git', args, {
    cwd,
    stdio: ['ignore', 'pipe', 'pipe'],
    maxBuffer: 256 * 1024 * 1024,
    windowsHide: true,
  });
}

/** Reads a file, or `REV:path` from git. Throws an Error with a readable message. */
export function readVersion(spec: string, cwd: string): Version {
  const asFile = resolve(cwd, spec);
  if (existsSync(asFile)) return { label: spec, text: decodeNote(readFileSync(asFile)), notePath: asFile };
  const m = /^([^:]+):(.+)$/.exec(spec);
  if (!m || /^[A-Za-z]:[\\/]/.test(spec)) throw new Error(`no such file: ${spec}`);
  const [, rev, path] = m;
  if (rev.startsWith('-')) throw new Error(`\`${rev}\` is not a git revision`);
  let buf: Buffer;
  try {
    buf = git(['show', `${rev}:${path}`], cwd);
  } catch (e) {
    const err = e as { stderr?: Buffer; message: string };
    const why = err.stderr?.toString('utf8').trim() || err.message;
    throw new Error(`cannot read ${spec} from git: ${why.split('\n')[0]}`);
  }
  // Histories of an old version are read from the working tree, where the note's path points now.
  let notePath: string;
  if (path.startsWith('./') || path.startsWith('../') || isAbsolute(path)) notePath = resolve(cwd, path);
  else {
    let top = cwd;
    try {
      top = git(['rev-parse', '--show-toplevel'], cwd).toString('utf8').trim() || cwd;
    } catch {
      top = cwd;
    }
    notePath = resolve(top, path);
  }
  return { label: spec, text: decodeNote(buf), notePath };
}

function evaluate(v: Version): NoteResult {
  return evaluateNote(v.text, cliHistoryOptions(historyReader(v.notePath, workspaceOf(v.notePath))));
}

function valueLine(v: ValueChange): string {
  const old = v.old?.display ?? '(absent)';
  const now = v.new?.display ?? '(absent)';
  const rel = relativeText(v.relative);
  return `    ${v.name.padEnd(14)} ${v.kind.padEnd(6)}  ${old} -> ${now}${rel ? `  (${rel})` : ''}`;
}

export function comparisonText(cmp: NoteComparison, oldLabel: string, newLabel: string): string {
  const out: string[] = [`compare ${oldLabel} -> ${newLabel}`];
  if (cmp.requirementChanges.length > 0) {
    out.push('', 'Requirements whose status changed:');
    for (const r of cmp.requirementChanges) {
      const tag = r.newlyFailing ? 'NOW FAILS' : r.new === 'met' ? 'now met' : 'changed';
      const actual = r.oldActual || r.newActual ? `  (${r.oldActual ?? '-'} -> ${r.newActual ?? '-'})` : '';
      out.push(`  ${tag.padEnd(10)} ${r.check}: ${r.text}  ${r.old} -> ${r.new}${actual}`);
    }
  }
  if (cmp.added.length > 0) {
    out.push('', 'Checks added:');
    for (const c of cmp.added)
      out.push(`  ${c.key} (line ${c.line}, ${c.status})${c.title ? ` — ${c.title}` : ''}`);
  }
  if (cmp.removed.length > 0) {
    out.push('', 'Checks removed:');
    for (const c of cmp.removed)
      out.push(`  ${c.key} (was line ${c.line}, ${c.status})${c.title ? ` — ${c.title}` : ''}`);
  }
  if (cmp.changed.length > 0) {
    out.push('', 'Checks changed:');
    for (const c of cmp.changed) {
      const status = c.oldStatus === c.newStatus ? c.newStatus : `${c.oldStatus} -> ${c.newStatus}`;
      out.push(`  ${c.key} (line ${c.oldLine} -> ${c.newLine}): ${status}`);
      for (const v of c.values) out.push(valueLine(v));
    }
  }
  if (cmp.unchanged.length > 0) out.push('', `Unchanged: ${cmp.unchanged.join(', ')}`);
  if (cmp.added.length + cmp.removed.length + cmp.changed.length === 0) out.push('', 'No check moved.');
  out.push('');
  out.push(
    cmp.newlyFailing
      ? `Newly failing (exit 1):\n${cmp.failures.map((f) => `  ${f}`).join('\n')}`
      : 'No requirement newly fails.',
  );
  return `${out.join('\n')}\n`;
}

export async function runCompareCommand(args: string[], io: Io): Promise<number> {
  let format = 'text';
  const specs: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '-h' || a === '--help') {
      io.stdout(USAGE);
      return 0;
    }
    if (a === '--format' || a === '-f') format = args[++i] ?? '';
    else if (a.startsWith('--format=')) format = a.slice(9);
    else if (a.startsWith('-')) {
      io.stderr(`fatigue-notes compare: unknown option ${a}\n${USAGE}`);
      return 2;
    } else specs.push(a);
  }
  if (format !== 'text' && format !== 'json') {
    io.stderr(`fatigue-notes compare: --format must be text or json (got "${format}")\n`);
    return 2;
  }
  if (specs.length !== 2) {
    io.stderr(USAGE);
    return 2;
  }
  let versions: [Version, Version];
  try {
    versions = [readVersion(specs[0], io.cwd), readVersion(specs[1], io.cwd)];
  } catch (e) {
    io.stderr(`fatigue-notes compare: ${(e as Error).message}\n`);
    return 2;
  }
  const cmp = compareNotes(evaluate(versions[0]), evaluate(versions[1]));
  if (format === 'json') io.stdout(`${JSON.stringify({ old: specs[0], new: specs[1], ...cmp }, null, 2)}\n`);
  else io.stdout(comparisonText(cmp, specs[0], specs[1]));
  return cmp.newlyFailing ? 1 : 0;
}
