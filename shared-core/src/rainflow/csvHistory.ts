/**
 * Incremental reader of load histories written by data loggers as CSV text. Pure: it gets
 * the text in chunks through `feed` (any chunk boundaries, even inside a line) and emits one
 * number per data row through `onValue`, so memory does not grow with the file. The server
 * reads the file in chunks and feeds it; nothing here touches a file system.
 *
 * The rules (common practice of logger files, no source):
 * - Lines end with LF or CRLF; a UTF-8 byte order mark at the start is dropped. Lines that
 *   start with `#` are comments. Blank lines are skipped and reported once (information).
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

const NUMBER_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const TIME_EXACT_RE = /^(?:t|s|ms|sec|secs|seconds)$/;
const TIME_PREFIX_RE = /^(?:time|zeit|temps|tiempo|timestamp|date|datetime|elapsed)(?:$|[\s_\-./:])/;
/** Words loggers write for a lost or saturated sample. */
const NON_FINITE_WORD_RE = /^"?[+-]?(?:nan|inf|infinity|1\.#inf|1\.#ind|1\.#qnan)"?$/i;
const UNIT_SUFFIX_RE = /\s*[[(][^\])]*[\])]\s*$/;
const TIME_SNIFF_ROWS = 16;

/** Parses one field as a number: NaN when it is not one. */
export function parseHistoryNumber(raw: string, decimalComma: boolean): number {
  let s = raw.trim();
  if (s.length >= 2 && s.charCodeAt(0) === 34 && s.charCodeAt(s.length - 1) === 34) s = s.slice(1, -1).trim();
  if (decimalComma && s.indexOf(',') >= 0) s = s.replace(',', '.');
  if (!NUMBER_RE.test(s)) return Number.NaN;
  return Number(s);
}

/** True for a header name that names a time column (see the rules above). */
export function isTimeColumnName(name: string): boolean {
  const n = normaliseName(name);
  return TIME_EXACT_RE.test(n) || TIME_PREFIX_RE.test(n);
}

function normaliseName(name: string): string {
  return unquote(name).replace(UNIT_SUFFIX_RE, '').trim().toLowerCase();
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

  private readonly opts: HistoryCsvOptions;
  private readonly maxRowReports: number;
  private phase: Phase = 'start';
  private pending = '';
  private firstChunk = true;
  private firstBlankLine = 0;
  private fieldCount = 0;
  private sniffRows: Array<{ line: string; no: number }> = [];
  private ended = false;

  constructor(opts: HistoryCsvOptions = {}) {
    this.opts = opts;
    this.maxRowReports = opts.maxRowReports ?? 100;
  }

  /** Feeds the next piece of the file's text. */
  feed(chunk: string): void {
    if (this.ended || this.fatal) return;
    let text = chunk;
    if (this.firstChunk && text.length > 0) {
      this.firstChunk = false;
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    }
    if (this.pending.length > 0) text = this.pending + text;
    let start = 0;
    for (;;) {
      const nl = text.indexOf('\n', start);
      if (nl < 0) break;
      let end = nl;
      if (end > start && text.charCodeAt(end - 1) === 13) end--;
      this.line(text.slice(start, end));
      if (this.fatal) {
        this.pending = '';
        return;
      }
      start = nl + 1;
    }
    this.pending = start < text.length ? text.slice(start) : '';
  }

  /** Ends the input: the last line without a newline, deferred decisions and summaries. */
  end(): void {
    if (this.ended) return;
    this.ended = true;
    if (!this.fatal && this.pending.length > 0) {
      let last = this.pending;
      if (last.charCodeAt(last.length - 1) === 13) last = last.slice(0, -1);
      this.pending = '';
      this.line(last);
    }
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
    const detail =
      n > 1
        ? `Reading ${this.columnLabel()} of ${n} (${why}); delimiter ${delimiterName(this.delimiter)}${this.decimalComma ? ', decimal comma accepted' : ''}.`
        : `Reading ${this.columnLabel()} (${why}).`;
    this.report(0, 'csv-column', 'information', detail);
  }

  private missing(no: number, what: string): void {
    const n = this.fieldCount;
    const available = this.header
      ? this.header.map((h, i) => `${i + 1}: "${h}"`).join(', ')
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
