/**
 * Diagnostics: the core's diagnostics as LSP diagnostics, published per document version.
 * Evaluation is debounced (by about as long as the previous evaluation of that note took,
 * so a burst of keystrokes is evaluated once while a cheap edit is answered at once),
 * runs in slices of a few milliseconds so the server keeps answering, and is dropped when
 * a newer version arrives. Closing a note clears its diagnostics.
 */
import type { Diagnostic as CoreDiagnostic, NoteResult } from '@fatigue-notes/core';
import {
  type Diagnostic,
  DiagnosticSeverity,
  type PublishDiagnosticsParams,
} from 'vscode-languageserver/node';
import type { NoteView } from './locate';

export const SOURCE = 'fatigue-notes';
/** A check slower than this gets an information diagnostic saying so. */
export const SLOW_CHECK_MS = 1000;

const SEVERITY: Record<CoreDiagnostic['severity'], DiagnosticSeverity> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  information: DiagnosticSeverity.Information,
  hint: DiagnosticSeverity.Hint,
};

export function toLspDiagnostic(d: CoreDiagnostic): Diagnostic {
  const out: Diagnostic = {
    range: d.range,
    severity: SEVERITY[d.severity],
    code: d.code,
    source: SOURCE,
    message: d.message,
  };
  if (d.check) out.data = { check: d.check };
  return out;
}

/** Code of the server's own hint for a check without `require:` (only with `defaultRequiredSafetyFactor`). */
export const NO_REQUIREMENT = 'no-requirement';
export const SLOW_CHECK = 'slow-check';

/** Every diagnostic of a note, in note order, plus the server's own hints. */
export function diagnosticsOf(view: Pick<NoteView, 'result' | 'settings' | 'timings'>): Diagnostic[] {
  const out: Diagnostic[] = [];
  const factor = view.settings.defaultRequiredSafetyFactor;
  const lintOn = (code: string) => view.settings.lints[code] !== false;
  view.result.checks.forEach((c, i) => {
    for (const d of c.diagnostics) out.push(toLspDiagnostic(d));
    if (factor !== null && lintOn(NO_REQUIREMENT) && c.requirements.length === 0 && c.values.n_f)
      out.push({
        range: c.headerRange,
        severity: DiagnosticSeverity.Hint,
        code: NO_REQUIREMENT,
        source: SOURCE,
        message: `no \`require:\` line: the note's default is \`require: n_f >= ${factor}\``,
        data: { check: c.id, factor },
      });
    const ms = view.timings[i] ?? 0;
    if (ms > SLOW_CHECK_MS && lintOn(SLOW_CHECK))
      out.push({
        range: c.headerRange,
        severity: DiagnosticSeverity.Information,
        code: SLOW_CHECK,
        source: SOURCE,
        message: `this check took ${(ms / 1000).toFixed(1)} s to evaluate: every edit of it waits that long (a long history file?)`,
      });
  });
  return out;
}

export function publishParams(uri: string, version: number | undefined, result: NoteResult, view: NoteView) {
  const params: PublishDiagnosticsParams = { uri, diagnostics: diagnosticsOf({ ...view, result }) };
  if (version !== undefined) params.version = version;
  return params;
}

/**
 * Delay before evaluating a changed note. A cheap evaluation (one block) runs on the next
 * turn of the event loop, which still merges the changes that arrived together; a costly
 * one waits about as long as it took last time (at most 300 ms), so that a burst of
 * keystrokes is evaluated once.
 */
export function debounceDelay(lastEvaluationMs: number): number {
  if (lastEvaluationMs < 30) return 0;
  return Math.min(300, Math.round(lastEvaluationMs));
}
