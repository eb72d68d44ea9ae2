/**
 * Markdown preview: under each ```fatigue block, a table of the check's main results, its
 * requirements and its status. The note is evaluated by the core in-process (it is pure);
 * load-history files are not read here, so a damage check driven by a history says so.
 */
import { type CheckResult, evaluateNote, methodViews } from '@fatigue-notes/core';

/** The parts of markdown-it this plugin uses (the preview passes its own instance). */
export interface MarkdownItLike {
  core: {
    ruler: { push(name: string, rule: (state: { src: string; tokens: Token[] }) => void): void };
  };
  renderer: { rules: Record<string, RenderRule | undefined> };
  utils: { escapeHtml(s: string): string };
}

export interface Token {
  type: string;
  info: string;
  map: [number, number] | null;
  meta: Record<string, unknown> | null;
}

type RenderRule = (
  tokens: Token[],
  idx: number,
  options: unknown,
  env: Record<string, unknown>,
  self: unknown,
) => string;

export interface PreviewSettings {
  enabled: boolean;
  unitSystem: 'auto' | 'SI' | 'US';
  significantDigits: number;
  lints?: Record<string, boolean>;
}

const META_KEY = 'fatigueNotesResults';
const STATUS: Record<CheckResult['status'], string> = {
  pass: '✓ pass',
  fail: '✗ fail',
  error: '! error',
  unchecked: '– unchecked',
};

function isFatigueFence(info: string): boolean {
  return /^fatigue(\s|$)/.test(info.trim());
}

export function fatiguePreviewPlugin(md: MarkdownItLike, settings: () => PreviewSettings): MarkdownItLike {
  // The results travel on the fence tokens themselves: VS Code parses with one `env` and
  // renders (possibly from its token cache) with another.
  md.core.ruler.push('fatigue_notes_evaluate', (state) => {
    const s = settings();
    if (!s.enabled) return;
    const fences = state.tokens.filter((t) => t.type === 'fence' && isFatigueFence(t.info));
    if (fences.length === 0) return;
    const result = evaluateNote(state.src, {
      unitSystem: s.unitSystem,
      significantDigits: s.significantDigits,
      ...(s.lints ? { lints: s.lints } : {}),
    });
    fences.forEach((token, n) => {
      // The n-th fatigue fence of the note is the n-th check; the opening line confirms it.
      const line = token.map?.[0];
      const check = result.checks.find((c) => c.range.start.line === line) ?? result.checks[n];
      if (check) token.meta = { ...(token.meta ?? {}), [META_KEY]: renderCheck(check, md.utils.escapeHtml) };
    });
  });
  const fallback: RenderRule = (tokens, idx, options, _env, self) =>
    (self as { renderToken(t: Token[], i: number, o: unknown): string }).renderToken(tokens, idx, options);
  const original = md.renderer.rules.fence ?? fallback;
  md.renderer.rules.fence = (tokens, idx, options, env, self) => {
    const html = original(tokens, idx, options, env, self);
    const extra = tokens[idx].meta?.[META_KEY];
    return typeof extra === 'string' && settings().enabled ? html + extra : html;
  };
  return md;
}

export function renderCheck(c: CheckResult, esc: (s: string) => string): string {
  const rows = methodViews(c.method)
    .preview.filter((n) => c.values[n])
    .map((n) => {
      const v = c.values[n];
      return `<tr><th scope="row"><code>${esc(n)}</code></th><td class="fatigue-notes-num">${esc(v.display)}</td><td>${esc(v.meaning)}</td></tr>`;
    });
  const reqs = c.requirements.map((r) => {
    const mark = r.met === true ? '✓' : r.met === false ? '✗' : '?';
    const cls = r.met === true ? 'met' : r.met === false ? 'not-met' : 'unknown';
    return `<li class="fatigue-notes-req-${cls}">${mark} <code>${esc(r.text)}</code>: ${esc(r.actualDisplay)}</li>`;
  });
  const errors = c.diagnostics.filter((d) => d.severity === 'error');
  const warnings = c.diagnostics.filter((d) => d.severity === 'warning');
  const problems =
    errors.length + warnings.length > 0
      ? `<p class="fatigue-notes-problems">${errors.length} error${errors.length === 1 ? '' : 's'}, ${warnings.length} warning${warnings.length === 1 ? '' : 's'}${
          errors[0] ? `: ${esc(errors[0].message)}` : ''
        }</p>`
      : '';
  return (
    `<div class="fatigue-notes-result fatigue-notes-${c.status}" data-check="${esc(c.id ?? '')}">` +
    `<div class="fatigue-notes-head"><span class="fatigue-notes-badge">${STATUS[c.status]}</span> ` +
    `<code>${esc(c.id ?? '(no id)')}</code>${c.title ? ` ${esc(c.title)}` : ''} <span class="fatigue-notes-method">${esc(c.method)}${c.criterion ? `, ${esc(c.criterion)}` : ''}</span></div>` +
    (rows.length ? `<table class="fatigue-notes-table"><tbody>${rows.join('')}</tbody></table>` : '') +
    (reqs.length ? `<ul class="fatigue-notes-reqs">${reqs.join('')}</ul>` : '') +
    problems +
    '</div>'
  );
}
