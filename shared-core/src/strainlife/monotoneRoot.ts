/**
 * The root of an increasing function of a positive unknown, bracketed before Brent's method
 * (`design/brent.ts`) closes in on it. Every solver of the strain-life core goes through here,
 * so that a stress from a strain, a notch-root stress from Neuber's or Glinka's rule and a
 * life from a strain amplitude are found the same way: a bracket [lo, hi] with f(lo) <= 0 <=
 * f(hi) from the caller's analytic bounds, widened by factors of 2 if the bounds were loose,
 * then Brent to a relative tolerance of 1e-13.
 *
 * Pure; never throws; the caller gets `ok: false` (and a finite fallback) when f is not finite
 * or no sign change was found within the widening budget.
 */
import { brentRoot } from '../design/brent';

export interface MonotoneRoot {
  ok: boolean;
  /** The root (or, when !ok, the best finite guess: the end of the bracket with the smaller |f|). */
  x: number;
  /** False when Brent's evaluation budget ran out before the tolerance (the root is then within the bracket). */
  converged: boolean;
}

const WIDEN_STEPS = 200;

/**
 * x > 0 with f(x) = 0 for an increasing f; `lo` and `hi` are positive guesses of a bracket.
 * `widenBy` is the factor applied to a bracket end that is on the wrong side (default 2).
 */
export function increasingRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  relTol = 1e-13,
  widenBy = 2,
): MonotoneRoot {
  let a = Number.isFinite(lo) && lo > 0 ? lo : Number.MIN_VALUE * 1e10;
  let b = Number.isFinite(hi) && hi > a ? hi : a * 2;
  let fa = f(a);
  let fb = f(b);
  for (let i = 0; i < WIDEN_STEPS && Number.isFinite(fa) && fa > 0; i++) {
    b = a;
    fb = fa;
    a /= widenBy;
    fa = f(a);
  }
  for (let i = 0; i < WIDEN_STEPS && Number.isFinite(fb) && fb < 0; i++) {
    a = b;
    fa = fb;
    b *= widenBy;
    fb = f(b);
  }
  if (!Number.isFinite(fa) || !Number.isFinite(fb) || fa > 0 || fb < 0) {
    const guess = Number.isFinite(fa) && (!Number.isFinite(fb) || Math.abs(fa) <= Math.abs(fb)) ? a : b;
    return { ok: false, x: Number.isFinite(guess) ? guess : 0, converged: false };
  }
  const out = brentRoot(f, a, b, { fa, fb, xRelTol: relTol, maxEvaluations: 200 });
  if (!out.ok) return { ok: false, x: a, converged: false };
  return { ok: true, x: out.x, converged: out.converged };
}

/**
 * x in [lo, hi] with f(x) = 0 for a decreasing f on a fixed interval (no widening): the caller
 * has already checked f(lo) >= 0 >= f(hi). Used for the life, solved in log10(2N).
 */
export function decreasingRootOn(
  f: (x: number) => number,
  lo: number,
  hi: number,
  absTol = 1e-12,
): MonotoneRoot {
  const out = brentRoot(f, lo, hi, { xAbsTol: absTol, xRelTol: 0, maxEvaluations: 200 });
  if (!out.ok) return { ok: false, x: lo, converged: false };
  return { ok: true, x: out.x, converged: out.converged };
}
