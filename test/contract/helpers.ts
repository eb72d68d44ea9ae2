import { expect } from 'vitest';
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

/** 0-based line of the first line of `text` that starts with `prefix`. */
export function lineOf(text: string[], prefix: string): number {
  const i = text.findIndex((l) => l.startsWith(prefix));
  if (i < 0) throw new Error(`no line ${prefix}`);
  return i;
}

/** The check's first diagnostic of `code` (the test fails, listing what there is, when it has none). */
export function diag(c: CheckResult, code: string) {
  const d = c.diagnostics.find((x) => x.code === code);
  expect(
    d,
    `${code}; got ${c.diagnostics.map((x) => `${x.range.start.line}:${x.code}`).join(' ')}`,
  ).toBeDefined();
  return d!;
}
