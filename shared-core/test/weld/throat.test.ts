import { describe, expect, it } from 'vitest';
import { MM, MPA } from '../../src/computed';
import { throatClass, throatNormalRange, throatResultant, throatShearRange } from '../../src/weld';

describe('weld throat stresses (IIW 2016 Sec. 2.2.2; EN 1993-1-9 Table 8.5 details 3 and 8; from memory)', () => {
  it('double fillet weld a = 5 mm carrying 300 N/mm across: Delta sigma_w = 300 / (2 * 5) = 30 MPa (hand computation)', () => {
    const r = throatNormalRange({ deltaFPerp: 300e3, a: 5 * MM, welds: 2 });
    expect(r.value / MPA).toBeCloseTo(30, 10);
  });

  it('shear flow 200 N/mm on two 4 mm throats: Delta tau_w = 25 MPa', () => {
    expect(throatShearRange({ deltaFPar: 200e3, a: 4 * MM, welds: 2 }).value / MPA).toBeCloseTo(25, 10);
  });

  it('on a 45 degree throat sigma_perp = tau_perp = sigma_w / sqrt(2): the resultant returns sigma_w (static equilibrium of the throat section)', () => {
    const w = 30 * MPA;
    expect(throatResultant(w / Math.SQRT2, w / Math.SQRT2).value / MPA).toBeCloseTo(30, 10);
  });

  it('classes: EN 36* / IIW FAT 36 (aluminium 12) with m = 3; shear 80 with m = 5', () => {
    const en = throatClass('EN 1993-1-9', 'normal');
    expect(en.value / MPA).toBe(36);
    expect(en.asterisk).toBe(true);
    expect(throatClass('IIW', 'normal', 'aluminium').value / MPA).toBe(12);
    const s = throatClass('IIW', 'shear');
    expect(s.value / MPA).toBe(80);
    expect(s.m1).toBe(5);
  });

  it('bad inputs are errors with a zero value', () => {
    for (const input of [
      { deltaFPerp: 300e3, a: 0, welds: 2 },
      { deltaFPerp: 300e3, a: 5 * MM, welds: 0 },
      { deltaFPerp: Number.NaN, a: 5 * MM, welds: 2 },
      { deltaFPerp: 300e3, a: 5, welds: 2 },
    ]) {
      const r = throatNormalRange(input);
      expect(r.value).toBe(0);
      expect(r.notes?.[0].severity).toBe('error');
    }
  });
});
