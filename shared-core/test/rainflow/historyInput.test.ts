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
  MAX_HISTORY_LINE,
  parseHistoryNumber,
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

/** UTF-16 bytes of `text`, little- or big-endian, with or without a byte-order mark (per the Unicode Standard, Sec. 3.10). */
function utf16(text: string, bigEndian: boolean, bom: boolean): Uint8Array {
  const units = (bom ? '\uFEFF' : '') + text;
  const out = new Uint8Array(units.length * 2);
  for (let i = 0; i < units.length; i++) {
    const u = units.charCodeAt(i);
    out[2 * i + (bigEndian ? 0 : 1)] = u >> 8;
    out[2 * i + (bigEndian ? 1 : 0)] = u & 0xff;
  }
  return out;
}

function utf8(text: string, bom: boolean): Uint8Array {
  const body = new TextEncoder().encode(text);
  if (!bom) return body;
  const out = new Uint8Array(body.length + 3);
  out.set([0xef, 0xbb, 0xbf]);
  out.set(body, 3);
  return out;
}

function readBytes(bytes: Uint8Array, cuts: number[] = [], opts: Omit<HistoryCsvOptions, 'onValue'> = {}) {
  const values: number[] = [];
  const lines: number[] = [];
  const r = new HistoryCsvReader({
    ...opts,
    onValue: (x, line) => {
      values.push(x);
      lines.push(line);
    },
  });
  let at = 0;
  for (const c of [...cuts, bytes.length]) {
    r.feed(bytes.subarray(at, Math.max(at, c)));
    at = Math.max(at, c);
  }
  r.end();
  return { r, values, lines };
}

describe('encodings and line ends (item 3)', () => {
  // A history with a header naming a unit in micro-units (a character outside ASCII) and a
  // character outside the Basic Multilingual Plane in a comment (a surrogate pair in UTF-16).
  const text = '# logger \u{1F527} v2\r\nM [k\u00b5N*m];t\r\n1,5;0\r\n-2;1\r\n3,25;2\r\n';
  const expected = [1.5, -2, 3.25];
  const encodings: Array<[string, Uint8Array, string | undefined]> = [
    ['UTF-8', utf8(text, false), undefined],
    ['UTF-8 with a BOM', utf8(text, true), 'UTF-8 with a byte-order mark'],
    ['UTF-16 LE with a BOM', utf16(text, false, true), 'UTF-16 LE with a byte-order mark'],
    ['UTF-16 BE with a BOM', utf16(text, true, true), 'UTF-16 BE with a byte-order mark'],
    ['UTF-16 LE without a BOM', utf16(text, false, false), 'UTF-16 LE without a byte-order mark'],
    ['UTF-16 BE without a BOM', utf16(text, true, false), 'UTF-16 BE without a byte-order mark'],
  ];
  for (const [name, bytes, named] of encodings)
    it(`${name}: the same numbers whatever the chunk cuts (every cut point, and cuts of 1 byte), the encoding named`, () => {
      const whole = readBytes(bytes);
      expect(whole.values).toEqual(expected);
      expect(whole.lines).toEqual([3, 4, 5]);
      expect(whole.r.header?.[0]).toBe('M [k\u00b5N*m]');
      const info = whole.r.issues.find((i) => i.code === 'csv-column')!.message;
      if (named) expect(info).toContain(`Decoded as ${named}`);
      else expect(info).not.toContain('Decoded');
      for (let cut = 0; cut <= bytes.length; cut++) {
        const part = readBytes(bytes, [cut]);
        expect(part.values, `cut at ${cut}`).toEqual(expected);
        expect(part.r.issues, `cut at ${cut}`).toEqual(whole.r.issues);
      }
      const ones = readBytes(
        bytes,
        Array.from({ length: bytes.length }, (_, i) => i),
      );
      expect(ones.values).toEqual(expected);
      expect(ones.r.issues).toEqual(whole.r.issues);
    });

  it('CR-only line ends are lines, and a CRLF split between chunks is one line end', () => {
    const cr = readBytes(utf8('load\r1\r-1\r\r2\r', false));
    expect(cr.values).toEqual([1, -1, 2]);
    expect(cr.lines).toEqual([2, 3, 5]);
    expect(cr.r.blankLineCount).toBe(1);
    const crlf = utf8('load\r\n1\r\n-1\r\n2\r\n', false);
    for (let cut = 0; cut <= crlf.length; cut++) {
      const r = readBytes(crlf, [cut]);
      expect(r.values, `cut at ${cut}`).toEqual([1, -1, 2]);
      expect(r.lines, `cut at ${cut}`).toEqual([2, 3, 4]);
      expect(r.r.blankLineCount, `cut at ${cut}`).toBe(0);
    }
  });

  it('bytes that are not UTF-8 become U+FFFD: an error on their row, never an exception', () => {
    const bytes = new Uint8Array([
      ...utf8('load\n1\n', false),
      0xff,
      0xfe,
      0x31,
      0x0a,
      ...utf8('-1\n2\n', false),
    ]);
    const r = readBytes(bytes);
    expect(r.values).toEqual([1, -1, 2]);
    expect(r.r.issues.find((i) => i.code === 'csv-non-numeric')?.line).toBe(3);
  });

  it('an odd byte at the end of a UTF-16 file is U+FFFD, not a lost or invented number', () => {
    const bytes = utf16('load\n1\n-1\n2\n7', false, true);
    const r = readBytes(bytes.subarray(0, bytes.length - 1));
    expect(r.values).toEqual([1, -1, 2]);
    expect(r.r.issues.find((i) => i.code === 'csv-non-numeric')?.line).toBe(5);
  });
});

describe('giant lines (item 4)', () => {
  it('a 64 MB history on one line: one history-line-too-long error, at most 2^20 characters held, work linear', () => {
    const piece = new TextEncoder().encode('1.25,'.repeat(13108)); // 65,540 bytes
    const r = new HistoryCsvReader();
    let held = 0;
    let fed = 0;
    while (fed < 64e6) {
      r.feed(piece);
      fed += piece.length;
      held = Math.max(held, r.heldCharacters);
    }
    r.end();
    expect(held).toBeLessThanOrEqual(MAX_HISTORY_LINE);
    const long = r.issues.filter((i) => i.code === 'history-line-too-long');
    expect(long).toHaveLength(1);
    expect(long[0]).toMatchObject({ line: 1, severity: 'error' });
    expect(long[0].message).toContain('"1.25,1.25,');
    expect(r.badRowCount).toBe(1);
    expect(r.steps).toBeLessThanOrEqual(3 * fed);
  });

  it('a line just within the limit is read; one character more is an error (the limit of docs/language.md)', () => {
    const ok = `${'0'.repeat(MAX_HISTORY_LINE - 1)}1\n2\n3\n`;
    expect(read(ok).values).toEqual([1, 2, 3]);
    const over = `${'0'.repeat(MAX_HISTORY_LINE)}1\n2\n3\n`;
    const r = read(over);
    expect(r.values).toEqual([2, 3]);
    expect(r.r.issues.find((i) => i.code === 'history-line-too-long')?.line).toBe(1);
  });

  it('number fields that once backtracked (a million digits then a letter) and header names full of brackets are linear', () => {
    const digits = `${'1'.repeat(1_000_000)}x`;
    expect(Number.isNaN(parseHistoryNumber(digits, true))).toBe(true);
    const header = `${'('.repeat(200_000)},load\n1,2\n3,4\n5,6\n`;
    const r = read(header, { column: 'load' });
    expect(r.values).toEqual([2, 4, 6]);
  });
});
