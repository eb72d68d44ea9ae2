/**
 * Which results each view shows, by method: the one list that the code lens, the command
 * line's summary line, the hover's check summary, the inline hints' ranking, the summary
 * panel and the Markdown preview follow. The language server sends the names with every
 * check's summary, so that the extension holds no list of its own.
 */
import type { CheckResult, Method, Value } from './types';

export interface ShownResults {
  /** The results that headline a check in one line (code lens, `check` summary, hover), in order. */
  headline: readonly string[];
  /** The rows of a check's table under its block in the Markdown preview, in order. */
  table: readonly string[];
  /** The summary panel's life column: the first of these the check has. */
  life: readonly string[];
}

export const SHOWN_RESULTS: Record<Method, ShownResults> = {
  'stress-life': {
    headline: ['n_f', 'n_y', 'N_f', 'S_f'],
    table: ['n_f', 'n_y', 'N_f', 'S_f', 'Se', 'sigma_a_eq', 'sigma_m_eq'],
    life: ['N_f'],
  },
  damage: {
    headline: ['D', 'repeats', 'N_eq'],
    table: ['D', 'repeats', 'N_eq', 'n_y'],
    life: ['D', 'N_f'],
  },
  'crack-growth': {
    headline: ['a_c', 'N_cg', 'N_insp'],
    table: ['a_c', 'N_cg', 'N_insp'],
    life: ['N_cg', 'N_f'],
  },
};

function shownOf(c: Pick<CheckResult, 'method'>): ShownResults {
  return SHOWN_RESULTS[c.method] ?? SHOWN_RESULTS['stress-life'];
}

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
  const s = shownOf(c);
  return {
    headline: present(c, s.headline),
    table: present(c, s.table),
    life: s.life.find((n) => c.values[n]) ?? null,
  };
}

/** The results that headline a check in one line (summary, code lens, hover), by method. */
export function headlineValues(c: CheckResult): Value[] {
  return shownNames(c).headline.map((n) => c.values[n]);
}

/** Place of a result in the check's headline (inline hints show these first); beyond it, last. */
export function headlineRank(c: Pick<CheckResult, 'method'>, name: string): number {
  const list = shownOf(c).headline;
  const i = list.indexOf(name);
  return i < 0 ? list.length : i;
}
