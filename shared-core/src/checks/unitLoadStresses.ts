/**
 * The section of a damage check: the nominal stress that one unit of each load causes at the
 * checked section (1 N*m of moment or torque, 1 N of axial force, 1 Pa of pressure; a stated
 * nominal stress is itself), from the same formulas as a stress-life check (`bendingStress(1, d)`,
 * `shellStresses(kind, 1, D_i, t)` ...), the concentration factors of the notch, and the
 * equivalent amplitude and mean at the notch of any load level. Everything is linear in the
 * loads, so the stresses per unit load are computed once and scaled for every level or cycle.
 *
 * The notch stresses are those of each critical point of the section (criticalPoints.ts): both
 * extreme fibres of a non-rotating round section bent by a moment (the bending stress with its
 * sign at one, the opposite sign at the other, each added to the axial stress with its sign), one
 * point otherwise.
 */
import type { Computed } from '../computed';
import type { CheckContext } from '../context/checkContext';
import type { Range } from '../context/types';
import {
  AXIAL_LOAD_FACTOR,
  axialStress,
  bendingStress,
  equivalentStresses,
  plateGrossStress,
  plateNetStress,
  pointEquivalentStresses,
  type ShellKind,
  shellStresses,
  torsionStress,
} from '../stress';
import { type Concentration, concentration } from './concentration';
import { damageFibrePoints, isRotating, ONLY_POINT, type SectionPoint } from './criticalPoints';
import type { LoadKind } from './enduranceChain';
import type { Geometry, NominalStresses } from './loads';
import type { Strengths } from './material';
import type { LevelBase, LevelLoad } from './spectrumLevels';

export type LevelLoads = Partial<Record<LevelBase, LevelLoad>>;

/** How the notch stresses of a level are combined. */
export type DamageRoute = 'shear' | 'shell-plain' | 'shell-cutout' | 'combined';

export interface DamageSection {
  geometry: Geometry;
  shellKind?: ShellKind;
  /** Nominal stress (Pa) per unit load of each base used; for `p` the hoop stress. */
  perUnit: Partial<Record<LevelBase, Computed>>;
  /** Longitudinal membrane stress per unit pressure (shells). */
  longPerUnit?: Computed;
  /** Names the per-unit stresses depend on, by base. */
  inputs: Partial<Record<LevelBase, string[]>>;
  conc: Concentration;
  route: DamageRoute;
  /** The load kind for the Marin load factor. */
  loadKind: LoadKind;
  hasAxial: boolean;
  /** A rotating round section: one point, amplitudes added as magnitudes (as a stress-life check). */
  rotating: boolean;
  /** The points evaluated: both extreme fibres, or the only point. */
  points: SectionPoint[];
}

function positive(ctx: CheckContext, name: string, why: string, range: Range): number | undefined {
  const v = ctx.input(name);
  if (v === undefined) {
    ctx.diag('error', 'missing-input', `${why} needs \`${name}\`: state it`, range);
    return undefined;
  }
  if (!(v > 0)) {
    ctx.diag('error', 'absurd-value', `\`${name}\` must be positive`, ctx.rangeOf(name));
    return undefined;
  }
  return v;
}

/**
 * Section, concentration and route of the bases a damage check loads. `range` is the line the
 * loads come from (the history or the first spectrum line), for diagnostics.
 */
export function damageSection(
  ctx: CheckContext,
  st: Strengths,
  used: ReadonlySet<LevelBase>,
  range: Range,
): DamageSection | null {
  const shellKind = ctx.option('shell') as ShellKind | undefined;
  const feature = ctx.option('feature');
  const perUnit: DamageSection['perUnit'] = {};
  const inputs: DamageSection['inputs'] = {};
  let longPerUnit: Computed | undefined;
  let geometry: Geometry = 'round';
  const others = [...used].filter((b) => b !== 'p');

  if (used.has('p') || shellKind) {
    if (!used.has('p')) {
      ctx.diag(
        'error',
        'missing-load',
        'a shell check takes the pressure: `history-load: pressure`, or `p_a`/`p_m` (or `p_max`/`p_min`) in the spectrum',
        ctx.optionRange('shell') ?? range,
      );
      return null;
    }
    if (!shellKind) {
      ctx.diag('error', 'missing-option', 'a pressure needs `shell: cylinder` or `shell: sphere`', range, [
        ctx.insertFix('State `shell: cylinder`', 'shell: cylinder'),
      ]);
      return null;
    }
    if (others.length > 0) {
      ctx.diag(
        'error',
        'unsupported-load',
        `a shell check uses the pressure only: remove ${others.map((b) => `\`${b}\``).join(', ')} from the levels`,
        range,
      );
      return null;
    }
    const D_i = positive(ctx, 'D_i', 'a shell', range);
    const t = positive(ctx, 't', 'a shell', range);
    if (D_i === undefined || t === undefined) return null;
    const s = shellStresses(shellKind, 1, D_i, t);
    perUnit.p = s.hoop;
    longPerUnit = s.long;
    inputs.p = ['D_i', 't'];
    geometry = 'shell';
  } else {
    const plate = feature === 'plate-hole' || (!ctx.has('d') && ctx.has('W') && ctx.has('t'));
    if (plate) {
      geometry = 'plate';
      if (used.has('M') || used.has('T')) {
        ctx.diag(
          'error',
          'unsupported-load',
          'a plate check takes an axial force; for bending or torsion of a plate give nominal stresses (`sigma_a`/`sigma_m`, `tau_a`/`tau_m`)',
          range,
        );
        return null;
      }
      if (used.has('F')) {
        const W = positive(ctx, 'W', 'a plate', range);
        const t = positive(ctx, 't', 'a plate', range);
        if (W === undefined || t === undefined) return null;
        if (feature === 'plate-hole') {
          const dh = positive(ctx, 'd_hole', 'a plate hole', range);
          if (dh === undefined) return null;
          if (dh >= W) {
            ctx.diag(
              'error',
              'absurd-value',
              '`d_hole` must be smaller than the plate width `W`',
              ctx.rangeOf('d_hole'),
            );
            return null;
          }
          perUnit.F = plateNetStress(1, W, dh, t);
          inputs.F = ['W', 'd_hole', 't'];
        } else {
          perUnit.F = plateGrossStress(1, W, t);
          inputs.F = ['W', 't'];
        }
      }
    } else if (used.has('M') || used.has('T') || used.has('F')) {
      const d = positive(ctx, 'd', 'a load on a round section', range);
      if (d === undefined) return null;
      if (used.has('M')) perUnit.M = bendingStress(1, d);
      if (used.has('T')) perUnit.T = torsionStress(1, d);
      if (used.has('F')) perUnit.F = axialStress(1, d);
      for (const b of ['M', 'T', 'F'] as const) if (used.has(b)) inputs[b] = ['d'];
    }
  }
  for (const b of ['sigma', 'sigma_ax', 'tau'] as const)
    if (used.has(b)) perUnit[b] = { value: 1, formula: 'stated nominal stress', source: 'the note' };

  // The concentration of every loaded mode, from a unit state of that mode.
  const bend = used.has('M') || used.has('sigma');
  const tor = used.has('T') || used.has('tau');
  const ax = used.has('F') || used.has('sigma_ax') || geometry === 'shell';
  const unit = { a: 1, m: 0 };
  const zero = { a: 0, m: 0 };
  const nominal: NominalStresses = {
    geometry,
    bending: geometry !== 'shell' && bend ? unit : zero,
    torsion: geometry !== 'shell' && tor ? unit : zero,
    axial: geometry !== 'shell' && ax ? unit : zero,
    ...(geometry === 'shell' && shellKind ? { shell: { kind: shellKind, hoop: unit, long: unit } } : {}),
    driver: range,
  };
  if (ctx.option('mean-concentration') === 'local-yield')
    ctx.diag(
      'warning',
      'mean-concentration-ignored',
      'a damage check applies Kf to the mean stress of every cycle: `mean-concentration: local-yield` is not applied per cycle',
      ctx.optionRange('mean-concentration'),
    );
  const conc = concentration(ctx, nominal, st.Sut, st.Sy, st.cls);
  if (!conc) return null;

  let loadKind: LoadKind = 'combined';
  if (geometry === 'shell') loadKind = 'axial';
  else if (tor && !bend && !ax) loadKind = 'torsion';
  else if (bend && !tor && !ax) loadKind = 'bending';
  else if (ax && !bend && !tor) loadKind = 'axial';
  const route: DamageRoute =
    geometry === 'shell'
      ? ctx.option('feature') === 'shell-cutout'
        ? 'shell-cutout'
        : 'shell-plain'
      : loadKind === 'torsion'
        ? 'shear'
        : 'combined';
  // Stated nominal stresses are the engineer's point: they rotate only when the note says so.
  const rotating =
    geometry === 'round' && (used.has('M') ? isRotating(ctx) : ctx.option('rotation') === 'rotating');
  const fibres = route === 'combined' && geometry === 'round' && !rotating && used.has('M');
  return {
    geometry,
    ...(shellKind ? { shellKind } : {}),
    perUnit,
    ...(longPerUnit ? { longPerUnit } : {}),
    inputs,
    conc,
    route,
    loadKind,
    hasAxial: ax,
    rotating,
    points: fibres ? damageFibrePoints() : [ONLY_POINT],
  };
}

function scaled(sec: DamageSection, base: LevelBase, l: LevelLoad | undefined): LevelLoad {
  if (!l) return { a: 0, m: 0 };
  const k = sec.perUnit[base]?.value ?? 0;
  return { a: k * l.a, m: k * l.m };
}

function vonMises2(s1: number, s2: number): number {
  return Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
}

/**
 * Equivalent amplitude and (signed) mean at the notch of one load level, Pa, at each point of
 * `sec.points` (in that order): the contract's combined-loading rule (von Mises, axial amplitude
 * / 0.85) as in a stress-life check, with the signed components at the point (a rotating section:
 * the largest moment fully reversed, amplitudes added as magnitudes); in pure torsion the shear stresses themselves, the mean as a
 * magnitude (the sign of a torque does not change its mean-stress effect: common practice, no
 * source); a plain shell by the von Mises stress of its membrane stresses, signed with their sum.
 */
export function notchEquivalent(sec: DamageSection, loads: LevelLoads): Array<{ sa: number; sm: number }> {
  const c = sec.conc;
  if (sec.route === 'shear') {
    const T = scaled(sec, 'T', loads.T);
    const tau = scaled(sec, 'tau', loads.tau);
    return [{ sa: c.Kfs * Math.abs(T.a + tau.a), sm: c.Kfsm * Math.abs(T.m + tau.m) }];
  }
  if (sec.route === 'shell-plain' || sec.route === 'shell-cutout') {
    const p = loads.p ?? { a: 0, m: 0 };
    const h = sec.perUnit.p?.value ?? 0;
    const l = sec.longPerUnit?.value ?? 0;
    if (sec.route === 'shell-cutout') {
      return [{ sa: Math.abs(c.Kf_ax * h * p.a) / AXIAL_LOAD_FACTOR, sm: c.Kf_axm * h * p.m }];
    }
    const sa = vonMises2(h * p.a, l * p.a) / AXIAL_LOAD_FACTOR;
    const vm = vonMises2(h * p.m, l * p.m);
    return [{ sa, sm: h * p.m + l * p.m < 0 ? -vm : vm }];
  }
  const M = scaled(sec, 'M', loads.M);
  const sB = scaled(sec, 'sigma', loads.sigma);
  const F = scaled(sec, 'F', loads.F);
  const sX = scaled(sec, 'sigma_ax', loads.sigma_ax);
  const T = scaled(sec, 'T', loads.T);
  const tau = scaled(sec, 'tau', loads.tau);
  return sec.points.map((pt) => {
    // A rotating shaft reverses its largest moment at every fibre (loads.ts, rotatingBending).
    // A stated bending stress on a section said to rotate is reversed the same way.
    const bend = sec.rotating
      ? { a: Math.abs(M.a) + Math.abs(M.m) + Math.abs(sB.a) + Math.abs(sB.m), m: 0 }
      : { a: pt.s * M.a + sB.a, m: pt.s * M.m + sB.m };
    const input = {
      ...c,
      // The moment's bending stress takes the point's sign; a stated stress is the point's own.
      sigma_a: bend.a,
      sigma_m: bend.m,
      sigma_ax_a: F.a + sX.a,
      sigma_ax_m: F.m + sX.m,
      tau_a: T.a + tau.a,
      tau_m: T.m + tau.m,
    };
    const eq = sec.rotating ? equivalentStresses(input) : pointEquivalentStresses(input);
    return { sa: eq.sigma_a_eq.value, sm: eq.sigma_m_eq.value };
  });
}
