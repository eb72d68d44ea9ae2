/**
 * A small catalogue of common welded details with their class in EN 1993-1-9 (table and detail
 * number) and in the IIW recommendations (FAT and detail number), as cited facts. Every entry was
 * written from a recalled copy of the tables ("from memory"): the engineer checks the detail against
 * the table in use and may always state the class instead. Where a detail's class depends on a
 * length the table bands it; outside the bands, or where the recalled table is not certain enough,
 * no class is given and the note must state one.
 */
import { type Computed, computed, type MethodNote, MM, MPA } from '../computed';
import type { WeldMaterial, WeldStandard, WeldStress } from './snCurve';
import { EN1993_1_9, IIW_2016 } from './sources';
import type { IiwThicknessJoint } from './thickness';
import type { WeldStressType } from './verification';
import { inputError, isPositive } from './weldNotes';

export interface DetailParams {
  /** Attachment length in the direction of the stress, m (longitudinal and transverse attachments, cruciform joints). */
  L?: number;
  /** Transition radius over attachment length, r / L (gussets on plate edges). */
  rOverL?: number;
  /** Cover plate thickness, m. */
  tc?: number;
  /** Main plate thickness, m (cover plate ends in the IIW table). */
  t?: number;
}

interface ClassRow {
  /** MPa at 2e6 cycles; null: the note must state the class. */
  value: number | null;
  reference: string;
  /** Why null, or the band taken. */
  band?: string;
}

export interface CatalogueEntry {
  key: string;
  description: string;
  stress: WeldStress;
  stressType: WeldStressType;
  m1: number;
  /** EN size effect ks named in the detail's table entry. */
  enSizeEffect: boolean;
  iiwThicknessJoint: IiwThicknessJoint;
  en: (p: DetailParams) => ClassRow;
  iiw: (p: DetailParams, material: WeldMaterial) => ClassRow;
  /** EN category marked with an asterisk (a category higher may be used with the knee at 1e7; not applied here). */
  enAsterisk?: boolean;
  /** Which parameters the class depends on. */
  needs: Array<keyof DetailParams>;
}

const mm = (x: number) => x / MM;

function bandL(
  L: number | undefined,
  bands: Array<[number, number]>,
  last: number | null,
  table: string,
): ClassRow {
  if (!isPositive(L)) return { value: null, reference: table, band: 'the attachment length L is needed' };
  const l = mm(L);
  for (const [upTo, v] of bands)
    if (l <= upTo) return { value: v, reference: table, band: `L <= ${upTo} mm` };
  return {
    value: last,
    reference: table,
    band:
      last === null
        ? `L = ${l.toPrecision(3)} mm is beyond the recalled bands`
        : `L > ${bands[bands.length - 1][0]} mm`,
  };
}

export const WELD_DETAILS: CatalogueEntry[] = [
  {
    key: 'transverse-butt-ground',
    description: 'Transverse butt weld, ground flush to the plate, 100 % NDT',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: true,
    iiwThicknessJoint: 'flush-or-longitudinal',
    en: () => ({ value: 112, reference: 'Table 8.3, detail 1' }),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 112 : 45, reference: 'Table 3.2-1, detail 211' }),
    needs: [],
  },
  {
    key: 'transverse-butt-as-welded',
    description:
      'Transverse butt weld as welded, made from both sides in the flat position, weld convexity at most 10 % of the weld width with a smooth transition, NDT',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: true,
    iiwThicknessJoint: 'butt-as-welded',
    en: () => ({ value: 90, reference: 'Table 8.3, detail 5' }),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 90 : 36, reference: 'Table 3.2-1, detail 212' }),
    needs: [],
  },
  {
    key: 'longitudinal-attachment',
    description:
      'Longitudinal fillet-welded attachment (gusset, stiffener end) on the plate surface, by its length L',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'toe-as-welded',
    en: (p) =>
      bandL(
        p.L,
        [
          [50, 80],
          [80, 71],
          [100, 63],
        ],
        56,
        'Table 8.4, detail 1',
      ),
    iiw: (p, mat) =>
      mat === 'steel'
        ? bandL(
            p.L,
            [
              [50, 80],
              [150, 71],
              [300, 63],
            ],
            50,
            'Table 3.2-1, detail 521',
          )
        : bandL(
            p.L,
            [
              [50, 28],
              [150, 25],
              [300, 20],
            ],
            18,
            'Table 3.2-1, detail 521',
          ),
    needs: ['L'],
  },
  {
    key: 'transverse-attachment',
    description:
      'Transverse non-load-carrying attachment, fillet welded, not thicker than the main plate, by its length L along the stress',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'toe-as-welded',
    en: (p) =>
      bandL(
        p.L,
        [
          [50, 80],
          [80, 71],
        ],
        null,
        'Table 8.4, detail 6',
      ),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 80 : 28, reference: 'Table 3.2-1, detail 511' }),
    needs: ['L'],
  },
  {
    key: 'cover-plate-end',
    description:
      'End of a fillet-welded cover (doubling) plate on a beam flange, by the cover plate thickness tc',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'toe-as-welded',
    enAsterisk: true,
    en: (p) => {
      if (!isPositive(p.tc))
        return {
          value: null,
          reference: 'Table 8.5, detail 5',
          band: 'the cover plate thickness tc is needed',
        };
      return mm(p.tc) <= 20
        ? { value: 56, reference: 'Table 8.5, detail 5', band: 'tc <= 20 mm' }
        : {
            value: null,
            reference: 'Table 8.5, detail 5',
            band: 'tc > 20 mm: state the category from the table',
          };
    },
    iiw: (p, mat) => {
      if (!isPositive(p.tc) || !isPositive(p.t))
        return {
          value: null,
          reference: 'Table 3.2-1, detail 711',
          band: 'tc and the flange thickness t are needed',
        };
      const r = p.tc / p.t;
      const v = r <= 0.8 ? [56, 20] : r <= 1.5 ? [50, 18] : [45, 16];
      return {
        value: mat === 'steel' ? v[0] : v[1],
        reference: 'Table 3.2-1, detail 711',
        band: r <= 0.8 ? 'tc <= 0.8 t' : r <= 1.5 ? '0.8 t < tc <= 1.5 t' : 'tc > 1.5 t',
      };
    },
    needs: ['tc', 't'],
  },
  {
    key: 'cruciform-toe',
    description:
      'Load-carrying cruciform or T-joint with fillet or partial-penetration welds, crack from the weld toe, by the attachment length L',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    // Applied on the safe side: the recalled table entry may not name the size effect.
    enSizeEffect: true,
    iiwThicknessJoint: 'toe-as-welded',
    en: (p) =>
      bandL(
        p.L,
        [
          [50, 80],
          [80, 71],
          [100, 63],
          [120, 56],
        ],
        null,
        'Table 8.5, detail 1',
      ),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 63 : 22, reference: 'Table 3.2-1, detail 412' }),
    needs: ['L'],
  },
  {
    key: 'cruciform-root',
    description:
      'Load-carrying cruciform or T-joint with fillet or partial-penetration welds, crack from the weld root (range on the throat)',
    stress: 'normal',
    stressType: 'throat',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'toe-as-welded',
    enAsterisk: true,
    en: () => ({ value: 36, reference: 'Table 8.5, detail 3' }),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 36 : 12, reference: 'Table 3.2-1, detail 413' }),
    needs: [],
  },
  {
    key: 'gusset-on-edge',
    description: 'Gusset or lug welded to a plate or flange edge with a ground transition radius r, by r / L',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'flush-or-longitudinal',
    en: (p) => {
      if (!isPositive(p.rOverL))
        return { value: null, reference: 'Table 8.4, detail 5', band: 'r / L is needed' };
      return p.rOverL >= 1 / 3
        ? { value: 90, reference: 'Table 8.4, detail 5', band: 'r/L >= 1/3' }
        : p.rOverL >= 1 / 6
          ? { value: 71, reference: 'Table 8.4, detail 5', band: '1/6 <= r/L < 1/3' }
          : { value: 50, reference: 'Table 8.4, detail 5', band: 'r/L < 1/6' };
    },
    iiw: (p, mat) => {
      if (!isPositive(p.rOverL))
        return { value: null, reference: 'Table 3.2-1, detail 525', band: 'r / L is needed' };
      const v = p.rOverL >= 1 / 3 ? [90, 32] : p.rOverL >= 1 / 6 ? [71, 25] : [50, 18];
      return { value: mat === 'steel' ? v[0] : v[1], reference: 'Table 3.2-1, detail 525' };
    },
    needs: ['rOverL'],
  },
  {
    key: 'stud-on-plate',
    description:
      'Welded stud (shear connector) on a plate or flange: the parent plate in normal stress at the stud weld',
    stress: 'normal',
    stressType: 'nominal',
    m1: 3,
    enSizeEffect: false,
    iiwThicknessJoint: 'toe-as-welded',
    en: () => ({ value: 80, reference: 'Table 8.4, detail 9' }),
    iiw: (_p, mat) => ({ value: mat === 'steel' ? 80 : 28, reference: 'Table 3.2-1, detail 513' }),
    needs: [],
  },
];

export function findDetail(key: string): CatalogueEntry | undefined {
  return WELD_DETAILS.find((d) => d.key === key);
}

export type CatalogueClassResult = Computed & {
  entry?: CatalogueEntry;
  reference?: string;
};

/** The class (Pa) of a catalogue detail in the chosen standard, with its table and number as the source. */
export function catalogueClass(
  key: string,
  standard: WeldStandard,
  material: WeldMaterial = 'steel',
  params: DetailParams = {},
): CatalogueClassResult {
  const entry = findDetail(key);
  if (!entry)
    return computed(0, 'detail class', 'weld detail catalogue', undefined, [
      {
        code: 'unknown-detail',
        severity: 'error',
        message: `"${key}" is not a catalogued detail (${WELD_DETAILS.map((d) => d.key).join(', ')}): state the class instead.`,
      },
    ]);
  if (standard === 'EN 1993-1-9' && material !== 'steel')
    return {
      ...computed(0, 'detail category', EN1993_1_9, undefined, [
        inputError('EN 1993-1-9 covers steel only; aluminium details need the IIW classes (or EN 1999-1-3).'),
      ]),
      entry,
    };
  const row = standard === 'EN 1993-1-9' ? entry.en(params) : entry.iiw(params, material);
  const name = standard === 'EN 1993-1-9' ? 'Delta sigma_C' : 'FAT';
  const source = `${standard === 'EN 1993-1-9' ? EN1993_1_9 : IIW_2016}, ${row.reference} (from memory): ${entry.description}${row.band ? `, ${row.band}` : ''}`;
  if (row.value === null)
    return {
      ...computed(0, name, source, undefined, [
        {
          code: 'no-detail-class',
          severity: 'error',
          message: `No class for "${key}" in ${standard}: ${row.band ?? 'state it'}; state the class from ${row.reference}.`,
        },
      ]),
      entry,
      reference: row.reference,
    };
  const notes: MethodNote[] = [
    {
      code: 'from-memory',
      severity: 'information',
      message: `The class of this detail rests on a recalled copy of ${row.reference}: check the detail and its conditions against the table in use.`,
    },
  ];
  if (standard === 'EN 1993-1-9' && entry.enAsterisk)
    notes.push({
      code: 'asterisk-category',
      severity: 'information',
      message: `Category ${row.value}* of the table: the lower category with the knee at 5e6 is used (the alternative one category higher with the knee at 1e7 is not applied).`,
    });
  return {
    ...computed(
      row.value * MPA,
      `${name} = ${row.value}${standard === 'EN 1993-1-9' && entry.enAsterisk ? '*' : ''} (${row.reference})`,
      source,
      undefined,
      notes,
    ),
    entry,
    reference: row.reference,
  };
}

/**
 * A class compared with a stress of another kind (a nominal class with a hot-spot stress, a toe
 * class with a throat stress ...): an error, the numbers would be meaningless.
 */
export function stressTypeNotes(classType: WeldStressType, usedType: WeldStressType): MethodNote[] {
  if (classType === usedType) return [];
  return [
    {
      code: 'wrong-stress-type',
      severity: 'error',
      message: `The class is for a ${classType} stress but the check uses a ${usedType} stress: take the class that belongs to the stress (or the stress that belongs to the class).`,
    },
  ];
}
