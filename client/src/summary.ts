/**
 * The `fatigue/summary` request of the fatigue-notes language server: every check of one
 * note, as the core's `CheckResult` records (without their diagnostics, which the editor
 * already shows), with the names each view shows and the diagrams drawn. The client
 * presents these records; it never recomputes a number, and holds no copy of the core
 * (types only are imported from it).
 */
import type { CheckDiagram, CheckResult } from '@fatigue-notes/core';

export const SUMMARY_REQUEST = 'fatigue/summary';

export interface SummaryParams {
  uri: string;
}

/** A check's record; the server adds what each view shows, the diagrams and the counts of its diagnostics. */
export type SummaryCheck = Omit<CheckResult, 'diagnostics' | 'insertLine'> & {
  diagnostics?: { errors: number; warnings: number; firstError?: string };
  /** The names of `values` each view shows (the core's one list, sent by the server). */
  shown?: { headline: string[]; table: string[]; life: string | null };
  /** The check's diagrams as SVG text, drawn by the server. */
  diagrams?: CheckDiagram[];
};

/** Errors and warnings of a check, from the server's counts. */
export function problemCounts(c: SummaryCheck): { errors: number; warnings: number } {
  const d = c.diagnostics;
  if (!d) return { errors: 0, warnings: 0 };
  return { errors: Number(d.errors) || 0, warnings: Number(d.warnings) || 0 };
}

export interface SummaryResult {
  /** The note and the version of it these results are of. */
  uri?: string;
  version?: number;
  checks: SummaryCheck[];
}

/** Values that are safety factors, in the order the status bar and the panel speak of them. */
export const SAFETY_FACTORS = ['n_f', 'n_y'] as const;

export interface WorstFactor {
  value: number;
  display: string;
  name: string;
  check: string | null;
}

/** The smallest safety factor the checks report (a selection among their values, not a computation). */
export function worstSafetyFactor(checks: readonly SummaryCheck[]): WorstFactor | null {
  let worst: WorstFactor | null = null;
  for (const c of checks) {
    for (const name of SAFETY_FACTORS) {
      const v = c.values?.[name];
      if (!v || v.si === null || !Number.isFinite(v.si)) continue;
      if (!worst || v.si < worst.value) worst = { value: v.si, display: v.display, name, check: c.id };
    }
  }
  return worst;
}

export function countByStatus(checks: readonly SummaryCheck[]): Record<CheckResult['status'], number> {
  const out = { pass: 0, fail: 0, error: 0, unchecked: 0 };
  for (const c of checks) out[c.status] = (out[c.status] ?? 0) + 1;
  return out;
}
