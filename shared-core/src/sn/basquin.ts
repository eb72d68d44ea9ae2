/**
 * The stress-life (Basquin) line `S_f = a N^b` for fully reversed equivalent stresses:
 * through `f Sut` at N1 = 10^3 and `Se` at N2 = 10^6 (Shigley), or from the Basquin constants
 * `sigma_ar = sigma_f' (2N)^b` (Dowling). With a knee (an endurance limit) the strength stays at
 * S2 beyond N2 and stresses below it give an infinite life; without one (aluminium, titanium ...)
 * the line is extrapolated beyond N2 with a note.
 */
import { type Computed, computed, infinite, isFiniteNumber, type MethodNote, MPA } from '../computed';

export interface SnLine {
  /** Coefficient of S_f = a N^b, Pa. */
  a: number;
  /** Exponent (negative). */
  b: number;
  /** Lower end of the fitted range (cycles), e.g. 1e3. */
  N1: number;
  /** Knee or upper end of the fitted range (cycles), e.g. 1e6. */
  N2: number;
  /** Strength at N1, Pa. */
  S1: number;
  /** Strength at N2 (the endurance limit when `hasKnee`), Pa. */
  S2: number;
  /** True when S2 is an endurance limit (flat beyond N2). */
  hasKnee: boolean;
}

export const SN_SHIGLEY_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-7, Eqs. (6-13), (6-14): a = (f Sut)^2/Se, b = -(1/3) log10(f Sut/Se), S_f = a N^b (general N1, N2: the line through (N1, f Sut) and (N2, Se))";
export const SN_LIFE_SOURCE =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-7, Eq. (6-15): N = (sigma_ar/a)^(1/b)";
export const SN_BASQUIN_SOURCE =
  'Dowling, Mechanical Behavior of Materials, 4th ed., Sec. 9.6, Eq. 9.22: sigma_ar = sigma_f_prime (2 N_f)^b (Basquin)';

function validLine(line: SnLine): string | null {
  if (!line || typeof line !== 'object') return 'No S-N line given.';
  if (!isFiniteNumber(line.a) || line.a <= 0) return 'The S-N line coefficient a must be a positive stress.';
  if (!isFiniteNumber(line.b) || line.b >= 0) return 'The S-N line exponent b must be negative.';
  if (!isFiniteNumber(line.N1) || !isFiniteNumber(line.N2) || line.N1 <= 0 || line.N2 <= line.N1)
    return 'The S-N line range needs 0 < N1 < N2.';
  return null;
}

/** The S-N line through `(N1, f Sut)` and `(N2, Se)`; `value` is the coefficient `a` in Pa. */
export function snLineThrough(
  fSut: number,
  Se: number,
  N1 = 1e3,
  N2 = 1e6,
  opts: { hasKnee?: boolean } = {},
): Computed & { line: SnLine } {
  const hasKnee = opts.hasKnee ?? true;
  const formula =
    'b = -log10(f Sut / Se) / log10(N2 / N1), a = f Sut / N1^b  (N1 = 1e3, N2 = 1e6: a = (f Sut)^2 / Se, b = -(1/3) log10(f Sut / Se))';
  const errors: string[] = [];
  if (!isFiniteNumber(fSut) || fSut <= 0) errors.push('f * Sut must be a positive stress.');
  if (!isFiniteNumber(Se) || Se <= 0) errors.push('Se must be a positive stress.');
  if (!isFiniteNumber(N1) || !isFiniteNumber(N2) || N1 <= 0 || N2 <= N1)
    errors.push('The lives need 0 < N1 < N2.');
  if (errors.length === 0 && fSut <= Se)
    errors.push('f * Sut must exceed Se for a falling S-N line (check f, Sut and the Marin factors).');
  if (errors.length > 0) {
    const n1 = isFiniteNumber(N1) && N1 > 0 ? N1 : 1e3;
    const n2 = isFiniteNumber(N2) && N2 > n1 ? N2 : n1 * 1e3;
    const line: SnLine = { a: 0, b: 0, N1: n1, N2: n2, S1: 0, S2: 0, hasKnee };
    return {
      ...computed(
        0,
        formula,
        SN_SHIGLEY_SOURCE,
        undefined,
        errors.map((message) => ({ code: 'input', message, severity: 'error' as const })),
      ),
      line,
    };
  }
  const b = -Math.log10(fSut / Se) / Math.log10(N2 / N1);
  const a = fSut / N1 ** b;
  const line: SnLine = { a, b, N1, N2, S1: fSut, S2: Se, hasKnee };
  return {
    ...computed(a, formula, SN_SHIGLEY_SOURCE, [
      { name: 'f Sut', value: fSut / MPA, unit: 'MPa' },
      { name: 'Se', value: Se / MPA, unit: 'MPa' },
      { name: 'N1', value: N1, unit: '' },
      { name: 'N2', value: N2, unit: '' },
      { name: 'a', value: a / MPA, unit: 'MPa' },
      { name: 'b', value: b, unit: '' },
    ]),
    line,
  };
}

/**
 * The line `sigma_ar = sigma_f' (2N)^b` as `S_f = a N^b` with `a = sigma_f' 2^b`, fitted range
 * 1e3 .. 1e6 cycles and no knee. Invalid constants give a line the other methods reject with an error.
 */
export function snLineFromBasquin(sigma_f_prime: number, b_basquin: number): SnLine {
  const N1 = 1e3;
  const N2 = 1e6;
  if (!isFiniteNumber(sigma_f_prime) || !isFiniteNumber(b_basquin) || sigma_f_prime <= 0 || b_basquin >= 0) {
    return { a: 0, b: 0, N1, N2, S1: 0, S2: 0, hasKnee: false };
  }
  const a = sigma_f_prime * 2 ** b_basquin;
  return { a, b: b_basquin, N1, N2, S1: a * N1 ** b_basquin, S2: a * N2 ** b_basquin, hasKnee: false };
}

/** Fully reversed fatigue strength at a life of N cycles, Pa. */
export function strengthAtLife(line: SnLine, N: number): Computed {
  const formula = 'S_f = a * N^b';
  const bad = validLine(line);
  if (bad)
    return computed(0, formula, SN_SHIGLEY_SOURCE, undefined, [
      { code: 'input', message: bad, severity: 'error' },
    ]);
  if (!isFiniteNumber(N) || N <= 0)
    return computed(0, formula, SN_SHIGLEY_SOURCE, undefined, [
      { code: 'input', message: 'The life N must be a positive number of cycles.', severity: 'error' },
    ]);
  const terms = [
    { name: 'a', value: line.a / MPA, unit: 'MPa' },
    { name: 'b', value: line.b, unit: '' },
    { name: 'N', value: N, unit: '' },
  ];
  const notes: MethodNote[] = [];
  if (N > line.N2 && line.hasKnee) {
    notes.push({
      code: 'life-range',
      message: `N = ${N.toExponential(2)} is beyond the knee at ${line.N2.toExponential(0)} cycles: the endurance limit is the strength.`,
      severity: 'information',
    });
    return computed(
      line.S2,
      'S_f = Se (N beyond the knee)',
      SN_SHIGLEY_SOURCE,
      [...terms, { name: 'S_f', value: line.S2 / MPA, unit: 'MPa' }],
      notes,
    );
  }
  if (N > line.N2) {
    notes.push({
      code: 'life-range',
      message: `N = ${N.toExponential(2)} is beyond ${line.N2.toExponential(0)} cycles: the line is extrapolated (no endurance limit).`,
      severity: 'warning',
    });
  } else if (N < line.N1) {
    notes.push({
      code: 'life-range',
      message: `N = ${N.toExponential(2)} is below ${line.N1.toExponential(0)} cycles: low-cycle regime, the stress-life line is an extrapolation (use a strain-life method).`,
      severity: 'warning',
    });
  }
  const S = line.a * N ** line.b;
  return computed(
    S,
    formula,
    SN_SHIGLEY_SOURCE,
    [...terms, { name: 'S_f', value: S / MPA, unit: 'MPa' }],
    notes,
  );
}

/** Cycles to failure at a fully reversed equivalent stress; `infinite` below the knee. */
export function lifeAtStress(line: SnLine, sigma_ar: number): Computed {
  const formula = 'N = (sigma_ar / a)^(1/b)';
  const bad = validLine(line);
  if (bad)
    return computed(0, formula, SN_LIFE_SOURCE, undefined, [
      { code: 'input', message: bad, severity: 'error' },
    ]);
  if (!isFiniteNumber(sigma_ar))
    return computed(0, formula, SN_LIFE_SOURCE, undefined, [
      { code: 'input', message: 'sigma_ar is not a finite number.', severity: 'error' },
    ]);
  const notes: MethodNote[] = [];
  if (sigma_ar < 0)
    notes.push({
      code: 'input',
      message: 'A fully reversed equivalent stress is a magnitude; its absolute value is used.',
      severity: 'error',
    });
  const s = Math.abs(sigma_ar);
  const terms = [
    { name: 'sigma_ar', value: s / MPA, unit: 'MPa' },
    { name: 'a', value: line.a / MPA, unit: 'MPa' },
    { name: 'b', value: line.b, unit: '' },
  ];
  if (s === 0)
    return infinite(formula, SN_LIFE_SOURCE, terms, [
      ...notes,
      { code: 'infinite', message: 'No alternating stress: no fatigue damage.', severity: 'information' },
    ]);
  if (line.hasKnee && s < line.S2)
    return infinite(formula, SN_LIFE_SOURCE, terms, [
      ...notes,
      {
        code: 'infinite',
        message: `sigma_ar = ${(s / MPA).toPrecision(4)} MPa is below the endurance limit ${(line.S2 / MPA).toPrecision(4)} MPa: infinite life.`,
        severity: 'information',
      },
    ]);
  const N = (s / line.a) ** (1 / line.b);
  if (!isFiniteNumber(N) || N > 1e300)
    return infinite(formula, SN_LIFE_SOURCE, terms, [
      ...notes,
      {
        code: 'infinite',
        message: 'The extrapolated life overflows: treated as infinite.',
        severity: 'warning',
      },
    ]);
  if (!line.hasKnee && s < line.S2) {
    notes.push({
      code: 'life-range',
      message: `sigma_ar is below the strength at ${line.N2.toExponential(0)} cycles: the line is extrapolated (no endurance limit).`,
      severity: 'warning',
    });
  } else if (N < line.N1) {
    notes.push({
      code: 'life-range',
      message: `N = ${N.toExponential(2)} is below ${line.N1.toExponential(0)} cycles: low-cycle regime, the stress-life line is an extrapolation (use a strain-life method).`,
      severity: 'warning',
    });
  }
  return computed(N, formula, SN_LIFE_SOURCE, [...terms, { name: 'N', value: N, unit: '' }], notes);
}
