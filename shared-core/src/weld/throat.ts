/**
 * Stresses on the throat of load-carrying fillet welds, for root failure checked against the
 * weld-metal classes. The force per length of weld is carried by n throats of size a (throat
 * thickness, the height of the inscribed triangle): the stress on the throat section is
 * Delta F' / (n a); across the weld it is the resultant of Delta sigma_perp and Delta tau_perp
 * on the throat plane, along the weld it is Delta tau_par.
 */
import { type Computed, computed, MM } from '../computed';
import type { WeldMaterial, WeldStandard } from './snCurve';
import { THROAT_SOURCE } from './sources';
import { inputError, isFiniteNumber, isPositive, mpaTerm, numTerm } from './weldNotes';

export interface ThroatInput {
  /** Range of the force per length of weld across the weld (N/m). */
  deltaFPerp?: number;
  /** Range of the force per length along the weld (N/m). */
  deltaFPar?: number;
  /** Throat thickness a (m). */
  a: number;
  /** Number of throats sharing the force (2 for a double fillet weld). */
  welds: number;
}

function throatErrors(input: ThroatInput): string[] {
  const e: string[] = [];
  if (!isPositive(input.a) || input.a < 0.5e-3)
    e.push('The throat thickness a must be a length of at least 0.5 mm.');
  else if (input.a > 0.2) e.push('A throat of more than 200 mm is not a fillet weld: check the unit of a.');
  if (!(Number.isInteger(input.welds) && input.welds >= 1))
    e.push('The number of throats must be a whole number, 1 or more.');
  return e;
}

/** Normal range on the throat from the force per length across the weld, Pa. */
export function throatNormalRange(input: ThroatInput): Computed {
  const formula = "Delta sigma_w = Delta F'_perp / (n a)";
  const errors = throatErrors(input);
  const F = input.deltaFPerp;
  if (!(isFiniteNumber(F) && F >= 0))
    errors.push("The force range per length Delta F'_perp must be a finite, non-negative force per length.");
  if (errors.length > 0) return computed(0, formula, THROAT_SOURCE, undefined, errors.map(inputError));
  const v = (F as number) / (input.welds * input.a);
  return computed(v, formula, THROAT_SOURCE, [
    numTerm("Delta F'_perp", (F as number) / 1e3, 'N/mm'),
    numTerm('n', input.welds),
    numTerm('a', input.a / MM, 'mm'),
    mpaTerm('Delta sigma_w', v),
  ]);
}

/** Shear range along the throat from the force per length along the weld, Pa. */
export function throatShearRange(input: ThroatInput): Computed {
  const formula = "Delta tau_w = Delta F'_par / (n a)";
  const errors = throatErrors(input);
  const F = input.deltaFPar;
  if (!(isFiniteNumber(F) && F >= 0))
    errors.push("The force range per length Delta F'_par must be a finite, non-negative force per length.");
  if (errors.length > 0) return computed(0, formula, THROAT_SOURCE, undefined, errors.map(inputError));
  const v = (F as number) / (input.welds * input.a);
  return computed(v, formula, THROAT_SOURCE, [
    numTerm("Delta F'_par", (F as number) / 1e3, 'N/mm'),
    numTerm('n', input.welds),
    numTerm('a', input.a / MM, 'mm'),
    mpaTerm('Delta tau_w', v),
  ]);
}

/** The throat's normal range from its two components on the throat plane, Pa. */
export function throatResultant(deltaSigmaPerp: number, deltaTauPerp: number): Computed {
  const formula = 'Delta sigma_w = sqrt(Delta sigma_perp^2 + Delta tau_perp^2)';
  if (!isFiniteNumber(deltaSigmaPerp) || !isFiniteNumber(deltaTauPerp))
    return computed(0, formula, THROAT_SOURCE, undefined, [
      inputError('Both throat stress components must be finite stresses.'),
    ]);
  return computed(Math.hypot(deltaSigmaPerp, deltaTauPerp), formula, THROAT_SOURCE, [
    mpaTerm('Delta sigma_perp', deltaSigmaPerp),
    mpaTerm('Delta tau_perp', deltaTauPerp),
  ]);
}

/** Weld-metal class for root failure (normal range on the throat) or shear along the throat, Pa, with its slope. */
export function throatClass(
  standard: WeldStandard,
  stress: 'normal' | 'shear',
  material: WeldMaterial = 'steel',
): Computed & { m1: number; asterisk?: boolean } {
  const MPA = 1e6;
  if (standard === 'EN 1993-1-9') {
    if (material !== 'steel')
      return {
        ...computed(0, 'Delta sigma_C', THROAT_SOURCE, undefined, [
          inputError('EN 1993-1-9 covers steel only.'),
        ]),
        m1: 3,
      };
    return stress === 'normal'
      ? {
          ...computed(
            36 * MPA,
            'Delta sigma_C = 36* (root failure, Delta sigma_w on the throat), m = 3',
            THROAT_SOURCE,
            undefined,
            [
              {
                code: 'from-memory',
                severity: 'information',
                message:
                  'EN 1993-1-9 Table 8.5 details 3 and 8 rest on a recalled copy: check the detail against the table.',
              },
            ],
          ),
          m1: 3,
          asterisk: true,
        }
      : {
          ...computed(
            80 * MPA,
            'Delta tau_C = 80 (shear flow on the throat, Delta tau_w), m = 5',
            THROAT_SOURCE,
            undefined,
            [
              {
                code: 'from-memory',
                severity: 'information',
                message:
                  'EN 1993-1-9 Table 8.5 details 3 and 8 rest on a recalled copy: check the detail against the table.',
              },
            ],
          ),
          m1: 5,
        };
  }
  const v = stress === 'normal' ? (material === 'steel' ? 36 : 12) : material === 'steel' ? 80 : 28;
  return {
    ...computed(
      v * MPA,
      stress === 'normal'
        ? `FAT = ${v} (root failure, Delta sigma_w on the throat), m = 3`
        : `FAT = ${v} (shear on the throat), m = 5`,
      THROAT_SOURCE,
      undefined,
      [
        {
          code: 'from-memory',
          severity: 'information',
          message:
            'The IIW weld-metal classes rest on a recalled copy of the detail table: check the detail against the table in use.',
        },
      ],
    ),
    m1: stress === 'normal' ? 3 : 5,
  };
}
