/**
 * The local stress-strain path with memory, on the rainflow example history of ASTM E1049-85
 * (Reapproved 2017), Fig. 6 (-2, 1, -3, 5, -1, 3, -4, 4, -2, in units of nominal stress):
 * re-ordered to start at its largest peak (5), its closed loops are (-1, 3), (-2, 1), (4, -3) and
 * (5, -4) (hand trace below). Each point of the path is recomputed in the test by Neuber's rule
 * solved with an independent bisection, from the point its branch is measured from.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { findMaterial } from '../../src/materials';
import { rainflow } from '../../src/rainflow';
import {
  type CyclicCurve,
  type LocalPath,
  type PathOptions,
  pathCurve,
  pathSteps,
  traceHistory,
  traceSpectrum,
} from '../../src/strainlife';
import { type Curve, masingStrain, neuberPoint, neuberRange } from './independent';

const ASTM_FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];
const reversals = (p: LocalPath) => p.points.filter((q) => q.kind === 'reversal');

// RQC-100: K' = 903 MPa, n' = 0.0905, E = 200 GPa (Dowling, Mechanical Behavior of Materials,
// 4th ed., Table 14.1, from memory); Sy = 683 MPa (Table 9.1, looked up).
const rqc = findMaterial('rqc-100')!;
const curve: CyclicCurve = { E: rqc.cyclic!.E, K_prime: rqc.cyclic!.K_prime, n_prime: rqc.cyclic!.n_prime };
const ref: Curve = { E: curve.E, K: curve.K_prime, n: curve.n_prime };
const Kt = 2.5;
const opts: PathOptions = { curve, rule: 'neuber', K: Kt, factor: 'Kt', Sy: rqc.Sy };

/** Hand trace of the re-ordered Fig. 6 block with unit u (Pa): points 5, -1, 3, -4, 4, -2, 1, -3, 5. */
function handTrace(u: number) {
  const p5 = neuberPoint(ref, Kt * 5 * u);
  const from = (o: { sigma: number; eps: number }, dUnits: number) => {
    const r = neuberRange(ref, Kt * Math.abs(dUnits) * u);
    const s = Math.sign(dUnits);
    return { sigma: o.sigma + s * r.dSigma, eps: o.eps + s * r.dEps };
  };
  const m1 = from(p5, -6); // 5 -> -1
  const p3 = from(m1, 4); // -1 -> 3
  const m4 = from(p5, -9); // -4 passes -1: loop (-1, 3) closes, the branch from 5 goes on
  const p4 = from(m4, 8); // -4 -> 4
  const m2 = from(p4, -6); // 4 -> -2
  const p1 = from(m2, 3); // -2 -> 1
  const m3 = from(p4, -7); // -3 passes -2: loop (-2, 1) closes, the branch from 4 goes on
  const p5b = from(m4, 9); // 5 passes 4: loop (4, -3) closes; the branch from -4 reaches 5: loop (5, -4) closes
  return {
    points: [p5, m1, p3, m4, p4, m2, p1, m3, p5b],
    loops: [
      [m1, p3],
      [m2, p1],
      [p4, m3],
      [p5, m4],
    ],
  };
}

describe('local path with memory on the ASTM E1049 Fig. 6 history', () => {
  it('re-orders the history to start at its largest peak and returns to it', () => {
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * MPA),
      opts,
    );
    expect(reversals(path).map((p) => p.S / MPA)).toEqual([5, -1, 3, -4, 4, -2, 1, -3, 5]);
    // With the points where the path passes an earlier reversal again (loop closures, memory).
    expect(path.points.map((p) => `${p.S / MPA}${p.kind === 'closure' ? 'c' : ''}`)).toEqual([
      '5',
      '-1',
      '3',
      '-1c',
      '-4',
      '4',
      '-2',
      '1',
      '-2c',
      '-3',
      '4c',
      '5',
    ]);
    expect(path.S_peak / MPA).toBe(5);
  });

  it('elastic notch (1 kPa units): the loops are the rainflow ranges 4, 3, 7, 9 (hand trace) times Kt/E', () => {
    const u = 1e3;
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * u),
      opts,
    );
    expect(path.loops.map((l) => l.dS / u)).toEqual([4, 3, 7, 9]);
    for (const l of path.loops) expect(l.dEps / ((Kt * l.dS) / curve.E)).toBeCloseTo(1, 9);
  });

  it('plastic notch (50 MPa units): every point matches the hand trace with Neuber solved by bisection in the test', () => {
    const u = 50 * MPA;
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * u),
      opts,
    );
    const hand = handTrace(u);
    const rev = reversals(path);
    expect(rev.length).toBe(9);
    rev.forEach((p, i) => {
      expect(p.sigma / MPA).toBeCloseTo(hand.points[i].sigma / MPA, 6);
      expect(p.eps).toBeCloseTo(hand.points[i].eps, 11);
    });
    // Plastic indeed: the first peak's strain is beyond the elastic Kt S / E.
    expect(path.points[0].eps).toBeGreaterThan(((Kt * 5 * u) / curve.E) * 1.05);
    // Memory: -4 is reached on the branch from 5, -3 on the branch from 4, the last 5 on the branch from -4.
    expect(path.points[4].origin).toBe(0);
    expect(path.points[9].origin).toBe(5);
    expect(path.points[11].origin).toBe(4);
    // A closure point is exactly the earlier reversal's state, reached on the branch from the loop's other end.
    expect(path.points[3]).toMatchObject({
      sigma: path.points[1].sigma,
      eps: path.points[1].eps,
      origin: 2,
      closes: 1,
    });
    expect(path.points[10]).toMatchObject({
      sigma: path.points[5].sigma,
      eps: path.points[5].eps,
      origin: 9,
      closes: 5,
    });
    // ... and lies on that branch: the Masing range from 3 down to -1, solved in the test.
    const r = neuberRange(ref, Kt * 4 * u);
    expect(path.points[3].sigma / MPA).toBeCloseTo((path.points[2].sigma - r.dSigma) / MPA, 6);
  });

  it('the closed loops and their local max/mean stresses match the hand trace', () => {
    const u = 50 * MPA;
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * u),
      opts,
    );
    const hand = handTrace(u);
    expect(path.loops.length).toBe(4);
    path.loops.forEach((l, i) => {
      const [a, b] = hand.loops[i];
      expect(l.dEps).toBeCloseTo(Math.abs(b.eps - a.eps), 11);
      expect(l.sigma_max / MPA).toBeCloseTo(Math.max(a.sigma, b.sigma) / MPA, 6);
      expect(l.sigma_m / MPA).toBeCloseTo((a.sigma + b.sigma) / 2 / MPA, 6);
      expect(l.count).toBe(1);
    });
  });

  it('the loop closes on itself: back at the first peak, stress and strain are those of the first loading (Masing)', () => {
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * 50 * MPA),
      opts,
    );
    const first = path.points[0];
    const last = path.points[path.points.length - 1];
    expect(last.sigma / first.sigma).toBeCloseTo(1, 10);
    expect(last.eps / first.eps).toBeCloseTo(1, 10);
  });

  it("the loops are the rainflow cycles of the local strains: the project's ASTM E1049 counter on the path's strains gives the same ranges", () => {
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * 50 * MPA),
      opts,
    );
    const rf = rainflow(reversals(path).map((p) => p.eps));
    const counted = new Map<string, number>();
    for (const c of rf.cycles!)
      counted.set(c.range.toPrecision(9), (counted.get(c.range.toPrecision(9)) ?? 0) + c.count);
    const loops = new Map<string, number>();
    for (const l of path.loops) loops.set(l.dEps.toPrecision(9), (loops.get(l.dEps.toPrecision(9)) ?? 0) + 1);
    expect(counted).toEqual(loops);
  });

  it('steps describe the path point by point, and the drawing curve passes through every point', () => {
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * 50 * MPA),
      opts,
    );
    const steps = pathSteps(path, 'neuber');
    expect(steps[0]).toMatch(/^1: S = 250 MPa, first loading on the cyclic curve \(Neuber\)/);
    expect(steps[3]).toMatch(/reaches point 2 again: the loop \(2, 3\) closes/);
    expect(steps[4]).toMatch(/Masing branch from point 1/);
    const pts = pathCurve(path, curve, 8);
    expect(pts.length).toBe(1 + 8 * path.points.length);
    path.points.forEach((p, i) => {
      expect(pts[(i + 1) * 8][0]).toBeCloseTo(p.sigma, 3);
      expect(pts[(i + 1) * 8][1]).toBeCloseTo(p.eps, 14);
    });
    for (const [s, e] of pts) expect(Number.isFinite(s) && Number.isFinite(e)).toBe(true);
  });
});

describe('drawing the loops', () => {
  it('the last segment (from the closure at 4 up to 5) follows the Masing branch from -4, not the cyclic curve', () => {
    const path = traceHistory(
      ASTM_FIG6.map((x) => x * 50 * MPA),
      opts,
    );
    const n = 10;
    const pts = pathCurve(path, curve, n);
    const o = path.points[4]; // -4
    for (let i = 1; i < n; i++) {
      const [sigma, eps] = pts[11 * n + i];
      expect(eps).toBeCloseTo(o.eps + masingStrain(ref, sigma - o.sigma), 12);
    }
  });
});

describe('spectrum and overloads', () => {
  it('a level alone is the constant-amplitude loop', () => {
    const a = traceSpectrum([{ S_max: 250 * MPA, S_min: -250 * MPA, count: 1 }], opts).loops[0];
    const b = traceHistory([250 * MPA, -250 * MPA, 250 * MPA], opts).loops[0];
    expect(a.dEps).toBeCloseTo(b.dEps, 14);
    expect(a.sigma_m).toBeCloseTo(b.sigma_m, 4);
  });

  it('an overload first: the small loops hang from its descending branch, as in the history with the overload first', () => {
    const levels = [
      { S_max: 250 * MPA, S_min: 0, count: 1 },
      { S_max: 100 * MPA, S_min: 0, count: 2 },
    ];
    const spec = traceSpectrum(levels, opts);
    const hist = traceHistory(
      [0, 250, 0, 100, 0, 100, 0].map((x) => x * MPA),
      opts,
    );
    const small = spec.loops[1];
    const fromHist = hist.loops.find((l) => Math.abs(l.dS - 100 * MPA) < 1)!;
    expect(small.count).toBe(2);
    expect(small.sigma_max / MPA).toBeCloseTo(fromHist.sigma_max / MPA, 6);
    expect(small.dEps).toBeCloseTo(fromHist.dEps, 12);
    // Hand trace: top on the cyclic curve, down by Delta S = 250, up by 100.
    const top = neuberPoint(ref, Kt * 250 * MPA);
    const down = neuberRange(ref, Kt * 250 * MPA);
    const up = neuberRange(ref, Kt * 100 * MPA);
    expect(small.sigma_min / MPA).toBeCloseTo((top.sigma - down.dSigma) / MPA, 6);
    expect(small.sigma_max / MPA).toBeCloseTo((top.sigma - down.dSigma + up.dSigma) / MPA, 6);
    // The overload leaves a compressive local stress at zero load.
    expect(small.sigma_min).toBeLessThan(0);
  });

  it('a compressive largest peak loads first in compression, and the envelope top is reached on the Masing curve', () => {
    const spec = traceSpectrum([{ S_max: 100 * MPA, S_min: -250 * MPA, count: 5 }], opts);
    expect(spec.S_peak / MPA).toBe(-250);
    expect(spec.points[0].sigma).toBeLessThan(0);
    const first = neuberPoint(ref, -Kt * 250 * MPA);
    const r = neuberRange(ref, Kt * 350 * MPA);
    expect(spec.loops[0].sigma_max / MPA).toBeCloseTo((first.sigma + r.dSigma) / MPA, 6);
  });
});

describe('diagnostics and odd histories', () => {
  it('too few points, no reversal, non-finite samples', () => {
    expect(traceHistory([1], opts).notes[0].code).toBe('history-too-few-points');
    expect(traceHistory([5, 5, 5], opts).notes.some((n) => n.code === 'history-no-cycles')).toBe(true);
    const p = traceHistory([0, Number.NaN, 100 * MPA, 0], opts);
    expect(p.notes.some((n) => n.code === 'history-non-finite')).toBe(true);
    expect(p.loops.length).toBe(1);
  });

  it('general yielding of the net section is an error note on the path', () => {
    const p = traceHistory([0, 700 * MPA, 0], opts);
    expect(p.notes.some((n) => n.code === 'general-yield' && n.severity === 'error')).toBe(true);
  });

  it('keeps at most maxPathPoints for drawing but counts every loop', () => {
    const h = Array.from({ length: 2001 }, (_, i) => (i % 2 === 0 ? 0 : (100 + (i % 7)) * MPA));
    const p = traceHistory(h, { ...opts, maxPathPoints: 50 });
    expect(p.points.length).toBe(50);
    expect(p.truncated).toBe(true);
    expect(p.notes.some((n) => n.code === 'path-truncated')).toBe(true);
    expect(p.loops.length).toBe(1000);
  });
});

describe('properties (fast-check)', () => {
  // Nominal stresses in MPa with 1 kPa resolution (the test's own bisection is not built for loads near underflow).
  const history = fc.array(
    fc.integer({ min: -300_000, max: 300_000 }).map((i) => i / 1000),
    { minLength: 3, maxLength: 80 },
  );
  it('finite everywhere, closes back at the first peak, (points - 1)/2 loops, each loop on the Masing curve for its nominal range', () => {
    fc.assert(
      fc.property(history, fc.constantFrom<'neuber' | 'glinka'>('neuber', 'glinka'), (h, rule) => {
        const p = traceHistory(
          h.map((x) => x * MPA),
          { ...opts, rule },
        );
        if (p.points.length === 0) return;
        for (const q of p.points) expect(Number.isFinite(q.sigma) && Number.isFinite(q.eps)).toBe(true);
        const rev = reversals(p);
        const first = rev[0];
        const last = rev[rev.length - 1];
        expect(Math.abs(last.eps - first.eps)).toBeLessThan(1e-9 * Math.max(1e-6, Math.abs(first.eps)));
        expect(p.loops.length).toBe((rev.length - 1) / 2);
        if (rule === 'neuber')
          for (const l of p.loops) {
            const r = neuberRange(ref, Kt * l.dS);
            expect(Math.abs(l.dEps - r.dEps)).toBeLessThanOrEqual(1e-8 * r.dEps + 1e-200);
          }
      }),
      { numRuns: 200 },
    );
  });

  it("the loops' nominal ranges are the rainflow cycles of the re-ordered nominal block (the project's ASTM E1049 counter)", () => {
    fc.assert(
      fc.property(history, (h) => {
        const p = traceHistory(
          h.map((x) => x * MPA),
          opts,
        );
        if (p.points.length === 0) return;
        const rf = rainflow(reversals(p).map((q) => q.S));
        const total = rf.cycles!.reduce((s, c) => s + c.count * c.range, 0);
        const loops = p.loops.reduce((s, l) => s + l.dS, 0);
        expect(loops / total).toBeCloseTo(1, 10);
        expect(Math.max(...p.loops.map((l) => l.dS))).toBeCloseTo(rf.maxRange, 3);
        expect(p.loops.length).toBeCloseTo(rf.totalCycles, 10);
      }),
      { numRuns: 200 },
    );
  });
});
