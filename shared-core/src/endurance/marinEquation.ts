import { type Computed, computed } from '../computed';

/**
 * Marin equation: the corrected endurance limit (or corrected fatigue strength at a
 * reference life, for a material without an endurance limit).
 */
export function marinCorrected(
  symbol: 'Se' | 'S_ref',
  factors: { ka: number; kb: number; kc: number; kd: number; ke: number; kmisc: number },
  base: number,
  baseName: 'Se_prime' | 'Sf_ref',
): Computed {
  const { ka, kb, kc, kd, ke, kmisc } = factors;
  return computed(
    ka * kb * kc * kd * ke * kmisc * base,
    `${symbol} = ka * kb * kc * kd * ke * kmisc * ${baseName}`,
    "Marin (1962); Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Eq. 6-18",
  );
}
