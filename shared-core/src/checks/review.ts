/**
 * Reviews a check once its method and requirements are done, shared by the methods that
 * describe a section with a material: the assumed material family where it changed a result,
 * and a pass that hides a finite life.
 */
import type { CheckContext } from '../context/checkContext';
import type { RequireStatement } from '../context/statements';
import type { RequirementResult } from '../context/types';

/** Without `material:` or `material-family:` a steel is assumed: a warning where that decided a result. */
export function assumedFamily(ctx: CheckContext): void {
  if (ctx.options.has('material') || ctx.options.has('material-family')) return;
  const v = ctx.values;
  const acts = (n: string) => v[n] !== undefined && v[n].origin === 'computed' && !v[n].unused;
  const decided: string[] = [];
  const fatigue = ['n_f', 'N_f', 'S_f', 'D_sum'].some((n) => v[n] !== undefined);
  if (fatigue && !ctx.has('Se'))
    decided.push(
      acts('Se_prime')
        ? 'that an endurance limit exists (no failure below Se) and its estimate Se_prime = 0.5 Sut'
        : 'that an endurance limit exists (no failure below Se)',
    );
  if (acts('q') || acts('qs')) decided.push('the notch-sensitivity data (q)');
  if (acts('gamma_walker')) decided.push('the Walker exponent');
  if (decided.length === 0) return;
  const family = (word: string, preferred: boolean) => ({
    ...ctx.insertFix(`State \`material-family: ${word}\``, `material-family: ${word}`),
    preferred,
  });
  ctx.diag(
    'warning',
    'assumed-steel',
    `no \`material-family:\` (or \`material:\`): a steel is assumed, and that decides ${decided.join('; ')}; an aluminium, titanium or copper alloy has no endurance limit: state what the material is`,
    ctx.has('Sut') ? ctx.rangeOf('Sut') : ctx.header,
    [family('steel', true), family('aluminium-wrought', false), family('cast-iron', false)],
  );
}

/**
 * Every requirement holds, yet the check's own n_f is below 1: the operating point lies above
 * the strength the criterion uses, so the life is finite; when no requirement is on `N_f`,
 * `pass` would read as an infinite (or sufficient) life. Warns and offers the requirement.
 */
export function hiddenFiniteLife(
  ctx: CheckContext,
  requirements: RequirementResult[],
  requireStatements: RequireStatement[],
): void {
  if (requirements.length === 0 || requirements.some((r) => r.met !== true)) return;
  if (ctx.diagnostics.some((d) => d.severity === 'error')) return;
  if (requirements.some((r) => r.symbol === 'N_f')) return;
  const nf = ctx.values.n_f;
  if (!nf || nf.si === null || !(nf.si < 1)) return;
  const life = ctx.values.N_f;
  if (life?.infinite) return;
  const last = requireStatements[requireStatements.length - 1];
  const item = last?.items[last.items.length - 1];
  if (!last || !item) return;
  const N = ctx.values.N;
  const want = N ? 'N_f >= N' : 'N_f >= 1e6';
  const lifeText = life ? ` (N_f = ${life.display} cycles)` : '';
  const message = N
    ? `every requirement holds, but n_f = ${nf.display} is below 1: the predicted life${lifeText} is shorter than the required N = ${N.display}, and no requirement judges it; require \`${want}\``
    : `every requirement holds, but n_f = ${nf.display} is below 1: the part has a finite life${lifeText} and no requirement judges it, so \`pass\` does not mean infinite life; require the life the part needs, e.g. \`${want}\``;
  const end = item.whole.range.end;
  ctx.diag('warning', 'hidden-finite-life', message, last.whole, [
    {
      title: `Add \`${want}\` to the requirements (set the life the part needs)`,
      edits: [{ range: { start: end, end }, newText: `, ${want}` }],
      preferred: true,
    },
  ]);
}
