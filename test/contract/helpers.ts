import { type CheckResult, evaluateNote } from '../../shared-core/src';

/** Evaluate a single fatigue block given as its statement lines. */
export function check(lines: string[], id = 'c'): CheckResult {
  const text = ['```fatigue ' + id, ...lines, '```', ''].join('\n');
  const r = evaluateNote(text);
  return r.checks[0];
}

export function si(c: CheckResult, name: string): number {
  const v = c.values[name];
  if (!v) throw new Error(`no value ${name}; have ${Object.keys(c.values).join(', ')}`);
  if (v.si === null) throw new Error(`${name} is infinite`);
  return v.si;
}

export function errors(c: CheckResult): string[] {
  return c.diagnostics.filter((d) => d.severity === 'error').map((d) => `${d.code}: ${d.message}`);
}

export const KSI = 6.894757293168361e6;
export const MPA = 1e6;
