/**
 * Stepped round shaft with a shoulder fillet: elastic stress concentration factor.
 *
 * Kt = C1 + C2 (2h/D) + C3 (2h/D)^2 + C4 (2h/D)^3, h = (D - d)/2 (Pilkey writes t),
 * Ci = k0 + k1 sqrt(h/r) + k2 (h/r), referred to the nominal stress of the SOLID section of the
 * smaller diameter d: 32M/(pi d^3), 16T/(pi d^3), 4F/(pi d^2).
 *
 * Coefficients: Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed., Chart 3.4
 * (tension), Chart 3.10 (bending), Chart 3.12 (torsion). Read from two independent public
 * transcriptions (eng-calculations.com "Peterson's Stress Concentration Factors / Shoulder
 * fillets" pages with explicit signs for tension and torsion; several public code bases quoting
 * the bending set, all agreeing on the values used here).
 *
 * Bending and tension have two published h/r ranges that meet at h/r = 2 with a step of up
 * to about 1 % of Kt; the charts are continuous, so the pieces are joined there, never below
 * the published piece of the range that holds h/r (see `fitJoin.ts`).
 *
 * Outside the fit's h/r range the function still answers, with a `fit-range` note:
 * - h/r below the range (a blunter fillet than the charts cover): h/r is clamped to the lower
 *   limit. Kt falls as r grows, so the value at the limit is an upper bound (conservative).
 * - h/r above the range (a sharper fillet): the upper polynomial is extrapolated, but never
 *   below its value at the upper limit, since Kt cannot fall as the fillet gets sharper.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, type Term } from '../computed';
import { type Joined, joinAtBoundary, liftText } from './fitJoin';

export type ShaftLoad = 'bending' | 'torsion' | 'axial';

/** [k0, k1, k2] for C1..C4 in one h/r range. */
type CoefRow = readonly [number, number, number];
interface FitRange {
  lo: number;
  hi: number;
  c: readonly [CoefRow, CoefRow, CoefRow, CoefRow];
}

const FITS: Record<ShaftLoad, readonly FitRange[]> = {
  // Pilkey Chart 3.4, tension of a stepped bar of circular cross section.
  axial: [
    {
      lo: 0.1,
      hi: 2.0,
      c: [
        [0.926, 1.157, -0.099],
        [0.012, -3.036, 0.961],
        [-0.302, 3.977, -1.744],
        [0.365, -2.098, 0.878],
      ],
    },
    {
      lo: 2.0,
      hi: 20.0,
      c: [
        [1.2, 0.86, -0.022],
        [-1.805, -0.346, -0.038],
        [2.198, -0.486, 0.165],
        [-0.593, -0.028, -0.106],
      ],
    },
  ],
  // Pilkey Chart 3.10, bending of a stepped bar of circular cross section.
  bending: [
    {
      lo: 0.1,
      hi: 2.0,
      c: [
        [0.947, 1.206, -0.131],
        [0.022, -3.405, 0.915],
        [0.869, 1.777, -0.555],
        [-0.81, 0.422, -0.26],
      ],
    },
    {
      lo: 2.0,
      hi: 20.0,
      c: [
        [1.232, 0.832, -0.008],
        [-3.813, 0.968, -0.26],
        [7.423, -4.868, 0.869],
        [-3.839, 3.07, -0.6],
      ],
    },
  ],
  // Pilkey Chart 3.12, torsion of a shaft with a shoulder fillet.
  torsion: [
    {
      lo: 0.25,
      hi: 4.0,
      c: [
        [0.905, 0.783, -0.075],
        [-0.437, -1.969, 0.553],
        [1.557, 1.073, -0.578],
        [-1.061, 0.171, 0.086],
      ],
    },
  ],
};

const SOURCE =
  "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (Wiley 2008), Charts 3.4 (tension), 3.10 (bending), 3.12 (torsion), curve-fit equations";

const SYMBOL: Record<ShaftLoad, string> = { bending: 'Kt', torsion: 'Kts', axial: 'Kt_ax' };
const NOMINAL: Record<ShaftLoad, string> = {
  bending: '32 M/(pi d^3)',
  torsion: '16 T/(pi d^3)',
  axial: '4 F/(pi d^2)',
};

function evalFit(range: FitRange, x: number, t: number): { kt: number; c: number[] } {
  const s = Math.sqrt(x);
  const c = range.c.map(([k0, k1, k2]) => k0 + k1 * s + k2 * x);
  return { kt: c[0] + c[1] * t + c[2] * t * t + c[3] * t * t * t, c };
}

/**
 * The fit inside its h/r range: the pieces on either side of the nearest boundary between two
 * ranges, joined there continuously (`fitJoin.ts`); a single range as published.
 */
function evalInRange(ranges: readonly FitRange[], x: number, t: number): Joined & { boundary?: number } {
  if (ranges.length === 1) return { ...evalFit(ranges[0], x, t), lift: 0, piece: 'lower' };
  let k = 0;
  for (let i = 1; i + 1 < ranges.length; i++)
    if (Math.abs(Math.log(x / ranges[i].hi)) < Math.abs(Math.log(x / ranges[k].hi))) k = i;
  const boundary = ranges[k].hi;
  const j = joinAtBoundary(
    x,
    boundary,
    (u) => evalFit(ranges[k], u, t),
    (u) => evalFit(ranges[k + 1], u, t),
  );
  return { ...j, boundary };
}

/** Kt of a shoulder fillet on a stepped round shaft (D > d, fillet radius r; SI lengths). */
export function shoulderFilletKt(load: ShaftLoad, D: number, d: number, r: number): Computed {
  const sym = SYMBOL[load] ?? 'Kt';
  const formula = `${sym} = C1 + C2 (2h/D) + C3 (2h/D)^2 + C4 (2h/D)^3, h = (D - d)/2, Ci = f(h/r); nominal ${NOMINAL[load] ?? ''}`;
  const ranges = FITS[load];
  if (!ranges) {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: `Unknown load '${String(load)}'; Kt = 1 returned.`,
      },
    ]);
  }
  if (![D, d, r].every(isFiniteNumber) || d <= 0 || D <= d || r <= 0) {
    return computed(1, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Shoulder fillet needs D > d > 0 and r > 0; Kt = 1 returned (no concentration computed).',
      },
    ]);
  }
  const notes: MethodNote[] = [];
  const h = (D - d) / 2;
  const x = h / r;
  const t = (2 * h) / D;
  const lo = ranges[0].lo;
  const hi = ranges[ranges.length - 1].hi;
  let xEval = x;
  let kt: number;
  let c: number[];
  let join: { lift: number; boundary: number; piece: 'lower' | 'upper' } | undefined;
  if (x < lo) {
    xEval = lo;
    ({ kt, c } = evalFit(ranges[0], lo, t));
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `h/r = ${x.toPrecision(3)} is below the fit range ${lo}..${hi}; h/r clamped to ${lo} (Kt at the limit is an upper bound for a blunter fillet).`,
    });
  } else if (x > hi) {
    const top = ranges[ranges.length - 1];
    const ext = evalFit(top, x, t);
    const atLimit = evalFit(top, hi, t);
    kt = Math.max(ext.kt, atLimit.kt);
    c = ext.c;
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `h/r = ${x.toPrecision(3)} is above the fit range ${lo}..${hi}; the fit is extrapolated (not below its value at h/r = ${hi}). Sharp fillet: check the drawing or state ${sym}.`,
    });
  } else {
    const inRange = evalInRange(ranges, x, t);
    ({ kt, c } = inRange);
    if (inRange.lift > 0 && inRange.boundary !== undefined)
      join = { lift: inRange.lift, boundary: inRange.boundary, piece: inRange.piece };
  }
  if (!isFiniteNumber(kt)) {
    kt = 1;
    notes.push({ code: 'invalid-input', severity: 'error', message: 'The fit did not give a finite value.' });
  }
  if (kt < 1) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `The fit gives ${kt.toFixed(3)} < 1 here; Kt = 1 used.`,
    });
    kt = 1;
  }
  const terms: Term[] = [
    { name: 'D/d', value: D / d, unit: '' },
    { name: 'r/d', value: r / d, unit: '' },
    { name: 'h/r', value: x, unit: '' },
    { name: '2h/D', value: t, unit: '' },
  ];
  if (xEval !== x) terms.push({ name: 'h/r used', value: xEval, unit: '' });
  c.forEach((ci, i) => {
    terms.push({ name: `C${i + 1}`, value: ci, unit: '' });
  });
  let shown = formula;
  if (join) {
    terms.push({ name: 'L w (join of the h/r ranges)', value: join.lift, unit: '' });
    shown = formula.replace('(2h/D)^3,', `(2h/D)^3 ${liftText(join.boundary, join.piece)},`);
  }
  return computed(kt, shown, SOURCE, terms, notes);
}
