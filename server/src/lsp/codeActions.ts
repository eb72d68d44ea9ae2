/**
 * Quick fixes: the core's own fixes of its diagnostics (insert the missing statement,
 * correct a misspelt option, add the expected unit ...); converting a stated value to the
 * check's unit system; and, when the settings give a default required safety factor,
 * adding `require: n_f >= X` to a check that has no requirement.
 */
import {
  type CheckResult,
  displayUnit,
  formatNumber,
  type Range,
  toDisplayNumber,
} from '@fatigue-notes/core';
import { type CodeAction, CodeActionKind } from 'vscode-languageserver/node';
import { NO_REQUIREMENT, toLspDiagnostic } from './diagnostics';
import { checkAt, isContentLine, type NoteView, overlaps, statementOn } from './locate';

/** Digits kept when a value is converted (more than displayed: a conversion must not round the input). */
const CONVERT_DIGITS = 6;
const NUMBER_UNIT = /^(-?[0-9]+(?:\.[0-9]*)?(?:[eE][+-]?[0-9]+)?)\s*([A-Za-z][A-Za-z0-9*/^. ]*)$/;

export function codeActionsFor(view: NoteView, range: Range): CodeAction[] {
  const out: CodeAction[] = [];
  for (const c of view.result.checks) {
    if (!overlaps(c.range, range)) continue;
    for (const d of c.diagnostics) {
      if (!d.fixes || !overlaps(d.range, range)) continue;
      for (const f of d.fixes)
        out.push({
          title: f.title,
          kind: CodeActionKind.QuickFix,
          diagnostics: [toLspDiagnostic(d)],
          isPreferred: f.preferred === true,
          edit: { changes: { [view.uri]: f.edits } },
        });
    }
    const factor = view.settings.defaultRequiredSafetyFactor;
    if (factor !== null && c.requirements.length === 0 && c.values.n_f)
      out.push({
        title: `Add \`require: n_f >= ${factor}\``,
        kind: CodeActionKind.QuickFix,
        isPreferred: true,
        diagnostics: [
          {
            range: c.headerRange,
            message: `no \`require:\` line: the note's default is \`require: n_f >= ${factor}\``,
            code: NO_REQUIREMENT,
            source: 'fatigue-notes',
          },
        ],
        edit: {
          changes: {
            [view.uri]: [
              {
                range: {
                  start: { line: c.insertLine, character: 0 },
                  end: { line: c.insertLine, character: 0 },
                },
                newText: `require: n_f >= ${factor}\n`,
              },
            ],
          },
        },
      });
  }
  for (let line = range.start.line; line <= range.end.line && line < view.lineCount; line++) {
    const check = checkAt(view.result, line);
    if (check && isContentLine(check, line)) {
      const a = convertAction(view, check, line);
      if (a) out.push(a);
    }
  }
  return out;
}

/** "Convert to 38.1 mm" for `d = 1.5 in` in a check written (or displayed) in SI, and the reverse. */
function convertAction(view: NoteView, check: CheckResult, line: number): CodeAction | undefined {
  const stmt = statementOn(line, view.line(line));
  if (stmt?.kind !== 'assign') return undefined;
  const v = check.values[stmt.name.text];
  if (v?.origin !== 'stated' || v.si === null || v.range?.start.line !== line) return undefined;
  const m = NUMBER_UNIT.exec(stmt.expr.text);
  if (!m) return undefined;
  const target = displayUnit(v.dim, check.unitSystem);
  if (!target) return undefined;
  const written = m[2].replace(/\s+/g, '');
  if (written === target.unit) return undefined;
  const { value, unit } = toDisplayNumber(v.si, v.dim, check.unitSystem);
  const newText = `${formatNumber(value, CONVERT_DIGITS)} ${unit}`;
  return {
    title: `Convert to ${newText} (the check's ${check.unitSystem} units)`,
    kind: CodeActionKind.RefactorRewrite,
    edit: { changes: { [view.uri]: [{ range: stmt.expr.range, newText }] } },
  };
}
