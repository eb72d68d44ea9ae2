/**
 * Incremental evaluation of one open note. Its result always equals a fresh
 * `evaluateNote(text, options)` of the same text; it only gets there with less work.
 *
 * How an update is classified (lines compared with the previous text, so wrong or missing
 * change hints can never make the result wrong):
 *
 * - `unchanged`: the lines are the same (only line endings or nothing changed).
 * - `block`: every changed line (before and after the edit) is a content line of one
 *   closed block whose opening fence starts at column 0 (a top-level fence: no list, no
 *   block quote around it), and none of those lines looks like a fence. Markdown
 *   structure cannot change then: the fence can only be closed by a fence line and a
 *   fenced block's content never affects what is parsed around it. Only that block is
 *   evaluated again, then the later checks that name it (`id.name`, transitively).
 * - `prose`: every changed line lies between two blocks (between the closing fence of a
 *   top-level block, or the start of the note, and the opening fence of the next
 *   top-level block, or the end of the note). Only that stretch of prose plus the next
 *   block is parsed again; if the next block is still found there as the same block (and
 *   no new fatigue block appeared) no check is evaluated again.
 * - `full`: anything else (a fence, an id, a title line of a block inside a list or a
 *   quote was touched): the whole note is parsed and every block evaluated.
 *
 * Later blocks whose lines moved keep their results; their ranges are shifted. A later
 * block whose messages cite a note line ("already stated on line 12") is evaluated again
 * when it moves, since the text would change.
 *
 * Work is split in steps (one block evaluated per step) so that a caller can interleave
 * other work and abandon a stale update: nothing is committed until `finish()`.
 */

import type { CheckResult, Diagnostic, NoteResult, Range } from '../context/types';
import { limitBlocks } from '../language/budgets';
import type { CheckScopeEntry, EvaluateOptions } from '../language/checkScope';
import { MAX_NESTING, nestingOf } from '../language/fenceScan';
import { type BlockSource, findFatigueBlocks, splitLines } from '../language/markdownBlocks';
import { type BlockHead, BlockSequence } from '../note/noteLoop';

/** One content change, as LSP sends them (applied in order; ranges refer to the text at that point). */
export interface TextChange {
  range: Range;
  text: string;
}

export type UpdateKind = 'unchanged' | 'block' | 'prose' | 'full';

export interface UpdateStats {
  kind: UpdateKind;
  /** Blocks evaluated by this update. */
  evaluated: number;
  /** Blocks of the note. */
  blocks: number;
  /** Lines added (negative: removed) above the blocks that moved. */
  lineDelta: number;
}

interface BlockEntry {
  head: BlockHead;
  scope: CheckScopeEntry;
  /** Check ids this block may read through `id.name` (every identifier followed by a dot: a superset). */
  refs: Set<string>;
  /** The result cites note line numbers in its texts: evaluate again when the block moves. */
  citesLines: boolean;
  /** Milliseconds the block took to evaluate (0 when the clock is unavailable). */
  ms: number;
}

/** Work of one update, committed by `finish()`. */
export interface SessionJob {
  readonly kind: UpdateKind;
  /** Evaluate the next block that needs it; false when nothing is left. */
  step(): boolean;
  /** Run what is left, commit to the session and return the note's result. */
  finish(): NoteResult;
  /** True once finished or superseded by a later `start()`. */
  readonly closed: boolean;
}

const FENCE_LIKE = /^[ \t]*(`{3,}|~{3,})/;
const TOP_LEVEL_FENCE = /^(`{3,}|~{3,})/;
const REF = /([A-Za-z_][A-Za-z0-9_]*)(?=\s*\.)/g;
const CITES_LINE = /\blines? \d/;

const now: () => number =
  typeof globalThis.performance?.now === 'function' ? () => globalThis.performance.now() : () => 0;

interface LineDiff {
  newLines: string[];
  hasCR: boolean;
  /** End (exclusive) of the changed lines in the old and in the new text. */
  oldEnd: number;
  newEnd: number;
}

/** How an update is classified, with the line diff it was classified on. */
type Planned = ({ kind: 'block'; index: number } | { kind: 'prose' | 'unchanged' | 'full' }) &
  Partial<LineDiff>;

export class NoteSession {
  private planned?: { text: string; base: string[]; changes?: readonly TextChange[]; plan: Planned };
  private text = '';
  private lines: string[] = [''];
  private hasCR = false;
  private entries: BlockEntry[] = [];
  private current: NoteResult = { checks: [], diagnostics: [] };
  private generation = 0;
  private evaluatedOnce = false;
  private stats: UpdateStats = { kind: 'unchanged', evaluated: 0, blocks: 0, lineDelta: 0 };

  constructor(private readonly options: EvaluateOptions = {}) {}

  /** Bring the session to `text` and return its result (equal to `evaluateNote(text, options)`). */
  update(text: string, changes?: readonly TextChange[]): NoteResult {
    return this.start(text, changes).finish();
  }

  /** The result of the last committed update. */
  result(): NoteResult {
    return this.current;
  }

  /** The text of the last committed update. */
  committedText(): string {
    return this.text;
  }

  /** Line `n` of the committed text ('' beyond the end), without its line ending. */
  lineAt(n: number): string {
    return this.lines[n] ?? '';
  }

  /** Lines of the committed text. */
  lineCount(): number {
    return this.lines.length;
  }

  /** What the last committed update did. */
  lastUpdate(): UpdateStats {
    return this.stats;
  }

  /** Milliseconds each check took at its last evaluation, in note order. */
  timings(): number[] {
    return this.entries.map((e) => e.ms);
  }

  /** Forget everything (e.g. a history file changed on disk): the next update evaluates every block. */
  reset(): void {
    this.generation++;
    this.evaluatedOnce = false;
    this.text = '';
    this.lines = [''];
    this.hasCR = false;
    this.entries = [];
    this.current = { checks: [], diagnostics: [] };
  }

  /**
   * Whether `start(text, changes)` would parse the whole note (an update of kind `full`). A host
   * may then find the blocks elsewhere (the language server parses large notes on another
   * thread) and hand them to `start`. The classification is kept for the `start` that follows.
   */
  needsFullParse(text: string, changes?: readonly TextChange[]): boolean {
    return this.plan(text, changes).kind === 'full';
  }

  private plan(text: string, changes?: readonly TextChange[]): Planned {
    const cached = this.planned;
    if (cached && cached.text === text && cached.base === this.lines && cached.changes === changes)
      return cached.plan;
    let plan: Planned;
    if (this.evaluatedOnce && text === this.text) plan = { kind: 'unchanged' };
    else {
      const fromChanges = changes && changes.length > 0 ? this.applyChanges(text, changes) : undefined;
      const newLines = fromChanges ?? splitFast(text);
      const hasCR = fromChanges ? false : text.includes('\r');
      const old = this.lines;
      // Lines unchanged at the start and at the end.
      const max = Math.min(old.length, newLines.length);
      let p = 0;
      while (p < max && old[p] === newLines[p]) p++;
      let s = 0;
      while (s < max - p && old[old.length - 1 - s] === newLines[newLines.length - 1 - s]) s++;
      const oldEnd = old.length - s;
      const newEnd = newLines.length - s;
      plan = { ...this.classify(newLines, p, oldEnd, newEnd), newLines, hasCR, oldEnd, newEnd };
    }
    this.planned = { text, base: this.lines, changes, plan };
    return plan;
  }

  /**
   * Plan an update; nothing changes in the session until the job's `finish()`. `blocks`: the
   * note's blocks found elsewhere for exactly this text, used when the whole note must be parsed.
   */
  start(text: string, changes?: readonly TextChange[], blocks?: ReadonlyArray<BlockHead>): SessionJob {
    const generation = ++this.generation;
    const planned = this.plan(text, changes);
    this.planned = undefined;
    if (planned.kind === 'unchanged' && !('newLines' in planned)) {
      const heads = this.entries.map((e) => e.head);
      return this.makeJob(generation, text, this.lines, this.hasCR, 'unchanged', heads, new Set(), 0, 0);
    }
    const { newLines, hasCR, oldEnd, newEnd } = planned as Planned & { newLines: string[] } & LineDiff;
    const delta = newEnd - oldEnd;
    const plan = planned;
    if (plan.kind === 'full') {
      const heads = limitBlocks(blocks ?? findFatigueBlocks(text, newLines)).map(toHead);
      return this.makeJob(generation, text, newLines, hasCR, 'full', heads, null, 0, 0);
    }
    // Heads after the changed lines move by `delta`.
    const heads: BlockHead[] = this.entries.map((e, i) => {
      if (plan.kind === 'block' && i === plan.index)
        return { ...e.head, closeLine: e.head.closeLine + delta };
      if (delta !== 0 && e.head.openLine >= oldEnd) return shiftHead(e.head, delta);
      return e.head;
    });
    const firstMoved =
      delta === 0 ? this.entries.length : this.entries.findIndex((e) => e.head.openLine >= oldEnd);
    const changed = new Set<number>(plan.kind === 'block' ? [plan.index] : []);
    return this.makeJob(
      generation,
      text,
      newLines,
      hasCR,
      plan.kind,
      heads,
      changed,
      delta,
      firstMoved < 0 ? this.entries.length : firstMoved,
    );
  }

  /**
   * Apply LSP changes to the current lines; undefined when they cannot be applied line-wise
   * exactly or do not turn the previous text into `text` (the text wins over the hints).
   */
  private applyChanges(text: string, changes: readonly TextChange[]): string[] | undefined {
    if (this.hasCR) return undefined;
    const lines = this.lines.slice();
    let applied = this.text;
    for (const c of changes) {
      if (c.text.includes('\r')) return undefined;
      const { start, end } = c.range;
      if (start.line > end.line || (start.line === end.line && start.character > end.character))
        return undefined;
      if (end.line >= lines.length || start.line < 0) return undefined;
      const first = lines[start.line];
      const last = lines[end.line];
      if (start.character > first.length || end.character > last.length || start.character < 0)
        return undefined;
      let offset = 0;
      for (let l = 0; l < start.line; l++) offset += lines[l].length + 1;
      let endOffset = offset;
      for (let l = start.line; l < end.line; l++) endOffset += lines[l].length + 1;
      applied =
        applied.slice(0, offset + start.character) + c.text + applied.slice(endOffset + end.character);
      const joined = first.slice(0, start.character) + c.text + last.slice(end.character);
      const pieces = joined.includes('\n') ? joined.split('\n') : [joined];
      lines.splice(start.line, end.line - start.line + 1, ...pieces);
    }
    return applied === text ? lines : undefined;
  }

  private classify(
    newLines: string[],
    p: number,
    oldEnd: number,
    newEnd: number,
  ): { kind: 'block'; index: number } | { kind: 'prose' | 'unchanged' } | { kind: 'full' } {
    const old = this.lines;
    // First update (or after reset): nothing to reuse.
    if (!this.evaluatedOnce) return { kind: 'full' };
    if (p === oldEnd && p === newEnd) return { kind: 'unchanged' };
    for (let l = p; l < oldEnd; l++) if (FENCE_LIKE.test(old[l]) || isDeep(old[l])) return { kind: 'full' };
    for (let l = p; l < newEnd; l++)
      if (FENCE_LIKE.test(newLines[l]) || isDeep(newLines[l])) return { kind: 'full' };
    // Blocks found by the line scan (nesting too deep for the Markdown parser): no partial parse.
    if (this.entries[0]?.head.fallback) return { kind: 'full' };
    const heads = this.entries.map((e) => e.head);
    // Last block that opens before the first changed line.
    let lo = 0;
    let hi = heads.length - 1;
    let k = -1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      if (heads[mid].openLine < p) {
        k = mid;
        lo = mid + 1;
      } else hi = mid - 1;
    }
    if (k >= 0) {
      const b = heads[k];
      if (!b.closed || !TOP_LEVEL_FENCE.test(old[b.openLine] ?? '')) return { kind: 'full' };
      if (oldEnd <= b.closeLine) return p > b.openLine ? { kind: 'block', index: k } : { kind: 'full' };
      if (p <= b.closeLine) return { kind: 'full' };
    }
    const next = heads[k + 1];
    if (next && oldEnd > next.openLine) return { kind: 'full' };
    if (next && !TOP_LEVEL_FENCE.test(old[next.openLine] ?? '')) return { kind: 'full' };
    // Prose between block k (or the start) and `next` (or the end): parse that stretch again.
    const segStart = k >= 0 ? heads[k].closeLine + 1 : 0;
    const delta = newEnd - oldEnd;
    const segEnd = next ? next.closeLine + delta : newLines.length - 1;
    const segment = newLines.slice(segStart, segEnd + 1);
    const found = findFatigueBlocks(segment.join('\n'), segment);
    if (!next) return found.length === 0 ? { kind: 'prose' } : { kind: 'full' };
    if (found.length !== 1) return { kind: 'full' };
    const f = found[0];
    const same =
      f.openLine + segStart === next.openLine + delta &&
      f.closeLine + segStart === next.closeLine + delta &&
      f.closed === next.closed &&
      f.id === next.id &&
      f.extraInfo === next.extraInfo &&
      f.idStart === next.idStart &&
      f.idEnd === next.idEnd &&
      f.openLineLength === next.openLineLength;
    return same ? { kind: 'prose' } : { kind: 'full' };
  }

  private makeJob(
    generation: number,
    text: string,
    lines: string[],
    hasCR: boolean,
    kind: UpdateKind,
    newHeads: BlockHead[],
    /** Indices of blocks whose lines changed; null: evaluate every block. */
    changed: Set<number> | null,
    delta: number,
    firstMoved: number,
  ): SessionJob {
    const session = this;
    const oldEntries = this.entries;
    const next: BlockEntry[] = [];
    // The loop over blocks shared with `evaluateNote` (budgets, design mode, lint switches).
    const sequence = new BlockSequence(session.options);
    const previous = sequence.previous;
    const dirty = new Set<string>();
    let evaluated = 0;
    let i = 0;
    let closed = false;
    let committed: NoteResult | undefined;

    const evaluateAt = (index: number): BlockEntry => {
      const head = newHeads[index];
      const source = sourceOf(head, lines);
      const t0 = now();
      const scope = sequence.evaluate(source, index);
      const ms = now() - t0;
      evaluated++;
      ownRanges(scope.result);
      return { head, scope, refs: refsOf(source), citesLines: citesLines(scope.result), ms };
    };

    const register = (entry: BlockEntry, reused: boolean): void => {
      sequence.add(entry.scope, reused ? entry.head : undefined);
      next.push(entry);
    };

    /** Process blocks up to and including the next one that needs evaluating. */
    const step = (): boolean => {
      if (closed) return false;
      if (generation !== session.generation) {
        closed = true;
        return false;
      }
      while (i < newHeads.length) {
        const index = i++;
        const old = changed === null ? undefined : oldEntries[index];
        const moved = index >= firstMoved && delta !== 0;
        // Its values change when its lines changed or a check it names changed; only its texts when it moved.
        const valuesChange = old === undefined || changed?.has(index) === true || intersects(old.refs, dirty);
        if (!valuesChange && !(moved && old.citesLines)) {
          register(old.head === newHeads[index] ? old : { ...old, head: newHeads[index] }, true);
          continue;
        }
        const entry = evaluateAt(index);
        const rid = entry.scope.result.id;
        if (valuesChange && rid && !previous.has(rid)) dirty.add(rid);
        register(entry, false);
        return i < newHeads.length;
      }
      return false;
    };

    const finish = (): NoteResult => {
      if (committed) return committed;
      if (closed || generation !== session.generation)
        throw new Error('this update was superseded by a later one: start a new update');
      while (step()) {
        /* evaluate what is left */
      }
      closed = true;
      // Reused blocks below the edit keep their results; move their ranges.
      if (delta !== 0 && changed !== null) {
        for (let j = firstMoved; j < next.length; j++) {
          const e = next[j];
          if (e.scope === oldEntries[j]?.scope) shiftResult(e.scope.result, delta);
        }
      }
      session.text = text;
      session.lines = lines;
      session.hasCR = hasCR;
      session.entries = next;
      session.evaluatedOnce = true;
      const checks: CheckResult[] = next.map((e) => e.scope.result);
      const diagnostics: Diagnostic[] = [];
      for (const c of checks) for (const d of c.diagnostics) diagnostics.push(d);
      session.current = kind === 'unchanged' ? session.current : { checks, diagnostics };
      session.stats = { kind, evaluated, blocks: next.length, lineDelta: delta };
      committed = session.current;
      return committed;
    };

    return {
      kind,
      step,
      finish,
      get closed() {
        return closed || generation !== session.generation;
      },
    };
  }
}

function toHead(b: BlockHead & { lines?: unknown }): BlockHead {
  if (!('lines' in b)) return b;
  const { lines: _lines, ...head } = b;
  return head;
}

function shiftHead(h: BlockHead, delta: number): BlockHead {
  return { ...h, openLine: h.openLine + delta, closeLine: h.closeLine + delta };
}

/** The block's content lines, read from the note's lines exactly as `findFatigueBlocks` reads them. */
function sourceOf(head: BlockHead, lines: string[]): BlockSource {
  const contentEnd = head.closed ? head.closeLine - 1 : head.closeLine;
  const content: BlockSource['lines'] = [];
  for (let l = head.openLine + 1; l <= contentEnd; l++) content.push({ line: l, text: lines[l] ?? '' });
  return { ...head, lines: content };
}

/** A line that may nest deeper than the Markdown parser is given (see `fenceScan.ts`). */
function isDeep(line: string): boolean {
  return line.length > MAX_NESTING && nestingOf(line) > MAX_NESTING;
}

function splitFast(text: string): string[] {
  return text.includes('\r') ? splitLines(text) : text.split('\n');
}

function refsOf(source: BlockSource): Set<string> {
  const out = new Set<string>();
  for (const { text } of source.lines) {
    if (!text.includes('.')) continue;
    for (const m of text.matchAll(REF)) out.add(m[1]);
  }
  return out;
}

function intersects(a: Set<string>, b: Set<string>): boolean {
  if (a.size === 0 || b.size === 0) return false;
  for (const x of a) if (b.has(x)) return true;
  return false;
}

function citesLines(r: CheckResult): boolean {
  for (const d of r.diagnostics) {
    if (CITES_LINE.test(d.message)) return true;
    for (const f of d.fixes ?? []) if (CITES_LINE.test(f.title)) return true;
  }
  for (const name in r.values) {
    const v = r.values[name];
    if (v.assumption && CITES_LINE.test(v.assumption)) return true;
    for (const n of v.notes ?? []) if (CITES_LINE.test(n)) return true;
  }
  return false;
}

/**
 * Give every range field of a check its own range and position objects (the evaluator
 * shares some, e.g. a statement's range between a value and a diagnostic), so that moving
 * the check later touches each position exactly once. Equality with a fresh evaluation is
 * unaffected: only object identity changes.
 */
function ownRanges(r: CheckResult): void {
  const copy = (x: Range): Range => ({
    start: { line: x.start.line, character: x.start.character },
    end: { line: x.end.line, character: x.end.character },
  });
  r.range = copy(r.range);
  r.headerRange = copy(r.headerRange);
  for (const name of r.order) {
    const v = r.values[name];
    if (v.range) v.range = copy(v.range);
  }
  for (const q of r.requirements) q.range = copy(q.range);
  for (const d of r.diagnostics) {
    d.range = copy(d.range);
    if (d.fixes) for (const f of d.fixes) for (const e of f.edits) e.range = copy(e.range);
  }
}

/** Move every range of a check (made unshared by `ownRanges`) by `delta` lines. */
function shiftResult(r: CheckResult, delta: number): void {
  const rng = (x: Range | undefined): void => {
    if (!x) return;
    x.start.line += delta;
    x.end.line += delta;
  };
  rng(r.range);
  rng(r.headerRange);
  r.insertLine += delta;
  // `order` lists every value once (faster than walking the record's keys).
  for (const name of r.order) rng(r.values[name].range);
  for (const q of r.requirements) rng(q.range);
  // Fixes are few; a fix object shared by two diagnostics must still move once.
  const seenEdits = new Set<object>();
  for (const d of r.diagnostics) {
    rng(d.range);
    if (d.fixes)
      for (const f of d.fixes)
        for (const e of f.edits) {
          if (seenEdits.has(e)) continue;
          seenEdits.add(e);
          rng(e.range);
        }
  }
}
