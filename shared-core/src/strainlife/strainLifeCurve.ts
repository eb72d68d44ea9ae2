/**
 * The strain-life curve and the life it gives for a local strain amplitude, with or without a
 * mean-stress correction:
 *
 *   none (Coffin-Manson-Basquin):  eps_a = (sigma_f'/E) (2N)^b + eps_f' (2N)^c
 *   morrow-elastic:                eps_a = ((sigma_f' - sigma_m)/E) (2N)^b + eps_f' (2N)^c
 *   morrow-full:                   eps_a = ((sigma_f' - sigma_m)/E) (2N)^b
 *                                          + eps_f' ((sigma_f' - sigma_m)/sigma_f')^(c/b) (2N)^c
 *   swt (Smith-Watson-Topper):     sigma_max eps_a = (sigma_f'^2/E) (2N)^(2b) + sigma_f' eps_f' (2N)^(b+c)
 *
 * The life is solved for in u = log10(2N) on [0, 12] (one reversal to 1e12 reversals) by Brent's
 * method on ln(right side) - ln(left side), which is strictly decreasing in u for b, c < 0: there
 * is one root, bracketed, whatever the transition life, so the solver cannot fail there or at
 * long lives. Past 1e12 reversals the life is `infinite` with a note that the strain-life data do
 * not reach so far (the stress-life method with an endurance limit is the check there); above
 * 2e7 reversals a warning says the same.
 *
 * Transition life (elastic and plastic parts equal): 2N_t = (eps_f' E / sigma_f')^(1/(b - c)).
 *
 * Sources: O. H. Basquin, Proc. ASTM 10 (1910) 625-630; L. F. Coffin, Trans. ASME 76 (1954)
 * 931-950; S. S. Manson, NACA TN 2933 (1953); J. Morrow, Fatigue Design Handbook, SAE AE-4
 * (1968) Sec. 3.2 (mean stress in the strain-life curve); K. N. Smith, P. Watson & T. H. Topper,
 * "A stress-strain function for the fatigue of metals", J. Materials 5 (1970) 767-778; Dowling,
 * Mechanical Behavior of Materials, 4th ed., Ch. 14 (strain-based approach; section and
 * equation numbers from memory).
 */
import {
  type Computed,
  computed,
  infinite,
  isFiniteNumber,
  type MethodNote,
  MPA,
  type Term,
} from '../computed';
import { decreasingRootOn } from './monotoneRoot';

export interface StrainLifeConstants {
  /** Young's modulus, Pa. */
  E: number;
  /** Fatigue strength coefficient sigma_f', Pa. */
  sigma_f_prime: number;
  /** Fatigue strength exponent b (< 0). */
  b: number;
  /** Fatigue ductility coefficient eps_f'. */
  eps_f_prime: number;
  /** Fatigue ductility exponent c (< b < 0). */
  c: number;
}

export type MeanStressModel = 'none' | 'morrow-elastic' | 'morrow-full' | 'swt';
export const MEAN_STRESS_MODELS: readonly MeanStressModel[] = Object.freeze([
  'none',
  'morrow-elastic',
  'morrow-full',
  'swt',
]);

export const STRAIN_LIFE_SOURCE =
  'Coffin-Manson-Basquin: Basquin, Proc. ASTM 10 (1910); Coffin, Trans. ASME 76 (1954); Manson, NACA TN 2933 (1953); Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14 (from memory for the section)';
export const MORROW_STRAIN_SOURCE =
  'Morrow, Fatigue Design Handbook, SAE AE-4 (1968), Sec. 3.2; Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14 (mean stress in the strain-life curve, from memory for the section)';
export const SWT_STRAIN_SOURCE =
  'Smith, Watson & Topper, J. Materials 5 (1970) 767-778; Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14 (from memory for the section)';

export function modelSource(model: MeanStressModel): string {
  if (model === 'swt') return SWT_STRAIN_SOURCE;
  if (model === 'morrow-elastic' || model === 'morrow-full') return MORROW_STRAIN_SOURCE;
  return STRAIN_LIFE_SOURCE;
}

export function modelFormula(model: MeanStressModel): string {
  switch (model) {
    case 'morrow-elastic':
      return "eps_a = ((sigma_f' - sigma_m)/E) (2N_f)^b + eps_f' (2N_f)^c";
    case 'morrow-full':
      return "eps_a = ((sigma_f' - sigma_m)/E) (2N_f)^b + eps_f' ((sigma_f' - sigma_m)/sigma_f')^(c/b) (2N_f)^c";
    case 'swt':
      return "sigma_max eps_a = (sigma_f'^2/E) (2N_f)^(2b) + sigma_f' eps_f' (2N_f)^(b+c)";
    default:
      return "eps_a = (sigma_f'/E) (2N_f)^b + eps_f' (2N_f)^c";
  }
}

/** Solved range of log10(2N): one reversal to 1e12 reversals. */
export const LOG_REVERSALS_MAX = 12;
/** Above this many reversals the strain-life data rarely hold (tests seldom exceed 1e7 cycles; common practice, no source). */
export const REVERSALS_DATA_MAX = 2e7;
/** Below this many reversals the curve is an extrapolation towards the tensile test (common practice, no source). */
export const REVERSALS_DATA_MIN = 10;

/** Errors (constants that cannot be a strain-life curve) and warnings (outside the published band). */
export function strainLifeConstantNotes(k: StrainLifeConstants): MethodNote[] {
  const bad: string[] = [];
  if (!isFiniteNumber(k.E) || !(k.E > 0)) bad.push('E must be a positive modulus');
  if (!isFiniteNumber(k.sigma_f_prime) || !(k.sigma_f_prime > 0))
    bad.push("sigma_f' must be a positive stress");
  if (!isFiniteNumber(k.eps_f_prime) || !(k.eps_f_prime > 0)) bad.push("eps_f' must be positive");
  if (!isFiniteNumber(k.b) || !(k.b < 0)) bad.push('b must be negative');
  if (!isFiniteNumber(k.c) || !(k.c < 0)) bad.push('c must be negative');
  if (bad.length === 0 && !(k.c < k.b))
    bad.push('c must be steeper than b (c < b): the plastic line falls faster than the elastic one');
  if (bad.length > 0)
    return [{ code: 'strain-life-constants-invalid', severity: 'error', message: `${bad.join('; ')}.` }];
  const notes: MethodNote[] = [];
  // Published metals: b about -0.04 to -0.16, c about -0.4 to -1.0 (Dowling Table 14.1, from memory); wider band warned.
  if (k.b < -0.25 || k.b > -0.02)
    notes.push({
      code: 'strain-life-constants-range',
      severity: 'warning',
      message: `b = ${k.b} is outside -0.25..-0.02, the band of published metals: check the constant.`,
    });
  if (k.c < -1.2 || k.c > -0.3)
    notes.push({
      code: 'strain-life-constants-range',
      severity: 'warning',
      message: `c = ${k.c} is outside -1.2..-0.3, the band of published metals: check the constant.`,
    });
  if (k.eps_f_prime > 5)
    notes.push({
      code: 'strain-life-constants-range',
      severity: 'warning',
      message: `eps_f' = ${k.eps_f_prime} is larger than any published metal's: is it in per cent?`,
    });
  return notes;
}

export function isUsableConstants(k: StrainLifeConstants): boolean {
  return !strainLifeConstantNotes(k).some((n) => n.severity === 'error');
}

/** Strain amplitude on the curve without mean stress at 2N reversals, kernel. */
export function strainAmplitudeKernel(k: StrainLifeConstants, reversals: number): number {
  return (k.sigma_f_prime / k.E) * reversals ** k.b + k.eps_f_prime * reversals ** k.c;
}

/** Transition life 2N_t (reversals) where the elastic and plastic strain amplitudes are equal, kernel. */
export function transitionReversalsKernel(k: StrainLifeConstants): number {
  return ((k.eps_f_prime * k.E) / k.sigma_f_prime) ** (1 / (k.b - k.c));
}

export interface LifeLoad {
  /** Local strain amplitude. */
  eps_a: number;
  /** Local mean stress, Pa (Morrow). */
  sigma_m?: number;
  /** Local maximum stress, Pa (SWT). */
  sigma_max?: number;
}

export type LifeStatus =
  | 'finite'
  | 'beyond' // past 1e12 reversals: infinite
  | 'first-reversal' // above the curve at one reversal
  | 'no-damage' // SWT with sigma_max <= 0
  | 'static'; // Morrow with sigma_m >= sigma_f'

export interface LifeKernel {
  /** Reversals to failure 2N_f (0 unless status is 'finite' or 'first-reversal'). */
  reversals: number;
  status: LifeStatus;
  converged: boolean;
}

/**
 * The right side R(u) of the model at u = log10(2N), and the left side P, such that
 * R(u) = P at the life; both positive. Returns null when the model predicts no finite solution
 * (static failure, no tension).
 */
function modelSides(
  k: StrainLifeConstants,
  model: MeanStressModel,
  load: LifeLoad,
): { P: number; R: (u: number) => number } | LifeStatus {
  const { E, sigma_f_prime: sf, b, eps_f_prime: ef, c } = k;
  const sm = load.sigma_m ?? 0;
  if (model === 'swt') {
    const smax = load.sigma_max ?? 0;
    if (!(smax > 0)) return 'no-damage';
    const A = (sf * sf) / E;
    const B = sf * ef;
    return { P: smax * load.eps_a, R: (u) => A * 10 ** (2 * b * u) + B * 10 ** ((b + c) * u) };
  }
  if (model === 'morrow-elastic' || model === 'morrow-full') {
    if (sm >= sf) return 'static';
    const el = (sf - sm) / E;
    const pl = model === 'morrow-full' ? ef * ((sf - sm) / sf) ** (c / b) : ef;
    return { P: load.eps_a, R: (u) => el * 10 ** (b * u) + pl * 10 ** (c * u) };
  }
  return { P: load.eps_a, R: (u) => (sf / E) * 10 ** (b * u) + ef * 10 ** (c * u) };
}

/** Reversals to failure for a local strain amplitude (and mean/max stress), kernel. */
export function reversalsKernel(k: StrainLifeConstants, model: MeanStressModel, load: LifeLoad): LifeKernel {
  if (!(load.eps_a > 0)) return { reversals: 0, status: 'beyond', converged: true };
  const sides = modelSides(k, model, load);
  if (typeof sides === 'string') return { reversals: 0, status: sides, converged: true };
  const lnP = Math.log(sides.P);
  const g = (u: number) => Math.log(sides.R(u)) - lnP;
  const g0 = g(0);
  if (!(g0 > 0)) return { reversals: 1, status: 'first-reversal', converged: true };
  const g1 = g(LOG_REVERSALS_MAX);
  if (!(g1 < 0)) return { reversals: 0, status: 'beyond', converged: true };
  const root = decreasingRootOn(g, 0, LOG_REVERSALS_MAX, 1e-12);
  return { reversals: 10 ** root.x, status: 'finite', converged: root.converged && root.ok };
}

function constantTerms(k: StrainLifeConstants): Term[] {
  return [
    { name: 'E', value: k.E / 1e9, unit: 'GPa' },
    { name: "sigma_f'", value: k.sigma_f_prime / MPA, unit: 'MPa' },
    { name: 'b', value: k.b, unit: '' },
    { name: "eps_f'", value: k.eps_f_prime, unit: '' },
    { name: 'c', value: k.c, unit: '' },
  ];
}

/** Transition life 2N_t in reversals, with its derivation. */
export function transitionLife(k: StrainLifeConstants): Computed {
  const formula = "2N_t = (eps_f' E / sigma_f')^(1/(b - c))";
  const notes = strainLifeConstantNotes(k);
  if (notes.some((n) => n.severity === 'error'))
    return computed(0, formula, STRAIN_LIFE_SOURCE, undefined, notes);
  const v = transitionReversalsKernel(k);
  if (!isFiniteNumber(v))
    return computed(0, formula, STRAIN_LIFE_SOURCE, constantTerms(k), [
      ...notes,
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'The transition life overflows: check the constants.',
      },
    ]);
  return computed(
    v,
    formula,
    STRAIN_LIFE_SOURCE,
    [
      ...constantTerms(k),
      { name: '2N_t', value: v, unit: 'reversals' },
      { name: 'N_t', value: v / 2, unit: 'cycles' },
      { name: 'eps_a at 2N_t', value: strainAmplitudeKernel(k, v), unit: '' },
    ],
    notes,
  );
}

/** Strain amplitude of the curve without mean stress at 2N reversals (for the strain-life diagram). */
export function strainAmplitudeAt(k: StrainLifeConstants, reversals: number): Computed {
  const formula = "eps_a = (sigma_f'/E) (2N)^b + eps_f' (2N)^c";
  const notes = strainLifeConstantNotes(k);
  if (notes.some((n) => n.severity === 'error'))
    return computed(0, formula, STRAIN_LIFE_SOURCE, undefined, notes);
  if (!isFiniteNumber(reversals) || !(reversals >= 1))
    return computed(0, formula, STRAIN_LIFE_SOURCE, undefined, [
      ...notes,
      { code: 'invalid-input', severity: 'error', message: '2N must be a number of reversals >= 1.' },
    ]);
  const el = (k.sigma_f_prime / k.E) * reversals ** k.b;
  const pl = k.eps_f_prime * reversals ** k.c;
  return computed(
    el + pl,
    formula,
    STRAIN_LIFE_SOURCE,
    [
      ...constantTerms(k),
      { name: '2N', value: reversals, unit: 'reversals' },
      { name: 'eps_ea', value: el, unit: '' },
      { name: 'eps_pa', value: pl, unit: '' },
    ],
    notes,
  );
}

/** Points [2N, eps_a] of the strain-life curve without mean stress, log-spaced from 1 to 1e8 reversals. */
export function strainLifeCurvePoints(k: StrainLifeConstants, n = 65): Array<[number, number]> {
  if (!isUsableConstants(k)) return [];
  const count = Math.max(2, Math.min(1000, Math.floor(isFiniteNumber(n) ? n : 65)));
  const out: Array<[number, number]> = [];
  for (let i = 0; i < count; i++) {
    const r = 10 ** ((8 * i) / (count - 1));
    out.push([r, strainAmplitudeKernel(k, r)]);
  }
  return out;
}

/** Life notes of one solved life (shared with the variable-amplitude damage sum). */
export function lifeNotes(
  k: StrainLifeConstants,
  model: MeanStressModel,
  load: LifeLoad,
  life: LifeKernel,
): MethodNote[] {
  const notes: MethodNote[] = [];
  const sm = load.sigma_m ?? 0;
  switch (life.status) {
    case 'first-reversal':
      notes.push({
        code: 'first-reversal-fracture',
        severity: 'error',
        message: `The local strain amplitude ${fmt(load.eps_a)} is above the strain-life curve at one reversal: fracture on the first loading, not fatigue.`,
      });
      break;
    case 'beyond':
      if (!(load.eps_a > 0)) {
        notes.push({
          code: 'no-damage',
          severity: 'information',
          message: 'Zero strain amplitude: no fatigue damage.',
        });
        break;
      }
      notes.push({
        code: 'strain-life-beyond',
        severity: 'warning',
        message: `The local strain amplitude ${fmt(load.eps_a)} gives more than 1e${LOG_REVERSALS_MAX} reversals: the strain-life data do not extend that far. Check the part with the stress-life method (endurance limit) instead.`,
      });
      break;
    case 'no-damage':
      notes.push({
        code: 'swt-no-tension',
        severity: 'warning',
        message: `sigma_max = ${fmt((load.sigma_max ?? 0) / MPA)} MPa <= 0: the Smith-Watson-Topper parameter predicts no fatigue damage for a cycle that is never tensile (the method's rule; a compressive cycle can still grow a crack from a tensile residual stress).`,
      });
      break;
    case 'static':
      notes.push({
        code: 'static-failure',
        severity: 'error',
        message: `The local mean stress ${fmt(sm / MPA)} MPa reaches sigma_f' = ${fmt(k.sigma_f_prime / MPA)} MPa: Morrow's correction leaves no fatigue strength.`,
      });
      break;
    default:
      if (life.reversals < REVERSALS_DATA_MIN)
        notes.push({
          code: 'strain-life-range',
          severity: 'warning',
          message: `2N_f = ${fmt(life.reversals)} reversals is below ${REVERSALS_DATA_MIN}: the curve is extrapolated towards the tensile test.`,
        });
      else if (life.reversals > REVERSALS_DATA_MAX)
        notes.push({
          code: 'strain-life-range',
          severity: 'warning',
          message: `2N_f = ${fmt(life.reversals)} reversals is beyond ${fmt(REVERSALS_DATA_MAX)} (about 1e7 cycles), where strain-life tests rarely reach: the stress-life method with the endurance limit is the usual check at such lives.`,
        });
      if (!life.converged)
        notes.push({
          code: 'solver-tolerance',
          severity: 'warning',
          message: 'The life solver stopped at its evaluation budget; the life is within the last bracket.',
        });
  }
  if (life.status === 'finite' && (model === 'morrow-elastic' || model === 'morrow-full') && sm < 0)
    notes.push({
      code: 'compressive-mean',
      severity: 'information',
      message: "Compressive local mean stress: Morrow's correction credits a longer life.",
    });
  if (life.status === 'finite' && model === 'none' && Math.abs(sm) > 0.05 * k.sigma_f_prime)
    notes.push({
      code: 'mean-stress-ignored',
      severity: 'warning',
      message: `The local mean stress ${fmt(sm / MPA)} MPa is not corrected for (Coffin-Manson-Basquin without mean stress): a tensile mean shortens the life; choose morrow or swt.`,
    });
  return notes;
}

function fmt(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  // Large and small magnitudes in exponent form (2.447e11, not 244700000000).
  const a = Math.abs(x);
  if (a !== 0 && (a >= 1e6 || a < 1e-4))
    return x
      .toExponential(3)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'e');
  return String(Number(x.toPrecision(4)));
}

export type LifeResult = Computed & {
  /** Reversals to failure 2N_f (0 when infinite). */
  reversals: number;
  status: LifeStatus;
};

/**
 * Cycles to failure N_f for a local strain amplitude, with the chosen mean-stress model; the
 * value is N_f in cycles (2N_f / 2), `infinite` past 1e12 reversals or when SWT predicts no damage.
 */
export function strainLife(k: StrainLifeConstants, model: MeanStressModel, load: LifeLoad): LifeResult {
  const formula = `${modelFormula(model)}, N_f = 2N_f / 2`;
  const source = modelSource(model);
  const notes = strainLifeConstantNotes(k);
  const bad: string[] = [];
  if (!isFiniteNumber(load.eps_a) || load.eps_a < 0) bad.push('eps_a must be a strain amplitude >= 0');
  if (load.sigma_m !== undefined && !isFiniteNumber(load.sigma_m)) bad.push('sigma_m must be finite');
  if (load.sigma_max !== undefined && !isFiniteNumber(load.sigma_max)) bad.push('sigma_max must be finite');
  if (model === 'swt' && load.sigma_max === undefined) bad.push('SWT needs sigma_max');
  if (bad.length > 0) notes.push({ code: 'invalid-input', severity: 'error', message: `${bad.join('; ')}.` });
  if (notes.some((n) => n.severity === 'error'))
    return { ...computed(0, formula, source, undefined, notes), reversals: 0, status: 'finite' };
  const life = reversalsKernel(k, model, load);
  notes.push(...lifeNotes(k, model, load, life));
  const terms: Term[] = [...constantTerms(k), { name: 'eps_a', value: load.eps_a, unit: '' }];
  if (load.sigma_m !== undefined) terms.push({ name: 'sigma_m', value: load.sigma_m / MPA, unit: 'MPa' });
  if (load.sigma_max !== undefined)
    terms.push({ name: 'sigma_max', value: load.sigma_max / MPA, unit: 'MPa' });
  const Nt = transitionReversalsKernel(k);
  if (isFiniteNumber(Nt)) terms.push({ name: '2N_t', value: Nt, unit: 'reversals' });
  if (life.status === 'beyond' || life.status === 'no-damage') {
    return { ...infinite(formula, source, terms, notes), reversals: 0, status: life.status };
  }
  if (life.status === 'static')
    return { ...computed(0, formula, source, terms, notes), reversals: 0, status: 'static' };
  terms.push({ name: '2N_f', value: life.reversals, unit: 'reversals' });
  return {
    ...computed(life.reversals / 2, formula, source, terms, notes),
    reversals: life.reversals,
    status: life.status,
  };
}
