/** Types shared by the block language, the evaluator and everything that presents results. */
import type { Term } from '../computed';
import type { DimKey } from '../units/dimensions';

/** 0-based line and UTF-16 character, as in LSP. */
export interface Position {
  line: number;
  character: number;
}

export interface Range {
  start: Position;
  end: Position;
}

export type Severity = 'error' | 'warning' | 'information' | 'hint';

export interface TextEdit {
  range: Range;
  newText: string;
}

export interface QuickFix {
  title: string;
  edits: TextEdit[];
  preferred?: boolean;
}

export interface Diagnostic {
  range: Range;
  severity: Severity;
  /** Stable code, listed in docs/diagnostics.md. */
  code: string;
  message: string;
  /** Id of the check it belongs to (null for a check without an id). */
  check?: string | null;
  fixes?: QuickFix[];
}

export type ValueOrigin = 'stated' | 'computed' | 'default' | 'library' | 'reference';

/** What the tool would have computed for a quantity the note states (shown beside the stated value). */
export interface ToolAlternative {
  si: number | null;
  infinite?: boolean;
  display: string;
  formula: string;
  source: string;
  /** What the tool computes it with, in a checker's words: `fit`, `elastic solution`, `computed`. */
  basis: string;
  /** Why the tool's value is what it is: `no notch feature stated`, `from r = 2 mm, Sut = 600 MPa`. */
  why: string;
  /** The two in one line, as the inline hint, the hover and the panel say it: `fit 1: no notch feature stated`. */
  label: string;
}

/** One number with its derivation: the single record behind hover, inline result, panel, report and JSON. */
export interface Value {
  name: string;
  dim: DimKey;
  /** SI value; null when infinite. */
  si: number | null;
  infinite?: boolean;
  display: string;
  origin: ValueOrigin;
  /** Short meaning, e.g. "surface factor". */
  meaning: string;
  formula?: string;
  /** The formula's inputs as `name = display` texts. */
  inputs?: Array<{ name: string; display: string }>;
  terms?: Term[];
  source?: string;
  /** The line where the note states it, or the line that drives it. */
  range?: Range;
  /** The expression as written, for stated values. */
  expression?: string;
  tool?: ToolAlternative;
  /** Remarks of the method (fit range, regime ...), shown with the derivation. */
  notes?: string[];
  /** Why a default was taken (for the assumptions register). */
  assumption?: string;
  /**
   * Why the value does not act on the results, when a stated value replaces the chain it
   * belongs to (e.g. `the stated Se replaces it` on ka ... kmisc): shown as "not used".
   */
  unused?: string;
}

export interface RequirementResult {
  text: string;
  symbol: string;
  op: '>=' | '<=' | '>' | '<';
  target: number | null;
  targetDisplay: string;
  actualDisplay: string;
  met: boolean | null;
  range: Range;
}

export type CheckStatus = 'pass' | 'fail' | 'error' | 'unchecked';
/** The value of `method:`: one of the registry's methods (`methods/registry.ts`). */
export type Method = string;

export interface HaighData {
  /** All stresses in Pa. `S` is Se or the fatigue strength at the required life. */
  S: number;
  Sut: number;
  Sy: number;
  shear: boolean;
  sigma_a: number;
  sigma_m: number;
  loadLine: 'proportional' | 'constant-mean' | 'constant-amplitude';
  criterion: string;
  n_f: number | null;
  curves: Array<{ key: string; label: string; points: Array<[number, number]> }>;
}

export interface SnData {
  a: number;
  b: number;
  N1: number;
  N2: number;
  S1: number;
  S2: number;
  hasKnee: boolean;
  /** Operating points: equivalent fully reversed stress (Pa) and life (null = infinite). */
  points: Array<{ label: string; sigma_ar: number; N: number | null; count?: number }>;
}

/**
 * The per-method records of a check (diagram data, tables). A method that needs a new one
 * adds it in its own folder by augmenting this interface
 * (`declare module '../../language/types' { interface MethodFields { ... } }`) and lists it
 * in its module's `fields`.
 */
export interface MethodFields {
  haigh?: HaighData;
  sn?: SnData;
  /** Extra per-method tables (damage contributors, crack size against cycles ...). */
  tables?: Array<{ title: string; columns: string[]; rows: string[][] }>;
  /** Crack size against cycles, for a crack-growth check (metres, cycles). */
  crackCurve?: Array<[number, number]>;
  /** Rainflow range-mean histogram, for a damage check with a history. */
  histogram?: { rangeEdges: number[]; meanEdges: number[]; counts: number[][]; unit: string };
}

export interface CheckResult extends MethodFields {
  id: string | null;
  title?: string;
  method: Method;
  criterion?: string;
  /** The whole fenced block, fences included. */
  range: Range;
  /** The info string's id (or the opening fence when there is no id). */
  headerRange: Range;
  /** Line after the last content line, where a quick fix may insert a statement. */
  insertLine: number;
  status: CheckStatus;
  values: Record<string, Value>;
  /** Names in the order a reader meets them: inputs first, then results. */
  order: string[];
  requirements: RequirementResult[];
  diagnostics: Diagnostic[];
  unitSystem: 'SI' | 'US';
}

export interface NoteResult {
  checks: CheckResult[];
  /** Every diagnostic of the note, those of the checks included. */
  diagnostics: Diagnostic[];
}

export function range(line: number, start: number, endLine: number, end: number): Range {
  return { start: { line, character: start }, end: { line: endLine, character: end } };
}

export function lineRange(line: number, start: number, end: number): Range {
  return range(line, start, line, end);
}
