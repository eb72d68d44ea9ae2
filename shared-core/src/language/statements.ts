/**
 * One statement per line inside a fatigue block:
 *   name = expression          a quantity
 *   key: value                 an option (`title:` takes free text)
 *   require: SYM >= EXPR, ...  acceptance criteria
 *   solve: NAME for SYM = EXPR design mode
 *   spectrum: M_a = ..., n = . one load level of a spectrum
 * `#` starts a comment; blank lines and indentation are ignored.
 */

import type { BadStatement, RequireItem, Span, SpectrumStatement, Statement } from '../context/statements';
import { lineRange, type Range } from '../context/types';
import type { SourceLine } from './markdownBlocks';

export type {
  AssignStatement,
  BadStatement,
  OptionStatement,
  RequireItem,
  RequireStatement,
  SolveStatement,
  Span,
  SpectrumStatement,
  Statement,
} from '../context/statements';

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

/**
 * Names every JavaScript object answers to (`constructor`, `__proto__`, `toString` ...):
 * a note may not use them, so that no lookup of a note's name can reach the runtime.
 */
export function isReservedWord(name: string): boolean {
  return name in Object.prototype;
}

function reserved(line: number, name: Span): BadStatement {
  return {
    kind: 'bad',
    line,
    code: 'reserved-name',
    message: `\`${name.text}\` cannot be a name in a note (it is reserved): choose another name`,
    range: name.range,
  };
}

function span(line: number, text: string, start: number): Span {
  return { text, range: lineRange(line, start, start + text.length) };
}

/** Trim `text` (which starts at `start`) and return the trimmed span. */
function trimmed(line: number, text: string, start: number): Span {
  const lead = text.length - text.trimStart().length;
  const t = text.trim();
  return span(line, t, start + lead);
}

/** Split at commas that are not inside parentheses; returns [piece, offset] pairs. */
function splitTopLevel(text: string): Array<[string, number]> {
  const out: Array<[string, number]> = [];
  let depth = 0;
  let from = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '(' || c === '[') depth++;
    else if (c === ')' || c === ']') depth = Math.max(0, depth - 1);
    else if (c === ',' && depth === 0) {
      out.push([text.slice(from, i), from]);
      from = i + 1;
    }
  }
  out.push([text.slice(from), from]);
  return out;
}

export function stripComment(text: string): string {
  const i = text.indexOf('#');
  return i < 0 ? text : text.slice(0, i);
}

export function parseStatements(lines: SourceLine[], quotePrefix = false): Statement[] {
  const out: Statement[] = [];
  for (const { line, text: raw } of lines) {
    let text = raw;
    let base = 0;
    if (quotePrefix) {
      const q = /^\s*(?:>\s?)*/.exec(text);
      if (q) {
        base = q[0].length;
        text = text.slice(base);
      }
    }
    const s = parseLine(line, stripComment(text), base);
    if (s) out.push(s);
  }
  return out;
}

export function parseLine(line: number, text: string, base = 0): Statement | null {
  if (text.trim() === '') return null;
  const lead = text.length - text.trimStart().length;
  const body = text.trim();
  const start = base + lead;
  const whole = lineRange(line, start, start + body.length);

  const opt = /^([A-Za-z_][A-Za-z0-9_-]*)\s*:(?!=)/.exec(body);
  const eq = body.indexOf('=');
  if (opt && (eq < 0 || eq > opt[0].length)) {
    const key = span(line, opt[1], start);
    const rest = body.slice(opt[0].length);
    const value = trimmed(line, rest, start + opt[0].length);
    if (key.text === 'require') return parseRequire(line, rest, start + opt[0].length, whole);
    if (key.text === 'solve') return parseSolve(line, rest, start + opt[0].length, whole);
    if (key.text === 'spectrum') return parseSpectrum(line, rest, start + opt[0].length, whole);
    if (value.text === '' && key.text !== 'title')
      return {
        kind: 'bad',
        line,
        code: 'missing-value',
        message: `\`${key.text}:\` has no value`,
        range: whole,
      };
    return { kind: 'option', line, key, value, whole };
  }
  const asg = /^([A-Za-z_][A-Za-z0-9_.]*)\s*=(?!=)/.exec(body);
  if (asg) {
    const name = span(line, asg[1], start);
    if (!NAME.test(name.text))
      return {
        kind: 'bad',
        line,
        code: 'syntax',
        message: `\`${name.text}\` cannot be assigned here: a check may only state its own names (no \`check.name =\`)`,
        range: name.range,
      };
    if (isReservedWord(name.text)) return reserved(line, name);
    const expr = trimmed(line, body.slice(asg[0].length), start + asg[0].length);
    if (expr.text === '')
      return {
        kind: 'bad',
        line,
        code: 'missing-value',
        message: `nothing after \`${name.text} =\`: write a value, e.g. \`${name.text} = 35 mm\``,
        range: whole,
      };
    return { kind: 'assign', line, name, expr, whole };
  }
  return {
    kind: 'bad',
    line,
    code: 'syntax',
    message: 'not a statement: write `name = value`, `option: word`, `require: n_f >= 1.5` or a `# comment`',
    range: whole,
  };
}

const REQ = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*(>=|<=|>|<)\s*(.*)$/;

function parseRequire(line: number, rest: string, offset: number, whole: Range): Statement {
  const items: RequireItem[] = [];
  for (const [piece, off] of splitTopLevel(rest)) {
    const m = REQ.exec(piece);
    const w = trimmed(line, piece, offset + off);
    if (!m || m[3].trim() === '') {
      return {
        kind: 'bad',
        line,
        code: 'syntax',
        message: `cannot read the requirement \`${w.text}\`: write e.g. \`require: n_f >= 1.5, n_y >= 1.2\``,
        range: w.text ? w.range : whole,
      };
    }
    const symStart = offset + off + piece.indexOf(m[1]);
    const exprStartInPiece = piece.length - m[3].length;
    if (isReservedWord(m[1])) return reserved(line, span(line, m[1], symStart));
    items.push({
      symbol: span(line, m[1], symStart),
      op: m[2] as RequireItem['op'],
      expr: trimmed(line, m[3], offset + off + exprStartInPiece),
      whole: w,
    });
  }
  return { kind: 'require', line, items, whole };
}

const SOLVE = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s+for\s+([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(.+)$/;

function parseSolve(line: number, rest: string, offset: number, whole: Range): Statement {
  const m = SOLVE.exec(rest);
  if (!m)
    return {
      kind: 'bad',
      line,
      code: 'syntax',
      message: 'cannot read the design statement: write e.g. `solve: d for n_f = 2`',
      range: whole,
    };
  const nameStart = offset + rest.indexOf(m[1]);
  const symStart = offset + rest.indexOf(m[2], rest.indexOf(m[1]) + m[1].length + 4);
  const exprStart = offset + rest.length - m[3].length;
  if (isReservedWord(m[1])) return reserved(line, span(line, m[1], nameStart));
  if (isReservedWord(m[2])) return reserved(line, span(line, m[2], symStart));
  return {
    kind: 'solve',
    line,
    name: span(line, m[1], nameStart),
    symbol: span(line, m[2], symStart),
    expr: trimmed(line, m[3], exprStart),
    whole,
  };
}

function parseSpectrum(line: number, rest: string, offset: number, whole: Range): Statement {
  const items: SpectrumStatement['items'] = [];
  for (const [piece, off] of splitTopLevel(rest)) {
    const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=(.*)$/.exec(piece);
    if (!m || m[2].trim() === '') {
      const w = trimmed(line, piece, offset + off);
      return {
        kind: 'bad',
        line,
        code: 'syntax',
        message:
          'cannot read the spectrum level: write e.g. `spectrum: M_a = 300 N*m, M_m = 100 N*m, n = 2e4`',
        range: w.text ? w.range : whole,
      };
    }
    const nameStart = offset + off + piece.indexOf(m[1]);
    if (isReservedWord(m[1])) return reserved(line, span(line, m[1], nameStart));
    items.push({
      name: span(line, m[1], nameStart),
      expr: trimmed(line, m[2], offset + off + piece.length - m[2].length),
    });
  }
  return { kind: 'spectrum', line, items, whole };
}
