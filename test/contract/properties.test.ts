/**
 * Properties of the evaluator over random notes (fast-check): evaluation never throws,
 * never yields NaN or Infinity in a value, and every diagnostic range lies inside its block.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateNote, INPUT_NAMES, type NoteResult, OPTIONS } from '../../shared-core/src';

const UNITS = [
  'MPa',
  'ksi',
  'mm',
  'in',
  'N*m',
  'lbf*in',
  'N',
  'kN',
  'degC',
  'degF',
  '%',
  '',
  'm',
  'GPa',
  'psi',
  'kip',
];
const names = Object.keys(INPUT_NAMES);
const optionKeys = Object.keys(OPTIONS);

const number = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => String(x)),
  fc.constantFrom('0', '-0', '1e308', '1e-320', '2^2^2^2^2^2', 'sqrt(-1)', '1/0', '0/0', '10^400', '-1e309'),
);
const expr = fc.oneof(
  fc.tuple(number, fc.constantFrom(...UNITS)).map(([n, u]) => `${n} ${u}`.trim()),
  fc
    .tuple(fc.constantFrom(...names), fc.constantFrom('*', '/', '+', '-'), number)
    .map(([a, o, b]) => `${a} ${o} ${b}`),
  fc.string({ maxLength: 12 }),
);
const statement = fc.oneof(
  fc.tuple(fc.constantFrom(...names), expr).map(([n, e]) => `${n} = ${e}`),
  fc
    .tuple(fc.constantFrom(...optionKeys), fc.string({ maxLength: 10 }))
    .map(
      ([k, v]) =>
        `${k}: ${OPTIONS[k].values ? Object.keys(OPTIONS[k].values!)[v.length % Object.keys(OPTIONS[k].values!).length] : v}`,
    ),
  fc.constantFrom(
    'require: n_f >= 1.5',
    'require: N_f >= 1e6, n_y >= 1',
    'require: x >= 2',
    'solve: d for n_f = 2',
    '# comment',
    '',
  ),
  fc.string({ maxLength: 20 }),
);

function assertSound(text: string, r: NoteResult): void {
  const lineCount = text.split(/\r\n|\r|\n/).length;
  for (const c of r.checks) {
    for (const v of Object.values(c.values)) {
      if (v.si !== null) expect(Number.isFinite(v.si), `${v.name} = ${v.si}`).toBe(true);
      else expect(v.infinite).toBe(true);
      expect(v.display).not.toMatch(/NaN|Infinity/);
    }
    for (const d of c.diagnostics) {
      expect(d.range.start.line).toBeGreaterThanOrEqual(c.range.start.line);
      expect(d.range.end.line).toBeLessThanOrEqual(Math.max(c.range.end.line, c.insertLine));
      expect(d.range.start.line).toBeLessThan(lineCount + 1);
      expect(d.range.start.character).toBeGreaterThanOrEqual(0);
      expect(d.message).not.toMatch(/NaN|Infinity|undefined/);
      expect(d.code, d.message).not.toBe('internal');
    }
  }
}

describe('evaluator properties', () => {
  it('random blocks never throw, never give NaN or Infinity, ranges stay in the block', () => {
    fc.assert(
      fc.property(fc.array(statement, { maxLength: 30 }), (stmts) => {
        const text = ['# note', '', '```fatigue p', ...stmts, '```', ''].join('\n');
        const r = evaluateNote(text);
        assertSound(text, r);
      }),
      { numRuns: 1000 },
    );
  });

  const samples = readdirSync('samples')
    .filter((f) => f.endsWith('.md'))
    .map((f) => readFileSync(join('samples', f), 'utf8'));
  it('random mutations of the samples never throw and stay sound', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...samples),
        fc.array(fc.tuple(fc.nat(), fc.nat({ max: 8 }), fc.string({ maxLength: 6 })), { maxLength: 6 }),
        (sample, edits) => {
          let text = sample;
          for (const [pos, del, ins] of edits) {
            const p = pos % (text.length + 1);
            text = text.slice(0, p) + ins + text.slice(p + del);
          }
          assertSound(text, evaluateNote(text));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('every example of the contract evaluates as written', () => {
    const text = readFileSync('test/fixtures/contract-example.md', 'utf8');
    const r = evaluateNote(text);
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(r.checks[0].status).toBe('pass');
  });
});

describe('evaluator properties on well-formed blocks with random numbers', () => {
  const value = fc.oneof(
    fc.double({ min: -1e4, max: 1e4, noNaN: true, noDefaultInfinity: true }),
    fc.constantFrom(0, 1e-9, 1e9, -1, 1e30),
  );
  it('any numbers in a complete shaft, shell or plate check give finite results or diagnostics', () => {
    fc.assert(
      fc.property(
        fc.array(value, { minLength: 12, maxLength: 12 }),
        fc.constantFrom('shoulder-fillet', 'groove', 'cross-hole', 'none'),
        fc.constantFrom('goodman', 'gerber', 'soderberg', 'asme-elliptic', 'morrow', 'swt', 'walker'),
        fc.constantFrom('proportional', 'constant-mean', 'constant-amplitude'),
        (v, feature, criterion, line) => {
          const shaft = [
            '```fatigue s',
            `Sut = ${v[0]} MPa`,
            `Sy = ${v[1]} MPa`,
            'surface: machined',
            `temp = ${v[2]} degC`,
            `reliability = ${v[3]}`,
            `d = ${v[4]} mm`,
            `D = ${v[5]} mm`,
            `r = ${v[6]} mm`,
            `d_hole = ${v[7]} mm`,
            `feature: ${feature}`,
            `M_max = ${v[8]} N*m`,
            `M_min = ${v[9]} N*m`,
            `T_a = ${v[10]} N*m`,
            `N = ${Math.abs(v[11])}`,
            `criterion: ${criterion}`,
            `load-line: ${line}`,
            'require: n_f >= 1.5',
            '```',
            '',
            '```fatigue sh',
            'material: astm-a36',
            'surface: hot-rolled',
            'shell: cylinder',
            `D_i = ${v[4]} mm`,
            `t = ${v[6]} mm`,
            'feature: shell-cutout',
            `w_c = ${v[7]} mm`,
            `h_c = ${v[5]} mm`,
            `p_max = ${v[8]} MPa`,
            `p_min = ${v[9]} MPa`,
            `criterion: ${criterion}`,
            '```',
          ].join('\n');
          const r = evaluateNote(shaft);
          assertSound(shaft, r);
        },
      ),
      { numRuns: 1500 },
    );
  });
});

describe('evaluator properties on hostile and odd input (issue 7)', () => {
  const hostile = fc.constantFrom(
    'import("fs")',
    'createUnit("foo", "1 m")',
    'evaluate("1")',
    'f(x) = x',
    'x = 2',
    '[1,2,3]',
    'zeros(1e4,1e4)',
    '"a" + "b"',
    '2^2^2^2^2^2',
    '1e308*10',
    'sqrt(-1) MPa',
    'e^1000',
    'factorial(1e6)',
    'x.constructor',
    'toString.constructor',
    '__proto__',
    'cos.apply',
    '5 mm to foo',
    `${'('.repeat(300)}1${')'.repeat(300)}`,
  );
  const reserved = fc.constantFrom('constructor', '__proto__', 'toString', 'valueOf', 'hasOwnProperty');
  const junk = fc.string({ unit: 'binary', maxLength: 16 });
  const oddStatement = fc.oneof(
    statement,
    fc.tuple(fc.constantFrom(...names), hostile).map(([n, e]) => `${n} = ${e}`),
    fc.tuple(reserved, expr).map(([n, e]) => `${n} = ${e}`),
    reserved.map((n) => `require: ${n} >= 1`),
    reserved.map((n) => `x = p.${n}`),
    fc.tuple(fc.constantFrom(...names), junk).map(([n, j]) => `${n} = ${j}`),
    junk,
    fc.tuple(fc.constantFrom(...names), expr).map(([n, e]) => `\t${n}\t=\t${e}\t`),
  );

  it('random blocks of hostile, reserved and junk statements, with any line ends and a BOM, stay sound', () => {
    fc.assert(
      fc.property(
        fc.array(oddStatement, { maxLength: 20 }),
        fc.constantFrom('\n', '\r\n', '\r'),
        fc.boolean(),
        (stmts, eol, bom) => {
          const text = `${bom ? '\uFEFF' : ''}${['# note', '', '```fatigue p', ...stmts, '```', ''].join(eol)}`;
          const r = evaluateNote(text);
          assertSound(text, r);
          // Line ends never change a result: the LF twin gives the same (when no junk carries its own line ends).
          if (!stmts.some((s) => /[\r\n\u2028\u2029]/.test(s)))
            expect(r).toStrictEqual(evaluateNote(text.split(eol).join('\n')));
        },
      ),
      { numRuns: 500 },
    );
  });
});
