import { describe, expect, it } from 'vitest';
import {
  type HistoryCsvOptions,
  HistoryCsvReader,
  isTimeColumnName,
  parseHistoryNumber,
} from '../../src/rainflow';

// The CSV rules are the project's own (common practice of logger files, no source); these
// tests check the documented behaviour, not a published value.

function read(text: string, opts: Omit<HistoryCsvOptions, 'onValue'> = {}, chunk = 0) {
  const values: number[] = [];
  const lines: number[] = [];
  const r = new HistoryCsvReader({
    ...opts,
    onValue: (x, line) => {
      values.push(x);
      lines.push(line);
    },
  });
  if (chunk > 0) for (let i = 0; i < text.length; i += chunk) r.feed(text.slice(i, i + chunk));
  else r.feed(text);
  r.end();
  return { r, values, lines, codes: r.issues.map((i) => i.code) };
}

describe('HistoryCsvReader', () => {
  it('reads a comma file with a header and a time column, taking the first non-time column', () => {
    const { r, values, lines } = read('time,force,moment\n0,1.5,7\n0.1,-2,8\n0.2,3e2,9\n');
    expect(values).toEqual([1.5, -2, 300]);
    expect(lines).toEqual([2, 3, 4]);
    expect(r.columnIndex).toBe(1);
    expect(r.columnName).toBe('force');
    expect(r.delimiter).toBe(',');
  });

  it('reads semicolons with decimal commas, and tabs with decimal commas', () => {
    expect(read('Zeit [s];Kraft [kN]\n0,0;1,25\n0,1;-0,5\n0,2;2\n').values).toEqual([1.25, -0.5, 2]);
    expect(read('t\tM (N*m)\n0\t1,5\n1\t2,5\n2\t-3\n').values).toEqual([1.5, 2.5, -3]);
  });

  it('picks a column by name (unit optional, any case) or by 1-based index', () => {
    const text = 'time [s],F [kN],M [N*m]\n0,1,10\n1,2,20\n2,3,30\n';
    expect(read(text, { column: 'M' }).values).toEqual([10, 20, 30]);
    expect(read(text, { column: 'm [n*m]' }).values).toEqual([10, 20, 30]);
    expect(read(text, { column: 1 }).values).toEqual([0, 1, 2]);
    expect(read(text, { column: '2' }).values).toEqual([1, 2, 3]);
  });

  it('reports a missing column with the list of the available ones, and stops', () => {
    const { r, values, codes } = read('time,force\n0,1\n1,2\n2,3\n', { column: 'torque' });
    expect(values).toEqual([]);
    expect(r.fatal).toBe(true);
    expect(codes).toContain('csv-column-missing');
    const msg = r.issues.find((i) => i.code === 'csv-column-missing')!.message;
    expect(msg).toContain('"time"');
    expect(msg).toContain('"force"');
    expect(
      read('1,2\n3,4\n5,6\n', { column: 3 }).r.issues.find((i) => i.code === 'csv-column-missing')!.message,
    ).toContain('1 to 2');
  });

  it('without a header, takes column 2 when column 1 rises strictly (time) and column 1 otherwise', () => {
    expect(read('0,5\n1,-5\n2,5\n3,-5\n').values).toEqual([5, -5, 5, -5]);
    expect(read('5,0\n-5,1\n5,2\n-5,3\n').values).toEqual([5, -5, 5, -5]);
    expect(read('2024-01-01T00:00:00;1,5\n2024-01-01T00:00:01;2,5\n2024-01-01T00:00:02;0\n').values).toEqual([
      1.5, 2.5, 0,
    ]);
  });

  it('reports non-numeric rows with their line, skips them, and reports blank lines once', () => {
    const { r, values, codes } = read('load\n1\n\n2\nabc\n3\n\n4\n');
    expect(values).toEqual([1, 2, 3, 4]);
    const bad = r.issues.filter((i) => i.code === 'csv-non-numeric');
    expect(bad.map((i) => i.line)).toEqual([5]);
    expect(bad[0].severity).toBe('error');
    const blank = r.issues.filter((i) => i.code === 'csv-blank-rows');
    expect(blank).toHaveLength(1);
    expect(blank[0].line).toBe(3);
    expect(blank[0].message).toContain('2 blank lines');
    expect(codes).not.toContain('history-too-few-points');
  });

  it('caps the per-row reports and sums up the rest', () => {
    let text = 'x\n1\n2\n3\n';
    for (let i = 0; i < 250; i++) text += 'n/a\n';
    const { r } = read(text, { maxRowReports: 100 });
    const bad = r.issues.filter((i) => i.code === 'csv-non-numeric');
    expect(bad).toHaveLength(101);
    expect(bad[100].message).toContain('150 more rows');
    expect(r.badRowCount).toBe(250);
  });

  it('gives the same numbers and issues whatever the chunk boundaries (CRLF and a BOM included)', () => {
    const text = '\uFEFFtime;load\r\n0;1,5\r\n1;x\r\n\r\n2;-2,25\r\n3;4';
    const whole = read(text);
    expect(whole.values).toEqual([1.5, -2.25, 4]);
    for (const chunk of [1, 2, 3, 5, 7]) {
      const part = read(text, {}, chunk);
      expect(part.values).toEqual(whole.values);
      expect(part.lines).toEqual(whole.lines);
      expect(part.r.issues).toEqual(whole.r.issues);
    }
  });

  it('reports fewer than three points', () => {
    expect(read('load\n1\n2\n').codes).toContain('history-too-few-points');
    expect(read('').codes).toContain('history-too-few-points');
  });

  it('honours quotes, comments and space-separated columns', () => {
    expect(read('"time","load"\n"0","1.5"\n"1","2"\n"2","-1"\n').values).toEqual([1.5, 2, -1]);
    expect(read('# logger v2\n# units: kN\nload\n1\n2\n3\n').values).toEqual([1, 2, 3]);
    expect(read('t  F\n0  1\n1  2\n2  3\n').values).toEqual([1, 2, 3]);
  });

  it('parses numbers strictly and names time columns as documented', () => {
    expect(parseHistoryNumber('0x10', false)).toBeNaN();
    expect(parseHistoryNumber('Infinity', false)).toBeNaN();
    expect(parseHistoryNumber('', false)).toBeNaN();
    expect(parseHistoryNumber(' -1.5e3 ', false)).toBe(-1500);
    expect(parseHistoryNumber('1,5', false)).toBeNaN();
    expect(parseHistoryNumber('1,5', true)).toBe(1.5);
    for (const n of ['t', 'Time [s]', 'time_s', 'Zeit (s)', 'timestamp', 'Date', 'sec', 'elapsed time']) {
      expect(isTimeColumnName(n)).toBe(true);
    }
    for (const n of ['load', 'F [kN]', 'stress', 'torque', 'strain_1', 'temperature']) {
      expect(isTimeColumnName(n)).toBe(false);
    }
  });
});

describe('HistoryCsvReader, the in-place path of plain rows', () => {
  // The reader reads `[+-]digits[.digits]` of up to 15 digits as an integer over an exact
  // power of ten (W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990,
  // the fast path). The check here is JavaScript's own `Number` of the same text, an
  // independent correctly rounded conversion (ECMA-262, StringToNumber).
  it('reads every plain value as Number() of its text, bit for bit, with comma, semicolon and tab', () => {
    let seed = 7;
    const rnd = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const texts: string[] = [
      '0',
      '-0',
      '+0.5',
      '.5',
      '-.25',
      '12.',
      '0.1',
      '0.3',
      '999999999999999',
      '-1.00000000000001',
    ];
    for (let i = 0; i < 3000; i++) {
      const intDigits = Math.floor(rnd() * 8);
      const fracDigits = Math.floor(rnd() * (16 - intDigits));
      let t = rnd() < 0.5 ? '-' : '';
      for (let k = 0; k < intDigits; k++) t += String(Math.floor(rnd() * 10));
      if (fracDigits > 0) {
        t += '.';
        for (let k = 0; k < fracDigits; k++) t += String(Math.floor(rnd() * 10));
      }
      if (/\d/.test(t)) texts.push(t);
    }
    for (const [d, comma] of [
      [',', false],
      [';', true],
      ['\t', true],
    ] as const) {
      const body = texts.map((t, i) => `${i}${d}${comma ? t.replace('.', ',') : t}`).join('\n');
      const { values, codes } = read(`time${d}load\n${body}\n`, {}, 997);
      expect(codes.filter((c) => c !== 'csv-column')).toEqual([]);
      expect(values.length).toBe(texts.length);
      for (let i = 0; i < texts.length; i++)
        expect(Object.is(values[i], Number(texts[i])), texts[i]).toBe(true);
    }
  });

  it('rows the in-place path does not take still go the general way: quotes, spaces, exponents, 16 digits, short rows', () => {
    const { values, codes, lines } = read('a,b\n"1",2\n0, 3 \n0,4e1\n0,1.234567890123456\n0\n0,x\n0,"5"\n', {
      column: 2,
    });
    expect(values).toEqual([2, 3, 40, 1.234567890123456, 5]);
    expect(codes).toContain('csv-non-numeric');
    expect(lines).toEqual([2, 3, 4, 5, 8]);
  });
});
