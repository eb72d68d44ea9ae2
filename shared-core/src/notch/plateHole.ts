/**
 * Central circular hole in a finite-width plate in tension, Kt referred to the NET-section
 * stress F/((W - d_hole) t) (Shigley Fig. A-15-1 convention).
 *
 * Ktn = 3.000 - 3.140 (d/W) + 3.667 (d/W)^2 - 1.527 (d/W)^3, 0 <= d/W < 1
 * Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed., equation of Chart 4.1
 * (Howland's solution). The same cubic appears rounded (3.13, 3.66, 1.53) in Roark's Formulas,
 * Table 17.1 (central circular hole, axial tension). It gives the exact Kirsch value 3.0 as
 * d/W -> 0 and 2.0 as d/W -> 1 (Heywood's Ktn = 2 + (1 - d/W)^3 has the same limits).
 */
import { type Computed, computed, isFiniteNumber } from '../computed';

const SOURCE =
  "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (Wiley 2008), Chart 4.1 equation (Howland); net-section convention of Shigley Fig. A-15-1";

/** Kt (net section) of a central hole of diameter d_hole in a plate of width W (SI lengths). */
export function plateHoleKt(W: number, d_hole: number): Computed {
  const formula =
    'Kt = 3 - 3.140 (d/W) + 3.667 (d/W)^2 - 1.527 (d/W)^3, d = d_hole; nominal F/((W - d_hole) t)';
  if (!isFiniteNumber(W) || !isFiniteNumber(d_hole) || W <= 0 || d_hole <= 0 || d_hole >= W) {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Plate hole needs W > 0 and 0 < d_hole < W; Kt = 1 returned (no concentration computed).',
      },
    ]);
  }
  const x = d_hole / W;
  const kt = 3 - 3.14 * x + 3.667 * x * x - 1.527 * x * x * x;
  return computed(kt, formula, SOURCE, [
    { name: 'd_hole/W', value: x, unit: '' },
    { name: 'Ktg = Kt (1 - d/W)', value: kt * (1 - x), unit: '' },
  ]);
}
