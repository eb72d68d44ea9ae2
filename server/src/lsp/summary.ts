/**
 * `fatigue/summary` (params `{ uri }`): every check's record for the client's summary panel:
 * id, title, method, criterion, status, values, requirements, the data of its diagrams,
 * its tables and its range in the note.
 */
import type { CheckResult } from '@fatigue-notes/core';
import type { NoteView } from './locate';

export const SUMMARY_REQUEST = 'fatigue/summary';

export interface SummaryParams {
  uri: string;
}

export interface CheckSummary {
  id: string | null;
  title?: string;
  method: CheckResult['method'];
  criterion?: string;
  status: CheckResult['status'];
  unitSystem: CheckResult['unitSystem'];
  values: CheckResult['values'];
  order: string[];
  requirements: CheckResult['requirements'];
  haigh?: CheckResult['haigh'];
  sn?: CheckResult['sn'];
  tables?: CheckResult['tables'];
  crackCurve?: CheckResult['crackCurve'];
  histogram?: CheckResult['histogram'];
  range: CheckResult['range'];
  headerRange: CheckResult['headerRange'];
  diagnostics: { errors: number; warnings: number };
}

export interface NoteSummary {
  uri: string;
  version: number;
  checks: CheckSummary[];
}

export function summaryOf(view: NoteView): NoteSummary {
  return {
    uri: view.uri,
    version: view.version,
    checks: view.result.checks.map((c) => {
      const s: CheckSummary = {
        id: c.id,
        method: c.method,
        status: c.status,
        unitSystem: c.unitSystem,
        values: c.values,
        order: c.order,
        requirements: c.requirements,
        range: c.range,
        headerRange: c.headerRange,
        diagnostics: {
          errors: c.diagnostics.filter((d) => d.severity === 'error').length,
          warnings: c.diagnostics.filter((d) => d.severity === 'warning').length,
        },
      };
      if (c.title !== undefined) s.title = c.title;
      if (c.criterion !== undefined) s.criterion = c.criterion;
      if (c.haigh) s.haigh = c.haigh;
      if (c.sn) s.sn = c.sn;
      if (c.tables) s.tables = c.tables;
      if (c.crackCurve) s.crackCurve = c.crackCurve;
      if (c.histogram) s.histogram = c.histogram;
      return s;
    }),
  };
}
