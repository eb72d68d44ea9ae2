/**
 * The words of the block language: reserved input names with their dimension and meaning,
 * result names, and option keys with their values. Completion, hover, diagnostics and the
 * docs all read this one table.
 */
import { FAMILIES, FAMILY_WORDS } from '../materials/families';
import type { DimKey } from '../units/dimensions';

export interface NameInfo {
  dim: DimKey;
  meaning: string;
}

/**
 * A table without `Object.prototype` behind it: `name in TABLE` and `TABLE[name]` answer for
 * the table's own words only, never for `constructor`, `__proto__` or `toString` (a note is
 * untrusted input, issue 7).
 */
function ownWords<T>(table: Record<string, T>): Record<string, T> {
  return Object.assign(Object.create(null) as Record<string, T>, table);
}

export const INPUT_NAMES: Record<string, NameInfo> = ownWords({
  Sut: { dim: 'stress', meaning: 'ultimate tensile strength' },
  Sy: { dim: 'stress', meaning: 'tensile yield strength' },
  Se_prime: { dim: 'stress', meaning: 'endurance limit of the polished rotating-beam specimen' },
  Sf_ref: {
    dim: 'stress',
    meaning:
      'fatigue strength of the rotating-beam specimen at the reference life N_ref (no endurance limit)',
  },
  N_ref: { dim: 'one', meaning: 'reference life of Sf_ref, in cycles (e.g. 5e8 for aluminium tables)' },
  f: { dim: 'one', meaning: 'fatigue strength fraction at 10^3 cycles' },
  sigma_f_prime: { dim: 'stress', meaning: 'Basquin fatigue strength coefficient' },
  b_basquin: { dim: 'one', meaning: 'Basquin exponent (negative)' },
  gamma_walker: { dim: 'one', meaning: 'Walker mean-stress exponent' },
  ka: { dim: 'one', meaning: 'surface factor' },
  kb: { dim: 'one', meaning: 'size factor' },
  kc: { dim: 'one', meaning: 'load factor' },
  kd: { dim: 'one', meaning: 'temperature factor' },
  ke: { dim: 'one', meaning: 'reliability factor' },
  kmisc: { dim: 'one', meaning: 'miscellaneous-effects factor' },
  temp: { dim: 'temperature', meaning: 'operating temperature' },
  reliability: { dim: 'one', meaning: 'required reliability' },
  d: { dim: 'length', meaning: 'diameter at the checked section' },
  D: { dim: 'length', meaning: 'larger diameter at a shoulder or groove' },
  r: { dim: 'length', meaning: 'notch root radius' },
  d_hole: { dim: 'length', meaning: 'diameter of the transverse or plate hole' },
  W: { dim: 'length', meaning: 'plate width' },
  t: { dim: 'length', meaning: 'plate or wall thickness' },
  Kt: { dim: 'one', meaning: 'elastic stress concentration, bending (shell cutout: on the hoop stress)' },
  Kts: { dim: 'one', meaning: 'elastic stress concentration, torsion' },
  Kt_ax: { dim: 'one', meaning: 'elastic stress concentration, axial' },
  q: { dim: 'one', meaning: 'notch sensitivity, normal stress' },
  qs: { dim: 'one', meaning: 'notch sensitivity, shear stress' },
  Kf: { dim: 'one', meaning: 'fatigue stress concentration, bending' },
  Kfs: { dim: 'one', meaning: 'fatigue stress concentration, torsion' },
  Kf_ax: { dim: 'one', meaning: 'fatigue stress concentration, axial' },
  M_max: { dim: 'moment', meaning: 'largest bending moment of the cycle' },
  M_min: { dim: 'moment', meaning: 'smallest bending moment of the cycle' },
  M_a: { dim: 'moment', meaning: 'bending moment amplitude' },
  M_m: { dim: 'moment', meaning: 'mean bending moment' },
  T_max: { dim: 'moment', meaning: 'largest torque of the cycle' },
  T_min: { dim: 'moment', meaning: 'smallest torque of the cycle' },
  T_a: { dim: 'moment', meaning: 'torque amplitude' },
  T_m: { dim: 'moment', meaning: 'mean torque' },
  F_max: { dim: 'force', meaning: 'largest axial force of the cycle' },
  F_min: { dim: 'force', meaning: 'smallest axial force of the cycle' },
  F_a: { dim: 'force', meaning: 'axial force amplitude' },
  F_m: { dim: 'force', meaning: 'mean axial force' },
  sigma_a: { dim: 'stress', meaning: 'nominal bending (normal) stress amplitude' },
  sigma_m: { dim: 'stress', meaning: 'nominal bending (normal) mean stress' },
  sigma_ax_a: { dim: 'stress', meaning: 'nominal axial stress amplitude' },
  sigma_ax_m: { dim: 'stress', meaning: 'nominal axial mean stress' },
  tau_a: { dim: 'stress', meaning: 'nominal shear stress amplitude' },
  tau_m: { dim: 'stress', meaning: 'nominal mean shear stress' },
  p_max: { dim: 'stress', meaning: 'largest internal pressure of the cycle' },
  p_min: { dim: 'stress', meaning: 'smallest internal pressure of the cycle' },
  D_i: { dim: 'length', meaning: 'inner diameter of the shell' },
  w_c: { dim: 'length', meaning: 'cutout width along the circumference' },
  h_c: { dim: 'length', meaning: 'cutout height along the axis' },
  N: { dim: 'one', meaning: 'required life in cycles' },
  history_scale: { dim: 'other', meaning: 'physical value of 1.0 in the history file' },
  history_gate: { dim: 'other', meaning: 'reversals smaller than this range are dropped before counting' },
  C_paris: { dim: 'paris', meaning: 'Paris-law coefficient' },
  m_paris: { dim: 'one', meaning: 'Paris-law exponent' },
  Y: { dim: 'one', meaning: 'geometry factor of the crack' },
  a_i: { dim: 'length', meaning: 'initial crack size' },
  a_c: { dim: 'length', meaning: 'critical crack size' },
  K_IC: { dim: 'toughness', meaning: 'fracture toughness' },
  sigma_max: { dim: 'stress', meaning: 'largest stress of the cycle' },
  sigma_min: { dim: 'stress', meaning: 'smallest stress of the cycle' },
  inspection_factor: { dim: 'one', meaning: 'divisor from crack-growth life to inspection interval' },
});

export const RESULT_NAMES: Record<string, NameInfo> = ownWords({
  Se: { dim: 'stress', meaning: 'corrected endurance limit (Marin)' },
  S_ref: { dim: 'stress', meaning: 'corrected fatigue strength at the reference life (no endurance limit)' },
  Sse: { dim: 'stress', meaning: 'corrected torsional endurance limit' },
  Ssu: { dim: 'stress', meaning: 'ultimate shear strength (0.67 Sut)' },
  sigma_a_eq: { dim: 'stress', meaning: 'von Mises equivalent alternating stress' },
  sigma_m_eq: { dim: 'stress', meaning: 'von Mises equivalent mean stress (signed)' },
  sigma_max_eq: { dim: 'stress', meaning: 'von Mises stress of the peak state' },
  tau_a_eq: { dim: 'stress', meaning: 'alternating shear stress at the notch' },
  tau_m_eq: { dim: 'stress', meaning: 'mean shear stress at the notch' },
  sigma_hoop_a: { dim: 'stress', meaning: 'hoop stress amplitude' },
  sigma_hoop_m: { dim: 'stress', meaning: 'mean hoop stress' },
  sigma_long_a: { dim: 'stress', meaning: 'longitudinal stress amplitude' },
  sigma_long_m: { dim: 'stress', meaning: 'mean longitudinal stress' },
  beta_shell: {
    dim: 'one',
    meaning:
      'shell parameter of an opening: its half-size against sqrt(R t) (flat-plate Kt holds for small values)',
  },
  Kfm: { dim: 'one', meaning: 'fatigue stress concentration on the mean stress, bending' },
  Kfsm: { dim: 'one', meaning: 'fatigue stress concentration on the mean stress, torsion' },
  Kf_axm: { dim: 'one', meaning: 'fatigue stress concentration on the mean stress, axial' },
  sigma_ar: { dim: 'stress', meaning: 'equivalent fully reversed stress of the chosen criterion' },
  n_f: { dim: 'one', meaning: 'fatigue safety factor (chosen criterion and load line)' },
  n_f_goodman: { dim: 'one', meaning: 'fatigue safety factor, Goodman' },
  n_f_gerber: { dim: 'one', meaning: 'fatigue safety factor, Gerber' },
  n_f_soderberg: { dim: 'one', meaning: 'fatigue safety factor, Soderberg' },
  n_f_asme: { dim: 'one', meaning: 'fatigue safety factor, ASME elliptic' },
  n_y: { dim: 'one', meaning: 'first-cycle yield safety factor (Langer)' },
  S_f: { dim: 'stress', meaning: 'fatigue strength at the required life N' },
  N_f: { dim: 'one', meaning: 'predicted cycles to failure' },
  D_sum: { dim: 'one', meaning: 'Miner damage sum of one pass of the history or spectrum (old name D)' },
  repeats: { dim: 'one', meaning: 'passes of the history or spectrum to failure (1/D_sum)' },
  N_eq: { dim: 'one', meaning: 'equivalent number of cycles at the largest level' },
  N_cg: { dim: 'one', meaning: 'crack-growth cycles from a_i to a_c' },
  N_insp: { dim: 'one', meaning: 'inspection interval in cycles' },
  cycles_counted: { dim: 'one', meaning: 'cycles counted in one pass of the history' },
});

/**
 * Results of one extreme fibre of a section bent by a moment (checks/criticalPoints.ts):
 * `_pos` at +M c/I (the fibre a positive moment puts in tension), `_neg` at -M c/I. The plain
 * names hold the governing fibre's value.
 */
export const POINT_RESULT_BASES = [
  'sigma_a_eq',
  'sigma_m_eq',
  'sigma_max_eq',
  'n_y',
  'n_f',
  'sigma_ar',
  'N_f',
  'D_sum',
] as const;
const POINT_WORDS = {
  pos: 'at the extreme fibre at +M c/I (a positive moment puts it in tension)',
  neg: 'at the extreme fibre at -M c/I (a positive moment puts it in compression)',
};
for (const base of POINT_RESULT_BASES)
  for (const [k, words] of Object.entries(POINT_WORDS))
    RESULT_NAMES[`${base}_${k}`] = {
      dim: RESULT_NAMES[base].dim,
      meaning: `${RESULT_NAMES[base].meaning}, ${words}`,
    };

export interface OptionInfo {
  meaning: string;
  /** Allowed words with their meanings; absent for free text or library keys. */
  values?: Record<string, string>;
  default?: string;
}

const OPTION_TABLE: Record<string, OptionInfo> = {
  title: { meaning: 'title of the check (free text)' },
  material: { meaning: 'a key of the material library (strengths, class, source)' },
  'material-family': {
    meaning:
      'what the material is when its strengths are stated without a library key: decides the endurance route and the notch-sensitivity data',
    values: Object.fromEntries(FAMILY_WORDS.map((w) => [w, FAMILIES[w].meaning])),
  },
  surface: {
    meaning: 'surface finish at the checked section, for the surface factor ka',
    values: {
      ground: 'ground surface (Marin a = 1.58 MPa, b = -0.085)',
      machined: 'machined surface (a = 4.51 MPa, b = -0.265)',
      'cold-drawn': 'cold-drawn surface (as machined: a = 4.51 MPa, b = -0.265)',
      'hot-rolled': 'hot-rolled surface (a = 57.7 MPa, b = -0.718)',
      'as-forged': 'as-forged surface (a = 272 MPa, b = -0.995)',
    },
  },
  rotation: {
    meaning: 'whether the section rotates under the bending moment (size factor)',
    values: {
      rotating: 'rotating round section: kb from d directly',
      'non-rotating': 'non-rotating round section: kb from the equivalent diameter 0.370 d',
    },
    default: 'rotating',
  },
  feature: {
    meaning: 'the stress raiser at the checked section (stress-concentration fit)',
    values: {
      'shoulder-fillet': 'shoulder fillet between diameters D and d, radius r',
      groove: 'U-shaped circumferential groove, root diameter d, radius r, outer D',
      'cross-hole': 'transverse hole d_hole through a round shaft d',
      'plate-hole': 'central hole d_hole in a plate of width W and thickness t (axial)',
      'shell-cutout': 'elliptical or circular opening w_c by h_c in a pressurised shell',
      none: 'no stress raiser: Kt = 1',
    },
  },
  shell: {
    meaning: 'thin-walled pressure shell type',
    values: {
      cylinder: 'cylinder: hoop p D_i/(2t), long p D_i/(4t)',
      sphere: 'sphere: p D_i/(4t) both ways',
    },
  },
  criterion: {
    meaning: 'mean-stress criterion for the safety factor and the equivalent reversed stress',
    values: {
      goodman: 'modified Goodman line from Se to Sut',
      gerber: 'Gerber parabola from Se to Sut',
      soderberg: 'Soderberg line from Se to Sy',
      'asme-elliptic': 'ASME elliptic quadrant from Se to Sy',
      morrow: 'Morrow: mean stress against the true fracture strength sigma_f_prime',
      swt: 'Smith-Watson-Topper: sqrt(sigma_max * sigma_a)',
      walker: 'Walker: sigma_max^(1-gamma) * sigma_a^gamma',
    },
    default: 'goodman',
  },
  'load-line': {
    meaning: 'how the loads grow towards failure on the Haigh diagram',
    values: {
      proportional: 'amplitude and mean grow together (fixed stress ratio)',
      'constant-mean': 'only the amplitude grows; the mean stays (e.g. preload, dead weight)',
      'constant-amplitude': 'only the mean grows; the amplitude stays',
    },
    default: 'proportional',
  },
  'notch-sensitivity': {
    meaning: 'notch-sensitivity model for q',
    values: {
      neuber: 'Neuber: q = 1/(1 + sqrt(a)/sqrt(r))',
      peterson: 'Peterson: q = 1/(1 + a/r)',
    },
    default: 'neuber',
  },
  'mean-concentration': {
    meaning: 'how the notch acts on the mean stress',
    values: {
      full: 'the fatigue concentration Kf acts on the mean stress too (conservative)',
      'local-yield': 'Kfm reduced where the notch root yields on the first cycle',
    },
    default: 'full',
  },
  method: {
    meaning: 'what the check computes',
    // One word per registered method, declared by the registry (methods/registry.ts).
    values: {},
  },
  miner: {
    meaning: 'how cycles below the knee of the S-N line count',
    values: {
      original: 'cycles below Se do no damage',
      elementary: 'the S-N line continued below Se',
      haibach: 'slope 2k - 1 below the knee',
    },
    default: 'original',
  },
  history: { meaning: 'CSV load history, relative to the note, inside the workspace' },
  'history-column': { meaning: 'column of the history: a header name or a 1-based index' },
  'history-load': {
    meaning: 'which load the history column is',
    values: {
      bending: 'bending moment',
      torsion: 'torque',
      axial: 'axial force',
      pressure: 'internal pressure of the shell',
      stress: 'nominal normal stress',
    },
  },
  'paris-units': {
    meaning: 'units of C_paris',
    values: {
      metre: 'da/dN in m/cycle with delta K in MPa*m^0.5',
      inch: 'da/dN in in/cycle with delta K in ksi*in^0.5',
    },
    default: 'metre',
  },
  'crack-geometry': {
    meaning: 'geometry factor of the crack',
    values: {
      constant: 'Y as stated',
      'centre-crack': 'centre crack of total length 2a in a plate of width W (Feddersen secant)',
      'edge-crack': 'single edge crack of depth a in a plate of width W (Tada polynomial)',
    },
    default: 'constant',
  },
};

/** An option whose allowed words are a prototype-free table too. */
function ownOptions(table: Record<string, OptionInfo>): Record<string, OptionInfo> {
  return Object.fromEntries(
    Object.entries(table).map(([k, v]) => [k, v.values ? { ...v, values: ownWords(v.values) } : v]),
  );
}

export const OPTIONS: Record<string, OptionInfo> = ownWords(ownOptions(OPTION_TABLE));

/**
 * Declares a word of `method:` (the registry of methods calls it for each method it lists,
 * the first as the default); returns a function that withdraws it.
 */
export function declareMethodWord(name: string, meaning: string, isDefault: boolean): () => void {
  const option = OPTIONS.method;
  const values = option.values ?? ownWords({});
  option.values = values;
  values[name] = meaning;
  if (isDefault) option.default = name;
  return () => {
    delete values[name];
    if (option.default === name) option.default = undefined;
  };
}

/** The words a method declares beside the shared ones (`MethodModule.words`). */
export interface MethodWords {
  inputs?: Record<string, NameInfo>;
  results?: Record<string, NameInfo>;
  options?: Record<string, OptionInfo>;
  /** Of its inputs and results, those that must be strictly positive. */
  positive?: readonly string[];
  /**
   * Results it renamed, old name -> new name: a note that uses the old name (in `require:` or
   * as `check_id.old`) still evaluates, with a `renamed-result` hint that offers the new one.
   */
  renamed?: Readonly<Record<string, string>>;
}

/** Each method's own words, and for a word no shared table has, the methods that declare it. */
const METHOD_WORDS = new Map<string, MethodWords>();
const OWNERS = new Map<string, Set<string>>();

/**
 * Declares a method's own words (the registry calls it for each method); returns a function
 * that withdraws them. A word the shared tables already have keeps its shared meaning
 * everywhere but in the method's own checks; a new word belongs to the methods that declare
 * it, and a check of another method that states it is told so (`wordOwners`).
 */
export function declareMethodWords(words: MethodWords | undefined, method?: string): () => void {
  if (!words) return () => {};
  const added: Array<() => void> = [];
  if (method) {
    METHOD_WORDS.set(method, words);
    added.push(() => METHOD_WORDS.delete(method));
  }
  const own = (k: string) => {
    if (!method) return;
    const set = OWNERS.get(k) ?? new Set<string>();
    OWNERS.set(k, set);
    set.add(method);
    added.push(() => {
      set.delete(method);
      if (set.size === 0) OWNERS.delete(k);
    });
  };
  const put = <T>(table: Record<string, T>, entries: Record<string, T> | undefined) => {
    for (const [k, v] of Object.entries(entries ?? {})) {
      if (k in table) {
        if (OWNERS.has(k)) own(k);
        continue;
      }
      own(k);
      table[k] = v;
      added.push(() => {
        // Still this method's word here; another method that declares it keeps it.
        if ((OWNERS.get(k)?.size ?? 0) <= 1) delete table[k];
      });
    }
  };
  put(INPUT_NAMES, words.inputs);
  put(RESULT_NAMES, words.results);
  put(OPTIONS, ownOptions(words.options ?? {}));
  // An option key two methods declare accepts the words of both (each check's hover and
  // completion show its own method's, `optionInfo`).
  for (const [k, o] of Object.entries(words.options ?? {})) {
    const shared = OPTIONS[k];
    if (!o.values || !shared?.values || shared === o || !OWNERS.get(k)?.has(method ?? '')) continue;
    for (const [w, meaning] of Object.entries(o.values))
      if (!Object.hasOwn(shared.values, w)) {
        const values = shared.values;
        values[w] = meaning;
        added.push(() => delete values[w]);
      }
  }
  for (const n of words.positive ?? [])
    if (!POSITIVE.has(n)) {
      POSITIVE.add(n);
      added.push(() => POSITIVE.delete(n));
    }
  return () => {
    for (const undo of added.reverse()) undo();
  };
}

/** A name's meaning; in a check of `method`, the method's own meaning first. */
export function nameInfo(name: string, method?: string): NameInfo | undefined {
  const own = method ? METHOD_WORDS.get(method) : undefined;
  const mine = own && (ownEntry(own.inputs, name) ?? ownEntry(own.results, name));
  return mine ?? INPUT_NAMES[name] ?? RESULT_NAMES[name];
}

/** An option's meaning; in a check of `method`, the method's own meaning first. */
export function optionInfo(key: string, method?: string): OptionInfo | undefined {
  const own = method ? METHOD_WORDS.get(method) : undefined;
  return (own && ownEntry(own.options, key)) ?? (Object.hasOwn(OPTIONS, key) ? OPTIONS[key] : undefined);
}

function ownEntry<T>(table: Record<string, T> | undefined, key: string): T | undefined {
  return table && Object.hasOwn(table, key) ? table[key] : undefined;
}

/**
 * The methods whose own word `name` is (input, result or option key), or undefined for a
 * shared word and for a word no method declares: a check of another method does not read it.
 */
export function wordOwners(name: string): readonly string[] | undefined {
  const set = OWNERS.get(name);
  return set && set.size > 0 ? [...set] : undefined;
}

/** Levenshtein distance, for "did you mean" suggestions. */
export function editDistance(a: string, b: string): number {
  const m = a.length;
  const n = b.length;
  if (m === 0) return n;
  if (n === 0) return m;
  let prev = new Array<number>(n + 1);
  let cur = new Array<number>(n + 1);
  for (let j = 0; j <= n; j++) prev[j] = j;
  for (let i = 1; i <= m; i++) {
    cur[0] = i;
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1].toLowerCase() === b[j - 1].toLowerCase() ? 0 : 1;
      cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, cur] = [cur, prev];
  }
  return prev[n];
}

export function nearest(word: string, choices: readonly string[], max = 3): string | undefined {
  let best: string | undefined;
  let bestD = Number.POSITIVE_INFINITY;
  for (const c of choices) {
    const d = editDistance(word, c);
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  return bestD <= Math.max(max, Math.floor(word.length / 2)) ? best : undefined;
}

/** Plausible magnitudes by dimension (SI): outside them a stated value is an input error, not a design. */
export const MAGNITUDE: Partial<Record<DimKey, { min: number; max: number; label: string }>> = {
  length: { min: 1e-7, max: 1e4, label: 'between 0.1 um and 10 km' },
  stress: { min: 0, max: 1e12, label: 'below 1e6 MPa' },
  force: { min: 0, max: 1e12, label: 'below 1e12 N' },
  moment: { min: 0, max: 1e12, label: 'below 1e12 N*m' },
  temperature: { min: 0, max: 3000, label: 'between 0 K and 3000 K' },
  toughness: { min: 0, max: 1e12, label: 'below 1e6 MPa*m^0.5' },
  one: { min: 0, max: 1e15, label: 'below 1e15' },
};

/** Names that must be strictly positive (a zero or negative value is an input error). */
export const POSITIVE = new Set([
  'Sut',
  'Sy',
  'Se_prime',
  'Se',
  'Sf_ref',
  'S_ref',
  'N_ref',
  'sigma_f_prime',
  'f',
  'ka',
  'kb',
  'kc',
  'kd',
  'ke',
  'kmisc',
  'reliability',
  'd',
  'D',
  'r',
  'd_hole',
  'W',
  't',
  'D_i',
  'w_c',
  'h_c',
  'Kt',
  'Kts',
  'Kt_ax',
  'Kf',
  'Kfs',
  'Kf_ax',
  'N',
  'C_paris',
  'm_paris',
  'Y',
  'a_i',
  'a_c',
  'K_IC',
  'inspection_factor',
  'q',
  'qs',
]);
