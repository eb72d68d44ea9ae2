/**
 * A stated value ends the chain it replaces (issue 11, item 5): a stated `Se` needs no
 * surface, size, temperature or reliability; a stated `Kf` no `Kt`, `q` or radius; a stated
 * `Kt` no geometry of the feature. Nothing is asked about the replaced factors, and what
 * the tool still works out of them is shown as not used in the hover and the report.
 */
import { describe, expect, it } from 'vitest';
import { derivation } from '../../server/src/lsp/hover';
import { assumptionsRegister, evaluateNote } from '../../shared-core/src';
import { check, errors, KSI, si } from './helpers';

const REPLACED_CODES = [
  'missing-surface',
  'missing-size',
  'defaulted-temperature',
  'defaulted-reliability',
  'missing-input',
  'defaulted-notch-sensitivity',
  'no-feature',
];

function replacedDiagnostics(c: ReturnType<typeof check>): string[] {
  return c.diagnostics.filter((d) => REPLACED_CODES.includes(d.code)).map((d) => d.code);
}

describe("Se and Kf stated: Budynas, Shigley's MED 8th ed. Solutions Manual, Problem 7-1", () => {
  // Given Kf = 2.2, Kfs = 1.8, Se = 30 kpsi, Sut = 100 kpsi, Sy = 80 kpsi, Ma = 600, Mm = 500,
  // Ta = 400, Tm = 300 lbf*in: the DE-Goodman diameter for n = 2 is 1.073 in. The problem gives
  // no surface, temperature or reliability: with Se stated none is needed.
  const c = check([
    'Sut = 100 ksi',
    'Sy = 80 ksi',
    'material-family: steel',
    'rotation: non-rotating',
    'Se = 30 ksi',
    'Kf = 2.2',
    'Kfs = 1.8',
    'd = 1.073 in',
    'M_a = 600 lbf*in',
    'M_m = 500 lbf*in',
    'T_a = 400 lbf*in',
    'T_m = 300 lbf*in',
    'criterion: goodman',
    'require: n_f >= 1.5',
  ]);
  it('evaluates without an error and without a diagnostic about the replaced factors', () => {
    expect(errors(c)).toEqual([]);
    expect(replacedDiagnostics(c)).toEqual([]);
    expect(c.status).toBe('pass');
  });
  it('n_f (Goodman) = 2 at the published diameter (rounded to 1e-3 in: 0.5 %)', () => {
    expect(Math.abs(si(c, 'n_f_goodman') - 2) / 2).toBeLessThan(0.005);
    expect(si(c, 'Se') / KSI).toBeCloseTo(30, 6);
  });
  it('the factors the tool still works out are marked as not used, and the register takes no default from them', () => {
    expect(c.values.ka).toBeUndefined();
    for (const n of ['kd', 'ke', 'kmisc', 'Se_prime']) expect(c.values[n]?.unused, n).toMatch(/stated Se/);
    expect(derivation(c.values.kd)).toContain('Not used');
    const text = ['```fatigue c', ...['Sut = 100 ksi', 'Se = 30 ksi'], '```'].join('\n');
    const register = assumptionsRegister(evaluateNote(text), text);
    expect(register.some((e) => e.name === 'kd' || e.name === 'ke' || e.name === 'kmisc')).toBe(false);
  });
});

describe('Se from another check ends the chain too', () => {
  const note = [
    '```fatigue shaft_a',
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'material-family: steel',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'd = 30 mm',
    'feature: none',
    'M_a = 200 N*m',
    '```',
    '',
    '```fatigue shaft_b',
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'material-family: steel',
    'Se = shaft_a.Se',
    'd = 30 mm',
    'feature: none',
    'M_a = 200 N*m',
    '```',
    '',
  ].join('\n');
  const [a, b] = evaluateNote(note).checks;
  it('no surface, temperature or reliability needed; the same n_f as the check it comes from', () => {
    expect(errors(b)).toEqual([]);
    expect(replacedDiagnostics(b)).toEqual([]);
    expect(si(b, 'n_f')).toBeCloseTo(si(a, 'n_f'), 12);
  });
  it('the stated Se keeps the tool own value beside it where the chain can be worked out', () => {
    // Surface missing in shaft_b: the tool cannot work out its own Se, so none is shown.
    expect(b.values.Se.origin).toBe('stated');
    expect(b.values.Se.tool).toBeUndefined();
  });
});

describe('a stated Kt needs no geometry of the feature; q still needs the radius', () => {
  // Neuber, Budynas & Nisbett, Shigley's MED 10th ed., Eqs. 6-34, 6-35a: sqrt(a) = 0.246 -
  // 3.08e-3 Sut + 1.51e-5 Sut^2 - 2.67e-8 Sut^3 (kpsi, sqrt(in)); q = 1/(1 + sqrt(a)/sqrt(r)).
  const lines = (extra: string[]) => [
    'Sut = 100 ksi',
    'Sy = 80 ksi',
    'material-family: steel',
    'surface: machined',
    'temp = 70 degF',
    'reliability = 0.5',
    'd = 1 in',
    'feature: shoulder-fillet',
    'Kt = 1.8',
    'M_a = 1000 lbf*in',
    'criterion: goodman',
    ...extra,
  ];
  it('no D stated: no missing-input, Kf = 1 + q (Kt - 1) with q from r', () => {
    const c = check(lines(['r = 0.1 in']));
    expect(errors(c)).toEqual([]);
    expect(replacedDiagnostics(c)).toEqual([]);
    const s = 100;
    const rootA = 0.246 - 3.08e-3 * s + 1.51e-5 * s * s - 2.67e-8 * s ** 3;
    const q = 1 / (1 + rootA / Math.sqrt(0.1));
    expect(si(c, 'q')).toBeCloseTo(q, 6);
    expect(si(c, 'Kf')).toBeCloseTo(1 + q * 0.8, 6);
  });
  it('with the geometry stated the fit is shown beside the stated Kt, without its remarks', () => {
    const c = check(lines(['r = 0.1 in', 'D = 1.5 in']));
    expect(c.values.Kt.tool?.si).toBeGreaterThan(1);
    expect(c.values.Kt.si).toBe(1.8);
    // r still acts through q; D only fed the replaced fit.
    expect(c.values.r.unused).toBeUndefined();
    expect(c.values.D.unused).toMatch(/stated Kt/);
  });
});

describe('a stated Kf needs neither Kt, q nor r', () => {
  const c = check([
    'Sut = 100 ksi',
    'Sy = 80 ksi',
    'material-family: steel',
    'surface: machined',
    'temp = 70 degF',
    'reliability = 0.5',
    'd = 1 in',
    'feature: shoulder-fillet',
    'r = 0.1 in',
    'Kf = 1.7',
    'M_a = 1000 lbf*in',
    'criterion: goodman',
  ]);
  it('no missing D, no q, no notch-radius default; the stated r shows as not used', () => {
    expect(errors(c)).toEqual([]);
    expect(replacedDiagnostics(c)).toEqual([]);
    expect(c.values.q).toBeUndefined();
    expect(c.values.r.unused).toMatch(/stated Kf/);
    // sigma_a = Kf 32 M / (pi d^3) (Shigley Eq. 6-40 form): Kf acts as stated.
    expect(si(c, 'sigma_a_eq') / KSI).toBeCloseTo((1.7 * 32 * 1000) / Math.PI / 1000, 6);
  });
});

describe('a stated Se_prime ends the estimate from Sut', () => {
  const c = check([
    'Sut = 100 ksi',
    'Sy = 80 ksi',
    'material-family: steel',
    'Se_prime = 40 ksi',
    'ka = 0.8',
    'kb = 0.9',
    'kd = 1',
    'ke = 1',
    'd = 1 in',
    'feature: none',
    'M_a = 1000 lbf*in',
  ]);
  it('Se = Marin x the stated Se_prime; the tool estimate 0.5 Sut is shown beside it', () => {
    // Budynas & Nisbett, Shigley's MED 9th ed., Eq. 6-8: 0.5 x 100 kpsi = 50 kpsi; Eq. 6-18: Se = ka kb kc kd ke Se_prime.
    expect(si(c, 'Se') / KSI).toBeCloseTo(0.8 * 0.9 * 40, 8);
    expect((c.values.Se_prime.tool?.si ?? 0) / KSI).toBeCloseTo(50, 8);
  });
});
