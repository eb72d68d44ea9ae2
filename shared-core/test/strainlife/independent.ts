/**
 * Independent computations for the strain-life tests, written here from the published equations
 * and solved by plain bisection (no code shared with `src/strainlife`): the reference the core
 * is compared with.
 */

/** Plain bisection of a function with f(lo) and f(hi) of opposite signs, 400 halvings (machine precision). */
export function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  for (let i = 0; i < 400; i++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    const fm = f(m);
    if (fm === 0) return m;
    if (Math.sign(fm) === Math.sign(fa)) {
      a = m;
      fa = fm;
    } else b = m;
  }
  return 0.5 * (a + b);
}

export interface Curve {
  E: number;
  K: number;
  n: number;
}

/** Ramberg-Osgood cyclic curve (Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 12): eps(sigma). */
export function roStrain(c: Curve, s: number): number {
  const a = Math.abs(s);
  const e = a / c.E + (a / c.K) ** (1 / c.n);
  return s < 0 ? -e : e;
}

/** Masing branch: Delta eps = Delta sigma/E + 2 (Delta sigma/(2K'))^(1/n'). */
export function masingStrain(c: Curve, ds: number): number {
  return ds / c.E + 2 * (ds / (2 * c.K)) ** (1 / c.n);
}

/** Stress on the cyclic curve at a strain, by bisection on [0, E eps]. */
export function roStress(c: Curve, e: number): number {
  const a = Math.abs(e);
  const s = bisect((x) => roStrain(c, x) - a, 0, c.E * a);
  return e < 0 ? -s : s;
}

/** Neuber's hyperbola sigma eps = (K S)^2/E intersected with the cyclic curve, by bisection on [0, K S]. */
export function neuberPoint(c: Curve, KS: number): { sigma: number; eps: number } {
  const e = Math.abs(KS);
  const target = (e * e) / c.E;
  const s = bisect((x) => x * roStrain(c, x) - target, 0, e);
  const sigma = KS < 0 ? -s : s;
  return { sigma, eps: roStrain(c, sigma) };
}

/** Neuber on ranges with the Masing curve, solved directly on the doubled curve: Delta sigma Delta eps = (K Delta S)^2/E. */
export function neuberRange(c: Curve, KdS: number): { dSigma: number; dEps: number } {
  const target = (KdS * KdS) / c.E;
  const ds = bisect((x) => x * masingStrain(c, x) - target, 0, KdS);
  return { dSigma: ds, dEps: masingStrain(c, ds) };
}

/** Composite Simpson rule with n (even) panels. */
export function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

/**
 * Strain energy density under the cyclic curve up to stress s, by numerical integration of
 * sigma d eps = sigma (d eps / d sigma) d sigma.
 */
export function energyNumeric(c: Curve, s: number): number {
  const deps = (x: number) => 1 / c.E + (x > 0 ? ((1 / c.n) * (x / c.K) ** (1 / c.n)) / x : 0);
  return simpson((x) => x * deps(x), 0, s);
}

/** Energy under the Masing branch up to the stress range ds, by numerical integration. */
export function masingEnergyNumeric(c: Curve, ds: number): number {
  const deps = (x: number) => 1 / c.E + (x > 0 ? ((2 / c.n) * (x / (2 * c.K)) ** (1 / c.n)) / x : 0);
  return simpson((x) => x * deps(x), 0, ds);
}

export interface Life {
  E: number;
  sf: number;
  b: number;
  ef: number;
  c: number;
}

/** Reversals 2N for a left side P and a right side R(2N), by bisection in log10(2N) on [0, 12]. */
export function lifeByBisection(R: (twoN: number) => number, P: number): number {
  const u = bisect((x) => Math.log(R(10 ** x)) - Math.log(P), 0, 12);
  return 10 ** u;
}

export function cmb(k: Life, twoN: number): number {
  return (k.sf / k.E) * twoN ** k.b + k.ef * twoN ** k.c;
}
