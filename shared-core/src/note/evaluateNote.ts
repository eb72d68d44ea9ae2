/**
 * Evaluates every fatigue block of a note, top to bottom (`evaluateBlock` per block, design
 * mode where a block has `solve:`). Never throws.
 */

import type { CheckResult, Diagnostic, NoteResult } from '../context/types';
import { limitBlocks } from '../language/budgets';
import type { EvaluateOptions } from '../language/checkScope';
import { findFatigueBlocks, splitLines } from '../language/markdownBlocks';
import { BlockSequence } from './noteLoop';

export function evaluateNote(text: string, options: EvaluateOptions = {}): NoteResult {
  const lines = splitLines(text);
  const blocks = limitBlocks(findFatigueBlocks(text, lines));
  const sequence = new BlockSequence(options);
  const checks: CheckResult[] = [];
  const diagnostics: Diagnostic[] = [];
  for (let i = 0; i < blocks.length; i++) {
    const entry = sequence.evaluate(blocks[i], i);
    sequence.add(entry);
    checks.push(entry.result);
    for (const d of entry.result.diagnostics) diagnostics.push(d);
  }
  return { checks, diagnostics };
}
