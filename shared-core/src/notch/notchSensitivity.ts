/**
 * Notch sensitivity from the material family's own data.
 *
 *   steels             Neuber: Shigley's sqrt(a) fits, Eqs. 6-35a/b (`neuber.ts`);
 *                      Peterson: a = 0.0254 (2079/Sut)^1.8 mm (`peterson.ts`)
 *   stainless steels   the steel data, by analogy (an information note says so)
 *   aluminium alloys   Peterson's constant for wrought aluminium alloys, a = 0.51 mm, under both
 *                      models: the Neuber-constant fits built in are for steels and must not be
 *                      applied to aluminium (Shigley, Sec. 6-10, fits for steels); no aluminium
 *                      Neuber constant is held with a source checked in this session, so the
 *                      `neuber` model takes Peterson's aluminium constant and says so. Against the
 *                      steel fit at the same Sut (the old behaviour), a = 0.51 mm gives a higher q
 *                      above r = 0.64 mm for 6061-T6 and above r = 1.6 mm for 7075-T6 (hand
 *                      evaluation of both formulas), a lower one below.
 *   anything else      (cast irons, titanium alloys, magnesium, ...) no published data built in:
 *                      q = 1 (Kf = Kt) with a `no-notch-data` warning asking for a stated q;
 *                      never the steel fit.
 */
import type { Computed } from '../computed';
import { neuberSensitivity, type StressKind } from './neuber';
import { noNotchData, petersonSensitivity } from './peterson';

export type NotchSensitivityModel = 'neuber' | 'peterson';

export function familyNotchSensitivity(
  model: NotchSensitivityModel,
  cls: string,
  r: number,
  Sut: number,
  load: StressKind,
): Computed {
  if (cls === 'steel' || cls === 'stainless') {
    if (model === 'peterson') return petersonSensitivity(r, Sut, cls, load);
    const c = neuberSensitivity(r, Sut, load);
    if (cls === 'steel') return c;
    return {
      ...c,
      notes: [
        ...(c.notes ?? []),
        {
          code: 'notch-data-substitute',
          severity: 'information',
          message: "Shigley's Neuber-constant fits for steels are applied to stainless steel by analogy.",
        },
      ],
    };
  }
  if (cls === 'aluminium') {
    const c = petersonSensitivity(r, Sut, 'aluminium', load);
    if (model === 'peterson') return c;
    return {
      ...c,
      notes: [
        ...(c.notes ?? []),
        {
          code: 'notch-data-substitute',
          severity: 'information',
          message:
            "aluminium alloy: the Neuber-constant fits built in are for steels; Peterson's constant for wrought aluminium alloys (a = 0.51 mm) is used instead.",
        },
      ],
    };
  }
  return noNotchData(cls, load);
}
