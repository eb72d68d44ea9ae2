/**
 * Elliptical (or circular) opening in a pressurised thin shell: exact elastic solution for an
 * elliptical hole in an infinite plate (Inglis 1913), superposed for the two membrane stresses.
 *
 * Axes: x along the circumference (hoop stress sx = sigma_h), cutout width w_c along x, so
 * a = w_c/2; y along the axis (longitudinal stress sy = sigma_l), b = h_c/2. Boundary point
 * x = a cos(eta), y = b sin(eta), m = (a - b)/(a + b). Tangential stress on the boundary:
 *   remote sx: sx (1 - m^2 + 2m - 2 cos 2eta) / (1 - 2m cos 2eta + m^2)
 *   remote sy: sy (1 - m^2 - 2m + 2 cos 2eta) / (1 - 2m cos 2eta + m^2)
 * These equal the elliptic-coordinate form of Inglis' solution,
 *   sigma (sinh 2a0 + cos 2beta - e^(2a0) cos 2(beta - eta)) / (cosh 2a0 - cos 2eta), tanh a0 = b/a
 * (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., Art. 63), checked in the tests, and give
 * the exact values 3 and -1 (circle, uniaxial), 1 + 2a/b (ellipse end), 2.5 (circle, 2:1 field).
 *
 * The two critical points. At the end of the circumferential semi-axis (x = +-a, eta = 0) the
 * edge stress is sigma_l (1 + 2a/b) - sigma_h and the radius of curvature b^2/a; at the end of
 * the axial semi-axis (y = +-b, eta = 90 deg) it is sigma_h (1 + 2b/a) - sigma_l and the radius
 * a^2/b (radius of curvature of the ellipse, rho(eta) = (a^2 sin^2 eta + b^2 cos^2 eta)^(3/2) / (a b);
 * Inglis 1913). With c = cos 2eta the elastic stress is (P + Q c)/(1 + m^2 - 2m c), a linear
 * fraction in c, monotonic on [-1, 1]: its largest magnitude sits at one of the two ends.
 *
 * The fatigue concentration is another matter: Kf = 1 + q(rho) (Kt - 1) weighs each point's
 * elastic peak by the notch sensitivity of its own radius, and the sharp end with the high Kt
 * has the small radius. Both ends are evaluated, each with its own Kt, radius, q and Kf; for a
 * slender opening with a small radius a point between the ends can carry a larger Kf than
 * either end (sampled in the tests), so the boundary between them is searched too and the
 * governing point is the largest Kf of all (`governingCutoutPoint`).
 *
 * A flat-plate solution: it ignores shell curvature, which raises the peak for openings that
 * are not small against sqrt(R t) (see `shellParameter.ts`).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MM, type Term } from '../computed';

const SOURCE =
  'Inglis (1913), Trans. Inst. Naval Architects 55; Timoshenko & Goodier, Theory of Elasticity, 3rd ed., Art. 63 (elliptical hole, remote biaxial stress, superposed); radius of curvature of the ellipse at the point';

/**
 * Tangential stress on the boundary of an elliptical hole (semi-axes a along x, b along y)
 * under remote sx and sy, at the boundary parameter eta (rad). Same unit as sx, sy.
 * Invalid geometry (a or b not finite and positive, or non-finite stresses) returns 0: use
 * `shellCutoutKt` for diagnosed results.
 */
export function ellipseBoundaryStress(a: number, b: number, sx: number, sy: number, eta: number): number {
  if (![a, b, sx, sy, eta].every(isFiniteNumber) || a <= 0 || b <= 0) return 0;
  const m = (a - b) / (a + b);
  const c = Math.cos(2 * eta);
  const den = 1 - 2 * m * c + m * m;
  const s = (sx * (1 - m * m + 2 * m - 2 * c) + sy * (1 - m * m - 2 * m + 2 * c)) / den;
  return isFiniteNumber(s) ? s : 0;
}

/**
 * Radius of curvature of the ellipse x = a cos(eta), y = b sin(eta) at eta:
 * (a^2 sin^2 eta + b^2 cos^2 eta)^(3/2) / (a b); b^2/a at the end of a, a^2/b at the end of b.
 * Invalid geometry returns 0.
 */
export function ellipseRadiusOfCurvature(a: number, b: number, eta: number): number {
  if (![a, b, eta].every(isFiniteNumber) || a <= 0 || b <= 0) return 0;
  const s = Math.sin(eta);
  const c = Math.cos(eta);
  const r = (a * a * s * s + b * b * c * c) ** 1.5 / (a * b);
  return isFiniteNumber(r) ? r : 0;
}

export type CutoutPointKey = 'circumferential' | 'axial' | 'between';

/** One point of the opening's edge: where it is, its elastic stress and its radius. */
export interface CutoutPoint {
  key: CutoutPointKey;
  /** Boundary parameter, rad (0 at the end of the circumferential semi-axis). */
  eta: number;
  /** Words for the derivation: "end of the axial semi-axis (y = +-h_c/2)". */
  label: string;
  /** Signed edge stress over sigma_h. */
  sigmaT: number;
  /** |sigmaT|: the elastic concentration on the hoop stress. */
  Kt: number;
  /** Radius of curvature of the edge there, m. */
  rho: number;
}

function pointLabel(key: CutoutPointKey, eta: number): string {
  if (key === 'circumferential') return 'end of the circumferential semi-axis (x = +-w_c/2, eta = 0)';
  if (key === 'axial') return 'end of the axial semi-axis (y = +-h_c/2, eta = 90 deg)';
  return `edge point between the ends (eta = ${((eta * 180) / Math.PI).toFixed(1)} deg)`;
}

/** The edge point at eta of an opening w_c by h_c under sigma_h = 1 and sigma_l = longOverHoop. */
export function cutoutPoint(w_c: number, h_c: number, longOverHoop: number, eta: number): CutoutPoint {
  const a = w_c / 2;
  const b = h_c / 2;
  const key: CutoutPointKey = eta <= 0 ? 'circumferential' : eta >= Math.PI / 2 ? 'axial' : 'between';
  const e = key === 'circumferential' ? 0 : key === 'axial' ? Math.PI / 2 : eta;
  const sigmaT = ellipseBoundaryStress(a, b, 1, longOverHoop, e);
  return {
    key,
    eta: e,
    label: pointLabel(key, e),
    sigmaT,
    Kt: Math.abs(sigmaT),
    rho: ellipseRadiusOfCurvature(a, b, e),
  };
}

/** The two ends of the opening: the circumferential one (x = +-w_c/2) and the axial one (y = +-h_c/2). */
export function cutoutEnds(w_c: number, h_c: number, longOverHoop: number): [CutoutPoint, CutoutPoint] {
  return [cutoutPoint(w_c, h_c, longOverHoop, 0), cutoutPoint(w_c, h_c, longOverHoop, Math.PI / 2)];
}

function valid(w_c: number, h_c: number, longOverHoop: number): boolean {
  return [w_c, h_c, longOverHoop].every(isFiniteNumber) && w_c > 0 && h_c > 0;
}

/**
 * The edge point with the largest Kf = 1 + q(rho) (Kt - 1), q given as a function of the radius
 * of curvature (m). Both ends are candidates; the quarter edge between them is sampled (the
 * edge is symmetric about both axes) and the best sample refined by golden-section search.
 * An end wins ties. Returns the ends too, for the derivation.
 */
export function governingCutoutPoint(
  w_c: number,
  h_c: number,
  longOverHoop: number,
  qOfRho: (rho: number) => number,
): { point: CutoutPoint; Kf: number; ends: [CutoutPoint, CutoutPoint] } {
  const ends = cutoutEnds(w_c, h_c, longOverHoop);
  const kf = (p: CutoutPoint) => {
    const q = qOfRho(p.rho);
    const v = 1 + (isFiniteNumber(q) ? q : 1) * (Math.max(p.Kt, 1) - 1);
    return isFiniteNumber(v) ? v : 1;
  };
  let best = ends[0];
  let bestKf = kf(ends[0]);
  const kfAxial = kf(ends[1]);
  if (kfAxial > bestKf) {
    best = ends[1];
    bestKf = kfAxial;
  }
  if (!valid(w_c, h_c, longOverHoop)) return { point: best, Kf: bestKf, ends };
  const n = 360;
  const step = Math.PI / 2 / n;
  let iBest = -1;
  let sBest = bestKf;
  for (let i = 1; i < n; i++) {
    const v = kf(cutoutPoint(w_c, h_c, longOverHoop, i * step));
    if (v > sBest * (1 + 1e-12)) {
      sBest = v;
      iBest = i;
    }
  }
  if (iBest > 0) {
    // Golden-section refinement inside the bracket around the best sample.
    let lo = (iBest - 1) * step;
    let hi = (iBest + 1) * step;
    const g = (Math.sqrt(5) - 1) / 2;
    for (let k = 0; k < 60; k++) {
      const x1 = hi - g * (hi - lo);
      const x2 = lo + g * (hi - lo);
      if (kf(cutoutPoint(w_c, h_c, longOverHoop, x1)) >= kf(cutoutPoint(w_c, h_c, longOverHoop, x2))) hi = x2;
      else lo = x1;
    }
    const p = cutoutPoint(w_c, h_c, longOverHoop, (lo + hi) / 2);
    const v = kf(p);
    if (v > bestKf) {
      best = p;
      bestKf = v;
    }
  }
  return { point: best, Kf: bestKf, ends };
}

/**
 * Kt of an elliptical cutout (width w_c along the circumference, height h_c along the axis)
 * in a thin shell, relative to the hoop stress, at one edge point. longOverHoop =
 * sigma_l/sigma_h: 0.5 for a cylinder, 1 for a sphere. Without `eta`, the point of the largest
 * elastic edge stress (one of the two ends). The terms carry both ends' stresses and radii.
 */
export function shellCutoutKt(w_c: number, h_c: number, longOverHoop: number, eta?: number): Computed {
  const formula =
    'Kt = |sigma_t| / sigma_h at the point, sigma_t = [sigma_h (1 - m^2 + 2m - 2 cos 2eta) + sigma_l (1 - m^2 - 2m + 2 cos 2eta)] / (1 - 2m cos 2eta + m^2), m = (a - b)/(a + b), a = w_c/2, b = h_c/2; ends: sigma_l (1 + 2a/b) - sigma_h at x = +-a (radius b^2/a), sigma_h (1 + 2b/a) - sigma_l at y = +-b (radius a^2/b)';
  if (!valid(w_c, h_c, longOverHoop) || (eta !== undefined && !isFiniteNumber(eta))) {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message:
          'Shell cutout needs w_c > 0, h_c > 0 and a finite sigma_l/sigma_h; Kt = 1 returned (no concentration computed).',
      },
    ]);
  }
  const a = w_c / 2;
  const b = h_c / 2;
  const k = longOverHoop;
  const [circ, axial] = cutoutEnds(w_c, h_c, k);
  const peakEnd = axial.Kt >= circ.Kt ? axial : circ;
  const at = eta === undefined ? peakEnd : cutoutPoint(w_c, h_c, k, eta);
  const notes: MethodNote[] = [
    {
      code: 'peak-location',
      severity: 'information',
      message:
        `Kt taken at the ${at.label}: edge stress ${at.sigmaT.toFixed(3)} sigma_h, radius of curvature ${(at.rho / MM).toPrecision(4)} mm. ` +
        `The largest elastic edge stress is ${peakEnd.sigmaT.toFixed(3)} sigma_h at the ${peakEnd.label}.`,
    },
  ];
  if (at.sigmaT < 0) {
    notes.push({
      code: 'peak-compressive',
      severity: 'information',
      message: 'The edge stress at this point is compressive; its magnitude is used (conservative).',
    });
  }
  const terms: Term[] = [
    { name: 'a = w_c/2', value: a / MM, unit: 'mm' },
    { name: 'b = h_c/2', value: b / MM, unit: 'mm' },
    { name: 'm', value: (a - b) / (a + b), unit: '' },
    { name: 'sigma_l/sigma_h', value: k, unit: '' },
    { name: 'sigma_t/sigma_h at the end of the circumferential semi-axis', value: circ.sigmaT, unit: '' },
    { name: 'rho = b^2/a there', value: circ.rho / MM, unit: 'mm' },
    { name: 'sigma_t/sigma_h at the end of the axial semi-axis', value: axial.sigmaT, unit: '' },
    { name: 'rho = a^2/b there', value: axial.rho / MM, unit: 'mm' },
    { name: 'eta at the point', value: (at.eta * 180) / Math.PI, unit: 'deg' },
    { name: 'rho at the point', value: at.rho / MM, unit: 'mm' },
  ];
  return computed(at.Kt, formula, SOURCE, terms, notes);
}
