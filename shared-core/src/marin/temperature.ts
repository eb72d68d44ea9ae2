/**
 * Marin temperature factor kd.
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-27):
 *   kd = 0.975 + 0.432e-3 TF - 0.115e-5 TF^2 + 0.104e-8 TF^3 - 0.595e-12 TF^4,
 *   TF in degF, 70 <= TF <= 1000 (a fit to Table 6-4, S_T / S_RT of steels).
 *
 * Below 70 degF the factor is 1 (room temperature: the data start there). Below about
 * -20 degC a warning: low-temperature brittle fracture is a separate failure mode that a
 * stress-life check does not cover. Above 1000 degF the fit is evaluated at 1000 degF with
 * a `fit-range` warning: creep and creep-fatigue govern there.
 */
import { type Computed, computed, type MethodNote } from '../computed';

const SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-27), fit to Table 6-4 (steels, 70 to 1000 degF)";
const FORMULA =
  'kd = 0.975 + 0.432e-3*TF - 0.115e-5*TF^2 + 0.104e-8*TF^3 - 0.595e-12*TF^4  (TF in degF, 70 <= TF <= 1000)';

const TF_LOW = 70;
const TF_HIGH = 1000;
/** -20 degC in kelvin: the brittle-fracture warning threshold (common practice, no source). */
const T_COLD = 253.15;

function polynomial(TF: number): number {
  return 0.975 + 0.432e-3 * TF - 0.115e-5 * TF ** 2 + 0.104e-8 * TF ** 3 - 0.595e-12 * TF ** 4;
}

/** Temperature factor at the operating temperature `T` in kelvin. */
export function temperatureFactor(T: number): Computed {
  if (typeof T !== 'number' || !Number.isFinite(T) || T <= 0) {
    return computed(
      1,
      FORMULA,
      SOURCE,
      [],
      [
        {
          code: 'invalid-input',
          severity: 'error',
          message: 'temp must be a temperature above absolute zero; kd = 1 shown.',
        },
      ],
    );
  }
  const TC = T - 273.15;
  const TF = TC * 1.8 + 32;
  const terms = [
    { name: 'T', value: TC, unit: 'degC' },
    { name: 'TF', value: TF, unit: 'degF' },
  ];
  const notes: MethodNote[] = [];
  if (TF < TF_LOW) {
    if (T < T_COLD) {
      notes.push({
        code: 'low-temperature',
        severity: 'warning',
        message: `T = ${TC.toFixed(0)} degC: below about -20 degC steels may lose toughness (ductile-to-brittle transition); brittle fracture is outside the stress-life method. kd = 1 taken; check impact toughness.`,
      });
    }
    return computed(1, 'kd = 1  (TF < 70 degF: room temperature or below)', SOURCE, terms, notes);
  }
  let TFe = TF;
  if (TF > TF_HIGH) {
    TFe = TF_HIGH;
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `T = ${TC.toFixed(0)} degC (${TF.toFixed(0)} degF) is above the 1000 degF (538 degC) limit of Eq. (6-27); kd evaluated at 1000 degF. Creep and creep-fatigue govern at this temperature: the stress-life check alone is not adequate.`,
    });
    terms.push({ name: 'TF (evaluated)', value: TFe, unit: 'degF' });
  }
  return computed(polynomial(TFe), FORMULA, SOURCE, terms, notes);
}
