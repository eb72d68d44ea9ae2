import { describe, expect, it } from 'vitest';
import { INCH, KSI, MM, MPA } from '../../src/computed';
import {
  axialStress,
  bendingStress,
  lameCylinderHoopMax,
  plateGrossStress,
  plateNetStress,
  shellStresses,
  torsionStress,
} from '../../src/stress';

const LBF = 4.4482216152605; // N, exact by definition

describe('round shaft nominal stresses', () => {
  it('bending: Shigley MED 8th ed., Solutions Manual Prob. 6-11: M = 30 kip*in, d = 2 in gives sigma_0 = 38.2 kpsi', () => {
    const M = 30_000 * LBF * INCH;
    const r = bendingStress(M, 2 * INCH);
    expect(r.value / KSI).toBeCloseTo(38.2, 1);
  });

  it('axial: Shigley MED 10th ed. Ex. 6-10 (from memory): 8 kip amplitude on a 1.5-in bar, Kf = 1.85 gives 8.38 kpsi', () => {
    const r = axialStress(8_000 * LBF, 1.5 * INCH);
    expect((1.85 * r.value) / KSI).toBeCloseTo(8.38, 2);
  });

  it('exact identities: sigma pi d^3 / 32 = M, tau = sigma/2 for T = M, sigma_ax pi d^2 / 4 = F', () => {
    const d = 35 * MM;
    expect((bendingStress(180, d).value * Math.PI * d ** 3) / 32).toBeCloseTo(180, 9);
    expect(torsionStress(180, d).value).toBeCloseTo(bendingStress(180, d).value / 2, 6);
    expect((axialStress(-5000, d).value * Math.PI * d * d) / 4).toBeCloseTo(-5000, 9);
  });

  it('bad diameter gives an error note and a finite value, never a throw', () => {
    for (const d of [0, -1, Number.NaN, Number.POSITIVE_INFINITY, 1e-200]) {
      const r = bendingStress(100, d);
      expect(Number.isFinite(r.value)).toBe(true);
      expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
    }
  });
});

describe('plate nominal stresses', () => {
  it('net section: Shigley MED 8th ed., Solutions Manual Prob. 6-17: A = 0.375(1 - 0.25) in^2, F = 3000 lbf gives 10.67 kpsi', () => {
    const r = plateNetStress(3000 * LBF, 1 * INCH, 0.25 * INCH, 0.375 * INCH);
    expect(r.value / KSI).toBeCloseTo(10.67, 2);
  });

  it('Shigley MED 8th ed., Solutions Manual Prob. 6-17: sigma_a = Kf (Fmax - Fmin)/(2A) = 8.45 kpsi with Kf = 2.16', () => {
    const r = plateNetStress(((3000 - 800) / 2) * LBF, 1 * INCH, 0.25 * INCH, 0.375 * INCH);
    expect((2.16 * r.value) / KSI).toBeCloseTo(8.45, 2);
  });

  it('gross section is F/(W t) and equals the net one with no hole (identity)', () => {
    expect(plateGrossStress(1000, 0.05, 0.01).value).toBeCloseTo(2e6, 6);
    expect(plateNetStress(1000, 0.05, 0, 0.01).value).toBeCloseTo(
      plateGrossStress(1000, 0.05, 0.01).value,
      6,
    );
  });

  it('a hole as wide as the plate is an error, not Infinity', () => {
    const r = plateNetStress(1000, 0.05, 0.05, 0.01);
    expect(r.value).toBe(0);
    expect(r.notes?.[0].severity).toBe('error');
  });
});

describe('thin shells', () => {
  it('cylinder: hoop force equilibrium 2 sigma_hoop t = p D_i (exact), long = hoop / 2', () => {
    const { hoop, long } = shellStresses('cylinder', 2 * MPA, 1000 * MM, 10 * MM);
    expect(2 * hoop.value * 0.01).toBeCloseTo(2e6 * 1.0, 3);
    expect(long.value).toBeCloseTo(hoop.value / 2, 6);
    expect(hoop.notes).toBeUndefined();
  });

  it('sphere: p D_i / (4 t) both ways', () => {
    const { hoop, long } = shellStresses('sphere', 2 * MPA, 1000 * MM, 10 * MM);
    expect(hoop.value).toBeCloseTo(50 * MPA, 3);
    expect(long.value).toBeCloseTo(hoop.value, 6);
  });

  it('t/D_i = 0.2: thin-wall note quotes the Lame bore stress (exact solution) and the -18.9 % error', () => {
    const { hoop } = shellStresses('cylinder', 1 * MPA, 100 * MM, 20 * MM);
    // Lame: ri = 50, ro = 70: (70^2 + 50^2)/(70^2 - 50^2) = 7400/2400 = 3.0833 p; thin: 50/20 = 2.5 p.
    expect(lameCylinderHoopMax(1 * MPA, 100 * MM, 20 * MM) / MPA).toBeCloseTo(7400 / 2400, 9);
    const note = hoop.notes?.find((n) => n.code === 'thin-wall');
    expect(note?.message).toContain('-18.9 %');
    expect(note?.message).toContain('Lame');
  });

  it('thin-wall error vanishes as t/D_i -> 0 (Lame tends to p D_i / (2 t))', () => {
    const ratio = lameCylinderHoopMax(1, 1, 1e-5) / shellStresses('cylinder', 1, 1, 1e-5).hoop.value;
    expect(ratio).toBeCloseTo(1, 4);
  });

  it('bad wall thickness is an error with finite values', () => {
    const { hoop, long } = shellStresses('cylinder', 1e6, 1, 0);
    expect(hoop.value).toBe(0);
    expect(long.notes?.[0].severity).toBe('error');
  });
});
