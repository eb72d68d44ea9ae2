/**
 * Shell cutouts evaluated at their critical edge points, notch sensitivity from the material
 * family's own data, and the shell parameter of an opening, through the block language. Every
 * expected number is computed here by hand from the published formula named beside it.
 */
import { describe, expect, it } from 'vitest';
import { check, errors, MPA, si } from './helpers';

const INCH = 0.0254;
const KSI = 6.894757293168361e6;

/** Budynas & Nisbett, Shigley's MED 10th ed., Eq. 6-35a (bending/axial, steels), sqrt(in). */
function shigleySqrtA(sutPa: number): number {
  const S = Math.min(Math.max(sutPa / KSI, 50), 250);
  return 0.246 - 3.08e-3 * S + 1.51e-5 * S * S - 2.67e-8 * S * S * S;
}
/** Neuber's q = 1/(1 + sqrt(a)/sqrt(r)), Shigley Eq. 6-34, r in m. */
function neuberQ(sutPa: number, r: number): number {
  return 1 / (1 + shigleySqrtA(sutPa) / Math.sqrt(r / INCH));
}

const shell = (kind: 'cylinder' | 'sphere', w: string, h: string, extra: string[] = []) => [
  'Sut = 400 MPa',
  'Sy = 250 MPa',
  'surface: machined',
  'temp = 20 degC',
  'reliability = 0.5',
  'criterion: goodman',
  `shell: ${kind}`,
  'D_i = 600 mm',
  't = 8 mm',
  'feature: shell-cutout',
  `w_c = ${w}`,
  `h_c = ${h}`,
  'p_max = 1 MPa',
  'p_min = 0.7 MPa',
  ...extra,
];

function notesOf(c: ReturnType<typeof check>, name: string): string {
  return (c.values[name]?.notes ?? []).join(' | ');
}

describe('shell cutout: the radius of curvature at the governing end (Inglis 1913; Timoshenko & Goodier, Theory of Elasticity, Art. 63)', () => {
  it('110 x 80 mm in a cylinder: the end of the axial semi-axis governs, radius a^2/b = 75.6 mm, not h_c/2 = 40 mm', () => {
    const c = check(shell('cylinder', '110 mm', '80 mm'));
    expect(errors(c)).toEqual([]);
    const a = 0.055;
    const b = 0.04;
    const Kt = 1 + (2 * b) / a - 0.5; // sigma_h (1 + 2b/a) - sigma_l, sigma_l = sigma_h/2
    const q = neuberQ(400 * MPA, (a * a) / b);
    expect(si(c, 'Kt')).toBeCloseTo(Kt, 10);
    expect(si(c, 'q')).toBeCloseTo(q, 6);
    expect(si(c, 'Kf')).toBeCloseTo(1 + q * (Kt - 1), 6);
    // The old radius (half the smaller dimension) gave a lower q: unconservative.
    expect(si(c, 'q')).toBeGreaterThan(neuberQ(400 * MPA, 0.04) + 0.015);
    expect(notesOf(c, 'Kf')).toContain('end of the axial semi-axis');
    expect(notesOf(c, 'q')).toContain('75.63 mm');
  });

  it('slot 30 x 60 mm along the axis of a cylinder: the end of the axial semi-axis, radius a^2/b = 7.5 mm', () => {
    const c = check(shell('cylinder', '30 mm', '60 mm'));
    const a = 0.015;
    const b = 0.03;
    const Kt = 1 + (2 * b) / a - 0.5;
    const q = neuberQ(400 * MPA, (a * a) / b);
    expect(si(c, 'Kt')).toBeCloseTo(Kt, 10);
    expect(si(c, 'Kf')).toBeCloseTo(1 + q * (Kt - 1), 6);
    expect(notesOf(c, 'Kf')).toContain('end of the axial semi-axis');
  });

  it('wide opening 120 x 40 mm in a sphere: the end of the circumferential semi-axis, Kt = 2a/b = 6, radius b^2/a = 6.67 mm', () => {
    const c = check(shell('sphere', '120 mm', '40 mm'));
    const a = 0.06;
    const b = 0.02;
    const Kt = (2 * a) / b; // equal biaxial: (1 + 2a/b) - 1
    const q = neuberQ(400 * MPA, (b * b) / a);
    expect(si(c, 'Kt')).toBeCloseTo(Kt, 10);
    expect(si(c, 'q')).toBeCloseTo(q, 6);
    expect(si(c, 'Kf')).toBeCloseTo(1 + q * (Kt - 1), 6);
    expect(notesOf(c, 'Kf')).toContain('end of the circumferential semi-axis');
  });

  it('circular opening in a sphere: Kt = 2 at every point, radius the hole radius', () => {
    const c = check(shell('sphere', '40 mm', '40 mm'));
    expect(si(c, 'Kt')).toBeCloseTo(2, 10);
    expect(si(c, 'Kf')).toBeCloseTo(1 + neuberQ(400 * MPA, 0.02), 6);
  });

  it('a stated r is used at every edge point: the largest elastic peak governs', () => {
    const c = check(shell('cylinder', '110 mm', '80 mm', ['r = 10 mm']));
    const Kt = 1 + 80 / 55 - 0.5;
    expect(si(c, 'Kf')).toBeCloseTo(1 + neuberQ(400 * MPA, 0.01) * (Kt - 1), 6);
  });
});

describe('shell parameter of the opening (Lekkerkerker 1964 / Van Dyke 1965 as used in Pilkey & Pilkey, Peterson SCF 3rd ed., Sec. 4.5; from memory)', () => {
  const beta = (a: number) => ((3 * 0.91) ** 0.25 * a) / (2 * Math.sqrt(0.304 * 0.008));

  it('reported with its derivation; a warning on the feature line beyond beta = 0.25', () => {
    const c = check(shell('cylinder', '110 mm', '80 mm'));
    expect(si(c, 'beta_shell')).toBeCloseTo(beta(0.055), 10);
    expect(c.values.beta_shell?.formula).toContain('sqrt(R * t)');
    const w = c.diagnostics.filter((d) => d.code === 'large-shell-opening');
    expect(w).toHaveLength(1);
    expect(w[0].severity).toBe('warning');
    expect(w[0].range.start.line).toBe(10); // `feature: shell-cutout`, the 10th line of the block
  });

  it('a small opening: no warning', () => {
    const c = check(shell('cylinder', '20 mm', '20 mm'));
    expect(si(c, 'beta_shell')).toBeCloseTo(beta(0.01), 10);
    expect(c.diagnostics.filter((d) => d.code === 'large-shell-opening')).toEqual([]);
  });

  it('a stated Kt replaces the flat-plate value: no warning, the tool value kept beside the stated one', () => {
    const c = check(shell('cylinder', '110 mm', '80 mm', ['Kt = 3.1   # shell solution, chart reading']));
    expect(c.diagnostics.filter((d) => d.code === 'large-shell-opening')).toEqual([]);
    expect(si(c, 'Kt')).toBeCloseTo(3.1, 12);
    expect(c.values.Kt?.origin).toBe('stated');
    expect(c.values.Kt?.tool?.si).toBeCloseTo(1 + 80 / 55 - 0.5, 10);
    expect(notesOf(c, 'beta_shell')).toContain('stated Kt');
    // q at the larger end radius a^2/b (conservative: where the stated peak lies is unknown).
    const q = neuberQ(400 * MPA, 0.055 ** 2 / 0.04);
    expect(si(c, 'Kf')).toBeCloseTo(1 + q * (3.1 - 1), 6);
  });

  it('a stated Kt without w_c and h_c: no error, q = 1 without a radius', () => {
    const lines = shell('cylinder', '1 mm', '1 mm', ['Kt = 3.1']).filter((l) => !/^(w_c|h_c)/.test(l));
    const c = check(lines);
    expect(errors(c)).toEqual([]);
    expect(si(c, 'Kf')).toBeCloseTo(3.1, 12);
    expect(c.diagnostics.some((d) => d.code === 'defaulted-notch-sensitivity')).toBe(true);
  });
});

describe('notch sensitivity from the material family', () => {
  const shaft = (material: string, extra: string[] = []) => [
    `material: ${material}`,
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.5',
    'rotation: rotating',
    'd = 30 mm',
    'D = 36 mm',
    'r = 1.5 mm',
    'feature: shoulder-fillet',
    'M_a = 100 N*m',
    'N = 1e7',
    'criterion: goodman',
    ...extra,
  ];

  it('titanium alloy: no published data built in: q = 1 (Kf = Kt) and a no-notch-data warning asking for q', () => {
    const c = check(shaft('ti-6al-4v-annealed'));
    expect(si(c, 'q')).toBe(1);
    expect(si(c, 'Kf')).toBeCloseTo(si(c, 'Kt'), 12);
    const w = c.diagnostics.find((d) => d.code === 'no-notch-data');
    expect(w?.severity).toBe('warning');
    expect(w?.message).toContain('titanium');
    expect(w?.message).toContain('`q`');
  });

  it('cast iron: the same warning, quoting the q = 0.20 of Shigley Sec. 6-10 (from memory) for the engineer to state', () => {
    const c = check(shaft('ductile-iron-80-55-06'));
    expect(si(c, 'q')).toBe(1);
    const w = c.diagnostics.find((d) => d.code === 'no-notch-data');
    expect(w?.message).toContain('cast iron');
    expect(w?.message).toContain('0.20');
  });

  it('a stated q ends the question: no warning', () => {
    const c = check(shaft('ti-6al-4v-annealed', ['q = 0.9']));
    expect(c.diagnostics.filter((d) => d.code === 'no-notch-data')).toEqual([]);
    expect(si(c, 'Kf')).toBeCloseTo(1 + 0.9 * (si(c, 'Kt') - 1), 12);
  });

  it("wrought aluminium alloy at a plate hole: Peterson's a = 0.51 mm (Peterson 1959 as quoted in Dowling, Sec. 10.3; from memory), not the steel fit", () => {
    const c = check([
      'material: al-6061-t6',
      'surface: machined',
      'temp = 20 degC',
      'reliability = 0.5',
      'W = 60 mm',
      't = 12 mm',
      'd_hole = 17 mm',
      'r = 8.5 mm',
      'feature: plate-hole',
      'F_max = 14 kN',
      'F_min = 2 kN',
      'N = 1e7',
      'criterion: goodman',
    ]);
    expect(si(c, 'q')).toBeCloseTo(1 / (1 + 0.51 / 8.5), 12);
    expect(c.diagnostics.filter((d) => d.code === 'no-notch-data')).toEqual([]);
  });
});
