import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import { improvedClass } from '../../src/weld';

const base = { standard: 'IIW' as const, material: 'steel' as const };

describe('IIW improvement factors (Haagensen & Maddox, IIW XIII-2200r7-07; IIW 2008 Sec. 3.6; from memory)', () => {
  it('burr grinding FAT 80 -> 1.3 * 80 = 104, m = 3', () => {
    const r = improvedClass({ ...base, FAT: 80 * MPA, method: 'burr-grinding' });
    expect(r.value / MPA).toBeCloseTo(104, 10);
    expect(r.m1).toBe(3);
  });

  it('TIG dressing FAT 90 -> 117 capped at FAT 112', () => {
    const r = improvedClass({ ...base, FAT: 90 * MPA, method: 'tig-dressing' });
    expect(r.value / MPA).toBe(112);
  });

  it('a class above FAT 90 gets no benefit (warning)', () => {
    const r = improvedClass({ ...base, FAT: 100 * MPA, method: 'burr-grinding' });
    expect(r.value / MPA).toBe(100);
    expect(r.notes?.some((n) => n.code === 'improvement-limit' && n.severity === 'warning')).toBe(true);
  });

  it('hammer peening FAT 71: 1.3 below fy = 355 MPa (92.3), 1.5 at 355 MPa (106.5)', () => {
    expect(
      improvedClass({ ...base, FAT: 71 * MPA, method: 'hammer-peening', fy: 275 * MPA }).value / MPA,
    ).toBeCloseTo(92.3, 10);
    expect(
      improvedClass({ ...base, FAT: 71 * MPA, method: 'needle-peening', fy: 355 * MPA }).value / MPA,
    ).toBeCloseTo(106.5, 10);
  });

  it('peening steel without fy: error', () => {
    const r = improvedClass({ ...base, FAT: 71 * MPA, method: 'hammer-peening' });
    expect(r.notes?.some((n) => n.severity === 'error')).toBe(true);
  });

  it('aluminium: FAT 28 ground -> 36.4; FAT 36 above the FAT 32 limit keeps its class', () => {
    expect(
      improvedClass({ ...base, material: 'aluminium', FAT: 28 * MPA, method: 'burr-grinding' }).value / MPA,
    ).toBeCloseTo(36.4, 10);
    expect(
      improvedClass({ ...base, material: 'aluminium', FAT: 36 * MPA, method: 'burr-grinding' }).value / MPA,
    ).toBe(36);
  });

  it('root failure keeps the as-welded class; EN 1993-1-9 does not cover improvement (Sec. 1.1(6))', () => {
    expect(
      improvedClass({ ...base, FAT: 36 * MPA, method: 'burr-grinding', failure: 'root' }).value / MPA,
    ).toBe(36);
    const en = improvedClass({ ...base, standard: 'EN 1993-1-9', FAT: 71 * MPA, method: 'burr-grinding' });
    expect(en.value / MPA).toBe(71);
    expect(en.notes?.[0].code).toBe('not-covered');
  });
});

describe('HFMI classes (Marquis & Barsoum, IIW Recommendations for the HFMI Treatment, Springer 2016; from memory)', () => {
  it('FAT 80 at fy = 355 MPa, R = 0.1: three steps, FAT 112, m = 5', () => {
    const r = improvedClass({ ...base, FAT: 80 * MPA, method: 'hfmi', fy: 355 * MPA, R: 0.1 });
    expect(r.value / MPA).toBe(112);
    expect(r.m1).toBe(5);
  });

  it('FAT 71 at fy = 700 MPa: five steps (FAT 125) at R = 0.1, two fewer (FAT 100) at R = 0.3', () => {
    expect(improvedClass({ ...base, FAT: 71 * MPA, method: 'hfmi', fy: 700 * MPA, R: 0.1 }).value / MPA).toBe(
      125,
    );
    expect(improvedClass({ ...base, FAT: 71 * MPA, method: 'hfmi', fy: 700 * MPA, R: 0.3 }).value / MPA).toBe(
      100,
    );
  });

  it('R above 0.52 or fy below 235 MPa: no class, as-welded kept (warning)', () => {
    const r = improvedClass({ ...base, FAT: 80 * MPA, method: 'hfmi', fy: 355 * MPA, R: 0.6 });
    expect(r.value / MPA).toBe(80);
    expect(r.notes?.some((n) => n.severity === 'warning')).toBe(true);
    expect(improvedClass({ ...base, FAT: 80 * MPA, method: 'hfmi', fy: 200 * MPA, R: 0 }).value / MPA).toBe(
      80,
    );
  });

  it('the improved class never falls below the as-welded class and rises with fy', () => {
    let prev = 0;
    for (const fy of [235, 300, 400, 600, 800, 1000]) {
      const v = improvedClass({ ...base, FAT: 63 * MPA, method: 'hfmi', fy: fy * MPA, R: 0 }).value;
      expect(v).toBeGreaterThanOrEqual(63 * MPA);
      expect(v).toBeGreaterThanOrEqual(prev);
      prev = v;
    }
  });
});
