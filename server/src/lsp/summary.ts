/**
 * `fatigue/summary` (params `{ uri }`): every check's record for the client's summary panel
 * and Markdown preview, for the version of the note the server evaluated: id, title,
 * method, criterion, status, values, requirements, the names each view shows (from the
 * core's one list), the diagrams drawn as SVG, the data behind them, its tables, its range
 * in the note and its diagnostics counted. The client draws and computes nothing itself.
 */
import {
  type CheckDiagram,
  type CheckResult,
  checkDiagrams,
  type MethodFields,
  methodModule,
  type NoteResult,
  shownNames,
} from '@fatigue-notes/core';
import type { NoteView } from './locate';

export const SUMMARY_REQUEST = 'fatigue/summary';

export interface SummaryParams {
  uri: string;
}

/** The data behind the diagrams and tables are the fields the check's method declares (`MethodModule.fields`). */
export interface CheckSummary extends Partial<MethodFields> {
  id: string | null;
  title?: string;
  method: CheckResult['method'];
  criterion?: string;
  status: CheckResult['status'];
  unitSystem: CheckResult['unitSystem'];
  values: CheckResult['values'];
  order: string[];
  requirements: CheckResult['requirements'];
  /** The names of `values` each view shows: one line, the preview's table, the panel's life column. */
  shown: ReturnType<typeof shownNames>;
  /** The check's diagrams as the core draws them, without an embedded style (the page supplies it). */
  diagrams: CheckDiagram[];
  range: CheckResult['range'];
  headerRange: CheckResult['headerRange'];
  /** Counted (the editor shows the diagnostics themselves), with the first error's message. */
  diagnostics: { errors: number; warnings: number; firstError?: string };
}

export interface NoteSummary {
  uri: string;
  /** The document version these results are of. */
  version: number;
  checks: CheckSummary[];
}

/** Diagrams of a check record, drawn once per record and digit count (unchanged blocks keep their record). */
const drawn = new WeakMap<CheckResult, { digits: number; diagrams: CheckDiagram[] }>();

function diagramsOf(c: CheckResult, digits: number): CheckDiagram[] {
  const hit = drawn.get(c);
  if (hit && hit.digits === digits) return hit.diagrams;
  const diagrams = checkDiagrams(c, { embedStyle: false, unitSystem: c.unitSystem, digits });
  drawn.set(c, { digits, diagrams });
  return diagrams;
}

/** The summary of one evaluated note (also what the client's tests build from `evaluateNote`). */
export function summaryOfResult(
  uri: string,
  version: number,
  result: NoteResult,
  digits: number,
): NoteSummary {
  return {
    uri,
    version,
    checks: result.checks.map((c) => {
      const errors = c.diagnostics.filter((d) => d.severity === 'error');
      const s: CheckSummary = {
        id: c.id,
        method: c.method,
        status: c.status,
        unitSystem: c.unitSystem,
        values: c.values,
        order: c.order,
        requirements: c.requirements,
        shown: shownNames(c),
        diagrams: diagramsOf(c, digits),
        range: c.range,
        headerRange: c.headerRange,
        diagnostics: {
          errors: errors.length,
          warnings: c.diagnostics.filter((d) => d.severity === 'warning').length,
        },
      };
      if (errors[0]) s.diagnostics.firstError = errors[0].message;
      if (c.title !== undefined) s.title = c.title;
      if (c.criterion !== undefined) s.criterion = c.criterion;
      for (const f of methodModule(c.method)?.fields ?? [])
        if (c[f] !== undefined) (s as unknown as Record<string, unknown>)[f] = c[f];
      return s;
    }),
  };
}

export function summaryOf(view: NoteView): NoteSummary {
  return summaryOfResult(view.uri, view.version, view.result, view.settings.significantDigits);
}
