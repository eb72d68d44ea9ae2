/**
 * Stress concentration at the checked section: Kt from the feature's fit (or stated),
 * notch sensitivity q (Neuber or Peterson), Kf = 1 + q (Kt - 1), and the concentration on
 * the mean stress (Kf, or reduced by local yielding when asked).
 */
import { computed } from '../computed';
import type { CheckContext } from '../language/checkContext';
import type { MaterialClass } from '../materials';
import {
  crossHoleKt,
  fatigueNotchFactor,
  grooveKt,
  meanStressNotchFactor,
  neuberSensitivity,
  petersonSensitivity,
  plateHoleKt,
  shellCutoutKt,
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

function notchSensitivity(
  ctx: CheckContext,
  shear: boolean,
  r: number,
  Sut: number,
  cls: MaterialClass,
  rangeName: string,
): number | null {
  const name = shear ? 'qs' : 'q';
  if (ctx.has(name)) return ctx.input(name)!;
  const model = ctx.option('notch-sensitivity') ?? 'neuber';
  const load = shear ? 'shear' : 'normal';
  // Peterson knows fewer classes than the families: the others get its conservative answer (q = 1) and an error.
  const c =
    model === 'peterson'
      ? petersonSensitivity(r, Sut, cls as Parameters<typeof petersonSensitivity>[2], load)
      : neuberSensitivity(r, Sut, load);
  return ctx.result(name, c, ['r', 'Sut'], { range: ctx.rangeOf(rangeName) });
}

export function concentration(
  ctx: CheckContext,
  s: NominalStresses,
  Sut: number,
  Sy: number | undefined,
  cls: MaterialClass,
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
    } else {
      // Kt: the fit, then a stated value overrides it (both kept).
      let Kt: number | null = null;
      let r: number | undefined;
      let fitInputs: string[] = [];
      if (s.geometry === 'shell' && feature === 'shell-cutout') {
        // A stated Kt ends the fit: its dimensions are not asked for.
        const dims = () => [positive(ctx, 'w_c', 'a shell cutout'), positive(ctx, 'h_c', 'a shell cutout')];
        const [w, h] = ctx.has(ktName) ? ctx.replacedBy(ktName, dims) : dims();
        if (w !== undefined && h !== undefined) {
          const c = shellCutoutKt(w, h, s.shell?.kind === 'sphere' ? 1 : 0.5);
          Kt = ctx.result(ktName, c, ['w_c', 'h_c'], { range: featureRange });
          const rho = c.terms?.find((t) => t.name === 'rho');
          r = ctx.input('r') ?? (rho ? rho.value * (rho.unit === 'mm' ? 1e-3 : 1) : Math.min(w, h) / 2);
        } else if (ctx.has(ktName)) Kt = ctx.input(ktName)!;
      } else if (feature && feature !== 'none') {
        const fit = ctx.has(ktName)
          ? ctx.replacedBy(ktName, () => fitKt(ctx, feature, mode))
          : fitKt(ctx, feature, mode);
        if (fit) {
          fitInputs = fit.inputs;
          r = fit.r;
          const rangeName = ctx.has('r') ? 'r' : fit.inputs[fit.inputs.length - 1];
          Kt = ctx.result(ktName, fit.c, fit.inputs, { range: ctx.rangeOf(rangeName) });
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
            ? { range: featureRange }
            : { range: featureRange, origin: 'default', assumption: 'no `feature:` stated: Kt = 1' },
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
