/**
 * Continuous join of two pieces of a chart fit at their common range boundary.
 *
 * Peterson's charts (Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed.,
 * Charts 3.4 and 3.10) and Roark's Table 17.1 (U-notch in a round shaft) draw Kt as smooth
 * curves of the geometry; their curve-fit equations give it in two ranges of h/r that meet at
 * h/r = 2 with a small step (up to about 1 % of Kt: each piece fits the curve within its own
 * accuracy, not the other piece). The step is an artefact of the fit, not of the chart, so the
 * project joins the pieces, conservatively: at the boundary B, where both published pieces
 * hold, Kt is the larger of the two; the piece that is lower there is lifted towards it over
 * the 5 % of h/r next to the boundary on its own side, and left as published beyond:
 *
 *   Kt = Kt_piece(h/r) + L w,  L = |Kt_upper(B) - Kt_lower(B)| (at the same 2h/D),
 *   w = 3 u^2 - 2 u^3, u = 1 at h/r = B falling to 0 at h/r = B/1.05 (lower piece lifted)
 *   or at h/r = 1.05 B (upper piece lifted).
 *
 * So Kt is continuous, never below the published piece of the range that holds h/r, and
 * equal to it outside the 5 % next to the boundary. This is the project's choice (no published
 * source for the join).
 */

/** Width factor of the join zone next to the boundary (h/r from B/1.05 to B, or B to 1.05 B). */
export const JOIN = 1.05;

export interface Piece {
  kt: number;
  c: number[];
}

export interface Joined extends Piece {
  /** The lift L w added to the piece's own value (0 outside the join zone). */
  lift: number;
  /** Which published piece the value rests on. */
  piece: 'lower' | 'upper';
}

/** Smoothstep 3u^2 - 2u^3 of u clamped to [0, 1]. */
function smooth(u: number): number {
  const v = Math.min(1, Math.max(0, u));
  return v * v * (3 - 2 * v);
}

/**
 * Kt at x (= h/r) from the pieces `lower` (ranges up to `boundary`) and `upper` (from it),
 * joined at the boundary as described above. Each piece is a function of x alone (2h/D fixed).
 */
export function joinAtBoundary(
  x: number,
  boundary: number,
  lower: (x: number) => Piece,
  upper: (x: number) => Piece,
): Joined {
  if (x <= boundary) {
    const base = lower(x);
    if (!(x > boundary / JOIN)) return { ...base, lift: 0, piece: 'lower' };
    const step = upper(boundary).kt - lower(boundary).kt;
    const lift = step > 0 ? step * smooth(Math.log(x / (boundary / JOIN)) / Math.log(JOIN)) : 0;
    return { kt: base.kt + lift, c: base.c, lift, piece: 'lower' };
  }
  const base = upper(x);
  if (!(x < boundary * JOIN)) return { ...base, lift: 0, piece: 'upper' };
  const step = lower(boundary).kt - upper(boundary).kt;
  const lift = step > 0 ? step * smooth(1 - Math.log(x / boundary) / Math.log(JOIN)) : 0;
  return { kt: base.kt + lift, c: base.c, lift, piece: 'upper' };
}

/** The derivation text of a lift, e.g. `+ 0.00227 (joined to the other range at h/r = 2, ...)`. */
export function liftText(boundary: number, piece: 'lower' | 'upper'): string {
  const zone =
    piece === 'lower'
      ? `${Number((boundary / JOIN).toPrecision(4))} < h/r <= ${boundary}`
      : `${boundary} < h/r < ${Number((boundary * JOIN).toPrecision(4))}`;
  return `+ L w: the ${piece} h/r range lifted to meet the larger published value at h/r = ${boundary} (L = the step there, w = 3u^2 - 2u^3 over ${zone})`;
}
