/**
 * Which results each view shows of a check, read from its method's registry entry
 * (`methodViews`): the code lens, the command line's summary line, the hover's check
 * summary, the inline hints' ranking, the summary panel and the Markdown preview follow
 * it. The language server sends the names with every check's summary, so that the
 * extension holds no list of its own.
 */
import type { CheckResult, Value } from '../context/types';
import { methodViews } from '../methods/registry';

/** Dimensions found by `solve:`: the answer the designer asked for comes first. */
function solvedNames(c: Pick<CheckResult, 'values'>): string[] {
  return Object.values(c.values)
    .filter((v) => v.formula?.startsWith('solved:'))
    .map((v) => v.name)
    .reverse();
}

/** The check's own names of a list, solved dimensions first, those it has only. */
function present(c: Pick<CheckResult, 'values'>, names: readonly string[]): string[] {
  const out = solvedNames(c);
  for (const n of names) if (c.values[n] && !out.includes(n)) out.push(n);
  return out;
}

/** The names each view shows for this check (what the server sends with its summary). */
export function shownNames(c: Pick<CheckResult, 'method' | 'values'>): {
  headline: string[];
  table: string[];
  life: string | null;
} {
  const v = methodViews(c.method);
  return {
    headline: present(c, v.summary),
    table: present(c, v.preview),
    life: v.life.find((n) => c.values[n]) ?? null,
  };
}

/** The results that headline a check in one line (summary, code lens, hover), as its method declares them. */
export function headlineValues(c: CheckResult): Value[] {
  return shownNames(c).headline.map((n) => c.values[n]);
}

/** Place of a result in the check's headline (inline hints show these first); beyond it, last. */
export function headlineRank(c: Pick<CheckResult, 'method'>, name: string): number {
  const list = methodViews(c.method).summary;
  const i = list.indexOf(name);
  return i < 0 ? list.length : i;
}
