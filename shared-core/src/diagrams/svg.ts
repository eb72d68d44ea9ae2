/**
 * Small drawing helpers shared by the diagrams: XML escaping, number formatting for
 * attributes, "nice" linear ticks, decade ticks for log axes, a plot frame that maps data
 * to pixels, segment clipping and the stylesheet every diagram uses.
 *
 * Colours are CSS custom properties with fallbacks (`var(--fn-goodman, #2f6db5)`), so the
 * editor's webview can map them onto the theme and the HTML report can keep the fallbacks.
 * Nothing here computes an engineering quantity: it only draws numbers the core produced.
 */

/** Escapes text for XML content and attribute values. */
export function esc(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** A pixel coordinate for an attribute: two decimals, never NaN (non-finite becomes 0). */
export function px(x: number): string {
  if (!Number.isFinite(x)) return '0';
  const r = Math.round(x * 100) / 100;
  return String(Object.is(r, -0) ? 0 : r);
}

/** Tick label: short, no exponent noise for the ranges a diagram shows. */
export function tickLabel(x: number): string {
  if (!Number.isFinite(x)) return '';
  if (x === 0) return '0';
  const ax = Math.abs(x);
  if (ax >= 1e5 || ax < 1e-3) {
    const e = Math.floor(Math.log10(ax));
    const m = x / 10 ** e;
    const ms = Math.abs(m - Math.round(m)) < 1e-9 ? String(Math.round(m)) : String(Number(m.toPrecision(3)));
    return ms === '1' ? `1e${e}` : `${ms}e${e}`;
  }
  return String(Number(x.toPrecision(6)));
}

/** Ticks at 1, 2 or 5 times a power of ten covering [min, max]; about `target` of them. */
export function niceTicks(min: number, max: number, target = 6): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [0];
  if (max < min) [min, max] = [max, min];
  if (max === min) {
    const pad = min === 0 ? 1 : Math.abs(min) * 0.1;
    min -= pad;
    max += pad;
  }
  const raw = (max - min) / Math.max(1, target);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const out: number[] = [];
  for (let i = first; i <= last && out.length < 50; i++) out.push(Number((i * step).toPrecision(12)));
  return out;
}

/** [min, max] widened to multiples of the nice step, so the axis ends on a tick. */
export function niceDomain(min: number, max: number, target = 6): [number, number] {
  const t = niceTicks(min, max, target);
  if (t.length < 2) return [min, max === min ? min + 1 : max];
  const step = t[1] - t[0];
  const lo = t[0] > min + 1e-12 * Math.abs(step) ? t[0] - step : t[0];
  const hi = t[t.length - 1] < max - 1e-12 * Math.abs(step) ? t[t.length - 1] + step : t[t.length - 1];
  return [Number(lo.toPrecision(12)), Number(hi.toPrecision(12))];
}

export interface LogTick {
  value: number;
  major: boolean;
  label: boolean;
}

/**
 * Ticks of a log axis from 10^lo to 10^hi (integer exponents): majors at the decades,
 * minors at 2..9 times a decade; minors 2 and 5 are labelled when the axis spans two
 * decades or fewer.
 */
export function logTicks(loExp: number, hiExp: number): LogTick[] {
  const out: LogTick[] = [];
  const span = hiExp - loExp;
  for (let e = loExp; e <= hiExp; e++) {
    const dec = 10 ** e;
    out.push({ value: dec, major: true, label: true });
    if (e === hiExp) break;
    for (let m = 2; m <= 9; m++)
      out.push({ value: m * dec, major: false, label: span <= 2 && (m === 2 || m === 5) });
  }
  return out;
}

/** Decade label: 10^e as plain digits up to 10^4, then as 1e5, 1e6 ... */
export function decadeLabel(x: number): string {
  if (x >= 1e5 || x < 1e-2) {
    const e = Math.round(Math.log10(x));
    const m = x / 10 ** e;
    return Math.abs(m - 1) < 1e-9 ? `1e${e}` : `${Number(m.toPrecision(2))}e${e}`;
  }
  return String(Number(x.toPrecision(6)));
}

export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

export type Scale = (v: number) => number;

/** Linear scale from [d0, d1] to [r0, r1]. */
export function linear(d0: number, d1: number, r0: number, r1: number): Scale {
  const k = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  return (v) => r0 + (v - d0) * k;
}

/** Log10 scale from [d0, d1] (both > 0) to [r0, r1]. */
export function logScale(d0: number, d1: number, r0: number, r1: number): Scale {
  const l0 = Math.log10(d0);
  const l1 = Math.log10(d1);
  const k = l1 === l0 ? 0 : (r1 - r0) / (l1 - l0);
  return (v) => r0 + (Math.log10(v > 0 ? v : d0) - l0) * k;
}

/**
 * Liang-Barsky clipping of the segment (x0,y0)-(x1,y1) to [xmin,xmax] x [ymin,ymax]
 * (in data units). Returns the visible part or null.
 */
export function clipSegment(
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  xmin: number,
  xmax: number,
  ymin: number,
  ymax: number,
): [number, number, number, number] | null {
  let t0 = 0;
  let t1 = 1;
  const dx = x1 - x0;
  const dy = y1 - y0;
  const edges: Array<[number, number]> = [
    [-dx, x0 - xmin],
    [dx, xmax - x0],
    [-dy, y0 - ymin],
    [dy, ymax - y0],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) {
      if (r > t1) return null;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return null;
      if (r < t1) t1 = r;
    }
  }
  return [x0 + t0 * dx, y0 + t0 * dy, x0 + t1 * dx, y0 + t1 * dy];
}

/** A polyline clipped to a rectangle: the visible runs, each at least two points. */
export function clipPolyline(
  points: Array<[number, number]>,
  xmin: number,
  xmax: number,
  ymin: number,
  ymax: number,
): Array<Array<[number, number]>> {
  const runs: Array<Array<[number, number]>> = [];
  let cur: Array<[number, number]> = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[i + 1];
    if (![x0, y0, x1, y1].every(Number.isFinite)) {
      if (cur.length > 1) runs.push(cur);
      cur = [];
      continue;
    }
    const c = clipSegment(x0, y0, x1, y1, xmin, xmax, ymin, ymax);
    if (c && c[0] === c[2] && c[1] === c[3]) continue; // touches the box in one point only
    if (!c) {
      if (cur.length > 1) runs.push(cur);
      cur = [];
      continue;
    }
    const last = cur[cur.length - 1];
    if (
      !last ||
      Math.abs(last[0] - c[0]) > 1e-12 * (1 + Math.abs(c[0])) ||
      Math.abs(last[1] - c[1]) > 1e-12 * (1 + Math.abs(c[1]))
    ) {
      if (cur.length > 1) runs.push(cur);
      cur = [[c[0], c[1]]];
    }
    cur.push([c[2], c[3]]);
  }
  if (cur.length > 1) runs.push(cur);
  return runs;
}

/** `points` attribute of a polyline, in pixels. */
export function pointsAttr(points: Array<[number, number]>, sx: Scale, sy: Scale): string {
  return points.map(([x, y]) => `${px(sx(x))},${px(sy(y))}`).join(' ');
}

/** Series colours and classes: one place, so every diagram and the legend agree. */
export const DIAGRAM_STYLE = `
.fn-diagram{font-family:var(--fn-font,system-ui,-apple-system,"Segoe UI",sans-serif);font-size:12px}
.fn-bg{fill:var(--fn-background,#ffffff)}
.fn-plot{fill:var(--fn-plot-background,transparent)}
.fn-text{fill:var(--fn-foreground,#1d232b)}
.fn-muted{fill:var(--fn-muted,#5b6573)}
.fn-axis{stroke:var(--fn-foreground,#1d232b);stroke-width:1;fill:none}
.fn-grid{stroke:var(--fn-grid,#d5dae1);stroke-width:0.6;fill:none}
.fn-grid-minor{stroke:var(--fn-grid,#d5dae1);stroke-width:0.4;stroke-dasharray:1 3;fill:none}
.fn-tick{stroke:var(--fn-foreground,#1d232b);stroke-width:1}
.fn-series{fill:none;stroke-width:1.8;stroke-linejoin:round;stroke-linecap:round}
.fn-chosen{stroke-width:3}
.fn-goodman{stroke:var(--fn-goodman,#2f6db5)}
.fn-gerber{stroke:var(--fn-gerber,#2e8b57)}
.fn-soderberg{stroke:var(--fn-soderberg,#c26a1b)}
.fn-asme-elliptic{stroke:var(--fn-asme,#8756b8)}
.fn-langer{stroke:var(--fn-yield,#c23b3b);stroke-dasharray:7 4}
.fn-curve-other{stroke:var(--fn-muted,#5b6573)}
.fn-loadline{stroke:var(--fn-loadline,#6b7480);stroke-width:1.2;stroke-dasharray:3 3;fill:none}
.fn-basquin{stroke:var(--fn-sn,#2f6db5)}
.fn-extrapolated{stroke-dasharray:6 4}
.fn-knee{stroke:var(--fn-muted,#5b6573);stroke-width:1;stroke-dasharray:2 3}
.fn-crack{stroke:var(--fn-crack,#2f6db5)}
.fn-point{fill:var(--fn-point,#111827);stroke:var(--fn-background,#ffffff);stroke-width:1.5}
.fn-point-required{fill:var(--fn-background,#ffffff);stroke:var(--fn-point,#111827);stroke-width:2}
.fn-point-level{fill:var(--fn-level,#b8741a);stroke:var(--fn-background,#ffffff);stroke-width:1}
.fn-limit{fill:var(--fn-background,#ffffff);stroke:var(--fn-foreground,#1d232b);stroke-width:1.5}
.fn-arrow{stroke:var(--fn-point,#111827);stroke-width:1.5;fill:none}
.fn-cell{fill:var(--fn-cell,#2f6db5)}
.fn-cell-empty{fill:none;stroke:var(--fn-grid,#d5dae1);stroke-width:0.4}
.fn-legend-box{fill:var(--fn-background,#ffffff);fill-opacity:0.9;stroke:var(--fn-grid,#d5dae1)}
`;

/** The `<style>` element of a self-contained diagram. */
export function styleElement(): string {
  return `<style>${DIAGRAM_STYLE.replace(/\n/g, '')}</style>`;
}
