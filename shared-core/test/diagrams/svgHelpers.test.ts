import { describe, expect, it } from 'vitest';
import { clipPolyline, clipSegment, esc, logTicks, niceDomain, niceTicks, px } from '../../src/diagrams/svg';

describe('drawing helpers', () => {
  it('escapes the five XML special characters', () => {
    expect(esc(`a<b>&"c'`)).toBe('a&lt;b&gt;&amp;&quot;c&#39;');
  });

  it('never writes NaN or -0 in an attribute', () => {
    expect(px(Number.NaN)).toBe('0');
    expect(px(Number.POSITIVE_INFINITY)).toBe('0');
    expect(px(-0.001)).toBe('0');
    expect(px(12.3456)).toBe('12.35');
  });

  it('gives 1-2-5 ticks covering the range', () => {
    expect(niceTicks(0, 630, 7)).toEqual([0, 100, 200, 300, 400, 500, 600]);
    expect(niceDomain(0, 655, 7)).toEqual([0, 700]);
    expect(niceDomain(-12.5, 104, 7)).toEqual([-20, 120]);
    for (const t of niceTicks(-3e-7, 7e-7)) expect(Number.isFinite(t)).toBe(true);
    expect(niceTicks(5, 5).length).toBeGreaterThan(1);
  });

  it('gives decade ticks with labelled 2 and 5 on short log axes', () => {
    const t = logTicks(2, 3);
    expect(t.filter((x) => x.major).map((x) => x.value)).toEqual([100, 1000]);
    expect(t.filter((x) => x.label).map((x) => x.value)).toEqual([100, 200, 500, 1000]);
    expect(
      logTicks(3, 7)
        .filter((x) => x.label)
        .map((x) => x.value),
    ).toEqual([1e3, 1e4, 1e5, 1e6, 1e7]);
  });

  it('clips segments to a rectangle (exact geometry)', () => {
    // The diagonal y = x from (-1,-1) to (3,3) clipped to the unit square is (0,0)-(1,1).
    expect(clipSegment(-1, -1, 3, 3, 0, 1, 0, 1)).toEqual([0, 0, 1, 1]);
    expect(clipSegment(2, 2, 3, 3, 0, 1, 0, 1)).toBeNull();
    // The Langer line (-Sy,0)-(0,Sy)-(Sy,0) seen from mean 0 keeps its tensile half.
    const runs = clipPolyline(
      [
        [-5, 0],
        [0, 5],
        [5, 0],
      ],
      0,
      10,
      0,
      10,
    );
    expect(runs).toEqual([
      [
        [0, 5],
        [5, 0],
      ],
    ]);
  });
});
