/**
 * Properties of the history reader and the rainflow counter over random files (fast-check;
 * issue 16): random bytes, random encodings (UTF-8, UTF-16 LE/BE, with and without a
 * byte-order mark), random line structures (LF, CRLF, CR, one giant line) and random chunk
 * cuts. Whatever the input: no exception; every number handed on and every cycle finite;
 * fewer than three numbers, or anything dropped, comes with an error; the result does not
 * depend on where the chunks are cut nor on the encoding; and the work, counted in
 * characters looked at (`HistoryCsvReader.steps`), is linear in the size of the file.
 * The rules are the project's own (docs/language.md; common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HistoryCsvReader, type HistoryIssue, parseHistoryNumber, RainflowCounter } from '../../src/rainflow';

type Encoding = 'utf-8' | 'utf-8-bom' | 'utf-16le' | 'utf-16le-bom' | 'utf-16be' | 'utf-16be-bom';
const ENCODINGS: Encoding[] = ['utf-8', 'utf-8-bom', 'utf-16le', 'utf-16le-bom', 'utf-16be', 'utf-16be-bom'];

/** Bytes of `text` in `enc`, written here from the encodings' definitions (Unicode Standard, Sec. 3.9-3.10). */
function encode(text: string, enc: Encoding): Uint8Array {
  if (enc === 'utf-8' || enc === 'utf-8-bom') {
    const body = new TextEncoder().encode(text);
    if (enc === 'utf-8') return body;
    const out = new Uint8Array(body.length + 3);
    out.set([0xef, 0xbb, 0xbf]);
    out.set(body, 3);
    return out;
  }
  const big = enc.startsWith('utf-16be');
  const units = (enc.endsWith('-bom') ? '\uFEFF' : '') + text;
  const out = new Uint8Array(units.length * 2);
  for (let i = 0; i < units.length; i++) {
    const u = units.charCodeAt(i);
    out[2 * i + (big ? 0 : 1)] = u >> 8;
    out[2 * i + (big ? 1 : 0)] = u & 0xff;
  }
  return out;
}

interface Outcome {
  values: number[];
  lines: number[];
  issues: HistoryIssue[];
  steps: number;
  fatal: boolean;
  badRows: number;
  cycles: Array<[number, number, number]>;
  notes: Array<{ code: string; severity?: string }>;
  totals: number[];
}

/** Reads `input` (bytes cut at `cuts`, or text) and counts it. */
function run(input: Uint8Array | string, cuts: number[] = []): Outcome {
  const cycles: Array<[number, number, number]> = [];
  const counter = new RainflowCounter({ onCycle: (r, m, n) => cycles.push([r, m, n]) });
  const values: number[] = [];
  const lines: number[] = [];
  const r = new HistoryCsvReader({
    onValue: (x, line) => {
      values.push(x);
      lines.push(line);
      counter.push(x);
    },
  });
  let at = 0;
  for (const c of [...cuts.filter((c) => c <= input.length).sort((a, b) => a - b), input.length]) {
    r.feed(typeof input === 'string' ? input.slice(at, c) : input.subarray(at, c));
    at = c;
  }
  r.end();
  const res = counter.finish();
  return {
    values,
    lines,
    issues: r.issues,
    steps: r.steps,
    fatal: r.fatal,
    badRows: r.badRowCount,
    cycles,
    notes: res.notes,
    totals: [res.totalCycles, res.maxRange, res.min, res.max, res.sampleCount, res.turningPointCount],
  };
}

function expectSound(o: Outcome, size: number) {
  for (const x of o.values) expect(Number.isFinite(x)).toBe(true);
  for (const [r, m, n] of o.cycles) {
    expect(Number.isFinite(r) && r >= 0).toBe(true);
    expect(Number.isFinite(m)).toBe(true);
    expect([0.5, 1]).toContain(n);
  }
  for (const t of o.totals) expect(Number.isFinite(t)).toBe(true);
  const errors = [
    ...o.issues.filter((i) => i.severity === 'error'),
    ...o.notes.filter((n) => n.severity === 'error'),
  ];
  // A finite result or a diagnostic: too few numbers, or a dropped row, is an error.
  if (o.values.length < 3 || o.badRows > 0 || o.fatal) expect(errors.length).toBeGreaterThan(0);
  for (const i of o.issues) expect(i.message).not.toMatch(/undefined|\[object/);
  // Linear work: a bounded number of looks per character (two searches for line ends, kept,
  // joined, read: at most 5), whatever the line structure.
  expect(o.steps).toBeLessThanOrEqual(5 * size + 16);
}

const cutsOf = (n: number) => fc.array(fc.integer({ min: 0, max: Math.max(0, n) }), { maxLength: 12 });

/** A field of a history: mostly numbers, sometimes huge, non-finite or a word. */
const field = fc.oneof(
  {
    weight: 8,
    arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }).map(String),
  },
  { weight: 2, arbitrary: fc.integer({ min: -1000, max: 1000 }).map(String) },
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      '1e309',
      '-1e400',
      'nan',
      'inf',
      'n/a',
      '',
      ' ',
      '"3.5"',
      '1,25',
      '1.5e308',
      '-1.5e308',
      '#c',
    ),
  },
);
const lineEnd = fc.constantFrom('\n', '\r\n', '\r');
/** Rows of one or two columns, with random line ends, or everything on one giant line. */
const structured = fc
  .record({
    header: fc.constantFrom('', 'load\n', 't;M [k\u00b5N*m]\r\n', 'time,force\r'),
    rows: fc.array(fc.tuple(field, field), { maxLength: 60 }),
    columns: fc.constantFrom(1, 2),
    sep: fc.constantFrom(',', ';', '\t', ' '),
    ends: fc.array(lineEnd, { minLength: 1, maxLength: 4 }),
    oneLine: fc.boolean(),
    trailing: fc.boolean(),
  })
  .map(({ header, rows, columns, sep, ends, oneLine, trailing }) => {
    const cells = rows.map(([a, b]) => (columns === 1 ? a : `${a}${sep}${b}`));
    if (oneLine) return header + cells.join(sep);
    let text = header;
    cells.forEach((c, i) => {
      text += c + (i < cells.length - 1 || trailing ? ends[i % ends.length] : '');
    });
    return text;
  });

/** The number rule as it was first written (trim, quotes, decimal comma, one regular expression): the reference for the one-pass parser. */
function referenceNumber(raw: string, decimalComma: boolean): number {
  let s = raw.trim();
  if (s.length >= 2 && s[0] === '"' && s[s.length - 1] === '"') s = s.slice(1, -1).trim();
  if (decimalComma && s.indexOf(',') >= 0) s = s.replace(',', '.');
  if (!/^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/.test(s)) return Number.NaN;
  return Number(s);
}

describe('history reader properties (issue 16)', () => {
  it('the one-pass number parser agrees with the regular-expression rule on any short field', () => {
    const chars = fc.constantFrom(...'0123456789+-.,eE "x\t\u00a0'.split(''));
    fc.assert(
      fc.property(
        fc.array(chars, { maxLength: 14 }).map((a) => a.join('')),
        fc.boolean(),
        (raw, dc) => {
          expect(Object.is(parseHistoryNumber(raw, dc), referenceNumber(raw, dc)), JSON.stringify(raw)).toBe(
            true,
          );
        },
      ),
      { numRuns: 5000 },
    );
  });

  it('random bytes, cut at random: no exception, finite numbers or an error, the same for every cut, linear work', () => {
    fc.assert(
      fc.property(
        fc.uint8Array({ maxLength: 600 }).chain((b) => fc.tuple(fc.constant(b), cutsOf(b.length))),
        ([bytes, cuts]) => {
          const whole = run(bytes);
          expectSound(whole, bytes.length);
          const cut = run(bytes, cuts);
          expect(cut.values).toEqual(whole.values);
          expect(cut.lines).toEqual(whole.lines);
          expect(cut.issues).toEqual(whole.issues);
        },
      ),
      { numRuns: 400 },
    );
  });

  it('random histories in random encodings, line ends and cuts: read as the text itself is', () => {
    fc.assert(
      fc.property(
        structured.chain((text) =>
          fc.tuple(fc.constant(text), fc.constantFrom(...ENCODINGS)).chain(([t, enc]) => {
            const bytes = encode(t, enc);
            return fc.tuple(fc.constant(t), fc.constant(enc), fc.constant(bytes), cutsOf(bytes.length));
          }),
        ),
        ([text, enc, bytes, cuts]) => {
          const asText = run(text);
          const asBytes = run(bytes, cuts);
          expectSound(asBytes, bytes.length);
          expect(asBytes.values).toEqual(asText.values);
          expect(asBytes.lines).toEqual(asText.lines);
          // The same issues, but for the encoding named in the column information.
          const strip = (i: HistoryIssue) => ({ ...i, message: i.message.replace(/ Decoded as .*$/, '') });
          expect(asBytes.issues.map(strip)).toEqual(asText.issues.map(strip));
          const info = asBytes.issues.find((i) => i.code === 'csv-column');
          if (info && enc !== 'utf-8') expect(info.message).toContain('Decoded as');
          expect(asBytes.cycles).toEqual(asText.cycles);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('work is linear in the size whatever the line structure: twice the file, about twice the steps', () => {
    const shapes: Record<string, (n: number) => string> = {
      'one giant line of numbers': (n) => '1.5,'.repeat(n / 4),
      'one giant line without separators': (n) => '7'.repeat(n),
      'one giant line of spaces': (n) => `1${' '.repeat(n - 2)}2`,
      'one giant quoted field': (n) => `"${'x'.repeat(n - 2)}"`,
      'short LF lines': (n) => '12\n'.repeat(n / 3),
      'short CRLF lines': (n) => '1\r\n'.repeat(n / 3),
      'short CR lines': (n) => '-3\r'.repeat(n / 3),
      'blank lines': (n) => '\n'.repeat(n),
      'a CR then LF lines (each line end searched once)': (n) => `\r${'5\n'.repeat(n / 2 - 1)}`,
      'lines of growing length': (n) => {
        let s = '';
        for (let k = 1; s.length < n; k++) s += `${'9'.repeat(k)}\n`;
        return s.slice(0, n);
      },
    };
    fc.assert(
      fc.property(
        fc.constantFrom(...Object.keys(shapes)),
        fc.constantFrom(...ENCODINGS),
        fc.integer({ min: 64, max: 64 * 1024 }),
        // Both sizes below the line limit (2^20 characters), or (for one giant line) both above it.
        fc.boolean(),
        (shape, enc, chunk, above) => {
          const n = above && shape.startsWith('one giant') ? 3 << 19 : 1 << 16;
          const steps = (n: number) => {
            const bytes = encode(shapes[shape](n), enc);
            const cuts: number[] = [];
            for (let i = chunk; i < bytes.length; i += chunk) cuts.push(i);
            const o = run(bytes, cuts);
            expect(o.steps).toBeLessThanOrEqual(5 * bytes.length + 16);
            return o.steps;
          };
          const small = steps(n);
          const large = steps(2 * n);
          expect(large / small, shape).toBeGreaterThan(1.5);
          expect(large / small, shape).toBeLessThan(2.5);
        },
      ),
      { numRuns: 16 },
    );
  });
});
