/**
 * Units offered after a number, by the dimension of the name being stated. Every entry is
 * a unit the block language reads (checked by the tests against the expression evaluator);
 * the note's own unit system is listed first.
 */
import type { DimKey } from '../units/dimensions';
import type { UnitSystem } from '../units/format';

export interface UnitChoice {
  unit: string;
  system: UnitSystem;
  meaning: string;
}

const CHOICES: Partial<Record<DimKey, UnitChoice[]>> = {
  stress: [
    { unit: 'MPa', system: 'SI', meaning: 'megapascal (N/mm^2)' },
    { unit: 'GPa', system: 'SI', meaning: 'gigapascal' },
    { unit: 'kPa', system: 'SI', meaning: 'kilopascal' },
    { unit: 'Pa', system: 'SI', meaning: 'pascal' },
    { unit: 'bar', system: 'SI', meaning: 'bar (0.1 MPa)' },
    { unit: 'ksi', system: 'US', meaning: 'kilopound per square inch' },
    { unit: 'psi', system: 'US', meaning: 'pound per square inch' },
  ],
  length: [
    { unit: 'mm', system: 'SI', meaning: 'millimetre' },
    { unit: 'm', system: 'SI', meaning: 'metre' },
    { unit: 'cm', system: 'SI', meaning: 'centimetre' },
    { unit: 'um', system: 'SI', meaning: 'micrometre' },
    { unit: 'in', system: 'US', meaning: 'inch' },
    { unit: 'ft', system: 'US', meaning: 'foot' },
  ],
  force: [
    { unit: 'N', system: 'SI', meaning: 'newton' },
    { unit: 'kN', system: 'SI', meaning: 'kilonewton' },
    { unit: 'lbf', system: 'US', meaning: 'pound-force' },
    { unit: 'kip', system: 'US', meaning: 'kilopound-force' },
  ],
  moment: [
    { unit: 'N*m', system: 'SI', meaning: 'newton metre' },
    { unit: 'kN*m', system: 'SI', meaning: 'kilonewton metre' },
    { unit: 'N*mm', system: 'SI', meaning: 'newton millimetre' },
    { unit: 'lbf*in', system: 'US', meaning: 'pound-force inch' },
    { unit: 'lbf*ft', system: 'US', meaning: 'pound-force foot' },
    { unit: 'kip*in', system: 'US', meaning: 'kilopound-force inch' },
  ],
  temperature: [
    { unit: 'degC', system: 'SI', meaning: 'degree Celsius' },
    { unit: 'K', system: 'SI', meaning: 'kelvin' },
    { unit: 'degF', system: 'US', meaning: 'degree Fahrenheit' },
  ],
  toughness: [
    { unit: 'MPa*m^0.5', system: 'SI', meaning: 'megapascal root metre' },
    { unit: 'ksi*in^0.5', system: 'US', meaning: 'ksi root inch' },
  ],
};

/** Units for a dimension, the given system's first; every unit when the dimension is unknown. */
export function unitChoices(dim: DimKey | undefined, system: UnitSystem = 'SI'): UnitChoice[] {
  const list = dim ? (CHOICES[dim] ?? []) : Object.values(CHOICES).flat();
  return [...list.filter((u) => u.system === system), ...list.filter((u) => u.system !== system)];
}

/** The dimensions that take units. */
export function dimensionsWithUnits(): DimKey[] {
  return Object.keys(CHOICES) as DimKey[];
}
