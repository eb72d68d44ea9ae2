/**
 * `method: damage`: Palmgren-Miner damage of one pass of a measured load history or of a load
 * spectrum, at the checked section of a stress-life check (strengths, section, notch, Marin
 * factors, S-N line and mean-stress criterion stated the same way).
 *
 * - History (`history:`, `history-column:`, `history-load:`, `history_scale`, optional
 *   `history_gate`): the CSV is streamed twice through the reader the editor or the command
 *   line gives (`ctx.histories`): once for its extremes (the limits of the range-mean
 *   histogram), once through the rainflow counter (ASTM E1049-85 (2017) 5.4.4), each counted
 *   cycle going straight to the Miner sum: no array of cycles is kept.
 * - Spectrum (`spectrum:` lines): each level's loads through the same section.
 *
 * Each cycle or level: loads -> nominal stresses (linear: the stress per unit load is computed
 * once) -> equivalent amplitude and mean at the notch -> equivalent fully reversed stress by
 * the chosen criterion -> cycles to failure on the S-N line under the chosen Miner rule.
 * A damage check's damage is `D_sum` (old name `D`, kept as an alias); `D` is the larger diameter, as everywhere.
 */

import { chooseCriterion, needsYield, strengthSetFor } from '../../checks/criterionChoice';
import { governingIndex, governingNote, pointName, warnRotationAssumed } from '../../checks/criticalPoints';
import { enduranceChain } from '../../checks/enduranceChain';
import { reportHistoryIssues } from '../../checks/historyIssues';
import { readStrengths } from '../../checks/material';
import { type LevelBase, readSpectrumLevels, type SpectrumLevel } from '../../checks/spectrumLevels';
import { type DamageSection, damageSection, notchEquivalent } from '../../checks/unitLoadStresses';
import { type Computed, computed, type MethodNote, MPA } from '../../computed';
import type { CheckContext } from '../../context/checkContext';
import type { CheckResult, Range, Severity, SnData } from '../../context/types';
import { type CriterionModel, criterionModel, type StrengthSet } from '../../criteria';
import {
  cyclesToFailure,
  equivalentCycles,
  MinerAccumulator,
  type MinerResult,
  type MinerRule,
  repeatsToFailure,
} from '../../damage';
import {
  HistoryCsvReader,
  histogramLimitsFor,
  RAINFLOW_SOURCE,
  RainflowCounter,
  RangeMeanHistogram,
  scaledSpreadProblem,
} from '../../rainflow';
import type { SnLine } from '../../sn';
import { type DimKey, sameVector, vectorOf } from '../../units/dimensions';
import { displayUnit, formatNumber, toDisplayNumber } from '../../units/format';
import type { MethodExtras } from '../types';

export type HistoryLoad = 'bending' | 'torsion' | 'axial' | 'pressure' | 'stress';

const HISTORY_BASE: Record<HistoryLoad, LevelBase> = {
  bending: 'M',
  torsion: 'T',
  axial: 'F',
  pressure: 'p',
  stress: 'sigma',
};

const HISTORY_DIM: Record<HistoryLoad, DimKey> = {
  bending: 'moment',
  torsion: 'moment',
  axial: 'force',
  pressure: 'stress',
  stress: 'stress',
};

/** Loads a stress-life check states, which a damage check takes from its history or spectrum instead. */
const LOAD_NAMES = [
  'M_max',
  'M_min',
  'M_a',
  'M_m',
  'T_max',
  'T_min',
  'T_a',
  'T_m',
  'F_max',
  'F_min',
  'F_a',
  'F_m',
  'p_max',
  'p_min',
  'sigma_a',
  'sigma_m',
  'sigma_ax_a',
  'sigma_ax_m',
  'tau_a',
  'tau_m',
];

/** Range bins of the damage table of a history. */
const RANGE_BINS = 10;
/** Bins per axis of the range-mean histogram. */
const HISTOGRAM_BINS = 16;
/** Contributors listed in the derivation of D_sum. */
const CONTRIBUTORS_SHOWN = 5;

interface HistorySetup {
  path: string;
  column?: string | number;
  load: HistoryLoad;
  base: LevelBase;
  /** SI value of 1.0 in the file. */
  scale: number;
  /** Gate in file units (0: none). */
  gate: number;
  range: Range;
  dim: DimKey;
}

/** What a pass over the history or the spectrum gives for the results. */
interface DamagePass {
  acc: MinerAccumulator;
  cycles: number;
  tables: NonNullable<CheckResult['tables']>;
  points: SnData['points'];
  histogram?: CheckResult['histogram'];
  /** Inputs named in the derivation of D_sum. */
  inputs: string[];
  /** Two-point sections: the damage at each point (in `sec.points` order) and the governing one. */
  pointDamage?: number[];
  gov?: number;
}

interface Evaluation {
  model: CriterionModel;
  set: StrengthSet;
  line: SnLine;
  rule: MinerRule;
  critRange: Range;
}

export function runDamage(ctx: CheckContext): MethodExtras {
  const historyStmt = ctx.options.get('history');
  if (!historyStmt && ctx.spectrum.length === 0) {
    ctx.diag(
      'error',
      'missing-history',
      'a damage check needs its loads: a `history:` file (with `history-load:` and `history_scale`) or `spectrum:` lines (e.g. `spectrum: M_a = 300 N*m, M_m = 100 N*m, n = 2e4`)',
      ctx.optionRange('method'),
    );
    return {};
  }
  if (historyStmt && ctx.spectrum.length > 0) {
    ctx.diag(
      'error',
      'history-and-spectrum',
      'give the loads either as a `history:` file or as `spectrum:` lines, not both (make two checks)',
      historyStmt.whole,
    );
    return {};
  }
  for (const n of LOAD_NAMES)
    if (ctx.has(n))
      ctx.diag(
        'warning',
        'ignored-input',
        `in a damage check the loads come from the ${historyStmt ? 'history' : 'spectrum'}: \`${n}\` is not used`,
        ctx.rangeOf(n),
      );

  const st = readStrengths(ctx);
  if (!st) return {};

  // The loads: which bases, from where.
  let history: HistorySetup | null = null;
  let levels: SpectrumLevel[] = [];
  let used: Set<LevelBase>;
  const loadRange = historyStmt?.whole ?? ctx.spectrum[0].whole;
  if (historyStmt) {
    history = historySetup(ctx, historyStmt.whole);
    if (!history) return {};
    used = new Set([history.base]);
  } else {
    levels = readSpectrumLevels(ctx);
    if (levels.length !== ctx.spectrum.length) return {};
    used = new Set(levels.flatMap((l) => Object.keys(l.loads) as LevelBase[]));
  }

  const sec = damageSection(ctx, st, used, loadRange);
  if (!sec) return {};
  if (sec.geometry === 'round' && sec.rotating && used.has('M')) {
    // A history's cycles have means of their own; a spectrum level its stated mean moment.
    const mean = history ? 1 : (levels.find((l) => (l.loads.M?.m ?? 0) !== 0)?.loads.M?.m ?? 0);
    const where = history
      ? loadRange
      : (levels.find((l) => (l.loads.M?.m ?? 0) !== 0)?.stmt.whole ?? loadRange);
    warnRotationAssumed(ctx, mean, where);
    if (history)
      ctx.diag(
        'warning',
        'rotating-history',
        'on a rotating shaft every revolution is a stress cycle: each cycle counted in the moment history is taken fully reversed at its largest moment, but a shaft that turns more often than the moment changes sees more cycles than the history holds. Count revolutions: state the levels as a spectrum (`spectrum: M_a = ..., n = revolutions`), or give the history of the bending stress at one fibre (`rotation: non-rotating`, `history-load: stress`)',
        loadRange,
      );
  }
  const chain = enduranceChain(ctx, st, sec.loadKind, sec.geometry, sec.hasAxial);
  const choice = chooseCriterion(ctx);
  if (!choice) return {};
  const criterion = choice.criterion;
  if (!chain.line) return { criterion };
  if (needsYield(criterion) && st.Sy === undefined) {
    ctx.diag(
      'error',
      'missing-yield',
      `\`criterion: ${criterion}\` needs the yield strength Sy`,
      choice.critRange,
    );
    return { criterion };
  }
  const ev: Evaluation = {
    model: criterionModel(criterion),
    set: strengthSetFor(ctx, st, chain, choice)(chain.S ?? chain.line.S2),
    line: chain.line,
    rule: (ctx.option('miner') ?? 'original') as MinerRule,
    critRange: choice.critRange,
  };
  const baseInputs = [chain.hasEndurance ? 'Se' : 'S_ref', 'f', chain.shear ? 'Ssu' : 'Sut'];

  const pass = history ? historyPass(ctx, history, sec, ev) : spectrumPass(ctx, levels, sec, ev);
  if (!pass) return { criterion };

  const res = pass.acc.result(10);
  if (!Number.isFinite(res.D)) {
    const why = 'the Miner sum overflows (lives too short to divide by: stresses far beyond the strength)';
    ctx.diag('error', 'damage-overflow', `${why}: check the loads and \`history_scale\``, loadRange);
    return { criterion };
  }
  recordDamage(ctx, sec, res, pass, ev, [...baseInputs, ...pass.inputs], loadRange);
  const sn: SnData = {
    a: ev.line.a,
    b: ev.line.b,
    N1: ev.line.N1,
    N2: ev.line.N2,
    S1: ev.line.S1,
    S2: ev.line.S2,
    hasKnee: ev.line.hasKnee,
    points: pass.points,
  };
  return {
    criterion,
    sn,
    tables: pass.tables,
    ...(pass.histogram ? { histogram: pass.histogram } : {}),
  };
}

function unitText(dim: DimKey, ctx: CheckContext): string {
  return displayUnit(dim, ctx.system)?.unit ?? '';
}

function historySetup(ctx: CheckContext, range: Range): HistorySetup | null {
  const path = ctx.options.get('history')!.value.text;
  if (!ctx.options.has('history-load')) {
    ctx.diag(
      'error',
      'missing-option',
      'say which load the history column is: `history-load: bending | torsion | axial | pressure | stress`',
      range,
      (['bending', 'torsion', 'axial', 'pressure', 'stress'] as const).map((w) => ({
        ...ctx.insertFix(`State \`history-load: ${w}\``, `history-load: ${w}`),
        preferred: false,
      })),
    );
    return null;
  }
  const load = ctx.option('history-load') as HistoryLoad | undefined;
  if (!load) return null;
  const dim = HISTORY_DIM[load];
  const sc = ctx.stated.get('history_scale');
  if (!sc) {
    ctx.diag(
      'error',
      'missing-input',
      `state \`history_scale\`, the physical value of 1.0 in the file (${ctx.dimLabel(dim)} for \`history-load: ${load}\`)`,
      range,
      [
        {
          ...ctx.insertFix(
            `State \`history_scale = 1 ${unitText(dim, ctx)}\` (check the file's unit)`,
            `history_scale = 1 ${unitText(dim, ctx)}`,
          ),
          preferred: false,
        },
      ],
    );
    return null;
  }
  ctx.used.add('history_scale');
  if (!sameVector(sc.q.dim, vectorOf(dim)!)) {
    ctx.diag(
      'error',
      sc.q.dim.every((x) => x === 0) ? 'missing-unit' : 'wrong-dimension',
      `\`history_scale\` must be ${ctx.dimLabel(dim)} for \`history-load: ${load}\` (the value of 1.0 in the file)`,
      sc.stmt.expr.range,
    );
    return null;
  }
  if (sc.q.si === 0) {
    ctx.diag('error', 'absurd-value', '`history_scale` must not be zero', sc.stmt.expr.range);
    return null;
  }
  let gate = 0;
  const g = ctx.stated.get('history_gate');
  if (g) {
    ctx.used.add('history_gate');
    if (!sameVector(g.q.dim, vectorOf(dim)!)) {
      ctx.diag(
        'error',
        g.q.dim.every((x) => x === 0) ? 'missing-unit' : 'wrong-dimension',
        `\`history_gate\` is a range of the load, ${ctx.dimLabel(dim)} for \`history-load: ${load}\``,
        g.stmt.expr.range,
      );
      return null;
    }
    if (g.q.si < 0) {
      ctx.diag('error', 'absurd-value', '`history_gate` must not be negative', g.stmt.expr.range);
      return null;
    }
    gate = g.q.si / Math.abs(sc.q.si);
  }
  const colText = ctx.options.get('history-column')?.value.text;
  const column = colText === undefined ? undefined : /^\d+$/.test(colText) ? Number(colText) : colText;
  return {
    path,
    ...(column !== undefined ? { column } : {}),
    load,
    base: HISTORY_BASE[load],
    scale: sc.q.si,
    gate,
    range,
    dim,
  };
}

/** Per-cycle notes of the criterion, summed up and reported once per code. */
class NoteTally {
  private readonly notes = new Map<string, { severity: Severity; message: string; count: number }>();
  add(notes: MethodNote[] | undefined, count: number): void {
    if (!notes) return;
    for (const n of notes) {
      const sev = n.severity ?? 'warning';
      if (sev !== 'error' && sev !== 'warning') continue;
      const t = this.notes.get(n.code);
      if (t) t.count += count;
      else this.notes.set(n.code, { severity: sev, message: n.message, count });
    }
  }
  report(ctx: CheckContext, range: Range, what: string): void {
    for (const [code, t] of this.notes)
      ctx.diag(t.severity, code, `${formatNumber(t.count, 6)} ${what}: ${t.message}`, range);
  }
}

function historyPass(
  ctx: CheckContext,
  h: HistorySetup,
  sec: DamageSection,
  ev: Evaluation,
): DamagePass | null {
  const reader = ctx.histories;
  if (!reader) {
    ctx.diag(
      'error',
      'history-unavailable',
      'history files cannot be read here: evaluate the note from the editor or the command line, which read files inside the workspace',
      h.range,
    );
    return null;
  }
  // Pass 1: extremes (they bound every range and mean) and the file's problems.
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  const scan = new HistoryCsvReader({
    ...(h.column !== undefined ? { column: h.column } : {}),
    onValue: (x) => {
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    },
  });
  const r1 = reader.read(h.path, (chunk) => scan.feed(chunk));
  if (!r1.ok) {
    ctx.diag('error', r1.code, r1.message, h.range);
    return null;
  }
  scan.end();
  reportHistoryIssues(ctx, scan.issues, h.range, h.path);
  if (scan.fatal || scan.valueCount < 3) return null;
  if (scan.badRowCount > 0) {
    // A skipped row may hold the largest load: no damage from what is left.
    const n = scan.badRowCount;
    ctx.diag(
      'information',
      'results-withheld',
      `no damage until the ${n} row${n === 1 ? '' : 's'} of \`${h.path}\` without a finite number ${n === 1 ? 'is' : 'are'} fixed: a lost sample may be the largest load of the history`,
      h.range,
    );
    return null;
  }

  // Notch stresses per 1.0 of the file (linear in the load), at each point of the section.
  const absScale = Math.abs(h.scale);
  const shear = sec.route === 'shear';
  const unitLoad = (a: number, m: number) => ({ [h.base]: { a, m } });
  const perA = notchEquivalent(sec, unitLoad(1, 0));
  const perM = notchEquivalent(sec, unitLoad(0, 1));
  const two = sec.points.length > 1;
  // Overflow of the scaled history, with the largest per-unit stresses of the section's points.
  const cA = Math.max(...perA.map((x) => Math.abs(x.sa))) * absScale;
  const cM = Math.max(...perM.map((x) => Math.abs(x.sm) + Math.abs(x.sa))) * Math.abs(h.scale);
  const bad = scaledSpreadProblem(lo, hi, cA, cM, h.path);
  if (bad) {
    const scaleRange = ctx.stated.get('history_scale')?.stmt.expr.range;
    ctx.diag('error', bad.code, bad.message, bad.on === 'scale' ? (scaleRange ?? h.range) : h.range);
    return null;
  }
  recordUnitStresses(ctx, h, sec, perA[0].sa * absScale, perM[0].sm * h.scale, two);

  // Pass 2: count once, sum at every point.
  const maxRange = hi - lo;
  const hist = new RangeMeanHistogram(histogramLimitsFor(lo, hi, HISTOGRAM_BINS));
  const states = sec.points.map((_, k) => ({
    cA: perA[k].sa * absScale,
    cM: perM[k].sm * h.scale,
    // Amplitude per unit mean: nonzero where a mean load alternates at the point (the moment on
    // a rotating shaft is fully reversed at every fibre, unitLoadStresses.ts).
    cMa: perM[k].sa * absScale,
    acc: new MinerAccumulator(ev.line, ev.rule),
    bins: Array.from({ length: RANGE_BINS }, () => ({
      acc: new MinerAccumulator(ev.line, ev.rule),
      count: 0,
      sarMax: 0,
    })),
    tally: new NoteTally(),
    staticCount: 0,
  }));
  const onCycle = (range: number, mean: number, count: number): void => {
    hist.add(range, mean, count);
    let i = maxRange > 0 ? Math.floor((range / maxRange) * RANGE_BINS) : 0;
    if (i >= RANGE_BINS) i = RANGE_BINS - 1;
    for (const st of states) {
      const sa = st.cA * range * 0.5 + st.cMa * Math.abs(mean);
      const sm = shear ? Math.abs(st.cM * mean) : st.cM * mean;
      const eq = ev.model.equivalentReversed(sa, sm, ev.set);
      st.tally.add(eq.notes, count);
      if (eq.infinite) {
        st.staticCount += count;
        continue;
      }
      const sar = eq.value;
      st.acc.add(sar, count);
      const bin = st.bins[i];
      bin.acc.add(sar, count);
      bin.count += count;
      if (sar > bin.sarMax) bin.sarMax = sar;
    }
  };
  const counter = new RainflowCounter({ gate: h.gate, onCycle });
  const csv = new HistoryCsvReader({
    ...(h.column !== undefined ? { column: h.column } : {}),
    onValue: (x) => counter.push(x),
  });
  const r2 = reader.read(h.path, (chunk) => csv.feed(chunk));
  if (!r2.ok) {
    ctx.diag('error', r2.code, r2.message, h.range);
    return null;
  }
  csv.end();
  const rf = counter.finish();
  for (const n of rf.notes)
    if (n.code !== 'history-too-few-points') ctx.diag(n.severity ?? 'warning', n.code, n.message, h.range);
  if (rf.overflowAt > 0) return null; // the count stopped (residue limit): no damage from part of it
  // The governing point: the one with more cycles that fail statically, then the larger damage.
  let gov = 0;
  states.forEach((st, k) => {
    const b = states[gov];
    if (
      st.staticCount > b.staticCount ||
      (st.staticCount === b.staticCount && st.acc.result(0).D > b.acc.result(0).D)
    )
      gov = k;
  });
  const g = states[gov];
  const at = two ? ` at ${sec.points[gov].words}` : '';
  g.tally.report(ctx, ev.critRange, `counted cycles${at}`);
  if (g.staticCount > 0)
    ctx.diag(
      'error',
      'static-failure',
      `${formatNumber(g.staticCount, 6)} counted cycles reach the static strength${at} (mean stress at or beyond the criterion's limit): the part fails statically; they are left out of D_sum`,
      h.range,
    );

  // Damage per range bin, at the governing point.
  const D = g.acc.result(0).D;
  const loadDisp = (si: number) => toDisplayNumber(si, h.dim, ctx.system).value;
  const unit = unitText(h.dim, ctx);
  const rows: string[][] = [];
  const points: SnData['points'] = [];
  g.bins.forEach((b, i) => {
    if (b.count === 0) return;
    const from = loadDisp((absScale * maxRange * i) / RANGE_BINS);
    const to = loadDisp((absScale * maxRange * (i + 1)) / RANGE_BINS);
    const d = b.acc.result(0).D;
    const life = cyclesToFailure(b.sarMax, ev.line, ev.rule);
    rows.push([
      `${formatNumber(from, 4)} to ${formatNumber(to, 4)}`,
      formatNumber(b.count, 6),
      ctx.display(b.sarMax, 'stress'),
      life.infinite ? 'infinite' : formatNumber(life.value, 4),
      formatNumber(d, 4),
      D > 0 ? `${((100 * d) / D).toFixed(1)} %` : '0 %',
    ]);
    points.push({
      label: `range ${formatNumber(from, 4)} to ${formatNumber(to, 4)} ${unit}`,
      sigma_ar: b.sarMax,
      N: life.infinite ? null : life.value,
      count: b.count,
    });
  });

  // Histogram in the load's display unit (a negative scale flips the mean axis).
  let meanEdges = hist.meanEdges().map((x) => loadDisp(h.scale * x));
  let counts = hist.matrix();
  if (h.scale < 0) {
    meanEdges = meanEdges.reverse();
    counts = counts.map((row) => row.reverse());
  }
  return {
    acc: g.acc,
    cycles: rf.totalCycles,
    ...(two ? { pointDamage: states.map((st) => st.acc.result(0).D), gov } : {}),
    tables: [
      {
        title: `Damage per range bin of \`${h.path}\`${at} (${RANGE_BINS} equal bins of the load range; sigma_ar at the bin's largest cycle)`,
        columns: [
          `range (${unit})`,
          'cycles',
          'sigma_ar max',
          'N at sigma_ar max',
          'damage',
          'share of D_sum',
        ],
        rows,
      },
    ],
    points,
    histogram: {
      rangeEdges: hist.rangeEdges().map((x) => loadDisp(absScale * x)),
      meanEdges,
      counts,
      unit,
    },
    inputs: ['history_scale', h.base === 'T' ? 'tau_a_eq_unit' : 'sigma_a_eq_unit'],
  };
}

/** The derivation of the stresses of 1.0 in the file, for the hover and the report. */
function recordUnitStresses(
  ctx: CheckContext,
  h: HistorySetup,
  sec: DamageSection,
  cA: number,
  cM: number,
  two: boolean,
) {
  const shear = sec.route === 'shear';
  const s = shear ? 'tau' : 'sigma';
  const per = sec.perUnit[h.base];
  const nominalFormula =
    h.base === 'sigma'
      ? `${s}_unit = history_scale`
      : (per?.formula ?? '').replace(/\b(M|T|F|p)\b/g, 'history_scale').replace(/^\s*\S+\s*=/, `${s}_unit =`);
  const nominal = (per?.value ?? 0) * Math.abs(h.scale);
  const inputs = ['history_scale', ...(sec.inputs[h.base] ?? [])];
  ctx.result(`${s}_unit`, computed(nominal, nominalFormula, per?.source ?? 'the note'), inputs, {
    dim: 'stress',
    range: h.range,
    meaning: `nominal ${h.base === 'p' ? 'hoop ' : ''}stress of 1.0 in the history file (history_scale through the section)`,
  });
  const notch: Record<typeof sec.route, [string, string, string[]]> = {
    shear: ['tau_a_eq_unit = Kfs * tau_unit', 'tau_m_eq_unit = Kfs * tau_unit (magnitude)', ['Kfs']],
    'shell-plain': [
      'sigma_a_eq_unit = sqrt(1 - r + r^2) * sigma_unit / 0.85, r = sigma_long / sigma_hoop',
      'sigma_m_eq_unit = sqrt(1 - r + r^2) * sigma_unit',
      [],
    ],
    'shell-cutout': [
      'sigma_a_eq_unit = Kf_ax * sigma_unit / 0.85',
      'sigma_m_eq_unit = Kf_ax * sigma_unit',
      ['Kf_ax'],
    ],
    combined:
      h.base === 'F'
        ? ['sigma_a_eq_unit = Kf_ax * sigma_unit / 0.85', 'sigma_m_eq_unit = Kf_ax * sigma_unit', ['Kf_ax']]
        : ['sigma_a_eq_unit = Kf * sigma_unit', 'sigma_m_eq_unit = Kf * sigma_unit', ['Kf']],
  };
  const [fa, fmOne, ks] = notch[sec.route];
  const fm = two ? `${fmOne}  (at +M c/I; at -M c/I the same with the opposite sign)` : fmOne;
  const src =
    "the check's combined-loading rule (Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-14, Eqs. 6-66, 6-67) applied to 1.0 of the file; loads are linear, so each cycle's stresses are these times its half range and mean";
  ctx.result(`${s}_a_eq_unit`, computed(cA, fa, src), [`${s}_unit`, ...ks], {
    dim: 'stress',
    range: h.range,
    meaning: 'equivalent alternating stress at the notch per 1.0 of half range in the file',
  });
  ctx.result(`${s}_m_eq_unit`, computed(cM, fm, src), [`${s}_unit`, ...ks], {
    dim: 'stress',
    range: h.range,
    meaning: 'equivalent mean stress at the notch per 1.0 of mean in the file',
  });
}

function spectrumPass(
  ctx: CheckContext,
  levels: SpectrumLevel[],
  sec: DamageSection,
  ev: Evaluation,
): DamagePass | null {
  const two = sec.points.length > 1;
  const states = sec.points.map(() => ({
    acc: new MinerAccumulator(ev.line, ev.rule),
    rows: [] as Array<{ cells: string[]; d: number }>,
    points: [] as SnData['points'],
    D: 0,
    notes: [] as Array<{ notes: MethodNote[]; range: Range }>,
  }));
  let cycles = 0;
  let failed = false;
  for (const lv of levels) {
    const at = notchEquivalent(sec, lv.loads);
    cycles += lv.n;
    at.forEach(({ sa, sm }, k) => {
      const st = states[k];
      const eq = ev.model.equivalentReversed(sa, sm, ev.set);
      if (eq.notes) st.notes.push({ notes: eq.notes, range: lv.stmt.whole });
      if (eq.infinite) {
        ctx.diag(
          'error',
          'static-failure',
          `this level's mean stress reaches the criterion's static limit${two ? ` at ${sec.points[k].words}` : ''}: the part fails statically`,
          lv.stmt.whole,
        );
        failed = true;
        return;
      }
      const sar = eq.value;
      st.acc.add(sar, lv.n);
      const life = cyclesToFailure(sar, ev.line, ev.rule);
      const d = life.infinite || !(life.value > 0) ? 0 : lv.n / life.value;
      st.D += d;
      st.rows.push({
        cells: [
          String(lv.stmt.line + 1),
          lv.text,
          ctx.display(sa, 'stress'),
          ctx.display(sm, 'stress'),
          ctx.display(sar, 'stress'),
          formatNumber(lv.n, 6),
          life.infinite ? 'infinite' : formatNumber(life.value, 4),
          formatNumber(d, 4),
        ],
        d,
      });
      st.points.push({
        label: `level on line ${lv.stmt.line + 1}`,
        sigma_ar: sar,
        N: life.infinite ? null : life.value,
        count: lv.n,
      });
    });
  }
  if (failed) return null;
  // The governing point: the larger damage; the criterion's notes are reported for it.
  const gov = governingIndex(
    states.map((st) => st.acc.result(0).D),
    'max',
  );
  const g = states[gov];
  for (const { notes, range } of g.notes)
    for (const n of notes) {
      const sev = n.severity ?? 'warning';
      if (sev === 'error' || sev === 'warning') ctx.diag(sev, n.code, n.message, range);
    }
  const D = g.D;
  const shear = sec.route === 'shear';
  return {
    acc: g.acc,
    cycles,
    ...(two ? { pointDamage: states.map((st) => st.acc.result(0).D), gov } : {}),
    tables: [
      {
        title: two ? `Damage per spectrum level at ${sec.points[gov].words}` : 'Damage per spectrum level',
        columns: [
          'line',
          'level',
          shear ? 'tau_a_eq' : 'sigma_a_eq',
          shear ? 'tau_m_eq' : 'sigma_m_eq',
          'sigma_ar',
          'n',
          'N',
          'damage',
          'share of D_sum',
        ],
        rows: g.rows.map((r) => [...r.cells, D > 0 ? `${((100 * r.d) / D).toFixed(1)} %` : '0 %']),
      },
    ],
    points: g.points,
    inputs: [],
  };
}

function recordDamage(
  ctx: CheckContext,
  sec: DamageSection,
  res: MinerResult,
  pass: DamagePass,
  ev: Evaluation,
  inputs: string[],
  range: Range,
): void {
  const shown = res.contributors.slice(0, CONTRIBUTORS_SHOWN).filter((c) => c.damage > 0);
  const notes: MethodNote[] = [...(res.notes ?? [])];
  if (shown.length > 0) {
    const text = shown
      .map((c) => {
        const band =
          c.sigma_ar_min < c.sigma_ar * 0.9995
            ? `${formatNumber(c.sigma_ar_min / MPA, 4)} to ${ctx.display(c.sigma_ar, 'stress')}`
            : ctx.display(c.sigma_ar, 'stress');
        return `sigma_ar ${band}: ${formatNumber(c.count, 6)} cycle${c.count === 1 ? '' : 's'}, ${formatNumber(c.damage, 3)} (${(c.share * 100).toFixed(1)} % of D_sum)`;
      })
      .join('; ');
    notes.push({ code: 'contributors', severity: 'information', message: `largest contributors: ${text}` });
  }
  const minerStated = ctx.options.has('miner');
  if (pass.pointDamage && pass.gov !== undefined) {
    const pts = sec.points;
    pts.forEach((p, k) => {
      ctx.result(
        pointName('D_sum', p),
        computed(
          pass.pointDamage![k],
          `${pointName('D_sum', p)} = sum of n_i / N_i at this fibre`,
          res.source,
        ),
        inputs,
        { dim: 'one', range, meaning: `Miner damage of one pass at ${p.words}` },
      );
    });
    notes.push(
      governingNote(
        ctx,
        'D_sum',
        pts,
        pass.gov,
        pts.map((p) => ctx.values[pointName('D_sum', p)]?.display ?? ''),
      ),
    );
  }
  ctx.result('D_sum', { ...res, notes }, inputs, {
    dim: 'one',
    meaning: 'Miner damage of one pass of the history or spectrum',
    range,
    ...(minerStated
      ? {}
      : { assumption: "no `miner:` rule stated: Miner's original rule (cycles below Se do no damage)" }),
  });
  ctx.result(
    'cycles_counted',
    computed(
      pass.cycles,
      pass.histogram
        ? 'cycles_counted = full cycles + half cycles / 2 (rainflow)'
        : 'cycles_counted = sum of n over the levels',
      pass.histogram ? RAINFLOW_SOURCE : 'sum of the spectrum levels',
    ),
    [],
    { range },
  );
  ctx.result('repeats', repeatsToFailure(res.D), ['D_sum'], { range });
  ctx.result(
    'sigma_ar_max',
    computed(
      res.sigma_ar_max,
      'sigma_ar_max = largest equivalent fully reversed stress of the cycles',
      ev.model.source,
    ),
    [],
    { dim: 'stress', range, meaning: 'largest equivalent fully reversed stress of the history or spectrum' },
  );
  const neq: Computed = equivalentCycles(res.D, res.sigma_ar_max, ev.line, ev.rule);
  ctx.result('N_eq', neq, ['D_sum', 'sigma_ar_max'], { range });
}
