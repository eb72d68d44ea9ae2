import { describe, expect, it } from 'vitest';
import { INCH, KSI, MPA } from '../../src/computed';
import {
  centreCrackFiniteWidth,
  criticalCrackSize,
  geometryFactorAt,
  inspectionInterval,
  KSI_SQRT_IN_IN_MPA_SQRT_M,
  parisConstantFromInch,
  parisLife,
  singleEdgeCrackFiniteWidth,
} from '../../src/crack';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * The stepwise integration of Budynas and Nisbett, Shigley's Mechanical Engineering Design,
 * 9th ed., eq. (6-7) (after Reemsnyder): da_j = C (delta_K_j)^m dN_j, a_{j+1} = a_j + da_j,
 * N_f = sum dN_j. Here dN_j is chosen so that da_j = a_j * 2e-5 (midpoint rule in each step).
 */
function reemsnyder(
  C: number,
  m: number,
  Y: (a: number) => number,
  dS: number,
  a_i: number,
  a_c: number,
): number {
  let a = a_i;
  let N = 0;
  while (a < a_c) {
    const da = Math.min(a * 2e-5, a_c - a);
    const am = a + da / 2;
    const rate = C * (Y(am) * dS * Math.sqrt(Math.PI * am)) ** m;
    N += da / rate;
    a += da;
  }
  return N;
}

describe('Paris-law crack growth', () => {
  it('closed form for constant Y matches the numerical integral (m = 3, 2, 4.2) (Paris and Erdogan 1963; Dowling, Mechanical Behavior of Materials, sec. 11.6)', () => {
    for (const m of [3, 2, 4.2]) {
      const base = { C: 5e-12, m, a_i: 0.5e-3, a_c: 25e-3, delta_sigma: 150 * MPA };
      const closed = parisLife({ ...base, Y: 1.12 });
      const numeric = parisLife({ ...base, Y: () => 1.12 });
      expect(closed.formula).toContain(m === 2 ? 'ln' : '1 - m/2');
      expect(numeric.formula).toContain('integral');
      expect(rel(numeric.value, closed.value)).toBeLessThan(1e-9);
    }
  });

  it('is continuous through m = 2 (the ln form is the limit of the power form)', () => {
    const base = { C: 5e-12, Y: 1, a_i: 1e-3, a_c: 20e-3, delta_sigma: 100 * MPA };
    const at2 = parisLife({ ...base, m: 2 }).value;
    expect(rel(parisLife({ ...base, m: 2 + 1e-7 }).value, at2)).toBeLessThan(1e-5);
    expect(rel(parisLife({ ...base, m: 2 - 1e-7 }).value, at2)).toBeLessThan(1e-5);
  });

  it('with Y(a) of an edge crack matches the stepwise integration of Shigley 9th ed. eq. (6-7) (Reemsnyder)', () => {
    const g = singleEdgeCrackFiniteWidth(50e-3);
    const p = { C: 6.9e-12, m: 3, a_i: 1e-3, a_c: 25e-3, delta_sigma: 120 * MPA };
    const N = parisLife({ ...p, Y: g });
    const ref = reemsnyder(p.C, p.m, (a) => g.Y(a), p.delta_sigma / MPA, p.a_i, p.a_c);
    expect(rel(N.value, ref)).toBeLessThan(1e-6);
    expect(N.notes ?? []).toEqual([]);
  });

  it('Shigley 9th ed. Example 6-1 data (C = 3.8e-11 (in/cycle)/(kpsi*in^0.5)^m, m = 3, delta_sigma = 115.2 kpsi, K_Ic = 73 kpsi*in^0.5, a_i = 0.004 in; Budynas-Nisbett p. 281): the SI calculation after unit conversion equals the in-kpsi closed form', () => {
    const beta = 1.3; // the example's starting value for beta (Fig. 5-27), taken constant here
    const C_in = 3.8e-11;
    const dS_ksi = 115.2;
    const KIc_ksi = 73;
    const ai_in = 0.004;
    // In inch-kpsi units throughout (the closed form for m = 3):
    const af_in = (1 / Math.PI) * (KIc_ksi / (beta * dS_ksi)) ** 2;
    const N_in = (2 / (C_in * beta ** 3 * dS_ksi ** 3 * Math.PI ** 1.5)) * (ai_in ** -0.5 - af_in ** -0.5);
    // Through the SI core:
    const C = parisConstantFromInch(C_in, 3).value;
    const ac = criticalCrackSize(KIc_ksi * KSI * Math.sqrt(INCH), beta, dS_ksi * KSI);
    expect(ac.value / INCH).toBeCloseTo(af_in, 12);
    expect(ac.value / INCH).toBeCloseTo(0.0756, 4);
    const N = parisLife({ C, m: 3, Y: beta, a_i: ai_in * INCH, a_c: ac.value, delta_sigma: dS_ksi * KSI });
    expect(rel(N.value, N_in)).toBeLessThan(1e-10);
    expect(N.notes ?? []).toEqual([]);
  });

  it('converts 1 ksi*in^0.5 to 1.0988 MPa*m^0.5 (exact unit definitions: 1 ksi = 6.894757 MPa, 1 in = 0.0254 m)', () => {
    expect(KSI_SQRT_IN_IN_MPA_SQRT_M).toBeCloseTo(6.894757293168361 * Math.sqrt(0.0254), 12);
    expect(KSI_SQRT_IN_IN_MPA_SQRT_M).toBeCloseTo(1.0988, 4);
  });

  it('diagnoses a_i >= a_c, impossible Paris units, bad inputs, without throwing', () => {
    const ok = { C: 5e-12, m: 3, Y: 1.12, a_i: 1e-3, a_c: 20e-3, delta_sigma: 100 * MPA };
    const order = parisLife({ ...ok, a_i: 30e-3 });
    expect(order.value).toBe(0);
    expect(order.notes?.find((n) => n.code === 'crack-size-order')?.severity).toBe('error');
    // A C for delta_K in Pa*m^0.5 (5e-12 / 1e18) is 1e18 too small: rate 5e-27 m/cycle at 10 MPa*m^0.5.
    const pa = parisLife({ ...ok, C: 5e-30 });
    expect(pa.notes?.find((n) => n.code === 'paris-units')?.severity).toBe('error');
    expect(pa.value).toBe(0);
    // A C for da/dN in mm/cycle (1e3 too large) is flagged as unusual.
    expect(parisLife({ ...ok, C: 5e-8 }).notes?.find((n) => n.code === 'paris-units')?.severity).toBe(
      'warning',
    );
    expect(parisLife({ ...ok, C: -1 }).notes?.[0].severity).toBe('error');
    expect(parisLife({ ...ok, delta_sigma: 0 }).infinite).toBe(true);
    expect(Number.isFinite(parisLife({ ...ok, a_i: Number.NaN }).value)).toBe(true);
  });

  it('integrates only up to the geometry limit and says so', () => {
    const g = centreCrackFiniteWidth(40e-3);
    const r = parisLife({ C: 5e-12, m: 3, Y: g, a_i: 2e-3, a_c: 30e-3, delta_sigma: 80 * MPA });
    expect(r.notes?.map((n) => n.code)).toContain('geometry-limit');
    expect(Number.isFinite(r.value) && r.value > 0).toBe(true);
  });
});

describe('critical crack size and inspection interval', () => {
  it('constant Y: K_IC = Y sigma_max sqrt(pi a_c) holds at the answer (Irwin 1957)', () => {
    const r = criticalCrackSize(60 * MPA, 1.12, 300 * MPA);
    expect(1.12 * 300 * Math.sqrt(Math.PI * r.value)).toBeCloseTo(60, 10);
  });

  it('Y(a): the root satisfies the same equation for an edge crack, and a toughness never reached stops at the fit limit with a note', () => {
    const g = singleEdgeCrackFiniteWidth(50e-3);
    const r = criticalCrackSize(50 * MPA, g, 200 * MPA);
    expect(g.Y(r.value) * 200 * Math.sqrt(Math.PI * r.value)).toBeCloseTo(50, 8);
    const big = criticalCrackSize(5000 * MPA, g, 50 * MPA);
    expect(big.value).toBeCloseTo(0.6 * 50e-3, 9);
    expect(big.notes?.map((n) => n.code)).toContain('geometry-limit');
    expect(criticalCrackSize(50 * MPA, 1, -10 * MPA).infinite).toBe(true);
    expect(criticalCrackSize(-1, 1, 10 * MPA).notes?.[0].severity).toBe('error');
  });

  it('N_insp = N_cg / factor (contract: inspection_factor = 2 by default)', () => {
    expect(inspectionInterval(1e5).value).toBe(5e4);
    expect(inspectionInterval(1e5, 3).value).toBeCloseTo(33333.333, 3);
    expect(inspectionInterval({ value: 0, infinite: true, formula: '', source: '' }).infinite).toBe(true);
    expect(inspectionInterval(1e5, 0).notes?.[0].severity).toBe('error');
    expect(inspectionInterval(1e5, 0.5).notes?.[0].code).toBe('inspection-factor');
  });
});

describe('geometry factors', () => {
  it('edge crack: the polynomial starts at the free-edge factor 1.12 (cricelli.com/FFAT/8b.php, edge crack in a finite plate)', () => {
    const g = singleEdgeCrackFiniteWidth(1);
    expect(g.Y(0)).toBeCloseTo(1.12, 12);
    expect(g.Y(0.5)).toBeCloseTo(1.12 - 0.231 * 0.5 + 10.55 * 0.25 - 21.72 * 0.125 + 30.39 * 0.0625, 12);
  });

  it("edge crack: the polynomial agrees within 1.1 % with Tada's closed-form SEN-tension expression for a/W = 0.1..0.6 (Tada, Paris, Irwin handbook, from memory)", () => {
    const g = singleEdgeCrackFiniteWidth(1);
    const tada = (s: number) => {
      const t = (Math.PI * s) / 2;
      return (Math.sqrt(Math.tan(t) / t) * (0.752 + 2.02 * s + 0.37 * (1 - Math.sin(t)) ** 3)) / Math.cos(t);
    };
    for (const s of [0.1, 0.2, 0.3, 0.4, 0.5, 0.6]) expect(rel(g.Y(s), tada(s))).toBeLessThan(0.011);
  });

  it('centre crack: matches the tabulated F(2a/W) 1.006, 1.025, 1.058, 1.109, 1.187, 1.303, 1.488, 1.816 for 2a/W = 0.1..0.8 to 0.15 % (Isida values as tabulated in the Tada, Paris, Irwin handbook; from memory)', () => {
    const W = 1;
    const g = centreCrackFiniteWidth(W);
    const table: Array<[number, number]> = [
      [0.1, 1.006],
      [0.2, 1.025],
      [0.3, 1.058],
      [0.4, 1.109],
      [0.5, 1.187],
      [0.6, 1.303],
      [0.7, 1.488],
      [0.8, 1.816],
    ];
    for (const [l, F] of table) expect(rel(g.Y((l * W) / 2), F)).toBeLessThan(0.0015);
  });

  it("centre crack: Feddersen's secant and Tada's refinement agree within 0.3 % up to 2a/W = 0.7 (both from memory)", () => {
    const t = centreCrackFiniteWidth(1, 'tada');
    const f = centreCrackFiniteWidth(1, 'feddersen');
    for (let l = 0.05; l <= 0.7; l += 0.05) expect(rel(f.Y(l / 2), t.Y(l / 2))).toBeLessThan(0.003);
  });

  it('reports the limits as notes, never NaN', () => {
    const g = centreCrackFiniteWidth(10e-3);
    const beyond = geometryFactorAt(g, 6e-3);
    expect(beyond.value).toBe(0);
    expect(beyond.notes?.[0].code).toBe('geometry-limit');
    const e = singleEdgeCrackFiniteWidth(10e-3);
    expect(geometryFactorAt(e, 3e-3).notes ?? []).toEqual([]);
    expect(geometryFactorAt(e, -1).notes?.[0].severity).toBe('error');
  });
});
