/**
 * Marin reliability factor ke and the standard normal quantile behind it.
 *
 * ke = 1 - 0.08 * za: Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed.,
 * Eq. (6-29) and Table 6-5 (standard deviation of the endurance limit taken as 8 % of the
 * mean, after Haugen and Wirsching). za is the standard normal quantile of the reliability R.
 *
 * normalQuantile: M. J. Wichura, "Algorithm AS 241: The Percentage Points of the Normal
 * Distribution", Applied Statistics 37(3), 1988, pp. 477-484 (PPND16, relative accuracy
 * about 1e-16). Coefficients as published.
 */
import { type Computed, computed, type MethodNote } from '../computed';

// biome-ignore-start lint/correctness/noPrecisionLoss: Wichura's AS 241 coefficients kept as published (20 digits)
const A = [
  3.387132872796366608, 133.14166789178437745, 1971.5909503065514427, 13731.693765509461125,
  45921.953931549871457, 67265.770927008700853, 33430.575583588128105, 2509.0809287301226727,
];
const B = [
  1.0, 42.313330701600911252, 687.1870074920579083, 5394.1960214247511077, 21213.794301586595867,
  39307.89580009271061, 28729.085735721942674, 5226.495278852854561,
];
const C = [
  1.42343711074968357734, 4.6303378461565452959, 5.7694972214606914055, 3.64784832476320460504,
  1.27045825245236838258, 0.24178072517745061177, 0.0227238449892691845833, 7.7454501427834140764e-4,
];
const D = [
  1.0, 2.05319162663775882187, 1.6763848301838038494, 0.68976733498510000455, 0.14810397642748007459,
  0.0151986665636164571966, 5.475938084995344946e-4, 1.05075007164441684324e-9,
];
const E = [
  6.6579046435011037772, 5.4637849111641143699, 1.7848265399172913358, 0.29656057182850489123,
  0.026532189526576123093, 0.0012426609473880784386, 2.71155556874348757815e-5, 2.01033439929228813265e-7,
];
const F = [
  1.0, 0.59983220655588793769, 0.13692988092273580531, 0.0148753612908506148525, 7.868691311456132591e-4,
  1.8463183175100546818e-5, 1.4215117583164458887e-7, 2.04426310338993978564e-15,
];
// biome-ignore-end lint/correctness/noPrecisionLoss: end of the AS 241 coefficients

/** Polynomial c[0] + c[1] x + ... by Horner's rule. */
function horner(c: readonly number[], x: number): number {
  let v = c[c.length - 1];
  for (let i = c.length - 2; i >= 0; i--) v = v * x + c[i];
  return v;
}

/**
 * Standard normal quantile z with Phi(z) = p, for 0 < p < 1 (Wichura AS 241).
 * Returns -Infinity / +Infinity at p = 0 / 1 and NaN outside [0, 1] or for NaN input:
 * it is a mathematical helper; `reliabilityFactor` guards its own inputs.
 */
export function normalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) return Number.NaN;
  if (p === 0) return Number.NEGATIVE_INFINITY;
  if (p === 1) return Number.POSITIVE_INFINITY;
  const q = p - 0.5;
  if (Math.abs(q) <= 0.425) {
    const r = 0.180625 - q * q;
    return (q * horner(A, r)) / horner(B, r);
  }
  let r = q < 0 ? p : 1 - p;
  r = Math.sqrt(-Math.log(r));
  let z: number;
  if (r <= 5) {
    r -= 1.6;
    z = horner(C, r) / horner(D, r);
  } else {
    r -= 5;
    z = horner(E, r) / horner(F, r);
  }
  return q < 0 ? -z : z;
}

const SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (6-29), Table 6-5; za by Wichura, Algorithm AS 241, Applied Statistics 37(3), 1988";
const FORMULA = 'ke = 1 - 0.08 * za,  za = Phi^-1(R)';

/** Reliability factor for the required reliability R (a fraction, e.g. 0.99). */
export function reliabilityFactor(R: number): Computed {
  if (typeof R !== 'number' || !Number.isFinite(R) || R <= 0 || R >= 1) {
    return computed(
      1,
      FORMULA,
      SOURCE,
      [],
      [
        {
          code: 'invalid-input',
          severity: 'error',
          message: 'reliability must lie strictly between 0 and 1 (e.g. 0.99 or 99 %); ke = 1 shown.',
        },
      ],
    );
  }
  const za = normalQuantile(R);
  // za <= 8.3 for any R < 1 representable in double precision, so ke >= 0.33 stays positive.
  const ke = 1 - 0.08 * za;
  const notes: MethodNote[] = [];
  if (R < 0.5) {
    notes.push({
      code: 'low-reliability',
      severity: 'warning',
      message: `R = ${R} is below 50 %: ke = ${ke.toFixed(3)} > 1 raises Se above the mean endurance limit. Design reliabilities are normally 0.9 or higher.`,
    });
  }
  return computed(
    ke,
    FORMULA,
    SOURCE,
    [
      { name: 'R', value: R, unit: '' },
      { name: 'za', value: za, unit: '' },
    ],
    notes,
  );
}
