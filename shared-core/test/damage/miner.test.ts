import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import {
  cyclesToFailure,
  equivalentCycles,
  MinerAccumulator,
  minerDamage,
  repeatsToFailure,
  type SnLine,
} from '../../src/damage';

/**
 * A line with slope exponent k = 5 (b = -0.2) through the knee S2 = 100 MPa at N2 = 1e6, so
 * that N = 1e6 (100 / S)^5 and every hand sum below is exact in decimals.
 */
const LINE: SnLine = { a: 100 * MPA * 1e6 ** 0.2, b: -0.2, N2: 1e6, S2: 100 * MPA, hasKnee: true };
const SPECTRUM = [
  { sigma_ar: 200 * MPA, count: 1000 }, // N = 1e6 / 2^5 = 31250, d = 0.032
  { sigma_ar: 150 * MPA, count: 1e4 }, // N = 1e6 * (2/3)^5, d = 1e4 * 243 / 32e6 = 0.0759375
  { sigma_ar: 80 * MPA, count: 1e5 }, // below the knee
];

/**
 * Independent calculation: the lifetime multiple of Miner-Haibach, E. Haibach,
 * Betriebsfestigkeit, 3rd ed. 2006, p. 291, eq. (3.21-61), as transcribed in pyLife
 * (boschresearch/pylife, src/pylife/strength/miner.py, MinerHaibach.lifetime_multiple):
 * A = sum(n) / (sum_{s >= xD} n s^k + xD^(1-k) sum_{s < xD} n s^(2k-1)), s = S/Smax, xD = SD/Smax;
 * the damage of one pass is then D = sum(n) / (N(Smax) * A).
 */
function haibachReference(levels: Array<{ sigma_ar: number; count: number }>, line: SnLine): number {
  const k = -1 / line.b;
  const smax = Math.max(...levels.map((l) => l.sigma_ar));
  const xD = line.S2 / smax;
  let sum1 = 0;
  let sum2 = 0;
  let ntot = 0;
  for (const l of levels) {
    const s = l.sigma_ar / smax;
    ntot += l.count;
    if (s >= xD) sum1 += l.count * s ** k;
    else sum2 += l.count * s ** (2 * k - 1);
  }
  const A = ntot / (sum1 + xD ** (1 - k) * sum2);
  const Nmax = (smax / line.a) ** (1 / line.b);
  return ntot / (Nmax * A);
}

describe('Palmgren-Miner damage', () => {
  it('original rule: hand sum 0.032 + 0.0759375 = 0.1079375, cycles below S2 do no damage (Miner 1945; Shigley 10th ed. sec. 6-15 "Cumulative Fatigue Damage", section number from memory; hand sum)', () => {
    const r = minerDamage(SPECTRUM, LINE, 'original');
    expect(r.D).toBeCloseTo(0.1079375, 12);
    expect(r.value).toBe(r.D);
    expect(r.notes?.map((n) => n.code)).toContain('below-knee');
    expect(r.damagingCycles).toBe(11000);
  });

  it('elementary rule continues the line: + 1e5 * 0.8^5 / 1e6 = 0.032768, D = 0.1407055 (Haibach 2006, "Miner elementar", hand sum)', () => {
    expect(minerDamage(SPECTRUM, LINE, 'elementary').D).toBeCloseTo(0.1407055, 12);
  });

  it('Haibach rule uses slope 2k - 1 = 9 below the knee: + 1e5 * 0.8^9 / 1e6 = 0.0134217728, D = 0.1213592728 (Haibach, Betriebsfestigkeit, 3rd ed. 2006, p. 291)', () => {
    const r = minerDamage(SPECTRUM, LINE, 'haibach');
    expect(r.D).toBeCloseTo(0.1213592728, 12);
    expect(r.terms?.find((t) => t.name === "k'")?.value).toBe(9);
  });

  it('Haibach damage equals the lifetime-multiple form of Haibach (2006) eq. (3.21-61) on random spectra (independent transcription via pyLife MinerHaibach)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            s: fc.double({ min: 20, max: 380, noNaN: true }),
            n: fc.integer({ min: 1, max: 1e6 }),
          }),
          {
            minLength: 1,
            maxLength: 12,
          },
        ),
        (levels) => {
          const spectrum = levels.map((l) => ({ sigma_ar: l.s * MPA, count: l.n }));
          if (Math.max(...levels.map((l) => l.s)) < 100) return; // pyLife's form needs Smax above the knee
          const got = minerDamage(spectrum, LINE, 'haibach').D;
          const ref = haibachReference(spectrum, LINE);
          expect(Math.abs(got - ref) / ref).toBeLessThan(1e-10);
        },
      ),
    );
  });

  it('repeats = 1/D and N_eq at the largest level: 0.1079375 * 31250 = 3373.046875 cycles (hand calculation)', () => {
    const r = minerDamage(SPECTRUM, LINE, 'original');
    expect(repeatsToFailure(r).value).toBeCloseTo(1 / 0.1079375, 9);
    expect(r.sigma_ar_max).toBe(200 * MPA);
    const neq = equivalentCycles(r, r.sigma_ar_max, LINE, 'original');
    expect(neq.value).toBeCloseTo(3373.046875, 6);
    // Identity: N_eq cycles at the reference level do the same damage.
    expect(minerDamage([{ sigma_ar: r.sigma_ar_max, count: neq.value }], LINE).D).toBeCloseTo(r.D, 12);
  });

  it('counts cycles above the 1e3 end of the line from the same line, with a note', () => {
    // S1 = a * 1e3^-0.2 = 398.1 MPa; at 500 MPa, N = 1e6 * 0.2^5 = 320.
    const r = minerDamage([{ sigma_ar: 500 * MPA, count: 2 }], LINE);
    expect(r.D).toBeCloseTo(2 / 320, 12);
    expect(r.notes?.map((n) => n.code)).toContain('low-cycle');
    expect(cyclesToFailure(500 * MPA, LINE).value).toBeCloseTo(320, 6);
    expect(cyclesToFailure(50 * MPA, LINE, 'original').infinite).toBe(true);
  });

  it('streams: many small adds equal the batch sum, contributors are grouped by level and ranked', () => {
    const acc = new MinerAccumulator(LINE, 'haibach');
    for (let i = 0; i < 1000; i++) acc.add(200 * MPA, 1);
    for (let i = 0; i < 10; i++) acc.add(150 * MPA, 1000);
    acc.add(80 * MPA, 1e5);
    const r = acc.result();
    expect(r.D).toBeCloseTo(0.1213592728, 10);
    expect(r.contributors.map((c) => c.sigma_ar / MPA)).toEqual([150, 200, 80]);
    expect(r.contributors[1].count).toBe(1000);
    expect(r.contributors.reduce((s, c) => s + c.share, 0)).toBeCloseTo(1, 12);
  });

  it('materials with no knee continue the line under every rule', () => {
    const noKnee = { ...LINE, hasKnee: false };
    for (const rule of ['original', 'elementary', 'haibach'] as const) {
      expect(minerDamage(SPECTRUM, noKnee, rule).D).toBeCloseTo(0.1407055, 12);
    }
  });

  it('never throws on bad input: invalid line, NaN cycles, zero damage', () => {
    const bad = minerDamage(SPECTRUM, { ...LINE, b: 0.1 }, 'original');
    expect(bad.value).toBe(0);
    expect(bad.notes?.some((n) => n.severity === 'error')).toBe(true);
    const withNaN = minerDamage([{ sigma_ar: Number.NaN, count: 1 }, ...SPECTRUM], LINE);
    expect(withNaN.D).toBeCloseTo(0.1079375, 12);
    expect(withNaN.notes?.map((n) => n.code)).toContain('input-invalid');
    const none = repeatsToFailure(0);
    expect(none.infinite).toBe(true);
    expect(Number.isFinite(none.value)).toBe(true);
    expect(repeatsToFailure(-1).notes?.[0].severity).toBe('error');
  });
});
