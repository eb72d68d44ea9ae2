/**
 * The language server's lookups of a word under the cursor or from the client (issue 16,
 * item 5): hover, navigation, rename and the settings see only the note's and the tables'
 * own words, never what every JavaScript object has. Rule of the project (docs/language.md,
 * "Limits"); no published value.
 */
import { evaluateNote } from '@fatigue-notes/core';
import { describe, expect, it } from 'vitest';
import { completionsAt } from '../src/lsp/completion';
import { hoverAt } from '../src/lsp/hover';
import type { NoteView } from '../src/lsp/locate';
import { definitionAt, RenameRefused, referencesAt, renameAt } from '../src/lsp/navigation';
import { DEFAULT_SETTINGS, readSettings } from '../src/lsp/settings';

const WORDS = Object.getOwnPropertyNames(Object.prototype);
const RUNTIME = /native code|\[object |undefined/;

function view(text: string): NoteView {
  const lines = text.split('\n');
  return {
    uri: 'file:///note.md',
    version: 1,
    result: evaluateNote(text),
    lineCount: lines.length,
    line: (n) => lines[n] ?? '',
    settings: DEFAULT_SETTINGS,
    timings: [],
  };
}

describe('server lookups of words every JavaScript object has (issue 16, item 5)', () => {
  for (const w of WORDS)
    it(`\`${w}\` under the cursor: hover, definition, references and completion never show the runtime`, () => {
      const text = [
        '```fatigue ' + w,
        'Sut = 600 MPa',
        '```',
        '',
        '```fatigue c1',
        'Sut = 600 MPa',
        `x1 = ${w}`,
        `x2 = ${w}.Sut`,
        `x3 = c1.${w}`,
        `criterion: ${w}`,
        '```',
        '',
      ].join('\n');
      const v = view(text);
      const lines = text.split('\n');
      for (let l = 0; l < lines.length; l++)
        for (let c = 0; c <= lines[l].length; c++) {
          const pos = { line: l, character: c };
          const out = JSON.stringify([
            hoverAt(v, pos),
            definitionAt(v, pos),
            referencesAt(v, pos, true),
            completionsAt(v, pos).map((i) => [i.label, i.detail]),
          ]);
          expect(out, `${l}:${c}`).not.toMatch(RUNTIME);
        }
    });

  it('rename refuses a reserved word as a check id or a name, with a reason', () => {
    const text = ['```fatigue shaft', 'Sut = 600 MPa', 'load_factor = 1.2', '```', ''].join('\n');
    const v = view(text);
    for (const w of ['constructor', '__proto__', 'valueOf', 'hasOwnProperty']) {
      expect(() => renameAt(v, { line: 0, character: 12 }, w)).toThrow(RenameRefused);
      expect(() => renameAt(v, { line: 0, character: 12 }, w)).toThrow(/reserved/);
      expect(() => renameAt(v, { line: 2, character: 3 }, w)).toThrow(/reserved/);
    }
    expect(renameAt(v, { line: 2, character: 3 }, 'factor').changes?.['file:///note.md']).toHaveLength(1);
  });

  it('settings from the client: `__proto__` and `constructor` as lint keys are plain keys, not the prototype', () => {
    const s = readSettings(
      JSON.parse('{"lints": {"__proto__": false, "constructor": false, "missing-id": false}}'),
    );
    expect(Object.getPrototypeOf(s.lints)).toBeNull();
    expect(s.lints['missing-id']).toBe(false);
    expect(s.lints.constructor).toBe(false);
    expect(Object.keys(s.lints).sort()).toEqual(['__proto__', 'constructor', 'missing-id']);
    expect(readSettings({}).lints.toString).toBeUndefined();
  });
});
