import { describe, expect, it } from 'vitest';
import { SHELL_PARAMETER_LIMIT, shellParameter } from '../../src/notch/shellParameter';

const MM = 1e-3;

describe('shellParameter: beta = [3 (1 - nu^2)]^(1/4) a / (2 sqrt(R t))', () => {
  it('Lekkerkerker / Van Dyke curvature parameter as used in Pilkey & Pilkey, Peterson SCF 3rd ed., Sec. 4.5 (definition from memory), hand-evaluated: receiver D_i = 600 mm, t = 8 mm, a = 55 mm, nu = 0.3 gives 0.717', () => {
    const c = shellParameter(55 * MM, 600 * MM, 8 * MM);
    const R = 304e-3;
    const expected = ((3 * (1 - 0.09)) ** 0.25 * 0.055) / (2 * Math.sqrt(R * 8e-3));
    expect(c.value).toBeCloseTo(expected, 12);
    expect(c.value).toBeCloseTo(0.7168, 4);
  });

  it('scales with a / sqrt(R t): doubling the opening doubles beta, a four times thicker wall halves it', () => {
    const b = shellParameter(10 * MM, 1000 * MM, 5 * MM).value;
    expect(shellParameter(20 * MM, 1000 * MM, 5 * MM).value).toBeCloseTo(2 * b, 12);
    // R grows by t/2 too: compare at an R that stays put.
    const r1 = shellParameter(10 * MM, 1000 * MM - 5 * MM, 5 * MM).value;
    const r4 = shellParameter(10 * MM, 1000 * MM - 20 * MM, 20 * MM).value;
    expect(r4).toBeCloseTo(r1 / 2, 12);
  });

  it('warns beyond the flat-plate range (beta > 0.25, from memory of the shell Kt charts) and not below it', () => {
    // beta = 0.25 at a = 0.5 sqrt(R t) / [3 (1 - nu^2)]^(1/4)
    const D_i = 1000 * MM;
    const t = 10 * MM;
    const R = (D_i + t) / 2;
    const aLimit = (2 * SHELL_PARAMETER_LIMIT * Math.sqrt(R * t)) / (3 * 0.91) ** 0.25;
    const below = shellParameter(aLimit * 0.99, D_i, t);
    const above = shellParameter(aLimit * 1.01, D_i, t);
    expect(below.notes ?? []).toEqual([]);
    expect(above.notes?.[0]?.code).toBe('large-shell-opening');
    expect(above.notes?.[0]?.severity).toBe('warning');
  });

  it('invalid inputs: beta = 0 with an error note, never NaN', () => {
    for (const [a, D, t] of [
      [0, 1, 0.01],
      [0.01, -1, 0.01],
      [0.01, 1, Number.NaN],
    ]) {
      const c = shellParameter(a, D, t);
      expect(c.value).toBe(0);
      expect(c.notes?.[0]?.severity).toBe('error');
    }
  });
});
