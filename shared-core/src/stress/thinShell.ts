/**
 * Membrane stresses in a thin-walled pressure shell (inner diameter `D_i`, wall `t`):
 * cylinder `sigma_hoop = p D_i / (2 t)`, `sigma_long = p D_i / (4 t)`; sphere `p D_i / (4 t)`
 * both ways. The hoop value of the cylinder is the exact through-wall average (equilibrium of
 * half the shell); the others are the thin-wall approximations of the contract.
 *
 * When `t / D_i > 0.1` the thin-wall formulas underestimate the peak (inner-surface) stress of
 * the exact thick-wall (Lame) solution; the note quotes that error.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MM, MPA } from '../computed';

export type ShellKind = 'cylinder' | 'sphere';

const SOURCE_CYL =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 3-14 (thin-walled vessels: tangential p d_i / (2 t), longitudinal p d_i / (4 t))";
const SOURCE_SPH =
  'Thin-walled sphere under internal pressure, sigma = p D_i / (4 t) in every tangential direction (equilibrium of a hemisphere, thin-wall approximation)';
const SOURCE_LAME = 'Lame thick-wall solution (Timoshenko & Goodier, Theory of Elasticity, 3rd ed.)';

/** Wall ratio above which the thin-wall theory is flagged (common practice, no source: t/D_i <= 0.1, i.e. r/t >= 5). */
export const THIN_WALL_LIMIT = 0.1;

/** Lame peak (inner-surface) tangential stress of a thick cylinder, Pa. */
export function lameCylinderHoopMax(p: number, D_i: number, t: number): number {
  const ri = D_i / 2;
  const ro = ri + t;
  return (p * (ro * ro + ri * ri)) / (ro * ro - ri * ri);
}

/** Lame axial stress of a thick closed-end cylinder (uniform through the wall), Pa. */
export function lameCylinderLong(p: number, D_i: number, t: number): number {
  const ri = D_i / 2;
  const ro = ri + t;
  return (p * ri * ri) / (ro * ro - ri * ri);
}

/** Lame peak (inner-surface) tangential stress of a thick sphere, Pa. */
export function lameSphereTangentialMax(p: number, D_i: number, t: number): number {
  const ri = D_i / 2;
  const ro = ri + t;
  return (p * (ro ** 3 + 2 * ri ** 3)) / (2 * (ro ** 3 - ri ** 3));
}

function pct(x: number): string {
  return `${(x * 100).toFixed(1)} %`;
}

export function shellStresses(
  shell: ShellKind,
  p: number,
  D_i: number,
  t: number,
): { hoop: Computed; long: Computed } {
  const isSphere = shell === 'sphere';
  const hoopFormula = isSphere ? 'sigma_hoop = p * D_i / (4 * t)' : 'sigma_hoop = p * D_i / (2 * t)';
  const longFormula = 'sigma_long = p * D_i / (4 * t)';
  const source = isSphere ? SOURCE_SPH : SOURCE_CYL;

  const errors: string[] = [];
  if (shell !== 'cylinder' && shell !== 'sphere') errors.push(`Unknown shell kind '${String(shell)}'.`);
  if (!isFiniteNumber(p)) errors.push('The pressure p is not a finite number.');
  if (!isFiniteNumber(D_i) || D_i <= 0) errors.push('The inner diameter D_i must be positive.');
  if (!isFiniteNumber(t) || t <= 0) errors.push('The wall thickness t must be positive.');
  if (errors.length > 0) {
    const notes: MethodNote[] = errors.map((message) => ({ code: 'input', message, severity: 'error' }));
    return {
      hoop: computed(0, hoopFormula, source, undefined, notes),
      long: computed(0, longFormula, source, undefined, notes),
    };
  }

  const hoop = isSphere ? (p * D_i) / (4 * t) : (p * D_i) / (2 * t);
  const long = (p * D_i) / (4 * t);
  if (!isFiniteNumber(hoop) || !isFiniteNumber(long)) {
    const notes: MethodNote[] = [
      { code: 'input', message: 'The wall is too thin: stress overflow.', severity: 'error' },
    ];
    return {
      hoop: computed(0, hoopFormula, source, undefined, notes),
      long: computed(0, longFormula, source, undefined, notes),
    };
  }

  const ratio = t / D_i;
  const hoopNotes: MethodNote[] = [];
  const longNotes: MethodNote[] = [];
  if (ratio > THIN_WALL_LIMIT && p !== 0) {
    if (isSphere) {
      const lame = lameSphereTangentialMax(p, D_i, t);
      const msg =
        `t/D_i = ${ratio.toFixed(3)} > ${THIN_WALL_LIMIT}: thin-wall theory is off. The Lame thick-wall peak ` +
        `tangential stress is ${(lame / MPA).toPrecision(4)} MPa; p D_i/(4 t) differs by ${pct(hoop / lame - 1)} ` +
        `(${SOURCE_LAME}).`;
      hoopNotes.push({ code: 'thin-wall', message: msg, severity: 'warning' });
      longNotes.push({ code: 'thin-wall', message: msg, severity: 'warning' });
    } else {
      const lameHoop = lameCylinderHoopMax(p, D_i, t);
      const lameLong = lameCylinderLong(p, D_i, t);
      hoopNotes.push({
        code: 'thin-wall',
        message:
          `t/D_i = ${ratio.toFixed(3)} > ${THIN_WALL_LIMIT}: thin-wall theory is off. The Lame thick-wall hoop stress ` +
          `at the bore is ${(lameHoop / MPA).toPrecision(4)} MPa; p D_i/(2 t) differs by ${pct(hoop / lameHoop - 1)} ` +
          `(${SOURCE_LAME}).`,
        severity: 'warning',
      });
      longNotes.push({
        code: 'thin-wall',
        message:
          `t/D_i = ${ratio.toFixed(3)} > ${THIN_WALL_LIMIT}: thin-wall theory is off. The Lame axial stress of a ` +
          `closed-end thick cylinder is ${(lameLong / MPA).toPrecision(4)} MPa; p D_i/(4 t) differs by ` +
          `${pct(long / lameLong - 1)} (${SOURCE_LAME}).`,
        severity: 'warning',
      });
    }
  }

  const terms = [
    { name: 'p', value: p / MPA, unit: 'MPa' },
    { name: 'D_i', value: D_i / MM, unit: 'mm' },
    { name: 't', value: t / MM, unit: 'mm' },
    { name: 't/D_i', value: ratio, unit: '' },
  ];
  return {
    hoop: computed(
      hoop,
      hoopFormula,
      source,
      [...terms, { name: 'sigma_hoop', value: hoop / MPA, unit: 'MPa' }],
      hoopNotes,
    ),
    long: computed(
      long,
      longFormula,
      source,
      [...terms, { name: 'sigma_long', value: long / MPA, unit: 'MPa' }],
      longNotes,
    ),
  };
}
