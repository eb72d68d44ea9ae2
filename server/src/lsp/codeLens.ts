/** A lens above each check: its status and its key result (safety factor, life, damage). */

import type { CheckResult } from '@fatigue-notes/core';
import { headlineValues } from '@fatigue-notes/core';
import type { CodeLens } from 'vscode-languageserver/node';
import type { NoteView } from './locate';

/** Command a client may bind to reveal the check in its summary panel; arguments [uri, check id]. */
export const SHOW_CHECK_COMMAND = 'fatigueNotes.showCheck';

const STATUS: Record<CheckResult['status'], string> = {
  pass: '✓ pass',
  fail: '✗ fail',
  error: '⚠ error',
  unchecked: '○ no requirement',
};

export function lensTitle(c: CheckResult): string {
  const parts = [STATUS[c.status]];
  for (const v of headlineValues(c)) parts.push(`${v.name} ${v.display}`);
  const failed = c.requirements.filter((r) => r.met === false).map((r) => r.text);
  if (failed.length > 0) parts.push(`not met: ${failed.join(', ')}`);
  return parts.join(' · ');
}

export function codeLensesFor(view: NoteView): CodeLens[] {
  return view.result.checks.map((c) => ({
    range: c.headerRange,
    command: { title: lensTitle(c), command: SHOW_CHECK_COMMAND, arguments: [view.uri, c.id] },
  }));
}
