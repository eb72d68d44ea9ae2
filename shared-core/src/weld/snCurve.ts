/**
 * S-N curves of welded details by detail class: the detail category of EN 1993-1-9 and the FAT
 * class of the IIW recommendations, both the characteristic stress range at N_C = 2e6 cycles.
 *
 *   N = N_C (Delta sigma_C / Delta sigma)^m1                 above the knee (Delta sigma >= Delta sigma_D)
 *   N = N_D (Delta sigma_D / Delta sigma)^m2                 below the knee, where the loading has a second slope
 *   no damage                                                below the knee without a second slope (fatigue limit),
 *                                                            or below the cut-off Delta sigma_L
 *
 * The knee and the second slope depend on the standard, the stress (normal or shear) and the
 * loading (constant or variable amplitude); see `enCurve` and `iiwCurve`. Ranges are in Pa.
 */
import { type Computed, computed, infinite, type MethodNote, MPA, type Term } from '../computed';
import { EN_CURVE_SOURCE, IIW_CURVE_SOURCE_2008, IIW_CURVE_SOURCE_2016 } from './sources';
import { cyclesText, inputError, isPositive, mpaTerm, mpaText, numTerm } from './weldNotes';

export type WeldStress = 'normal' | 'shear';
export type WeldMaterial = 'steel' | 'aluminium';
export type WeldLoading = 'constant' | 'variable';
export type IiwEdition = '2008' | '2016';
export type WeldStandard = 'EN 1993-1-9' | 'IIW';

export interface WeldSnCurve {
  standard: WeldStandard;
  /** IIW edition; absent for EN 1993-1-9. */
  edition?: IiwEdition;
  stress: WeldStress;
  material: WeldMaterial;
  /** Characteristic range at N_C (the detail class after any correction), Pa. */
  deltaC: number;
  NC: number;
  m1: number;
  /** Knee: cycles and range. */
  ND: number;
  deltaD: number;
  /** Slope beyond the knee under constant amplitude; null: no damage below the knee (a fatigue limit). */
  m2Constant: number | null;
  /** Slope beyond the knee under variable amplitude; null: no damage below the knee. */
  m2Variable: number | null;
  /** Cut-off: cycles and range below which no range does damage; null: none. */
  NL: number | null;
  deltaL: number | null;
  source: string;
  /** e.g. `EN 1993-1-9 detail category 71, normal stress`. */
  label: string;
}

export type WeldCurveResult = Computed & { curve: WeldSnCurve };

/** Lowest life the standards draw their curves from (EN 1993-1-9 Fig. 7.1, IIW Fig. 3.2-1 start at 1e4; from memory). */
export const N_LOW_END = 1e4;
export const N_C = 2e6;

function classErrors(deltaC: number, what: string): MethodNote[] {
  if (!isPositive(deltaC)) return [inputError(`The ${what} must be a positive stress range.`)];
  if (deltaC < 1 * MPA)
    return [
      inputError(
        `The ${what} ${mpaText(deltaC)} is below any class of the standards (they start near 10 MPa): check the unit.`,
      ),
    ];
  if (deltaC > 1000 * MPA)
    return [
      inputError(
        `The ${what} ${mpaText(deltaC)} is beyond any class of the standards (they end near 250 MPa).`,
      ),
    ];
  return [];
}

function curveTerms(c: WeldSnCurve): Term[] {
  const t: Term[] = [
    mpaTerm('Delta sigma_C', c.deltaC),
    numTerm('N_C', c.NC),
    numTerm('m1', c.m1),
    numTerm('N_D', c.ND),
    mpaTerm('Delta sigma_D', c.deltaD),
  ];
  if (c.m2Variable !== null) t.push(numTerm('m2 (variable amplitude)', c.m2Variable));
  if (c.m2Constant !== null) t.push(numTerm('m2 (constant amplitude)', c.m2Constant));
  if (c.NL !== null && c.deltaL !== null) t.push(numTerm('N_L', c.NL), mpaTerm('Delta sigma_L', c.deltaL));
  return t;
}

/**
 * EN 1993-1-9 curve of a detail category (Delta sigma_C or Delta tau_C in Pa). Normal stress:
 * m = 3 to the constant-amplitude fatigue limit at 5e6, m = 5 (variable amplitude) to the cut-off
 * at 1e8. Shear: m = 5 to the cut-off at 1e8, no constant-amplitude limit above it.
 */
export function enCurve(deltaC: number, stress: WeldStress = 'normal'): WeldCurveResult {
  const errors = classErrors(
    deltaC,
    stress === 'shear' ? 'detail category Delta tau_C' : 'detail category Delta sigma_C',
  );
  const dc = errors.length > 0 ? 0 : deltaC;
  let curve: WeldSnCurve;
  let formula: string;
  if (stress === 'normal') {
    const deltaD = (2 / 5) ** (1 / 3) * dc;
    const deltaL = (5 / 100) ** (1 / 5) * deltaD;
    curve = {
      standard: 'EN 1993-1-9',
      stress,
      material: 'steel',
      deltaC: dc,
      NC: N_C,
      m1: 3,
      ND: 5e6,
      deltaD,
      m2Constant: null,
      m2Variable: 5,
      NL: 1e8,
      deltaL,
      source: EN_CURVE_SOURCE,
      label: `EN 1993-1-9 detail category ${(dc / MPA).toPrecision(3)}, normal stress`,
    };
    formula =
      'Delta sigma_D = (2/5)^(1/3) Delta sigma_C at 5e6; Delta sigma_L = (5/100)^(1/5) Delta sigma_D at 1e8; m = 3 above Delta sigma_D, m = 5 below (variable amplitude)';
  } else {
    const deltaL = (2 / 100) ** (1 / 5) * dc;
    curve = {
      standard: 'EN 1993-1-9',
      stress,
      material: 'steel',
      deltaC: dc,
      NC: N_C,
      m1: 5,
      ND: 1e8,
      deltaD: deltaL,
      m2Constant: null,
      m2Variable: null,
      NL: 1e8,
      deltaL,
      source: EN_CURVE_SOURCE,
      label: `EN 1993-1-9 detail category ${(dc / MPA).toPrecision(3)}, shear stress`,
    };
    formula = 'Delta tau_L = (2/100)^(1/5) Delta tau_C at 1e8; m = 5 down to Delta tau_L, no damage below';
  }
  return { ...computed(dc, formula, EN_CURVE_SOURCE, curveTerms(curve), errors), curve };
}

export interface IiwCurveOptions {
  stress?: WeldStress;
  material?: WeldMaterial;
  /** Slope above the knee when the class comes with its own (e.g. m = 5 after HFMI); default 3 normal, 5 shear. */
  m1?: number;
}

/**
 * IIW curve of a FAT class (Pa). The edition is stated, never defaulted, because the editions
 * treat the region beyond the knee differently:
 *
 * - 2016 (XIII-2460-13): knee at 1e7 (normal) or 1e8 (shear); beyond it m = 22 for constant and
 *   variable amplitude alike; no cut-off.
 * - 2008 (IIW-1823-07): same knees; constant amplitude: no damage below the knee; variable
 *   amplitude: m2 = 2 m1 - 1 below the knee (5 for normal stress), no cut-off.
 */
export function iiwCurve(FAT: number, edition: IiwEdition, opts: IiwCurveOptions = {}): WeldCurveResult {
  const stress = opts.stress ?? 'normal';
  const material = opts.material ?? 'steel';
  const errors = classErrors(FAT, 'FAT class');
  const m1 = opts.m1 ?? (stress === 'normal' ? 3 : 5);
  if (!(Number.isFinite(m1) && m1 >= 2 && m1 <= 12))
    errors.push(inputError('The slope m1 must lie between 2 and 12.'));
  if (edition !== '2008' && edition !== '2016')
    errors.push(inputError('The IIW edition must be 2008 or 2016.'));
  const dc = errors.length > 0 ? 0 : FAT;
  const m = errors.length > 0 ? 3 : m1;
  const ND = stress === 'normal' ? 1e7 : 1e8;
  const deltaD = dc * (N_C / ND) ** (1 / m);
  const source = edition === '2008' ? IIW_CURVE_SOURCE_2008 : IIW_CURVE_SOURCE_2016;
  const curve: WeldSnCurve = {
    standard: 'IIW',
    edition: edition === '2008' ? '2008' : '2016',
    stress,
    material,
    deltaC: dc,
    NC: N_C,
    m1: m,
    ND,
    deltaD,
    m2Constant: edition === '2008' ? null : 22,
    m2Variable: edition === '2008' ? 2 * m - 1 : 22,
    NL: null,
    deltaL: null,
    source,
    label: `IIW ${edition} FAT ${(dc / MPA).toPrecision(3)}, ${material}, ${stress} stress`,
  };
  const formula =
    edition === '2008'
      ? `Delta sigma_D = FAT (2e6 / N_D)^(1/m1), N_D = ${cyclesText(ND)}; constant amplitude: no damage below Delta sigma_D; variable amplitude: m2 = 2 m1 - 1`
      : `Delta sigma_D = FAT (2e6 / N_D)^(1/m1), N_D = ${cyclesText(ND)}; m = 22 beyond the knee`;
  const notes: MethodNote[] = [...errors];
  if (errors.length === 0)
    notes.push({
      code: 'from-memory',
      severity: 'information',
      message: `The IIW ${edition} knee and slope beyond it rest on a recalled copy of the recommendations: check them against the edition in use.`,
    });
  return { ...computed(dc, formula, source, curveTerms(curve), notes), curve };
}

/** The curve with every range divided by gamma_Mf (the design curve), or multiplied by a correction factor. */
export function scaleCurve(curve: WeldSnCurve, factor: number): WeldSnCurve {
  const f = isPositive(factor) ? factor : 0;
  return {
    ...curve,
    deltaC: curve.deltaC * f,
    deltaD: curve.deltaD * f,
    deltaL: curve.deltaL === null ? null : curve.deltaL * f,
  };
}

/** The constant-amplitude fatigue limit or knee range, Pa, with its derivation. */
export function kneeRange(curve: WeldSnCurve): Computed {
  const formula = 'Delta sigma_D = Delta sigma_C (N_C / N_D)^(1/m1)';
  return computed(curve.deltaD, formula, curve.source, [
    mpaTerm('Delta sigma_C', curve.deltaC),
    numTerm('N_C', curve.NC),
    numTerm('N_D', curve.ND),
    numTerm('m1', curve.m1),
  ]);
}

/** The cut-off range, Pa; zero with a note where the curve has none. */
export function cutOffRange(curve: WeldSnCurve): Computed {
  if (curve.deltaL === null || curve.NL === null)
    return computed(0, 'no cut-off', curve.source, undefined, [
      {
        code: 'no-cut-off',
        severity: 'information',
        message: `${curve.label}: the curve has no cut-off; every range does damage.`,
      },
    ]);
  const formula =
    curve.m2Variable === null
      ? 'Delta sigma_L = Delta sigma_C (N_C / N_L)^(1/m1)'
      : 'Delta sigma_L = Delta sigma_D (N_D / N_L)^(1/m2)';
  return computed(curve.deltaL, formula, curve.source, [
    mpaTerm('Delta sigma_D', curve.deltaD),
    numTerm('N_D', curve.ND),
    numTerm('N_L', curve.NL),
    numTerm('m2', curve.m2Variable ?? curve.m1),
  ]);
}

/** Cycles to failure at one range (Pa) under the loading's treatment of the knee; Infinity when no damage. No notes. */
export function lifeKernel(curve: WeldSnCurve, range: number, loading: WeldLoading): number {
  if (!(range > 0) || !(curve.deltaC > 0)) return Number.POSITIVE_INFINITY;
  if (range >= curve.deltaD) return curve.NC * (curve.deltaC / range) ** curve.m1;
  if (curve.deltaL !== null && range < curve.deltaL) return Number.POSITIVE_INFINITY;
  const m2 = loading === 'constant' ? curve.m2Constant : curve.m2Variable;
  if (m2 === null) return Number.POSITIVE_INFINITY;
  return curve.ND * (curve.deltaD / range) ** m2;
}

function curveUnusable(curve: WeldSnCurve): MethodNote[] {
  return curve && curve.deltaC > 0
    ? []
    : [inputError('The S-N curve has no usable class: state the detail class.')];
}

/** Cycles to failure at a stress range (Pa); `infinite` below the fatigue limit or the cut-off. */
export function weldLife(curve: WeldSnCurve, range: number, loading: WeldLoading): Computed {
  const bad = curveUnusable(curve);
  const terms: Term[] = [mpaTerm('Delta sigma', Number.isFinite(range) ? range : 0), ...curveTerms(curve)];
  if (bad.length > 0)
    return computed(0, 'N = N_C (Delta sigma_C / Delta sigma)^m1', curve?.source ?? '', terms, bad);
  if (!(Number.isFinite(range) && range >= 0))
    return computed(0, 'N = N_C (Delta sigma_C / Delta sigma)^m1', curve.source, terms, [
      inputError('The stress range must be a finite, non-negative stress.'),
    ]);
  const m2 = loading === 'constant' ? curve.m2Constant : curve.m2Variable;
  if (range === 0)
    return infinite('no range: no damage', curve.source, terms, [
      { code: 'no-damage', severity: 'information', message: 'No stress range: no fatigue damage.' },
    ]);
  if (range >= curve.deltaD) {
    const N = lifeKernel(curve, range, loading);
    const notes: MethodNote[] = [];
    if (N < N_LOW_END)
      notes.push({
        code: 'low-cycle',
        severity: 'warning',
        message: `N = ${cyclesText(N)} is below ${cyclesText(N_LOW_END)} cycles, where the standard's curves begin: check the static strength and the stress-range limit.`,
      });
    return computed(N, 'N = N_C (Delta sigma_C / Delta sigma)^m1', curve.source, terms, notes);
  }
  if (curve.deltaL !== null && range < curve.deltaL)
    return infinite('Delta sigma < Delta sigma_L: no damage (cut-off)', curve.source, terms, [
      {
        code: 'below-cut-off',
        severity: 'information',
        message: `${mpaText(range)} is below the cut-off ${mpaText(curve.deltaL)}: no damage.`,
      },
    ]);
  if (m2 === null)
    return infinite(
      'Delta sigma < Delta sigma_D: no damage (constant-amplitude fatigue limit)',
      curve.source,
      terms,
      [
        {
          code: 'below-knee',
          severity: 'information',
          message: `${mpaText(range)} is below the ${loading === 'constant' ? 'constant-amplitude fatigue limit' : 'knee'} ${mpaText(curve.deltaD)}: no damage under ${loading} amplitude.`,
        },
      ],
    );
  const N = lifeKernel(curve, range, loading);
  if (!(N < 1e300))
    return infinite(
      'N = N_D (Delta sigma_D / Delta sigma)^m2',
      curve.source,
      [...terms, numTerm('m2', m2)],
      [
        {
          code: 'infinite',
          severity: 'information',
          message: 'The life overflows any count of cycles: treated as infinite.',
        },
      ],
    );
  return computed(N, 'N = N_D (Delta sigma_D / Delta sigma)^m2', curve.source, [...terms, numTerm('m2', m2)]);
}

/** Characteristic (or design, on a scaled curve) range at a life N, Pa. */
export function weldStrengthAtLife(curve: WeldSnCurve, N: number, loading: WeldLoading): Computed {
  const bad = curveUnusable(curve);
  const terms: Term[] = [numTerm('N', Number.isFinite(N) ? N : 0), ...curveTerms(curve)];
  const formula = 'Delta sigma_R = Delta sigma_C (N_C / N)^(1/m1)';
  if (bad.length > 0) return computed(0, formula, curve?.source ?? '', terms, bad);
  if (!isPositive(N) || N < 1 || N > 1e300)
    return computed(0, formula, curve.source, terms, [
      inputError('The life N must be a number of cycles from 1 up.'),
    ]);
  const notes: MethodNote[] = [];
  if (N < N_LOW_END)
    notes.push({
      code: 'low-cycle',
      severity: 'warning',
      message: `N = ${cyclesText(N)} is below ${cyclesText(N_LOW_END)} cycles, where the standard's curves begin: the range is an extrapolation; check the static strength and the stress-range limit.`,
    });
  if (N <= curve.ND)
    return computed(curve.deltaC * (curve.NC / N) ** (1 / curve.m1), formula, curve.source, terms, notes);
  const m2 = loading === 'constant' ? curve.m2Constant : curve.m2Variable;
  if (m2 === null)
    return computed(
      curve.deltaD,
      'Delta sigma_R = Delta sigma_D (beyond the knee: fatigue limit)',
      curve.source,
      terms,
      notes,
    );
  if (curve.NL !== null && curve.deltaL !== null && N >= curve.NL)
    return computed(
      curve.deltaL,
      'Delta sigma_R = Delta sigma_L (beyond the cut-off)',
      curve.source,
      terms,
      notes,
    );
  return computed(
    curve.deltaD * (curve.ND / N) ** (1 / m2),
    'Delta sigma_R = Delta sigma_D (N_D / N)^(1/m2)',
    curve.source,
    [...terms, numTerm('m2', m2)],
    notes,
  );
}
