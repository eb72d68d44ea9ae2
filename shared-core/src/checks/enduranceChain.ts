/**
 * Marin factors, the corrected endurance limit (or the corrected strength at a reference
 * life for a material without one), the fatigue strength fraction and the S-N line.
 */
import { computed } from '../computed';
import type { CheckContext } from '../context/checkContext';
import { fatigueStrengthFraction, rotatingBeamEndurance } from '../endurance';
import { marinCorrected } from '../endurance/marinEquation';
import {
  loadFactor,
  miscFactor,
  reliabilityFactor,
  sizeFactorRound,
  surfaceFactor,
  temperatureFactor,
} from '../marin';
import type { SurfaceFinish } from '../marin/surface';
import { FAMILIES, type MaterialFamily } from '../materials';
import { type SnLine, snLineFromBasquin, snLineThrough } from '../sn';
import type { Strengths } from './material';

export type LoadKind = 'bending' | 'axial' | 'torsion' | 'combined';

export interface EnduranceChain {
  /** Se (or Sse for pure torsion), or S_ref at N_ref without an endurance limit. */
  S: number | null;
  /** Ultimate of the route: Sut, or Ssu = 0.67 Sut in pure torsion. */
  Su: number;
  hasEndurance: boolean;
  line: SnLine | null;
  shear: boolean;
}

interface MarinFactors {
  ka: number | null;
  kb: number | null;
  kc: number | null;
  kd: number | null;
  ke: number | null;
  kmisc: number | null;
  /** Every factor known (the Marin equation can be applied). */
  all: boolean;
}

/** Highest temperature read as room temperature for a family other than steel (50 degC). */
const NON_STEEL_ROOM_MAX = 273.15 + 50;

/** Marin factors, stated values winning over the derived ones. */
function marinFactors(
  ctx: CheckContext,
  Sut: number,
  load: LoadKind,
  geometry: 'round' | 'plate' | 'shell',
  hasAxial: boolean,
  family: MaterialFamily,
): MarinFactors {
  let ok = true;
  // ka: surface
  let ka: number | null = null;
  const surface = ctx.option('surface') as SurfaceFinish | undefined;
  if (surface)
    ka = ctx.result('ka', surfaceFactor(surface, Sut), ['Sut'], { range: ctx.optionRange('surface') });
  else if (ctx.has('ka')) ka = ctx.input('ka')!;
  else {
    ctx.diag(
      'error',
      'missing-surface',
      'surface factor ka cannot be derived: state the finish with `surface:` (ground, machined, cold-drawn, hot-rolled, as-forged) or state `ka`',
      ctx.header,
      [ctx.insertFix('Insert `surface: machined` (check the finish)', 'surface: machined')],
    );
    ok = false;
  }
  if (ka !== null && ctx.has('ka') && surface) ka = ctx.input('ka')!;

  // kb: size
  let kb: number | null = null;
  const rotation = (ctx.option('rotation') ?? 'rotating') as 'rotating' | 'non-rotating';
  if (load === 'axial' || geometry !== 'round') {
    kb = ctx.result(
      'kb',
      sizeFactorRound(ctx.si('d') ?? 0.01, { rotation, load: 'axial', unitSystem: ctx.system }),
      [],
      {},
    );
    if (ctx.values.kb && ctx.values.kb.origin !== 'stated') {
      ctx.values.kb.formula = 'kb = 1';
      ctx.values.kb.inputs = [];
      ctx.values.kb.terms = undefined;
    }
  } else {
    const d = ctx.input('d');
    if (d !== undefined && d > 0)
      kb = ctx.result('kb', sizeFactorRound(d, { rotation, load, unitSystem: ctx.system }), ['d'], {
        range: ctx.rangeOf('d'),
      });
    else if (ctx.has('kb')) kb = ctx.input('kb')!;
    else {
      ctx.diag(
        'error',
        'missing-size',
        'size factor kb cannot be derived: state the diameter `d` at the checked section, or `kb`',
      );
      ok = false;
    }
  }

  // kc: load
  let kc: number | null;
  if (ctx.has('kc')) {
    kc = ctx.input('kc')!;
    ctx.result('kc', loadFactor(load), [], {});
    if (hasAxial && load !== 'axial' && kc < 1)
      ctx.diag(
        'warning',
        'kc-axial-twice',
        'the axial 0.85 is already applied inside sigma_a_eq (combined loading): a stated kc below 1 counts it twice',
        ctx.rangeOf('kc'),
      );
  } else kc = ctx.result('kc', loadFactor(load === 'axial' ? 'combined' : load), [], { range: ctx.header });

  // kd: temperature
  let kd: number | null;
  const T = ctx.input('temp');
  if (T !== undefined && family !== 'steel' && T > NON_STEEL_ROOM_MAX && !ctx.has('kd')) {
    // Eq. 6-27 is a fit to steels; lighter alloys lose strength sooner and faster (an
    // aluminium alloy at 150 degC keeps well under the steel fit's 1.0): no credit, no guess.
    const TC = T - 273.15;
    ctx.diag(
      'error',
      'kd-not-for-family',
      `kd of Shigley Eq. (6-27) is a fit to steels (Table 6-4); it does not hold for ${family} at ${TC.toFixed(0)} degC, where the strength falls sooner and faster: state \`kd\` from the alloy's elevated-temperature fatigue data`,
      ctx.rangeOf('temp'),
    );
    kd = ctx.result(
      'kd',
      computed(
        1,
        'kd = 1 (shown only: not valid for this family at this temperature)',
        'no fit for this family',
      ),
      ['temp'],
      { range: ctx.rangeOf('temp') },
    );
  } else if (T !== undefined && family !== 'steel' && !ctx.has('kd'))
    kd = ctx.result(
      'kd',
      computed(
        1,
        `kd = 1 (${family} at room temperature, up to ${(NON_STEEL_ROOM_MAX - 273.15).toFixed(0)} degC)`,
        'room temperature: common practice, no source (handbook properties of light alloys are room-temperature values)',
      ),
      ['temp'],
      { range: ctx.rangeOf('temp') },
    );
  else if (T !== undefined)
    kd = ctx.result('kd', temperatureFactor(T), ['temp'], { range: ctx.rangeOf('temp') });
  else if (ctx.has('kd')) kd = ctx.input('kd')!;
  else {
    const room = ctx.system === 'US' ? '70 degF' : '20 degC';
    ctx.diag(
      'warning',
      'defaulted-temperature',
      `no operating temperature: room temperature assumed (kd = 1); state \`temp\` or \`kd\``,
      ctx.header,
      [ctx.insertFix(`State \`temp = ${room}\``, `temp = ${room}`)],
    );
    kd = ctx.result('kd', computed(1, 'kd = 1', 'room temperature assumed: no temperature stated'), [], {
      origin: 'default',
      assumption: `operating temperature not stated: room temperature, kd = 1`,
    });
  }

  // ke: reliability
  let ke: number | null;
  const R = ctx.input('reliability');
  if (R !== undefined)
    ke = ctx.result('ke', reliabilityFactor(R), ['reliability'], { range: ctx.rangeOf('reliability') });
  else if (ctx.has('ke')) ke = ctx.input('ke')!;
  else {
    ctx.diag(
      'warning',
      'defaulted-reliability',
      'no reliability stated: 50 % assumed (ke = 1, the mean S-N curve); state `reliability` or `ke`',
      ctx.header,
      [
        ctx.insertFix('State `reliability = 0.99`', 'reliability = 0.99'),
        { ...ctx.insertFix('State the assumed `reliability = 0.5`', 'reliability = 0.5'), preferred: false },
      ],
    );
    ke = ctx.result('ke', computed(1, 'ke = 1', '50 % reliability assumed: no reliability stated'), [], {
      origin: 'default',
      assumption: 'reliability not stated: 50 %, ke = 1',
    });
  }

  const kmisc = ctx.has('kmisc')
    ? ctx.input('kmisc')!
    : ctx.result('kmisc', miscFactor(), [], {
        origin: 'default',
        assumption: 'no miscellaneous effects: kmisc = 1',
      });

  for (const [n, v] of [
    ['ka', ka],
    ['kb', kb],
    ['kc', kc],
    ['kd', kd],
    ['ke', ke],
    ['kmisc', kmisc],
  ] as const) {
    if (v !== null && (v <= 0 || v > 1.5))
      ctx.diag(
        'warning',
        'absurd-value',
        `${n} = ${v.toPrecision(3)} is outside any sensible Marin factor (0 to about 1)`,
        ctx.rangeOf(n),
      );
  }
  return {
    ka,
    kb,
    kc,
    kd,
    ke,
    kmisc,
    all: ok && ka !== null && kb !== null && kc !== null && kd !== null && ke !== null && kmisc !== null,
  };
}

function factorValues(k: MarinFactors) {
  return { ka: k.ka!, kb: k.kb!, kc: k.kc!, kd: k.kd!, ke: k.ke!, kmisc: k.kmisc! };
}

const MARIN_INPUTS = ['ka', 'kb', 'kc', 'kd', 'ke', 'kmisc'];

/**
 * Life of the reference strength of a material without an endurance limit: stated `N_ref`,
 * else the library entry's; without either the S-N line cannot be drawn (error).
 */
function referenceLife(ctx: CheckContext, st: Strengths): number | undefined {
  const mat = st.material;
  if (ctx.has('N_ref')) return ctx.input('N_ref');
  if (mat?.N_ref !== undefined)
    return ctx.library(
      'N_ref',
      mat.N_ref,
      `${mat.name}: life of the library's fatigue strength; ${mat.source}`,
      ctx.optionRange('material'),
    );
  const usual = FAMILIES[st.family].usualReferenceLife;
  ctx.diag(
    'error',
    'missing-reference-life',
    `\`${st.family}\` has no endurance limit: state the life \`N_ref\` (cycles) at which the reference strength holds${usual ? ` (typical tables of this family give it at ${usual.toExponential(0).replace('+', '')} cycles)` : ''}`,
    ctx.rangeOf(ctx.has('Sf_ref') ? 'Sf_ref' : 'Sut'),
    usual
      ? [
          ctx.insertFix(
            `State \`N_ref = ${usual.toExponential(0).replace('+', '')}\` (check the life of your data)`,
            `N_ref = ${usual.toExponential(0).replace('+', '')}`,
          ),
        ]
      : [],
  );
  return undefined;
}

/** Rotating-beam strength at the reference life: stated `Sf_ref` (or `Se_prime`), else the library's. */
function referenceStrength(ctx: CheckContext, st: Strengths, N_ref: number | undefined): number | undefined {
  const mat = st.material;
  if (ctx.has('Sf_ref')) return ctx.input('Sf_ref');
  if (ctx.has('Se_prime')) return ctx.input('Se_prime');
  if (mat?.Sf_ref !== undefined)
    return ctx.library(
      'Sf_ref',
      mat.Sf_ref,
      `${mat.name}: rotating-beam fatigue strength at ${(N_ref ?? mat.N_ref ?? 0).toExponential(0).replace('+', '')} cycles; ${mat.source}`,
    );
  ctx.diag(
    'error',
    'missing-reference-strength',
    `\`${st.family}\` has no endurance limit: state the rotating-beam fatigue strength \`Sf_ref\` and the life \`N_ref\` it holds at${st.cls === 'aluminium' || st.cls === 'aluminium-cast' ? " (the Aluminum Association's typical properties give it at 5e8 cycles)" : ''}`,
    ctx.rangeOf('Sut'),
  );
  return undefined;
}

/**
 * Marin factors (stated values win) and the corrected strength. A stated `Se` (or `S_ref`)
 * ends the chain it replaces: the factors are still worked out where the note allows, for
 * the tool's own value beside the stated one, but they raise no diagnostic and show as not used.
 */
export function enduranceChain(
  ctx: CheckContext,
  st: Strengths,
  load: LoadKind,
  geometry: 'round' | 'plate' | 'shell',
  hasAxial: boolean,
): EnduranceChain {
  const shear = load === 'torsion';
  const Sut = st.Sut;
  const hasEndurance = st.enduranceLimit;
  const sName = hasEndurance ? 'Se' : 'S_ref';
  const chain = <T>(run: () => T): T => (ctx.has(sName) ? ctx.replacedBy(sName, run) : run());
  const k = chain(() => marinFactors(ctx, Sut, load, geometry, hasAxial, st.family));

  // Ultimate of the route and the base strength.
  const Su = shear
    ? (ctx.result(
        'Ssu',
        computed(0.67 * Sut, 'Ssu = 0.67 * Sut', "Budynas & Nisbett, Shigley's MED 10th ed., Eq. 6-54"),
        ['Sut'],
      ) ?? 0.67 * Sut)
    : Sut;
  let S: number | null = null;
  let N_ref: number | undefined = 1e6;
  if (hasEndurance) {
    const reference = ['Sf_ref', 'N_ref', 'S_ref'].filter((n) => ctx.has(n));
    if (reference.length > 0) {
      ctx.diag(
        'warning',
        'reference-strength-unused',
        `\`${st.family}\` has an endurance limit: ${reference.map((n) => `\`${n}\``).join(', ')} not used (state \`Se_prime\` or \`Se\`, or the family of a material without one)`,
        ctx.rangeOf(reference[0]),
      );
      ctx.replaced('Se', reference, `\`${st.family}\` has an endurance limit: Se_prime and Se are used`);
    }
    // Se_prime from Sut by family; a stated Se_prime ends that estimate (kept as the tool's own value).
    const estimate = () =>
      ctx.result('Se_prime', rotatingBeamEndurance(st.cls, Sut), ['Sut'], { range: ctx.rangeOf('Sut') });
    const prime = chain(() => (ctx.has('Se_prime') ? ctx.replacedBy('Se_prime', estimate) : estimate()));
    const tool = k.all && prime !== null ? marinCorrected('Se', factorValues(k), prime, 'Se_prime') : null;
    S = ctx.result('Se', tool, [...MARIN_INPUTS, 'Se_prime'], {
      range: ctx.header,
      tool: { basis: 'Marin equation' },
    });
  } else {
    N_ref = referenceLife(ctx, st);
    const base = chain(() => referenceStrength(ctx, st, N_ref));
    const tool =
      k.all && base !== undefined ? marinCorrected('S_ref', factorValues(k), base, 'Sf_ref') : null;
    S = ctx.result('S_ref', tool, [...MARIN_INPUTS, 'Sf_ref'], {
      dim: 'stress',
      range: ctx.header,
      tool: { basis: 'Marin equation' },
    });
  }

  // S-N line.
  let line: SnLine | null = null;
  const sfp = ctx.input('sigma_f_prime');
  const bb = ctx.input('b_basquin');
  if (sfp !== undefined && bb !== undefined) {
    if (bb >= 0) ctx.diag('error', 'absurd-value', '`b_basquin` must be negative', ctx.rangeOf('b_basquin'));
    else {
      line = snLineFromBasquin(sfp, bb);
      ctx.diag(
        'information',
        'basquin-as-stated',
        "the stated Basquin constants are used as the part's S-N line: Marin factors do not act on them",
        ctx.rangeOf('sigma_f_prime'),
      );
    }
  } else if (S !== null && N_ref !== undefined) {
    const f = ctx.has('f')
      ? ctx.input('f')!
      : ctx.result('f', fatigueStrengthFraction(Sut), ['Sut'], { range: ctx.rangeOf('Sut') });
    if (f !== null) {
      const c = snLineThrough(f * Su, S, 1e3, hasEndurance ? 1e6 : N_ref);
      line = { ...c.line, hasKnee: hasEndurance };
      if (c.notes) for (const n of c.notes) ctx.diag(n.severity ?? 'warning', n.code, n.message, ctx.header);
    }
  }
  return { S, Su, hasEndurance, line, shear };
}
