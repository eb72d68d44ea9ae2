/** Strengths and material class of a check: stated values win over the library's. */

import type { CheckContext } from '../language/checkContext';
import { findMaterial, type Material, type MaterialClass, nearestMaterialKeys } from '../materials';

export interface Strengths {
  Sut: number;
  Sy: number | undefined;
  cls: MaterialClass;
  enduranceLimit: boolean;
  material?: Material;
}

export function readStrengths(ctx: CheckContext): Strengths | null {
  const matStmt = ctx.options.get('material');
  let material: Material | undefined;
  if (matStmt) {
    material = findMaterial(matStmt.value.text);
    if (!material) {
      const near = nearestMaterialKeys(matStmt.value.text, 3);
      ctx.diag(
        'error',
        'unknown-material',
        `\`${matStmt.value.text}\` is not in the material library${near.length ? `: did you mean ${near.map((k) => `\`${k}\``).join(', ')}?` : ''}`,
        matStmt.value.range,
        near.map((k, i) => ({
          title: `Change to \`${k}\``,
          edits: [{ range: matStmt.value.range, newText: k }],
          preferred: i === 0,
        })),
      );
    }
  }
  const matRange = matStmt?.whole;
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
  if (Sut > 5e9)
    ctx.diag(
      'warning',
      'absurd-value',
      '`Sut` above 5000 MPa is beyond any engineering metal: check the unit',
      ctx.rangeOf('Sut'),
    );
  if (Sy === undefined) {
    ctx.diag(
      'warning',
      'missing-yield',
      'no yield strength: state `Sy = ...` (first-cycle yield, Soderberg and ASME elliptic need it)',
    );
  } else if (Sy <= 0) {
    ctx.diag('error', 'absurd-value', '`Sy` must be positive', ctx.rangeOf('Sy'));
    Sy = undefined;
  } else if (Sy > Sut) {
    ctx.diag(
      'warning',
      'sy-above-sut',
      `Sy (${ctx.values.Sy?.display}) is above Sut (${ctx.values.Sut?.display}): yield cannot exceed the ultimate strength; check both values`,
      ctx.has('Sy') ? ctx.rangeOf('Sy') : ctx.rangeOf('Sut'),
    );
  }
  let cls: MaterialClass = 'steel';
  if (material) cls = material.class;
  else if (!ctx.has('Se_prime'))
    ctx.diag(
      'information',
      'assumed-steel',
      'no `material:` given: a steel is assumed for the endurance estimate and the notch sensitivity',
    );
  const enduranceLimit = material ? material.enduranceLimit : true;
  return { Sut, Sy, cls, enduranceLimit, ...(material ? { material } : {}) };
}
