/**
 * The one loop over a note's blocks, shared by `evaluateNote` and the incremental session
 * (`session/noteSession.ts`) so that the two cannot drift: what a block is evaluated with
 * (per-block display units, the history time budget), the size budgets, design mode
 * (`solve:`), the Markdown fallback notice and the lint switches. A sequence is used once,
 * top to bottom: each block sees the checks added before it.
 */

import type { Diagnostic } from '../context/types';
import { solveBlock } from '../design/solve';
import { notEvaluated, overBudget } from '../language/budgets';
import type { CheckScopeEntry, EvaluateOptions } from '../language/checkScope';
import { evaluateBlock } from '../language/evaluateBlock';
import { MAX_NESTING } from '../language/fenceScan';
import { historyBudget } from '../language/historyBudget';
import { type BlockSource, ID_PATTERN } from '../language/markdownBlocks';

/** A block as the session keeps it between updates (its lines are read again when needed). */
/**
 * Warnings that say a result may be unconservative: the `lints` setting cannot turn them off
 * (nor any error); a reader of the note must see them.
 */
const KEPT_WARNINGS = new Set([
  'hidden-finite-life',
  'large-shell-opening',
  'rotating-history',
  'criterion-domain',
]);

export type BlockHead = Omit<BlockSource, 'lines'>;

export class BlockSequence {
  /** Checks so far by id, for `id.name` references of later blocks. */
  readonly previous = new Map<string, CheckScopeEntry>();
  /** Ids taken so far, for `duplicate-id`. */
  readonly seenIds = new Map<string, BlockSource>();
  private readonly blockOptions: EvaluateOptions;

  constructor(private readonly options: EvaluateOptions) {
    const noteSystem = options.unitSystem && options.unitSystem !== 'auto' ? options.unitSystem : undefined;
    this.blockOptions = { ...options, unitSystem: noteSystem ?? 'auto' };
  }

  /** Evaluate the block at `index` of the note (0-based), against the checks added so far. */
  evaluate(block: BlockSource, index: number): CheckScopeEntry {
    const { previous, seenIds } = this;
    const why = overBudget(block, index);
    let entry: CheckScopeEntry;
    if (why) {
      const system = this.blockOptions.unitSystem === 'US' ? 'US' : 'SI';
      entry = notEvaluated(block, why, system, seenIds);
    } else {
      const options = historyBudget(this.blockOptions);
      // Design mode evaluates the block again per trial value; trials leave `seenIds` alone.
      // A block without the word `solve` has no `solve:` line: it is evaluated once, directly.
      entry = mentionsSolve(block)
        ? solveBlock(block, previous, (inject, trial) =>
            evaluateBlock(block, previous, trial ? new Map(seenIds) : seenIds, options, inject),
          )
        : evaluateBlock(block, previous, seenIds, options);
      if (block.fallback) entry.result.diagnostics.unshift(fallbackNotice(block));
    }
    const lints = this.options.lints;
    if (lints)
      entry.result.diagnostics = entry.result.diagnostics.filter(
        (d) => d.severity === 'error' || KEPT_WARNINGS.has(d.code) || lints[d.code] !== false,
      );
    return entry;
  }

  /**
   * Make a finished check visible to the blocks after it. `kept`: the check was not evaluated
   * again (the session reuses it), so its id is taken here as evaluating it would have done.
   */
  add(entry: CheckScopeEntry, kept?: BlockHead): void {
    if (kept) {
      const id = kept.id;
      if (id && ID_PATTERN.test(id) && !this.seenIds.has(id))
        this.seenIds.set(id, { ...kept, lines: NO_LINES });
    }
    const rid = entry.result.id;
    if (rid && !this.previous.has(rid)) this.previous.set(rid, entry);
  }
}

const NO_LINES: BlockSource['lines'] = [];

function mentionsSolve(block: BlockSource): boolean {
  for (const l of block.lines) if (l.text.includes('solve')) return true;
  return false;
}

function fallbackNotice(block: BlockSource): Diagnostic {
  const id = block.id && ID_PATTERN.test(block.id) ? block.id : null;
  return {
    range: {
      start: { line: block.openLine, character: block.idStart },
      end: { line: block.openLine, character: block.idEnd },
    },
    severity: 'warning',
    code: 'markdown-fallback',
    message:
      block.fallback === 'nesting'
        ? `this note nests block quotes or lists more than ${MAX_NESTING} deep: its fatigue blocks were found by a line scan, not by a Markdown parser (a fence inside such nesting may be missed or misread)`
        : 'the Markdown parser failed on this note: its fatigue blocks were found by a line scan (a fence inside a list or a quote may be missed or misread)',
    check: id,
  };
}
