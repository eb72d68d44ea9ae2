/**
 * Endurance limit S'e of the polished rotating-beam specimen, estimated from Sut by
 * material class.
 *
 * Steels (carbon, alloy, structural, stainless): Budynas & Nisbett, Shigley's Mechanical
 *   Engineering Design, 9th ed., Eq. (6-8): S'e = 0.5 Sut for Sut <= 1400 MPa, 700 MPa above
 *   (from the wrought iron and steel data of Fig. 6-17).
 * Cast iron: J. Carvill, Mechanical Engineer's Data Handbook (Butterworth-Heinemann, 1993),
 *   Sec. 1.3.2: endurance limit = 0.45 x tensile strength up to 600 N/mm^2, 275 N/mm^2 above.
 * Aluminium, titanium, copper and magnesium alloys: no endurance limit (the fatigue-notes contract); the caller uses
 *   a fatigue strength at a stated life instead, so the answer is null.
 */
import { type Computed, computed, type MethodNote, MPA } from '../computed';
import type { MaterialClass } from '../materials/library';

const SOURCE_STEEL = "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-8)";
const SOURCE_CAST_IRON =
  "Carvill, Mechanical Engineer's Data Handbook (Butterworth-Heinemann, 1993), Sec. 1.3.2 (cast iron and cast steel)";

/** Estimated rotating-beam endurance limit (Pa), or null for a class without an endurance limit. */
export function rotatingBeamEndurance(cls: MaterialClass, Sut: number): Computed | null {
  if (
    cls === 'aluminium' ||
    cls === 'aluminium-cast' ||
    cls === 'titanium' ||
    cls === 'copper' ||
    cls === 'magnesium'
  )
    return null;
  const castIron = cls === 'cast-iron';
  const source = castIron ? SOURCE_CAST_IRON : SOURCE_STEEL;
  const formula = castIron
    ? 'Se_prime = 0.45 * Sut  (Sut <= 600 MPa);  275 MPa  (Sut > 600 MPa)'
    : 'Se_prime = 0.5 * Sut  (Sut <= 1400 MPa);  700 MPa  (Sut > 1400 MPa)';
  if (cls !== 'steel' && cls !== 'stainless' && !castIron) {
    return computed(
      0,
      formula,
      source,
      [],
      [
        {
          code: 'unknown-option',
          severity: 'error',
          message: `Unknown material class '${String(cls)}'; no endurance limit estimated (Se_prime = 0 shown).`,
        },
      ],
    );
  }
  if (typeof Sut !== 'number' || !Number.isFinite(Sut) || Sut <= 0) {
    return computed(
      0,
      formula,
      source,
      [],
      [
        {
          code: 'invalid-input',
          severity: 'error',
          message: 'Sut must be a positive stress; Se_prime cannot be estimated (0 shown).',
        },
      ],
    );
  }
  const sutMPa = Sut / MPA;
  const terms = [{ name: 'Sut', value: sutMPa, unit: 'MPa' }];
  const notes: MethodNote[] = [];
  let value: number;
  if (castIron) {
    value = sutMPa <= 600 ? 0.45 * Sut : 275 * MPA;
    notes.push({
      code: 'estimate',
      severity: 'information',
      message:
        'Cast-iron endurance limits scatter widely: Budynas & Nisbett (9th ed., Table 6-9) give mean fatigue ratios of 0.35 (grey), 0.33 (normalised nodular) and 0.40 (malleable). Prefer a test value (state Se_prime).',
    });
  } else {
    value = sutMPa <= 1400 ? 0.5 * Sut : 700 * MPA;
    if (cls === 'stainless') {
      notes.push({
        code: 'estimate',
        severity: 'information',
        message:
          'Eq. (6-8) is drawn from carbon and alloy steel data (Fig. 6-17); for stainless steels a published fatigue limit should be preferred (state Se_prime).',
      });
    }
  }
  return computed(value, formula, source, terms, notes);
}
