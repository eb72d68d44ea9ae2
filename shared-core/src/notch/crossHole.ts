/**
 * Transverse (cross) hole through a solid round shaft: elastic stress concentration factor,
 * referred to the GROSS solid-section nominal stress with the shaft diameter d
 * (32M/(pi d^3), 16T/(pi d^3), 4F/(pi d^2)), as the block-language contract requires.
 *
 * Bending and torsion: Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed.,
 * Sec. 4 (transverse hole in a round bar or tube, gross-section fits with C1..C4 functions of
 * di/D), read from the public transcription at eng-calculations.com ("Bending / Torsion of a
 * tube with a transverse hole"), here with di = 0 (solid shaft):
 *   bending  Ktg = 3 - 6.250 x + 41.000 x^2 - 45.000 x^3                 (x = d_hole/d)
 *   torsion  Ktg = sigma_max/tau_nom = 4 - 6.055 x + 32.764 x^2 - 38.330 x^3
 * The torsion fit is the peak NORMAL stress over the nominal shear stress (4 for a small hole
 * in pure shear, Kirsch). The contract's Kts is a shear factor used with tau (Shigley's
 * convention, Fig. A-15-10): the hole edge is a free surface in uniaxial tangential stress,
 * so tau_max = sigma_max/2 exactly and Kts = Ktg/2.
 * Chart numbers and the fits' d_hole/d range are not verified here; the fits are used up to
 * d_hole/d = 0.4 (the cubics turn over just above 0.45) and held non-decreasing beyond it.
 *
 * Axial: no published fit could be verified for this session. The value returned is an
 * engineering estimate with NO published source: Kirsch's 3.0 applied to the net-section
 * stress, Kt_ax = 3 A_gross / A_net (A_net = solid section minus the hole's strip). It tends
 * to the exact small-hole value 3.0, but is flagged with a warning: state Kt_ax if you have it.
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, type Term } from '../computed';
import type { ShaftLoad } from './shoulderFillet';

const X_MAX = 0.4;

const SOURCE_FIT =
  "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (Wiley 2008), Sec. 4, round bar/tube with a transverse hole, gross-section fits (solid shaft: di/D = 0)";
const SOURCE_AXIAL =
  'Engineering estimate, no published source: Kirsch (1898) value 3.0 on the net-section stress, Kt_ax = 3 A/A_net';

function bendingKtg(x: number): number {
  return 3 - 6.25 * x + 41 * x * x - 45 * x * x * x;
}

function torsionKtg(x: number): number {
  return 4 - 6.055 * x + 32.764 * x * x - 38.33 * x * x * x;
}

/** Area of the strip |y| <= c of a circle of radius R (c <= R). */
function stripArea(R: number, c: number): number {
  return 2 * (c * Math.sqrt(R * R - c * c) + R * R * Math.asin(c / R));
}

/** Kt of a transverse hole (shaft diameter d, hole diameter d_hole; SI lengths), gross-section based. */
export function crossHoleKt(load: ShaftLoad, d: number, d_hole: number): Computed {
  const sym = load === 'torsion' ? 'Kts' : load === 'axial' ? 'Kt_ax' : 'Kt';
  const invalid = (formula: string, source: string): Computed =>
    computed(1, formula, source, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: 'Cross hole needs d > 0 and 0 < d_hole < d; Kt = 1 returned (no concentration computed).',
      },
    ]);

  if (load === 'axial') {
    const formula =
      'Kt_ax = 3 A/A_net, A = pi d^2/4, A_net = A - strip |y| <= d_hole/2; nominal 4 F/(pi d^2)';
    if (!isFiniteNumber(d) || !isFiniteNumber(d_hole) || d <= 0 || d_hole <= 0 || d_hole >= d) {
      return invalid(formula, SOURCE_AXIAL);
    }
    const R = d / 2;
    const A = Math.PI * R * R;
    const strip = stripArea(R, d_hole / 2);
    const aNet = A - strip;
    const kt = (3 * A) / aNet;
    const notes: MethodNote[] = [
      {
        code: 'unverified-method',
        severity: 'warning',
        message:
          'No verified published fit for a transverse hole under axial load is built in; Kt_ax is an engineering estimate (3.0 on the net section). State Kt_ax from a chart (e.g. Peterson) if available.',
      },
    ];
    const terms: Term[] = [
      { name: 'd_hole/d', value: d_hole / d, unit: '' },
      { name: 'A_net/A', value: aNet / A, unit: '' },
    ];
    return computed(kt, formula, SOURCE_AXIAL, terms, notes);
  }

  const isTorsion = load === 'torsion';
  const formula = isTorsion
    ? 'Kts = Ktg/2, Ktg = sigma_max/tau_nom = 4 - 6.055 x + 32.764 x^2 - 38.33 x^3, x = d_hole/d; nominal 16 T/(pi d^3)'
    : 'Kt = 3 - 6.25 x + 41 x^2 - 45 x^3, x = d_hole/d; nominal 32 M/(pi d^3)';
  if (load !== 'bending' && load !== 'torsion') {
    return computed(1, formula, SOURCE_FIT, undefined, [
      {
        code: 'invalid-input',
        severity: 'error',
        message: `Unknown load '${String(load)}'; Kt = 1 returned.`,
      },
    ]);
  }
  if (!isFiniteNumber(d) || !isFiniteNumber(d_hole) || d <= 0 || d_hole <= 0 || d_hole >= d) {
    return invalid(formula, SOURCE_FIT);
  }
  const notes: MethodNote[] = [];
  const x = d_hole / d;
  const f = isTorsion ? torsionKtg : bendingKtg;
  let ktg = f(x);
  if (x > X_MAX) {
    ktg = Math.max(ktg, f(X_MAX));
    notes.push({
      code: 'fit-range',
      severity: 'warning',
      message: `d_hole/d = ${x.toPrecision(3)} is above the range used for this fit (<= ${X_MAX}); the value is held at least at its value at ${X_MAX}. A large cross hole: state ${sym}.`,
    });
  }
  const terms: Term[] = [{ name: 'd_hole/d', value: x, unit: '' }];
  let kt = ktg;
  if (isTorsion) {
    terms.push({ name: 'Ktg = sigma_max/tau_nom', value: ktg, unit: '' });
    kt = ktg / 2;
    notes.push({
      code: 'torsion-convention',
      severity: 'information',
      message:
        'Kts = tau_max/tau_nom = Ktg/2. The peak at the hole edge is a uniaxial normal stress Ktg*tau_nom; the von Mises combination with sqrt(3)*Kfs*tau gives 0.87 of it at this point (Shigley convention).',
    });
  }
  return computed(kt, formula, SOURCE_FIT, terms, notes);
}
