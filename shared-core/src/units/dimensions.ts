/**
 * Physical dimensions the block language knows, as exponent vectors over mathjs's base
 * dimensions [mass, length, time, current, temperature, luminous intensity, amount, angle, bit].
 */
export type DimKey =
  | 'one'
  | 'stress'
  | 'length'
  | 'force'
  | 'moment'
  | 'temperature'
  | 'toughness'
  | 'paris'
  | 'other';

export type DimVector = readonly number[];

const VECTORS: Record<Exclude<DimKey, 'other' | 'paris'>, DimVector> = {
  one: [0, 0, 0, 0, 0, 0, 0, 0, 0],
  stress: [1, -1, -2, 0, 0, 0, 0, 0, 0],
  length: [0, 1, 0, 0, 0, 0, 0, 0, 0],
  force: [1, 1, -2, 0, 0, 0, 0, 0, 0],
  moment: [1, 2, -2, 0, 0, 0, 0, 0, 0],
  temperature: [0, 0, 0, 0, 1, 0, 0, 0, 0],
  toughness: [1, -0.5, -2, 0, 0, 0, 0, 0, 0],
};

export const DIM_LABEL: Record<DimKey, string> = {
  one: 'a pure number',
  stress: 'a stress (e.g. MPa, ksi)',
  length: 'a length (e.g. mm, in)',
  force: 'a force (e.g. N, kN, lbf)',
  moment: 'a moment or torque (e.g. N*m, lbf*in)',
  temperature: 'a temperature (e.g. degC, degF)',
  toughness: 'a stress intensity (e.g. MPa*m^0.5, ksi*in^0.5)',
  paris: 'a Paris constant (a pure number in the stated paris-units)',
  other: 'a quantity',
};

export function vectorOf(key: DimKey): DimVector | undefined {
  return key === 'other' || key === 'paris' ? undefined : VECTORS[key];
}

export function sameVector(a: DimVector, b: DimVector): boolean {
  for (let i = 0; i < 9; i++) if (Math.abs((a[i] ?? 0) - (b[i] ?? 0)) > 1e-12) return false;
  return true;
}

export function classify(v: DimVector): DimKey {
  for (const key of Object.keys(VECTORS) as Array<keyof typeof VECTORS>) {
    if (sameVector(v, VECTORS[key])) return key;
  }
  return 'other';
}

export function isDimensionless(v: DimVector): boolean {
  return v.every((x) => Math.abs(x) < 1e-12);
}

/** Base-unit text of a vector, e.g. `kg m^-1 s^-2`, used to rebuild a mathjs unit from an SI value. */
export function baseUnitText(v: DimVector): string {
  const names = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'bits'];
  const parts: string[] = [];
  v.forEach((e, i) => {
    if (Math.abs(e) < 1e-12) return;
    parts.push(e === 1 ? names[i] : `${names[i]}^${e}`);
  });
  return parts.join(' ');
}
