/**
 * The material library: published strengths and moduli of common engineering materials,
 * keyed by a kebab-case name that calc notes use in `material: KEY`.
 *
 * All values in SI base units (Pa, Pa*m^0.5). Each entry names the publication its
 * numbers come from. Minimum (specification) and typical (mean) values are not mixed
 * silently: the `source` text says which kind a value is.
 *
 * Materials without an endurance limit (aluminium, titanium) carry `enduranceLimit: false`
 * and a rotating-beam fatigue strength `Sf_ref` at `N_ref` cycles instead.
 */

/**
 * The class of a material: one per family of `material-family:` (see `families.ts`). It decides
 * the endurance estimate, whether an endurance limit exists, and the notch-sensitivity data.
 * `aluminium` is the wrought aluminium alloys.
 */
export type MaterialClass =
  | 'steel'
  | 'stainless'
  | 'cast-iron'
  | 'aluminium'
  | 'aluminium-cast'
  | 'titanium'
  | 'copper'
  | 'magnesium';

export interface Material {
  /** Kebab-case library key, e.g. `aisi-1045-cd`. */
  key: string;
  name: string;
  class: MaterialClass;
  /** Processing or heat-treatment condition, e.g. `cold drawn`. */
  condition: string;
  /** Ultimate tensile strength, Pa. */
  Sut: number;
  /** Yield strength (0.2 % offset where the source gives it), Pa. */
  Sy: number;
  /** Young's modulus, Pa. */
  E: number;
  /** Whether the material shows a fatigue (endurance) limit. */
  enduranceLimit: boolean;
  /** Rotating-beam fatigue strength for materials without an endurance limit, Pa. */
  Sf_ref?: number;
  /** Cycle count of `Sf_ref`, e.g. 5e8. */
  N_ref?: number;
  /** Plane-strain fracture toughness, Pa*m^0.5, where published. */
  K_IC?: number;
  /** Publication of the values. */
  source: string;
  /**
   * Cyclic stress-strain and strain-life constants (local strain approach), only where a
   * publication gives them for this very condition; their own `source` says which numbers were
   * looked up and which are from memory.
   */
  cyclic?: CyclicProperties;
}

/** Cyclic curve eps = sigma/E + (sigma/K')^(1/n') and strain-life curve eps_a = (sigma_f'/E)(2N)^b + eps_f'(2N)^c; SI. */
export interface CyclicProperties {
  /** Modulus of the strain-life data, Pa. */
  E: number;
  /** Cyclic strength coefficient K' (H' in Dowling), Pa. */
  K_prime: number;
  n_prime: number;
  /** Fatigue strength coefficient, Pa. */
  sigma_f_prime: number;
  b: number;
  eps_f_prime: number;
  c: number;
  source: string;
}

const MPa = 1e6;
const GPa = 1e9;

const SHIGLEY_A20 =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., Table A-20 (ASTM minimum strengths, source 1986 SAE Handbook p. 2.15)";
const SHIGLEY_A5_STEEL =
  "E: Budynas & Nisbett, Shigley's Mechanical Engineering Design, Table A-5 (carbon steel 207 GPa)";
const PHILPOT_D1B =
  'Philpot, Mechanics of Materials: An Integrated Learning System, 4th ed. (Wiley 2017), Table D.1b (average properties)';
const EFUNDA_4140 = 'eFunda alloy steel data, AISI 4140 oil quenched (fine grained) and tempered';
const AA_TYPICAL =
  'Aluminum Association typical properties (fatigue endurance limit at 5e8 cycles, R.R. Moore rotating beam; E average of tension and compression), as tabulated in Kutz, Handbook of Materials Selection, Ch. 4 Table 5 and in the AA typical-property table reproduced by Aerodynamic Metals';

const DOWLING_9_1 =
  "Dowling, Mechanical Behavior of Materials, 4th ed., Pearson 2013, Table 9.1 (yield, ultimate, sigma_f', b; tests at zero mean stress on unnotched axial specimens)";
const DOWLING_14_1_MEMORY =
  "Dowling, Mechanical Behavior of Materials, 4th ed., Table 14.1 (E, eps_f', c, H' = K', n'; from memory, not looked up)";

function material(m: Material): Material {
  if (m.cyclic) Object.freeze(m.cyclic);
  return Object.freeze(m);
}

export const MATERIALS: readonly Material[] = Object.freeze([
  // Carbon steels: Table A-20 gives ASTM minimum tensile and yield strengths (size range 18 to 32 mm).
  material({
    key: 'aisi-1018-cd',
    name: 'AISI 1018 carbon steel',
    class: 'steel',
    condition: 'cold drawn',
    Sut: 440 * MPa,
    Sy: 370 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1020-hr',
    name: 'AISI 1020 carbon steel',
    class: 'steel',
    condition: 'hot rolled',
    Sut: 380 * MPa,
    Sy: 210 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1020-cd',
    name: 'AISI 1020 carbon steel',
    class: 'steel',
    condition: 'cold drawn',
    Sut: 470 * MPa,
    Sy: 390 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1035-hr',
    name: 'AISI 1035 carbon steel',
    class: 'steel',
    condition: 'hot rolled',
    Sut: 500 * MPa,
    Sy: 270 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1045-cd',
    name: 'AISI 1045 carbon steel',
    class: 'steel',
    condition: 'cold drawn',
    Sut: 630 * MPa,
    Sy: 530 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1050-hr',
    name: 'AISI 1050 carbon steel',
    class: 'steel',
    condition: 'hot rolled',
    Sut: 620 * MPa,
    Sy: 340 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1050-cd',
    name: 'AISI 1050 carbon steel',
    class: 'steel',
    condition: 'cold drawn',
    Sut: 690 * MPa,
    Sy: 580 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-1095-hr',
    name: 'AISI 1095 carbon steel',
    class: 'steel',
    condition: 'hot rolled',
    Sut: 830 * MPa,
    Sy: 460 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${SHIGLEY_A20}; ${SHIGLEY_A5_STEEL}`,
  }),
  // Alloy steels, quenched and tempered (mean values).
  material({
    key: 'aisi-4140-qt425',
    name: 'AISI 4140 Cr-Mo alloy steel',
    class: 'steel',
    condition: 'oil quenched, tempered at 425 degC (800 degF)',
    Sut: 1248 * MPa,
    Sy: 1138 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${EFUNDA_4140} at 425 degC (1248 / 1138 MPa; Budynas & Nisbett Table A-21 lists 1250 / 1140 MPa, from memory); ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-4140-qt540',
    name: 'AISI 4140 Cr-Mo alloy steel',
    class: 'steel',
    condition: 'oil quenched, tempered at 540 degC (1000 degF)',
    Sut: 951 * MPa,
    Sy: 834 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${EFUNDA_4140} at 540 degC (951 / 834 MPa); ${SHIGLEY_A5_STEEL}`,
  }),
  material({
    key: 'aisi-4340-qt650',
    name: 'AISI 4340 Ni-Cr-Mo alloy steel',
    class: 'steel',
    condition: 'oil quenched from 800 degC, tempered at 650 degC (1200 degF), 50 mm round',
    Sut: 931 * MPa,
    Sy: 834 * MPa,
    E: 205 * GPa,
    enduranceLimit: true,
    source:
      'ASM / MatWeb data sheet "AISI 4340 Steel, oil quenched 800 degC, 650 degC temper, 50 mm round" (931 / 834 MPa, E 205 GPa typical for steel)',
  }),
  // Steels with published cyclic and strain-life constants (one tested heat each, typical values).
  material({
    key: 'aisi-4340-aircraft',
    name: 'AISI 4340 Ni-Cr-Mo alloy steel',
    class: 'steel',
    condition: 'aircraft quality, quenched and tempered',
    Sut: 1172 * MPa,
    Sy: 1103 * MPa,
    E: 207 * GPa,
    enduranceLimit: true,
    source: `${DOWLING_9_1}: AISI 4340 (aircraft quality) 1103 / 1172 MPa; E ${DOWLING_14_1_MEMORY}`,
    cyclic: {
      E: 207 * GPa,
      K_prime: 1655 * MPa,
      n_prime: 0.131,
      sigma_f_prime: 1758 * MPa,
      b: -0.0977,
      eps_f_prime: 2.12,
      c: -0.774,
      source: `sigma_f' = 1758 MPa, b = -0.0977: ${DOWLING_9_1}; E = 207 GPa, eps_f' = 2.12, c = -0.774, K' = 1655 MPa, n' = 0.131: ${DOWLING_14_1_MEMORY}`,
    },
  }),
  material({
    key: 'rqc-100',
    name: 'RQC-100 quenched and tempered steel plate',
    class: 'steel',
    condition: 'roller quenched and tempered',
    Sut: 758 * MPa,
    Sy: 683 * MPa,
    E: 200 * GPa,
    enduranceLimit: true,
    source: `${DOWLING_9_1}: RQC-100 (roller Q & T) 683 / 758 MPa; E ${DOWLING_14_1_MEMORY}`,
    cyclic: {
      E: 200 * GPa,
      K_prime: 903 * MPa,
      n_prime: 0.0905,
      sigma_f_prime: 938 * MPa,
      b: -0.0648,
      eps_f_prime: 1.38,
      c: -0.704,
      source: `sigma_f' = 938 MPa, b = -0.0648: ${DOWLING_9_1}; E = 200 GPa, eps_f' = 1.38, c = -0.704, K' = 903 MPa, n' = 0.0905: ${DOWLING_14_1_MEMORY}`,
    },
  }),
  // Structural steels (minimum specified values).
  material({
    key: 'astm-a36',
    name: 'ASTM A36 structural steel',
    class: 'steel',
    condition: 'as rolled (plates, shapes, bars)',
    Sut: 400 * MPa,
    Sy: 250 * MPa,
    E: 200 * GPa,
    enduranceLimit: true,
    source: `${PHILPOT_D1B}: structural steel ASTM A36`,
  }),
  material({
    key: 'astm-a992',
    name: 'ASTM A992 structural steel',
    class: 'steel',
    condition: 'as rolled (wide-flange shapes)',
    Sut: 450 * MPa,
    Sy: 345 * MPa,
    E: 200 * GPa,
    enduranceLimit: true,
    source: `${PHILPOT_D1B}: structural steel ASTM A992`,
  }),
  // Stainless.
  material({
    key: 'stainless-18-8-annealed',
    name: 'Austenitic stainless steel 18-8 (AISI 302/304 family)',
    class: 'stainless',
    condition: 'annealed',
    Sut: 586 * MPa,
    Sy: 248 * MPa,
    E: 193 * GPa,
    enduranceLimit: true,
    source: `${PHILPOT_D1B}: stainless (18-8) annealed`,
  }),
  // Aluminium alloys: no endurance limit; fatigue strength at 5e8 cycles.
  material({
    key: 'al-2024-t3',
    name: 'Aluminium alloy 2024',
    class: 'aluminium',
    condition: 'T3 (solution heat treated, cold worked, naturally aged)',
    Sut: 485 * MPa,
    Sy: 345 * MPa,
    E: 73 * GPa,
    enduranceLimit: false,
    Sf_ref: 140 * MPa,
    N_ref: 5e8,
    source: `${AA_TYPICAL}: 2024-T3 485 / 345 MPa (70 / 50 ksi), fatigue 140 MPa (20 ksi)`,
  }),
  material({
    key: 'al-6061-t6',
    name: 'Aluminium alloy 6061',
    class: 'aluminium',
    condition: 'T6 (solution heat treated, artificially aged)',
    Sut: 310 * MPa,
    Sy: 275 * MPa,
    E: 69 * GPa,
    enduranceLimit: false,
    Sf_ref: 95 * MPa,
    N_ref: 5e8,
    source: `${AA_TYPICAL}: 6061-T6 310 / 275 MPa (45 / 40 ksi), fatigue 95 MPa (14 ksi)`,
  }),
  material({
    key: 'al-7075-t6',
    name: 'Aluminium alloy 7075',
    class: 'aluminium',
    condition: 'T6 (solution heat treated, artificially aged)',
    Sut: 570 * MPa,
    Sy: 505 * MPa,
    E: 72 * GPa,
    enduranceLimit: false,
    Sf_ref: 160 * MPa,
    N_ref: 5e8,
    source: `${AA_TYPICAL}: 7075-T6 570 / 505 MPa (83 / 73 ksi), fatigue 160 MPa (23 ksi)`,
  }),
  // Titanium: no endurance limit in the stress-life sense used here; fatigue strength at 1e7.
  material({
    key: 'ti-6al-4v-annealed',
    name: 'Titanium alloy Ti-6Al-4V (Grade 5)',
    class: 'titanium',
    condition: 'mill annealed (700-785 degC)',
    Sut: 950 * MPa,
    Sy: 880 * MPa,
    E: 113.8 * GPa,
    enduranceLimit: false,
    Sf_ref: 510 * MPa,
    N_ref: 1e7,
    K_IC: 75 * MPa,
    source:
      'ASM / MatWeb data sheet "Titanium Ti-6Al-4V (Grade 5), Annealed" (data by Allvac): 950 / 880 MPa, E 113.8 GPa, unnotched fatigue strength 510 MPa at 1e7 cycles, K_IC 75 MPa*m^0.5',
  }),
  // Cast iron: ductile (nodular), so that a yield strength exists for first-cycle yield checks.
  material({
    key: 'ductile-iron-80-55-06',
    name: 'Ductile (nodular) cast iron ASTM A536 grade 80-55-06',
    class: 'cast-iron',
    condition: 'as cast',
    Sut: 552 * MPa,
    Sy: 379 * MPa,
    E: 168 * GPa,
    enduranceLimit: true,
    source: `${PHILPOT_D1B}: ductile cast iron ASTM A536 80-55-06 (minimum 552 / 379 MPa also in Callister, Fundamentals of Materials Science and Engineering, 3rd ed., Table B.4)`,
  }),
]);

function normaliseKey(key: string): string {
  return typeof key === 'string' ? key.trim().toLowerCase() : '';
}

/** The library entry with this key (case and surrounding blanks ignored), or undefined. */
export function findMaterial(key: string): Material | undefined {
  const k = normaliseKey(key);
  return MATERIALS.find((m) => m.key === k);
}

/** Levenshtein edit distance (insertions, deletions, substitutions each cost 1). */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Array<number>(b.length + 1);
  let curr = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    curr[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      curr[j] = Math.min(prev[j] + 1, curr[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, curr] = [curr, prev];
  }
  return prev[b.length];
}

/** Key without separators, so that `ti6al4v` and `ti-6al-4v` compare equal. */
function compact(key: string): string {
  return key.replace(/[-_\s]/g, '');
}

/**
 * Distance of a typed key to a library key: the Levenshtein distance, also taken without
 * separators and against the library key's leading part (plus 1), and 1 when the typed
 * text (two characters or more) occurs inside the key, so that partial keys such as
 * `ti6al4v` or `a36` rank their completions first.
 */
function keyDistance(typed: string, key: string): number {
  const t = compact(typed);
  const k = compact(key);
  if (t.length >= 2 && t !== k && k.includes(t)) return 1;
  const prefix = t.length < k.length ? editDistance(t, k.slice(0, t.length)) + 1 : Number.POSITIVE_INFINITY;
  return Math.min(editDistance(typed, key), editDistance(t, k), prefix);
}

/**
 * The `n` library keys closest to `key` (see `keyDistance`; ties in key order), for
 * "did you mean" suggestions. An unknown key never throws; `n <= 0` gives [].
 */
export function nearestMaterialKeys(key: string, n = 3): string[] {
  const count = Number.isFinite(n) ? Math.max(0, Math.floor(n)) : 0;
  if (count === 0) return [];
  const k = normaliseKey(key);
  return MATERIALS.map((m) => ({ key: m.key, d: keyDistance(k, m.key) }))
    .sort((x, y) => x.d - y.d || (x.key < y.key ? -1 : x.key > y.key ? 1 : 0))
    .slice(0, count)
    .map((e) => e.key);
}
