/**
 * Brent's root finder (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4)
 * against exact roots: Cardano's formula for a cubic, the fixed point of cos, and a jump.
 */
import { describe, expect, it } from 'vitest';
import { brentRoot } from '../../src/design/brent';

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
