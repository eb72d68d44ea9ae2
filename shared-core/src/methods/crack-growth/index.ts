// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/** `method: crack-growth`: Paris-law life of a crack from its initial to its critical size. */
import { TEMPLATE_UNITS } from '../templateParts';
import type { MethodModule } from '../types';
import { crackGrowthDiagram } from './diagram';
import { runCrackGrowth } from './pipeline';

export const crackGrowth: MethodModule = {
  name: 'crack-growth',
  meaning: 'Paris-law crack growth life and inspection interval',
  docs: 'crack growth',
  run: runCrackGrowth,
  fields: ['tables', 'crackCurve'],
  headline: {
    summary: ['a_c', 'N_cg', 'N_insp'],
    preview: ['a_c', 'N_cg', 'N_insp'],
    life: ['N_cg', 'N_f'],
  },
  diagrams: [
    {
      kind: 'crack-growth',
      title: 'Crack growth',
      draw: (c, o) =>
        c.crackCurve && c.crackCurve.length > 0
          ? crackGrowthDiagram(c.crackCurve, o, {
              criticalSize: c.values?.a_c?.si ?? null,
              inspectionInterval: c.values?.N_insp?.si ?? null,
            })
          : null,
    },
  ],
  snippet: {
    label: 'fatigue check: crack growth',
    body: () => [
      '```fatigue ${1:check_id}',
      'title: ${2:what is checked}',
      'method: crack-growth',
      'C_paris = ${3:Paris coefficient}',
      'm_paris = ${4:Paris exponent}',
      'Y = ${5:geometry factor}',
      'a_i = ${6:initial crack} mm',
      'K_IC = ${7:fracture toughness} MPa*m^0.5',
      'sigma_max = ${8:largest stress} MPa',
      'sigma_min = ${9:smallest stress} MPa',
      'require: N_cg >= ${10:required cycles}',
      '```',
      '$0',
    ],
  },
  templates: [
    {
      kind: 'crack-growth',
      label: 'Crack growth (Paris law)',
      detail: 'cycles from an initial to a critical crack, inspection interval',
      idStem: 'crack',
      body: (u) => [
        'method: crack-growth',
        `# Paris law da/dN = C_paris * delta_K^m_paris (C for m/cycle and ${TEMPLATE_UNITS.SI.toughness} unless paris-units: inch)`,
        'C_paris = ${3:?}',
        'm_paris = ${4:?}',
        'Y = ${5:?}',
        `a_i = \${6:?} ${u.length}`,
        `K_IC = \${7:?} ${u.toughness}`,
        `sigma_max = \${8:?} ${u.stress}`,
        `sigma_min = \${9:?} ${u.stress}`,
        'inspection_factor = ${10:2}',
        'require: N_insp >= ${11:?}',
      ],
    },
  ],
  defaultedOptions: {
    'paris-units': (c) => c.values.C_paris !== undefined,
    'crack-geometry': (c) => c.values.Y !== undefined,
  },
};
