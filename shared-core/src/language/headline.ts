import type { CheckResult, Value } from './types';

/** The results that headline a check in one line (summary, code lens), by method. */
export function headlineValues(c: CheckResult): Value[] {
  const names =
    c.method === 'damage'
      ? ['D', 'repeats', 'N_eq']
      : c.method === 'crack-growth'
        ? ['a_c', 'N_cg', 'N_insp']
        : ['n_f', 'n_y', 'N_f', 'S_f'];
  const out = names.map((n) => c.values[n]).filter((v): v is Value => v !== undefined);
  // A dimension found by `solve:` is the answer the designer asked for.
  for (const v of Object.values(c.values)) if (v.formula?.startsWith('solved:')) out.unshift(v);
  return out;
}
