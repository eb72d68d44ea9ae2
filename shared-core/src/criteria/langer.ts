/**
 * First-cycle yield (Langer): `n_y = Sy / sigma_max_eq`, with sigma_max_eq the von Mises
 * stress of the peak stresses (see `stress/vonMises.ts`). The Langer line on the Haigh diagram
 * is `sigma_a + |sigma_m| = Sy`.
 */
import { type Computed, computed, infinite, isFiniteNumber, MPA } from '../computed';

export const LANGER_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-12 (Langer first-cycle yield line S_a + S_m = S_y) applied to the von Mises stress of the peak state, Sec. 6-14 (sigma'_max): n_y = S_y / sigma_max_eq";

/** Safety factor against first-cycle yield, `Sy / |sigma_max_eq|`; no stress gives `infinite`. */
export function firstCycleYieldFactor(Sy: number, sigma_max_eq: number): Computed {
  const formula = 'n_y = Sy / sigma_max_eq';
  if (!isFiniteNumber(Sy) || Sy <= 0)
    return computed(0, formula, LANGER_SOURCE, undefined, [
      { code: 'input', message: 'Sy must be a positive stress.', severity: 'error' },
    ]);
  if (!isFiniteNumber(sigma_max_eq))
    return computed(0, formula, LANGER_SOURCE, undefined, [
      { code: 'input', message: 'sigma_max_eq is not a finite number.', severity: 'error' },
    ]);
  const peak = Math.abs(sigma_max_eq);
  const terms = [
    { name: 'Sy', value: Sy / MPA, unit: 'MPa' },
    { name: 'sigma_max_eq', value: peak / MPA, unit: 'MPa' },
  ];
  if (peak === 0) {
    return infinite(formula, LANGER_SOURCE, terms, [
      {
        code: 'infinite',
        message: 'No peak stress: the yield safety factor is unbounded.',
        severity: 'information',
      },
    ]);
  }
  const n = Sy / peak;
  if (!isFiniteNumber(n)) {
    return infinite(formula, LANGER_SOURCE, terms, [
      {
        code: 'infinite',
        message: 'The peak stress is negligible: the yield safety factor is unbounded.',
        severity: 'information',
      },
    ]);
  }
  return computed(n, formula, LANGER_SOURCE, [...terms, { name: 'n_y', value: n, unit: '' }]);
}

/** Langer line points [sigma_m, sigma_a] (Pa): from (-Sy, 0) through (0, Sy) to (Sy, 0). */
export function langerLine(Sy: number): Array<[number, number]> {
  if (!isFiniteNumber(Sy) || Sy <= 0) return [];
  return [
    [-Sy, 0],
    [0, Sy],
    [Sy, 0],
  ];
}
