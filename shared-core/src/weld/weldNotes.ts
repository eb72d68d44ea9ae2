/** Small helpers shared by the welded-detail functions: input notes and terms in MPa. */
import type { MethodNote, Term } from '../computed';
import { MPA } from '../computed';

export function inputError(message: string): MethodNote {
  return { code: 'input-invalid', severity: 'error', message };
}

export function fromMemory(what: string): MethodNote {
  return {
    code: 'from-memory',
    severity: 'information',
    message: `${what} rests on a recalled copy of the source, not a looked-up one: check it against the edition in use.`,
  };
}

/** A term in MPa; a non-finite input shows as 0 (its error note says why). */
export function mpaTerm(name: string, pa: number): Term {
  const v = pa / MPA;
  return { name, value: Number.isFinite(v) ? v : 0, unit: 'MPa' };
}

/** A plain term; a non-finite input shows as 0 (its error note says why). */
export function numTerm(name: string, value: number, unit = ''): Term {
  return { name, value: Number.isFinite(value) ? value : 0, unit };
}

export function isPositive(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x) && x > 0;
}

export function isFiniteNumber(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

/** `1.234e+6` style for cycle counts in messages. */
export function cyclesText(n: number): string {
  return n.toExponential(3).replace(/\.?0+e/, 'e');
}

export function mpaText(pa: number): string {
  return `${(pa / MPA).toPrecision(4)} MPa`;
}
