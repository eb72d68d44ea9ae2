/**
 * Brent's root finder and Brent's minimiser, for design mode.
 *
 * The root finder works on a bracket: inverse quadratic interpolation and the secant step
 * where they make progress, bisection where they do not, so it converges whenever the
 * function changes sign on the bracket (even across a jump, which it then closes in on).
 *
 * The procedure `zero` of R. P. Brent, "Algorithms for Minimization without Derivatives",
 * Prentice-Hall 1973, chapter 4 (section 4.6); the same algorithm as `zbrent` in Press,
 * Teukolsky, Vetterling & Flannery, "Numerical Recipes", 3rd ed., section 9.3.
 *
 * Pure: calls `f` at most `maxEvaluations` times (the two ends of the bracket included
 * when their values are not given) and never throws.
 */

export interface BrentOptions {
  /** Absolute tolerance on x (default 0: only the relative one acts). */
  xAbsTol?: number;
  /** Relative tolerance on x (default 1e-10). */
  xRelTol?: number;
  /** Largest number of calls of `f` (default 100). */
  maxEvaluations?: number;
  /** f(a) and f(b) when the caller has them already (they are then not evaluated again). */
  fa?: number;
  fb?: number;
}

export type BrentOutcome =
  | {
      ok: true;
      /** The end of the final bracket where |f| is smaller. */
      x: number;
      fx: number;
      /** The final bracket [lo, hi] (contains the sign change). */
      bracket: [number, number];
      /** The other end of the final bracket and f there (f changes sign between it and x). */
      other: { x: number; fx: number };
      evaluations: number;
      /** False when the evaluation budget ran out before the tolerance was reached. */
      converged: boolean;
    }
  | { ok: false; reason: 'no-sign-change' | 'not-finite'; evaluations: number };

/** Finds x in [a, b] with f(x) = 0, given that f(a) and f(b) differ in sign. */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  options: BrentOptions = {},
): BrentOutcome {
  const maxEval = options.maxEvaluations ?? 100;
  const relTol = options.xRelTol ?? 1e-10;
  const absTol = options.xAbsTol ?? 0;
  let evaluations = 0;
  const call = (x: number) => {
    evaluations++;
    return f(x);
  };
  let fa = options.fa ?? call(a);
  let fb = options.fb ?? call(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return { ok: false, reason: 'not-finite', evaluations };
  if (fa === 0)
    return { ok: true, x: a, fx: 0, bracket: [a, a], other: { x: a, fx: 0 }, evaluations, converged: true };
  if (fb === 0)
    return { ok: true, x: b, fx: 0, bracket: [b, b], other: { x: b, fx: 0 }, evaluations, converged: true };
  if (Math.sign(fa) === Math.sign(fb)) return { ok: false, reason: 'no-sign-change', evaluations };

  // Brent's notation: b is the best estimate, a the previous one, c the other end of the bracket.
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  while (true) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * (absTol + relTol * Math.abs(b));
    const m = 0.5 * (c - b);
    const done = Math.abs(m) <= tol || fb === 0;
    if (done || evaluations >= maxEval) {
      const lo = Math.min(b, c);
      const hi = Math.max(b, c);
      return {
        ok: true,
        x: b,
        fx: fb,
        bracket: [lo, hi],
        other: { x: c, fx: fc },
        evaluations,
        converged: done,
      };
    }
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      // Bisection: the last step was too small or did not reduce |f|.
      d = m;
      e = m;
    } else {
      let s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        // Linear interpolation (secant).
        p = 2 * m * s;
        q = 1 - s;
      } else {
        // Inverse quadratic interpolation.
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      s = e;
      e = d;
      // Accept the interpolation only when it falls inside the bracket and shrinks fast enough.
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * s * q)) d = p / q;
      else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = call(b);
    if (!Number.isFinite(fb)) return { ok: false, reason: 'not-finite', evaluations };
  }
}

export interface BrentMinOptions {
  /** Absolute tolerance on x (default 1e-12). */
  xAbsTol?: number;
  /** Relative tolerance on x (default 1e-8, about the square root of the machine epsilon). */
  xRelTol?: number;
  /** Largest number of calls of `f` (default 60). */
  maxEvaluations?: number;
}

export interface BrentMinOutcome {
  /** The point of the smallest value found. */
  x: number;
  fx: number;
  evaluations: number;
  /** False when the evaluation budget ran out before the tolerance was reached. */
  converged: boolean;
}

/**
 * Finds a local minimum of `f` on [a, b]: golden-section steps, parabolic interpolation
 * through the three best points where it is safe. It needs no derivative and no continuity
 * (on a step it closes in on the step, on the lower side), and converges to a minimum of a
 * unimodal function on the interval.
 *
 * The procedure `localmin` of R. P. Brent, "Algorithms for Minimization without
 * Derivatives", Prentice-Hall 1973, chapter 5 (section 5.8); the same algorithm as `brent`
 * in Press et al., "Numerical Recipes", 3rd ed., section 10.3.
 *
 * Pure: calls `f` at most `maxEvaluations` times; a non-finite value counts as larger than
 * any finite one. Never throws.
 */
export function brentMinimize(
  f: (x: number) => number,
  a: number,
  b: number,
  options: BrentMinOptions = {},
): BrentMinOutcome {
  const maxEval = Math.max(1, options.maxEvaluations ?? 60);
  const relTol = options.xRelTol ?? 1e-8;
  const absTol = options.xAbsTol ?? 1e-12;
  let evaluations = 0;
  const call = (x: number) => {
    evaluations++;
    const y = f(x);
    return Number.isFinite(y) ? y : Number.MAX_VALUE;
  };
  if (a > b) [a, b] = [b, a];
  const golden = 0.5 * (3 - Math.sqrt(5));
  let x = a + golden * (b - a);
  let w = x;
  let v = x;
  let fx = call(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  while (true) {
    const m = 0.5 * (a + b);
    const tol = relTol * Math.abs(x) + absTol;
    const t2 = 2 * tol;
    const done = Math.abs(x - m) <= t2 - 0.5 * (b - a);
    if (done || evaluations >= maxEval) return { x, fx, evaluations, converged: done };
    let p = 0;
    let q = 0;
    let r = 0;
    if (Math.abs(e) > tol) {
      // Parabola through x, w and v.
      r = (x - w) * (fx - fv);
      q = (x - v) * (fx - fw);
      p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
    }
    if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
      // Parabolic step, not too close to the ends.
      d = p / q;
      const u = x + d;
      if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
    } else {
      // Golden-section step into the larger part.
      e = (x < m ? b : a) - x;
      d = golden * e;
    }
    const u = x + (Math.abs(d) >= tol ? d : d > 0 ? tol : -tol);
    const fu = call(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
}
