/**
 * `require: n_f >= 1.5, n_y >= 1.2, N_f >= 1e6` — each item compares a value of the check
 * with a target expression of the same dimension. An infinite life meets any `>=`.
 */

import type { CheckContext } from '../context/checkContext';
import type { RequirementResult } from '../context/types';
import { INPUT_NAMES, nearest, RESULT_NAMES } from '../context/vocabulary';
import { renamedResult } from '../methods/registry';
import { classify, sameVector, vectorOf } from '../units/dimensions';
import { ExpressionError, evaluateExpression, type Scope } from './expressions';
import type { RequireStatement } from './statements';

export function evaluateRequirements(
  ctx: CheckContext,
  statements: RequireStatement[],
  scope: Scope,
  withheld = false,
  method?: string,
): RequirementResult[] {
  const out: RequirementResult[] = [];
  for (const s of statements) {
    for (const item of s.items) {
      const symbol = item.symbol.text;
      const res: RequirementResult = {
        text: item.whole.text,
        symbol,
        op: item.op,
        target: null,
        targetDisplay: item.expr.text,
        actualDisplay: 'not computed',
        met: null,
        range: item.whole.range,
      };
      out.push(res);
      if (withheld) continue;
      let v = ctx.values[symbol];
      const renamed = !v && method ? renamedResult(method, symbol) : undefined;
      if (renamed) {
        ctx.diag(
          'hint',
          'renamed-result',
          `\`${symbol}\` is now called \`${renamed}\` in a \`method: ${method}\` check; the old name still works`,
          item.symbol.range,
          [
            {
              title: `Change to \`${renamed}\``,
              edits: [{ range: item.symbol.range, newText: renamed }],
              preferred: true,
            },
          ],
        );
        v = ctx.values[renamed];
        if (!v) {
          ctx.diag(
            'error',
            'requirement-not-evaluated',
            `\`${renamed}\` was not computed for this check (see its other diagnostics), so the requirement cannot be judged`,
            item.symbol.range,
          );
          continue;
        }
      }
      if (!v && (symbol in RESULT_NAMES || symbol in INPUT_NAMES)) {
        ctx.diag(
          'error',
          'requirement-not-evaluated',
          `\`${symbol}\` was not computed for this check (see its other diagnostics), so the requirement cannot be judged`,
          item.symbol.range,
        );
        continue;
      }
      if (!v) {
        const near = nearest(symbol, Object.keys(ctx.values), 2);
        ctx.diag(
          'error',
          'unknown-requirement-symbol',
          `\`${symbol}\` is not a value of this check${near ? `: did you mean \`${near}\`?` : ''}`,
          item.symbol.range,
          near
            ? [{ title: `Change to \`${near}\``, edits: [{ range: item.symbol.range, newText: near }] }]
            : [],
        );
        continue;
      }
      let target: number;
      try {
        const q = evaluateExpression(item.expr.text, scope);
        const want = vectorOf(v.dim);
        if (want && !sameVector(q.dim, want)) {
          ctx.diag(
            'error',
            'wrong-dimension',
            `\`${symbol}\` is ${ctx.dimLabel(v.dim)}; \`${item.expr.text}\` is ${ctx.dimLabel(classify(q.dim))}`,
            item.expr.range,
          );
          continue;
        }
        target = q.si;
      } catch (e) {
        const msg = e instanceof ExpressionError ? e.message : String(e);
        ctx.diag('error', e instanceof ExpressionError ? e.code : 'expression-error', msg, item.expr.range);
        continue;
      }
      res.target = target;
      res.targetDisplay = ctx.display(target, v.dim);
      res.actualDisplay = v.display;
      if (v.infinite) res.met = item.op === '>=' || item.op === '>';
      else if (v.si === null) res.met = null;
      else {
        const a = v.si;
        res.met =
          item.op === '>='
            ? a >= target
            : item.op === '<='
              ? a <= target
              : item.op === '>'
                ? a > target
                : a < target;
      }
      if (res.met === false)
        ctx.diag(
          'error',
          'requirement-not-met',
          `requirement not met: ${symbol} = ${v.display}, required ${item.op} ${res.targetDisplay}`,
          item.whole.range,
        );
    }
  }
  return out;
}
