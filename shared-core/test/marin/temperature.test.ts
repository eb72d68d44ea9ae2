import { describe, expect, it } from 'vitest';
import { temperatureFactor } from '../../src/marin/temperature';

const fromC = (c: number) => c + 273.15;
const fromF = (f: number) => (f - 32) / 1.8 + 273.15;

// Eq. (6-27) is a polynomial fit to Table 6-4; its largest departure from the printed
// three-digit ratios inside 70..1000 degF is 0.0047 (at 600 degF): tolerance 0.005.
const FIT_TO_TABLE = 0.005;

describe('temperatureFactor (Budynas & Nisbett, 9th ed., Eq. 6-27, Table 6-4)', () => {
  // Table 6-4, S_T/S_RT, Celsius column (20 degC is below 70 degF: kd = 1 by definition here).
  const tableC: [number, number][] = [
    [20, 1.0],
    [50, 1.01],
    [100, 1.02],
    [150, 1.025],
    [200, 1.02],
    [250, 1.0],
    [300, 0.975],
    [350, 0.943],
    [400, 0.9],
    [450, 0.843],
    [500, 0.768],
  ];
  for (const [c, ratio] of tableC) {
    it(`Table 6-4: ${c} degC -> S_T/S_RT = ${ratio}`, () => {
      expect(Math.abs(temperatureFactor(fromC(c)).value - ratio)).toBeLessThanOrEqual(FIT_TO_TABLE);
    });
  }

  // Table 6-4, Fahrenheit column.
  const tableF: [number, number][] = [
    [70, 1.0],
    [100, 1.008],
    [200, 1.02],
    [300, 1.024],
    [400, 1.018],
    [500, 0.995],
    [600, 0.963],
    [700, 0.927],
    [800, 0.872],
    [900, 0.797],
    [1000, 0.698],
  ];
  for (const [f, ratio] of tableF) {
    it(`Table 6-4: ${f} degF -> S_T/S_RT = ${ratio}`, () => {
      expect(Math.abs(temperatureFactor(fromF(f)).value - ratio)).toBeLessThanOrEqual(FIT_TO_TABLE);
    });
  }

  it('Example 6-5: 1035 steel at 450 degF -> kd = 1.007 (three places)', () => {
    expect(Math.abs(temperatureFactor(fromF(450)).value - 1.007)).toBeLessThanOrEqual(0.0005);
  });

  it('room temperature and mild cold (-20..21 degC): kd = 1 exactly, no note', () => {
    for (const c of [-19, 0, 15, 20, 21]) {
      const r = temperatureFactor(fromC(c));
      expect(r.value).toBe(1);
      expect(r.notes).toBeUndefined();
    }
  });

  it('below about -20 degC: kd = 1 with a low-temperature warning', () => {
    const r = temperatureFactor(fromC(-40));
    expect(r.value).toBe(1);
    expect(r.notes?.[0]).toMatchObject({ code: 'low-temperature', severity: 'warning' });
  });

  it('above 1000 degF: the fit at 1000 degF with a fit-range warning naming creep', () => {
    const at = temperatureFactor(fromF(1000)).value;
    const r = temperatureFactor(fromC(650));
    expect(r.value).toBeCloseTo(at, 12);
    expect(r.notes?.[0]).toMatchObject({ code: 'fit-range', severity: 'warning' });
    expect(r.notes?.[0].message).toMatch(/creep/i);
  });

  it('T <= 0 K or not finite: value 1 with an error note', () => {
    for (const bad of [0, -5, Number.NaN, Number.NEGATIVE_INFINITY]) {
      const r = temperatureFactor(bad);
      expect(r.value).toBe(1);
      expect(r.notes?.[0].severity).toBe('error');
    }
  });

  it('property: finite, between 0.69 and 1.03, continuous at 70 degF within 0.001', () => {
    for (let k = 1; k <= 2000; k += 7) {
      const v = temperatureFactor(k).value;
      expect(Number.isFinite(v)).toBe(true);
      expect(v).toBeGreaterThanOrEqual(0.69);
      expect(v).toBeLessThanOrEqual(1.03);
    }
    expect(Math.abs(temperatureFactor(fromF(70.0001)).value - 1)).toBeLessThan(0.001);
  });

  it('property: kd falls monotonically from 400 degF to 1000 degF (strength loss with heat)', () => {
    let prev = Number.POSITIVE_INFINITY;
    for (let f = 400; f <= 1000; f += 10) {
      const v = temperatureFactor(fromF(f)).value;
      expect(v).toBeLessThan(prev);
      prev = v;
    }
  });
});
