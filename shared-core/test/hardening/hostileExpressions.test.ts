/**
 * Hostile expressions (issue 7): notes are untrusted input. Each line below must come back
 * quickly as an error diagnostic on its own line: never a crash (`internal`), never a value
 * that is not a finite number, never code run. The expected outcome is the contract of
 * docs/language.md ("Nothing else is accepted: no assignments inside expressions, no
 * function definitions, no strings, matrices or unit definitions. A result that overflows,
 * is complex, ... is an error on that line").
 */
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../src/index';

/** Per-expression budget (issue 7: "each must come back within its budget"). */
const BUDGET_MS = 50;

const HOSTILE: string[] = [
  'import("fs")',
  'import({}, {override: true})',
  'createUnit("foo", "1 m")',
  'evaluate("1+1")',
  'parse("1+1")',
  'compile("1")',
  'simplify("x")',
  'f(x) = x',
  'x = 2',
  '[1,2,3]',
  '{a: 1}',
  'zeros(1e4,1e4)',
  'ones(1e9)',
  'range(1,1e9)',
  '1:1e9',
  '"a" + "b"',
  'concat("a", "b")',
  '2^2^2^2^2^2',
  '1e308*10',
  '-1e308*10',
  '10^400',
  '1/0',
  '0/0',
  'sqrt(-1) MPa',
  'sqrt(-1 MPa)',
  'log(-1)',
  'asin(2)',
  'acos(5)',
  '(-8)^(1/3)',
  'e^1000',
  'exp(1000)',
  'factorial(1e6)',
  'gamma(171)',
  'x.constructor',
  'toString.constructor',
  'constructor',
  'constructor(1)',
  'toString(1)',
  'valueOf(1)',
  'hasOwnProperty(1)',
  '__proto__',
  '__defineGetter__(1)',
  'cos.apply',
  'cos.apply(1)',
  'sqrt.call(1, 4)',
  'max.constructor("return 1")()',
  '5 mm to foo',
  '5 mm to MPa',
  '5 to mm',
  '5 mm to 3 mm',
  '5 foo',
  '5 mm^1e9',
  '(2 m)^1e9',
  '2 m^(1/0)',
  'atan2(1)',
  'min()',
  'max()',
  'hypot()',
  'sqrt()',
  'pow(2)',
  'sqrt(1, 2, 3)',
  '1 MPa + 1 mm',
  '5 mm * "x"',
  'a ? b : c',
  'true',
  'null',
  'undefined',
  'NaN',
  'Infinity',
  '-Infinity',
  'i',
  '2 i',
  'i^2',
  'x[1]',
  'd[1]',
  'matrix([1])',
  "A'",
  '5!',
  '5 % 3',
  '5 mod 3',
  '1 == 1',
  '1 < 2',
  'not 1',
  '1 and 0',
  '1 | 2',
  '1 << 40',
  '~1',
  '"\\u0000"',
  'f(x) = f(x)',
  'help(sqrt)',
  'typeOf(1)',
  'unit("m")',
  'bignumber(1)',
  'fraction(1, 3)',
  'chain(1)',
  'resolve(1)',
  'reviver',
  'config({number: "BigNumber"})',
  '5 MPa MPa MPa',
  '1 degC * 2 degC',
  '0 K ^ -1',
  '1e-320 MPa',
  '1e400 MPa',
  '5 MPa to ',
  '(',
  ')',
  '((1)',
  '1 +',
  '#',
  '\u0000',
  '\uFFFD\uFFFD',
  '５ MPa',
  `${'('.repeat(10_000)}1${')'.repeat(10_000)}`,
  `${'-'.repeat(10_000)}1`,
  `${'1+'.repeat(500_000)}1`,
  `sqrt(${'1,'.repeat(300)}1)`,
  `${'2^'.repeat(150)}2`,
];

function evaluateLine(expr: string) {
  const text = ['```fatigue h', 'Sut = 600 MPa', `d = ${expr}`, '```', ''].join('\n');
  const t0 = performance.now();
  const r = evaluateNote(text);
  return { r, ms: performance.now() - t0 };
}

describe('hostile expressions (issue 7)', () => {
  // Warm the interpreter so that the first case does not pay for module initialisation.
  evaluateLine('1 mm');

  for (const expr of HOSTILE) {
    it(`\`${expr.length > 40 ? `${expr.slice(0, 40)}... (${expr.length} chars)` : expr}\` is an error on its line, quickly`, () => {
      const { r, ms } = evaluateLine(expr);
      // 4x the budget for a loaded test machine; a line of 1 MB also pays the Markdown parse of
      // 1 MB (about 35 ms here), hence a second allowance of 1 ms per kB.
      expect(ms).toBeLessThan(BUDGET_MS * 4 + (expr.length > 10_000 ? expr.length / 1000 : 0));
      const c = r.checks[0];
      expect(c.diagnostics.some((d) => d.code === 'internal')).toBe(false);
      const onLine = c.diagnostics.filter((d) => d.severity === 'error' && d.range.start.line === 2);
      expect(onLine.length, JSON.stringify(c.diagnostics)).toBeGreaterThan(0);
      for (const d of onLine) {
        expect(d.range.start.character).toBeGreaterThanOrEqual(0);
        expect(d.range.end.line).toBe(2);
        expect(d.range.end.character).toBeLessThanOrEqual(`d = ${expr}`.length);
        expect(d.message).not.toMatch(/NaN|Infinity/);
      }
      // The failed line states nothing.
      expect(c.values.d).toBeUndefined();
      for (const v of Object.values(c.values)) if (v.si !== null) expect(Number.isFinite(v.si)).toBe(true);
    });
  }

  it('no hostile line changes the interpreter: a plain value still evaluates afterwards', () => {
    for (const expr of HOSTILE) evaluateLine(expr);
    const { r } = evaluateLine('35 mm');
    expect(r.checks[0].values.d.si).toBeCloseTo(0.035, 12);
    expect(Object.hasOwn(Object.prototype, 'polluted')).toBe(false);
  });
});

describe('names that are properties of every JavaScript object (issue 7)', () => {
  const NAMES = [
    'constructor',
    '__proto__',
    'toString',
    'valueOf',
    'hasOwnProperty',
    'prototype',
    '__defineGetter__',
  ];
  for (const name of NAMES) {
    it(`\`${name}\` as a stated name, a reference and a requirement never crashes`, () => {
      const text = [
        '```fatigue a',
        'Sut = 600 MPa',
        `${name} = 5 MPa`,
        `x = ${name} * 2`,
        `y = a.${name}`,
        `require: ${name} >= 1`,
        '```',
        '```fatigue b',
        `z = a.${name}`,
        `require: n_f >= a.${name}`,
        '```',
        '',
      ].join('\n');
      const r = evaluateNote(text);
      for (const c of r.checks) {
        expect(c.diagnostics.map((d) => d.code)).not.toContain('internal');
        // The table of values has nothing behind it (issue 16), and no name replaced that.
        expect(Object.getPrototypeOf(c.values)).toBeNull();
        for (const v of Object.values(c.values)) if (v.si !== null) expect(Number.isFinite(v.si)).toBe(true);
      }
      expect(({} as Record<string, unknown>).si).toBeUndefined();
    });
  }
});
