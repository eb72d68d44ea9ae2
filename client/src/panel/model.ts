/**
 * From the server's summary records to what the panel shows: table rows with sort keys,
 * and for every check its requirements, diagrams (drawn by the core in the server) and
 * derivation list. A view: every number is one the core computed and formatted.
 */
import { problemCounts, type SummaryCheck } from '../summary';
import type { Cell, DerivationItem, PanelDetail, PanelModel, PanelRow } from './protocol';

function cell(check: SummaryCheck, name: string): Cell {
  const v = check.values?.[name];
  if (!v) return { text: '', sort: null };
  if (v.infinite) return { text: v.display || 'infinite', sort: 1e308 };
  return { text: v.display, sort: v.si !== null && Number.isFinite(v.si) ? v.si : null };
}

export function rowKey(check: SummaryCheck, index: number): string {
  return check.id ?? `#${index}`;
}

export function buildRows(checks: readonly SummaryCheck[]): PanelRow[] {
  return checks.map((c, index) => {
    // The life column's value is the one the server names (the core's list of what each view shows).
    const lifeName = c.shown?.life ?? '';
    return {
      index,
      key: rowKey(c, index),
      id: c.id ?? '(no id)',
      title: c.title ?? '',
      method: c.method,
      criterion: c.criterion ?? '',
      n_f: cell(c, 'n_f'),
      n_y: cell(c, 'n_y'),
      life: { ...cell(c, lifeName), name: lifeName, meaning: c.values?.[lifeName]?.meaning ?? '' },
      status: c.status,
      line: c.range.start.line + 1,
    };
  });
}

export function buildDetail(check: SummaryCheck, index: number): PanelDetail {
  const derivation: DerivationItem[] = [];
  for (const name of check.order ?? Object.keys(check.values ?? {})) {
    const v = check.values?.[name];
    if (!v) continue;
    const item: DerivationItem = { name, display: v.display, meaning: v.meaning, origin: v.origin };
    if (v.formula) item.formula = v.formula;
    if (v.inputs && v.inputs.length > 0)
      item.inputs = v.inputs.map((i) => `${i.name} = ${i.display}`).join(', ');
    if (v.source) item.source = v.source;
    if (v.notes && v.notes.length > 0) item.notes = v.notes;
    if (v.assumption) item.assumption = v.assumption;
    if (v.tool) item.tool = `${v.tool.label} (${v.tool.formula})`;
    derivation.push(item);
  }
  return {
    key: rowKey(check, index),
    heading: `${check.id ?? '(no id)'}${check.title ? ` — ${check.title}` : ''}`,
    subtitle: [check.method, check.criterion, `line ${check.range.start.line + 1}`]
      .filter(Boolean)
      .join(' · '),
    problems: problemCounts(check),
    requirements: (check.requirements ?? []).map((r) => ({
      text: r.text,
      actual: r.actualDisplay,
      met: r.met,
    })),
    diagrams: check.diagrams ?? [],
    derivation,
    tables: check.tables ?? [],
  };
}

export function buildPanelModel(
  note: { fileName: string } | undefined,
  checks: readonly SummaryCheck[],
  error?: string,
): PanelModel {
  if (!note) return { state: 'no-note', rows: [], details: [] };
  if (error) return { state: 'error', fileName: note.fileName, message: error, rows: [], details: [] };
  if (checks.length === 0) return { state: 'no-checks', fileName: note.fileName, rows: [], details: [] };
  return {
    state: 'note',
    fileName: note.fileName,
    rows: buildRows(checks),
    details: checks.map((c, i) => buildDetail(c, i)),
  };
}
