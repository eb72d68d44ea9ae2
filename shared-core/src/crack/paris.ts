import {
  type Computed,
  computed,
  INCH,
  infinite,
  KSI,
  type MethodNote,
  MM,
  MPA,
  type Term,
} from '../computed';
import type { GeometryFactor } from './geometry';

/**
 * Fatigue crack growth by the Paris law, da/dN = C (delta_K)^m with
 * delta_K = Y delta_sigma sqrt(pi a) (P.C. Paris, F. Erdogan, A critical analysis of crack
 * propagation laws, J. Basic Eng. 85 (1963) 528-534), integrated from a_i to a_c:
 *
 *   N = integral_{a_i}^{a_c} da / (C (Y(a) delta_sigma sqrt(pi a))^m)
 *
 * Closed form for constant Y (Dowling, Mechanical Behavior of Materials, 4th ed., sec. 11.6,
 * equation numbers from memory; Budynas and Nisbett, Shigley's Mechanical Engineering Design,
 * 9th ed., sec. 6-6, whose eq. 6-7 is the stepwise (Reemsnyder) form of the same integral):
 *   m != 2: N = (a_c^(1 - m/2) - a_i^(1 - m/2)) / (C (Y delta_sigma sqrt(pi))^m (1 - m/2))
 *   m == 2: N = ln(a_c / a_i) / (C pi (Y delta_sigma)^2)
 * With Y depending on a: adaptive Simpson quadrature in ln(a) (a smooth integrand).
 *
 * Units: `C` is for da/dN in m/cycle with delta_K in MPa*m^0.5 (the contract's default);
 * stresses are in Pa and lengths in m, converted inside. `parisConstantFromInch` converts a
 * C given for in/cycle and ksi*in^0.5.
 */
export interface ParisInput {
  /** Paris coefficient for da/dN in m/cycle and delta_K in MPa*m^0.5. */
  C: number;
  /** Paris exponent. */
  m: number;
  /** Geometry factor: a constant, a function of a (m), or a built-in geometry. */
  Y: number | ((a: number) => number) | GeometryFactor;
  /** Initial crack size, m. */
  a_i: number;
  /** Final (critical) crack size, m. */
  a_c: number;
  /** Stress range, Pa. */
  delta_sigma: number;
}

export const PARIS_SOURCE =
  'P.C. Paris, F. Erdogan, A critical analysis of crack propagation laws, J. Basic Eng. 85 (1963) 528-534; ' +
  'integration as in N.E. Dowling, Mechanical Behavior of Materials, 4th ed., sec. 11.6 (section from memory)';

/** delta_K at which the plausibility of C is judged (MPa*m^0.5). */
const DK_CHECK = 10;
/** ksi*in^0.5 in MPa*m^0.5 (exact from the definitions of ksi and inch). */
export const KSI_SQRT_IN_IN_MPA_SQRT_M = (KSI / MPA) * Math.sqrt(INCH);

function isGeometry(y: ParisInput['Y']): y is GeometryFactor {
  return typeof y === 'object' && y !== null && typeof (y as GeometryFactor).Y === 'function';
}

/** Checks C and m: a rate at delta_K = 10 MPa*m^0.5 far from any metal's says "wrong units". */
export function parisConstantNotes(C: number, m: number): MethodNote[] {
  const notes: MethodNote[] = [];
  if (!(Number.isFinite(C) && C > 0)) {
    notes.push({ code: 'paris-constant', severity: 'error', message: 'C_paris must be a positive number.' });
  }
  if (!(Number.isFinite(m) && m > 0)) {
    notes.push({ code: 'paris-exponent', severity: 'error', message: 'm_paris must be a positive number.' });
  }
  if (notes.length > 0) return notes;
  if (m < 1 || m > 10) {
    notes.push({
      code: 'paris-exponent',
      severity: 'warning',
      message: `m_paris = ${m} is outside 1..10, unusual for metals in the Paris regime.`,
    });
  }
  // Common practice, no source: Paris-regime growth rates of metals lie roughly between
  // 1e-9 and 1e-6 m/cycle; at delta_K = 10 MPa*m^0.5 a rate below 1e-15 (less than a
  // millionth of an atomic spacing per cycle) or above 1e-3 m/cycle cannot be right.
  const rate = C * DK_CHECK ** m;
  const hint =
    'Check the units of C_paris: it is for da/dN in m/cycle with delta_K in MPa*m^0.5 (paris-units: inch for in/cycle and ksi*in^0.5); ' +
    'a C for delta_K in Pa*m^0.5 or da/dN in mm/cycle is off by powers of 1e6 or 1e3.';
  if (!(rate >= 1e-15 && rate <= 1e-3)) {
    notes.push({
      code: 'paris-units',
      severity: 'error',
      message: `C_paris = ${C.toPrecision(4)} with m_paris = ${m} gives da/dN = ${rate.toPrecision(3)} m/cycle at delta_K = 10 MPa*m^0.5, impossible for a metal. ${hint}`,
    });
  } else if (rate < 1e-12 || rate > 1e-5) {
    notes.push({
      code: 'paris-units',
      severity: 'warning',
      message: `C_paris = ${C.toPrecision(4)} with m_paris = ${m} gives da/dN = ${rate.toPrecision(3)} m/cycle at delta_K = 10 MPa*m^0.5, far from usual values. ${hint}`,
    });
  }
  return notes;
}

/** Cycles for the crack to grow from a_i to a_c under a constant stress range. */
export function parisLife(p: ParisInput): Computed {
  const { C, m, a_i, delta_sigma } = p;
  let a_c = p.a_c;
  const dS = delta_sigma / MPA;
  const geometry = isGeometry(p.Y) ? p.Y : undefined;
  const Yconst = typeof p.Y === 'number' ? p.Y : undefined;
  const terms: Term[] = [
    { name: 'C_paris', value: C, unit: '(m/cycle)/(MPa*m^0.5)^m' },
    { name: 'm_paris', value: m, unit: '' },
    { name: 'delta_sigma', value: dS, unit: 'MPa' },
    { name: 'a_i', value: a_i / MM, unit: 'mm' },
    { name: 'a_c', value: a_c / MM, unit: 'mm' },
  ];
  const closedFormula =
    Math.abs(m - 2) < 1e-9
      ? 'N_cg = ln(a_c / a_i) / (C_paris * pi * (Y * delta_sigma)^2)'
      : 'N_cg = (a_c^(1 - m/2) - a_i^(1 - m/2)) / (C_paris * (Y * delta_sigma * sqrt(pi))^m * (1 - m/2))';
  const numFormula =
    'N_cg = integral from a_i to a_c of da / (C_paris * (Y(a) * delta_sigma * sqrt(pi * a))^m)';
  const formula = Yconst !== undefined ? closedFormula : numFormula;
  const notes: MethodNote[] = parisConstantNotes(C, m);
  const fail = (code: string, message: string) => {
    notes.push({ code, severity: 'error', message });
    return computed(0, formula, PARIS_SOURCE, terms, notes);
  };
  if (notes.some((n) => n.severity === 'error')) return computed(0, formula, PARIS_SOURCE, terms, notes);
  if (!(Number.isFinite(a_i) && a_i > 0)) return fail('input-invalid', 'a_i must be a positive length.');
  if (!(Number.isFinite(a_c) && a_c > 0)) return fail('input-invalid', 'a_c must be a positive length.');
  if (a_i >= a_c) {
    return fail(
      'crack-size-order',
      `The initial crack (a_i = ${(a_i / MM).toPrecision(4)} mm) is not smaller than the critical size (a_c = ${(a_c / MM).toPrecision(4)} mm): the part fails on the first cycle.`,
    );
  }
  if (!Number.isFinite(delta_sigma) || delta_sigma < 0)
    return fail('input-invalid', 'The stress range must be a finite, non-negative stress.');
  if (Yconst !== undefined && !(Number.isFinite(Yconst) && Yconst > 0))
    return fail('input-invalid', 'Y must be a positive number.');
  if (delta_sigma === 0) {
    return infinite(formula, PARIS_SOURCE, terms, [
      ...notes,
      {
        code: 'no-stress-range',
        severity: 'information',
        message: 'With no stress range the crack does not grow.',
      },
    ]);
  }
  if (geometry) {
    terms.push({ name: 'W', value: geometry.W / MM, unit: 'mm' });
    if (a_c >= geometry.aMax) {
      const limit = geometry.aMax * (1 - 1e-9);
      notes.push({
        code: 'geometry-limit',
        severity: 'warning',
        message: `a_c is at or beyond the geometry factor's limit (${(geometry.aMax / MM).toPrecision(4)} mm): growth is integrated up to that limit only.`,
      });
      if (a_i >= limit)
        return fail('crack-size-order', 'The initial crack already reaches the geometry limit.');
      a_c = limit;
    }
    if (a_c > geometry.fitMax) {
      notes.push({
        code: 'fit-range',
        severity: 'warning',
        message: `The crack grows beyond the geometry factor's stated accuracy range (a <= ${(geometry.fitMax / MM).toPrecision(4)} mm).`,
      });
    }
  }

  if (Yconst !== undefined) {
    terms.push({ name: 'Y', value: Yconst, unit: '' });
    terms.push({ name: 'delta_K_i', value: Yconst * dS * Math.sqrt(Math.PI * a_i), unit: 'MPa*m^0.5' });
    terms.push({ name: 'delta_K_c', value: Yconst * dS * Math.sqrt(Math.PI * a_c), unit: 'MPa*m^0.5' });
    const N = parisClosedForm(C, m, Yconst, dS, a_i, a_c);
    if (!Number.isFinite(N))
      return fail('overflow', 'The crack-growth life is outside the range of floating-point numbers.');
    return computed(N, formula, PARIS_SOURCE, terms, notes);
  }

  const Yfun = geometry ? (a: number) => geometry.Y(a) : (p.Y as (a: number) => number);
  const Yi = Yfun(a_i);
  const Yc = Yfun(a_c);
  if (!(Number.isFinite(Yi) && Yi > 0 && Number.isFinite(Yc) && Yc > 0)) {
    return fail(
      'geometry-domain',
      'The geometry factor is not a positive number over the crack growth range.',
    );
  }
  terms.push({ name: 'Y(a_i)', value: Yi, unit: '' }, { name: 'Y(a_c)', value: Yc, unit: '' });
  terms.push({ name: 'delta_K_i', value: Yi * dS * Math.sqrt(Math.PI * a_i), unit: 'MPa*m^0.5' });
  terms.push({ name: 'delta_K_c', value: Yc * dS * Math.sqrt(Math.PI * a_c), unit: 'MPa*m^0.5' });
  const q = integrateParis(C, m, Yfun, dS, a_i, a_c);
  if (!q.ok || !Number.isFinite(q.value)) {
    return fail(
      'geometry-domain',
      'The geometry factor is not a positive number over the crack growth range.',
    );
  }
  if (!q.converged) {
    notes.push({
      code: 'integration-tolerance',
      severity: 'warning',
      message:
        'The numerical integration did not reach its tolerance everywhere; the result may be off by more than 1e-8.',
    });
  }
  return computed(q.value, formula, `${PARIS_SOURCE}; adaptive Simpson quadrature in ln(a)`, terms, notes);
}

/** The closed form for constant Y (delta_sigma in MPa, sizes in m); may overflow to Infinity. */
function parisClosedForm(C: number, m: number, Y: number, dS: number, a_i: number, a_c: number): number {
  if (Math.abs(m - 2) < 1e-9) return Math.log(a_c / a_i) / (C * Math.PI * (Y * dS) ** 2);
  const e = 1 - m / 2;
  // a_c^e - a_i^e computed as a_i^e * expm1(e ln(a_c/a_i)) to keep precision when m is near 2.
  const diff = a_i ** e * Math.expm1(e * Math.log(a_c / a_i));
  return diff / (C * (Y * dS * Math.sqrt(Math.PI)) ** m * e);
}

interface Quadrature {
  value: number;
  ok: boolean;
  converged: boolean;
}

/** Adaptive Simpson in u = ln(a): N = integral a / (C (Y dS)^m (pi a)^(m/2)) du. */
function integrateParis(
  C: number,
  m: number,
  Y: (a: number) => number,
  dS: number,
  a_i: number,
  a_c: number,
): Quadrature {
  let ok = true;
  const f = (u: number): number => {
    const a = Math.exp(u);
    const y = Y(a);
    if (!(Number.isFinite(y) && y > 0)) {
      ok = false;
      return 0;
    }
    return a / (C * (y * dS * Math.sqrt(Math.PI * a)) ** m);
  };
  const u0 = Math.log(a_i);
  const u1 = Math.log(a_c);
  const state = { converged: true };
  const fa = f(u0);
  const fb = f(u1);
  const fm = f((u0 + u1) / 2);
  const whole = ((u1 - u0) / 6) * (fa + 4 * fm + fb);
  const value = simpson(f, u0, u1, fa, fm, fb, whole, Math.abs(whole) * 1e-11, 0, state);
  return { value, ok, converged: state.converged };
}

function simpson(
  f: (u: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tol: number,
  depth: number,
  state: { converged: boolean },
): number {
  const m = (a + b) / 2;
  const lm = (a + m) / 2;
  const rm = (m + b) / 2;
  const flm = f(lm);
  const frm = f(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth >= 8 && Math.abs(delta) <= 15 * tol) return left + right + delta / 15;
  if (depth >= 40) {
    state.converged = false;
    return left + right + delta / 15;
  }
  return (
    simpson(f, a, m, fa, flm, fm, left, tol / 2, depth + 1, state) +
    simpson(f, m, b, fm, frm, fb, right, tol / 2, depth + 1, state)
  );
}

/**
 * Critical crack size where Y(a) sigma_max sqrt(pi a) = K_IC (K_IC in Pa*m^0.5, sigma_max in Pa).
 * Constant Y: a_c = (K_IC / (Y sigma_max))^2 / pi. Y depending on a: bisection on ln(a)
 * (Y grows with a for the built-in geometries, so the root is unique).
 */
export function criticalCrackSize(
  K_IC: number,
  Y: number | ((a: number) => number) | GeometryFactor,
  sigma_max: number,
): Computed {
  const formula = 'a_c: Y(a_c) * sigma_max * sqrt(pi * a_c) = K_IC';
  const source =
    'G.R. Irwin, Analysis of stresses and strains near the end of a crack, J. Appl. Mech. 24 (1957) 361-364 (K = Y sigma sqrt(pi a))';
  const terms: Term[] = [
    { name: 'K_IC', value: K_IC / MPA, unit: 'MPa*m^0.5' },
    { name: 'sigma_max', value: sigma_max / MPA, unit: 'MPa' },
  ];
  const err = (code: string, message: string) =>
    computed(0, formula, source, terms, [{ code, severity: 'error', message }]);
  if (!(Number.isFinite(K_IC) && K_IC > 0))
    return err('input-invalid', 'K_IC must be a positive fracture toughness.');
  if (!Number.isFinite(sigma_max)) return err('input-invalid', 'sigma_max must be a finite stress.');
  if (sigma_max <= 0) {
    return infinite(formula, source, terms, [
      {
        code: 'no-tension',
        severity: 'information',
        message: 'With no tensile peak stress the crack does not open: no critical size.',
      },
    ]);
  }
  if (typeof Y === 'number') {
    if (!(Number.isFinite(Y) && Y > 0)) return err('input-invalid', 'Y must be a positive number.');
    terms.push({ name: 'Y', value: Y, unit: '' });
    const a_c = (K_IC / (Y * sigma_max)) ** 2 / Math.PI;
    return computed(a_c, 'a_c = (K_IC / (Y * sigma_max))^2 / pi', source, terms);
  }
  const geometry = isGeometry(Y) ? Y : undefined;
  const Yf: (a: number) => number = geometry ? (a: number) => geometry.Y(a) : (Y as (a: number) => number);
  const aMax = geometry ? geometry.aMax : Number.POSITIVE_INFINITY;
  const K = (a: number): number => {
    const y = Yf(a);
    return Number.isFinite(y) && y > 0 ? y * sigma_max * Math.sqrt(Math.PI * a) : Number.POSITIVE_INFINITY;
  };
  if (geometry) terms.push({ name: 'W', value: geometry.W / MM, unit: 'mm' });
  // Bracket: lo with K < K_IC, hi with K >= K_IC.
  let lo = 1e-12;
  if (!(K(lo) < K_IC))
    return err('geometry-domain', 'The stress intensity exceeds K_IC even for a vanishing crack.');
  const notes: MethodNote[] = [];
  let hi: number;
  if (Number.isFinite(aMax)) {
    const top = aMax * (1 - 1e-12);
    if (K(top) < K_IC) {
      notes.push({
        code: 'geometry-limit',
        severity: 'warning',
        message: `K stays below K_IC up to the geometry factor's limit (${(aMax / MM).toPrecision(4)} mm): a_c is taken as that limit; check net-section yielding.`,
      });
      terms.push({ name: 'Y(a_c)', value: Yf(top), unit: '' });
      return computed(top, formula, source, terms, notes);
    }
    hi = top;
  } else {
    hi = 1e-6;
    while (K(hi) < K_IC && hi < 1e6) hi *= 2;
    if (K(hi) < K_IC) return err('geometry-domain', 'No crack size below 1e6 m reaches K_IC.');
  }
  for (let i = 0; i < 200 && hi / lo > 1 + 1e-14; i++) {
    const mid = Math.sqrt(lo * hi);
    if (K(mid) < K_IC) lo = mid;
    else hi = mid;
  }
  const a_c = Math.sqrt(lo * hi);
  terms.push({ name: 'Y(a_c)', value: Yf(a_c), unit: '' });
  if (geometry && a_c > geometry.fitMax) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: "a_c lies beyond the geometry factor's stated accuracy range.",
    });
  }
  return computed(a_c, formula, source, terms, notes);
}

/** Inspection interval N_insp = N_cg / factor (contract default factor 2). */
export function inspectionInterval(N_cg: number | Computed, factor = 2): Computed {
  const formula = 'N_insp = N_cg / inspection_factor';
  const source =
    'damage-tolerance practice: inspect at a fraction of the crack-growth life (common practice, no source)';
  const isInf = typeof N_cg !== 'number' && N_cg.infinite === true;
  const n = typeof N_cg === 'number' ? N_cg : N_cg.value;
  const terms: Term[] = [{ name: 'inspection_factor', value: factor, unit: '' }];
  if (!(Number.isFinite(factor) && factor > 0)) {
    return computed(0, formula, source, terms, [
      {
        code: 'input-invalid',
        severity: 'error',
        message: 'The inspection factor must be a positive number.',
      },
    ]);
  }
  const notes: MethodNote[] = [];
  if (factor < 1) {
    notes.push({
      code: 'inspection-factor',
      severity: 'warning',
      message: 'An inspection factor below 1 puts the inspection after the predicted failure.',
    });
  }
  if (isInf) return infinite(formula, source, terms, notes);
  if (!(Number.isFinite(n) && n >= 0)) {
    return computed(0, formula, source, terms, [
      {
        code: 'input-invalid',
        severity: 'error',
        message: 'N_cg must be a finite, non-negative cycle count.',
      },
    ]);
  }
  terms.unshift({ name: 'N_cg', value: n, unit: '' });
  return computed(n / factor, formula, source, terms, notes);
}

/**
 * Converts a Paris coefficient given for da/dN in in/cycle and delta_K in ksi*in^0.5 to the
 * metre form (m/cycle, MPa*m^0.5): C_m = C_in * 0.0254 / (1.0988 ...)^m (exact unit factors).
 */
export function parisConstantFromInch(C_inch: number, m: number): Computed {
  const value = (C_inch * INCH) / KSI_SQRT_IN_IN_MPA_SQRT_M ** m;
  const terms: Term[] = [
    { name: 'C_inch', value: C_inch, unit: '(in/cycle)/(ksi*in^0.5)^m' },
    { name: 'm_paris', value: m, unit: '' },
    { name: 'ksi*in^0.5', value: KSI_SQRT_IN_IN_MPA_SQRT_M, unit: 'MPa*m^0.5' },
  ];
  if (!(Number.isFinite(value) && Number.isFinite(C_inch) && Number.isFinite(m))) {
    return computed(
      0,
      'C_paris = C_inch * 0.0254 / (ksi*in^0.5 in MPa*m^0.5)^m',
      'exact unit conversion',
      terms,
      [{ code: 'input-invalid', severity: 'error', message: 'C_paris and m_paris must be finite numbers.' }],
    );
  }
  return computed(
    value,
    'C_paris = C_inch * 0.0254 / (ksi*in^0.5 in MPa*m^0.5)^m',
    'exact unit conversion (1 in = 0.0254 m, 1 ksi = 6.894757 MPa)',
    terms,
  );
}
