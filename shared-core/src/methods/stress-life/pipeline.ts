/**
 * `method: stress-life`: nominal stresses, concentration, equivalent stresses, Marin and
 * the corrected endurance limit, safety factors by every criterion along the chosen load
 * line, first-cycle yield, fatigue strength at a required life and the predicted life.
 */

import { concentration } from '../../checks/concentration';
import { chooseCriterion, needsYield, strengthSetFor } from '../../checks/criterionChoice';
import {
  fibrePoints,
  governingIndex,
  governingNote,
  infoOnly,
  isRotating,
  ONLY_POINT,
  pointName,
  type SectionPoint,
  warnRotationAssumed,
} from '../../checks/criticalPoints';
import { enduranceChain, type LoadKind } from '../../checks/enduranceChain';
import { lazyField } from '../../checks/lazyField';
import { active, nominalStresses } from '../../checks/loads';
import { readStrengths } from '../../checks/material';
import { type Computed, computed, type MethodNote } from '../../computed';
import type { CheckContext } from '../../context/checkContext';
import type { HaighData, SnData } from '../../context/types';
import { nameInfo } from '../../context/vocabulary';
import {
  type CriterionKey,
  criterionModel,
  fatigueSafetyFactor,
  firstCycleYieldFactor,
  langerLine,
} from '../../criteria';
import { lifeAtStress, strengthAtLife } from '../../sn';
import { type EquivalentStresses, equivalentStresses, pointEquivalentStresses } from '../../stress';
import { biaxialVonMises } from '../../stress/biaxial';
import type { MethodExtras } from '../types';

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

  // The section's critical points and their equivalent stresses (criticalPoints.ts).
  // Stated nominal stresses are the engineer's point: they rotate only when the note says so.
  const rotating =
    s.geometry === 'round' && (s.bendingFromMoment ? isRotating(ctx) : ctx.option('rotation') === 'rotating');
  const momentRange = ctx.rangeOf(ctx.has('M_max') ? 'M_max' : 'M_a');
  if (s.geometry === 'round' && s.bendingFromMoment && rotating)
    warnRotationAssumed(ctx, ctx.values.M_m?.si ?? 0, momentRange);
  const opRange = s.driver;
  const statedEq = ['sigma_a_eq', 'sigma_m_eq', 'sigma_max_eq'].some((n) => ctx.has(n));
  let points: SectionPoint[] = [ONLY_POINT];
  const states: PointState[] = [];
  if (chain.shear) {
    const sa = ctx.result(
      'tau_a_eq',
      computed(
        conc.Kfs * Math.abs(s.torsion.a),
        'tau_a_eq = Kfs * |tau_a|',
        "Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-15 (torsion)",
      ),
      ['Kfs', 'tau_a'],
      { range: opRange },
    );
    const sm = ctx.result(
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
    const smax = ctx.result('sigma_max_eq', eq.sigma_max_eq, ['Kfs', 'tau_a', 'tau_m'], { range: opRange });
    states.push({ sa, sm, smax });
  } else if (s.geometry === 'shell' && s.shell && ctx.option('feature') !== 'shell-cutout') {
    const h = s.shell.hoop;
    const l = s.shell.long;
    const va = biaxialVonMises('sigma_a_eq', h.a, l.a, 'sigma_hoop_a', 'sigma_long_a');
    const sa = ctx.result(
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
    const sm = ctx.result(
      'sigma_m_eq',
      {
        ...vm,
        value: Math.sign(h.m + l.m || 1) * vm.value,
        source: `${vm.source}; signed with the sum of the two membrane mean stresses (common practice, no source)`,
      },
      ['sigma_hoop_m', 'sigma_long_m'],
      { range: opRange },
    );
    // The peak of either instant (p_max or p_min): a vacuum (p_min < 0) larger than p_max governs.
    const v1 = biaxialVonMises('sigma_max_eq', h.m + h.a, l.m + l.a, 'sigma_hoop_max', 'sigma_long_max');
    const v2 = biaxialVonMises('sigma_max_eq', h.m - h.a, l.m - l.a, 'sigma_hoop_min', 'sigma_long_min');
    const smax = ctx.result(
      'sigma_max_eq',
      v2.value > v1.value ? { ...v2, formula: `${v2.formula}  (the instant p_min governs)` } : v1,
      ['sigma_hoop_a', 'sigma_hoop_m', 'sigma_long_a', 'sigma_long_m'],
      { range: opRange },
    );
    states.push({ sa, sm, smax });
  } else {
    const axial = s.geometry === 'shell' && s.shell ? s.shell.hoop : s.axial;
    const input = (p: SectionPoint) => ({
      ...conc,
      sigma_a: p.s * s.bending.a,
      sigma_m: p.s * s.bending.m,
      sigma_ax_a: axial.a,
      sigma_ax_m: axial.m,
      tau_a: s.torsion.a,
      tau_m: s.torsion.m,
    });
    const ins =
      s.geometry === 'shell'
        ? ['Kf_ax', 'sigma_hoop_a', 'sigma_hoop_m']
        : ['Kf', 'Kfs', 'Kf_ax', 'sigma_a', 'sigma_m', 'sigma_ax_a', 'sigma_ax_m', 'tau_a', 'tau_m'];
    if (s.geometry === 'round' && !rotating && s.bendingFromMoment && !statedEq) {
      // A non-rotating section bent by a moment: both extreme fibres.
      points = fibrePoints(s.bending, ctx.has('M_max') ? 'M_max' : 'M_m + M_a');
      for (const p of points) {
        const eq = pointEquivalentStresses(input(p));
        const rec = (base: string, c: Computed) =>
          ctx.result(pointName(base, p), { ...c, notes: infoOnly(c.notes) }, ins, {
            range: opRange,
            dim: 'stress',
            meaning: `${nameInfo(base)?.meaning ?? base} at ${p.words}`,
          });
        states.push({
          sa: rec('sigma_a_eq', eq.sigma_a_eq),
          sm: rec('sigma_m_eq', eq.sigma_m_eq),
          smax: rec('sigma_max_eq', eq.sigma_max_eq),
          eq,
        });
      }
      const gov = governingIndex(
        states.map((x) => (x.smax === null ? null : -x.smax)),
        'min',
      );
      const eqG = states[gov].eq!;
      ctx.result(
        'sigma_max_eq',
        withNote(
          eqG.sigma_max_eq,
          governingNote(ctx, 'sigma_max_eq', points, gov, displays(ctx, 'sigma_max_eq', points)),
        ),
        points.map((p) => pointName('sigma_max_eq', p)),
        { range: opRange },
      );
    } else {
      // One point: a rotating shaft as it always was (amplitudes added as magnitudes: every
      // fibre passes through both sides of the moment); otherwise the signed stresses at the point.
      const eq = rotating
        ? equivalentStresses(input(ONLY_POINT))
        : pointEquivalentStresses(input(ONLY_POINT));
      const sa = ctx.result('sigma_a_eq', eq.sigma_a_eq, ins, { range: opRange });
      const sm = ctx.result('sigma_m_eq', eq.sigma_m_eq, ins, { range: opRange });
      const smax = ctx.result('sigma_max_eq', eq.sigma_max_eq, ins, { range: opRange });
      states.push({ sa, sm, smax });
    }
  }
  if (states.some((x) => x.sa === null || x.sm === null)) return {};
  const two = points.length > 1;

  // First-cycle yield (Langer) at every point; the governing point is the one with the larger peak.
  if (Sy !== undefined && states.every((x) => x.smax !== null)) {
    const yRange = ctx.options.get('criterion')?.whole ?? ctx.header;
    let ny: number | null;
    if (!two) {
      ny = ctx.result('n_y', firstCycleYieldFactor(Sy, states[0].smax!), ['Sy', 'sigma_max_eq'], {
        range: yRange,
      });
    } else {
      const c = states.map((x) => firstCycleYieldFactor(Sy, x.smax!));
      points.forEach((p, i) => {
        ctx.result(
          pointName('n_y', p),
          { ...c[i], notes: infoOnly(c[i].notes) },
          ['Sy', pointName('sigma_max_eq', p)],
          {
            range: yRange,
            meaning: `first-cycle yield safety factor at ${p.words}`,
          },
        );
      });
      const gov = governingIndex(
        c.map((x) => (x.infinite ? null : x.value)),
        'min',
      );
      ny = ctx.result(
        'n_y',
        withNote(
          firstCycleYieldFactor(Sy, ctx.si('sigma_max_eq') ?? states[gov].smax!),
          governingNote(ctx, 'n_y', points, gov, displays(ctx, 'n_y', points)),
        ),
        ['Sy', 'sigma_max_eq'],
        { range: yRange },
      );
    }
    if (ny !== null && ny < 1)
      ctx.diag(
        'warning',
        'first-cycle-yield',
        `the section yields on the first cycle (n_y = ${ctx.values.n_y?.display}): stress-life results assume elastic behaviour`,
        ctx.values.n_y?.range ?? ctx.header,
      );
  }

  // With two points, the equivalent stresses under the plain names are those of the point that
  // governs the fatigue safety factor (or the life); recorded once that point is known.
  const recordFatigueEq = (gov: number, why: string) => {
    if (!two) return;
    const eqG = states[gov].eq!;
    const note = (base: string): MethodNote => {
      const n = governingNote(ctx, base, points, gov, displays(ctx, base, points));
      return { ...n, message: `${n.message} (${why})` };
    };
    ctx.result(
      'sigma_a_eq',
      withNote(eqG.sigma_a_eq, note('sigma_a_eq')),
      [pointName('sigma_a_eq', points[gov])],
      {
        range: opRange,
      },
    );
    ctx.result(
      'sigma_m_eq',
      withNote(eqG.sigma_m_eq, note('sigma_m_eq')),
      [pointName('sigma_m_eq', points[gov])],
      {
        range: opRange,
      },
    );
  };
  // Without any factor or life: the point with the larger amplitude plus tensile mean is shown.
  const fallbackGov = () =>
    governingIndex(
      states.map((x) => -(x.sa! + Math.max(x.sm!, 0))),
      'min',
    );

  const choice = chooseCriterion(ctx);
  if (!choice) {
    recordFatigueEq(fallbackGov(), 'no criterion: the point with the larger sigma_a_eq + tensile sigma_m_eq');
    return {};
  }
  const { criterion, lineOpt, critRange } = choice;

  if (chain.S === null && chain.line === null) {
    recordFatigueEq(
      fallbackGov(),
      'no fatigue strength: the point with the larger sigma_a_eq + tensile sigma_m_eq',
    );
    return { criterion };
  }

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
  const needsSy = needsYield;
  const sa = (i: number) => states[i].sa!;
  const sm = (i: number) => states[i].sm!;

  // Each point's safety factor (chosen criterion) and equivalent fully reversed stress.
  const set = S !== null && S > 0 ? strengths(S) : null;
  const canFactor = set !== null && !(needsSy(criterion) && Sy === undefined);
  const nfC = canFactor
    ? states.map((_, i) => fatigueSafetyFactor(criterion, lineOpt, sa(i), sm(i), set!))
    : null;
  const model = criterionModel(criterion);
  const base = chain.line ? strengths(chain.S ?? chain.line.S2) : null;
  const canReverse =
    base !== null && !((criterion === 'soderberg' || criterion === 'asme-elliptic') && Sy === undefined);
  const arC = canReverse ? states.map((_, i) => model.equivalentReversed(sa(i), sm(i), base!)) : null;
  const govF = nfC
    ? governingIndex(
        nfC.map((c) => (c.infinite ? null : c.value)),
        'min',
      )
    : arC
      ? governingIndex(
          arC.map((c) => (c.infinite ? null : -c.value)),
          'min',
        )
      : fallbackGov();
  recordFatigueEq(
    govF,
    nfC
      ? 'the point of the smallest n_f'
      : arC
        ? 'the point of the largest sigma_ar'
        : 'the point with the larger sigma_a_eq + tensile sigma_m_eq',
  );

  let haigh: HaighData | undefined;
  if (set !== null) {
    const inputsAt = (p: SectionPoint) => [
      N !== undefined ? 'S_f' : chain.hasEndurance ? 'Se' : 'S_ref',
      chain.shear ? 'Ssu' : 'Sut',
      chain.shear ? 'tau_a_eq' : pointName('sigma_a_eq', p),
      chain.shear ? 'tau_m_eq' : pointName('sigma_m_eq', p),
    ];
    const inputs = inputsAt(ONLY_POINT);
    if (!nfC) {
      ctx.diag(
        'error',
        'missing-yield',
        `\`criterion: ${criterion}\` needs the yield strength Sy`,
        critRange,
      );
    } else if (!two) {
      ctx.result('n_f', nfC[0], needsSy(criterion) ? [...inputs, 'Sy'] : inputs, { range: critRange });
    } else {
      const withSy = (xs: string[]) => (needsSy(criterion) ? [...xs, 'Sy'] : xs);
      points.forEach((p, i) => {
        ctx.result(pointName('n_f', p), { ...nfC[i], notes: infoOnly(nfC[i].notes) }, withSy(inputsAt(p)), {
          range: critRange,
          meaning: `fatigue safety factor (chosen criterion and load line) at ${p.words}`,
        });
      });
      ctx.result(
        'n_f',
        withNote(nfC[govF], governingNote(ctx, 'n_f', points, govF, displays(ctx, 'n_f', points))),
        withSy(inputs),
        { range: critRange },
      );
    }
    for (const [k, name] of COMPARED) {
      if (needsSy(k) && Sy === undefined) continue;
      const cs = states.map((_, i) => fatigueSafetyFactor(k, lineOpt, sa(i), sm(i), set));
      const g = governingIndex(
        cs.map((c) => (c.infinite ? null : c.value)),
        'min',
      );
      // The chosen criterion's domain notes are reported once, on n_f.
      const notes: MethodNote[] = two
        ? [
            governingNote(
              ctx,
              name,
              points,
              g,
              cs.map((c) => ctx.display(c.value, 'one', c.infinite)),
              false,
            ),
          ]
        : [];
      ctx.result(name, { ...cs[g], notes }, needsSy(k) ? [...inputs, 'Sy'] : inputs, { range: critRange });
    }
    // The curves are computed when a diagram first reads them (lazyField.ts).
    const setH = set;
    const smG = sm(govF);
    haigh = lazyField<HaighData, 'curves'>(
      {
        S: set.S,
        Sut: chain.Su,
        Sy: set.Sy,
        shear: chain.shear,
        sigma_a: sa(govF),
        sigma_m: smG,
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
            ...(smG < 0 ? ([[-(setH.Sy > 0 ? setH.Sy : setH.Sut), setH.S]] as Array<[number, number]>) : []),
            ...criterionModel(k).haighCurve(setH, 48),
          ],
        })),
        ...(Sy !== undefined
          ? [{ key: 'langer', label: 'Langer (first-cycle yield)', points: langerLine(setH.Sy) }]
          : []),
      ],
    );
  }

  // Equivalent fully reversed stress and life at every point; the governing point has the shortest life.
  let sn: SnData | undefined;
  if (chain.line) {
    const line = chain.line;
    let ar: number | null = null;
    let Nf: number | null = null;
    if (arC) {
      const eqIns = (p: SectionPoint) => [
        chain.shear ? 'tau_a_eq' : pointName('sigma_a_eq', p),
        chain.shear ? 'tau_m_eq' : pointName('sigma_m_eq', p),
      ];
      if (!two) {
        ar = ctx.result('sigma_ar', arC[0], eqIns(ONLY_POINT), { range: critRange });
        if (ar !== null) {
          const life = lifeAtStress(line, ar);
          Nf = ctx.result('N_f', life, ['sigma_ar'], { range: critRange });
          if (!chain.hasEndurance && life.infinite) Nf = null;
        }
      } else {
        const lives = points.map((p, i) => {
          const a = ctx.result(
            pointName('sigma_ar', p),
            { ...arC[i], notes: infoOnly(arC[i].notes) },
            eqIns(p),
            {
              range: critRange,
              dim: 'stress',
              meaning: `equivalent fully reversed stress of the chosen criterion at ${p.words}`,
            },
          );
          if (a === null) return null;
          const life = lifeAtStress(line, a);
          ctx.result(
            pointName('N_f', p),
            { ...life, notes: infoOnly(life.notes) },
            [pointName('sigma_ar', p)],
            {
              range: critRange,
              meaning: `predicted cycles to failure at ${p.words}`,
            },
          );
          return { a, life };
        });
        // Shortest life; a static failure (unbounded sigma_ar) governs before any life; with
        // every life infinite, the larger sigma_ar.
        let g = governingIndex(
          lives.map((l, i) =>
            l === null
              ? arC[i].infinite
                ? Number.NEGATIVE_INFINITY
                : null
              : l.life.infinite
                ? null
                : l.life.value,
          ),
          'min',
        );
        if (lives.every((l) => l?.life.infinite))
          g = governingIndex(
            lives.map((l) => -(l?.a ?? 0)),
            'min',
          );
        ar = ctx.result(
          'sigma_ar',
          withNote(arC[g], governingNote(ctx, 'sigma_ar', points, g, displays(ctx, 'sigma_ar', points))),
          [pointName('sigma_ar', points[g])],
          { range: critRange },
        );
        if (ar !== null) {
          const life = lifeAtStress(line, ar);
          Nf = ctx.result(
            'N_f',
            withNote(life, governingNote(ctx, 'N_f', points, g, displays(ctx, 'N_f', points))),
            ['sigma_ar'],
            { range: critRange },
          );
          if (!chain.hasEndurance && life.infinite) Nf = null;
        }
      }
    }
    sn = {
      a: line.a,
      b: line.b,
      N1: line.N1,
      N2: line.N2,
      S1: line.S1,
      S2: line.S2,
      hasKnee: line.hasKnee,
      points: ar !== null ? [{ label: 'operating point', sigma_ar: ar, N: Nf }] : [],
    };
    if (N !== undefined && S !== null) sn.points.push({ label: 'required life', sigma_ar: S, N });
  }
  return { criterion, ...(haigh ? { haigh } : {}), ...(sn ? { sn } : {}) };
}

interface PointState {
  sa: number | null;
  sm: number | null;
  smax: number | null;
  /** The point's own equivalent stresses (two-point sections), for the governing records. */
  eq?: EquivalentStresses;
}

function withNote(c: Computed, note: MethodNote): Computed {
  return { ...c, notes: [...(c.notes ?? []), note] };
}

/** The displays of a per-point result, in the order of the points. */
function displays(ctx: CheckContext, base: string, points: SectionPoint[]): string[] {
  return points.map((p) => ctx.values[pointName(base, p)]?.display ?? '');
}

function zeroInput() {
  return { sigma_a: 0, sigma_m: 0, sigma_ax_a: 0, sigma_ax_m: 0, tau_a: 0, tau_m: 0 };
}
