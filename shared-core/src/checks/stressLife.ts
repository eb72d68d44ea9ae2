/**
 * `method: stress-life`: nominal stresses, concentration, equivalent stresses, Marin and
 * the corrected endurance limit, safety factors by every criterion along the chosen load
 * line, first-cycle yield, fatigue strength at a required life and the predicted life.
 */
import { computed } from '../computed';
import {
  type CriterionKey,
  criterionModel,
  fatigueSafetyFactor,
  firstCycleYieldFactor,
  langerLine,
} from '../criteria';
import type { CheckContext } from '../language/checkContext';
import type { HaighData, SnData } from '../language/types';
import { lifeAtStress, strengthAtLife } from '../sn';
import { equivalentStresses } from '../stress';
import { biaxialVonMises } from '../stress/biaxial';
import { concentration } from './concentration';
import { chooseCriterion, needsYield, strengthSetFor } from './criterionChoice';
import { enduranceChain, type LoadKind } from './enduranceChain';
import { lazyField } from './lazyField';
import { active, nominalStresses } from './loads';
import { readStrengths } from './material';
import type { MethodExtras } from './runMethod';

const COMPARED: Array<[CriterionKey, string]> = [
  ['goodman', 'n_f_goodman'],
  ['gerber', 'n_f_gerber'],
  ['soderberg', 'n_f_soderberg'],
  ['asme-elliptic', 'n_f_asme'],
];

export function runStressLife(ctx: CheckContext): MethodExtras {
  const st = readStrengths(ctx);
  const s = nominalStresses(ctx);
  if (!st || !s) return {};
  const { Sut, Sy } = st;
  const conc = concentration(ctx, s, Sut, Sy, st.cls);
  if (!conc) return {};

  // Which loading route.
  const bend = active(s.bending);
  const tor = active(s.torsion);
  const ax = active(s.axial) || s.geometry === 'shell';
  let load: LoadKind = 'combined';
  if (s.geometry !== 'shell') {
    if (tor && !bend && !ax) load = 'torsion';
    else if (bend && !tor && !ax) load = 'bending';
    else if (ax && !bend && !tor) load = 'axial';
  } else load = 'axial';
  const chain = enduranceChain(ctx, st, load, s.geometry, ax);

  // Equivalent stresses at the notch.
  let sa: number | null;
  let sm: number | null;
  let smax: number | null;
  const opRange = s.driver;
  if (chain.shear) {
    sa = ctx.result(
      'tau_a_eq',
      computed(
        conc.Kfs * s.torsion.a,
        'tau_a_eq = Kfs * tau_a',
        "Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-15 (torsion)",
      ),
      ['Kfs', 'tau_a'],
      { range: opRange },
    );
    sm = ctx.result(
      'tau_m_eq',
      computed(
        conc.Kfsm * Math.abs(s.torsion.m),
        'tau_m_eq = Kfs * |tau_m|  (the sense of a steady torque does not relieve the shaft)',
        "Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-15 (torsion)",
      ),
      ['Kfs', 'tau_m'],
      { range: opRange },
    );
    const eq = equivalentStresses({ ...zeroInput(), ...conc, tau_a: s.torsion.a, tau_m: s.torsion.m });
    // The von Mises equivalents are reported too (the contract names them for every check);
    // the criteria of pure torsion work on the shear stresses above.
    ctx.result('sigma_a_eq', eq.sigma_a_eq, ['Kfs', 'tau_a'], { range: opRange });
    ctx.result('sigma_m_eq', eq.sigma_m_eq, ['Kfs', 'tau_m'], { range: opRange });
    smax = ctx.result('sigma_max_eq', eq.sigma_max_eq, ['Kfs', 'tau_a', 'tau_m'], { range: opRange });
  } else if (s.geometry === 'shell' && s.shell && ctx.option('feature') !== 'shell-cutout') {
    const h = s.shell.hoop;
    const l = s.shell.long;
    const va = biaxialVonMises('sigma_a_eq', h.a, l.a, 'sigma_hoop_a', 'sigma_long_a');
    sa = ctx.result(
      'sigma_a_eq',
      {
        ...va,
        value: va.value / 0.85,
        formula: `${va.formula} / 0.85`,
        source: `${va.source}; membrane stress treated as axial loading (0.85), per the combined-loading rule of the contract`,
      },
      ['sigma_hoop_a', 'sigma_long_a'],
      { range: opRange },
    );
    const vm = biaxialVonMises('sigma_m_eq', h.m, l.m, 'sigma_hoop_m', 'sigma_long_m');
    sm = ctx.result(
      'sigma_m_eq',
      { ...vm, value: Math.sign(h.m + l.m || 1) * vm.value },
      ['sigma_hoop_m', 'sigma_long_m'],
      { range: opRange },
    );
    const vmax = biaxialVonMises('sigma_max_eq', h.a + h.m, l.a + l.m, 'sigma_hoop_max', 'sigma_long_max');
    smax = ctx.result(
      'sigma_max_eq',
      vmax,
      ['sigma_hoop_a', 'sigma_hoop_m', 'sigma_long_a', 'sigma_long_m'],
      { range: opRange },
    );
  } else {
    const axial = s.geometry === 'shell' && s.shell ? s.shell.hoop : s.axial;
    const eq = equivalentStresses({
      ...conc,
      sigma_a: s.bending.a,
      sigma_m: s.bending.m,
      sigma_ax_a: axial.a,
      sigma_ax_m: axial.m,
      tau_a: s.torsion.a,
      tau_m: s.torsion.m,
    });
    const ins =
      s.geometry === 'shell'
        ? ['Kf_ax', 'sigma_hoop_a', 'sigma_hoop_m']
        : ['Kf', 'Kfs', 'Kf_ax', 'sigma_a', 'sigma_m', 'sigma_ax_a', 'sigma_ax_m', 'tau_a', 'tau_m'];
    sa = ctx.result('sigma_a_eq', eq.sigma_a_eq, ins, { range: opRange });
    sm = ctx.result('sigma_m_eq', eq.sigma_m_eq, ins, { range: opRange });
    smax = ctx.result('sigma_max_eq', eq.sigma_max_eq, ins, { range: opRange });
  }
  if (sa === null || sm === null) return {};

  // First-cycle yield.
  if (Sy !== undefined && smax !== null) {
    const ny = ctx.result('n_y', firstCycleYieldFactor(Sy, smax), ['Sy', 'sigma_max_eq'], {
      range: ctx.options.get('criterion')?.whole ?? ctx.header,
    });
    if (ny !== null && ny < 1)
      ctx.diag(
        'warning',
        'first-cycle-yield',
        `the section yields on the first cycle (n_y = ${ctx.values.n_y?.display}): stress-life results assume elastic behaviour`,
        ctx.values.n_y?.range ?? ctx.header,
      );
  }

  const choice = chooseCriterion(ctx);
  if (!choice) return {};
  const { criterion, lineOpt, critRange } = choice;

  if (chain.S === null && chain.line === null) return { criterion };

  // Strength used by the criteria: Se, or the fatigue strength at the required life.
  const N = ctx.input('N');
  let S: number | null = chain.hasEndurance ? chain.S : null;
  if (N !== undefined) {
    if (N <= 0)
      ctx.diag('error', 'absurd-value', '`N` must be a positive number of cycles', ctx.rangeOf('N'));
    else if (chain.line) {
      const c = strengthAtLife(chain.line, N);
      S = ctx.result('S_f', c, ['N'], { range: ctx.rangeOf('N') });
    }
  } else if (!chain.hasEndurance) {
    ctx.diag(
      'error',
      'no-endurance-limit',
      'this material has no endurance limit: state the required life `N` (cycles) for a finite-life check',
      ctx.optionRange('material') ?? ctx.header,
      [ctx.insertFix('State `N = 1e7`', 'N = 1e7')],
    );
  }

  // Strength set of the route (pure torsion works in shear).
  const strengths = strengthSetFor(ctx, st, chain, choice);

  let haigh: HaighData | undefined;
  if (S !== null && S > 0) {
    const set = strengths(S);
    const inputs = [
      N !== undefined ? 'S_f' : chain.hasEndurance ? 'Se' : 'S_ref',
      chain.shear ? 'Ssu' : 'Sut',
      chain.shear ? 'tau_a_eq' : 'sigma_a_eq',
      chain.shear ? 'tau_m_eq' : 'sigma_m_eq',
    ];
    const needsSy = needsYield;
    if (needsSy(criterion) && Sy === undefined) {
      ctx.diag(
        'error',
        'missing-yield',
        `\`criterion: ${criterion}\` needs the yield strength Sy`,
        critRange,
      );
    } else {
      const c = fatigueSafetyFactor(criterion, lineOpt, sa, sm, set);
      ctx.result('n_f', c, needsSy(criterion) ? [...inputs, 'Sy'] : inputs, { range: critRange });
    }
    for (const [k, name] of COMPARED) {
      if (needsSy(k) && Sy === undefined) continue;
      const c = fatigueSafetyFactor(k, lineOpt, sa, sm, set);
      // The chosen criterion's domain notes are reported once, on n_f.
      ctx.result(name, { ...c, notes: [] }, needsSy(k) ? [...inputs, 'Sy'] : inputs, { range: critRange });
    }
    // The curves are computed when a diagram first reads them (lazyField.ts).
    haigh = lazyField<HaighData, 'curves'>(
      {
        S,
        Sut: chain.Su,
        Sy: set.Sy,
        shear: chain.shear,
        sigma_a: sa,
        sigma_m: sm,
        loadLine: lineOpt,
        criterion,
        n_f: ctx.values.n_f?.si ?? null,
      },
      'curves',
      () => [
        ...COMPARED.filter(([k]) => !(needsSy(k) && Sy === undefined)).map(([k]) => ({
          key: k,
          label: criterionModel(k).label,
          // On the compressive side every classical criterion is the horizontal line at S
          // (Shigley Fig. 6-27 discussion): drawn when the operating point lies there.
          points: [
            ...(sm < 0 ? ([[-(set.Sy > 0 ? set.Sy : set.Sut), set.S]] as Array<[number, number]>) : []),
            ...criterionModel(k).haighCurve(set, 48),
          ],
        })),
        ...(Sy !== undefined
          ? [{ key: 'langer', label: 'Langer (first-cycle yield)', points: langerLine(set.Sy) }]
          : []),
      ],
    );
  }

  // Equivalent fully reversed stress and life.
  let sn: SnData | undefined;
  if (chain.line) {
    const base = strengths(chain.S ?? chain.line.S2);
    const model = criterionModel(criterion);
    const arName = 'sigma_ar';
    const ar =
      (criterion === 'soderberg' || criterion === 'asme-elliptic') && Sy === undefined
        ? null
        : ctx.result(
            arName,
            model.equivalentReversed(sa, sm, base),
            [chain.shear ? 'tau_a_eq' : 'sigma_a_eq', chain.shear ? 'tau_m_eq' : 'sigma_m_eq'],
            {
              range: critRange,
            },
          );
    let Nf: number | null = null;
    if (ar !== null) {
      const life = lifeAtStress(chain.line, ar);
      Nf = ctx.result('N_f', life, ['sigma_ar'], { range: critRange });
      if (!chain.hasEndurance && life.infinite) Nf = null;
    }
    sn = {
      a: chain.line.a,
      b: chain.line.b,
      N1: chain.line.N1,
      N2: chain.line.N2,
      S1: chain.line.S1,
      S2: chain.line.S2,
      hasKnee: chain.line.hasKnee,
      points: ar !== null ? [{ label: 'operating point', sigma_ar: ar, N: Nf }] : [],
    };
    if (N !== undefined && S !== null) sn.points.push({ label: 'required life', sigma_ar: S, N });
  }
  return { criterion, ...(haigh ? { haigh } : {}), ...(sn ? { sn } : {}) };
}

function zeroInput() {
  return { sigma_a: 0, sigma_m: 0, sigma_ax_a: 0, sigma_ax_m: 0, tau_a: 0, tau_m: 0 };
}
