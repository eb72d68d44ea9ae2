/**
 * What moved between two evaluations of a note: checks added, removed and changed; in a
 * changed check every value whose display moved (inputs and results, old -> new with the
 * relative change), its status, and each requirement whose status changed. Requirement
 * changes are also collected at the top, worst first, because that is what a reviewer and
 * a CI job look at before anything else.
 *
 * "Moved" means: different when both are shown at the same precision in the same units
 * (the new check's unit system, `digits` significant digits), so that a change below the
 * display precision is not reported. Pure: only the two records are read.
 */
import type { CheckResult, CheckStatus, NoteResult, RequirementResult, Value } from '../context/types';
import { type DimKey, vectorOf } from '../units/dimensions';
import { formatNumber, formatValue, type UnitSystem } from '../units/format';

export interface ValueSnapshot {
  si: number | null;
  infinite?: boolean;
  display: string;
}

export interface ValueChange {
  name: string;
  /** 'input' when the note states it (in the new version, or the old one when removed). */
  kind: 'input' | 'result';
  change: 'moved' | 'added' | 'removed';
  old: ValueSnapshot | null;
  new: ValueSnapshot | null;
  /** (new - old) / |old| for finite, non-zero old values; null otherwise. */
  relative: number | null;
}

export type RequirementState = 'met' | 'not met' | 'not evaluated' | 'absent';

export interface RequirementChange {
  check: string;
  text: string;
  old: RequirementState;
  new: RequirementState;
  oldActual?: string;
  newActual?: string;
  /** Met (or absent) before, not met now. */
  newlyFailing: boolean;
}

export interface CheckSummary {
  key: string;
  id: string | null;
  title?: string;
  line: number;
  status: CheckStatus;
}

export interface CheckChange {
  key: string;
  id: string | null;
  title?: string;
  oldLine: number;
  newLine: number;
  oldStatus: CheckStatus;
  newStatus: CheckStatus;
  requirements: RequirementChange[];
  values: ValueChange[];
}

export interface NoteComparison {
  version: 1;
  /** Requirement status changes of all checks, newly failing first. */
  requirementChanges: RequirementChange[];
  added: CheckSummary[];
  removed: CheckSummary[];
  changed: CheckChange[];
  /** Keys of the checks present in both versions with nothing moved. */
  unchanged: string[];
  /** True when a requirement newly fails or a check newly goes to error. */
  newlyFailing: boolean;
  /** One line per reason behind `newlyFailing`. */
  failures: string[];
}

export interface CompareOptions {
  /** Significant digits of the comparison (default 4, the display precision). */
  digits?: number;
}

/** Key of a check: its id, or its rank among the checks without an id. */
function keysOf(note: NoteResult): Map<string, CheckResult> {
  const out = new Map<string, CheckResult>();
  let anon = 0;
  for (const c of note.checks) {
    const key = c.id ?? `(no id #${++anon})`;
    if (!out.has(key)) out.set(key, c);
  }
  return out;
}

function summary(key: string, c: CheckResult): CheckSummary {
  return {
    key,
    id: c.id,
    ...(c.title ? { title: c.title } : {}),
    line: c.range.start.line + 1,
    status: c.status,
  };
}

function snapshot(v: Value): ValueSnapshot {
  return v.infinite ? { si: null, infinite: true, display: v.display } : { si: v.si, display: v.display };
}

function shown(v: Value, dim: DimKey, system: UnitSystem, digits: number): string {
  if (v.infinite) return 'infinite';
  if (v.si === null) return 'none';
  return vectorOf(dim) ? formatValue(v.si, dim, system, digits) : formatNumber(v.si, digits);
}

function requirementState(r: RequirementResult | undefined): RequirementState {
  if (!r) return 'absent';
  return r.met === true ? 'met' : r.met === false ? 'not met' : 'not evaluated';
}

const norm = (t: string) => t.replace(/\s+/g, '');

function compareRequirements(key: string, a: CheckResult, b: CheckResult): RequirementChange[] {
  const out: RequirementChange[] = [];
  const olds = new Map(a.requirements.map((r) => [norm(r.text), r]));
  const news = new Map(b.requirements.map((r) => [norm(r.text), r]));
  for (const [k, r] of news) {
    const o = olds.get(k);
    const os = requirementState(o);
    const ns = requirementState(r);
    if (os === ns) continue;
    out.push({
      check: key,
      text: r.text,
      old: os,
      new: ns,
      ...(o ? { oldActual: o.actualDisplay } : {}),
      newActual: r.actualDisplay,
      newlyFailing: ns === 'not met',
    });
  }
  for (const [k, o] of olds) {
    if (news.has(k)) continue;
    out.push({
      check: key,
      text: o.text,
      old: requirementState(o),
      new: 'absent',
      oldActual: o.actualDisplay,
      newlyFailing: false,
    });
  }
  return out;
}

function compareValues(a: CheckResult, b: CheckResult, digits: number): ValueChange[] {
  const out: ValueChange[] = [];
  const system = b.unitSystem;
  const names = [...b.order, ...a.order.filter((n) => !(n in b.values))];
  for (const name of names) {
    const o = a.values[name];
    const n = b.values[name];
    const kind: ValueChange['kind'] = (n ?? o).origin === 'stated' ? 'input' : 'result';
    if (o && !n) {
      out.push({ name, kind, change: 'removed', old: snapshot(o), new: null, relative: null });
      continue;
    }
    if (!o && n) {
      out.push({ name, kind, change: 'added', old: null, new: snapshot(n), relative: null });
      continue;
    }
    if (!o || !n) continue;
    const dim = n.dim;
    if (shown(o, dim, system, digits) === shown(n, dim, system, digits)) continue;
    const relative =
      o.si !== null && n.si !== null && !o.infinite && !n.infinite && o.si !== 0
        ? (n.si - o.si) / Math.abs(o.si)
        : null;
    out.push({ name, kind, change: 'moved', old: snapshot(o), new: snapshot(n), relative });
  }
  return out;
}

export function compareNotes(
  oldNote: NoteResult,
  newNote: NoteResult,
  options: CompareOptions = {},
): NoteComparison {
  const digits = options.digits ?? 4;
  const olds = keysOf(oldNote);
  const news = keysOf(newNote);
  const added: CheckSummary[] = [];
  const removed: CheckSummary[] = [];
  const changed: CheckChange[] = [];
  const unchanged: string[] = [];
  const requirementChanges: RequirementChange[] = [];
  const failures: string[] = [];
  for (const [key, b] of news) {
    const a = olds.get(key);
    if (!a) {
      added.push(summary(key, b));
      if (b.status === 'error') failures.push(`${key}: new check with status error`);
      for (const r of b.requirements)
        if (r.met === false) {
          requirementChanges.push({
            check: key,
            text: r.text,
            old: 'absent',
            new: 'not met',
            newActual: r.actualDisplay,
            newlyFailing: true,
          });
          failures.push(`${key}: ${r.text} not met (${r.actualDisplay}) in a new check`);
        }
      continue;
    }
    const reqs = compareRequirements(key, a, b);
    const values = compareValues(a, b, digits);
    requirementChanges.push(...reqs);
    for (const r of reqs)
      if (r.newlyFailing) failures.push(`${key}: ${r.text} now not met (${r.newActual ?? ''})`);
    // A check that now fails does so through a requirement (above); one that goes to error is listed here.
    if (a.status !== 'error' && b.status === 'error') failures.push(`${key}: ${a.status} -> error`);
    if (reqs.length === 0 && values.length === 0 && a.status === b.status) {
      unchanged.push(key);
      continue;
    }
    changed.push({
      key,
      id: b.id,
      ...(b.title ? { title: b.title } : {}),
      oldLine: a.range.start.line + 1,
      newLine: b.range.start.line + 1,
      oldStatus: a.status,
      newStatus: b.status,
      requirements: reqs,
      values,
    });
  }
  for (const [key, a] of olds) if (!news.has(key)) removed.push(summary(key, a));
  requirementChanges.sort((x, y) => Number(y.newlyFailing) - Number(x.newlyFailing));
  return {
    version: 1,
    requirementChanges,
    added,
    removed,
    changed,
    unchanged,
    newlyFailing: failures.length > 0,
    failures,
  };
}

/** Relative change as text: `+3.2 %`, `-0.05 %`, or '' when there is none. */
export function relativeText(relative: number | null): string {
  if (relative === null) return '';
  const pct = relative * 100;
  const s = formatNumber(Math.abs(pct), 3);
  return `${pct >= 0 ? '+' : '-'}${s} %`;
}
