/**
 * Peterson's notch sensitivity q = 1/(1 + a/r) with Peterson's material characteristic length a.
 *
 * Constants used:
 *   steels:             a = 0.0254 (2079/Sut)^1.8 mm, Sut in MPa (Pilkey & Pilkey, Peterson's
 *                       Stress Concentration Factors, 3rd ed., Sec. 1.9; form as given in the task
 *                       brief, not checked against the book in this session)
 *   aluminium alloys:   a = 0.51 mm (0.02 in), Peterson's constant for wrought aluminium alloys
 *                       (Peterson 1959, as quoted in Dowling, Mechanical Behavior of Materials,
 *                       Sec. 10.3, Eq. 10.9 and the text after it; from memory, the search tool
 *                       found no copy in this session). The earlier 0.635 mm (0.025 in) gave a
 *                       lower q and is not used.
 *   shear (torsion):    a_shear = 0.6 a_normal (common practice, no source; the ratio of the
 *                       squared torsion and bending Neuber constants of Shigley's steel fits,
 *                       Eqs. 6-35a/b, is 0.55 to 0.6 over 80 to 150 kpsi)
 *   stainless steels:   the steel correlation, by analogy (a note says so)
 * Families without a published constant (cast irons, titanium alloys, and any other) get
 * q = 1 (Kf = Kt, conservative) with a `no-notch-data` warning asking for a stated q. For cast
 * irons Shigley recommends q = 0.20 for all grades (Budynas & Nisbett, Shigley's MED, Sec. 6-10,
 * from memory): the warning quotes it for the engineer to state, it is not applied silently.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MM, MPA, type Term } from '../computed';
import type { StressKind } from './neuber';

export type MaterialClass = 'steel' | 'stainless' | 'cast-iron' | 'aluminium' | 'titanium';

const SOURCE =
  "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (Wiley 2008), Sec. 1.9 (Peterson's notch sensitivity q = 1/(1 + a/r)); a_shear = 0.6 a: common practice, no source";

const SOURCE_ALUMINIUM =
  "Peterson's constant for wrought aluminium alloys a = 0.51 mm (0.02 in), Peterson (1959) as quoted in Dowling, Mechanical Behavior of Materials, Sec. 10.3, Eq. 10.9 (from memory); q = 1/(1 + a/r); a_shear = 0.6 a: common practice, no source";

const SHEAR_RATIO = 0.6;

/** Peterson's constant for wrought aluminium alloys, mm (0.02 in). */
export const ALUMINIUM_A_MM = 0.51;

const FAMILY_WORDS: Record<string, string> = {
  'cast-iron': 'cast irons',
  titanium: 'titanium alloys',
};

/**
 * q = 1 (Kf = Kt) for a material family without published notch-sensitivity data, with the
 * warning that asks for a stated q. Shared by both notch-sensitivity models.
 */
export function noNotchData(cls: string, load: StressKind): Computed {
  const sym = load === 'shear' ? 'qs' : 'q';
  const family = FAMILY_WORDS[cls] ?? `the family '${cls}'`;
  const hint =
    cls === 'cast-iron'
      ? ' Shigley recommends q = 0.20 for all grades of cast iron (Budynas & Nisbett, Sec. 6-10, from memory).'
      : '';
  return computed(
    1,
    `${sym} = 1 (no notch-sensitivity data for ${family} built in: Kf = Kt)`,
    'conservative default: full notch sensitivity where no published data for the material family is built in',
    undefined,
    [
      {
        code: 'no-notch-data',
        severity: 'warning',
        message: `no published notch-sensitivity data for ${family} is built in (the Neuber and Peterson constants are for steels and wrought aluminium alloys): ${sym} = 1 (Kf = Kt) used; state \`${sym}\` from test data or the material's source.${hint}`,
      },
    ],
  );
}

/** Peterson notch sensitivity for notch radius r (m), ultimate strength Sut (Pa), material family `cls`. */
export function petersonSensitivity(
  r: number,
  Sut: number,
  cls: MaterialClass | string,
  load: StressKind,
): Computed {
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
  if (cls !== 'steel' && cls !== 'stainless' && cls !== 'aluminium') return noNotchData(cls, load);
  const terms: Term[] = [];
  let aNormalMm = ALUMINIUM_A_MM;
  let source = SOURCE_ALUMINIUM;
  if (cls !== 'aluminium') {
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
    source = SOURCE;
    terms.push({ name: 'Sut', value: sutMpa, unit: 'MPa' });
    if (cls === 'stainless') {
      notes.push({
        code: 'notch-data-substitute',
        severity: 'information',
        message:
          'The steel correlation a = 0.0254 (2079/Sut)^1.8 mm is applied to stainless steel by analogy.',
      });
    }
  }
  const aMm = load === 'shear' ? SHEAR_RATIO * aNormalMm : aNormalMm;
  if (load === 'shear') terms.push({ name: 'a (normal)', value: aNormalMm, unit: 'mm' });
  terms.push({ name: 'a', value: aMm, unit: 'mm' });
  terms.push({ name: 'r', value: r / MM, unit: 'mm' });
  const q = 1 / (1 + aMm / (r / MM));
  return computed(q, formula, source, terms, notes);
}
