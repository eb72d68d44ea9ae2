/**
 * Design mode, `solve: NAME for SYMBOL = EXPR` (block-language contract, "Statements"):
 * the solved input against an independent evaluation of the same check with the answer
 * stated, against a published sizing example, and the diagnostics of the solve line.
 */
import { describe, expect, it } from 'vitest';
import { type CheckResult, evaluateNote } from '../../shared-core/src';
import { SOLVE_BUDGET } from '../../shared-core/src/design/solve';
import { check, errors, si } from './helpers';

const INCH = 0.0254;

function codes(c: CheckResult, severity?: string): string[] {
  return c.diagnostics.filter((d) => !severity || d.severity === severity).map((d) => d.code);
}

/** Line (0-based in the note) of the statement that starts with `prefix`: the helper's block starts on line 1. */
function lineOf(lines: string[], prefix: string): number {
  return lines.findIndex((l) => l.startsWith(prefix)) + 1;
}

describe('solve against an independent evaluation of the same check at the solved value', () => {
  // A shoulder fillet whose D and r are proportional to d: the Kt fit, q, kb and the nominal
  // stresses all follow d. Stating the answer must reproduce every number of the solved check.
  const body = [
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'feature: shoulder-fillet',
    'M_max = 180 N*m',
    'M_min = -180 N*m',
    'T_max = 250 N*m',
    'T_min = 250 N*m',
    'criterion: goodman',
  ];
  const proportions = ['D = 1.2 * d', 'r = 0.05 * d'];
  const solved = check([
    ...body,
    ...proportions,
    'solve: d for n_f = 1.5',
    'require: n_f >= 1.5, n_y >= 1.2',
  ]);
  const d = si(solved, 'd');
  const stated = check([...body, `d = ${d} m`, ...proportions, 'require: n_f >= 1.5, n_y >= 1.2']);

  it('solves without errors and records d as computed by the solver', () => {
    expect(errors(solved)).toEqual([]);
    expect(solved.values.d.origin).toBe('computed');
    expect(solved.values.d.formula).toBe('solved: n_f(d) = 1.5');
    expect(solved.values.d.source).toMatch(/Brent/);
    expect(solved.values.d.range?.start.line).toBe(14);
    expect(d).toBeGreaterThan(0.01);
    expect(d).toBeLessThan(0.1);
  });

  it('the check at the answer meets the target (n_f = 1.5 on the safe side) and passes its requirement', () => {
    expect(si(solved, 'n_f')).toBeGreaterThanOrEqual(1.5);
    expect(si(solved, 'n_f') - 1.5).toBeLessThan(1e-8);
    expect(solved.status).toBe('pass');
  });

  it('every value of the solved check equals the independent evaluation with d stated', () => {
    expect(errors(stated)).toEqual([]);
    const names = Object.keys(stated.values);
    expect(Object.keys(solved.values).sort()).toEqual(names.sort());
    for (const n of names) {
      const a = solved.values[n];
      const b = stated.values[n];
      expect(a.infinite ?? false, n).toBe(b.infinite ?? false);
      if (a.si === null || b.si === null) continue;
      expect(Math.abs(a.si - b.si), n).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(b.si)));
    }
    // The size factor and the Kt fit followed d (they are not constants of the block).
    expect(solved.values.kb.origin).toBe('computed');
    expect(solved.values.Kt.origin).toBe('computed');
  });

  it('keeps to the evaluation budget', () => {
    const terms = solved.values.d.terms ?? [];
    const n = terms.find((t) => t.name === 'evaluations of the check')?.value ?? Number.NaN;
    expect(n).toBeGreaterThan(10);
    expect(n).toBeLessThanOrEqual(SOLVE_BUDGET);
  });
});

describe("Budynas, Shigley's MED 8th ed., Solutions Manual, Problem 7-1: shaft diameter for n = 2", () => {
  // Given: Kf = 2.2, Kfs = 1.8, Ma = 600, Ta = 400, Mm = 500, Tm = 300 lbf*in, Se = 30 kpsi,
  // Sut = 100 kpsi, Sy = 80 kpsi, n = 2. Published answers (Eqs. 7-8, 7-10, 7-12, 7-14, rounded
  // to 0.001 in): DE-Gerber 1.016 in, DE-elliptic 1.012 in, DE-Soderberg 1.090 in, DE-Goodman 1.073 in.
  // The mean moment is a mean stress at the fibre: the section does not rotate under it.
  const base = [
    'rotation: non-rotating',
    'Sut = 100 ksi',
    'Sy = 80 ksi',
    'Se = 30 ksi',
    'Kf = 2.2',
    'Kfs = 1.8',
    'M_a = 600 lbf*in',
    'M_m = 500 lbf*in',
    'T_a = 400 lbf*in',
    'T_m = 300 lbf*in',
    'surface: machined',
    'feature: none',
    'temp = 70 degF',
    'reliability = 0.5',
  ];
  it.each([
    ['n_f_gerber', 'gerber', 1.016],
    ['n_f_asme', 'asme-elliptic', 1.012],
    ['n_f_soderberg', 'soderberg', 1.09],
    ['n_f_goodman', 'goodman', 1.073],
  ])('solve: d for %s = 2 (criterion: %s) gives d = %s in', (symbol, criterion, published) => {
    const c = check([...base, `criterion: ${criterion}`, `solve: d for ${symbol} = 2`, 'require: n_f >= 2']);
    expect(errors(c)).toEqual([]);
    const d = si(c, 'd') / INCH;
    // Published to 0.001 in: within half a unit of the last digit (plus float noise).
    expect(Math.abs(d - published)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(si(c, symbol)).toBeCloseTo(2, 9);
    expect(c.values.d.display).toBe(`${published === 1.09 ? '1.09' : published} in`);
    expect(c.status).toBe('pass');
  });
});

describe('solve-line diagnostics', () => {
  const base = [
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'feature: none',
    'M_max = 180 N*m',
    'M_min = -180 N*m',
    'criterion: goodman',
  ];

  it('no root in the physical range: an error naming the range and the closest value, shown at that value', () => {
    const lines = [...base, 'solve: d for n_f = 1e9'];
    const c = check(lines);
    const d = c.diagnostics.find((x) => x.code === 'solve-no-root');
    expect(d?.severity).toBe('error');
    expect(d?.range.start.line).toBe(lineOf(lines, 'solve:'));
    expect(d?.message).toContain('from 0.1 mm to 5000 mm');
    expect(d?.message).toMatch(/closest is n_f = [0-9.e]+ at d = 5000 mm/);
    expect(c.status).toBe('error');
    expect(c.values.d.formula).toMatch(/^closest: n_f\(d\)/);
  });

  it('a jump across the target (life to infinite at the knee) is not a root', () => {
    const lines = [...base, 'solve: d for N_f = 1e8'];
    const c = check(lines);
    const d = c.diagnostics.find((x) => x.code === 'solve-no-root');
    expect(d?.message).toMatch(/jumps across the target at d = [0-9.]+ mm/);
  });

  it('an unknown result symbol: solve-bad-symbol on the symbol, with a suggestion', () => {
    const lines = [...base, 'solve: d for n_q = 2'];
    const c = check(lines);
    const d = c.diagnostics.find((x) => x.code === 'solve-bad-symbol');
    expect(d?.severity).toBe('error');
    expect(d?.range.start).toEqual({ line: lineOf(lines, 'solve:'), character: 13 });
    expect(d?.range.end.character).toBe(16);
    expect(d?.fixes?.[0]?.edits[0]?.newText).toMatch(/^n_[fy]$/);
  });

  it('a stated symbol, or the solved name itself, is not a result', () => {
    expect(codes(check([...base, 'solve: d for Sut = 2 MPa']))).toContain('solve-bad-symbol');
    expect(codes(check([...base, 'solve: d for d = 2 mm']))).toContain('solve-bad-symbol');
  });

  it('NAME must be a reserved input left unstated', () => {
    const stated = check([...base, 'd = 35 mm', 'solve: d for n_f = 2']);
    expect(codes(stated, 'error')).toContain('solve-stated');
    expect(stated.values.d.origin).toBe('stated');
    expect(codes(check([...base, 'solve: n_f for d = 2 mm']), 'error')).toContain('solve-bad-name');
    expect(codes(check([...base, 'solve: dd for n_f = 2']), 'error')).toContain('solve-bad-name');
    expect(codes(check([...base, 'solve: material for n_f = 2']), 'error')).toContain('solve-bad-name');
  });

  it('a target of the wrong dimension', () => {
    const lines = [...base, 'solve: d for n_f = 2 MPa'];
    const c = check(lines);
    const d = c.diagnostics.find((x) => x.code === 'wrong-dimension');
    expect(d?.range.start.line).toBe(lineOf(lines, 'solve:'));
  });

  it('a second solve line is an error; the first is solved', () => {
    const c = check([...base, 'solve: d for n_f = 2', 'solve: d for n_y = 3']);
    expect(codes(c, 'error')).toEqual(['solve-twice']);
    expect(si(c, 'n_f')).toBeCloseTo(2, 8);
  });

  it('several roots: a warning listing them; the smallest is the answer, and each is a root', () => {
    // kd (Shigley MED 9th ed., Eq. 6-27) rises above 1 and falls again with temperature: kd = 1.01 twice.
    const lines = [...base.filter((l) => !l.startsWith('temp')), 'd = 35 mm', 'solve: temp for kd = 1.01'];
    const c = check(lines);
    const w = c.diagnostics.find((x) => x.code === 'solve-several-roots');
    expect(w?.severity).toBe('warning');
    const roots = [...(w?.message.matchAll(/(-?[0-9.]+) degC/g) ?? [])].map((m) => Number(m[1]));
    expect(roots.length).toBe(2);
    expect(roots[0]).toBeLessThan(roots[1]);
    expect(c.values.temp.display).toBe(`${roots[0]} degC`);
    for (const T of roots) {
      const at = check([...base.filter((l) => !l.startsWith('temp')), 'd = 35 mm', `temp = ${T} degC`]);
      // The roots are printed to 4 digits: kd there is 1.01 to about 1e-5.
      expect(Math.abs(si(at, 'kd') - 1.01)).toBeLessThan(2e-5);
    }
  });

  it('a target that names values of the block and of an earlier check', () => {
    // sigma_a = 0.5 * Se: Se itself follows d through kb, so the target moves with the trial value.
    const own = check([...base, 'solve: d for sigma_a = 0.5 * Se']);
    expect(errors(own)).toEqual([]);
    expect(si(own, 'sigma_a') / si(own, 'Se')).toBeCloseTo(0.5, 9);
    const text = [
      '```fatigue first',
      ...base,
      'd = 30 mm',
      '```',
      '',
      '```fatigue second',
      ...base.map((l) => l.replace('180 N*m', '250 N*m').replace('-180 N*m', '-250 N*m')),
      'solve: d for n_f = first.n_f',
      '```',
      '',
    ].join('\n');
    const r = evaluateNote(text);
    expect(r.checks[1].diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(si(r.checks[1], 'n_f')).toBeCloseTo(si(r.checks[0], 'n_f'), 9);
    expect(si(r.checks[1], 'd')).toBeGreaterThan(0.03);
  });

  it('other checks and later checks see the solved value (check.name references)', () => {
    const text = [
      '```fatigue sized',
      ...base,
      'solve: d for n_f = 2',
      '```',
      '',
      '```fatigue next',
      'Sut = 630 MPa',
      'Sy = 530 MPa',
      'surface: machined',
      'temp = 20 degC',
      'reliability = 0.99',
      'feature: none',
      'd = sized.d',
      'M_max = 180 N*m',
      'M_min = -180 N*m',
      'criterion: goodman',
      '```',
      '',
    ].join('\n');
    const r = evaluateNote(text);
    expect(r.checks.map((c) => c.id)).toEqual(['sized', 'next']);
    expect(r.diagnostics.filter((d) => d.code === 'duplicate-id')).toEqual([]);
    expect(si(r.checks[1], 'n_f')).toBeCloseTo(2, 8);
  });
});
