/**
 * Expressions of the block language: `630 MPa`, `0.04 * d`, `other_id.Se`, `sqrt(3) * 2 ksi`.
 *
 * mathjs parses the text; this module then accepts only a small whitelist of node kinds
 * (numbers, names, units, + - * / ^, unary minus, parentheses, `to`, a few pure functions,
 * and `check.name` member access) and runs them with its own interpreter. Nothing here can
 * import, define functions or units, evaluate strings, build matrices or loop, so every
 * expression runs in time proportional to its (bounded) size.
 *
 * A symbol right after a number (`250 N`) or chained to one (`250 N*m`, `50 MPa*m^0.5`) is a
 * unit even when a name of the note has the same spelling (`N` the required life, `t` the
 * thickness); anywhere else a name of the note wins over a unit (`0.04 * d`).
 */
import type { MathNode } from 'mathjs';
import { ExpressionError, type Quantity, type Scope } from '../context/quantity';
import { type DimVector, isDimensionless } from '../units/dimensions';
import { isUnit, math, type Unit, unitNamed } from '../units/mathInstance';

export const MAX_EXPRESSION_LENGTH = 400;
export const MAX_NODES = 200;

export { ExpressionError, type Quantity, type Scope } from '../context/quantity';

type Runner = (scope: Scope) => unknown;

export interface CompiledExpression {
  run: Runner;
  /** Names of the block read by the expression (for dependency tracking). */
  names: string[];
  /** `check.member` references. */
  members: Array<{ check: string; member: string }>;
  /** The unit text when the expression is exactly `number unit...`. */
  statedUnit?: string;
  /**
   * The outcome of an expression that reads nothing of its scope (`630 MPa`, `2 * 3 ksi`),
   * computed once when it is compiled: its quantity, or the error it raises.
   */
  constant?: { q: Quantity } | { error: ExpressionError };
}

const FUNCTIONS: Record<string, (...args: unknown[]) => unknown> = {
  sqrt: (x) => math.sqrt(x as number),
  cbrt: (x) => math.cbrt(x as number),
  abs: (x) => math.abs(x as number),
  exp: (x) => math.exp(x as number),
  log: (x) => math.log(x as number),
  ln: (x) => math.log(x as number),
  log10: (x) => math.log10(x as number),
  sin: (x) => math.sin(x as number),
  cos: (x) => math.cos(x as number),
  tan: (x) => math.tan(x as number),
  asin: (x) => math.asin(x as number),
  acos: (x) => math.acos(x as number),
  atan: (x) => math.atan(x as number),
  atan2: (y, x) => math.atan2(y as number, x as number),
  min: (...xs) => math.min(...(xs as number[])),
  max: (...xs) => math.max(...(xs as number[])),
  pow: (x, y) => math.pow(x as number, y as number),
  hypot: (...xs) => math.hypot(...(xs as number[])),
};

const CONSTANTS: Record<string, number> = { pi: Math.PI, e: Math.E };

const BINARY: Record<string, (a: unknown, b: unknown) => unknown> = {
  add: (a, b) => math.add(a as number, b as number),
  subtract: (a, b) => math.subtract(a as number, b as number),
  multiply: (a, b) => math.multiply(a as number, b as number),
  divide: (a, b) => math.divide(a as number, b as number),
  pow: (a, b) => {
    if (typeof b !== 'number') throw new ExpressionError('bad-power', 'an exponent must be a plain number');
    return math.pow(a as number, b);
  },
};

const cache = new Map<string, CompiledExpression>();

/** Parse and check an expression once; later calls with the same text reuse the result. */
export function compileExpression(text: string): CompiledExpression {
  const hit = cache.get(text);
  if (hit) return hit;
  const compiled = compileFresh(text);
  foldConstant(compiled);
  if (cache.size > 20_000) cache.clear();
  cache.set(text, compiled);
  return compiled;
}

function compileFresh(text: string): CompiledExpression {
  if (text.trim() === '')
    throw new ExpressionError('missing-value', 'nothing after `=`: write a value, e.g. `35 mm`');
  if (text.length > MAX_EXPRESSION_LENGTH)
    throw new ExpressionError(
      'expression-too-long',
      `expression longer than ${MAX_EXPRESSION_LENGTH} characters: split it into named steps`,
    );
  let node: MathNode;
  try {
    node = math.parse(text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const m = /char (\d+)/.exec(msg);
    const offset = m ? Math.max(0, Number(m[1]) - 1) : undefined;
    throw new ExpressionError('expression-syntax', `cannot read the expression: ${msg}`, offset, 1);
  }
  let count = 0;
  node.traverse(() => {
    count++;
  });
  if (count > MAX_NODES)
    throw new ExpressionError(
      'expression-too-long',
      `expression too complex (${count} parts): split it into named steps`,
    );
  const names = new Set<string>();
  const members: Array<{ check: string; member: string }> = [];
  const run = build(node, false, text, names, members);
  const statedUnit = statedUnitOf(node);
  return { run, names: [...names], members, ...(statedUnit ? { statedUnit } : {}) };
}

function isOp(
  n: MathNode,
  fn?: string,
): n is MathNode & { fn: string; args: MathNode[]; implicit?: boolean } {
  return n.type === 'OperatorNode' && (fn === undefined || (n as unknown as { fn: string }).fn === fn);
}

/** True when the node is a number times a unit chain: `250 N`, `250 N*m`, `50 MPa*m^0.5`. */
function isUnitChain(n: MathNode): boolean {
  if (!isOp(n)) return false;
  const op = n as unknown as { fn: string; args: MathNode[]; implicit?: boolean };
  if (op.fn === 'multiply' && op.implicit) return true;
  if ((op.fn === 'multiply' || op.fn === 'divide') && op.args.length === 2) return isUnitChain(op.args[0]);
  return false;
}

function offsetOfName(text: string, name: string): number | undefined {
  const re = new RegExp(`(^|[^A-Za-z0-9_.])${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(?![A-Za-z0-9_])`);
  const m = re.exec(text);
  return m ? m.index + m[1].length : undefined;
}

function build(
  node: MathNode,
  unitPosition: boolean,
  text: string,
  names: Set<string>,
  members: Array<{ check: string; member: string }>,
): Runner {
  switch (node.type) {
    case 'ConstantNode': {
      const v = (node as unknown as { value: unknown }).value;
      if (typeof v !== 'number')
        throw new ExpressionError('not-a-quantity', 'only numbers and units are allowed in an expression');
      return () => v;
    }
    case 'ParenthesisNode':
      return build((node as unknown as { content: MathNode }).content, false, text, names, members);
    case 'SymbolNode': {
      const name = (node as unknown as { name: string }).name;
      const unit = unitNamed(name);
      if (unitPosition && unit) return () => unit;
      if (Object.hasOwn(CONSTANTS, name) && !unit) {
        const c = CONSTANTS[name];
        return (scope) => scope.get(name) ?? c;
      }
      names.add(name);
      const off = offsetOfName(text, name);
      return (scope) => {
        const v = scope.get(name);
        if (v !== undefined) return v;
        if (unit) return unit;
        throw new ExpressionError(
          'unknown-name',
          `\`${name}\` is not defined above in this check (names are read top to bottom)`,
          off,
          name.length,
        );
      };
    }
    case 'AccessorNode': {
      const acc = node as unknown as {
        object: MathNode;
        index: { dimensions: MathNode[]; dotNotation?: boolean };
      };
      const dims = acc.index.dimensions;
      if (
        acc.object.type !== 'SymbolNode' ||
        !acc.index.dotNotation ||
        dims.length !== 1 ||
        dims[0].type !== 'ConstantNode'
      )
        throw new ExpressionError('not-a-quantity', 'only `check_id.name` references are allowed');
      const check = (acc.object as unknown as { name: string }).name;
      const member = String((dims[0] as unknown as { value: unknown }).value);
      members.push({ check, member });
      const off = offsetOfName(text, `${check}.${member}`);
      const len = check.length + 1 + member.length;
      return (scope) => {
        if (!scope.hasCheck(check))
          throw new ExpressionError(
            'unknown-reference',
            `no check \`${check}\` above this one in the note (checks are read top to bottom)`,
            off,
            len,
          );
        const v = scope.member(check, member);
        if (v === undefined)
          throw new ExpressionError(
            'unknown-reference',
            `check \`${check}\` has no input or result \`${member}\``,
            off,
            len,
          );
        return v;
      };
    }
    case 'FunctionNode': {
      const fnNode = node as unknown as { fn: MathNode; args: MathNode[] };
      const fname = fnNode.fn.type === 'SymbolNode' ? (fnNode.fn as unknown as { name: string }).name : '';
      const impl = Object.hasOwn(FUNCTIONS, fname) ? FUNCTIONS[fname] : undefined;
      if (!impl)
        throw new ExpressionError(
          'function-not-allowed',
          `function \`${fname || '?'}\` is not available in a note (allowed: ${Object.keys(FUNCTIONS).join(', ')})`,
          offsetOfName(text, fname),
          fname.length || 1,
        );
      const args = fnNode.args.map((a) => build(a, false, text, names, members));
      return (scope) => impl(...args.map((a) => a(scope)));
    }
    case 'OperatorNode': {
      const op = node as unknown as { fn: string; args: MathNode[]; implicit?: boolean; op: string };
      if (op.args.length === 1) {
        const a = build(op.args[0], false, text, names, members);
        if (op.fn === 'unaryMinus') return (s) => math.unaryMinus(a(s) as number);
        if (op.fn === 'unaryPlus') return (s) => a(s);
        throw new ExpressionError('operator-not-allowed', `operator \`${op.op}\` is not allowed here`);
      }
      if (op.fn === 'to') {
        const a = build(op.args[0], false, text, names, members);
        const b = build(op.args[1], true, text, names, members);
        return (s) => math.to(a(s) as Unit, b(s) as Unit);
      }
      const impl = Object.hasOwn(BINARY, op.fn) ? BINARY[op.fn] : undefined;
      if (!impl || op.args.length !== 2)
        throw new ExpressionError('operator-not-allowed', `operator \`${op.op}\` is not allowed in a note`);
      const leftIsChain = isUnitChain(op.args[0]);
      const rightUnitPos =
        (op.fn === 'multiply' && op.implicit) ||
        ((op.fn === 'multiply' || op.fn === 'divide') && leftIsChain) ||
        (op.fn === 'pow' && unitPosition);
      const a = build(op.args[0], op.fn === 'pow' && unitPosition, text, names, members);
      const b = build(op.args[1], rightUnitPos && op.fn !== 'pow', text, names, members);
      return (s) => impl(a(s), b(s));
    }
    default:
      throw new ExpressionError(
        'not-a-quantity',
        `${node.type.replace('Node', '').toLowerCase()} syntax is not allowed in a note: write a number with a unit`,
      );
  }
}

function statedUnitOf(node: MathNode): string | undefined {
  if (!isUnitChain(node)) return undefined;
  const op = node as unknown as { fn: string; args: MathNode[]; implicit?: boolean };
  if (op.fn === 'multiply' && op.implicit) {
    const left = op.args[0];
    const isNum =
      left.type === 'ConstantNode' ||
      (isOp(left, 'unaryMinus') && (left as unknown as { args: MathNode[] }).args[0].type === 'ConstantNode');
    if (!isNum) return undefined;
    return op.args[1].toString();
  }
  const inner = statedUnitOf(op.args[0]);
  if (!inner) return undefined;
  return `${inner}${op.fn === 'multiply' ? '*' : '/'}${op.args[1].toString().replace(/ /g, '')}`;
}

const TEMP: DimVector = [0, 0, 0, 0, 1, 0, 0, 0, 0];

/** Turn what the interpreter returned into a finite SI quantity, or throw an ExpressionError. */
export function toQuantity(v: unknown): Quantity {
  if (typeof v === 'number') {
    if (!Number.isFinite(v))
      throw new ExpressionError('non-finite', 'the expression overflows (the result is not a finite number)');
    return { si: v, dim: [0, 0, 0, 0, 0, 0, 0, 0, 0], raw: v };
  }
  if (isUnit(v)) {
    const u = v as Unit & { value: unknown; dimensions: number[] };
    if (u.value === null || u.value === undefined)
      throw new ExpressionError('missing-number', 'a unit without a number: write e.g. `35 mm`');
    if (typeof u.value !== 'number')
      throw new ExpressionError('complex-result', 'the expression gives a complex or non-numeric value');
    const dims = u.dimensions.slice();
    let si = u.value;
    if (dims.every((x, i) => x === TEMP[i])) si = (u.toSI() as unknown as { value: number }).value;
    if (!Number.isFinite(si))
      throw new ExpressionError('non-finite', 'the expression overflows (the result is not a finite number)');
    return { si, dim: dims, raw: u };
  }
  if (math.isComplex(v)) throw new ExpressionError('complex-result', 'the expression gives a complex number');
  throw new ExpressionError('not-a-quantity', 'the expression does not give a number or a quantity');
}

/** Compile (cached) and run an expression. */
export function evaluateExpression(text: string, scope: Scope): Quantity {
  const c = compileExpression(text);
  const k = c.constant;
  if (k) {
    if ('error' in k) throw k.error;
    // A copy: callers may set fields of their quantity; the mathjs value is never mutated.
    return { ...k.q };
  }
  return runCompiled(c, scope);
}

function runCompiled(c: CompiledExpression, scope: Scope): Quantity {
  let v: unknown;
  try {
    v = c.run(scope);
  } catch (e) {
    if (e instanceof ExpressionError) throw e;
    const msg = e instanceof Error ? e.message : String(e);
    if (/unit with undefined value|valueless/i.test(msg))
      throw new ExpressionError(
        'missing-number',
        'a unit without a number: write e.g. `35 mm`, and `2 * 35 mm` rather than `mm * 2`',
      );
    if (/Units do not match|dimension/i.test(msg))
      throw new ExpressionError('wrong-dimension', `units do not add up: ${msg}`);
    throw new ExpressionError('expression-error', `cannot evaluate: ${msg}`);
  }
  const q = toQuantity(v);
  if (c.statedUnit) q.statedUnit = c.statedUnit;
  return q;
}

/**
 * Run the expression once against a scope that records any use: when it never asks for a
 * name, a reference or a check, its outcome is the same in every note and is kept.
 */
function foldConstant(c: CompiledExpression): void {
  let touched = false;
  const probe: Scope = {
    get: () => {
      touched = true;
      return undefined;
    },
    member: () => {
      touched = true;
      return undefined;
    },
    hasCheck: () => {
      touched = true;
      return false;
    },
  };
  try {
    const q = runCompiled(c, probe);
    if (!touched) c.constant = { q };
  } catch (e) {
    if (!touched && e instanceof ExpressionError) c.constant = { error: e };
  }
}

/** A mathjs value for an SI number of a given dimension (to put a computed result back into a scope). */
export function rawFromSI(si: number, dim: DimVector): Unit | number {
  if (isDimensionless(dim)) return si;
  const names = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'bits'];
  const parts: string[] = [];
  dim.forEach((e, i) => {
    if (Math.abs(e) > 1e-12) parts.push(e === 1 ? names[i] : `${names[i]}^${e}`);
  });
  return math.unit(si, parts.join(' '));
}
