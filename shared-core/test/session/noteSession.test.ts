/**
 * The incremental session must give exactly what a fresh `evaluateNote` gives on the same
 * text, after any sequence of edits (reference: `evaluateNote` itself, the core's
 * non-incremental evaluator). It must also do less work where the edit allows it.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateNote, type Position } from '../../src/index';
import { NoteSession, type TextChange } from '../../src/session';

const NOTE = [
  '# Hoist drum shafts',
  '',
  'The drum shaft and the gearbox output shaft of the site hoist.',
  '',
  '```fatigue drum_shaft',
  'title: Drum shaft, fillet at the bearing seat',
  'Sut = 630 MPa',
  'Sy = 530 MPa',
  'surface: machined',
  'd = 35 mm',
  'D = 42 mm',
  'r = 1.5 mm',
  'feature: shoulder-fillet',
  'M_max = 180 N*m',
  'M_min = -180 N*m',
  'T_max = 250 N*m',
  'T_min = 250 N*m',
  'temp = 20 degC',
  'criterion: goodman',
  'require: n_f >= 1.5, n_y >= 1.2',
  '```',
  '',
  'Prose between the checks, with `code` and a [link](#x).',
  '',
  '```fatigue gear_shaft',
  'title: Gearbox output shaft',
  'Sut = drum_shaft.Sut',
  'Sy = 530 MPa',
  'surface: ground',
  'kd = drum_shaft.kd',
  'd = 30 mm',
  'd = 31 mm',
  'M_max = 120 N*m',
  'M_min = -120 N*m',
  'require: n_f >= drum_shaft.n_f',
  '```',
  '',
  '- a list item',
  '',
  '  ```fatigue listed',
  '  Sut = 500 MPa',
  '  Sy = 400 MPa',
  '  d = 20 mm',
  '  M_a = 50 N*m',
  '  ```',
  '',
  '> ```fatigue quoted',
  '> Sut = gear_shaft.Sut',
  '> d = 25 mm',
  '> ```',
  '',
  '```fatigue gear_shaft',
  'Sut = 400 MPa',
  '```',
  '',
  '```js',
  'not = a fatigue block',
  '```',
  '',
  '```fatigue last_one',
  'Sut = gear_shaft.Sut',
  'Sy = 300 MPa',
  'd = 10 mm',
  'F_a = 2 kN',
  'require: n_f >= 1',
  '```',
  '',
].join('\n');

/** Position of an offset, counting lines as LSP does (\n, \r\n and \r). */
function positionAt(text: string, offset: number): Position {
  let line = 0;
  let start = 0;
  for (let i = 0; i < offset; i++) {
    const c = text[i];
    if (c === '\n' || c === '\r') {
      if (c === '\r' && text[i + 1] === '\n') {
        if (i + 1 >= offset) break; // an offset between \r and \n stays on the line
        i++;
      }
      line++;
      start = i + 1;
    }
  }
  return { line, character: offset - start };
}

const SNIPPETS = [
  '\n',
  '\n\n',
  'x',
  '5',
  ' ',
  '.',
  '```',
  '```fatigue extra\nSut = 1 MPa\n```\n',
  '```fatigue\n',
  '~~~',
  '\nd = 40 mm\n',
  'drum_shaft.n_f',
  'gear_shaft.Sut',
  'last_one',
  ' = ',
  '# comment',
  '<!--',
  '-->',
  '> ',
  '- ',
  '  ',
  '\nkd = drum_shaft.kd\n',
  '\r\n',
  '\nSut = 700 MPa',
  '\ntitle: another title\n',
  '\nrequire: n_f >= 2\n',
  '\nd = 35 mm\n',
  '\ncriterion: gerber\n',
  '\nmaterial: aisi-1045-cd\n',
  'M_max = 1e9 N*m',
];

const editArb = fc.record({
  at: fc.integer({ min: 0, max: 1_000_000 }),
  length: fc.nat({ max: 40 }),
  snippet: fc.constantFrom(...SNIPPETS),
  hint: fc.boolean(),
});

function apply(text: string, e: { at: number; length: number; snippet: string }) {
  const start = e.at % (text.length + 1);
  const end = Math.min(text.length, start + (e.length > 30 ? 0 : e.length));
  const next = text.slice(0, start) + e.snippet + text.slice(end);
  const change: TextChange = {
    range: { start: positionAt(text, start), end: positionAt(text, end) },
    text: e.snippet,
  };
  return { next, change };
}

describe('NoteSession', () => {
  it('first update equals evaluateNote (reference: evaluateNote)', () => {
    const s = new NoteSession();
    expect(s.update(NOTE)).toStrictEqual(evaluateNote(NOTE));
    expect(s.lastUpdate().kind).toBe('full');
  });

  it('a one-line edit inside a block evaluates that block and the checks that name it', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const text = NOTE.replace('d = 35 mm', 'd = 36 mm');
    expect(s.update(text)).toStrictEqual(evaluateNote(text));
    const stats = s.lastUpdate();
    expect(stats.kind).toBe('block');
    // drum_shaft, then gear_shaft (names drum_shaft), then quoted and last_one (name gear_shaft).
    expect(stats.evaluated).toBe(4);
  });

  it('an edit in a block nobody names evaluates one block', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const text = NOTE.replace('F_a = 2 kN', 'F_a = 3 kN');
    expect(s.update(text)).toStrictEqual(evaluateNote(text));
    expect(s.lastUpdate()).toMatchObject({ kind: 'block', evaluated: 1 });
  });

  it('a line inserted in prose moves later checks without evaluating them', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const text = NOTE.replace('Prose between', 'New line\n\nProse between');
    const lines = text.split('\n');
    const change: TextChange = {
      range: { start: { line: 22, character: 0 }, end: { line: 22, character: 0 } },
      text: 'New line\n\n',
    };
    expect(lines[22]).toBe('New line');
    const r = s.update(text, [change]);
    expect(r).toStrictEqual(evaluateNote(text));
    // gear_shaft states `d` twice: its message cites a line, so it is evaluated again when it moves.
    expect(s.lastUpdate()).toMatchObject({ kind: 'prose', lineDelta: 2, evaluated: 2 });
  });

  it('typing a fence, or editing a block inside a list, falls back to a full evaluation', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const t1 = NOTE.replace('Prose between', '```\nProse between');
    expect(s.update(t1)).toStrictEqual(evaluateNote(t1));
    expect(s.lastUpdate().kind).toBe('full');
    const t2 = t1.replace('  d = 20 mm', '  d = 21 mm');
    expect(s.update(t2)).toStrictEqual(evaluateNote(t2));
    expect(s.lastUpdate().kind).toBe('full');
  });

  it('an abandoned update leaves the session as it was', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const text = NOTE.replace('d = 10 mm', 'd = 12 mm');
    const job = s.start(NOTE.replace('d = 35 mm', 'd = 50 mm\n'));
    job.step();
    expect(s.update(text)).toStrictEqual(evaluateNote(text));
    expect(job.closed).toBe(true);
    expect(() => job.finish()).toThrow(/superseded/);
  });

  it('stays equal to evaluateNote over random edit sequences (fast-check; reference: evaluateNote)', () => {
    const kinds = new Map<string, number>();
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 6 }), (edits) => {
        const s = new NoteSession({ significantDigits: 3, lints: { 'missing-id': false } });
        let text = NOTE;
        s.update(text);
        for (const e of edits) {
          const { next, change } = apply(text, e);
          const got = s.update(next, e.hint ? [change] : undefined);
          if (process.env.SESSION_KINDS) console.log(s.lastUpdate());
          const want = evaluateNote(next, { significantDigits: 3, lints: { 'missing-id': false } });
          expect(got).toStrictEqual(want);
          const kind = s.lastUpdate().kind;
          kinds.set(kind, (kinds.get(kind) ?? 0) + 1);
          text = next;
        }
      }),
      { numRuns: 40 },
    );
    // The random edits reach the incremental paths, not only the full one.
    expect(kinds.get('block') ?? 0).toBeGreaterThan(0);
    expect(kinds.get('prose') ?? 0).toBeGreaterThan(0);
    expect(kinds.get('full') ?? 0).toBeGreaterThan(0);
  });

  it('stays equal over several changes in one update, with US display units', () => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 2, maxLength: 4 }), (edits) => {
        const s = new NoteSession({ unitSystem: 'US' });
        s.update(NOTE);
        let text = NOTE;
        const changes: TextChange[] = [];
        for (const e of edits) {
          const { next, change } = apply(text, e);
          changes.push(change);
          text = next;
        }
        expect(s.update(text, changes)).toStrictEqual(evaluateNote(text, { unitSystem: 'US' }));
      }),
      { numRuns: 30 },
    );
  });

  it('ignores wrong change hints (the text wins)', () => {
    const s = new NoteSession();
    s.update(NOTE);
    const text = NOTE.replace('d = 35 mm', 'd = 38 mm');
    const wrong: TextChange = {
      range: { start: { line: 0, character: 0 }, end: { line: 0, character: 1 } },
      text: 'Q',
    };
    expect(s.update(text, [wrong])).toStrictEqual(evaluateNote(text));
  });
});

describe('NoteSession on CRLF notes and notes with a byte-order mark (issue 7)', () => {
  const variants: Array<[string, string]> = [
    ['CRLF', NOTE.replace(/\n/g, '\r\n')],
    ['a byte-order mark', `\uFEFF${NOTE}`],
    ['a byte-order mark and CRLF', `\uFEFF${NOTE.replace(/\n/g, '\r\n')}`],
  ];
  for (const [name, base] of variants) {
    it(`stays equal to evaluateNote over random edit sequences of a note with ${name} (fast-check; reference: evaluateNote)`, () => {
      fc.assert(
        fc.property(fc.array(editArb, { minLength: 1, maxLength: 5 }), (edits) => {
          const s = new NoteSession();
          let text = base;
          expect(s.update(text)).toStrictEqual(evaluateNote(text));
          for (const e of edits) {
            const { next, change } = apply(text, e);
            expect(s.update(next, e.hint ? [change] : undefined)).toStrictEqual(evaluateNote(next));
            text = next;
          }
        }),
        { numRuns: 25 },
      );
    });
  }

  it('a CRLF note and its LF twin give the same ranges after the same edit', () => {
    const crlf = NOTE.replace(/\n/g, '\r\n');
    const s = new NoteSession();
    s.update(crlf);
    const edited = crlf.replace('d = 35 mm', 'd = 36 mm');
    expect(s.update(edited)).toStrictEqual(evaluateNote(NOTE.replace('d = 35 mm', 'd = 36 mm')));
  });
});

describe('NoteSession and evaluateNote share one loop over blocks', () => {
  const SOLVE = [
    '```fatigue sized',
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'feature: shoulder-fillet',
    'D = 1.2 * d',
    'r = 0.05 * d',
    'M_max = 180 N*m',
    'M_min = -180 N*m',
    'criterion: goodman',
    'solve: d for n_f = 1.5',
    '```',
    '',
    '```fatigue after',
    'Sut = sized.Sut',
    'd = sized.d',
    'M_a = 50 N*m',
    '```',
    '',
  ].join('\n');

  it('a design-mode block (solve:) gives in the session what evaluateNote gives, before and after an edit', () => {
    const s = new NoteSession({ lints: { 'missing-id': false } });
    expect(s.update(SOLVE)).toStrictEqual(evaluateNote(SOLVE, { lints: { 'missing-id': false } }));
    expect(s.result().checks[0].values.d.origin).toBe('computed');
    const edited = SOLVE.replace('M_max = 180 N*m', 'M_max = 200 N*m');
    expect(s.update(edited)).toStrictEqual(evaluateNote(edited, { lints: { 'missing-id': false } }));
    expect(s.lastUpdate()).toMatchObject({ kind: 'block', evaluated: 2 });
  });
});

describe('lints that cannot be turned off', () => {
  const note = (extra: string[]) =>
    [
      '```fatigue c',
      'Sut = 600 MPa',
      'Sy = 450 MPa',
      'material-family: steel',
      'surface: machined',
      'temp = 20 degC',
      'reliability = 0.9',
      'd = 30 mm',
      'feature: none',
      'M_a = 700 N*m',
      ...extra,
      'require: n_y >= 1',
      '```',
      '',
    ].join('\n');
  const offAll = (text: string) =>
    Object.fromEntries(evaluateNote(text).checks[0].diagnostics.map((d) => [d.code, false]));

  it('a pass that hides a finite life keeps its warning whatever the lints say', () => {
    const text = note([]);
    const codes = evaluateNote(text).checks[0].diagnostics.map((d) => d.code);
    expect(codes).toContain('hidden-finite-life');
    const kept = evaluateNote(text, { lints: offAll(text) }).checks[0].diagnostics.map((d) => d.code);
    expect(kept).toEqual(['hidden-finite-life']);
  });

  it('an error stays whatever the lints say', () => {
    const text = note(['kb =']);
    const kept = evaluateNote(text, { lints: offAll(text) }).checks[0].diagnostics;
    expect(kept.some((d) => d.code === 'missing-value')).toBe(true);
    for (const d of kept) expect(d.severity === 'error' || d.code === 'hidden-finite-life').toBe(true);
  });
});
