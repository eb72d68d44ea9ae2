/**
 * Display of SI values in the note's unit system. Torque shows as N*m or lbf*in, never as
 * energy; stresses in MPa or ksi; lengths in mm or in; temperatures in degC or degF.
 */
import type { DimKey } from './dimensions';

export type UnitSystem = 'SI' | 'US';

interface DisplayUnit {
  unit: string;
  /** SI value of one display unit. */
  scale: number;
  offset?: number;
}

const LBF = 4.4482216152605;
const INCH = 0.0254;

const UNITS: Record<UnitSystem, Partial<Record<DimKey, DisplayUnit>>> = {
  SI: {
    stress: { unit: 'MPa', scale: 1e6 },
    length: { unit: 'mm', scale: 1e-3 },
    force: { unit: 'N', scale: 1 },
    moment: { unit: 'N*m', scale: 1 },
    temperature: { unit: 'degC', scale: 1, offset: 273.15 },
    toughness: { unit: 'MPa*m^0.5', scale: 1e6 },
  },
  US: {
    stress: { unit: 'ksi', scale: 1000 * (LBF / (INCH * INCH)) },
    length: { unit: 'in', scale: INCH },
    force: { unit: 'lbf', scale: LBF },
    moment: { unit: 'lbf*in', scale: LBF * INCH },
    temperature: { unit: 'degF', scale: 5 / 9, offset: 459.67 * (5 / 9) },
    toughness: { unit: 'ksi*in^0.5', scale: 1000 * (LBF / (INCH * INCH)) * Math.sqrt(INCH) },
  },
};

export function displayUnit(dim: DimKey, system: UnitSystem): DisplayUnit | undefined {
  return UNITS[system][dim];
}

/** Value of `si` in the display unit of its dimension. */
export function toDisplayNumber(
  si: number,
  dim: DimKey,
  system: UnitSystem,
): { value: number; unit: string } {
  const u = displayUnit(dim, system);
  if (!u) return { value: si, unit: '' };
  return { value: si / u.scale - (u.offset ?? 0) / u.scale, unit: u.unit };
}

export function formatNumber(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return 'not a number';
  if (x === 0) return '0';
  const ax = Math.abs(x);
  if (ax >= 1e6 || ax < 1e-3) {
    const [m, e] = x.toExponential(digits - 1).split('e');
    return `${trimZeros(m)}e${Number(e)}`;
  }
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(ax)));
  return trimZeros(x.toFixed(decimals));
}

/** `1.2500` -> `1.25`, `3.000` -> `3`, `120` stays (the same as `s.replace(/\.?0+$/, '')` on a decimal). */
function trimZeros(s: string): string {
  if (s.indexOf('.') < 0) return s;
  let end = s.length;
  while (end > 0 && s.charCodeAt(end - 1) === 48) end--;
  if (end > 0 && s.charCodeAt(end - 1) === 46) end--;
  return end === s.length ? s : s.slice(0, end);
}

export function formatValue(si: number, dim: DimKey, system: UnitSystem, digits = 4): string {
  const { value, unit } = toDisplayNumber(si, dim, system);
  const n = formatNumber(value, digits);
  return unit ? `${n} ${unit}` : n;
}

/** Cycle counts read better with grouping: 1.23e6 stays exponential, 12 500 is plain. */
export function formatCycles(n: number): string {
  if (!Number.isFinite(n)) return 'not a number';
  if (n >= 1e5) {
    const [m, e] = n.toExponential(2).split('e');
    return `${trimZeros(m)}e${Number(e)}`;
  }
  return String(Math.round(n));
}
