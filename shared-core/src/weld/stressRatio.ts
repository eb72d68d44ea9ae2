/**
 * Mean stress of welded details. As-welded joints carry residual stresses near yield, so the
 * applied mean stress does not change their strength and neither standard gives a benefit.
 * Joints free of them may be credited: the IIW enhancement factor f(R) on the FAT class, and
 * EN 1993-1-9's reduced compressive part of the range for stress-relieved details.
 */
import { type Computed, computed, type MethodNote } from '../computed';
import { EN_COMPRESSIVE_SOURCE, IIW_RATIO_SOURCE } from './sources';
import { inputError, isFiniteNumber, mpaTerm, numTerm } from './weldNotes';

const isStress = (x: number) => isFiniteNumber(x) && Math.abs(x) <= 1e12;

/**
 * Residual-stress condition of the IIW enhancement cases:
 * - `stress-relieved`: case I, unwelded or stress-relieved, residual stress negligible (< 0.2 fy);
 * - `small-scale`: case II, small-scale thin-walled simple elements with short welds, thermally cut edges;
 * - `as-welded`: case III, complex two- or three-dimensional welded components, global residual stresses, thick walls.
 */
export type ResidualCondition = 'stress-relieved' | 'small-scale' | 'as-welded';

export function stressRatio(sigmaMax: number, sigmaMin: number): Computed {
  const formula = 'R = sigma_min / sigma_max';
  const terms = [mpaTerm('sigma_max', sigmaMax), mpaTerm('sigma_min', sigmaMin)];
  if (!isStress(sigmaMax) || !isStress(sigmaMin))
    return computed(0, formula, IIW_RATIO_SOURCE, terms, [
      inputError('sigma_max and sigma_min must be finite stresses (at most 1e6 MPa).'),
    ]);
  if (sigmaMax < sigmaMin)
    return computed(0, formula, IIW_RATIO_SOURCE, terms, [
      inputError('sigma_max is below sigma_min: swap them.'),
    ]);
  if (sigmaMax === 0 && sigmaMin === 0)
    return computed(0, formula, IIW_RATIO_SOURCE, terms, [
      { code: 'no-stress-range', severity: 'information', message: 'No stress: R is taken as 0.' },
    ]);
  if (sigmaMax <= 0)
    return computed(0, formula, IIW_RATIO_SOURCE, terms, [
      {
        code: 'compressive-cycle',
        severity: 'warning',
        message:
          'The whole cycle is compressive: R = sigma_min / sigma_max is outside the ranges of f(R); no R is reported.',
      },
    ]);
  const r = sigmaMin / sigmaMax;
  if (!(r > -1e6))
    return computed(-1e6, formula, IIW_RATIO_SOURCE, terms, [
      {
        code: 'input',
        severity: 'information',
        message: 'sigma_max is negligible beside sigma_min: R is below -1e6 and reported as -1e6.',
      },
    ]);
  return computed(r, formula, IIW_RATIO_SOURCE, terms);
}

/**
 * IIW enhancement factor f(R) on the FAT class for the residual-stress condition. A wholly compressive
 * cycle gets f(R) = 1 with a warning: it lies outside the ranges the recommendations state.
 */
export function iiwStressRatioFactor(
  sigmaMax: number,
  sigmaMin: number,
  condition: ResidualCondition,
): Computed {
  const R = stressRatio(sigmaMax, sigmaMin);
  const errors = (R.notes ?? []).filter((n) => n.severity === 'error');
  const terms = [mpaTerm('sigma_max', sigmaMax), mpaTerm('sigma_min', sigmaMin)];
  if (errors.length > 0) return computed(1, 'f(R)', IIW_RATIO_SOURCE, terms, errors);
  if (condition === 'as-welded')
    return computed(1, 'f(R) = 1 (as welded: case III)', IIW_RATIO_SOURCE, terms, [
      {
        code: 'no-enhancement',
        severity: 'information',
        message:
          'As welded (case III): residual stresses near yield make the local cycle tensile whatever the applied mean stress, so no mean-stress enhancement is allowed.',
      },
    ]);
  if (condition !== 'stress-relieved' && condition !== 'small-scale')
    return computed(1, 'f(R)', IIW_RATIO_SOURCE, terms, [
      inputError(`Unknown residual-stress condition "${condition}".`),
    ]);
  if (sigmaMax <= 0)
    return computed(1, 'f(R) = 1 (wholly compressive cycle)', IIW_RATIO_SOURCE, terms, [
      {
        code: 'compressive-cycle',
        severity: 'warning',
        message:
          'The whole cycle is compressive: outside the stated ranges of f(R); no enhancement is taken (conservative).',
      },
    ]);
  const r = R.value;
  terms.push(numTerm('R', r));
  if (condition === 'stress-relieved') {
    const f = r < -1 ? 1.6 : r <= 0.5 ? -0.4 * r + 1.2 : 1;
    return computed(
      f,
      'case I: f(R) = 1.6 (R < -1), -0.4 R + 1.2 (-1 <= R <= 0.5), 1 (R > 0.5)',
      IIW_RATIO_SOURCE,
      terms,
    );
  }
  const f = r < -1 ? 1.3 : r <= -0.25 ? -0.4 * r + 0.9 : 1;
  return computed(
    f,
    'case II: f(R) = 1.3 (R < -1), -0.4 R + 0.9 (-1 <= R <= -0.25), 1 (R > -0.25)',
    IIW_RATIO_SOURCE,
    terms,
  );
}

/**
 * EN 1993-1-9 effective range: as welded, the full range; stress-relieved (or non-welded), the
 * tensile part plus 60 % of the compressive part.
 */
export function enEffectiveRange(sigmaMax: number, sigmaMin: number, stressRelieved: boolean): Computed {
  const terms = [mpaTerm('sigma_max', sigmaMax), mpaTerm('sigma_min', sigmaMin)];
  const notes: MethodNote[] = [];
  if (!isStress(sigmaMax) || !isStress(sigmaMin))
    return computed(0, 'Delta sigma_E', EN_COMPRESSIVE_SOURCE, terms, [
      inputError('sigma_max and sigma_min must be finite stresses (at most 1e6 MPa).'),
    ]);
  if (sigmaMax < sigmaMin)
    return computed(0, 'Delta sigma_E', EN_COMPRESSIVE_SOURCE, terms, [
      inputError('sigma_max is below sigma_min: swap them.'),
    ]);
  const range = sigmaMax - sigmaMin;
  if (!stressRelieved)
    return computed(
      range,
      'Delta sigma = sigma_max - sigma_min (as welded: the full range)',
      EN_COMPRESSIVE_SOURCE,
      terms,
      [
        {
          code: 'no-enhancement',
          severity: 'information',
          message:
            'As welded: the compressive part of the range counts in full (residual stresses near yield).',
        },
      ],
    );
  const tensile = Math.max(sigmaMax, 0) - Math.max(sigmaMin, 0);
  const compressive = Math.max(-sigmaMin, 0) - Math.max(-sigmaMax, 0);
  terms.push(mpaTerm('tensile part', tensile), mpaTerm('compressive part', compressive));
  return computed(
    tensile + 0.6 * compressive,
    'Delta sigma_E = tensile part + 0.6 |compressive part|',
    EN_COMPRESSIVE_SOURCE,
    terms,
    notes,
  );
}
