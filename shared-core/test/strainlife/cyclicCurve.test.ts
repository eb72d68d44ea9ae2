/**
 * The cyclic stress-strain curve (Ramberg-Osgood form with K', n'; Dowling, Mechanical Behavior
 * of Materials, 4th ed., Ch. 12) and the Masing doubled curve, against the equations solved by
 * bisection in the test (`independent.ts`) and the strain energy integrated numerically.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial } from '../../src/materials';
import {
  type CyclicCurve,
  cyclicEnergy,
  cyclicStrain,
  cyclicStrainFromStress,
  cyclicStress,
  cyclicStressFromStrain,
  cyclicYieldStrength,
  masingEnergy,
  masingStrainFromStressRange,
  masingStressFromStrainRange,
  masingStressRange,
} from '../../src/strainlife';
import {
  type Curve,
  energyNumeric,
  masingEnergyNumeric,
  masingStrain,
  roStrain,
  roStress,
} from './independent';

// Constants of AISI 4340 (aircraft quality) from the library: Dowling, Mechanical Behavior of
// Materials, 4th ed., Table 14.1 (K' = 1655 MPa, n' = 0.131, E = 207 GPa; from memory).
const c4340 = findMaterial('aisi-4340-aircraft')!.cyclic!;
const curve: CyclicCurve = { E: c4340.E, K_prime: c4340.K_prime, n_prime: c4340.n_prime };
const ref: Curve = { E: curve.E, K: curve.K_prime, n: curve.n_prime };

const logspace = (a: number, b: number, n: number) =>
  Array.from(
    { length: n },
    (_, i) => 10 ** (Math.log10(a) + ((Math.log10(b) - Math.log10(a)) * i) / (n - 1)),
  );

describe('cyclic curve: stress from strain', () => {
  it("inverts eps = sigma/E + (sigma/K')^(1/n') from 1e-8 to 0.3 strain (bisection in the test as reference)", () => {
    for (const eps of logspace(1e-8, 0.3, 41)) {
      const s = cyclicStress(curve, eps);
      expect(Math.abs(roStrain(ref, s) - eps) / eps).toBeLessThan(1e-11);
      expect(s).toBeCloseTo(roStress(ref, eps), 3);
    }
  });

  it('is odd: a compressive strain gives the mirrored stress', () => {
    expect(cyclicStress(curve, -0.01)).toBeCloseTo(-cyclicStress(curve, 0.01), 6);
    expect(cyclicStrain(curve, -500 * MPA)).toBeCloseTo(-cyclicStrain(curve, 500 * MPA), 15);
  });

  it('is elastic at small strain (sigma = E eps to 1e-9 at eps = 1e-6)', () => {
    expect(cyclicStress(curve, 1e-6) / (curve.E * 1e-6)).toBeCloseTo(1, 9);
  });

  it('returns Computed records with terms and the source', () => {
    const r = cyclicStressFromStrain(curve, 0.01);
    expect(r.value).toBeCloseTo(roStress(ref, 0.01), 3);
    expect(r.source).toMatch(/Ramberg & Osgood/);
    const e = cyclicStrainFromStress(curve, 800 * MPA);
    expect(e.value).toBeCloseTo(roStrain(ref, 800 * MPA), 14);
    expect(e.terms?.find((t) => t.name === 'eps_p')?.value).toBeCloseTo((800 / 1655) ** (1 / 0.131), 12);
  });

  it("0.2 % cyclic yield: the plastic strain at S'y = K' 0.002^n' is 0.002 (the definition of the offset yield)", () => {
    const Sy = cyclicYieldStrength(curve).value;
    expect((Sy / curve.K_prime) ** (1 / curve.n_prime)).toBeCloseTo(0.002, 14);
  });
});

describe('Masing curve (Masing 1926; Dowling Ch. 12): the cyclic curve doubled', () => {
  it("solves Delta eps = Delta sigma/E + 2 (Delta sigma/(2K'))^(1/n') for Delta sigma (bisection in the test)", () => {
    for (const de of logspace(1e-7, 0.2, 25)) {
      const ds = masingStressRange(curve, de);
      expect(Math.abs(masingStrain(ref, ds) - de) / de).toBeLessThan(1e-11);
    }
    const r = masingStressFromStrainRange(curve, 0.02);
    expect(masingStrain(ref, r.value)).toBeCloseTo(0.02, 12);
    expect(masingStrainFromStressRange(curve, 1500 * MPA).value).toBeCloseTo(
      masingStrain(ref, 1500 * MPA),
      14,
    );
  });

  it('a branch from -sigma_a to +sigma_a ends on the cyclic curve (Delta = 2 x amplitude)', () => {
    const sa = 900 * MPA;
    expect(masingStrain(ref, 2 * sa)).toBeCloseTo(2 * roStrain(ref, sa), 14);
  });
});

describe("strain energy density under the curves (for Glinka's rule)", () => {
  it('equals the integral of sigma d eps (composite Simpson in the test) on the cyclic curve', () => {
    for (const s of [10, 300, 800, 1200, 1600].map((x) => x * MPA)) {
      expect(cyclicEnergy(curve, s) / energyNumeric(ref, s)).toBeCloseTo(1, 6);
    }
  });

  it('equals the integral under the Masing branch', () => {
    for (const ds of [100, 1000, 2400].map((x) => x * MPA)) {
      expect(masingEnergy(curve, ds) / masingEnergyNumeric(ref, ds)).toBeCloseTo(1, 6);
    }
  });
});

describe('bad constants', () => {
  it("gives an error note and a finite 0, never NaN, for n' = 0, K' < 0, E = NaN", () => {
    for (const bad of [
      { ...curve, n_prime: 0 },
      { ...curve, K_prime: -1 },
      { ...curve, E: Number.NaN },
      { ...curve, n_prime: 1.5 },
    ]) {
      const r = cyclicStressFromStrain(bad, 0.01);
      expect(r.value).toBe(0);
      expect(r.notes?.some((n) => n.code === 'cyclic-constants-invalid' && n.severity === 'error')).toBe(
        true,
      );
    }
    expect(cyclicStrainFromStress(curve, Number.NaN).notes?.[0].code).toBe('invalid-input');
  });

  it("warns for n' outside the band of published metals", () => {
    const r = cyclicStressFromStrain({ ...curve, n_prime: 0.6 }, 0.01);
    expect(r.notes?.some((n) => n.code === 'cyclic-constants-range')).toBe(true);
  });
});

describe('properties (fast-check)', () => {
  it('inverts the curve for random metals in the published range and strains 1e-7 to 0.2', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 68e9, max: 210e9, noNaN: true }),
        fc.double({ min: 300e6, max: 2500e6, noNaN: true }),
        fc.double({ min: 0.05, max: 0.3, noNaN: true }),
        fc.double({ min: -7, max: Math.log10(0.2), noNaN: true }),
        (E, K, n, le) => {
          const c = { E, K_prime: K, n_prime: n };
          const eps = 10 ** le;
          const s = cyclicStress(c, eps);
          expect(Number.isFinite(s)).toBe(true);
          expect(Math.abs(roStrain({ E, K, n }, s) - eps) / eps).toBeLessThan(1e-10);
          const ds = masingStressRange(c, eps);
          expect(Math.abs(masingStrain({ E, K, n }, ds) - eps) / eps).toBeLessThan(1e-10);
        },
      ),
      { numRuns: 300 },
    );
  });
});
