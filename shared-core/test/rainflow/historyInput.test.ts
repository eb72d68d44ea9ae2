/**
 * The history reader and the rainflow counter on input that breaks the rules (issue 16).
 * The rules are the project's own (docs/language.md, docs/diagnostics.md; common practice of
 * logger files, no source): a sample that cannot be read as a finite load is an error with
 * its line, never a silent drop.
 */
import { describe, expect, it } from 'vitest';
import { type HistoryCsvOptions, HistoryCsvReader, rainflow } from '../../src/rainflow';

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
