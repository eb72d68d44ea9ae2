import { describe, expect, it } from 'vitest';
import { MM, MPA } from '../../src/computed';
import { catalogueClass, stressTypeNotes, WELD_DETAILS } from '../../src/weld';

/** Every class below is checked against a recalled copy of the tables (from memory), as the catalogue says. */
describe('weld detail catalogue (EN 1993-1-9 Tables 8.3 to 8.5; IIW 2016 Table 3.2-1; from memory)', () => {
  it('transverse butt weld ground flush: EN 112 (Table 8.3, detail 1), IIW FAT 112 steel / 45 aluminium (detail 211)', () => {
    const en = catalogueClass('transverse-butt-ground', 'EN 1993-1-9');
    expect(en.value / MPA).toBe(112);
    expect(en.source).toMatch(/Table 8\.3, detail 1/);
    expect(catalogueClass('transverse-butt-ground', 'IIW').value / MPA).toBe(112);
    expect(catalogueClass('transverse-butt-ground', 'IIW', 'aluminium').value / MPA).toBe(45);
  });

  it('longitudinal attachment by length: EN 80 / 71 / 63 / 56 at L = 40, 60, 90, 150 mm; IIW 80 / 71 / 63 / 50 at 40, 100, 200, 400 mm', () => {
    const en = (L: number) =>
      catalogueClass('longitudinal-attachment', 'EN 1993-1-9', 'steel', { L: L * MM }).value / MPA;
    expect([en(40), en(60), en(90), en(150)]).toEqual([80, 71, 63, 56]);
    const iiw = (L: number) =>
      catalogueClass('longitudinal-attachment', 'IIW', 'steel', { L: L * MM }).value / MPA;
    expect([iiw(40), iiw(100), iiw(200), iiw(400)]).toEqual([80, 71, 63, 50]);
  });

  it('a class that needs a parameter withholds without it (error), and outside the bands', () => {
    const r = catalogueClass('longitudinal-attachment', 'EN 1993-1-9');
    expect(r.value).toBe(0);
    expect(r.notes?.[0].code).toBe('no-detail-class');
    expect(
      catalogueClass('transverse-attachment', 'EN 1993-1-9', 'steel', { L: 100 * MM }).notes?.[0].code,
    ).toBe('no-detail-class');
  });

  it('cruciform root failure is a throat class: EN 36* with the asterisk note, IIW FAT 36', () => {
    const en = catalogueClass('cruciform-root', 'EN 1993-1-9');
    expect(en.value / MPA).toBe(36);
    expect(en.entry?.stressType).toBe('throat');
    expect(en.notes?.map((n) => n.code)).toContain('asterisk-category');
  });

  it('every entry names its table and number in both standards and gives a positive class with its parameters', () => {
    const params = { L: 40 * MM, rOverL: 0.5, tc: 15 * MM, t: 20 * MM };
    for (const d of WELD_DETAILS) {
      for (const std of ['EN 1993-1-9', 'IIW'] as const) {
        const r = catalogueClass(d.key, std, 'steel', params);
        expect(r.value).toBeGreaterThan(0);
        expect(r.reference).toMatch(/Table [0-9.-]+, detail \d+/);
        expect(r.source).toMatch(/from memory/);
      }
      expect(catalogueClass(d.key, 'IIW', 'aluminium', params).value).toBeGreaterThan(0);
    }
  });

  it('EN 1993-1-9 has no aluminium; an unknown detail is an error listing the catalogue', () => {
    expect(catalogueClass('stud-on-plate', 'EN 1993-1-9', 'aluminium').notes?.[0].severity).toBe('error');
    const u = catalogueClass('tee-weld', 'IIW');
    expect(u.notes?.[0].code).toBe('unknown-detail');
    expect(u.notes?.[0].message).toMatch(/cruciform-toe/);
  });

  it('a nominal class with a hot-spot stress is an error', () => {
    expect(stressTypeNotes('nominal', 'hot-spot')[0].code).toBe('wrong-stress-type');
    expect(stressTypeNotes('throat', 'throat')).toEqual([]);
  });
});
