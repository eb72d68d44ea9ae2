/**
 * Post-weld improvement of the weld toe: the IIW benefit factors for burr grinding, TIG dressing,
 * hammer and needle peening, and the HFMI classes. EN 1993-1-9 does not cover improvement
 * techniques other than stress relief, so an EN check keeps its class with a warning.
 * Improvement acts on toe cracks only: a root crack keeps the as-welded class.
 */
import { type Computed, computed, type MethodNote, MPA } from '../computed';
import type { WeldMaterial, WeldStandard } from './snCurve';
import { EN_IMPROVEMENT_SOURCE, HFMI_SOURCE, IIW_IMPROVEMENT_SOURCE } from './sources';
import { inputError, isFiniteNumber, isPositive, mpaTerm, numTerm } from './weldNotes';

export type ImprovementMethod =
  | 'burr-grinding'
  | 'tig-dressing'
  | 'hammer-peening'
  | 'needle-peening'
  | 'hfmi';

export interface ImprovementInput {
  standard: WeldStandard;
  /** As-welded class, Pa. */
  FAT: number;
  method: ImprovementMethod;
  material: WeldMaterial;
  /** Yield strength of the parent plate, Pa (peening and HFMI depend on it). */
  fy?: number;
  /** Stress ratio of the applied cycle (HFMI). */
  R?: number;
  /** Where the crack starts; improvement of the toe does nothing for the root. Default `toe`. */
  failure?: 'toe' | 'root';
}

export type ImprovementResult = Computed & {
  /** Slope above the knee of the improved curve. */
  m1: number;
};

/** The FAT classes of the IIW recommendations (the step of about 12 % between neighbours), MPa. */
export const FAT_SERIES = [
  12, 14, 16, 18, 20, 22, 25, 28, 32, 36, 40, 45, 50, 56, 63, 71, 80, 90, 100, 112, 125, 140, 160, 180, 200,
  225, 250, 280, 320, 360, 400, 450, 500, 560, 630,
];

function keep(
  FAT: number,
  source: string,
  formula: string,
  notes: MethodNote[],
  terms = [mpaTerm('FAT', FAT)],
): ImprovementResult {
  return { ...computed(FAT, formula, source, terms, notes), m1: 3 };
}

/** The improved class (Pa) and the slope of its curve. */
export function improvedClass(input: ImprovementInput): ImprovementResult {
  const { FAT, method, material } = input;
  const failure = input.failure ?? 'toe';
  if (!isPositive(FAT) || FAT > 1000 * MPA)
    return keep(0, IIW_IMPROVEMENT_SOURCE, 'FAT_improved', [
      inputError('The as-welded class must be a positive stress range.'),
    ]);
  if (input.standard === 'EN 1993-1-9')
    return keep(FAT, EN_IMPROVEMENT_SOURCE, 'Delta sigma_C unchanged (improvement not covered)', [
      {
        code: 'not-covered',
        severity: 'warning',
        message: `EN 1993-1-9 does not cover ${method}: the as-welded detail category is kept. Use the IIW recommendations for an improved class.`,
      },
    ]);
  if (failure === 'root')
    return keep(
      FAT,
      method === 'hfmi' ? HFMI_SOURCE : IIW_IMPROVEMENT_SOURCE,
      'FAT unchanged (root failure)',
      [
        {
          code: 'improvement-limit',
          severity: 'warning',
          message: 'Toe improvement does not act on a crack from the weld root: the as-welded class is kept.',
        },
      ],
    );
  if (method === 'hfmi') return hfmiClass(input);
  const fatMpa = FAT / MPA;
  const limit = material === 'aluminium' ? 32 : 90;
  const cap = material === 'aluminium' ? 45 : 112;
  const fy = input.fy;
  const peening = method === 'hammer-peening' || method === 'needle-peening';
  if (method !== 'burr-grinding' && method !== 'tig-dressing' && !peening)
    return keep(FAT, IIW_IMPROVEMENT_SOURCE, 'FAT_improved', [
      inputError(`Unknown improvement method "${method}".`),
    ]);
  if (peening && material === 'steel' && !isPositive(fy))
    return keep(FAT, IIW_IMPROVEMENT_SOURCE, 'FAT unchanged (no fy)', [
      inputError(
        'Peening of steel needs the yield strength fy (the factor is 1.3 below 355 MPa, 1.5 at or above).',
      ),
    ]);
  const notes: MethodNote[] = [
    {
      code: 'from-memory',
      severity: 'warning',
      message:
        'The improvement factors and their limits rest on a recalled copy of the IIW recommendations on improvement techniques: confirm them in the edition in use before relying on the benefit.',
    },
  ];
  if (fatMpa > limit + 1e-9)
    return keep(FAT, IIW_IMPROVEMENT_SOURCE, 'FAT unchanged (class above the limit of the benefit)', [
      ...notes,
      {
        code: 'improvement-limit',
        severity: 'warning',
        message: `The benefit factors apply to details of FAT <= ${limit} (${material}); FAT ${fatMpa.toPrecision(3)} is kept.`,
      },
    ]);
  const k = peening ? (material === 'aluminium' ? 1.5 : (fy as number) >= 355 * MPA ? 1.5 : 1.3) : 1.3;
  const raised = k * FAT;
  const value = Math.min(raised, cap * MPA);
  if (raised > cap * MPA)
    notes.push({
      code: 'improvement-limit',
      severity: 'information',
      message: `k FAT = ${(raised / MPA).toPrecision(4)} MPa is above the highest improved class FAT ${cap} (${material}): FAT ${cap} is used.`,
    });
  if (peening)
    notes.push({
      code: 'improvement-limit',
      severity: 'information',
      message:
        'Peening benefits rest on compressive residual stresses: they are lost under high mean stress or overloads that relax them; confirm the conditions of the recommendations.',
    });
  const terms = [mpaTerm('FAT', FAT), numTerm('k', k), mpaTerm('FAT max', cap * MPA)];
  if (isPositive(fy)) terms.push(mpaTerm('fy', fy));
  return {
    ...computed(value, 'FAT_improved = min(k FAT, FAT max), m = 3', IIW_IMPROVEMENT_SOURCE, terms, notes),
    m1: 3,
  };
}

/** Number of FAT steps HFMI adds for the yield strength (Pa); null outside the recommendations. */
function hfmiSteps(fy: number): number | null {
  const f = fy / MPA;
  if (f < 235) return null;
  if (f <= 355) return 3;
  if (f <= 550) return 4;
  if (f <= 750) return 5;
  if (f <= 950) return 6;
  return 7;
}

/** Steps taken off for the stress ratio; null above R = 0.52 (no recommendation). */
function hfmiRatioPenalty(R: number): number | null {
  if (R <= 0.15) return 0;
  if (R <= 0.28) return 1;
  if (R <= 0.4) return 2;
  if (R <= 0.52) return 3;
  return null;
}

function hfmiClass(input: ImprovementInput): ImprovementResult {
  const { FAT, fy, R } = input;
  if (input.material !== 'steel')
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged', [
      {
        code: 'improvement-limit',
        severity: 'warning',
        message: 'The HFMI recommendations cover steel only: the as-welded class is kept.',
      },
    ]);
  if (!isPositive(fy))
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged (no fy)', [
      inputError('HFMI needs the yield strength fy of the plate.'),
    ]);
  if (!isFiniteNumber(R))
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged (no R)', [
      inputError('HFMI needs the stress ratio R of the applied cycle (its class falls with R above 0.15).'),
    ]);
  const steps = hfmiSteps(fy);
  const penalty = hfmiRatioPenalty(R);
  if (steps === null)
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged (fy below 235 MPa)', [
      {
        code: 'improvement-limit',
        severity: 'warning',
        message: 'The HFMI recommendations start at fy = 235 MPa: the as-welded class is kept.',
      },
    ]);
  if (penalty === null)
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged (R above 0.52)', [
      {
        code: 'improvement-limit',
        severity: 'warning',
        message: `R = ${R.toPrecision(3)} is above 0.52, where the HFMI recommendations give no class: the as-welded class is kept.`,
      },
    ]);
  const fatMpa = FAT / MPA;
  let index = -1;
  for (let i = 0; i < FAT_SERIES.length; i++) if (FAT_SERIES[i] <= fatMpa + 1e-9) index = i;
  const notes: MethodNote[] = [
    {
      code: 'from-memory',
      severity: 'warning',
      message:
        'The HFMI steps by yield strength and stress ratio rest on a recalled copy of the recommendations: confirm the class in the edition in use before relying on the benefit.',
    },
  ];
  if (index < 0)
    return keep(FAT, HFMI_SOURCE, 'FAT unchanged', [
      inputError(`FAT ${fatMpa.toPrecision(3)} is below the lowest class of the series.`),
    ]);
  if (Math.abs(FAT_SERIES[index] - fatMpa) > 1e-6)
    notes.push({
      code: 'improvement-limit',
      severity: 'information',
      message: `FAT ${fatMpa.toPrecision(4)} is not a class of the series: the steps count from FAT ${FAT_SERIES[index]} below it.`,
    });
  const net = steps - penalty;
  const target = Math.min(index + net, FAT_SERIES.length - 1);
  const value = FAT_SERIES[target] * MPA;
  return {
    ...computed(
      Math.max(value, FAT),
      'FAT_HFMI = the class n steps above the as-welded class, n = steps(fy) - steps(R); m = 5',
      HFMI_SOURCE,
      [
        mpaTerm('FAT', FAT),
        mpaTerm('fy', fy),
        numTerm('R', R),
        numTerm('steps(fy)', steps),
        numTerm('steps(R)', penalty),
      ],
      notes,
    ),
    m1: 5,
  };
}
