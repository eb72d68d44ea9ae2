/**
 * The state of one check while it is evaluated: its stated inputs, its options, the values
 * it has derived so far (each with its derivation), and its diagnostics. The methods in
 * `checks/` read inputs and record results only through this object, so that every number
 * is computed once and carries its formula, inputs and source.
 */
import type { Computed } from '../computed';
import { DIM_LABEL, type DimKey } from '../units/dimensions';
import { formatCycles, formatValue, type UnitSystem } from '../units/format';
import type { Quantity } from './quantity';
import type { AssignStatement, OptionStatement, SpectrumStatement } from './statements';
import type { Diagnostic, QuickFix, Range, Severity, ToolAlternative, Value, ValueOrigin } from './types';
import { nameInfo, OPTIONS } from './vocabulary';

export interface StatedInput {
  q: Quantity;
  stmt: AssignStatement;
}

export interface HistoryChunkReader {
  /**
   * Calls `onChunk` with the file in order, as its bytes (which the history reader decodes:
   * UTF-8, UTF-16 with or without a byte-order mark) or as text already decoded; returns an
   * error text instead when it cannot. A chunk may be cut anywhere and is not kept after
   * the call returns.
   */
  read(
    relativePath: string,
    onChunk: (chunk: string | Uint8Array) => void,
  ): { ok: true } | { ok: false; code: string; message: string };
}

const SURFACED = new Set(['criterion-domain', 'load-line']);
/** Most inputs a tool alternative's `why` names with their values (beyond, their names only). */
const TOOL_INPUTS_SHOWN = 3;

export class CheckContext {
  /** Without `Object.prototype` behind it: `values[name]` answers for the check's own values only. */
  readonly values: Record<string, Value> = Object.create(null);
  readonly order: string[] = [];
  readonly diagnostics: Diagnostic[] = [];
  readonly used = new Set<string>();
  /**
   * Stated inputs read only while a chain that a stated value replaces was worked out (for the
   * tool's own value beside it), with that stated value's name: they do not act.
   */
  readonly replacedReads = new Map<string, string>();
  /** The stated value whose replaced chain is being worked out (see `replacedBy`). */
  private replacing: string | null = null;
  spectrum: SpectrumStatement[] = [];
  /**
   * Evaluates an expression of the block (its names and `check.name` references) for a method
   * that reads expressions itself (spectrum levels); throws an `ExpressionError`. The block
   * language sets it (`language/evaluateBlock.ts`).
   */
  evaluate?: (text: string) => Quantity;

  constructor(
    readonly id: string | null,
    readonly header: Range,
    readonly insertLine: number,
    readonly stated: Map<string, StatedInput>,
    readonly options: Map<string, OptionStatement>,
    readonly system: UnitSystem,
    readonly digits: number,
    readonly histories?: HistoryChunkReader,
  ) {}

  /** A validated option word, or undefined when absent (or invalid: already diagnosed). */
  option(key: string): string | undefined {
    const o = this.options.get(key);
    if (!o) return undefined;
    const allowed = OPTIONS[key]?.values;
    if (allowed && !(o.value.text in allowed)) return undefined;
    return o.value.text;
  }

  optionRange(key: string): Range | undefined {
    return this.options.get(key)?.whole;
  }

  /** SI value of a stated input (undefined when not stated or stated wrongly). */
  input(name: string): number | undefined {
    const s = this.stated.get(name);
    if (!s) return undefined;
    this.markRead(name);
    return s.q.si;
  }

  private markRead(name: string): void {
    if (this.replacing === null) this.used.add(name);
    else if (!this.replacedReads.has(name)) this.replacedReads.set(name, this.replacing);
  }

  /**
   * Runs the chain that the stated value `name` replaces (a stated `Se` ends the Marin chain,
   * a stated `Kt` the geometry fit ...), only for the tool's own value beside the stated one:
   * the chain raises no diagnostic, the values it records are marked as not used, and the
   * stated inputs it alone reads are marked so after the method (`markReplacedInputs`).
   */
  replacedBy<T>(name: string, run: () => T): T {
    const outer = this.replacing;
    this.replacing = outer ?? name;
    try {
      return run();
    } finally {
      this.replacing = outer;
    }
  }

  /** Whether a replaced chain is being worked out (its diagnostics are dropped). */
  get quiet(): boolean {
    return this.replacing !== null;
  }

  /**
   * Notes stated inputs that only a replaced chain would have read (they are not read at all);
   * `why` says it when the reason is not a stated value (`by` is then only the chain's name).
   */
  replaced(by: string, names: readonly string[], why?: string): void {
    for (const n of names)
      if (this.stated.has(n) && !this.replacedReads.has(n)) {
        this.replacedReads.set(n, by);
        if (why) this.replacedWhy.set(n, why);
      }
  }

  private readonly replacedWhy = new Map<string, string>();

  /** After the method: a stated input that only replaced chains read is shown as not used. */
  markReplacedInputs(): void {
    for (const [name, by] of this.replacedReads) {
      const v = this.values[name];
      if (this.used.has(name) || !v || v.origin !== 'stated' || name === by) continue;
      v.unused = this.replacedWhy.get(name) ?? `the stated ${by} replaces the chain it feeds`;
    }
  }

  has(name: string): boolean {
    return this.stated.has(name);
  }

  rangeOf(name: string): Range {
    return this.stated.get(name)?.stmt.whole ?? this.values[name]?.range ?? this.header;
  }

  diag(severity: Severity, code: string, message: string, range?: Range, fixes?: QuickFix[]): void {
    // A chain that a stated value replaces does not act: nothing it finds is the note's concern.
    if (this.replacing !== null) return;
    const d: Diagnostic = { range: range ?? this.header, severity, code, message, check: this.id };
    if (fixes && fixes.length > 0) d.fixes = fixes;
    // One diagnostic per code and place.
    if (
      this.diagnostics.some(
        (x) =>
          x.code === code &&
          x.range.start.line === d.range.start.line &&
          x.range.start.character === d.range.start.character,
      )
    )
      return;
    this.diagnostics.push(d);
  }

  /** A quick fix that inserts a statement as the block's last line. */
  insertFix(title: string, statement: string): QuickFix {
    return {
      title,
      edits: [
        {
          range: {
            start: { line: this.insertLine, character: 0 },
            end: { line: this.insertLine, character: 0 },
          },
          newText: `${statement}\n`,
        },
      ],
      preferred: true,
    };
  }

  display(si: number | null, dim: DimKey, infinite = false): string {
    if (infinite || si === null) return 'infinite';
    if (dim === 'one' && Math.abs(si) >= 1e3 && Number.isInteger(Math.round(si))) return formatCycles(si);
    return formatValue(si, dim, this.system, this.digits);
  }

  private dimOf(name: string, fallback: DimKey): DimKey {
    return nameInfo(name)?.dim ?? fallback;
  }

  private put(v: Value): void {
    if (this.replacing !== null && v.origin !== 'stated')
      v.unused = `the stated ${this.replacing} replaces it`;
    if (!(v.name in this.values)) this.order.push(v.name);
    this.values[v.name] = v;
  }

  /** Record a stated input as a value (done by the evaluator for every assignment). */
  recordStated(name: string, q: Quantity, stmt: AssignStatement, dim: DimKey): void {
    this.put({
      name,
      dim,
      si: q.si,
      display: this.display(q.si, dim),
      origin: 'stated',
      meaning: nameInfo(name)?.meaning ?? 'quantity of the note',
      range: stmt.whole,
      expression: stmt.expr.text,
    });
  }

  inputsOf(names: string[]): Array<{ name: string; display: string }> {
    const out: Array<{ name: string; display: string }> = [];
    for (const n of names) {
      const v = this.values[n];
      if (v) out.push({ name: n, display: v.display });
    }
    return out;
  }

  /**
   * Record a computed quantity. When the note states it, the stated value wins and the tool's
   * own result is kept beside it; returns the value to use downstream (null when infinite).
   */
  result(
    name: string,
    c: Computed | null,
    inputs: string[],
    opts: {
      dim?: DimKey;
      range?: Range;
      origin?: ValueOrigin;
      assumption?: string;
      meaning?: string;
      /** What a stated value's tool alternative is computed with, and why it is what it is. */
      tool?: { basis?: string; why?: string };
    } = {},
  ): number | null {
    const dim = opts.dim ?? this.dimOf(name, 'one');
    const stated = this.stated.get(name);
    const notes: string[] = [];
    // A stated value replaces the tool's own: the remarks of that computation are not the note's concern.
    if (c?.notes && !stated)
      for (const n of c.notes) {
        // A criterion used outside its domain and a load line that cannot bound the factor
        // are engineering warnings whatever the method's own severity.
        const sev = SURFACED.has(n.code) ? 'warning' : (n.severity ?? 'warning');
        if (sev === 'information' || sev === 'hint') notes.push(n.message);
        else this.diag(sev, n.code, `${name}: ${n.message}`, opts.range ?? this.rangeOf(name));
      }
    if (stated) {
      this.markRead(name);
      const v = this.values[name];
      if (v && c) {
        v.tool = this.toolAlternative(c, dim, inputs, opts.tool);
      }
      return stated.q.si;
    }
    if (!c) return null;
    // A stated input of a value that acts acts too (the radius of a q worked out from a quietly read fit ...).
    if (this.replacing === null) for (const n of inputs) if (this.stated.has(n)) this.used.add(n);
    if (!Number.isFinite(c.value)) {
      this.diag(
        'error',
        'non-finite',
        `${name} could not be computed from these inputs (not a finite number)`,
        opts.range,
      );
      return null;
    }
    const v: Value = {
      name,
      dim,
      si: c.infinite ? null : c.value,
      display: this.display(c.value, dim, c.infinite),
      origin: opts.origin ?? 'computed',
      meaning: opts.meaning ?? nameInfo(name)?.meaning ?? name,
      formula: renameFormula(c.formula, name),
      inputs: this.inputsOf(inputs),
      source: c.source,
    };
    if (c.infinite) v.infinite = true;
    if (c.terms) v.terms = c.terms;
    if (notes.length > 0) v.notes = notes;
    if (opts.range) v.range = opts.range;
    if (opts.assumption) v.assumption = opts.assumption;
    this.put(v);
    return c.infinite ? null : c.value;
  }

  /**
   * The tool's own value beside a stated one, with what it is computed with and why, in
   * words a checker reads without the derivation: `fit 1: no notch feature stated`.
   */
  private toolAlternative(
    c: Computed,
    dim: DimKey,
    inputs: string[],
    words: { basis?: string; why?: string } = {},
  ): ToolAlternative {
    const display = this.display(c.value, dim, c.infinite);
    const basis = words.basis ?? 'computed';
    const given = this.inputsOf(inputs);
    let why = words.why;
    let label: string;
    if (why) label = `${basis} ${display}: ${why}`;
    else if (given.length > 0) {
      why = `from ${
        given.length <= TOOL_INPUTS_SHOWN
          ? given.map((i) => `${i.name} = ${i.display}`).join(', ')
          : given.map((i) => i.name).join(', ')
      }`;
      label = `${basis} ${display} ${why}`;
    } else {
      why = c.source;
      label = `${basis} ${display}: ${why}`;
    }
    return {
      si: c.infinite ? null : c.value,
      ...(c.infinite ? { infinite: true } : {}),
      display,
      formula: c.formula,
      source: c.source,
      basis,
      why,
      label,
    };
  }

  /** A value taken from a library (material) rather than computed. */
  library(name: string, si: number, source: string, range?: Range): number {
    const stated = this.stated.get(name);
    if (stated) {
      this.markRead(name);
      return stated.q.si;
    }
    const dim = this.dimOf(name, 'one');
    this.put({
      name,
      dim,
      si,
      display: this.display(si, dim),
      origin: 'library',
      meaning: nameInfo(name)?.meaning ?? name,
      source,
      ...(range ? { range } : {}),
    });
    return si;
  }

  /** Whether a value is available (stated or already derived). */
  known(name: string): boolean {
    return this.stated.has(name) || name in this.values;
  }

  si(name: string): number | undefined {
    const s = this.stated.get(name);
    if (s) return s.q.si;
    const v = this.values[name];
    return v && v.si !== null ? v.si : undefined;
  }

  dimLabel(dim: DimKey): string {
    return DIM_LABEL[dim];
  }
}

/** A method's formula names its own symbol (`n_f = ...`); the record shows the value's name. */
function renameFormula(formula: string, name: string): string {
  // Most formulas already start with `name =` or `name ` (no regex needed then).
  if (formula.startsWith(name)) {
    const c = formula.charCodeAt(name.length);
    if (c === 32 || c === 61) {
      let i = name.length;
      while (formula.charCodeAt(i) === 32) i++;
      if (formula.charCodeAt(i) === 61 && formula.charCodeAt(i + 1) !== 61) return formula;
    }
  }
  const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=(?!=)/.exec(formula);
  if (!m || m[1] === name) return formula;
  return `${name} =${formula.slice(m[0].length)}`;
}
