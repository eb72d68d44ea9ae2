/**
 * The strain-life check of a notch: nominal loading -> local path with memory (`localPath.ts`)
 * -> closed loops -> life of each loop on the strain-life curve (`strainLifeCurve.ts`) ->
 * Palmgren-Miner sum per block -> blocks (repeats of the history) to failure.
 *
 * Results, each a `Computed` with its derivation: the local strain amplitude, maximum and mean
 * stress of the governing loop (the most damaging one; for constant amplitude, the loop), the
 * life in cycles, the transition life, the damage of the stated repeats and the repeats to
 * failure. The path is kept point by point (`steps`, and the terms of `eps_a`) for the panel.
 *
 * Damage of a loop: count / N_f; a loop beyond 1e12 reversals or without tension under SWT does
 * none (with the method's note); a loop above the curve at one reversal or at Morrow's static
 * limit is counted as failing in one reversal (N_f = 0.5, conservative) with an error note that
 * withholds the check.
 *
 * Source of the sum: A. Palmgren, VDI-Z. 68 (1924) 339-341; M. A. Miner, "Cumulative damage in
 * fatigue", J. Appl. Mech. 12 (1945) A159-A164.
 */
import {
  type Computed,
  computed,
  infinite,
  isFiniteNumber,
  type MethodNote,
  MPA,
  type Term,
} from '../computed';
import {
  type LocalLoop,
  type LocalPath,
  type PathOptions,
  pathSteps,
  type SpectrumLevel,
  traceConstantAmplitude,
  traceHistory,
  traceSpectrum,
} from './localPath';
import type { NotchFactorKind, NotchRule } from './notchRoot';
import type { StrainLifeMaterial } from './propertyEstimates';
import {
  type LifeStatus,
  lifeNotes,
  type MeanStressModel,
  modelFormula,
  modelSource,
  reversalsKernel,
  strainLifeConstantNotes,
  transitionLife,
} from './strainLifeCurve';

export const STRAIN_MINER_SOURCE =
  'Palmgren-Miner linear damage sum (Palmgren, VDI-Z. 68 (1924); Miner, J. Appl. Mech. 12 (1945) A159-A164) over the closed local hysteresis loops';

export interface NotchStrainLifeInput {
  material: StrainLifeMaterial;
  rule: NotchRule;
  K: number;
  factor: NotchFactorKind;
  model: MeanStressModel;
  /** Monotonic yield strength for the general-yield check, Pa. */
  Sy?: number;
  /** Repeats of the history (blocks) in service, for the damage D (default 1). */
  repeats?: number;
  /** Hysteresis gate on the nominal history, Pa. */
  gate?: number;
  /** Path points kept for drawing. */
  maxPathPoints?: number;
}

export interface LoopLife extends LocalLoop {
  /** Reversals to failure of this loop alone (0 when it does no damage). */
  reversals: number;
  status: LifeStatus;
  /** Damage of this loop's count per block. */
  damage: number;
}

export interface NotchStrainLifeResult {
  path: LocalPath;
  loops: LoopLife[];
  /** Index in `loops` of the governing (most damaging, then largest) loop, -1 without loops. */
  governing: number;
  /** Local strain amplitude of the governing loop. */
  eps_a: Computed;
  /** Local maximum and mean stress of the governing loop, Pa. */
  sigma_max: Computed;
  sigma_m: Computed;
  /** Cycles to failure: the loop's life at constant amplitude; cycles per block times blocks to failure otherwise. */
  N_f: Computed;
  /** Transition life 2N_t, reversals. */
  transition: Computed;
  /** Damage of `repeats` blocks. */
  D: Computed;
  /** Blocks (repeats of the history) to failure, 1/D per block. */
  repeats: Computed;
  /** One line per path point. */
  steps: string[];
  /** All notes (path, lives, constants), each code once with a count of repeats. */
  notes: MethodNote[];
}

/** Each code once; a code seen on several loops says how many. */
function mergeNotes(notes: MethodNote[]): MethodNote[] {
  const byKey = new Map<string, { note: MethodNote; extra: number }>();
  for (const n of notes) {
    const key = `${n.code}|${n.severity ?? ''}`;
    const seen = byKey.get(key);
    if (seen === undefined) byKey.set(key, { note: n, extra: 0 });
    else if (seen.note.message !== n.message) seen.extra++;
  }
  return [...byKey.values()].map(({ note, extra }) =>
    extra === 0
      ? note
      : { ...note, message: `${note.message} (and ${extra} more loop${extra === 1 ? '' : 's'})` },
  );
}

/** Terms that show the path point by point (the first `limit` points). */
function pathTerms(path: LocalPath, limit = 24): Term[] {
  const t: Term[] = [];
  path.points.slice(0, limit).forEach((p, i) => {
    t.push(
      { name: `S_${i + 1}`, value: p.S / MPA, unit: 'MPa' },
      { name: `sigma_${i + 1}`, value: p.sigma / MPA, unit: 'MPa' },
      { name: `eps_${i + 1}`, value: p.eps, unit: '' },
    );
  });
  return t;
}

function evaluate(
  path: LocalPath,
  input: NotchStrainLifeInput,
  constantAmplitude: boolean,
): NotchStrainLifeResult {
  const m = input.material;
  const model = input.model;
  const source = modelSource(model);
  const constNotes = strainLifeConstantNotes(m);
  const lifeNoteList: MethodNote[] = [];
  const loops: LoopLife[] = path.loops.map((lp) => {
    const load = { eps_a: lp.eps_a, sigma_m: lp.sigma_m, sigma_max: lp.sigma_max };
    const life = constNotes.some((n) => n.severity === 'error')
      ? { reversals: 0, status: 'beyond' as LifeStatus, converged: true }
      : reversalsKernel(m, model, load);
    if (!constNotes.some((n) => n.severity === 'error'))
      lifeNoteList.push(...lifeNotes(m, model, load, life));
    let damage = 0;
    if (life.status === 'finite') damage = lp.count / (life.reversals / 2);
    else if (life.status === 'first-reversal' || life.status === 'static') damage = lp.count / 0.5;
    return { ...lp, reversals: life.status === 'finite' ? life.reversals : 0, status: life.status, damage };
  });
  const repeatsIn = input.repeats ?? 1;
  const repeatsNotes: MethodNote[] = [];
  const serviceRepeats = isFiniteNumber(repeatsIn) && repeatsIn >= 0 ? repeatsIn : 1;
  if (serviceRepeats !== repeatsIn)
    repeatsNotes.push({
      code: 'invalid-input',
      severity: 'error',
      message: 'repeats must be a number >= 0; 1 used.',
    });
  const pathNotes = path.notes;
  const notes = mergeNotes([...constNotes, ...pathNotes, ...lifeNoteList, ...repeatsNotes]);

  let governing = -1;
  loops.forEach((lp, i) => {
    if (governing < 0) governing = i;
    else {
      const g = loops[governing];
      if (lp.damage > g.damage || (lp.damage === g.damage && lp.eps_a > g.eps_a)) governing = i;
    }
  });
  const g = governing >= 0 ? loops[governing] : undefined;
  const steps = pathSteps(path, input.rule);
  const pTerms = pathTerms(path);
  const formulaPath =
    "local path: first loading on eps = sigma/E + (sigma/K')^(1/n'), reversals on Delta eps = Delta sigma/E + 2 (Delta sigma/(2K'))^(1/n'), " +
    (input.rule === 'glinka' ? 'Glinka energy equality' : 'Neuber sigma eps = (K S)^2/E') +
    '; governing loop: eps_a = Delta eps / 2';
  const gTerms: Term[] = g
    ? [
        { name: 'Delta S', value: g.dS / MPA, unit: 'MPa' },
        { name: 'Delta sigma', value: g.dSigma / MPA, unit: 'MPa' },
        { name: 'Delta eps', value: g.dEps, unit: '' },
        { name: 'sigma_max', value: g.sigma_max / MPA, unit: 'MPa' },
        { name: 'sigma_min', value: g.sigma_min / MPA, unit: 'MPa' },
      ]
    : [];
  const eps_a = computed(g ? g.eps_a : 0, formulaPath, path.source, [...gTerms, ...pTerms], pathNotes);
  const sigma_max = computed(
    g ? g.sigma_max : 0,
    'sigma_max = the larger local stress of the governing loop',
    path.source,
    gTerms,
    pathNotes,
  );
  const sigma_m = computed(
    g ? g.sigma_m : 0,
    'sigma_m = (sigma_max + sigma_min)/2 of the governing loop',
    path.source,
    gTerms,
    pathNotes,
  );

  const Dblock = loops.reduce((s, lp) => s + lp.damage, 0);
  const cyclesPerBlock = loops.reduce((s, lp) => s + lp.count, 0);
  const lifeTerms: Term[] = [
    { name: 'loops per block', value: loops.length, unit: '' },
    { name: 'cycles per block', value: cyclesPerBlock, unit: '' },
    ...loops.slice(0, 12).flatMap((lp, i) => [
      { name: `eps_a,${i + 1}`, value: lp.eps_a, unit: '' },
      { name: `sigma_m,${i + 1}`, value: lp.sigma_m / MPA, unit: 'MPa' },
      { name: `2N_f,${i + 1}`, value: lp.reversals, unit: 'reversals' },
      { name: `d_${i + 1}`, value: lp.damage, unit: '' },
    ]),
  ];
  const Dformula = `D = repeats * sum(n_i / N_f,i) over the closed loops, N_f,i from ${modelFormula(model)}`;
  const D = computed(
    serviceRepeats * Dblock,
    Dformula,
    `${STRAIN_MINER_SOURCE}; ${source}`,
    [
      ...lifeTerms,
      { name: 'D per block', value: Dblock, unit: '' },
      { name: 'repeats', value: serviceRepeats, unit: '' },
    ],
    notes,
  );
  const repeatsFormula = 'repeats to failure = 1 / (sum(n_i / N_f,i) per block)';
  const repeats =
    Dblock > 0
      ? computed(
          1 / Dblock,
          repeatsFormula,
          `${STRAIN_MINER_SOURCE}; ${source}`,
          [...lifeTerms, { name: 'D per block', value: Dblock, unit: '' }],
          notes,
        )
      : infinite(repeatsFormula, `${STRAIN_MINER_SOURCE}; ${source}`, lifeTerms, notes);
  let N_f: Computed;
  if (constantAmplitude && g) {
    const f = `${modelFormula(model)}, N_f = 2N_f / 2`;
    const t: Term[] = [
      { name: 'eps_a', value: g.eps_a, unit: '' },
      { name: 'sigma_m', value: g.sigma_m / MPA, unit: 'MPa' },
      { name: 'sigma_max', value: g.sigma_max / MPA, unit: 'MPa' },
      { name: '2N_f', value: g.reversals, unit: 'reversals' },
    ];
    N_f =
      g.status === 'finite'
        ? computed(g.reversals / 2, f, source, t, notes)
        : g.status === 'first-reversal' || g.status === 'static'
          ? computed(0.5, f, source, t, notes)
          : infinite(f, source, t, notes);
  } else {
    const f = 'N_f = cycles per block * repeats to failure';
    N_f =
      Dblock > 0
        ? computed(
            cyclesPerBlock / Dblock,
            f,
            `${STRAIN_MINER_SOURCE}; ${source}`,
            [...lifeTerms, { name: 'D per block', value: Dblock, unit: '' }],
            notes,
          )
        : infinite(f, `${STRAIN_MINER_SOURCE}; ${source}`, lifeTerms, notes);
  }
  return {
    path,
    loops,
    governing,
    eps_a,
    sigma_max,
    sigma_m,
    N_f,
    transition: transitionLife(m),
    D,
    repeats,
    steps,
    notes,
  };
}

function pathOptions(input: NotchStrainLifeInput): PathOptions {
  return {
    curve: input.material,
    rule: input.rule,
    K: input.K,
    factor: input.factor,
    Sy: input.Sy,
    gate: input.gate,
    maxPathPoints: input.maxPathPoints,
  };
}

/** Constant amplitude between nominal S_max and S_min (Pa). */
export function constantAmplitudeStrainLife(
  S_max: number,
  S_min: number,
  input: NotchStrainLifeInput,
): NotchStrainLifeResult {
  return evaluate(traceConstantAmplitude(S_max, S_min, pathOptions(input)), input, true);
}

/** A nominal stress history (Pa), repeated `repeats` times. */
export function historyStrainLife(
  history: ArrayLike<number>,
  input: NotchStrainLifeInput,
): NotchStrainLifeResult {
  return evaluate(traceHistory(history, pathOptions(input)), input, false);
}

/** A spectrum of nominal levels (Pa) with counts per block, repeated `repeats` times. */
export function spectrumStrainLife(
  levels: readonly SpectrumLevel[],
  input: NotchStrainLifeInput,
): NotchStrainLifeResult {
  return evaluate(traceSpectrum(levels, pathOptions(input)), input, false);
}
