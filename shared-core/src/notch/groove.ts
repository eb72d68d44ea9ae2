/**
 * U-shaped circumferential groove in a round shaft: elastic stress concentration factor.
 *
 * Roark's Formulas for Stress and Strain (Young, Budynas & Sadegh), 7th/8th ed., Table 17.1,
 * "U-notch in a circular shaft", elastic stress, axial tension / bending / torsion:
 *   Kt = C1 + C2 (2h/D) + C3 (2h/D)^2 + C4 (2h/D)^3, Ci = k0 + k1 sqrt(h/r) + k2 (h/r),
 *   h = groove depth = (D - d)/2, r = groove root radius, d = root diameter,
 *   valid 0.25 <= h/r <= 50 (two ranges split at h/r = 2).
 * Nominal stresses on the SOLID root section d: 4F/(pi d^2), 32M/(pi d^3), 16T/(pi d^3).
 * Coefficients read from the public transcription of Table 17.1 at eng-calculations.com
 * (explicit signs); checked in the tests against independent chart tables (Carvill).
 *
 * The two ranges meet at h/r = 2 with a step of up to about 0.1 % of Kt; the curves of the
 * source are continuous, so the pieces are joined there, never below the published piece of
 * the range that holds h/r (see `fitJoin.ts`).
 *
 * Out-of-range h/r is treated as in `shoulderFillet.ts`: clamped below (conservative),
 * extrapolated above but never below the value at the upper limit; both with `fit-range`.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, type Term } from '../computed';
import { joinAtBoundary, liftText } from './fitJoin';
import type { ShaftLoad } from './shoulderFillet';

type CoefRow = readonly [number, number, number];
type Coefs = readonly [CoefRow, CoefRow, CoefRow, CoefRow];

const LO = 0.25;
const SPLIT = 2.0;
const HI = 50.0;

const FITS: Record<ShaftLoad, { low: Coefs; high: Coefs }> = {
  axial: {
    low: [
      [0.455, 3.354, -0.769],
      [3.129, -15.955, 7.404],
      [-6.909, 29.286, -16.104],
      [4.325, -16.685, 9.469],
    ],
    high: [
      [0.935, 1.922, 0.004],
      [0.537, -3.708, 0.04],
      [-2.538, 3.438, -0.012],
      [2.066, -1.652, -0.031],
    ],
  },
  bending: {
    low: [
      [0.455, 3.354, -0.769],
      [0.891, -12.721, 4.593],
      [0.286, 15.481, -6.392],
      [-0.632, -6.115, 2.568],
    ],
    high: [
      [0.935, 1.922, 0.004],
      [-0.552, -5.327, 0.086],
      [0.754, 6.281, -0.121],
      [-0.138, -2.876, 0.031],
    ],
  },
  torsion: {
    low: [
      [1.245, 0.264, 0.491],
      [-3.03, 3.269, -3.633],
      [7.199, -11.286, 8.318],
      [-4.414, 7.753, -5.176],
    ],
    high: [
      [1.651, 0.614, 0.04],
      [-4.794, -0.314, -0.217],
      [8.457, -0.962, 0.389],
      [-4.314, 0.662, -0.212],
    ],
  },
};

const SOURCE =
  "Young, Budynas & Sadegh, Roark's Formulas for Stress and Strain, 7th/8th ed., Table 17.1, U-notch in a circular shaft (elastic stress)";

const SYMBOL: Record<ShaftLoad, string> = { bending: 'Kt', torsion: 'Kts', axial: 'Kt_ax' };
const NOMINAL: Record<ShaftLoad, string> = {
  bending: '32 M/(pi d^3)',
  torsion: '16 T/(pi d^3)',
  axial: '4 F/(pi d^2)',
};

function evalFit(c4: Coefs, x: number, t: number): { kt: number; c: number[] } {
  const s = Math.sqrt(x);
  const c = c4.map(([k0, k1, k2]) => k0 + k1 * s + k2 * x);
  return { kt: c[0] + c[1] * t + c[2] * t * t + c[3] * t * t * t, c };
}

/** Kt of a U-groove (outer diameter D, root diameter d, root radius r; SI lengths). */
export function grooveKt(load: ShaftLoad, D: number, d: number, r: number): Computed {
  const sym = SYMBOL[load] ?? 'Kt';
  const formula = `${sym} = C1 + C2 (2h/D) + C3 (2h/D)^2 + C4 (2h/D)^3, h = (D - d)/2, Ci = f(h/r); nominal ${NOMINAL[load] ?? ''}`;
  const fit = FITS[load];
  if (!fit) {
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
        message: 'Groove needs D > d > 0 (d = root diameter) and r > 0; Kt = 1 returned.',
      },
    ]);
  }
  const notes: MethodNote[] = [];
  const h = (D - d) / 2;
  const x = h / r;
  const t = (2 * h) / D;
  let xEval = x;
  let res: { kt: number; c: number[] };
  let join: { lift: number; piece: 'lower' | 'upper' } | undefined;
  if (x < LO) {
    xEval = LO;
    res = evalFit(fit.low, LO, t);
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `h/r = ${x.toPrecision(3)} is below the fit range ${LO}..${HI}; h/r clamped to ${LO} (upper bound for a blunter groove).`,
    });
  } else if (x > HI) {
    const ext = evalFit(fit.high, x, t);
    const atLimit = evalFit(fit.high, HI, t);
    res = { kt: Math.max(ext.kt, atLimit.kt), c: ext.c };
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `h/r = ${x.toPrecision(3)} is above the fit range ${LO}..${HI}; the fit is extrapolated (not below its value at h/r = ${HI}).`,
    });
  } else {
    const j = joinAtBoundary(
      x,
      SPLIT,
      (u) => evalFit(fit.low, u, t),
      (u) => evalFit(fit.high, u, t),
    );
    res = j;
    if (j.lift > 0) join = { lift: j.lift, piece: j.piece };
  }
  let kt = res.kt;
  if (!isFiniteNumber(kt)) {
    kt = 1;
    notes.push({ code: 'invalid-input', severity: 'error', message: 'The fit did not give a finite value.' });
  }
  if (kt < 1) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `The fit gives ${kt.toFixed(3)} < 1; Kt = 1 used.`,
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
  res.c.forEach((ci, i) => {
    terms.push({ name: `C${i + 1}`, value: ci, unit: '' });
  });
  let shown = formula;
  if (join) {
    terms.push({ name: 'L w (join of the h/r ranges)', value: join.lift, unit: '' });
    shown = formula.replace('(2h/D)^3,', `(2h/D)^3 ${liftText(SPLIT, join.piece)},`);
  }
  return computed(kt, shown, SOURCE, terms, notes);
}
