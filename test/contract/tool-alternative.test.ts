/**
 * A stated value keeps the tool's own value beside it (`Value.tool`), and the record says in
 * a checker's words what it is computed with and why: the inline hint, the hover and the
 * panel all show this one record. Each alternative is checked against the value the same
 * block gives when nothing is stated (the tool computes every number once, the same way).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../shared-core/src';
import { check } from './helpers';

const SECTION = ['Sut = 600 MPa', 'Sy = 400 MPa', 'd = 30 mm', 'M_max = 100 N*m', 'M_min = -100 N*m'];

describe('the tool alternative of a stated value', () => {
  it('no notch feature stated: Kt = 1 (no stress raiser: the peak is the nominal stress, by the definition of Kt; Pilkey & Pilkey, Peterson SCF 3rd ed., Sec. 1.1, from memory)', () => {
    const c = check([...SECTION, 'Kt = 1.85']);
    const kt = c.values.Kt;
    expect(kt.origin).toBe('stated');
    expect(kt.si).toBe(1.85);
    expect(kt.tool).toMatchObject({ si: 1, basis: 'fit', why: 'no notch feature stated' });
    expect(kt.tool?.label).toBe('fit 1: no notch feature stated');
    // `feature: none` confirms the plain section: the reason says so.
    const plain = check([...SECTION, 'feature: none', 'Kt = 1.85']);
    expect(plain.values.Kt.tool?.label).toBe('fit 1: plain section (feature: none)');
  });

  it('a shoulder fillet: the fit value the block gives without the stated Kt, and the fit inputs it is read at', () => {
    const fillet = ['feature: shoulder-fillet', 'D = 36 mm', 'r = 2 mm'];
    const stated = check([...SECTION, ...fillet, 'Kt = 1.85']).values.Kt;
    const own = check([...SECTION, ...fillet]).values.Kt;
    expect(own.origin).toBe('computed');
    expect(stated.tool?.si).toBe(own.si);
    expect(stated.tool?.display).toBe(own.display);
    expect(stated.tool?.formula).toBe(own.formula);
    expect(stated.tool?.basis).toBe('fit');
    expect(stated.tool?.why).toBe('from D = 36 mm, d = 30 mm, r = 2 mm');
    expect(stated.tool?.label).toBe(`fit ${own.display} from D = 36 mm, d = 30 mm, r = 2 mm`);
  });

  it('a shell cutout: the elastic solution at the opening (test/fixtures/notch-warnings.md)', () => {
    const t = readFileSync(new URL('../fixtures/notch-warnings.md', import.meta.url), 'utf8');
    const [, opening, stated] = evaluateNote(t).checks;
    expect(stated.values.Kt.tool?.basis).toBe('elastic solution');
    expect(stated.values.Kt.tool?.si).toBe(opening.values.Kt.si);
    expect(stated.values.Kt.tool?.label).toMatch(/^elastic solution 2\.5 from w_c = .+, h_c = .+$/);
  });

  it('every tool alternative of the samples and fixtures says what and why, never a bare "tool"', () => {
    let seen = 0;
    for (const f of ['compressor-receiver-cracks.md']) {
      const t = readFileSync(new URL(`../../samples/${f}`, import.meta.url), 'utf8');
      for (const c of evaluateNote(t).checks)
        for (const v of Object.values(c.values))
          if (v.tool) {
            seen++;
            expect(v.tool.basis.length).toBeGreaterThan(0);
            expect(v.tool.why.length).toBeGreaterThan(0);
            expect(v.tool.label).toBe(
              `${v.tool.basis} ${v.tool.display}${v.tool.why.startsWith('from ') ? ' ' : ': '}${v.tool.why}`,
            );
            expect(v.tool.label).not.toMatch(/\btool\b/);
          }
    }
    // The stated critical crack sizes of the receiver note (a_c from K_IC beside them).
    expect(seen).toBeGreaterThanOrEqual(1);
  });
});
