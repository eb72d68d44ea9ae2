/** The issues of a history file as diagnostics on the `history:` line: one per kind, its rows listed. */
import type { CheckContext } from '../context/checkContext';
import type { Range, Severity } from '../context/types';
import type { HistoryIssue } from '../rainflow';

/** Rows named in one diagnostic; the rest are counted. */
const ROWS_SHOWN = 5;

export function reportHistoryIssues(
  ctx: CheckContext,
  issues: HistoryIssue[],
  range: Range,
  path: string,
): void {
  const byCode = new Map<string, HistoryIssue[]>();
  for (const i of issues) {
    const list = byCode.get(i.code) ?? [];
    list.push(i);
    byCode.set(i.code, list);
  }
  for (const [code, list] of byCode) {
    const shown = list
      .slice(0, ROWS_SHOWN)
      .map((i) => (i.line > 0 ? `line ${i.line}: ${i.message}` : i.message))
      .join(' ');
    const more = list.length > ROWS_SHOWN ? ` (${list.length - ROWS_SHOWN} more)` : '';
    const sev: Severity = list.some((i) => i.severity === 'error')
      ? 'error'
      : list.some((i) => i.severity === 'warning')
        ? 'warning'
        : 'information';
    ctx.diag(sev, code, `\`${path}\`: ${shown}${more}`, range);
  }
}
