/**
 * Neuber's notch sensitivity with Shigley's curve fits of the Neuber constant for steels.
 *
 * Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Eq. (6-35a) bending
 * and axial, Eq. (6-35b) torsion, Sut in kpsi, sqrt(a) in sqrt(in), fitted for
 * 50 <= Sut <= 250 kpsi:
 *   sqrt(a) = 0.246 - 3.08e-3 Sut + 1.51e-5 Sut^2 - 2.67e-8 Sut^3   (bending, axial)
 *   sqrt(a) = 0.190 - 2.51e-3 Sut + 1.35e-5 Sut^2 - 2.67e-8 Sut^3   (torsion)
 * and q = 1/(1 + sqrt(a)/sqrt(r)) (Eq. 6-34). The 9th edition prints the bending fit with six
 * digits (0.245799 - 0.307794e-2 Sut + 0.150874e-4 Sut^2 - 0.266978e-7 Sut^3), which the tests
 * use as an outside check of the rounded coefficients.
 *
 * Outside 50..250 kpsi Sut is clamped with a `fit-range` note. Both ends are conservative:
 * sqrt(a) falls as Sut rises, so a clamped weak steel gets a smaller sqrt(a) (higher q) and a
 * clamped strong steel gets q close to 1. The torsion cubic turns negative near 240 kpsi; it
 * is floored at 0 (q = 1) with a note.
 */
import { type Computed, computed, INCH, isFiniteNumber, KSI, type MethodNote, MM } from '../computed';

export type StressKind = 'normal' | 'shear';

const SOURCE_A =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Eq. (6-35a) (bending/axial) and Eq. (6-35b) (torsion), steels, 50 <= Sut <= 250 kpsi";
const SOURCE_Q = `${SOURCE_A}; q from Eq. (6-34)`;

const SUT_LO = 50;
const SUT_HI = 250;

function sqrtAInch(sutKsi: number, load: StressKind): number {
  const s = sutKsi;
  return load === 'shear'
    ? 0.19 - 2.51e-3 * s + 1.35e-5 * s * s - 2.67e-8 * s * s * s
    : 0.246 - 3.08e-3 * s + 1.51e-5 * s * s - 2.67e-8 * s * s * s;
}

/** Neuber constant sqrt(a) in sqrt(m) for a steel of ultimate strength Sut (Pa). */
export function neuberConstant(Sut: number, load: StressKind): Computed {
  const formula =
    load === 'shear'
      ? 'sqrt(a) = 0.190 - 2.51e-3 Sut + 1.35e-5 Sut^2 - 2.67e-8 Sut^3 (Sut in kpsi, sqrt(a) in sqrt(in))'
      : 'sqrt(a) = 0.246 - 3.08e-3 Sut + 1.51e-5 Sut^2 - 2.67e-8 Sut^3 (Sut in kpsi, sqrt(a) in sqrt(in))';
  if (!isFiniteNumber(Sut) || Sut <= 0) {
    return computed(0, formula, SOURCE_A, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Sut must be a positive stress; sqrt(a) = 0 returned (q = 1, full notch sensitivity).',
      },
    ]);
  }
  const notes: MethodNote[] = [];
  const sutKsi = Sut / KSI;
  let sUsed = sutKsi;
  if (sutKsi < SUT_LO || sutKsi > SUT_HI) {
    sUsed = Math.min(Math.max(sutKsi, SUT_LO), SUT_HI);
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `Sut = ${sutKsi.toFixed(1)} kpsi is outside the fit range ${SUT_LO}..${SUT_HI} kpsi; Sut = ${sUsed} kpsi used (conservative).`,
    });
  }
  let root = sqrtAInch(sUsed, load);
  if (root < 0) {
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `The ${load === 'shear' ? 'torsion' : 'bending'} fit gives sqrt(a) = ${root.toFixed(4)} < 0 at this strength; sqrt(a) = 0 used (q = 1).`,
    });
    root = 0;
  }
  const inSi = root * Math.sqrt(INCH);
  return computed(
    inSi,
    formula,
    SOURCE_A,
    [
      { name: 'Sut', value: sutKsi, unit: 'kpsi' },
      ...(sUsed !== sutKsi ? [{ name: 'Sut used', value: sUsed, unit: 'kpsi' }] : []),
      { name: 'sqrt(a)', value: root, unit: 'in^0.5' },
      { name: 'sqrt(a)', value: inSi / Math.sqrt(MM), unit: 'mm^0.5' },
      { name: 'sqrt(a)', value: inSi, unit: 'm^0.5' },
    ],
    notes,
  );
}

/** Neuber notch sensitivity q = 1/(1 + sqrt(a)/sqrt(r)), r = notch radius (m), Sut (Pa). */
export function neuberSensitivity(r: number, Sut: number, load: StressKind): Computed {
  const sym = load === 'shear' ? 'qs' : 'q';
  const formula = `${sym} = 1/(1 + sqrt(a)/sqrt(r))`;
  const a = neuberConstant(Sut, load);
  const notes: MethodNote[] = [...(a.notes ?? [])];
  if (!isFiniteNumber(r) || r <= 0) {
    notes.push({
      code: 'invalid-input',
      severity: 'error',
      message: 'Notch radius r must be positive; q = 1 returned (full notch sensitivity).',
    });
    return computed(1, formula, SOURCE_Q, a.terms, notes);
  }
  const q = 1 / (1 + a.value / Math.sqrt(r));
  return computed(
    q,
    formula,
    SOURCE_Q,
    [
      ...(a.terms ?? []),
      { name: 'r', value: r / MM, unit: 'mm' },
      { name: 'r', value: r / INCH, unit: 'in' },
    ],
    notes,
  );
}
