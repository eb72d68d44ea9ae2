/**
 * `method: crack-growth` blocks, end to end: lives against the closed form and against a
 * numerical integration written here, the critical size and the inspection interval, the
 * shell's hoop stress, and the diagnostics of bad inputs on their lines.
 */
import { describe, expect, it } from 'vitest';
import { type CheckResult, evaluateNote } from '../../shared-core/src';
import { diag, lineOf, MPA, si } from './helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function evaluate(lines: string[]): { c: CheckResult; text: string[] } {
  const text = ['```fatigue c', ...lines, '```', ''].join('\n');
  return { c: evaluateNote(text).checks[0], text: text.split('\n') };
}

function expectAllFinite(c: CheckResult) {
  for (const [name, v] of Object.entries(c.values)) {
    if (v.si === null) expect(v.infinite, `${name} is null but not infinite`).toBe(true);
    else expect(Number.isFinite(v.si), `${name} = ${v.si}`).toBe(true);
    expect(v.display, name).not.toMatch(/NaN|Infinity/);
  }
  for (const [a, n] of c.crackCurve ?? []) expect(Number.isFinite(a) && Number.isFinite(n)).toBe(true);
}

/**
 * Paris-law life for a constant geometry factor, integrated in closed form (Paris and Erdogan
 * 1963; N.E. Dowling, Mechanical Behavior of Materials, 4th ed., sec. 11.6, section from
 * memory): N = (a_c^(1 - m/2) - a_i^(1 - m/2)) / (C (Y dS sqrt(pi))^m (1 - m/2)), stresses in
 * MPa, sizes in m; a_c = (K_IC / (Y sigma_max))^2 / pi (Irwin 1957).
 */
function closedForm(C: number, m: number, Y: number, dS: number, a_i: number, a_c: number): number {
  const e = 1 - m / 2;
  return (a_c ** e - a_i ** e) / (C * (Y * dS * Math.sqrt(Math.PI)) ** m * e);
}

/**
 * Single edge crack in a finite plate under tension, Y = 1.12 - 0.231 s + 10.55 s^2 -
 * 21.72 s^3 + 30.39 s^4, s = a/W, a/W <= 0.6 (Brown and Srawley, ASTM STP 410, 1966, as quoted
 * in Tada, Paris, Irwin, The Stress Analysis of Cracks Handbook, 3rd ed.; from memory; the
 * polynomial as given at cricelli.com/FFAT/8b.php).
 */
const edgeY = (a: number, W: number) => {
  const s = a / W;
  return 1.12 - 0.231 * s + 10.55 * s ** 2 - 21.72 * s ** 3 + 30.39 * s ** 4;
};

/** Composite Simpson on [lo, hi] with n (even) intervals: an independent quadrature. */
function simpson(f: (x: number) => number, lo: number, hi: number, n: number): number {
  const h = (hi - lo) / n;
  let s = f(lo) + f(hi);
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(lo + i * h);
  return (s * h) / 3;
}

/** The root of g on [lo, hi] by bisection (g(lo) < 0 < g(hi)). */
function bisect(g: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (g(mid) < 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

const BASE = [
  'method: crack-growth',
  'C_paris = 6.9e-12',
  'm_paris = 3.0',
  'a_i = 1 mm',
  'K_IC = 100 MPa*m^0.5',
];

describe('crack-growth life', () => {
  it('constant Y: a_c from K_IC and N_cg equal the closed forms; N_insp = N_cg / 2 by default, recorded as an assumption (Paris-Erdogan 1963; Irwin 1957; Dowling 4th ed. sec. 11.6)', () => {
    const { c } = evaluate([...BASE, 'Y = 1.12', 'sigma_max = 200 MPa', 'sigma_min = 20 MPa']);
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const a_c = (100 / (1.12 * 200)) ** 2 / Math.PI;
    expect(rel(si(c, 'a_c'), a_c)).toBeLessThan(1e-12);
    const N = closedForm(6.9e-12, 3, 1.12, 180, 0.001, a_c);
    expect(rel(si(c, 'N_cg'), N)).toBeLessThan(1e-9);
    expect(rel(si(c, 'N_insp'), N / 2)).toBeLessThan(1e-9);
    expect(c.values.inspection_factor.origin).toBe('default');
    expect(c.values.inspection_factor.assumption).toMatch(/2/);
    expect(rel(si(c, 'delta_sigma'), 180 * MPA)).toBeLessThan(1e-12);
    // The curve: from (a_i, 0) to (a_c, N_cg), about 50 points, rising.
    const curve = c.crackCurve!;
    expect(curve.length).toBe(50);
    expect(curve[0]).toEqual([0.001, 0]);
    expect(rel(curve[49][0], a_c)).toBeLessThan(1e-9);
    expect(rel(curve[49][1], N)).toBeLessThan(1e-9);
    for (let i = 1; i < curve.length; i++) expect(curve[i][1]).toBeGreaterThan(curve[i - 1][1]);
    // Each point is the closed form up to its own crack size.
    expect(rel(curve[20][1], closedForm(6.9e-12, 3, 1.12, 180, 0.001, curve[20][0]))).toBeLessThan(1e-9);
    expectAllFinite(c);
  });

  it('edge crack in a finite plate: a_c by bisection and N_cg by Simpson integration done here agree with the block (Brown-Srawley polynomial, from memory)', () => {
    const W = 0.05;
    const smax = 200;
    const dS = 200;
    const { c } = evaluate([
      ...BASE.filter((l) => !l.startsWith('K_IC')),
      'K_IC = 60 MPa*m^0.5',
      'crack-geometry: edge-crack',
      'W = 50 mm',
      'sigma_max = 200 MPa',
      'sigma_min = 0 MPa',
      'inspection_factor = 3',
    ]);
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const a_c = bisect((a) => edgeY(a, W) * smax * Math.sqrt(Math.PI * a) - 60, 1e-6, 0.6 * W);
    expect(rel(si(c, 'a_c'), a_c)).toBeLessThan(1e-9);
    const N = simpson(
      (a) => 1 / (6.9e-12 * (edgeY(a, W) * dS * Math.sqrt(Math.PI * a)) ** 3),
      0.001,
      a_c,
      20000,
    );
    expect(rel(si(c, 'N_cg'), N)).toBeLessThan(1e-7);
    expect(rel(si(c, 'N_insp'), N / 3)).toBeLessThan(1e-7);
    // Y is recorded at a_i.
    expect(rel(si(c, 'Y'), edgeY(0.001, W))).toBeLessThan(1e-12);
    expectAllFinite(c);
  });

  it('a shell: the hoop stress p D_i / (2 t) drives the crack (Shigley 10th ed. Sec. 3-14, thin-walled vessels)', () => {
    const { c } = evaluate([
      ...BASE,
      'Y = 1.12',
      'shell: cylinder',
      'D_i = 600 mm',
      't = 8 mm',
      'p_max = 1.0 MPa',
      'p_min = 0.7 MPa',
      'a_c = 6 mm',
    ]);
    expect(rel(si(c, 'sigma_max'), 37.5 * MPA)).toBeLessThan(1e-12);
    expect(rel(si(c, 'sigma_min'), 26.25 * MPA)).toBeLessThan(1e-12);
    // a_c stated wins over the toughness's; the tool's value is kept beside it.
    expect(si(c, 'a_c')).toBe(0.006);
    expect(c.values.a_c.tool?.si).toBeCloseTo((100 / (1.12 * 37.5)) ** 2 / Math.PI, 12);
    expect(rel(si(c, 'N_cg'), closedForm(6.9e-12, 3, 1.12, 11.25, 0.001, 0.006))).toBeLessThan(1e-9);
    expect(c.diagnostics.some((d) => d.code === 'crack-through-wall')).toBe(false);
  });

  it("paris-units: inch converts C exactly; Barsom and Rolfe's ferrite-pearlite constants 3.6e-10 in/cycle (ksi*in^0.5)^-3 and 6.9e-12 m/cycle (MPa*m^0.5)^-3 agree within 1 % (Barsom & Rolfe, Fracture and Fatigue Control in Structures, 3rd ed.; both forms from memory)", () => {
    const { c } = evaluate([
      'method: crack-growth',
      'paris-units: inch',
      'C_paris = 3.6e-10',
      'm_paris = 3.0',
      'Y = 1.12',
      'a_i = 0.04 in',
      'K_IC = 90 ksi*in^0.5',
      'sigma_max = 30 ksi',
      'sigma_min = 0 ksi',
    ]);
    const Cm = si(c, 'C_paris_metre');
    expect(rel(Cm, 6.9e-12)).toBeLessThan(0.01);
    // 1 ksi*in^0.5 = 6.894757 MPa * sqrt(0.0254 m) (exact unit definitions).
    expect(rel(Cm, (3.6e-10 * 0.0254) / (6.894757293168361 * Math.sqrt(0.0254)) ** 3)).toBeLessThan(1e-12);
  });
});

describe('crack-growth diagnostics on their lines', () => {
  it('a_i >= a_c: crack-size-order error on the a_i line, no life', () => {
    const { c, text } = evaluate([
      ...BASE.filter((l) => !l.startsWith('a_i')),
      'a_i = 80 mm',
      'Y = 1.12',
      'sigma_max = 200 MPa',
    ]);
    const d = diag(c, 'crack-size-order');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'a_i = 80 mm'));
    expect(c.values.N_cg).toBeUndefined();
  });

  it('a Paris constant with impossible units (C for delta_K in Pa*m^0.5): error on the C_paris line', () => {
    const { c, text } = evaluate([
      'method: crack-growth',
      'C_paris = 6.9e-30',
      'm_paris = 3',
      'Y = 1.12',
      'a_i = 1 mm',
      'K_IC = 100 MPa*m^0.5',
      'sigma_max = 200 MPa',
      'sigma_min = 0 MPa',
    ]);
    const d = diag(c, 'paris-units');
    expect(d.severity).toBe('error');
    expect(d.range.start.line).toBe(lineOf(text, 'C_paris'));
    expect(c.values.N_cg).toBeUndefined();
  });

  it('a compressive-only cycle: no growth, N_cg infinite, a warning on the sigma_max line', () => {
    const { c, text } = evaluate([...BASE, 'Y = 1.12', 'sigma_max = -10 MPa', 'sigma_min = -200 MPa']);
    expect(diag(c, 'compressive-cycle').range.start.line).toBe(lineOf(text, 'sigma_max'));
    expect(c.values.N_cg.infinite).toBe(true);
    expect(c.values.N_insp.infinite).toBe(true);
    expect(c.status).toBe('unchecked');
    expectAllFinite(c);
  });

  it('sigma_min < 0: only the tensile part drives growth, delta_sigma = sigma_max, said on the sigma_min line (ASTM E647: delta_K = K_max for R < 0)', () => {
    const { c, text } = evaluate([...BASE, 'Y = 1.12', 'sigma_max = 200 MPa', 'sigma_min = -100 MPa']);
    expect(diag(c, 'compressive-part').range.start.line).toBe(lineOf(text, 'sigma_min'));
    expect(si(c, 'delta_sigma')).toBe(200 * MPA);
    const a_c = (100 / (1.12 * 200)) ** 2 / Math.PI;
    expect(rel(si(c, 'N_cg'), closedForm(6.9e-12, 3, 1.12, 200, 0.001, a_c))).toBeLessThan(1e-9);
  });

  it('Y stated with a crack-geometry; no Y at all; neither K_IC nor a_c; a pressure without shell', () => {
    const twice = evaluate([
      ...BASE,
      'crack-geometry: edge-crack',
      'W = 50 mm',
      'Y = 1.12',
      'sigma_max = 100 MPa',
    ]);
    expect(diag(twice.c, 'geometry-twice').range.start.line).toBe(lineOf(twice.text, 'Y = 1.12'));
    const noY = evaluate([...BASE, 'sigma_max = 100 MPa']);
    expect(diag(noY.c, 'missing-input').message).toMatch(/geometry factor/);
    const noK = evaluate([...BASE.filter((l) => !l.startsWith('K_IC')), 'Y = 1', 'sigma_max = 100 MPa']);
    expect(diag(noK.c, 'missing-input').message).toMatch(/K_IC/);
    const noShell = evaluate([...BASE, 'Y = 1', 'p_max = 1 MPa']);
    expect(diag(noShell.c, 'missing-option').range.start.line).toBe(lineOf(noShell.text, 'p_max'));
  });

  it('a critical size deeper than a shell wall is flagged (leak before break)', () => {
    const { c, text } = evaluate([
      ...BASE,
      'Y = 1.12',
      'shell: cylinder',
      'D_i = 600 mm',
      't = 8 mm',
      'p_max = 1.0 MPa',
    ]);
    expect(diag(c, 'crack-through-wall').range.start.line).toBe(lineOf(text, 'K_IC'));
    expectAllFinite(c);
  });
});
