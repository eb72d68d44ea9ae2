/**
 * Size budgets of a note (issue 7: a note is untrusted input and must not hang the editor).
 * A block over a budget is not evaluated: its check carries one error on its fence instead.
 * The limits are far above any hand-written check (the samples have blocks of 10 to 40
 * lines) and low enough that the largest block allowed evaluates in milliseconds.
 */

import { type CheckResult, type Diagnostic, lineRange, range } from '../context/types';
import { defaultMethod } from '../methods/registry';
import type { CheckScopeEntry } from './checkScope';
import { MAX_EXPRESSION_LENGTH } from './expressions';
import { type BlockSource, ID_PATTERN } from './markdownBlocks';

/** Most content lines of one block that are evaluated. */
export const MAX_BLOCK_LINES = 2_000;
/** Most characters of one block (its content lines and their line ends) that are evaluated. */
export const MAX_BLOCK_CHARS = 200_000;
/** Most blocks of one note that are evaluated; the next one says so and the rest are left out. */
export const MAX_BLOCKS = 10_000;
/** In a block over budget, lines longer than this get an error of their own (the first few of them). */
export const LONG_LINE_CHARS = 10_000;
const LONG_LINES_REPORTED = 10;

export interface OverBudget {
  code: string;
  message: string;
  /** Lines of the block longer than `LONG_LINE_CHARS` (document lines, at most a few). */
  longLines?: Array<{ line: number; length: number }>;
}

/** The blocks of a note that the evaluator looks at: the first `MAX_BLOCKS`, and one more to say so. */
export function limitBlocks<T>(blocks: readonly T[]): T[] {
  return blocks.slice(0, MAX_BLOCKS + 1);
}

/** Why the block at `index` of its note is not evaluated, or undefined when it is. */
export function overBudget(block: BlockSource, index: number): OverBudget | undefined {
  if (index >= MAX_BLOCKS)
    return {
      code: 'too-many-blocks',
      message: `this note has more than ${MAX_BLOCKS.toLocaleString('en-US')} fatigue blocks: the first ${MAX_BLOCKS.toLocaleString('en-US')} are evaluated, this one and those after it are not (split the note)`,
    };
  const n = block.lines.length;
  if (n > MAX_BLOCK_LINES)
    return {
      code: 'block-too-large',
      message: `this block has ${n.toLocaleString('en-US')} content lines, more than the ${MAX_BLOCK_LINES.toLocaleString('en-US')} a check may have: it is not evaluated (split it into several checks${block.closed ? '' : ', or close its fence'})`,
    };
  let chars = 0;
  const longLines: Array<{ line: number; length: number }> = [];
  for (const l of block.lines) {
    chars += l.text.length + 1;
    if (l.text.length > LONG_LINE_CHARS && longLines.length < LONG_LINES_REPORTED)
      longLines.push({ line: l.line, length: l.text.length });
  }
  if (chars > MAX_BLOCK_CHARS)
    return {
      longLines,
      code: 'block-too-large',
      message: `this block has ${chars.toLocaleString('en-US')} characters, more than the ${MAX_BLOCK_CHARS.toLocaleString('en-US')} a check may have: it is not evaluated (split it into several checks${block.closed ? '' : ', or close its fence'})`,
    };
  return undefined;
}

/** The check of a block that is not evaluated: no values, one error on its fence. */
export function notEvaluated(
  block: BlockSource,
  why: OverBudget,
  unitSystem: CheckResult['unitSystem'],
  seenIds: Map<string, BlockSource>,
): CheckScopeEntry {
  const id = block.id && ID_PATTERN.test(block.id) ? block.id : null;
  // Its id is taken, as for an evaluated block, so that a later block of the same id is a duplicate.
  if (id && !seenIds.has(id)) seenIds.set(id, block);
  const headerRange = lineRange(block.openLine, block.idStart, block.idEnd);
  const diagnostic: Diagnostic = {
    range: lineRange(block.openLine, block.idStart, block.idEnd),
    severity: 'error',
    code: why.code,
    message: why.message,
    check: id,
  };
  const result: CheckResult = {
    id,
    method: defaultMethod(),
    range: range(block.openLine, 0, block.closeLine, 0),
    headerRange,
    insertLine: block.closed ? block.closeLine : block.closeLine + 1,
    status: 'error',
    values: Object.create(null),
    order: [],
    requirements: [],
    diagnostics: [diagnostic, ...(why.longLines ?? []).map((l) => longLine(l, id))],
    unitSystem,
  };
  return { result, raw: new Map() };
}

function longLine(l: { line: number; length: number }, check: string | null): Diagnostic {
  return {
    range: lineRange(l.line, 0, l.length),
    severity: 'error',
    code: 'line-too-long',
    message: `this line has ${l.length.toLocaleString('en-US')} characters: a statement or an expression that long is not read (expressions: at most ${MAX_EXPRESSION_LENGTH} characters)`,
    check,
  };
}
