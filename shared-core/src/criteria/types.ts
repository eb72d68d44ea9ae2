/** The words and records the mean-stress criteria share: keys, load lines, strengths, the kernels of a classical criterion. */
export type CriterionKey = 'goodman' | 'gerber' | 'soderberg' | 'asme-elliptic' | 'morrow' | 'swt' | 'walker';
export type LoadLine = 'proportional' | 'constant-mean' | 'constant-amplitude';

export interface StrengthSet {
  /** Se, or S_f at N for a finite-life check, Pa. */
  S: number;
  Sut: number;
  Sy: number;
  /** Morrow's intercept, Pa; defaults to Sut + 345 MPa (steels) with a note. */
  sigma_f_prime?: number;
  /** Walker exponent; defaults to Dowling's steel correlation with a note. */
  gamma_walker?: number;
}

export const CRITERION_KEYS: readonly CriterionKey[] = [
  'goodman',
  'gerber',
  'soderberg',
  'asme-elliptic',
  'morrow',
  'swt',
  'walker',
];
export const LOAD_LINES: readonly LoadLine[] = ['proportional', 'constant-mean', 'constant-amplitude'];

/** The numeric kernels of an infinite-life criterion (all stresses in Pa, amplitude >= 0). */
export interface ClassicalCriterion {
  key: 'goodman' | 'gerber' | 'soderberg' | 'asme-elliptic';
  label: string;
  source: string;
  /** Defined for a tensile mean only (a compressive mean gets a `criterion-domain` note). */
  tensileOnly: boolean;
  /** Mean-stress intercept of the curve (Sut or Sy). */
  meanIntercept(s: StrengthSet): number;
  /** Allowable amplitude at a mean (S for a mean <= 0), >= 0. */
  amplitudeAt(sigma_m: number, s: StrengthSet): number;
  /** Allowable (tensile) mean at an amplitude, >= 0. */
  meanAt(sigma_a: number, s: StrengthSet): number;
  /** Closed-form factor on the proportional line, for sigma_m > 0. */
  proportional(sigma_a: number, sigma_m: number, s: StrengthSet): number;
  /** Equivalent fully reversed stress; `STATIC_FAILURE` at or past the mean intercept. */
  reversed(sigma_a: number, sigma_m: number, s: StrengthSet): number;
  formulas: {
    proportional: string;
    constantMean: string;
    constantAmplitude: string;
    reversed: string;
    amplitude: string;
  };
}
