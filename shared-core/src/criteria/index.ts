import type { Computed } from '../computed';
import * as morrow from '../meanstress/morrow';
import * as swt from '../meanstress/swt';
import * as walker from '../meanstress/walker';
import * as asmeElliptic from './asmeElliptic';
import * as gerber from './gerber';
import * as goodman from './goodman';
import {
  type CriterionKey,
  classicalModel,
  equivalentReversedFor,
  resolveFiniteLifeModel,
  type StrengthSet,
} from './loadLine';
import * as soderberg from './soderberg';

export { firstCycleYieldFactor, LANGER_SOURCE, langerLine } from './langer';
export {
  type ClassicalCriterion,
  CRITERION_KEYS,
  type CriterionKey,
  classicalModel,
  equivalentReversedFor,
  fatigueSafetyFactor,
  LOAD_LINES,
  type LoadLine,
  type ResolvedModel,
  resolveFiniteLifeModel,
  type StrengthSet,
} from './loadLine';
export { type FactorSolution, MAX_FACTOR, STATIC_FAILURE, solveFactor } from './solveFactor';
export { asmeElliptic, gerber, goodman, soderberg };

/** One criterion's methods behind a common shape (for the Haigh diagram and the comparison table). */
export interface CriterionModel {
  key: CriterionKey;
  label: string;
  source: string;
  equivalentReversed(sigma_a: number, sigma_m: number, s: StrengthSet): Computed;
  allowableAmplitude(sigma_m: number, s: StrengthSet): Computed;
  /** Points [sigma_m, sigma_a] (Pa), tensile side from zero mean. */
  haighCurve(s: StrengthSet, n?: number): Array<[number, number]>;
}

const LABELS: Record<CriterionKey, string> = {
  goodman: 'Modified Goodman',
  gerber: 'Gerber',
  soderberg: 'Soderberg',
  'asme-elliptic': 'ASME elliptic',
  morrow: 'Morrow',
  swt: 'Smith-Watson-Topper',
  walker: 'Walker',
};

function withNotes(c: Computed, notes: Computed['notes']): Computed {
  if (!notes || notes.length === 0) return c;
  return { ...c, notes: [...notes, ...(c.notes ?? [])] };
}

/** Lookup of the seven criteria / mean-stress models by key. */
export function criterionModel(key: CriterionKey): CriterionModel {
  const classical = classicalModel(key);
  if (classical) {
    const mod =
      key === 'goodman'
        ? goodman
        : key === 'gerber'
          ? gerber
          : key === 'soderberg'
            ? soderberg
            : asmeElliptic;
    return {
      key,
      label: classical.label,
      source: classical.source,
      equivalentReversed: (a, m, s) => mod.equivalentReversed(a, m, s),
      allowableAmplitude: (m, s) => mod.allowableAmplitude(m, s),
      haighCurve: (s, n = 64) => mod.haighCurve(s, n),
    };
  }
  const k = key as 'morrow' | 'swt' | 'walker';
  return {
    key,
    label: LABELS[key],
    source: k === 'morrow' ? morrow.MORROW_SOURCE : k === 'swt' ? swt.SWT_SOURCE : walker.WALKER_SOURCE,
    equivalentReversed: (a, m, s) => equivalentReversedFor(k, a, m, s),
    allowableAmplitude: (m, s) => {
      const r = resolveFiniteLifeModel(k, s);
      if (k === 'morrow') {
        return withNotes(morrow.allowableAmplitude(m, s.S, r.sigma_f_prime ?? 0), r.notes);
      }
      if (k === 'swt') return swt.allowableAmplitude(m, s.S);
      return withNotes(walker.allowableAmplitude(m, s.S, r.gamma ?? 0.5), r.notes);
    },
    haighCurve: (s, n = 64) => {
      const r = resolveFiniteLifeModel(k, s);
      if (k === 'morrow') return morrow.haighCurve(s.S, r.sigma_f_prime ?? 0, n);
      if (k === 'swt') return swt.haighCurve(s.S, s.Sut, n);
      return walker.haighCurve(s.S, s.Sut, r.gamma ?? 0.5, n);
    },
  };
}
