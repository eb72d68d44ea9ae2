/**
 * Which unit system a check is written in (for display), and the quick fixes that add a
 * missing unit in that system.
 */

import type { QuickFix } from '../context/types';
import type { DimKey } from '../units/dimensions';
import { displayUnit, type UnitSystem } from '../units/format';
import { compileExpression } from './expressions';
import type { Span, Statement } from './statements';

const US_UNITS = /^(ksi|kpsi|psi|in|inch|ft|lbf|kip|kips|degF|lbf\*in|lbf\*ft|kip\*in|ksi\*in\^0\.5)$/;

/** Majority vote of the units written after numbers; SI when none or a tie. */
export function detectUnitSystem(statements: Statement[]): UnitSystem {
  let us = 0;
  let si = 0;
  for (const s of statements) {
    if (s.kind !== 'assign') continue;
    let unit: string | undefined;
    try {
      unit = compileExpression(s.expr.text).statedUnit;
    } catch {
      unit = undefined;
    }
    if (!unit) continue;
    const first = unit.split(/[*/ ]/)[0];
    if (US_UNITS.test(unit) || US_UNITS.test(first)) us++;
    else si++;
  }
  return us > si ? 'US' : 'SI';
}

export function unitFixes(dim: DimKey, system: UnitSystem, expr: Span): QuickFix[] {
  const out: QuickFix[] = [];
  for (const sys of system === 'US' ? (['US', 'SI'] as const) : (['SI', 'US'] as const)) {
    const u = displayUnit(dim, sys);
    if (!u) continue;
    out.push({
      title: `Add the unit ${u.unit}`,
      edits: [{ range: { start: expr.range.end, end: expr.range.end }, newText: ` ${u.unit}` }],
      preferred: sys === system,
    });
  }
  return out;
}
