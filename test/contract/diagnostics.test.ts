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
  it('defaulted temperature and reliability are flagged as assumptions', () => {
    const fence = lineOf('```fatigue', lineOf('Sy = 450 MPa') - 3);
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
  it('strengths without a family: the assumed steel is a warning on the Sut line, with the family as a fix', () => {
    const d = has('assumed-steel', lineOf('Sut = 600 MPa'), 'warning');
    expect(d.message).toContain('endurance limit');
    expect(d.fixes?.[0].edits[0].newText).toBe('material-family: steel\n');
    expect(d.fixes?.map((f) => f.edits[0].newText.trim())).toContain('material-family: aluminium-wrought');
  });
  it('a pass with n_f below 1 and no requirement on life: warning on the require line, the fix adds N_f', () => {
    const line = lineOf('require: n_y >= 0.85');
    const d = has('hidden-finite-life', line, 'warning');
    expect(d.message).toContain('finite life');
    const edit = d.fixes?.[0].edits[0];
    expect(edit?.newText).toBe(', N_f >= 1e6');
    expect(edit?.range.start).toEqual({ line, character: lines[line].length });
    const pin = result.checks.find((c) => c.id === 'pin_finite_life');
    expect(pin?.status).toBe('pass');
    expect(pin?.values.n_f.si).toBeLessThan(1);
  });
  it('statuses: errors make a check an error; warnings alone do not', () => {
    expect(result.checks.map((c) => c.status)).toEqual(['error', 'pass', 'error', 'pass']);
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
  // Values no engineering part can have are errors that withhold every result, as a wrong unit does.
  const withheld = (id: string, code: string, prefix: string) => {
    const c = r.checks.find((x) => x.id === id);
    expect(c, id).toBeDefined();
    const line = t.split('\n').findIndex((l, k) => k > c!.range.start.line && l.startsWith(prefix));
    const d = c!.diagnostics.find((x) => x.code === code);
    expect(d?.severity, `${id}: ${c!.diagnostics.map((x) => x.code).join(' ')}`).toBe('error');
    expect(d?.range.start.line).toBe(line);
    expect(c!.values.n_f).toBeUndefined();
    expect(c!.status).toBe('error');
    expect(c!.requirements.every((q) => q.met === null)).toBe(true);
    expect(c!.diagnostics.some((x) => x.code === 'results-withheld')).toBe(true);
    return d!;
  };
  it('Sut = 63000 MPa is beyond any metal: error, no results', () =>
    withheld('impossible_strength', 'absurd-value', 'Sut = 63000 MPa'));
  it('a 45 m shaft: error, no results', () => withheld('giant_shaft', 'absurd-value', 'd = 45 m'));
  it('yield above ultimate: error, no results', () =>
    withheld('yield_above_ultimate', 'sy-above-sut', 'Sy = 700 MPa'));
  it('a notch radius larger than the part: error, no results', () =>
    withheld('notch_larger_than_part', 'absurd-value', 'r = 50 mm'));
  it('an unknown library key: error with the nearest keys, no results (a stated Sut does not stand in)', () => {
    const d = withheld('unknown_key', 'unknown-material', 'material: aisi-1045-colddrawn');
    expect(d.fixes?.[0].edits[0].newText).toBe('aisi-1045-cd');
  });
  it('a family that contradicts the library key: error, with the library family as the fix', () => {
    const d = withheld('family_conflict', 'family-conflict', 'material-family: steel');
    expect(d.fixes?.[0].edits[0].newText).toBe('aluminium-wrought');
  });
  it('Se stated for a family without an endurance limit: error, no infinite life', () =>
    withheld('aluminium_with_endurance_limit', 'endurance-limit-stated', 'Se = 90 MPa'));
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
