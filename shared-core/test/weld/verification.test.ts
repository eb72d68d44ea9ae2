import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import {
  damageUtilisation,
  enInteraction,
  iiwInteraction,
  rangeUtilisation,
  stressRangeLimit,
} from '../../src/weld';

describe('verification (EN 1993-1-9 Sec. 8, Eqs. 8.1 to 8.3; IIW 2016 Sec. 4.3.3, from memory)', () => {
  it('Eq. 8.2: gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf) = 1.0 * 45 / (71 / 1.35) = 0.8556 (hand computation)', () => {
    expect(rangeUtilisation(45 * MPA, 71 * MPA, 1.0, 1.35).value).toBeCloseTo((45 * 1.35) / 71, 12);
    expect(rangeUtilisation(45 * MPA, 71 * MPA, 1.0, 1.35).value).toBeCloseTo(0.8556, 4);
  });

  it('Eq. 8.3: 0.8^3 + 0.7^5 = 0.512 + 0.16807 = 0.68007', () => {
    expect(enInteraction(0.8, 0.7).value).toBeCloseTo(0.68007, 12);
  });

  it('Eq. 8.3 from ranges: normal 40 MPa on category 71, shear 30 MPa on 80, gamma_Mf = 1.15', () => {
    const us = rangeUtilisation(40 * MPA, 71 * MPA, 1, 1.15);
    const ut = rangeUtilisation(30 * MPA, 80 * MPA, 1, 1.15);
    const hand = ((40 * 1.15) / 71) ** 3 + ((30 * 1.15) / 80) ** 5;
    expect(enInteraction(us, ut).value).toBeCloseTo(hand, 12);
  });

  it('one range failing alone is flagged before the interaction', () => {
    expect(enInteraction(1.1, 0.1).notes?.[0].code).toBe('interaction-single');
  });

  it('IIW comparison: (0.8^2 + 0.7^2) / CV: 1.13 proportional (CV = 1), 2.26 non-proportional (CV = 0.5)', () => {
    expect(iiwInteraction(0.8, 0.7, true).value).toBeCloseTo(1.13, 12);
    expect(iiwInteraction(0.8, 0.7, false).value).toBeCloseTo(2.26, 12);
  });

  it('damage utilisation D / D_allow', () => {
    expect(damageUtilisation(0.3, 0.5).value).toBeCloseTo(0.6, 12);
    expect(damageUtilisation(0.3, 0).notes?.[0].severity).toBe('error');
  });

  it('stress-range limit (EN Eq. 8.1): 600 MPa on fy = 355 MPa exceeds 1.5 fy = 532.5 MPa (error); shear limit 1.5 fy / sqrt(3)', () => {
    const r = stressRangeLimit('EN 1993-1-9', 600 * MPA, 355 * MPA, 'normal');
    expect(r.value).toBeCloseTo(600 / 532.5, 12);
    expect(r.notes?.[0].code).toBe('stress-range-limit');
    expect(r.notes?.[0].severity).toBe('error');
    expect(stressRangeLimit('EN 1993-1-9', 300 * MPA, 355 * MPA, 'shear').value).toBeCloseTo(
      300 / ((1.5 * 355) / Math.sqrt(3)),
      12,
    );
  });

  it('IIW hot-spot ranges may reach 2 fy (from memory)', () => {
    expect(stressRangeLimit('IIW', 600 * MPA, 355 * MPA, 'normal', 'hot-spot').notes ?? []).toEqual([]);
    expect(stressRangeLimit('IIW', 600 * MPA, 355 * MPA, 'normal', 'nominal').notes?.[0].code).toBe(
      'stress-range-limit',
    );
  });
});
