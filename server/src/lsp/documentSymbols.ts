/** Outline: each check a symbol named by its id and title, its results as children. */
import type { CheckResult, Range } from '@fatigue-notes/core';
import { type DocumentSymbol, SymbolKind } from 'vscode-languageserver/node';
import type { NoteView } from './locate';

function inside(r: Range, outer: Range): boolean {
  return r.start.line >= outer.start.line && r.end.line <= outer.end.line;
}

function symbolOf(view: NoteView, c: CheckResult): DocumentSymbol {
  const end = c.range.end.line;
  const full: Range = { start: c.range.start, end: { line: end, character: view.line(end).length } };
  const children: DocumentSymbol[] = [];
  for (const name of c.order) {
    const v = c.values[name];
    if (v.origin === 'stated') continue;
    const r = v.range && inside(v.range, full) ? v.range : c.headerRange;
    children.push({
      name,
      detail: `${v.display} · ${v.meaning}`,
      kind: name.startsWith('n_') || name.startsWith('N_') ? SymbolKind.Number : SymbolKind.Field,
      range: r,
      selectionRange: r,
    });
  }
  return {
    name: c.id ?? '(check without id)',
    detail: [c.title, c.status].filter(Boolean).join(' · '),
    kind: SymbolKind.Module,
    range: full,
    selectionRange: c.headerRange,
    children,
  };
}

export function documentSymbolsFor(view: NoteView): DocumentSymbol[] {
  return view.result.checks.map((c) => symbolOf(view, c));
}
