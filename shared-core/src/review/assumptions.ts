/**
 * The assumptions register of a note: everything the tool took by default rather than
 * read from the note, with the line where it applies, as plain data (the HTML report
 * renders it; `JSON.stringify` exports it).
 *
 * Three sources, in note order:
 * - values whose origin is 'default' (with the `assumption` their method gave);
 * - diagnostics that announce a default (codes `defaulted-*`, `assumed-*`, and the few
 *   older codes in `ASSUMPTION_CODES`); one that names a defaulted value (`kd = 1` ...) is
 *   merged into that value's entry;
 * - options left unstated whose default the check used (`rotation:`, `load-line:` ...),
 *   when the note's text is given.
 *
 * It only reads the evaluation's records: nothing is computed here.
 */

import type { CheckResult, Diagnostic, NoteResult, Severity } from '../context/types';
import { OPTIONS } from '../context/vocabulary';
import { type BlockSource, findFatigueBlocks, splitLines } from '../language/markdownBlocks';
import { parseStatements } from '../language/statements';
import { defaultedOptions } from '../methods/registry';

/** Diagnostic codes that announce a default although their name does not say so. */
export const ASSUMPTION_CODES: ReadonlySet<string> = new Set(['no-criterion', 'no-feature']);

export interface AssumptionEntry {
  /** Id of the check (null for a check without an id). */
  check: string | null;
  /** 1-based line of the check's opening fence. */
  checkLine: number;
  /** 1-based line the assumption applies to (the statement that drives it, or the fence). */
  line: number;
  kind: 'default-value' | 'default-option' | 'diagnostic';
  /** The value's name or the option's key (absent for a plain diagnostic). */
  name?: string;
  /** The value taken, as displayed (`1`, `rotating` ...). */
  display?: string;
  /** What was assumed, in words. */
  text: string;
  /** Codes of the diagnostics that announce it. */
  codes: string[];
  severity?: Severity;
}

export function isAssumptionCode(code: string): boolean {
  return code.startsWith('defaulted-') || code.startsWith('assumed-') || ASSUMPTION_CODES.has(code);
}

/** Options of every method whose default a check evidently used, judged from the values it produced (the method adds its own). */
const OPTION_USED: Record<string, (c: CheckResult) => boolean> = {
  criterion: () => false, // announced by the `no-criterion` diagnostic instead
  rotation: (c) =>
    c.values.kb?.origin === 'computed' &&
    !c.values.kb.unused &&
    (c.values.kb.inputs ?? []).some((i) => i.name === 'd'),
  'notch-sensitivity': (c) =>
    (c.values.q?.origin === 'computed' && !c.values.q.unused) ||
    (c.values.qs?.origin === 'computed' && !c.values.qs.unused),
  'mean-concentration': (c) =>
    c.values.n_f !== undefined &&
    ['Kf', 'Kfs', 'Kf_ax'].some((k) => c.values[k]?.si !== null && (c.values[k]?.si ?? 1) > 1),
};

function lineOfDiagnostic(d: Diagnostic): number {
  return d.range.start.line + 1;
}

function optionKeysStated(block: BlockSource): Set<string> {
  const out = new Set<string>();
  for (const s of parseStatements(block.lines, /^\s*>/.test(block.lines[0]?.text ?? '')))
    if (s.kind === 'option') out.add(s.key.text);
  return out;
}

/** The register of one evaluated note; pass the note's text to include defaulted options. */
export function assumptionsRegister(note: NoteResult, text?: string): AssumptionEntry[] {
  const blocks = text !== undefined ? findFatigueBlocks(text, splitLines(text)) : [];
  const out: AssumptionEntry[] = [];
  for (const c of note.checks) {
    const checkLine = c.range.start.line + 1;
    const entries: AssumptionEntry[] = [];
    const byName = new Map<string, AssumptionEntry>();
    for (const name of c.order) {
      const v = c.values[name];
      // A default in a chain that a stated value replaced assumes nothing.
      if (v?.origin !== 'default' || v.unused) continue;
      const e: AssumptionEntry = {
        check: c.id,
        checkLine,
        line: (v.range?.start.line ?? c.range.start.line) + 1,
        kind: 'default-value',
        name,
        display: v.display,
        text: v.assumption ?? `${name} taken as ${v.display} (${v.meaning})`,
        codes: [],
      };
      entries.push(e);
      byName.set(name, e);
    }
    for (const d of c.diagnostics) {
      if (!isAssumptionCode(d.code)) continue;
      const owner = [...byName.entries()].find(([n]) =>
        new RegExp(`(^|[^A-Za-z0-9_])${n} = `).test(d.message),
      );
      if (owner) {
        const e = owner[1];
        if (!e.codes.includes(d.code)) e.codes.push(d.code);
        e.severity = e.severity === 'warning' || d.severity === 'warning' ? 'warning' : d.severity;
        continue;
      }
      entries.push({
        check: c.id,
        checkLine,
        line: lineOfDiagnostic(d),
        kind: 'diagnostic',
        text: d.message,
        codes: [d.code],
        severity: d.severity,
      });
    }
    const block = blocks.find((b) => b.openLine === c.range.start.line);
    if (block) {
      const stated = optionKeysStated(block);
      const usedBy = { ...OPTION_USED, ...defaultedOptions(c.method) };
      // In the vocabulary's order of the options, whichever method declares them.
      for (const key of Object.keys(OPTIONS)) {
        const info = OPTIONS[key];
        const used = usedBy[key];
        if (!used || !info?.default || stated.has(key) || !used(c)) continue;
        const meaning = info.values?.[info.default];
        entries.push({
          check: c.id,
          checkLine,
          line: checkLine,
          kind: 'default-option',
          name: key,
          display: info.default,
          text: `\`${key}:\` not stated: \`${info.default}\` used${meaning ? ` (${meaning})` : ''}`,
          codes: [],
        });
      }
    }
    entries.sort((a, b) => a.line - b.line);
    out.push(...entries);
  }
  return out;
}
