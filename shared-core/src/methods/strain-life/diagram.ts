/**
 * The diagrams of a strain-life check, drawn from the numbers the method computed
 * (`StrainLifeData`): the notch-root stress-strain path with its hysteresis loops, point by
 * point, and the strain-life curve (elastic, plastic, total) with the transition life and the
 * governing loop's operating point. They compute no engineering quantity.
 */

import type { StrainLifeData } from '../../context/types';
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
  trianglePath,
} from '../../diagrams/frame';
import { clipPolyline, esc, niceDomain, pointsAttr, px } from '../../diagrams/svg';
import { displayUnit, formatCycles, formatNumber } from '../../units/format';

const finite = (x: number) => Number.isFinite(x);
/** Reversal points numbered on the drawing up to this many. */
const NUMBERED_POINTS = 16;

/** Local stress against local strain (in %) along the path, with the reversal points and the governing loop. */
export function hysteresisDiagram(data: StrainLifeData, options: DiagramOptions): string {
  const unit = displayUnit('stress', options.unitSystem) ?? { unit: 'MPa', scale: 1e6 };
  const k = 1 / unit.scale;
  const digits = options.digits ?? 4;
  const path = data.path
    .filter(([s, e]) => finite(s) && finite(e))
    .map(([s, e]) => [e * 100, s * k] as [number, number]);
  const pts = data.points.filter((p) => finite(p.sigma) && finite(p.eps));
  const tips = data.governingLoop.map(([s, e]) => [e * 100, s * k] as [number, number]);
  const xs = [0, ...path.map((p) => p[0]), ...tips.map((p) => p[0])].filter(finite);
  const ys = [0, ...path.map((p) => p[1]), ...tips.map((p) => p[1])].filter(finite);
  const [x0, x1] = niceDomain(Math.min(...xs), Math.max(...xs), AXIS_TICKS);
  const [y0, y1] = niceDomain(Math.min(...ys), Math.max(...ys), AXIS_TICKS);
  const xAxis: Axis = { kind: 'linear', min: x0, max: x1 === x0 ? x0 + 1 : x1, label: 'local strain ε (%)' };
  const yAxis: Axis = {
    kind: 'linear',
    min: y0,
    max: y1 === y0 ? y0 + 1 : y1,
    label: `local stress σ (${unit.unit})`,
  };
  const gov = data.loops.find((l) => l.governing);
  const rule = data.rule === 'glinka' ? 'Glinka' : 'Neuber';
  const items: LegendItem[] = [
    { className: 'fn-series fn-crack', label: `local path (${rule}, cyclic curve then Masing branches)` },
    {
      className: 'fn-point-level',
      label: pts.length <= NUMBERED_POINTS ? 'reversal points, numbered' : 'reversal points',
      marker: 'square',
    },
  ];
  if (gov) items.push({ className: 'fn-series fn-goodman fn-chosen', label: 'governing loop' });
  const f = frameFor(options, xAxis, yAxis, items);
  const heading = options.title ?? 'Notch-root hysteresis loops';
  const description =
    `Local stress in ${unit.unit} against local strain in per cent at the notch root, ${pts.length} points` +
    (data.truncated ? ' (the first ones kept)' : '') +
    `, ${data.loops.length} closed loop${data.loops.length === 1 ? '' : 's'}.` +
    (gov
      ? ` Governing loop from ${formatNumber(gov.sigma_min * k, digits)} to ${formatNumber(gov.sigma_max * k, digits)} ${unit.unit}, strain ${formatNumber(gov.eps_min * 100, digits)} to ${formatNumber(gov.eps_max * 100, digits)} %.`
      : '');
  const parts = [openSvg(f, options, 'strain-life-loops', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy, box } = f;
  if (x0 < 0 && x1 > 0)
    parts.push(
      `<line class="fn-knee" x1="${px(sx(0))}" y1="${box.top}" x2="${px(sx(0))}" y2="${box.top + box.height}"/>`,
    );
  if (y0 < 0 && y1 > 0)
    parts.push(
      `<line class="fn-knee" x1="${box.left}" y1="${px(sy(0))}" x2="${box.left + box.width}" y2="${px(sy(0))}"/>`,
    );
  if (path.length >= 2)
    parts.push(
      `<polyline class="fn-series fn-crack" data-role="path" points="${pointsAttr(path, sx, sy)}"/>`,
    );
  const loop = data.governingLoop
    .filter(([s, e]) => finite(s) && finite(e))
    .map(([s, e]) => [e * 100, s * k] as [number, number]);
  if (loop.length >= 2)
    parts.push(
      `<polyline class="fn-series fn-goodman fn-chosen" data-role="governing-loop" points="${pointsAttr(loop, sx, sy)}"/>`,
    );
  pts.forEach((p, i) => {
    const X = sx(p.eps * 100);
    const Y = sy(p.sigma * k);
    parts.push(
      `<rect class="fn-point-level" data-role="reversal" x="${px(X - 3.5)}" y="${px(Y - 3.5)}" width="7" height="7"><title>${esc(
        `point ${i + 1}: σ = ${formatNumber(p.sigma * k, digits)} ${unit.unit}, ε = ${formatNumber(p.eps * 100, digits)} %`,
      )}</title></rect>`,
    );
    if (pts.length <= NUMBERED_POINTS) parts.push(pointLabel(f, X, Y, String(i + 1), 'fn-muted'));
  });
  if (gov)
    for (const [e, s] of [
      [gov.eps_max, gov.sigma_max],
      [gov.eps_min, gov.sigma_min],
    ])
      parts.push(
        `<circle class="fn-point" data-role="governing" cx="${px(sx(e * 100))}" cy="${px(sy(s * k))}" r="4.5"/>`,
      );
  parts.push(legend(f, items), closeSvg());
  return parts.join('');
}

/** Strain amplitude against reversals (log-log): elastic, plastic and total lines, 2N_t, the operating point. */
export function strainLifeDiagram(data: StrainLifeData, options: DiagramOptions): string {
  const digits = options.digits ?? 4;
  const curve = data.curve.filter((r) => r.every((x) => finite(x) && x > 0));
  const op = data.operating;
  const opN = op && op.reversals !== null && op.reversals > 0 ? op.reversals : null;
  const nMax = Math.max(1e8, opN ? opN * 10 : 0);
  const hiExp = Math.min(14, Math.ceil(Math.log10(nMax)));
  const amps = [...curve.map((r) => r[1]), ...(op && op.eps_a > 0 ? [op.eps_a] : [])];
  const total = curve.map((r) => r[1]);
  const lo = Math.min(...total.filter((x) => x > 0), ...(op && op.eps_a > 0 ? [op.eps_a] : [])) * 0.7;
  const hi = Math.max(...amps) * 1.3;
  const yLo = Math.floor(Math.log10(lo > 0 ? lo : 1e-4));
  let yHi = Math.ceil(Math.log10(hi > 0 ? hi : 1));
  if (yHi <= yLo) yHi = yLo + 1;
  const xAxis: Axis = {
    kind: 'log',
    min: 1,
    max: 10 ** hiExp,
    label: 'reversals to failure 2N',
    powers: true,
  };
  const yAxis: Axis = { kind: 'log', min: 10 ** yLo, max: 10 ** yHi, label: 'strain amplitude ε_a' };
  const items: LegendItem[] = [
    { className: 'fn-series fn-basquin fn-chosen', label: 'total (Coffin-Manson-Basquin, no mean stress)' },
    { className: 'fn-series fn-gerber fn-extrapolated', label: "elastic (σf'/E)(2N)^b" },
    { className: 'fn-series fn-soderberg fn-extrapolated', label: "plastic εf'(2N)^c" },
    { className: 'fn-knee', label: `transition life 2N_t = ${formatCycles(data.transition)}` },
  ];
  if (op)
    items.push({ className: 'fn-point', label: 'governing loop (its own mean-stress model)', marker: 'dot' });
  const f = frameFor(options, xAxis, yAxis, items);
  const heading = options.title ?? 'Strain-life curve';
  const description =
    `Strain amplitude against reversals to failure, log-log. Transition life 2N_t = ${formatCycles(data.transition)} reversals.` +
    (op
      ? ` Governing loop: strain amplitude ${formatNumber(op.eps_a, digits)}, ${opN ? `${formatCycles(opN)} reversals` : 'beyond the curve'}.`
      : '');
  const parts = [openSvg(f, options, 'strain-life-curve', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy, box } = f;
  const line = (col: number, cls: string, role: string) => {
    for (const run of clipPolyline(
      curve.map((r) => [r[0], r[col]] as [number, number]),
      xAxis.min,
      xAxis.max,
      yAxis.min,
      yAxis.max,
    ))
      parts.push(`<polyline class="${cls}" data-role="${role}" points="${pointsAttr(run, sx, sy)}"/>`);
  };
  line(2, 'fn-series fn-gerber fn-extrapolated', 'elastic');
  line(3, 'fn-series fn-soderberg fn-extrapolated', 'plastic');
  line(1, 'fn-series fn-basquin fn-chosen', 'total');
  if (finite(data.transition) && data.transition >= xAxis.min && data.transition <= xAxis.max)
    parts.push(
      `<line class="fn-knee" data-role="transition" x1="${px(sx(data.transition))}" y1="${box.top}" x2="${px(sx(data.transition))}" y2="${box.top + box.height}"/>`,
    );
  if (op && op.eps_a > 0) {
    const Y = sy(Math.min(Math.max(op.eps_a, yAxis.min), yAxis.max));
    if (opN !== null) {
      const X = sx(opN);
      parts.push(
        `<circle class="fn-point" data-role="operating" cx="${px(X)}" cy="${px(Y)}" r="4.5"><title>${esc(
          `ε_a = ${formatNumber(op.eps_a, digits)}, 2N_f = ${formatCycles(opN)}`,
        )}</title></circle>`,
      );
      parts.push(pointLabel(f, X, Y, `2N_f = ${formatCycles(opN)}`));
    } else {
      const X = box.left + box.width - 8;
      parts.push(`<path class="fn-point" data-role="operating" d="${trianglePath(X, Y, 6)}"/>`);
      parts.push(pointLabel(f, X, Y, 'beyond the curve'));
    }
  }
  parts.push(legend(f, items), closeSvg());
  return parts.join('');
}
