/**
 * Nominal stresses in a solid round section of diameter `d` (no concentration):
 * bending `sigma = 32 M / (pi d^3)`, torsion `tau = 16 T / (pi d^3)`, axial `sigma = 4 F / (pi d^2)`.
 * Exact elastic beam, torsion and bar theory; the sign of the load is kept.
 */
import { type Computed, computed, isFiniteNumber, MM, MPA } from '../computed';

const SOURCE_BENDING =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 3-10 (sigma = M c / I, solid round: I/c = pi d^3 / 32)";
const SOURCE_TORSION =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 3-12 (tau = T r / J, solid round: J/r = pi d^3 / 16)";
const SOURCE_AXIAL =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 3-9 (uniformly distributed stress sigma = F / A, A = pi d^2 / 4)";

function badInput(formula: string, source: string, message: string): Computed {
  return computed(0, formula, source, undefined, [{ code: 'input', message, severity: 'error' }]);
}

function checkDiameter(d: number, load: number, loadName: string): string | null {
  if (!isFiniteNumber(load)) return `${loadName} is not a finite number.`;
  if (!isFiniteNumber(d) || d <= 0) return 'The diameter d must be a positive length.';
  return null;
}

/** Nominal bending stress at the surface of a solid round section, Pa (signed like `M`). */
export function bendingStress(M: number, d: number): Computed {
  const formula = 'sigma = 32 * M / (pi * d^3)';
  const problem = checkDiameter(d, M, 'The bending moment M');
  if (problem) return badInput(formula, SOURCE_BENDING, problem);
  const sigma = (32 * M) / (Math.PI * d ** 3);
  if (!isFiniteNumber(sigma))
    return badInput(formula, SOURCE_BENDING, 'The diameter is too small: stress overflow.');
  return computed(sigma, formula, SOURCE_BENDING, [
    { name: 'M', value: M, unit: 'N*m' },
    { name: 'd', value: d / MM, unit: 'mm' },
    { name: 'sigma', value: sigma / MPA, unit: 'MPa' },
  ]);
}

/** Nominal torsional shear stress at the surface of a solid round section, Pa (signed like `T`). */
export function torsionStress(T: number, d: number): Computed {
  const formula = 'tau = 16 * T / (pi * d^3)';
  const problem = checkDiameter(d, T, 'The torque T');
  if (problem) return badInput(formula, SOURCE_TORSION, problem);
  const tau = (16 * T) / (Math.PI * d ** 3);
  if (!isFiniteNumber(tau))
    return badInput(formula, SOURCE_TORSION, 'The diameter is too small: stress overflow.');
  return computed(tau, formula, SOURCE_TORSION, [
    { name: 'T', value: T, unit: 'N*m' },
    { name: 'd', value: d / MM, unit: 'mm' },
    { name: 'tau', value: tau / MPA, unit: 'MPa' },
  ]);
}

/** Nominal axial (direct) stress in a solid round section, Pa (tension positive, signed like `F`). */
export function axialStress(F: number, d: number): Computed {
  const formula = 'sigma_ax = 4 * F / (pi * d^2)';
  const problem = checkDiameter(d, F, 'The axial force F');
  if (problem) return badInput(formula, SOURCE_AXIAL, problem);
  const sigma = (4 * F) / (Math.PI * d ** 2);
  if (!isFiniteNumber(sigma))
    return badInput(formula, SOURCE_AXIAL, 'The diameter is too small: stress overflow.');
  return computed(sigma, formula, SOURCE_AXIAL, [
    { name: 'F', value: F, unit: 'N' },
    { name: 'd', value: d / MM, unit: 'mm' },
    { name: 'sigma_ax', value: sigma / MPA, unit: 'MPa' },
  ]);
}
