import { describe, expect, it } from 'vitest';
import { KSI, MPA } from '../../src/computed';
import { familyNotchSensitivity } from '../../src/notch/notchSensitivity';

const MM = 1e-3;

describe('familyNotchSensitivity: each material family with its own data', () => {
  it("steel, Neuber model: Shigley's Eq. 6-35a, Sut = 100 kpsi gives sqrt(a) = 0.0622 in^0.5 (Budynas & Nisbett, Shigley's MED 10th ed., Eq. 6-35a, hand-evaluated)", () => {
    const r = 0.1 * 0.0254;
    const q = familyNotchSensitivity('neuber', 'steel', r, 100 * KSI, 'normal').value;
    expect(q).toBeCloseTo(1 / (1 + 0.0622 / Math.sqrt(0.1)), 3);
  });

  it("aluminium alloy, Neuber model: Peterson's aluminium constant a = 0.51 mm, not the steel fit (Peterson 1959 as quoted in Dowling, Mechanical Behavior of Materials, Sec. 10.3; from memory)", () => {
    const c = familyNotchSensitivity('neuber', 'aluminium', 8.5 * MM, 310 * MPA, 'normal');
    expect(c.value).toBeCloseTo(1 / (1 + 0.51 / 8.5), 12);
    expect(c.notes?.some((n) => n.code === 'notch-data-substitute' && n.severity === 'information')).toBe(
      true,
    );
    const steel = familyNotchSensitivity('neuber', 'steel', 8.5 * MM, 310 * MPA, 'normal');
    expect(Math.abs(c.value - steel.value)).toBeGreaterThan(0.05);
  });

  it('aluminium alloy, Peterson model: the same constant, no substitution note', () => {
    const c = familyNotchSensitivity('peterson', 'aluminium', 2 * MM, 310 * MPA, 'normal');
    expect(c.value).toBeCloseTo(1 / (1 + 0.51 / 2), 12);
    expect(c.notes ?? []).toEqual([]);
  });

  it('titanium, cast iron and families the tool has no data for: q = 1 with a no-notch-data warning under both models', () => {
    for (const model of ['neuber', 'peterson'] as const)
      for (const cls of ['titanium', 'cast-iron', 'magnesium', 'copper'])
        for (const load of ['normal', 'shear'] as const) {
          const c = familyNotchSensitivity(model, cls, 1 * MM, 900 * MPA, load);
          expect(c.value).toBe(1);
          expect(c.notes?.[0]?.code).toBe('no-notch-data');
          expect(c.notes?.[0]?.severity).toBe('warning');
        }
  });

  it('stainless steel: the steel data by analogy, with an information note under both models', () => {
    for (const model of ['neuber', 'peterson'] as const) {
      const ss = familyNotchSensitivity(model, 'stainless', 1 * MM, 600 * MPA, 'normal');
      const st = familyNotchSensitivity(model, 'steel', 1 * MM, 600 * MPA, 'normal');
      expect(ss.value).toBeCloseTo(st.value, 12);
      expect(ss.notes?.some((n) => n.code === 'notch-data-substitute')).toBe(true);
    }
  });
});
