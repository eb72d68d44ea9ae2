/**
 * Evaluates one fatigue block: reads the statements, checks names, units and options, runs
 * the check's method, then its requirements. Never throws: whatever goes wrong inside the
 * check becomes a diagnostic of that check. The note's loop is `note/noteLoop.ts`.
 */
import { copyMethodFields, reviewCheck, runCheckMethod } from '../checks/runMethod';
import { CheckContext, type StatedInput } from '../context/checkContext';
import { type CheckResult, lineRange, type Range, range } from '../context/types';
import { editDistance, INPUT_NAMES, nearest, OPTIONS, RESULT_NAMES, wordOwners } from '../context/vocabulary';
import { findMaterial, nearestMaterialKeys } from '../materials';
import { defaultMethod, renamedResult } from '../methods/registry';
import { classify, type DimKey, sameVector, vectorOf } from '../units/dimensions';
import type { UnitSystem } from '../units/format';
import type { Unit } from '../units/mathInstance';
import type { CheckScopeEntry, EvaluateOptions } from './checkScope';
import { ExpressionError, evaluateExpression, type Quantity, rawFromSI, type Scope } from './expressions';
import { type BlockSource, ID_PATTERN } from './markdownBlocks';
import { checkConsistency, valuePlausibility } from './plausibility';
import { evaluateRequirements } from './requirements';
import {
  type AssignStatement,
  isReservedWord,
  type OptionStatement,
  parseStatements,
  type Statement,
} from './statements';
import { detectUnitSystem, unitFixes } from './unitSystem';

export function evaluateBlock(
  block: BlockSource,
  previous: ReadonlyMap<string, CheckScopeEntry>,
  seenIds: Map<string, BlockSource>,
  options: EvaluateOptions,
  /** Inputs set as if stated before the first line (design mode's trial values). */
  inject?: ReadonlyMap<string, StatedInput>,
): CheckScopeEntry {
  const header = lineRange(block.openLine, block.idStart, block.idEnd);
  const id = block.id && ID_PATTERN.test(block.id) ? block.id : null;
  const statements = parseStatements(block.lines, /^\s*>/.test(block.lines[0]?.text ?? ''));
  const system: UnitSystem =
    options.unitSystem && options.unitSystem !== 'auto' ? options.unitSystem : detectUnitSystem(statements);
  const stated = new Map<string, StatedInput>();
  const optionMap = new Map<string, OptionStatement>();
  const ctx = new CheckContext(
    id,
    header,
    block.closed ? block.closeLine : block.closeLine + 1,
    stated,
    optionMap,
    system,
    options.significantDigits ?? 4,
    options.histories,
  );
  const raw = new Map<string, Unit | number>();
  const result: CheckResult = {
    id,
    method: defaultMethod(),
    range: range(block.openLine, 0, block.closeLine, 0),
    headerRange: header,
    insertLine: ctx.insertLine,
    status: 'error',
    values: ctx.values,
    order: ctx.order,
    requirements: [],
    diagnostics: ctx.diagnostics,
    unitSystem: system,
  };
  try {
    checkHeader(ctx, block, seenIds);
    const scope = blockScope(raw, previous, ctx.values);
    ctx.evaluate = (text) => evaluateExpression(text, scope);
    for (const [name, input] of inject ?? []) {
      raw.set(name, input.q.raw);
      stated.set(name, input);
      ctx.recordStated(name, input.q, input.stmt, classify(input.q.dim));
    }
    // Values that cannot be physical, read against each other, the library and the family.
    const faults = readStatements(ctx, statements, scope, raw) + checkConsistency(ctx);
    const title = optionMap.get('title')?.value.text;
    if (title) result.title = title;
    result.method = ctx.option('method') ?? defaultMethod();
    flagOtherMethodsWords(ctx, result.method, statements);
    result.criterion = ctx.option('criterion');
    // An input the author wrote but the tool could not read (wrong unit, misspelt option,
    // unreadable line) would silently change every result: none is produced until it is fixed.
    if (faults > 0)
      ctx.diag(
        'information',
        'results-withheld',
        `no results until the ${faults === 1 ? 'error' : `${faults} errors`} in this check's inputs ${faults === 1 ? 'is' : 'are'} fixed: a misread input would change them`,
      );
    const extras = faults > 0 ? {} : runCheckMethod(result.method, ctx);
    copyMethodFields(result.method, extras, result as unknown as Record<string, unknown>);
    const requireStatements = statements.filter((s) => s.kind === 'require');
    const hasErrors = ctx.diagnostics.some((d) => d.severity === 'error');
    result.requirements = evaluateRequirements(ctx, requireStatements, scope, faults > 0, result.method);
    if (faults === 0) reviewCheck(ctx, result.method, result.requirements, requireStatements);
    if (hasErrors) result.status = 'error';
    else if (result.requirements.length === 0) result.status = 'unchecked';
    else if (result.requirements.some((r) => r.met === null)) result.status = 'error';
    else result.status = result.requirements.every((r) => r.met) ? 'pass' : 'fail';
  } catch (e) {
    // A bug in a method must not take the note down: report it on the block.
    const msg = e instanceof Error ? e.message : String(e);
    ctx.diag(
      'error',
      'internal',
      `the check could not be evaluated (internal error: ${msg}); please report it`,
    );
    result.status = 'error';
  }
  return { result, raw };
}

function checkHeader(ctx: CheckContext, block: BlockSource, seenIds: Map<string, BlockSource>): void {
  if (!block.id) {
    ctx.diag(
      'warning',
      'missing-id',
      'this check has no id: write one after `fatigue` (e.g. ```fatigue drive_shaft) so that reports and other checks can name it',
    );
  } else if (isReservedWord(block.id)) {
    ctx.diag(
      'error',
      'reserved-name',
      `\`${block.id}\` cannot be a check id: every JavaScript object has that name, so it is reserved; choose another id (other checks cannot refer to this one)`,
    );
  } else if (!ID_PATTERN.test(block.id)) {
    ctx.diag(
      'error',
      'bad-id',
      `\`${block.id}\` is not a valid check id: use a letter or _ then letters, digits or _`,
    );
  } else {
    const prior = seenIds.get(block.id);
    if (prior)
      ctx.diag(
        'error',
        'duplicate-id',
        `a check named \`${block.id}\` already exists on line ${prior.openLine + 1}: ids must be unique in a note`,
      );
    else seenIds.set(block.id, block);
  }
  if (block.extraInfo)
    ctx.diag(
      'warning',
      'extra-info',
      `\`${block.extraInfo}\` after the id is ignored: put the title on a \`title:\` line`,
      lineRange(block.openLine, block.idEnd, block.openLineLength),
    );
  if (!block.closed)
    ctx.diag(
      'error',
      'unclosed-block',
      'this block has no closing fence: everything to the end of the note is read as part of it',
    );
}

/**
 * A name or option that is another method's own word (`a_c` of a crack-growth check stated
 * in a stress-life check) feeds nothing here: say so, and which method reads it.
 */
function flagOtherMethodsWords(ctx: CheckContext, method: string, statements: Statement[]): void {
  for (const s of statements) {
    const word = s.kind === 'assign' ? s.name : s.kind === 'option' ? s.key : undefined;
    if (!word) continue;
    const owners = wordOwners(word.text);
    if (!owners || owners.includes(method)) continue;
    const which = owners.map((m) => `\`method: ${m}\``).join(' or ');
    ctx.diag(
      'warning',
      'word-of-other-method',
      `\`${word.text}\` is a word of ${which} checks: this \`method: ${method}\` check does not read it`,
      word.range,
    );
  }
}

/** A use of a renamed result through another check (`damage_check.D` for `D_sum`). */
interface AliasUse {
  check: string;
  member: string;
  to: string;
}

type BlockScope = Scope & { aliases: AliasUse[] };

function blockScope(
  raw: Map<string, Unit | number>,
  previous: ReadonlyMap<string, CheckScopeEntry>,
  values: CheckResult['values'],
): BlockScope {
  // Names of this block: stated ones as written; computed ones (for `require:` targets
  // such as `0.5 * Se`) are built on first use.
  const self: CheckScopeEntry = { result: { values } as CheckResult, raw };
  const aliases: AliasUse[] = [];
  return {
    aliases,
    get: (name) => memberValue(self, name),
    hasCheck: (check) => previous.has(check),
    member: (check, member) => {
      const entry = previous.get(check);
      const v = memberValue(entry, member);
      if (v !== undefined || !entry) return v;
      const to = renamedResult(entry.result.method, member);
      if (to) aliases.push({ check, member, to });
      return to ? memberValue(entry, to) : undefined;
    },
  };
}

/** Hints on the old names of renamed results an expression used, with the new name as a fix. */
function flagAliases(ctx: CheckContext, scope: BlockScope, expr: { text: string; range: Range }): void {
  for (const a of scope.aliases.splice(0)) {
    const ref = `${a.check}.${a.member}`;
    const at = new RegExp(`(^|[^A-Za-z0-9_.])${ref.replace('.', '\\.')}(?![A-Za-z0-9_])`).exec(expr.text);
    const start = expr.range.start.character + (at ? at.index + at[1].length : 0);
    const r = at ? lineRange(expr.range.start.line, start, start + ref.length) : expr.range;
    ctx.diag(
      'hint',
      'renamed-result',
      `\`${a.member}\` of \`${a.check}\` is now called \`${a.to}\`; the old name still works`,
      r,
      at
        ? [
            {
              title: `Change to \`${a.check}.${a.to}\``,
              edits: [{ range: r, newText: `${a.check}.${a.to}` }],
              preferred: true,
            },
          ]
        : [],
    );
  }
}

function readStatements(
  ctx: CheckContext,
  statements: Statement[],
  scope: BlockScope,
  raw: Map<string, Unit | number>,
): number {
  let faults = 0;
  const errors = () => ctx.diagnostics.reduce((n, d) => n + (d.severity === 'error' ? 1 : 0), 0);
  const lineOfName = new Map<string, number>();
  // First line where each name is stated, to tell "stated below" from "never stated".
  const statementsBelow = new Map<string, number>();
  for (const s of statements)
    if (s.kind === 'assign' && !statementsBelow.has(s.name.text)) statementsBelow.set(s.name.text, s.line);
  for (const s of statements) {
    const before = errors();
    switch (s.kind) {
      case 'bad':
        ctx.diag('error', s.code, s.message, s.range);
        break;
      case 'option':
        readOption(ctx, s);
        break;
      case 'assign':
        readAssign(ctx, s, scope, raw, lineOfName, statementsBelow);
        break;
      case 'spectrum':
        ctx.spectrum.push(s);
        break;
      default:
        break;
    }
    // A faulty helper name only matters through a reserved input that uses it (which then
    // fails itself); a faulty reserved input, option or unreadable line always matters.
    const reserved = s.kind !== 'assign' || s.name.text in INPUT_NAMES || s.name.text in RESULT_NAMES;
    if (errors() > before && reserved && s.kind !== 'require' && s.kind !== 'solve') faults++;
  }
  return faults;
}

function readOption(ctx: CheckContext, s: OptionStatement): void {
  const key = s.key.text;
  const info = OPTIONS[key];
  if (!info) {
    const near = nearest(key, Object.keys(OPTIONS), 2);
    const asName = key in INPUT_NAMES ? ` (\`${key}\` is a quantity: write \`${key} = ...\`)` : '';
    ctx.diag(
      'error',
      'unknown-option',
      `unknown option \`${key}:\`${near ? `: did you mean \`${near}:\`?` : ''}${asName}`,
      s.key.range,
      near
        ? [
            {
              title: `Change to \`${near}:\``,
              edits: [{ range: s.key.range, newText: near }],
              preferred: true,
            },
          ]
        : [],
    );
    return;
  }
  if (ctx.options.has(key)) {
    ctx.diag(
      'error',
      'duplicate-option',
      `\`${key}:\` is already given on line ${ctx.options.get(key)!.line + 1}`,
      s.whole,
    );
    return;
  }
  ctx.options.set(key, s);
  if (key === 'material' && !findMaterial(s.value.text)) {
    // A key the library does not have: the strengths and the family would be guessed.
    const near = nearestMaterialKeys(s.value.text, 3);
    ctx.diag(
      'error',
      'unknown-material',
      `\`${s.value.text}\` is not in the material library${near.length ? `: did you mean ${near.map((k) => `\`${k}\``).join(', ')}?` : ''}`,
      s.value.range,
      near.map((k, i) => ({
        title: `Change to \`${k}\``,
        edits: [{ range: s.value.range, newText: k }],
        preferred: i === 0,
      })),
    );
    return;
  }
  if (info.values && !(s.value.text in info.values)) {
    const choices = Object.keys(info.values);
    const near = nearest(s.value.text, choices, 3);
    ctx.diag(
      'error',
      'unknown-option-value',
      `\`${s.value.text}\` is not a value of \`${key}:\`${near ? `: did you mean \`${near}\`?` : ''} (one of ${choices.join(', ')})`,
      s.value.range,
      near
        ? [
            {
              title: `Change to \`${near}\``,
              edits: [{ range: s.value.range, newText: near }],
              preferred: true,
            },
          ]
        : [],
    );
  }
}

function readAssign(
  ctx: CheckContext,
  s: AssignStatement,
  scope: BlockScope,
  raw: Map<string, Unit | number>,
  lineOfName: Map<string, number>,
  statementsBelow: ReadonlyMap<string, number>,
): void {
  const name = s.name.text;
  const prior = lineOfName.get(name);
  if (prior !== undefined) {
    ctx.diag(
      'error',
      'duplicate-name',
      `\`${name}\` is already stated on line ${prior + 1} of this note`,
      s.name.range,
    );
    return;
  }
  lineOfName.set(name, s.line);
  if (name in RESULT_NAMES && !(name in INPUT_NAMES) && !['Se', 'Kfm', 'Kfsm', 'Kf_axm'].includes(name)) {
    ctx.diag(
      'information',
      'result-stated',
      `\`${name}\` is a result of the check: the stated value replaces the computed one (both are shown)`,
      s.name.range,
    );
  }
  let q: Quantity;
  try {
    q = evaluateExpression(s.expr.text, scope);
    flagAliases(ctx, scope, s.expr);
  } catch (e) {
    scope.aliases.length = 0;
    const err = e instanceof ExpressionError ? e : new ExpressionError('expression-error', String(e));
    const start = s.expr.range.start.character + (err.offset ?? 0);
    const r =
      err.offset !== undefined
        ? lineRange(s.line, start, Math.min(start + (err.length ?? 1), s.expr.range.end.character))
        : s.expr.range;
    let message = `${name}: ${err.message}`;
    if (err.code === 'unknown-name') {
      const used = /`([A-Za-z_][A-Za-z0-9_]*)`/.exec(err.message)?.[1];
      const later = used ? statementsBelow.get(used) : undefined;
      if (later !== undefined && later > s.line)
        message = `${name}: \`${used}\` is stated below, on line ${later + 1}: names are read top to bottom, so move that line above this one`;
      else if (used && Object.hasOwn(UNIT_SLIPS, used))
        message = `${name}: \`${used}\` is not a unit here: write \`${UNIT_SLIPS[used]}\``;
    }
    ctx.diag('error', err.code, message, r);
    return;
  }
  const info = INPUT_NAMES[name] ?? RESULT_NAMES[name];
  if (!info) {
    // A helper name one letter away from a reserved input is most likely a misspelt override.
    const near = nearReserved(name);
    if (near)
      ctx.diag(
        'warning',
        'near-reserved-name',
        `\`${name}\` is not a reserved name, so it does not feed the check: did you mean \`${near}\`?`,
        s.name.range,
        [
          {
            title: `Rename to \`${near}\``,
            edits: [{ range: s.name.range, newText: near }],
            preferred: true,
          },
        ],
      );
  }
  let dim: DimKey = classify(q.dim);
  if (info && info.dim !== 'other') {
    const want = info.dim === 'paris' ? vectorOf('one')! : vectorOf(info.dim)!;
    if (!sameVector(q.dim, want)) {
      const noUnit = q.dim.every((x) => x === 0);
      if (noUnit) {
        ctx.diag(
          'error',
          'missing-unit',
          `\`${name}\` needs a unit: it is ${ctx.dimLabel(info.dim)}`,
          s.expr.range,
          unitFixes(info.dim, ctx.system, s.expr),
        );
      } else {
        const slip =
          info.dim === 'temperature' && /\bC\b/.test(s.expr.text)
            ? ' (`C` is the coulomb: write `degC`)'
            : info.dim === 'temperature' && /\bF\b/.test(s.expr.text)
              ? ' (`F` is the farad: write `degF`)'
              : '';
        ctx.diag(
          'error',
          'wrong-dimension',
          `\`${name}\` must be ${ctx.dimLabel(info.dim)}, but \`${s.expr.text}\` is ${ctx.dimLabel(dim)}${slip}`,
          s.expr.range,
        );
      }
      return;
    }
    dim = info.dim === 'paris' ? 'one' : info.dim;
    const shownDim = dim;
    const bad = valuePlausibility(name, q.si, dim, (x) => ctx.display(x, shownDim));
    if (bad) {
      ctx.diag(bad.severity, 'absurd-value', `\`${name}\` ${bad.message}`, s.expr.range);
      if (bad.severity === 'error') return;
    }
  }
  raw.set(name, q.raw);
  ctx.stated.set(name, { q, stmt: s });
  ctx.recordStated(name, q, s, dim);
}

const RESERVED_INPUTS = Object.keys(INPUT_NAMES);

/** The reserved input a helper name most likely meant: same letters (case, `_`) or one edit away. */
function nearReserved(name: string): string | undefined {
  const squash = (x: string) => x.replace(/_/g, '').toLowerCase();
  const same = RESERVED_INPUTS.find((r) => squash(r) === squash(name));
  if (same) return same;
  if (name.length < 3) return undefined;
  return RESERVED_INPUTS.find((r) => r.length >= 3 && editDistance(r, name) === 1);
}

/** Unit spellings that are common in calc notes but not units to mathjs. */
const UNIT_SLIPS: Record<string, string> = {
  Nm: 'N*m',
  Nmm: 'N*mm',
  kNm: 'kN*m',
  lbin: 'lbf*in',
  lbfin: 'lbf*in',
  inlb: 'lbf*in',
  ftlb: 'lbf*ft',
  lbft: 'lbf*ft',
  Mpa: 'MPa',
  mpa: 'MPa',
  Ksi: 'ksi',
  KSI: 'ksi',
  PSI: 'psi',
  MM: 'mm',
  deg: 'degC or degF',
};

/** A value of an earlier check as a mathjs value, built on first use (most are never referenced). */
export function memberValue(entry: CheckScopeEntry | undefined, name: string): Unit | number | undefined {
  if (!entry) return undefined;
  const hit = entry.raw.get(name);
  if (hit !== undefined) return hit;
  const values = entry.result.values;
  const v = Object.hasOwn(values, name) ? values[name] : undefined;
  if (!v || v.si === null) return undefined;
  const vec = vectorOf(v.dim);
  if (!vec) return undefined;
  const raw = rawFromSI(v.si, vec);
  entry.raw.set(name, raw);
  return raw;
}
