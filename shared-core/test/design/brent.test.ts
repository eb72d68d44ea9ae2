/**
 * Brent's root finder (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4)
 * against exact roots: Cardano's formula for a cubic, the fixed point of cos, and a jump;
 * Brent's minimiser (same book, ch. 5) against exact minima.
 */
import { describe, expect, it } from 'vitest';
import { brentMinimize, brentRoot } from '../../src/design/brent';

describe('brentRoot', () => {
  it('finds the real root of x^3 - x - 2 (exact value by Cardano: cbrt(1 + sqrt(26/27)) + cbrt(1 - sqrt(26/27)))', () => {
    const exact = Math.cbrt(1 + Math.sqrt(26 / 27)) + Math.cbrt(1 - Math.sqrt(26 / 27));
    let calls = 0;
    const out = brentRoot(
      (x) => {
        calls++;
        return x ** 3 - x - 2;
      },
      1,
      2,
      { xRelTol: 1e-14 },
    );
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.converged).toBe(true);
    expect(Math.abs(out.x - exact)).toBeLessThan(1e-13);
    expect(out.evaluations).toBe(calls);
    // Superlinear: far fewer calls than bisection's log2(1 / 1e-14) = 47.
    expect(calls).toBeLessThan(15);
  });

  it('finds x = cos(x) (algebraic check of the residual) with the ends reversed', () => {
    const out = brentRoot((x) => Math.cos(x) - x, 1, 0, { xRelTol: 1e-15 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(Math.abs(Math.cos(out.x) - out.x)).toBeLessThan(1e-14);
  });

  it('closes in on a jump (no root) and reports the residual that shows it', () => {
    const out = brentRoot((x) => (x < 1 / 3 ? -1 : 1), 0, 1, { xRelTol: 1e-12 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(Math.abs(out.x - 1 / 3)).toBeLessThan(1e-11);
    expect(Math.abs(out.fx)).toBe(1);
    expect(Math.sign(out.fx)).not.toBe(Math.sign(out.other.fx));
  });

  it('says so when there is no sign change or f is not finite', () => {
    expect(brentRoot((x) => x * x + 1, -1, 1)).toMatchObject({ ok: false, reason: 'no-sign-change' });
    expect(brentRoot((x) => (x > 0.5 ? Number.NaN : -1), 0, 1)).toMatchObject({
      ok: false,
      reason: 'not-finite',
    });
  });

  it('keeps to its evaluation budget', () => {
    let calls = 0;
    const out = brentRoot(
      (x) => {
        calls++;
        return x < 0.123456789 ? -1 : 1;
      },
      0,
      1,
      { maxEvaluations: 10, xRelTol: 1e-15 },
    );
    expect(calls).toBeLessThanOrEqual(10);
    expect(out.ok && out.converged).toBe(false);
  });

  it('uses the given end values without calling f again', () => {
    let calls = 0;
    const out = brentRoot(
      (x) => {
        calls++;
        return x - 0.25;
      },
      0,
      1,
      { fa: -0.25, fb: 0.75 },
    );
    expect(out.ok).toBe(true);
    expect(out.evaluations).toBe(calls);
    if (out.ok) expect(out.x).toBeCloseTo(0.25, 12);
  });
});

describe('brentMinimize', () => {
  it('finds the minimum of x - ln x at x = 1 (exact: derivative 1 - 1/x = 0) superlinearly', () => {
    let calls = 0;
    const out = brentMinimize(
      (x) => {
        calls++;
        return x - Math.log(x);
      },
      0.2,
      5,
    );
    expect(out.converged).toBe(true);
    // A smooth minimum is located to about sqrt(machine epsilon) (Brent 1973, 5.4).
    expect(Math.abs(out.x - 1)).toBeLessThan(1e-7);
    expect(out.fx).toBeCloseTo(1, 12);
    expect(out.evaluations).toBe(calls);
    // Golden section alone would need log(4.8 / 1e-7) / log(1.618) = 37 calls.
    expect(calls).toBeLessThan(25);
  });

  it('finds the minimum of cos on [3, 4] at pi, ends reversed', () => {
    const out = brentMinimize(Math.cos, 4, 3, { xRelTol: 1e-10 });
    expect(Math.abs(out.x - Math.PI)).toBeLessThan(1e-7);
    expect(out.fx).toBeCloseTo(-1, 12);
  });

  it('closes in on a step (no derivative, no continuity): |g| of a jump across zero at 1/3', () => {
    // g = x - 0.5 below 1/3 and x above: |g| falls to 1/6 just below the step, is 1/3 above it.
    const out = brentMinimize((x) => Math.abs(x < 1 / 3 ? x - 0.5 : x), 0, 1, {
      xRelTol: 0,
      xAbsTol: 1e-12,
    });
    expect(Math.abs(out.x - 1 / 3)).toBeLessThan(1e-10);
    expect(out.x).toBeLessThan(1 / 3);
    expect(out.fx).toBeCloseTo(1 / 6, 9);
  });

  it('an end minimum: a monotone function on [1, 2] is minimised at the end', () => {
    const out = brentMinimize((x) => x * x, 1, 2, { xAbsTol: 1e-12, xRelTol: 0 });
    expect(out.x - 1).toBeLessThan(1e-10);
  });

  it('keeps to its budget and treats non-finite values as the largest', () => {
    let calls = 0;
    const out = brentMinimize(
      (x) => {
        calls++;
        return x > 0.7 ? Number.NaN : (x - 0.3) ** 2;
      },
      0,
      1,
      { maxEvaluations: 8 },
    );
    expect(calls).toBeLessThanOrEqual(8);
    expect(Number.isFinite(out.fx)).toBe(true);
    expect(out.x).toBeLessThan(0.7);
  });
});
