/**
 * S-N diagram (log-log) of a check: the Basquin line between (N1, S1) and (N2, S2), the
 * knee and the endurance plateau when the material has one (otherwise the line continued
 * past N2, dashed), the operating point (or, for a spectrum, its levels) and the required
 * life. Draws `SnData` only; it computes no engineering quantity.
 */
import type { SnData } from '../context/types';
import { displayUnit, formatCycles, formatNumber } from '../units/format';
import {
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
} from './frame';
import { clipPolyline, esc, pointsAttr, px } from './svg';

function positive(x: number | null | undefined): x is number {
  return typeof x === 'number' && Number.isFinite(x) && x > 0;
}

export function snDiagram(data: SnData, options: DiagramOptions): string {
  const unit = displayUnit('stress', options.unitSystem) ?? { unit: 'MPa', scale: 1e6 };
  const k = 1 / unit.scale;
  const digits = options.digits ?? 4;
  const N1 = positive(data.N1) ? data.N1 : 1e3;
  const N2 = positive(data.N2) && data.N2 > N1 ? data.N2 : N1 * 1000;
  const S1 = positive(data.S1) ? data.S1 * k : null;
  const S2 = positive(data.S2) ? data.S2 * k : null;
  const b = Number.isFinite(data.b) ? data.b : 0;
  const points = data.points.filter((p) => positive(p.sigma_ar));
  const finiteN = points.map((p) => p.N).filter(positive);

  // Cycles: from the decade of N1 to well past the knee and every point.
  const loExp = Math.floor(Math.log10(Math.min(N1, ...finiteN)));
  const hiExp = Math.min(loExp + 14, Math.ceil(Math.log10(Math.max(N2 * 10, ...finiteN.map((n) => n * 3)))));
  const xMin = 10 ** loExp;
  const xMax = 10 ** hiExp;
  // The line beyond N2: flat at the knee, or Basquin continued (straight in log-log).
  const Send = S2 !== null ? (data.hasKnee ? S2 : S2 * (xMax / N2) ** b) : null;
  const stresses = [S1, S2, Send, ...points.map((p) => p.sigma_ar * k)].filter(positive);
  if (stresses.length === 0) stresses.push(1);
  const yLoExp = Math.floor(Math.log10(Math.min(...stresses) * 0.92));
  let yHiExp = Math.ceil(Math.log10(Math.max(...stresses) * 1.08));
  if (yHiExp <= yLoExp) yHiExp = yLoExp + 1;
  const yMin = 10 ** yLoExp;
  const yMax = 10 ** yHiExp;

  const xAxis: Axis = { kind: 'log', min: xMin, max: xMax, label: 'cycles N', powers: true };
  const yAxis: Axis = {
    kind: 'log',
    min: yMin,
    max: yMax,
    label: `fully reversed stress amplitude σar (${unit.unit})`,
  };
  const levels = points.filter((p) => p.count !== undefined);
  const operating = points.filter((p) => p.count === undefined && p.label !== 'required life');
  const required = points.filter((p) => p.count === undefined && p.label === 'required life');

  const legendItems: LegendItem[] = [];
  if (S1 !== null && S2 !== null) {
    legendItems.push({ className: 'fn-series fn-basquin', label: 'Basquin line' });
    legendItems.push(
      data.hasKnee
        ? { className: 'fn-knee', label: `knee at N = ${formatCycles(N2)}` }
        : { className: 'fn-series fn-basquin fn-extrapolated', label: 'no endurance limit: line continued' },
    );
  }
  if (operating.length > 0)
    legendItems.push({ className: 'fn-point', label: 'operating point', marker: 'dot' });
  if (levels.length > 0)
    legendItems.push({ className: 'fn-point-level', label: 'spectrum levels', marker: 'square' });
  if (required.length > 0)
    legendItems.push({ className: 'fn-point-required', label: 'required life', marker: 'ring' });

  const f = frameFor(options, xAxis, yAxis, legendItems);
  const heading = options.title ?? 'S-N diagram';
  const describePoint = (p: SnData['points'][number]) =>
    `${p.label}: ${formatNumber(p.sigma_ar * k, digits)} ${unit.unit} at ${p.N === null ? 'infinite life' : `${formatCycles(p.N)} cycles`}`;
  const description =
    `Stress amplitude against cycles, log-log, in ${unit.unit}.` +
    (S1 !== null && S2 !== null
      ? ` Basquin line from ${formatNumber(S1, digits)} ${unit.unit} at ${formatCycles(N1)} cycles to ${formatNumber(S2, digits)} ${unit.unit} at ${formatCycles(N2)} cycles${data.hasKnee ? ', flat beyond the knee' : ', continued (no endurance limit)'}.`
      : '') +
    (points.length > 0 ? ` ${points.slice(0, 12).map(describePoint).join('; ')}.` : '');

  const parts: string[] = [openSvg(f, options, 'sn', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy } = f;
  if (S1 !== null && S2 !== null && Send !== null) {
    const line: Array<[number, number]> = [
      [N1, S1],
      [N2, S2],
    ];
    for (const run of clipPolyline(line, xMin, xMax, yMin, yMax))
      parts.push(
        `<polyline class="fn-series fn-basquin" data-role="basquin" points="${pointsAttr(run, sx, sy)}"/>`,
      );
    const beyond: Array<[number, number]> = [
      [N2, S2],
      [xMax, Send],
    ];
    const cls = data.hasKnee ? 'fn-series fn-basquin' : 'fn-series fn-basquin fn-extrapolated';
    for (const run of clipPolyline(beyond, xMin, xMax, yMin, yMax))
      parts.push(
        `<polyline class="${cls}" data-role="${data.hasKnee ? 'endurance' : 'continued'}" points="${pointsAttr(run, sx, sy)}"/>`,
      );
    if (data.hasKnee) {
      parts.push(
        `<line class="fn-knee" data-role="knee" x1="${px(sx(N2))}" y1="${px(sy(yMin))}" x2="${px(sx(N2))}" y2="${px(sy(S2))}"/>`,
      );
      parts.push(
        `<text class="fn-muted" x="${px(sx(N2) + 4)}" y="${px(sy(S2) - 6)}" font-size="11">${esc(`${formatNumber(S2, digits)} ${unit.unit}`)}</text>`,
      );
    }
  }

  for (const p of levels) {
    const X = sx(positive(p.N) ? p.N : xMax);
    const Y = sy(p.sigma_ar * k);
    parts.push(
      `<rect class="fn-point-level" data-role="level" x="${px(X - 3.5)}" y="${px(Y - 3.5)}" width="7" height="7"><title>${esc(
        `${describePoint(p)}${p.count !== undefined ? `, ${formatCycles(p.count)} applied` : ''}`,
      )}</title></rect>`,
    );
  }
  for (const p of required) {
    if (!positive(p.N)) continue;
    const X = sx(p.N);
    const Y = sy(p.sigma_ar * k);
    parts.push(
      `<circle class="fn-point-required" data-role="required-life" cx="${px(X)}" cy="${px(Y)}" r="5"><title>${esc(describePoint(p))}</title></circle>`,
    );
    parts.push(pointLabel(f, X, Y, `required ${formatCycles(p.N)}`, 'fn-muted'));
  }
  for (const p of operating) {
    const Y = sy(p.sigma_ar * k);
    if (positive(p.N)) {
      const X = sx(p.N);
      parts.push(
        `<circle class="fn-point" data-role="operating-point" cx="${px(X)}" cy="${px(Y)}" r="5"><title>${esc(describePoint(p))}</title></circle>`,
      );
      parts.push(pointLabel(f, X, Y, `N_f = ${formatCycles(p.N)}`));
    } else {
      // Infinite life: a marker at the right edge pointing on, with its stress.
      const X = sx(xMax) - 8;
      parts.push(
        `<path class="fn-point" data-role="operating-point" data-infinite="true" d="${trianglePath(X, Y, 7)}"><title>${esc(describePoint(p))}</title></path>`,
      );
      parts.push(pointLabel(f, X, Y, data.hasKnee ? 'below the knee: infinite life' : 'infinite life'));
    }
  }
  parts.push(legend(f, legendItems));
  parts.push(closeSvg());
  return parts.join('');
}
