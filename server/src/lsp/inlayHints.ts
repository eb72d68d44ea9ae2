/**
 * Inline results: beside each line, the values that line drives (`q`, `Kf` beside the notch
 * radius, `kb` beside `d`, `ka` beside `surface:`), the key results beside `criterion:`
 * (`n_f`, `n_y`, `N_f`, or `D`, `N_cg` ...), each requirement's actual value and verdict
 * beside its `require:` item, and the tool's own value beside a value the note overrides.
 */
import { type CheckResult, headlineRank, type Range, type Value } from '@fatigue-notes/core';
import { type InlayHint, InlayHintKind } from 'vscode-languageserver/node';
import { isContentLine, type NoteView, overlaps } from './locate';

/** Most values shown beside one line; the rest are in the hover. */
const MAX_PER_LINE = 4;
/** Shown in the hover and the panel, not inline (they would crowd the criterion line); the per-fibre values (`n_y_neg` ...) too. */
const NOT_INLINE = /^(n_f_|sigma_ar$)|_(pos|neg)$/;

export function inlayHintsFor(view: NoteView, range: Range): InlayHint[] {
  const out: InlayHint[] = [];
  for (const c of view.result.checks) {
    if (!overlaps(c.range, range)) continue;
    hintsOfCheck(view, c, range, out);
  }
  return out;
}

function hintsOfCheck(view: NoteView, c: CheckResult, range: Range, out: InlayHint[]): void {
  const byLine = new Map<number, Value[]>();
  for (const name of c.order) {
    const v = c.values[name];
    if (!v.range) continue;
    const line = v.range.start.line;
    if (!isContentLine(c, line) || line < range.start.line || line > range.end.line) continue;
    if (v.origin === 'stated' && !v.tool) continue;
    if (v.origin !== 'stated' && NOT_INLINE.test(name)) continue;
    const list = byLine.get(line);
    if (list) list.push(v);
    else byLine.set(line, [v]);
  }
  const requireLines = new Set(c.requirements.map((r) => r.range.start.line));
  for (const [line, values] of byLine) {
    if (requireLines.has(line)) continue;
    // The check's headline results first (the core's one list of what each view shows).
    const ranked = values.slice().sort((a, b) => headlineRank(c, a.name) - headlineRank(c, b.name));
    const shown = ranked.slice(0, MAX_PER_LINE);
    // A stated value: what the tool would compute and why (`fit 1: no notch feature stated`).
    const parts = shown.map((v) =>
      v.origin === 'stated' && v.tool
        ? v.tool.label
        : `${v.name} ${v.display}${v.unused ? ' (not used)' : ''}`,
    );
    if (ranked.length > shown.length) parts.push('… more in the hover');
    out.push({
      position: { line, character: view.line(line).length },
      label: parts.join(' · '),
      paddingLeft: true,
      kind: InlayHintKind.Type,
      tooltip: shown
        .map((v) =>
          v.origin === 'stated' && v.tool
            ? `${v.name} = ${v.display} as stated; fatigue-notes would compute ${v.tool.display} (${v.tool.formula})`
            : `${v.name}: ${v.meaning}`,
        )
        .join('\n'),
    });
  }
  for (const r of c.requirements) {
    const line = r.range.end.line;
    if (line < range.start.line || line > range.end.line) continue;
    const mark = r.met === true ? '✓' : r.met === false ? '✗' : '?';
    out.push({
      position: r.range.end,
      label: `${mark} ${r.actualDisplay}`,
      paddingLeft: true,
      kind: InlayHintKind.Type,
      tooltip: `${r.symbol} = ${r.actualDisplay}, required ${r.op} ${r.targetDisplay}`,
    });
  }
}
