/**
 * Material families: what a note says its material is when it states `Sut`/`Sy` without a
 * library key (`material-family: WORD`). The family decides the endurance route (whether an
 * endurance limit exists, and how `Se_prime` is estimated from `Sut`) and the material class
 * the notch-sensitivity data are looked up by. Each family is one library class
 * (`Material.class`), so that a library key and a family can be compared.
 *
 * Families without an endurance limit have no estimate here: the note states the fatigue
 * strength `Sf_ref` of the rotating-beam specimen and the life `N_ref` it holds at (the
 * library does the same for its aluminium and titanium entries).
 *
 * The strength and temperature bounds are for the plausibility checks of stated values: a
 * value above them is no material of the family (an error that withholds results).
 */
import type { MaterialClass } from './library';

export type MaterialFamily =
  | 'steel'
  | 'stainless-steel'
  | 'cast-iron'
  | 'aluminium-wrought'
  | 'aluminium-cast'
  | 'titanium'
  | 'copper'
  | 'magnesium';

export interface FamilyInfo {
  word: MaterialFamily;
  /** The library class of the family's materials. */
  cls: MaterialClass;
  /** Meaning shown in completion, hover and the docs. */
  meaning: string;
  enduranceLimit: boolean;
  /** Life at which published reference strengths of the family are usually given (quick-fix hint). */
  usualReferenceLife?: number;
  /** Largest ultimate strength of the family's commercial alloys, with margin, Pa: above it, no such material. */
  maxSut: number;
  maxSutSource: string;
  /** Melting point of the base metal (or the eutectic of cast iron), K: above it, no solid part. */
  melt: number;
}

const GPA = 1e9;
const MPA = 1e6;
const C0 = 273.15;
const MELT_SOURCE =
  'melting points of the base metals (iron 1538 degC, solidus of carbon steels about 1400 degC; Fe-C eutectic 1147 degC; aluminium 660 degC; titanium 1668 degC; copper 1085 degC; magnesium 650 degC), from memory';

export const FAMILY_MELT_SOURCE = MELT_SOURCE;

export const FAMILIES: Readonly<Record<MaterialFamily, FamilyInfo>> = Object.freeze({
  steel: {
    word: 'steel',
    cls: 'steel',
    meaning:
      'carbon, alloy and structural steels: endurance limit, Se_prime = 0.5 Sut up to 1400 MPa (Shigley Eq. 6-8)',
    enduranceLimit: true,
    maxSut: 3.5 * GPA,
    maxSutSource:
      "fine music wire (ASTM A228) is the strongest steel product: Sut = A / d^m with A = 2211 MPa*mm^m, m = 0.145 for 0.10 to 6.5 mm (Budynas & Nisbett, Shigley's MED 9th ed., Table 10-4) gives 3.09 GPa at 0.10 mm; maraging steels reach about 2.4 GPa (from memory); 3.5 GPa: common practice, no source",
    melt: 1400 + C0,
  },
  'stainless-steel': {
    word: 'stainless-steel',
    cls: 'stainless',
    meaning: 'stainless steels: endurance limit, the steel estimate of Se_prime by analogy',
    enduranceLimit: true,
    maxSut: 3.0 * GPA,
    maxSutSource:
      "AISI 302 spring wire: A = 1867 MPa*mm^m, m = 0.146 for 0.3 to 2.5 mm (Budynas & Nisbett, Shigley's MED 9th ed., Table 10-4), 2.2 GPa at 0.3 mm; precipitation-hardening grades about 2.4 GPa (from memory); 3.0 GPa: common practice, no source",
    melt: 1400 + C0,
  },
  'cast-iron': {
    word: 'cast-iron',
    cls: 'cast-iron',
    meaning:
      'grey, ductile and malleable cast irons: endurance limit, Se_prime = 0.45 Sut up to 600 MPa (Carvill)',
    enduranceLimit: true,
    maxSut: 1.8 * GPA,
    maxSutSource:
      'austempered ductile iron ASTM A897 grade 1600-1300-00 has Sut 1600 MPa (from memory); 1.8 GPa: common practice, no source',
    melt: 1147 + C0,
  },
  'aluminium-wrought': {
    word: 'aluminium-wrought',
    cls: 'aluminium',
    meaning:
      'wrought aluminium alloys (library class aluminium): no endurance limit, state Sf_ref and N_ref (typical tables give the strength at 5e8 cycles)',
    enduranceLimit: false,
    usualReferenceLife: 5e8,
    maxSut: 0.8 * GPA,
    maxSutSource:
      'the strongest wrought alloys (7075-T6 about 570 MPa, 7068-T6 about 700 MPa; from memory); 0.8 GPa: common practice, no source',
    melt: 660 + C0,
  },
  'aluminium-cast': {
    word: 'aluminium-cast',
    cls: 'aluminium-cast',
    meaning:
      'cast aluminium alloys: no endurance limit, state Sf_ref and N_ref (typical tables give the strength at 5e8 cycles)',
    enduranceLimit: false,
    usualReferenceLife: 5e8,
    maxSut: 0.6 * GPA,
    maxSutSource:
      'the strongest casting alloys (A201.0-T7 about 460 MPa; from memory); 0.6 GPa: common practice, no source',
    melt: 660 + C0,
  },
  titanium: {
    word: 'titanium',
    cls: 'titanium',
    meaning: 'titanium alloys: no endurance limit here, state Sf_ref and N_ref',
    enduranceLimit: false,
    maxSut: 1.8 * GPA,
    maxSutSource:
      'solution-treated and aged beta alloys reach about 1.4 GPa (from memory); 1.8 GPa: common practice, no source',
    melt: 1668 + C0,
  },
  copper: {
    word: 'copper',
    cls: 'copper',
    meaning: 'copper alloys (brasses, bronzes, beryllium copper): no endurance limit, state Sf_ref and N_ref',
    enduranceLimit: false,
    maxSut: 1.6 * GPA,
    maxSutSource:
      'precipitation-hardened beryllium copper C17200 reaches about 1.4 GPa (from memory); 1.6 GPa: common practice, no source',
    melt: 1085 + C0,
  },
  magnesium: {
    word: 'magnesium',
    cls: 'magnesium',
    meaning: 'magnesium alloys: no endurance limit, state Sf_ref and N_ref',
    enduranceLimit: false,
    maxSut: 500 * MPA,
    maxSutSource:
      'the strongest wrought magnesium alloys (ZK60A-T5) reach about 365 MPa (from memory); 500 MPa: common practice, no source',
    melt: 650 + C0,
  },
});

export const FAMILY_WORDS = Object.keys(FAMILIES) as MaterialFamily[];

export function isFamily(word: string): word is MaterialFamily {
  return Object.hasOwn(FAMILIES, word);
}

/** The family word of a library class (each class belongs to one family). */
export function familyOfClass(cls: MaterialClass): MaterialFamily {
  const hit = FAMILY_WORDS.find((w) => FAMILIES[w].cls === cls);
  return hit ?? 'steel';
}
