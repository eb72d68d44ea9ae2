/**
 * Templates of new checks: each method declares its own in the core (`methods/<method>/`);
 * the extension holds no copy of the core, so the language server sends the choices
 * (`fatigue/templates`) and the snippet of the one picked (`fatigue/templateSnippet`).
 * Inputs the engineer must supply are `?` placeholders, never made-up numbers.
 */
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

/** A fresh id: the stem with the first number not used by a check of the note. */
export function freshId(noteText: string, stem: string): string {
  const used = new Set<string>();
  for (const m of noteText.matchAll(/^\s*(?:>\s*)*(?:`{3,}|~{3,})\s*fatigue\s+([A-Za-z_][A-Za-z0-9_]*)/gm))
    used.add(m[1]);
  for (let i = 1; ; i++) if (!used.has(`${stem}_${i}`)) return `${stem}_${i}`;
}
