// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/** `method: damage`: Palmgren-Miner damage of a load history or spectrum at a section. */
import { assumedFamily } from '../../checks/review';
import { OPTIONS } from '../../context/vocabulary';
import { HISTOGRAM_DIAGRAM, SN_DIAGRAM } from '../../diagrams/drawers';
import { MATERIALS } from '../../materials';
import { materialLines, sectionLines } from '../templateParts';
import type { MethodModule } from '../types';
import { runDamage } from './pipeline';

export const damage: MethodModule = {
  name: 'damage',
  meaning: 'Palmgren-Miner damage of a load history or spectrum',
  docs: 'damage',
  words: { renamed: { D: 'D_sum', D_pos: 'D_sum_pos', D_neg: 'D_sum_neg' } },
  run: runDamage,
  fields: ['sn', 'tables', 'histogram'],
  review(ctx) {
    assumedFamily(ctx);
  },
  headline: {
    summary: ['D_sum', 'repeats', 'N_eq'],
    preview: ['D_sum', 'repeats', 'N_eq', 'n_y'],
    life: ['D_sum', 'N_f'],
  },
  diagrams: [SN_DIAGRAM, HISTOGRAM_DIAGRAM],
  snippet: {
    label: 'fatigue check: damage (spectrum)',
    body: () => [
      '```fatigue ${1:check_id}',
      'title: ${2:what is checked}',
      'method: damage',
      'material: ${3|' + MATERIALS.map((m) => m.key).join(',') + '|}',
      'surface: ${4|' + Object.keys(OPTIONS.surface.values ?? {}).join(',') + '|}',
      'd = ${5:diameter} mm',
      'spectrum: M_a = ${6:amplitude} N*m, M_m = ${7:mean} N*m, n = ${8:cycles}',
      'miner: ${9|original,elementary,haibach|}',
      'criterion: ${10|goodman,gerber,soderberg,asme-elliptic|}',
      'require: D_sum <= ${11:allowed damage}',
      '```',
      '$0',
    ],
  },
  templates: [
    {
      kind: 'damage',
      label: 'Variable amplitude (Palmgren-Miner damage)',
      detail: 'a load spectrum or a rainflow-counted history, damage D_sum and repeats',
      idStem: 'damage',
      body: (u) => [
        'method: damage',
        ...materialLines(u),
        ...sectionLines(u),
        'criterion: ${13|goodman,gerber,soderberg,asme-elliptic|}',
        'miner: ${14|original,elementary,haibach|}',
        '# one line per load level; or history: loads/FILE.csv with history-column: and history-load:',
        `spectrum: M_a = \${15:?} ${u.moment}, M_m = \${16:?} ${u.moment}, n = \${17:?}`,
        'require: D_sum <= ${18:?}',
      ],
    },
  ],
  defaultedOptions: {
    miner: (c) => c.values.D_sum !== undefined,
  },
};
