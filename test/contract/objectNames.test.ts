/**
 * Names that every JavaScript object has (`constructor`, `__proto__`, `valueOf`,
 * `hasOwnProperty`, `toString` ...) in every place a note can write a word (issue 16, item 5).
 * The rule is the language's own (docs/language.md, "Limits"; docs/diagnostics.md,
 * `reserved-name`): every lookup of a name, unit, option word, material key or check id sees
 * only the table's own words, so these words get the diagnostic any unknown word gets (or
 * `reserved-name`), and no message quotes the runtime (`function Object() { [native code] }`,
 * `[object Object]`).
 */
import { describe, expect, it } from 'vitest';
import { evaluateNote, type NoteResult } from '../../shared-core/src';

const WORDS = Object.getOwnPropertyNames(Object.prototype);
const RUNTIME = /native code|\[object |function \w*\(|undefined|Cannot read/;

const SECTION = [
  'Sut = 600 MPa',
  'Sy = 450 MPa',
  'surface: machined',
  'temp = 20 degC',
  'reliability = 0.9',
  'd = 20 mm',
  'feature: none',
  'M_a = 300 N*m',
  'M_m = 0 N*m',
  'criterion: goodman',
];

function evaluate(blocks: Array<[string, string[]]>): NoteResult {
  return evaluateNote(
    blocks.map(([id, lines]) => ['```fatigue ' + id, ...lines, '```', ''].join('\n')).join('\n'),
  );
}

function codesOn(r: NoteResult, line: number): string[] {
  return r.diagnostics.filter((d) => d.range.start.line === line).map((d) => d.code);
}

describe('words every JavaScript object has (issue 16, item 5)', () => {
  it('the list covers the words of the issue', () => {
    for (const w of ['constructor', '__proto__', 'valueOf', 'hasOwnProperty', 'toString'])
      expect(WORDS).toContain(w);
  });

  for (const w of WORDS)
    it(`\`${w}\` as a name, in an expression, as a unit, an option key or word, a material: the table's own diagnostic, never the runtime`, () => {
      const lines = [
        ...SECTION.filter((l) => !l.startsWith('surface') && !l.startsWith('criterion')),
        `x1 = ${w}`, // line 9
        `x2 = 3 ${w}`, // 10
        `x3 = 2 MPa * ${w}`, // 11
        `${w} = 3`, // 12
        `${w}: goodman`, // 13
        `surface: ${w}`, // 14
        `criterion: ${w}`, // 15
        `require: ${w} >= 1`, // 16
      ];
      const r = evaluate([['c', lines]]);
      for (const d of r.diagnostics) expect(d.message, `${d.code}: ${d.message}`).not.toMatch(RUNTIME);
      expect(codesOn(r, 9)).toContain('unknown-name');
      expect(codesOn(r, 10)).toContain('unknown-name');
      expect(codesOn(r, 11)).toContain('unknown-name');
      expect(codesOn(r, 12)).toEqual(['reserved-name']);
      expect(codesOn(r, 13)).toEqual(['unknown-option']);
      expect(codesOn(r, 14)).toEqual(['unknown-option-value']);
      expect(codesOn(r, 15)).toEqual(['unknown-option-value']);
      expect(codesOn(r, 16).length).toBeGreaterThan(0);
      expect(r.checks[0].status).toBe('error');
      expect(Object.getPrototypeOf(r.checks[0].values)).toBeNull();
      expect(r.checks[0].values[w]).toBeUndefined();
    });

  for (const w of WORDS)
    it(`\`${w}\` as a check id: reserved-name on the fence, and a later reference to it is unknown`, () => {
      const r = evaluate([
        [w, SECTION],
        ['after', [...SECTION.filter((l) => !l.startsWith('Sut')), `Sut = ${w}.Sut`]],
      ]);
      const onFence = r.diagnostics.filter((d) => d.range.start.line === 0 && d.code === 'reserved-name');
      expect(onFence).toHaveLength(1);
      expect(onFence[0].severity).toBe('error');
      expect(onFence[0].message).toContain(`\`${w}\` cannot be a check id`);
      expect(r.checks[0].id).toBeNull();
      expect(r.checks[0].status).toBe('error');
      const ref = r.checks[1].diagnostics.find((d) => d.code === 'unknown-reference');
      expect(ref?.message).toContain(`no check \`${w}\``);
      for (const d of r.diagnostics) expect(d.message).not.toMatch(RUNTIME);
    });

  for (const w of WORDS)
    it(`\`${w}\` as a material key: unknown-material, the nearest keys offered`, () => {
      const r = evaluate([['m', [`material: ${w}`, ...SECTION.filter((l) => !/^(Sut|Sy) =/.test(l))]]]);
      expect(codesOn(r, 1)).toEqual(['unknown-material']);
      for (const d of r.diagnostics) expect(d.message).not.toMatch(RUNTIME);
    });

  it('a misspelt unit still gets its suggestion (the table answers for its own words)', () => {
    const r = evaluate([['c', [...SECTION, 'x1 = 3 Nm']]]);
    expect(r.diagnostics.find((d) => d.code === 'unknown-name')?.message).toContain('write `N*m`');
  });

  it('spectrum levels and history options with such words: diagnostics, no runtime text', () => {
    const r = evaluate([
      [
        's',
        [
          ...SECTION.filter((l) => !l.startsWith('M_')),
          'method: damage',
          'spectrum: constructor = 3 MPa, n = 10',
        ],
      ],
      [
        'h',
        [
          ...SECTION.filter((l) => !l.startsWith('M_')),
          'method: damage',
          'history: h.csv',
          'history-load: __proto__',
          'history_scale = 1 N*m',
        ],
      ],
    ]);
    expect(r.checks.every((c) => c.status === 'error')).toBe(true);
    for (const d of r.diagnostics) expect(d.message).not.toMatch(RUNTIME);
  });
});
