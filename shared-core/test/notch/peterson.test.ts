import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { petersonSensitivity } from '../../src/notch/peterson';

const MM = 1e-3;

describe('petersonSensitivity', () => {
  it('steel: a = 0.0254 (2079/Sut)^1.8 mm (Pilkey, Peterson SCF 3rd ed., Sec. 1.9; form from the brief, not checked against the book), so Sut = 2079 MPa gives a = 0.0254 mm and q = 1/2 at r = a', () => {
    const r = petersonSensitivity(0.0254 * MM, 2079 * MPA, 'steel', 'normal');
    expect(r.terms?.find((t) => t.name === 'a')?.value).toBeCloseTo(0.0254, 12);
    expect(r.value).toBeCloseTo(0.5, 12);
  });

  it('steel, Sut = 690 MPa: a = 0.0254 (2079/690)^1.8 = 0.185 mm (same equation, hand-evaluated)', () => {
    const r = petersonSensitivity(1 * MM, 690 * MPA, 'steel', 'normal');
    expect(r.terms?.find((t) => t.name === 'a')?.value).toBeCloseTo(0.185, 3);
  });

  it("aluminium: Peterson's a = 0.51 mm (0.02 in) for wrought aluminium alloys (Peterson 1959 as quoted in Dowling, Mechanical Behavior of Materials, Sec. 10.3, Eq. 10.9; from memory): q = 1/2 at r = 0.51 mm, 0.797 at 2 mm, 0.943 at 8.5 mm, whatever Sut", () => {
    expect(petersonSensitivity(0.51 * MM, 300 * MPA, 'aluminium', 'normal').value).toBeCloseTo(0.5, 12);
    expect(petersonSensitivity(2 * MM, 310 * MPA, 'aluminium', 'normal').value).toBeCloseTo(
      1 / (1 + 0.51 / 2),
      12,
    );
    expect(petersonSensitivity(8.5 * MM, 570 * MPA, 'aluminium', 'normal').value).toBeCloseTo(0.9434, 4);
    // 0.02 in exactly, within the rounding of the published 0.51 mm
    expect(Math.abs(0.51 - 0.02 * 25.4)).toBeLessThan(0.005);
  });

  it('shear: a = 0.6 a_normal (common practice, no source), so qs > q', () => {
    const n = petersonSensitivity(1 * MM, 800 * MPA, 'steel', 'normal');
    const s = petersonSensitivity(1 * MM, 800 * MPA, 'steel', 'shear');
    const an = n.terms?.find((t) => t.name === 'a')?.value ?? 0;
    expect(s.terms?.find((t) => t.name === 'a')?.value).toBeCloseTo(0.6 * an, 12);
    expect(s.value).toBeGreaterThan(n.value);
  });

  it('q in [0, 1], increasing with r and with Sut (stronger steels are more notch sensitive)', () => {
    let prev = 0;
    for (let r = 0.01 * MM; r < 20 * MM; r *= 1.5) {
      const q = petersonSensitivity(r, 900 * MPA, 'steel', 'normal').value;
      expect(q).toBeGreaterThan(prev);
      expect(q).toBeLessThanOrEqual(1);
      prev = q;
    }
    expect(petersonSensitivity(1 * MM, 1400 * MPA, 'steel', 'normal').value).toBeGreaterThan(
      petersonSensitivity(1 * MM, 600 * MPA, 'steel', 'normal').value,
    );
  });

  it('families without published data (titanium, cast iron, any other): q = 1 (Kf = Kt) with a no-notch-data warning, never the steel correlation', () => {
    for (const cls of ['titanium', 'cast-iron', 'magnesium']) {
      for (const load of ['normal', 'shear'] as const) {
        const r = petersonSensitivity(1 * MM, 900 * MPA, cls, load);
        expect(r.value).toBe(1);
        expect(r.notes?.[0]?.code).toBe('no-notch-data');
        expect(r.notes?.[0]?.severity).toBe('warning');
        expect(r.notes?.[0]?.message).toContain(load === 'shear' ? '`qs`' : '`q`');
      }
    }
    // The cast-iron warning quotes Shigley's q = 0.20 for the engineer to state (Sec. 6-10, from memory).
    expect(petersonSensitivity(1 * MM, 250 * MPA, 'cast-iron', 'normal').notes?.[0]?.message).toContain(
      '0.20',
    );
  });

  it('stainless: the steel correlation by analogy, said in an information note', () => {
    const ss = petersonSensitivity(1 * MM, 600 * MPA, 'stainless', 'normal');
    const st = petersonSensitivity(1 * MM, 600 * MPA, 'steel', 'normal');
    expect(ss.value).toBeCloseTo(st.value, 12);
    expect(ss.notes?.[0]?.code).toBe('notch-data-substitute');
    expect(ss.notes?.[0]?.severity).toBe('information');
  });

  it('invalid inputs: q = 1 with an error note', () => {
    for (const [r, s] of [
      [0, 600 * MPA],
      [1 * MM, 0],
      [Number.NaN, 600 * MPA],
    ]) {
      const res = petersonSensitivity(r, s, 'steel', 'normal');
      expect(res.value).toBe(1);
      expect(res.notes?.[0]?.severity).toBe('error');
    }
  });
});
