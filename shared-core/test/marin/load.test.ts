import { describe, expect, it } from 'vitest';
import { type LoadKind, loadFactor } from '../../src/marin/load';
import { miscFactor } from '../../src/marin/miscellaneous';

describe('loadFactor (Budynas & Nisbett, 9th ed., Eq. 6-26)', () => {
  it('bending 1, axial 0.85, torsion 0.59', () => {
    expect(loadFactor('bending').value).toBe(1);
    expect(loadFactor('axial').value).toBe(0.85);
    expect(loadFactor('torsion').value).toBe(0.59);
  });

  it('Example 6-8: reversed axial loading -> kc = 0.85', () => {
    expect(loadFactor('axial').value).toBe(0.85);
    expect(loadFactor('axial').source).toMatch(/6-26/);
  });

  it('combined: kc = 1, with the axial 0.85 carried inside the equivalent stress (fatigue-notes contract)', () => {
    const r = loadFactor('combined');
    expect(r.value).toBe(1);
    expect(r.formula).toMatch(/0\.85/);
    expect(r.formula).toMatch(/sigma_a_eq/);
  });

  it('torsion formula reminds of the shear ultimate 0.67 Sut (contract)', () => {
    expect(loadFactor('torsion').formula).toMatch(/0\.67/);
  });

  it('an unknown mode gives 1 with an error note, no throw', () => {
    const r = loadFactor('twisting' as LoadKind);
    expect(r.value).toBe(1);
    expect(r.notes?.[0].severity).toBe('error');
  });
});

describe('miscFactor', () => {
  it('defaults to 1 and says it is common practice with no source', () => {
    const r = miscFactor();
    expect(r.value).toBe(1);
    expect(r.source).toBe('common practice, no source');
    expect(r.formula).toMatch(/kmisc/);
  });
});
