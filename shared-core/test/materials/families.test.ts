/** The material families of `material-family:` and the library's classes agree (issue 11, item 4). */
import { describe, expect, it } from 'vitest';
import { FAMILIES, FAMILY_WORDS, familyOfClass, MATERIALS } from '../../src/materials';

describe('material families', () => {
  it('each family is one library class, and each library class is one family', () => {
    const classes = FAMILY_WORDS.map((w) => FAMILIES[w].cls);
    expect(new Set(classes).size).toBe(classes.length);
    for (const m of MATERIALS) expect(FAMILIES[familyOfClass(m.class)].cls).toBe(m.class);
  });
  it("a library entry's endurance limit is its family's", () => {
    for (const m of MATERIALS)
      expect(FAMILIES[familyOfClass(m.class)].enduranceLimit, m.key).toBe(m.enduranceLimit);
  });
  it("every library entry lies below its family's strength bound", () => {
    for (const m of MATERIALS) expect(m.Sut, m.key).toBeLessThan(FAMILIES[familyOfClass(m.class)].maxSut);
  });
  it('steels, stainless steels and cast irons have an endurance limit; the nonferrous families do not', () => {
    // Budynas & Nisbett, Shigley's MED 9th ed., Sec. 6-7 and Table A-24 (aluminium: strength at 5e8, no endurance limit).
    expect(FAMILY_WORDS.filter((w) => FAMILIES[w].enduranceLimit)).toEqual([
      'steel',
      'stainless-steel',
      'cast-iron',
    ]);
  });
  it('melting points: aluminium 660 degC, magnesium 650 degC, copper 1085 degC (from memory)', () => {
    expect(FAMILIES['aluminium-wrought'].melt - 273.15).toBeCloseTo(660, 6);
    expect(FAMILIES.magnesium.melt - 273.15).toBeCloseTo(650, 6);
    expect(FAMILIES.copper.melt - 273.15).toBeCloseTo(1085, 6);
  });
});
