/**
 * `fatigue/templates` (no params): the templates of "insert a check" the methods declare,
 * and `fatigue/templateSnippet` (`{ kind, id, system }`): one of them as a VS Code snippet.
 * The extension holds no copy of the core, so it asks the server for both.
 */
import { methodTemplates, templateSnippetOf } from '@fatigue-notes/core';

export const TEMPLATES_REQUEST = 'fatigue/templates';
export const TEMPLATE_SNIPPET_REQUEST = 'fatigue/templateSnippet';

export interface TemplateChoice {
  kind: string;
  /** The method the template's check uses. */
  method: string;
  label: string;
  detail: string;
  idStem: string;
}

export function templateChoices(): TemplateChoice[] {
  return methodTemplates().map((t) => ({
    kind: t.kind,
    method: t.method,
    label: t.label,
    detail: t.detail,
    idStem: t.idStem,
  }));
}

/** The snippet of a template; unknown kinds and malformed params get the first template, in SI. */
export function templateSnippetFor(p: unknown): { snippet: string } {
  const o = p && typeof p === 'object' ? (p as Record<string, unknown>) : {};
  const kind = typeof o.kind === 'string' ? o.kind : '';
  const id = typeof o.id === 'string' && /^[A-Za-z_][A-Za-z0-9_]*$/.test(o.id) ? o.id : 'check_1';
  const system = o.system === 'US' ? 'US' : 'SI';
  return { snippet: templateSnippetOf(kind, id, system) };
}
