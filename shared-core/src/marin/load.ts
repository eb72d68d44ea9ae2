/**
 * Marin load factor kc.
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-26):
 * kc = 1 (bending), 0.85 (axial), 0.59 (torsion). For combined loading the contract of
 * fatigue-notes (and Budynas & Nisbett Sec. 6-14) applies kc = 1 to Se and carries the
 * axial 0.85 inside the equivalent stress: sigma_a_eq uses Kf_ax * sigma_ax_a / 0.85.
 */
import { type Computed, computed } from '../computed';

export type LoadKind = 'bending' | 'axial' | 'torsion' | 'combined';

const SOURCE = "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-26)";
const SOURCE_COMBINED =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Sec. 6-14 (combinations of loading modes) and the fatigue-notes block-language contract (combined loading)";

/** Load factor for the mode of loading; an unknown mode gives kc = 1 with an error note. */
export function loadFactor(load: LoadKind): Computed {
  switch (load) {
    case 'bending':
      return computed(1, 'kc = 1  (bending)', SOURCE);
    case 'axial':
      return computed(0.85, 'kc = 0.85  (axial)', SOURCE);
    case 'torsion':
      return computed(0.59, 'kc = 0.59  (torsion; pair with the shear ultimate 0.67 * Sut)', SOURCE);
    case 'combined':
      return computed(
        1,
        'kc = 1  (combined: the axial 0.85 is carried inside sigma_a_eq as Kf_ax * sigma_ax_a / 0.85, torsion through the von Mises sqrt(3))',
        SOURCE_COMBINED,
      );
    default:
      return computed(
        1,
        'kc = 1',
        SOURCE,
        [],
        [
          {
            code: 'unknown-option',
            severity: 'error',
            message: `Unknown load kind '${String(load)}'; expected bending, axial, torsion or combined. kc = 1 used.`,
          },
        ],
      );
  }
}
