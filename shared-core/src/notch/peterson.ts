/**
 * Peterson's notch sensitivity q = 1/(1 + a/r) with Peterson's material characteristic length a.
 *
 * Constants used (Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed., Sec. 1.9
 * on notch sensitivity; values as given in the task brief and from memory, not checked against
 * the book in this session):
 *   steels:              a = 0.0254 (2079/Sut)^1.8 mm, Sut in MPa
 *   aluminium alloys:    a = 0.635 mm
 *   shear (torsion):     a_shear = 0.6 a_normal for steels (common practice, no source)
 * Classes without a verified constant are answered conservatively and say so:
 *   stainless:  the steel correlation is applied by analogy (note);
 *   cast-iron:  q = 0.20, Shigley's advice for cast irons (Budynas & Nisbett, Shigley's MED,
 *               Sec. 6-10, from memory) (note);
 *   titanium:   q = 1 (Kf = Kt), no verified constant (note).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MM, MPA, type Term } from '../computed';
import type { StressKind } from './neuber';

export type MaterialClass = 'steel' | 'stainless' | 'cast-iron' | 'aluminium' | 'titanium';

const SOURCE =
  "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (Wiley 2008), Sec. 1.9 (Peterson's notch sensitivity q = 1/(1 + a/r)); a_shear = 0.6 a: common practice, no source";

const SHEAR_RATIO = 0.6;

/** Peterson notch sensitivity for notch radius r (m), ultimate strength Sut (Pa). */
export function petersonSensitivity(r: number, Sut: number, cls: MaterialClass, load: StressKind): Computed {
  const sym = load === 'shear' ? 'qs' : 'q';
  const formula = `${sym} = 1/(1 + a/r)`;
  const notes: MethodNote[] = [];
  if (!isFiniteNumber(r) || r <= 0) {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Notch radius r must be positive; q = 1 returned (full notch sensitivity).',
      },
    ]);
  }
  if (cls === 'titanium') {
    return computed(1, `${sym} = 1 (no Peterson constant for titanium built in)`, SOURCE, undefined, [
      {
        code: 'no-material-constant',
        severity: 'warning',
        message: 'No verified Peterson constant for titanium alloys; q = 1 (Kf = Kt) used. State q if known.',
      },
    ]);
  }
  if (cls === 'cast-iron') {
    return computed(
      0.2,
      `${sym} = 0.20 (cast iron)`,
      "Budynas & Nisbett, Shigley's Mechanical Engineering Design, Sec. 6-10 (q = 0.20 for cast irons, from memory)",
      undefined,
      [
        {
          code: 'no-material-constant',
          severity: 'warning',
          message:
            'Peterson constant not defined for cast iron; q = 0.20 (Shigley, from memory) used. State q if known.',
        },
      ],
    );
  }
  let aNormalMm: number;
  const terms: Term[] = [];
  if (cls === 'aluminium') {
    aNormalMm = 0.635;
  } else if (cls === 'steel' || cls === 'stainless') {
    if (!isFiniteNumber(Sut) || Sut <= 0) {
      return computed(1, formula, SOURCE, undefined, [
        {
          code: 'invalid-input',
          severity: 'error',
          message: 'Sut must be a positive stress; q = 1 returned (full notch sensitivity).',
        },
      ]);
    }
    const sutMpa = Sut / MPA;
    aNormalMm = 0.0254 * (2079 / sutMpa) ** 1.8;
    terms.push({ name: 'Sut', value: sutMpa, unit: 'MPa' });
    if (cls === 'stainless') {
      notes.push({
        code: 'no-material-constant',
        severity: 'information',
        message:
          'The steel correlation a = 0.0254 (2079/Sut)^1.8 mm is applied to stainless steel by analogy.',
      });
    }
  } else {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: `Unknown material class '${String(cls)}'; q = 1 returned.`,
      },
    ]);
  }
  const aMm = load === 'shear' ? SHEAR_RATIO * aNormalMm : aNormalMm;
  if (load === 'shear') terms.push({ name: 'a (normal)', value: aNormalMm, unit: 'mm' });
  terms.push({ name: 'a', value: aMm, unit: 'mm' });
  terms.push({ name: 'r', value: r / MM, unit: 'mm' });
  const q = 1 / (1 + aMm / (r / MM));
  return computed(q, formula, SOURCE, terms, notes);
}
