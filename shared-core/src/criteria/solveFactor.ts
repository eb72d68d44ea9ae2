/**
 * Bracketed root finder for a safety factor along a load line: the smallest `n >= 0` with
 * `f(n) = target`, for a function `f` that is non-decreasing in `n` (the equivalent fully
 * reversed stress of the scaled load). `f` may return `STATIC_FAILURE` where the scaled state is
 * beyond the criterion's static limit; a jump to it is bracketed like any crossing.
 *
 * The bracket grows by doubling from [0, 1] and is then bisected to a relative width of 1e-13.
 * Plain bisection of a bracket: no published source needed (numerical analysis, exact to the tolerance).
 */

/** Sentinel a kernel returns for a state past the static limit (mean at or beyond the intercept). */
export const STATIC_FAILURE = Number.MAX_VALUE;

/** Beyond this factor a load line is treated as never reaching the criterion. */
export const MAX_FACTOR = 1e12;

export type FactorSolution =
  | { kind: 'root'; n: number; iterations: number }
  /** `f(0)` already reaches the target: the fixed part of the load alone fails. */
  | { kind: 'zero' }
  /** `f(n)` stays below the target for every `n` up to `MAX_FACTOR`. */
  | { kind: 'unbounded' };

function below(f: (n: number) => number, n: number, target: number): boolean {
  const v = f(n);
  // NaN counts as "not below": a kernel that cannot evaluate a state is treated as failed there.
  return v < target;
}

export function solveFactor(f: (n: number) => number, target: number): FactorSolution {
  if (!(target > 0) || !Number.isFinite(target)) return { kind: 'zero' };
  if (!below(f, 0, target)) return { kind: 'zero' };
  let lo = 0;
  let hi = 1;
  let iterations = 0;
  while (below(f, hi, target)) {
    lo = hi;
    hi *= 2;
    iterations++;
    if (hi > MAX_FACTOR) return { kind: 'unbounded' };
  }
  for (let i = 0; i < 2000; i++) {
    iterations++;
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (below(f, mid, target)) lo = mid;
    else hi = mid;
    if (hi - lo <= 1e-13 * hi) break;
  }
  return { kind: 'root', n: 0.5 * (lo + hi), iterations };
}
