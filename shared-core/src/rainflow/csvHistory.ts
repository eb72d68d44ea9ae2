/**
 * Incremental reader of load histories written by data loggers as CSV text. Pure: it gets
 * the file in chunks through `feed` (its bytes, or its text; any chunk boundaries, even
 * inside a character or a line) and emits one number per data row through `onValue`, so
 * memory does not grow with the file. The server reads the file in chunks and feeds it;
 * nothing here touches a file system. Work is linear in the file's size whatever its line
 * structure: each character is looked at a bounded number of times, and at most
 * `MAX_HISTORY_LINE` characters of a line are kept.
 *
 * The rules (common practice of logger files, no source):
 * - Bytes are decoded as `HistoryDecoder` says: UTF-8, or UTF-16 LE or BE with or without a
 *   byte-order mark (the mark is dropped); an encoding other than plain UTF-8 is named in
 *   the information `csv-column`. Text fed as text may start with U+FEFF, which is dropped.
 * - Lines end with LF, CRLF or a lone CR. A line longer than `MAX_HISTORY_LINE` (2^20)
 *   characters is an error `history-line-too-long` and is skipped like a row without a
 *   number. Lines that start with `#` are comments. Blank lines are skipped and reported
 *   once (information).
 * - Delimiter, from the first non-blank, non-comment line: tab if it has a tab, else `;`,
 *   else `,`, else runs of spaces when it has several space-separated fields, else a single
 *   column. With `;`, tab, spaces or a single column, a comma inside a number is a decimal
 *   comma (`1,25` is 1.25); with `,` as the delimiter only the point is decimal.
 *   (A single-column file with decimal commas but no header reads as comma-separated: give
 *   it a header or use `;`.)
 * - Header: the first such line is a header when none of its non-empty fields is a number.
 * - Column: `column` is a header name (case-insensitive; a unit in brackets or parentheses
 *   after the name may be left out) or a 1-based index (a number, or a string of digits
 *   that is not a header name). With no column given and several columns, the reader takes
 *   the first column that is not a time column. A column is a time column when its header
 *   name is `t`, `s`, `ms`, `sec`, `secs`, `seconds`, or starts with `time`, `zeit`,
 *   `temps`, `tiempo`, `timestamp`, `date`, `datetime` or `elapsed`; with no header, the
 *   first column is a time column when its first value is not a number (a date stamp) or
 *   its values rise strictly over the first 16 data rows. The choice is reported
 *   (information `csv-column`).
 * - A column that does not exist is an error listing the available columns; the reader
 *   then stops (`fatal`). A data row whose value is not a number (or is missing) is an
 *   error `csv-non-numeric` with its line number; one whose value is a number that is not
 *   finite (`1e309` overflows; `nan`, `inf`, `Infinity`) is an error `history-non-finite`.
 *   Such rows are skipped and counted in `badRowCount`; the first 100 are listed one by one,
 *   the rest summed up in one issue at `end()`. A history with such a row must not be used
 *   for a result: the lost sample may be its largest load.
 * - Fewer than three numbers in all is an error at `end()` (`history-too-few-points`).
 */
import { encodingName, HistoryDecoder, type HistoryEncoding } from './historyDecoder';

export interface HistoryIssue {
  /** 1-based line in the file (0 when the issue is about the whole file). */
  line: number;
  message: string;
  code: string;
  severity: 'error' | 'warning' | 'information';
}

export type HistoryDelimiter = ',' | ';' | '\t' | 'whitespace' | 'none';

export interface HistoryCsvOptions {
  /** Header name or 1-based index of the load column. */
  column?: string | number;
  /** Receives each number with its 1-based file line. */
  onValue?: (x: number, line: number) => void;
  /** Receives each issue as it is found (they are also collected in `issues`). */
  onIssue?: (issue: HistoryIssue) => void;
  /** Overrides the delimiter detection. */
  delimiter?: HistoryDelimiter;
  /** Overrides the decimal-comma rule. */
  decimalComma?: boolean;
  /** Non-numeric rows listed one by one before they are only counted. Default 100. */
  maxRowReports?: number;
}

/** Longest line kept (characters); a longer one is an error and is skipped, unread. */
export const MAX_HISTORY_LINE = 1 << 20;
const MAX_LINE = MAX_HISTORY_LINE;
/** Columns listed by name in the message of a missing column. */
const COLUMNS_LISTED = 20;
const TIME_EXACT_RE = /^(?:t|s|ms|sec|secs|seconds)$/;
const TIME_PREFIX_RE = /^(?:time|zeit|temps|tiempo|timestamp|date|datetime|elapsed)(?:$|[\s_\-./:])/;
/** Words loggers write for a lost or saturated sample. */
const NON_FINITE_WORD_RE = /^"?[+-]?(?:nan|inf|infinity|1\.#inf|1\.#ind|1\.#qnan)"?$/i;
const TIME_SNIFF_ROWS = 16;
/** Exact powers of ten for the fast number path (10^0 .. 10^15, all exact doubles). */
const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/** The characters `String.prototype.trim` removes (ECMAScript WhiteSpace and LineTerminator). */
function isTrimSpace(c: number): boolean {
  if (c <= 32) return c === 32 || (c >= 9 && c <= 13);
  if (c < 0xa0) return false;
  return (
    c === 0xa0 ||
    c === 0x1680 ||
    (c >= 0x2000 && c <= 0x200a) ||
    c === 0x2028 ||
    c === 0x2029 ||
    c === 0x202f ||
    c === 0x205f ||
    c === 0x3000 ||
    c === 0xfeff
  );
}

const isDigit = (c: number) => c >= 48 && c <= 57;

/**
 * Parses one field as a number: NaN when it is not one. The field, trimmed and without
 * surrounding double quotes, must be `[+-]digits[.digits][e[+-]digits]` or
 * `[+-].digits[e[+-]digits]` (with a decimal comma allowed for the point when
 * `decimalComma`); the value is JavaScript's `Number` of that text (so `1e309` is Infinity,
 * which the reader reports). One pass over the characters, linear in the field.
 */
export function parseHistoryNumber(raw: string, decimalComma: boolean): number {
  let a = 0;
  let b = raw.length;
  while (a < b && isTrimSpace(raw.charCodeAt(a))) a++;
  while (b > a && isTrimSpace(raw.charCodeAt(b - 1))) b--;
  if (b - a >= 2 && raw.charCodeAt(a) === 34 && raw.charCodeAt(b - 1) === 34) {
    a++;
    b--;
    while (a < b && isTrimSpace(raw.charCodeAt(a))) a++;
    while (b > a && isTrimSpace(raw.charCodeAt(b - 1))) b--;
  }
  let i = a;
  let c = raw.charCodeAt(i);
  if (c === 43 || c === 45) c = raw.charCodeAt(++i); // + -
  let digits = 0;
  while (i < b && isDigit(c)) {
    digits++;
    c = raw.charCodeAt(++i);
  }
  let comma = -1;
  if (i < b && (c === 46 || (decimalComma && c === 44))) {
    if (c === 44) comma = i;
    c = raw.charCodeAt(++i);
    while (i < b && isDigit(c)) {
      digits++;
      c = raw.charCodeAt(++i);
    }
  }
  if (digits === 0) return Number.NaN;
  if (i < b && (c === 101 || c === 69)) {
    c = raw.charCodeAt(++i);
    if (i < b && (c === 43 || c === 45)) c = raw.charCodeAt(++i);
    let exp = 0;
    while (i < b && isDigit(c)) {
      exp++;
      c = raw.charCodeAt(++i);
    }
    if (exp === 0) return Number.NaN;
  }
  if (i !== b) return Number.NaN;
  const text = a === 0 && b === raw.length ? raw : raw.slice(a, b);
  return Number(comma < 0 ? text : `${text.slice(0, comma - a)}.${text.slice(comma - a + 1)}`);
}

/** True for a header name that names a time column (see the rules above). */
export function isTimeColumnName(name: string): boolean {
  const n = normaliseName(name);
  return TIME_EXACT_RE.test(n) || TIME_PREFIX_RE.test(n);
}

function normaliseName(name: string): string {
  return dropUnitSuffix(unquote(name)).trim().toLowerCase();
}

/**
 * `F [kN]` -> `F`, `M (N*m)` -> `M`: drops a bracketed unit at the end, from the first `[` or
 * `(` after the last closing bracket before it (a scan, linear in the name).
 */
function dropUnitSuffix(name: string): string {
  const t = name.trimEnd();
  const last = t.charCodeAt(t.length - 1);
  if (last !== 93 && last !== 41) return t; // ] )
  const body = t.slice(0, -1);
  const after = Math.max(body.lastIndexOf(']'), body.lastIndexOf(')')) + 1;
  let open = -1;
  for (let i = after; i < body.length; i++) {
    const c = body.charCodeAt(i);
    if (c === 91 || c === 40) {
      open = i;
      break;
    }
  }
  return open < 0 ? t : t.slice(0, open);
}

function unquote(s: string): string {
  const t = s.trim();
  if (t.length >= 2 && t[0] === '"' && t[t.length - 1] === '"')
    return t.slice(1, -1).replace(/""/g, '"').trim();
  return t;
}

/** Splits a whole line into fields (quotes honoured for character delimiters). */
function splitLine(line: string, delimiter: HistoryDelimiter): string[] {
  if (delimiter === 'none') return [line];
  if (delimiter === 'whitespace') return line.trim().split(/\s+/);
  if (line.indexOf('"') < 0) return line.split(delimiter);
  const out: string[] = [];
  let cur = '';
  let inQuotes = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') {
      if (inQuotes && line[i + 1] === '"') {
        cur += '""';
        i++;
      } else {
        inQuotes = !inQuotes;
        cur += ch;
      }
    } else if (ch === delimiter && !inQuotes) {
      out.push(cur);
      cur = '';
    } else {
      cur += ch;
    }
  }
  out.push(cur);
  return out;
}

function detectDelimiter(line: string): HistoryDelimiter {
  let tabs = 0;
  let semis = 0;
  let commas = 0;
  let inQuotes = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') inQuotes = !inQuotes;
    else if (!inQuotes) {
      if (ch === '\t') tabs++;
      else if (ch === ';') semis++;
      else if (ch === ',') commas++;
    }
  }
  if (tabs > 0) return '\t';
  if (semis > 0) return ';';
  if (commas > 0) return ',';
  if (/\S\s+\S/.test(line.trim())) return 'whitespace';
  return 'none';
}

type Phase = 'start' | 'sniff' | 'data' | 'fatal';

export class HistoryCsvReader {
  readonly issues: HistoryIssue[] = [];
  /** Set when the reader stopped (missing column); no more numbers are emitted. */
  fatal = false;
  /** Header names, when the file has a header. */
  header?: string[];
  delimiter: HistoryDelimiter = 'none';
  decimalComma = false;
  /** 0-based index of the column read (-1 until decided). */
  columnIndex = -1;
  /** Display name of the column read (header name, or `column N`). */
  columnName = '';
  /** Numbers emitted. */
  valueCount = 0;
  /** Lines seen. */
  lineCount = 0;
  /** Rows skipped because their value was not a finite number (words, `nan`, `inf`, `1e309`). */
  badRowCount = 0;
  /** Of those, the rows whose value is a non-finite number (`nan`, `inf`, an overflow like `1e309`). */
  nonFiniteRowCount = 0;
  blankLineCount = 0;
  /**
   * Characters looked at so far (line-end searches, pieces kept, lines read): a measure of
   * the work, which tests hold linear in the size of the input whatever its line structure.
   */
  steps = 0;

  private readonly opts: HistoryCsvOptions;
  private readonly maxRowReports: number;
  private phase: Phase = 'start';
  /** Pieces of the line not yet ended, and their length (counted on past `MAX_LINE`). */
  private parts: string[] = [];
  private partLength = 0;
  private overlong = false;
  private overlongHead = '';
  /** The last piece ended with a CR: an LF at the start of the next one belongs to it. */
  private afterCR = false;
  private decoder?: HistoryDecoder;
  private firstChunk = true;
  private firstBlankLine = 0;
  private fieldCount = 0;
  private sniffRows: Array<{ line: string; no: number }> = [];
  private ended = false;
  /** Character code of a one-character delimiter (`,`, `;`, tab) for the fast row path, else -1. */
  private fastDelimiter = -1;

  constructor(opts: HistoryCsvOptions = {}) {
    this.opts = opts;
    this.maxRowReports = opts.maxRowReports ?? 100;
  }

  /**
   * Feeds the next piece of the file: its bytes (decoded here, see `HistoryDecoder`) or,
   * when the caller has decoded it, its text. Work and memory are linear in the piece:
   * a line is looked at once, when it ends, and at most `MAX_LINE` characters of it are kept.
   */
  feed(chunk: string | Uint8Array): void {
    if (this.ended || this.fatal) return;
    if (typeof chunk === 'string') {
      this.feedText(chunk);
      return;
    }
    if (this.decoder === undefined) this.decoder = new HistoryDecoder();
    this.feedText(this.decoder.write(chunk));
  }

  /** Characters of the current, unfinished line that are kept (at most `MAX_HISTORY_LINE`). */
  get heldCharacters(): number {
    return this.overlong ? 0 : this.partLength;
  }

  /** The encoding of the bytes fed (undefined when the caller fed text). */
  get encoding(): HistoryEncoding | undefined {
    return this.decoder?.encoding;
  }

  private feedText(chunk: string): void {
    if (this.fatal || chunk.length === 0) return;
    let text = chunk;
    if (this.firstChunk) {
      this.firstChunk = false;
      if (this.decoder === undefined && text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    }
    let start = 0;
    if (this.afterCR) {
      // CR LF split between two pieces: the LF ends no second line.
      this.afterCR = false;
      if (text.charCodeAt(0) === 10) start = 1;
    }
    // Line ends: LF, CRLF or a lone CR. The next of each is searched once and kept until passed.
    let lf = this.find(text, '\n', start);
    let cr = this.find(text, '\r', start);
    while (lf >= 0 || cr >= 0) {
      let end: number;
      let next: number;
      if (cr >= 0 && (lf < 0 || cr < lf)) {
        end = cr;
        if (cr + 1 < text.length) next = text.charCodeAt(cr + 1) === 10 ? cr + 2 : cr + 1;
        else {
          next = cr + 1;
          this.afterCR = true;
        }
      } else {
        end = lf;
        next = lf + 1;
      }
      if (this.phase !== 'data' || this.partLength > 0 || !this.fastRow(text, start, end))
        this.endLine(text, start, end);
      if (this.fatal) {
        this.parts = [];
        return;
      }
      start = next;
      if (lf >= 0 && lf < start) lf = this.find(text, '\n', start);
      if (cr >= 0 && cr < start) cr = this.find(text, '\r', start);
    }
    if (start < text.length) this.append(text, start, text.length);
  }

  /**
   * The common data row read in place, without slicing the line: plain fields before the
   * column, and in the column `[+-]digits[.digits]` with at most 15 digits in all, ended by
   * the delimiter or the line end. Such a value is an integer below 2^53 divided by an exact
   * power of ten, so one division gives the correctly rounded double, the same as `Number`
   * of the text (W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990,
   * the fast path). Anything else (quotes, spaces, exponents, more digits, a short row)
   * returns false and goes the general way (`line`), which reports it.
   */
  private fastRow(text: string, from: number, to: number): boolean {
    const d = this.fastDelimiter;
    if (d < 0 || to - from > MAX_LINE) return false;
    let i = from;
    for (let k = this.columnIndex; k > 0; k--) {
      for (;;) {
        if (i >= to) return false;
        const c = text.charCodeAt(i++);
        if (c === d) break;
        if (c === 34) return false; // a quote: the general split honours it
      }
    }
    let c = i < to ? text.charCodeAt(i) : -1;
    const negative = c === 45;
    if (negative || c === 43) c = ++i < to ? text.charCodeAt(i) : -1;
    let m = 0;
    let digits = 0;
    let decimals = 0;
    while (c >= 48 && c <= 57) {
      m = m * 10 + (c - 48);
      digits++;
      c = ++i < to ? text.charCodeAt(i) : -1;
    }
    if (c === 46 || (c === 44 && this.decimalComma && d !== 44)) {
      c = ++i < to ? text.charCodeAt(i) : -1;
      while (c >= 48 && c <= 57) {
        m = m * 10 + (c - 48);
        digits++;
        decimals++;
        c = ++i < to ? text.charCodeAt(i) : -1;
      }
    }
    if (digits === 0 || digits > 15 || (c !== -1 && c !== d)) return false;
    const v = decimals === 0 ? m : m / POW10[decimals];
    const x = negative ? -v : v;
    const no = ++this.lineCount;
    this.steps += to - from + 1;
    this.valueCount++;
    if (this.opts.onValue !== undefined) this.opts.onValue(x, no);
    return true;
  }

  /** `text.indexOf(ch, from)`, counting the characters it looks at in `steps`. */
  private find(text: string, ch: string, from: number): number {
    const i = text.indexOf(ch, from);
    this.steps += (i < 0 ? text.length : i + 1) - from;
    return i;
  }

  /** Keeps a piece of the line not yet ended, up to `MAX_LINE` characters in all. */
  private append(text: string, from: number, to: number): void {
    const n = to - from;
    if (this.partLength + n > MAX_LINE) {
      if (!this.overlong) {
        this.overlong = true;
        this.overlongHead = (this.parts.join('') + text.slice(from, from + 40)).slice(0, 40);
        this.parts = [];
      }
      this.partLength += n;
      return;
    }
    this.parts.push(from === 0 && to === text.length ? text : text.slice(from, to));
    this.partLength += n;
    this.steps += n;
  }

  /** A line ends at `text[to]`: hands it on whole, or reports it when it is too long. */
  private endLine(text: string, from: number, to: number): void {
    let raw: string;
    if (this.partLength === 0) {
      if (to - from > MAX_LINE) {
        this.overlong = true;
        this.overlongHead = text.slice(from, from + 40);
        this.partLength = to - from;
      }
      raw = this.overlong ? '' : text.slice(from, to);
    } else {
      this.append(text, from, to);
      raw = this.overlong ? '' : this.parts.join('');
      this.steps += raw.length;
    }
    this.parts = [];
    const length = this.partLength;
    this.partLength = 0;
    if (this.overlong) {
      this.overlong = false;
      this.longLine(length);
      return;
    }
    this.line(raw);
  }

  /** Ends the input: the last line without a newline, deferred decisions and summaries. */
  end(): void {
    if (this.ended) return;
    if (!this.fatal && this.decoder !== undefined) this.feedText(this.decoder.end());
    this.ended = true;
    if (!this.fatal && (this.partLength > 0 || this.overlong)) this.endLine('', 0, 0);
    if (!this.fatal && this.phase === 'sniff') this.decideSniffedColumn();
    if (this.blankLineCount > 0) {
      this.report(
        this.firstBlankLine,
        'csv-blank-rows',
        'information',
        `${this.blankLineCount} blank line${this.blankLineCount === 1 ? '' : 's'} skipped (the first at line ${this.firstBlankLine}).`,
      );
    }
    if (this.badRowCount > this.maxRowReports) {
      const more = this.badRowCount - this.maxRowReports;
      this.report(
        0,
        'csv-non-numeric',
        'error',
        `${more} more row${more === 1 ? '' : 's'} without a finite number in ${this.columnLabel()} skipped (${this.badRowCount} in all).`,
      );
    }
    if (!this.fatal && this.valueCount < 3) {
      this.report(
        0,
        'history-too-few-points',
        'error',
        `The history has ${this.valueCount} number${this.valueCount === 1 ? '' : 's'} in ${this.columnLabel()}; rainflow counting needs at least three.`,
      );
    }
  }

  private line(raw: string): void {
    const no = ++this.lineCount;
    // Every rule below looks at the line a bounded number of times: count it once.
    this.steps += raw.length + 1;
    const phase = this.phase;
    if (phase === 'data') {
      this.dataRow(raw, no);
      return;
    }
    if (isBlank(raw)) {
      this.blank(no);
      return;
    }
    if (isComment(raw)) return;
    if (phase === 'sniff') {
      this.sniffRows.push({ line: raw, no });
      if (this.sniffRows.length >= TIME_SNIFF_ROWS) this.decideSniffedColumn();
      return;
    }
    this.firstLine(raw, no);
  }

  private firstLine(raw: string, no: number): void {
    this.delimiter = this.opts.delimiter ?? detectDelimiter(raw);
    this.decimalComma = this.opts.decimalComma ?? this.delimiter !== ',';
    const dl = this.delimiter;
    this.fastDelimiter = dl === ',' || dl === ';' || dl === '\t' ? dl.charCodeAt(0) : -1;
    const fields = splitLine(raw, this.delimiter);
    let anyNumber = false;
    for (const f of fields) {
      if (f.trim() === '') continue;
      if (!Number.isNaN(parseHistoryNumber(f, this.decimalComma))) {
        anyNumber = true;
        break;
      }
    }
    this.fieldCount = fields.length;
    if (!anyNumber) {
      this.header = fields.map(unquote);
      this.phase = 'data';
      this.resolveColumn(no);
      return;
    }
    // No header: this line is data.
    const col = this.opts.column;
    if (col === undefined && fields.length > 1) {
      this.phase = 'sniff';
      this.sniffRows.push({ line: raw, no });
      return;
    }
    this.phase = 'data';
    this.resolveColumn(no);
    if (!this.fatal) this.dataRow(raw, no);
  }

  /** Chooses the column from `opts.column`, the header and the field count. */
  private resolveColumn(no: number): void {
    const pick = this.pickColumn(no);
    if (typeof pick === 'string') this.missing(no, pick);
    else this.choose(pick.index, pick.why);
  }

  /** The column to read, or the description of the missing one. */
  private pickColumn(no: number): { index: number; why: string } | string {
    const col = this.opts.column;
    const n = this.fieldCount;
    const header = this.header;
    if (col === undefined) {
      if (n === 1) return { index: 0, why: 'the only column' };
      if (header) {
        const i = header.findIndex((h) => !isTimeColumnName(h));
        if (i >= 0) return { index: i, why: 'the first column that is not a time column' };
        this.report(no, 'csv-column', 'warning', 'Every column looks like a time column; reading the first.');
      }
      return { index: 0, why: 'the first column' };
    }
    if (typeof col === 'number') {
      if (Number.isInteger(col) && col >= 1 && col <= n) return { index: col - 1, why: 'as asked' };
      return `column ${col}`;
    }
    const wanted = col.trim();
    if (header) {
      const lower = wanted.toLowerCase();
      let i = header.findIndex((h) => h.trim().toLowerCase() === lower);
      if (i < 0) i = header.findIndex((h) => normaliseName(h) === normaliseName(wanted));
      if (i >= 0) return { index: i, why: 'as asked' };
    }
    if (/^\d+$/.test(wanted)) {
      const k = Number(wanted);
      if (k >= 1 && k <= n) return { index: k - 1, why: 'as asked' };
      return `column ${wanted}`;
    }
    return `column "${wanted}"`;
  }

  private choose(index: number, why: string): void {
    this.columnIndex = index;
    this.columnName = this.header?.[index] ?? `column ${index + 1}`;
    const n = this.fieldCount;
    // Plain UTF-8 is the rule and goes unsaid; any other encoding is named.
    const enc = this.encoding;
    const decoded = enc !== undefined && enc !== 'utf-8' ? ` Decoded as ${encodingName(enc)}.` : '';
    const detail =
      n > 1
        ? `Reading ${this.columnLabel()} of ${n} (${why}); delimiter ${delimiterName(this.delimiter)}${this.decimalComma ? ', decimal comma accepted' : ''}.${decoded}`
        : `Reading ${this.columnLabel()} (${why}).${decoded}`;
    this.report(0, 'csv-column', 'information', detail);
  }

  private missing(no: number, what: string): void {
    const n = this.fieldCount;
    const h = this.header;
    const shown = (name: string) => (name.length > 40 ? `${name.slice(0, 40)}...` : name);
    const available = h
      ? h
          .slice(0, COLUMNS_LISTED)
          .map((name, i) => `${i + 1}: "${shown(name)}"`)
          .join(', ') + (h.length > COLUMNS_LISTED ? `, ... (${h.length} in all)` : '')
      : `1 to ${n} (the file has no header row, so columns are chosen by number)`;
    this.report(
      no,
      'csv-column-missing',
      'error',
      `The history has no ${what}. Available columns: ${available}.`,
    );
    this.fatal = true;
    this.phase = 'fatal';
  }

  private decideSniffedColumn(): void {
    const rows = this.sniffRows;
    this.sniffRows = [];
    let timeFirst = false;
    if (rows.length > 0) {
      const firsts = rows.map((r) =>
        parseHistoryNumber(fieldAt(r.line, 0, this.delimiter), this.decimalComma),
      );
      if (Number.isNaN(firsts[0])) timeFirst = true;
      else if (firsts.length >= 2) {
        timeFirst = true;
        for (let i = 1; i < firsts.length; i++) {
          if (!(firsts[i] > firsts[i - 1])) {
            timeFirst = false;
            break;
          }
        }
      }
    }
    this.phase = 'data';
    this.columnIndex = timeFirst ? 1 : 0;
    this.choose(
      this.columnIndex,
      timeFirst
        ? 'no header; column 1 rises strictly or holds time stamps, so it is taken as time'
        : 'no header; column 1 is not a time column',
    );
    for (const r of rows) this.dataRow(r.line, r.no);
  }

  private dataRow(raw: string, no: number): void {
    const field = fieldAt(raw, this.columnIndex, this.delimiter);
    const x = parseHistoryNumber(field, this.decimalComma);
    if (!Number.isFinite(x)) {
      // Blank lines and comments are rare: look for them only when the row has no number.
      if (Number.isNaN(x)) {
        if (isBlank(raw)) {
          this.blank(no);
          return;
        }
        if (isComment(raw)) return;
      }
      this.badRow(no, field.trim(), x);
      return;
    }
    this.valueCount++;
    if (this.opts.onValue !== undefined) this.opts.onValue(x, no);
  }

  /**
   * A row whose value cannot be read as a finite load: an error with its line. It is left
   * out of the count, and a user of the numbers must not act on a history with such rows
   * (`badRowCount > 0`): a lost sample may be the largest load of the history.
   */
  private badRow(no: number, shown: string, x: number): void {
    this.badRowCount++;
    const nonFinite = !Number.isNaN(x) || NON_FINITE_WORD_RE.test(shown);
    if (nonFinite) this.nonFiniteRowCount++;
    if (this.badRowCount > this.maxRowReports) return;
    const quoted = `"${shown.length > 40 ? `${shown.slice(0, 40)}...` : shown}" in ${this.columnLabel()}`;
    if (!nonFinite) {
      const msg =
        shown === ''
          ? `No value in ${this.columnLabel()}; row skipped.`
          : `${quoted} is not a number; row skipped.`;
      this.report(no, 'csv-non-numeric', 'error', msg);
      return;
    }
    const why = Number.isNaN(x)
      ? 'is not a finite number (a logger writes it for a lost or saturated sample)'
      : 'is beyond the largest number there is (about 1.8e308)';
    this.report(no, 'history-non-finite', 'error', `${quoted} ${why}; row skipped.`);
  }

  /** A line longer than `MAX_LINE`: skipped unread, an error like a row without a number. */
  private longLine(length: number): void {
    const no = ++this.lineCount;
    this.badRowCount++;
    if (this.badRowCount > this.maxRowReports) return;
    const head = this.overlongHead.replace(/[^\x20-\x7e]/g, '?');
    this.overlongHead = '';
    this.report(
      no,
      'history-line-too-long',
      'error',
      `Line ${no} has ${length} characters (it starts "${head}..."), more than the ${MAX_LINE} a history line may have: a history has one sample per line; the line is skipped.`,
    );
  }

  private blank(no: number): void {
    if (this.blankLineCount === 0) this.firstBlankLine = no;
    this.blankLineCount++;
  }

  private columnLabel(): string {
    if (this.columnIndex < 0) return 'the load column';
    return this.header
      ? `column ${this.columnIndex + 1} "${this.columnName}"`
      : `column ${this.columnIndex + 1}`;
  }

  private report(line: number, code: string, severity: HistoryIssue['severity'], message: string): void {
    const issue: HistoryIssue = { line, message, code, severity };
    this.issues.push(issue);
    if (this.opts.onIssue !== undefined) this.opts.onIssue(issue);
  }
}

/** The field at a 0-based index ('' when the row is shorter); fast path without splitting. */
function fieldAt(line: string, index: number, delimiter: HistoryDelimiter): string {
  if (delimiter === 'none') return index === 0 ? line : '';
  if (delimiter === 'whitespace' || line.indexOf('"') >= 0) {
    const fields = splitLine(line, delimiter);
    return index < fields.length ? fields[index] : '';
  }
  let start = 0;
  for (let i = 0; i < index; i++) {
    const next = line.indexOf(delimiter, start);
    if (next < 0) return '';
    start = next + 1;
  }
  const end = line.indexOf(delimiter, start);
  return end < 0 ? line.slice(start) : line.slice(start, end);
}

function isBlank(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c !== 32 && c !== 9 && c !== 13 && c !== 44 && c !== 59) return false; // spaces, tabs, lone delimiters
  }
  return true;
}

function isComment(s: string): boolean {
  return s.trimStart().startsWith('#');
}

function delimiterName(d: HistoryDelimiter): string {
  switch (d) {
    case ',':
      return 'comma';
    case ';':
      return 'semicolon';
    case '\t':
      return 'tab';
    case 'whitespace':
      return 'spaces';
    default:
      return 'none';
  }
}
