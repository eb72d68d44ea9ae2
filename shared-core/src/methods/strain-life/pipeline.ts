/**
 * `method: strain-life`: the local strain approach at a notch whose root yields. The nominal
 * (net-section) stress at the notch and the elastic stress concentration `Kt` (or a stated `Kf`)
 * give the notch-root stress and strain by Neuber's rule or Glinka's energy rule on the cyclic
 * stress-strain curve (first loading) and the doubled Masing curve (reversals), with material
 * memory; the closed hysteresis loops go to the strain-life curve (Coffin-Manson-Basquin, Morrow,
 * Smith-Watson-Topper) and, for a spectrum or history, to the Palmgren-Miner sum. The computations
 * are those of `strainlife/` (their sources there); this file reads the check and records results.
 *
 * - Material: `E`, `K_prime`, `n_prime`, `sigma_f_prime`, `b_basquin`, `eps_f_prime`, `c_coffin`
 *   stated or from a library entry with cyclic constants (`material:`), every stated value winning;
 *   `K_prime`/`n_prime` missing: compatibility n' = b/c, K' = sigma_f'/eps_f'^n' (warning); strain-life
 *   constants missing: an error, unless `estimate:` names a published estimate from `Sut` (and `RA`
 *   or `HB`) and `E` (warning naming the estimate and its scatter).
 * - Loads: constant amplitude `sigma_max`/`sigma_min` or `sigma_a`/`sigma_m` (nominal stresses at
 *   the notch); `spectrum:` lines of the same names with `n`; or a `history:` of the nominal stress
 *   (`history_scale`, `history_gate`), reduced to its turning points while it is read.
 * - Results: `eps_a`, `sigma_max_local`, `sigma_min_local`, `sigma_m_local` (governing loop),
 *   `N_f` (cycles), `two_N_t` (transition life, reversals), `D_sum` and `repeats` (spectrum,
 *   history; constant amplitude with `N`), `cycles_counted` (history).
 *
 * The core's notes of the whole chain are merged there (each code once); here each becomes one
 * diagnostic on the line it is about, and the information notes ride on `N_f` alone.
 */

import { reportHistoryIssues } from '../../checks/historyIssues';
import { statedFamily } from '../../checks/material';
import { readSpectrumLevels } from '../../checks/spectrumLevels';
import { type Computed, computed, type MethodNote, type Term } from '../../computed';
import type { CheckContext } from '../../context/checkContext';
import type { Range, StrainLifeData } from '../../context/types';
import { nameInfo } from '../../context/vocabulary';
import { FAMILIES, type MaterialClass } from '../../materials';
import { HistoryCsvReader, TurningPointDetector } from '../../rainflow';
import {
  compatibleCyclicCurve,
  constantAmplitudeStrainLife,
  type EstimateClass,
  type EstimateMethod,
  estimateConstants,
  historyStrainLife,
  type MeanStressModel,
  masingStrainRange,
  modelFormula,
  type NotchFactorKind,
  type NotchRule,
  type NotchStrainLifeInput,
  type NotchStrainLifeResult,
  pathCurve,
  type SpectrumLevel,
  type StrainLifeMaterial,
  spectrumStrainLife,
  strainAmplitudeKernel,
} from '../../strainlife';
import { sameVector, vectorOf } from '../../units/dimensions';
import type { MethodExtras } from '../types';

/** The words of `mean-stress:` and the core's model each stands for (`morrow` is Dowling's Morrow: both terms). */
export const MEAN_STRESS_WORDS: Readonly<Record<string, MeanStressModel>> = Object.freeze({
  none: 'none',
  'morrow-elastic': 'morrow-elastic',
  'morrow-full': 'morrow-full',
  morrow: 'morrow-full',
  swt: 'swt',
});

/** Turning points of a history kept for the local path: 2^17 (the trace of so many takes about 1.5 s and 150 MB). */
export const HISTORY_TURNING_POINTS_MAX = 131_072;
/** Path points kept for drawing the loops. */
const DRAWN_PATH_POINTS = 160;
/** Samples per drawn branch. */
const DRAWN_PER_SEGMENT = 12;
/** Steps of the local path shown with eps_a. */
const STEPS_SHOWN = 24;
/** Points of each branch of the drawn governing loop. */
const LOOP_POINTS = 24;
/** Points of the drawn strain-life curve (1 to 1e8 reversals). */
const CURVE_POINTS = 49;

const CONSTANTS = ['sigma_f_prime', 'b_basquin', 'eps_f_prime', 'c_coffin'] as const;
const CURVE = ['K_prime', 'n_prime'] as const;

/** Codes whose note is about the cyclic curve, the strain-life constants, the mean-stress model, the history. */
const CURVE_CODES = new Set(['cyclic-constants-invalid', 'cyclic-constants-range']);
const CONSTANT_CODES = new Set(['strain-life-constants-invalid', 'strain-life-constants-range']);
const MODEL_CODES = new Set(['swt-no-tension', 'mean-stress-ignored', 'compressive-mean']);
const HISTORY_CODES = new Set(['history-non-finite', 'history-too-few-points', 'history-no-cycles']);
/** How the core's messages name each constant, in the order they name them. */
const NAMED_CONSTANTS: ReadonlyArray<[RegExp, string]> = [
  [/^(c must|c = )/, 'c_coffin'],
  [/^(b must|b = )/, 'b_basquin'],
  [/^sigma_f'/, 'sigma_f_prime'],
  [/^eps_f'/, 'eps_f_prime'],
  [/^K'/, 'K_prime'],
  [/^n'/, 'n_prime'],
  [/^E must/, 'E'],
];

/** Reported by this file itself (on the Kt/Kf line, with what the check states). */
const OWN_CODES = new Set(['notch-factor']);

interface Loading {
  kind: 'constant' | 'spectrum' | 'history';
  range: Range;
  inputs: string[];
  S_max?: number;
  S_min?: number;
  levels?: SpectrumLevel[];
  history?: Float64Array;
}

interface MaterialRead {
  material: StrainLifeMaterial;
  Sy?: number;
  /** Names the results' derivations list as inputs. */
  inputs: string[];
}

function unitOf(ctx: CheckContext): string {
  return ctx.system === 'US' ? 'ksi' : 'MPa';
}

/** Whether the statement of `name` was rejected with an error (so that "missing" would repeat it). */
function rejected(ctx: CheckContext, name: string): boolean {
  return ctx.diagnostics.some(
    (d) =>
      d.severity === 'error' && (d.message.startsWith(`\`${name}\``) || d.message.startsWith(`${name}:`)),
  );
}

function fmt(x: number): string {
  return String(Number(x.toPrecision(4)));
}

function methodLine(ctx: CheckContext): Range {
  return ctx.optionRange('method') ?? ctx.header;
}

/** The estimate class of the check's material (library class, or the family's). */
function estimateClass(cls: MaterialClass): EstimateClass | undefined {
  switch (cls) {
    case 'steel':
    case 'stainless':
    case 'cast-iron':
    case 'titanium':
      return cls;
    case 'aluminium':
    case 'aluminium-cast':
      return 'aluminium';
    default:
      return undefined;
  }
}

/** The cyclic curve and the strain-life constants: stated, library, compatibility or estimate. */
function readMaterial(ctx: CheckContext): MaterialRead | null {
  const matRange = ctx.optionRange('material');
  const named = statedFamily(ctx);
  const lib = named?.material;
  const libStrength = lib ? `${lib.name} (${lib.condition}): ${lib.source}` : '';
  const Sut = ctx.has('Sut')
    ? ctx.input('Sut')
    : lib
      ? ctx.library('Sut', lib.Sut, libStrength, matRange)
      : undefined;
  const SyRead = ctx.has('Sy')
    ? ctx.input('Sy')
    : lib
      ? ctx.library('Sy', lib.Sy, libStrength, matRange)
      : undefined;
  const cyc = lib?.cyclic;
  const libSource = lib && cyc ? `${lib.name} (${lib.condition}): ${cyc.source}` : '';
  const get = (name: string, libValue: number | undefined): number | undefined => {
    if (ctx.has(name)) return ctx.input(name);
    if (libValue !== undefined && cyc) return ctx.library(name, libValue, libSource, matRange);
    return undefined;
  };
  let E = get('E', cyc?.E);
  if (E === undefined && !ctx.has('E') && lib && !cyc) E = ctx.library('E', lib.E, libStrength, matRange);
  const stated = {
    sigma_f_prime: get('sigma_f_prime', cyc?.sigma_f_prime),
    b_basquin: get('b_basquin', cyc?.b),
    eps_f_prime: get('eps_f_prime', cyc?.eps_f_prime),
    c_coffin: get('c_coffin', cyc?.c),
    K_prime: get('K_prime', cyc?.K_prime),
    n_prime: get('n_prime', cyc?.n_prime),
  };
  const estimateStmt = ctx.options.get('estimate');
  const estimateWord = ctx.option('estimate') as EstimateMethod | undefined;
  const missing: string[] = [
    ...(E === undefined ? ['E'] : []),
    ...CONSTANTS.filter((n) => stated[n] === undefined),
  ];
  if (E === undefined && (missing.length === 1 || estimateWord !== undefined)) {
    if (!rejected(ctx, 'E'))
      ctx.diag(
        'error',
        'missing-cyclic-constants',
        "a strain-life check needs Young's modulus `E` of the strain-life data (with the cyclic and strain-life constants, or a `material:` that has them)",
        matRange ?? methodLine(ctx),
        [
          ctx.insertFix(
            'State `E = 200 GPa` (steel)',
            `E = ${ctx.system === 'US' ? '29000 ksi' : '200 GPa'}`,
          ),
        ],
      );
    return null;
  }
  const inputs = ['E', ...CONSTANTS, ...CURVE];
  let sf = stated.sigma_f_prime;
  let b = stated.b_basquin;
  let ef = stated.eps_f_prime;
  let c = stated.c_coffin;
  let K = stated.K_prime;
  let n = stated.n_prime;
  if (estimateWord !== undefined && missing.length === 0 && K !== undefined && n !== undefined)
    ctx.diag(
      'warning',
      'ignored-input',
      `every constant is stated (or from the library): \`estimate: ${estimateWord}\` is not used`,
      estimateStmt!.whole,
    );
  if (missing.length > 0 || (estimateWord !== undefined && (K === undefined || n === undefined))) {
    if (estimateWord === undefined) {
      if (estimateStmt) return null; // a misspelt word: already diagnosed
      if (missing.some((m) => rejected(ctx, m))) return null;
      const have = lib && !cyc ? ` (\`material: ${lib.key}\` has no cyclic constants in the library)` : '';
      ctx.diag(
        'error',
        'missing-cyclic-constants',
        `missing strain-life constants ${missing.map((m) => `\`${m}\``).join(', ')}${have}: state the measured constants (e.g. from Dowling's or Bannantine's tables of cyclic properties), a \`material:\` that has them, or \`estimate: uniform-material-law | modified-universal-slopes | hardness\` with \`Sut\` (an estimate, with its scatter)`,
        matRange ?? methodLine(ctx),
        (['uniform-material-law', 'hardness'] as const).map((w, i) => ({
          ...ctx.insertFix(`State \`estimate: ${w}\``, `estimate: ${w}`),
          preferred: i === 0,
        })),
      );
      return null;
    }
    const range = estimateStmt!.whole;
    // The hardness method works from HB alone (Sut only converts to HB when HB is missing).
    if (Sut === undefined && !(estimateWord === 'hardness' && ctx.has('HB'))) {
      if (rejected(ctx, 'Sut')) return null;
      ctx.diag(
        'error',
        'missing-strength',
        `\`estimate: ${estimateWord}\` works from the ultimate strength: state \`Sut = ...\` (and \`RA\` or \`HB\` where the estimate needs it) or a \`material:\``,
        range,
      );
      return null;
    }
    const family = named?.family ?? 'steel';
    const cls = lib ? lib.class : FAMILIES[family].cls;
    const ec = estimateClass(cls);
    if (ec === undefined) {
      ctx.diag(
        'error',
        'estimate-not-applicable',
        `no published strain-life estimate covers this material family (${family}): state measured constants`,
        range,
      );
      return null;
    }
    if (!named)
      ctx.diag(
        'warning',
        'assumed-steel',
        `no \`material-family:\` (or \`material:\`): the estimate takes the steel set; an aluminium or titanium alloy has its own: state what the material is`,
        range,
        [
          { ...ctx.insertFix('State `material-family: steel`', 'material-family: steel'), preferred: true },
          {
            ...ctx.insertFix(
              'State `material-family: aluminium-wrought`',
              'material-family: aluminium-wrought',
            ),
            preferred: false,
          },
        ],
      );
    const est = estimateConstants(estimateWord, {
      Sut,
      E: E as number,
      RA: ctx.input('RA'),
      HB: ctx.input('HB'),
      materialClass: ec,
    });
    const estInputs = [
      ...(Sut !== undefined ? ['Sut'] : []),
      'E',
      ...(ctx.has('RA') ? ['RA'] : []),
      ...(ctx.has('HB') ? ['HB'] : []),
    ];
    let failed = false;
    for (const note of est.notes) {
      const sev = note.severity ?? 'warning';
      if (sev === 'error') failed = true;
      if (sev === 'error' || sev === 'warning') ctx.diag(sev, note.code, note.message, range);
    }
    if (failed || !est.material) return null;
    const quiet = (x: Computed): Computed => ({ ...x, notes: [] });
    const put = (name: string, x: Computed) =>
      ctx.result(name, quiet(x), estInputs, {
        range,
        origin: 'computed',
        meaning: `${nameInfo(name)?.meaning ?? name} (estimated: ${estimateWord})`,
      }) ?? undefined;
    sf = sf ?? put('sigma_f_prime', est.sigma_f_prime);
    b = b ?? put('b_basquin', est.b);
    ef = ef ?? put('eps_f_prime', est.eps_f_prime);
    c = c ?? put('c_coffin', est.c);
    K = K ?? put('K_prime', est.K_prime);
    n = n ?? put('n_prime', est.n_prime);
  }
  if (E === undefined || sf === undefined || b === undefined || ef === undefined || c === undefined)
    return null;
  if ((K === undefined) !== (n === undefined)) {
    const have = K === undefined ? 'n_prime' : 'K_prime';
    const lack = K === undefined ? 'K_prime' : 'n_prime';
    ctx.diag(
      'error',
      'missing-cyclic-constants',
      `state \`${lack}\` with \`${have}\`: the cyclic curve needs both of one measured set (or neither: then both follow from the strain-life constants by compatibility)`,
      ctx.rangeOf(have),
    );
    return null;
  }
  if (K === undefined || n === undefined) {
    const cc = compatibleCyclicCurve({ E, sigma_f_prime: sf, b, eps_f_prime: ef, c });
    const bad = (cc.K_prime.notes ?? []).some((x) => x.severity === 'error');
    const where = ctx.has('c_coffin') ? ctx.rangeOf('c_coffin') : (matRange ?? methodLine(ctx));
    for (const note of cc.K_prime.notes ?? [])
      ctx.diag(note.severity ?? 'warning', note.code, note.message, where);
    if (bad) return null;
    const q = (x: Computed): Computed => ({ ...x, notes: [] });
    const cInputs = ['sigma_f_prime', 'b_basquin', 'eps_f_prime', 'c_coffin'];
    if (n === undefined) n = ctx.result('n_prime', q(cc.n_prime), cInputs, { range: where }) ?? undefined;
    if (K === undefined) K = ctx.result('K_prime', q(cc.K_prime), cInputs, { range: where }) ?? undefined;
    if (K === undefined || n === undefined) return null;
  }
  const Sy = SyRead;
  return {
    material: { E, K_prime: K, n_prime: n, sigma_f_prime: sf, b, eps_f_prime: ef, c },
    ...(Sy !== undefined && Sy > 0 ? { Sy } : {}),
    inputs,
  };
}

interface NotchRead {
  K: number;
  factor: NotchFactorKind;
  range: Range;
  name: 'Kt' | 'Kf';
}

function readNotch(ctx: CheckContext, rule: NotchRule): NotchRead | null {
  const ruleName = rule === 'glinka' ? "Glinka's rule" : "Neuber's rule";
  if (ctx.has('Kf')) {
    const K = ctx.input('Kf');
    if (K === undefined) return null;
    if (ctx.has('Kt'))
      ctx.replaced('Kf', ['Kt'], `the stated Kf replaces Kt in ${ruleName} (the factor used at the notch)`);
    ctx.replaced('Kf', ['r', 'q']);
    ctx.diag(
      'information',
      'notch-factor',
      `${ruleName} with the stated fatigue notch factor Kf = ${fmt(K)} in place of Kt (Topper, Wetzel & Morrow 1969): the local stress and strain are fatigue-effective values, not the elastic-plastic state at the notch root`,
      ctx.rangeOf('Kf'),
    );
    return { K, factor: 'Kf', range: ctx.rangeOf('Kf'), name: 'Kf' };
  }
  if (ctx.has('Kt')) {
    const K = ctx.input('Kt');
    if (K === undefined) return null;
    const r = ctx.has('r');
    if (r) ctx.replaced('Kt', ['r', 'q'], `${ruleName} takes the elastic Kt itself: no notch sensitivity`);
    ctx.diag(
      'information',
      'notch-factor',
      r
        ? `${ruleName} with the elastic stress concentration Kt = ${fmt(K)}, the factor the rule is derived for; \`r\` is not used (no notch sensitivity enters the rule)`
        : `${ruleName} with the elastic stress concentration Kt = ${fmt(K)} (no notch root radius \`r\` stated: Kt is taken as the elastic factor of this notch, not a fatigue notch factor Kf); state \`Kf\` instead to use a fatigue-effective local strain`,
      ctx.rangeOf('Kt'),
    );
    return { K, factor: 'Kt', range: ctx.rangeOf('Kt'), name: 'Kt' };
  }
  if (!rejected(ctx, 'Kt') && !rejected(ctx, 'Kf'))
    ctx.diag(
      'error',
      'missing-input',
      'a strain-life check needs the elastic stress concentration `Kt` of the notch for the nominal stress (Neuber and Glinka are derived for it; `Kt = 1` for a smooth part), or a stated `Kf`; a stress-life check of the same section gives it as `other_check.Kt`',
      methodLine(ctx),
      [ctx.insertFix('State `Kt = 1` (no notch)', 'Kt = 1')],
    );
  return null;
}

/** The constant-amplitude cycle from `sigma_max`/`sigma_min` or `sigma_a`/`sigma_m`. */
function readCycle(ctx: CheckContext): Loading | null {
  const maxMin = ctx.has('sigma_max') || ctx.has('sigma_min');
  const aM = ctx.has('sigma_a') || ctx.has('sigma_m');
  if (maxMin && aM) {
    ctx.diag(
      'error',
      'load-twice',
      'state the nominal cycle either as `sigma_max`/`sigma_min` or as `sigma_a`/`sigma_m`, not both',
      ctx.rangeOf(ctx.has('sigma_a') ? 'sigma_a' : 'sigma_m'),
    );
    return null;
  }
  if (maxMin) {
    const max = ctx.input('sigma_max');
    const min = ctx.input('sigma_min');
    if (!ctx.has('sigma_max') || !ctx.has('sigma_min')) {
      const missing = ctx.has('sigma_max') ? 'sigma_min' : 'sigma_max';
      ctx.diag(
        'error',
        'missing-input',
        `state \`${missing}\` too: the nominal cycle runs between \`sigma_max\` and \`sigma_min\` (e.g. \`sigma_min = 0 ${unitOf(ctx)}\` for a pulsating load, \`-sigma_max\` for a reversed one)`,
        ctx.rangeOf(ctx.has('sigma_max') ? 'sigma_max' : 'sigma_min'),
      );
      return null;
    }
    if (max === undefined || min === undefined) return null;
    if (max < min)
      ctx.diag(
        'warning',
        'max-below-min',
        '`sigma_max` is below `sigma_min`: the two are read as the extremes of the cycle',
        ctx.rangeOf('sigma_max'),
      );
    return {
      kind: 'constant',
      range: ctx.rangeOf('sigma_max'),
      inputs: ['sigma_max', 'sigma_min'],
      S_max: Math.max(max, min),
      S_min: Math.min(max, min),
    };
  }
  if (aM) {
    if (!ctx.has('sigma_a')) {
      ctx.diag(
        'error',
        'missing-input',
        'state the nominal stress amplitude `sigma_a` with the mean `sigma_m`',
        ctx.rangeOf('sigma_m'),
      );
      return null;
    }
    const a = ctx.input('sigma_a');
    let m = ctx.input('sigma_m');
    if (a === undefined) return null;
    if (!ctx.has('sigma_m')) {
      m = 0;
      ctx.diag(
        'information',
        'defaulted-load',
        '`sigma_m` not stated: the nominal cycle is taken fully reversed (mean 0)',
        ctx.rangeOf('sigma_a'),
        [ctx.insertFix(`State \`sigma_m = 0 ${unitOf(ctx)}\``, `sigma_m = 0 ${unitOf(ctx)}`)],
      );
    }
    if (m === undefined) return null;
    return {
      kind: 'constant',
      range: ctx.rangeOf('sigma_a'),
      inputs: ['sigma_a', 'sigma_m'],
      S_max: m + Math.abs(a),
      S_min: m - Math.abs(a),
    };
  }
  ctx.diag(
    'error',
    'missing-load',
    'no load: state the nominal stress at the notch as `sigma_max`/`sigma_min` or `sigma_a`/`sigma_m`, `spectrum:` lines of the same names with `n`, or a `history:` of the nominal stress',
    methodLine(ctx),
  );
  return null;
}

function readSpectrum(ctx: CheckContext): Loading | null {
  const levels = readSpectrumLevels(ctx);
  if (levels.length !== ctx.spectrum.length) return null;
  const out: SpectrumLevel[] = [];
  let ok = true;
  for (const lv of levels) {
    const bases = Object.keys(lv.loads);
    const s = lv.loads.sigma;
    if (!s || bases.length !== 1) {
      ctx.diag(
        'error',
        'unknown-spectrum-name',
        'a strain-life level is the nominal stress at the notch: `sigma_max`/`sigma_min` or `sigma_a`/`sigma_m` with `n` (loads and other stresses do not reach the notch here: compute the nominal stress in a line above)',
        lv.stmt.whole,
      );
      ok = false;
      continue;
    }
    out.push({ S_max: s.m + Math.abs(s.a), S_min: s.m - Math.abs(s.a), count: lv.n });
  }
  if (!ok) return null;
  return { kind: 'spectrum', range: ctx.spectrum[0].whole, inputs: [], levels: out };
}

/** A history of the nominal stress, read once and reduced to its turning points (SI). */
function readHistory(ctx: CheckContext): Loading | null {
  const stmt = ctx.options.get('history')!;
  const range = stmt.whole;
  const path = stmt.value.text;
  if (ctx.options.has('history-load') && ctx.option('history-load') !== 'stress') {
    if (ctx.option('history-load') !== undefined)
      ctx.diag(
        'error',
        'history-load-strain-life',
        'a strain-life history is the nominal stress at the notch: `history-load: stress` (convert a load history to the nominal stress with `history_scale`, the stress of 1.0 in the file)',
        ctx.optionRange('history-load'),
      );
    return null;
  }
  const sc = ctx.stated.get('history_scale');
  if (!sc) {
    ctx.diag(
      'error',
      'missing-input',
      'state `history_scale`, the nominal stress at the notch for 1.0 in the file',
      range,
      [
        {
          ...ctx.insertFix(
            `State \`history_scale = 1 ${unitOf(ctx)}\` (check the file's unit)`,
            `history_scale = 1 ${unitOf(ctx)}`,
          ),
          preferred: false,
        },
      ],
    );
    return null;
  }
  ctx.used.add('history_scale');
  const stress = vectorOf('stress')!;
  if (!sameVector(sc.q.dim, stress)) {
    ctx.diag(
      'error',
      sc.q.dim.every((x) => x === 0) ? 'missing-unit' : 'wrong-dimension',
      '`history_scale` must be a stress: the nominal stress at the notch for 1.0 in the file',
      sc.stmt.expr.range,
    );
    return null;
  }
  if (sc.q.si === 0) {
    ctx.diag('error', 'absurd-value', '`history_scale` must not be zero', sc.stmt.expr.range);
    return null;
  }
  const scale = sc.q.si;
  let gate = 0;
  const g = ctx.stated.get('history_gate');
  if (g) {
    ctx.used.add('history_gate');
    if (!sameVector(g.q.dim, stress)) {
      ctx.diag(
        'error',
        g.q.dim.every((x) => x === 0) ? 'missing-unit' : 'wrong-dimension',
        '`history_gate` is a range of the nominal stress',
        g.stmt.expr.range,
      );
      return null;
    }
    if (g.q.si < 0) {
      ctx.diag('error', 'absurd-value', '`history_gate` must not be negative', g.stmt.expr.range);
      return null;
    }
    gate = g.q.si / Math.abs(scale);
  }
  const reader = ctx.histories;
  if (!reader) {
    ctx.diag(
      'error',
      'history-unavailable',
      'history files cannot be read here: evaluate the note from the editor or the command line, which read files inside the workspace',
      range,
    );
    return null;
  }
  const colText = ctx.options.get('history-column')?.value.text;
  const column = colText === undefined ? undefined : /^\d+$/.test(colText) ? Number(colText) : colText;
  const detector = new TurningPointDetector(gate);
  let points = new Float64Array(1024);
  let count = 0;
  let overflow = false;
  const keep = (x: number) => {
    if (count >= HISTORY_TURNING_POINTS_MAX) {
      overflow = true;
      return;
    }
    if (count === points.length) {
      const next = new Float64Array(Math.min(HISTORY_TURNING_POINTS_MAX, points.length * 2));
      next.set(points);
      points = next;
    }
    points[count++] = x * scale;
  };
  const csv = new HistoryCsvReader({
    ...(column !== undefined ? { column } : {}),
    onValue: (x) => {
      if (!overflow && detector.push(x)) keep(detector.point);
    },
  });
  const r = reader.read(path, (chunk) => csv.feed(chunk));
  if (!r.ok) {
    ctx.diag('error', r.code, r.message, range);
    return null;
  }
  csv.end();
  if (!overflow && detector.finish()) keep(detector.point);
  reportHistoryIssues(ctx, csv.issues, range, path);
  if (csv.fatal) return null;
  if (csv.badRowCount > 0) {
    const n = csv.badRowCount;
    ctx.diag(
      'information',
      'results-withheld',
      `no life until the ${n} row${n === 1 ? '' : 's'} of \`${path}\` without a finite number ${n === 1 ? 'is' : 'are'} fixed: a lost sample may be the largest load of the history`,
      range,
    );
    return null;
  }
  if (overflow) {
    ctx.diag(
      'error',
      'history-too-many-peaks',
      `\`${path}\` has more than ${HISTORY_TURNING_POINTS_MAX} peaks and valleys: the local path keeps them all (its memory), so split the history into blocks or raise \`history_gate\``,
      range,
    );
    return null;
  }
  return {
    kind: 'history',
    range,
    inputs: ['history_scale', ...(g ? ['history_gate'] : [])],
    history: points.subarray(0, count),
  };
}

function readLoading(ctx: CheckContext): Loading | null {
  const historyStmt = ctx.options.get('history');
  const spectrum = ctx.spectrum.length > 0;
  if (historyStmt && spectrum) {
    ctx.diag(
      'error',
      'history-and-spectrum',
      'give the loads either as a `history:` file or as `spectrum:` lines, not both (make two checks)',
      historyStmt.whole,
    );
    return null;
  }
  if (historyStmt || spectrum) {
    for (const n of ['sigma_max', 'sigma_min', 'sigma_a', 'sigma_m'])
      if (ctx.has(n))
        ctx.diag(
          'warning',
          'ignored-input',
          `the loads come from the ${historyStmt ? 'history' : 'spectrum'}: \`${n}\` is not used`,
          ctx.rangeOf(n),
        );
    return historyStmt ? readHistory(ctx) : readSpectrum(ctx);
  }
  return readCycle(ctx);
}

/** The line each of the core's notes is about. */
function noteRange(
  ctx: CheckContext,
  code: string,
  message: string,
  loading: Loading,
  notch: NotchRead,
): Range {
  if (code === 'invalid-input' && /concentration factor/.test(message)) return notch.range;
  // The constant the message names first, where the note states it (`c must be steeper than b` -> c_coffin).
  if (CURVE_CODES.has(code) || CONSTANT_CODES.has(code)) {
    const named = NAMED_CONSTANTS.find(([re, n]) => re.test(message) && ctx.has(n));
    if (named) return ctx.rangeOf(named[1]);
  }
  if (CURVE_CODES.has(code))
    return ctx.has('K_prime')
      ? ctx.rangeOf('K_prime')
      : ctx.has('n_prime')
        ? ctx.rangeOf('n_prime')
        : (ctx.optionRange('material') ?? ctx.optionRange('estimate') ?? methodLine(ctx));
  if (CONSTANT_CODES.has(code))
    return (
      CONSTANTS.map((n) => (ctx.has(n) ? ctx.rangeOf(n) : undefined)).find((r) => r !== undefined) ??
      ctx.optionRange('material') ??
      ctx.optionRange('estimate') ??
      methodLine(ctx)
    );
  if (MODEL_CODES.has(code)) return ctx.optionRange('mean-stress') ?? loading.range;
  if (code === 'notch-factor') return notch.range;
  if (HISTORY_CODES.has(code)) return loading.range;
  if (code === 'invalid-input' && ctx.has('passes')) return ctx.rangeOf('passes');
  return loading.range;
}

/** Strips a record's notes (they are reported once, by `reportNotes`). */
function bare(c: Computed): Computed {
  return { ...c, notes: [] };
}

function reportNotes(
  ctx: CheckContext,
  notes: MethodNote[],
  loading: Loading,
  notch: NotchRead,
): { errors: boolean; info: MethodNote[] } {
  let errors = false;
  const info: MethodNote[] = [];
  for (const n of notes) {
    const sev = n.severity ?? 'warning';
    if (sev === 'error') errors = true;
    if (OWN_CODES.has(n.code)) continue;
    // In a spectrum or history, loops too small to reach the curve's 1e12 reversals do no damage:
    // said with the life, not as a warning (the loops that count are warned of by strain-life-range).
    const quiet = n.code === 'strain-life-beyond' && loading.kind !== 'constant';
    if (sev === 'information' || sev === 'hint' || quiet) {
      info.push(quiet ? { ...n, severity: 'information' } : n);
      continue;
    }
    ctx.diag(sev, n.code, n.message, noteRange(ctx, n.code, n.message, loading, notch));
  }
  return { errors, info };
}

/** The governing loop drawn closed: up its Masing branch from the lower tip, down the other from the upper. */
function loopBranches(
  g: { sigma_min: number; sigma_max: number; eps_min: number; eps_max: number },
  m: StrainLifeMaterial,
): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  const d = g.sigma_max - g.sigma_min;
  for (let i = 0; i <= LOOP_POINTS; i++) {
    const x = (d * i) / LOOP_POINTS;
    out.push([g.sigma_min + x, g.eps_min + masingStrainRange(m, x)]);
  }
  for (let i = 1; i <= LOOP_POINTS; i++) {
    const x = (d * i) / LOOP_POINTS;
    out.push([g.sigma_max - x, g.eps_max - masingStrainRange(m, x)]);
  }
  return out;
}

/** The drawing data: the local path along its branches, the loops and the strain-life curve. */
function drawingData(
  res: NotchStrainLifeResult,
  m: StrainLifeMaterial,
  rule: NotchRule,
  model: MeanStressModel,
  factor: NotchFactorKind,
): StrainLifeData {
  const g = res.governing >= 0 ? res.loops[res.governing] : undefined;
  const curve: StrainLifeData['curve'] = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const r = 10 ** ((8 * i) / (CURVE_POINTS - 1));
    const el = (m.sigma_f_prime / m.E) * r ** m.b;
    const pl = m.eps_f_prime * r ** m.c;
    curve.push([r, el + pl, el, pl]);
  }
  const reversals = g && g.status === 'finite' ? g.reversals : null;
  return {
    rule,
    model,
    factor,
    path: pathCurve(res.path, m, DRAWN_PER_SEGMENT).map(([s, e]) => [s, e]),
    points: res.path.points.map((p) => ({ S: p.S, sigma: p.sigma, eps: p.eps })),
    truncated: res.path.truncated,
    loops: res.loops
      .map((lp, i) => ({ lp, i }))
      .filter(({ i }) => i < 63 || i === res.governing)
      .map(({ lp, i }) => ({
        sigma_max: lp.sigma_max,
        sigma_min: lp.sigma_min,
        eps_max: lp.eps_max,
        eps_min: lp.eps_min,
        count: lp.count,
        reversals: lp.status === 'finite' ? lp.reversals : null,
        governing: i === res.governing,
      })),
    governingLoop: g ? loopBranches(g, m) : [],
    curve,
    transition: res.transition.value,
    operating: g ? { eps_a: g.eps_a, reversals, sigma_m: g.sigma_m } : null,
    eps_a_at_transition: strainAmplitudeKernel(m, res.transition.value),
  };
}

export function runStrainLife(ctx: CheckContext): MethodExtras {
  const rule = (ctx.option('notch-rule') ?? 'neuber') as NotchRule;
  const modelWord = ctx.option('mean-stress') ?? 'swt';
  const model = MEAN_STRESS_WORDS[modelWord] ?? 'swt';
  if (
    (ctx.options.has('notch-rule') && ctx.option('notch-rule') === undefined) ||
    (ctx.options.has('mean-stress') && ctx.option('mean-stress') === undefined)
  )
    return {};
  if (ctx.has('D')) {
    // `D` is a diameter elsewhere; the damage of this check is `D_sum`.
    ctx.diag(
      'warning',
      'ignored-input',
      'a strain-life check does not use the larger diameter `D`; its damage sum is the result `D_sum`',
      ctx.rangeOf('D'),
    );
  }

  const mat = readMaterial(ctx);
  const notch = readNotch(ctx, rule);
  const loading = readLoading(ctx);
  if (!mat || !notch || !loading) return {};

  const N = ctx.input('N');
  const passesIn = ctx.input('passes');
  if (loading.kind !== 'constant' && ctx.has('N'))
    ctx.diag(
      'warning',
      'ignored-input',
      `\`N\` is not used in a ${loading.kind} check: the service is \`passes\` of the ${loading.kind} (\`D_sum\`), the life \`N_f\` is in cycles`,
      ctx.rangeOf('N'),
    );
  for (const key of ['surface', 'rotation', 'criterion', 'miner'])
    if (ctx.options.has(key))
      ctx.diag(
        'warning',
        'ignored-input',
        key === 'surface'
          ? '`surface:` is not used by the strain-life method: its constants are those of polished specimens, and a rough surface shortens long lives (state constants measured on the finish, or check long lives with `method: stress-life`)'
          : `\`${key}:\` is not used by the strain-life method (\`mean-stress:\` chooses the correction of the strain-life curve)`,
        ctx.optionRange(key),
      );
  if (loading.kind === 'constant' && ctx.has('passes'))
    ctx.diag(
      'warning',
      'ignored-input',
      '`passes` counts passes of a spectrum or history; at constant amplitude state the cycles in service as `N`',
      ctx.rangeOf('passes'),
    );
  if (passesIn !== undefined && !(passesIn >= 0)) {
    ctx.diag('error', 'absurd-value', '`passes` must be a number >= 0', ctx.rangeOf('passes'));
    return {};
  }
  const input: NotchStrainLifeInput = {
    material: mat.material,
    rule,
    K: notch.K,
    factor: notch.factor,
    model,
    ...(mat.Sy !== undefined ? { Sy: mat.Sy } : {}),
    repeats: loading.kind === 'constant' ? (N ?? 1) : (passesIn ?? 1),
    maxPathPoints: DRAWN_PATH_POINTS,
  };
  const res =
    loading.kind === 'constant'
      ? constantAmplitudeStrainLife(loading.S_max!, loading.S_min!, input)
      : loading.kind === 'spectrum'
        ? spectrumStrainLife(loading.levels!, input)
        : historyStrainLife(loading.history!, input);

  const { errors, info } = reportNotes(ctx, res.notes, loading, notch);
  // The transition life is the material's: shown even when the loading withholds the rest.
  const constIn = ['E', ...CONSTANTS];
  // ... unless the constants themselves cannot be a strain-life curve (c not steeper than b ...).
  const constantsBad = res.notes.some(
    (n) => n.severity === 'error' && (CONSTANT_CODES.has(n.code) || CURVE_CODES.has(n.code)),
  );
  if (!constantsBad)
    ctx.result('two_N_t', bare(res.transition), constIn, {
      range: ctx.optionRange('material') ?? ctx.rangeOf('c_coffin'),
    });
  if (errors) return {};
  if (res.governing < 0) {
    // A static load (no range): no loop, no fatigue damage; the life is unbounded.
    ctx.diag(
      'information',
      'no-stress-range',
      'the nominal stress does not change: a static load, no hysteresis loop and no fatigue damage (N_f infinite)',
      loading.range,
    );
    ctx.result('N_f', { ...res.N_f, notes: [] }, [...mat.inputs, notch.name, ...loading.inputs], {
      range: loading.range,
    });
    return {};
  }

  const notchIn = [...mat.inputs, notch.name, ...loading.inputs];
  const modelIn = [...notchIn];
  const r = loading.range;
  // The local path point by point is the derivation of eps_a: its steps ride on it as remarks.
  const steps = res.steps.slice(0, STEPS_SHOWN);
  if (res.steps.length > STEPS_SHOWN)
    steps.push(`... ${res.steps.length - STEPS_SHOWN} more points of the path (every loop is counted)`);
  ctx.result(
    'eps_a',
    {
      ...res.eps_a,
      notes: steps.map((message) => ({ code: 'path-step', severity: 'information', message })),
    },
    notchIn,
    { range: r },
  );
  ctx.result('sigma_max_local', bare(res.sigma_max), notchIn, { range: r });
  const g = res.loops[res.governing];
  ctx.result(
    'sigma_min_local',
    computed(
      g.sigma_min,
      'sigma_min_local = the smaller local stress of the governing loop',
      res.path.source,
      res.sigma_max.terms,
    ),
    notchIn,
    { range: r },
  );
  ctx.result('sigma_m_local', bare(res.sigma_m), notchIn, { range: r });
  if (loading.kind === 'history')
    ctx.result(
      'cycles_counted',
      computed(
        res.loops.reduce((s, lp) => s + lp.count, 0),
        'cycles_counted = closed local hysteresis loops of one pass (the block closed at its largest peak)',
        res.path.source,
        [{ name: 'turning points', value: res.path.turningPointCount, unit: '' }],
      ),
      loading.inputs,
      { range: r },
    );
  // The information notes of the chain (no damage, path kept for drawing ...) ride on N_f alone.
  const withInfo = (c: Computed): Computed => ({
    ...c,
    formula:
      loading.kind === 'constant'
        ? `N_f = 2N_f / 2, 2N_f solved from ${modelFormula(model)}`
        : 'N_f = cycles per pass * repeats (passes to failure)',
    notes: info,
  });
  ctx.result('N_f', withInfo(res.N_f), [...modelIn, 'eps_a', 'sigma_m_local', 'sigma_max_local'], {
    range: r,
    meaning:
      loading.kind === 'constant'
        ? 'predicted cycles to failure at the notch root'
        : 'predicted cycles to failure: cycles per pass times passes to failure',
  });
  const variable = loading.kind !== 'constant';
  if (variable || N !== undefined) {
    const dTerms: Term[] = res.D.terms ?? [];
    const D = computed(
      res.D.value,
      variable
        ? res.D.formula.replace(/^D = repeats/, 'D_sum = passes')
        : 'D_sum = N / N_f (Palmgren-Miner at constant amplitude)',
      res.D.source,
      variable ? dTerms : [...dTerms, { name: 'N', value: N ?? 1, unit: 'cycles' }],
    );
    ctx.result('D_sum', D, variable ? ['N_f', ...(ctx.has('passes') ? ['passes'] : [])] : ['N', 'N_f'], {
      range: variable && ctx.has('passes') ? ctx.rangeOf('passes') : ctx.has('N') ? ctx.rangeOf('N') : r,
      meaning: variable
        ? `Miner damage sum of the local loops over ${passesIn ?? 1} pass${(passesIn ?? 1) === 1 ? '' : 'es'} of the ${loading.kind}`
        : 'Miner damage of the N cycles in service',
    });
    if (variable)
      ctx.result('repeats', bare(res.repeats), ['N_f'], {
        range: r,
        meaning: `passes of the ${loading.kind} to failure (1 / damage per pass)`,
      });
  }
  const extras: MethodExtras = {
    strainLife: drawingData(res, mat.material, rule, model, notch.factor),
  };
  if (res.loops.length > 1) {
    const fmt = (x: number) => String(Number(x.toPrecision(4)));
    const stress = (x: number) => ctx.display(x, 'stress');
    extras.tables = [
      {
        title: 'Closed local hysteresis loops (one pass), most damaging first',
        columns: ['count', 'Delta S', 'sigma_max', 'sigma_min', 'eps_a', '2N_f', 'd per pass'],
        rows: [...res.loops]
          .sort((a, b) => b.damage - a.damage || b.eps_a - a.eps_a)
          .slice(0, 12)
          .map((lp) => [
            fmt(lp.count),
            stress(lp.dS),
            stress(lp.sigma_max),
            stress(lp.sigma_min),
            fmt(lp.eps_a),
            lp.status === 'finite' ? fmt(lp.reversals) : 'infinite',
            fmt(lp.damage),
          ]),
      },
    ];
  }
  return extras;
}
