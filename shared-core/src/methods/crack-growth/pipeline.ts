/**
 * `method: crack-growth`: damage-tolerance life of a crack under a constant-amplitude stress
 * cycle by the Paris law, da/dN = C_paris (delta_K)^m_paris, delta_K = Y delta_sigma sqrt(pi a),
 * from the initial size a_i to the critical size a_c where Y sigma_max sqrt(pi a_c) = K_IC, and
 * the inspection interval N_insp = N_cg / inspection_factor.
 *
 * - Geometry: a constant `Y`, or `crack-geometry: centre-crack | edge-crack` with the plate
 *   width `W` (Y then depends on a: the life is integrated numerically).
 * - Stress cycle: `sigma_max`/`sigma_min`, or a shell's `p_max`/`p_min` (`shell:`, `D_i`, `t`)
 *   through the membrane hoop stress (the stress that opens an axial crack).
 * - A compressive part of the cycle does not drive growth: delta_sigma = sigma_max - max(sigma_min, 0),
 *   the convention of ASTM E647 (delta_K = K_max when R <= 0); a wholly compressive cycle grows
 *   no crack.
 */
import { type Computed, computed, infinite, MPA } from '../../computed';
import type { CheckContext } from '../../context/checkContext';
import type { Range } from '../../context/types';
import { nameInfo } from '../../context/vocabulary';
import {
  centreCrackFiniteWidth,
  criticalCrackSize,
  type GeometryFactor,
  geometryFactorAt,
  inspectionInterval,
  parisConstantFromInch,
  parisConstantNotes,
  parisLife,
  singleEdgeCrackFiniteWidth,
} from '../../crack';
import { type ShellKind, shellStresses } from '../../stress';
import { formatNumber } from '../../units/format';
import type { MethodExtras } from '../types';

/** Points of the crack-size curve for the diagram. */
const CURVE_POINTS = 50;
/** Rows of the crack-growth table. */
const TABLE_ROWS = 8;

const DELTA_SOURCE =
  'ASTM E647, Standard Test Method for Measurement of Fatigue Crack Growth Rates: delta_K = K_max - K_min for R >= 0 and delta_K = K_max for R < 0 (only the tensile part of the range drives growth; as quoted in the secondary literature, section not checked)';

const PARIS_K_SOURCE =
  'G.R. Irwin, Analysis of stresses and strains near the end of a crack, J. Appl. Mech. 24 (1957) (K = Y sigma sqrt(pi a))';

/** Codes of the Paris-life notes reported elsewhere (on the constants' lines, or checked before). */
const REPORTED_ELSEWHERE = new Set(['paris-units', 'paris-exponent', 'crack-size-order']);

/** Whether the statement of `name` was rejected with an error (so that "missing" would repeat it). */
function rejected(ctx: CheckContext, name: string): boolean {
  return ctx.diagnostics.some(
    (d) =>
      d.severity === 'error' && (d.message.startsWith(`\`${name}\``) || d.message.startsWith(`${name}:`)),
  );
}

function required(ctx: CheckContext, name: string, why?: string): number | undefined {
  const v = ctx.input(name);
  if (v === undefined && !rejected(ctx, name))
    ctx.diag(
      'error',
      'missing-input',
      `a crack-growth check needs \`${name}\` (${why ?? nameInfo(name)?.meaning ?? name}): state it`,
      ctx.optionRange('method') ?? ctx.header,
    );
  return v;
}

function positive(ctx: CheckContext, name: string, why?: string): number | undefined {
  const v = required(ctx, name, why);
  if (v !== undefined && !(v > 0)) {
    ctx.diag('error', 'absurd-value', `\`${name}\` must be positive`, ctx.rangeOf(name));
    return undefined;
  }
  return v;
}

interface Cycle {
  max: number;
  min: number;
  /** Lines of the largest and smallest stress (or pressure). */
  maxRange: Range;
  minRange: Range;
  inputs: string[];
}

function stressCycle(ctx: CheckContext): Cycle | null {
  const shellKind = ctx.option('shell') as ShellKind | undefined;
  if (ctx.options.has('shell') || ctx.has('p_max') || ctx.has('p_min')) {
    if (!ctx.options.has('shell')) {
      ctx.diag(
        'error',
        'missing-option',
        'a pressure needs `shell: cylinder` or `shell: sphere`',
        ctx.rangeOf('p_max'),
        [ctx.insertFix('State `shell: cylinder`', 'shell: cylinder')],
      );
      return null;
    }
    if (!shellKind) return null;
    if (ctx.has('sigma_max') || ctx.has('sigma_min')) {
      ctx.diag(
        'error',
        'load-twice',
        'state the cycle either as the shell pressure `p_max`/`p_min` or as `sigma_max`/`sigma_min`, not both',
        ctx.rangeOf(ctx.has('sigma_max') ? 'sigma_max' : 'sigma_min'),
      );
      return null;
    }
    const pmax = required(ctx, 'p_max', 'the largest pressure of the cycle');
    let pmin = ctx.input('p_min');
    if (pmax === undefined) return null;
    if (pmin === undefined) {
      pmin = 0;
      ctx.diag(
        'information',
        'defaulted-load',
        '`p_min` not stated: the pressure is taken to fall to 0 each cycle',
        ctx.rangeOf('p_max'),
        [ctx.insertFix('State `p_min = 0 MPa`', `p_min = 0 ${ctx.system === 'US' ? 'ksi' : 'MPa'}`)],
      );
    }
    const D_i = positive(ctx, 'D_i');
    const t = positive(ctx, 't');
    if (D_i === undefined || t === undefined) return null;
    const hoop = (p: number, sym: string): Computed => {
      const c = shellStresses(shellKind, p, D_i, t).hoop;
      return {
        ...c,
        formula: c.formula.replace(/^\s*\S+\s*=/, `${sym} =`).replace(/\bp\b/, sym.replace('sigma', 'p')),
      };
    };
    const maxRange = ctx.rangeOf('p_max');
    const minRange = ctx.has('p_min') ? ctx.rangeOf('p_min') : maxRange;
    const max = ctx.result('sigma_max', hoop(pmax, 'sigma_max'), ['p_max', 'D_i', 't'], {
      dim: 'stress',
      range: maxRange,
      meaning: 'largest hoop stress of the cycle (opens an axial crack)',
    });
    const min = ctx.result('sigma_min', hoop(pmin, 'sigma_min'), ['p_min', 'D_i', 't'], {
      dim: 'stress',
      range: minRange,
      meaning: 'smallest hoop stress of the cycle',
    });
    if (max === null || min === null) return null;
    return { max, min, maxRange, minRange, inputs: ['sigma_max', 'sigma_min'] };
  }
  const max = required(ctx, 'sigma_max', 'the largest stress of the cycle, or a shell pressure `p_max`');
  if (max === undefined) return null;
  let min = ctx.input('sigma_min');
  if (min === undefined) {
    min = 0;
    ctx.diag(
      'information',
      'defaulted-load',
      '`sigma_min` not stated: the stress is taken to fall to 0 each cycle',
      ctx.rangeOf('sigma_max'),
      [ctx.insertFix('State `sigma_min = 0 MPa`', `sigma_min = 0 ${ctx.system === 'US' ? 'ksi' : 'MPa'}`)],
    );
  }
  const maxRange = ctx.rangeOf('sigma_max');
  const minRange = ctx.has('sigma_min') ? ctx.rangeOf('sigma_min') : maxRange;
  return { max, min, maxRange, minRange, inputs: ['sigma_max', 'sigma_min'] };
}

export function runCrackGrowth(ctx: CheckContext): MethodExtras {
  // Paris constants, in the metre form.
  const C = positive(ctx, 'C_paris');
  const m = positive(ctx, 'm_paris');
  let Cm: number | undefined = C;
  if (C !== undefined && m !== undefined && ctx.option('paris-units') === 'inch') {
    Cm =
      ctx.result('C_paris_metre', parisConstantFromInch(C, m), ['C_paris', 'm_paris'], {
        range: ctx.rangeOf('C_paris'),
        meaning: 'Paris coefficient for da/dN in m/cycle with delta_K in MPa*m^0.5',
      }) ?? undefined;
  }
  let parisOk = Cm !== undefined && m !== undefined;
  if (Cm !== undefined && m !== undefined) {
    for (const n of parisConstantNotes(Cm, m)) {
      const sev = n.severity ?? 'warning';
      ctx.diag(sev, n.code, n.message, ctx.rangeOf(n.code === 'paris-exponent' ? 'm_paris' : 'C_paris'));
      if (sev === 'error') parisOk = false;
    }
  }

  // Geometry factor.
  let Y: number | GeometryFactor | undefined;
  const geoWord = ctx.option('crack-geometry');
  const geoRange = ctx.optionRange('crack-geometry');
  if (!ctx.options.has('crack-geometry') || geoWord === 'constant') {
    const y = ctx.input('Y');
    if (y === undefined) {
      if (!rejected(ctx, 'Y'))
        ctx.diag(
          'error',
          'missing-input',
          'state the geometry factor `Y` (constant), or `crack-geometry: centre-crack | edge-crack` with the plate width `W`',
          ctx.optionRange('method') ?? ctx.header,
        );
    } else if (!(y > 0)) ctx.diag('error', 'absurd-value', '`Y` must be positive', ctx.rangeOf('Y'));
    else Y = y;
  } else if (geoWord) {
    if (ctx.has('Y'))
      ctx.diag(
        'error',
        'geometry-twice',
        `\`Y\` comes from \`crack-geometry: ${geoWord}\` here (it varies with the crack size): remove the stated \`Y\`, or write \`crack-geometry: constant\``,
        ctx.rangeOf('Y'),
      );
    else {
      const W = positive(ctx, 'W', `the plate width of \`crack-geometry: ${geoWord}\``);
      if (W !== undefined)
        Y =
          geoWord === 'centre-crack' ? centreCrackFiniteWidth(W, 'feddersen') : singleEdgeCrackFiniteWidth(W);
    }
  }

  const cycle = stressCycle(ctx);
  const a_i = positive(ctx, 'a_i');
  if (Cm === undefined || m === undefined || !parisOk || Y === undefined || !cycle || a_i === undefined)
    return {};
  const geometry = typeof Y === 'number' ? undefined : Y;
  if (geometry) {
    if (a_i >= geometry.aMax) {
      ctx.diag(
        'error',
        'geometry-limit',
        `a_i is at or beyond the limit of the ${geometry.key} geometry factor (a < ${ctx.display(geometry.aMax, 'length')} for W = ${ctx.display(geometry.W, 'length')})`,
        ctx.rangeOf('a_i'),
      );
      return {};
    }
    ctx.result('Y', geometryFactorAt(geometry, a_i), ['a_i', 'W'], {
      range: geoRange,
      meaning: `geometry factor at the initial crack a_i (${geometry.name}; it varies with a)`,
    });
  }

  // The stress range that drives growth.
  let { max, min } = cycle;
  if (max < min) {
    ctx.diag(
      'warning',
      'max-below-min',
      'the largest stress is below the smallest: the two are swapped',
      cycle.maxRange,
    );
    [max, min] = [min, max];
  }
  let delta: Computed;
  if (max <= 0) {
    ctx.diag(
      'warning',
      'compressive-cycle',
      'the whole cycle is compressive (sigma_max <= 0): a crack does not grow under it, so there is no crack-growth life to check',
      cycle.maxRange,
    );
    delta = computed(0, 'delta_sigma = 0 (sigma_max <= 0: no tensile part)', DELTA_SOURCE);
  } else if (min < 0) {
    ctx.diag(
      'information',
      'compressive-part',
      'sigma_min is compressive: only the tensile part of the range drives growth, delta_sigma = sigma_max (ASTM E647 convention, delta_K = K_max for R < 0)',
      cycle.minRange,
    );
    delta = computed(max, 'delta_sigma = sigma_max (sigma_min < 0: tensile part only)', DELTA_SOURCE, [
      { name: 'sigma_max', value: max / MPA, unit: 'MPa' },
      { name: 'sigma_min', value: min / MPA, unit: 'MPa' },
    ]);
  } else {
    delta = computed(max - min, 'delta_sigma = sigma_max - sigma_min', DELTA_SOURCE, [
      { name: 'sigma_max', value: max / MPA, unit: 'MPa' },
      { name: 'sigma_min', value: min / MPA, unit: 'MPa' },
    ]);
  }
  const dS = ctx.result('delta_sigma', delta, cycle.inputs, {
    dim: 'stress',
    range: cycle.maxRange,
    meaning: 'stress range that drives crack growth (tensile part)',
  });
  if (dS === null) return {};
  const Y_i = typeof Y === 'number' ? Y : Y.Y(a_i);
  ctx.result(
    'delta_K_i',
    computed(
      dS * Y_i * Math.sqrt(Math.PI * a_i),
      'delta_K_i = Y * delta_sigma * sqrt(pi * a_i)',
      PARIS_K_SOURCE,
    ),
    ['Y', 'delta_sigma', 'a_i'],
    { dim: 'toughness', range: ctx.rangeOf('a_i'), meaning: 'stress-intensity range at the initial crack' },
  );

  // Critical size.
  let a_c: number | null | undefined;
  const K_IC = ctx.input('K_IC');
  if (K_IC !== undefined) {
    if (!(K_IC > 0)) {
      ctx.diag('error', 'absurd-value', '`K_IC` must be positive', ctx.rangeOf('K_IC'));
      return {};
    }
    a_c = ctx.result('a_c', criticalCrackSize(K_IC, Y, max), ['K_IC', 'Y', 'sigma_max'], {
      range: ctx.rangeOf('K_IC'),
    });
  } else if (ctx.has('a_c')) {
    a_c = ctx.input('a_c');
    if (a_c !== undefined && !(a_c > 0)) {
      ctx.diag('error', 'absurd-value', '`a_c` must be positive', ctx.rangeOf('a_c'));
      return {};
    }
  } else {
    if (!rejected(ctx, 'K_IC') && !rejected(ctx, 'a_c'))
      ctx.diag(
        'error',
        'missing-input',
        'state the fracture toughness `K_IC` (the critical size follows from it) or the critical crack size `a_c`',
        ctx.optionRange('method') ?? ctx.header,
      );
    return {};
  }
  if (a_c === undefined) return {};
  const wall = ctx.options.has('shell') ? ctx.si('t') : undefined;
  if (a_c !== null && wall !== undefined && a_c > wall)
    ctx.diag(
      'warning',
      'crack-through-wall',
      `a_c = ${ctx.display(a_c, 'length')} is deeper than the wall (t = ${ctx.display(wall, 'length')}): the crack goes through the wall (a leak) before it is critical; state the critical depth \`a_c\` no larger than the wall`,
      ctx.has('a_c') ? ctx.rangeOf('a_c') : ctx.rangeOf('K_IC'),
    );
  const lifeRange = ctx.rangeOf('a_i');
  const lifeInputs = ['C_paris', 'm_paris', 'Y', 'delta_sigma', 'a_i', 'a_c'];

  // No growth: no tensile part, or no critical size (no tensile peak).
  if (dS === 0 || a_c === null) {
    const none = infinite('N_cg: no tensile stress range, the crack does not grow', DELTA_SOURCE, undefined, [
      {
        code: 'no-stress-range',
        severity: 'information',
        message: 'no tensile part of the cycle: no crack growth',
      },
    ]);
    ctx.result('N_cg', none, lifeInputs, { range: lifeRange });
    inspection(ctx, none, lifeRange);
    return {};
  }
  if (a_i >= a_c) {
    ctx.diag(
      'error',
      'crack-size-order',
      `the initial crack a_i = ${ctx.display(a_i, 'length')} is not smaller than the critical size a_c = ${ctx.display(a_c, 'length')}: the part fails on the first cycle (no crack-growth life)`,
      lifeRange,
    );
    return {};
  }

  // Life, curve and table.
  const life = parisLife({ C: Cm, m, Y, a_i, a_c, delta_sigma: dS });
  const N_cg = ctx.result(
    'N_cg',
    { ...life, notes: (life.notes ?? []).filter((n) => !REPORTED_ELSEWHERE.has(n.code)) },
    lifeInputs,
    { range: lifeRange },
  );
  inspection(ctx, life, lifeRange);
  if (N_cg === null) return {};

  const aEnd = geometry && a_c >= geometry.aMax ? geometry.aMax * (1 - 1e-9) : a_c;
  const at = (k: number, n: number) => a_i * (aEnd / a_i) ** (k / (n - 1));
  const cyclesTo = (a: number) =>
    a <= a_i ? 0 : parisLife({ C: Cm, m, Y, a_i, a_c: a, delta_sigma: dS }).value;
  const crackCurve: Array<[number, number]> = [];
  for (let k = 0; k < CURVE_POINTS; k++) {
    const a = at(k, CURVE_POINTS);
    const N = cyclesTo(a);
    if (Number.isFinite(N)) crackCurve.push([a, N]);
  }
  const Yof = (a: number) => (typeof Y === 'number' ? Y : Y.Y(a));
  const rows: string[][] = [];
  for (let k = 0; k < TABLE_ROWS; k++) {
    const a = at(k, TABLE_ROWS);
    const dK = Yof(a) * dS * Math.sqrt(Math.PI * a);
    const rate = Cm * (dK / MPA) ** m;
    rows.push([
      ctx.display(a, 'length'),
      formatNumber(Yof(a), 4),
      ctx.display(dK, 'toughness'),
      `${ctx.display(rate, 'length')}/cycle`,
      formatNumber(cyclesTo(a), 4),
    ]);
  }
  return {
    crackCurve,
    tables: [
      {
        title: 'Crack growth from a_i to a_c (Paris law)',
        columns: ['a', 'Y(a)', 'delta_K', 'da/dN', 'N from a_i'],
        rows,
      },
    ],
  };
}

/** N_insp = N_cg / inspection_factor; the factor defaults to 2 (recorded as an assumption). */
function inspection(ctx: CheckContext, life: Computed, range: Range): void {
  let f = ctx.input('inspection_factor');
  if (f === undefined && !rejected(ctx, 'inspection_factor'))
    f =
      ctx.result(
        'inspection_factor',
        computed(
          2,
          'inspection_factor = 2',
          'default of the block language: inspect at half the predicted crack-growth life (damage-tolerance practice, common practice, no source)',
        ),
        [],
        {
          origin: 'default',
          range,
          assumption: 'no `inspection_factor` stated: 2 (inspection interval = half the crack-growth life)',
        },
      ) ?? undefined;
  if (f === undefined) return;
  ctx.result('N_insp', inspectionInterval(life, f), ['N_cg', 'inspection_factor'], {
    range: ctx.has('inspection_factor') ? ctx.rangeOf('inspection_factor') : range,
  });
}
