/**
 * Design mode, `solve: NAME for SYMBOL = EXPR`: finds the value of the unstated input NAME
 * for which the check's result SYMBOL equals the target EXPR.
 *
 * The whole block is evaluated again at every trial value, NAME being injected as if the
 * note stated it, so that everything that depends on it follows (the size factor `kb` on
 * `d`, the fits of `Kt` on `d/D` and `r/d`, nominal stresses, later lines such as
 * `r = 0.05 * d`). The search:
 *
 *  1. scans NAME's physical range (log-spaced: lengths 0.1 mm .. 5 m, moments 1e-3 .. 1e8
 *     N*m, forces 1e-2 .. 1e9 N, stresses 0.1 MPa .. 10 GPa, ...), about eight points per
 *     decade, for sign changes of (SYMBOL - target);
 *  2. closes in on each sign change with Brent's method (Brent 1973, ch. 4; Press et al.,
 *     Numerical Recipes, 3rd ed., 9.3);
 *  3. the target is met where |SYMBOL - target| <= SOLVE_TOLERANCE |target|: a step of the
 *     result that straddles the target within it is a root; a larger step across the target
 *     (a method's range boundary: the two ranges of kb in Shigley Eq. 6-20 at 51 mm, the knee
 *     of the S-N line) is a jump, reported with the result on both sides and the value of the
 *     check whose method changes range there;
 *  4. answers the smallest root in the range (the rule for several roots: the smallest
 *     value of the dimension, i.e. the lightest section or the smallest load), with a
 *     warning that lists the others; no root is an error that names the range searched, the
 *     jumps, and the closest value: the best local minima of |SYMBOL - target| on the scan
 *     refined by Brent's minimiser (Brent 1973, ch. 5), the best of all evaluations made.
 *
 * At most `SOLVE_BUDGET` evaluations of the block. The answer is recorded as the value
 * NAME (origin 'computed', formula `solved: SYMBOL(NAME) = target`) of the evaluation at
 * the answer, which provides every other value of the check.
 */

import type { Term } from '../computed';
import type { StatedInput } from '../context/checkContext';
import type { CheckResult, Diagnostic, QuickFix, Range, Severity, Value } from '../context/types';
import { INPUT_NAMES, nearest, RESULT_NAMES } from '../context/vocabulary';
import type { CheckScopeEntry } from '../language/checkScope';
import { ExpressionError, evaluateExpression, rawFromSI, type Scope } from '../language/expressions';
import type { BlockSource } from '../language/markdownBlocks';
import {
  type AssignStatement,
  parseStatements,
  type SolveStatement,
  type Statement,
} from '../language/statements';
import { renamedResult } from '../methods/registry';
import { classify, DIM_LABEL, type DimKey, sameVector, vectorOf } from '../units/dimensions';
import { formatValue } from '../units/format';
import type { Unit } from '../units/mathInstance';
import { brentMinimize, brentRoot } from './brent';

export const SOLVE_SOURCE =
  'bracketed root finding: scan of the physical range, then Brent\'s method (R. P. Brent, "Algorithms for Minimization without Derivatives", Prentice-Hall 1973, ch. 4; Press et al., "Numerical Recipes", 3rd ed., Sec. 9.3)';

/** The source of a closest point when no root is found. */
export const SOLVE_CLOSEST_SOURCE =
  'closest point: Brent\'s minimiser of |SYMBOL - target| around the best points of the scan (R. P. Brent, "Algorithms for Minimization without Derivatives", Prentice-Hall 1973, ch. 5; Press et al., "Numerical Recipes", 3rd ed., Sec. 10.3)';

/** Largest number of evaluations of the block for one solve (scan, Brent and the final one). */
export const SOLVE_BUDGET = 200;

/** Evaluates the block, with NAME injected when given; `trial` evaluations leave the note's state alone. */
export type BlockRunner = (
  inject: ReadonlyMap<string, StatedInput> | undefined,
  trial: boolean,
) => CheckScopeEntry;

export interface SearchRange {
  lo: number;
  hi: number;
  scale: 'log' | 'linear';
}

const BY_DIM: Partial<Record<DimKey, SearchRange>> = {
  length: { lo: 1e-4, hi: 5, scale: 'log' },
  moment: { lo: 1e-3, hi: 1e8, scale: 'log' },
  force: { lo: 1e-2, hi: 1e9, scale: 'log' },
  stress: { lo: 1e5, hi: 1e10, scale: 'log' },
  temperature: { lo: 223.15, hi: 873.15, scale: 'linear' },
  toughness: { lo: 1e5, hi: 1e9, scale: 'log' },
};

const DIMENSIONLESS: Record<string, SearchRange> = {
  N: { lo: 1e2, hi: 1e12, scale: 'log' },
  Kt: { lo: 1, hi: 20, scale: 'log' },
  Kts: { lo: 1, hi: 20, scale: 'log' },
  Kt_ax: { lo: 1, hi: 20, scale: 'log' },
  Kf: { lo: 1, hi: 20, scale: 'log' },
  Kfs: { lo: 1, hi: 20, scale: 'log' },
  Kf_ax: { lo: 1, hi: 20, scale: 'log' },
  q: { lo: 0.01, hi: 1, scale: 'linear' },
  qs: { lo: 0.01, hi: 1, scale: 'linear' },
  ka: { lo: 0.05, hi: 1.5, scale: 'linear' },
  kb: { lo: 0.05, hi: 1.5, scale: 'linear' },
  kc: { lo: 0.05, hi: 1.5, scale: 'linear' },
  kd: { lo: 0.05, hi: 1.5, scale: 'linear' },
  ke: { lo: 0.05, hi: 1.5, scale: 'linear' },
  kmisc: { lo: 0.05, hi: 1.5, scale: 'linear' },
  f: { lo: 0.5, hi: 1, scale: 'linear' },
};

/** The range searched for an input, or undefined when design mode does not solve for it. */
export function searchRange(name: string): SearchRange | undefined {
  const info = INPUT_NAMES[name];
  if (!info) return undefined;
  if (info.dim === 'one') return DIMENSIONLESS[name];
  return BY_DIM[info.dim];
}

/** Trial values of the scan: about eight per decade (log) or 40 steps (linear), ends included. */
export function scanPoints(r: SearchRange): number[] {
  if (r.scale === 'linear') {
    const n = 40;
    return Array.from({ length: n + 1 }, (_, i) => r.lo + ((r.hi - r.lo) * i) / n);
  }
  const decades = Math.log10(r.hi / r.lo);
  const n = Math.min(80, Math.max(24, Math.round(decades * 8)));
  return Array.from({ length: n + 1 }, (_, i) => r.lo * 10 ** ((decades * i) / n));
}

export function solveStatements(block: BlockSource): { solves: SolveStatement[]; statements: Statement[] } {
  const statements = parseStatements(block.lines, /^\s*>/.test(block.lines[0]?.text ?? ''));
  return { solves: statements.filter((s): s is SolveStatement => s.kind === 'solve'), statements };
}

interface Trial {
  x: number;
  /** (SYMBOL - target) / |target|; null when the check gives no SYMBOL there. */
  g: number | null;
  symbolDisplay?: string;
  /** SYMBOL's SI value (undefined when infinite). */
  si?: number;
}

/** A value large enough to carry the sign of an infinite result into the root finder. */
const INFINITE_G = 1e9;

/**
 * The target is met where |SYMBOL - target| <= SOLVE_TOLERANCE * |target| (|target| taken as 1
 * when the target is 0): at most a tenth of the last digit of the 4-digit display. A step of the
 * result across the target smaller than this is a root (e.g. the 2e-6 step of the inch form of
 * Shigley Eq. 6-20 at 2 in); a larger one is a jump, reported with both sides.
 */
export const SOLVE_TOLERANCE = 1e-5;

/** Local minima of |SYMBOL - target| refined when no root is found. */
const MAX_REFINED = 3;
/** Jumps whose cause is looked up (two more evaluations each). */
const MAX_EXPLAINED = 2;
/** Relative step of a value between the two sides of a jump that counts as its own step. */
const JUMP_STEP = 1e-7;

/** A sign change of (SYMBOL - target) that is not closed within the tolerance: its two sides. */
interface Jump {
  lo: Trial;
  hi: Trial;
}

/**
 * Evaluates a block, solving its `solve:` statement when it has one. Without one this is
 * exactly `run(undefined, false)`.
 */
export function solveBlock(
  block: BlockSource,
  previous: ReadonlyMap<string, CheckScopeEntry>,
  run: BlockRunner,
): CheckScopeEntry {
  const { solves, statements } = solveStatements(block);
  if (solves.length === 0) return run(undefined, false);
  const s = solves[0];
  const extra: Diagnostic[] = [];
  const diag = (severity: Severity, code: string, message: string, range: Range, fixes?: QuickFix[]) => {
    const d: Diagnostic = { range, severity, code, message };
    if (fixes && fixes.length > 0) d.fixes = fixes;
    extra.push(d);
  };
  for (const other of solves.slice(1))
    diag(
      'error',
      'solve-twice',
      `a check solves for one input only: the \`solve:\` line ${s.line + 1} is used, this one is ignored`,
      other.whole,
    );
  const name = s.name.text;
  const symbol = s.symbol.text;
  const assigned = new Map<string, AssignStatement>();
  for (const st of statements)
    if (st.kind === 'assign' && !assigned.has(st.name.text)) assigned.set(st.name.text, st);

  const bail = (): CheckScopeEntry => finish(run(undefined, false), extra);

  // NAME: a reserved input, not stated, with a searchable range.
  if (!(name in INPUT_NAMES)) {
    const near = nearest(name, Object.keys(INPUT_NAMES), 2);
    const isResult = name in RESULT_NAMES;
    diag(
      'error',
      'solve-bad-name',
      isResult
        ? `\`${name}\` is a result of the check: design mode solves for an input, e.g. \`solve: d for ${name} = ...\``
        : `\`${name}\` is not a reserved input name${near ? `: did you mean \`${near}\`?` : ''}`,
      s.name.range,
      near && !isResult
        ? [{ title: `Change to \`${near}\``, edits: [{ range: s.name.range, newText: near }] }]
        : [],
    );
    return bail();
  }
  const stated = assigned.get(name);
  if (stated) {
    diag(
      'error',
      'solve-stated',
      `\`${name}\` is stated on line ${stated.line + 1}: design mode finds an input the note leaves unstated; remove that line or this one`,
      s.name.range,
    );
    return bail();
  }
  const range = searchRange(name);
  if (!range) {
    diag(
      'error',
      'solve-bad-name',
      `design mode cannot solve for \`${name}\` (${INPUT_NAMES[name].meaning}): it solves for a length, a load, a stress, a temperature, N or a factor`,
      s.name.range,
    );
    return bail();
  }
  // SYMBOL: a value the check computes.
  if (symbol === name) {
    diag(
      'error',
      'solve-bad-symbol',
      `\`${symbol}\` is the input being solved for: name a result`,
      s.symbol.range,
    );
    return bail();
  }
  if (assigned.has(symbol)) {
    diag(
      'error',
      'solve-bad-symbol',
      `\`${symbol}\` is stated on line ${assigned.get(symbol)!.line + 1}: design mode needs a result the check computes`,
      s.symbol.range,
    );
    return bail();
  }
  if (!(symbol in RESULT_NAMES) && !(symbol in INPUT_NAMES)) {
    const near = nearest(symbol, Object.keys(RESULT_NAMES), 2);
    diag(
      'error',
      'solve-bad-symbol',
      `\`${symbol}\` is not a result of a check${near ? `: did you mean \`${near}\`?` : ''}`,
      s.symbol.range,
      near ? [{ title: `Change to \`${near}\``, edits: [{ range: s.symbol.range, newText: near }] }] : [],
    );
    return bail();
  }

  const nameDim = INPUT_NAMES[name].dim;
  const vec = vectorOf(nameDim) ?? vectorOf('one')!;
  const inject = (x: number): Map<string, StatedInput> => {
    const stmt: AssignStatement = {
      kind: 'assign',
      line: s.line,
      name: s.name,
      expr: { text: `solved for ${symbol} = ${s.expr.text}`, range: s.expr.range },
      whole: s.whole,
    };
    return new Map([[name, { q: { si: x, dim: vec, raw: rawFromSI(x, vec) }, stmt }]]);
  };

  // Target, per trial (it may name values of the block or of earlier checks).
  let targetError: Diagnostic | undefined;
  let lastTarget: number | undefined;
  let evaluations = 0;
  let system: 'SI' | 'US' = 'SI';
  let symbolDim: DimKey = 'one';
  const seen = new Map<number, Trial>();
  let best: Trial | undefined;
  const trialAt = (x: number): Trial => {
    const t = evaluate(x);
    if (t.g !== null) {
      seen.set(x, t);
      if (!best || Math.abs(t.g) < Math.abs(best.g!)) best = t;
    }
    return t;
  };
  const evaluate = (x: number): Trial => {
    evaluations++;
    const entry = run(inject(x), true);
    system = entry.result.unitSystem;
    const v = resultValue(entry.result, symbol);
    if (!v || v.origin === 'stated' || (v.si === null && !v.infinite)) return { x, g: null };
    const scope: Scope = {
      get: (n) => quantityOf(entry, n),
      hasCheck: (c) => previous.has(c),
      member: (c, m) => quantityOf(previous.get(c), m),
    };
    let target: number;
    try {
      const q = evaluateExpression(s.expr.text, scope);
      const want = vectorOf(v.dim);
      if (want && !sameVector(q.dim, want)) {
        targetError ??= {
          range: s.expr.range,
          severity: 'error',
          code: 'wrong-dimension',
          message: `\`${symbol}\` is ${DIM_LABEL[v.dim]}; the target \`${s.expr.text}\` is ${DIM_LABEL[classify(q.dim)]}`,
        };
        return { x, g: null };
      }
      target = q.si;
    } catch (e) {
      const err = e instanceof ExpressionError ? e : new ExpressionError('expression-error', String(e));
      targetError ??= {
        range: s.expr.range,
        severity: 'error',
        code: err.code,
        message: `target: ${err.message}`,
      };
      return { x, g: null };
    }
    lastTarget = target;
    symbolDim = v.dim;
    const scale = Math.abs(target) > 0 ? Math.abs(target) : 1;
    const g = v.infinite ? INFINITE_G : (v.si! - target) / scale;
    return { x, g, symbolDisplay: v.display, si: v.si ?? undefined };
  };

  const points = scanPoints(range);
  const trials = points.map(trialAt);
  if (targetError) {
    extra.push(targetError);
    return bail();
  }
  const defined = trials.filter((t) => t.g !== null);
  const fmt = (x: number) => formatValue(x, nameDim, system, 4);
  const rangeText = `${fmt(range.lo)} to ${fmt(range.hi)}`;
  if (defined.length === 0) {
    diag(
      'error',
      'solve-no-root',
      `the check gives no \`${symbol}\` for any \`${name}\` from ${rangeText}: see the check's other diagnostics`,
      s.whole,
    );
    return bail();
  }

  // Brackets: consecutive scan points with opposite signs (or an exact zero).
  const brackets: Array<[Trial, Trial]> = [];
  const exact: number[] = [];
  for (let i = 0; i < trials.length; i++) {
    const t = trials[i];
    if (t.g === 0) exact.push(t.x);
    const u = trials[i + 1];
    if (u && t.g !== null && u.g !== null && t.g !== 0 && u.g !== 0 && Math.sign(t.g) !== Math.sign(u.g))
      brackets.push([t, u]);
  }

  // Prefer the side of the answer where the requirements on SYMBOL hold (>= by default).
  const wantsBelow = statements.some(
    (st) =>
      st.kind === 'require' &&
      st.items.some((it) => it.symbol.text === symbol && (it.op === '<=' || it.op === '<')),
  );
  const onSide = (g: number) => (wantsBelow ? g <= 0 : g >= 0);
  const roots: number[] = [...exact];
  const jumps: Jump[] = [];
  // Kept back for the final evaluation and for explaining up to MAX_EXPLAINED jumps.
  let explained = 0;
  const reserve = () => 1 + 2 * Math.max(0, MAX_EXPLAINED - explained);
  const left = () => SOLVE_BUDGET - evaluations - reserve();
  for (let i = 0; i < brackets.length; i++) {
    const [a, b] = brackets[i];
    const share = Math.max(4, Math.floor(left() / (brackets.length - i)));
    const out = brentRoot((x) => trialAt(x).g ?? Number.NaN, a.x, b.x, {
      fa: a.g!,
      fb: b.g!,
      xRelTol: 1e-10,
      maxEvaluations: Math.min(60, share, Math.max(0, left())),
    });
    if (!out.ok) continue;
    const ends = [
      { x: out.x, g: out.fx },
      { x: out.other.x, g: out.other.fx },
    ];
    // The target is met where |SYMBOL - target| <= SOLVE_TOLERANCE |target|: a step of the
    // result that straddles the target within that tolerance is a root like any other.
    const met = ends.filter((e) => Math.abs(e.g) <= SOLVE_TOLERANCE);
    if (met.length > 0) {
      roots.push((met.find((e) => onSide(e.g)) ?? met[0]).x);
      continue;
    }
    // A sign change that the tolerance does not close is a jump of the result (a range
    // boundary of a method: the knee of the S-N line, a published fit's two ranges).
    const [lo, hi] = ends[0].x <= ends[1].x ? [ends[0], ends[1]] : [ends[1], ends[0]];
    jumps.push({
      lo: seen.get(lo.x) ?? { x: lo.x, g: lo.g },
      hi: seen.get(hi.x) ?? { x: hi.x, g: hi.g },
    });
  }

  // No root from a sign change: the closest point is a real minimisation of |SYMBOL - target|,
  // refined around the best local minima of the scan (Brent's localmin), not a scan point.
  if (roots.length === 0) {
    const mag = (t: Trial | undefined) =>
      t === undefined || t.g === null ? Number.POSITIVE_INFINITY : Math.abs(t.g);
    const localMinima: number[] = [];
    for (let i = 0; i < trials.length; i++) {
      const here = mag(trials[i]);
      if (Number.isFinite(here) && here <= mag(trials[i - 1]) && here <= mag(trials[i + 1]))
        localMinima.push(i);
    }
    localMinima.sort((i, j) => mag(trials[i]) - mag(trials[j]));
    const refine = localMinima.slice(0, MAX_REFINED);
    const toU = range.scale === 'log' ? Math.log : (x: number) => x;
    const fromU = range.scale === 'log' ? Math.exp : (u: number) => u;
    for (let k = 0; k < refine.length; k++) {
      const i = refine[k];
      const budget = Math.min(40, Math.floor(left() / (refine.length - k)));
      if (budget < 4) break;
      const lo = points[Math.max(0, i - 1)];
      const hi = points[Math.min(points.length - 1, i + 1)];
      brentMinimize(
        (u) => {
          const x = Math.min(range.hi, Math.max(range.lo, fromU(u)));
          return mag(trialAt(x));
        },
        toU(lo),
        toU(hi),
        {
          xRelTol: range.scale === 'log' ? 0 : 1e-9,
          xAbsTol: range.scale === 'log' ? 1e-9 : 1e-12,
          maxEvaluations: budget,
        },
      );
    }
    // The minimisation may find the target met where the result touches it without crossing.
    if (best && best.g !== null && Math.abs(best.g) <= SOLVE_TOLERANCE) roots.push(best.x);
  }
  roots.sort((p, q) => p - q);

  const targetText = lastTarget !== undefined ? formatValue(lastTarget, symbolDim, system, 4) : s.expr.text;
  const jumpTexts = jumps.map((j, k) => {
    const side = (t: Trial) =>
      t.si !== undefined ? formatValue(t.si, symbolDim, system, 6) : (t.symbolDisplay ?? '?');
    const where = `${name} = ${fmt(j.hi.x)}, from ${symbol} = ${side(j.lo)} just below to ${side(j.hi)} just above`;
    if (k >= MAX_EXPLAINED) return where;
    explained++;
    const why = explainJump(
      run(inject(j.lo.x), true).result,
      run(inject(j.hi.x), true).result,
      name,
      symbol,
      system,
    );
    evaluations += 2;
    return `${where}${why}`;
  });
  if (roots.length === 0) {
    const closest = best ?? defined[0];
    const jumpText =
      jumpTexts.length > 0 ? `: \`${symbol}\` jumps across the target at ${jumpTexts.join('; and at ')}` : '';
    // Say which side of a jump the closest point is on (the two sides print alike).
    const atJump = jumps.find((j) => j.lo.x === closest.x || j.hi.x === closest.x);
    const whichSide = atJump
      ? atJump.lo.x === closest.x
        ? ', just below the jump'
        : ', just above the jump'
      : '';
    diag(
      'error',
      'solve-no-root',
      `no \`${name}\` from ${rangeText} gives ${symbol} = ${targetText}${jumpText}; the closest is ${symbol} = ${closest.symbolDisplay} at ${name} = ${fmt(closest.x)}${whichSide} (shown)`,
      s.whole,
    );
    const entry = run(inject(closest.x), false);
    const notes = [
      `searched ${name} from ${rangeText}; no root; the closest point found by minimising |${symbol} - target| (Brent's localmin)`,
    ];
    if (jumps.length > 0)
      notes.push(`${symbol} jumps across the target at ${jumps.map((j) => fmt(j.hi.x)).join(', ')}`);
    record(entry.result, name, symbol, s, {
      formula: `closest: ${symbol}(${name}) = ${closest.symbolDisplay}, target ${targetText} not reached`,
      source: SOLVE_CLOSEST_SOURCE,
      notes,
      evaluations: evaluations + 1,
    });
    return finish(entry, extra);
  }
  const answer = roots[0];
  if (roots.length > 1)
    diag(
      'warning',
      'solve-several-roots',
      `several values of \`${name}\` give ${symbol} = ${targetText}: ${roots.map(fmt).join(', ')}; the smallest is used (rule: the smallest ${name} in the range)`,
      s.whole,
    );
  const entry = run(inject(answer), false);
  const notes = [
    `searched ${name} from ${rangeText} (${points.length} scan points, then Brent's method); target met within ${SOLVE_TOLERANCE} of it`,
  ];
  if (roots.length > 1) notes.push(`other roots: ${roots.slice(1).map(fmt).join(', ')}`);
  if (jumps.length > 0)
    notes.push(`${symbol} also jumps across the target at ${jumpTexts.join('; and at ')}`);
  record(entry.result, name, symbol, s, {
    formula: `solved: ${symbol}(${name}) = ${targetText}`,
    notes,
    evaluations: evaluations + 1,
  });
  return finish(entry, extra);
}

/**
 * Why the result jumps between two evaluations on either side of a step: the first value of
 * the check whose formula changes there (a method's range boundary, e.g. the two ranges of
 * the size factor of Shigley Eq. 6-20 at 51 mm), else the first whose value steps.
 */
function explainJump(
  below: CheckResult,
  above: CheckResult,
  name: string,
  symbol: string,
  system: 'SI' | 'US',
): string {
  const show = (v: Value) => (v.si !== null ? formatValue(v.si, v.dim, system, 6) : v.display);
  const names = Object.keys(below.values).filter((n) => n !== name && n in above.values);
  const changed = (n: string) => {
    const a = below.values[n];
    const b = above.values[n];
    return (a.formula ?? '') !== (b.formula ?? '') || Boolean(a.infinite) !== Boolean(b.infinite);
  };
  const byFormula = names.filter((n) => n !== symbol && changed(n));
  const cause = byFormula[0] ?? (changed(symbol) ? symbol : undefined);
  if (cause) {
    const a = below.values[cause];
    const b = above.values[cause];
    return `, where \`${cause}\` changes from \`${a.formula ?? a.display}\` (${show(a)}) to \`${b.formula ?? b.display}\` (${show(b)}), the boundary between two ranges of its method`;
  }
  const stepped = names.find((n) => {
    const a = below.values[n].si;
    const b = above.values[n].si;
    if (n === symbol || a === null || b === null) return false;
    return Math.abs(a - b) > JUMP_STEP * Math.max(Math.abs(a), Math.abs(b));
  });
  if (stepped)
    return `, where \`${stepped}\` steps from ${show(below.values[stepped])} to ${show(above.values[stepped])}`;
  return '';
}

/** A value of an evaluated check as a mathjs value, for the target expression (stated ones as written). */
/** A result by name, a renamed result's old name included. */
function resultValue(result: CheckResult, name: string): Value | undefined {
  return result.values[name] ?? result.values[renamedResult(result.method, name) ?? ''];
}

function quantityOf(entry: CheckScopeEntry | undefined, name: string): Unit | number | undefined {
  if (!entry) return undefined;
  const hit = entry.raw.get(name);
  if (hit !== undefined) return hit;
  // A renamed result's old name (`D` of a damage check) still reads the new one.
  const v = entry.result.values[name] ?? entry.result.values[renamedResult(entry.result.method, name) ?? ''];
  const vec = v && v.si !== null ? vectorOf(v.dim) : undefined;
  return vec ? rawFromSI(v.si!, vec) : undefined;
}

function record(
  result: CheckResult,
  name: string,
  symbol: string,
  s: SolveStatement,
  how: { formula: string; notes: string[]; evaluations: number; source?: string },
): void {
  const v: Value | undefined = result.values[name];
  if (!v) return;
  v.origin = 'computed';
  v.formula = how.formula;
  v.source = how.source ?? SOLVE_SOURCE;
  const sym = resultValue(result, symbol);
  v.inputs = sym ? [{ name: symbol, display: sym.display }] : [];
  const terms: Term[] = [{ name: 'evaluations of the check', value: how.evaluations, unit: '' }];
  v.terms = terms;
  v.notes = how.notes;
  v.range = s.whole;
  delete v.expression;
}

/** Adds the solve line's diagnostics to the check and sets its status again. */
function finish(entry: CheckScopeEntry, extra: Diagnostic[]): CheckScopeEntry {
  const r = entry.result;
  for (const d of extra) {
    d.check = r.id;
    if (!r.diagnostics.some((x) => x.code === d.code && x.range.start.line === d.range.start.line))
      r.diagnostics.push(d);
  }
  if (extra.some((d) => d.severity === 'error')) r.status = 'error';
  return entry;
}
