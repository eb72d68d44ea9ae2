/**
 * Fatigue strength fraction f: the fraction of Sut reached at 10^3 cycles on the S-N line.
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, Fig. 6-18, as the quadratic
 * fit of the 10th/11th editions: f = 1.06 - 2.8e-3 Sut + 6.9e-6 Sut^2 (Sut in kpsi,
 * 70 <= Sut <= 200 kpsi). Below 70 kpsi the book takes f = 0.9 (9th ed., p. 285 and
 * Example 6-8). Above 200 kpsi the fit is evaluated at 200 kpsi with a `fit-range` note.
 */
import { type Computed, computed, KSI, type MethodNote } from '../computed';

const SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, Fig. 6-18 (quadratic fit of the 10th/11th ed., 70 <= Sut <= 200 kpsi; f = 0.9 below 70 kpsi, 9th ed. p. 285)";
const FORMULA = 'f = 1.06 - 2.8e-3 * Sut + 6.9e-6 * Sut^2  (Sut in kpsi, 70 <= Sut <= 200)';

function fit(sutKsi: number): number {
  return 1.06 - 2.8e-3 * sutKsi + 6.9e-6 * sutKsi ** 2;
}

/** Fatigue strength fraction for the ultimate strength `Sut` in Pa. */
export function fatigueStrengthFraction(Sut: number): Computed {
  if (typeof Sut !== 'number' || !Number.isFinite(Sut) || Sut <= 0) {
    return computed(
      0.9,
      FORMULA,
      SOURCE,
      [],
      [
        {
          code: 'invalid-input',
          severity: 'error',
          message: 'Sut must be a positive stress; f = 0.9 shown.',
        },
      ],
    );
  }
  const sutKsi = Sut / KSI;
  const terms = [{ name: 'Sut', value: sutKsi, unit: 'kpsi' }];
  const notes: MethodNote[] = [];
  if (sutKsi < 70) {
    notes.push({
      code: 'fit-range',
      severity: 'information',
      message: `Sut = ${sutKsi.toFixed(1)} kpsi is below 70 kpsi, where Fig. 6-18 starts: f = 0.9 taken, as Budynas & Nisbett do.`,
    });
    return computed(0.9, 'f = 0.9  (Sut < 70 kpsi)', SOURCE, terms, notes);
  }
  let at = sutKsi;
  if (sutKsi > 200) {
    at = 200;
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `Sut = ${sutKsi.toFixed(0)} kpsi is above the 200 kpsi end of Fig. 6-18; f evaluated at 200 kpsi.`,
    });
    terms.push({ name: 'Sut (evaluated)', value: at, unit: 'kpsi' });
  }
  return computed(fit(at), FORMULA, SOURCE, terms, notes);
}
