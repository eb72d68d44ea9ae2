/**
 * Combined in-phase loading reduced to von Mises equivalent stresses (the contract's
 * "Combined loading" method):
 *
 *   sigma_a_eq   = sqrt((Kf*|sigma_a| + Kf_ax*|sigma_ax_a|/0.85)^2 + 3*(Kfs*|tau_a|)^2)
 *   sigma_m_eq   = sign(m) * sqrt(m^2 + 3*(Kfsm*tau_m)^2),  m = Kfm*sigma_m + Kf_axm*sigma_ax_m
 *   sigma_max_eq = sqrt((|m| + n_a)^2 + 3*(|Kfsm*tau_m| + Kfs*|tau_a|)^2),
 *                  n_a = Kf*|sigma_a| + Kf_ax*|sigma_ax_a|   (axial without the 0.85)
 *
 * Amplitudes are magnitudes (a caller may give them negative). The mean keeps the sign of its
 * normal part so that a compressive mean stays compressive for the mean-stress criteria: this
 * signing is common practice, no source. The peak stress for first-cycle yield is the von Mises
 * stress of the worst in-phase peak state: of the states mean + amplitude and mean - amplitude of
 * every component, the larger; since amplitudes carry no phase sign, the combination that adds
 * the magnitudes is taken (Shigley's sigma'_max = [(sigma_m + sigma_a)^2 + 3 (tau_m + tau_a)^2]^(1/2)).
 */
import { type Computed, computed, isFiniteNumber, type MethodNote, MPA } from '../computed';

export interface EquivalentStressInput {
  Kf: number;
  Kf_ax: number;
  Kfs: number;
  Kfm: number;
  Kf_axm: number;
  Kfsm: number;
  sigma_a: number;
  sigma_m: number;
  sigma_ax_a: number;
  sigma_ax_m: number;
  tau_a: number;
  tau_m: number;
}

export interface EquivalentStresses {
  sigma_a_eq: Computed;
  sigma_m_eq: Computed;
  sigma_max_eq: Computed;
}

/** Load factor dividing the axial amplitude in the combined-loading amplitude (Shigley's kc = 0.85 for axial). */
export const AXIAL_LOAD_FACTOR = 0.85;

const SOURCE_A =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14, Eq. (6-66) (combinations of loading modes, axial amplitude divided by kc = 0.85)";
const SOURCE_M =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14, Eq. (6-67); a compressive normal mean signs it only without a shear mean (Sec. 6-12), with one it earns no credit (common practice, no source)";
const SOURCE_MAX =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14 (von Mises stress of the peak stresses for first-cycle yield, sigma'_max = [(sigma_m + sigma_a)^2 + 3 (tau_m + tau_a)^2]^(1/2), axial without 0.85)";

const KEYS: Array<keyof EquivalentStressInput> = [
  'Kf',
  'Kf_ax',
  'Kfs',
  'Kfm',
  'Kf_axm',
  'Kfsm',
  'sigma_a',
  'sigma_m',
  'sigma_ax_a',
  'sigma_ax_m',
  'tau_a',
  'tau_m',
];
const FACTOR_KEYS: Array<keyof EquivalentStressInput> = ['Kf', 'Kf_ax', 'Kfs', 'Kfm', 'Kf_axm', 'Kfsm'];

export function equivalentStresses(p: EquivalentStressInput): EquivalentStresses {
  const fA = 'sigma_a_eq = sqrt((Kf*sigma_a + Kf_ax*sigma_ax_a/0.85)^2 + 3*(Kfs*tau_a)^2)';
  const fM =
    'sigma_m_eq = sqrt(m^2 + 3*(Kfsm*tau_m)^2), m = Kfm*sigma_m + Kf_axm*sigma_ax_m; m < 0: -|m| without a shear mean, sqrt(3)*Kfsm*|tau_m| with one';
  const fMax =
    'sigma_max_eq = sqrt((|m| + Kf*|sigma_a| + Kf_ax*|sigma_ax_a|)^2 + 3*(|Kfsm*tau_m| + Kfs*|tau_a|)^2)';

  const bad = KEYS.filter((k) => !isFiniteNumber(p[k]));
  if (bad.length > 0) {
    const notes: MethodNote[] = [
      { code: 'input', message: `Not a finite number: ${bad.join(', ')}.`, severity: 'error' },
    ];
    return {
      sigma_a_eq: computed(0, fA, SOURCE_A, undefined, notes),
      sigma_m_eq: computed(0, fM, SOURCE_M, undefined, notes),
      sigma_max_eq: computed(0, fMax, SOURCE_MAX, undefined, notes),
    };
  }

  const notes: MethodNote[] = [];
  const negative = FACTOR_KEYS.filter((k) => p[k] < 0);
  if (negative.length > 0) {
    notes.push({
      code: 'input',
      message: `Concentration factors must not be negative (${negative.join(', ')}); their magnitudes are used.`,
      severity: 'error',
    });
  }
  const Kf = Math.abs(p.Kf);
  const Kf_ax = Math.abs(p.Kf_ax);
  const Kfs = Math.abs(p.Kfs);
  const Kfm = Math.abs(p.Kfm);
  const Kf_axm = Math.abs(p.Kf_axm);
  const Kfsm = Math.abs(p.Kfsm);

  const sa = Math.abs(p.sigma_a);
  const saxa = Math.abs(p.sigma_ax_a);
  const ta = Math.abs(p.tau_a);

  const normalAmp = Kf * sa + (Kf_ax * saxa) / AXIAL_LOAD_FACTOR;
  const shearAmp = Kfs * ta;
  const sigmaAEq = Math.sqrt(normalAmp * normalAmp + 3 * shearAmp * shearAmp);

  const normalMean = Kfm * p.sigma_m + Kf_axm * p.sigma_ax_m;
  const shearMean = Kfsm * p.tau_m;
  const sigmaMEq = equivalentMean(normalMean, shearMean);

  const normalPeak = Math.abs(normalMean) + Kf * sa + Kf_ax * saxa;
  const shearPeak = Math.abs(shearMean) + shearAmp;
  const sigmaMaxEq = Math.sqrt(normalPeak * normalPeak + 3 * shearPeak * shearPeak);

  if (!isFiniteNumber(sigmaAEq) || !isFiniteNumber(sigmaMEq) || !isFiniteNumber(sigmaMaxEq)) {
    const overflow: MethodNote[] = [
      ...notes,
      { code: 'input', message: 'Stresses too large: overflow.', severity: 'error' },
    ];
    return {
      sigma_a_eq: computed(0, fA, SOURCE_A, undefined, overflow),
      sigma_m_eq: computed(0, fM, SOURCE_M, undefined, overflow),
      sigma_max_eq: computed(0, fMax, SOURCE_MAX, undefined, overflow),
    };
  }

  const mpa = (name: string, v: number) => ({ name, value: v / MPA, unit: 'MPa' });
  const one = (name: string, v: number) => ({ name, value: v, unit: '' });

  const meanNotes: MethodNote[] = [...notes];
  if (normalMean < 0) {
    meanNotes.push({
      code: 'compressive-mean',
      message:
        shearMean === 0
          ? 'The normal mean stress is compressive and there is no shear mean: sigma_m_eq carries its sign, so the criteria take the compressive-mean branch.'
          : 'The normal mean stress is compressive but a shear mean acts: the compressive normal mean earns no credit and the shear mean still counts, sigma_m_eq = sqrt(3) Kfs |tau_m| (Shigley Sec. 6-12 for the compressive normal mean, Eq. 6-67 for the shear part).',
      severity: 'information',
    });
  }

  return {
    sigma_a_eq: computed(
      sigmaAEq,
      fA,
      SOURCE_A,
      [
        one('Kf', Kf),
        mpa('sigma_a', sa),
        one('Kf_ax', Kf_ax),
        mpa('sigma_ax_a', saxa),
        one('Kfs', Kfs),
        mpa('tau_a', ta),
        mpa('sigma_a_eq', sigmaAEq),
      ],
      notes,
    ),
    sigma_m_eq: computed(
      sigmaMEq,
      fM,
      SOURCE_M,
      [
        one('Kfm', Kfm),
        mpa('sigma_m', p.sigma_m),
        one('Kf_axm', Kf_axm),
        mpa('sigma_ax_m', p.sigma_ax_m),
        one('Kfsm', Kfsm),
        mpa('tau_m', p.tau_m),
        mpa('m', normalMean),
        mpa('sigma_m_eq', sigmaMEq),
      ],
      meanNotes,
    ),
    sigma_max_eq: computed(
      sigmaMaxEq,
      fMax,
      SOURCE_MAX,
      [mpa('normal peak', normalPeak), mpa('shear peak', shearPeak), mpa('sigma_max_eq', sigmaMaxEq)],
      notes,
    ),
  };
}

const SOURCE_A_POINT =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14, Eq. (6-66), evaluated at one point of the section with the signed components that act there (axial amplitude divided by kc = 0.85)";
const SOURCE_M_POINT =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14, Eq. (6-67), at one point of the section; a compressive normal mean signs it only without a shear mean (Sec. 6-12), with one it earns no credit (common practice, no source)";
const SOURCE_MAX_POINT =
  "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Sec. 6-14 (von Mises stress of the peak stresses for first-cycle yield, axial without 0.85), taken at both instants of the in-phase cycle (mean + amplitude and mean - amplitude) at one point, the larger: a compressive peak counts like a tensile one";

/**
 * Equivalent stresses at one point of the section from signed components (in-phase loads):
 * every component is `mean + amplitude` at the first instant of the cycle and `mean - amplitude`
 * at the second, with the amplitudes signed (a negative amplitude is a component that falls
 * while the others rise). At the point the normal components add with their signs:
 *
 *   n_a = Kf*sigma_a + Kf_ax*sigma_ax_a/0.85,  n_m = Kfm*sigma_m + Kf_axm*sigma_ax_m
 *   sigma_a_eq   = sqrt(n_a^2 + 3*(Kfs*tau_a)^2)
 *   sigma_m_eq   = sign(n_m) * sqrt(n_m^2 + 3*(Kfsm*tau_m)^2)
 *   sigma_max_eq = max over the two instants of sqrt(sigma^2 + 3 tau^2),
 *                  sigma = n_m +/- (Kf*sigma_a + Kf_ax*sigma_ax_a), tau = Kfsm*tau_m +/- Kfs*tau_a
 *
 * The bending components are those at this point (a caller evaluating the opposite fibre
 * passes them with the opposite sign). With one normal component these equal
 * `equivalentStresses`; with bending and axial together they differ from it where the two
 * have opposite signs at the point.
 */
export function pointEquivalentStresses(p: EquivalentStressInput): EquivalentStresses {
  const fA =
    'sigma_a_eq = sqrt((Kf*sigma_a + Kf_ax*sigma_ax_a/0.85)^2 + 3*(Kfs*tau_a)^2)  (signed components at the point)';
  const fM =
    'sigma_m_eq = sqrt(m^2 + 3*(Kfsm*tau_m)^2), m = Kfm*sigma_m + Kf_axm*sigma_ax_m; m < 0: -|m| without a shear mean, sqrt(3)*Kfsm*|tau_m| with one  (at the point)';
  const fMax =
    'sigma_max_eq = max over the instants +/- of sqrt((m +/- (Kf*sigma_a + Kf_ax*sigma_ax_a))^2 + 3*(Kfsm*tau_m +/- Kfs*tau_a)^2)';

  const bad = KEYS.filter((k) => !isFiniteNumber(p[k]));
  if (bad.length > 0) {
    const notes: MethodNote[] = [
      { code: 'input', message: `Not a finite number: ${bad.join(', ')}.`, severity: 'error' },
    ];
    return {
      sigma_a_eq: computed(0, fA, SOURCE_A_POINT, undefined, notes),
      sigma_m_eq: computed(0, fM, SOURCE_M_POINT, undefined, notes),
      sigma_max_eq: computed(0, fMax, SOURCE_MAX_POINT, undefined, notes),
    };
  }
  const notes: MethodNote[] = [];
  const negative = FACTOR_KEYS.filter((k) => p[k] < 0);
  if (negative.length > 0) {
    notes.push({
      code: 'input',
      message: `Concentration factors must not be negative (${negative.join(', ')}); their magnitudes are used.`,
      severity: 'error',
    });
  }
  const Kf = Math.abs(p.Kf);
  const Kf_ax = Math.abs(p.Kf_ax);
  const Kfs = Math.abs(p.Kfs);
  const Kfm = Math.abs(p.Kfm);
  const Kf_axm = Math.abs(p.Kf_axm);
  const Kfsm = Math.abs(p.Kfsm);

  const normalAmp = Kf * p.sigma_a + (Kf_ax * p.sigma_ax_a) / AXIAL_LOAD_FACTOR;
  const shearAmp = Kfs * p.tau_a;
  const sigmaAEq = Math.sqrt(normalAmp * normalAmp + 3 * shearAmp * shearAmp);

  const normalMean = Kfm * p.sigma_m + Kf_axm * p.sigma_ax_m;
  const shearMean = Kfsm * p.tau_m;
  const sigmaMEq = equivalentMean(normalMean, shearMean);

  const peakAmp = Kf * p.sigma_a + Kf_ax * p.sigma_ax_a;
  const s1 = normalMean + peakAmp;
  const t1 = shearMean + shearAmp;
  const s2 = normalMean - peakAmp;
  const t2 = shearMean - shearAmp;
  const vm1 = Math.sqrt(s1 * s1 + 3 * t1 * t1);
  const vm2 = Math.sqrt(s2 * s2 + 3 * t2 * t2);
  const sigmaMaxEq = Math.max(vm1, vm2);

  if (!isFiniteNumber(sigmaAEq) || !isFiniteNumber(sigmaMEq) || !isFiniteNumber(sigmaMaxEq)) {
    const overflow: MethodNote[] = [
      ...notes,
      { code: 'input', message: 'Stresses too large: overflow.', severity: 'error' },
    ];
    return {
      sigma_a_eq: computed(0, fA, SOURCE_A_POINT, undefined, overflow),
      sigma_m_eq: computed(0, fM, SOURCE_M_POINT, undefined, overflow),
      sigma_max_eq: computed(0, fMax, SOURCE_MAX_POINT, undefined, overflow),
    };
  }
  const mpa = (name: string, v: number) => ({ name, value: v / MPA, unit: 'MPa' });
  const one = (name: string, v: number) => ({ name, value: v, unit: '' });
  const meanNotes: MethodNote[] = [...notes];
  if (normalMean < 0) {
    meanNotes.push({
      code: 'compressive-mean',
      message:
        shearMean === 0
          ? 'The normal mean stress is compressive and there is no shear mean: sigma_m_eq carries its sign, so the criteria take the compressive-mean branch.'
          : 'The normal mean stress is compressive but a shear mean acts: the compressive normal mean earns no credit and the shear mean still counts, sigma_m_eq = sqrt(3) Kfs |tau_m| (Shigley Sec. 6-12 for the compressive normal mean, Eq. 6-67 for the shear part).',
      severity: 'information',
    });
  }
  const maxNotes: MethodNote[] = [...notes];
  maxNotes.push({
    code: 'peak-instant',
    message:
      vm1 >= vm2
        ? `The peak is at the instant mean + amplitude (normal ${(s1 / MPA).toPrecision(4)} MPa, shear ${(t1 / MPA).toPrecision(4)} MPa).`
        : `The peak is at the instant mean - amplitude (normal ${(s2 / MPA).toPrecision(4)} MPa, shear ${(t2 / MPA).toPrecision(4)} MPa).`,
    severity: 'information',
  });
  return {
    sigma_a_eq: computed(
      sigmaAEq,
      fA,
      SOURCE_A_POINT,
      [
        one('Kf', Kf),
        mpa('sigma_a', p.sigma_a),
        one('Kf_ax', Kf_ax),
        mpa('sigma_ax_a', p.sigma_ax_a),
        one('Kfs', Kfs),
        mpa('tau_a', p.tau_a),
        mpa('sigma_a_eq', sigmaAEq),
      ],
      notes,
    ),
    sigma_m_eq: computed(
      sigmaMEq,
      fM,
      SOURCE_M_POINT,
      [
        one('Kfm', Kfm),
        mpa('sigma_m', p.sigma_m),
        one('Kf_axm', Kf_axm),
        mpa('sigma_ax_m', p.sigma_ax_m),
        one('Kfsm', Kfsm),
        mpa('tau_m', p.tau_m),
        mpa('m', normalMean),
        mpa('sigma_m_eq', sigmaMEq),
      ],
      meanNotes,
    ),
    sigma_max_eq: computed(
      sigmaMaxEq,
      fMax,
      SOURCE_MAX_POINT,
      [
        mpa('normal, instant +', s1),
        mpa('shear, instant +', t1),
        mpa('normal, instant -', s2),
        mpa('shear, instant -', t2),
        mpa('sigma_max_eq', sigmaMaxEq),
      ],
      maxNotes,
    ),
  };
}

/**
 * The von Mises mean with the sign the mean-stress criteria need. A tensile (or zero) normal
 * mean: Shigley Eq. 6-67, sqrt(m^2 + 3 tau_m^2). A compressive normal mean and no shear mean:
 * -|m|, so that the criteria take their compressive branch (Shigley Sec. 6-12, n = Se/sigma_a).
 * A compressive normal mean with a shear mean: the compression earns no credit and the shear
 * mean keeps its Eq. 6-67 share, sqrt(3)|tau_m| (positive). This is continuous across m = 0
 * and never lets a small compressive normal mean erase a torsional mean (common practice, no
 * source; conservative against signing the whole von Mises mean with m).
 */
export function equivalentMean(normalMean: number, shearMean: number): number {
  if (normalMean >= 0) return Math.sqrt(normalMean * normalMean + 3 * shearMean * shearMean);
  if (shearMean === 0) return normalMean;
  return Math.sqrt(3) * Math.abs(shearMean);
}
