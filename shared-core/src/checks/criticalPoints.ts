/**
 * The critical points of a section: where a check evaluates its stresses.
 *
 * A bending moment puts +M c/I at one extreme fibre and -M c/I at the other; the axial and
 * torsional stresses of a round section are the same at both. So a section whose bending
 * stress comes from a moment (`M`) and that does not rotate under it is evaluated at both
 * extreme fibres, each with its own signed amplitude and mean (the loads in phase: every load at
 * `mean + amplitude` at one instant and `mean - amplitude` at the other):
 *
 *   fibre `pos` (+M c/I):  sigma = +Kf*sigma_b + Kf_ax*sigma_ax,  tau = Kfs*tau
 *   fibre `neg` (-M c/I):  sigma = -Kf*sigma_b + Kf_ax*sigma_ax,  tau = Kfs*tau
 *
 * and every result (safety factors, first-cycle yield, life, damage) is that of the governing
 * fibre, which the derivation names in words. Per-fibre results carry the suffix `_pos` (the
 * fibre a positive moment puts in tension) or `_neg` (the opposite fibre).
 *
 * One point only: a rotating round section (every fibre passes through both sides of the
 * moment each revolution: the check is as it always was, amplitudes added as magnitudes), a
 * section without a moment (axial and torsion are the same at every point of the surface),
 * stated nominal stresses (`sigma_a`, `sigma_m`, ...: the stresses at the point the note means),
 * and a shell (membrane stresses, one point per location).
 */
import type { MethodNote } from '../computed';
import type { CheckContext } from '../context/checkContext';
import type { Range } from '../context/types';
import type { Component } from './loads';

export type PointKey = 'pos' | 'neg';

export interface SectionPoint {
  /** `pos`/`neg` for an extreme fibre; null for the section's only point (results under the plain names). */
  key: PointKey | null;
  /** Sign of a moment's bending stress at the point: +1 at +M c/I, -1 at -M c/I. */
  s: 1 | -1;
  /** The point in words a checker reads in the derivation. */
  words: string;
}

export const ONLY_POINT: SectionPoint = { key: null, s: 1, words: 'the checked point' };

export { isRotating } from './loads';

const GEOMETRIC: Record<PointKey, string> = {
  pos: 'at +M c/I, `_pos`',
  neg: 'at -M c/I, `_neg`',
};

/**
 * Both extreme fibres, described by the nominal bending stress of the moment: "in tension under
 * the mean moment" when there is a mean moment, otherwise by the moment at its `_max` instant.
 */
export function fibrePoints(bending: Component, maxName: string): SectionPoint[] {
  const words = (s: 1 | -1): string => {
    const geo = GEOMETRIC[s > 0 ? 'pos' : 'neg'];
    if (bending.m !== 0)
      return `the fibre in ${s * bending.m > 0 ? 'tension' : 'compression'} under the mean moment (${geo})`;
    const atMax = bending.m + bending.a;
    if (atMax !== 0)
      return `the fibre in ${s * atMax > 0 ? 'tension' : 'compression'} when the moment is at \`${maxName}\` (no mean moment; ${geo})`;
    return `the extreme fibre ${geo}`;
  };
  return [
    { key: 'pos', s: 1, words: words(1) },
    { key: 'neg', s: -1, words: words(-1) },
  ];
}

/** Both extreme fibres of a damage check, whose levels or cycles have means of both signs. */
export function damageFibrePoints(): SectionPoint[] {
  return [
    { key: 'pos', s: 1, words: 'the fibre a positive moment puts in tension (at +M c/I, `_pos`)' },
    { key: 'neg', s: -1, words: 'the fibre a positive moment puts in compression (at -M c/I, `_neg`)' },
  ];
}

/** A result's name at a point: `n_f_pos`, or the plain name for the only point. */
export function pointName(base: string, p: SectionPoint): string {
  return p.key ? `${base}_${p.key}` : base;
}

/**
 * Index of the governing point: the smallest value (`min`, e.g. a safety factor or a life) or
 * the largest (`max`, e.g. damage). `null` stands for an unbounded value (infinite safety factor
 * or life), never governing under `min`. Ties go to the first point.
 */
export function governingIndex(values: Array<number | null>, worst: 'min' | 'max'): number {
  let best = 0;
  const rank = (v: number | null) =>
    v === null ? (worst === 'min' ? Number.POSITIVE_INFINITY : Number.NEGATIVE_INFINITY) : v;
  for (let i = 1; i < values.length; i++) {
    const a = rank(values[i]);
    const b = rank(values[best]);
    if (worst === 'min' ? a < b : a > b) best = i;
  }
  return best;
}

/**
 * The note on a governing result: which point governs and what the other points give, e.g.
 * "n_f is governed by the fibre in tension under the mean moment, ... (`_neg`); at the fibre in
 * compression under the mean moment, ... (`_pos`): n_f_pos = 1.15". `displays` are the values
 * shown per point; without them the per-point records (`n_f_pos` ...) are read. `perPointNames`
 * false: the per-point values have no records of their own (the comparison criteria).
 */
export function governingNote(
  ctx: CheckContext,
  base: string,
  points: SectionPoint[],
  gov: number,
  displays?: string[],
  perPointNames = true,
): MethodNote {
  const shown = (i: number) => displays?.[i] ?? ctx.values[pointName(base, points[i])]?.display ?? '';
  const others = points
    .map((p, i) => ({ p, i }))
    .filter(({ i }) => i !== gov)
    .map(({ p, i }) => `at ${p.words}: ${perPointNames ? pointName(base, p) : base} = ${shown(i)}`);
  const same = points.length > 1 && points.every((_, i) => shown(i) === shown(gov));
  return {
    code: 'critical-point',
    severity: 'information',
    message: same
      ? `${base} is the same at both extreme fibres (shown: ${points[gov].words})`
      : `${base} is governed by ${points[gov].words}; ${others.join('; ')}`,
  };
}

/** Notes of a per-point record: the information only (warnings and errors are reported once, on the governing record). */
export function infoOnly(notes: MethodNote[] | undefined): MethodNote[] {
  return (notes ?? []).filter((n) => n.severity === 'information' || n.severity === 'hint');
}

/**
 * A round section with a mean moment and no `rotation:` stated is taken as rotating, where
 * the largest moment is fully reversed: say so, and offer `rotation: non-rotating` (both
 * fibres are then checked with the mean moment).
 */
export function warnRotationAssumed(ctx: CheckContext, meanMoment: number, range: Range): void {
  if (ctx.options.has('rotation') || meanMoment === 0) return;
  ctx.diag(
    'warning',
    'rotation-assumed',
    'no `rotation:` stated: the section is taken as rotating, so the largest moment is fully reversed at every fibre (the conservative reading for fatigue). If the section does not turn under the load (a pin, an axle, a bracket), state `rotation: non-rotating`: both extreme fibres are then checked with the mean moment, and the size factor uses the equivalent diameter',
    range,
    [
      ctx.insertFix('State `rotation: non-rotating`', 'rotation: non-rotating'),
      { ...ctx.insertFix('State `rotation: rotating`', 'rotation: rotating'), preferred: false },
    ],
  );
}
