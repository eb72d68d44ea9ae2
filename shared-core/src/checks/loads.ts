/**
 * Loads of a check and the nominal stresses they cause at the checked section: round
 * shafts (solid-section formulas with `d`), plates with a hole (net section), and
 * thin-walled shells (hoop and longitudinal membrane stresses).
 *
 * Loads keep their signs. Each load is a signed mean and a signed amplitude: the load is
 * `mean + amplitude` at the first instant of the cycle (the `_max` values as written) and
 * `mean - amplitude` at the second (the `_min` values), every load of the check at the same
 * instants (in phase). A negative amplitude is a load that falls while the others rise; the
 * critical points of the section (`criticalPoints.ts`) combine the components with these signs.
 */
import { type Computed, computed } from '../computed';
import type { CheckContext } from '../context/checkContext';
import type { Range } from '../context/types';
import {
  axialStress,
  bendingStress,
  plateGrossStress,
  plateNetStress,
  shellStresses,
  torsionStress,
} from '../stress';

/** A load or stress: signed amplitude `a` and signed mean `m` (`m + a` at the first instant, `m - a` at the second). */
export interface Component {
  a: number;
  m: number;
}

export type Geometry = 'round' | 'plate' | 'shell';

export interface NominalStresses {
  geometry: Geometry;
  bending: Component;
  axial: Component;
  torsion: Component;
  /** Shell membrane stresses (hoop and longitudinal), when `shell:` is given. */
  shell?: { kind: 'cylinder' | 'sphere'; hoop: Component; long: Component };
  /** Line that drives the stresses (for inline results). */
  driver: Range;
  /**
   * The bending stress comes from a moment (`M`) on a round section: it is +M c/I at one
   * extreme fibre and -M c/I at the other. (A stated `sigma_a`/`sigma_m` is the stress at the
   * point the note means, and is not mirrored.)
   */
  bendingFromMoment?: boolean;
}

type Base = 'M' | 'T' | 'F' | 'p';

/** Amplitude and mean of a load from `X_max`/`X_min` or `X_a`/`X_m`. */
export function readPair(ctx: CheckContext, base: Base): Component | undefined {
  const maxN = `${base}_max`;
  const minN = `${base}_min`;
  const aN = `${base}_a`;
  const mN = `${base}_m`;
  const hasMaxMin = ctx.has(maxN) || ctx.has(minN);
  const hasAM = base !== 'p' && (ctx.has(aN) || ctx.has(mN));
  if (!hasMaxMin && !hasAM) return undefined;
  if (hasMaxMin && hasAM) {
    ctx.diag(
      'error',
      'load-twice',
      `state the ${base} load either as \`${maxN}\`/\`${minN}\` or as \`${aN}\`/\`${mN}\`, not both`,
      ctx.rangeOf(ctx.has(aN) ? aN : mN),
    );
    return undefined;
  }
  if (hasMaxMin) {
    const max = ctx.input(maxN);
    let min = ctx.input(minN);
    if (max === undefined && min !== undefined) {
      ctx.diag(
        'error',
        'missing-load-pair',
        `\`${minN}\` is stated without \`${maxN}\`: state both`,
        ctx.rangeOf(minN),
      );
      return undefined;
    }
    if (min === undefined) {
      if (base === 'p') {
        min = 0;
        ctx.diag(
          'information',
          'defaulted-load',
          '`p_min` not stated: the pressure is taken to fall to 0 each cycle',
          ctx.rangeOf(maxN),
          [ctx.insertFix('State `p_min = 0 MPa`', `p_min = 0 ${ctx.system === 'US' ? 'ksi' : 'MPa'}`)],
        );
      } else {
        ctx.diag(
          'error',
          'missing-load-pair',
          `\`${maxN}\` is stated without \`${minN}\`: state both (for a steady load, the same value twice)`,
          ctx.rangeOf(maxN),
        );
        return undefined;
      }
    }
    if (max === undefined) return undefined;
    if (max < min) {
      // Read as written: the `_max` values of all loads act together, so this load falls while
      // the others rise (its amplitude is negative). Alone it makes no difference.
      ctx.diag(
        'warning',
        'max-below-min',
        `\`${maxN}\` is below \`${minN}\`: read as written, ${base} is at its smaller value when the other loads are at their \`_max\` (opposite phase, a negative \`${aN}\`); swap the two if that is a slip`,
        ctx.rangeOf(maxN),
      );
    }
    const dim = base === 'F' ? 'force' : base === 'p' ? 'stress' : 'moment';
    const r = ctx.rangeOf(maxN);
    const a = ctx.result(
      aN,
      computed(
        (max - min) / 2,
        `${aN} = (${maxN} - ${minN}) / 2`,
        'definition of the alternating component (signed: the load at the `_max` instant minus the mean)',
      ),
      [maxN, minN],
      { dim, range: r, meaning: `${base} amplitude` },
    );
    const m = ctx.result(
      mN,
      computed((max + min) / 2, `${mN} = (${maxN} + ${minN}) / 2`, 'definition of the mean component'),
      [maxN, minN],
      { dim, range: r, meaning: `mean ${base}` },
    );
    return { a: a ?? 0, m: m ?? 0 };
  }
  const a = ctx.input(aN);
  let m = ctx.input(mN);
  if (a === undefined) {
    ctx.diag(
      'error',
      'missing-load-pair',
      `\`${mN}\` is stated without \`${aN}\`: state the amplitude too (0 for a steady load)`,
      ctx.rangeOf(mN),
    );
    return undefined;
  }
  if (m === undefined) {
    m = 0;
    ctx.diag(
      'information',
      'defaulted-load',
      `\`${mN}\` not stated: fully reversed loading (mean 0) assumed`,
      ctx.rangeOf(aN),
    );
  }
  return { a, m };
}

function readStressPair(ctx: CheckContext, aN: string, mN: string): Component | undefined {
  if (!ctx.has(aN) && !ctx.has(mN)) return undefined;
  const a = ctx.input(aN);
  let m = ctx.input(mN);
  if (a === undefined) {
    ctx.diag(
      'error',
      'missing-load-pair',
      `\`${mN}\` is stated without \`${aN}\`: state the amplitude too`,
      ctx.rangeOf(mN),
    );
    return undefined;
  }
  if (m === undefined) {
    m = 0;
    ctx.diag('information', 'defaulted-load', `\`${mN}\` not stated: mean 0 assumed`, ctx.rangeOf(aN));
  }
  return { a, m };
}

const ZERO: Component = { a: 0, m: 0 };

function need(ctx: CheckContext, name: string, why: string): number | undefined {
  const v = ctx.input(name);
  if (v === undefined) {
    ctx.diag(
      'error',
      'missing-input',
      `${why} needs \`${name}\` (${ctx.values[name]?.meaning ?? name}): state it`,
    );
    return undefined;
  }
  if (v <= 0) {
    ctx.diag('error', 'absurd-value', `\`${name}\` must be positive`, ctx.rangeOf(name));
    return undefined;
  }
  return v;
}

function stressOf(
  ctx: CheckContext,
  prefix: string,
  pair: Component,
  f: (load: number) => Computed,
  loadBase: string,
  range: Range,
  inputs: string[],
): Component {
  const ca = f(pair.a);
  const cm = f(pair.m);
  const aName = `${prefix}_a`;
  const mName = `${prefix}_m`;
  const sub = (c: Computed, suffix: string) => ({
    ...c,
    formula: c.formula
      .replace(/\b(M|T|F|p)\b/g, `${loadBase}_${suffix}`)
      .replace(/^\s*\S+\s*=/, `${prefix}_${suffix} =`),
  });
  const a = ctx.result(aName, sub(ca, 'a'), [`${loadBase}_a`, ...inputs], { dim: 'stress', range });
  const m = ctx.result(mName, sub(cm, 'm'), [`${loadBase}_m`, ...inputs], { dim: 'stress', range });
  return { a: a ?? 0, m: m ?? 0 };
}

/** Whether the check's round section rotates (`rotation:`, rotating when not stated). */
export function isRotating(ctx: CheckContext): boolean {
  return (ctx.option('rotation') ?? 'rotating') === 'rotating';
}

/**
 * Bending stress of a rotating round section. A fibre of a shaft that turns under a moment
 * passes through the tension and the compression side once a revolution, so a moment that is
 * steady in space is completely reversed at every fibre, and a moment that varies slowly
 * between `M_min` and `M_max` reverses the largest of them: amplitude 32 max|M| / (pi d^3),
 * mean 0 (Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-14 and Ex. 7-1 to 7-3: the steady
 * moment of a rotating shaft is taken as fully reversed, M_a = M, M_m = 0).
 */
function rotatingBending(ctx: CheckContext, M: Component, d: number, range: Range): Component {
  const peak = Math.abs(M.m) + Math.abs(M.a);
  const base = bendingStress(peak, d);
  const a = ctx.result(
    'sigma_a',
    {
      ...base,
      formula:
        'sigma_a = 32 * (|M_m| + |M_a|) / (pi * d^3)  (rotating: the largest moment is fully reversed at every fibre)',
      source:
        "Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-14, Ex. 7-1: a steady moment on a rotating shaft is completely reversed",
    },
    ['M_a', 'M_m', 'd'],
    { dim: 'stress', range },
  );
  ctx.result(
    'sigma_m',
    computed(
      0,
      'sigma_m = 0  (rotating: every fibre passes both sides of the moment each revolution)',
      "Budynas & Nisbett, Shigley's MED 10th ed., Sec. 6-14, Ex. 7-1",
    ),
    ['M_m'],
    { dim: 'stress', range },
  );
  return { a: a ?? 0, m: 0 };
}

export function nominalStresses(ctx: CheckContext): NominalStresses | null {
  const shellKind = ctx.option('shell') as 'cylinder' | 'sphere' | undefined;
  const feature = ctx.option('feature');
  const M = readPair(ctx, 'M');
  const T = readPair(ctx, 'T');
  const F = readPair(ctx, 'F');
  const p = readPair(ctx, 'p');
  const sB = readStressPair(ctx, 'sigma_a', 'sigma_m');
  const sX = readStressPair(ctx, 'sigma_ax_a', 'sigma_ax_m');
  const sT = readStressPair(ctx, 'tau_a', 'tau_m');
  const driverName = [
    'M_max',
    'M_a',
    'T_max',
    'T_a',
    'F_max',
    'F_a',
    'p_max',
    'sigma_a',
    'sigma_ax_a',
    'tau_a',
  ].find((n) => ctx.has(n));
  const driver = driverName ? ctx.rangeOf(driverName) : ctx.header;
  for (const [load, stress, ln, sn] of [
    [M, sB, 'M', 'sigma_a'],
    [T, sT, 'T', 'tau_a'],
    [F, sX, 'F', 'sigma_ax_a'],
  ] as const) {
    if (load && stress) {
      ctx.diag(
        'error',
        'load-twice',
        `state either the ${ln} load or the nominal stress \`${sn}\`, not both`,
        ctx.rangeOf(sn),
      );
      return null;
    }
  }
  if (p && !shellKind) {
    ctx.diag(
      'error',
      'missing-option',
      'a pressure needs `shell: cylinder` or `shell: sphere`',
      ctx.rangeOf('p_max'),
    );
    return null;
  }

  if (shellKind) {
    if (!p) {
      ctx.diag(
        'error',
        'missing-load',
        'a shell check needs the pressure cycle: state `p_max` (and `p_min`)',
        ctx.optionRange('shell'),
      );
      return null;
    }
    const D_i = need(ctx, 'D_i', 'a shell');
    const t = need(ctx, 't', 'a shell');
    if (D_i === undefined || t === undefined) return null;
    const r = ctx.rangeOf('p_max');
    const sa = shellStresses(shellKind, p.a, D_i, t);
    const sm = shellStresses(shellKind, p.m, D_i, t);
    const name = (c: Computed, sym: string) => ({
      ...c,
      formula: c.formula.replace(/^\s*\S+\s*=/, `${sym} =`),
    });
    const hoopA = ctx.result('sigma_hoop_a', name(sa.hoop, 'sigma_hoop_a'), ['p_a', 'D_i', 't'], {
      dim: 'stress',
      range: r,
    });
    const hoopM = ctx.result('sigma_hoop_m', name(sm.hoop, 'sigma_hoop_m'), ['p_m', 'D_i', 't'], {
      dim: 'stress',
      range: r,
    });
    const longA = ctx.result('sigma_long_a', name(sa.long, 'sigma_long_a'), ['p_a', 'D_i', 't'], {
      dim: 'stress',
      range: r,
    });
    const longM = ctx.result('sigma_long_m', name(sm.long, 'sigma_long_m'), ['p_m', 'D_i', 't'], {
      dim: 'stress',
      range: r,
    });
    if (M || T || F || sB || sT || sX)
      ctx.diag(
        'warning',
        'ignored-input',
        'a shell check uses the pressure only: the other loads are ignored',
        driver,
      );
    return {
      geometry: 'shell',
      bending: ZERO,
      axial: ZERO,
      torsion: ZERO,
      shell: {
        kind: shellKind,
        hoop: { a: hoopA ?? 0, m: hoopM ?? 0 },
        long: { a: longA ?? 0, m: longM ?? 0 },
      },
      driver: r,
    };
  }

  const plate = feature === 'plate-hole' || (!ctx.has('d') && ctx.has('W') && ctx.has('t'));
  if (plate) {
    if (M || T) {
      ctx.diag(
        'error',
        'unsupported-load',
        'a plate check takes an axial force; for bending or torsion of a plate state `sigma_a`/`sigma_m` or `tau_a`/`tau_m` directly',
        ctx.rangeOf(M ? (ctx.has('M_max') ? 'M_max' : 'M_a') : ctx.has('T_max') ? 'T_max' : 'T_a'),
      );
      return null;
    }
    let axial = sX ?? ZERO;
    if (F) {
      const W = need(ctx, 'W', 'a plate');
      const t = need(ctx, 't', 'a plate');
      if (W === undefined || t === undefined) return null;
      const r = ctx.rangeOf(ctx.has('F_max') ? 'F_max' : 'F_a');
      if (feature === 'plate-hole') {
        const dh = need(ctx, 'd_hole', 'a plate hole');
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
        axial = stressOf(ctx, 'sigma_ax', F, (f) => plateNetStress(f, W, dh, t), 'F', r, [
          'W',
          'd_hole',
          't',
        ]);
      } else {
        axial = stressOf(ctx, 'sigma_ax', F, (f) => plateGrossStress(f, W, t), 'F', r, ['W', 't']);
      }
    }
    return { geometry: 'plate', bending: sB ?? ZERO, axial, torsion: sT ?? ZERO, driver };
  }

  let bending = sB ?? ZERO;
  let torsion = sT ?? ZERO;
  let axial = sX ?? ZERO;
  if (sB && ctx.option('rotation') === 'rotating' && sB.m !== 0) {
    // A bending mean cannot stay at a fibre of a shaft that turns under it (rotatingBending).
    bending = { a: Math.abs(sB.a) + Math.abs(sB.m), m: 0 };
    ctx.diag(
      'information',
      'rotating-stated-mean',
      '`rotation: rotating`: every fibre passes both sides of the bending stress each revolution, so the stated bending mean is reversed with the amplitude (|sigma_a| + |sigma_m|, mean 0; Shigley Sec. 6-14, Ex. 7-1). For the stresses at one point of a section that does not turn, state `rotation: non-rotating`',
      ctx.rangeOf('sigma_m'),
    );
  }
  if (M || T || F) {
    const d = need(ctx, 'd', 'a load on a round section');
    if (d === undefined) return null;
    const mRange = ctx.rangeOf(ctx.has('M_max') ? 'M_max' : 'M_a');
    if (M && isRotating(ctx)) bending = rotatingBending(ctx, M, d, mRange);
    else if (M) bending = stressOf(ctx, 'sigma', M, (m) => bendingStress(m, d), 'M', mRange, ['d']);
    if (T)
      torsion = stressOf(
        ctx,
        'tau',
        T,
        (x) => torsionStress(x, d),
        'T',
        ctx.rangeOf(ctx.has('T_max') ? 'T_max' : 'T_a'),
        ['d'],
      );
    if (F)
      axial = stressOf(
        ctx,
        'sigma_ax',
        F,
        (x) => axialStress(x, d),
        'F',
        ctx.rangeOf(ctx.has('F_max') ? 'F_max' : 'F_a'),
        ['d'],
      );
  }
  if (!M && !T && !F && !sB && !sT && !sX) {
    ctx.diag(
      'error',
      'missing-load',
      'no load: state `M_max`/`M_min`, `T_max`/`T_min`, `F_max`/`F_min` (or their `_a`/`_m` forms), nominal stresses `sigma_a`/`sigma_m`, or a shell pressure',
    );
    return null;
  }
  return { geometry: 'round', bending, axial, torsion, driver, bendingFromMoment: M !== undefined };
}

export function active(c: Component): boolean {
  return c.a !== 0 || c.m !== 0;
}
