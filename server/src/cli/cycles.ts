/**
 * `fatigue-notes cycles FILE.csv [--column N|NAME] [--format text|json] [--gate RANGE] [--bins N]`
 *
 * Rainflow-counts one column of a load history (ASTM E1049-85 (2017) 5.4.4, three-point
 * rules, residue counted as half cycles) with the core's streaming counter. The file is read
 * in 64 KiB chunks and the output is written as it is produced, so memory stays bounded
 * whatever the size of the file. With --bins the histogram's limits are fixed by the
 * history's extremes, known only at its end: the cycles are kept (16 bytes and a count each)
 * and binned at the end, in one pass over the file; a history of more than `KEPT_CYCLES`
 * cycles is read a second time to bin them, so that memory stays bounded.
 *
 * Output, in the history's units:
 * - json: `{ "cycles": [ { "range": R, "mean": M, "count": 0.5 | 1 } ... ], "summary": {...},
 *   "issues": [...] }` (plus `"histogram"` with --bins), the contract's shape extended.
 * - text: a table of the cycles in counting order and the totals; with --bins the non-empty
 *   range-mean bins instead of the cycles.
 *
 * Exit codes: 0 counted, no error; 1 data errors: a missing column (the available columns
 * are listed), fewer than three points, values so far apart that their range overflows
 * (about 1.8e308: counting stops at that line), or rows whose value is not a finite number (a word,
 * `nan`, `inf`, `1e309`: each reported on stderr with its line; those rows are skipped and
 * the rest is still counted and printed, so that one bad row does not hide the rest, but
 * the count is incomplete, a lost sample may be the largest load, and the exit code fails
 * a CI job), or a history past the command line's budget (`historyLimits.ts`: 120 s of
 * reading, 1 GiB; `history-time-budget`, `history-too-large`); 2 usage error or unreadable file.
 */
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import {
  HistoryCsvReader,
  type HistoryIssue,
  histogramLimitsFor,
  RAINFLOW_SOURCE,
  RainflowCounter,
  type RainflowResult,
  RangeMeanHistogram,
} from '@fatigue-notes/core/src/rainflow';
import { CLI_HISTORY_LIMITS, type HistoryLimits } from './historyLimits';
import type { Io } from './io';

const USAGE =
  'usage: fatigue-notes cycles FILE.csv [--column N|NAME] [--format text|json] [--gate RANGE] [--bins N]\n';
const CHUNK = 64 * 1024;
const FLUSH_AT = 64 * 1024;
/** Cycles kept for the histogram of one pass (about 34 MB); more are binned in a second pass. */
const KEPT_CYCLES = 1 << 21;

/** The cycles of a history, kept until the histogram's limits are known (at most `KEPT_CYCLES`). */
class KeptCycles {
  range = new Float64Array(1 << 16);
  mean = new Float64Array(1 << 16);
  full = new Uint8Array(1 << 16);
  length = 0;
  /** More cycles than `KEPT_CYCLES`: none is kept, the file is read again. */
  overflowed = false;
  add(range: number, mean: number, count: number): void {
    if (this.overflowed) return;
    const n = this.length;
    if (n === this.range.length) {
      if (n >= KEPT_CYCLES) {
        this.overflowed = true;
        this.range = new Float64Array(0);
        this.mean = new Float64Array(0);
        this.full = new Uint8Array(0);
        return;
      }
      this.range = grow(this.range, 2 * n);
      this.mean = grow(this.mean, 2 * n);
      const f = new Uint8Array(2 * n);
      f.set(this.full);
      this.full = f;
    }
    this.range[n] = range;
    this.mean[n] = mean;
    this.full[n] = count === 1 ? 1 : 0;
    this.length = n + 1;
  }
  into(h: RangeMeanHistogram): void {
    for (let i = 0; i < this.length; i++) h.add(this.range[i], this.mean[i], this.full[i] === 1 ? 1 : 0.5);
  }
}

function grow(a: Float64Array, n: number): Float64Array<ArrayBuffer> {
  const b = new Float64Array(n);
  b.set(a);
  return b;
}

interface CyclesArgs {
  file: string;
  column?: string;
  format: 'text' | 'json';
  gate: number;
  bins?: number;
}

function parseArgs(args: string[]): CyclesArgs | { error: string } | { help: true } {
  let file: string | undefined;
  let column: string | undefined;
  let format: 'text' | 'json' = 'text';
  let gate = 0;
  let bins: number | undefined;
  for (let i = 0; i < args.length; i++) {
    let arg = args[i];
    let value: string | undefined;
    if (arg === '-h' || arg === '--help') return { help: true };
    if (arg.startsWith('--') && arg.includes('=')) {
      value = arg.slice(arg.indexOf('=') + 1);
      arg = arg.slice(0, arg.indexOf('='));
    }
    const take = (): string | undefined => {
      if (value !== undefined) return value;
      if (i + 1 >= args.length) return undefined;
      return args[++i];
    };
    switch (arg) {
      case '--column': {
        const v = take();
        if (v === undefined || v.trim() === '')
          return { error: '--column needs a column name or a 1-based index' };
        column = v;
        break;
      }
      case '--format': {
        const v = take();
        if (v !== 'text' && v !== 'json')
          return { error: `--format must be text or json${v ? `, not "${v}"` : ''}` };
        format = v;
        break;
      }
      case '--gate': {
        const v = take();
        const g = v === undefined ? Number.NaN : Number(v);
        if (v === undefined || v.trim() === '' || !Number.isFinite(g) || g < 0) {
          return { error: '--gate needs a range >= 0 in the units of the history' };
        }
        gate = g;
        break;
      }
      case '--bins': {
        const v = take();
        const n = v === undefined ? Number.NaN : Number(v);
        if (!Number.isInteger(n) || n < 1 || n > 1000)
          return { error: '--bins needs a whole number from 1 to 1000' };
        bins = n;
        break;
      }
      default:
        if (arg.startsWith('-') && arg !== '-') return { error: `unknown option "${arg}"` };
        if (file !== undefined) return { error: 'give exactly one history file' };
        file = arg;
    }
  }
  if (file === undefined) return { error: 'give the history file to count' };
  return { file, column, format, gate, bins };
}

/** Collects output text and hands it to `write` in pieces of about 64 KiB. */
class Output {
  private text = '';
  /** True when the last write was refused room: the reader waits for the pipe to drain. */
  full = false;
  constructor(private readonly write: (s: string) => unknown) {}
  put(s: string): void {
    this.text += s;
    if (this.text.length >= FLUSH_AT) this.flush();
  }
  flush(): void {
    if (this.text.length === 0) return;
    this.full = this.write(this.text) === false;
    this.text = '';
  }
}

class ReadFailure extends Error {}

/** The command line's budget for the history (`historyLimits.ts`): time over all passes, bytes per pass. */
class Budget {
  private readonly t0: number;
  exceeded?: HistoryIssue;
  constructor(
    private readonly file: string,
    private readonly limits: HistoryLimits,
    private readonly clock: () => number,
  ) {
    this.t0 = clock();
  }
  /** False (and `exceeded` set) when a pass that has read `bytes` so far must stop. */
  allows(bytes: number): boolean {
    if (this.exceeded) return false;
    if (bytes > this.limits.bytes) this.exceeded = this.tooLarge();
    else if (this.clock() - this.t0 > this.limits.ms)
      this.exceeded = {
        line: 0,
        code: 'history-time-budget',
        severity: 'error',
        message: `Reading ${this.file} took more than ${(this.limits.ms / 1000).toFixed(1)} s, the command line's budget for a history: counting stopped there and the count is incomplete (split the file into parts and count each).`,
      };
    return this.exceeded === undefined;
  }
  tooLarge(): HistoryIssue {
    return {
      line: 0,
      code: 'history-too-large',
      severity: 'error',
      message: `${this.file} is larger than ${Number((this.limits.bytes / 1048576).toPrecision(4))} MiB, the command line's budget for a history file: it is not counted whole (split it into parts and count each).`,
    };
  }
}

/** Streams the file through the reader; stops early when the reader gives up or the budget is spent. */
async function feedFile(
  path: string,
  reader: HistoryCsvReader,
  budget: Budget,
  backpressure?: { out: Output; drain?: () => Promise<void> },
): Promise<void> {
  // Bytes, not text: the reader decodes them (UTF-8, UTF-16 with or without a byte-order mark).
  const stream = createReadStream(path, { highWaterMark: CHUNK });
  let bytes = 0;
  try {
    for await (const chunk of stream) {
      bytes += (chunk as Buffer).length;
      if (!budget.allows(bytes)) break;
      reader.feed(chunk as Buffer);
      if (reader.fatal) break;
      // A slow consumer of the output (a pipe) must not make the output pile up in memory.
      if (backpressure?.out.full && backpressure.drain) {
        await backpressure.drain();
        backpressure.out.full = false;
      }
    }
  } catch (e) {
    throw new ReadFailure((e as Error).message);
  } finally {
    stream.destroy();
  }
  if (!budget.exceeded) reader.end();
}

/** Shortest readable form of a number for the text table (6 significant digits). */
function fmt(x: number): string {
  if (x === 0) return '0';
  const s = Number(x.toPrecision(6)).toString();
  return s;
}

function issueLine(file: string, i: HistoryIssue): string {
  return `${file}${i.line > 0 ? `:${i.line}` : ''}: ${i.severity}: ${i.message} [${i.code}]\n`;
}

export async function runCyclesCommand(args: string[], io: Io): Promise<number> {
  const parsed = parseArgs(args);
  if ('help' in parsed) {
    io.stdout(USAGE);
    return 0;
  }
  if ('error' in parsed) {
    io.stderr(`fatigue-notes cycles: ${parsed.error}\n${USAGE}`);
    return 2;
  }
  const { file, column, format, gate, bins } = parsed;
  const path = resolve(io.cwd, file);
  const budget = new Budget(
    file,
    io.historyLimits ?? CLI_HISTORY_LIMITS,
    io.clock ?? (() => performance.now()),
  );
  try {
    const st = await stat(path);
    if (!st.isFile()) {
      io.stderr(`fatigue-notes cycles: ${file} is not a file\n`);
      return 2;
    }
    if (!budget.allows(st.size)) {
      io.stderr(issueLine(file, budget.exceeded as HistoryIssue));
      return 1;
    }
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    io.stderr(
      `fatigue-notes cycles: cannot read ${file}: ${code === 'ENOENT' ? 'no such file' : (e as Error).message}\n`,
    );
    return 2;
  }

  try {
    const out = new Output(io.stdout);
    // With --bins: the extremes of every sample read (they bound every range and mean) and the cycles.
    let lo = Number.POSITIVE_INFINITY;
    let hi = Number.NEGATIVE_INFINITY;
    const kept = bins !== undefined ? new KeptCycles() : undefined;
    let histogram: RangeMeanHistogram | undefined;
    let started = false;
    let rows = 0;
    let reader: HistoryCsvReader;
    const title = () =>
      `Rainflow cycles of ${file}, ${reader.header ? `column ${reader.columnIndex + 1} "${reader.columnName}"` : `column ${reader.columnIndex + 1}`}` +
      `${gate > 0 ? `, gate ${fmt(gate)}` : ''} (ASTM E1049-85 (2017) 5.4.4; residue counted as half cycles)\n`;
    const start = () => {
      started = true;
      if (format === 'json') out.put('{"cycles":[');
      else {
        out.put(title());
        if (!kept) out.put(`${'range'.padStart(14)}${'mean'.padStart(14)}${'count'.padStart(7)}\n`);
      }
    };
    const onCycle = (range: number, mean: number, count: number) => {
      if (!started) start();
      if (kept) kept.add(range, mean, count);
      if (format === 'json') {
        out.put(
          `${rows === 0 ? '\n' : ',\n'}{"range":${JSON.stringify(range)},"mean":${JSON.stringify(mean)},"count":${count}}`,
        );
      } else if (!kept) {
        out.put(`${fmt(range).padStart(14)}${fmt(mean).padStart(14)}${String(count).padStart(7)}\n`);
      }
      rows++;
    };
    const counter = new RainflowCounter({ gate, onCycle });
    // The line of the first sample the counter refused (it stops on a spread that overflows).
    let stopLine = 0;
    reader = new HistoryCsvReader({
      column,
      onValue: (x, line) => {
        if (x < lo) lo = x;
        if (x > hi) hi = x;
        if (!counter.push(x) && stopLine === 0) stopLine = line;
      },
    });
    await feedFile(path, reader, budget, { out, drain: io.drain });

    const issues = [...reader.issues];
    if (budget.exceeded) issues.push(budget.exceeded);
    if (reader.fatal) {
      for (const i of issues) if (i.severity !== 'information') io.stderr(issueLine(file, i));
      return 1;
    }
    const result = counter.finish(); // counts the residue through onCycle
    // (A spread that overflows gets no histogram: the count stopped with an error; nor does
    // a history past the budget, whose count is incomplete.)
    if (kept && !budget.exceeded && !reader.fatal && lo <= hi && hi - lo <= Number.MAX_VALUE) {
      histogram = new RangeMeanHistogram(histogramLimitsFor(lo, hi, bins as number));
      if (!kept.overflowed) kept.into(histogram);
      else {
        // Too many cycles to keep: count the file again into the histogram alone.
        const h = histogram;
        const again = new RainflowCounter({ gate, onCycle: (r, m, c) => h.add(r, m, c) });
        const scan = new HistoryCsvReader({ column, onValue: (x) => again.push(x) });
        await feedFile(path, scan, budget);
        if (budget.exceeded) {
          histogram = undefined;
          issues.push(budget.exceeded);
        } else again.finish();
      }
    }
    for (const n of result.notes) {
      if (!issues.some((i) => i.code === n.code)) {
        issues.push({
          line: n.code === 'history-overflow' ? stopLine : 0,
          code: n.code,
          message: n.message,
          severity: n.severity === 'error' ? 'error' : 'warning',
        });
      }
    }
    if (!started) start();
    if (format === 'json') writeJsonTail(out, file, reader, result, gate, histogram, issues, rows);
    else writeTextTail(out, reader, result, histogram);
    out.flush();
    for (const i of issues) if (i.severity !== 'information') io.stderr(issueLine(file, i));
    return issues.some((i) => i.severity === 'error') ? 1 : 0;
  } catch (e) {
    if (e instanceof ReadFailure) {
      io.stderr(`fatigue-notes cycles: cannot read ${file}: ${e.message}\n`);
      return 2;
    }
    throw e;
  }
}

function summaryOf(file: string, reader: HistoryCsvReader, r: RainflowResult, gate: number) {
  return {
    file,
    column: reader.header ? reader.columnName : reader.columnIndex + 1,
    columnIndex: reader.columnIndex + 1,
    samples: r.sampleCount,
    skippedRows: reader.badRowCount,
    turningPoints: r.turningPointCount,
    fullCycles: r.fullCycles,
    halfCycles: r.halfCycles,
    totalCycles: r.totalCycles,
    maxRange: r.maxRange,
    min: r.min,
    max: r.max,
    gate,
    method: RAINFLOW_SOURCE,
  };
}

function writeJsonTail(
  out: Output,
  file: string,
  reader: HistoryCsvReader,
  r: RainflowResult,
  gate: number,
  histogram: RangeMeanHistogram | undefined,
  issues: HistoryIssue[],
  rows: number,
): void {
  out.put(rows > 0 ? '\n],\n' : '],\n');
  out.put(`"summary":${JSON.stringify(summaryOf(file, reader, r, gate))},\n`);
  if (histogram) {
    out.put(
      `"histogram":${JSON.stringify({
        rangeEdges: histogram.rangeEdges(),
        meanEdges: histogram.meanEdges(),
        counts: histogram.matrix(),
      })},\n`,
    );
  }
  out.put(`"issues":${JSON.stringify(issues)}}\n`);
}

function writeTextTail(
  out: Output,
  reader: HistoryCsvReader,
  r: RainflowResult,
  histogram: RangeMeanHistogram | undefined,
): void {
  if (histogram) {
    out.put(
      `${'range from'.padStart(14)}${'range to'.padStart(14)}${'mean from'.padStart(14)}${'mean to'.padStart(14)}${'cycles'.padStart(10)}\n`,
    );
    for (const b of histogram.nonEmpty()) {
      out.put(
        `${fmt(b.rangeLow).padStart(14)}${fmt(b.rangeHigh).padStart(14)}${fmt(b.meanLow).padStart(14)}${fmt(b.meanHigh).padStart(14)}${fmt(b.count).padStart(10)}\n`,
      );
    }
  }
  const plural = (n: number, w: string) => `${fmt(n)} ${w}${n === 1 ? '' : 's'}`;
  out.put(
    `Totals: ${plural(r.sampleCount, 'sample')}, ${plural(r.turningPointCount, 'turning point')}; ` +
      `${plural(r.fullCycles, 'full cycle')} + ${plural(r.halfCycles, 'half cycle')} = ${plural(r.totalCycles, 'cycle')}; ` +
      `largest range ${fmt(r.maxRange)}; min ${fmt(r.min)}, max ${fmt(r.max)}.\n`,
  );
  if (reader.badRowCount > 0)
    out.put(
      `${plural(reader.badRowCount, 'row')} without a finite number skipped (see stderr): the count is incomplete.\n`,
    );
  if (reader.blankLineCount > 0) out.put(`${plural(reader.blankLineCount, 'blank line')} skipped.\n`);
}
