/**
 * The S-N diagram of a welded detail, log-log: the design curve (class over gamma_Mf) with its
 * slope m1 to the knee, the second slope (or the fatigue limit) to the cut-off, and the ranges
 * the check applies (times gamma_Ff), each at its life on the curve. Draws the numbers the
 * core computed (`WeldSnData`); computes none of its own beyond placing them.
 */
import type { WeldSnData } from '../../context/types';
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
} from '../../diagrams/frame';
import { clipPolyline, esc, pointsAttr, px } from '../../diagrams/svg';
import { displayUnit, formatCycles, formatNumber } from '../../units/format';

const positive = (x: number | null | undefined): x is number =>
  typeof x === 'number' && Number.isFinite(x) && x > 0;

/** The curve's corner points from 1e4 cycles to the end of the axis (Pa, cycles). */
function corners(c: WeldSnData, nMin: number, nMax: number): Array<[number, number]> {
  const NC = 2e6;
  const at = (N: number) => c.deltaC * (NC / N) ** (1 / c.m1);
  const pts: Array<[number, number]> = [[nMin, at(nMin)]];
  if (c.ND < nMax) {
    pts.push([c.ND, c.deltaD]);
    if (c.m2 === null) pts.push([nMax, c.deltaD]);
    else if (positive(c.NL) && positive(c.deltaL) && c.NL < nMax) {
      pts.push([c.NL, c.deltaL], [nMax, c.deltaL]);
    } else pts.push([nMax, c.deltaD * (c.ND / nMax) ** (1 / c.m2)]);
  } else pts.push([nMax, at(nMax)]);
  return pts;
}

export function weldSnDiagram(curves: WeldSnData[], options: DiagramOptions): string | null {
  const c = curves[0];
  if (!c || !positive(c.deltaC) || !positive(c.deltaD)) return null;
  const unit = displayUnit('stress', options.unitSystem) ?? { unit: 'MPa', scale: 1e6 };
  const k = 1 / unit.scale;
  const digits = options.digits ?? 4;
  const pts = c.points.filter((p) => positive(p.range));
  const xMin = 1e4;
  const xMax = 1e9;
  const line = corners(c, xMin, xMax);
  const stresses = [...line.map((p) => p[1]), ...pts.map((p) => p.range)].map((s) => s * k).filter(positive);
  const yLoExp = Math.floor(Math.log10(Math.min(...stresses) * 0.9));
  let yHiExp = Math.ceil(Math.log10(Math.max(...stresses) * 1.1));
  if (yHiExp <= yLoExp) yHiExp = yLoExp + 1;
  const xAxis: Axis = { kind: 'log', min: xMin, max: xMax, label: 'cycles N', powers: true };
  const yAxis: Axis = {
    kind: 'log',
    min: 10 ** yLoExp,
    max: 10 ** yHiExp,
    label: `${c.stress === 'shear' ? 'shear' : 'stress'} range (${unit.unit})`,
  };
  const items: LegendItem[] = [
    { className: 'fn-series fn-basquin', label: `design curve: ${c.label}` },
    { className: 'fn-knee', label: `knee at N = ${formatCycles(c.ND)}` },
  ];
  if (positive(c.NL) && c.m2 !== null)
    items.push({ className: 'fn-knee fn-extrapolated', label: `cut-off at N = ${formatCycles(c.NL)}` });
  if (pts.length > 0)
    items.push({
      className: pts.length > 1 ? 'fn-point-level' : 'fn-point',
      label:
        pts.length > 1 ? 'ranges of the spectrum or history (x gamma_Ff)' : 'operating range (x gamma_Ff)',
      marker: pts.length > 1 ? 'square' : 'dot',
    });
  const f = frameFor(options, xAxis, yAxis, items);
  const heading = options.title ?? 'S-N diagram of the welded detail';
  const describe = (p: WeldSnData['points'][number]) =>
    `${formatNumber(p.range * k, digits)} ${unit.unit}, ${formatCycles(p.count)} applied, ${p.N === null ? 'no damage' : `life ${formatCycles(p.N)} cycles`}`;
  const description =
    `Stress range against cycles, log-log, in ${unit.unit}. Design curve ${formatNumber(c.deltaC * k, digits)} ${unit.unit} at 2e6 cycles, slope ${c.m1}` +
    `, knee ${formatNumber(c.deltaD * k, digits)} ${unit.unit} at ${formatCycles(c.ND)}` +
    (c.m2 === null ? ', no damage below the knee' : `, slope ${c.m2} beyond it`) +
    (positive(c.NL) && positive(c.deltaL) && c.m2 !== null
      ? `, cut-off ${formatNumber(c.deltaL * k, digits)} ${unit.unit} at ${formatCycles(c.NL)}`
      : '') +
    '.' +
    (pts.length > 0 ? ` ${pts.slice(0, 12).map(describe).join('; ')}.` : '');
  const parts = [openSvg(f, options, 'weld-sn', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy } = f;
  const scaled = line.map(([n, s]) => [n, s * k] as [number, number]);
  for (const run of clipPolyline(scaled, xMin, xMax, yAxis.min, yAxis.max))
    parts.push(
      `<polyline class="fn-series fn-basquin" data-role="design-curve" points="${pointsAttr(run, sx, sy)}"/>`,
    );
  parts.push(
    `<line class="fn-knee" data-role="knee" x1="${px(sx(c.ND))}" y1="${px(sy(yAxis.min))}" x2="${px(sx(c.ND))}" y2="${px(sy(c.deltaD * k))}"/>`,
    `<text class="fn-muted" x="${px(sx(c.ND) + 4)}" y="${px(sy(c.deltaD * k) - 6)}" font-size="11">${esc(`${formatNumber(c.deltaD * k, digits)} ${unit.unit}`)}</text>`,
  );
  if (positive(c.NL) && positive(c.deltaL) && c.m2 !== null && c.NL < xMax)
    parts.push(
      `<line class="fn-knee fn-extrapolated" data-role="cut-off" x1="${px(sx(c.NL))}" y1="${px(sy(yAxis.min))}" x2="${px(sx(c.NL))}" y2="${px(sy(c.deltaL * k))}"/>`,
    );
  for (const p of pts) {
    const X = sx(positive(p.N) ? Math.min(p.N, xMax) : xMax);
    const Y = sy(p.range * k);
    if (pts.length > 1)
      parts.push(
        `<rect class="fn-point-level" data-role="level" x="${px(X - 3.5)}" y="${px(Y - 3.5)}" width="7" height="7"><title>${esc(describe(p))}</title></rect>`,
      );
    else {
      parts.push(
        `<circle class="fn-point" data-role="operating" cx="${px(X)}" cy="${px(Y)}" r="4.5"><title>${esc(describe(p))}</title></circle>`,
      );
      parts.push(pointLabel(f, X, Y, `${formatNumber(p.range * k, digits)} ${unit.unit}`));
    }
  }
  parts.push(legend(f, items), closeSvg());
  return parts.join('');
}
