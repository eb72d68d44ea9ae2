/**
 * Huge and odd input (issue 7): budgets per block and per note, deep nesting, very long
 * lines, byte-order marks, CRLF and CR line ends, tabs, junk. The expectations are the
 * budgets of `language/budgets.ts` and the ranges of LSP (0-based lines, UTF-16 columns;
 * \n, \r\n and \r end a line, LSP 3.17 "Text Documents": position encoding and EOL; from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateNote, type NoteResult } from '../../src/index';
import { MAX_BLOCK_CHARS, MAX_BLOCK_LINES, MAX_BLOCKS } from '../../src/language/budgets';
import { MAX_NESTING, nestingOf } from '../../src/language/fenceScan';
import { NoteSession } from '../../src/session';

const CHECK = [
  'Sut = 630 MPa',
  'Sy = 530 MPa',
  'surface: machined',
  'd = 35 mm',
  'D = 42 mm',
  'r = 1.5 mm',
  'feature: shoulder-fillet',
  'M_max = 180 N*m',
  'M_min = -180 N*m',
  'criterion: goodman',
  'require: n_f >= 1.5',
];

function block(id: string, lines: string[] = CHECK): string {
  return ['```fatigue ' + id, ...lines, '```'].join('\n');
}

function codes(r: NoteResult): string[] {
  return r.diagnostics.map((d) => d.code);
}

/** Every value finite (or infinite by design), every range inside the text. */
function sound(text: string, r: NoteResult): void {
  const lines = text.split(/\r\n|\r|\n/);
  for (const c of r.checks) {
    for (const v of Object.values(c.values)) if (v.si !== null) expect(Number.isFinite(v.si)).toBe(true);
    for (const d of c.diagnostics) {
      expect(d.code).not.toBe('internal');
      const { start, end } = d.range;
      expect(start.line).toBeGreaterThanOrEqual(0);
      expect(start.line).toBeLessThan(lines.length);
      expect(end.line).toBeLessThan(lines.length + 1);
      expect(start.character).toBeGreaterThanOrEqual(0);
      expect(start.character).toBeLessThanOrEqual(lines[start.line].length);
      if (end.line === start.line) expect(end.character).toBeGreaterThanOrEqual(start.character);
    }
  }
}

describe('block budgets', () => {
  it(`a block of ${MAX_BLOCK_LINES} content lines is evaluated; one more line and it is not, with block-too-large on its fence`, () => {
    const filler = Array.from({ length: MAX_BLOCK_LINES - CHECK.length }, (_, i) => `# note ${i}`);
    const ok = evaluateNote(`${block('big', [...CHECK, ...filler])}\n`);
    expect(codes(ok)).not.toContain('block-too-large');
    expect(ok.checks[0].status).toBe('pass');
    const text = `# title\n\n${block('big', [...CHECK, ...filler, '# one more'])}\n`;
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(1);
    const c = r.checks[0];
    expect(c.status).toBe('error');
    expect(c.values).toEqual({});
    expect(c.diagnostics).toHaveLength(1);
    const d = c.diagnostics[0];
    expect(d.code).toBe('block-too-large');
    expect(d.severity).toBe('error');
    // On the fence: the id `big` of line 2.
    expect(d.range).toEqual({ start: { line: 2, character: 11 }, end: { line: 2, character: 14 } });
    sound(text, r);
  });

  it(`a block over ${MAX_BLOCK_CHARS} characters (one line of 1 MB) is not evaluated; the checks around it are`, () => {
    const long = `# ${'x'.repeat(1 << 20)}`;
    const text = [block('before'), block('huge', [...CHECK, long]), block('after'), ''].join('\n\n');
    const t0 = performance.now();
    const r = evaluateNote(text);
    expect(performance.now() - t0).toBeLessThan(5000);
    expect(r.checks.map((c) => [c.id, c.status])).toEqual([
      ['before', 'pass'],
      ['huge', 'error'],
      ['after', 'pass'],
    ]);
    expect(r.checks[1].diagnostics.map((d) => d.code)).toEqual(['block-too-large', 'line-too-long']);
    // The long line has an error of its own, on its line.
    const long1 = r.checks[1].diagnostics[1];
    expect(text.split('\n')[long1.range.start.line]).toBe(long);
    sound(text, r);
  });

  it('an unclosed fence at the top of a long note is one block over budget, not a hang', () => {
    const prose = Array.from({ length: 5000 }, (_, i) => `Line ${i} of prose.`).join('\n');
    const text = `\`\`\`fatigue open\n${prose}\n`;
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(1);
    expect(codes(r)).toEqual(['block-too-large']);
    expect(r.checks[0].diagnostics[0].message).toMatch(/close its fence/);
  });

  it('a 1 MB line outside any block leaves the blocks alone', () => {
    const text = `${'y'.repeat(1 << 20)}\n\n${block('s')}\n`;
    const r = evaluateNote(text);
    expect(r.checks[0].status).toBe('pass');
    expect(r.checks[0].range.start.line).toBe(2);
  });

  it('an expression of 120 kB (inside the block budget) is an error on its line', () => {
    const r = evaluateNote(`${block('e', ['Sut = 630 MPa', `d = ${'1+'.repeat(60_000)}1 mm`])}\n`);
    expect(codes(r)).toContain('expression-too-long');
    expect(r.diagnostics.find((d) => d.code === 'expression-too-long')!.range.start.line).toBe(2);
  });
});

describe(`more than ${MAX_BLOCKS} blocks`, () => {
  it(`evaluates the first ${MAX_BLOCKS}, says so on the next one and leaves the rest out; the session agrees`, () => {
    const n = MAX_BLOCKS + 5;
    const parts: string[] = [];
    for (let i = 0; i < n; i++) parts.push(`\`\`\`fatigue b${i}\nx = ${i} mm\n\`\`\``);
    const text = `${parts.join('\n')}\n`;
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(MAX_BLOCKS + 1);
    expect(r.checks[MAX_BLOCKS - 1].values.x.si).toBeCloseTo((MAX_BLOCKS - 1) / 1000, 12);
    const last = r.checks[MAX_BLOCKS];
    expect(last.id).toBe(`b${MAX_BLOCKS}`);
    expect(last.diagnostics.map((d) => d.code)).toEqual(['too-many-blocks']);
    expect(last.range.start.line).toBe(3 * MAX_BLOCKS);
    expect(codes(r).filter((c) => c === 'too-many-blocks')).toHaveLength(1);
    const s = new NoteSession();
    expect(s.update(text)).toStrictEqual(r);
    // An edit in the last evaluated block, then one beyond the limit.
    const edited = text.replace(`x = ${MAX_BLOCKS - 1} mm`, 'x = 1 mm');
    expect(s.update(edited)).toStrictEqual(evaluateNote(edited));
    const beyond = edited.replace(`x = ${MAX_BLOCKS + 3} mm`, 'x = 2 mm');
    expect(s.update(beyond)).toStrictEqual(evaluateNote(beyond));
  }, 300_000);
});

describe('deep nesting does not reach the Markdown parser', () => {
  const fence = ['```fatigue deep', ...CHECK, '```'];
  const cases: Array<[string, string]> = [
    ['20,000 block quotes on one line, a fence inside', `${'>'.repeat(20_000)} ${fence.join('\n')}\n`],
    ['3,000 nested list markers on one line, then a fence', `${'- '.repeat(3000)}x\n\n${fence.join('\n')}\n`],
    [
      '1,000 list items nested by indentation, then a fence',
      `${Array.from({ length: 1000 }, (_, i) => `${'  '.repeat(i)}- item`).join('\n')}\n\n${fence.join('\n')}\n`,
    ],
    ['a fence inside 1,000 block quotes', `${fence.map((l) => `${'> '.repeat(1000)}${l}`).join('\n')}\n`],
  ];
  for (const [name, text] of cases) {
    it(`${name}: the block is found by the line scan and says so`, () => {
      const t0 = performance.now();
      const r = evaluateNote(text);
      expect(performance.now() - t0).toBeLessThan(10_000);
      expect(r.checks).toHaveLength(1);
      expect(r.checks[0].id).toBe('deep');
      expect(codes(r)[0]).toBe('markdown-fallback');
      expect(r.diagnostics[0].severity).toBe('warning');
      expect(r.checks[0].values.Sut.si).toBe(630e6);
      sound(text, r);
      // The session gives the same, and stays on the full path.
      const s = new NoteSession();
      expect(s.update(text)).toStrictEqual(r);
      const edited = text.replace('d = 35 mm', 'd = 36 mm');
      expect(s.update(edited)).toStrictEqual(evaluateNote(edited));
      expect(s.lastUpdate().kind).toBe('full');
    });
  }

  it(`nesting up to ${MAX_NESTING} levels still goes to the parser`, () => {
    const text = `${'> '.repeat(MAX_NESTING)}\`\`\`fatigue q\n${'> '.repeat(MAX_NESTING)}Sut = 600 MPa\n${'> '.repeat(MAX_NESTING)}\`\`\`\n`;
    expect(nestingOf(text.split('\n')[0])).toBe(MAX_NESTING);
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(1);
    expect(codes(r)).not.toContain('markdown-fallback');
  });

  it('nestingOf counts markers and the indentation before them, not text', () => {
    expect(nestingOf('> > - 1. x')).toBe(4);
    expect(nestingOf('    - x')).toBe(3);
    expect(nestingOf('-x')).toBe(0);
    expect(nestingOf('1234567890. x')).toBe(0);
    expect(nestingOf('Sut = 5 MPa')).toBe(0);
    expect(nestingOf(`${' '.repeat(500)}x`)).toBe(0);
  });

  it('a deep line typed into a note switches the session to the full path and back', () => {
    const base = `${block('a')}\n\nprose\n\n${block('b')}\n`;
    const s = new NoteSession();
    s.update(base);
    const deep = base.replace('prose', `${'>'.repeat(500)} prose`);
    expect(s.update(deep)).toStrictEqual(evaluateNote(deep));
    expect(s.lastUpdate().kind).toBe('full');
    expect(s.update(base)).toStrictEqual(evaluateNote(base));
  });
});

describe('line ends, byte-order marks, tabs', () => {
  const lf = `# Note\n\nProse.\n\n${block('a')}\n\n${block('b', ['Sut = a.Sut', 'Sy = 530 mm', 'd = 35 mm', 'M_a = 10 N*m'])}\n`;

  it('CRLF and CR notes give exactly the results of the LF note (ranges count lines, not bytes)', () => {
    const want = evaluateNote(lf);
    expect(evaluateNote(lf.replace(/\n/g, '\r\n'))).toStrictEqual(want);
    expect(evaluateNote(lf.replace(/\n/g, '\r'))).toStrictEqual(want);
    // Mixed line ends (a CR is never put right before an LF: that pair is one line end).
    let i = 0;
    const mixed = lf.replace(/\n(?!\n)/g, () => ['\n', '\r\n', '\r'][i++ % 3]).replace(/\n\n/g, '\r\n\n');
    expect(evaluateNote(mixed)).toStrictEqual(want);
    const d = want.diagnostics.find((x) => x.code === 'wrong-dimension')!;
    expect(lf.split('\n')[d.range.start.line].slice(d.range.start.character, d.range.end.character)).toBe(
      '530 mm',
    );
  });

  it('a byte-order mark before the first fence shifts its columns by one UTF-16 unit and nothing else', () => {
    const text = `\uFEFF${block('a')}\n`;
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(1);
    expect(r.checks[0].status).toBe('pass');
    expect(r.checks[0].headerRange.start.character).toBe(
      evaluateNote(`${block('a')}\n`).checks[0].headerRange.start.character + 1,
    );
    const line0 = text.split('\n')[0];
    const h = r.checks[0].headerRange;
    expect(line0.slice(h.start.character, h.end.character)).toBe('a');
  });

  it('tabs around names and values: ranges point at the text in UTF-16 columns', () => {
    const text = `${block('t', ['\tSut\t=\t630 mm', 'd\t=\t35 mm', '\tM_a =\t10 N*m'])}\n`;
    const r = evaluateNote(text);
    const lines = text.split('\n');
    const d = r.diagnostics.find((x) => x.code === 'wrong-dimension')!;
    expect(lines[d.range.start.line].slice(d.range.start.character, d.range.end.character)).toBe('630 mm');
    expect(r.checks[0].values.d.si).toBeCloseTo(0.035, 12);
    sound(text, r);
  });

  it('non-UTF-8 bytes decoded as U+FFFD, NUL and control characters, lone surrogates: never a crash', () => {
    const junk = '\uFFFD\u0000\u0001\u001b[31m\uD800\uDFFF\u200B\u202E';
    const text = `${junk}\n${block('j', ['Sut = 630 MPa', `d = 35 ${junk}`, `${junk} = 3`, `title: ${junk}`])}\n${junk}`;
    const r = evaluateNote(text);
    expect(r.checks).toHaveLength(1);
    sound(text, r);
  });

  it('random binary junk around and inside a block never throws and stays sound (fast-check)', () => {
    const junk = fc.string({ unit: 'binary', maxLength: 200 });
    fc.assert(
      fc.property(junk, junk, junk, (a, b, c) => {
        const text = `${a}\n${block('j', ['Sut = 630 MPa', b, 'd = 35 mm', c])}\n${c}`;
        sound(text, evaluateNote(text));
      }),
      { numRuns: 300 },
    );
  });
});
