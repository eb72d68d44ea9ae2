/**
 * Fatigue safety factor of a stress state (sigma_a, sigma_m) along a load line:
 *
 * - `proportional` (default): both components grow together, `n = S_a/sigma_a = S_m/sigma_m`.
 * - `constant-mean`: the mean stays, the amplitude grows: `n = S_a(sigma_m) / sigma_a`.
 * - `constant-amplitude`: the amplitude stays, the mean grows: `n = S_m(sigma_a) / sigma_m`.
 *
 * Goodman, Gerber, Soderberg and ASME elliptic use closed forms: the proportional ones are
 * Shigley's (10th ed., Tables 6-6, 6-7, 6-8; Soderberg 1/n = sigma_a/S + sigma_m/Sy); the other
 * two follow by solving the same failure curve for one component (this module):
 *
 *   constant mean       Goodman   n = S (1 - sigma_m/Sut) / sigma_a      Soderberg  n = S (1 - sigma_m/Sy) / sigma_a
 *                       Gerber    n = S (1 - (sigma_m/Sut)^2) / sigma_a  ASME       n = S sqrt(1 - (sigma_m/Sy)^2) / sigma_a
 *   constant amplitude  Goodman   n = Sut (1 - sigma_a/S) / sigma_m      Soderberg  n = Sy (1 - sigma_a/S) / sigma_m
 *                       Gerber    n = Sut sqrt(1 - sigma_a/S) / sigma_m  ASME       n = Sy sqrt(1 - (sigma_a/S)^2) / sigma_m
 *
 * Morrow, SWT and Walker solve `sigma_ar(load(n)) = S` with the bracketed root finder of
 * `solveFactor.ts` (sigma_ar is non-decreasing in n along each line handled).
 *
 * Limiting answers (never NaN or Infinity): zero mean gives `S/sigma_a`; a compressive mean
 * takes the horizontal line `S/sigma_a` for the four classical criteria (Gerber and ASME elliptic
 * with a `criterion-domain` note); a load line whose scaled component is zero (constant amplitude
 * at zero or compressive mean, constant mean at zero amplitude) falls back to the other
 * component's factor with a `load-line` note; no stress at all is `infinite`.
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
import * as morrow from '../meanstress/morrow';
import * as swt from '../meanstress/swt';
import * as walker from '../meanstress/walker';
import { asmeEllipticModel, equivalentReversed as asmeEq } from './asmeElliptic';
import { equivalentReversed as gerberEq, gerberModel } from './gerber';
import { COMPRESSIVE_MEAN_SOURCE, equivalentReversed as goodmanEq, goodmanModel } from './goodman';
import { equivalentReversed as soderbergEq, soderbergModel } from './soderberg';
import { MAX_FACTOR, solveFactor } from './solveFactor';
import {
  type ClassicalCriterion,
  CRITERION_KEYS,
  type CriterionKey,
  LOAD_LINES,
  type LoadLine,
  type StrengthSet,
} from './types';

export {
  type ClassicalCriterion,
  CRITERION_KEYS,
  type CriterionKey,
  LOAD_LINES,
  type LoadLine,
  type StrengthSet,
} from './types';

export function classicalModel(key: CriterionKey): ClassicalCriterion | null {
  switch (key) {
    case 'goodman':
      return goodmanModel;
    case 'gerber':
      return gerberModel;
    case 'soderberg':
      return soderbergModel;
    case 'asme-elliptic':
      return asmeEllipticModel;
    default:
      return null;
  }
}

const ALGEBRA_SOURCE =
  'constant-mean / constant-amplitude forms: the same failure curve solved for one component (derived, criteria/loadLine.ts)';
const SOLVER_SOURCE = 'factor by bracketed bisection of sigma_ar(load(n)) = S (criteria/solveFactor.ts)';

/** The parameters of a finite-life mean-stress model, with defaults and their notes. */
export interface ResolvedModel {
  reversed: (sigma_a: number, sigma_m: number) => number;
  source: string;
  formula: string;
  terms: Term[];
  notes: MethodNote[];
  /** Morrow's intercept used, Pa. */
  sigma_f_prime?: number;
  /** Walker's exponent used. */
  gamma?: number;
}

function resolveSigmaFPrime(s: StrengthSet): { value: number; notes: MethodNote[] } {
  if (s.sigma_f_prime !== undefined && isFiniteNumber(s.sigma_f_prime) && s.sigma_f_prime > 0)
    return { value: s.sigma_f_prime, notes: [] };
  const est = morrow.estimateSigmaFPrimeSteel(s.Sut);
  const given = s.sigma_f_prime !== undefined;
  return {
    value: est.value,
    notes: [
      {
        code: given ? 'input' : 'mean-stress-default',
        message:
          (given ? 'sigma_f_prime must be a positive stress; ' : 'sigma_f_prime not stated; ') +
          `estimated as Sut + 345 MPa = ${(est.value / MPA).toPrecision(4)} MPa for steels (${est.source}).`,
        severity: given ? 'error' : 'warning',
      },
    ],
  };
}

function resolveGamma(s: StrengthSet): { value: number; notes: MethodNote[] } {
  if (
    s.gamma_walker !== undefined &&
    isFiniteNumber(s.gamma_walker) &&
    s.gamma_walker >= 0 &&
    s.gamma_walker <= 1
  )
    return { value: s.gamma_walker, notes: [] };
  const est = walker.walkerGammaSteel(s.Sut);
  const given = s.gamma_walker !== undefined;
  return {
    value: est.value,
    notes: [
      {
        code: given ? 'input' : 'mean-stress-default',
        message:
          (given ? 'gamma_walker must lie between 0 and 1; ' : 'gamma_walker not stated; ') +
          `Dowling's steel correlation gives gamma = ${est.value.toFixed(3)} (aluminium alloys: about ${walker.WALKER_GAMMA_ALUMINIUM}; state gamma_walker for other metals).`,
        severity: given ? 'error' : 'information',
      },
      ...(est.notes ?? []),
    ],
  };
}

/** The kernel and parameters of Morrow, SWT or Walker for a strength set. */
export function resolveFiniteLifeModel(key: 'morrow' | 'swt' | 'walker', s: StrengthSet): ResolvedModel {
  if (key === 'morrow') {
    const sf = resolveSigmaFPrime(s);
    return {
      reversed: (a, m) => morrow.reversedKernel(a, m, sf.value),
      source: morrow.MORROW_SOURCE,
      formula: 'sigma_ar = sigma_a / (1 - sigma_m/sigma_f_prime)',
      terms: [{ name: 'sigma_f_prime', value: sf.value / MPA, unit: 'MPa' }],
      notes: sf.notes,
      sigma_f_prime: sf.value,
    };
  }
  if (key === 'swt') {
    return {
      reversed: (a, m) => swt.reversedKernel(a, m),
      source: swt.SWT_SOURCE,
      formula: 'sigma_ar = sqrt(sigma_max * sigma_a)',
      terms: [],
      notes: [],
    };
  }
  const g = resolveGamma(s);
  return {
    reversed: (a, m) => walker.reversedKernel(a, m, g.value),
    source: walker.WALKER_SOURCE,
    formula: 'sigma_ar = sigma_max^(1 - gamma) * sigma_a^gamma',
    terms: [{ name: 'gamma', value: g.value, unit: '' }],
    notes: g.notes,
    gamma: g.value,
  };
}

/** Equivalent fully reversed stress of any of the seven criteria, Pa. */
export function equivalentReversedFor(
  criterion: CriterionKey,
  sigma_a: number,
  sigma_m: number,
  s: StrengthSet,
): Computed {
  switch (criterion) {
    case 'goodman':
      return goodmanEq(sigma_a, sigma_m, s);
    case 'gerber':
      return gerberEq(sigma_a, sigma_m, s);
    case 'soderberg':
      return soderbergEq(sigma_a, sigma_m, s);
    case 'asme-elliptic':
      return asmeEq(sigma_a, sigma_m, s);
    case 'morrow': {
      const sf = resolveSigmaFPrime(s);
      return withNotes(morrow.equivalentReversed(sigma_a, sigma_m, sf.value), sf.notes);
    }
    case 'swt':
      return swt.equivalentReversed(sigma_a, sigma_m);
    case 'walker': {
      const g = resolveGamma(s);
      return withNotes(walker.equivalentReversed(sigma_a, sigma_m, g.value), g.notes);
    }
    default:
      return computed(0, 'sigma_ar', 'n/a', undefined, [
        { code: 'input', message: `Unknown criterion '${String(criterion)}'.`, severity: 'error' },
      ]);
  }
}

function withNotes(c: Computed, notes: MethodNote[]): Computed {
  if (notes.length === 0) return c;
  return { ...c, notes: [...notes, ...(c.notes ?? [])] };
}

function strengthProblems(criterion: CriterionKey, s: StrengthSet): string[] {
  const out: string[] = [];
  if (!s || typeof s !== 'object') return ['No strength set given.'];
  if (!isFiniteNumber(s.S) || s.S <= 0) out.push('The fatigue strength S (Se or S_f) must be positive.');
  if (!isFiniteNumber(s.Sut) || s.Sut <= 0) out.push('Sut must be a positive stress.');
  if ((criterion === 'soderberg' || criterion === 'asme-elliptic') && (!isFiniteNumber(s.Sy) || s.Sy <= 0))
    out.push('Sy must be a positive stress.');
  return out;
}

function loadLineNote(message: string): MethodNote {
  return { code: 'load-line', message, severity: 'information' };
}

interface Outcome {
  /** The factor, or 'infinite'. */
  n: number | 'infinite';
  formula: string;
  source: string;
  notes: MethodNote[];
}

function finish(o: Outcome, terms: Term[]): Computed {
  if (o.n === 'infinite' || !isFiniteNumber(o.n) || o.n > MAX_FACTOR) {
    const notes = [...o.notes];
    if (o.n !== 'infinite' && !notes.some((x) => x.code === 'infinite'))
      notes.push({
        code: 'infinite',
        message: 'The factor is unbounded for this load.',
        severity: 'information',
      });
    return infinite(o.formula, o.source, terms, notes);
  }
  return computed(o.n, o.formula, o.source, [...terms, { name: 'n_f', value: o.n, unit: '' }], o.notes);
}

function classicalFactor(
  model: ClassicalCriterion,
  line: LoadLine,
  a: number,
  m: number,
  s: StrengthSet,
): Outcome {
  const src = `${model.source}; ${ALGEBRA_SOURCE}`;
  if (m <= 0) {
    const notes: MethodNote[] = [];
    if (m < 0 && model.tensileOnly)
      notes.push({
        code: 'criterion-domain',
        message: `${model.label} is defined for a tensile mean stress; at a compressive mean the limiting answer n_f = S/sigma_a (horizontal line) is used.`,
        severity: 'information',
      });
    if (a === 0)
      return {
        n: 'infinite',
        formula: 'n_f = S / sigma_a (no alternating stress)',
        source: COMPRESSIVE_MEAN_SOURCE,
        notes: [
          ...notes,
          {
            code: 'infinite',
            message:
              'No alternating stress and a compressive mean: no fatigue; first-cycle yield (n_y) governs.',
            severity: 'information',
          },
        ],
      };
    if (line === 'constant-amplitude')
      notes.push(
        loadLineNote(
          m === 0
            ? 'Constant amplitude at zero mean: a factor on the mean is unbounded; the amplitude factor S/sigma_a is given.'
            : 'Constant amplitude at a compressive mean: growing the mean never reaches the fatigue line; the amplitude factor S/sigma_a is given.',
        ),
      );
    return {
      n: s.S / a,
      formula:
        m < 0 ? 'n_f = S / sigma_a (compressive mean: horizontal line)' : 'n_f = S / sigma_a (zero mean)',
      source: m < 0 ? `${COMPRESSIVE_MEAN_SOURCE}; ${model.source}` : model.source,
      notes,
    };
  }
  // Tensile mean.
  if (line === 'proportional') {
    return {
      n: model.proportional(a, m, s),
      formula: model.formulas.proportional,
      source: model.source,
      notes: [],
    };
  }
  if (line === 'constant-mean' && a > 0) {
    const Sa = model.amplitudeAt(m, s);
    const notes: MethodNote[] = [];
    if (Sa <= 0)
      notes.push({
        code: 'load-line',
        message: `The mean stress alone reaches the ${model.label} curve (sigma_m >= ${model.meanIntercept(s) === s.Sut ? 'Sut' : 'Sy'}): no amplitude is allowed.`,
        severity: 'warning',
      });
    return { n: Sa / a, formula: model.formulas.constantMean, source: src, notes };
  }
  // constant-amplitude, or constant-mean with no amplitude (falls back to the factor on the mean).
  const notes: MethodNote[] = [];
  if (line === 'constant-mean')
    notes.push(
      loadLineNote(
        'Constant mean with zero amplitude: a factor on the amplitude is unbounded; the factor on the mean is given.',
      ),
    );
  const Sm = model.meanAt(a, s);
  if (Sm <= 0)
    notes.push({
      code: 'load-line',
      message: `The amplitude alone reaches the ${model.label} curve (sigma_a >= S): no mean stress is allowed.`,
      severity: 'warning',
    });
  return { n: Sm / m, formula: model.formulas.constantAmplitude, source: src, notes };
}

function solvedOutcome(
  f: (n: number) => number,
  S: number,
  formula: string,
  source: string,
  notes: MethodNote[],
  unboundedMessage: string,
  zeroMessage: string,
): Outcome {
  const sol = solveFactor(f, S);
  if (sol.kind === 'root') return { n: sol.n, formula, source, notes };
  if (sol.kind === 'zero')
    return {
      n: 0,
      formula,
      source,
      notes: [...notes, { code: 'load-line', message: zeroMessage, severity: 'warning' }],
    };
  return {
    n: 'infinite',
    formula,
    source,
    notes: [...notes, { code: 'infinite', message: unboundedMessage, severity: 'information' }],
  };
}

function finiteLifeFactor(
  key: 'morrow' | 'swt' | 'walker',
  line: LoadLine,
  a: number,
  m: number,
  s: StrengthSet,
): Outcome & { extraTerms: Term[] } {
  const model = resolveFiniteLifeModel(key, s);
  const src = `${model.source}; ${SOLVER_SOURCE}`;
  const base = [...model.notes];
  if (m < 0)
    base.push({
      code: 'compressive-mean',
      message: `Compressive mean: the ${key === 'morrow' ? 'Morrow' : key === 'swt' ? 'SWT' : 'Walker'} equation credits a benefit (sigma_ar < sigma_a), as published by Dowling.`,
      severity: 'information',
    });
  const unbounded =
    key === 'morrow'
      ? 'The scaled load never reaches the fatigue strength: the factor is unbounded.'
      : 'sigma_max <= 0 along the load line: the model predicts no fatigue damage, the factor is unbounded.';

  let effective: LoadLine = line;
  if (line === 'constant-amplitude' && m <= 0) {
    effective = 'constant-mean';
    base.push(
      loadLineNote(
        m === 0
          ? 'Constant amplitude at zero mean: a factor on the mean is unbounded; the amplitude factor is given.'
          : 'Constant amplitude at a compressive mean: growing the mean lowers sigma_ar; the factor on the amplitude is given.',
      ),
    );
  } else if (line === 'constant-mean' && a === 0) {
    effective = 'constant-amplitude';
    base.push(
      loadLineNote(
        'Constant mean with zero amplitude: a factor on the amplitude is unbounded; the factor on the mean is given.',
      ),
    );
    if (m <= 0)
      return {
        n: 'infinite',
        formula: `${model.formula}; n_f: sigma_ar(n) = S`,
        source: src,
        notes: [
          ...base,
          {
            code: 'infinite',
            message: 'No alternating stress and no tensile mean: no fatigue damage.',
            severity: 'information',
          },
        ],
        extraTerms: model.terms,
      };
  }

  const zero =
    effective === 'constant-mean'
      ? 'The mean stress alone reaches the fatigue strength: no amplitude is allowed.'
      : 'The amplitude alone reaches the fatigue strength: no mean stress is allowed.';
  let f: (n: number) => number;
  let formula: string;
  if (effective === 'proportional') {
    f = (n) => model.reversed(n * a, n * m);
    formula = `${model.formula}; n_f: sigma_ar(n sigma_a, n sigma_m) = S`;
  } else if (effective === 'constant-mean') {
    f = (n) => model.reversed(n * a, m);
    formula = `${model.formula}; n_f: sigma_ar(n sigma_a, sigma_m) = S`;
  } else {
    f = (n) => model.reversed(a, n * m);
    formula = `${model.formula}; n_f: sigma_ar(sigma_a, n sigma_m) = S`;
  }
  return { ...solvedOutcome(f, s.S, formula, src, base, unbounded, zero), extraTerms: model.terms };
}

/** Fatigue safety factor of (sigma_a, sigma_m) for a criterion and load line. */
export function fatigueSafetyFactor(
  criterion: CriterionKey,
  line: LoadLine,
  sigma_a: number,
  sigma_m: number,
  s: StrengthSet,
): Computed {
  const errors: string[] = [];
  if (!CRITERION_KEYS.includes(criterion)) errors.push(`Unknown criterion '${String(criterion)}'.`);
  if (!LOAD_LINES.includes(line)) errors.push(`Unknown load line '${String(line)}'.`);
  if (!isFiniteNumber(sigma_a) || !isFiniteNumber(sigma_m))
    errors.push('sigma_a and sigma_m must be finite numbers.');
  if (errors.length === 0) errors.push(...strengthProblems(criterion, s));
  if (errors.length > 0)
    return computed(
      0,
      'n_f',
      'n/a',
      undefined,
      errors.map((message) => ({ code: 'input', message, severity: 'error' as const })),
    );

  const a = Math.abs(sigma_a);
  const m = sigma_m;
  const terms: Term[] = [
    { name: 'sigma_a', value: a / MPA, unit: 'MPa' },
    { name: 'sigma_m', value: m / MPA, unit: 'MPa' },
    { name: 'S', value: s.S / MPA, unit: 'MPa' },
    { name: 'Sut', value: s.Sut / MPA, unit: 'MPa' },
  ];
  if (isFiniteNumber(s.Sy) && s.Sy > 0) terms.push({ name: 'Sy', value: s.Sy / MPA, unit: 'MPa' });

  if (a === 0 && m === 0) {
    return infinite('n_f = S / sigma_a', 'no alternating and no mean stress', terms, [
      {
        code: 'infinite',
        message: 'No stress: the fatigue safety factor is unbounded.',
        severity: 'information',
      },
    ]);
  }

  const model = classicalModel(criterion);
  if (model) return finish(classicalFactor(model, line, a, m, s), terms);
  const o = finiteLifeFactor(criterion as 'morrow' | 'swt' | 'walker', line, a, m, s);
  return finish(o, [...terms, ...o.extraTerms]);
}
