import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { enEffectiveRange, iiwStressRatioFactor } from '../../src/weld';

const f = (R: number, c: 'stress-relieved' | 'small-scale' | 'as-welded') =>
  iiwStressRatioFactor(100 * MPA, R * 100 * MPA, c).value;

describe('IIW enhancement factor f(R) (Hobbacher 2016 Sec. 3.3.4; from memory)', () => {
  it('case I stress-relieved: 1.6 at R = -2, 1.6 at R = -1, 1.2 at R = 0, 1.0 at R = 0.5 and above (the published piecewise formula)', () => {
    expect(f(-2, 'stress-relieved')).toBeCloseTo(1.6, 12);
    expect(f(-1, 'stress-relieved')).toBeCloseTo(1.6, 12);
    expect(f(0, 'stress-relieved')).toBeCloseTo(1.2, 12);
    expect(f(0.25, 'stress-relieved')).toBeCloseTo(1.1, 12);
    expect(f(0.5, 'stress-relieved')).toBeCloseTo(1.0, 12);
    expect(f(0.8, 'stress-relieved')).toBe(1);
  });

  it('case II small-scale: 1.3 at R <= -1, -0.4 R + 0.9 down to R = -0.25, 1.0 above', () => {
    expect(f(-3, 'small-scale')).toBeCloseTo(1.3, 12);
    expect(f(-1, 'small-scale')).toBeCloseTo(1.3, 12);
    expect(f(-0.5, 'small-scale')).toBeCloseTo(1.1, 12);
    expect(f(-0.25, 'small-scale')).toBeCloseTo(1.0, 12);
    expect(f(0, 'small-scale')).toBe(1);
  });

  it('case III as welded: 1.0 always, with the reason', () => {
    const r = iiwStressRatioFactor(100 * MPA, -100 * MPA, 'as-welded');
    expect(r.value).toBe(1);
    expect(r.notes?.[0].code).toBe('no-enhancement');
    expect(r.notes?.[0].message).toMatch(/residual/);
  });

  it('a wholly compressive cycle gets no enhancement (warning)', () => {
    const r = iiwStressRatioFactor(-10 * MPA, -100 * MPA, 'stress-relieved');
    expect(r.value).toBe(1);
    expect(r.notes?.[0].code).toBe('compressive-cycle');
  });

  it('continuous in R and never below 1 (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 0.99, noNaN: true }),
        fc.constantFrom('stress-relieved', 'small-scale'),
        (R, c) => {
          const a = f(R, c as 'stress-relieved');
          const b = f(R + 1e-7, c as 'stress-relieved');
          expect(a).toBeGreaterThanOrEqual(1);
          expect(Math.abs(a - b)).toBeLessThan(1e-6);
        },
      ),
    );
  });
});

describe('EN 1993-1-9 reduced compressive part for stress-relieved details (Sec. 7.2.1(2), Fig. 7.3; from memory)', () => {
  it('+60 / -100 MPa: stress relieved 60 + 0.6 * 100 = 120 MPa; as welded the full 160 MPa', () => {
    expect(enEffectiveRange(60 * MPA, -100 * MPA, true).value / MPA).toBeCloseTo(120, 10);
    expect(enEffectiveRange(60 * MPA, -100 * MPA, false).value / MPA).toBeCloseTo(160, 10);
  });

  it('wholly tensile: the full range; wholly compressive: 60 %', () => {
    expect(enEffectiveRange(150 * MPA, 50 * MPA, true).value / MPA).toBeCloseTo(100, 10);
    expect(enEffectiveRange(-20 * MPA, -120 * MPA, true).value / MPA).toBeCloseTo(60, 10);
  });

  it('swapped max and min: error', () => {
    expect(enEffectiveRange(-100 * MPA, 60 * MPA, true).notes?.[0].severity).toBe('error');
  });
});
