/**
 * Structural hot-spot stress by surface extrapolation to the weld toe (IIW Sec. 2.2.3), with the
 * hot-spot classes it is compared with, and the effective notch stress classes (1 mm radius).
 *
 * Type a hot spots lie on the plate surface at the toe of a weld across the plate: the reference
 * points scale with the plate thickness t. Type b hot spots lie at a weld end on a plate edge: the
 * points sit at fixed distances. The stresses at the points may equally be ranges, maxima or minima
 * (the extrapolation is linear in them).
 */
import { type Computed, computed, type MethodNote, MM, MPA } from '../computed';
import type { WeldMaterial } from './snCurve';
import { HOT_SPOT_CLASS_SOURCE, HOT_SPOT_SOURCE, NOTCH_SOURCE } from './sources';
import { inputError, isFiniteNumber, isPositive, mpaTerm, numTerm } from './weldNotes';

export type HotSpotScheme = 'a-linear' | 'a-quadratic' | 'a-coarse' | 'b-linear' | 'b-quadratic';

interface SchemeDef {
  /** Published coefficients, in the order of the points. */
  coefficients: number[];
  /** Positions as multiples of t (type a) or in mm (type b). */
  positions: number[];
  relative: boolean;
  formula: string;
}

export const HOT_SPOT_SCHEMES: Record<HotSpotScheme, SchemeDef> = {
  'a-linear': {
    coefficients: [1.67, -0.67],
    positions: [0.4, 1.0],
    relative: true,
    formula: 'sigma_hs = 1.67 sigma(0.4 t) - 0.67 sigma(1.0 t)',
  },
  'a-quadratic': {
    coefficients: [2.52, -2.24, 0.72],
    positions: [0.4, 0.9, 1.4],
    relative: true,
    formula: 'sigma_hs = 2.52 sigma(0.4 t) - 2.24 sigma(0.9 t) + 0.72 sigma(1.4 t)',
  },
  'a-coarse': {
    coefficients: [1.5, -0.5],
    positions: [0.5, 1.5],
    relative: true,
    formula: 'sigma_hs = 1.50 sigma(0.5 t) - 0.50 sigma(1.5 t)',
  },
  'b-linear': {
    coefficients: [1.5, -0.5],
    positions: [5, 15],
    relative: false,
    formula: 'sigma_hs = 1.50 sigma(5 mm) - 0.50 sigma(15 mm)',
  },
  'b-quadratic': {
    coefficients: [3, -3, 1],
    positions: [4, 8, 12],
    relative: false,
    formula: 'sigma_hs = 3 sigma(4 mm) - 3 sigma(8 mm) + sigma(12 mm)',
  },
};

/**
 * Hot-spot stress (Pa) from the surface stresses at the scheme's reference points, in the order of
 * increasing distance from the toe. `t` (plate thickness) is needed for type a to place the points.
 */
export function hotSpotStress(scheme: HotSpotScheme, stresses: number[], t?: number): Computed {
  const def = HOT_SPOT_SCHEMES[scheme];
  if (!def)
    return computed(0, 'sigma_hs', HOT_SPOT_SOURCE, undefined, [
      inputError(`Unknown hot-spot scheme "${scheme}".`),
    ]);
  const errors: MethodNote[] = [];
  if (!Array.isArray(stresses) || stresses.length !== def.coefficients.length)
    errors.push(
      inputError(
        `The ${scheme} scheme needs ${def.coefficients.length} surface stresses, at ${positionsText(def)}.`,
      ),
    );
  else if (!stresses.every((x) => isFiniteNumber(x) && Math.abs(x) <= 1e12))
    errors.push(inputError('Every surface stress must be a finite stress (at most 1e6 MPa).'));
  if (def.relative && t !== undefined && !(isPositive(t) && t >= 1e-4 && t <= 1))
    errors.push(inputError('The plate thickness t must lie between 0.1 mm and 1 m.'));
  if (errors.length > 0) return computed(0, def.formula, HOT_SPOT_SOURCE, undefined, errors);
  const terms = stresses.map((s, i) =>
    mpaTerm(def.relative ? `sigma(${def.positions[i]} t)` : `sigma(${def.positions[i]} mm)`, s),
  );
  if (def.relative && isPositive(t)) {
    terms.push(numTerm('t', t / MM, 'mm'));
    def.positions.forEach((p, i) => {
      terms.push(numTerm(`x${i + 1}`, (p * t) / MM, 'mm'));
    });
  }
  const extrapolated = def.coefficients.reduce((sum, c, i) => sum + c * stresses[i], 0);
  const notes: MethodNote[] = [];
  const nearest = stresses[0];
  if (
    Math.abs(nearest) > 0 &&
    Math.abs(extrapolated) < Math.abs(nearest) * 0.999 &&
    Math.sign(extrapolated) === Math.sign(nearest)
  ) {
    // Never below what was read nearest the toe: the larger of the two is taken (common
    // practice, no source), so that a reversed gradient cannot lower the stress at the detail.
    notes.push({
      code: 'hot-spot-gradient',
      severity: 'warning',
      message:
        "The surface stress grows away from the toe: the extrapolated hot-spot stress is below the stress at the first point, so the first point's stress is taken; check the points, their order and the mesh.",
    });
    return computed(
      nearest,
      `${def.formula}; not below sigma at the first point`,
      HOT_SPOT_SOURCE,
      [...terms, mpaTerm('extrapolated', extrapolated)],
      notes,
    );
  }
  return computed(extrapolated, def.formula, HOT_SPOT_SOURCE, terms, notes);
}

function positionsText(def: SchemeDef): string {
  return def.positions.map((p) => (def.relative ? `${p} t` : `${p} mm`)).join(', ');
}

export type HotSpotJoint = 'non-load-carrying' | 'load-carrying';

/** IIW structural hot-spot class (Pa): FAT 100 / 90 steel, FAT 40 / 36 aluminium. */
export function hotSpotClass(joint: HotSpotJoint, material: WeldMaterial): Computed {
  const table = {
    steel: { 'non-load-carrying': 100, 'load-carrying': 90 },
    aluminium: { 'non-load-carrying': 40, 'load-carrying': 36 },
  };
  const v = table[material]?.[joint];
  if (v === undefined)
    return computed(0, 'FAT_hs', HOT_SPOT_CLASS_SOURCE, undefined, [
      inputError(`No hot-spot class for ${joint} ${material}.`),
    ]);
  return computed(
    v * MPA,
    `FAT_hs = ${v} (${joint} fillet welds or butt joints, ${material})`,
    HOT_SPOT_CLASS_SOURCE,
    undefined,
    [
      {
        code: 'from-memory',
        severity: 'information',
        message:
          'The hot-spot classes rest on a recalled copy of the IIW table: check the joint against the table in use.',
      },
    ],
  );
}

export type NotchCriterion = 'principal' | 'von-mises';

/** Effective notch stress class (Pa) for the 1 mm reference radius. */
export function notchStressClass(material: WeldMaterial, criterion: NotchCriterion): Computed {
  const table = {
    steel: { principal: 225, 'von-mises': 200 },
    aluminium: { principal: 71, 'von-mises': 63 },
  };
  const v = table[material]?.[criterion];
  if (v === undefined)
    return computed(0, 'FAT_notch', NOTCH_SOURCE, undefined, [
      inputError(`No notch-stress class for ${material} with ${criterion}.`),
    ]);
  return computed(
    v * MPA,
    `FAT_notch = ${v} (r_ref = 1 mm, ${criterion === 'principal' ? 'maximum principal stress' : 'von Mises stress'}, ${material})`,
    NOTCH_SOURCE,
    [numTerm('r_ref', 1, 'mm')],
    [
      {
        code: 'notch-radius',
        severity: 'information',
        message:
          'The 1 mm reference radius applies to plates of t >= 5 mm; thinner sheets use the 0.05 mm radius and its own classes.',
      },
      {
        code: 'from-memory',
        severity: 'information',
        message:
          'The notch-stress classes rest on a recalled copy of the IIW guideline: check them against the edition in use.',
      },
    ],
  );
}
