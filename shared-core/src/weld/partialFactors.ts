/**
 * Partial factors of the fatigue verification: gamma_Ff on the load side, gamma_Mf (EN) or
 * gamma_M (IIW) on the resistance side, chosen by the assessment concept and the consequence of
 * failure. A factor the note does not state is defaulted with a warning naming the case it was
 * taken for (`defaulted-partial-factor`).
 */
import { type Computed, computed, type MethodNote } from '../computed';
import type { WeldStandard } from './snCurve';
import { EN_GAMMA_SOURCE, IIW_GAMMA_SOURCE } from './sources';
import { inputError, numTerm } from './weldNotes';

/** Damage tolerant: inspected and repairable, a crack is found before it matters. Safe life: no inspection credited. */
export type AssessmentConcept = 'damage-tolerant' | 'safe-life';
export type Consequence = 'low' | 'high';

const EN_TABLE: Record<AssessmentConcept, Record<Consequence, number>> = {
  'damage-tolerant': { low: 1.0, high: 1.15 },
  'safe-life': { low: 1.15, high: 1.35 },
};
const IIW_TABLE: Record<AssessmentConcept, Record<Consequence, number>> = {
  'damage-tolerant': { low: 1.0, high: 1.15 },
  'safe-life': { low: 1.15, high: 1.3 },
};

export interface PartialFactorInput {
  standard: WeldStandard;
  concept?: AssessmentConcept;
  consequence?: Consequence;
  /** A factor stated in the note; it wins over the table. */
  stated?: number;
}

function statedFactor(v: number, name: string, source: string): Computed {
  if (!(Number.isFinite(v) && v >= 1 && v <= 3))
    return computed(1, `${name} (stated)`, source, undefined, [
      inputError(
        `${name} = ${String(v)} is outside 1 to 3: a partial factor below 1 removes safety, above 3 is not a partial factor.`,
      ),
    ]);
  return computed(v, `${name} (stated in the note)`, source);
}

/**
 * Resistance partial factor. Without a stated factor or a stated concept and consequence, the most
 * onerous row of the table (safe life, high consequence) is taken, with a warning.
 */
export function resistanceFactor(input: PartialFactorInput): Computed {
  const en = input.standard === 'EN 1993-1-9';
  const name = en ? 'gamma_Mf' : 'gamma_M';
  const source = en ? EN_GAMMA_SOURCE : IIW_GAMMA_SOURCE;
  if (input.stated !== undefined) return statedFactor(input.stated, name, source);
  const table = en ? EN_TABLE : IIW_TABLE;
  const notes: MethodNote[] = [];
  let concept = input.concept;
  let consequence = input.consequence;
  if (concept !== undefined && !(concept in table))
    return computed(1, name, source, undefined, [inputError(`Unknown assessment concept "${concept}".`)]);
  if (consequence !== undefined && consequence !== 'low' && consequence !== 'high')
    return computed(1, name, source, undefined, [inputError(`Unknown consequence "${consequence}".`)]);
  if (concept === undefined || consequence === undefined) {
    concept = concept ?? 'safe-life';
    consequence = consequence ?? 'high';
    notes.push({
      code: 'defaulted-partial-factor',
      severity: 'warning',
      message: `${name} not stated: ${table[concept][consequence]} is taken, the ${concept} / ${consequence}-consequence value of ${en ? 'EN 1993-1-9 Table 3.1' : 'the IIW table of gamma_M'}${input.concept === undefined && input.consequence === undefined ? ' (the most onerous row)' : ''}. State ${name}, or the assessment concept and consequence class (\`assessment:\`, \`consequence:\`).`,
    });
  }
  if (!en)
    notes.push({
      code: 'from-memory',
      severity: 'information',
      message:
        'The IIW gamma_M values rest on a recalled copy of the recommendations: check them against the edition in use.',
    });
  const v = table[concept][consequence];
  return computed(
    v,
    `${name} from the table: ${concept}, ${consequence} consequence`,
    source,
    [numTerm(name, v)],
    notes,
  );
}

/** Load partial factor gamma_Ff: 1.0 recommended; a default comes with a warning. */
export function loadFactor(standard: WeldStandard, stated?: number): Computed {
  const source = standard === 'EN 1993-1-9' ? EN_GAMMA_SOURCE : IIW_GAMMA_SOURCE;
  if (stated !== undefined) return statedFactor(stated, 'gamma_Ff', source);
  return computed(1, 'gamma_Ff = 1.0 (recommended value)', source, undefined, [
    {
      code: 'defaulted-partial-factor',
      severity: 'warning',
      message:
        'gamma_Ff not stated: the recommended 1.0 is taken, which assumes the stress ranges are already the design spectrum. State gamma_Ff.',
    },
  ]);
}
