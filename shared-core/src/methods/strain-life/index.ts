// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/** `method: strain-life`: local strain approach at a notch that yields (Neuber or Glinka, Masing, memory). */
import { MATERIALS } from '../../materials';
import type { MethodModule } from '../types';
import { hysteresisDiagram, strainLifeDiagram } from './diagram';
import { runStrainLife } from './pipeline';

const CYCLIC_KEYS = MATERIALS.filter((m) => m.cyclic).map((m) => m.key);

export const strainLife: MethodModule = {
  name: 'strain-life',
  meaning: 'local strain approach at a notch root that yields: Neuber or Glinka, strain-life curve, memory',
  docs: 'strain-life',
  words: {
    inputs: {
      E: { dim: 'stress', meaning: "Young's modulus of the cyclic and strain-life data" },
      K_prime: { dim: 'stress', meaning: "cyclic strength coefficient K' (Ramberg-Osgood cyclic curve)" },
      n_prime: { dim: 'one', meaning: "cyclic strain-hardening exponent n'" },
      eps_f_prime: { dim: 'one', meaning: "fatigue ductility coefficient eps_f' (strain-life curve)" },
      c_coffin: { dim: 'one', meaning: 'fatigue ductility exponent c of the strain-life curve (negative)' },
      HB: { dim: 'one', meaning: 'Brinell hardness (for `estimate: hardness`)' },
      RA: {
        dim: 'one',
        meaning: 'reduction in area at fracture, a fraction (for `estimate: modified-universal-slopes`)',
      },
      passes: {
        dim: 'one',
        meaning: 'passes of the spectrum or history in service, for the damage sum D_sum (default 1)',
      },
    },
    results: {
      eps_a: { dim: 'one', meaning: 'local strain amplitude at the notch root (governing loop)' },
      sigma_max_local: { dim: 'stress', meaning: 'largest local stress at the notch root (governing loop)' },
      sigma_min_local: { dim: 'stress', meaning: 'smallest local stress at the notch root (governing loop)' },
      sigma_m_local: { dim: 'stress', meaning: 'local mean stress at the notch root (governing loop)' },
      two_N_t: {
        dim: 'one',
        meaning: 'transition life 2N_t in reversals (elastic and plastic strain amplitudes equal)',
      },
      D_sum: { dim: 'one', meaning: 'Palmgren-Miner damage sum' },
    },
    options: {
      'notch-rule': {
        meaning: 'how the notch-root stress and strain follow from the nominal stress and Kt',
        values: {
          neuber: "Neuber's rule: sigma eps = (Kt S)^2 / E",
          glinka: "Glinka's rule: equal strain energy density under the cyclic curve",
        },
        default: 'neuber',
      },
      'mean-stress': {
        meaning: 'mean-stress correction of the strain-life curve',
        values: {
          swt: 'Smith-Watson-Topper: sigma_max eps_a on the curve',
          'morrow-full':
            "Morrow on both terms: sigma_f' - sigma_m, and eps_f' scaled by ((sigma_f' - sigma_m)/sigma_f')^(c/b)",
          morrow: 'Morrow as Dowling writes it: the same as morrow-full',
          'morrow-elastic': "Morrow on the elastic term only: sigma_f' - sigma_m",
          none: 'Coffin-Manson-Basquin without mean stress',
        },
        default: 'swt',
      },
      estimate: {
        meaning: 'estimate of the strain-life constants from monotonic properties (with its scatter)',
        values: {
          'uniform-material-law': 'Baumel & Seeger: from Sut and E (steels; aluminium and titanium alloys)',
          'modified-universal-slopes': 'Muralidharan & Manson: from Sut, E and the reduction in area RA',
          hardness: 'Roessle & Fatemi: from the Brinell hardness HB and E (steels)',
        },
      },
    },
    positive: ['E', 'K_prime', 'n_prime', 'eps_f_prime', 'HB'],
  },
  run: runStrainLife,
  fields: ['strainLife', 'tables'],
  headline: {
    summary: ['N_f', 'eps_a', 'D_sum', 'repeats'],
    preview: ['N_f', 'eps_a', 'sigma_max_local', 'sigma_m_local', 'two_N_t', 'D_sum', 'repeats'],
    life: ['N_f'],
  },
  diagrams: [
    {
      kind: 'strain-life-loops',
      title: 'Notch-root hysteresis loops',
      draw: (c, o) =>
        c.strainLife && c.strainLife.path.length > 1 ? hysteresisDiagram(c.strainLife, o) : null,
    },
    {
      kind: 'strain-life-curve',
      title: 'Strain-life curve',
      draw: (c, o) =>
        c.strainLife && c.strainLife.curve.length > 1 ? strainLifeDiagram(c.strainLife, o) : null,
    },
  ],
  snippet: {
    label: 'fatigue check: strain-life at a notch',
    body: () => [
      '```fatigue ${1:check_id}',
      'title: ${2:what is checked}',
      'method: strain-life',
      'material: ${3|' + CYCLIC_KEYS.join(',') + '|}',
      'Kt = ${4:elastic stress concentration}',
      'sigma_max = ${5:largest nominal stress} MPa',
      'sigma_min = ${6:smallest nominal stress} MPa',
      'notch-rule: ${7|neuber,glinka|}',
      'mean-stress: ${8|swt,morrow,morrow-elastic,none|}',
      'require: N_f >= ${9:required cycles}',
      '```',
      '$0',
    ],
  },
  templates: [
    {
      kind: 'strain-life',
      label: 'Strain-life at a notch (local strain approach)',
      detail: 'cyclic and strain-life constants, Kt, nominal stress cycle, Neuber or Glinka, life N_f',
      idStem: 'notch',
      body: (u) => [
        'method: strain-life',
        '# cyclic curve and strain-life constants with their source, or material: KEY, or estimate:',
        `E = \${3:?} ${u.system === 'US' ? 'ksi' : 'GPa'}`,
        `K_prime = \${4:?} ${u.stress}`,
        'n_prime = ${5:?}',
        `sigma_f_prime = \${6:?} ${u.stress}`,
        'b_basquin = ${7:?}',
        'eps_f_prime = ${8:?}',
        'c_coffin = ${9:?}',
        `Sy = \${10:?} ${u.stress}`,
        'Kt = ${11:?}',
        `sigma_max = \${12:?} ${u.stress}`,
        `sigma_min = \${13:?} ${u.stress}`,
        'notch-rule: ${14|neuber,glinka|}',
        'mean-stress: ${15|swt,morrow,morrow-elastic,none|}',
        'require: N_f >= ${16:?}',
      ],
    },
  ],
  defaultedOptions: {
    'notch-rule': (c) => c.values.eps_a !== undefined,
    'mean-stress': (c) => c.values.N_f !== undefined,
  },
};
