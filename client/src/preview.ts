/**
 * Markdown preview: under each ```fatigue block, a table of the check's main results, its
 * requirements and its status, as the language server evaluated them for this very version
 * of the note (the `fatigue/summary` records the panel shows, history files included).
 * Nothing is evaluated here: until the server's results for the note's current version are
 * at hand, each block says "evaluating…", and the preview is refreshed when they arrive.
 */
import { problemCounts, type SummaryCheck } from './summary';

/** The parts of markdown-it this plugin uses (the preview passes its own instance). */
export interface MarkdownItLike {
  core: {
    ruler: {
      push(name: string, rule: (state: { src: string; tokens: Token[]; env?: unknown }) => void): void;
    };
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
}

/** The server's results for the note being rendered, if it has them for its current version. */
export type PreviewResults =
  | { state: 'ready'; checks: readonly SummaryCheck[] }
  | { state: 'evaluating' }
  | { state: 'unavailable'; message: string };

/** The fence's place among the note's fatigue fences, set when the note is parsed. */
const INDEX_KEY = 'fatigueNotesIndex';
const STATUS: Record<SummaryCheck['status'], string> = {
  pass: '✓ pass',
  fail: '✗ fail',
  error: '! error',
  unchecked: '– no requirement',
};

function isFatigueFence(info: string): boolean {
  return /^fatigue(\s|$)/.test(info.trim());
}

/** The preview's own document (VS Code passes it as `env.currentDocument`, a Uri). */
export function documentUriOf(env: unknown): string | undefined {
  const doc = (env as { currentDocument?: unknown } | undefined)?.currentDocument;
  if (doc === undefined || doc === null) return undefined;
  const s = typeof doc === 'string' ? doc : String(doc);
  return s && s !== '[object Object]' ? s : undefined;
}

export function fatiguePreviewPlugin(
  md: MarkdownItLike,
  settings: () => PreviewSettings,
  results: (uri: string | undefined) => PreviewResults,
): MarkdownItLike {
  // VS Code parses without the document (and caches the tokens) and renders with it in
  // `env.currentDocument`: the parse only numbers the fatigue fences, the render looks the
  // results up, once per render.
  md.core.ruler.push('fatigue_notes_fences', (state) => {
    let n = 0;
    for (const t of state.tokens)
      if (t.type === 'fence' && isFatigueFence(t.info)) t.meta = { ...(t.meta ?? {}), [INDEX_KEY]: n++ };
  });
  const perRender = new WeakMap<object, PreviewResults>();
  const lookup = (env: unknown): PreviewResults => {
    if (typeof env !== 'object' || env === null) return results(documentUriOf(env));
    let r = perRender.get(env);
    if (!r) {
      r = results(documentUriOf(env));
      perRender.set(env, r);
    }
    return r;
  };
  const fallback: RenderRule = (tokens, idx, options, _env, self) =>
    (self as { renderToken(t: Token[], i: number, o: unknown): string }).renderToken(tokens, idx, options);
  const original = md.renderer.rules.fence ?? fallback;
  md.renderer.rules.fence = (tokens, idx, options, env, self) => {
    const html = original(tokens, idx, options, env, self);
    const token = tokens[idx];
    const n = token.meta?.[INDEX_KEY];
    if (typeof n !== 'number' || !settings().enabled) return html;
    const r = lookup(env);
    if (r.state === 'evaluating') return html + renderWaiting();
    if (r.state === 'unavailable') return html + renderUnavailable(r.message, md.utils.escapeHtml);
    // The check whose block opens on this fence's line; the n-th check otherwise.
    const line = token.map?.[0];
    const check = r.checks.find((c) => c.range.start.line === line) ?? r.checks[n];
    return check ? html + renderCheck(check, md.utils.escapeHtml) : html;
  };
  return md;
}

export function renderWaiting(): string {
  return '<div class="fatigue-notes-result fatigue-notes-evaluating" role="status"><span class="fatigue-notes-badge">evaluating…</span> the language server is working out this check</div>';
}

export function renderUnavailable(message: string, esc: (s: string) => string): string {
  return `<div class="fatigue-notes-result fatigue-notes-unavailable" role="status">${esc(message)}</div>`;
}

export function renderCheck(c: SummaryCheck, esc: (s: string) => string): string {
  const rows = (c.shown?.table ?? [])
    .filter((n) => c.values[n])
    .map((n) => {
      const v = c.values[n];
      return `<tr><th scope="row"><code>${esc(n)}</code></th><td class="fatigue-notes-num">${esc(v.display)}</td><td>${esc(v.meaning)}</td></tr>`;
    });
  const reqs = c.requirements.map((r) => {
    const mark = r.met === true ? '✓' : r.met === false ? '✗' : '?';
    const cls = r.met === true ? 'met' : r.met === false ? 'not-met' : 'unknown';
    const verdict = r.met === true ? 'met' : r.met === false ? 'not met' : 'not evaluated';
    return `<li class="fatigue-notes-req-${cls}">${mark} <code>${esc(r.text)}</code>: ${esc(r.actualDisplay)} (${verdict})</li>`;
  });
  const { errors, warnings } = problemCounts(c);
  const first = c.diagnostics?.firstError;
  const problems =
    errors + warnings > 0
      ? `<p class="fatigue-notes-problems">${errors} error${errors === 1 ? '' : 's'}, ${warnings} warning${warnings === 1 ? '' : 's'}${
          first ? `: ${esc(first)}` : ''
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
