/**
 * What the language server's `fatigue/summary` answers for a note, built by the server's own
 * function from the core's evaluation of the same text: the records the client's views get.
 */
import { type EvaluateOptions, evaluateNote } from '@fatigue-notes/core';
import { summaryOfResult } from '../../server/src/lsp/summary';
import type { SummaryCheck } from '../src/summary';

export function serverSummary(text: string, options: EvaluateOptions = {}, digits = 4): SummaryCheck[] {
  return summaryOfResult('file:///note.md', 1, evaluateNote(text, options), digits).checks;
}
