import type { CheckResult, Value } from '../context/types';
import { methodViews } from '../methods/registry';

/** The results that headline a check in one line (summary, code lens), as its method declares them. */
export function headlineValues(c: CheckResult): Value[] {
  const names = methodViews(c.method).summary;
  const out = names.map((n) => c.values[n]).filter((v): v is Value => v !== undefined);
  // A dimension found by `solve:` is the answer the designer asked for.
  for (const v of Object.values(c.values)) if (v.formula?.startsWith('solved:')) out.unshift(v);
  return out;
}
