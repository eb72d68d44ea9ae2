/** Every unit offered by completion must be read by the expression evaluator with the right dimension. */
import { describe, expect, it } from 'vitest';
import { evaluateExpression } from '../../src/index';
import { dimensionsWithUnits, unitChoices } from '../../src/session';
import { classify } from '../../src/units/dimensions';

const noScope = { get: () => undefined, member: () => undefined, hasCheck: () => false };

describe('unitChoices', () => {
  for (const dim of dimensionsWithUnits()) {
    it(`${dim}: every offered unit parses after a number with that dimension`, () => {
      for (const u of unitChoices(dim)) {
        const q = evaluateExpression(`2 ${u.unit}`, noScope);
        expect(classify(q.dim), u.unit).toBe(dim);
      }
    });
  }

  it('lists the asked system first', () => {
    expect(unitChoices('length', 'US')[0].system).toBe('US');
    expect(unitChoices('length', 'SI')[0].unit).toBe('mm');
  });

  // 1 ksi = 6.894757 MPa: NIST SP 811 (2008), Appendix B.9 (psi = 6.894757e3 Pa).
  it('ksi is 1000 psi (NIST SP 811, App. B.9)', () => {
    const q = evaluateExpression('1 ksi', noScope);
    expect(q.si).toBeCloseTo(6.894757e6, -1);
  });
});
