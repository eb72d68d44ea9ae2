/**
 * compareNotes: moves judged at the display precision, infinite lives, anonymous checks,
 * requirement states. The bending relation used is sigma_a = 32 M_a / (pi d^3) (Budynas &
 * Nisbett, Shigley's MED 10th ed., Eq. 3-28 for a solid round section).
 */
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../src';
import { compareNotes, relativeText } from '../../src/review';

function note(d: string, Ma: string, extra: string[] = [], id = 'shaft'): string {
  return [
    `\`\`\`fatigue${id ? ` ${id}` : ''}`,
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'kb = 0.85',
    `d = ${d}`,
    'feature: none',
    `M_a = ${Ma}`,
    'M_m = 0 N*m',
    'criterion: goodman',
    ...extra,
    '```',
    '',
  ].join('\n');
}

describe('compareNotes', () => {
  it('reports sigma_a moving by the ratio of the moments (Shigley Eq. 3-28), and Se not at all', () => {
    const cmp = compareNotes(evaluateNote(note('30 mm', '100 N*m')), evaluateNote(note('30 mm', '150 N*m')));
    const values = cmp.changed[0].values;
    expect(values.find((v) => v.name === 'sigma_a')?.relative).toBeCloseTo(0.5, 12);
    expect(values.find((v) => v.name === 'M_a')).toMatchObject({ kind: 'input', change: 'moved' });
    expect(values.find((v) => v.name === 'Se')).toBeUndefined();
    expect(cmp.unchanged).toEqual([]);
  });

  it('ignores a change below four significant digits and reports one at the fourth digit', () => {
    const base = evaluateNote(note('30 mm', '100 N*m'));
    expect(compareNotes(base, evaluateNote(note('30 mm', '100.004 N*m'))).changed).toEqual([]);
    const moved = compareNotes(base, evaluateNote(note('30 mm', '100.1 N*m')));
    expect(moved.changed[0].values.map((v) => v.name)).toContain('M_a');
  });

  it('a life going from infinite to finite is a move without a relative change', () => {
    const a = evaluateNote(note('30 mm', '100 N*m'));
    const b = evaluateNote(note('30 mm', '500 N*m'));
    expect(a.checks[0].values.N_f.infinite).toBe(true);
    const nf = compareNotes(a, b).changed[0].values.find((v) => v.name === 'N_f');
    expect(nf).toMatchObject({ change: 'moved', relative: null, old: { si: null, infinite: true } });
    expect(nf?.new?.si).toBeGreaterThan(0);
  });

  it('requirements: newly failing first, added requirement that fails counts, removed one does not', () => {
    const a = evaluateNote(note('30 mm', '100 N*m', ['require: n_f >= 1.5, n_y >= 2']));
    const b = evaluateNote(note('30 mm', '500 N*m', ['require: n_f >= 1.5, sigma_a <= 300 MPa']));
    const cmp = compareNotes(a, b);
    expect(cmp.requirementChanges.map((r) => [r.text, r.old, r.new, r.newlyFailing])).toEqual([
      ['n_f >= 1.5', 'met', 'not met', true],
      ['sigma_a <= 300 MPa', 'absent', 'met', false],
      ['n_y >= 2', 'met', 'absent', false],
    ]);
    expect(cmp.newlyFailing).toBe(true);
  });

  it('matches checks without an id by their rank and new checks by id', () => {
    const a = evaluateNote(note('30 mm', '100 N*m', [], ''));
    const b = evaluateNote(
      note('30 mm', '100 N*m', [], '') + note('30 mm', '100 N*m', ['require: n_f >= 9'], 'extra'),
    );
    const cmp = compareNotes(a, b);
    expect(cmp.unchanged).toEqual(['(no id #1)']);
    expect(cmp.added.map((c) => c.key)).toEqual(['extra']);
    expect(cmp.failures).toEqual([
      'extra: n_f >= 9 not met (' + b.checks[1].values.n_f.display + ') in a new check',
    ]);
  });

  it('formats relative changes', () => {
    expect(relativeText(-1 / 7)).toBe('-14.3 %');
    expect(relativeText(0.5)).toBe('+50 %');
    expect(relativeText(null)).toBe('');
  });
});
