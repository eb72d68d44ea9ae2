/**
 * The client's pure views: the panel model, the status text, the preview plugin, the
 * check templates and the block grammar. Each must present the core's results as they
 * are, never recompute them.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { checkDiagrams, evaluateNote } from '@fatigue-notes/core';
import { describe, expect, it } from 'vitest';
import { templateChoices, templateSnippetFor } from '../../server/src/lsp/templates';
import { buildDetail, buildPanelModel, buildRows } from '../src/panel/model';
import { fatiguePreviewPlugin, type MarkdownItLike, type Token } from '../src/preview';
import { statusText } from '../src/statusText';
import { worstSafetyFactor } from '../src/summary';
import { freshId } from '../src/templates';
import { serverSummary } from './serverSummary';

const ROOT = resolve(__dirname, '../..');
const CONTRACT = readFileSync(resolve(ROOT, 'test/fixtures/contract-example.md'), 'utf8');
const FAILING = `
\`\`\`fatigue lever_arm
Sut = 500 MPa
Sy = 300 MPa
surface: hot-rolled
d = 20 mm
feature: none
M_max = 200 N*m
M_min = -100 N*m
criterion: goodman
require: n_f >= 2
\`\`\`
`;

const DAMAGE = `
\`\`\`fatigue hoist_spectrum
method: damage
Sut = 600 MPa
Sy = 450 MPa
surface: machined
d = 30 mm
feature: none
criterion: goodman
spectrum: sigma_a = 300 MPa, sigma_m = 100 MPa, n = 2000
spectrum: sigma_a = 250 MPa, n = 1e4
\`\`\`
`;
const CRACK = `
\`\`\`fatigue seam
method: crack-growth
C_paris = 6.9e-12
m_paris = 3.0
a_i = 1 mm
K_IC = 100 MPa*m^0.5
Y = 1.12
sigma_max = 200 MPa
sigma_min = 20 MPa
\`\`\`
`;
/** A stated Kt without a notch feature: the tool's own value is Kt = 1, and it says why. */
const STATED_KT = `
\`\`\`fatigue stated_kt
Sut = 600 MPa
Sy = 400 MPa
d = 30 mm
Kt = 1.85
M_max = 100 N*m
M_min = -100 N*m
\`\`\`
`;

describe('panel model', () => {
  const checks = evaluateNote(CONTRACT + FAILING).checks;
  const summary = serverSummary(CONTRACT + FAILING);

  it('shows each check with its own displays and numeric sort keys', () => {
    const rows = buildRows(summary);
    expect(rows.map((r) => r.id)).toEqual(['drive_shaft_fillet', 'lever_arm']);
    expect(rows[0].n_f).toEqual({ text: checks[0].values.n_f.display, sort: checks[0].values.n_f.si });
    // Infinite life sorts after every finite life.
    expect(rows[0].life).toMatchObject({ name: 'N_f', text: 'infinite', sort: 1e308 });
    expect(rows[1].life.sort).toBe(checks[1].values.N_f.si);
    expect(rows[0].line).toBe(3);
  });

  it('shows the diagrams the server drew, without an embedded style (the page supplies it under its CSP)', () => {
    const m = buildPanelModel({ fileName: 'a.md' }, summary);
    expect(m.state).toBe('note');
    expect(m.details[0].diagrams.map((d) => d.kind)).toEqual(['haigh', 'sn']);
    // The very SVG the core draws for this check: the panel passes it on, it draws nothing.
    expect(m.details[0].diagrams).toEqual(checkDiagrams(checks[0], { embedStyle: false }));
    for (const d of m.details[0].diagrams) expect(d.svg).not.toContain('<style');
    expect(m.details[0].derivation.find((d) => d.name === 'n_f')?.source).toContain('Shigley');
    expect(m.details[1].requirements).toEqual([
      { text: 'n_f >= 2', actual: checks[1].values.n_f.display, met: false },
    ]);
  });

  it('names the life column from the server: damage D_sum for a damage check, N_cg for crack growth', () => {
    const damage = serverSummary(DAMAGE);
    expect(buildRows(damage)[0].life).toMatchObject({ name: 'D_sum', text: damage[0].values.D_sum.display });
    const crack = serverSummary(CRACK);
    expect(buildRows(crack)[0].life).toMatchObject({ name: 'N_cg', text: crack[0].values.N_cg.display });
  });

  it('says what the tool would compute beside a stated value, in the core words', () => {
    const s = serverSummary(STATED_KT);
    const kt = buildDetail(s[0], 0).derivation.find((d) => d.name === 'Kt');
    expect(kt?.tool).toBe(`${s[0].values.Kt.tool?.label} (Kt = 1)`);
    expect(kt?.tool).toMatch(/^fit 1: no notch feature stated/);
  });

  it('has a state for no note, no checks and a failed request', () => {
    expect(buildPanelModel(undefined, []).state).toBe('no-note');
    expect(buildPanelModel({ fileName: 'a.md' }, []).state).toBe('no-checks');
    expect(buildPanelModel({ fileName: 'a.md' }, summary, 'down').state).toBe('error');
  });
});

describe('status bar text', () => {
  it('names the smallest safety factor and where it is', () => {
    const checks = serverSummary(CONTRACT + FAILING);
    const worst = worstSafetyFactor(checks)!;
    // The smallest of the n_f and n_y values the checks report.
    const all = checks
      .flatMap((c) => [c.values.n_f?.si, c.values.n_y?.si])
      .filter((x): x is number => typeof x === 'number');
    expect(worst.value).toBe(Math.min(...all));
    expect(worst).toMatchObject({ name: 'n_f', check: 'lever_arm' });
    const t = statusText({ checks });
    expect(t.text).toBe(`$(warning) lowest safety factor ${worst.display}`);
    expect(t.alarm).toBe(true);
    expect(t.tooltip).toContain('1 pass, 1 fail');
    expect(statusText({ checks: serverSummary(CONTRACT) }).alarm).toBe(false);
  });
});

/**
 * The smallest stand-in for markdown-it that exercises the plugin: fences only, parsed with
 * one env (without the document) and rendered with another (holding it), as VS Code's
 * preview does.
 */
function fakeMarkdownIt(): MarkdownItLike & { render(src: string, uri?: string): string } {
  const rules: Array<(s: { src: string; tokens: Token[]; env?: unknown }) => void> = [];
  const md = {
    core: {
      ruler: {
        push: (_n: string, r: (s: { src: string; tokens: Token[]; env?: unknown }) => void) => rules.push(r),
      },
    },
    renderer: {
      rules: {
        fence: (tokens: Token[], idx: number) => `<pre data-info="${tokens[idx].info}"></pre>`,
      } as MarkdownItLike['renderer']['rules'],
    },
    utils: {
      escapeHtml: (s: string) =>
        s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;'),
    },
    render(src: string, uri = 'file:///note.md'): string {
      const lines = src.split('\n');
      const tokens: Token[] = [];
      for (let i = 0; i < lines.length; i++) {
        const m = /^```(.*)$/.exec(lines[i]);
        if (!m?.[1]) continue;
        let j = i + 1;
        while (j < lines.length && !/^```\s*$/.test(lines[j])) j++;
        tokens.push({ type: 'fence', info: m[1], map: [i, j + 1], meta: null });
        i = j;
      }
      // As VS Code does: the parse has no document; the render's env holds it as a Uri
      // object, whose toString() is the URI.
      for (const r of rules) r({ src, tokens, env: { currentDocument: undefined } });
      const env = { currentDocument: { toString: () => uri } };
      return tokens.map((_, i) => md.renderer.rules.fence!(tokens, i, {}, env, {})).join('\n');
    },
  };
  return md;
}

describe('Markdown preview plugin', () => {
  const text = `${CONTRACT}\n\`\`\`js\nx\n\`\`\`\n${FAILING}`;

  it("renders the server's results for the note under each block: results, requirements, status", () => {
    const md = fakeMarkdownIt();
    const summary = serverSummary(text);
    const asked: Array<string | undefined> = [];
    fatiguePreviewPlugin(
      md,
      () => ({ enabled: true }),
      (uri) => {
        asked.push(uri);
        return { state: 'ready', checks: summary };
      },
    );
    const html = md.render(text);
    expect(asked).toEqual(['file:///note.md']);
    expect(html).toContain('data-check="drive_shaft_fillet"');
    expect(html).toContain('fatigue-notes-pass');
    // The rows are the ones the server names for the check, in its order, with its displays.
    const first = html.slice(
      html.indexOf('data-check="drive_shaft_fillet"'),
      html.indexOf('data-check="lever_arm"'),
    );
    const names = [...first.matchAll(/<th scope="row"><code>([^<]+)<\/code>/g)].map((m) => m[1]);
    expect(names).toEqual(summary[0].shown?.table);
    expect(names.slice(0, 3)).toEqual(['n_f', 'n_y', 'N_f']);
    for (const n of names)
      expect(first).toContain(`<td class="fatigue-notes-num">${summary[0].values[n].display}</td>`);
    expect(html).toContain('fatigue-notes-fail');
    expect(html).toContain('✗ <code>n_f &gt;= 2</code>');
    // `D` of a stress-life check is the shoulder diameter, not a damage: not among the results.
    expect(html).not.toContain('<code>D</code>');
    // A block of another language is left alone.
    expect(html).toContain('<pre data-info="js"></pre>\n<pre');
  });

  it('says "evaluating…" under every block until the results of this version are in, and numbers none', () => {
    const md = fakeMarkdownIt();
    fatiguePreviewPlugin(
      md,
      () => ({ enabled: true }),
      () => ({ state: 'evaluating' }),
    );
    const html = md.render(text);
    expect(html.match(/evaluating…/g)).toHaveLength(2);
    expect(html).not.toContain('fatigue-notes-num');
    expect(html).not.toContain('<pre data-info="js"></pre><div');
  });

  it('says why when there are no results, and can be switched off', () => {
    const md = fakeMarkdownIt();
    let enabled = true;
    fatiguePreviewPlugin(
      md,
      () => ({ enabled }),
      () => ({ state: 'unavailable', message: 'the <server> is not running' }),
    );
    expect(md.render(CONTRACT)).toContain('the &lt;server&gt; is not running');
    enabled = false;
    expect(md.render(CONTRACT)).not.toContain('fatigue-notes-result');
  });

  it('shows the server units (US here) and the damage of a damage check', () => {
    const md = fakeMarkdownIt();
    const us = serverSummary(CONTRACT, { unitSystem: 'US' });
    const damage = serverSummary(DAMAGE);
    let checks = us;
    fatiguePreviewPlugin(
      md,
      () => ({ enabled: true }),
      () => ({ state: 'ready', checks }),
    );
    expect(md.render(CONTRACT)).toMatch(/ksi<\/td>/);
    checks = damage;
    const html = md.render(DAMAGE);
    expect(html).toContain(
      `<th scope="row"><code>D_sum</code></th><td class="fatigue-notes-num">${damage[0].values.D_sum.display}</td>`,
    );
  });
});

describe('check templates', () => {
  it('picks an id that is not used yet', () => {
    expect(freshId('```fatigue section_1\n```\n```fatigue section_2\n```', 'section')).toBe('section_3');
    expect(freshId('', 'crack')).toBe('crack_1');
  });

  it('gives blocks that the core reads as the chosen method, with only placeholders to fill', () => {
    for (const c of templateChoices()) {
      for (const system of ['SI', 'US'] as const) {
        // Expand the snippet as VS Code would with its defaults: ${1:x} -> x, ${1|a,b|} -> a.
        const text = templateSnippetFor({ kind: c.kind, id: 'x_1', system })
          .snippet.replace(/\$\{\d+\|([^,|]+)[^}]*\}/g, '$1')
          .replace(/\$\{\d+:([^}]*)\}/g, '$1')
          .replace(/\$0/, '');
        const r = evaluateNote(text);
        expect(r.checks).toHaveLength(1);
        expect(r.checks[0].id).toBe('x_1');
        expect(r.checks[0].method).toBe(c.method);
        // No unknown names or options: only the `?` placeholders are errors.
        const codes = new Set(r.checks[0].diagnostics.map((d) => d.code));
        for (const bad of [
          'unknown-option',
          'unknown-option-value',
          'unknown-name',
          'wrong-dimension',
          'missing-unit',
        ])
          expect(codes.has(bad), `${c.kind} ${system}: ${bad}`).toBe(false);
        if (system === 'US' && c.kind !== 'crack-growth') expect(text).toContain('ksi');
      }
    }
  });
});

describe('block grammar', () => {
  const grammar = JSON.parse(readFileSync(resolve(ROOT, 'syntaxes/fatigue-block.tmLanguage.json'), 'utf8'));
  const manifest = JSON.parse(readFileSync(resolve(ROOT, 'client/package.json'), 'utf8'));

  it('is injected into Markdown under the scope the manifest declares', () => {
    const g = manifest.contributes.grammars[0];
    expect(g.scopeName).toBe(grammar.scopeName);
    expect(g.injectTo).toEqual(['text.html.markdown']);
    expect(grammar.injectionSelector).toBe('L:text.html.markdown');
  });

  /** Oniguruma patterns as JavaScript regexps (\G is the line start in the cases tested here). */
  const js = (p: string) => new RegExp(p.replace(/\\G/g, '^'), 'm');
  const rules = grammar.repository;

  it('opens on ```fatigue id and on ~~~fatigue, not on other languages', () => {
    const begin = js(rules['fatigue-fence'].begin);
    expect(begin.exec('```fatigue drive_shaft')?.[5]).toBe('drive_shaft');
    expect(begin.test('~~~~ fatigue')).toBe(true);
    expect(begin.test('```python')).toBe(false);
    expect(begin.test('```fatigues x')).toBe(false);
  });

  it('reads numbers with units, names, options, requirements and references', () => {
    const quantity = js(rules.expression.patterns[0].match);
    const cases: Array<[string, string, string | undefined]> = [
      ['630 MPa', '630', 'MPa'],
      ['250 N*m', '250', 'N*m'],
      ['50 MPa*m^0.5', '50', 'MPa*m^0.5'],
      ['1.2e6', '1.2e6', undefined],
      ['35 mm', '35', 'mm'],
      ['1500 lbf*in', '1500', 'lbf*in'],
      ['99 %', '99', '%'],
      ['0.04 * d', '0.04', undefined],
    ];
    for (const [src, num, unit] of cases) {
      const m = quantity.exec(src);
      expect(m?.[1], src).toBe(num);
      expect(m?.[2], src).toBe(unit);
    }
    expect(quantity.exec('sigma_f_prime2')).toBeNull();
    const ref = js(rules.expression.patterns[2].match).exec('0.9 * shaft_a.Se');
    expect([ref?.[1], ref?.[3]]).toEqual(['shaft_a', 'Se']);
    expect(js(rules.option.match).exec('surface: machined')?.slice(1, 4)).toEqual([
      'surface',
      ':',
      'machined',
    ]);
    expect(js(rules['option-title'].match).exec('title: Drive shaft, fillet')?.[3]).toBe(
      'Drive shaft, fillet',
    );
    expect(js(rules.require.begin).test('require: n_f >= 1.5')).toBe(true);
    expect(js(rules.solve.patterns[1].match).exec('d for n_f = 1.5')?.slice(1, 3)).toEqual(['d', 'for']);
    expect(js(rules.assignment.begin).exec('Sut = 630 MPa')?.[1]).toBe('Sut');
    expect(js(rules.assignment.begin).test('n_f == 2')).toBe(false);
    expect(js(rules.comment.match).exec('d = 35 mm  # at the bearing')?.[0]).toBe('# at the bearing');
  });
});
