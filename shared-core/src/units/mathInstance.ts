/**
 * The one mathjs instance of fatigue-notes. Notes never reach mathjs's own evaluator:
 * expressions are parsed by mathjs, checked against a whitelist and run by the
 * interpreter in `language/expressions.ts`, which calls only the arithmetic below.
 * Trade units that mathjs lacks are registered here, once.
 */
import {
  absDependencies,
  acosDependencies,
  addDependencies,
  asinDependencies,
  atan2Dependencies,
  atanDependencies,
  cbrtDependencies,
  cosDependencies,
  create,
  createUnitDependencies,
  divideDependencies,
  expDependencies,
  hypotDependencies,
  log10Dependencies,
  logDependencies,
  type MathJsInstance,
  maxDependencies,
  minDependencies,
  multiplyDependencies,
  parseDependencies,
  powDependencies,
  sinDependencies,
  sqrtDependencies,
  subtractDependencies,
  tanDependencies,
  toDependencies,
  type Unit,
  unaryMinusDependencies,
  unitDependencies,
} from 'mathjs';

// Only the factories the language calls: the parser, units and the whitelisted arithmetic
// (language/expressions.ts). Building mathjs's whole default instance cost most of a short
// command's start-up; the functions built here are the same factories with the same config.
const math = create(
  {
    parseDependencies,
    unitDependencies,
    createUnitDependencies,
    toDependencies,
    addDependencies,
    subtractDependencies,
    multiplyDependencies,
    divideDependencies,
    unaryMinusDependencies,
    powDependencies,
    sqrtDependencies,
    cbrtDependencies,
    absDependencies,
    expDependencies,
    logDependencies,
    log10Dependencies,
    sinDependencies,
    cosDependencies,
    tanDependencies,
    asinDependencies,
    acosDependencies,
    atanDependencies,
    atan2Dependencies,
    minDependencies,
    maxDependencies,
    hypotDependencies,
  },
  {},
) as MathJsInstance;

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
