/**
 * The mean-stress criterion of a check and the strength set it is evaluated with, shared by
 * `method: stress-life` and `method: damage`: Goodman when no `criterion:` is stated (with a
 * warning and a quick fix), Morrow's sigma_f_prime and Walker's gamma estimated when the
 * chosen model needs them and the note does not state them.
 */

import type { CheckContext } from '../context/checkContext';
import type { Range } from '../context/types';
import type { CriterionKey, LoadLine, StrengthSet } from '../criteria';
import { defaultWalkerGamma, estimateSigmaFPrimeSteel } from '../meanstress';
import type { EnduranceChain } from './enduranceChain';
import type { Strengths } from './material';

export interface CriterionChoice {
  criterion: CriterionKey;
  lineOpt: LoadLine;
  /** The `criterion:` line, or the block header when it is defaulted. */
  critRange: Range;
}

/** The chosen criterion (Goodman by default, diagnosed); null when the stated one is invalid (already diagnosed). */
export function chooseCriterion(ctx: CheckContext): CriterionChoice | null {
  const critStmt = ctx.options.get('criterion');
  let criterion = ctx.option('criterion') as CriterionKey | undefined;
  if (!critStmt) {
    ctx.diag('warning', 'no-criterion', 'no `criterion:` stated: Goodman assumed', ctx.header, [
      ctx.insertFix('State `criterion: goodman`', 'criterion: goodman'),
    ]);
    criterion = 'goodman';
  }
  if (!criterion) return null;
  const lineOpt = (ctx.option('load-line') ?? 'proportional') as LoadLine;
  return { criterion, lineOpt, critRange: critStmt?.whole ?? ctx.header };
}

/**
 * The strength set of the check's route (pure torsion works in shear: Ssu and 0.577 Sy),
 * with Morrow's and Walker's constants read or estimated (recorded) when the criterion needs them.
 */
export function strengthSetFor(
  ctx: CheckContext,
  st: Strengths,
  chain: EnduranceChain,
  choice: CriterionChoice,
): (S: number) => StrengthSet {
  const { criterion, critRange } = choice;
  const { Sut, Sy } = st;
  let sigma_f_prime = ctx.input('sigma_f_prime');
  if (sigma_f_prime === undefined && criterion === 'morrow')
    sigma_f_prime =
      ctx.result('sigma_f_prime', estimateSigmaFPrimeSteel(Sut), ['Sut'], { range: critRange }) ?? undefined;
  let gamma = ctx.input('gamma_walker');
  if (gamma === undefined && criterion === 'walker' && st.family !== 'steel')
    // Dowling's correlation is for steels; an average of other alloys hides a spread whose
    // low end (high-strength aluminium) is more sensitive to the mean stress than the average.
    ctx.diag(
      'error',
      'walker-gamma-family',
      `Walker's gamma has a published correlation for steels only (Dowling, Calhoun & Arcari 2009); for ${st.family} state \`gamma_walker\` from test data of the alloy (aluminium alloys range from about 0.45 for high-strength to 0.65 for medium-strength grades, from memory)`,
      critRange,
    );
  if (gamma === undefined && criterion === 'walker')
    gamma =
      ctx.result(
        'gamma_walker',
        defaultWalkerGamma(st.cls === 'aluminium' ? 'aluminium' : 'steel', Sut),
        ['Sut'],
        { range: critRange },
      ) ?? undefined;
  return (Sval: number): StrengthSet => ({
    S: Sval,
    Sut: chain.Su,
    Sy: chain.shear ? 0.577 * (Sy ?? chain.Su) : (Sy ?? Number.NaN),
    ...(sigma_f_prime !== undefined ? { sigma_f_prime } : {}),
    ...(gamma !== undefined ? { gamma_walker: gamma } : {}),
  });
}

/** Soderberg and ASME elliptic are bounded by the yield strength. */
export function needsYield(k: CriterionKey): boolean {
  return k === 'soderberg' || k === 'asme-elliptic';
}
