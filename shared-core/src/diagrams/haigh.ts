/**
 * Haigh diagram (alternating against mean stress) of a stress-life check: the criteria
 * lines the core computed (Goodman, Gerber, Soderberg, ASME elliptic), the first-cycle
 * yield (Langer) line, the load line through the operating point and the operating point
 * itself. Draws `HaighData` only; it computes no engineering quantity.
 */
import type { HaighData } from '../context/types';
import { displayUnit, formatNumber } from '../units/format';
import {
  AXIS_TICKS,
  type Axis,
  axes,
  closeSvg,
  type DiagramOptions,
  diamondPath,
  frameFor,
  type LegendItem,
  legend,
  openSvg,
  pointLabel,
} from './frame';
import { clipPolyline, clipSegment, esc, niceDomain, pointsAttr, px } from './svg';

const KNOWN = new Set(['goodman', 'gerber', 'soderberg', 'asme-elliptic', 'langer']);

const LOAD_LINE_LABEL: Record<HaighData['loadLine'], string> = {
  proportional: 'load line (proportional)',
  'constant-mean': 'load line (constant mean)',
  'constant-amplitude': 'load line (constant amplitude)',
};

function finite(x: number | null | undefined): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

export function haighDiagram(data: HaighData, options: DiagramOptions): string {
  const unit = displayUnit('stress', options.unitSystem) ?? { unit: 'MPa', scale: 1e6 };
  const k = 1 / unit.scale;
  const digits = options.digits ?? 4;
  const sm = finite(data.sigma_m) ? data.sigma_m * k : 0;
  const sa = finite(data.sigma_a) ? data.sigma_a * k : 0;
  const curves = data.curves
    .map((c) => ({
      ...c,
      points: c.points
        .filter(([x, y]) => finite(x) && finite(y))
        .map(([x, y]) => [x * k, y * k] as [number, number]),
    }))
    .filter((c) => c.points.length >= 2);

  // Domain: the curves and the operating point; the compressive side only when the mean is negative.
  let xMax = Math.max(0, sm);
  let yMax = Math.max(0, sa);
  for (const c of curves)
    for (const [x, y] of c.points) {
      if (c.key !== 'langer' || x >= 0) xMax = Math.max(xMax, x);
      yMax = Math.max(yMax, y);
    }
  if (xMax <= 0) xMax = Math.max(1, finite(data.Sut) ? data.Sut * k : 1);
  if (yMax <= 0) yMax = Math.max(1, finite(data.S) ? data.S * k : 1);
  let xMin = 0;
  if (sm < 0) {
    const sy = finite(data.Sy) && data.Sy > 0 ? data.Sy * k : 0;
    xMin = Math.min(sm * 1.15, -sy, -0.25 * xMax);
  }
  const [x0, x1] = niceDomain(xMin, xMax * 1.04, AXIS_TICKS);
  const [, y1] = niceDomain(0, yMax * 1.06, AXIS_TICKS);
  const sym = data.shear ? 'τ' : 'σ';
  const xAxis: Axis = { kind: 'linear', min: x0, max: x1, label: `mean stress ${sym}m (${unit.unit})` };
  const yAxis: Axis = { kind: 'linear', min: 0, max: y1, label: `alternating stress ${sym}a (${unit.unit})` };

  const legendItems: LegendItem[] = [];
  const ordered = [...curves].sort(
    (a, b) => Number(a.key === data.criterion) - Number(b.key === data.criterion),
  );
  for (const c of curves) {
    const chosen = c.key === data.criterion;
    legendItems.push({
      className: `fn-series ${seriesClass(c.key)}`,
      label: chosen ? `${c.label} (chosen)` : c.label,
    });
  }
  const showLoadLine = sa !== 0 || sm !== 0 || data.loadLine !== 'proportional';
  if (showLoadLine)
    legendItems.push({ className: 'fn-loadline', label: LOAD_LINE_LABEL[data.loadLine] ?? 'load line' });
  legendItems.push({ className: 'fn-point', label: 'operating point', marker: 'dot' });

  const f = frameFor(options, xAxis, yAxis, legendItems);
  const heading = options.title ?? 'Haigh diagram';
  const nf = finite(data.n_f) ? formatNumber(data.n_f, digits) : null;
  const criterionLabel = curves.find((c) => c.key === data.criterion)?.label ?? data.criterion;
  const description =
    `Alternating against mean stress in ${unit.unit}. Operating point: mean ${formatNumber(sm, digits)} ${unit.unit}, ` +
    `alternating ${formatNumber(sa, digits)} ${unit.unit}. Criterion: ${criterionLabel}` +
    (nf ? `, safety factor n_f = ${nf}.` : '.') +
    ` Lines drawn: ${curves.map((c) => c.label).join(', ')}.`;

  const parts: string[] = [openSvg(f, options, 'haigh', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy } = f;

  parts.push('<g class="fn-curves">');
  for (const c of ordered) {
    const chosen = c.key === data.criterion;
    for (const run of clipPolyline(c.points, x0, x1, 0, y1)) {
      parts.push(
        `<polyline class="fn-series ${seriesClass(c.key)}${chosen ? ' fn-chosen' : ''}" data-key="${esc(c.key)}" points="${pointsAttr(run, sx, sy)}"/>`,
      );
    }
  }
  parts.push('</g>');

  // Load line, and where it meets the chosen criterion's line.
  if (showLoadLine) {
    const seg = loadLineSegment(data.loadLine, sm, sa, x0, x1, y1);
    if (seg) {
      parts.push(
        `<line class="fn-loadline" data-load-line="${esc(data.loadLine)}" x1="${px(sx(seg[0]))}" y1="${px(sy(seg[1]))}" x2="${px(sx(seg[2]))}" y2="${px(sy(seg[3]))}"/>`,
      );
      const chosen = curves.find((c) => c.key === data.criterion);
      const hit = chosen ? firstCrossing(seg, chosen.points, data.loadLine, sm, sa) : null;
      if (hit) {
        parts.push(
          `<path class="fn-limit" data-role="limit" data-mean="${px(hit[0])}" data-alt="${px(hit[1])}" d="${diamondPath(sx(hit[0]), sy(hit[1]), 5)}"><title>${esc(
            `load line meets ${criterionLabel} at mean ${formatNumber(hit[0], digits)} ${unit.unit}, alternating ${formatNumber(hit[1], digits)} ${unit.unit}`,
          )}</title></path>`,
        );
      }
    }
  }

  // Operating point.
  const X = sx(sm);
  const Y = sy(sa);
  parts.push(
    `<circle class="fn-point" data-role="operating-point" cx="${px(X)}" cy="${px(Y)}" r="5"><title>${esc(
      `operating point: mean ${formatNumber(sm, digits)} ${unit.unit}, alternating ${formatNumber(sa, digits)} ${unit.unit}`,
    )}</title></circle>`,
  );
  parts.push(pointLabel(f, X, Y, nf ? `n_f = ${nf}` : 'operating point'));
  parts.push(legend(f, legendItems));
  parts.push(closeSvg());
  return parts.join('');
}

function seriesClass(key: string): string {
  return KNOWN.has(key) ? `fn-${key}` : 'fn-curve-other';
}

/** The load line as a segment inside the plot, in display units. */
function loadLineSegment(
  kind: HaighData['loadLine'],
  sm: number,
  sa: number,
  x0: number,
  x1: number,
  y1: number,
): [number, number, number, number] | null {
  switch (kind) {
    case 'constant-mean':
      return clipSegment(sm, 0, sm, y1, x0, x1, 0, y1);
    case 'constant-amplitude':
      return clipSegment(x0, sa, x1, sa, x0, x1, 0, y1);
    default: {
      // From the origin through the operating point, as far as the plot goes.
      const far = (Math.abs(x1 - x0) + y1) * 4;
      const len = Math.hypot(sm, sa);
      if (len === 0) return null;
      return clipSegment(0, 0, (sm / len) * far, (sa / len) * far, x0, x1, 0, y1);
    }
  }
}

/**
 * The point where the load line, walked from its start in the direction of increasing
 * load, first crosses the given polyline (pure geometry on the drawn lines).
 */
function firstCrossing(
  seg: [number, number, number, number],
  curve: Array<[number, number]>,
  kind: HaighData['loadLine'],
  sm: number,
  sa: number,
): [number, number] | null {
  // Ray origin and direction in data units.
  let ox = seg[0];
  let oy = seg[1];
  let dx = seg[2] - seg[0];
  let dy = seg[3] - seg[1];
  if (kind === 'constant-amplitude') {
    // Increasing mean from the operating point (towards the tensile side when the mean is positive).
    ox = sm;
    oy = sa;
    dx = sm >= 0 ? 1 : -1;
    dy = 0;
  } else if (kind === 'constant-mean') {
    ox = sm;
    oy = 0;
    dx = 0;
    dy = 1;
  }
  let best: [number, number] | null = null;
  let bestT = Number.POSITIVE_INFINITY;
  for (let i = 0; i + 1 < curve.length; i++) {
    const [ax, ay] = curve[i];
    const [bx, by] = curve[i + 1];
    const ex = bx - ax;
    const ey = by - ay;
    const den = dx * ey - dy * ex;
    if (den === 0) continue;
    const t = ((ax - ox) * ey - (ay - oy) * ex) / den;
    const u = ((ax - ox) * dy - (ay - oy) * dx) / den;
    if (t > 1e-12 && u >= -1e-9 && u <= 1 + 1e-9 && t < bestT) {
      bestT = t;
      best = [ox + t * dx, oy + t * dy];
    }
  }
  return best && Number.isFinite(best[0]) && Number.isFinite(best[1]) ? best : null;
}
