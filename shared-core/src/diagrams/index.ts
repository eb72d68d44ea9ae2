/**
 * SVG diagrams of a check, drawn from the numbers the core produced: self-contained
 * strings (no scripts, no external references) whose colours are CSS custom properties
 * with fallbacks. The summary panel and the HTML report both use them;
 * `checkDiagrams` (methods/registry.ts) draws those of a check, as its method lists them.
 */
export type { DiagramOptions } from './frame';
export { haighDiagram } from './haigh';
export { histogramDiagram, type RangeMeanHistogram } from './histogram';
export { snDiagram } from './sn';
export { DIAGRAM_STYLE, esc } from './svg';
