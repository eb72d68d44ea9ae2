/**
 * `method: weld`: a welded detail checked by its detail class (EN 1993-1-9 detail category or IIW
 * FAT class). The pipeline only wires the pure functions of `weld/`:
 *
 * 1. the stress at the detail: stated ranges (`delta_sigma`, `delta_tau`), or `sigma_max`/`sigma_min`
 *    (`tau_max`/`tau_min`), or a hot-spot range extrapolated from surface ranges at the reference
 *    points (`sigma_x1` ...), or the range on the throat of a load-carrying fillet weld
 *    (`dF_perp`, `a_w`, `n_w`); the stress type (`stress-type:`) decides which classes apply;
 * 2. the class: stated (`delta_sigma_C`, `delta_tau_C`) or from the catalogue (`detail:`), checked
 *    against the stress type; corrected for thickness, stress ratio (only where the residual-stress
 *    state allows it) and a stated improvement method;
 * 3. the curve of the standard, the partial factors (stated, or defaulted with a warning);
 * 4. the loading: constant amplitude with the required cycles `N`, `spectrum:` lines of ranges,
 *    or a `history:` of the stress through the rainflow counter; damage on the design curve, the
 *    equivalent range at 2e6 cycles, the utilisation, the safety factor on stress range, the life.
 */

import { statedFamily } from '../../checks/material';
import { type Computed, computed, infinite, MM, MPA } from '../../computed';
import type { CheckContext } from '../../context/checkContext';
import { ExpressionError, type Quantity } from '../../context/quantity';
import type { SpectrumStatement } from '../../context/statements';
import type { Range, WeldSnData } from '../../context/types';
import { HistoryCsvReader, RAINFLOW_SOURCE, RainflowCounter } from '../../rainflow';
import { sameVector, vectorOf } from '../../units/dimensions';
import {
  blocksToLimit,
  catalogueClass,
  constantAmplitudeSafetyFactor,
  cyclesToLimit,
  enCurve,
  enEffectiveRange,
  enInteraction,
  enSizeFactor,
  equivalentRange,
  findDetail,
  type HotSpotScheme,
  hotSpotClass,
  hotSpotStress,
  type IiwThicknessJoint,
  type ImprovementMethod,
  iiwCurve,
  iiwInteraction,
  iiwStressRatioFactor,
  iiwThicknessFactor,
  improvedClass,
  loadFactor,
  notchStressClass,
  permissibleDamage,
  type RangeCount,
  type ResidualCondition,
  rangeSafetyFactor,
  rangeUtilisation,
  resistanceFactor,
  statedThicknessFactorNotes,
  stressRangeLimit,
  stressTypeNotes,
  throatClass,
  throatNormalRange,
  WeldDamageAccumulator,
  type WeldMaterial,
  type WeldSnCurve,
  type WeldStandard,
  type WeldStressType,
  weldStrengthAtLife,
} from '../../weld';
import type { MethodExtras } from '../types';

export type { WeldSnData };

const STANDARDS: Record<string, { standard: WeldStandard; edition?: '2008' | '2016' }> = {
  'en-1993-1-9': { standard: 'EN 1993-1-9' },
  'iiw-2016': { standard: 'IIW', edition: '2016' },
  'iiw-2008': { standard: 'IIW', edition: '2008' },
};

/** Words of the shaft route that have no meaning for a welded detail, with the reason. */
const NOT_FOR_WELDS: Record<string, string> = {
  criterion:
    'a mean-stress criterion does not apply to a welded detail: residual stresses near yield make the local cycle tensile whatever the applied mean, so the class holds for the stress range alone (a stress-relieved joint is credited by `residual-stress:`)',
  surface:
    'the surface factor of the Marin chain does not apply to a weld: the weld profile and its surface are part of the detail class',
  'load-line':
    'a load line belongs to a mean-stress criterion, which does not apply to a welded detail: the class holds for the stress range alone',
  'mean-concentration':
    'the notch of a weld is in its detail class: no fatigue concentration acts on a mean stress',
  feature:
    'a stress-concentration fit does not apply to a weld: the local geometry is in the detail class (or use `stress-type: hot-spot` or `effective-notch`)',
  miner:
    "the knee of a weld curve is the standard's (EN 1993-1-9: m = 5 to the cut-off; IIW: by edition), not a `miner:` choice",
};
/** Dimension vector of a force per length (N/m = kg s^-2). */
const FORCE_PER_LENGTH = [1, 0, -2, 0, 0, 0, 0, 0, 0];

/** Families whose welds the standards' classes cover. */
const WELD_FAMILIES = new Set(['steel', 'stainless-steel', 'aluminium-wrought', 'aluminium-cast']);

const MARIN = ['ka', 'kb', 'kc', 'kd', 'ke', 'kmisc', 'Se', 'Se_prime', 'Kt', 'Kf', 'q', 'Sut'];

type Loading =
  | { kind: 'constant'; N: number; range: Range }
  | { kind: 'spectrum'; levels: Array<{ range: number; n: number; stmt: SpectrumStatement }> }
  | { kind: 'history'; cycles: RangeCount[]; counted: number; range: Range };

function note(ctx: CheckContext): void {
  for (const [key, why] of Object.entries(NOT_FOR_WELDS))
    if (ctx.options.has(key))
      ctx.diag('warning', 'not-for-welds', `\`${key}:\` is not used: ${why}`, ctx.optionRange(key));
  for (const n of MARIN)
    if (ctx.has(n))
      ctx.diag(
        'warning',
        'not-for-welds',
        `\`${n}\` is not used: Marin factors, notch factors and the endurance limit of a plain specimen do not apply to a welded detail; its geometry, residual stress and weld profile are in the detail class (state \`delta_sigma_C\` or \`detail:\`)`,
        ctx.rangeOf(n),
      );
}

export function runWeld(ctx: CheckContext): MethodExtras {
  note(ctx);
  const stdWord = ctx.option('standard');
  if (!stdWord) {
    if (!ctx.options.has('standard'))
      ctx.diag(
        'error',
        'missing-standard',
        'a weld check needs the standard its classes and curves come from: `standard: en-1993-1-9`, `standard: iiw-2016` or `standard: iiw-2008`',
        ctx.optionRange('method'),
        Object.keys(STANDARDS).map((w, i) => ({
          ...ctx.insertFix(`State \`standard: ${w}\``, `standard: ${w}`),
          preferred: i === 0,
        })),
      );
    return {};
  }
  const { standard, edition } = STANDARDS[stdWord];
  // The family from the library key or `material-family:`; classes exist for steels and aluminium.
  const named = statedFamily(ctx);
  const famWhere = ctx.optionRange('material') ?? ctx.optionRange('material-family');
  if (named && !WELD_FAMILIES.has(named.family)) {
    ctx.diag(
      'error',
      'weld-standard-material',
      `the weld classes of EN 1993-1-9 and the IIW recommendations are for steels and aluminium alloys, not ${named.family}: state a steel or an aluminium family`,
      famWhere,
    );
    return {};
  }
  const material: WeldMaterial = named?.family.startsWith('aluminium') ? 'aluminium' : 'steel';
  if (material === 'aluminium' && standard === 'EN 1993-1-9') {
    ctx.diag(
      'error',
      'weld-standard-material',
      'EN 1993-1-9 covers steel only: check an aluminium detail with `standard: iiw-2016` (or EN 1999-1-3, not implemented)',
      famWhere,
    );
    return {};
  }
  const stressType = (ctx.option('stress-type') ?? 'nominal') as 'nominal' | 'hot-spot' | 'effective-notch';
  const detailKey = ctx.option('detail');
  const entry = detailKey ? findDetail(detailKey) : undefined;

  // 1. The stress at the detail.
  const loading = readLoading(ctx);
  if (loading === null) return {};
  const stressed = normalStress(ctx, stressType, entry?.stressType === 'throat', loading, standard);
  if (stressed === null) return {};
  const usedType: WeldStressType = stressed.type;
  // A root detail rated on the throat, its range stated directly: say how it is read, since a
  // plate stress put there would understate the throat stress.
  if (usedType === 'throat' && !ctx.has('dF_perp') && (ctx.has('delta_sigma') || ctx.has('sigma_max')))
    ctx.diag(
      'warning',
      'throat-range-stated',
      `the detail is rated on the weld throat: the stated range is read as the stress range on the throat (force per throat area), not the plate's; a plate stress understates it: state it on the throat, or \`dF_perp\`, \`a_w\` and \`n_w\``,
      ctx.has('delta_sigma') ? ctx.rangeOf('delta_sigma') : ctx.rangeOf('sigma_max'),
    );
  // A stated hot-spot or notch stress type with the throat's forces: the throat stress is a
  // nominal stress on the weld metal, rated by the throat class, not a hot-spot or notch class.
  if (usedType === 'throat' && stressType !== 'nominal' && ctx.options.has('stress-type')) {
    ctx.diag(
      'error',
      'wrong-stress-type',
      `\`stress-type: ${stressType}\` with the forces on a throat (\`dF_perp\`, \`a_w\`): the throat stress is rated by the throat class of the weld metal; remove \`stress-type:\` or state the ${stressType} stress range at the toe instead`,
      ctx.optionRange('stress-type')!,
    );
    return {};
  }
  const hasShear = ctx.has('delta_tau') || ctx.has('tau_max') || ctx.has('tau_min');
  if (hasShear && loading.kind !== 'constant') {
    // Leaving the shear out would pass a detail that the interaction may fail.
    const name = ctx.has('delta_tau') ? 'delta_tau' : ctx.has('tau_max') ? 'tau_max' : 'tau_min';
    ctx.diag(
      'error',
      'shear-variable-amplitude',
      `a shear range with a ${loading.kind} is not checked here (the normal and shear cycles of a spectrum or history would have to be paired): check the shear in a check of its own (a \`spectrum:\` of its ranges with \`delta_tau_C\` as the class) or as constant amplitude with \`N\`, and combine the utilisations by the standard's interaction`,
      ctx.rangeOf(name),
    );
    return {};
  }
  const tau = hasShear && loading.kind === 'constant' ? shearRange(ctx) : undefined;
  if (hasShear && tau === undefined) return {};

  // 2. The class.
  const cls = normalClass(ctx, standard, material, usedType, entry, detailKey);
  if (cls === null) return {};
  const corrected = correctClass(ctx, standard, material, cls, stressed, entry?.iiwThicknessJoint);
  if (corrected === null) return {};

  // 3. Curve and partial factors.
  const curveRes =
    standard === 'EN 1993-1-9'
      ? enCurve(corrected.value, 'normal')
      : iiwCurve(corrected.value, edition!, { stress: 'normal', material, m1: corrected.m1 });
  const curve = curveRes.curve;
  ctx.result(
    'delta_sigma_D',
    computed(curve.deltaD, curveRes.formula, curve.source, curveRes.terms, curveRes.notes),
    ['delta_sigma_C_eff'],
    {
      dim: 'stress',
      range: ctx.has('delta_sigma_C') ? ctx.rangeOf('delta_sigma_C') : undefined,
      meaning: 'knee of the S-N curve (constant-amplitude fatigue limit for EN 1993-1-9)',
    },
  );
  // A class no standard has (below 1 MPa, above 1000 MPa: a wrong unit) gives no curve.
  if (curveRes.notes?.some((n) => n.severity === 'error')) return {};
  if (curve.deltaL !== null)
    ctx.result(
      'delta_sigma_L',
      computed(curve.deltaL, 'Delta sigma_L = (5/100)^(1/5) Delta sigma_D at 1e8', curve.source),
      ['delta_sigma_D'],
      { dim: 'stress', meaning: 'cut-off of the S-N curve' },
    );
  const gammaFf = factor(ctx, 'gamma_Ff', loadFactor(standard, ctx.input('gamma_Ff')));
  const concept = ctx.option('assessment') as 'damage-tolerant' | 'safe-life' | undefined;
  const consequence = ctx.option('consequence') as 'low' | 'high' | undefined;
  const gammaMf = factor(
    ctx,
    'gamma_Mf',
    resistanceFactor({
      standard,
      ...(concept ? { concept } : {}),
      ...(consequence ? { consequence } : {}),
      ...(ctx.has('gamma_Mf') ? { stated: ctx.input('gamma_Mf') } : {}),
    }),
  );
  if (gammaFf === null || gammaMf === null) return {};

  // Range limit relative to yield.
  const Sy =
    ctx.input('Sy') ??
    (named?.material
      ? ctx.library(
          'Sy',
          named.material.Sy,
          `${named.material.name} (${named.material.condition}): ${named.material.source}`,
          ctx.optionRange('material'),
        )
      : undefined);
  if (Sy !== undefined) {
    const maxRange = stressed.maxRange;
    const lim = stressRangeLimit(standard, maxRange, Sy, 'normal', usedType);
    ctx.result('u_yield', lim, [stressed.name, 'Sy'], {
      range: stressed.where,
      meaning: 'largest stress range over the standard limit relative to yield',
    });
    // Beyond the limit the detail yields every cycle: no S-N result is physical.
    if (lim.notes?.some((n) => n.severity === 'error')) return {};
    if (tau && usedType !== 'notch') {
      const limTau = stressRangeLimit(standard, tau.range, Sy, 'shear');
      ctx.result('u_yield_tau', limTau, ['delta_tau', 'Sy'], {
        range: tau.where,
        meaning: 'shear range over the limit 1.5 fy / sqrt(3)',
      });
      if (limTau.notes?.some((n) => n.severity === 'error')) return {};
    }
  } else
    ctx.diag(
      'warning',
      'missing-yield',
      'state `Sy` (the yield strength of the plate) so that the stress range can be checked against the limit of the standard (1.5 fy for nominal ranges)',
      stressed.where,
    );

  // 4. Damage, equivalent range, verification.
  const proportional = ctx.option('normal-shear') !== 'non-proportional';
  // Constant amplitude reads the life on the curve itself (D = 1); the permissible damage sum
  // of the standard belongs to variable amplitude (or is stated).
  const allowed =
    loading.kind === 'constant' && !ctx.has('D_allow')
      ? computed(
          1,
          'D_allow = 1 (constant amplitude: the life is read on the S-N curve itself)',
          curve.source,
        )
      : permissibleDamage(standard, {
          proportional,
          ...(ctx.has('D_allow') ? { stated: ctx.input('D_allow') } : {}),
        });
  // A stated value replaces the tool's, and with it the tool's remarks: the one on the stated value itself stays.
  if (ctx.has('D_allow'))
    for (const n of allowed.notes ?? [])
      if (n.code === 'damage-sum-above-recommended')
        ctx.diag('warning', n.code, n.message, ctx.rangeOf('D_allow'));
  const Dallow = ctx.result('D_allow', allowed, [], {
    range: ctx.rangeOf('D_allow'),
    meaning: 'permissible damage sum',
  });
  const cycles: RangeCount[] =
    loading.kind === 'constant'
      ? [{ range: stressed.maxRange, count: loading.N }]
      : loading.kind === 'spectrum'
        ? stressed.levels!.map((l) => ({ range: l.range, count: l.n }))
        : loading.cycles;
  const acc = new WeldDamageAccumulator(curve, {
    loading: loading.kind === 'constant' ? 'constant' : 'variable',
    gammaFf,
    gammaMf,
  });
  for (const c of cycles) acc.add(c.range, c.count);
  const dmg = acc.result(5);
  const total = cycles.reduce((s, c) => s + c.count, 0);
  const loadWhere = loading.kind === 'spectrum' ? loading.levels[0].stmt.whole : loading.range;
  const dInputs = ['delta_sigma_C_eff', 'gamma_Ff', 'gamma_Mf', stressed.name];
  if (standard === 'IIW' && edition === '2016' && loading.kind !== 'constant') {
    // The two editions treat the ranges below the knee differently (m = 22 against m2 = 5); the
    // 2016 slope rests on a recalled copy, so the note is told what the more onerous one gives.
    const alt = new WeldDamageAccumulator(
      iiwCurve(corrected.value, '2008', { stress: 'normal', material, m1: corrected.m1 }).curve,
      { loading: 'variable', gammaFf, gammaMf },
    );
    for (const c of cycles) alt.add(c.range, c.count);
    const D08 = alt.result(0).D;
    if (D08 > 1.05 * dmg.D)
      ctx.diag(
        'warning',
        'knee-slope-edition',
        `the IIW 2016 curve counts the ranges below the knee with m = 22 (a recalled copy: check it against the edition in use); the 2008 slope m2 = 5 gives D_sum = ${D08.toPrecision(4)}, ${(dmg.D > 0 ? D08 / dmg.D : Number.POSITIVE_INFINITY) < 1e6 ? `${(D08 / Math.max(dmg.D, 1e-300)).toPrecision(3)} times` : 'far above'} this one: state \`standard: iiw-2008\` for the more onerous treatment`,
        loadWhere,
      );
  }
  // The shear curve of a constant-amplitude check with a shear range: the life, the repeats and
  // the safety factor on range below take the normal-shear interaction, never the normal range alone.
  const tcls =
    tau && loading.kind === 'constant' ? shearClass(ctx, standard, material, usedType === 'throat') : null;
  const tcurve =
    tcls === null
      ? null
      : standard === 'EN 1993-1-9'
        ? enCurve(tcls, 'shear').curve
        : iiwCurve(tcls, edition!, { stress: 'shear', material }).curve;
  const interactionAt =
    tau && tcurve && loading.kind === 'constant'
      ? (x: number, n: number): number => {
          const us = allowedUtilisation(
            rangeUtilisation(
              constantEquivalent(curve, x * stressed.maxRange, n),
              curve.deltaC,
              gammaFf,
              gammaMf,
            ),
            Dallow ?? 1,
            curve.m1,
          ).value;
          const ut = allowedUtilisation(
            rangeUtilisation(constantEquivalent(tcurve, x * tau.range, n), tcurve.deltaC, gammaFf, gammaMf),
            Dallow ?? 1,
            tcurve.m1,
          ).value;
          return (standard === 'EN 1993-1-9' ? enInteraction(us, ut) : iiwInteraction(us, ut, proportional))
            .value;
        }
      : null;
  const D =
    ctx.result('D_sum', dmg, dInputs, {
      range: loadWhere,
      meaning:
        loading.kind === 'constant'
          ? 'Miner damage of the required cycles N on the design curve'
          : 'Miner damage of one pass of the spectrum or history on the design curve',
    }) ?? 0;
  ctx.result(
    'cycles_counted',
    computed(
      total,
      loading.kind === 'history'
        ? 'cycles_counted = full cycles + half cycles / 2 (rainflow)'
        : 'cycles_counted = sum of n',
      loading.kind === 'history' ? RAINFLOW_SOURCE : 'the note',
    ),
    [],
    { range: loadWhere },
  );
  const shearLife =
    interactionAt && loading.kind === 'constant'
      ? interactionLife(interactionAt, loading.N, curve.source)
      : null;
  ctx.result(
    'repeats',
    shearLife ? shearLife.repeats : blocksToLimit(D, Dallow ?? 1),
    shearLife ? ['delta_sigma', 'delta_tau', 'N'] : ['D_sum', 'D_allow'],
    {
      range: loadWhere,
      meaning: 'passes of the spectrum (or of the N cycles) until the damage reaches D_allow',
    },
  );
  ctx.result(
    'N_f',
    shearLife ? shearLife.life : cyclesToLimit(D, total, Dallow ?? 1),
    shearLife ? ['delta_sigma', 'delta_tau'] : ['D_sum', 'D_allow', 'cycles_counted'],
    {
      range: loadWhere,
      meaning: shearLife
        ? 'cycles at which the normal-shear interaction of the verification reaches 1'
        : 'cycles to the permissible damage sum on the design curve',
    },
  );
  // Equivalent range at 2e6 (exactly the range whose 2e6 cycles do the same damage on the m1 branch).
  const eq =
    loading.kind === 'constant'
      ? constantEquivalent(curve, stressed.maxRange, loading.N)
      : equivalentRange(D, curve, gammaFf, gammaMf);
  const dE2 = ctx.result('delta_sigma_E2', eq, ['D_sum', 'delta_sigma_C_eff', 'gamma_Ff', 'gamma_Mf'], {
    dim: 'stress',
    range: loadWhere,
    meaning: 'equivalent constant-amplitude stress range at 2e6 cycles',
  });
  const uSigma = ctx.result(
    'u_sigma',
    allowedUtilisation(rangeUtilisation(dE2 ?? 0, curve.deltaC, gammaFf, gammaMf), Dallow ?? 1, curve.m1),
    ['delta_sigma_E2', 'delta_sigma_C_eff', 'gamma_Ff', 'gamma_Mf', 'D_allow'],
    { range: loadWhere, meaning: 'utilisation of the normal-stress range verification at 2e6 cycles' },
  );
  // Shear and interaction (constant amplitude).
  let uTau: number | null = null;
  if (tau && loading.kind === 'constant') {
    if (tcls !== null && tcurve !== null) {
      const tacc = new WeldDamageAccumulator(tcurve, { loading: 'constant', gammaFf, gammaMf });
      tacc.add(tau.range, loading.N);
      ctx.result('D_tau', tacc.result(0), ['delta_tau_C', 'delta_tau'], {
        range: tau.where,
        meaning: 'Miner damage of the shear range on the shear curve',
      });
      const eqt = constantEquivalent(tcurve, tau.range, loading.N);
      const dtE2 = ctx.result('delta_tau_E2', eqt, ['D_tau'], {
        dim: 'stress',
        range: tau.where,
        meaning: 'equivalent constant-amplitude shear range at 2e6 cycles',
      });
      uTau = ctx.result(
        'u_tau',
        allowedUtilisation(
          rangeUtilisation(dtE2 ?? 0, tcurve.deltaC, gammaFf, gammaMf),
          Dallow ?? 1,
          tcurve.m1,
        ),
        ['delta_tau_E2', 'D_allow'],
        {
          range: tau.where,
          meaning: 'utilisation of the shear-range verification at 2e6 cycles',
        },
      );
    }
  }
  let u: Computed;
  if (uTau !== null && uSigma !== null)
    u = standard === 'EN 1993-1-9' ? enInteraction(uSigma, uTau) : iiwInteraction(uSigma, uTau, proportional);
  else u = computed(uSigma ?? 0, 'u_fat = u_sigma', curve.source);
  ctx.result('u_fat', u, uTau !== null ? ['u_sigma', 'u_tau'] : ['u_sigma'], {
    range: loadWhere,
    meaning:
      'utilisation of the verification (normal range, or the normal-shear interaction); at most 1 passes',
  });
  // Safety factor on stress range.
  const Dlim = Dallow ?? 1;
  const sf =
    interactionAt && loading.kind === 'constant'
      ? interactionFactor(interactionAt, loading.N, curve.source)
      : loading.kind === 'constant'
        ? constantAmplitudeSafetyFactor(curve, stressed.maxRange, loading.N, 'constant', gammaFf, gammaMf)
        : rangeSafetyFactor(curve, cycles, Dlim, { loading: 'variable', gammaFf, gammaMf });
  ctx.result('n_range', sf, ['delta_sigma_C_eff', 'gamma_Ff', 'gamma_Mf', stressed.name], {
    range: loadWhere,
    meaning: 'safety factor on stress range: the factor on every range that brings the damage to D_allow',
  });

  const design: WeldSnData = {
    label: `${curve.label}, divided by gamma_Mf = ${gammaMf}`,
    stress: 'normal',
    deltaC: curve.deltaC / gammaMf,
    m1: curve.m1,
    ND: curve.ND,
    deltaD: curve.deltaD / gammaMf,
    m2: loading.kind === 'constant' ? curve.m2Constant : curve.m2Variable,
    NL: curve.NL,
    deltaL: curve.deltaL === null ? null : curve.deltaL / gammaMf,
    points: cyclesPoints(curve, cycles, gammaFf, gammaMf, loading.kind === 'constant'),
  };
  return { weldSn: [design], tables: damageTable(ctx, curve, gammaFf, gammaMf, loading) };
}

function cyclesPoints(
  curve: WeldSnCurve,
  cycles: RangeCount[],
  gammaFf: number,
  gammaMf: number,
  constant: boolean,
): WeldSnData['points'] {
  const design = {
    ...curve,
    deltaC: curve.deltaC / gammaMf,
    deltaD: curve.deltaD / gammaMf,
    deltaL: curve.deltaL === null ? null : curve.deltaL / gammaMf,
  };
  const sorted = [...cycles].sort((a, b) => b.range - a.range).slice(0, 40);
  return sorted.map((c) => {
    const s = c.range * gammaFf;
    const N = lifeOf(design, s, constant);
    return { label: `${(s / MPA).toPrecision(4)} MPa`, range: s, count: c.count, N };
  });
}

function lifeOf(c: WeldSnCurve, s: number, constant: boolean): number | null {
  if (!(s > 0)) return null;
  if (s >= c.deltaD) return c.NC * (c.deltaC / s) ** c.m1;
  if (c.deltaL !== null && s < c.deltaL) return null;
  const m2 = constant ? c.m2Constant : c.m2Variable;
  if (m2 === null) return null;
  return c.ND * (c.deltaD / s) ** m2;
}

function damageTable(
  ctx: CheckContext,
  curve: WeldSnCurve,
  gammaFf: number,
  gammaMf: number,
  loading: Loading,
): NonNullable<MethodExtras['tables']> {
  if (loading.kind !== 'spectrum') return [];
  const design = {
    ...curve,
    deltaC: curve.deltaC / gammaMf,
    deltaD: curve.deltaD / gammaMf,
    deltaL: curve.deltaL === null ? null : curve.deltaL / gammaMf,
  };
  const rows = loading.levels.map((l) => {
    const N = lifeOf(design, l.range * gammaFf, false);
    return [
      String(l.stmt.line + 1),
      ctx.display(l.range, 'stress'),
      ctx.display(l.n, 'one'),
      N === null ? 'no damage' : ctx.display(N, 'one'),
      N === null ? '0' : (l.n / N).toPrecision(4),
    ];
  });
  return [
    {
      title: 'Damage per spectrum level (design curve)',
      columns: ['line', 'range', 'n', 'N', 'n / N'],
      rows,
    },
  ];
}

function factor(ctx: CheckContext, name: string, c: Computed): number | null {
  const bad = c.notes?.some((n) => n.severity === 'error');
  // A defaulted factor is shown where its default comes from: gamma_Ff at the standard,
  // gamma_Mf at the assessment concept or consequence class (or the block's header).
  const where = ctx.has(name)
    ? ctx.rangeOf(name)
    : name === 'gamma_Ff'
      ? (ctx.optionRange('standard') ?? ctx.header)
      : (ctx.optionRange('assessment') ?? ctx.optionRange('consequence') ?? ctx.header);
  const v = ctx.result(name, c, [], {
    range: where,
    meaning:
      name === 'gamma_Ff'
        ? 'partial factor on the fatigue load (stress ranges)'
        : 'partial factor on the fatigue strength',
  });
  return bad ? null : v;
}

/** The loading: required cycles, spectrum of ranges, or a stress history. */
function readLoading(ctx: CheckContext): Loading | null {
  const hist = ctx.options.get('history');
  const kinds = [ctx.has('N'), ctx.spectrum.length > 0, !!hist].filter(Boolean).length;
  if (kinds === 0) {
    ctx.diag(
      'error',
      'missing-weld-loading',
      'a weld check needs its cycles: the required cycles `N` of a constant-amplitude range, `spectrum:` lines of ranges (`spectrum: delta_sigma = 60 MPa, n = 2e5`), or a `history:` of the stress at the detail',
      ctx.optionRange('method'),
    );
    return null;
  }
  if (kinds > 1) {
    ctx.diag(
      'error',
      'history-and-spectrum',
      'give the cycles one way only: `N` with a constant range, `spectrum:` lines, or a `history:` file (make two checks)',
      hist?.whole ?? ctx.spectrum[0]?.whole ?? ctx.rangeOf('N'),
    );
    return null;
  }
  if (ctx.has('N')) return { kind: 'constant', N: ctx.input('N')!, range: ctx.rangeOf('N') };
  if (ctx.spectrum.length > 0) {
    const levels = readWeldSpectrum(ctx);
    return levels ? { kind: 'spectrum', levels } : null;
  }
  return readHistory(ctx, hist!.whole);
}

function readWeldSpectrum(
  ctx: CheckContext,
): Array<{ range: number; n: number; stmt: SpectrumStatement }> | null {
  const out: Array<{ range: number; n: number; stmt: SpectrumStatement }> = [];
  let ok = true;
  for (const stmt of ctx.spectrum) {
    const got: Record<string, number> = {};
    for (const item of stmt.items) {
      const name = item.name.text;
      if (!['delta_sigma', 'sigma_max', 'sigma_min', 'n'].includes(name)) {
        ctx.diag(
          'error',
          'unknown-spectrum-name',
          `\`${name}\` cannot describe a level of a weld spectrum: give the stress range \`delta_sigma\` (or \`sigma_max\` and \`sigma_min\`) at the detail and the cycles \`n\``,
          item.name.range,
        );
        ok = false;
        continue;
      }
      let q: Quantity;
      try {
        if (!ctx.evaluate)
          throw new ExpressionError('expression-error', 'expressions cannot be evaluated here');
        q = ctx.evaluate(item.expr.text);
      } catch (e) {
        const err = e instanceof ExpressionError ? e : new ExpressionError('expression-error', String(e));
        ctx.diag('error', err.code, `${name}: ${err.message}`, item.expr.range);
        ok = false;
        continue;
      }
      const want = vectorOf(name === 'n' ? 'one' : 'stress')!;
      if (!sameVector(q.dim, want)) {
        ctx.diag(
          'error',
          q.dim.every((x) => x === 0) ? 'missing-unit' : 'wrong-dimension',
          name === 'n'
            ? '`n` is a number of cycles (a pure number)'
            : `\`${name}\` must be a stress (e.g. MPa)`,
          item.expr.range,
        );
        ok = false;
        continue;
      }
      got[name] = q.si;
    }
    if (!ok) continue;
    if (!(got.n > 0)) {
      ctx.diag(
        'error',
        'missing-cycles',
        'this spectrum level needs a positive number of cycles `n = ...`',
        stmt.whole,
      );
      ok = false;
      continue;
    }
    let range: number | undefined = got.delta_sigma;
    if (range === undefined && got.sigma_max !== undefined && got.sigma_min !== undefined)
      range = got.sigma_max - got.sigma_min;
    if (range === undefined || !(range >= 0)) {
      ctx.diag(
        'error',
        'missing-load',
        'this level needs its stress range: `delta_sigma = ...` (a non-negative stress), or `sigma_max` and `sigma_min` with sigma_max >= sigma_min',
        stmt.whole,
      );
      ok = false;
      continue;
    }
    out.push({ range, n: got.n, stmt });
  }
  return ok ? out : null;
}

function readHistory(ctx: CheckContext, where: Range): Loading | null {
  const path = ctx.options.get('history')!.value.text;
  const load = ctx.options.get('history-load')?.value.text;
  if (load !== 'stress') {
    ctx.diag(
      'error',
      'missing-option',
      'a weld check reads the history of the stress at the detail: state `history-load: stress` and `history_scale` (the stress of 1.0 in the file)',
      ctx.optionRange('history-load') ?? where,
    );
    return null;
  }
  const sc = ctx.stated.get('history_scale');
  if (!sc || !sameVector(sc.q.dim, vectorOf('stress')!) || sc.q.si === 0) {
    ctx.diag(
      'error',
      sc ? 'wrong-dimension' : 'missing-input',
      'state `history_scale`, the stress of 1.0 in the file (a non-zero stress, e.g. `history_scale = 1 MPa`)',
      sc?.stmt.expr.range ?? where,
    );
    return null;
  }
  ctx.used.add('history_scale');
  const reader = ctx.histories;
  if (!reader) {
    ctx.diag(
      'error',
      'history-unavailable',
      'history files cannot be read here: evaluate the note from the editor or the command line, which read files inside the workspace',
      where,
    );
    return null;
  }
  const scale = Math.abs(sc.q.si);
  const cycles: RangeCount[] = [];
  const bands = new Map<number, RangeCount>();
  let counted = 0;
  const counter = new RainflowCounter({
    gate: 0,
    onCycle: (range, _mean, count) => {
      counted += count;
      const r = range * scale;
      // 1 % bands keep the memory bounded; each band keeps its largest range (conservative).
      const key = r > 0 ? Math.floor(Math.log(r) / Math.log(1.01)) : -1e9;
      const b = bands.get(key);
      if (b) {
        b.count += count;
        if (r > b.range) b.range = r;
      } else bands.set(key, { range: r, count });
    },
  });
  const colText = ctx.options.get('history-column')?.value.text;
  const column = colText === undefined ? undefined : /^\d+$/.test(colText) ? Number(colText) : colText;
  const csv = new HistoryCsvReader({
    ...(column !== undefined ? { column } : {}),
    onValue: (x) => counter.push(x),
  });
  const r = reader.read(path, (chunk) => csv.feed(chunk));
  if (!r.ok) {
    ctx.diag('error', r.code, r.message, where);
    return null;
  }
  csv.end();
  for (const i of csv.issues) ctx.diag(i.severity ?? 'warning', i.code, `\`${path}\`: ${i.message}`, where);
  if (csv.fatal || csv.badRowCount > 0 || csv.valueCount < 3) {
    if (!csv.fatal)
      ctx.diag(
        'information',
        'results-withheld',
        `no damage until \`${path}\` has at least 3 readable values and no unreadable rows`,
        where,
      );
    return null;
  }
  const rf = counter.finish();
  for (const n of rf.notes)
    if (n.code !== 'history-too-few-points') ctx.diag(n.severity ?? 'warning', n.code, n.message, where);
  if (rf.overflowAt > 0) return null;
  cycles.push(...bands.values());
  return { kind: 'history', cycles, counted, range: where };
}

interface NormalStress {
  type: WeldStressType;
  name: string;
  where: Range;
  maxRange: number;
  sigmaMax?: number;
  sigmaMin?: number;
  levels?: Array<{ range: number; n: number }>;
}

function normalStress(
  ctx: CheckContext,
  stressType: 'nominal' | 'hot-spot' | 'effective-notch',
  throatDetail: boolean,
  loading: Loading,
  standard: WeldStandard,
): NormalStress | null {
  const type: WeldStressType =
    ctx.has('dF_perp') || throatDetail ? 'throat' : stressType === 'effective-notch' ? 'notch' : stressType;
  if (loading.kind !== 'constant') {
    const where = loading.kind === 'spectrum' ? loading.levels[0].stmt.whole : loading.range;
    const ranges =
      loading.kind === 'spectrum'
        ? loading.levels
        : loading.cycles.map((c) => ({ range: c.range, n: c.count }));
    const max = ranges.reduce((m, l) => Math.max(m, l.range), 0);
    for (const n of ['delta_sigma', 'sigma_max', 'sigma_min', 'sigma_x1', 'dF_perp'])
      if (ctx.has(n))
        ctx.diag(
          'warning',
          'ignored-input',
          `\`${n}\` is not used: the ranges come from the ${loading.kind}`,
          ctx.rangeOf(n),
        );
    ctx.result(
      'delta_sigma_max',
      computed(
        max,
        'delta_sigma_max = largest range of the levels or counted cycles',
        loading.kind === 'history' ? RAINFLOW_SOURCE : 'the spectrum of the note',
      ),
      [],
      {
        dim: 'stress',
        range: where,
        meaning: `largest ${typeWords(type)} stress range of the spectrum or history`,
      },
    );
    return {
      type,
      name: 'delta_sigma_max',
      where,
      maxRange: max,
      levels: ranges.map((l) => ({ range: l.range, n: l.n })),
    };
  }
  if (type === 'throat') {
    const a = ctx.input('a_w');
    const F = ctx.input('dF_perp');
    if (a === undefined || F === undefined) {
      // A range stated on the throat (delta_sigma, sigma_max/sigma_min) needs neither.
      const stated = ctx.has('delta_sigma') || (ctx.has('sigma_max') && ctx.has('sigma_min'));
      if (!stated || ctx.has('dF_perp') || ctx.has('a_w')) {
        ctx.diag(
          'error',
          'missing-input',
          'the range on the throat of a load-carrying fillet weld needs `dF_perp` (range of the force per length across the weld, e.g. N/mm) and the throat thickness `a_w`; or state `delta_sigma` on the throat',
          ctx.has('dF_perp') || ctx.has('a_w')
            ? ctx.rangeOf(a === undefined ? 'dF_perp' : 'a_w')
            : ctx.optionRange('detail'),
        );
        return null;
      }
    } else {
      const fDim = ctx.stated.get('dF_perp')?.q.dim;
      if (!fDim || !sameVector(fDim, FORCE_PER_LENGTH)) {
        ctx.diag(
          'error',
          'wrong-dimension',
          '`dF_perp` is a force per length of weld (e.g. `dF_perp = 450 N/mm`)',
          ctx.rangeOf('dF_perp'),
        );
        return null;
      }
      let nw = ctx.input('n_w');
      if (nw === undefined) {
        // One throat carrying the whole force is the safe side: a double fillet weld halves it
        // only when the note says the two welds share it.
        nw = 1;
        ctx.diag(
          'warning',
          'defaulted-throats',
          'no `n_w` stated: the force range `dF_perp` is taken on one throat (n_w = 1, on the safe side); state `n_w = 2` where two fillet welds share it',
          ctx.rangeOf('dF_perp'),
          [ctx.insertFix('State `n_w = 1` (one throat carries the force)', 'n_w = 1')],
        );
      }
      const c = throatNormalRange({ deltaFPerp: F, a, welds: nw });
      if (c.notes?.some((n) => n.severity === 'error')) {
        ctx.result('delta_sigma', c, ['dF_perp', 'a_w'], { dim: 'stress', range: ctx.rangeOf('dF_perp') });
        return null;
      }
      const v = ctx.result('delta_sigma', c, ['dF_perp', 'a_w', 'n_w'], {
        dim: 'stress',
        range: ctx.rangeOf('dF_perp'),
        meaning: 'stress range on the weld throat (root failure)',
      });
      return { type, name: 'delta_sigma', where: ctx.rangeOf('dF_perp'), maxRange: v ?? 0 };
    }
  }
  if (type === 'hot-spot' && ctx.has('sigma_x1')) {
    const scheme = (ctx.option('hot-spot-scheme') ?? 'a-linear') as HotSpotScheme;
    const names = scheme.endsWith('quadratic')
      ? ['sigma_x1', 'sigma_x2', 'sigma_x3']
      : ['sigma_x1', 'sigma_x2'];
    const vals = names.map((n) => ctx.input(n));
    if (vals.some((v) => v === undefined)) {
      ctx.diag(
        'error',
        'missing-input',
        `\`hot-spot-scheme: ${scheme}\` needs the surface stress ranges ${names.map((n) => `\`${n}\``).join(', ')} at its reference points`,
        ctx.rangeOf('sigma_x1'),
      );
      return null;
    }
    if (!ctx.options.has('hot-spot-scheme'))
      ctx.diag(
        'warning',
        'defaulted-option',
        'no `hot-spot-scheme:` stated: the type a linear extrapolation from 0.4 t and 1.0 t is taken',
        ctx.rangeOf('sigma_x1'),
      );
    const t = ctx.input('t');
    if (scheme.startsWith('a') && t === undefined) {
      ctx.diag(
        'error',
        'missing-input',
        'type a reference points lie at multiples of the plate thickness: state `t`',
        ctx.rangeOf('sigma_x1'),
      );
      return null;
    }
    const c = hotSpotStress(scheme, vals as number[], t);
    const v = ctx.result('delta_sigma_hs', c, [...names, 't'], {
      dim: 'stress',
      range: ctx.rangeOf('sigma_x1'),
      meaning: 'structural hot-spot stress range, extrapolated to the weld toe',
    });
    if (v === null || c.notes?.some((n) => n.severity === 'error')) return null;
    return { type, name: 'delta_sigma_hs', where: ctx.rangeOf('sigma_x1'), maxRange: Math.abs(v) };
  }
  if (ctx.has('delta_sigma')) {
    const v = ctx.input('delta_sigma')!;
    if (ctx.has('sigma_max'))
      ctx.diag(
        'error',
        'load-twice',
        'state the range as `delta_sigma` or as `sigma_max`/`sigma_min`, not both',
        ctx.rangeOf('sigma_max'),
      );
    if (v < 0) {
      ctx.diag(
        'error',
        'absurd-value',
        '`delta_sigma` is a range: it cannot be negative',
        ctx.rangeOf('delta_sigma'),
      );
      return null;
    }
    return { type, name: 'delta_sigma', where: ctx.rangeOf('delta_sigma'), maxRange: v };
  }
  if (ctx.has('sigma_max') && ctx.has('sigma_min')) {
    const mx = ctx.input('sigma_max')!;
    const mn = ctx.input('sigma_min')!;
    if (mx < mn) {
      ctx.diag(
        'error',
        'max-below-min',
        '`sigma_max` is below `sigma_min`: swap them',
        ctx.rangeOf('sigma_max'),
      );
      return null;
    }
    // EN 1993-1-9 credits a stress-relieved detail on the range (60 % of the compressive part);
    // the IIW credits it on the class (f(R), below): never both.
    const relieved =
      standard === 'EN 1993-1-9' && (ctx.option('residual-stress') ?? 'as-welded') === 'stress-relieved';
    const c = enEffectiveRange(mx, mn, relieved);
    const v = ctx.result('delta_sigma', c, ['sigma_max', 'sigma_min'], {
      dim: 'stress',
      range: ctx.rangeOf('sigma_max'),
      meaning: `${typeWords(type)} stress range at the detail`,
    });
    return {
      type,
      name: 'delta_sigma',
      where: ctx.rangeOf('sigma_max'),
      maxRange: v ?? 0,
      sigmaMax: mx,
      sigmaMin: mn,
    };
  }
  const loads = ['F_max', 'F_min', 'M_max', 'M_min'];
  if (type === 'nominal' && loads.some((n) => ctx.has(n))) {
    // A load without its pair would be read against zero: a reversal would be halved.
    for (const [a, b] of [
      ['F_max', 'F_min'],
      ['M_max', 'M_min'],
    ])
      if (ctx.has(a) !== ctx.has(b)) {
        ctx.diag(
          'error',
          'missing-load-pair',
          `state both \`${a}\` and \`${b}\` (the load's range is their difference)`,
          ctx.rangeOf(ctx.has(a) ? a : b),
        );
        return null;
      }
    const W = ctx.input('W');
    const t = ctx.input('t');
    if (W === undefined || t === undefined) {
      ctx.diag(
        'error',
        'missing-input',
        'the nominal stress from forces and moments needs the plate section: its width `W` and thickness `t`',
        ctx.rangeOf(ctx.has('F_max') ? 'F_max' : 'M_max'),
      );
      return null;
    }
    const dF = (ctx.input('F_max') ?? 0) - (ctx.input('F_min') ?? 0);
    const dM = (ctx.input('M_max') ?? 0) - (ctx.input('M_min') ?? 0);
    // At the face where the axial and the bending ranges add (the loads in phase).
    const c = computed(
      Math.abs(dF / (W * t)) + Math.abs((6 * dM) / (W * t * t)),
      'delta_sigma = |F_max - F_min| / (W t) + 6 |M_max - M_min| / (W t^2)',
      'elastic stresses of a rectangular plate section: axial F/A, bending M/(W t^2/6), at the face where they add',
    );
    const where = ctx.rangeOf(ctx.has('F_max') ? 'F_max' : 'M_max');
    const v = ctx.result('delta_sigma', c, ['F_max', 'F_min', 'M_max', 'M_min', 'W', 't'], {
      dim: 'stress',
      range: where,
      meaning: 'nominal stress range at the face of the plate',
    });
    return { type, name: 'delta_sigma', where, maxRange: v ?? 0 };
  }
  ctx.diag(
    'error',
    'missing-stress-range',
    'state the stress range at the detail: `delta_sigma`, or `sigma_max` and `sigma_min`, or the loads `F_max`/`F_min`, `M_max`/`M_min` on a plate `W` x `t`, or (hot spot) the surface ranges `sigma_x1`, `sigma_x2`, or (throat) `dF_perp` with `a_w`',
    ctx.optionRange('method'),
  );
  return null;
}

function typeWords(t: WeldStressType): string {
  return t === 'hot-spot'
    ? 'structural hot-spot'
    : t === 'notch'
      ? 'effective notch'
      : t === 'throat'
        ? 'throat'
        : 'nominal';
}

function shearRange(ctx: CheckContext): { range: number; where: Range } | undefined {
  if (ctx.has('delta_tau')) {
    const v = ctx.input('delta_tau')!;
    if (v < 0) {
      ctx.diag(
        'error',
        'absurd-value',
        '`delta_tau` is a range: it cannot be negative',
        ctx.rangeOf('delta_tau'),
      );
      return undefined;
    }
    return { range: v, where: ctx.rangeOf('delta_tau') };
  }
  const mx = ctx.input('tau_max');
  const mn = ctx.input('tau_min');
  if (mx === undefined || mn === undefined) {
    ctx.diag('error', 'missing-load-pair', 'state both `tau_max` and `tau_min`', ctx.rangeOf('tau_max'));
    return undefined;
  }
  const v = ctx.result(
    'delta_tau',
    computed(Math.abs(mx - mn), 'delta_tau = |tau_max - tau_min|', 'the note'),
    ['tau_max', 'tau_min'],
    {
      dim: 'stress',
      range: ctx.rangeOf('tau_max'),
    },
  );
  return { range: v ?? 0, where: ctx.rangeOf('tau_max') };
}

function normalClass(
  ctx: CheckContext,
  standard: WeldStandard,
  material: WeldMaterial,
  usedType: WeldStressType,
  entry: ReturnType<typeof findDetail>,
  detailKey: string | undefined,
): number | null {
  if (ctx.has('delta_sigma_C')) {
    const v = ctx.input('delta_sigma_C')!;
    if (entry)
      ctx.diag(
        'information',
        'stated-class',
        `the stated class replaces the catalogue's class of \`${detailKey}\``,
        ctx.rangeOf('delta_sigma_C'),
      );
    if (entry && entry.stressType !== usedType)
      for (const n of stressTypeNotes(entry.stressType, usedType))
        ctx.diag('error', n.code, n.message, ctx.rangeOf('delta_sigma_C'));
    return v;
  }
  if (entry) {
    const params = {
      ...(ctx.has('L_att') ? { L: ctx.input('L_att') } : {}),
      ...(ctx.has('r_att') && ctx.has('L_att') ? { rOverL: ctx.input('r_att')! / ctx.input('L_att')! } : {}),
      ...(ctx.has('t_c') ? { tc: ctx.input('t_c') } : {}),
      ...(ctx.has('t') ? { t: ctx.input('t') } : {}),
    };
    const c = catalogueClass(entry.key, standard, material, params);
    for (const n of stressTypeNotes(entry.stressType, usedType))
      ctx.diag(
        n.severity ?? 'error',
        n.code,
        `\`detail: ${entry.key}\`: ${n.message}`,
        ctx.optionRange('detail'),
      );
    if (entry.stressType !== usedType) return null;
    const v = ctx.result('delta_sigma_C', c, [], {
      dim: 'stress',
      range: ctx.optionRange('detail'),
      origin: 'library',
      meaning: `detail class at 2e6 cycles of \`${entry.key}\` (${standard})`,
    });
    return v !== null && v > 0 ? v : null;
  }
  if (usedType === 'hot-spot' && standard === 'IIW') {
    const joint = (ctx.option('joint') ?? 'load-carrying') as 'load-carrying' | 'non-load-carrying';
    if (!ctx.options.has('joint'))
      ctx.diag(
        'warning',
        'defaulted-option',
        'no `joint:` stated: the load-carrying hot-spot class (the lower) is taken',
        ctx.optionRange('stress-type'),
      );
    return ctx.result('delta_sigma_C', hotSpotClass(joint, material), [], {
      dim: 'stress',
      range: ctx.optionRange('stress-type'),
      origin: 'library',
      meaning: 'structural hot-spot class at 2e6 cycles',
    });
  }
  if (usedType === 'notch' && standard === 'IIW')
    return ctx.result('delta_sigma_C', notchStressClass(material, 'principal'), [], {
      dim: 'stress',
      range: ctx.optionRange('stress-type'),
      origin: 'library',
      meaning: 'effective notch stress class (1 mm reference radius, principal stress)',
    });
  if (usedType === 'throat')
    return ctx.result('delta_sigma_C', throatClass(standard, 'normal', material), [], {
      dim: 'stress',
      origin: 'library',
      meaning: 'weld-metal class for root failure (range on the throat)',
    });
  ctx.diag(
    'error',
    'missing-weld-class',
    `no detail class: state \`delta_sigma_C\` (the ${standard === 'IIW' ? 'FAT class' : 'detail category'} of the ${typeWords(usedType)} stress, at 2e6 cycles) or \`detail:\` from the catalogue`,
    ctx.optionRange('method'),
  );
  return null;
}

function shearClass(
  ctx: CheckContext,
  standard: WeldStandard,
  material: WeldMaterial,
  throat: boolean,
): number | null {
  if (ctx.has('delta_tau_C')) return ctx.input('delta_tau_C')!;
  if (throat)
    return ctx.result('delta_tau_C', throatClass(standard, 'shear', material), [], {
      dim: 'stress',
      origin: 'library',
      meaning: 'class of the shear on the throat',
    });
  ctx.diag(
    'error',
    'missing-weld-class',
    'a shear range needs its class: state `delta_tau_C` (the shear class at 2e6 cycles)',
    ctx.rangeOf('delta_tau'),
  );
  return null;
}

function correctClass(
  ctx: CheckContext,
  standard: WeldStandard,
  material: WeldMaterial,
  cls: number,
  stressed: NormalStress,
  joint: IiwThicknessJoint | undefined,
): { value: number; m1?: number } | null {
  const inputs = ['delta_sigma_C'];
  let value = cls;
  // Thickness.
  if (ctx.has('k_s')) {
    const ks = ctx.input('k_s')!;
    for (const n of statedThicknessFactorNotes(ks, standard))
      ctx.diag(
        'error',
        n.code,
        `${n.message} The stated factor is not used to raise the class: remove it or state k_s <= 1.`,
        ctx.rangeOf('k_s'),
      );
    if (ks > 1) return null;
    value *= ks;
    inputs.push('k_s');
  } else if (ctx.has('t') && stressed.type !== 'notch') {
    const t = ctx.input('t')!;
    const entry = ctx.option('detail') ? findDetail(ctx.option('detail')!) : undefined;
    let c: Computed;
    if (standard === 'EN 1993-1-9') {
      const applies = entry ? entry.enSizeEffect : true;
      c = enSizeFactor(t, applies);
      if (!entry && t > 25 * MM)
        c.notes = [
          ...(c.notes ?? []),
          {
            code: 'size-effect-assumed',
            severity: 'information',
            message:
              'The class is stated without a catalogue detail: the size effect is applied (on the safe side); state `k_s = 1` where the detail table names none.',
          },
        ];
    } else {
      const group =
        (ctx.option('thickness-group') as IiwThicknessJoint | undefined) ?? joint ?? 'toe-as-welded';
      c = iiwThicknessFactor(t, group);
    }
    const ks = ctx.result('k_s', c, ['t'], {
      range: ctx.rangeOf('t'),
      meaning: 'thickness (size) factor on the class',
    });
    if (ks !== null) {
      value *= ks;
      inputs.push('k_s');
    }
  }
  // Stress ratio (IIW f(R) for joints free of residual stress).
  const residual = (ctx.option('residual-stress') ?? 'as-welded') as ResidualCondition;
  if (standard === 'IIW' && stressed.sigmaMax !== undefined && stressed.sigmaMin !== undefined) {
    const c = iiwStressRatioFactor(stressed.sigmaMax, stressed.sigmaMin, residual);
    const f = ctx.result('f_R', c, ['sigma_max', 'sigma_min'], {
      range: ctx.optionRange('residual-stress') ?? stressed.where,
      meaning: 'stress-ratio enhancement factor on the class (1 as welded)',
    });
    if (f !== null) {
      value *= f;
      inputs.push('f_R');
    }
  } else if (residual !== 'as-welded' && standard === 'IIW')
    ctx.diag(
      'information',
      'no-enhancement',
      'the stress-ratio enhancement needs the cycle: state `sigma_max` and `sigma_min` (with a range only, f(R) = 1)',
      ctx.optionRange('residual-stress'),
    );
  // Improvement.
  let m1: number | undefined;
  const imp = ctx.option('improvement');
  if (imp && imp !== 'none') {
    const R =
      stressed.sigmaMax && stressed.sigmaMax > 0 ? (stressed.sigmaMin ?? 0) / stressed.sigmaMax : undefined;
    const c = improvedClass({
      standard,
      FAT: value,
      method: imp as ImprovementMethod,
      material,
      ...(ctx.has('Sy') ? { fy: ctx.input('Sy') } : {}),
      ...(R !== undefined ? { R } : {}),
      failure: stressed.type === 'throat' ? 'root' : 'toe',
    });
    const v = ctx.result('delta_sigma_C_imp', c, [...inputs], {
      dim: 'stress',
      range: ctx.optionRange('improvement'),
      meaning: 'class after the stated post-weld improvement',
    });
    if (v === null || c.notes?.some((n) => n.severity === 'error')) return null;
    value = v;
    m1 = c.m1 !== 3 ? c.m1 : undefined;
    inputs.splice(0, inputs.length, 'delta_sigma_C_imp');
  }
  const eff = ctx.result(
    'delta_sigma_C_eff',
    computed(
      value,
      'delta_sigma_C_eff = delta_sigma_C * k_s * f_R (improved class where stated)',
      'the corrections of the standard on the class',
    ),
    inputs,
    { dim: 'stress', meaning: 'detail class after the corrections (the curve is drawn through it)' },
  );
  if (eff === null || !(eff > 0)) return null;
  return { value: eff, ...(m1 !== undefined ? { m1 } : {}) };
}

/**
 * The range verification against a permissible damage sum below 1 (IIW 0.5): the equivalent
 * range at 2e6 cycles may reach D_allow^(1/m1) of the design class, so that u <= 1 holds exactly
 * when D_sum <= D_allow. With D_allow = 1 (EN 1993-1-9) it is the utilisation of Eq. (8.2).
 */
function allowedUtilisation(u: Computed, Dallow: number, m1: number): Computed {
  if (u.notes?.some((n) => n.severity === 'error') || !(Dallow > 0) || Dallow === 1) return u;
  const f = Dallow ** (1 / m1);
  return {
    ...u,
    value: u.value / f,
    formula: `${u.formula} / D_allow^(1/m1)`,
    terms: [
      ...(u.terms ?? []),
      { name: 'D_allow', value: Dallow, unit: '' },
      { name: 'm1', value: m1, unit: '' },
    ],
  };
}

/**
 * Constant amplitude: the range at 2e6 cycles that the curve rates as the stated range at its N
 * cycles, Delta sigma_E,2 = Delta sigma Delta sigma_C / Delta sigma_R(N), so that the verification
 * gamma_Ff Delta sigma_E,2 <= Delta sigma_C / gamma_Mf (EN 1993-1-9 Eq. 8.2) is the check of the
 * range at N on the curve, gamma_Ff Delta sigma <= Delta sigma_R(N) / gamma_Mf: at N = 2e6 the
 * range itself, beyond the knee the fatigue limit (never zero for a range below it).
 */
function constantEquivalent(curve: WeldSnCurve, range: number, N: number): Computed {
  const R = weldStrengthAtLife(curve, N, 'constant');
  const formula = 'Delta sigma_E,2 = Delta sigma Delta sigma_C / Delta sigma_R(N) (constant amplitude)';
  if (R.notes?.some((n) => n.severity === 'error') || !(R.value > 0))
    return computed(0, formula, curve.source, R.terms, R.notes);
  return computed(
    (range * curve.deltaC) / R.value,
    formula,
    curve.source,
    [
      { name: 'Delta sigma', value: range / MPA, unit: 'MPa' },
      { name: 'Delta sigma_C', value: curve.deltaC / MPA, unit: 'MPa' },
      { name: 'Delta sigma_R(N)', value: R.value / MPA, unit: 'MPa' },
      { name: 'N', value: N, unit: '' },
    ],
    R.notes?.filter((n) => n.severity !== 'information'),
  );
}

/** Bisection of a non-decreasing f on [lo, hi] (log scale) for f = 1; null when f stays below 1. */
function rootOfOne(f: (x: number) => number, lo: number, hi: number): number | null {
  if (!(f(hi) >= 1)) return null;
  if (f(lo) >= 1) return lo;
  let a = Math.log(lo);
  let b = Math.log(hi);
  for (let i = 0; i < 200 && b - a > 1e-12; i++) {
    const m = (a + b) / 2;
    if (f(Math.exp(m)) >= 1) b = m;
    else a = m;
  }
  return Math.exp(b);
}

/**
 * Safety factor on range with a shear range: the factor s on both ranges at which the
 * normal-shear interaction of the verification reaches 1 (EN 1993-1-9 Eq. 8.3; IIW's
 * comparison value), found by bisection; the normal range alone would overstate it.
 */
function interactionFactor(at: (x: number, n: number) => number, N: number, source: string): Computed {
  const formula = 's: u_fat(s Delta sigma, s Delta tau) = 1 at the required cycles N (bisection)';
  const terms = [{ name: 'N', value: N, unit: '' }];
  const s = rootOfOne((x) => at(x, N), 1e-6, 1e4);
  if (s === null) return infinite(formula, source, terms);
  return computed(s, formula, source, terms);
}

/**
 * Life and repeats with a shear range: the cycles N_f at which the interaction of the stated
 * ranges reaches 1 (the interaction only grows with the cycles), by bisection.
 */
function interactionLife(
  at: (x: number, n: number) => number,
  N: number,
  source: string,
): { life: Computed; repeats: Computed } {
  const formula = 'N_f: u_fat(Delta sigma, Delta tau) at N_f cycles = 1 (bisection)';
  const n = rootOfOne((x) => at(1, x), 1, 1e15);
  if (n === null)
    return {
      life: infinite(
        formula,
        source,
        [],
        [
          {
            code: 'no-damage',
            severity: 'information',
            message: 'The interaction stays below 1 at every life: below the cut-offs.',
          },
        ],
      ),
      repeats: infinite('repeats = N_f / N', source, [{ name: 'N', value: N, unit: '' }]),
    };
  return {
    life: computed(n, formula, source, []),
    repeats: computed(n / N, 'repeats = N_f / N', source, [
      { name: 'N_f', value: n, unit: '' },
      { name: 'N', value: N, unit: '' },
    ]),
  };
}
