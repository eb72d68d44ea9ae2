// biome-ignore-all lint/suspicious/noTemplateCurlyInString: these strings are VS Code snippets (${1:...} tab stops), not templates
/**
 * The registry of check methods: every view (completion, hover, headline, preview, panel,
 * report, templates, assumptions register, docs tests) reads it and none names a method.
 * Adding a method is one folder under `methods/` and one line here.
 */

import type { CheckResult } from '../context/types';
import { declareMethodWord, declareMethodWords } from '../context/vocabulary';
import type { DiagramOptions } from '../diagrams/frame';
import { crackGrowth } from './crack-growth';
import { damage } from './damage';
import { stressLife } from './stress-life';
import { TEMPLATE_UNITS } from './templateParts';
import type { DiagramSource, MethodHeadline, MethodModule, MethodTemplate } from './types';

/** The methods, the default (no `method:` stated) first. */
const METHODS: MethodModule[] = [stressLife, damage, crackGrowth];

const withdraw = new Map<string, () => void>();
function declare(m: MethodModule): void {
  withdraw.get(m.name)?.();
  const undoWord = declareMethodWord(m.name, m.meaning, m === METHODS[0]);
  const undoWords = declareMethodWords(m.words, m.name);
  withdraw.set(m.name, () => {
    undoWords();
    undoWord();
  });
}
for (const m of METHODS) declare(m);

/** Every registered method, the default first. */
export function methods(): readonly MethodModule[] {
  return METHODS;
}

/** The method a check without `method:` uses. */
export function defaultMethod(): string {
  return METHODS[0].name;
}

export function methodModule(name: string): MethodModule | undefined {
  return METHODS.find((m) => m.name === name);
}

/**
 * Registers a method (tests, and methods added by an embedding program). A method of the
 * same name is replaced; returns a function that removes it again.
 */
export function registerMethod(m: MethodModule): () => void {
  const i = METHODS.findIndex((x) => x.name === m.name);
  const previous = i >= 0 ? METHODS[i] : undefined;
  if (i >= 0) METHODS[i] = m;
  else METHODS.push(m);
  declare(m);
  return () => {
    const j = METHODS.indexOf(m);
    if (j < 0) return;
    if (previous) {
      METHODS[j] = previous;
      declare(previous);
    } else {
      METHODS.splice(j, 1);
      withdraw.get(m.name)?.();
      withdraw.delete(m.name);
    }
  };
}

const NO_HEADLINE: MethodHeadline = { summary: [], preview: [], life: ['N_f'] };

/** What the views show of a method's check: headline names and preview rows (unknown method: none). */
export function methodViews(method: string): MethodHeadline {
  return methodModule(method)?.headline ?? methodModule(defaultMethod())?.headline ?? NO_HEADLINE;
}

/**
 * The new name of a result a method renamed (`D` -> `D_sum` in a damage check), or
 * undefined: the old name stays an alias with a hint.
 */
export function renamedResult(method: string, name: string): string | undefined {
  const to = methodModule(method)?.words?.renamed;
  return to && Object.hasOwn(to, name) ? to[name] : undefined;
}

/** Every template of "insert a check", in registry order. */
export function methodTemplates(): Array<MethodTemplate & { method: string }> {
  return METHODS.flatMap((m) => m.templates.map((t) => ({ ...t, method: m.name })));
}

/** Options whose default a check of this method evidently used, judged from its values. */
export function defaultedOptions(method: string): Readonly<Record<string, (c: CheckResult) => boolean>> {
  return methodModule(method)?.defaultedOptions ?? {};
}

export interface CheckDiagram {
  kind: string;
  title: string;
  svg: string;
}

/**
 * Every diagram the check has data for, in reading order (each kind once, in the order the
 * registered methods list them). The unit system defaults to the check's own display units.
 */
export function checkDiagrams(check: DiagramSource, options: Partial<DiagramOptions> = {}): CheckDiagram[] {
  const opts: DiagramOptions = { ...options, unitSystem: options.unitSystem ?? check.unitSystem ?? 'SI' };
  const out: CheckDiagram[] = [];
  const seen = new Set<string>();
  for (const d of METHODS.flatMap((m) => m.diagrams ?? [])) {
    if (seen.has(d.kind)) continue;
    seen.add(d.kind);
    const svg = d.draw(check, { ...opts, title: d.title });
    if (svg !== null) out.push({ kind: d.kind, title: d.title, svg });
  }
  return out;
}

/** A template as a whole VS Code snippet (fence, id, title, body); unknown kind: the first template. */
export function templateSnippetOf(kind: string, id: string, system: 'SI' | 'US'): string {
  const all = methodTemplates();
  const t = all.find((x) => x.kind === kind) ?? all[0];
  const head = [`\`\`\`fatigue \${1:${id}}`, `title: \${2:what is checked, and where}`];
  return [...head, ...t.body(TEMPLATE_UNITS[system]), '```', '$0'].join('\n');
}
