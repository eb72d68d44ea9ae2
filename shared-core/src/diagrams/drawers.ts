/**
 * The diagrams that several methods draw from shared records: the Haigh diagram, the S-N
 * diagram and the rainflow range-mean matrix. A method lists those it produces (and its own)
 * in its module's `diagrams`.
 */
import type { MethodDiagram } from '../methods/types';
import { haighDiagram } from './haigh';
import { histogramDiagram } from './histogram';
import { snDiagram } from './sn';

export const HAIGH_DIAGRAM: MethodDiagram = {
  kind: 'haigh',
  title: 'Haigh diagram',
  draw: (c, o) => (c.haigh ? haighDiagram(c.haigh, o) : null),
};

export const SN_DIAGRAM: MethodDiagram = {
  kind: 'sn',
  title: 'S-N diagram',
  draw: (c, o) => (c.sn ? snDiagram(c.sn, o) : null),
};

export const HISTOGRAM_DIAGRAM: MethodDiagram = {
  kind: 'histogram',
  title: 'Rainflow range-mean matrix',
  draw: (c, o) => (c.histogram ? histogramDiagram(c.histogram, o) : null),
};
