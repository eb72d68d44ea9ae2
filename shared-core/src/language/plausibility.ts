/**
 * Plausibility of stated values. A value no engineering part can have (a strength beyond any
 * metal, a shaft tens of metres across, a yield above the ultimate, a notch radius larger
 * than the part ...) is an error that withholds every result, as a wrong unit does: such a
 * value is almost always a slip, and any number computed from it would mislead. A value that
 * is merely unusual is a warning and the check goes on.
 *
 * Two stages: `valuePlausibility` judges one stated value on its own line (the evaluator
 * calls it for every reserved name); `checkConsistency` runs once all statements are read
 * and compares values with each other, with the library entry and with the family.
 *
 * The limits and their grounds (the message of each diagnostic quotes them):
 * - strengths: fine music wire, the strongest steel product, reaches 3.09 GPa at 0.10 mm
 *   (Budynas & Nisbett, Shigley's MED 9th ed., Table 10-4: A = 2211 MPa*mm^m, m = 0.145);
 *   maraging steels about 2.4 GPa (from memory). Error above 3.5 GPa, warning above 2.5 GPa
 *   (common practice, no source). Per family, the bounds of `materials/families.ts`.
 * - yield above ultimate: the ultimate is the largest engineering stress of the tensile test,
 *   so the 0.2 % yield cannot exceed it (definition).
 * - a fatigue strength (Se_prime, Se, Sf_ref, S_ref) at or above Sut: the endurance ratio of
 *   steels stays below about 0.6 (Shigley Fig. 6-17), and no fatigue strength at 10^4 cycles
 *   or more reaches the ultimate (definition of the S-N curve, which starts at Sut).
 * - f above 1: f Sut is the fatigue strength at 10^3 cycles, below Sut (Shigley Sec. 6-7).
 * - q above 1, or Kf above Kt: q = (Kf - 1)/(Kt - 1) lies between 0 and 1 (Shigley Eq. 6-31).
 * - sizes: shafts above 10 m, plate widths above 50 m, walls above 2 m, shells above 200 m
 *   (errors) and 3 m, 10 m, 0.5 m, 50 m (warnings): the largest forged shafts (marine and
 *   hydro-generator) are one to two metres across (from memory); the limits are common
 *   practice, no source. A notch radius larger than the part, a plate hole wider than the
 *   plate, a cutout wider than the shell's circumference or a wall thicker than the shell's
 *   bore cannot be (geometry).
 * - temperatures above the melting point of the family's base metal (see `families.ts`).
 */

import type { CheckContext } from '../context/checkContext';
import { MAGNITUDE, POSITIVE } from '../context/vocabulary';
import {
  FAMILIES,
  FAMILY_MELT_SOURCE,
  familyOfClass,
  findMaterial,
  isFamily,
  type MaterialFamily,
} from '../materials';
import type { DimKey } from '../units/dimensions';

export interface Implausible {
  severity: 'error' | 'warning';
  /** Text after the value's name, e.g. "= 63000 MPa is beyond any engineering metal ...". */
  message: string;
}

interface Limit {
  errorAbove?: number;
  warnAbove?: number;
  errorBelow?: number;
  warnBelow?: number;
  /** What a value beyond the error limit is, and the ground of the limit. */
  beyond: string;
  /** What a value beyond the warning limit is. */
  unusual?: string;
  below?: string;
  unusualBelow?: string;
}

const STRENGTH_TOP =
  "the strongest steel product, fine music wire, reaches 3.09 GPa (Shigley's MED 9th ed., Table 10-4); 3.5 GPa: common practice, no source";
const SIZE_GROUND =
  'the largest forged shafts are one to two metres across (from memory); common practice, no source';

const LIMITS: Record<string, Limit> = {
  Sut: {
    errorAbove: 3.5e9,
    warnAbove: 2.5e9,
    errorBelow: 10e6,
    warnBelow: 60e6,
    beyond: `is beyond any engineering metal (above 3500 MPa: ${STRENGTH_TOP})`,
    unusual: 'is above 2500 MPa: only fine spring wire and maraging steels reach it',
    below: 'is below any structural metal (below 10 MPa; annealed pure aluminium has about 90 MPa)',
    unusualBelow: 'is below 60 MPa: weaker than annealed pure aluminium (about 90 MPa)',
  },
  Sy: {
    errorAbove: 3.5e9,
    warnAbove: 2.5e9,
    errorBelow: 2e6,
    warnBelow: 25e6,
    beyond: `is beyond any engineering metal (above 3500 MPa: ${STRENGTH_TOP})`,
    unusual: 'is above 2500 MPa: only fine spring wire and maraging steels reach it',
    below: 'is below any structural metal (below 2 MPa)',
    unusualBelow: 'is below 25 MPa: weaker than annealed pure aluminium (about 35 MPa)',
  },
  Se_prime: {
    errorAbove: 2.1e9,
    beyond:
      'is above any fatigue strength (0.6 x 3500 MPa: the endurance ratio of steels stays below about 0.6, Shigley Fig. 6-17)',
  },
  Sf_ref: {
    errorAbove: 2.1e9,
    beyond:
      'is above any fatigue strength (0.6 x 3500 MPa: the endurance ratio of steels stays below about 0.6, Shigley Fig. 6-17)',
  },
  d: {
    errorAbove: 10,
    warnAbove: 3,
    beyond: `is no section of an engineering part (a shaft above 10 m across: ${SIZE_GROUND})`,
    unusual: 'is above 3 m: larger than the largest forged shafts',
  },
  D: {
    errorAbove: 10,
    warnAbove: 3,
    beyond: `is no section of an engineering part (a shaft above 10 m across: ${SIZE_GROUND})`,
    unusual: 'is above 3 m: larger than the largest forged shafts',
  },
  W: {
    errorAbove: 50,
    warnAbove: 10,
    beyond: 'is no plate of an engineering part (above 50 m wide; common practice, no source)',
    unusual: 'is above 10 m wide',
  },
  t: {
    errorAbove: 2,
    warnAbove: 0.5,
    beyond: 'is no plate or wall of an engineering part (above 2 m thick; common practice, no source)',
    unusual: 'is above 0.5 m thick: thicker than the walls of reactor pressure vessels',
  },
  D_i: {
    errorAbove: 200,
    warnAbove: 50,
    beyond: 'is no pressure shell (above 200 m across; common practice, no source)',
    unusual: 'is above 50 m across',
  },
  r: {
    errorAbove: 5,
    beyond: 'is no notch radius of an engineering part (above 5 m; common practice, no source)',
  },
  d_hole: {
    errorAbove: 10,
    beyond: 'is no hole of an engineering part (above 10 m; common practice, no source)',
  },
  w_c: {
    errorAbove: 50,
    beyond: 'is no cutout of a pressure shell (above 50 m; common practice, no source)',
  },
  h_c: {
    errorAbove: 50,
    beyond: 'is no cutout of a pressure shell (above 50 m; common practice, no source)',
  },
  temp: {
    errorAbove: 1700 + 273.15,
    beyond: 'is above the melting point of every structural metal (1700 degC and above)',
  },
  f: {
    errorAbove: 1,
    beyond:
      "cannot exceed 1: f Sut is the fatigue strength at 10^3 cycles, below the ultimate (Shigley's MED Sec. 6-7)",
  },
  q: {
    errorAbove: 1,
    beyond: "cannot exceed 1: q = (Kf - 1)/(Kt - 1) lies between 0 and 1 (Shigley's MED Eq. 6-31)",
  },
  qs: {
    errorAbove: 1,
    beyond: "cannot exceed 1: qs = (Kfs - 1)/(Kts - 1) lies between 0 and 1 (Shigley's MED Eq. 6-31)",
  },
  N_ref: {
    errorBelow: 1e4,
    warnBelow: 1e6,
    beyond: 'is no reference life of a fatigue strength',
    below:
      'is below 10^4 cycles: the S-N line runs from f Sut at 10^3 cycles to the reference strength, which must lie well beyond it',
    unusualBelow: 'is below 10^6 cycles: reference strengths are usually given at 10^7 to 5e8 cycles',
  },
};

/** Why a stated reserved value cannot be (error) or is unusual (warning); undefined when plausible. */
export function valuePlausibility(
  name: string,
  si: number,
  dim: DimKey,
  show: (si: number) => string,
): Implausible | undefined {
  if (POSITIVE.has(name) && !(si > 0)) return { severity: 'error', message: 'must be positive' };
  if (name === 'reliability' && si >= 1)
    return { severity: 'error', message: 'must be below 1 (e.g. 0.99 or 99 %)' };
  const m = MAGNITUDE[dim];
  if (m) {
    const a = Math.abs(si);
    if (a > m.max || (a > 0 && a < m.min))
      return {
        severity: 'error',
        message: `= ${si.toExponential(3)} (SI) is not a plausible value: expected ${m.label}; check the unit`,
      };
  }
  const l = LIMITS[name];
  if (!l) return undefined;
  const shown = `= ${show(si)}`;
  if (l.errorAbove !== undefined && si > l.errorAbove)
    return { severity: 'error', message: `${shown} ${l.beyond}: check the value and its unit` };
  if (l.errorBelow !== undefined && si < l.errorBelow)
    return { severity: 'error', message: `${shown} ${l.below ?? l.beyond}: check the value and its unit` };
  if (l.warnAbove !== undefined && si > l.warnAbove)
    return {
      severity: 'warning',
      message: `${shown} ${l.unusual ?? l.beyond}: check the value and its unit`,
    };
  if (l.warnBelow !== undefined && si < l.warnBelow)
    return {
      severity: 'warning',
      message: `${shown} ${l.unusualBelow ?? l.below ?? l.beyond}: check the value and its unit`,
    };
  return undefined;
}

/**
 * Compares the stated values with each other, with the library entry and with the family,
 * once every statement is read. Returns the number of errors found: each withholds the
 * results (the caller counts them as faults of the inputs).
 */
export function checkConsistency(ctx: CheckContext): number {
  const before = errorCount(ctx);
  const stated = (n: string): number | undefined => ctx.stated.get(n)?.q.si;
  const show = (n: string, si: number) => ctx.display(si, ctx.values[n]?.dim ?? 'stress');
  const at = (n: string) => ctx.rangeOf(n);

  // Family: the library key's, the stated word, or an assumed steel.
  const matStmt = ctx.options.get('material');
  const material = matStmt ? findMaterial(matStmt.value.text) : undefined;
  const famStmt = ctx.options.get('material-family');
  const word = famStmt && isFamily(famStmt.value.text) ? famStmt.value.text : undefined;
  if (material && word && familyOfClass(material.class) !== word && famStmt) {
    const lib = familyOfClass(material.class);
    ctx.diag(
      'error',
      'family-conflict',
      `\`material: ${material.key}\` (${material.name}) is of the family \`${lib}\`, not \`${word}\`: the family decides the endurance route and the notch data, so keep the one that is true`,
      famStmt.value.range,
      [
        {
          title: `Change to \`${lib}\``,
          edits: [{ range: famStmt.value.range, newText: lib }],
          preferred: true,
        },
      ],
    );
  }
  const family: MaterialFamily = material ? familyOfClass(material.class) : (word ?? 'steel');
  const info = FAMILIES[family];
  const named = material !== undefined || word !== undefined;
  const enduranceLimit = material ? material.enduranceLimit : info.enduranceLimit;

  const Sut = stated('Sut') ?? material?.Sut;
  const Sy = stated('Sy') ?? material?.Sy;
  const strengthAt = (n: string) => (ctx.has(n) ? at(n) : (matStmt?.whole ?? ctx.header));
  if (Sut !== undefined && Sy !== undefined && Sut > 0 && Sy > Sut)
    ctx.diag(
      'error',
      'sy-above-sut',
      `Sy (${ctx.display(Sy, 'stress')}) is above Sut (${ctx.display(Sut, 'stress')}): the yield strength cannot exceed the ultimate, the largest stress of the tensile test; check both values`,
      ctx.has('Sy') ? at('Sy') : strengthAt('Sut'),
    );
  if (named && ctx.has('Sut') && Sut !== undefined && Sut > info.maxSut)
    ctx.diag(
      'error',
      'absurd-value',
      `Sut = ${show('Sut', Sut)} is above any ${family} (at most about ${ctx.display(info.maxSut, 'stress')}: ${info.maxSutSource}): check the value, its unit and the family`,
      at('Sut'),
    );
  if (Sut !== undefined && Sut > 0)
    for (const n of ['Se_prime', 'Sf_ref', 'Se', 'S_ref']) {
      const x = stated(n);
      if (x !== undefined && x >= Sut)
        ctx.diag(
          'error',
          'absurd-value',
          `${n} (${show(n, x)}) is not below Sut (${ctx.display(Sut, 'stress')}): a fatigue strength at 10^4 cycles or more is always below the ultimate (steels: at most about 0.6 Sut, Shigley's MED Fig. 6-17); check both values`,
          at(n),
        );
    }
  if (ctx.has('Se') && !enduranceLimit)
    ctx.diag(
      'error',
      'endurance-limit-stated',
      `\`${family}\` has no endurance limit, so a stated \`Se\` would give an infinite life: state the corrected strength at the reference life as \`S_ref\` (or \`Sf_ref\`) with its life \`N_ref\``,
      at('Se'),
    );

  // Concentration: q <= 1, so Kf never exceeds Kt.
  for (const [kt, kf] of [
    ['Kt', 'Kf'],
    ['Kts', 'Kfs'],
    ['Kt_ax', 'Kf_ax'],
  ] as const) {
    const a = stated(kt);
    const b = stated(kf);
    if (a !== undefined && b !== undefined && b > a * (1 + 1e-9))
      ctx.diag(
        'error',
        'absurd-value',
        `${kf} = ${b.toPrecision(4)} is above ${kt} = ${a.toPrecision(4)}: Kf = 1 + q (Kt - 1) with q between 0 and 1 never exceeds Kt (Shigley's MED Eq. 6-32); check both values`,
        at(kf),
      );
  }

  // Geometry: a notch or hole larger than the part, a wall thicker than the shell's bore.
  const r = stated('r');
  const sizes = (['d', 'D', 'W', 'D_i'] as const)
    .map((n) => [n, stated(n)] as const)
    .filter((e): e is readonly [(typeof e)[0], number] => e[1] !== undefined);
  if (r !== undefined && sizes.length > 0) {
    const [n, largest] = sizes.reduce((p, q) => (q[1] > p[1] ? q : p));
    if (r > largest)
      ctx.diag(
        'error',
        'absurd-value',
        `the notch radius r = ${show('r', r)} is larger than the part (${n} = ${show(n, largest)}): no notch of this section can have it; check the value and its unit`,
        at('r'),
      );
  }
  const dh = stated('d_hole');
  const W = stated('W');
  if (dh !== undefined && W !== undefined && dh >= W)
    ctx.diag(
      'error',
      'absurd-value',
      `the hole d_hole = ${show('d_hole', dh)} is not narrower than the plate (W = ${show('W', W)}); check both values`,
      at('d_hole'),
    );
  const t = stated('t');
  const Di = stated('D_i');
  if (t !== undefined && Di !== undefined && t > Di)
    ctx.diag(
      'error',
      'absurd-value',
      `the wall t = ${show('t', t)} is thicker than the bore D_i = ${show('D_i', Di)}: no thin-walled shell, and the membrane stresses p D_i/(2t), p D_i/(4t) fall far below the thick-wall (Lame) peak; check both values`,
      at('t'),
    );
  const wc = stated('w_c');
  if (wc !== undefined && Di !== undefined && wc > Math.PI * Di)
    ctx.diag(
      'error',
      'absurd-value',
      `the cutout w_c = ${show('w_c', wc)} is wider than the shell's circumference (pi D_i = ${ctx.display(Math.PI * Di, 'length')}); check both values`,
      at('w_c'),
    );

  // Temperature: a solid part of the family.
  const T = stated('temp');
  if (T !== undefined && T >= info.melt)
    ctx.diag(
      'error',
      'absurd-value',
      `temp = ${show('temp', T)} is at or above the melting point of ${named ? `a ${family}` : 'steel (assumed: no `material-family:`)'} (${ctx.display(info.melt, 'temperature')}; ${FAMILY_MELT_SOURCE}): no solid part; check the value, its unit and the family`,
      at('temp'),
    );
  return errorCount(ctx) - before;
}

function errorCount(ctx: CheckContext): number {
  let n = 0;
  for (const d of ctx.diagnostics) if (d.severity === 'error') n++;
  return n;
}
