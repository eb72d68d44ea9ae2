/**
 * Thickness (size) effect on the detail class: EN 1993-1-9's ks and the IIW's f(t). Both reduce the
 * class of thick plates only; neither lets a plate thinner than the reference raise it, so a
 * factor above 1 is refused with a note (`thin-plate`).
 */
import { type Computed, computed, type MethodNote, MM } from '../computed';
import { EN_SIZE_SOURCE, IIW_THICKNESS_SOURCE } from './sources';
import { inputError, isPositive, numTerm } from './weldNotes';

const T_REF = 25 * MM;

function thicknessErrors(t: number): MethodNote[] {
  if (!isPositive(t)) return [inputError('The plate thickness t must be a positive length.')];
  if (t > 1) return [inputError('A plate thickness above 1 m is not a plate: check the unit of t.')];
  return [];
}

function thinNote(t: number, standard: string): MethodNote {
  return {
    code: 'thin-plate',
    severity: 'information',
    message: `t = ${(t / MM).toPrecision(3)} mm is below the reference 25 mm: ${standard} gives no increase of the class for thinner plates, the factor is 1.`,
  };
}

/**
 * EN 1993-1-9 size factor ks = (25/t)^0.2 for t > 25 mm. `applies` is whether the detail's table
 * entry names the size effect (the catalogue records it); a detail without it gets ks = 1 and a note.
 */
export function enSizeFactor(t: number, applies: boolean): Computed {
  const formula = 'ks = (25 mm / t)^0.2 for t > 25 mm, else 1';
  const errors = thicknessErrors(t);
  const terms = [numTerm('t', isPositive(t) && t <= 1 ? t / MM : 0, 'mm'), numTerm('t_ref', 25, 'mm')];
  if (errors.length > 0) return computed(1, formula, EN_SIZE_SOURCE, terms, errors);
  if (!applies)
    return computed(1, 'ks = 1 (the detail has no size effect in its table entry)', EN_SIZE_SOURCE, terms, [
      {
        code: 'no-size-effect',
        severity: 'information',
        message: 'The detail category table does not name a size effect for this detail: ks = 1.',
      },
    ]);
  if (t <= T_REF)
    return computed(1, formula, EN_SIZE_SOURCE, terms, t < T_REF ? [thinNote(t, 'EN 1993-1-9')] : []);
  return computed((T_REF / t) ** 0.2, formula, EN_SIZE_SOURCE, terms);
}

/** Joint groups of the IIW thickness table and their exponents n. */
export const IIW_THICKNESS_EXPONENT = {
  /** Cruciform and T-joints, transverse attachments, ends of longitudinal stiffeners, as welded. */
  'toe-as-welded': 0.3,
  /** The same joints with the weld toe ground. */
  'toe-ground': 0.2,
  /** Transverse butt welds, as welded. */
  'butt-as-welded': 0.2,
  /** Butt welds ground flush, base material, longitudinal welds or attachments. */
  'flush-or-longitudinal': 0.1,
} as const;

export type IiwThicknessJoint = keyof typeof IIW_THICKNESS_EXPONENT;

export interface IiwThicknessOptions {
  /** Toe-to-toe length L of the attachment (for the effective-thickness rule). */
  L?: number;
  /**
   * Apply the short-attachment rule t_eff = max(0.5 L, t_ref) for L/t <= 2. It rests on a recalled
   * reading of IIW Sec. 3.5.2 and lowers the reduction, so it is used only when the note asks for it;
   * otherwise t_eff = t (the conservative reading).
   */
  shortAttachmentRule?: boolean;
}

/**
 * IIW thickness factor f(t) = (t_ref / t_eff)^n, t_ref = 25 mm, for plates thicker than t_ref.
 */
export function iiwThicknessFactor(
  t: number,
  joint: IiwThicknessJoint,
  opts: IiwThicknessOptions = {},
): Computed {
  const n = IIW_THICKNESS_EXPONENT[joint];
  const errors = thicknessErrors(t);
  if (n === undefined)
    errors.push(inputError(`Unknown joint group "${String(joint)}" for the IIW thickness exponent.`));
  const L = opts.L;
  if (L !== undefined && !isPositive(L))
    errors.push(inputError('The attachment length L must be a positive length.'));
  const terms = [
    numTerm('t', isPositive(t) && t <= 1 ? t / MM : 0, 'mm'),
    numTerm('t_ref', 25, 'mm'),
    numTerm('n', n ?? 0),
  ];
  const formula = 'f(t) = (t_ref / t_eff)^n, t_ref = 25 mm, for t > t_ref';
  if (errors.length > 0) return computed(1, formula, IIW_THICKNESS_SOURCE, terms, errors);
  const notes: MethodNote[] = [];
  if (t <= T_REF) {
    if (t < T_REF) notes.push(thinNote(t, 'the IIW recommendations (without component tests)'));
    return computed(1, formula, IIW_THICKNESS_SOURCE, terms, notes);
  }
  let tEff = t;
  let f = formula;
  if (L !== undefined && L / t <= 2) {
    if (opts.shortAttachmentRule) {
      tEff = Math.max(0.5 * L, T_REF);
      f = 'f(t) = (t_ref / t_eff)^n, t_eff = max(0.5 L, t_ref) for L/t <= 2';
      notes.push({
        code: 'from-memory',
        severity: 'warning',
        message:
          'The short-attachment rule t_eff = max(0.5 L, t_ref) for L/t <= 2 rests on a recalled reading of the IIW recommendations and lowers the thickness reduction: confirm it in the edition in use.',
      });
    } else {
      notes.push({
        code: 'effective-thickness',
        severity: 'information',
        message:
          'L/t <= 2: the IIW effective-thickness rule for short attachments is not applied unless the note asks for it; t_eff = t (conservative).',
      });
    }
    terms.push(numTerm('L', L / MM, 'mm'));
  }
  terms.push(numTerm('t_eff', tEff / MM, 'mm'));
  return computed((T_REF / tEff) ** n, f, IIW_THICKNESS_SOURCE, terms, notes);
}

/**
 * A thickness factor stated in a note: above 1 it raises the class, which neither standard allows
 * without tests; the note says so (a warning for the check to show on the statement).
 */
export function statedThicknessFactorNotes(factor: number, standard: 'EN 1993-1-9' | 'IIW'): MethodNote[] {
  if (!(Number.isFinite(factor) && factor > 0))
    return [inputError('A thickness factor must be a positive number.')];
  if (factor > 1)
    return [
      {
        code: 'thickness-benefit',
        severity: 'warning',
        message: `A thickness factor of ${factor.toPrecision(3)} raises the class: ${standard} reduces thick plates only and gives no increase below 25 mm without component tests.`,
      },
    ];
  return [];
}
