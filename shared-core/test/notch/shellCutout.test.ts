import { describe, expect, it } from 'vitest';
import { ellipseBoundaryStress, shellCutoutKt } from '../../src/notch/shellCutout';

const DEG = Math.PI / 180;

/**
 * Inglis' solution in elliptic coordinates, uniaxial remote sigma at angle beta to the major
 * axis a (along x), ellipse tanh(a0) = b/a: Timoshenko & Goodier, Theory of Elasticity, 3rd ed.,
 * Art. 63 (formula from memory, written independently of the code under test).
 */
function inglis(a: number, b: number, sigma: number, beta: number, eta: number): number {
  const a0 = Math.atanh(b / a);
  return (
    (sigma * (Math.sinh(2 * a0) + Math.cos(2 * beta) - Math.exp(2 * a0) * Math.cos(2 * (beta - eta)))) /
    (Math.cosh(2 * a0) - Math.cos(2 * eta))
  );
}

describe('ellipseBoundaryStress', () => {
  it('circle, uniaxial sigma along x: 3 at eta = 90 deg and -1 at eta = 0 (Kirsch 1898)', () => {
    expect(ellipseBoundaryStress(1, 1, 1, 0, 90 * DEG)).toBeCloseTo(3, 12);
    expect(ellipseBoundaryStress(1, 1, 1, 0, 0)).toBeCloseTo(-1, 12);
  });

  it('ellipse end values: 1 + 2a/b at x = a under sigma along y, 1 + 2b/a at y = b under sigma along x (Inglis 1913)', () => {
    for (const [a, b] of [
      [3, 1],
      [1, 2.5],
      [1.7, 1.1],
    ]) {
      expect(ellipseBoundaryStress(a, b, 0, 1, 0)).toBeCloseTo(1 + (2 * a) / b, 10);
      expect(ellipseBoundaryStress(a, b, 1, 0, 90 * DEG)).toBeCloseTo(1 + (2 * b) / a, 10);
    }
  });

  it('agrees with the elliptic-coordinate form of Inglis (Timoshenko & Goodier Art. 63) at any eta', () => {
    for (const [a, b] of [
      [3, 1],
      [2, 1.5],
      [1.2, 1],
      [4, 0.5],
    ]) {
      for (let eta = 0.05; eta < Math.PI; eta += 0.173) {
        expect(ellipseBoundaryStress(a, b, 1, 0, eta)).toBeCloseTo(inglis(a, b, 1, 0, eta), 10);
        expect(ellipseBoundaryStress(a, b, 0, 1, eta)).toBeCloseTo(inglis(a, b, 1, Math.PI / 2, eta), 10);
      }
    }
  });

  it('invalid geometry returns 0, never NaN', () => {
    expect(ellipseBoundaryStress(0, 1, 1, 1, 0)).toBe(0);
    expect(ellipseBoundaryStress(1, Number.NaN, 1, 1, 0)).toBe(0);
  });
});

describe('shellCutoutKt', () => {
  it('circular opening in a cylinder (sigma_l = sigma_h/2): Kt = 2.5 at the axial ends (Kirsch superposed, exact)', () => {
    const r = shellCutoutKt(0.1, 0.1, 0.5);
    expect(r.value).toBeCloseTo(2.5, 12);
    expect(r.terms?.find((t) => t.name === 'eta_peak')?.value).toBe(90);
  });

  it('circular opening in a sphere (equal biaxial): Kt = 2.0 (Kirsch superposed, exact)', () => {
    expect(shellCutoutKt(0.05, 0.05, 1).value).toBeCloseTo(2.0, 12);
  });

  it('equal biaxial ellipse: Kt = 2a/b at the ends of the major axis (Inglis superposed; exact)', () => {
    expect(shellCutoutKt(0.2, 0.1, 1).value).toBeCloseTo(4, 12); // a/b = 2
  });

  it('cylinder, ellipse with a/b = sigma_h/sigma_l = 2: uniform edge stress sigma_h + sigma_l = 1.5 sigma_h (Inglis; the optimum opening, algebraic identity)', () => {
    const r = shellCutoutKt(0.2, 0.1, 0.5);
    expect(r.value).toBeCloseTo(1.5, 12);
    for (let eta = 0; eta <= Math.PI; eta += 0.1) {
      expect(ellipseBoundaryStress(0.1, 0.05, 1, 0.5, eta)).toBeCloseTo(1.5, 12);
    }
  });

  it('slot along the axis in a cylinder (h_c = 4 w_c): peak (1 + 2b/a) - 0.5 = 8.5 at the axial ends (Inglis superposed, exact)', () => {
    const r = shellCutoutKt(0.05, 0.2, 0.5); // a = 0.025, b = 0.1
    // at x = a: -1 + 0.5 (1 + 2a/b) = -0.75; at y = b: (1 + 2b/a) - 0.5 = 8.5
    expect(r.value).toBeCloseTo(8.5, 12);
    expect(r.terms?.find((t) => t.name === 'eta_peak')?.value).toBe(90);
  });

  it('the two axis ends carry the largest |stress|: dense sampling never exceeds the returned Kt', () => {
    for (const [w, h, k] of [
      [0.3, 0.1, 0.5],
      [0.1, 0.3, 0.5],
      [0.1, 0.1, 0.5],
      [0.25, 0.2, 1],
      [0.07, 0.5, -0.3],
      [0.4, 0.11, 2],
    ]) {
      const kt = shellCutoutKt(w, h, k).value;
      let max = 0;
      for (let i = 0; i <= 3600; i++) {
        max = Math.max(max, Math.abs(ellipseBoundaryStress(w / 2, h / 2, 1, k, (i / 3600) * Math.PI)));
      }
      expect(max).toBeLessThanOrEqual(kt + 1e-12);
      expect(kt - max).toBeLessThan(1e-9);
    }
  });

  it('invalid inputs: Kt = 1 with an error note', () => {
    for (const [w, h, k] of [
      [0, 0.1, 0.5],
      [0.1, -1, 0.5],
      [0.1, 0.1, Number.NaN],
    ]) {
      const r = shellCutoutKt(w, h, k);
      expect(r.value).toBe(1);
      expect(r.notes?.[0]?.severity).toBe('error');
    }
  });
});
