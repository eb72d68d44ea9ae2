/**
 * Miscellaneous-effects factor (the contract's `kmisc`; Marin's own letter k_f would clash
 * with the fatigue stress concentration factor Kf).
 */
import { type Computed, computed } from '../computed';

/**
 * kmisc = 1 by default. Residual stresses, corrosion, plating, metal spraying, fretting,
 * cyclic frequency and directional properties (rolled parts can be 10 to 20 % weaker
 * across the grain, Budynas & Nisbett 9th ed. Sec. 6-9) are not modelled: the engineer
 * states `kmisc` when any applies.
 */
export function miscFactor(): Computed {
  return computed(
    1,
    'kmisc = 1  (default: no residual-stress, corrosion, plating, fretting or directional effects assumed; state kmisc when any applies)',
    'common practice, no source',
  );
}
