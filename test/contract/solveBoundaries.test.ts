/**
 * Design mode where a method changes range: the chart fits' range boundaries (joined by the
 * project where the source's chart is continuous) and the published equations that step
 * (Shigley Eq. 6-20 at 51 mm / 2 in, Eq. 6-27 at 70 degF). Every solved value is checked
 * against an independent evaluation of the same check with the answer stated; every
 * "closest" value against a dense scan made here.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CheckResult } from '../../shared-core/src';
import { SOLVE_BUDGET, SOLVE_TOLERANCE } from '../../shared-core/src/design/solve';
import { check, errors, si } from './helpers';

const MM = 1e-3;
const INCH = 0.0254;

/** The check with `name = x m` (or K, ...) stated in SI at full precision. */
function at(lines: string[], name: string, x: number, unit = 'm'): CheckResult {
  return check([...lines, `${name} = ${x} ${unit}`]);
}

function noRoot(c: CheckResult) {
  return c.diagnostics.find((d) => d.code === 'solve-no-root');
}

/** Evaluations the solver reports in the derivation of the solved input. */
function evaluations(c: CheckResult, name: string): number {
  return c.values[name].terms?.find((t) => t.name === 'evaluations of the check')?.value ?? Number.NaN;
}

/** A rotating shaft with a shoulder fillet, D and r in proportion to d (stated after d). */
function filletShaft(Dd: number, rd: number, M: number, T: number): { head: string[]; tail: string[] } {
  return {
    head: [
      'Sut = 630 MPa',
      'Sy = 530 MPa',
      'surface: machined',
      'temp = 20 degC',
      'reliability = 0.99',
      'feature: shoulder-fillet',
      `M_max = ${M} N*m`,
      `M_min = ${-M} N*m`,
      `T_max = ${T} N*m`,
      `T_min = ${T} N*m`,
      'criterion: goodman',
    ],
    tail: [`D = ${Dd} * d`, `r = ${rd} * d`],
  };
}

describe('solve at the h/r = 2 boundary of the shoulder-fillet fit (Pilkey, Peterson SCF 3rd ed., Charts 3.4, 3.10)', () => {
  // D = 1.2 d, r = 0.05 d puts h/r at exactly 2, where the two published ranges of the fit
  // meet; rounding put h/r on either side of 2 from one trial d to the next, so Kt stepped by
  // 0.1 % (bending) to 0.3 % (tension) back and forth. Before the join (commit 07b0762), with
  // the loads below, `solve: d for n_f = T` reported "no root" for T = 1.8, 2 and 2.5
  // (D = 1.2 d, r = 0.05 d), T = 1.2, 2 and 2.5 (D = 1.5 d, r = 0.125 d) and T = 2.2
  // (D = 1.1 d, r = 0.025 d), each with a "closest" value that was only the nearest scan
  // point. D = 2 d, r = 0.25 d (h/r = 2 too) and D = 1.2 d, r = 0.04 d (h/r = 2.5) happened to
  // pass.
  const proportions: Array<[number, number]> = [
    [1.2, 0.05],
    [1.5, 0.125],
    [2, 0.25],
    [1.1, 0.025],
    [1.2, 0.04],
  ];
  const targets = [1.2, 1.5, 1.8, 2, 2.2, 2.5, 3];
  for (const [Dd, rd] of proportions) {
    it(`D = ${Dd} d, r = ${rd} d: every target is met, and the check with the answer stated meets it too`, () => {
      const { head, tail } = filletShaft(Dd, rd, 180, 250);
      for (const target of targets) {
        const c = check([...head, ...tail, `solve: d for n_f = ${target}`]);
        expect(errors(c), `n_f = ${target}`).toEqual([]);
        const d = si(c, 'd');
        const again = check([...head, `d = ${d} m`, ...tail]);
        const nf = si(again, 'n_f');
        expect(Math.abs(nf - target) / target, `n_f = ${target}`).toBeLessThanOrEqual(SOLVE_TOLERANCE);
        // On the side of the (default) requirement n_f >= target.
        expect(nf, `n_f = ${target}`).toBeGreaterThanOrEqual(target);
      }
    });
  }
});

describe("a published equation that steps: the size factor kb of Shigley's MED 9th ed., Eq. 6-20", () => {
  // Rotating shaft without a notch: n_f = Se / sigma_a carries kb's step at d = 51 mm, where
  // 1.24 d^-0.107 = 0.81416 and 1.51 d^-0.157 = 0.81450 (d in mm): a step of 0.041 %, left as
  // published.
  const plain = (M: number) => [
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'feature: none',
    `M_max = ${M} N*m`,
    `M_min = ${-M} N*m`,
    'criterion: goodman',
  ];

  it('a target inside the step: no root, a jump reported with both sides, its cause, and the nearer side shown', () => {
    const base = plain(2000);
    const below = si(at(base, 'd', 0.051 * (1 - 1e-9)), 'n_f');
    const above = si(at(base, 'd', 0.051 * (1 + 1e-9)), 'n_f');
    expect(above).toBeGreaterThan(below);
    // A quarter of the way up the step: the lower side is the nearer.
    const target = below + 0.25 * (above - below);
    const c = check([...base, `solve: d for n_f = ${target}`]);
    const d = noRoot(c);
    expect(d?.severity).toBe('error');
    expect(d?.message).toMatch(/jumps across the target at d = 51 mm/);
    expect(d?.message).toContain(
      `from n_f = ${below.toPrecision(6)} just below to ${above.toPrecision(6)} just above`,
    );
    expect(d?.message).toContain('`kb` changes from `kb = 1.24 * d^-0.107');
    expect(d?.message).toContain('`kb = 1.51 * d^-0.157');
    expect(d?.message).toMatch(/the boundary between two ranges of its method/);
    expect(d?.message).toMatch(/just below the jump \(shown\)$/);
    // The value shown is the lower side of the step, within the root finder's tolerance on d.
    expect(Math.abs(si(c, 'd') - 0.051)).toBeLessThan(1e-9);
    expect(Math.abs(si(c, 'n_f') - below)).toBeLessThan(1e-7 * below);
    expect(c.values.d.source).toMatch(/Brent.*ch\. 5/);
    expect(evaluations(c, 'd')).toBeLessThanOrEqual(SOLVE_BUDGET);
  });

  it('a target just off one side of the step, within the tolerance, is a root', () => {
    const base = plain(2000);
    const above = si(at(base, 'd', 0.051 * (1 + 1e-9)), 'n_f');
    const target = above * (1 - 0.5 * SOLVE_TOLERANCE);
    const c = check([...base, `solve: d for n_f = ${target}`]);
    expect(errors(c)).toEqual([]);
    expect(Math.abs(si(c, 'n_f') - target) / target).toBeLessThanOrEqual(SOLVE_TOLERANCE);
    expect(Math.abs(si(c, 'd') - 0.051)).toBeLessThan(1e-8);
  });

  it('the inch form steps by 2.3e-6 at 2 in (0.879 d^-0.107 = 0.816166, 0.91 d^-0.157 = 0.816168): inside the tolerance, so a target in it is a root', () => {
    const base = [
      'Sut = 91 ksi',
      'Sy = 77 ksi',
      'surface: machined',
      'temp = 70 degF',
      'reliability = 0.5',
      'feature: none',
      'M_max = 12000 lbf*in',
      'M_min = -12000 lbf*in',
      'criterion: goodman',
    ];
    const below = si(at(base, 'd', 2 * (1 - 1e-9), 'in'), 'n_f');
    const above = si(at(base, 'd', 2 * (1 + 1e-9), 'in'), 'n_f');
    expect(Math.abs(above - below) / below).toBeGreaterThan(1e-6);
    expect(Math.abs(above - below) / below).toBeLessThan(SOLVE_TOLERANCE);
    const target = 0.5 * (below + above);
    const c = check([...base, `solve: d for n_f = ${target}`]);
    expect(errors(c)).toEqual([]);
    expect(Math.abs(si(c, 'd') / INCH - 2)).toBeLessThan(1e-6);
    expect(Math.abs(si(c, 'n_f') - target) / target).toBeLessThanOrEqual(SOLVE_TOLERANCE);
  });

  it('property: inside the step, no root, and the closest value is no worse than a dense independent scan', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 300, max: 4000, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9, noNaN: true }),
        (M, theta) => {
          const base = plain(Number(M.toPrecision(6)));
          const below = si(at(base, 'd', 0.051 * (1 - 1e-9)), 'n_f');
          const above = si(at(base, 'd', 0.051 * (1 + 1e-9)), 'n_f');
          const target = below + theta * (above - below);
          const c = check([...base, `solve: d for n_f = ${target}`]);
          expect(noRoot(c)?.severity).toBe('error');
          const shown = Math.abs(si(at(base, 'd', si(c, 'd')), 'n_f') - target);
          // Dense scan: 300 log-spaced points over the searched 0.1 mm .. 5 m, 200 over 50 .. 52 mm.
          const xs = [
            ...Array.from({ length: 300 }, (_, i) => 1e-4 * (5 / 1e-4) ** (i / 299)),
            ...Array.from({ length: 200 }, (_, i) => 0.05 + (0.002 * i) / 199),
          ];
          for (const x of xs) {
            const v = at(base, 'd', x).values.n_f;
            if (v?.si === null || v?.si === undefined) continue;
            expect(shown).toBeLessThanOrEqual(Math.abs(v.si - target) * (1 + 1e-9) + 1e-15);
          }
        },
      ),
      { numRuns: 3 },
    );
  });
});

describe('no root: the closest point is a refined minimum of |result - target|', () => {
  const base = [
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'reliability = 0.99',
    'feature: none',
    'd = 35 mm',
    'M_max = 180 N*m',
    'M_min = -180 N*m',
    'criterion: goodman',
  ];
  /** kd of Shigley's MED 9th ed., Eq. 6-27, T in degF, typed here from the book. */
  const kd = (TF: number) =>
    0.975 + 0.432e-3 * TF - 0.115e-5 * TF ** 2 + 0.104e-8 * TF ** 3 - 0.595e-12 * TF ** 4;
  const dkd = (TF: number) => 0.432e-3 - 0.23e-5 * TF + 0.312e-8 * TF ** 2 - 2.38e-12 * TF ** 3;

  it('kd = 1.05 is above the maximum of Eq. 6-27: the closest is that maximum (found here by bisection on dkd/dT = 0)', () => {
    let lo = 100;
    let hi = 500;
    for (let i = 0; i < 100; i++) {
      const m = 0.5 * (lo + hi);
      if (dkd(m) > 0) lo = m;
      else hi = m;
    }
    const TF = 0.5 * (lo + hi);
    const TC = (TF - 32) / 1.8;
    const c = check([...base, 'solve: temp for kd = 1.05']);
    expect(noRoot(c)?.message).toMatch(/the closest is kd = 1\.025 at temp = 128\.\d degC \(shown\)$/);
    expect(Math.abs(si(c, 'kd') - kd(TF))).toBeLessThan(1e-9);
    // A flat maximum: its place is known to about sqrt(1e-9) of the range.
    expect(Math.abs(si(c, 'temp') - 273.15 - TC)).toBeLessThan(0.5);
    expect(evaluations(c, 'temp')).toBeLessThanOrEqual(SOLVE_BUDGET);
  });

  it('property: n_f over temp, a target above its maximum: the closest is no worse than a dense independent scan', () => {
    const Ts = Array.from({ length: 400 }, (_, i) => 223.15 + (650 * i) / 399);
    const scan = Ts.map((T) => si(at(base, 'temp', T - 273.15, 'degC'), 'n_f'));
    const top = Math.max(...scan);
    fc.assert(
      fc.property(fc.double({ min: 0.002, max: 0.3, noNaN: true }), (excess) => {
        const target = top * (1 + excess);
        const c = check([...base, `solve: temp for n_f = ${target}`]);
        expect(noRoot(c)?.severity).toBe('error');
        const shown = Math.abs(si(at(base, 'temp', si(c, 'temp') - 273.15, 'degC'), 'n_f') - target);
        for (const v of scan) expect(shown).toBeLessThanOrEqual(Math.abs(v - target) * (1 + 1e-9));
        // Refined, not a scan point of the solver's own: at the maximum of n_f, where kd peaks.
        expect(Math.abs(si(c, 'temp') - 273.15 - 128.1)).toBeLessThan(0.5);
      }),
      { numRuns: 4 },
    );
  });
});

describe('property: solve meets any reachable target (shoulder-fillet shafts of random proportions and loads)', () => {
  it('the target is n_f of the same check at a random d; the solved d meets it within the tolerance', () => {
    let runs = 0;
    fc.assert(
      fc.property(
        fc.double({ min: 1.05, max: 2.5, noNaN: true }),
        fc.double({ min: 0.02, max: 0.25, noNaN: true }),
        fc.double({ min: 20, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 3000, noNaN: true }),
        fc.double({ min: Math.log(8), max: Math.log(200), noNaN: true }),
        (Dd, rd, M, T, lnd) => {
          const { head, tail } = filletShaft(
            Number(Dd.toPrecision(4)),
            Number(rd.toPrecision(3)),
            Number(M.toPrecision(4)),
            Number(T.toPrecision(4)),
          );
          const dStar = Math.exp(lnd) * MM;
          const target = si(check([...head, `d = ${dStar} m`, ...tail]), 'n_f');
          const c = check([...head, ...tail, `solve: d for n_f = ${target}`]);
          runs++;
          expect(errors(c)).toEqual([]);
          const nf = si(check([...head, `d = ${si(c, 'd')} m`, ...tail]), 'n_f');
          expect(Math.abs(nf - target) / target).toBeLessThanOrEqual(SOLVE_TOLERANCE);
        },
      ),
      { numRuns: 12 },
    );
    expect(runs).toBe(12);
  });
});
