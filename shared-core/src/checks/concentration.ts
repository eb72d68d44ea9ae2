/**
 * Stress concentration at the checked section: Kt from the feature's fit (or stated),
 * notch sensitivity q from the material family's own data (Neuber or Peterson),
 * Kf = 1 + q (Kt - 1), and the concentration on the mean stress (Kf, or reduced by local
 * yielding when asked). A shell cutout is evaluated at its critical edge points (both ends of
 * the opening and the edge between them), each with its own Kt, radius of curvature, q and Kf;
 * the governing one is reported, with the shell parameter of the opening.
 */
import { type Computed, computed, MM, type Term } from '../computed';
import type { CheckContext } from '../context/checkContext';
import type { Range } from '../context/types';
import type { MaterialClass } from '../materials';
import {
  type CutoutPoint,
  crossHoleKt,
  familyNotchSensitivity,
  fatigueNotchFactor,
  governingCutoutPoint,
  grooveKt,
  meanStressNotchFactor,
  type NotchSensitivityModel,
  plateHoleKt,
  SHELL_PARAMETER_LIMIT,
  shellCutoutKt,
  shellParameter,
  shoulderFilletKt,
} from '../notch';
import { active, type NominalStresses } from './loads';

export type Mode = 'bending' | 'torsion' | 'axial';

export interface Concentration {
  Kf: number;
  Kfs: number;
  Kf_ax: number;
  Kfm: number;
  Kfsm: number;
  Kf_axm: number;
}

const KT_NAME: Record<Mode, 'Kt' | 'Kts' | 'Kt_ax'> = { bending: 'Kt', torsion: 'Kts', axial: 'Kt_ax' };
const KF_NAME: Record<Mode, 'Kf' | 'Kfs' | 'Kf_ax'> = { bending: 'Kf', torsion: 'Kfs', axial: 'Kf_ax' };
const KFM_NAME: Record<Mode, 'Kfm' | 'Kfsm' | 'Kf_axm'> = {
  bending: 'Kfm',
  torsion: 'Kfsm',
  axial: 'Kf_axm',
};

function positive(ctx: CheckContext, name: string, why: string): number | undefined {
  const v = ctx.input(name);
  if (v === undefined) {
    ctx.diag(
      'error',
      'missing-input',
      `${why} needs \`${name}\`: state it (or state \`Kt\`/\`Kf\` directly)`,
      ctx.optionRange('feature'),
    );
    return undefined;
  }
  if (v <= 0) {
    ctx.diag('error', 'absurd-value', `\`${name}\` must be positive`, ctx.rangeOf(name));
    return undefined;
  }
  return v;
}

/** Kt of one mode from the feature's fit; null when it cannot be computed (diagnosed). */
function fitKt(ctx: CheckContext, feature: string, mode: Mode) {
  const fr = ctx.optionRange('feature');
  switch (feature) {
    case 'shoulder-fillet':
    case 'groove': {
      const D = positive(ctx, 'D', `a ${feature}`);
      const d = positive(ctx, 'd', `a ${feature}`);
      const r = positive(ctx, 'r', `a ${feature}`);
      if (D === undefined || d === undefined || r === undefined) return null;
      if (D <= d) {
        ctx.diag(
          'error',
          'absurd-value',
          '`D` must be larger than `d` at a shoulder or groove',
          ctx.rangeOf('D'),
        );
        return null;
      }
      return {
        c: feature === 'groove' ? grooveKt(mode, D, d, r) : shoulderFilletKt(mode, D, d, r),
        inputs: ['D', 'd', 'r'],
        r,
      };
    }
    case 'cross-hole': {
      const d = positive(ctx, 'd', 'a cross hole');
      const dh = positive(ctx, 'd_hole', 'a cross hole');
      if (d === undefined || dh === undefined) return null;
      if (dh >= d) {
        ctx.diag(
          'error',
          'absurd-value',
          '`d_hole` must be smaller than the shaft diameter `d`',
          ctx.rangeOf('d_hole'),
        );
        return null;
      }
      return { c: crossHoleKt(mode, d, dh), inputs: ['d', 'd_hole'], r: ctx.input('r') ?? dh / 2 };
    }
    case 'plate-hole': {
      if (mode !== 'axial') {
        ctx.diag(
          'error',
          'unsupported-load',
          'the plate-hole fit is for an axial load: state `Kt` for other loads',
          fr,
        );
        return null;
      }
      const W = positive(ctx, 'W', 'a plate hole');
      const dh = positive(ctx, 'd_hole', 'a plate hole');
      if (W === undefined || dh === undefined) return null;
      return { c: plateHoleKt(W, dh), inputs: ['W', 'd_hole'], r: ctx.input('r') ?? dh / 2 };
    }
    default:
      return null;
  }
}

function sensitivityModel(ctx: CheckContext): NotchSensitivityModel {
  return ctx.option('notch-sensitivity') === 'peterson' ? 'peterson' : 'neuber';
}

function notchSensitivity(
  ctx: CheckContext,
  shear: boolean,
  r: number,
  Sut: number,
  cls: MaterialClass | string,
  rangeName: string,
): number | null {
  const name = shear ? 'qs' : 'q';
  if (ctx.has(name)) return ctx.input(name)!;
  const c = familyNotchSensitivity(sensitivityModel(ctx), cls, r, Sut, shear ? 'shear' : 'normal');
  return ctx.result(name, c, ['r', 'Sut'], { range: ctx.rangeOf(rangeName) });
}

function withNote(c: Computed, terms: Term[], message: string): Computed {
  return {
    ...c,
    terms: [...(c.terms ?? []), ...terms],
    notes: [...(c.notes ?? []), { code: 'peak-location', severity: 'information', message }],
  };
}

const POINT_WORDS: Record<CutoutPoint['key'], string> = {
  circumferential: 'circumferential end',
  axial: 'axial end',
  between: 'point between the ends',
};

function mm(x: number): string {
  return `${(x / MM).toPrecision(4)} mm`;
}

/**
 * Kf of an elliptical or circular opening in a pressurised shell (the hoop stress is the
 * nominal stress). Returns null when it cannot be computed (diagnosed).
 */
function shellCutoutConcentration(
  ctx: CheckContext,
  s: NominalStresses,
  Sut: number,
  cls: MaterialClass | string,
  range: Range,
): number | null {
  const k = s.shell?.kind === 'sphere' ? 1 : 0.5;
  const ktStated = ctx.has('Kt');
  let w: number | undefined;
  let h: number | undefined;
  if (ktStated) {
    const wi = ctx.input('w_c');
    const hi = ctx.input('h_c');
    if (wi !== undefined && hi !== undefined && wi > 0 && hi > 0) {
      w = wi;
      h = hi;
    }
  } else {
    w = positive(ctx, 'w_c', 'a shell cutout');
    h = positive(ctx, 'h_c', 'a shell cutout');
    if (w === undefined || h === undefined) return null;
  }

  // Shell parameter: is the opening small against sqrt(R t)?
  const D_i = ctx.input('D_i');
  const t = ctx.input('t');
  if (w !== undefined && h !== undefined && D_i !== undefined && t !== undefined && D_i > 0 && t > 0) {
    const c = shellParameter(Math.max(w, h) / 2, D_i, t);
    const beyond = c.value > SHELL_PARAMETER_LIMIT;
    const notes =
      ktStated && beyond
        ? [
            ...(c.notes ?? []).filter((n) => n.code !== 'large-shell-opening'),
            {
              code: 'large-shell-opening',
              severity: 'information' as const,
              message: `beta = ${c.value.toFixed(2)} > ${SHELL_PARAMETER_LIMIT}: beyond the flat-plate range; the stated Kt is used in place of the flat-plate value.`,
            },
          ]
        : c.notes;
    ctx.result('beta_shell', { ...c, ...(notes ? { notes } : {}) }, ['w_c', 'h_c', 'D_i', 't'], {
      range,
    });
  }

  const model = sensitivityModel(ctx);
  const rStated = ctx.input('r');
  const qStated = ctx.input('q');
  const qAt = (rho: number) => familyNotchSensitivity(model, cls, rStated ?? rho, Sut, 'normal');
  const qOfRho = (rho: number) => qStated ?? qAt(rho).value;
  const gov = w !== undefined && h !== undefined ? governingCutoutPoint(w, h, k, qOfRho) : undefined;

  // Kt at the governing point (a stated Kt replaces it; the tool's value stays beside it).
  let Kt: number | null;
  if (gov && w !== undefined && h !== undefined) {
    Kt = ctx.result('Kt', shellCutoutKt(w, h, k, gov.point.eta), ['w_c', 'h_c'], {
      range,
      tool: { basis: 'elastic solution' },
    });
  } else Kt = ctx.input('Kt') ?? null;
  if (Kt === null) return null;
  if (Kt < 1)
    ctx.diag(
      'warning',
      'absurd-value',
      'Kt below 1 means the notch lowers the stress: check it',
      ctx.rangeOf('Kt'),
    );

  // Notch sensitivity with the radius of curvature of the governing point.
  let q: number | null;
  let point: CutoutPoint | undefined;
  if (qStated !== undefined) q = qStated;
  else if (!ktStated && gov) {
    point = gov.point;
    const rUsed = rStated ?? point.rho;
    const c = withNote(
      qAt(rUsed),
      [],
      rStated !== undefined
        ? `the stated r = ${mm(rStated)} is used at every edge point; governing point: the ${point.label}`
        : `notch radius: the radius of curvature at the governing point, the ${point.label}: rho = ${mm(point.rho)} (${point.key === 'circumferential' ? 'b^2/a' : point.key === 'axial' ? 'a^2/b' : '(a^2 sin^2 eta + b^2 cos^2 eta)^(3/2)/(a b)'}, Inglis)`,
    );
    q = ctx.result('q', c, rStated !== undefined ? ['r', 'Sut'] : ['w_c', 'h_c', 'Sut'], {
      range: rStated !== undefined ? ctx.rangeOf('r') : range,
    });
  } else {
    // Kt stated: where the stated peak lies is not known; the larger end radius gives the
    // larger q (conservative), unless r is stated.
    const rho = rStated ?? (gov ? Math.max(gov.ends[0].rho, gov.ends[1].rho) : undefined);
    if (rho === undefined) {
      ctx.diag(
        'warning',
        'defaulted-notch-sensitivity',
        'no notch radius `r`: full notch sensitivity (q = 1, Kf = Kt) assumed',
        ctx.rangeOf('Kt'),
      );
      q = ctx.result('q', computed(1, 'q = 1', 'conservative default without a notch radius'), [], {
        origin: 'default',
        assumption: 'no notch radius: q = 1',
      });
    } else {
      const c = withNote(
        qAt(rho),
        [],
        rStated !== undefined
          ? `Kt is stated: the stated r = ${mm(rStated)} is used`
          : `Kt is stated: q at the larger end radius max(b^2/a, a^2/b) = ${mm(rho)} (conservative: the tool does not know where the stated peak lies; state \`r\` or \`q\` for it)`,
      );
      q = ctx.result('q', c, rStated !== undefined ? ['r', 'Sut'] : ['w_c', 'h_c', 'Sut'], {
        range: rStated !== undefined ? ctx.rangeOf('r') : range,
      });
    }
  }
  if (q === null) return null;

  // Kf, with each end's own Kt, radius, q and Kf in the derivation.
  let kf = fatigueNotchFactor(Kt, q, 'Kf');
  if (gov && !ktStated) {
    const terms: Term[] = [];
    const pts = gov.point.key === 'between' ? [...gov.ends, gov.point] : gov.ends;
    for (const p of pts) {
      const qp = qOfRho(p.rho);
      const at = POINT_WORDS[p.key];
      terms.push(
        { name: `Kt, ${at}`, value: p.Kt, unit: '' },
        { name: `rho, ${at}`, value: p.rho / MM, unit: 'mm' },
        { name: `q, ${at}`, value: qp, unit: '' },
        { name: `Kf, ${at}`, value: 1 + qp * (Math.max(p.Kt, 1) - 1), unit: '' },
      );
    }
    kf = withNote(
      kf,
      terms,
      `governing point: the ${gov.point.label} (largest Kf of the edge)` +
        (gov.point.key === 'between'
          ? '; a point between the ends governs because the sharp end with the high Kt has a small radius and a low q'
          : ''),
    );
  }
  return ctx.result('Kf', kf, ['Kt', 'q'], { range: ctx.values.q?.range ?? range });
}

export function concentration(
  ctx: CheckContext,
  s: NominalStresses,
  Sut: number,
  Sy: number | undefined,
  cls: MaterialClass | string,
): Concentration | null {
  const out: Concentration = { Kf: 1, Kfs: 1, Kf_ax: 1, Kfm: 1, Kfsm: 1, Kf_axm: 1 };
  const feature = ctx.option('feature');
  const featureStated = ctx.options.has('feature');
  const meanMode = (ctx.option('mean-concentration') ?? 'full') as 'full' | 'local-yield';
  let ok = true;

  const modes: Array<[Mode, { a: number; m: number }]> = [];
  if (s.geometry === 'shell' && s.shell) {
    // A cutout's peak stress is uniaxial (tangential) and quoted on the hoop stress: it acts
    // like an axial (membrane) stress, so its concentration is carried as the axial one.
    if (feature === 'shell-cutout') modes.push(['axial', s.shell.hoop]);
    else if (feature && feature !== 'none') {
      ctx.diag(
        'error',
        'unsupported-feature',
        `\`feature: ${feature}\` does not apply to a shell: use \`shell-cutout\` or \`none\``,
        ctx.optionRange('feature'),
      );
      return null;
    }
  } else {
    if (active(s.bending)) modes.push(['bending', s.bending]);
    if (active(s.torsion)) modes.push(['torsion', s.torsion]);
    if (active(s.axial)) modes.push(['axial', s.axial]);
  }

  if (
    !featureStated &&
    modes.length > 0 &&
    !modes.some(([m]) => ctx.has(KT_NAME[m]) || ctx.has(KF_NAME[m]))
  ) {
    ctx.diag(
      'warning',
      'no-feature',
      'no `feature:` stated: no stress concentration is applied (Kt = 1); state the notch, or `feature: none` to confirm a plain section',
      ctx.header,
      [ctx.insertFix('State `feature: none`', 'feature: none')],
    );
  }

  for (const [mode, comp] of modes) {
    const ktName = s.geometry === 'shell' ? 'Kt' : KT_NAME[mode];
    const kfName = s.geometry === 'shell' ? 'Kf' : KF_NAME[mode];
    const shear = mode === 'torsion';
    const featureRange = ctx.optionRange('feature') ?? ctx.header;
    let Kf: number | null;
    if (ctx.has(kfName)) {
      // A stated Kf ends the Kt / q chain: nothing of it is asked for, and what is stated of it shows as not used.
      Kf = ctx.input(kfName)!;
      ctx.replaced(kfName, [ktName, shear ? 'qs' : 'q', 'r', 'D', 'd_hole', 'w_c', 'h_c']);
    } else if (s.geometry === 'shell' && feature === 'shell-cutout') {
      Kf = shellCutoutConcentration(ctx, s, Sut, cls, featureRange);
    } else {
      // Kt: the fit, then a stated value overrides it (both kept).
      let Kt: number | null = null;
      let r: number | undefined;
      let fitInputs: string[] = [];
      if (feature && feature !== 'none') {
        const fit = ctx.has(ktName)
          ? ctx.replacedBy(ktName, () => fitKt(ctx, feature, mode))
          : fitKt(ctx, feature, mode);
        if (fit) {
          fitInputs = fit.inputs;
          r = fit.r;
          const rangeName = ctx.has('r') ? 'r' : fit.inputs[fit.inputs.length - 1];
          Kt = ctx.result(ktName, fit.c, fit.inputs, {
            range: ctx.rangeOf(rangeName),
            tool: { basis: 'fit' },
          });
          const stated = ctx.values[ktName];
          if (stated?.origin === 'stated' && stated.tool?.si) {
            const rel = Math.abs(stated.si! - stated.tool.si) / stated.tool.si;
            if (rel > 0.15)
              ctx.diag(
                'hint',
                'kt-far-from-fit',
                `stated ${ktName} = ${stated.display} differs by ${Math.round(rel * 100)} % from the built-in fit (${stated.tool.display}); check the chart and its nominal-stress basis`,
                ctx.rangeOf(ktName),
              );
          }
        } else if (ctx.has(ktName)) Kt = ctx.input(ktName)!;
      } else {
        Kt = ctx.result(
          ktName,
          computed(
            1,
            `${ktName} = 1`,
            feature === 'none'
              ? 'plain section (feature: none)'
              : 'no feature stated: no concentration applied',
          ),
          [],
          feature === 'none'
            ? { range: featureRange, tool: { basis: 'fit', why: 'plain section (feature: none)' } }
            : {
                range: featureRange,
                origin: 'default',
                assumption: 'no `feature:` stated: Kt = 1',
                tool: { basis: 'fit', why: 'no notch feature stated' },
              },
        );
      }
      if (Kt === null) {
        ok = false;
        continue;
      }
      if (Kt < 1)
        ctx.diag(
          'warning',
          'absurd-value',
          `${ktName} below 1 means the notch lowers the stress: check it`,
          ctx.rangeOf(ktName),
        );
      let q: number | null = 1;
      if (Kt === 1 && !ctx.has(shear ? 'qs' : 'q')) q = 1;
      else {
        if (r === undefined) r = ctx.input('r');
        if (r === undefined && !ctx.has(shear ? 'qs' : 'q')) {
          ctx.diag(
            'warning',
            'defaulted-notch-sensitivity',
            `no notch radius \`r\`: full notch sensitivity (${shear ? 'qs' : 'q'} = 1, Kf = Kt) assumed`,
            ctx.rangeOf(ktName),
          );
          q = ctx.result(
            shear ? 'qs' : 'q',
            computed(1, `${shear ? 'qs' : 'q'} = 1`, 'conservative default without a notch radius'),
            [],
            {
              origin: 'default',
              assumption: 'no notch radius: q = 1',
            },
          );
        } else {
          q = notchSensitivity(ctx, shear, r ?? 0, Sut, cls, ctx.has('r') ? 'r' : ktName);
        }
      }
      if (q === null) {
        ok = false;
        continue;
      }
      Kf = ctx.result(
        kfName,
        fatigueNotchFactor(Kt, q, kfName as 'Kf' | 'Kfs' | 'Kf_ax'),
        [ktName, shear ? 'qs' : 'q', ...fitInputs.slice(0, 0)],
        {
          range: ctx.values[shear ? 'qs' : 'q']?.range ?? ctx.rangeOf(ktName),
        },
      );
    }
    if (Kf === null) {
      ok = false;
      continue;
    }
    let Kfm = Kf;
    if (meanMode === 'local-yield') {
      if (Sy === undefined) {
        ctx.diag(
          'warning',
          'missing-yield',
          '`mean-concentration: local-yield` needs Sy: Kf is applied to the mean stress',
          ctx.optionRange('mean-concentration'),
        );
      } else {
        const mName = s.geometry === 'shell' ? 'Kfm' : KFM_NAME[mode];
        const c = meanStressNotchFactor({ Kf, sigma_a: comp.a, sigma_m: comp.m, Sy, mode: 'local-yield' });
        Kfm = ctx.result(mName, c, [kfName, 'Sy'], { range: ctx.optionRange('mean-concentration') }) ?? Kf;
      }
    }
    if (mode === 'bending') {
      out.Kf = Kf;
      out.Kfm = Kfm;
    } else if (mode === 'torsion') {
      out.Kfs = Kf;
      out.Kfsm = Kfm;
    } else {
      out.Kf_ax = Kf;
      out.Kf_axm = Kfm;
    }
  }
  return ok ? out : null;
}
