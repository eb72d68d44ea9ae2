import { type Computed, computed } from '../computed';

/** von Mises stress of a plane biaxial state without shear (a shell's membrane stresses). */
export function biaxialVonMises(
  symbol: string,
  s1: number,
  s2: number,
  s1Name: string,
  s2Name: string,
): Computed {
  const v = Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
  return computed(
    v,
    `${symbol} = sqrt(${s1Name}^2 - ${s1Name} * ${s2Name} + ${s2Name}^2)`,
    "von Mises (distortion energy) criterion for plane stress; Budynas & Nisbett, Shigley's MED 10th ed., Eq. 5-13",
  );
}
