/**
 * The record every method of the core returns: a number with the formula that made it,
 * the intermediate terms worth showing, its published source and any warnings (fit range
 * exceeded, criterion outside its domain ...). The block evaluator wraps it into a
 * `Value` with the inputs' display units; hovers, the report and the JSON are views of it.
 *
 * Numbers are in SI base units (Pa, m, N, N*m, K) or dimensionless. A method never
 * returns NaN or Infinity: where a limit is infinite it says so through `infinite`.
 */
export interface Term {
  /** Symbol as shown in the derivation, e.g. `a`, `b`, `sqrt(a)`, `h/r`. */
  name: string;
  /** Value expressed in `unit` (not necessarily SI: a fit constant in MPa stays in MPa). */
  value: number;
  /** Unit text, '' for a pure number. */
  unit: string;
}

export interface MethodNote {
  /** Stable diagnostic code, e.g. `fit-range`, `criterion-domain`. */
  code: string;
  message: string;
  severity?: 'error' | 'warning' | 'information' | 'hint';
}

export interface Computed {
  value: number;
  /** True when the quantity is unbounded (e.g. life below the endurance limit); `value` is then 0 and must not be used. */
  infinite?: boolean;
  /** The formula in plain text, using the contract's symbol names, e.g. `ka = a * Sut^b`. */
  formula: string;
  /** Author, title, edition, equation or table; "from memory" or "common practice, no source" where that is the truth. */
  source: string;
  terms?: Term[];
  notes?: MethodNote[];
}

export function computed(
  value: number,
  formula: string,
  source: string,
  terms?: Term[],
  notes?: MethodNote[],
): Computed {
  const out: Computed = { value, formula, source };
  if (terms && terms.length > 0) out.terms = terms;
  if (notes && notes.length > 0) out.notes = notes;
  return out;
}

export function infinite(formula: string, source: string, terms?: Term[], notes?: MethodNote[]): Computed {
  return { ...computed(0, formula, source, terms, notes), infinite: true };
}

/** Throw-free guard for a method's own arithmetic: a non-finite intermediate is a bug or an input outside any sense. */
export function isFiniteNumber(x: number): boolean {
  return typeof x === 'number' && Number.isFinite(x);
}

/** Unit conversions the fits need (exact by definition). */
export const MPA = 1e6;
export const KSI = 6.894757293168361e6; // 1 ksi = 1000 lbf/in^2 (exact from 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m)
export const MM = 1e-3;
export const INCH = 0.0254;
