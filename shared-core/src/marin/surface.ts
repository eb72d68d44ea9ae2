/**
 * Marin surface factor ka = a * Sut^b (Sut in MPa).
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-19) and
 * Table 6-2 (after Noll & Lipson 1946): ground 1.58 / -0.085, machined or cold-drawn
 * 4.51 / -0.265, hot-rolled 57.7 / -0.718, as-forged 272 / -0.995 (a in MPa form).
 */
import { type Computed, computed, type MethodNote, MPA } from '../computed';

export type SurfaceFinish = 'ground' | 'machined' | 'cold-drawn' | 'hot-rolled' | 'as-forged';

export const SURFACE_FINISHES: readonly SurfaceFinish[] = Object.freeze([
  'ground',
  'machined',
  'cold-drawn',
  'hot-rolled',
  'as-forged',
]);

const SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-19), Table 6-2 (after Noll & Lipson, 1946)";

/** Table 6-2 constants, `a` for Sut in MPa. */
const TABLE_6_2: Readonly<Record<SurfaceFinish, { a: number; b: number }>> = Object.freeze({
  ground: { a: 1.58, b: -0.085 },
  machined: { a: 4.51, b: -0.265 },
  'cold-drawn': { a: 4.51, b: -0.265 },
  'hot-rolled': { a: 57.7, b: -0.718 },
  'as-forged': { a: 272, b: -0.995 },
});

const FORMULA = 'ka = a * Sut^b  (Sut in MPa)';

/** Surface factor for a finish and ultimate strength `Sut` in Pa. */
export function surfaceFactor(finish: SurfaceFinish, Sut: number): Computed {
  const row = TABLE_6_2[finish];
  if (!row) {
    return computed(
      1,
      FORMULA,
      SOURCE,
      [],
      [
        {
          code: 'unknown-option',
          severity: 'error',
          message: `Unknown surface finish '${String(finish)}'; expected one of ${SURFACE_FINISHES.join(', ')}. ka = 1 used.`,
        },
      ],
    );
  }
  const terms = [
    { name: 'a', value: row.a, unit: 'MPa' },
    { name: 'b', value: row.b, unit: '' },
  ];
  if (!Number.isFinite(Sut) || Sut <= 0) {
    return computed(1, FORMULA, SOURCE, terms, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Sut must be a positive stress; ka cannot be computed (ka = 1 shown).',
      },
    ]);
  }
  const sutMPa = Sut / MPA;
  const fit = row.a * sutMPa ** row.b;
  // A finish cannot be better than the polished specimen: the fit's value above 1 (low
  // strengths) is capped at 1 (common practice, no source; conservative).
  const ka = Math.min(fit, 1);
  const notes: MethodNote[] = [];
  if (fit > 1) {
    notes.push({
      code: 'factor-above-one',
      severity: 'information',
      message: `The Table 6-2 fit gives ${fit.toFixed(3)} > 1 for a ${finish} surface of so low a strength (${sutMPa.toFixed(0)} MPa): a finish cannot beat the polished specimen, so ka = 1 is used.`,
    });
  }
  return computed(
    ka,
    fit > 1 ? `${FORMULA}, capped at 1` : FORMULA,
    SOURCE,
    [...terms, { name: 'Sut', value: sutMPa, unit: 'MPa' }],
    notes,
  );
}
