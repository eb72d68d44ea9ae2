/**
 * Marin size factor kb and the equivalent diameters of non-rotating sections.
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed.:
 *   Eq. (6-20)  kb = 0.879 d^-0.107 (0.11 <= d <= 2 in),  0.91 d^-0.157 (2 < d <= 10 in)
 *               kb = 1.24 d^-0.107 (2.79 <= d <= 51 mm), 1.51 d^-0.157 (51 < d <= 254 mm)
 *   Eq. (6-21)  kb = 1 for axial loading
 *   Table 6-3 and Eq. (6-24)  de = 0.370 d   (non-rotating round, from A95 = 0.01046 d^2)
 *   Table 6-3 and Eq. (6-25)  de = 0.808 sqrt(h b)   (rectangle h x b in bending)
 *
 * Outside the fit range the method still answers, with a `fit-range` note:
 *   - below the lower bound (2.79 mm / 0.11 in): kb = 1 (no credit for smallness; the fit
 *     itself would give kb > 1, which is unconservative to extrapolate);
 *   - above the upper bound (254 mm / 10 in): the fit evaluated at the bound (kb = 0.633 SI),
 *     which stays inside the 0.60 to 0.75 older texts quote for large sizes (Brown, Marks'
 *     Calculations for Machine Design, 2005, Sec. 7, after Eq. 7.10). Extrapolating the power
 *     law further is not supported by the data behind it.
 */
import { type Computed, computed, INCH, type MethodNote, MM, type Term } from '../computed';

export type SizeLoad = 'bending' | 'torsion' | 'axial' | 'combined';
export type UnitSystem = 'SI' | 'US';

export interface RoundSizeOptions {
  rotation: 'rotating' | 'non-rotating';
  load: SizeLoad;
  unitSystem: UnitSystem;
}

export interface RectangularSizeOptions {
  load: SizeLoad;
  unitSystem: UnitSystem;
}

const SOURCE_KB =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-20) (size factor, 133 data sets), Eq. (6-21) (axial)";
const SOURCE_DE_ROUND =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Table 6-3 and Eq. (6-24): de = 0.370 d (95 % stressed area of a non-rotating round)";
const SOURCE_DE_RECT =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Table 6-3 and Eq. (6-25): de = 0.808 sqrt(h b) (95 % stressed area of a rectangle in bending)";

/** Equivalent-diameter coefficient of a non-rotating round, sqrt(0.01046 / 0.0766) rounded as published. */
const DE_ROUND = 0.37;
/** Equivalent-diameter coefficient of a rectangle, sqrt(0.05 / 0.0766) rounded as published. */
const DE_RECT = 0.808;

function invalid(formula: string, source: string, message: string, terms: Term[] = []): Computed {
  return computed(1, formula, source, terms, [{ code: 'invalid-input', severity: 'error', message }]);
}

function isPositive(x: number): boolean {
  return typeof x === 'number' && Number.isFinite(x) && x > 0;
}

/** Equivalent diameter of a non-rotating round bar (solid or hollow, outer diameter `d`, m). */
export function equivalentDiameterRound(d: number): Computed {
  const formula = 'de = 0.370 * d';
  if (!isPositive(d)) return invalid(formula, SOURCE_DE_ROUND, 'd must be a positive length.');
  return computed(DE_ROUND * d, formula, SOURCE_DE_ROUND, [{ name: 'd', value: d / MM, unit: 'mm' }]);
}

/** Equivalent diameter of a rectangular section h x b (m) in bending. */
export function equivalentDiameterRectangular(h: number, b: number): Computed {
  const formula = 'de = 0.808 * sqrt(h * b)';
  if (!isPositive(h) || !isPositive(b)) {
    return invalid(formula, SOURCE_DE_RECT, 'h and b must be positive lengths.');
  }
  return computed(DE_RECT * Math.sqrt(h * b), formula, SOURCE_DE_RECT, [
    { name: 'h', value: h / MM, unit: 'mm' },
    { name: 'b', value: b / MM, unit: 'mm' },
  ]);
}

interface FitResult {
  value: number;
  formula: string;
  terms: Term[];
  notes: MethodNote[];
}

/** Eq. (6-20) evaluated at diameter `dm` (m) in the chosen unit system; `label` is `d` or `de`. */
function kbFit(dm: number, unitSystem: UnitSystem, label: string): FitResult {
  const us = unitSystem === 'US';
  const unit = us ? 'in' : 'mm';
  const x = us ? dm / INCH : dm / MM;
  const lo = us ? 0.11 : 2.79;
  const mid = us ? 2 : 51;
  const hi = us ? 10 : 254;
  const small = us ? { a: 0.879, b: -0.107 } : { a: 1.24, b: -0.107 };
  const large = us ? { a: 0.91, b: -0.157 } : { a: 1.51, b: -0.157 };
  const notes: MethodNote[] = [];
  const terms: Term[] = [{ name: label, value: x, unit }];

  if (x < lo) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `${label} = ${x.toPrecision(3)} ${unit} is below the ${lo} ${unit} lower bound of the size-factor fit (Eq. 6-20); kb = 1 taken (no credit for a small section).`,
    });
    return { value: 1, formula: `kb = 1  (${label} < ${lo} ${unit}, below the fit range)`, terms, notes };
  }

  let evalAt = x;
  if (x > hi) {
    evalAt = hi;
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `${label} = ${x.toPrecision(4)} ${unit} is above the ${hi} ${unit} upper bound of the size-factor fit (Eq. 6-20); kb evaluated at ${label} = ${hi} ${unit}. Large sections need test data or a conservative allowance.`,
    });
  }
  const c = evalAt <= mid ? small : large;
  const range = evalAt <= mid ? `${lo} <= ${label} <= ${mid} ${unit}` : `${mid} < ${label} <= ${hi} ${unit}`;
  const value = c.a * evalAt ** c.b;
  terms.push({ name: 'a', value: c.a, unit: '' }, { name: 'b', value: c.b, unit: '' });
  if (evalAt !== x) terms.push({ name: `${label} (evaluated)`, value: evalAt, unit });
  if (value > 1) {
    notes.push({
      code: 'factor-above-one',
      severity: 'hint',
      message: `kb = ${value.toFixed(3)} > 1: the section is smaller than the 7.62 mm (0.30 in) rotating-beam specimen and the published fit credits it; kb = 1 is the cautious choice.`,
    });
  }
  return { value, formula: `kb = ${c.a} * ${label}^${c.b}  (${label} in ${unit}, ${range})`, terms, notes };
}

function axial(): Computed {
  return computed(1, 'kb = 1  (axial loading: no size effect; see kc)', SOURCE_KB);
}

const COMBINED_NOTE = ' [combined loading: the bending/torsion size factor applies to Se]';

/** Size factor of a round section of diameter `d` (m). */
export function sizeFactorRound(d: number, opts: RoundSizeOptions): Computed {
  if (!isPositive(d)) {
    return invalid('kb = a * d^b  (Eq. 6-20)', SOURCE_KB, 'd must be a positive length; kb = 1 shown.');
  }
  if (opts.load === 'axial') return axial();
  const suffix = opts.load === 'combined' ? COMBINED_NOTE : '';
  if (opts.rotation === 'non-rotating') {
    const de = equivalentDiameterRound(d);
    const fit = kbFit(de.value, opts.unitSystem, 'de');
    const dTerm: Term =
      opts.unitSystem === 'US'
        ? { name: 'd', value: d / INCH, unit: 'in' }
        : { name: 'd', value: d / MM, unit: 'mm' };
    return computed(
      fit.value,
      `${fit.formula}, de = 0.370 * d${suffix}`,
      `${SOURCE_KB}; ${SOURCE_DE_ROUND}`,
      [dTerm, ...fit.terms],
      fit.notes,
    );
  }
  const fit = kbFit(d, opts.unitSystem, 'd');
  return computed(fit.value, fit.formula + suffix, SOURCE_KB, fit.terms, fit.notes);
}

/** Size factor of a rectangular section h x b (m), via the equivalent diameter 0.808 sqrt(h b). */
export function sizeFactorRectangular(h: number, b: number, opts: RectangularSizeOptions): Computed {
  if (!isPositive(h) || !isPositive(b)) {
    return invalid(
      'kb = a * de^b, de = 0.808 * sqrt(h * b)',
      SOURCE_KB,
      'h and b must be positive lengths; kb = 1 shown.',
    );
  }
  if (opts.load === 'axial') return axial();
  const suffix = opts.load === 'combined' ? COMBINED_NOTE : '';
  const de = equivalentDiameterRectangular(h, b);
  const fit = kbFit(de.value, opts.unitSystem, 'de');
  const unit = opts.unitSystem === 'US' ? 'in' : 'mm';
  const scale = opts.unitSystem === 'US' ? INCH : MM;
  return computed(
    fit.value,
    `${fit.formula}, de = 0.808 * sqrt(h * b)${suffix}`,
    `${SOURCE_KB}; ${SOURCE_DE_RECT}`,
    [{ name: 'h', value: h / scale, unit }, { name: 'b', value: b / scale, unit }, ...fit.terms],
    fit.notes,
  );
}
