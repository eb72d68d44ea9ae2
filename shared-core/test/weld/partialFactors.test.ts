import { describe, expect, it } from 'vitest';
import { loadFactor, resistanceFactor } from '../../src/weld';

describe('partial factors (EN 1993-1-9 Table 3.1 and Sec. 3(7); IIW 2016 Sec. 6.3, from memory)', () => {
  it('EN gamma_Mf: 1.00 / 1.15 damage tolerant, 1.15 / 1.35 safe life (low / high consequence)', () => {
    const v = (concept: 'damage-tolerant' | 'safe-life', consequence: 'low' | 'high') =>
      resistanceFactor({ standard: 'EN 1993-1-9', concept, consequence }).value;
    expect(v('damage-tolerant', 'low')).toBe(1.0);
    expect(v('damage-tolerant', 'high')).toBe(1.15);
    expect(v('safe-life', 'low')).toBe(1.15);
    expect(v('safe-life', 'high')).toBe(1.35);
  });

  it('defaulted: the safe-life high-consequence value with a warning naming the case', () => {
    const r = resistanceFactor({ standard: 'EN 1993-1-9' });
    expect(r.value).toBe(1.35);
    const w = r.notes?.find((n) => n.code === 'defaulted-partial-factor');
    expect(w?.severity).toBe('warning');
    expect(w?.message).toMatch(/safe-life/);
    expect(loadFactor('EN 1993-1-9').value).toBe(1);
    expect(loadFactor('EN 1993-1-9').notes?.[0].code).toBe('defaulted-partial-factor');
  });

  it('a stated factor wins; one below 1 is an error', () => {
    expect(resistanceFactor({ standard: 'IIW', stated: 1.25 }).value).toBe(1.25);
    expect(resistanceFactor({ standard: 'IIW', stated: 0.9 }).notes?.[0].severity).toBe('error');
    expect(loadFactor('IIW', 1.1).value).toBe(1.1);
  });

  it('IIW gamma_M: 1.30 safe life, high consequence (from memory, flagged)', () => {
    const r = resistanceFactor({ standard: 'IIW', concept: 'safe-life', consequence: 'high' });
    expect(r.value).toBe(1.3);
    expect(r.notes?.some((n) => n.code === 'from-memory')).toBe(true);
  });
});
