/**
 * Nominal axial stresses in a plate of width `W` and thickness `t` with a central
 * transverse hole of diameter `d_hole`: on the net section `F / ((W - d_hole) t)` (the
 * reference stress of the usual Kt charts for a plate hole) and on the gross section `F / (W t)`.
 */
import { type Computed, computed, isFiniteNumber, MM, MPA } from '../computed';

const SOURCE_NET =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Table A-15-1 (plate with a transverse hole in tension: sigma_0 = F / A, A = (w - d) t)";
const SOURCE_GROSS = 'Uniform axial stress on the gross section, sigma = F / (W t) (equilibrium, exact)';

function badInput(formula: string, source: string, message: string): Computed {
  return computed(0, formula, source, undefined, [{ code: 'input', message, severity: 'error' }]);
}

/** Net-section nominal stress `F / ((W - d_hole) t)`, Pa. */
export function plateNetStress(F: number, W: number, d_hole: number, t: number): Computed {
  const formula = 'sigma_net = F / ((W - d_hole) * t)';
  if (!isFiniteNumber(F)) return badInput(formula, SOURCE_NET, 'The force F is not a finite number.');
  if (!isFiniteNumber(W) || W <= 0)
    return badInput(formula, SOURCE_NET, 'The plate width W must be positive.');
  if (!isFiniteNumber(t) || t <= 0) return badInput(formula, SOURCE_NET, 'The thickness t must be positive.');
  if (!isFiniteNumber(d_hole) || d_hole < 0)
    return badInput(formula, SOURCE_NET, 'The hole diameter d_hole must be zero or positive.');
  if (d_hole >= W)
    return badInput(formula, SOURCE_NET, 'The hole diameter d_hole must be smaller than the plate width W.');
  const sigma = F / ((W - d_hole) * t);
  if (!isFiniteNumber(sigma))
    return badInput(formula, SOURCE_NET, 'The net section is too small: stress overflow.');
  return computed(sigma, formula, SOURCE_NET, [
    { name: 'F', value: F, unit: 'N' },
    { name: 'W', value: W / MM, unit: 'mm' },
    { name: 'd_hole', value: d_hole / MM, unit: 'mm' },
    { name: 't', value: t / MM, unit: 'mm' },
    { name: 'sigma_net', value: sigma / MPA, unit: 'MPa' },
  ]);
}

/** Gross-section nominal stress `F / (W t)`, Pa. */
export function plateGrossStress(F: number, W: number, t: number): Computed {
  const formula = 'sigma_gross = F / (W * t)';
  if (!isFiniteNumber(F)) return badInput(formula, SOURCE_GROSS, 'The force F is not a finite number.');
  if (!isFiniteNumber(W) || W <= 0)
    return badInput(formula, SOURCE_GROSS, 'The plate width W must be positive.');
  if (!isFiniteNumber(t) || t <= 0)
    return badInput(formula, SOURCE_GROSS, 'The thickness t must be positive.');
  const sigma = F / (W * t);
  if (!isFiniteNumber(sigma))
    return badInput(formula, SOURCE_GROSS, 'The section is too small: stress overflow.');
  return computed(sigma, formula, SOURCE_GROSS, [
    { name: 'F', value: F, unit: 'N' },
    { name: 'W', value: W / MM, unit: 'mm' },
    { name: 't', value: t / MM, unit: 'mm' },
    { name: 'sigma_gross', value: sigma / MPA, unit: 'MPa' },
  ]);
}
