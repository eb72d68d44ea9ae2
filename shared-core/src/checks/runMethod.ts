import type { CheckContext } from '../language/checkContext';
import type { CheckResult, Method } from '../language/types';
import { runCrackGrowth } from './crackGrowth';
import { runDamage } from './damage';
import { runStressLife } from './stressLife';

export type MethodExtras = Partial<
  Pick<CheckResult, 'haigh' | 'sn' | 'tables' | 'crackCurve' | 'histogram' | 'criterion'>
>;

export function runCheckMethod(method: Method, ctx: CheckContext): MethodExtras {
  switch (method) {
    case 'stress-life':
      return runStressLife(ctx);
    case 'damage':
      return runDamage(ctx);
    case 'crack-growth':
      return runCrackGrowth(ctx);
    default:
      ctx.diag(
        'error',
        'method-unavailable',
        `\`method: ${method}\` is not available in this version`,
        ctx.optionRange('method'),
      );
      return {};
  }
}
