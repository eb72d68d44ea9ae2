/**
 * The statements of a fatigue block as the checks read them (types only; the parser is
 * `language/statements.ts`): spans with their ranges, so that a diagnostic lands on the
 * exact place.
 */
import type { Range } from './types';

export interface Span {
  text: string;
  range: Range;
}

export interface AssignStatement {
  kind: 'assign';
  line: number;
  name: Span;
  expr: Span;
  whole: Range;
}

export interface OptionStatement {
  kind: 'option';
  line: number;
  key: Span;
  value: Span;
  whole: Range;
}

export interface RequireItem {
  symbol: Span;
  op: '>=' | '<=' | '>' | '<';
  expr: Span;
  whole: Span;
}

export interface RequireStatement {
  kind: 'require';
  line: number;
  items: RequireItem[];
  whole: Range;
}

export interface SolveStatement {
  kind: 'solve';
  line: number;
  name: Span;
  symbol: Span;
  expr: Span;
  whole: Range;
}

export interface SpectrumStatement {
  kind: 'spectrum';
  line: number;
  items: Array<{ name: Span; expr: Span }>;
  whole: Range;
}

export interface BadStatement {
  kind: 'bad';
  line: number;
  code: string;
  message: string;
  range: Range;
}

export type Statement =
  | AssignStatement
  | OptionStatement
  | RequireStatement
  | SolveStatement
  | SpectrumStatement
  | BadStatement;
