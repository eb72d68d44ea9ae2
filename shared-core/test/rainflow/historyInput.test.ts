/**
 * The history reader and the rainflow counter on input that breaks the rules (issue 16).
 * The rules are the project's own (docs/language.md, docs/diagnostics.md; common practice of
 * logger files, no source): a sample that cannot be read as a finite load is an error with
 * its line, never a silent drop.
 */
import { describe, expect, it } from 'vitest';
import {
  type HistoryCsvOptions,
  HistoryCsvReader,
  RainflowCounter,
  rainflow,
  scaledSpreadProblem,
  turningPoints,
} from '../../src/rainflow';

function read(text: string, opts: Omit<HistoryCsvOptions, 'onValue'> = {}) {
  const values: number[] = [];
  const lines: number[] = [];
  const r = new HistoryCsvReader({
    ...opts,
    onValue: (x, line) => {
      values.push(x);
      lines.push(line);
    },
  });
  r.feed(text);
  r.end();
  return { r, values, lines };
}

describe('samples that are not finite numbers (item 1)', () => {
  it('an overflowing number, inf and nan are errors history-non-finite with their line; a word is csv-non-numeric', () => {
    const { r, values } = read('load\n1\n1e309\n-1E+400\ninf\n-Infinity\nNaN\n"nan"\n1.#INF\nabc\n2\n-1\n');
    expect(values).toEqual([1, 2, -1]);
    const nf = r.issues.filter((i) => i.code === 'history-non-finite');
    expect(nf.map((i) => i.line)).toEqual([3, 4, 5, 6, 7, 8, 9]);
    expect(nf.every((i) => i.severity === 'error')).toBe(true);
    expect(nf[0].message).toContain('"1e309"');
    expect(nf[0].message).toContain('largest number');
    const words = r.issues.filter((i) => i.code === 'csv-non-numeric');
    expect(words.map((i) => [i.line, i.severity])).toEqual([[10, 'error']]);
    expect(r.badRowCount).toBe(8);
    expect(r.nonFiniteRowCount).toBe(7);
  });

  it('a value that underflows is a finite zero, not an error (IEEE 754 rounding)', () => {
    const { r, values } = read('load\n1e-400\n1\n-1\n');
    expect(values).toEqual([0, 1, -1]);
    expect(r.badRowCount).toBe(0);
  });

  it('blank lines and a header are not errors', () => {
    const { r, values } = read('load [kN]\n\n1\n\n-1\n2\n\n');
    expect(values).toEqual([1, -1, 2]);
    expect(r.issues.filter((i) => i.severity !== 'information')).toEqual([]);
    expect(r.badRowCount).toBe(0);
  });

  it('the counter makes a non-finite sample an error, not a warning: the count misses it', () => {
    const withNaN = rainflow([0, Number.NaN, 2, Number.POSITIVE_INFINITY, 0]);
    expect(withNaN.skippedSamples).toBe(2);
    const note = withNaN.notes.find((n) => n.code === 'history-non-finite');
    expect(note?.severity).toBe('error');
  });
});

describe('ranges and sums that would overflow (item 2)', () => {
  const MAX = Number.MAX_VALUE;

  it('samples of one sign near the largest number: ranges and means stay finite (mean = a/2 + b/2)', () => {
    const r = rainflow([1.5e308, 1.7e308, 1.6e308, 1.7e308, 1.5e308]);
    expect(r.notes.filter((n) => n.severity === 'error')).toEqual([]);
    for (const c of r.cycles!) {
      expect(Number.isFinite(c.range)).toBe(true);
      expect(Number.isFinite(c.mean)).toBe(true);
    }
    // The residue 1.5e308 -> 1.7e308 -> 1.5e308 and the closed cycle 1.7e308 <-> 1.6e308
    // (ASTM E1049-85 (2017) 5.4.4 three-point rule, by hand): means 1.6e308 and 1.65e308.
    const means = r.cycles!.map((c) => c.mean).sort((a, b) => a - b);
    expect(means[0] / 1.6e308).toBeCloseTo(1, 12);
    expect(means[means.length - 1] / 1.65e308).toBeCloseTo(1, 12);
  });

  it('a spread beyond the largest number stops the count with an error at that sample; nothing non-finite is emitted', () => {
    const emitted: number[] = [];
    const c = new RainflowCounter({ onCycle: (range, mean) => emitted.push(range, mean) });
    const accepted = [0, 1.5e308, 1e308, 1.5e308, -1.5e308, 0, 1].map((x) => c.push(x));
    expect(accepted).toEqual([true, true, true, true, false, false, false]);
    const r = c.finish();
    expect(r.overflowAt).toBe(5);
    const note = r.notes.find((n) => n.code === 'history-overflow');
    expect(note?.severity).toBe('error');
    expect(note?.message).toContain('Sample 5 (-1.5e+308)');
    expect(r.notes.map((n) => n.code)).not.toContain('history-too-few-points');
    expect(emitted.length).toBeGreaterThan(0);
    for (const x of emitted) expect(Number.isFinite(x)).toBe(true);
    expect(r.maxRange).toBeLessThanOrEqual(MAX);
    expect(r.max - r.min).toBeLessThanOrEqual(MAX);
  });

  it('the residue limit stops a history whose reversals keep shrinking, instead of growing without bound', () => {
    // 100, -99, 98, -97 ...: every range is smaller than the one before, so rule (3) of
    // ASTM E1049-85 (2017) 5.4.4 never closes a cycle and every point stays in the residue.
    const xs: number[] = [];
    for (let i = 100; i >= 1; i--) xs.push(i % 2 ? -i : i);
    const unlimited = rainflow(xs);
    expect(unlimited.residue).toHaveLength(100);
    const c = new RainflowCounter({ maxResidue: 10 });
    const accepted = xs.map((x) => c.push(x));
    const r = c.finish();
    expect(accepted.filter(Boolean).length).toBe(r.sampleCount);
    expect(r.overflowAt).toBe(r.sampleCount);
    expect(r.residue.length).toBeLessThanOrEqual(12);
    expect(r.notes.find((n) => n.code === 'history-overflow')?.severity).toBe('error');
  });

  it('an infinite gate (a gate over a vanishing scale) drops every reversal instead of none', () => {
    expect(turningPoints([0, 1, -1, 1e300, -1e300], Number.POSITIVE_INFINITY)).toEqual([]);
    expect(turningPoints([0, 1, -1], Number.NaN)).toEqual([0, 1, -1]);
  });

  it('scaledSpreadProblem: the spread of the file, then the scaled stresses, then their underflow', () => {
    expect(scaledSpreadProblem(-1.5e308, 1.5e308, 1, 1, 'h.csv')).toMatchObject({
      code: 'history-overflow',
      on: 'history',
    });
    expect(scaledSpreadProblem(-1, 1, 1e308, 1, 'h.csv')).toMatchObject({
      code: 'history-overflow',
      on: 'scale',
    });
    expect(scaledSpreadProblem(-1, 1e300, 1, 1e10, 'h.csv')).toMatchObject({
      code: 'history-overflow',
      on: 'scale',
    });
    expect(scaledSpreadProblem(-1, 1, 1e-320, 1e-320, 'h.csv')).toMatchObject({
      code: 'absurd-value',
      on: 'scale',
    });
    expect(scaledSpreadProblem(-1, 1, 0, 0, 'h.csv')).toMatchObject({ code: 'absurd-value', on: 'scale' });
    // A constant history (no spread) and ordinary numbers are fine.
    expect(scaledSpreadProblem(3, 3, 1e-320, 1e-320, 'h.csv')).toBeUndefined();
    expect(scaledSpreadProblem(-250, 400, 2.4e5, 2.4e5, 'h.csv')).toBeUndefined();
  });
});
