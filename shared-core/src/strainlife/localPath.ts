/**
 * The local (notch-root) stress-strain path of a nominal stress history, with the material's
 * memory, and its closed hysteresis loops:
 *
 * 1. The history is reduced to its peaks and valleys (`rainflow/turningPoints.ts`) and re-ordered
 *    to start at its largest absolute peak, then closed by returning to that peak: the history is
 *    a block that repeats, and starting at the largest peak leaves no open half cycles (the usual
 *    practice of the local strain approach; Dowling, Mechanical Behavior of Materials, 4th ed.,
 *    Ch. 14, variable amplitude loading, from memory for the section).
 * 2. First loading from zero to that peak follows the cyclic curve; every later branch follows
 *    the Masing (doubled) curve from its reversal point, through Neuber's rule or Glinka's rule
 *    on the nominal range from that point (`notchRoot.ts`).
 * 3. Memory: when a branch passes the reversal point before its own origin, the loop between
 *    those two points closes (a full cycle, counted with both its points' stresses and strains)
 *    and the branch goes on as the continuation of the earlier branch, measured from the earlier
 *    origin; a branch that passes the first peak's level continues on the cyclic curve. This is
 *    the three-point rule of rainflow counting (ASTM E1049-85 (2017), 5.4.4: a range X at least
 *    as large as the previous range Y counts Y) applied to the path, so the closed loops are the
 *    rainflow cycles of the local strain history; the tests check them against the project's
 *    rainflow counter run on the local strains.
 *
 * A spectrum (levels of nominal max/min with counts) has no order: its envelope (highest max,
 * lowest min) is loaded first, largest absolute peak first, and each level's loop hangs from the
 * descending branch of the envelope, the higher of the two placements inside the envelope
 * (common practice, no source).
 *
 * Pure; never throws; bounded memory for the memory stack (at most the turning points) and for
 * the kept path points (`maxPathPoints`).
 */
import { isFiniteNumber, type MethodNote, MPA } from '../computed';
import { RAINFLOW_SOURCE } from '../rainflow/rainflowCounter';
import { TurningPointDetector } from '../rainflow/turningPoints';
import { type CyclicCurve, cyclicCurveNotes, cyclicStrain, masingStrainRange } from './cyclicCurve';
import {
  firstLoadingKernel,
  generalYieldNotes,
  type NotchFactorKind,
  type NotchRule,
  notchFactorNote,
  reversalKernel,
} from './notchRoot';

export const LOCAL_PATH_SOURCE = `Local strain approach with the cyclic curve for first loading, the Masing curve for reversals and material memory (Dowling, Mechanical Behavior of Materials, 4th ed., Ch. 14, from memory for the section); loops counted by the three-point rule of ${RAINFLOW_SOURCE}`;

export interface PathPoint {
  /** Nominal stress at this point, Pa. */
  S: number;
  /** Local stress, Pa. */
  sigma: number;
  /** Local strain. */
  eps: number;
  /** Index of the point the branch into this point is measured from; -1: first loading from zero on the cyclic curve. */
  origin: number;
  /**
   * `reversal`: a peak or valley of the nominal history. `closure`: the path passing an earlier
   * reversal point again on its way to the next reversal (a loop closes there and the branch
   * resumes the earlier one); kept so that a drawing follows the true branches. `closes` is the
   * index of the point passed again.
   */
  kind: 'reversal' | 'closure';
  closes?: number;
}

export interface LocalLoop {
  /** Indices of the loop's two reversal points in `points` (-1 when the path was not kept that far). */
  from: number;
  to: number;
  /** Nominal range and extremes, Pa. */
  dS: number;
  S_max: number;
  S_min: number;
  /** Local stress range and extremes, Pa. */
  dSigma: number;
  sigma_max: number;
  sigma_min: number;
  sigma_m: number;
  /** Local strain range and amplitude. */
  dEps: number;
  eps_a: number;
  eps_max: number;
  eps_min: number;
  /** Cycles of this loop per block (1 for a history, n for a spectrum level). */
  count: number;
}

export interface LocalPath {
  points: PathPoint[];
  loops: LocalLoop[];
  notes: MethodNote[];
  /** True when `points` was cut at `maxPathPoints` (the loops are complete nonetheless). */
  truncated: boolean;
  /** Turning points of the nominal history (before the re-ordering). */
  turningPointCount: number;
  /** Largest absolute nominal stress (the first peak), Pa. */
  S_peak: number;
  /** Nominal envelope, Pa. */
  S_top: number;
  S_bottom: number;
  source: string;
}

export interface PathOptions {
  curve: CyclicCurve;
  rule: NotchRule;
  /** Concentration factor (>= 1) and which one it is. */
  K: number;
  factor: NotchFactorKind;
  /** Monotonic yield strength for the general-yield check, Pa. */
  Sy?: number;
  /** Hysteresis gate on the nominal history, Pa (reversals smaller than this are dropped). */
  gate?: number;
  /** Path points kept for drawing (default 10,000). */
  maxPathPoints?: number;
}

const DEFAULT_MAX_POINTS = 10_000;

interface StackEntry {
  S: number;
  sigma: number;
  eps: number;
  index: number;
}

/** Traces nominal turning points with the memory rules; collects closed loops. */
class Tracer {
  readonly points: PathPoint[] = [];
  readonly loops: LocalLoop[] = [];
  truncated = false;
  private readonly stack: StackEntry[] = [];
  private pointCount = 0;

  constructor(
    private readonly curve: CyclicCurve,
    private readonly rule: NotchRule,
    private readonly K: number,
    private readonly maxPoints: number,
  ) {}

  /** The local point reached from `origin` (or from zero on the cyclic curve) at nominal S. */
  private reach(origin: StackEntry | undefined, S: number): { sigma: number; eps: number } {
    if (origin === undefined) return firstLoadingKernel(this.curve, this.rule, this.K * S);
    const dS = S - origin.S;
    const r = reversalKernel(this.curve, this.rule, this.K * Math.abs(dS));
    const s = dS < 0 ? -1 : 1;
    return { sigma: origin.sigma + s * r.dSigma, eps: origin.eps + s * r.dEps };
  }

  private keep(p: PathPoint): number {
    const i = this.pointCount++;
    if (this.points.length < this.maxPoints) {
      this.points.push(p);
      return i;
    }
    this.truncated = true;
    return -1;
  }

  private closeLoop(a: StackEntry, b: StackEntry, count: number): void {
    this.loops.push(loopOf(a, b, count));
  }

  push(S: number): void {
    const st = this.stack;
    // Memory: while the new branch passes the reversal point before its origin, the loop closes.
    while (st.length >= 2) {
      const top = st[st.length - 1];
      const prev = st[st.length - 2];
      if (Math.abs(S - top.S) < Math.abs(top.S - prev.S)) break;
      this.closeLoop(prev, top, 1);
      st.length -= 2;
      if (S === prev.S) {
        // The branch ends exactly where the loop closes: the new reversal is the earlier point's state.
        const index = this.keep({ S, sigma: prev.sigma, eps: prev.eps, origin: top.index, kind: 'reversal' });
        st.push({ S, sigma: prev.sigma, eps: prev.eps, index });
        return;
      }
      // The branch from `top` passes `prev` (its state, by the Masing closure) and resumes the branch into `prev`.
      this.keep({
        S: prev.S,
        sigma: prev.sigma,
        eps: prev.eps,
        origin: top.index,
        kind: 'closure',
        closes: prev.index,
      });
    }
    const origin = st.length > 0 ? st[st.length - 1] : undefined;
    const p = this.reach(origin, S);
    const index = this.keep({
      S,
      sigma: p.sigma,
      eps: p.eps,
      origin: origin === undefined ? -1 : origin.index,
      kind: 'reversal',
    });
    st.push({ S, sigma: p.sigma, eps: p.eps, index });
  }

  /** Appends a point reached from a given entry without touching the memory stack (spectrum drawing). */
  pointFrom(origin: StackEntry | undefined, S: number): StackEntry {
    const p = this.reach(origin, S);
    const index = this.keep({
      S,
      sigma: p.sigma,
      eps: p.eps,
      origin: origin === undefined ? -1 : origin.index,
      kind: 'reversal',
    });
    return { S, sigma: p.sigma, eps: p.eps, index };
  }

  addLoop(a: StackEntry, b: StackEntry, count: number): void {
    this.closeLoop(a, b, count);
  }
}

function loopOf(a: StackEntry, b: StackEntry, count: number): LocalLoop {
  const sigma_max = Math.max(a.sigma, b.sigma);
  const sigma_min = Math.min(a.sigma, b.sigma);
  const eps_max = Math.max(a.eps, b.eps);
  const eps_min = Math.min(a.eps, b.eps);
  const dEps = eps_max - eps_min;
  return {
    from: a.index,
    to: b.index,
    dS: Math.abs(b.S - a.S),
    S_max: Math.max(a.S, b.S),
    S_min: Math.min(a.S, b.S),
    dSigma: sigma_max - sigma_min,
    sigma_max,
    sigma_min,
    sigma_m: (sigma_max + sigma_min) / 2,
    dEps,
    eps_a: dEps / 2,
    eps_max,
    eps_min,
    count,
  };
}

function optionNotes(o: PathOptions): MethodNote[] {
  const notes = cyclicCurveNotes(o.curve);
  if (!isFiniteNumber(o.K) || o.K < 1)
    notes.push({
      code: 'invalid-input',
      severity: 'error',
      message: `The concentration factor must be a number >= 1 (got ${o.K}).`,
    });
  return notes;
}

function emptyPath(notes: MethodNote[], turningPointCount = 0): LocalPath {
  return {
    points: [],
    loops: [],
    notes,
    truncated: false,
    turningPointCount,
    S_peak: 0,
    S_top: 0,
    S_bottom: 0,
    source: LOCAL_PATH_SOURCE,
  };
}

/** Peaks and valleys of a nominal history (non-finite samples skipped, with a count). */
function peaksAndValleys(history: ArrayLike<number>, gate: number): { points: number[]; skipped: number } {
  const d = new TurningPointDetector(gate);
  const points: number[] = [];
  let skipped = 0;
  for (let i = 0; i < history.length; i++) {
    const x = history[i];
    if (!isFiniteNumber(x)) {
      skipped++;
      continue;
    }
    if (d.push(x)) points.push(d.point);
  }
  if (d.finish()) points.push(d.point);
  return { points, skipped };
}

/** The closed block: start at the largest absolute turning point, go round, return to it; only reversals kept. */
function reorderedBlock(tp: number[]): number[] {
  let k = 0;
  for (let i = 1; i < tp.length; i++) if (Math.abs(tp[i]) > Math.abs(tp[k])) k = i;
  const rotated = [...tp.slice(k), ...tp.slice(0, k), tp[k]];
  const d = new TurningPointDetector(0);
  const out: number[] = [];
  for (const x of rotated) if (d.push(x)) out.push(d.point);
  if (d.finish()) out.push(d.point);
  return out;
}

/**
 * The local path of a nominal stress history (Pa), re-ordered to start at its largest absolute
 * peak and closed as a repeating block; its loops are the closed hysteresis loops of one block.
 */
export function traceHistory(history: ArrayLike<number>, options: PathOptions): LocalPath {
  const notes = optionNotes(options);
  if (notes.some((n) => n.severity === 'error')) return emptyPath(notes);
  const gate = isFiniteNumber(options.gate ?? 0) && (options.gate ?? 0) > 0 ? (options.gate as number) : 0;
  const { points: tp, skipped } = peaksAndValleys(history, gate);
  if (skipped > 0)
    notes.push({
      code: 'history-non-finite',
      severity: 'warning',
      message: `${skipped} non-finite sample${skipped === 1 ? ' was' : 's were'} ignored.`,
    });
  if (tp.length < 2) {
    notes.push({
      code: tp.length === 0 && history.length < 2 ? 'history-too-few-points' : 'history-no-cycles',
      severity: 'error',
      message:
        tp.length === 0 && history.length < 2
          ? 'The history needs at least two points with a change of stress.'
          : 'The history has no reversal (it is constant or all its changes are below the gate): no cycles.',
    });
    return emptyPath(notes, tp.length);
  }
  const block = reorderedBlock(tp);
  let top = block[0];
  let bottom = block[0];
  for (const s of block) {
    if (s > top) top = s;
    if (s < bottom) bottom = s;
  }
  notes.push(
    notchFactorNote(options.rule, options.K, options.factor),
    ...generalYieldNotes(options.curve, block[0], top - bottom, options.Sy),
  );
  const tracer = new Tracer(
    options.curve,
    options.rule,
    options.K,
    options.maxPathPoints ?? DEFAULT_MAX_POINTS,
  );
  for (const s of block) tracer.push(s);
  if (tracer.truncated)
    notes.push({
      code: 'path-truncated',
      severity: 'information',
      message: `Only the first ${tracer.points.length} points of the local path are kept for drawing; all loops are counted.`,
    });
  return {
    points: tracer.points,
    loops: tracer.loops,
    notes,
    truncated: tracer.truncated,
    turningPointCount: tp.length,
    S_peak: block[0],
    S_top: top,
    S_bottom: bottom,
    source: LOCAL_PATH_SOURCE,
  };
}

export interface SpectrumLevel {
  /** Nominal maximum and minimum stress of the level, Pa. */
  S_max: number;
  S_min: number;
  /** Cycles of the level per block (> 0). */
  count: number;
}

/** The local loops of a spectrum: envelope first (largest absolute peak first), each level's loop on its descending branch. */
export function traceSpectrum(levels: readonly SpectrumLevel[], options: PathOptions): LocalPath {
  const notes = optionNotes(options);
  if (notes.some((n) => n.severity === 'error')) return emptyPath(notes);
  const usable: SpectrumLevel[] = [];
  levels.forEach((lv, i) => {
    if (
      !isFiniteNumber(lv.S_max) ||
      !isFiniteNumber(lv.S_min) ||
      !isFiniteNumber(lv.count) ||
      !(lv.count > 0)
    ) {
      notes.push({
        code: 'invalid-input',
        severity: 'error',
        message: `Spectrum level ${i + 1}: S_max, S_min must be finite stresses and the count positive.`,
      });
      return;
    }
    const hi = Math.max(lv.S_max, lv.S_min);
    const lo = Math.min(lv.S_max, lv.S_min);
    if (hi === lo) {
      notes.push({
        code: 'no-stress-range',
        severity: 'information',
        message: `Spectrum level ${i + 1} has no stress range: no cycles.`,
      });
      return;
    }
    usable.push({ S_max: hi, S_min: lo, count: lv.count });
  });
  if (notes.some((n) => n.severity === 'error')) return emptyPath(notes);
  if (usable.length === 0) {
    notes.push({
      code: 'history-no-cycles',
      severity: 'error',
      message: 'The spectrum has no level with a stress range.',
    });
    return emptyPath(notes);
  }
  const top = Math.max(...usable.map((l) => l.S_max));
  const bottom = Math.min(...usable.map((l) => l.S_min));
  const peak = Math.abs(bottom) > Math.abs(top) ? bottom : top;
  notes.push(
    notchFactorNote(options.rule, options.K, options.factor),
    ...generalYieldNotes(options.curve, peak, top - bottom, options.Sy),
  );
  const tracer = new Tracer(
    options.curve,
    options.rule,
    options.K,
    options.maxPathPoints ?? DEFAULT_MAX_POINTS,
  );
  const first = tracer.pointFrom(undefined, peak);
  const topPoint = peak === top ? first : tracer.pointFrom(first, top);
  // One block is the levels in order, each a cycle max -> min, repeated: its rainflow with the
  // memory rules (started at the largest absolute peak) gives the cycles that join levels,
  // the envelope top -> bottom among them when no single level spans it. Each level's other
  // n - 1 cycles are its own loops. Every loop hangs from the envelope's descending branch: the
  // highest local stresses any branch inside the envelope reaches (Masing and memory), so the
  // local means are never understated.
  const sequence = new Tracer(options.curve, options.rule, options.K, 0);
  for (const S of reorderedBlock(usable.flatMap((lv) => [lv.S_max, lv.S_min]))) sequence.push(S);
  const hang = (lo: number, hi: number, count: number) => {
    const a = tracer.pointFrom(topPoint, lo);
    const b = tracer.pointFrom(a, hi);
    tracer.addLoop(a, b, count);
    // For drawing: the loop closes at its minimum, and the path returns to the envelope's top.
    const closed = tracer.pointFrom(b, lo);
    tracer.pointFrom(closed, top);
  };
  // Equal cycles counted together, the largest range first.
  const cycles = new Map<string, { lo: number; hi: number; count: number }>();
  const add = (lo: number, hi: number, count: number) => {
    const key = `${lo}|${hi}`;
    const c = cycles.get(key);
    if (c) c.count += count;
    else cycles.set(key, { lo, hi, count });
  };
  for (const l of sequence.loops) add(l.S_min, l.S_max, 1);
  for (const lv of usable) if (lv.count > 1) add(lv.S_min, lv.S_max, lv.count - 1);
  for (const c of [...cycles.values()].sort((x, y) => y.hi - y.lo - (x.hi - x.lo))) hang(c.lo, c.hi, c.count);
  return {
    points: tracer.points,
    loops: tracer.loops,
    notes,
    truncated: tracer.truncated,
    turningPointCount: usable.length * 2,
    S_peak: peak,
    S_top: top,
    S_bottom: bottom,
    source: LOCAL_PATH_SOURCE,
  };
}

/** Constant amplitude: the history S_max, S_min repeated (largest absolute first). */
export function traceConstantAmplitude(S_max: number, S_min: number, options: PathOptions): LocalPath {
  const hi = Math.max(S_max, S_min);
  const lo = Math.min(S_max, S_min);
  if (isFiniteNumber(hi) && isFiniteNumber(lo) && hi === lo) {
    const notes = optionNotes(options);
    if (notes.some((n) => n.severity === 'error')) return emptyPath(notes);
    notes.push(
      {
        code: 'no-stress-range',
        severity: 'information',
        message: 'S_max = S_min: a static load, no cycles.',
      },
      ...generalYieldNotes(options.curve, hi, 0, options.Sy),
    );
    const p = firstLoadingKernel(options.curve, options.rule, options.K * hi);
    return {
      ...emptyPath(notes, 1),
      points: [{ S: hi, sigma: p.sigma, eps: p.eps, origin: -1, kind: 'reversal' }],
      S_peak: hi,
      S_top: hi,
      S_bottom: hi,
    };
  }
  return traceHistory([hi, lo, hi], options);
}

/**
 * Points [sigma, eps] along the path for drawing: each segment follows its branch (the cyclic
 * curve from zero, or the Masing curve from its origin), `perSegment` points per segment.
 */
export function pathCurve(path: LocalPath, curve: CyclicCurve, perSegment = 16): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  const n = Math.max(2, Math.min(200, Math.floor(isFiniteNumber(perSegment) ? perSegment : 16)));
  let prev: { sigma: number; eps: number } = { sigma: 0, eps: 0 };
  out.push([0, 0]);
  for (const p of path.points) {
    const o = p.origin >= 0 && p.origin < path.points.length ? path.points[p.origin] : undefined;
    for (let i = 1; i <= n; i++) {
      const sigma = prev.sigma + ((p.sigma - prev.sigma) * i) / n;
      let eps: number;
      if (o === undefined) eps = cyclicStrain(curve, sigma);
      else {
        const d = sigma - o.sigma;
        eps = o.eps + Math.sign(d) * masingStrainRange(curve, Math.abs(d));
      }
      out.push([sigma, i === n ? p.eps : eps]);
    }
    prev = p;
  }
  return out;
}

/** One line per path point: how it was reached and where it lies (the derivation of the path). */
export function pathSteps(path: LocalPath, rule: NotchRule, digits = 4): string[] {
  const rname = rule === 'glinka' ? 'Glinka' : 'Neuber';
  const f = (x: number) => Number(x.toPrecision(digits));
  return path.points.map((p, i) => {
    const at = `S = ${f(p.S / MPA)} MPa`;
    const where = `sigma = ${f(p.sigma / MPA)} MPa, eps = ${f(p.eps)}`;
    if (p.kind === 'closure') {
      const j = (p.closes ?? -1) + 1;
      return `${i + 1}: ${at}, the branch from point ${p.origin + 1} reaches point ${j} again: the loop (${j}, ${p.origin + 1}) closes and the path resumes the branch into point ${j} (memory): ${where}`;
    }
    const how =
      p.origin < 0
        ? `first loading on the cyclic curve (${rname})`
        : `Masing branch from point ${p.origin + 1} (S = ${f(path.points[p.origin].S / MPA)} MPa, ${rname} on the range)`;
    return `${i + 1}: ${at}, ${how}: ${where}`;
  });
}
