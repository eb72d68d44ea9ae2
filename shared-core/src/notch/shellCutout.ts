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
 * Where the peak lies: with c = cos 2eta the stress is (P + Q c)/(1 + m^2 - 2m c), a linear
 * fraction in c whose denominator never vanishes for |m| < 1. A linear fraction is monotonic on
 * c in [-1, 1], so both its largest and its smallest value (hence the largest magnitude) sit at
 * c = +1 (eta = 0, the circumferential ends x = +-a) or c = -1 (eta = 90 deg, the axial ends
 * y = +-b). Only those two points are evaluated.
 *
 * A flat-plate solution: it ignores shell curvature, which raises the peak for openings that
 * are not small against sqrt(R t) (Pilkey, Peterson's SCF 3rd ed., Sec. 4 on cylindrical and
 * spherical shells, from memory).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote } from '../computed';

const SOURCE =
  'Inglis (1913), Trans. Inst. Naval Architects 55; Timoshenko & Goodier, Theory of Elasticity, 3rd ed., Art. 63 (elliptical hole, remote biaxial stress, superposed)';

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
 * Kt of an elliptical cutout (width w_c along the circumference, height h_c along the axis)
 * in a thin shell, relative to the hoop stress. longOverHoop = sigma_l/sigma_h: 0.5 for a
 * cylinder, 1 for a sphere.
 */
export function shellCutoutKt(w_c: number, h_c: number, longOverHoop: number): Computed {
  const formula =
    'Kt = max |sigma_t(eta)| / sigma_h, sigma_t = [sigma_h (1 - m^2 + 2m - 2 cos 2eta) + sigma_l (1 - m^2 - 2m + 2 cos 2eta)] / (1 - 2m cos 2eta + m^2), m = (a - b)/(a + b), a = w_c/2, b = h_c/2';
  if (![w_c, h_c, longOverHoop].every(isFiniteNumber) || w_c <= 0 || h_c <= 0) {
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
  const atCircEnds = ellipseBoundaryStress(a, b, 1, k, 0); // x = +-a
  const atAxialEnds = ellipseBoundaryStress(a, b, 1, k, Math.PI / 2); // y = +-b
  const peakAtAxial = Math.abs(atAxialEnds) >= Math.abs(atCircEnds);
  const peak = peakAtAxial ? atAxialEnds : atCircEnds;
  const notes: MethodNote[] = [
    {
      code: 'peak-location',
      severity: 'information',
      message: peakAtAxial
        ? `Peak tangential stress ${peak.toFixed(3)} sigma_h at the axial ends of the opening (y = +-h_c/2, eta = 90 deg).`
        : `Peak tangential stress ${peak.toFixed(3)} sigma_h at the circumferential ends of the opening (x = +-w_c/2, eta = 0).`,
    },
  ];
  if (peak < 0) {
    notes.push({
      code: 'peak-compressive',
      severity: 'information',
      message: 'The largest-magnitude edge stress is compressive.',
    });
  }
  return computed(
    Math.abs(peak),
    formula,
    SOURCE,
    [
      { name: 'a = w_c/2', value: a, unit: 'm' },
      { name: 'b = h_c/2', value: b, unit: 'm' },
      { name: 'm', value: (a - b) / (a + b), unit: '' },
      { name: 'sigma_l/sigma_h', value: k, unit: '' },
      { name: 'sigma_t/sigma_h at x = +-a (eta = 0)', value: atCircEnds, unit: '' },
      { name: 'sigma_t/sigma_h at y = +-b (eta = 90 deg)', value: atAxialEnds, unit: '' },
      { name: 'eta_peak', value: peakAtAxial ? 90 : 0, unit: 'deg' },
    ],
    notes,
  );
}
