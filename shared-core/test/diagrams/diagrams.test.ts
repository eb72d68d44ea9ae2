import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { CONTRACT_BLOCK } from '../../../test/fixtures/contractBlock';
import { evaluateNote } from '../../src';
import type { CheckResult, HaighData, SnData } from '../../src/context/types';
import { haighDiagram, histogramDiagram, snDiagram } from '../../src/diagrams';
import { crackGrowthDiagram } from '../../src/methods/crack-growth/diagram';
import { checkDiagrams } from '../../src/methods/registry';
import { axisFromTicks, findAll, hasClass, parseXml, textOf, walk, type XmlNode } from './parseSvg';

// Sample notes (the contract's example and variations of it): the numbers under test are the
// check's own results; the diagrams must put them where they say.
const CONTRACT = `
${CONTRACT_BLOCK}`;

const MORE = `
\`\`\`fatigue failing
Sut = 500 MPa
Sy = 300 MPa
surface: hot-rolled
rotation: non-rotating
d = 20 mm
M_max = 200 N*m
M_min = -100 N*m
criterion: goodman
require: n_f >= 2
\`\`\`

\`\`\`fatigue compressive
Sut = 100 ksi
Sy = 80 ksi
surface: ground
d = 1.25 in
sigma_a = 18 ksi
sigma_m = -13 ksi
criterion: asme-elliptic
load-line: constant-mean
\`\`\`

\`\`\`fatigue finite_bracket
Sut = 690 MPa
Sy = 580 MPa
surface: machined
d = 30 mm
F_max = 90 kN
F_min = 10 kN
N = 2e5
criterion: gerber
\`\`\`

\`\`\`fatigue torsion_only
Sut = 600 MPa
Sy = 450 MPa
surface: machined
d = 25 mm
T_max = 300 N*m
T_min = 50 N*m
criterion: soderberg
\`\`\`
`;

function check(note: string, id: string): CheckResult {
  const c = evaluateNote(note).checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
}

const PA_PER_MPA = unit(1, 'MPa').toNumber('Pa');
// Reference library: mathjs's psi (1 lbf / 1 in^2 from the international pound and inch).
const PA_PER_KSI = unit(1000, 'psi').toNumber('Pa');

/** Every structural promise of a diagram: parseable, accessible, self-contained, no NaN. */
function expectWellFormed(svg: string, embedStyle = true): XmlNode {
  const root = parseXml(svg);
  expect(root.name).toBe('svg');
  expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
  expect(root.attrs.role).toBe('img');
  expect(root.attrs.viewBox).toMatch(/^0 0 \d+ \d+$/);
  expect(root.children[0].name).toBe('title');
  expect(textOf(root.children[0]).trim().length).toBeGreaterThan(3);
  expect(root.children[1].name).toBe('desc');
  expect(findAll(root, (n) => n.name === 'style').length).toBe(embedStyle ? 1 : 0);
  walk(root, (n) => {
    expect(n.name).not.toBe('script');
    expect(n.name).not.toBe('foreignObject');
    for (const [k, v] of Object.entries(n.attrs)) {
      expect(v, `${n.name}@${k}`).not.toMatch(/NaN|Infinity|undefined|null/);
      expect(k).not.toMatch(/^on|href$/i);
    }
  });
  expect(svg).not.toMatch(/url\(|@import|https?:\/\/(?!www\.w3\.org\/2000\/svg)/);
  return root;
}

function byRole(root: XmlNode, role: string): XmlNode[] {
  return findAll(root, (n) => n.attrs['data-role'] === role);
}

describe('Haigh diagram', () => {
  const c = check(CONTRACT, 'drive_shaft_fillet');

  it('is a well-formed, accessible, self-contained SVG', () => {
    const svg = haighDiagram(c.haigh!, { unitSystem: 'SI' });
    const root = expectWellFormed(svg);
    expect(textOf(root.children[0])).toBe('Haigh diagram');
    expect(textOf(root.children[1])).toContain('n_f = 1.788');
    expectWellFormed(haighDiagram(c.haigh!, { unitSystem: 'SI', embedStyle: false }), false);
  });

  it('draws every criterion line, the chosen one marked, and the Langer line', () => {
    const root = parseXml(haighDiagram(c.haigh!, { unitSystem: 'SI' }));
    const keys = findAll(root, (n) => n.name === 'polyline').map((n) => n.attrs['data-key']);
    expect(new Set(keys)).toEqual(new Set(['goodman', 'gerber', 'soderberg', 'asme-elliptic', 'langer']));
    const chosen = findAll(root, (n) => hasClass(n, 'fn-chosen'));
    expect(chosen.map((n) => n.attrs['data-key'])).toEqual(['goodman']);
    const legend = textOf(findAll(root, (n) => hasClass(n, 'fn-legend'))[0]);
    for (const label of [
      'Modified Goodman (chosen)',
      'Gerber',
      'Soderberg',
      'ASME elliptic',
      'Langer',
      'load line',
      'operating point',
    ])
      expect(legend).toContain(label);
  });

  it("puts the operating point at the check's equivalent mean and alternating stresses (MPa axes)", () => {
    const root = parseXml(haighDiagram(c.haigh!, { unitSystem: 'SI' }));
    const op = byRole(root, 'operating-point')[0];
    const mean = axisFromTicks(root, 'x', false)(Number(op.attrs.cx));
    const alt = axisFromTicks(root, 'y', false)(Number(op.attrs.cy));
    // The numbers the check reports for the same point.
    expect(mean).toBeCloseTo(c.values.sigma_m_eq.si! / PA_PER_MPA, 0);
    expect(alt).toBeCloseTo(c.values.sigma_a_eq.si! / PA_PER_MPA, 0);
    expect(Math.abs(mean - 77.43)).toBeLessThan(1.5); // 77.43 MPa: the check's display of sigma_m_eq
    expect(textOf(root.children[0])).toBe('Haigh diagram');
    expect(findAll(root, (n) => hasClass(n, 'fn-axis-label-x')).map(textOf)[0]).toContain('(MPa)');
  });

  it('uses ksi axes for the US system, at the same point', () => {
    const root = parseXml(haighDiagram(c.haigh!, { unitSystem: 'US' }));
    const op = byRole(root, 'operating-point')[0];
    const mean = axisFromTicks(root, 'x', false)(Number(op.attrs.cx));
    const alt = axisFromTicks(root, 'y', false)(Number(op.attrs.cy));
    expect(mean).toBeCloseTo(c.values.sigma_m_eq.si! / PA_PER_KSI, 1);
    expect(alt).toBeCloseTo(c.values.sigma_a_eq.si! / PA_PER_KSI, 1);
    expect(findAll(root, (n) => hasClass(n, 'fn-axis-label-y')).map(textOf)[0]).toContain('(ksi)');
  });

  it('proportional load line: where it meets the chosen line is n_f times the operating point', () => {
    // Algebraic identity of the proportional load line: the limit point is n_f * (sigma_m, sigma_a).
    const root = parseXml(haighDiagram(c.haigh!, { unitSystem: 'SI' }));
    const limit = byRole(root, 'limit')[0];
    const sm = c.values.sigma_m_eq.si! / PA_PER_MPA;
    const sa = c.values.sigma_a_eq.si! / PA_PER_MPA;
    const ratio =
      Math.hypot(Number(limit.attrs['data-mean']), Number(limit.attrs['data-alt'])) / Math.hypot(sm, sa);
    expect(ratio).toBeCloseTo(c.values.n_f.si!, 2);
    const line = findAll(root, (n) => n.attrs['data-load-line'] === 'proportional')[0];
    // The drawn load line starts at the origin.
    const x = axisFromTicks(root, 'x', false);
    const y = axisFromTicks(root, 'y', false);
    expect(x(Number(line.attrs.x1))).toBeCloseTo(0, 6);
    expect(y(Number(line.attrs.y1))).toBeCloseTo(0, 6);
  });

  it('shows the failing point outside the chosen line with n_f < 1', () => {
    const f = check(MORE, 'failing');
    const root = expectWellFormed(haighDiagram(f.haigh!, { unitSystem: 'SI' }));
    const limit = byRole(root, 'limit')[0];
    const op = byRole(root, 'operating-point')[0];
    const y = axisFromTicks(root, 'y', false);
    expect(y(Number(op.attrs.cy))).toBeGreaterThan(Number(limit.attrs['data-alt']));
    // The label is the check's own n_f, which is below 1.
    expect(f.values.n_f.si!).toBeLessThan(1);
    expect(textOf(root)).toContain(`n_f = ${f.values.n_f.display}`);
  });

  it('shows the compressive side and a vertical load line for constant mean', () => {
    const h = check(MORE, 'compressive');
    const root = expectWellFormed(haighDiagram(h.haigh!, { unitSystem: 'US' }));
    const x = axisFromTicks(root, 'x', false);
    const op = byRole(root, 'operating-point')[0];
    expect(x(Number(op.attrs.cx))).toBeCloseTo(h.values.sigma_m_eq.si! / PA_PER_KSI, 1);
    expect(x(Number(op.attrs.cx))).toBeLessThan(0);
    const line = findAll(root, (n) => n.attrs['data-load-line'] === 'constant-mean')[0];
    expect(line.attrs.x1).toBe(line.attrs.x2);
    expect(x(Number(line.attrs.x1))).toBeCloseTo(h.values.sigma_m_eq.si! / PA_PER_KSI, 1);
  });

  it('labels shear axes for a torsion-only check', () => {
    const t = check(MORE, 'torsion_only');
    const root = expectWellFormed(haighDiagram(t.haigh!, { unitSystem: 'SI' }));
    expect(textOf(findAll(root, (n) => hasClass(n, 'fn-axis-label-x'))[0])).toContain('τm');
  });

  it('never writes NaN for missing or absurd data, and escapes its text', () => {
    const bad: HaighData = {
      S: Number.NaN,
      Sut: 0,
      Sy: Number.NaN,
      shear: false,
      sigma_a: Number.POSITIVE_INFINITY,
      sigma_m: Number.NaN,
      loadLine: 'proportional',
      criterion: 'goodman',
      n_f: null,
      curves: [
        {
          key: 'goodman',
          label: 'G <&> "q"',
          points: [
            [Number.NaN, 1],
            [0, 0],
          ],
        },
      ],
    };
    expectWellFormed(haighDiagram(bad, { unitSystem: 'SI', title: 'A <b> & "c"' }));
    const zero: HaighData = { ...bad, S: 1e8, Sut: 4e8, Sy: 3e8, sigma_a: 0, sigma_m: 0, curves: [] };
    expectWellFormed(haighDiagram(zero, { unitSystem: 'US', width: 100 }));
  });
});

describe('S-N diagram', () => {
  it('draws the Basquin line through its two points and the knee', () => {
    const c = check(CONTRACT, 'drive_shaft_fillet');
    const root = expectWellFormed(snDiagram(c.sn!, { unitSystem: 'SI' }));
    const x = axisFromTicks(root, 'x', true);
    const y = axisFromTicks(root, 'y', true);
    const pts = byRole(root, 'basquin')[0]
      .attrs.points.split(' ')
      .map((p) => p.split(',').map(Number));
    expect(x(pts[0][0]) / c.sn!.N1).toBeCloseTo(1, 2);
    expect(y(pts[0][1]) / (c.sn!.S1 / PA_PER_MPA)).toBeCloseTo(1, 2);
    expect(x(pts[1][0]) / c.sn!.N2).toBeCloseTo(1, 2);
    expect(y(pts[1][1]) / (c.sn!.S2 / PA_PER_MPA)).toBeCloseTo(1, 2);
    // Basquin's law sigma = a N^b through the drawn line's ends: an identity of the core's constants.
    expect(c.sn!.a * c.sn!.N2 ** c.sn!.b).toBeCloseTo(c.sn!.S2, -3);
    expect(byRole(root, 'knee')).toHaveLength(1);
    expect(byRole(root, 'endurance')).toHaveLength(1);
    // Infinite life: the operating point is a marker at the right edge.
    const op = byRole(root, 'operating-point')[0];
    expect(op.attrs['data-infinite']).toBe('true');
  });

  it('puts a finite-life operating point at (N_f, sigma_ar) on log axes', () => {
    const f = check(MORE, 'failing');
    const root = expectWellFormed(snDiagram(f.sn!, { unitSystem: 'SI' }));
    const op = byRole(root, 'operating-point')[0];
    const N = axisFromTicks(root, 'x', true)(Number(op.attrs.cx));
    const S = axisFromTicks(root, 'y', true)(Number(op.attrs.cy));
    expect(N / f.values.N_f.si!).toBeCloseTo(1, 2);
    expect(S / (f.values.sigma_ar.si! / PA_PER_MPA)).toBeCloseTo(1, 2);
  });

  it('marks the required life of a finite-life check', () => {
    const f = check(MORE, 'finite_bracket');
    const root = expectWellFormed(snDiagram(f.sn!, { unitSystem: 'SI' }));
    const req = byRole(root, 'required-life')[0];
    expect(axisFromTicks(root, 'x', true)(Number(req.attrs.cx)) / 2e5).toBeCloseTo(1, 2);
  });

  it('continues the line dashed when there is no knee, and draws spectrum levels', () => {
    const data: SnData = {
      a: 900e6,
      b: -0.1,
      N1: 1e3,
      N2: 5e8,
      S1: 900e6 * 1e3 ** -0.1,
      S2: 900e6 * 5e8 ** -0.1,
      hasKnee: false,
      points: [
        { label: 'level 1', sigma_ar: 200e6, N: 3e5, count: 1000 },
        { label: 'level 2', sigma_ar: 150e6, N: 6e6, count: 20000 },
      ],
    };
    const root = expectWellFormed(snDiagram(data, { unitSystem: 'US' }));
    expect(byRole(root, 'continued')).toHaveLength(1);
    expect(byRole(root, 'knee')).toHaveLength(0);
    expect(byRole(root, 'level')).toHaveLength(2);
  });

  it('survives absurd data without NaN', () => {
    const data: SnData = {
      a: Number.NaN,
      b: Number.NaN,
      N1: 0,
      N2: -1,
      S1: Number.NaN,
      S2: 0,
      hasKnee: true,
      points: [{ label: 'operating point', sigma_ar: -5, N: Number.NaN }],
    };
    expectWellFormed(snDiagram(data, { unitSystem: 'SI' }));
  });
});

describe('crack growth and histogram diagrams', () => {
  it('draws the crack curve ending at its last pair (mm against cycles)', () => {
    const curve: Array<[number, number]> = [
      [0.001, 0],
      [0.002, 40000],
      [0.004, 60000],
      [0.008, 65000],
    ];
    const root = expectWellFormed(
      crackGrowthDiagram(curve, { unitSystem: 'SI' }, { criticalSize: 0.008, inspectionInterval: 32500 }),
    );
    const end = byRole(root, 'end')[0];
    expect(axisFromTicks(root, 'x', false)(Number(end.attrs.cx))).toBeCloseTo(65000, -1);
    expect(axisFromTicks(root, 'y', false)(Number(end.attrs.cy))).toBeCloseTo(8, 2);
    expect(byRole(root, 'inspection')).toHaveLength(1);
    expectWellFormed(crackGrowthDiagram([], { unitSystem: 'US' }));
  });

  it('draws one cell per non-empty bin of the range-mean matrix', () => {
    const hist = {
      rangeEdges: [0, 10, 20, 30],
      meanEdges: [-10, 0, 10],
      counts: [
        [4, 0],
        [1, 2.5],
        [0, 0.5],
      ],
      unit: 'MPa',
    };
    const root = expectWellFormed(histogramDiagram(hist, { unitSystem: 'SI' }));
    const cells = findAll(root, (n) => hasClass(n, 'fn-cells'))[0];
    expect(cells.children.filter((n) => n.name === 'rect' && hasClass(n, 'fn-cell'))).toHaveLength(4);
    expectWellFormed(
      histogramDiagram({ rangeEdges: [], meanEdges: [], counts: [], unit: '' }, { unitSystem: 'SI' }),
    );
  });
});

describe('checkDiagrams', () => {
  it('gives the Haigh and S-N diagrams of a stress-life check in its own units', () => {
    const c = check(MORE, 'compressive');
    const d = checkDiagrams(c);
    expect(d.map((x) => x.kind)).toEqual(['haigh', 'sn']);
    for (const x of d) expect(x.svg).toContain('(ksi)');
  });
});
