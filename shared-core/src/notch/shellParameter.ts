/**
 * Shell parameter of an opening in a thin cylindrical or spherical shell: how large the opening
 * is against the bending length sqrt(R t) of the wall.
 *
 *   beta = [3 (1 - nu^2)]^(1/4) * a / (2 sqrt(R t))
 *
 * with a the opening's half-size, R the mean radius (D_i + t)/2 and t the wall: the curvature
 * parameter of Lekkerkerker (1964) and Van Dyke (1965) for a circular hole in a cylindrical
 * shell, as used for the Kt charts of openings in cylindrical shells in Pilkey & Pilkey,
 * Peterson's Stress Concentration Factors, 3rd ed., Sec. 4.5 (definition from memory, not checked
 * against the book in this session). At beta = 0 those charts start from the flat-plate value
 * (2.5 for a circular hole under the 2:1 membrane field) and rise with beta: the flat-plate
 * solution that `shellCutout.ts` computes understates the peak of a large opening.
 *
 * Conventions of this tool (stated, no source): for an elliptical opening a is the larger
 * semi-axis (the larger of w_c/2 and h_c/2, so beta errs on the large side); nu = 0.3 (metals;
 * nu = 0.33 changes beta by -0.5 %); a sphere uses the same parameter.
 *
 * The limit: beta <= 0.25, where the flat-plate value is within about 10 % of the shell peak
 * on the internal-pressure curve of those charts (a reading from memory, not checked against
 * the book in this session); James (1963, An Experimental Determination of Stress
 * Concentrations around Circular Holes in Cylindrical Pressure Vessels, MSc thesis, University
 * of Alberta) found by strain gauges that flat-plate theory is not a good basis unless the hole
 * is very small against the cylinder. Beyond the limit the check warns and asks for a shell
 * solution's `Kt` (a stated `Kt` replaces the flat-plate value).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MM } from '../computed';

export const SHELL_PARAMETER_LIMIT = 0.25;
export const SHELL_POISSON = 0.3;

const SOURCE =
  "Lekkerkerker (1964); Van Dyke (1965), AIAA J. 3; as used in Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed., Sec. 4.5 (openings in cylindrical shells; definition and the limit beta <= 0.25 from memory); James (1963), MSc thesis, University of Alberta (flat-plate theory only for holes very small against the cylinder)";

/**
 * beta for an opening of half-size `a` (m) in a shell of inner diameter D_i and wall t (m).
 * The note `large-shell-opening` (warning) says when beta exceeds the limit.
 */
export function shellParameter(a: number, D_i: number, t: number, nu = SHELL_POISSON): Computed {
  const formula = 'beta_shell = [3 (1 - nu^2)]^(1/4) * a / (2 * sqrt(R * t)), R = (D_i + t)/2';
  if (![a, D_i, t, nu].every(isFiniteNumber) || a <= 0 || D_i <= 0 || t <= 0 || nu <= -1 || nu >= 0.5) {
    return computed(0, formula, SOURCE, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'The shell parameter needs an opening size, D_i and t all positive; beta = 0 returned.',
      },
    ]);
  }
  const R = (D_i + t) / 2;
  const root = Math.sqrt(R * t);
  const c = (3 * (1 - nu * nu)) ** 0.25;
  const beta = (c * a) / (2 * root);
  const notes: MethodNote[] = [];
  if (beta > SHELL_PARAMETER_LIMIT) {
    notes.push({
      code: 'large-shell-opening',
      severity: 'warning',
      message:
        `beta = ${beta.toFixed(2)} > ${SHELL_PARAMETER_LIMIT}: the opening is not small against sqrt(R t) = ${(root / MM).toPrecision(3)} mm, ` +
        'and the flat-plate Kt understates the peak of the curved shell (Pilkey & Pilkey, Peterson SCF 3rd ed., Sec. 4.5, from memory). ' +
        'State `Kt` from a shell solution (e.g. the charts for openings in cylindrical shells) with its source.',
    });
  }
  return computed(
    beta,
    formula,
    SOURCE,
    [
      { name: 'a (larger semi-axis)', value: a / MM, unit: 'mm' },
      { name: 'R = (D_i + t)/2', value: R / MM, unit: 'mm' },
      { name: 't', value: t / MM, unit: 'mm' },
      { name: 'sqrt(R t)', value: root / MM, unit: 'mm' },
      { name: 'nu', value: nu, unit: '' },
      { name: '[3 (1 - nu^2)]^(1/4)', value: c, unit: '' },
      { name: 'limit', value: SHELL_PARAMETER_LIMIT, unit: '' },
    ],
    notes,
  );
}
