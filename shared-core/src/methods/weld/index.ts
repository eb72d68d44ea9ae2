// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/** `method: weld`: a welded detail checked by its detail class (EN 1993-1-9 or IIW). */
import { HOT_SPOT_SCHEMES, IIW_THICKNESS_EXPONENT, WELD_DETAILS } from '../../weld';
import type { MethodModule } from '../types';
import { weldSnDiagram } from './diagram';
import { runWeld } from './pipeline';

const stress = (meaning: string) => ({ dim: 'stress' as const, meaning });
const one = (meaning: string) => ({ dim: 'one' as const, meaning });

export const weld: MethodModule = {
  name: 'weld',
  meaning: 'welded detail by its detail class (EN 1993-1-9 detail category or IIW FAT class)',
  docs: 'weld',
  words: {
    inputs: {
      delta_sigma: stress(
        'normal stress range at the detail (nominal, hot-spot, notch or throat: see stress-type)',
      ),
      delta_tau: stress('shear stress range at the detail'),
      tau_max: stress('largest shear stress of the cycle'),
      tau_min: stress('smallest shear stress of the cycle'),
      sigma_x1: stress('surface stress range at the first reference point of the hot-spot scheme'),
      sigma_x2: stress('surface stress range at the second reference point of the hot-spot scheme'),
      sigma_x3: stress('surface stress range at the third reference point (quadratic schemes)'),
      dF_perp: {
        dim: 'other',
        meaning: 'range of the force per length of weld across a load-carrying fillet weld (e.g. N/mm)',
      },
      a_w: { dim: 'length', meaning: 'throat thickness of the fillet weld' },
      n_w: one(
        'number of throats sharing dF_perp (2 for a double fillet weld); not stated: 1, with a warning',
      ),
      delta_sigma_C: stress(
        'detail class: characteristic normal stress range at 2e6 cycles (detail category, FAT)',
      ),
      delta_tau_C: stress('shear detail class: characteristic shear stress range at 2e6 cycles'),
      k_s: one('thickness (size) factor on the class, at most 1'),
      gamma_Ff: one('partial factor on the fatigue load (stress ranges)'),
      gamma_Mf: one('partial factor on the fatigue strength'),
      D_allow: one('permissible damage sum'),
      L_att: {
        dim: 'length',
        meaning: 'attachment length in the direction of the stress (catalogue details)',
      },
      r_att: { dim: 'length', meaning: 'transition radius of a gusset or lug (catalogue details)' },
      t_c: { dim: 'length', meaning: 'cover plate thickness (catalogue details)' },
    },
    results: {
      delta_sigma_hs: stress('structural hot-spot stress range, extrapolated to the weld toe'),
      delta_sigma_max: stress('largest stress range of the spectrum or history'),
      delta_sigma_C_imp: stress('class after the stated post-weld improvement'),
      delta_sigma_C_eff: stress('detail class after the corrections (thickness, stress ratio, improvement)'),
      delta_sigma_D: stress('knee of the S-N curve (constant-amplitude fatigue limit in EN 1993-1-9)'),
      delta_sigma_L: stress('cut-off limit of the S-N curve'),
      f_R: one('stress-ratio enhancement factor on the class (1 as welded)'),
      u_yield: one('largest stress range over the limit of the standard relative to yield'),
      u_yield_tau: one('shear range over the limit 1.5 fy / sqrt(3)'),
      D_sum: one('Miner damage sum of the cycles (one pass of the spectrum or history) on the design curve'),
      D_tau: one('Miner damage of the shear range on the design shear curve'),
      N_f: one('cycles to the permissible damage sum on the design curve'),
      delta_sigma_E2: stress('equivalent constant-amplitude stress range at 2e6 cycles'),
      delta_tau_E2: stress('equivalent constant-amplitude shear range at 2e6 cycles'),
      u_sigma: one('utilisation of the normal-range verification at 2e6 cycles (at most 1 passes)'),
      u_tau: one('utilisation of the shear-range verification at 2e6 cycles'),
      u_fat: one('utilisation of the verification, normal-shear interaction included (at most 1 passes)'),
      n_range: one(
        'safety factor on stress range: the factor on every range that brings the damage to D_allow',
      ),
    },
    options: {
      standard: {
        meaning: 'the standard the classes, curves and partial factors come from',
        values: {
          'en-1993-1-9':
            'EN 1993-1-9:2005 (steel): detail categories, m = 3 to 5e6, m = 5 to the cut-off at 1e8',
          'iiw-2016': 'IIW recommendations 2016: FAT classes, knee at 1e7, m = 22 beyond it',
          'iiw-2008':
            'IIW recommendations 2008: FAT classes, knee at 1e7; variable amplitude m2 = 5 below it',
        },
      },
      'stress-type': {
        meaning: 'which stress the ranges are, and so which classes apply',
        values: {
          nominal: 'nominal stress at the detail (classes of the detail tables)',
          'hot-spot': 'structural hot-spot stress at the weld toe (hot-spot classes)',
          'effective-notch': 'effective notch stress at a 1 mm reference radius (IIW FAT 225 steel)',
        },
        default: 'nominal',
      },
      detail: {
        meaning: 'a detail of the catalogue: its class in the standard chosen, with its table and number',
        values: Object.fromEntries(WELD_DETAILS.map((d) => [d.key, d.description])),
      },
      'hot-spot-scheme': {
        meaning: 'the reference points of the hot-spot extrapolation (sigma_x1, sigma_x2, sigma_x3)',
        values: Object.fromEntries(Object.entries(HOT_SPOT_SCHEMES).map(([k, d]) => [k, d.formula])),
        default: 'a-linear',
      },
      joint: {
        meaning: 'whether the weld carries the load (IIW hot-spot class)',
        values: {
          'load-carrying': 'load-carrying fillet welds (FAT 90 steel)',
          'non-load-carrying': 'non-load-carrying fillet welds or butt welds (FAT 100 steel)',
        },
        default: 'load-carrying',
      },
      'residual-stress': {
        meaning: 'residual-stress state of the joint: decides any mean-stress (stress-ratio) credit',
        values: {
          'as-welded': 'as welded: residual stress near yield, the full range counts, no enhancement',
          'stress-relieved': 'stress-relieved: IIW f(R) case I; EN 60 % of the compressive part',
          'small-scale': 'IIW case II: small thin-walled parts with short welds',
        },
        default: 'as-welded',
      },
      improvement: {
        meaning: 'a post-weld improvement of the weld toe, credited as the standard says',
        values: {
          none: 'no improvement',
          'burr-grinding': 'burr grinding of the toe (IIW benefit factor)',
          'tig-dressing': 'TIG dressing of the toe (IIW benefit factor)',
          'hammer-peening': 'hammer peening (IIW benefit factor)',
          'needle-peening': 'needle peening (IIW benefit factor)',
          hfmi: 'high-frequency mechanical impact treatment (IIW HFMI recommendations)',
        },
        default: 'none',
      },
      assessment: {
        meaning: 'assessment concept of the partial factor gamma_Mf (EN 1993-1-9 Table 3.1)',
        values: {
          'damage-tolerant': 'damage tolerant: inspected, a crack is found and repaired in time',
          'safe-life': 'safe life: no inspection credited',
        },
        default: 'safe-life',
      },
      consequence: {
        meaning: 'consequence of failure, for gamma_Mf (EN 1993-1-9 Table 3.1)',
        values: { low: 'low consequence', high: 'high consequence' },
        default: 'high',
      },
      'normal-shear': {
        meaning: 'whether the normal and shear ranges act in phase (interaction, IIW comparison value CV)',
        values: {
          proportional: 'in phase, proportional (IIW CV = 1.0)',
          'non-proportional': 'out of phase (IIW CV = 0.5, D_allow 0.2)',
        },
        default: 'proportional',
      },
      'thickness-group': {
        meaning: 'IIW joint group of the thickness exponent n in (25 mm / t)^n',
        values: Object.fromEntries(Object.entries(IIW_THICKNESS_EXPONENT).map(([k, n]) => [k, `n = ${n}`])),
      },
    },
    positive: ['a_w', 'n_w', 'delta_sigma_C', 'delta_tau_C', 'k_s', 'gamma_Ff', 'gamma_Mf', 'D_allow'],
  },
  run: runWeld,
  fields: ['weldSn', 'tables'],
  headline: {
    summary: ['u_fat', 'D_sum', 'N_f'],
    preview: ['u_fat', 'D_sum', 'delta_sigma_E2', 'n_range', 'N_f'],
    life: ['N_f'],
  },
  diagrams: [
    {
      kind: 'weld-sn',
      title: 'S-N diagram of the welded detail',
      draw: (c, o) => (c.weldSn && c.weldSn.length > 0 ? weldSnDiagram(c.weldSn, o) : null),
    },
  ],
  snippet: {
    label: 'fatigue check: welded detail',
    body: () => [
      '```fatigue ${1:check_id}',
      'title: ${2:what is checked}',
      'method: weld',
      'standard: ${3|en-1993-1-9,iiw-2016,iiw-2008|}',
      'delta_sigma_C = ${4:detail class} MPa',
      'delta_sigma = ${5:stress range} MPa',
      'N = ${6:required cycles}',
      'require: u_fat <= 1',
      '```',
      '$0',
    ],
  },
  templates: [
    {
      kind: 'weld',
      label: 'Welded detail (detail class, EN 1993-1-9 or IIW)',
      detail: 'a nominal stress range or spectrum on a detail class: damage, equivalent range, utilisation',
      idStem: 'weld',
      body: (u) => [
        'method: weld',
        'standard: ${3|en-1993-1-9,iiw-2016,iiw-2008|}',
        '# the class of the detail at 2e6 cycles, or detail: from the catalogue',
        `delta_sigma_C = \${4:?} ${u.stress}`,
        `t = \${5:?} ${u.length}`,
        `Sy = \${6:?} ${u.stress}`,
        'gamma_Ff = ${7:1.0}',
        'assessment: ${8|safe-life,damage-tolerant|}',
        'consequence: ${9|high,low|}',
        '# one line per stress-range level (the largest range of each band)',
        `spectrum: delta_sigma = \${10:?} ${u.stress}, n = \${11:?}`,
        'require: u_fat <= 1',
      ],
    },
  ],
  defaultedOptions: {
    'stress-type': (c) => c.values.delta_sigma_C !== undefined,
    assessment: (c) => c.values.gamma_Mf !== undefined && c.values.gamma_Mf.origin !== 'stated',
    consequence: (c) => c.values.gamma_Mf !== undefined && c.values.gamma_Mf.origin !== 'stated',
    'normal-shear': (c) => c.values.u_tau !== undefined,
  },
};
