/**
 * Templates of new checks: each method declares its own in the core (`methods/<method>/`);
 * inputs the engineer must supply are `?` placeholders (an error until filled), never
 * made-up numbers.
 */
import { methodTemplates, templateSnippetOf } from '@fatigue-notes/core';

export type TemplateKind = string;

export interface TemplateChoice {
  kind: TemplateKind;
  /** The method the template's check uses. */
  method: string;
  label: string;
  detail: string;
  idStem: string;
}

export const TEMPLATE_CHOICES: TemplateChoice[] = methodTemplates().map((t) => ({
  kind: t.kind,
  method: t.method,
  label: t.label,
  detail: t.detail,
  idStem: t.idStem,
}));

/** A fresh id: the stem with the first number not used by a check of the note. */
export function freshId(noteText: string, stem: string): string {
  const used = new Set<string>();
  for (const m of noteText.matchAll(/^\s*(?:>\s*)*(?:`{3,}|~{3,})\s*fatigue\s+([A-Za-z_][A-Za-z0-9_]*)/gm))
    used.add(m[1]);
  for (let i = 1; ; i++) if (!used.has(`${stem}_${i}`)) return `${stem}_${i}`;
}

/** The check as a VS Code snippet (tab stops, choices); `?` marks what must be filled in. */
export function templateSnippet(kind: TemplateKind, id: string, system: 'SI' | 'US'): string {
  return templateSnippetOf(kind, id, system);
}
