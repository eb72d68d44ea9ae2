/**
 * Crack size against cycles of a crack-growth check: the curve the core integrated
 * (pairs of crack size in metres and cycles), its end at the critical size, and the
 * inspection interval when the check has one. Draws the numbers only.
 */

import {
  AXIS_TICKS,
  type Axis,
  axes,
  closeSvg,
  type DiagramOptions,
  frameFor,
  type LegendItem,
  legend,
  openSvg,
  pointLabel,
} from '../../diagrams/frame';
import { esc, niceDomain, pointsAttr, px } from '../../diagrams/svg';
import { displayUnit, formatCycles, formatNumber } from '../../units/format';

export interface CrackGrowthMarks {
  /** Critical crack size in metres (the curve's end when omitted). */
  criticalSize?: number | null;
  /** Inspection interval in cycles. */
  inspectionInterval?: number | null;
}

/** `curve`: `[a, N]` pairs, crack size in metres against cycles, as in `CheckResult.crackCurve`. */
export function crackGrowthDiagram(
  curve: Array<[number, number]>,
  options: DiagramOptions,
  marks: CrackGrowthMarks = {},
): string {
  const unit = displayUnit('length', options.unitSystem) ?? { unit: 'mm', scale: 1e-3 };
  const k = 1 / unit.scale;
  const digits = options.digits ?? 4;
  const pts = curve
    .filter(([a, n]) => Number.isFinite(a) && Number.isFinite(n) && a >= 0 && n >= 0)
    .map(([a, n]) => [n, a * k] as [number, number]);
  const nMax = Math.max(1, ...pts.map((p) => p[0]));
  const aMax = Math.max(...pts.map((p) => p[1]), 0) || 1;
  const ac =
    typeof marks.criticalSize === 'number' && Number.isFinite(marks.criticalSize)
      ? marks.criticalSize * k
      : null;
  const insp =
    typeof marks.inspectionInterval === 'number' &&
    Number.isFinite(marks.inspectionInterval) &&
    marks.inspectionInterval > 0
      ? marks.inspectionInterval
      : null;
  const [, x1] = niceDomain(0, nMax * 1.04, AXIS_TICKS);
  const [, y1] = niceDomain(0, Math.max(aMax, ac ?? 0) * 1.08, AXIS_TICKS);
  const xAxis: Axis = { kind: 'linear', min: 0, max: x1, label: 'cycles N' };
  const yAxis: Axis = { kind: 'linear', min: 0, max: y1, label: `crack size a (${unit.unit})` };
  const items: LegendItem[] = [{ className: 'fn-series fn-crack', label: 'crack growth (Paris law)' }];
  if (ac !== null) items.push({ className: 'fn-langer fn-series', label: 'critical crack size' });
  if (insp !== null) items.push({ className: 'fn-knee', label: 'inspection interval' });
  const f = frameFor(options, xAxis, yAxis, items);
  const heading = options.title ?? 'Crack growth';
  const first = pts[0];
  const last = pts[pts.length - 1];
  const description =
    `Crack size in ${unit.unit} against cycles.` +
    (first && last
      ? ` From ${formatNumber(first[1], digits)} ${unit.unit} to ${formatNumber(last[1], digits)} ${unit.unit} in ${formatCycles(last[0])} cycles.`
      : ' No curve.') +
    (insp !== null ? ` Inspection interval ${formatCycles(insp)} cycles.` : '');
  const parts = [openSvg(f, options, 'crack-growth', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy, box } = f;
  if (ac !== null)
    parts.push(
      `<line class="fn-series fn-langer" data-role="critical-size" x1="${box.left}" y1="${px(sy(ac))}" x2="${box.left + box.width}" y2="${px(sy(ac))}"/>`,
    );
  if (insp !== null && insp <= x1)
    parts.push(
      `<line class="fn-knee" data-role="inspection" x1="${px(sx(insp))}" y1="${box.top}" x2="${px(sx(insp))}" y2="${box.top + box.height}"/>`,
    );
  if (pts.length >= 2)
    parts.push(
      `<polyline class="fn-series fn-crack" data-role="crack" points="${pointsAttr(pts, sx, sy)}"/>`,
    );
  if (last) {
    parts.push(
      `<circle class="fn-point" data-role="end" cx="${px(sx(last[0]))}" cy="${px(sy(last[1]))}" r="4.5"><title>${esc(
        `${formatNumber(last[1], digits)} ${unit.unit} after ${formatCycles(last[0])} cycles`,
      )}</title></circle>`,
    );
    parts.push(pointLabel(f, sx(last[0]), sy(last[1]), `N = ${formatCycles(last[0])}`));
  }
  parts.push(legend(f, items), closeSvg());
  return parts.join('');
}
