/**
 * The closed forms of the four classical criteria against the bracketed root finder applied to
 * their own equivalent reversed stress, for every load line; the root-finder answers of Morrow,
 * SWT and Walker against their algebraic solutions; and the limiting answers the contract asks for.
 */
import { describe, expect, it } from 'vitest';
import { MPA } from '../../src/computed';
import {
  asmeElliptic,
  CRITERION_KEYS,
  type CriterionKey,
  classicalModel,
  criterionModel,
  fatigueSafetyFactor,
  gerber,
  goodman,
  LOAD_LINES,
  type LoadLine,
  langerLine,
  type StrengthSet,
  soderberg,
  solveFactor,
} from '../../src/criteria';

const s: StrengthSet = {
  S: 200 * MPA,
  Sut: 600 * MPA,
  Sy: 450 * MPA,
  sigma_f_prime: 900 * MPA,
  gamma_walker: 0.6,
};
const CLASSICAL = ['goodman', 'gerber', 'soderberg', 'asme-elliptic'] as const;
const STATES: Array<[number, number]> = [
  [80, 60],
  [120, 150],
  [30, 300],
  [150, 20],
];

function numeric(key: (typeof CLASSICAL)[number], line: LoadLine, a: number, m: number): number {
  const model = classicalModel(key)!;
  const f =
    line === 'proportional'
      ? (n: number) => model.reversed(n * a, n * m, s)
      : line === 'constant-mean'
        ? (n: number) => model.reversed(n * a, m, s)
        : (n: number) => model.reversed(a, n * m, s);
  const sol = solveFactor(f, s.S);
  if (sol.kind !== 'root') throw new Error(`no root for ${key} ${line}`);
  return sol.n;
}

describe('closed form = root finder, classical criteria x load lines (algebraic identity)', () => {
  for (const key of CLASSICAL) {
    for (const line of LOAD_LINES) {
      it(`${key}, ${line}`, () => {
        for (const [a, m] of STATES) {
          const closed = fatigueSafetyFactor(key, line, a * MPA, m * MPA, s);
          expect(closed.infinite).toBeFalsy();
          expect(closed.value).toBeCloseTo(numeric(key, line, a * MPA, m * MPA), 9);
        }
      });
    }
  }
});

describe('Morrow, SWT, Walker: root finder = algebraic solution (identities)', () => {
  const S = s.S;
  const sf = s.sigma_f_prime!;
  for (const [aM, mM] of STATES) {
    const a = aM * MPA;
    const m = mM * MPA;
    it(`Morrow at (${aM}, ${mM}) MPa: the Goodman forms with Sut -> sigma_f'`, () => {
      expect(fatigueSafetyFactor('morrow', 'proportional', a, m, s).value).toBeCloseTo(
        1 / (a / S + m / sf),
        9,
      );
      expect(fatigueSafetyFactor('morrow', 'constant-mean', a, m, s).value).toBeCloseTo(
        (S * (1 - m / sf)) / a,
        9,
      );
      expect(fatigueSafetyFactor('morrow', 'constant-amplitude', a, m, s).value).toBeCloseTo(
        Math.max(0, (sf * (1 - a / S)) / m),
        9,
      );
    });
    it(`SWT at (${aM}, ${mM}) MPa: quadratic solutions`, () => {
      expect(fatigueSafetyFactor('swt', 'proportional', a, m, s).value).toBeCloseTo(
        S / Math.sqrt((m + a) * a),
        9,
      );
      expect(fatigueSafetyFactor('swt', 'constant-mean', a, m, s).value).toBeCloseTo(
        (-m + Math.sqrt(m * m + 4 * S * S)) / (2 * a),
        9,
      );
      expect(fatigueSafetyFactor('swt', 'constant-amplitude', a, m, s).value).toBeCloseTo(
        Math.max(0, (S * S) / a - a) / m,
        9,
      );
    });
    it(`Walker at (${aM}, ${mM}) MPa: homogeneous of degree 1 (proportional), and the solved state lies on the curve`, () => {
      const g = s.gamma_walker!;
      const w = (x: number, y: number) => (y + x) ** (1 - g) * x ** g;
      expect(fatigueSafetyFactor('walker', 'proportional', a, m, s).value).toBeCloseTo(S / w(a, m), 9);
      const nm = fatigueSafetyFactor('walker', 'constant-mean', a, m, s).value;
      expect(w(nm * a, m) / S).toBeCloseTo(1, 9);
      const na = fatigueSafetyFactor('walker', 'constant-amplitude', a, m, s).value;
      if (na > 0) expect(w(a, na * m) / S).toBeCloseTo(1, 9);
    });
  }
  it('Walker with gamma = 0.5 is SWT (Dowling, Mech. Behavior of Materials 4th ed., Sec. 9.7)', () => {
    for (const line of LOAD_LINES) {
      const w = fatigueSafetyFactor('walker', line, 90 * MPA, 70 * MPA, { ...s, gamma_walker: 0.5 }).value;
      expect(w).toBeCloseTo(fatigueSafetyFactor('swt', line, 90 * MPA, 70 * MPA, s).value, 9);
    }
  });
});

describe('limiting answers', () => {
  it('zero mean: n = S / sigma_a for every criterion and load line (identity)', () => {
    for (const key of CRITERION_KEYS) {
      for (const line of LOAD_LINES) {
        const r = fatigueSafetyFactor(key, line, 50 * MPA, 0, s);
        expect(r.value).toBeCloseTo(4, 9);
        if (line === 'constant-amplitude') expect(r.notes?.some((n) => n.code === 'load-line')).toBe(true);
      }
    }
  });

  it('compressive mean: horizontal line n = S/sigma_a; Gerber and ASME elliptic add criterion-domain', () => {
    for (const key of CLASSICAL) {
      for (const line of LOAD_LINES) {
        const r = fatigueSafetyFactor(key, line, 50 * MPA, -300 * MPA, s);
        expect(r.value).toBeCloseTo(4, 9);
        const domain = r.notes?.some((n) => n.code === 'criterion-domain') ?? false;
        expect(domain).toBe(key === 'gerber' || key === 'asme-elliptic');
      }
    }
  });

  it('no stress at all: infinite, value 0 (never Infinity)', () => {
    for (const key of CRITERION_KEYS) {
      const r = fatigueSafetyFactor(key, 'proportional', 0, 0, s);
      expect(r.infinite).toBe(true);
      expect(r.value).toBe(0);
    }
  });

  it('SWT and Walker with sigma_max <= 0 on the proportional line: infinite with a note', () => {
    for (const key of ['swt', 'walker'] as const) {
      const r = fatigueSafetyFactor(key, 'proportional', 50 * MPA, -80 * MPA, s);
      expect(r.infinite).toBe(true);
      expect(r.notes?.some((n) => n.code === 'infinite')).toBe(true);
    }
  });

  it('Goodman with sigma_m >= Sut: the proportional formula, < 1', () => {
    const r = fatigueSafetyFactor('goodman', 'proportional', 50 * MPA, 700 * MPA, s);
    expect(r.value).toBeCloseTo(1 / (50 / 200 + 700 / 600), 12);
    expect(r.value).toBeLessThan(1);
  });

  it('constant mean beyond the intercept: factor 0 with a warning (the mean alone fails)', () => {
    const r = fatigueSafetyFactor('goodman', 'constant-mean', 50 * MPA, 700 * MPA, s);
    expect(r.value).toBe(0);
    expect(r.notes?.[0].severity).toBe('warning');
  });

  it('pure static tensile mean: proportional n = intercept / sigma_m (Sut for Goodman/Gerber, Sy for Soderberg/ASME)', () => {
    expect(fatigueSafetyFactor('goodman', 'proportional', 0, 300 * MPA, s).value).toBeCloseTo(2, 12);
    expect(fatigueSafetyFactor('gerber', 'proportional', 0, 300 * MPA, s).value).toBeCloseTo(2, 12);
    expect(fatigueSafetyFactor('soderberg', 'proportional', 0, 300 * MPA, s).value).toBeCloseTo(1.5, 12);
    expect(fatigueSafetyFactor('asme-elliptic', 'proportional', 0, 300 * MPA, s).value).toBeCloseTo(1.5, 12);
  });

  it('Gerber proportional closed form matches Table 6-7 written as printed (Shigley MED 10th ed.)', () => {
    const a = 80 * MPA;
    const m = 60 * MPA;
    const table =
      0.5 * (s.Sut / m) ** 2 * (a / s.S) * (-1 + Math.sqrt(1 + ((2 * m * s.S) / (s.Sut * a)) ** 2));
    expect(fatigueSafetyFactor('gerber', 'proportional', a, m, s).value).toBeCloseTo(table, 10);
  });

  it('bad strengths: error note, finite value', () => {
    const r = fatigueSafetyFactor('soderberg', 'proportional', 50, 50, { S: 1, Sut: 1, Sy: -1 });
    expect(r.value).toBe(0);
    expect(r.notes?.[0].severity).toBe('error');
  });

  it('Morrow without sigma_f_prime: Shigley estimate Sut + 345 MPa with a default note', () => {
    const r = fatigueSafetyFactor('morrow', 'proportional', 80 * MPA, 60 * MPA, {
      S: s.S,
      Sut: s.Sut,
      Sy: s.Sy,
    });
    expect(r.value).toBeCloseTo(1 / (80 / 200 + 60 / 945), 9);
    expect(r.notes?.some((n) => n.code === 'mean-stress-default')).toBe(true);
  });
});

describe('Haigh curves and the Langer line', () => {
  it('end points: (0, S) and (intercept, 0) for the classical criteria', () => {
    for (const [mod, intercept] of [
      [goodman, s.Sut],
      [gerber, s.Sut],
      [soderberg, s.Sy],
      [asmeElliptic, s.Sy],
    ] as const) {
      const pts = mod.haighCurve(s, 16);
      expect(pts).toHaveLength(16);
      expect(pts[0]).toEqual([0, s.S]);
      expect(pts[15][0]).toBeCloseTo(intercept, 6);
      expect(pts[15][1]).toBeCloseTo(0, 6);
    }
  });

  it('every model of the lookup: its Haigh points lie on its own curve (equivalentReversed = S)', () => {
    for (const key of CRITERION_KEYS as readonly CriterionKey[]) {
      const model = criterionModel(key);
      const pts = model.haighCurve(s, 12).filter(([, a]) => a > 1e-6 * s.S);
      expect(pts.length).toBeGreaterThan(5);
      for (const [m, a] of pts) {
        const r = model.equivalentReversed(a, m, s);
        expect(r.value / s.S).toBeCloseTo(1, 6);
        expect(model.allowableAmplitude(m, s).value / a).toBeCloseTo(1, 6);
      }
    }
  });

  it('Langer line through (0, Sy) and (+-Sy, 0)', () => {
    expect(langerLine(400)).toEqual([
      [-400, 0],
      [0, 400],
      [400, 0],
    ]);
  });
});
