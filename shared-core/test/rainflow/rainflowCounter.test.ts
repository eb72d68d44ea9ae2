import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  histogramLimitsFor,
  RainflowCounter,
  type RainflowCycle,
  RangeMeanHistogram,
  rainflow,
  turningPoints,
} from '../../src/rainflow';

/** ASTM E1049-85 (Reapproved 2017), Fig. 6: the rainflow example history (peaks and valleys, units). */
const ASTM_FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];

function countsByRange(cycles: RainflowCycle[]): Map<number, number> {
  const m = new Map<number, number>();
  for (const c of cycles) m.set(c.range, (m.get(c.range) ?? 0) + c.count);
  return m;
}

/** Multiset key of (range, mean) -> count, rounded to kill float noise. */
function countsByRangeMean(cycles: RainflowCycle[]): Map<string, number> {
  const m = new Map<string, number>();
  for (const c of cycles) {
    const k = `${c.range.toFixed(9)}|${c.mean.toFixed(9)}`;
    m.set(k, (m.get(k) ?? 0) + c.count);
  }
  return m;
}

/**
 * Reference written literally from the rules of ASTM E1049-85 (2017) 5.4.4.1, kept naive on
 * purpose (arrays, splice, an explicit start-point flag), to check the streaming counter.
 */
function astmReference(history: number[]): RainflowCycle[] {
  // Peaks and valleys: drop plateaus, keep the first and last point and every slope reversal.
  const pv: number[] = [];
  for (const x of history) {
    if (pv.length > 0 && x === pv[pv.length - 1]) continue;
    if (pv.length >= 2) {
      const a = pv[pv.length - 2];
      const b = pv[pv.length - 1];
      if ((b - a) * (x - b) > 0) {
        pv[pv.length - 1] = x; // same direction: b was not a reversal
        continue;
      }
    }
    pv.push(x);
  }
  const out: RainflowCycle[] = [];
  const pts: Array<{ v: number; start: boolean }> = [];
  let i = 0;
  for (;;) {
    // Step 1
    if (i >= pv.length) break;
    pts.push({ v: pv[i++], start: pts.length === 0 && out.length === 0 });
    // Step 2..5
    for (;;) {
      if (pts.length < 3) break;
      const p1 = pts[pts.length - 3];
      const p2 = pts[pts.length - 2];
      const p3 = pts[pts.length - 1];
      const X = Math.abs(p3.v - p2.v);
      const Y = Math.abs(p2.v - p1.v);
      if (X < Y) break;
      if (p1.start || p2.start) {
        out.push({ range: Y, mean: (p1.v + p2.v) / 2, count: 0.5 });
        pts.splice(pts.length - 3, 1);
        p2.start = true;
      } else {
        out.push({ range: Y, mean: (p1.v + p2.v) / 2, count: 1 });
        pts.splice(pts.length - 3, 2);
      }
    }
  }
  // Step 6
  for (let k = 0; k + 1 < pts.length; k++) {
    out.push({ range: Math.abs(pts[k + 1].v - pts[k].v), mean: (pts[k].v + pts[k + 1].v) / 2, count: 0.5 });
  }
  return out;
}

describe('rainflow counting, ASTM E1049-85 (2017) section 5.4.4', () => {
  it('counts the Fig. 6 example as the standard tabulates: range 3: 0.5, 4: 1.5, 6: 0.5, 8: 1.0, 9: 0.5 (ASTM E1049-85 (2017) Fig. 6; same table in the iamlikeme/rainflow test suite)', () => {
    const r = rainflow(ASTM_FIG6);
    const byRange = countsByRange(r.cycles!);
    expect([...byRange.entries()].sort((a, b) => a[0] - b[0])).toEqual([
      [3, 0.5],
      [4, 1.5],
      [6, 0.5],
      [8, 1],
      [9, 0.5],
    ]);
    expect(r.totalCycles).toBe(4);
    expect(r.fullCycles).toBe(1);
    expect(r.halfCycles).toBe(6);
  });

  it('gives the Fig. 6 cycles their means: full (4, 1); halves (3,-0.5) (4,-1) (8,1) (6,1) (8,0) (9,0.5) (ASTM E1049-85 (2017) 5.4.4 as reproduced in the qats.rainflow.cycles_rangemean docstring)', () => {
    const r = rainflow(ASTM_FIG6);
    const full = r.cycles!.filter((c) => c.count === 1).map((c) => [c.range, c.mean]);
    const half = r
      .cycles!.filter((c) => c.count === 0.5)
      .map((c) => [c.range, c.mean])
      .sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    expect(full).toEqual([[4, 1]]);
    expect(half).toEqual(
      [
        [3, -0.5],
        [4, -1],
        [8, 1],
        [6, 1],
        [8, 0],
        [9, 0.5],
      ].sort((a, b) => a[0] - b[0] || a[1] - b[1]),
    );
  });

  it('finds the same turning points when the Fig. 6 history is sampled densely, with plateaus (ASTM E1049-85 (2017) 3.1.5 peak/valley definitions)', () => {
    const dense: number[] = [];
    for (let i = 0; i + 1 < ASTM_FIG6.length; i++) {
      const a = ASTM_FIG6[i];
      const b = ASTM_FIG6[i + 1];
      for (let k = 0; k < 10; k++) dense.push(a + ((b - a) * k) / 10);
      dense.push(b, b); // plateau at each reversal
    }
    expect(turningPoints(dense)).toEqual(ASTM_FIG6);
    expect(countsByRangeMean(rainflow(dense).cycles!)).toEqual(
      countsByRangeMean(rainflow(ASTM_FIG6).cycles!),
    );
  });

  it('matches a literal transcription of the 5.4.4.1 rules on random histories, whatever the chunking (ASTM E1049-85 (2017) 5.4.4.1)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -20, max: 20 }), { minLength: 0, maxLength: 200 }),
        fc.integer({ min: 1, max: 17 }),
        (xs, chunk) => {
          const expected = astmReference(xs);
          const got: RainflowCycle[] = [];
          const c = new RainflowCounter({
            onCycle: (range, mean, count) => got.push({ range, mean, count }),
          });
          for (let i = 0; i < xs.length; i += chunk) c.pushMany(xs.slice(i, i + chunk));
          const res = c.finish();
          expect(got).toEqual(expected);
          expect(res.cycles).toBeUndefined();
        },
      ),
      { numRuns: 400 },
    );
  });

  it('keeps the identity sum(2 * count * range) = total variation of the turning points (algebraic identity of the 5.4.4 rules: removing Y shortens the path by 2Y)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 3, maxLength: 300 }),
        (xs) => {
          const r = rainflow(xs);
          const tp = turningPoints(xs);
          let variation = 0;
          for (let i = 1; i < tp.length; i++) variation += Math.abs(tp[i] - tp[i - 1]);
          expect(2 * r.sumCountRange).toBeCloseTo(variation, 6);
          let s = 0;
          for (const c of r.cycles!) s += 2 * c.count * c.range;
          expect(s).toBeCloseTo(variation, 6);
        },
      ),
    );
  });

  it('counts (turning points - 1) / 2 cycles in all (each reversal is counted once as half a cycle: ASTM E1049-85 (2017) 5.4.4 steps 4-6)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 2, maxLength: 300 }), (xs) => {
        const r = rainflow(xs);
        const n = r.turningPointCount;
        expect(r.totalCycles).toBe(n > 0 ? (n - 1) / 2 : 0);
      }),
    );
  });

  it('counts a closed history the same whether it is rotated to start at its maximum or at its minimum (closed cycles of a repeated history do not depend on where it starts: Downing and Socie, Simple rainflow counting algorithms, Int. J. Fatigue, January 1982; volume/pages from memory)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -30, max: 30 }), { minLength: 4, maxLength: 80 }), (raw) => {
        const tp = turningPoints(raw);
        if (tp.length < 4) return;
        // One period of a repeated history: drop the last point if it repeats the first's role.
        const period = tp.slice(0, tp.length % 2 === 0 ? tp.length : tp.length - 1);
        const closedFrom = (start: number) => {
          const rot = period.slice(start).concat(period.slice(0, start));
          rot.push(rot[0]);
          return rainflow(rot).cycles!;
        };
        let iMax = 0;
        let iMin = 0;
        for (let i = 1; i < period.length; i++) {
          if (period[i] > period[iMax]) iMax = i;
          if (period[i] < period[iMin]) iMin = i;
        }
        expect(countsByRangeMean(closedFrom(iMax))).toEqual(countsByRangeMean(closedFrom(iMin)));
      }),
      { numRuns: 300 },
    );
  });

  it('applies the gate: every counted range is >= gate and ripple below the gate does not change the count (hysteresis filter, common practice, no source)', () => {
    const base = [0, 10, 2, 8, -10, 10, 0];
    const noisy: number[] = [];
    for (let i = 0; i + 1 < base.length; i++) {
      const a = base[i];
      const b = base[i + 1];
      for (let k = 0; k < 20; k++)
        noisy.push(a + ((b - a) * k) / 20 + (k % 2 === 0 ? 0.3 : -0.3) * (k > 0 ? 1 : 0));
    }
    noisy.push(base[base.length - 1]);
    const gated = rainflow(noisy, { gate: 1 });
    expect(countsByRange(gated.cycles!)).toEqual(countsByRange(rainflow(base).cycles!));
    for (const c of rainflow(noisy, { gate: 7 }).cycles!) expect(c.range).toBeGreaterThanOrEqual(7);
    expect(rainflow(noisy).totalCycles).toBeGreaterThan(gated.totalCycles);
  });

  it('holds only the residue: 1e6 iid samples leave a short residue and the stack never grows with the file', () => {
    let seed = 12345;
    const rnd = () => {
      seed = (seed * 1103515245 + 12345) & 0x7fffffff;
      return seed / 0x7fffffff;
    };
    const c = new RainflowCounter();
    let maxHeld = 0;
    for (let i = 0; i < 1_000_000; i++) {
      c.push(rnd() * 2 - 1);
      if (c.residueLength > maxHeld) maxHeld = c.residueLength;
    }
    const r = c.finish();
    expect(r.sampleCount).toBe(1_000_000);
    expect(maxHeld).toBeLessThan(64);
    expect(r.residue.length).toBeLessThan(64);
  });

  it('counts 5 million samples well within a few seconds', () => {
    const xs = new Float64Array(5_000_000);
    let seed = 7;
    for (let i = 0; i < xs.length; i++) {
      seed = (seed * 1103515245 + 12345) & 0x7fffffff;
      xs[i] = Math.sin(i * 0.01) + seed / 0x7fffffff - 0.5;
    }
    const t0 = performance.now();
    const c = new RainflowCounter();
    c.pushMany(xs);
    const r = c.finish();
    const ms = performance.now() - t0;
    expect(r.sampleCount).toBe(5_000_000);
    expect(ms).toBeLessThan(4000);
  });

  it('reports too few points and constant histories instead of failing', () => {
    expect(rainflow([1, 2]).notes.map((n) => n.code)).toContain('history-too-few-points');
    const flat = rainflow([3, 3, 3, 3]);
    expect(flat.totalCycles).toBe(0);
    expect(flat.notes.map((n) => n.code)).toContain('history-no-cycles');
    const withNaN = rainflow([0, Number.NaN, 2, Number.POSITIVE_INFINITY, 0]);
    expect(withNaN.skippedSamples).toBe(2);
    expect(withNaN.totalCycles).toBe(1);
  });
});

describe('range-mean histogram', () => {
  it('bins the Fig. 6 cycles without losing any (ASTM E1049-85 (2017) Fig. 6 counts)', () => {
    const r0 = rainflow(ASTM_FIG6);
    const h = new RangeMeanHistogram(histogramLimitsFor(r0.min, r0.max, 9));
    const c = new RainflowCounter({ onCycle: (r, m, n) => h.add(r, m, n) });
    c.pushMany(ASTM_FIG6);
    c.finish();
    expect(h.total).toBe(4);
    expect(h.outside).toBe(0);
    let sum = 0;
    for (const b of h.nonEmpty()) sum += b.count;
    expect(sum).toBe(4);
    // Ranges 8 (1 cycle: means 1 and 0) and 9 (0.5, mean 0.5) fall in the last range bin [8, 9]:
    // mean bin [0, 1) holds 0.5 + 0.5, mean bin [1, 2) holds 0.5.
    const last = h.nonEmpty().filter((b) => b.rangeHigh === 9);
    expect(last.map((b) => [b.meanLow, b.count])).toEqual([
      [0, 1],
      [1, 0.5],
    ]);
    expect(h.matrix().length).toBe(9);
  });
});
