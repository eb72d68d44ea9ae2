/**
 * Strengths, family and class of a check's material: stated values win over the library's;
 * the family comes from the library key, else from `material-family:`, else a steel is
 * assumed (announced after the method, where it changed a result: `runMethod.ts`).
 *
 * Impossible values (Sy above Sut, a strength beyond the family, a key the library does not
 * have, a family that contradicts the key) are found before the method runs
 * (`language/plausibility.ts`) and withhold the results.
 */

import type { CheckContext } from '../context/checkContext';
import {
  FAMILIES,
  familyOfClass,
  findMaterial,
  isFamily,
  type Material,
  type MaterialClass,
  type MaterialFamily,
} from '../materials';

export interface Strengths {
  Sut: number;
  Sy: number | undefined;
  /** Library class of the material (the family's class): endurance estimate and notch data. */
  cls: MaterialClass;
  family: MaterialFamily;
  /** False when neither `material:` nor `material-family:` names the family (a steel is assumed). */
  familyStated: boolean;
  enduranceLimit: boolean;
  material?: Material;
}

/** The family a check's options name (library key first), or undefined when none does. */
export function statedFamily(ctx: CheckContext): { family: MaterialFamily; material?: Material } | undefined {
  const key = ctx.options.get('material')?.value.text;
  const material = key !== undefined ? findMaterial(key) : undefined;
  if (material) return { family: familyOfClass(material.class), material };
  const word = ctx.option('material-family');
  if (word !== undefined && isFamily(word)) return { family: word };
  return undefined;
}

export function readStrengths(ctx: CheckContext): Strengths | null {
  const named = statedFamily(ctx);
  const material = named?.material;
  const matRange = ctx.optionRange('material');
  const src = material ? `${material.name} (${material.condition}): ${material.source}` : '';
  let Sut: number | undefined = ctx.input('Sut');
  if (Sut === undefined && material) Sut = ctx.library('Sut', material.Sut, src, matRange);
  let Sy: number | undefined = ctx.input('Sy');
  if (Sy === undefined && material) Sy = ctx.library('Sy', material.Sy, src, matRange);
  if (Sut === undefined) {
    ctx.diag(
      'error',
      'missing-strength',
      'no ultimate strength: state `Sut = ...` or pick a library material with `material: KEY`',
    );
    return null;
  }
  if (Sut <= 0) {
    ctx.diag('error', 'absurd-value', '`Sut` must be positive', ctx.rangeOf('Sut'));
    return null;
  }
  if (Sy === undefined) {
    ctx.diag(
      'warning',
      'missing-yield',
      'no yield strength: state `Sy = ...` (first-cycle yield, Soderberg and ASME elliptic need it)',
    );
  } else if (Sy <= 0) {
    ctx.diag('error', 'absurd-value', '`Sy` must be positive', ctx.rangeOf('Sy'));
    Sy = undefined;
  }
  const family: MaterialFamily = named?.family ?? 'steel';
  const cls: MaterialClass = material ? material.class : FAMILIES[family].cls;
  const enduranceLimit = material ? material.enduranceLimit : FAMILIES[family].enduranceLimit;
  return {
    Sut,
    Sy,
    cls,
    family,
    familyStated: named !== undefined,
    enduranceLimit,
    ...(material ? { material } : {}),
  };
}
