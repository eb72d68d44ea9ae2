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
  nameInfo,
  OPTIONS,
  registerMethod,
  templateSnippetOf,
} from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { completionsAt } from '../src/lsp/completion';
import { hoverAt } from '../src/lsp/hover';
import { inlayHintsFor } from '../src/lsp/inlayHints';
import type { NoteView } from '../src/lsp/locate';
import { DEFAULT_SETTINGS } from '../src/lsp/settings';
import { summaryOfResult } from '../src/lsp/summary';
import { buildReportHtml } from '../src/report/reportHtml';

const RATIO: MethodModule = {
  name: 'yield-ratio',
  meaning: 'the yield ratio Sy / Sut of the material (test only)',
  docs: 'test only',
  words: {
    inputs: { ratio_floor: { dim: 'one', meaning: 'smallest acceptable yield ratio (test only)' } },
    results: { yield_ratio: { dim: 'one', meaning: 'Sy / Sut of the material (test only)' } },
    options: {
      'ratio-basis': { meaning: 'which strengths (test only)', values: { nominal: 'as stated (test only)' } },
    },
    renamed: { ratio: 'yield_ratio' },
  },
  run(ctx) {
    const sut = ctx.si('Sut');
    const sy = ctx.si('Sy');
    if (sut === undefined || sy === undefined || !(sut > 0)) return {};
    const range = ctx.optionRange('method');
    ctx.result('n_y', computed(sy / sut, 'n_y = Sy / Sut', 'test only'), ['Sy', 'Sut']);
    ctx.result('yield_ratio', computed(sy / sut, 'yield_ratio = Sy / Sut', 'test only'), ['Sy', 'Sut'], {
      ...(range ? { range } : {}),
    });
    return { ratioBars: [sy / sut] } as unknown as MethodExtras;
  },
  fields: ['ratioBars' as never],
  headline: { summary: ['yield_ratio', 'n_y'], preview: ['yield_ratio', 'n_y', 'Sut'], life: ['n_y'] },
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
    expect(c.values.yield_ratio?.si).toBeCloseTo(450 / 600, 12);
    expect(headlineValues(c).map((v) => v.name)).toEqual(['yield_ratio', 'n_y']);
    expect(methodViews('yield-ratio').preview).toEqual(['yield_ratio', 'n_y', 'Sut']);
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

  it('declares its own words while registered', () => {
    expect(nameInfo('yield_ratio')?.meaning).toBe('Sy / Sut of the material (test only)');
  });

  it('reaches the hover, the inline hints, the server summary (panel, preview) and the report', () => {
    const v = view(NOTE);
    const hover = hoverAt(v, { line: 1, character: 2 });
    expect(JSON.stringify(hover?.contents)).toContain('yield-ratio');
    const hints = inlayHintsFor(v, { start: { line: 0, character: 0 }, end: { line: 5, character: 0 } });
    const text = hints.map((h) =>
      typeof h.label === 'string' ? h.label : h.label.map((p) => p.value).join(''),
    );
    expect(text.join(' ')).toContain('yield_ratio');
    const sum = summaryOfResult('file:///note.md', 1, v.result, 4).checks[0];
    expect(sum.shown.headline).toEqual(['yield_ratio', 'n_y']);
    expect(sum.shown.table).toEqual(['yield_ratio', 'n_y', 'Sut']);
    expect((sum as unknown as { ratioBars: number[] }).ratioBars).toEqual([0.75]);
    expect(sum.diagrams.map((d) => d.kind)).toEqual(['yield-ratio']);
    const html = buildReportHtml({
      noteName: 'note.md',
      result: v.result,
      register: assumptionsRegister(v.result, NOTE),
      toolVersion: 'test',
      runDate: 'today',
    });
    expect(html).toContain('width="75"');
    expect(html).toContain(
      `<span class="sym">yield_ratio</span>&nbsp;=&nbsp;${sum.values.yield_ratio.display}`,
    );
  });

  it("scopes its words: its own checks read and offer them, another method's check is told they are not its", () => {
    const own = view(
      [
        '```fatigue r1',
        'method: yield-ratio',
        'ratio-basis: nominal',
        'Sut = 600 MPa',
        'Sy = 450 MPa',
        '',
        '```',
        '',
      ].join('\n'),
    );
    const offered = completionsAt(own, { line: 5, character: 0 }).map((i) => i.label);
    expect(offered).toContain('ratio_floor');
    expect(offered).toContain('ratio-basis:');
    expect(own.result.checks[0].diagnostics.filter((d) => d.code === 'word-of-other-method')).toEqual([]);
    const other = view(
      [
        '```fatigue s1',
        'method: stress-life',
        'ratio-basis: nominal',
        'ratio_floor = 0.8',
        'd = 20 mm',
        '',
        '```',
        '',
      ].join('\n'),
    );
    const c = other.result.checks[0];
    const flagged = c.diagnostics.filter((d) => d.code === 'word-of-other-method');
    expect(flagged.map((d) => d.range.start.line)).toEqual([2, 3]);
    expect(flagged[1].message).toContain('`method: yield-ratio`');
    expect(flagged[1].range.end.character - flagged[1].range.start.character).toBe('ratio_floor'.length);
    const notOffered = completionsAt(other, { line: 5, character: 0 }).map((i) => i.label);
    expect(notOffered).not.toContain('ratio_floor');
    expect(notOffered).not.toContain('yield_ratio');
    expect(notOffered).not.toContain('ratio-basis:');
    expect(notOffered).toContain('Kt');
    expect(JSON.stringify(hoverAt(other, { line: 3, character: 2 })?.contents)).toContain(
      'A word of `method: yield-ratio` checks',
    );
  });

  it("keeps a renamed result's old name as an alias, with a hint that offers the new one", () => {
    const c = evaluateNote(NOTE.replace('```\n', 'require: ratio >= 0.5\n```\n')).checks[0];
    const d = c.diagnostics.find((x) => x.code === 'renamed-result');
    expect(d?.fixes?.[0].edits[0].newText).toBe('yield_ratio');
    expect(c.requirements[0].met).toBe(true);
    expect(c.status).toBe('pass');
  });

  it('is gone once unregistered', () => {
    unregister();
    expect(OPTIONS.method.values?.['yield-ratio']).toBeUndefined();
    expect(nameInfo('yield_ratio')).toBeUndefined();
    expect(nameInfo('ratio_floor')).toBeUndefined();
    expect(OPTIONS['ratio-basis']).toBeUndefined();
    expect(evaluateNote(NOTE).checks[0].diagnostics.some((d) => d.severity === 'error')).toBe(true);
    unregister = registerMethod(RATIO);
  });
});
