/**
 * What an expression of a note evaluates to, the scope it reads its names from, and the
 * error it raises: the interface between the block language (`language/expressions.ts`, the
 * interpreter) and the checks, which evaluate through `CheckContext.evaluate`.
 */
import type { DimVector } from '../units/dimensions';
import type { Unit } from '../units/mathInstance';

export interface Quantity {
  /** Value in SI base units (K for temperatures). */
  si: number;
  dim: DimVector;
  /** The mathjs value, kept so that names used in later expressions keep their units. */
  raw: Unit | number;
  /** The unit the author wrote, when the expression is a plain `number unit`. */
  statedUnit?: string;
}

export class ExpressionError extends Error {
  constructor(
    public readonly code: string,
    message: string,
    /** Offset of the offending text within the expression, when known. */
    public readonly offset?: number,
    public readonly length?: number,
  ) {
    super(message);
  }
}

export interface Scope {
  /** A name of this block, or `undefined`. */
  get(name: string): Unit | number | undefined;
  /** `check.member`; returns undefined when unknown (the evaluator reports which part). */
  member(check: string, member: string): Unit | number | undefined;
  hasCheck(check: string): boolean;
}
