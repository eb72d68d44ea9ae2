// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/** `method: stress-life`: safety factors and life of a section from the S-N approach. */
import { assumedFamily, hiddenFiniteLife } from '../../checks/review';
import { OPTIONS } from '../../context/vocabulary';
import { HAIGH_DIAGRAM, SN_DIAGRAM } from '../../diagrams/drawers';
import { MATERIALS } from '../../materials';
import { loadLines, materialLines, sectionLines } from '../templateParts';
import type { MethodModule } from '../types';
import { runStressLife } from './pipeline';

export const stressLife: MethodModule = {
  name: 'stress-life',
  meaning: 'safety factors and life from the S-N approach',
  docs: '`n_f`',
  run: runStressLife,
  fields: ['haigh', 'sn'],
  review(ctx, requirements, requireStatements) {
    assumedFamily(ctx);
    hiddenFiniteLife(ctx, requirements, requireStatements);
  },
  headline: {
    summary: ['n_f', 'n_y', 'N_f', 'S_f'],
    preview: ['n_f', 'n_y', 'N_f', 'S_f', 'Se', 'sigma_a_eq', 'sigma_m_eq'],
    life: ['N_f'],
  },
  diagrams: [HAIGH_DIAGRAM, SN_DIAGRAM],
  snippet: {
    label: 'fatigue check: stress-life',
    body: () => [
      '```fatigue ${1:check_id}',
      'title: ${2:what is checked}',
      'material: ${3|' + MATERIALS.map((m) => m.key).join(',') + '|}',
      'surface: ${4|' + Object.keys(OPTIONS.surface.values ?? {}).join(',') + '|}',
      'd = ${5:diameter} mm',
      'M_max = ${6:largest moment} N*m',
      'M_min = ${7:smallest moment} N*m',
      'criterion: ${8|goodman,gerber,soderberg,asme-elliptic|}',
      'require: n_f >= ${9:required factor}, n_y >= ${10:required factor}',
      '```',
      '$0',
    ],
  },
  templates: [
    {
      kind: 'stress-life',
      label: 'Stress-life, infinite life',
      detail: 'Marin factors, notch, loads, a mean-stress criterion, n_f and n_y',
      idStem: 'section',
      body: (u) => [
        ...materialLines(u),
        ...sectionLines(u),
        ...loadLines(u),
        'criterion: ${17|goodman,gerber,soderberg,asme-elliptic|}',
        'require: n_f >= ${18:?}, n_y >= ${19:?}',
      ],
    },
    {
      kind: 'finite-life',
      label: 'Stress-life, finite life',
      detail: 'Basquin S-N line, fatigue strength at a required number of cycles N',
      idStem: 'finite_life',
      body: (u) => [
        ...materialLines(u),
        ...sectionLines(u),
        ...loadLines(u),
        'N = ${17:?}',
        'criterion: ${18|goodman,gerber,soderberg,asme-elliptic,morrow,swt,walker|}',
        'require: n_f >= ${19:?}',
      ],
    },
  ],
  defaultedOptions: {
    'load-line': (c) => c.values.n_f !== undefined && c.values.n_f.origin !== 'stated',
  },
};
