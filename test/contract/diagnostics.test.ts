/** Each mistake of test/fixtures/mistakes.md gets its diagnostic, with its code, on its line. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../shared-core/src';

const text = readFileSync(new URL('../fixtures/mistakes.md', import.meta.url), 'utf8');
const lines = text.split('\n');
const result = evaluateNote(text);

/** 0-based line of the first line that starts with `prefix` (after a given line). */
function lineOf(prefix: string, after = 0): number {
  const i = lines.findIndex((l, k) => k >= after && l.startsWith(prefix));
  if (i < 0) throw new Error(`no line ${prefix}`);
  return i;
}

function has(code: string, line: number, severity?: string) {
  const found = result.diagnostics.filter((d) => d.code === code && d.range.start.line === line);
  expect(
    found,
    `${code} on line ${line + 1}; got ${result.diagnostics.map((d) => `${d.range.start.line + 1}:${d.code}`).join(' ')}`,
  ).not.toHaveLength(0);
  if (severity) expect(found[0].severity).toBe(severity);
  return found[0];
}

describe('diagnostics of a note with mistakes', () => {
  it('wrong dimension on the Sut line', () => has('wrong-dimension', lineOf('Sut = 630 mm'), 'error'));
  it('misspelt option value, with the nearest word as a quick fix', () => {
    const d = has('unknown-option-value', lineOf('surface: machinned'), 'error');
    expect(d.message).toContain('machined');
    expect(d.fixes?.[0].edits[0].newText).toBe('machined');
    expect(d.range.start.character).toBe('surface: '.length);
  });
  it('missing unit, with unit quick fixes', () => {
    const d = has('missing-unit', lineOf('d = 35'), 'error');
    expect(d.fixes?.map((f) => f.edits[0].newText)).toContain(' mm');
  });
  it('name stated twice: error on the second line', () =>
    has('duplicate-name', lineOf('Sy = 500 MPa'), 'error'));
  it('unknown option key with a suggestion', () => {
    const d = has('unknown-option', lineOf('criteria: goodman'), 'error');
    expect(d.message).toContain('criterion');
  });
  it('name used before it is defined', () => has('unknown-name', lineOf('x = y + 2 mm'), 'error'));
  it('a check without an id: warning on the fence', () =>
    has(
      'missing-id',
      lines.findIndex((l) => l.trim() === '```fatigue'),
      'warning',
    ));
  it('Sy above Sut', () => has('sy-above-sut', lineOf('Sy = 700 MPa'), 'warning'));
  it('defaulted temperature and reliability are flagged as assumptions', () => {
    const fence = lineOf('```fatigue', lineOf('Sy = 700 MPa') - 3);
    has('defaulted-temperature', fence, 'warning');
    has('defaulted-reliability', fence, 'warning');
    has('no-criterion', fence, 'warning');
  });
  it('two checks with one id: error', () => has('duplicate-id', lineOf('```fatigue shaft_a', 5), 'error'));
  it('no endurance limit and no N: error on the material line', () =>
    has('no-endurance-limit', lineOf('material: al-6061-t6'), 'error'));
  it('unknown reference', () => has('unknown-reference', lineOf('z = other_check.d'), 'error'));
  it('every diagnostic range lies inside its block', () => {
    for (const c of result.checks)
      for (const d of c.diagnostics) {
        expect(d.range.start.line).toBeGreaterThanOrEqual(c.range.start.line);
        expect(d.range.end.line).toBeLessThanOrEqual(c.range.end.line + 1);
        expect(d.range.start.character).toBeGreaterThanOrEqual(0);
      }
  });
  it('statuses: errors make a check an error; warnings alone do not', () => {
    expect(result.checks.map((c) => c.status)).toEqual(['error', 'pass', 'error']);
  });
});

describe('domain and order diagnostics (test/fixtures/compressive-gerber.md)', () => {
  const t = readFileSync(new URL('../fixtures/compressive-gerber.md', import.meta.url), 'utf8');
  const r = evaluateNote(t);
  const at = (code: string) => r.diagnostics.find((d) => d.code === code);
  it('Gerber at a compressive mean: the limiting answer, with a warning on the criterion line', () => {
    const d = at('criterion-domain');
    expect(d?.severity).toBe('warning');
    expect(d?.range.start.line).toBe(13);
    // Limiting answer: the horizontal line n_f = Se / sigma_a_eq (Budynas & Nisbett, Shigley's MED, Fig. 6-27 discussion).
    const c = r.checks[0];
    expect(c.values.n_f.si).toBeCloseTo(c.values.Se.si! / c.values.sigma_a_eq.si!, 10);
  });
  it('a name used above the line that states it: says where it is stated', () => {
    const d = at('unknown-name');
    expect(d?.range.start.line).toBe(11);
    expect(d?.message).toContain('stated below, on line 13');
  });
});

describe('misread inputs withhold every result (test/fixtures/withheld.md)', () => {
  const t = readFileSync(new URL('../fixtures/withheld.md', import.meta.url), 'utf8');
  const r = evaluateNote(t);
  const [slip, misspelt] = r.checks;
  it('a load with the wrong unit: error on its line, no safety factor, the requirement not judged', () => {
    expect(slip.diagnostics.some((d) => d.code === 'wrong-dimension' && d.range.start.line === 10)).toBe(
      true,
    );
    expect(slip.values.n_f).toBeUndefined();
    expect(slip.requirements[0].met).toBeNull();
    expect(slip.status).toBe('error');
    expect(slip.diagnostics.some((d) => d.code === 'results-withheld')).toBe(true);
    // No follow-on diagnostic contradicts what the author wrote.
    expect(slip.diagnostics.some((d) => d.code === 'missing-load-pair')).toBe(false);
  });
  it('unit slips are named: C is the coulomb, Nm is N*m', () => {
    const temp = misspelt.diagnostics.find((d) => d.range.start.line === 20);
    expect(temp?.message).toContain('degC');
    const torque = misspelt.diagnostics.find((d) => d.range.start.line === 26);
    expect(torque?.message).toContain('N*m');
  });
  it('a helper name one edit from a reserved input is flagged, with a rename fix', () => {
    const d = misspelt.diagnostics.find((x) => x.code === 'near-reserved-name');
    expect(d?.range.start.line).toBe(24);
    expect(d?.fixes?.[0].edits[0].newText).toBe('Kfs');
  });
});

describe('notch data and shell openings (test/fixtures/notch-warnings.md)', () => {
  const t = readFileSync(new URL('../fixtures/notch-warnings.md', import.meta.url), 'utf8');
  const tl = t.split('\n');
  const r = evaluateNote(t);
  const [ti, opening, stated] = r.checks;
  const lineIn = (prefix: string, after: number) =>
    tl.findIndex((l, k) => k >= after && l.startsWith(prefix));
  it('a titanium alloy without a stated q: no-notch-data warning on the notch radius (q = 1, never the steel fit)', () => {
    const d = ti.diagnostics.find((x) => x.code === 'no-notch-data');
    expect(d?.severity).toBe('warning');
    expect(d?.range.start.line).toBe(lineIn('r = 1.5 mm', 0));
    expect(d?.message).toContain('state `q`');
    expect(ti.values.q?.si).toBe(1);
  });
  it('an opening large against sqrt(R t): large-shell-opening warning on the feature line', () => {
    const d = opening.diagnostics.find((x) => x.code === 'large-shell-opening');
    expect(d?.severity).toBe('warning');
    expect(d?.range.start.line).toBe(lineIn('feature: shell-cutout', 0));
    expect(d?.message).toContain('State `Kt`');
  });
  it('the same opening with a stated Kt: no warning, the stated value with the tool value beside it', () => {
    expect(stated.diagnostics.some((x) => x.code === 'large-shell-opening')).toBe(false);
    expect(stated.values.Kt?.origin).toBe('stated');
    expect(stated.values.Kt?.tool?.si).toBeCloseTo(2.5, 10);
  });
});
