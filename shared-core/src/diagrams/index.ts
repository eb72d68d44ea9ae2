/**
 * SVG diagrams of a check, drawn from the numbers the core produced: self-contained
 * strings (no scripts, no external references) whose colours are CSS custom properties
 * with fallbacks. The summary panel and the HTML report both use them.
 */
import type { CheckResult } from '../language/types';
import { crackGrowthDiagram } from './crackGrowth';
import type { DiagramOptions } from './frame';
import { haighDiagram } from './haigh';
import { histogramDiagram } from './histogram';
import { snDiagram } from './sn';

export { type CrackGrowthMarks, crackGrowthDiagram } from './crackGrowth';
export type { DiagramOptions } from './frame';
export { haighDiagram } from './haigh';
export { histogramDiagram, type RangeMeanHistogram } from './histogram';
export { snDiagram } from './sn';
export { DIAGRAM_STYLE, esc } from './svg';

export type DiagramKind = 'haigh' | 'sn' | 'crack-growth' | 'histogram';

export interface CheckDiagram {
  kind: DiagramKind;
  title: string;
  svg: string;
}

/** The check's fields a diagram needs: a `CheckResult`, or the same record without diagnostics. */
export type DiagramSource = Pick<CheckResult, 'haigh' | 'sn' | 'crackCurve' | 'histogram' | 'unitSystem'> & {
  values?: CheckResult['values'];
};

/**
 * Every diagram the check has data for, in reading order. The unit system defaults to the
 * check's own display units.
 */
export function checkDiagrams(check: DiagramSource, options: Partial<DiagramOptions> = {}): CheckDiagram[] {
  const opts: DiagramOptions = { ...options, unitSystem: options.unitSystem ?? check.unitSystem ?? 'SI' };
  const out: CheckDiagram[] = [];
  if (check.haigh) {
    const title = 'Haigh diagram';
    out.push({ kind: 'haigh', title, svg: haighDiagram(check.haigh, { ...opts, title }) });
  }
  if (check.sn) {
    const title = 'S-N diagram';
    out.push({ kind: 'sn', title, svg: snDiagram(check.sn, { ...opts, title }) });
  }
  if (check.crackCurve && check.crackCurve.length > 0) {
    const title = 'Crack growth';
    const ac = check.values?.a_c;
    const insp = check.values?.N_insp;
    out.push({
      kind: 'crack-growth',
      title,
      svg: crackGrowthDiagram(
        check.crackCurve,
        { ...opts, title },
        { criticalSize: ac?.si ?? null, inspectionInterval: insp?.si ?? null },
      ),
    });
  }
  if (check.histogram) {
    const title = 'Rainflow range-mean matrix';
    out.push({ kind: 'histogram', title, svg: histogramDiagram(check.histogram, { ...opts, title }) });
  }
  return out;
}
