import { describe, expect, it } from 'vitest';
import {
  cutoutEnds,
  ellipseBoundaryStress,
  ellipseRadiusOfCurvature,
  governingCutoutPoint,
  shellCutoutKt,
} from '../../src/notch/shellCutout';

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
    expect(r.terms?.find((t) => t.name === 'eta at the point')?.value).toBe(90);
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
    expect(r.terms?.find((t) => t.name === 'eta at the point')?.value).toBe(90);
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

/**
 * Radius of curvature of the parametric curve x = a cos t, y = b sin t from its derivatives,
 * rho = (x'^2 + y'^2)^(3/2) / |x' y'' - y' x''|, the derivatives taken by central differences
 * (any calculus text; computed here independently of the closed form under test).
 */
function radiusByDifferences(a: number, b: number, t: number): number {
  const h = 1e-4;
  const x = (u: number) => a * Math.cos(u);
  const y = (u: number) => b * Math.sin(u);
  const d1 = (f: (u: number) => number) => (f(t + h) - f(t - h)) / (2 * h);
  const d2 = (f: (u: number) => number) => (f(t + h) - 2 * f(t) + f(t - h)) / (h * h);
  const xp = d1(x);
  const yp = d1(y);
  return (xp * xp + yp * yp) ** 1.5 / Math.abs(xp * d2(y) - yp * d2(x));
}

describe('radius of curvature at the edge of the opening', () => {
  it('b^2/a at the end of a, a^2/b at the end of b (Inglis 1913; Timoshenko & Goodier Art. 63), and the curve everywhere (independent finite differences)', () => {
    for (const [a, b] of [
      [0.055, 0.04],
      [0.02, 0.06],
      [1, 1],
      [3, 0.2],
    ]) {
      expect(ellipseRadiusOfCurvature(a, b, 0)).toBeCloseTo((b * b) / a, 12);
      expect(ellipseRadiusOfCurvature(a, b, Math.PI / 2)).toBeCloseTo((a * a) / b, 12);
      for (let t = 0.01; t < Math.PI; t += 0.217) {
        const exact = ellipseRadiusOfCurvature(a, b, t);
        expect(Math.abs(exact - radiusByDifferences(a, b, t)) / exact).toBeLessThan(1e-5);
      }
    }
  });

  it("Inglis' peak: sigma_max = sigma (1 + 2 sqrt(a/rho)) at the end of a under sigma across a, rho the radius there (Inglis 1913, exact)", () => {
    for (const [a, b] of [
      [3, 1],
      [1, 2.5],
      [0.055, 0.04],
    ]) {
      const rhoA = ellipseRadiusOfCurvature(a, b, 0);
      expect(ellipseBoundaryStress(a, b, 0, 1, 0)).toBeCloseTo(1 + 2 * Math.sqrt(a / rhoA), 10);
      const rhoB = ellipseRadiusOfCurvature(a, b, Math.PI / 2);
      expect(ellipseBoundaryStress(a, b, 1, 0, Math.PI / 2)).toBeCloseTo(1 + 2 * Math.sqrt(b / rhoB), 10);
    }
  });

  it('invalid geometry returns 0, never NaN', () => {
    expect(ellipseRadiusOfCurvature(0, 1, 0)).toBe(0);
    expect(ellipseRadiusOfCurvature(1, Number.NaN, 0)).toBe(0);
  });
});

describe('cutoutEnds: the two ends of the opening, each with its own Kt and radius', () => {
  it('circular opening in a sphere: 2 at both ends, radius = hole radius (Kirsch superposed, equal biaxial; exact)', () => {
    const [c, x] = cutoutEnds(0.04, 0.04, 1);
    expect(c.Kt).toBeCloseTo(2, 12);
    expect(x.Kt).toBeCloseTo(2, 12);
    expect(c.rho).toBeCloseTo(0.02, 12);
    expect(x.rho).toBeCloseTo(0.02, 12);
  });

  it('circular opening in a cylinder: 2.5 at the axial end, 3 (1/2) - 1 = 0.5 at the circumferential end (Kirsch superposed, 2:1 field; exact)', () => {
    const [c, x] = cutoutEnds(0.05, 0.05, 0.5);
    expect(x.Kt).toBeCloseTo(2.5, 12);
    expect(c.sigmaT).toBeCloseTo(0.5, 12);
  });

  it('uniaxial hoop stress only (sigma_l = 0): 1 + 2b/a at the end of the axial semi-axis, -1 at the other (Inglis 1913, exact)', () => {
    const [c, x] = cutoutEnds(0.06, 0.02, 0); // a = 0.03 along the circumference, b = 0.01
    expect(x.sigmaT).toBeCloseTo(1 + (2 * 0.01) / 0.03, 12);
    expect(c.sigmaT).toBeCloseTo(-1, 12);
    expect(x.rho).toBeCloseTo(0.03 ** 2 / 0.01, 12);
    expect(c.rho).toBeCloseTo(0.01 ** 2 / 0.03, 12);
  });

  it('biaxial field: sigma_l (1 + 2a/b) - sigma_h at x = +-a and sigma_h (1 + 2b/a) - sigma_l at y = +-b (Inglis superposed, exact)', () => {
    for (const [w, h, k] of [
      [0.11, 0.08, 0.5],
      [0.03, 0.09, 0.5],
      [0.2, 0.05, 1],
    ]) {
      const a = w / 2;
      const b = h / 2;
      const [c, x] = cutoutEnds(w, h, k);
      expect(c.sigmaT).toBeCloseTo(k * (1 + (2 * a) / b) - 1, 12);
      expect(x.sigmaT).toBeCloseTo(1 + (2 * b) / a - k, 12);
    }
  });

  it('receiver opening 110 x 80 mm in a cylinder: the peak is at the end of the short (axial) semi-axis, radius a^2/b = 75.6 mm, not h_c/2 = 40 mm (Inglis; hand evaluation)', () => {
    const [c, x] = cutoutEnds(0.11, 0.08, 0.5);
    expect(x.Kt).toBeCloseTo(1 + 80 / 55 - 0.5, 12); // 1.9545
    expect(c.Kt).toBeCloseTo(0.5 * (1 + 110 / 40) - 1, 12); // 0.875
    expect(x.rho).toBeCloseTo(0.055 ** 2 / 0.04, 12); // 75.6 mm
    expect(c.rho).toBeCloseTo(0.04 ** 2 / 0.055, 12); // 29.1 mm
  });
});

describe('governingCutoutPoint: the largest Kf = 1 + q(rho) (Kt - 1) of the edge', () => {
  const peterson = (aMm: number) => (rho: number) => 1 / (1 + (aMm * 1e-3) / rho);
  const neuber = (sqrtAmm: number) => (rho: number) => 1 / (1 + (sqrtAmm * Math.sqrt(1e-3)) / Math.sqrt(rho));

  it('one q for every point: the end with the largest elastic peak governs', () => {
    for (const [w, h, k] of [
      [0.11, 0.08, 0.5],
      [0.03, 0.09, 0.5],
      [0.05, 0.05, 1],
    ]) {
      const g = governingCutoutPoint(w, h, k, () => 0.8);
      const peak = Math.max(...cutoutEnds(w, h, k).map((p) => p.Kt));
      expect(g.point.Kt).toBeCloseTo(peak, 12);
      expect(g.Kf).toBeCloseTo(1 + 0.8 * (peak - 1), 12);
    }
  });

  it('receiver opening, steel q by radius: the axial end governs with its own radius', () => {
    const g = governingCutoutPoint(0.11, 0.08, 0.5, neuber(0.569));
    expect(g.point.key).toBe('axial');
    expect(g.point.rho).toBeCloseTo(0.055 ** 2 / 0.04, 12);
  });

  it('never below the largest Kf of a dense independent sampling of the edge (Inglis stress and radius at 20,000 points)', () => {
    for (const q of [peterson(0.51), peterson(0.2), neuber(1.0), neuber(0.3)])
      for (const [w, h, k] of [
        [0.0072, 0.00072, 1],
        [0.0035, 0.00115, 0.5],
        [0.02, 0.004, 0.5],
        [0.11, 0.08, 0.5],
        [0.001, 0.01, 0.5],
      ]) {
        const g = governingCutoutPoint(w, h, k, q);
        let max = 0;
        for (let i = 0; i <= 20000; i++) {
          const eta = (i / 20000) * (Math.PI / 2);
          const kt = Math.abs(ellipseBoundaryStress(w / 2, h / 2, 1, k, eta));
          max = Math.max(max, 1 + q(ellipseRadiusOfCurvature(w / 2, h / 2, eta)) * (Math.max(kt, 1) - 1));
        }
        expect(g.Kf).toBeGreaterThanOrEqual(max * (1 - 1e-9));
        expect(g.Kf).toBeLessThanOrEqual(max * (1 + 1e-6));
      }
  });

  it('a slender opening with a small radius: a point between the ends can govern, and is named so', () => {
    const g = governingCutoutPoint(0.0072, 0.00072, 1, peterson(1.0));
    expect(g.point.key).toBe('between');
    expect(g.Kf).toBeGreaterThan(Math.max(...g.ends.map((p) => 1 + peterson(1.0)(p.rho) * (p.Kt - 1))));
  });
});
