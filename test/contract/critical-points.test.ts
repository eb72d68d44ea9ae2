/**
 * The critical points of a section: a non-rotating section bent by a moment is evaluated at both
 * extreme fibres (+M c/I and -M c/I), each with its own signed amplitude and mean, and the check
 * reports the governing fibre. Every expected value is computed here from the published
 * equations (Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed.):
 *
 * - bending stress sigma = 32 M / (pi d^3), axial 4 F / (pi d^2), torsion 16 T / (pi d^3) (Secs. 3-9, 3-10, 3-12);
 * - Table 6-6: Goodman n_f = 1 / (sigma_a/Se + sigma_m/Sut); Langer n_y = Sy / (sigma_a + sigma_m);
 * - Table 6-7 (Gerber), Table 6-8 (ASME elliptic), Eq. 6-45 (Soderberg);
 * - Sec. 6-12, Fig. 6-27 discussion: a compressive mean fails at sigma_a = Se (n_f = Se/sigma_a);
 * - Eqs. 6-66, 6-67: von Mises amplitude and mean, axial amplitude / 0.85;
 * - Eqs. 6-14 to 6-16: S-N line a = (f Sut)^2 / Se, b = -(1/3) log10(f Sut / Se), N = (sigma_rev/a)^(1/b);
 *
 * and the in-phase reading of the loads (every load at its `_max` value at one instant and at
 * its `_min` value at the other) documented in docs/language.md.
 */
import { describe, expect, it } from 'vitest';
import { type CheckResult, evaluateNote, type HistoryChunkReader } from '../../shared-core/src';
import { check, errors, KSI, MPA, si } from './helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const near = (x: number, want: number, tol = 1e-9) =>
  expect(rel(x, want), `${x} vs ${want}`).toBeLessThan(tol);

const bend = (M: number, d: number) => (32 * M) / (Math.PI * d ** 3);
const axial = (F: number, d: number) => (4 * F) / (Math.PI * d ** 2);
const shear = (T: number, d: number) => (16 * T) / (Math.PI * d ** 3);

/** Table 6-6 (Goodman), with the compressive-mean branch of Sec. 6-12 (n_f = Se / sigma_a). */
const goodman = (sa: number, sm: number, Se: number, Sut: number) =>
  sm > 0 ? 1 / (sa / Se + sm / Sut) : Se / sa;

function codes(c: CheckResult): string[] {
  return c.diagnostics.map((d) => d.code);
}

describe("Shigley's MED 10th ed., Example 6-12 (sigma_max = 60, sigma_min = -20 kpsi; Sut = 80, Sy = 65, Se = 40 kpsi, f = 0.9; from memory) at a bent bar", () => {
  // The example's fluctuating stress is put on a non-rotating 1 in bar as a bending moment:
  // the fibre at +M c/I sees -20 .. 60 kpsi (the example), the opposite fibre 20 .. -60 kpsi.
  const body = (max: string, min: string) => [
    'Sut = 80 ksi',
    'Sy = 65 ksi',
    'Se = 40 ksi',
    'f = 0.9',
    'surface: machined',
    'rotation: non-rotating',
    'temp = 70 degF',
    'reliability = 0.5',
    'd = 1 in',
    'feature: none',
    `M_max = ${max} * pi * d^3 / 32`,
    `M_min = ${min} * pi * d^3 / 32`,
    'criterion: goodman',
  ];
  // Published method (Eqs. 6-14 to 6-16 and the Goodman sigma_rev = sigma_a / (1 - sigma_m/Sut)):
  const Sut = 80;
  const Se = 40;
  const a = (0.9 * Sut) ** 2 / Se;
  const b = -Math.log10((0.9 * Sut) / Se) / 3;
  const revG = 40 / (1 - 20 / Sut);
  const revGerber = 40 / (1 - (20 / Sut) ** 2);
  const life = (s: number) => (s / a) ** (1 / b);

  it('the fibre of the example governs: sigma_rev = 53.3 kpsi, N = (sigma_rev/a)^(1/b) (published answer, from memory: 3.4e4 cycles)', () => {
    const c = check(body('60 ksi', '-20 ksi'));
    expect(errors(c)).toEqual([]);
    near(si(c, 'sigma_ar') / KSI, revG, 1e-9);
    near(si(c, 'N_f'), life(revG), 1e-9);
    expect(rel(si(c, 'N_f'), 3.4e4)).toBeLessThan(0.02);
    // The other fibre has a compressive mean: sigma_rev = sigma_a = 40 kpsi = Se (the knee).
    near(si(c, 'sigma_ar_neg') / KSI, 40, 1e-9);
    expect(c.values.N_f.notes?.join(' ')).toMatch(/governed by the fibre in tension under the mean moment/);
    // Goodman infinite-life factor, Table 6-6: 1 / (40/40 + 20/80) = 0.8.
    near(si(c, 'n_f'), 0.8, 1e-9);
    // Langer, Table 6-6: n_y = Sy / (sigma_a + sigma_m) = 65/60 at both fibres (the compressive peak counts).
    near(si(c, 'n_y'), 65 / 60, 1e-9);
    near(si(c, 'n_y_neg'), 65 / 60, 1e-9);
  });

  it('the mirrored moment (the example at the opposite fibre) gives the same life: the defect of a one-fibre check', () => {
    const c = check(body('20 ksi', '-60 ksi'));
    near(si(c, 'N_f'), life(revG), 1e-9);
    near(si(c, 'N_f_neg'), life(revG), 1e-9);
    near(si(c, 'n_f'), 0.8, 1e-9);
    // A one-fibre reading of the sign of M would have taken the compressive mean: sigma_rev = 40 kpsi.
    expect(si(c, 'sigma_ar') / KSI).toBeGreaterThan(40 * 1.3);
  });

  it('Gerber: sigma_rev = sigma_a / (1 - (sigma_m/Sut)^2) at the fibre of the example (published answer, from memory: 4.6e5 cycles)', () => {
    const c = check(
      body('20 ksi', '-60 ksi').map((l) => (l === 'criterion: goodman' ? 'criterion: gerber' : l)),
    );
    near(si(c, 'sigma_ar') / KSI, revGerber, 1e-9);
    near(si(c, 'N_f'), life(revGerber), 1e-9);
    expect(rel(si(c, 'N_f'), 4.6e5)).toBeLessThan(0.03);
  });
});

describe('a non-rotating pin with the moment between two negative values (issue 11: -0.2 to -1.3 kN*m)', () => {
  const d = 0.03;
  const Sut = 600 * MPA;
  const Sy = 450 * MPA;
  const Se = 200 * MPA;
  const lines = (max: string, min: string, extra: string[] = []) => [
    'Sut = 600 MPa',
    'Sy = 450 MPa',
    'Se = 200 MPa',
    'surface: machined',
    'rotation: non-rotating',
    'temp = 20 degC',
    'reliability = 0.5',
    'd = 30 mm',
    'feature: none',
    `M_max = ${max}`,
    `M_min = ${min}`,
    'criterion: goodman',
    ...extra,
  ];
  const sa = bend(550, d);
  const sm = bend(750, d); // magnitude of the mean stress, tensile at the fibre at -M c/I

  it('gives the Goodman answer of the fibre in tension under the mean moment (Table 6-6), not the amplitude-only answer', () => {
    const c = check(lines('-0.2 kN*m', '-1.3 kN*m'));
    expect(errors(c)).toEqual([]);
    near(si(c, 'n_f'), 1 / (sa / Se + sm / Sut));
    near(si(c, 'n_f_neg'), 1 / (sa / Se + sm / Sut));
    near(si(c, 'n_f_pos'), Se / sa); // compressive mean: Sec. 6-12, Fig. 6-27
    expect(si(c, 'n_f')).toBeLessThan(Se / sa);
    near(si(c, 'sigma_m_eq'), sm);
    near(si(c, 'sigma_a_eq'), sa);
    expect(c.values.n_f.notes?.join(' ')).toMatch(
      /n_f is governed by the fibre in tension under the mean moment \(at -M c\/I, `_neg`\)/,
    );
  });

  it('Gerber (Table 6-7), ASME elliptic (Table 6-8) and Soderberg (Eq. 6-45) at the same fibre', () => {
    const c = check(lines('-0.2 kN*m', '-1.3 kN*m'));
    const gerber =
      0.5 * (Sut / sm) ** 2 * (sa / Se) * (-1 + Math.sqrt(1 + ((2 * sm * Se) / (Sut * sa)) ** 2));
    near(si(c, 'n_f_gerber'), gerber);
    near(si(c, 'n_f_asme'), Math.sqrt(1 / ((sa / Se) ** 2 + (sm / Sy) ** 2)));
    near(si(c, 'n_f_soderberg'), 1 / (sa / Se + sm / Sy));
  });

  it('the same moments with the sign flipped give the same factors (the section is symmetric)', () => {
    const a = check(lines('-0.2 kN*m', '-1.3 kN*m'));
    const b = check(lines('1.3 kN*m', '0.2 kN*m'));
    for (const n of ['n_f', 'n_y', 'n_f_gerber', 'n_f_asme', 'n_f_soderberg', 'sigma_a_eq', 'sigma_m_eq'])
      near(si(b, n), si(a, n), 1e-12);
    near(si(b, 'n_f_pos'), si(a, 'n_f_neg'), 1e-12);
    expect(b.values.n_f.notes?.join(' ')).toMatch(/in tension under the mean moment \(at \+M c\/I, `_pos`\)/);
  });

  it('Langer (Table 6-6): n_y = Sy / (sigma_a + sigma_m) at the peak, equal at both fibres', () => {
    const c = check(lines('-0.2 kN*m', '-1.3 kN*m'));
    near(si(c, 'n_y'), Sy / (sa + sm));
    near(si(c, 'n_y_pos'), Sy / (sa + sm));
    near(si(c, 'n_y_neg'), Sy / (sa + sm));
  });

  it('without `rotation:` the section is taken as rotating (the largest moment fully reversed, Shigley 10th ed. Ex. 7-1) and a warning offers `rotation: non-rotating`', () => {
    const c = check(lines('-0.2 kN*m', '-1.3 kN*m').filter((l) => !l.startsWith('rotation:')));
    const w = c.diagnostics.find((x) => x.code === 'rotation-assumed');
    expect(w?.severity).toBe('warning');
    expect(w?.fixes?.[0].edits[0].newText).toBe('rotation: non-rotating\n');
    // Rotating: every fibre sees the largest moment fully reversed, Se / (|sigma_m| + sigma_a).
    near(si(c, 'n_f'), Se / (sa + sm));
    expect(si(c, 'sigma_m_eq')).toBe(0);
    // No mean moment: no warning.
    const z = check(lines('1.3 kN*m', '-1.3 kN*m').filter((l) => !l.startsWith('rotation:')));
    expect(codes(z)).not.toContain('rotation-assumed');
    // Rotation stated: no warning.
    expect(codes(check(lines('-0.2 kN*m', '-1.3 kN*m')))).not.toContain('rotation-assumed');
  });
});

describe('a tie with a compressive preload and bending: first-cycle yield where they add', () => {
  const d = 0.03;
  const Sut = 600 * MPA;
  const Sy = 450 * MPA;
  const Se = 200 * MPA;
  const lines = [
    'Sut = 600 MPa',
    'Sy = 450 MPa',
    'Se = 200 MPa',
    'surface: machined',
    'rotation: non-rotating',
    'temp = 20 degC',
    'reliability = 0.5',
    'd = 30 mm',
    'feature: none',
    'M_max = 0.9 kN*m',
    'M_min = 0.3 kN*m',
    'F_max = -100 kN',
    'F_min = -100 kN',
    'criterion: goodman',
  ];
  const sx = axial(-100e3, d);
  const sMax = bend(900, d);
  const sMin = bend(300, d);

  it('n_y = Sy / |sigma_ax - sigma_b(M_max)|, the fibre in compression under the mean moment (Langer, Table 6-6; uniaxial peak)', () => {
    const c = check(lines);
    const peak = Math.abs(sx - sMax);
    near(si(c, 'n_y'), Sy / peak);
    near(si(c, 'n_y_neg'), Sy / peak);
    near(si(c, 'n_y_pos'), Sy / Math.abs(sx + sMax));
    expect(si(c, 'n_y')).toBeLessThan(1);
    expect(codes(c)).toContain('first-cycle-yield');
    expect(c.values.n_y.notes?.join(' ')).toMatch(
      /governed by the fibre in compression under the mean moment/,
    );
    // A one-point check (the preload and +sigma_b together) would have shown a comfortable n_y.
    expect(Sy / Math.abs(sx + sMax)).toBeGreaterThan(2);
  });

  it('n_f from the fibre where the bending mean outweighs the preload (Goodman, Table 6-6)', () => {
    const c = check(lines);
    const sa = (sMax - sMin) / 2;
    const smPos = (sMax + sMin) / 2 + sx; // tensile: 226 - 141 MPa
    expect(smPos).toBeGreaterThan(0);
    near(si(c, 'n_f'), goodman(sa, smPos, Se, Sut));
    near(si(c, 'n_f_neg'), Se / sa); // compressive mean at the other fibre
  });
});

describe('bending and torsion at a non-rotating section (Shigley 10th ed., Eqs. 6-66, 6-67 and Sec. 6-14 sigma_max)', () => {
  const d = 0.025;
  const Kf = 1.6;
  const Kfs = 1.3;
  const lines = (Mmax: string, Mmin: string) => [
    'Sut = 700 MPa',
    'Sy = 560 MPa',
    'Se = 220 MPa',
    'surface: machined',
    'rotation: non-rotating',
    'temp = 20 degC',
    'reliability = 0.5',
    'd = 25 mm',
    `Kf = ${Kf}`,
    `Kfs = ${Kfs}`,
    `M_max = ${Mmax}`,
    `M_min = ${Mmin}`,
    'T_max = 300 N*m',
    'T_min = 100 N*m',
    'criterion: goodman',
  ];
  // Moment and torque peak together (500 with 300): Shigley's sigma'_max applies at either fibre.
  const sa = Kf * bend(200, d);
  const sm = Kf * bend(300, d);
  const ta = Kfs * shear(100, d);
  const tm = Kfs * shear(200, d);
  const aEq = Math.sqrt(sa ** 2 + 3 * ta ** 2);
  const mEq = Math.sqrt(sm ** 2 + 3 * tm ** 2);
  const maxEq = Math.sqrt((sa + sm) ** 2 + 3 * (ta + tm) ** 2);

  it("DE-Goodman at the fibre in tension under the mean moment; n_y = Sy / sigma'_max", () => {
    const c = check(lines('500 N*m', '100 N*m'));
    expect(errors(c)).toEqual([]);
    near(si(c, 'sigma_a_eq'), aEq);
    near(si(c, 'sigma_m_eq'), mEq);
    near(si(c, 'n_f'), 1 / (aEq / 220e6 + mEq / 700e6));
    near(si(c, 'n_y'), 560e6 / maxEq);
    // The other fibre: compressive normal mean with a torsional mean: the compression earns no
    // credit, the shear share of Eq. 6-67 stays, sqrt(3) tau_m (Sec. 6-12; common practice).
    near(si(c, 'sigma_m_eq_neg'), Math.sqrt(3) * tm);
    near(si(c, 'n_f_neg'), 1 / (aEq / 220e6 + (Math.sqrt(3) * tm) / 700e6));
  });

  it('with the moment running between negative values, the same answer at the other fibre; the torque peaks with the smaller moment', () => {
    const c = check(lines('-100 N*m', '-500 N*m'));
    near(si(c, 'n_f'), 1 / (aEq / 220e6 + mEq / 700e6));
    near(si(c, 'n_f_neg'), si(c, 'n_f'));
    // In phase as written: at the `_max` instant M = -100 N*m with T = 300 N*m, at the `_min`
    // instant M = -500 N*m with T = 100 N*m; the larger von Mises of the two instants governs.
    const vm = (M: number, T: number) => Math.sqrt((Kf * bend(M, d)) ** 2 + 3 * (Kfs * shear(T, d)) ** 2);
    near(si(c, 'n_y'), 560e6 / Math.max(vm(100, 300), vm(500, 100)));
  });
});

describe('signed amplitudes: the relative phase of bending and axial loads', () => {
  const d = 0.03;
  const Se = 200 * MPA;
  const Sut = 600 * MPA;
  const base = [
    'Sut = 600 MPa',
    'Sy = 450 MPa',
    'Se = 200 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.5',
    'd = 30 mm',
    'feature: none',
    'criterion: goodman',
  ];
  const sb = bend(400, d);
  const sxa = axial(20e3, d);
  const sxm = axial(30e3, d);

  it('F falls while M rises (F_a < 0): the axial amplitude adds at the fibre at -M c/I and subtracts at +M c/I (Eq. 6-66 at each fibre)', () => {
    const c = check([
      ...base,
      'rotation: non-rotating',
      'M_a = 400 N*m',
      'M_m = 0 N*m',
      'F_a = -20 kN',
      'F_m = 30 kN',
    ]);
    expect(errors(c)).toEqual([]);
    near(si(c, 'sigma_a_eq_pos'), Math.abs(sb - sxa / 0.85));
    near(si(c, 'sigma_a_eq_neg'), sb + sxa / 0.85);
    near(si(c, 'n_f'), goodman(sb + sxa / 0.85, sxm, Se, Sut));
  });

  it('the same with F_max below F_min as written (read as written: opposite phase, with a warning)', () => {
    const c = check([
      ...base,
      'rotation: non-rotating',
      'M_max = 400 N*m',
      'M_min = -400 N*m',
      'F_max = 10 kN',
      'F_min = 50 kN',
    ]);
    expect(codes(c)).toContain('max-below-min');
    near(si(c, 'F_a'), -20e3);
    near(si(c, 'n_f'), goodman(sb + sxa / 0.85, sxm, Se, Sut));
  });

  it('a rotating section as before: the amplitudes add as magnitudes (Eq. 6-66)', () => {
    const c = check([
      ...base,
      'rotation: rotating',
      'M_a = 400 N*m',
      'M_m = 0 N*m',
      'F_a = -20 kN',
      'F_m = 30 kN',
    ]);
    near(si(c, 'sigma_a_eq'), sb + sxa / 0.85);
    expect(c.values.sigma_a_eq_pos).toBeUndefined();
    near(si(c, 'n_f'), goodman(sb + sxa / 0.85, sxm, Se, Sut));
  });

  it('stated nominal stresses are one point: their signs give the phase (sigma_a = -80, sigma_ax_a = 30 MPa)', () => {
    const c = check([
      ...base,
      'rotation: non-rotating',
      'sigma_a = -80 MPa',
      'sigma_m = 40 MPa',
      'sigma_ax_a = 30 MPa',
      'sigma_ax_m = 20 MPa',
    ]);
    expect(errors(c)).toEqual([]);
    expect(c.values.n_f_pos).toBeUndefined();
    near(si(c, 'sigma_a_eq'), Math.abs(-80 + 30 / 0.85) * MPA);
    near(si(c, 'sigma_m_eq'), 60 * MPA);
    // Peak: instants -80 + 30 + 60 = 10 and 80 - 30 + 60 = 110 MPa.
    near(si(c, 'sigma_max_eq'), 110 * MPA);
    near(si(c, 'n_f'), goodman(Math.abs(-80 + 30 / 0.85) * MPA, 60 * MPA, Se, Sut));
  });
});

/** The S-N line of a section with Se = Se_prime = 200 MPa (Marin factors 1) and f Sut = 540 MPa (Eqs. 6-14 to 6-16). */
const SECTION = [
  'method: damage',
  'Sut = 600 MPa',
  'Sy = 450 MPa',
  'Se_prime = 200 MPa',
  'f = 0.9',
  'ka = 1',
  'kb = 1',
  'kc = 1',
  'kd = 1',
  'ke = 1',
  'rotation: non-rotating',
  'd = 30 mm',
  'feature: none',
  'criterion: goodman',
  'miner: elementary',
];
const A = 540 ** 2 / 200;
const B = -Math.log10(540 / 200) / 3;
const life = (s: number) => (s / A) ** (1 / B);
/** Goodman sigma_rev = sigma_a / (1 - sigma_m / Sut), sigma_a for a compressive mean (MPa). */
const rev = (sa: number, sm: number) => (sm > 0 ? sa / (1 - sm / 600) : sa);

function note(lines: string[]): string {
  return ['```fatigue c', ...lines, '```', ''].join('\n');
}

describe('damage at both fibres (Palmgren-Miner, Miner 1945; sums by hand)', () => {
  const s = (M: number) => bend(M, 0.03) / MPA;

  it('a spectrum whose levels have means of both signs: each fibre sums its own levels, the larger D governs', () => {
    const c = evaluateNote(
      note([
        ...SECTION,
        'spectrum: M_a = 500 N*m, M_m = 300 N*m, n = 4000',
        'spectrum: M_a = 600 N*m, M_m = -200 N*m, n = 3000',
      ]),
    ).checks[0];
    expect(errors(c)).toEqual([]);
    const Dpos = 4000 / life(rev(s(500), s(300))) + 3000 / life(rev(s(600), -s(200)));
    const Dneg = 4000 / life(rev(s(500), -s(300))) + 3000 / life(rev(s(600), s(200)));
    near(si(c, 'D_sum_pos'), Dpos);
    near(si(c, 'D_sum_neg'), Dneg);
    near(si(c, 'D_sum'), Math.max(Dpos, Dneg));
    near(si(c, 'repeats'), 1 / Math.max(Dpos, Dneg));
    expect(c.values.D_sum.notes?.join(' ')).toMatch(
      /D_sum is governed by the fibre a positive moment puts in/,
    );
  });

  it('flipping every level gives the same D', () => {
    const a = evaluateNote(
      note([
        ...SECTION,
        'spectrum: M_a = 500 N*m, M_m = -300 N*m, n = 4000',
        'spectrum: M_max = -100 N*m, M_min = -900 N*m, n = 2000',
      ]),
    ).checks[0];
    const b = evaluateNote(
      note([
        ...SECTION,
        'spectrum: M_a = 500 N*m, M_m = 300 N*m, n = 4000',
        'spectrum: M_max = 900 N*m, M_min = 100 N*m, n = 2000',
      ]),
    ).checks[0];
    near(si(a, 'D_sum'), si(b, 'D_sum'), 1e-12);
    // All the mean moments negative: the fibre at -M c/I is in tension under them.
    near(si(a, 'D_sum'), 4000 / life(rev(s(500), s(300))) + 2000 / life(rev(s(400), s(500))));
  });

  it('a bending history: the fibre at -M c/I takes every cycle with its mean negated; flipping history_scale changes nothing', () => {
    // ASTM E1049-85 (2017), Fig. 6 history, as moments of 100 N*m per unit.
    const csv = `t,M\n${[-2, 1, -3, 5, -1, 3, -4, 4, -2].map((x, i) => `${i},${x}`).join('\n')}\n`;
    const reader: HistoryChunkReader = {
      read(_p, onChunk) {
        onChunk(csv);
        return { ok: true };
      },
    };
    // Its cycles (range, mean, count) as the standard tabulates them.
    const cycles: Array<[number, number, number]> = [
      [4, 1, 1],
      [3, -0.5, 0.5],
      [4, -1, 0.5],
      [8, 1, 0.5],
      [6, 1, 0.5],
      [8, 0, 0.5],
      [9, 0.5, 0.5],
    ];
    const run = (scale: string) =>
      evaluateNote(
        note([...SECTION, 'history: h.csv', 'history-load: bending', `history_scale = ${scale}`]),
        { histories: reader },
      ).checks[0];
    const u = s(100);
    let Dpos = 0;
    let Dneg = 0;
    for (const [r, m, n] of cycles) {
      Dpos += n / life(rev((u * r) / 2, u * m));
      Dneg += n / life(rev((u * r) / 2, -u * m));
    }
    const c = run('100 N*m');
    expect(errors(c)).toEqual([]);
    near(si(c, 'D_sum_pos'), Dpos);
    near(si(c, 'D_sum_neg'), Dneg);
    near(si(c, 'D_sum'), Math.max(Dpos, Dneg));
    const f = run('-100 N*m');
    near(si(f, 'D_sum'), si(c, 'D_sum'), 1e-12);
    near(si(f, 'D_sum_pos'), Dneg);
  });
});
