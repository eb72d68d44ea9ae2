import type { CheckContext } from '../context/checkContext';
import type { RequireStatement } from '../context/statements';
import type { RequirementResult } from '../context/types';
import { methodModule } from '../methods/registry';
import type { MethodExtras } from '../methods/types';

/** Runs the check's method, found in the registry; an unknown method is an error at `method:`. */
export function runCheckMethod(method: string, ctx: CheckContext): MethodExtras {
  const m = methodModule(method);
  if (m) return m.run(ctx);
  ctx.diag(
    'error',
    'method-unavailable',
    `\`method: ${method}\` is not available in this version`,
    ctx.optionRange('method'),
  );
  return {};
}

/**
 * What a check must say once its method and requirements are done: the stated inputs that
 * a stated value replaced (shown as not used), then the method's own review.
 */
export function reviewCheck(
  ctx: CheckContext,
  method: string,
  requirements: RequirementResult[],
  requireStatements: RequireStatement[],
): void {
  ctx.markReplacedInputs();
  methodModule(method)?.review?.(ctx, requirements, requireStatements);
}

/** Copies the per-method records a pipeline returned onto the check, in the method's order. */
export function copyMethodFields(method: string, extras: MethodExtras, into: Record<string, unknown>): void {
  for (const f of methodModule(method)?.fields ?? []) if (extras[f] !== undefined) into[f] = extras[f];
  if (extras.criterion) into.criterion = extras.criterion;
}
