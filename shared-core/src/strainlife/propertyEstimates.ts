/**
 * Estimates of the strain-life constants (and, where the method gives none, the cyclic curve by
 * compatibility) when only monotonic properties are known. Every estimate carries a warning
 * that names it and its scatter: an estimate is a starting point for design, not test data.
 *
 * - Modified universal slopes (Muralidharan & Manson 1988), in ranges and cycles:
 *     Delta eps = 1.17 (Su/E)^0.832 N^-0.09 + 0.0266 D^0.155 (Su/E)^-0.53 N^-0.56,
 *   D = ln(1/(1 - RA)) the true fracture ductility. In amplitude and reversals:
 *     sigma_f' = (1.17/2) 2^0.09 E (Su/E)^0.832 = 0.623 E (Su/E)^0.832, b = -0.09,
 *     eps_f' = (0.0266/2) 2^0.56 D^0.155 (Su/E)^-0.53 = 0.0196 D^0.155 (Su/E)^-0.53, c = -0.56.
 *   U. Muralidharan & S. S. Manson, "A modified universal slopes equation for estimation of
 *   fatigue characteristics of metals", J. Eng. Mater. Technol. 110 (1988) 55-58.
 * - Uniform material law (Baumel & Seeger 1990): unalloyed and low-alloy steels
 *     sigma_f' = 1.5 Su, b = -0.087, eps_f' = 0.59 psi, c = -0.58, K' = 1.65 Su, n' = 0.15,
 *     psi = 1 for Su/E <= 0.003, else 1.375 - 125 Su/E;
 *   aluminium and titanium alloys
 *     sigma_f' = 1.67 Su, b = -0.095, eps_f' = 0.35, c = -0.69, K' = 1.61 Su, n' = 0.11.
 *   A. Baumel Jr. & T. Seeger, Materials Data for Cyclic Loading, Supplement 1, Elsevier 1990.
 * - Hardness method (Roessle & Fatemi 2000), steels, HB Brinell hardness, E and stresses in MPa:
 *     sigma_f' = 4.25 HB + 225, b = -0.09, eps_f' = (0.32 HB^2 - 487 HB + 191000)/E, c = -0.56.
 *   M. L. Roessle & A. Fatemi, "Strain-controlled fatigue properties of steels and some simple
 *   approximations", Int. J. Fatigue 22 (2000) 495-511.
 * - Compatibility of the cyclic curve with the strain-life curve: n' = b/c,
 *   K' = sigma_f' / eps_f'^n' (Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14, from
 *   memory for the section).
 *
 * The coefficients above are checked in the tests against the estimates published for one
 * steel in "Comparison of Fatigue Property Estimation Methods with Physical Test Data",
 * Metals 15 (2025) 780, Sec. 4 table (looked up): sigma_f', b, c of the modified universal
 * slopes, all four strain-life constants of the uniform material law's steel set, and sigma_f',
 * eps_f' of the hardness method. The rest is from memory: the universal-slopes ductility term,
 * psi, the law's K', n' and its aluminium and titanium set, the hardness range and Su = 3.45 HB.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA, type Term } from '../computed';
import type { CyclicCurve } from './cyclicCurve';
import type { StrainLifeConstants } from './strainLifeCurve';

/** The full set the local strain approach needs: cyclic curve and strain-life curve on one E. */
export type StrainLifeMaterial = CyclicCurve & StrainLifeConstants;

export type EstimateMethod = 'modified-universal-slopes' | 'uniform-material-law' | 'hardness';
export type EstimateClass = 'steel' | 'stainless' | 'cast-iron' | 'aluminium' | 'titanium';

export const MUS_SOURCE =
  'Muralidharan & Manson, J. Eng. Mater. Technol. 110 (1988) 55-58 (modified universal slopes), written in amplitudes and reversals';
export const UML_SOURCE =
  'Baumel & Seeger, Materials Data for Cyclic Loading, Supplement 1, Elsevier 1990 (uniform material law)';
export const HARDNESS_SOURCE =
  'Roessle & Fatemi, Int. J. Fatigue 22 (2000) 495-511 (hardness method for steels)';
export const COMPATIBILITY_SOURCE =
  "Compatibility of the cyclic and strain-life curves: n' = b/c, K' = sigma_f'/eps_f'^n' (Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14, from memory for the section)";

const SCATTER =
  'estimates from monotonic properties predict lives within a factor of about 3 for most steels and can be off by a factor of 10 or more, most at long lives (Park & Song, Int. J. Fatigue 17 (1995) 365-373; Roessle & Fatemi 2000; from memory for the factors)';

export interface EstimateInput {
  /** Ultimate tensile strength, Pa (modified universal slopes, uniform material law; hardness method when HB is missing). */
  Sut?: number;
  /** Young's modulus, Pa. */
  E: number;
  /** Reduction in area at fracture, as a fraction 0..1 (modified universal slopes). */
  RA?: number;
  /** Brinell hardness (hardness method). */
  HB?: number;
  /** Material class (the uniform material law has two sets; the hardness method is for steels). */
  materialClass: EstimateClass;
}

export interface EstimatedConstants {
  method: EstimateMethod;
  sigma_f_prime: Computed;
  b: Computed;
  eps_f_prime: Computed;
  c: Computed;
  K_prime: Computed;
  n_prime: Computed;
  /** The set for the local strain approach, or null when an error withholds it. */
  material: StrainLifeMaterial | null;
  /** All notes of the estimate (the named warning first). */
  notes: MethodNote[];
}

function fmt(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}

function estimateWarning(method: EstimateMethod): MethodNote {
  const name =
    method === 'modified-universal-slopes'
      ? 'the modified universal slopes (Muralidharan & Manson 1988)'
      : method === 'uniform-material-law'
        ? 'the uniform material law (Baumel & Seeger 1990)'
        : 'the hardness method (Roessle & Fatemi 2000)';
  return {
    code: 'cyclic-estimate',
    severity: 'warning',
    message: `Strain-life constants estimated by ${name}, not measured: ${SCATTER}. State measured constants where the part matters.`,
  };
}

function withheld(method: EstimateMethod, source: string, notes: MethodNote[]): EstimatedConstants {
  const z = (formula: string) => computed(0, formula, source, undefined, notes);
  return {
    method,
    sigma_f_prime: z("sigma_f'"),
    b: z('b'),
    eps_f_prime: z("eps_f'"),
    c: z('c'),
    K_prime: z("K'"),
    n_prime: z("n'"),
    material: null,
    notes,
  };
}

/** K', n' from the strain-life constants by compatibility. */
function compatible(sf: number, b: number, ef: number, c: number, inputs: Term[], notes: MethodNote[]) {
  const n = b / c;
  const K = sf / ef ** n;
  const terms: Term[] = [
    ...inputs,
    { name: "sigma_f'", value: sf / MPA, unit: 'MPa' },
    { name: 'b', value: b, unit: '' },
    { name: "eps_f'", value: ef, unit: '' },
    { name: 'c', value: c, unit: '' },
  ];
  return {
    n_prime: computed(
      n,
      "n' = b/c",
      COMPATIBILITY_SOURCE,
      [...terms, { name: "n'", value: n, unit: '' }],
      notes,
    ),
    K_prime: computed(
      K,
      "K' = sigma_f' / eps_f'^n'",
      COMPATIBILITY_SOURCE,
      [...terms, { name: "n'", value: n, unit: '' }, { name: "K'", value: K / MPA, unit: 'MPa' }],
      notes,
    ),
  };
}

function positive(x: number | undefined): x is number {
  return x !== undefined && isFiniteNumber(x) && x > 0;
}

/** Modified universal slopes: needs Sut, E and the reduction in area. */
export function modifiedUniversalSlopes(input: EstimateInput): EstimatedConstants {
  const method: EstimateMethod = 'modified-universal-slopes';
  const notes: MethodNote[] = [estimateWarning(method)];
  const { E, RA } = input;
  const Sut = input.Sut ?? Number.NaN;
  const bad: string[] = [];
  if (!positive(Sut)) bad.push('Sut (a positive stress)');
  if (!positive(E)) bad.push('E (a positive modulus)');
  if (bad.length > 0) {
    notes.push({
      code: 'missing-input',
      severity: 'error',
      message: `The modified universal slopes need ${bad.join(' and ')}.`,
    });
    return withheld(method, MUS_SOURCE, notes);
  }
  if (RA === undefined || !isFiniteNumber(RA) || !(RA > 0) || !(RA < 1)) {
    notes.push({
      code: 'missing-input',
      severity: 'error',
      message:
        "The modified universal slopes need the reduction in area RA (a fraction between 0 and 1, from the tensile test): its ductility term D = ln(1/(1 - RA)) sets eps_f'. Use the uniform material law or the hardness method without it.",
    });
    return withheld(method, MUS_SOURCE, notes);
  }
  if (input.materialClass === 'cast-iron')
    notes.push({
      code: 'estimate-not-applicable',
      severity: 'warning',
      message:
        'The modified universal slopes were fitted to wrought steels, aluminium and titanium alloys, not cast iron.',
    });
  const ratio = Sut / E;
  const D = Math.log(1 / (1 - RA));
  const sfCoef = (1.17 / 2) * 2 ** 0.09;
  const efCoef = (0.0266 / 2) * 2 ** 0.56;
  const sf = sfCoef * E * ratio ** 0.832;
  const ef = efCoef * D ** 0.155 * ratio ** -0.53;
  const b = -0.09;
  const c = -0.56;
  const inputs: Term[] = [
    { name: 'Sut', value: Sut / MPA, unit: 'MPa' },
    { name: 'E', value: E / 1e9, unit: 'GPa' },
    { name: 'Sut/E', value: ratio, unit: '' },
  ];
  const sigma_f_prime = computed(
    sf,
    "sigma_f' = (1.17/2) 2^0.09 E (Sut/E)^0.832",
    MUS_SOURCE,
    [...inputs, { name: "sigma_f'", value: sf / MPA, unit: 'MPa' }],
    notes,
  );
  const eps_f_prime = computed(
    ef,
    "eps_f' = (0.0266/2) 2^0.56 D^0.155 (Sut/E)^-0.53, D = ln(1/(1 - RA))",
    MUS_SOURCE,
    [
      ...inputs,
      { name: 'RA', value: RA, unit: '' },
      { name: 'D', value: D, unit: '' },
      { name: "eps_f'", value: ef, unit: '' },
    ],
    notes,
  );
  const cc = compatible(sf, b, ef, c, inputs, notes);
  return {
    method,
    sigma_f_prime,
    b: computed(b, 'b = -0.09', MUS_SOURCE, undefined, notes),
    eps_f_prime,
    c: computed(c, 'c = -0.56', MUS_SOURCE, undefined, notes),
    ...cc,
    material: {
      E,
      sigma_f_prime: sf,
      b,
      eps_f_prime: ef,
      c,
      K_prime: cc.K_prime.value,
      n_prime: cc.n_prime.value,
    },
    notes,
  };
}

/** Uniform material law: needs Sut and E; two sets (steels; aluminium and titanium alloys). */
export function uniformMaterialLaw(input: EstimateInput): EstimatedConstants {
  const method: EstimateMethod = 'uniform-material-law';
  const notes: MethodNote[] = [estimateWarning(method)];
  const { E, materialClass } = input;
  const Sut = input.Sut ?? Number.NaN;
  const bad: string[] = [];
  if (!positive(Sut)) bad.push('Sut (a positive stress)');
  if (!positive(E)) bad.push('E (a positive modulus)');
  if (bad.length > 0) {
    notes.push({
      code: 'missing-input',
      severity: 'error',
      message: `The uniform material law needs ${bad.join(' and ')}.`,
    });
    return withheld(method, UML_SOURCE, notes);
  }
  if (materialClass === 'cast-iron') {
    notes.push({
      code: 'estimate-not-applicable',
      severity: 'error',
      message: 'The uniform material law has no set for cast iron: state measured cyclic constants.',
    });
    return withheld(method, UML_SOURCE, notes);
  }
  if (materialClass === 'stainless')
    notes.push({
      code: 'estimate-not-applicable',
      severity: 'warning',
      message:
        "The uniform material law's steel set was derived for unalloyed and low-alloy steels; it is used here for a stainless steel without support.",
    });
  const light = materialClass === 'aluminium' || materialClass === 'titanium';
  const ratio = Sut / E;
  const inputs: Term[] = [
    { name: 'Sut', value: Sut / MPA, unit: 'MPa' },
    { name: 'E', value: E / 1e9, unit: 'GPa' },
    { name: 'Sut/E', value: ratio, unit: '' },
  ];
  let sf: number;
  let b: number;
  let ef: number;
  let c: number;
  let K: number;
  let n: number;
  let efFormula: string;
  let psi = 1;
  if (light) {
    sf = 1.67 * Sut;
    b = -0.095;
    ef = 0.35;
    c = -0.69;
    K = 1.61 * Sut;
    n = 0.11;
    efFormula = "eps_f' = 0.35 (aluminium and titanium alloys)";
  } else {
    psi = ratio <= 0.003 ? 1 : Math.max(0, 1.375 - 125 * ratio);
    sf = 1.5 * Sut;
    b = -0.087;
    ef = 0.59 * psi;
    c = -0.58;
    K = 1.65 * Sut;
    n = 0.15;
    efFormula = "eps_f' = 0.59 psi, psi = 1 for Sut/E <= 0.003, else 1.375 - 125 Sut/E (steels)";
    if (!(ef > 0)) {
      notes.push({
        code: 'estimate-not-applicable',
        severity: 'error',
        message: `Sut/E = ${fmt(ratio)} is beyond the uniform material law (psi = 1.375 - 125 Sut/E <= 0): state measured constants.`,
      });
      return withheld(method, UML_SOURCE, notes);
    }
  }
  const set = light ? '(aluminium and titanium alloys)' : '(steels)';
  return {
    method,
    sigma_f_prime: computed(
      sf,
      `sigma_f' = ${light ? '1.67' : '1.5'} Sut ${set}`,
      UML_SOURCE,
      [...inputs, { name: "sigma_f'", value: sf / MPA, unit: 'MPa' }],
      notes,
    ),
    b: computed(b, `b = ${b} ${set}`, UML_SOURCE, undefined, notes),
    eps_f_prime: computed(
      ef,
      efFormula,
      UML_SOURCE,
      [
        ...inputs,
        ...(light ? [] : [{ name: 'psi', value: psi, unit: '' }]),
        { name: "eps_f'", value: ef, unit: '' },
      ],
      notes,
    ),
    c: computed(c, `c = ${c} ${set}`, UML_SOURCE, undefined, notes),
    K_prime: computed(
      K,
      `K' = ${light ? '1.61' : '1.65'} Sut ${set}`,
      UML_SOURCE,
      [...inputs, { name: "K'", value: K / MPA, unit: 'MPa' }],
      notes,
    ),
    n_prime: computed(n, `n' = ${n} ${set}`, UML_SOURCE, undefined, notes),
    material: { E, sigma_f_prime: sf, b, eps_f_prime: ef, c, K_prime: K, n_prime: n },
    notes,
  };
}

/** Brinell hardness range of the steels behind the hardness method (Roessle & Fatemi 2000, from memory). */
const HB_LO = 150;
const HB_HI = 700;
/** Su (MPa) = 3.45 HB for steels (Roessle & Fatemi 2000, from memory), used when only Sut is given. */
const SU_PER_HB = 3.45;

/** Hardness method (steels): needs HB (or Sut, converted with Su = 3.45 HB) and E. */
export function hardnessMethod(input: EstimateInput): EstimatedConstants {
  const method: EstimateMethod = 'hardness';
  const notes: MethodNote[] = [estimateWarning(method)];
  const { E, materialClass } = input;
  let HB = input.HB;
  if (!positive(E)) {
    notes.push({
      code: 'missing-input',
      severity: 'error',
      message: 'The hardness method needs E (a positive modulus).',
    });
    return withheld(method, HARDNESS_SOURCE, notes);
  }
  if (!positive(HB)) {
    if (positive(input.Sut)) {
      HB = input.Sut / MPA / SU_PER_HB;
      notes.push({
        code: 'cyclic-estimate',
        severity: 'warning',
        message: `No Brinell hardness: HB = Sut / 3.45 MPa = ${fmt(HB)} taken from Sut (Roessle & Fatemi's steel correlation, from memory).`,
      });
    } else {
      notes.push({
        code: 'missing-input',
        severity: 'error',
        message: 'The hardness method needs the Brinell hardness HB (or Sut).',
      });
      return withheld(method, HARDNESS_SOURCE, notes);
    }
  }
  if (materialClass !== 'steel' && materialClass !== 'stainless') {
    notes.push({
      code: 'estimate-not-applicable',
      severity: 'error',
      message: `The hardness method of Roessle & Fatemi is for steels, not ${materialClass}: use the uniform material law or measured constants.`,
    });
    return withheld(method, HARDNESS_SOURCE, notes);
  }
  if (HB < HB_LO || HB > HB_HI)
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `HB = ${fmt(HB)} is outside ${HB_LO}..${HB_HI}, the hardness range of the steels behind the method (from memory): extrapolated.`,
    });
  const E_MPa = E / MPA;
  const sf = (4.25 * HB + 225) * MPA;
  const ef = (0.32 * HB * HB - 487 * HB + 191000) / E_MPa;
  const b = -0.09;
  const c = -0.56;
  const inputs: Term[] = [
    { name: 'HB', value: HB, unit: '' },
    { name: 'E', value: E_MPa, unit: 'MPa' },
  ];
  if (!(ef > 0)) {
    notes.push({
      code: 'estimate-not-applicable',
      severity: 'error',
      message: `The hardness method gives eps_f' <= 0 at HB = ${fmt(HB)}: state measured constants.`,
    });
    return withheld(method, HARDNESS_SOURCE, notes);
  }
  const cc = compatible(sf, b, ef, c, inputs, notes);
  return {
    method,
    sigma_f_prime: computed(
      sf,
      "sigma_f' = 4.25 HB + 225 (MPa)",
      HARDNESS_SOURCE,
      [...inputs, { name: "sigma_f'", value: sf / MPA, unit: 'MPa' }],
      notes,
    ),
    b: computed(b, 'b = -0.09', HARDNESS_SOURCE, undefined, notes),
    eps_f_prime: computed(
      ef,
      "eps_f' = (0.32 HB^2 - 487 HB + 191000) / E (E in MPa)",
      HARDNESS_SOURCE,
      [...inputs, { name: "eps_f'", value: ef, unit: '' }],
      notes,
    ),
    c: computed(c, 'c = -0.56', HARDNESS_SOURCE, undefined, notes),
    ...cc,
    material: {
      E,
      sigma_f_prime: sf,
      b,
      eps_f_prime: ef,
      c,
      K_prime: cc.K_prime.value,
      n_prime: cc.n_prime.value,
    },
    notes,
  };
}

/** The estimate by name. */
export function estimateConstants(method: EstimateMethod, input: EstimateInput): EstimatedConstants {
  if (method === 'modified-universal-slopes') return modifiedUniversalSlopes(input);
  if (method === 'hardness') return hardnessMethod(input);
  return uniformMaterialLaw(input);
}

/** The cyclic curve by compatibility from stated strain-life constants (when K', n' are not stated). */
export function compatibleCyclicCurve(k: StrainLifeConstants): { K_prime: Computed; n_prime: Computed } {
  const notes: MethodNote[] = [
    {
      code: 'cyclic-estimate',
      severity: 'warning',
      message:
        "K' and n' are not stated: taken from the strain-life constants by compatibility (n' = b/c, K' = sigma_f'/eps_f'^n'); measured curves often differ by 10 to 30 % in stress at a given strain (from memory).",
    },
  ];
  if (
    !positive(k.sigma_f_prime) ||
    !positive(k.eps_f_prime) ||
    !isFiniteNumber(k.b) ||
    !isFiniteNumber(k.c) ||
    !(k.b < 0) ||
    !(k.c < k.b)
  ) {
    notes.push({
      code: 'strain-life-constants-invalid',
      severity: 'error',
      message: "Compatibility needs sigma_f' > 0, eps_f' > 0 and c < b < 0.",
    });
    return {
      K_prime: computed(0, "K' = sigma_f' / eps_f'^n'", COMPATIBILITY_SOURCE, undefined, notes),
      n_prime: computed(0, "n' = b/c", COMPATIBILITY_SOURCE, undefined, notes),
    };
  }
  return compatible(k.sigma_f_prime, k.b, k.eps_f_prime, k.c, [], notes);
}
