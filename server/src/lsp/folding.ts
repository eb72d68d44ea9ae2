/** Folding: one range per fatigue block, fences included. */
import { type FoldingRange, FoldingRangeKind } from 'vscode-languageserver/node';
import type { NoteView } from './locate';

export function foldingRangesFor(view: NoteView): FoldingRange[] {
  return view.result.checks
    .filter((c) => c.range.end.line > c.range.start.line)
    .map((c) => ({
      startLine: c.range.start.line,
      endLine: c.range.end.line,
      kind: FoldingRangeKind.Region,
      collapsedText: `${c.id ?? 'fatigue'}${c.title ? ` — ${c.title}` : ''} (${c.status})`,
    }));
}
