// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/**
 * A method added by one folder and one registry line reaches every view: a small test-only
 * method (the yield ratio Sy / Sut of a material, with a bar diagram drawn from its own data)
 * is registered and then found in `method:`'s words, the completion's snippets, the headline,
 * the preview rows, the templates, the diagrams and the assumptions register. The expected
 * ratio is computed here from the stated strengths (Sy / Sut = 450 / 600 = 0.75, arithmetic).
 */
import {
  assumptionsRegister,
  checkDiagrams,
  computed,
  evaluateNote,
  headlineValues,
  type MethodExtras,
  type MethodModule,
  methodTemplates,
  methodViews,
  OPTIONS,
  registerMethod,
  templateSnippetOf,
} from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { completionsAt } from '../src/lsp/completion';
import type { NoteView } from '../src/lsp/locate';
import { DEFAULT_SETTINGS } from '../src/lsp/settings';

const RATIO: MethodModule = {
  name: 'yield-ratio',
  meaning: 'the yield ratio Sy / Sut of the material (test only)',
  docs: 'test only',
  run(ctx) {
    const sut = ctx.si('Sut');
    const sy = ctx.si('Sy');
    if (sut === undefined || sy === undefined || !(sut > 0)) return {};
    ctx.result('n_y', computed(sy / sut, 'n_y = Sy / Sut', 'test only'), ['Sy', 'Sut']);
    return { ratioBars: [sy / sut] } as unknown as MethodExtras;
  },
  fields: ['ratioBars' as never],
  headline: { summary: ['n_y'], preview: ['n_y', 'Sut'], life: ['n_y'] },
  diagrams: [
    {
      kind: 'yield-ratio',
      title: 'Yield ratio',
      draw: (c) => {
        const bars = (c as { ratioBars?: number[] }).ratioBars;
        return bars
          ? `<svg xmlns="http://www.w3.org/2000/svg"><rect width="${bars[0] * 100}" height="10"/></svg>`
          : null;
      },
    },
  ],
  snippet: {
    label: 'fatigue check: yield ratio',
    body: () => ['```fatigue ${1:id}', 'method: yield-ratio', '```'],
  },
  templates: [
    {
      kind: 'yield-ratio',
      label: 'Yield ratio',
      detail: 'test only',
      idStem: 'ratio',
      body: (u) => ['method: yield-ratio', `Sut = 600 ${u.stress}`, `Sy = 450 ${u.stress}`],
    },
  ],
  defaultedOptions: { rotation: () => true },
};

const NOTE = ['```fatigue r1', 'method: yield-ratio', 'Sut = 600 MPa', 'Sy = 450 MPa', '```', ''].join('\n');

let unregister: () => void = () => {};
beforeAll(() => {
  unregister = registerMethod(RATIO);
});
afterAll(() => unregister());

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

describe('a registered method', () => {
  it('is a word of `method:` and runs its pipeline', () => {
    expect(OPTIONS.method.values?.['yield-ratio']).toBe(RATIO.meaning);
    const r = evaluateNote(NOTE);
    const c = r.checks[0];
    expect(c.method).toBe('yield-ratio');
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(c.values.n_y?.si).toBeCloseTo(450 / 600, 12);
    expect(headlineValues(c).map((v) => v.display)).toEqual([c.values.n_y.display]);
    expect(methodViews('yield-ratio').preview).toEqual(['n_y', 'Sut']);
  });

  it('draws its own diagram from its own field, kept in the JSON', () => {
    const c = evaluateNote(NOTE).checks[0];
    expect(JSON.parse(JSON.stringify(c)).ratioBars).toEqual([0.75]);
    const d = checkDiagrams(c);
    expect(d.map((x) => x.kind)).toEqual(['yield-ratio']);
    expect(d[0].svg).toContain('width="75"');
  });

  it('is offered by the completion of `method:` and of a new block', () => {
    const v = view(NOTE);
    const words = completionsAt(v, { line: 1, character: 'method: '.length }).map((i) => i.label);
    expect(words).toContain('yield-ratio');
    const snippets = completionsAt(view(`\n${NOTE}`), { line: 0, character: 0 }).map((i) => i.label);
    expect(snippets).toContain('fatigue check: yield ratio');
  });

  it('has a template that evaluates as its method, and assumption entries of its own', () => {
    const t = methodTemplates().find((x) => x.method === 'yield-ratio');
    expect(t?.kind).toBe('yield-ratio');
    const text = templateSnippetOf('yield-ratio', 'ratio_1', 'SI')
      .replace(/\$\{\d+:([^}]*)\}/g, '$1')
      .replace('$0', '');
    expect(evaluateNote(text).checks[0].method).toBe('yield-ratio');
    const reg = assumptionsRegister(evaluateNote(NOTE), NOTE);
    expect(reg.some((e) => e.kind === 'default-option' && e.name === 'rotation')).toBe(true);
  });

  it('is gone once unregistered', () => {
    unregister();
    expect(OPTIONS.method.values?.['yield-ratio']).toBeUndefined();
    expect(evaluateNote(NOTE).checks[0].diagnostics.some((d) => d.severity === 'error')).toBe(true);
    unregister = registerMethod(RATIO);
  });
});
