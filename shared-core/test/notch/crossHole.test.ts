import { describe, expect, it } from 'vitest';
import { crossHoleKt } from '../../src/notch/crossHole';

describe('crossHoleKt', () => {
  it('bending, small hole: Kt -> 3.0, the exact value for a hole in a uniaxial field (Kirsch 1898)', () => {
    expect(crossHoleKt('bending', 1, 1e-5).value).toBeCloseTo(3.0, 3);
  });

  it('torsion, small hole: Kts -> 2.0 (hole in pure shear: sigma_max = 4 tau, tau_max = 2 tau; Kirsch)', () => {
    const r = crossHoleKt('torsion', 1, 1e-5);
    expect(r.value).toBeCloseTo(2.0, 3);
    expect(r.terms?.find((t) => t.name.startsWith('Ktg'))?.value).toBeCloseTo(4.0, 3);
  });

  it('axial, small hole: Kt_ax -> 3.0 (Kirsch), flagged as an unverified estimate', () => {
    const r = crossHoleKt('axial', 1, 1e-5);
    expect(r.value).toBeCloseTo(3.0, 3);
    expect(r.notes?.some((n) => n.code === 'unverified-method')).toBe(true);
  });

  it('gross-section factors: bending Kt at d_hole/d = 0.2 is 3.03 from the cubic 3 - 6.25x + 41x^2 - 45x^3 (Pilkey, Peterson SCF 3rd ed., Sec. 4 transverse hole, di/D = 0) and gross Kt exceeds the small-hole 3.0 for large holes', () => {
    expect(crossHoleKt('bending', 1, 0.2).value).toBeCloseTo(3 - 6.25 * 0.2 + 41 * 0.04 - 45 * 0.008, 12);
    expect(crossHoleKt('bending', 1, 0.3).value).toBeGreaterThan(3);
    expect(crossHoleKt('torsion', 1, 0.3).value).toBeGreaterThan(2);
  });

  it('beyond d_hole/d = 0.4: still an answer, not decreasing, with a fit-range note', () => {
    const at = crossHoleKt('bending', 1, 0.4).value;
    const beyond = crossHoleKt('bending', 1, 0.6);
    expect(beyond.value).toBeGreaterThanOrEqual(at);
    expect(beyond.notes?.some((n) => n.code === 'fit-range')).toBe(true);
  });

  it('Kt >= 1, finite, and axial estimate grows with the hole', () => {
    let prev = 0;
    for (let x = 0.01; x < 0.95; x += 0.02) {
      for (const load of ['bending', 'torsion', 'axial'] as const) {
        const v = crossHoleKt(load, 0.05, 0.05 * x).value;
        expect(Number.isFinite(v)).toBe(true);
        expect(v).toBeGreaterThanOrEqual(1);
      }
      const ax = crossHoleKt('axial', 1, x).value;
      expect(ax).toBeGreaterThan(prev);
      prev = ax;
    }
  });

  it('degenerate holes: Kt = 1 with an error note', () => {
    for (const [d, dh] of [
      [1, 0],
      [1, 1],
      [1, 1.5],
      [0, 0.1],
      [1, Number.NaN],
    ]) {
      for (const load of ['bending', 'torsion', 'axial'] as const) {
        const r = crossHoleKt(load, d, dh);
        expect(r.value).toBe(1);
        expect(r.notes?.[0]?.severity).toBe('error');
      }
    }
  });
});
