/**
 * The one mathjs instance of fatigue-notes. Notes never reach mathjs's own evaluator:
 * expressions are parsed by mathjs, checked against a whitelist and run by the
 * interpreter in `language/expressions.ts`, which calls only the arithmetic below.
 * Trade units that mathjs lacks are registered here, once.
 */
import { all, create, type MathJsInstance, type Unit } from 'mathjs';

const math: MathJsInstance = create(all, {});

// mathjs 15 has psi but not ksi/kpsi; MPa, GPa, kN, lbf, kip, in, ft, degC, degF are built in.
math.createUnit('ksi', { definition: '1000 psi', aliases: ['kpsi'] });

export type { Unit };
export { math };

const valueless = new Map<string, Unit | null>();

/** The valueless mathjs unit for a name (`MPa`, `N`, `in` ...), or null when it is not a unit. */
export function unitNamed(name: string): Unit | null {
  let u = valueless.get(name);
  if (u !== undefined) return u;
  try {
    u = math.Unit.isValuelessUnit(name) ? math.unit(name) : null;
  } catch {
    u = null;
  }
  valueless.set(name, u);
  return u;
}

export function isUnit(x: unknown): x is Unit {
  return math.isUnit(x);
}
