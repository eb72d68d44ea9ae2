/**
 * What is under a position of a note: the check, the statement of the line and the word
 * (a name, `check_id.name`, an option key or value). Shared by hover, completion,
 * navigation and code actions; reads the core's records, computes nothing.
 */
import {
  type CheckResult,
  type NoteResult,
  type Position,
  parseLine,
  type Range,
  type Statement,
  stripComment,
} from '@fatigue-notes/core';
import type { FatigueSettings } from './settings';

/** One evaluated version of an open note, as the features see it. */
export interface NoteView {
  uri: string;
  version: number;
  result: NoteResult;
  lineCount: number;
  /** Line `n` without its line ending ('' beyond the end). */
  line(n: number): string;
  settings: FatigueSettings;
  /** Milliseconds each check took at its last evaluation, in note order. */
  timings: number[];
}

/** The check whose block (fences included) holds `line`. */
export function checkAt(result: NoteResult, line: number): CheckResult | undefined {
  const checks = result.checks;
  let lo = 0;
  let hi = checks.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const r = checks[mid].range;
    if (line < r.start.line) hi = mid - 1;
    else if (line > r.end.line) lo = mid + 1;
    else return checks[mid];
  }
  return undefined;
}

export function checkById(result: NoteResult, id: string): CheckResult | undefined {
  return result.checks.find((c) => c.id === id);
}

export interface Word {
  text: string;
  start: number;
  end: number;
  /** For `a.b`: the check part and the member part with their columns. */
  check?: { text: string; start: number; end: number };
  member?: { text: string; start: number; end: number };
}

const WORD = /[A-Za-z_][A-Za-z0-9_-]*(?:\.[A-Za-z_][A-Za-z0-9_]*)?/g;

/** The word under `character` (names may hold `-` for option words such as `cold-drawn`). */
export function wordAt(text: string, character: number): Word | undefined {
  for (const m of text.matchAll(WORD)) {
    const start = m.index ?? 0;
    const end = start + m[0].length;
    if (character < start || character > end) continue;
    // A word glued to a number (`35mm`, `1e3`) is a unit or an exponent, not a name.
    if (start > 0 && /[0-9]/.test(text[start - 1])) continue;
    const w: Word = { text: m[0], start, end };
    const dot = m[0].indexOf('.');
    if (dot > 0) {
      w.check = { text: m[0].slice(0, dot), start, end: start + dot };
      w.member = { text: m[0].slice(dot + 1), start: start + dot + 1, end };
    }
    return w;
  }
  return undefined;
}

/** The statement on a line of a check (block-quote markers skipped, comments dropped). */
export function statementOn(lineNo: number, text: string): Statement | null {
  const q = /^\s*(?:>\s?)*/.exec(text);
  const base = q?.[0].includes('>') ? q[0].length : 0;
  return parseLine(lineNo, stripComment(text.slice(base)), base);
}

export function contains(r: Range, p: Position): boolean {
  if (p.line < r.start.line || p.line > r.end.line) return false;
  if (p.line === r.start.line && p.character < r.start.character) return false;
  if (p.line === r.end.line && p.character > r.end.character) return false;
  return true;
}

export function overlaps(a: Range, b: Range): boolean {
  const before = (x: Position, y: Position) =>
    x.line < y.line || (x.line === y.line && x.character < y.character);
  return !before(a.end, b.start) && !before(b.end, a.start);
}

/** Whether `line` is a content line of the check (not a fence). */
export function isContentLine(check: CheckResult, line: number): boolean {
  return line > check.range.start.line && line < check.insertLine;
}

/** Checks above `line` whose id is valid, nearest last. */
export function checksAbove(result: NoteResult, line: number): CheckResult[] {
  return result.checks.filter((c) => c.id && c.range.end.line < line);
}
