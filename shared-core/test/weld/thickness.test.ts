import { describe, expect, it } from 'vitest';
import { MM } from '../../src/computed';
import { enSizeFactor, iiwThicknessFactor, statedThicknessFactorNotes } from '../../src/weld';

describe('EN 1993-1-9 size effect ks = (25/t)^0.2 for t > 25 mm (Sec. 7.2.2, Table 8.3; clause number from memory)', () => {
  it('t = 40 mm: ks = (25/40)^0.2 = 0.9103; t = 60 mm: 0.8394 (hand computation from the published formula)', () => {
    expect(enSizeFactor(40 * MM, true).value).toBeCloseTo(0.9103, 4);
    expect(enSizeFactor(60 * MM, true).value).toBeCloseTo(0.8394, 4);
  });

  it('t = 25 mm: 1; t = 12 mm: 1 with the thin-plate note (no increase below the reference)', () => {
    expect(enSizeFactor(25 * MM, true).value).toBe(1);
    const thin = enSizeFactor(12 * MM, true);
    expect(thin.value).toBe(1);
    expect(thin.notes?.map((n) => n.code)).toContain('thin-plate');
  });

  it('a detail whose table entry names no size effect: ks = 1 even at 60 mm', () => {
    const r = enSizeFactor(60 * MM, false);
    expect(r.value).toBe(1);
    expect(r.notes?.[0].code).toBe('no-size-effect');
  });

  it('bad thickness: error, finite value', () => {
    for (const t of [0, -1, Number.NaN, 5]) {
      const r = enSizeFactor(t, true);
      expect(r.value).toBe(1);
      expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
    }
  });
});

describe('IIW f(t) = (t_ref/t_eff)^n, t_ref = 25 mm (Hobbacher 2016 Sec. 3.5.2, Table 3.5-1; from memory)', () => {
  it('t = 50 mm: n = 0.3 -> 0.8123, n = 0.2 -> 0.8706, n = 0.1 -> 0.9330 (hand computation, 0.5^n)', () => {
    expect(iiwThicknessFactor(50 * MM, 'toe-as-welded').value).toBeCloseTo(0.5 ** 0.3, 10);
    expect(iiwThicknessFactor(50 * MM, 'toe-as-welded').value).toBeCloseTo(0.8123, 4);
    expect(iiwThicknessFactor(50 * MM, 'butt-as-welded').value).toBeCloseTo(0.8706, 4);
    expect(iiwThicknessFactor(50 * MM, 'toe-ground').value).toBeCloseTo(0.8706, 4);
    expect(iiwThicknessFactor(50 * MM, 'flush-or-longitudinal').value).toBeCloseTo(0.933, 4);
  });

  it('thin plates get no benefit: t = 10 mm -> 1 with the thin-plate note', () => {
    const r = iiwThicknessFactor(10 * MM, 'toe-as-welded');
    expect(r.value).toBe(1);
    expect(r.notes?.map((n) => n.code)).toContain('thin-plate');
  });

  it('short attachment L/t <= 2: t_eff = t unless the rule is asked for; with it, t_eff = max(0.5 L, 25 mm)', () => {
    const t = 60 * MM;
    const L = 100 * MM;
    expect(iiwThicknessFactor(t, 'toe-as-welded', { L }).value).toBeCloseTo((25 / 60) ** 0.3, 10);
    const rule = iiwThicknessFactor(t, 'toe-as-welded', { L, shortAttachmentRule: true });
    expect(rule.value).toBeCloseTo((25 / 50) ** 0.3, 10);
    expect(rule.notes?.some((n) => n.code === 'from-memory' && n.severity === 'warning')).toBe(true);
    // 0.5 L below t_ref: no benefit beyond 1
    expect(iiwThicknessFactor(t, 'toe-as-welded', { L: 30 * MM, shortAttachmentRule: true }).value).toBe(1);
    // long attachment: t_eff = t whatever the option
    expect(
      iiwThicknessFactor(t, 'toe-as-welded', { L: 200 * MM, shortAttachmentRule: true }).value,
    ).toBeCloseTo((25 / 60) ** 0.3, 10);
  });

  it('a stated factor above 1 raises the class: warning thickness-benefit', () => {
    expect(statedThicknessFactorNotes(1.1, 'IIW')[0].code).toBe('thickness-benefit');
    expect(statedThicknessFactorNotes(0.9, 'EN 1993-1-9')).toEqual([]);
  });

  it('the factor never exceeds 1 and never rises with thickness', () => {
    let prev = 1;
    for (let t = 5; t <= 150; t += 5) {
      const f = iiwThicknessFactor(t * MM, 'toe-as-welded').value;
      expect(f).toBeLessThanOrEqual(1);
      expect(f).toBeLessThanOrEqual(prev);
      prev = f;
    }
  });
});
