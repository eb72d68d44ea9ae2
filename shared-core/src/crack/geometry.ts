import { type Computed, computed, type MethodNote, MM } from '../computed';

/**
 * Geometry factors Y (K = Y * sigma * sqrt(pi * a)) for through cracks in finite-width
 * plates under remote tension, as functions of the crack size a (m).
 */
export interface GeometryFactor {
  /** Stable key, e.g. `centre-crack`. */
  key: string;
  name: string;
  formula: string;
  source: string;
  /** Plate width W (m). */
  W: number;
  /** Largest crack size the expression can take (exclusive where Y grows without bound), m. */
  aMax: number;
  /** Largest crack size of the published fit's stated accuracy, m (the same as aMax when exact). */
  fitMax: number;
  /** Y at crack size a (m); Infinity at or beyond aMax, never NaN for a >= 0. */
  Y(a: number): number;
}

export const TADA_HANDBOOK =
  'H. Tada, P.C. Paris, G.R. Irwin, The Stress Analysis of Cracks Handbook, 3rd ed., ASME Press 2000';

/**
 * Centre crack of total length 2a in a plate of width W under remote tension.
 * - `tada` (default): Y = (1 - 0.025 l^2 + 0.06 l^4) * sqrt(sec(pi l / 2)), l = 2a/W;
 *   Tada's refinement of the secant formula, stated to 0.1 % for any a/W (Tada, Paris,
 *   Irwin handbook, page 2.1, from memory).
 * - `feddersen`: Y = sqrt(sec(pi a / W)) (C.E. Feddersen, discussion in ASTM STP 410, 1967;
 *   from memory), within about 0.3 % for 2a/W <= 0.7.
 */
export function centreCrackFiniteWidth(W: number, variant: 'tada' | 'feddersen' = 'tada'): GeometryFactor {
  const half = W / 2;
  const Y =
    variant === 'tada'
      ? (a: number) => {
          if (!(a < half)) return Number.POSITIVE_INFINITY;
          const l = (2 * Math.max(a, 0)) / W;
          const l2 = l * l;
          return (1 - 0.025 * l2 + 0.06 * l2 * l2) * Math.sqrt(1 / Math.cos((Math.PI * l) / 2));
        }
      : (a: number) => {
          if (!(a < half)) return Number.POSITIVE_INFINITY;
          return Math.sqrt(1 / Math.cos((Math.PI * Math.max(a, 0)) / W));
        };
  return {
    key: 'centre-crack',
    name: 'Centre crack (length 2a) in a finite-width plate, remote tension',
    formula:
      variant === 'tada'
        ? 'Y = (1 - 0.025 (2a/W)^2 + 0.06 (2a/W)^4) * sqrt(sec(pi a / W))'
        : 'Y = sqrt(sec(pi a / W))',
    source:
      variant === 'tada'
        ? `${TADA_HANDBOOK}, p. 2.1 (from memory)`
        : 'C.E. Feddersen, discussion, ASTM STP 410 (1967) (from memory)',
    W,
    aMax: half,
    fitMax: variant === 'tada' ? half : 0.35 * W,
    Y,
  };
}

/**
 * Single edge crack of depth a in a plate of width W under remote tension (free to bend):
 * Y = 1.12 - 0.231 (a/W) + 10.55 (a/W)^2 - 21.72 (a/W)^3 + 30.39 (a/W)^4, for a/W <= 0.6
 * (Brown and Srawley's fit, ASTM STP 410, 1966, quoted to 0.5 % in the Tada, Paris, Irwin
 * handbook; reference, page and accuracy from memory; the polynomial itself checked against
 * cricelli.com/FFAT/8b.php, "edge crack in a finite plate"). Beyond a/W = 0.6 the fit is not valid: the factor stops there (aMax).
 */
export function singleEdgeCrackFiniteWidth(W: number): GeometryFactor {
  const limit = 0.6 * W;
  return {
    key: 'edge-crack',
    name: 'Single edge crack (depth a) in a finite-width plate, remote tension',
    formula: 'Y = 1.12 - 0.231 (a/W) + 10.55 (a/W)^2 - 21.72 (a/W)^3 + 30.39 (a/W)^4',
    source: `W.F. Brown, J.E. Srawley, ASTM STP 410 (1966), as quoted in ${TADA_HANDBOOK} (reference from memory)`,
    W,
    aMax: limit,
    fitMax: limit,
    Y(a: number): number {
      if (!(a <= limit)) return Number.POSITIVE_INFINITY;
      const s = Math.max(a, 0) / W;
      return 1.12 + s * (-0.231 + s * (10.55 + s * (-21.72 + s * 30.39)));
    },
  };
}

/** A constant geometry factor dressed as a `GeometryFactor` (no size limit). */
export function constantGeometry(Y: number): GeometryFactor {
  return {
    key: 'constant',
    name: 'Constant geometry factor',
    formula: `Y = ${Y}`,
    source: 'stated by the user',
    W: Number.POSITIVE_INFINITY,
    aMax: Number.POSITIVE_INFINITY,
    fitMax: Number.POSITIVE_INFINITY,
    Y: () => Y,
  };
}

/** Y at one crack size, as a `Computed` with fit-range and domain notes. */
export function geometryFactorAt(g: GeometryFactor, a: number): Computed {
  const terms = [
    { name: 'a', value: a / MM, unit: 'mm' },
    { name: 'W', value: g.W / MM, unit: 'mm' },
  ];
  const notes: MethodNote[] = [];
  if (!(Number.isFinite(g.W) ? g.W > 0 : true)) {
    notes.push({ code: 'input-invalid', severity: 'error', message: 'The plate width must be positive.' });
    return computed(0, g.formula, g.source, terms, notes);
  }
  if (!(Number.isFinite(a) && a >= 0)) {
    notes.push({
      code: 'input-invalid',
      severity: 'error',
      message: 'The crack size must be a finite, non-negative length.',
    });
    return computed(0, g.formula, g.source, terms, notes);
  }
  const y = g.Y(a);
  if (!Number.isFinite(y)) {
    notes.push({
      code: 'geometry-limit',
      severity: 'error',
      message: `The crack size is at or beyond the expression's limit (a = ${(g.aMax / MM).toPrecision(4)} mm).`,
    });
    return computed(0, g.formula, g.source, terms, notes);
  }
  if (a > g.fitMax) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `The crack size is beyond the stated accuracy range of the expression (a <= ${(g.fitMax / MM).toPrecision(4)} mm).`,
    });
  }
  return computed(y, g.formula, g.source, terms, notes);
}
