// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/**
 * Templates of new checks, one per method, in the block language of the contract. Inputs
 * the engineer must supply are left as `?` placeholders (an error until filled), never as
 * made-up numbers.
 */
export type TemplateKind = 'stress-life' | 'finite-life' | 'damage' | 'crack-growth';

export interface TemplateChoice {
  kind: TemplateKind;
  label: string;
  detail: string;
  idStem: string;
}

export const TEMPLATE_CHOICES: TemplateChoice[] = [
  {
    kind: 'stress-life',
    label: 'Stress-life, infinite life',
    detail: 'Marin factors, notch, loads, a mean-stress criterion, n_f and n_y',
    idStem: 'section',
  },
  {
    kind: 'finite-life',
    label: 'Stress-life, finite life',
    detail: 'Basquin S-N line, fatigue strength at a required number of cycles N',
    idStem: 'finite_life',
  },
  {
    kind: 'damage',
    label: 'Variable amplitude (Palmgren-Miner damage)',
    detail: 'a load spectrum or a rainflow-counted history, damage D and repeats',
    idStem: 'damage',
  },
  {
    kind: 'crack-growth',
    label: 'Crack growth (Paris law)',
    detail: 'cycles from an initial to a critical crack, inspection interval',
    idStem: 'crack',
  },
];

interface Units {
  stress: string;
  length: string;
  moment: string;
  force: string;
  temp: string;
  toughness: string;
}

const SI: Units = {
  stress: 'MPa',
  length: 'mm',
  moment: 'N*m',
  force: 'N',
  temp: 'degC',
  toughness: 'MPa*m^0.5',
};
const US: Units = {
  stress: 'ksi',
  length: 'in',
  moment: 'lbf*in',
  force: 'lbf',
  temp: 'degF',
  toughness: 'ksi*in^0.5',
};

/** A fresh id: the stem with the first number not used by a check of the note. */
export function freshId(noteText: string, stem: string): string {
  const used = new Set<string>();
  for (const m of noteText.matchAll(/^\s*(?:>\s*)*(?:`{3,}|~{3,})\s*fatigue\s+([A-Za-z_][A-Za-z0-9_]*)/gm))
    used.add(m[1]);
  for (let i = 1; ; i++) if (!used.has(`${stem}_${i}`)) return `${stem}_${i}`;
}

/** The check as a VS Code snippet (tab stops, choices); `?` marks what must be filled in. */
export function templateSnippet(kind: TemplateKind, id: string, system: 'SI' | 'US'): string {
  const u = system === 'US' ? US : SI;
  const head = [`\`\`\`fatigue \${1:${id}}`, `title: \${2:what is checked, and where}`];
  const material = [
    `Sut = \${3:?} ${u.stress}`,
    `Sy = \${4:?} ${u.stress}`,
    'surface: ${5|machined,ground,cold-drawn,hot-rolled,as-forged|}',
    'rotation: ${6|rotating,non-rotating|}',
    `temp = \${7:?} ${u.temp}`,
    'reliability = ${8:0.99}',
  ];
  const section = [
    `d = \${9:?} ${u.length}`,
    `D = \${10:?} ${u.length}`,
    `r = \${11:?} ${u.length}`,
    'feature: ${12|shoulder-fillet,groove,cross-hole,none|}',
  ];
  const loads = [
    `M_max = \${13:?} ${u.moment}`,
    `M_min = \${14:?} ${u.moment}`,
    `T_max = \${15:?} ${u.moment}`,
    `T_min = \${16:?} ${u.moment}`,
  ];
  let body: string[];
  switch (kind) {
    case 'stress-life':
      body = [
        ...material,
        ...section,
        ...loads,
        'criterion: ${17|goodman,gerber,soderberg,asme-elliptic|}',
        'require: n_f >= ${18:?}, n_y >= ${19:?}',
      ];
      break;
    case 'finite-life':
      body = [
        ...material,
        ...section,
        ...loads,
        'N = ${17:?}',
        'criterion: ${18|goodman,gerber,soderberg,asme-elliptic,morrow,swt,walker|}',
        'require: n_f >= ${19:?}',
      ];
      break;
    case 'damage':
      body = [
        'method: damage',
        ...material,
        ...section,
        'criterion: ${13|goodman,gerber,soderberg,asme-elliptic|}',
        'miner: ${14|original,elementary,haibach|}',
        '# one line per load level; or history: loads/FILE.csv with history-column: and history-load:',
        `spectrum: M_a = \${15:?} ${u.moment}, M_m = \${16:?} ${u.moment}, n = \${17:?}`,
        'require: D <= ${18:?}',
      ];
      break;
    case 'crack-growth':
      body = [
        'method: crack-growth',
        `# Paris law da/dN = C_paris * delta_K^m_paris (C for m/cycle and ${SI.toughness} unless paris-units: inch)`,
        'C_paris = ${3:?}',
        'm_paris = ${4:?}',
        'Y = ${5:?}',
        `a_i = \${6:?} ${u.length}`,
        `K_IC = \${7:?} ${u.toughness}`,
        `sigma_max = \${8:?} ${u.stress}`,
        `sigma_min = \${9:?} ${u.stress}`,
        'inspection_factor = ${10:2}',
        'require: N_insp >= ${11:?}',
      ];
      break;
  }
  return [...head, ...body, '```', '$0'].join('\n');
}
