/**
 * The frame every diagram shares: the outer `<svg>` with its accessible title and
 * description, a visible heading, the plot box, grid, axes with ticks and labels, and a
 * legend laid out in rows under the plot.
 */
import type { UnitSystem } from '../units/format';
import {
  type Box,
  decadeLabel,
  esc,
  linear,
  logScale,
  logTicks,
  niceTicks,
  px,
  type Scale,
  styleElement,
  tickLabel,
} from './svg';

export interface DiagramOptions {
  /** Display units of the axes: MPa and mm (SI) or ksi and in (US). */
  unitSystem: UnitSystem;
  /** Visible heading and accessible name; each diagram has its own default. */
  title?: string;
  /** Width of the drawing in pixels (the height follows); default 520. */
  width?: number;
  /**
   * Include the `<style>` element (default true) so that the SVG stands alone. A page that
   * supplies `DIAGRAM_STYLE` itself under a strict content security policy passes false.
   */
  embedStyle?: boolean;
  /** Significant digits of the numbers written on the diagram; default 4. */
  digits?: number;
}

export interface Axis {
  kind: 'linear' | 'log';
  /** Decade labels of a log axis as powers of ten (10^6) rather than digits. */
  powers?: boolean;
  /** Domain; for a log axis both are powers of ten. */
  min: number;
  max: number;
  label: string;
}

export interface LegendItem {
  /** Class of the sample: a line (`fn-series fn-goodman`) or a marker (`fn-point`). */
  className: string;
  label: string;
  marker?: 'line' | 'dot' | 'ring' | 'square' | 'diamond' | 'triangle' | 'cell';
}

export interface Frame {
  box: Box;
  sx: Scale;
  sy: Scale;
  width: number;
  height: number;
}

const MARGIN = { left: 66, right: 18, top: 36, bottom: 48 };
const LEGEND_ROW = 18;

export function frameFor(options: DiagramOptions, x: Axis, y: Axis, legendItems: LegendItem[]): Frame {
  const width = Math.max(320, Math.min(1600, options.width ?? 520));
  const plotHeight = Math.round(width * 0.56);
  const rows = legendRows(legendItems, width);
  const height = MARGIN.top + plotHeight + MARGIN.bottom + rows * LEGEND_ROW + (rows > 0 ? 6 : 0);
  const box: Box = {
    left: MARGIN.left,
    top: MARGIN.top,
    width: width - MARGIN.left - MARGIN.right,
    height: plotHeight,
  };
  const sx =
    x.kind === 'log'
      ? logScale(x.min, x.max, box.left, box.left + box.width)
      : linear(x.min, x.max, box.left, box.left + box.width);
  const sy =
    y.kind === 'log'
      ? logScale(y.min, y.max, box.top + box.height, box.top)
      : linear(y.min, y.max, box.top + box.height, box.top);
  return { box, sx, sy, width, height };
}

/** Opening of the SVG: title, description, style, background, heading. */
export function openSvg(
  f: Frame,
  options: DiagramOptions,
  kind: string,
  heading: string,
  description: string,
): string {
  const embed = options.embedStyle !== false;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" class="fn-diagram fn-${esc(kind)}" role="img" ` +
    `viewBox="0 0 ${f.width} ${f.height}" width="${f.width}" height="${f.height}" data-diagram="${esc(kind)}">` +
    `<title>${esc(heading)}</title><desc>${esc(description)}</desc>` +
    (embed ? styleElement() : '') +
    `<rect class="fn-bg" x="0" y="0" width="${f.width}" height="${f.height}"/>` +
    `<text class="fn-text fn-heading" x="${MARGIN.left}" y="22" font-weight="600" font-size="13">${esc(heading)}</text>`
  );
}

/** Grid, axes, ticks and axis labels. */
export function axes(f: Frame, x: Axis, y: Axis): string {
  const { box, sx, sy } = f;
  const bottom = box.top + box.height;
  const right = box.left + box.width;
  const parts: string[] = [
    `<rect class="fn-plot" x="${box.left}" y="${box.top}" width="${box.width}" height="${box.height}"/>`,
  ];
  const grid: string[] = [];
  const ticks: string[] = [];
  for (const t of axisTicks(x)) {
    const X = px(sx(t.value));
    grid.push(
      `<line class="${t.major ? 'fn-grid' : 'fn-grid-minor'}" x1="${X}" y1="${box.top}" x2="${X}" y2="${bottom}"/>`,
    );
    ticks.push(
      `<line class="fn-tick" x1="${X}" y1="${bottom}" x2="${X}" y2="${bottom + (t.major ? 5 : 3)}"/>`,
    );
    if (t.label)
      ticks.push(
        `<text class="fn-muted fn-tick-x" x="${X}" y="${bottom + 17}" text-anchor="middle" data-value="${t.value}">${tickText(t)}</text>`,
      );
  }
  for (const t of axisTicks(y)) {
    const Y = px(sy(t.value));
    grid.push(
      `<line class="${t.major ? 'fn-grid' : 'fn-grid-minor'}" x1="${box.left}" y1="${Y}" x2="${right}" y2="${Y}"/>`,
    );
    ticks.push(
      `<line class="fn-tick" x1="${box.left - (t.major ? 5 : 3)}" y1="${Y}" x2="${box.left}" y2="${Y}"/>`,
    );
    if (t.label)
      ticks.push(
        `<text class="fn-muted fn-tick-y" x="${box.left - 8}" y="${px(sy(t.value) + 4)}" text-anchor="end" data-value="${t.value}">${tickText(t)}</text>`,
      );
  }
  parts.push(`<g class="fn-grid-lines">${grid.join('')}</g>`);
  // The zero lines of a linear axis that crosses zero are drawn as axes.
  const x0 = x.kind === 'linear' && x.min < 0 && x.max > 0 ? sx(0) : box.left;
  const y0 = y.kind === 'linear' && y.min < 0 && y.max > 0 ? sy(0) : bottom;
  parts.push(
    `<line class="fn-axis" x1="${box.left}" y1="${px(y0)}" x2="${right}" y2="${px(y0)}"/>` +
      `<line class="fn-axis" x1="${px(x0)}" y1="${box.top}" x2="${px(x0)}" y2="${bottom}"/>` +
      `<rect class="fn-axis" x="${box.left}" y="${box.top}" width="${box.width}" height="${box.height}" stroke-opacity="0.35"/>`,
  );
  parts.push(`<g class="fn-ticks">${ticks.join('')}</g>`);
  parts.push(
    `<text class="fn-text fn-axis-label-x" x="${px(box.left + box.width / 2)}" y="${bottom + 36}" text-anchor="middle">${esc(x.label)}</text>`,
  );
  const cy = box.top + box.height / 2;
  parts.push(
    `<text class="fn-text fn-axis-label-y" x="16" y="${px(cy)}" text-anchor="middle" transform="rotate(-90 16 ${px(cy)})">${esc(y.label)}</text>`,
  );
  return parts.join('');
}

interface AxisTick {
  value: number;
  major: boolean;
  label: boolean;
  text: string;
  /** Write the label as 10 with this exponent raised. */
  power?: number;
}

/** How many ticks a linear axis aims at; `niceDomain` callers use the same number. */
export const AXIS_TICKS = 7;

function tickText(t: AxisTick): string {
  if (t.power === undefined) return esc(t.text);
  return `10<tspan dy="-6" font-size="9">${t.power}</tspan>`;
}

function axisTicks(a: Axis): AxisTick[] {
  if (a.kind === 'log') {
    const lo = Math.round(Math.log10(a.min));
    const hi = Math.round(Math.log10(a.max));
    return logTicks(lo, hi).map((t) => ({
      ...t,
      text: decadeLabel(t.value),
      power: a.powers && t.major ? Math.round(Math.log10(t.value)) : undefined,
    }));
  }
  return niceTicks(a.min, a.max, AXIS_TICKS)
    .filter((v) => v >= a.min - 1e-9 * Math.abs(a.max - a.min) && v <= a.max + 1e-9 * Math.abs(a.max - a.min))
    .map((v) => ({ value: v, major: true, label: true, text: tickLabel(v) }));
}

/** Approximate width of a legend entry at 11 px (sample, gap, text, spacing). */
function entryWidth(it: LegendItem): number {
  return 28 + it.label.length * 6.1 + 18;
}

/** Flow layout of the legend under the plot: the position of every entry and the row count. */
function legendLayout(items: LegendItem[], width: number): { at: Array<[number, number]>; rows: number } {
  const left = MARGIN.left;
  const right = width - MARGIN.right;
  const at: Array<[number, number]> = [];
  let x = left;
  let row = 0;
  for (const it of items) {
    const w = entryWidth(it);
    if (x > left && x + w - 18 > right) {
      row++;
      x = left;
    }
    at.push([x, row]);
    x += w;
  }
  return { at, rows: items.length === 0 ? 0 : row + 1 };
}

function legendRows(items: LegendItem[], width: number): number {
  return legendLayout(items, width).rows;
}

/** Legend in rows under the plot. */
export function legend(f: Frame, items: LegendItem[]): string {
  if (items.length === 0) return '';
  const { at } = legendLayout(items, f.width);
  const top = f.box.top + f.box.height + MARGIN.bottom + 4;
  const out: string[] = ['<g class="fn-legend">'];
  items.forEach((it, i) => {
    const X = at[i][0];
    const Y = top + at[i][1] * LEGEND_ROW;
    out.push(`<g class="fn-legend-item">${legendSample(it, X, Y)}`);
    out.push(
      `<text class="fn-text" x="${px(X + 28)}" y="${px(Y + 4)}" font-size="11">${esc(it.label)}</text></g>`,
    );
  });
  out.push('</g>');
  return out.join('');
}

function legendSample(it: LegendItem, X: number, Y: number): string {
  switch (it.marker ?? 'line') {
    case 'line':
      return `<line class="${esc(it.className)}" x1="${px(X)}" y1="${px(Y)}" x2="${px(X + 22)}" y2="${px(Y)}"/>`;
    case 'dot':
    case 'ring':
      return `<circle class="${esc(it.className)}" cx="${px(X + 11)}" cy="${px(Y)}" r="4.5"/>`;
    case 'square':
    case 'cell':
      return `<rect class="${esc(it.className)}" x="${px(X + 7)}" y="${px(Y - 4)}" width="8" height="8"/>`;
    case 'diamond':
      return `<path class="${esc(it.className)}" d="${diamondPath(X + 11, Y, 5)}"/>`;
    case 'triangle':
      return `<path class="${esc(it.className)}" d="${trianglePath(X + 11, Y, 6)}"/>`;
  }
}

export function diamondPath(cx: number, cy: number, r: number): string {
  return `M${px(cx)} ${px(cy - r)}L${px(cx + r)} ${px(cy)}L${px(cx)} ${px(cy + r)}L${px(cx - r)} ${px(cy)}Z`;
}

/** A triangle pointing right (towards longer life). */
export function trianglePath(cx: number, cy: number, r: number): string {
  return `M${px(cx + r)} ${px(cy)}L${px(cx - r * 0.6)} ${px(cy - r * 0.8)}L${px(cx - r * 0.6)} ${px(cy + r * 0.8)}Z`;
}

/** A label placed beside a point, kept inside the plot box. */
export function pointLabel(f: Frame, X: number, Y: number, text: string, className = 'fn-text'): string {
  const approxWidth = text.length * 6.4;
  const right = f.box.left + f.box.width;
  const leftSide = X + 10 + approxWidth > right;
  const tx = leftSide ? X - 10 : X + 10;
  const ty = Y - 10 < f.box.top + 10 ? Y + 18 : Y - 10;
  return `<text class="${className} fn-point-label" x="${px(tx)}" y="${px(ty)}" text-anchor="${leftSide ? 'end' : 'start'}" font-size="11">${esc(text)}</text>`;
}

export function closeSvg(): string {
  return '</svg>';
}
