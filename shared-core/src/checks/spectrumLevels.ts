/**
 * The `spectrum:` lines of a damage check read into load levels: each line is one level with
 * any amplitude/mean (or max/min) pair of the reserved load or stress names and its number of
 * cycles `n`, e.g. `spectrum: M_a = 300 N*m, M_m = 100 N*m, n = 2e4`. Expressions are
 * evaluated in the block's scope (earlier names and `other_id.name`); every problem is a
 * diagnostic on the exact item.
 */
import type { CheckContext } from '../context/checkContext';
import { ExpressionError, type Quantity } from '../context/quantity';
import type { SpectrumStatement } from '../context/statements';
import { lineRange, type Range } from '../context/types';
import { type DimKey, sameVector, vectorOf } from '../units/dimensions';

/** The load or stress a spectrum name belongs to. */
export type LevelBase = 'M' | 'T' | 'F' | 'p' | 'sigma' | 'sigma_ax' | 'tau';

type Part = 'a' | 'm' | 'max' | 'min';

interface NameRule {
  base: LevelBase;
  part: Part;
  dim: DimKey;
}

const BASE_DIM: Record<LevelBase, DimKey> = {
  M: 'moment',
  T: 'moment',
  F: 'force',
  p: 'stress',
  sigma: 'stress',
  sigma_ax: 'stress',
  tau: 'stress',
};

/** Without `Object.prototype`: `NAMES[name]` answers for the spectrum's own names only. */
const NAMES: Record<string, NameRule> = Object.create(null);
for (const base of Object.keys(BASE_DIM) as LevelBase[]) {
  const parts: Part[] = base === 'sigma_ax' || base === 'tau' ? ['a', 'm'] : ['a', 'm', 'max', 'min'];
  for (const part of parts) NAMES[`${base}_${part}`] = { base, part, dim: BASE_DIM[base] };
}

/** Names a spectrum level may use, for messages and completion. */
export const SPECTRUM_NAMES: readonly string[] = [...Object.keys(NAMES), 'n'];

/** Signed amplitude and signed mean of one load of a level, SI (`m + a` at the level's `_max` instant, in phase with the other loads). */
export interface LevelLoad {
  a: number;
  m: number;
}

export interface SpectrumLevel {
  stmt: SpectrumStatement;
  /** Cycles of the level. */
  n: number;
  loads: Partial<Record<LevelBase, LevelLoad>>;
  /** The level as written, for tables. */
  text: string;
}

function evaluate(
  ctx: CheckContext,
  item: SpectrumStatement['items'][number],
  line: number,
): Quantity | undefined {
  if (!ctx.evaluate) {
    ctx.diag('error', 'internal', 'spectrum levels cannot be evaluated here (no scope)', item.expr.range);
    return undefined;
  }
  try {
    return ctx.evaluate(item.expr.text);
  } catch (e) {
    const err = e instanceof ExpressionError ? e : new ExpressionError('expression-error', String(e));
    const start = item.expr.range.start.character + (err.offset ?? 0);
    const r: Range =
      err.offset !== undefined
        ? lineRange(line, start, Math.min(start + (err.length ?? 1), item.expr.range.end.character))
        : item.expr.range;
    ctx.diag('error', err.code, `${item.name.text}: ${err.message}`, r);
    return undefined;
  }
}

/** Reads every `spectrum:` line; levels with an error are left out (and diagnosed). */
export function readSpectrumLevels(ctx: CheckContext): SpectrumLevel[] {
  const levels: SpectrumLevel[] = [];
  for (const stmt of ctx.spectrum) {
    const level = readLevel(ctx, stmt);
    if (level) levels.push(level);
  }
  return levels;
}

function readLevel(ctx: CheckContext, stmt: SpectrumStatement): SpectrumLevel | null {
  let ok = true;
  let n: number | undefined;
  const parts = new Map<LevelBase, Partial<Record<Part, { si: number; range: Range }>>>();
  const seen = new Set<string>();
  for (const item of stmt.items) {
    const name = item.name.text;
    if (seen.has(name)) {
      ctx.diag(
        'error',
        'duplicate-name',
        `\`${name}\` is given twice in this spectrum level`,
        item.name.range,
      );
      ok = false;
      continue;
    }
    seen.add(name);
    const rule = NAMES[name];
    if (!rule && name !== 'n') {
      ctx.diag(
        'error',
        'unknown-spectrum-name',
        `\`${name}\` cannot describe a spectrum level: use amplitude/mean (or max/min) pairs of ${Object.keys(
          BASE_DIM,
        )
          .map((b) => `\`${b}\``)
          .join(', ')} and the cycles \`n\``,
        item.name.range,
      );
      ok = false;
      continue;
    }
    const q = evaluate(ctx, item, stmt.line);
    if (!q) {
      ok = false;
      continue;
    }
    const want = vectorOf(rule ? rule.dim : 'one')!;
    if (!sameVector(q.dim, want)) {
      const noUnit = q.dim.every((x) => x === 0);
      ctx.diag(
        'error',
        noUnit ? 'missing-unit' : 'wrong-dimension',
        rule
          ? `\`${name}\` must be ${ctx.dimLabel(rule.dim)}${noUnit ? ': give it a unit' : ''}`
          : '`n` is a number of cycles (a pure number)',
        item.expr.range,
      );
      ok = false;
      continue;
    }
    if (!rule) {
      if (!(q.si > 0)) {
        ctx.diag('error', 'absurd-value', '`n` must be a positive number of cycles', item.expr.range);
        ok = false;
      } else n = q.si;
      continue;
    }
    const entry = parts.get(rule.base) ?? {};
    entry[rule.part] = { si: q.si, range: item.expr.range };
    parts.set(rule.base, entry);
  }
  if (n === undefined && ok) {
    ctx.diag(
      'error',
      'missing-cycles',
      'this spectrum level has no number of cycles: add `n = ...`',
      stmt.whole,
    );
    ok = false;
  }
  const loads: Partial<Record<LevelBase, LevelLoad>> = {};
  for (const [base, p] of parts) {
    const am = p.a !== undefined || p.m !== undefined;
    const mm = p.max !== undefined || p.min !== undefined;
    if (am && mm) {
      ctx.diag(
        'error',
        'load-twice',
        `state \`${base}\` either as \`${base}_a\`/\`${base}_m\` or as \`${base}_max\`/\`${base}_min\`, not both`,
        (p.max ?? p.min)!.range,
      );
      ok = false;
      continue;
    }
    if (am) {
      if (p.a === undefined) {
        ctx.diag(
          'error',
          'missing-load-pair',
          `\`${base}_m\` is given without \`${base}_a\`: give the amplitude too (0 for a steady load)`,
          p.m!.range,
        );
        ok = false;
        continue;
      }
      loads[base] = { a: p.a.si, m: p.m?.si ?? 0 };
      continue;
    }
    const max = p.max?.si;
    let min = p.min?.si;
    if (max === undefined) {
      ctx.diag(
        'error',
        'missing-load-pair',
        `\`${base}_min\` is given without \`${base}_max\`: give both`,
        p.min!.range,
      );
      ok = false;
      continue;
    }
    if (min === undefined) {
      if (base === 'p') min = 0;
      else {
        ctx.diag(
          'error',
          'missing-load-pair',
          `\`${base}_max\` is given without \`${base}_min\`: give both (for a steady load, the same value twice)`,
          p.max!.range,
        );
        ok = false;
        continue;
      }
    }
    if (max < min)
      // Read as written: the `_max` values of the level's loads act together (this load falls
      // while the others rise). Alone it makes no difference.
      ctx.diag(
        'warning',
        'max-below-min',
        `\`${base}_max\` is below \`${base}_min\`: read as written, ${base} is at its smaller value when the level's other loads are at their \`_max\` (opposite phase); swap the two if that is a slip`,
        p.max!.range,
      );
    loads[base] = { a: (max - min) / 2, m: (max + min) / 2 };
  }
  if (ok && Object.keys(loads).length === 0) {
    ctx.diag(
      'error',
      'missing-load',
      'this spectrum level has no load: give e.g. `M_a = 300 N*m, M_m = 100 N*m` with its `n`',
      stmt.whole,
    );
    ok = false;
  }
  if (!ok || n === undefined) return null;
  const text = stmt.items.map((i) => `${i.name.text} = ${i.expr.text}`).join(', ');
  return { stmt, n, loads, text };
}
