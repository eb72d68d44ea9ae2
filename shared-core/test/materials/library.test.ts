import { describe, expect, it } from 'vitest';
import { KSI, MPA } from '../../src/computed';
import { editDistance, findMaterial, MATERIALS, nearestMaterialKeys } from '../../src/materials/library';

describe('material library: shape and invariants', () => {
  it('has at least 14 entries with unique kebab-case keys', () => {
    expect(MATERIALS.length).toBeGreaterThanOrEqual(14);
    const keys = MATERIALS.map((m) => m.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const k of keys) expect(k).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
  });

  it('every entry has finite positive SI values, Sy < Sut, E in the metallic range, and a source', () => {
    for (const m of MATERIALS) {
      for (const v of [m.Sut, m.Sy, m.E]) {
        expect(Number.isFinite(v)).toBe(true);
        expect(v).toBeGreaterThan(0);
      }
      expect(m.Sy).toBeLessThan(m.Sut);
      expect(m.Sut).toBeGreaterThan(100 * MPA);
      expect(m.Sut).toBeLessThan(2500 * MPA);
      expect(m.E).toBeGreaterThan(50e9);
      expect(m.E).toBeLessThan(250e9);
      expect(m.source.length).toBeGreaterThan(20);
    }
  });

  it('aluminium and titanium have no endurance limit and carry Sf_ref / N_ref (contract); the others do not', () => {
    for (const m of MATERIALS) {
      const noLimit = m.class === 'aluminium' || m.class === 'titanium';
      expect(m.enduranceLimit).toBe(!noLimit);
      if (noLimit) {
        expect(m.Sf_ref).toBeGreaterThan(0);
        expect(m.Sf_ref).toBeLessThan(m.Sut);
        expect(m.N_ref).toBeGreaterThanOrEqual(1e7);
      } else {
        expect(m.Sf_ref).toBeUndefined();
        expect(m.N_ref).toBeUndefined();
      }
    }
  });

  it('covers the classes the task asks for', () => {
    const count = (c: string) => MATERIALS.filter((m) => m.class === c).length;
    expect(count('steel')).toBeGreaterThanOrEqual(6);
    expect(count('stainless')).toBeGreaterThanOrEqual(1);
    expect(count('aluminium')).toBeGreaterThanOrEqual(3);
    expect(count('titanium')).toBeGreaterThanOrEqual(1);
    expect(count('cast-iron')).toBeGreaterThanOrEqual(1);
    expect(MATERIALS.every((m) => m.N_ref === undefined || [5e8, 1e7].includes(m.N_ref))).toBe(true);
  });

  it('entries are frozen', () => {
    expect(Object.isFrozen(MATERIALS)).toBe(true);
    expect(Object.isFrozen(MATERIALS[0])).toBe(true);
  });
});

describe('material library: values against the kpsi column of their sources', () => {
  // Budynas & Nisbett Table A-20 prints MPa and (kpsi); the MPa values converted must land
  // on the printed kpsi within the table's rounding (1 kpsi).
  const a20: [string, number, number][] = [
    ['aisi-1018-cd', 64, 54],
    ['aisi-1020-hr', 55, 30],
    ['aisi-1020-cd', 68, 57],
    ['aisi-1035-hr', 72, 39.5],
    ['aisi-1045-cd', 91, 77],
    ['aisi-1050-hr', 90, 49.5],
    ['aisi-1050-cd', 100, 84],
    ['aisi-1095-hr', 120, 66],
  ];
  for (const [key, sut, sy] of a20) {
    it(`Table A-20: ${key} -> Sut ${sut} kpsi, Sy ${sy} kpsi`, () => {
      const m = findMaterial(key);
      expect(m).toBeDefined();
      expect(Math.abs((m?.Sut ?? 0) / KSI - sut)).toBeLessThanOrEqual(1);
      expect(Math.abs((m?.Sy ?? 0) / KSI - sy)).toBeLessThanOrEqual(1);
    });
  }

  it('Example 6-2 (9th ed.) reads Sut = 90 kpsi for 1050 HR from Table A-20', () => {
    expect(Math.abs((findMaterial('aisi-1050-hr')?.Sut ?? 0) / KSI - 90)).toBeLessThanOrEqual(1);
  });

  it('Aluminum Association typical values (ksi column): 2024-T3 70/50/20, 6061-T6 45/40/14, 7075-T6 83/73/23 ksi', () => {
    const rows: [string, number, number, number][] = [
      ['al-2024-t3', 70, 50, 20],
      ['al-6061-t6', 45, 40, 14],
      ['al-7075-t6', 83, 73, 23],
    ];
    for (const [key, sut, sy, sf] of rows) {
      const m = findMaterial(key);
      expect(Math.abs((m?.Sut ?? 0) / KSI - sut)).toBeLessThanOrEqual(1);
      expect(Math.abs((m?.Sy ?? 0) / KSI - sy)).toBeLessThanOrEqual(1);
      expect(Math.abs((m?.Sf_ref ?? 0) / KSI - sf)).toBeLessThanOrEqual(1);
      expect(m?.N_ref).toBe(5e8);
    }
  });

  it('MatWeb Ti-6Al-4V annealed: 138 000 / 128 000 psi, fatigue 74 000 psi at 1e7 (1 ksi)', () => {
    const m = findMaterial('ti-6al-4v-annealed');
    expect(Math.abs((m?.Sut ?? 0) / KSI - 138)).toBeLessThanOrEqual(1);
    expect(Math.abs((m?.Sy ?? 0) / KSI - 128)).toBeLessThanOrEqual(1);
    expect(Math.abs((m?.Sf_ref ?? 0) / KSI - 74)).toBeLessThanOrEqual(1);
    expect(m?.N_ref).toBe(1e7);
    expect(m?.K_IC).toBe(75e6);
  });
});

describe('findMaterial and nearestMaterialKeys', () => {
  it('finds by key, ignoring case and surrounding blanks', () => {
    expect(findMaterial('aisi-1045-cd')?.Sut).toBe(630 * MPA);
    expect(findMaterial('  AISI-1045-CD ')?.key).toBe('aisi-1045-cd');
    expect(findMaterial('unobtainium')).toBeUndefined();
  });

  it('suggests the intended key first for a typo', () => {
    expect(nearestMaterialKeys('aisi-1045-dc')[0]).toBe('aisi-1045-cd');
    expect(nearestMaterialKeys('al-7075-t651', 1)).toEqual(['al-7075-t6']);
    expect(nearestMaterialKeys('ti6al4v')[0]).toBe('ti-6al-4v-annealed');
    expect(nearestMaterialKeys('aisi 4140')[0]).toMatch(/^aisi-4140-/);
    expect(nearestMaterialKeys('a36')[0]).toBe('astm-a36');
  });

  it('returns n keys, [] for n <= 0, and never throws on odd input', () => {
    expect(nearestMaterialKeys('x')).toHaveLength(3);
    expect(nearestMaterialKeys('x', 5)).toHaveLength(5);
    expect(nearestMaterialKeys('x', 0)).toEqual([]);
    expect(nearestMaterialKeys('x', Number.NaN)).toEqual([]);
    expect(nearestMaterialKeys('', 2)).toHaveLength(2);
  });

  it('editDistance: the classic kitten -> sitting = 3, and metric identities', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('abc', 'abc')).toBe(0);
    expect(editDistance('flaw', 'lawn')).toBe(editDistance('lawn', 'flaw'));
  });
});
