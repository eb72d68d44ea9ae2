/**
 * Range-mean matrix of the rainflow cycles of a damage check: one cell per bin, its
 * shade growing with the logarithm of the count. Draws the counts the core made.
 */
import type { CheckResult } from '../context/types';
import { formatCycles } from '../units/format';
import {
  type Axis,
  axes,
  closeSvg,
  type DiagramOptions,
  frameFor,
  type LegendItem,
  legend,
  openSvg,
} from './frame';
import { esc, px, tickLabel } from './svg';

export type RangeMeanHistogram = NonNullable<CheckResult['histogram']>;

/** `counts[i][j]`: cycles with a range in bin i of `rangeEdges` and a mean in bin j of `meanEdges`. */
export function histogramDiagram(hist: RangeMeanHistogram, options: DiagramOptions): string {
  const rEdges = hist.rangeEdges.filter(Number.isFinite);
  const mEdges = hist.meanEdges.filter(Number.isFinite);
  const unit = hist.unit ? ` (${hist.unit})` : '';
  const okShape = rEdges.length >= 2 && mEdges.length >= 2;
  const xAxis: Axis = {
    kind: 'linear',
    min: okShape ? mEdges[0] : 0,
    max: okShape ? mEdges[mEdges.length - 1] : 1,
    label: `cycle mean${unit}`,
  };
  const yAxis: Axis = {
    kind: 'linear',
    min: okShape ? rEdges[0] : 0,
    max: okShape ? rEdges[rEdges.length - 1] : 1,
    label: `cycle range${unit}`,
  };
  let max = 0;
  let total = 0;
  for (const row of hist.counts)
    for (const c of row)
      if (Number.isFinite(c) && c > 0) {
        max = Math.max(max, c);
        total += c;
      }
  const legendItems: LegendItem[] = [
    { className: 'fn-cell', label: `darker: more cycles (max ${formatCycles(max)})`, marker: 'cell' },
  ];
  const f = frameFor(options, xAxis, yAxis, legendItems);
  const heading = options.title ?? 'Rainflow range-mean matrix';
  const description = `Counted cycles by range and mean${unit}: ${formatCycles(total)} cycles in all, at most ${formatCycles(max)} in one cell.`;
  const parts = [openSvg(f, options, 'histogram', heading, description), axes(f, xAxis, yAxis)];
  const { sx, sy } = f;
  parts.push('<g class="fn-cells">');
  if (okShape && max > 0) {
    for (let i = 0; i + 1 < rEdges.length; i++) {
      const row = hist.counts[i] ?? [];
      for (let j = 0; j + 1 < mEdges.length; j++) {
        const c = row[j];
        if (!(Number.isFinite(c) && c > 0)) continue;
        const xA = sx(mEdges[j]);
        const xB = sx(mEdges[j + 1]);
        const yA = sy(rEdges[i + 1]);
        const yB = sy(rEdges[i]);
        const shade = 0.15 + (0.85 * Math.log1p(c)) / Math.log1p(max);
        parts.push(
          `<rect class="fn-cell" x="${px(Math.min(xA, xB))}" y="${px(Math.min(yA, yB))}" width="${px(Math.abs(xB - xA))}" height="${px(Math.abs(yB - yA))}" fill-opacity="${px(shade)}"><title>${esc(
            `range ${tickLabel(rEdges[i])} to ${tickLabel(rEdges[i + 1])}, mean ${tickLabel(mEdges[j])} to ${tickLabel(mEdges[j + 1])}${unit}: ${formatCycles(c)} cycles`,
          )}</title></rect>`,
        );
      }
    }
  }
  parts.push('</g>');
  parts.push(legend(f, legendItems));
  parts.push(closeSvg());
  return parts.join('');
}
