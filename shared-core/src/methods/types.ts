/**
 * The interface a check method is written against. A method is one folder under
 * `methods/` whose `index.ts` exports one `MethodModule`, listed once in `registry.ts`;
 * the language, the server, the client, the report and the docs tests read the registry
 * and never name a method.
 */

import type { CheckContext } from '../context/checkContext';
import type { RequireStatement } from '../context/statements';
import type { CheckResult, MethodFields, RequirementResult } from '../context/types';
import type { MethodWords } from '../context/vocabulary';
import type { DiagramOptions } from '../diagrams/frame';

/** What a method's pipeline returns beside the values it records on the context. */
export type MethodExtras = Partial<MethodFields> & { criterion?: string };

/** A check as a diagram sees it: a `CheckResult`, or the same record without diagnostics. */
export type DiagramSource = Partial<MethodFields> &
  Pick<CheckResult, 'unitSystem'> & {
    values?: CheckResult['values'];
  };

/** One diagram a method draws from its own data; `draw` returns null when the check has none. */
export interface MethodDiagram {
  /** Stable kind, used as the SVG's class and the panel's key. */
  kind: string;
  title: string;
  draw(check: DiagramSource, options: DiagramOptions): string | null;
}

/** The results that headline a check, by view. Names absent from a check are skipped. */
export interface MethodHeadline {
  /** Summary line, code lens and status bar, in this order. */
  summary: readonly string[];
  /** Rows of the Markdown preview under the block. */
  preview: readonly string[];
  /** The panel's life column: the first of these the check has. */
  life: readonly string[];
}

/** A template of "insert a check" (and the `fatigue` snippet of the completion). */
export interface MethodTemplate {
  /** Stable key of the template (a method may offer several). */
  kind: string;
  label: string;
  detail: string;
  /** Stem of the fresh id (`section` -> `section_1`). */
  idStem: string;
  /** Body lines between the title and the closing fence, as a VS Code snippet (tab stops from 3). */
  body(units: TemplateUnits): string[];
}

export interface TemplateUnits {
  system: 'SI' | 'US';
  stress: string;
  length: string;
  moment: string;
  force: string;
  temp: string;
  toughness: string;
}

export interface MethodModule {
  /** The value of `method:`. */
  name: string;
  /** What the method computes, in a line (hover and completion of `method:`). */
  meaning: string;
  /** Its row of the table in docs/methods.md (the first cell's text): where its formulas and sources are. */
  docs: string;
  /**
   * Its own input, result and option names (beside the shared section, material and load
   * words of `language/vocabulary.ts`), each with dimension and meaning.
   */
  words?: MethodWords;
  /** The pipeline over the check context. */
  run(ctx: CheckContext): MethodExtras;
  /** Fields of `MethodFields` the pipeline may return, in the order they appear in the JSON. */
  fields: readonly (keyof MethodFields)[];
  /** Warnings once the method and the requirements are done (assumed family, hidden finite life ...). */
  review?(ctx: CheckContext, requirements: RequirementResult[], requireStatements: RequireStatement[]): void;
  headline: MethodHeadline;
  diagrams?: readonly MethodDiagram[];
  templates: readonly MethodTemplate[];
  /** The `fatigue` snippet the completion offers at the start of a line (VS Code snippet syntax). */
  snippet: { label: string; body(): string[] };
  /** Options whose default the check evidently used (assumptions register), judged from its values. */
  defaultedOptions?: Readonly<Record<string, (c: CheckResult) => boolean>>;
}
