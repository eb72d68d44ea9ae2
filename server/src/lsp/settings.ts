/**
 * Workspace configuration section `fatigueNotes`: display units, significant digits, the
 * default required safety factor and the lint switches. Whatever the client sends is
 * checked here; anything out of range falls back to the default.
 */
import type { EvaluateOptions, HistoryChunkReader } from '@fatigue-notes/core';

export const SETTINGS_SECTION = 'fatigueNotes';

export interface FatigueSettings {
  /** Display units: 'auto' follows the units each check is written in. */
  units: 'auto' | 'SI' | 'US';
  /** Significant digits of displayed values (2 to 10). */
  significantDigits: number;
  /**
   * When set, a check without `require:` gets a hint and a quick fix that inserts
   * `require: n_f >= X`. Null: no hint.
   */
  defaultRequiredSafetyFactor: number | null;
  /** Diagnostic code to on/off; codes not listed are on. */
  lints: Record<string, boolean>;
}

export const DEFAULT_SETTINGS: FatigueSettings = Object.freeze({
  units: 'auto',
  significantDigits: 4,
  defaultRequiredSafetyFactor: null,
  lints: Object.freeze({}) as Record<string, boolean>,
});

/** Settings from whatever the client sent (null, partial or wrongly typed values are tolerated). */
export function readSettings(raw: unknown): FatigueSettings {
  const o = raw && typeof raw === 'object' ? (raw as Record<string, unknown>) : {};
  const units = o.units === 'SI' || o.units === 'US' || o.units === 'auto' ? o.units : DEFAULT_SETTINGS.units;
  const digits =
    typeof o.significantDigits === 'number' && Number.isFinite(o.significantDigits)
      ? Math.min(10, Math.max(2, Math.round(o.significantDigits)))
      : DEFAULT_SETTINGS.significantDigits;
  const factor =
    typeof o.defaultRequiredSafetyFactor === 'number' &&
    Number.isFinite(o.defaultRequiredSafetyFactor) &&
    o.defaultRequiredSafetyFactor > 0
      ? o.defaultRequiredSafetyFactor
      : null;
  // A table of the client's words: nothing behind it (`__proto__`, `constructor` are plain keys).
  const lints: Record<string, boolean> = Object.create(null);
  if (o.lints && typeof o.lints === 'object')
    for (const [k, v] of Object.entries(o.lints as Record<string, unknown>))
      if (typeof v === 'boolean') lints[k] = v;
  return { units, significantDigits: digits, defaultRequiredSafetyFactor: factor, lints };
}

/** The core's options for one note. */
export function evaluateOptionsOf(
  settings: FatigueSettings,
  histories?: HistoryChunkReader,
): EvaluateOptions {
  const options: EvaluateOptions = {
    unitSystem: settings.units,
    significantDigits: settings.significantDigits,
  };
  if (Object.keys(settings.lints).length > 0) options.lints = settings.lints;
  if (histories) options.histories = histories;
  return options;
}

export function sameSettings(a: FatigueSettings, b: FatigueSettings): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}
