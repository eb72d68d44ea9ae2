import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCyclesCommand } from '../src/cli/cycles';
import type { Io } from '../src/cli/io';

const dir = mkdtempSync(join(tmpdir(), 'fatigue-cycles-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, text: string): string {
  writeFileSync(join(dir, name), text);
  return name;
}

async function run(args: string[]) {
  return runWith(args, {});
}

async function runWith(args: string[], extra: Partial<Io>) {
  let stdout = '';
  let stderr = '';
  let writes = 0;
  const code = await runCyclesCommand(args, {
    ...extra,
    stdout: (s) => {
      stdout += s;
      writes++;
    },
    stderr: (s) => {
      stderr += s;
    },
    cwd: dir,
  });
  return { code, stdout, stderr, writes };
}

/** ASTM E1049-85 (Reapproved 2017) Fig. 6 history, with a time column. */
const ASTM_CSV =
  'time [s];load [kN]\n' + [-2, 1, -3, 5, -1, 3, -4, 4, -2].map((x, i) => `${i},0;${x},0`).join('\n') + '\n';

describe('fatigue-notes cycles', () => {
  it('prints the contract JSON for the ASTM E1049-85 (2017) Fig. 6 example: ranges 3: 0.5, 4: 1.5, 6: 0.5, 8: 1, 9: 0.5', async () => {
    const f = file('astm.csv', ASTM_CSV);
    const r = await run([f, '--format', 'json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    const json = JSON.parse(r.stdout);
    const byRange = new Map<number, number>();
    for (const c of json.cycles) {
      expect(Object.keys(c)).toEqual(['range', 'mean', 'count']);
      expect([0.5, 1]).toContain(c.count);
      byRange.set(c.range, (byRange.get(c.range) ?? 0) + c.count);
    }
    expect([...byRange.entries()].sort((a, b) => a[0] - b[0])).toEqual([
      [3, 0.5],
      [4, 1.5],
      [6, 0.5],
      [8, 1],
      [9, 0.5],
    ]);
    expect(json.summary.column).toBe('load [kN]');
    expect(json.summary.totalCycles).toBe(4);
  });

  it('prints a readable table with totals', async () => {
    const f = file('astm2.csv', ASTM_CSV);
    const r = await run([f]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('column 2 "load [kN]"');
    expect(r.stdout).toContain(
      'Totals: 9 samples, 9 turning points; 1 full cycle + 6 half cycles = 4 cycles; largest range 9',
    );
    expect(r.stdout.split('\n').filter((l) => /^\s+\d/.test(l))).toHaveLength(7);
  });

  it('with --bins prints a range-mean histogram (text and json)', async () => {
    const f = file('astm3.csv', ASTM_CSV);
    const t = await run([f, '--bins', '3']);
    expect(t.code).toBe(0);
    expect(t.stdout).toContain('range from');
    const j = JSON.parse((await run([f, '--bins', '3', '--format=json'])).stdout);
    expect(j.histogram.rangeEdges).toEqual([0, 3, 6, 9]);
    const total = j.histogram.counts.flat().reduce((s: number, x: number) => s + x, 0);
    expect(total).toBe(4);
  });

  it('applies --gate and --column', async () => {
    const f = file('gate.csv', 't,a,b\n0,0,5\n1,10,-5\n2,9,5\n3,10,-5\n4,0,5\n');
    const j = JSON.parse((await run([f, '--column', 'a', '--gate', '2', '--format', 'json'])).stdout);
    expect(j.cycles.every((c: { range: number }) => c.range >= 2)).toBe(true);
    expect(j.summary.turningPoints).toBe(3);
    const b = JSON.parse((await run([f, '--column', '3', '--format', 'json'])).stdout);
    expect(b.summary.column).toBe('b');
    expect(b.summary.totalCycles).toBe(2);
  });

  it('exit 1 for a missing column, listing the available ones', async () => {
    const f = file('cols.csv', 'time,force\n0,1\n1,2\n2,3\n');
    const r = await run([f, '--column', 'torque']);
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('csv-column-missing');
    expect(r.stderr).toContain('1: "time", 2: "force"');
  });

  it('exit 1 for non-numeric rows (reported with their line, skipped, the rest counted) and for fewer than three points', async () => {
    const f = file('bad.csv', 'load\n1\n-1\noops\n2\n-2\n');
    const r = await run([f, '--format', 'json']);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('bad.csv:4: error:');
    const j = JSON.parse(r.stdout);
    expect(j.summary.samples).toBe(4);
    expect(
      j.issues.some((i: { code: string; line: number }) => i.code === 'csv-non-numeric' && i.line === 4),
    ).toBe(true);
    const few = await run([file('few.csv', 'load\n1\n2\n')]);
    expect(few.code).toBe(1);
    expect(few.stderr).toContain('history-too-few-points');
  });

  it('exit 2 for usage errors and unreadable files', async () => {
    expect((await run([])).code).toBe(2);
    expect((await run(['a.csv', '--format', 'xml'])).code).toBe(2);
    expect((await run(['a.csv', '--gate', '-1'])).code).toBe(2);
    expect((await run(['a.csv', '--bins', '0'])).code).toBe(2);
    expect((await run(['a.csv', '--frobnicate'])).code).toBe(2);
    const missing = await run(['no-such-file.csv']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('no such file');
    expect((await run(['.'])).code).toBe(2);
  });

  it('streams a large file: 1e6 rows, output written in many pieces', async () => {
    const lines: string[] = ['t,x'];
    for (let i = 0; i < 1_000_000; i++) lines.push(`${i},${Math.sin(i * 0.7) * 100 + (i % 7)}`);
    const f = file('big.csv', `${lines.join('\n')}\n`);
    const r = await run([f, '--format', 'json']);
    expect(r.code).toBe(0);
    expect(r.writes).toBeGreaterThan(10);
    const j = JSON.parse(r.stdout);
    expect(j.summary.samples).toBe(1_000_000);
    expect(j.cycles.reduce((s: number, c: { count: number }) => s + c.count, 0)).toBe(j.summary.totalCycles);
  });
});

describe('fatigue-notes cycles on samples that are not finite numbers (issue 16, item 1)', () => {
  it('exit 1 for 1e309, inf and nan rows, each named on stderr with its line; no null or Infinity printed', async () => {
    const f = file('nonfinite.csv', 'load\n1\n-1\n1e309\n2\ninf\n-2\nnan\n1\n');
    const j = await run([f, '--format', 'json']);
    expect(j.code).toBe(1);
    for (const line of [4, 6, 8]) expect(j.stderr).toContain(`nonfinite.csv:${line}: error:`);
    expect(j.stderr).toContain('[history-non-finite]');
    expect(j.stdout).not.toMatch(/null|Infinity|NaN/);
    const parsed = JSON.parse(j.stdout);
    expect(parsed.summary.skippedRows).toBe(3);
    expect(parsed.summary.samples).toBe(5);
    const t = await run([f]);
    expect(t.code).toBe(1);
    expect(t.stdout).toContain('3 rows without a finite number skipped');
    expect(t.stdout).not.toMatch(/Infinity|NaN/);
  });

  it('blank lines and a header row still exit 0', async () => {
    const r = await run([file('blank.csv', 'load [kN]\n\n1\n-1\n\n2\n-2\n\n')]);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
  });
});

describe('fatigue-notes cycles on values whose ranges overflow (issue 16, item 2)', () => {
  it('exit 1 with history-overflow at the line that overflows; never null, Infinity or NaN in JSON or text', async () => {
    const f = file('huge-range.csv', 'M\n0\n1.5e308\n-1.5e308\n1e308\n0\n');
    for (const args of [
      [f, '--format', 'json'],
      [f],
      [f, '--bins', '4'],
      [f, '--bins', '4', '--format', 'json'],
    ]) {
      const r = await run(args);
      expect(r.code, args.join(' ')).toBe(1);
      expect(r.stderr).toContain('huge-range.csv:4: error:');
      expect(r.stderr).toContain('[history-overflow]');
      expect(r.stdout).not.toMatch(/null|Infinity|NaN/);
      if (args.includes('json')) JSON.parse(r.stdout);
    }
  });

  it('values of one sign near 1e308 count without overflow (exit 0, finite means)', async () => {
    const r = await run([
      file('one-sign.csv', 'M\n1.5e308\n1.7e308\n1.6e308\n1.7e308\n1.5e308\n'),
      '--format',
      'json',
    ]);
    expect(r.code).toBe(0);
    expect(r.stdout).not.toMatch(/null|Infinity|NaN/);
    const j = JSON.parse(r.stdout);
    expect(j.summary.totalCycles).toBe(2);
  });
});

/** UTF-16 bytes of `text` (Unicode Standard, Sec. 3.10), with a byte-order mark unless `bom` is false. */
function utf16(text: string, bigEndian: boolean, bom = true): Buffer {
  const units = (bom ? '\uFEFF' : '') + text;
  const out = Buffer.alloc(units.length * 2);
  for (let i = 0; i < units.length; i++)
    bigEndian ? out.writeUInt16BE(units.charCodeAt(i), 2 * i) : out.writeUInt16LE(units.charCodeAt(i), 2 * i);
  return out;
}

describe('fatigue-notes cycles on encodings and line ends (issue 16, item 3)', () => {
  it('UTF-16 LE and BE, with and without a byte-order mark, and CR-only line ends count as the UTF-8 file does (ASTM E1049-85 (2017) Fig. 6)', async () => {
    const base = JSON.parse((await run([file('fig6-utf8.csv', ASTM_CSV), '--format', 'json'])).stdout);
    expect(base.summary.totalCycles).toBe(4);
    const variants: Array<[string, Buffer | string, string | undefined]> = [
      ['fig6-le.csv', utf16(ASTM_CSV, false), 'UTF-16 LE with a byte-order mark'],
      ['fig6-be.csv', utf16(ASTM_CSV, true), 'UTF-16 BE with a byte-order mark'],
      ['fig6-le-nobom.csv', utf16(ASTM_CSV, false, false), 'UTF-16 LE without a byte-order mark'],
      ['fig6-be-nobom.csv', utf16(ASTM_CSV, true, false), 'UTF-16 BE without a byte-order mark'],
      ['fig6-cr.csv', ASTM_CSV.replace(/\n/g, '\r'), undefined],
      ['fig6-crlf-le.csv', utf16(ASTM_CSV.replace(/\n/g, '\r\n'), false), 'UTF-16 LE with a byte-order mark'],
    ];
    for (const [name, body, named] of variants) {
      writeFileSync(join(dir, name), body);
      const r = await run([name, '--format', 'json']);
      expect(r.code, name).toBe(0);
      const j = JSON.parse(r.stdout);
      expect(j.cycles, name).toEqual(base.cycles);
      expect(j.summary.samples, name).toBe(9);
      const info = j.issues.find((i: { code: string }) => i.code === 'csv-column').message;
      if (named) expect(info, name).toContain(named);
    }
  });
});

describe('fatigue-notes cycles on giant lines and its budget (issue 16, item 4)', () => {
  it('a 64 MB history on one line: history-line-too-long on line 1, exit 1, in bounded memory', async () => {
    const name = 'one-line.csv';
    const piece = Buffer.from('1.25,-0.5,'.repeat(6554)); // 65,540 bytes
    const parts: Buffer[] = [];
    for (let n = 0; n < 64e6; n += piece.length) parts.push(piece);
    writeFileSync(join(dir, name), Buffer.concat(parts));
    parts.length = 0;
    const heap0 = process.memoryUsage().heapUsed;
    const r = await run([name, '--format', 'json']);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('one-line.csv:1: error:');
    expect(r.stderr).toContain('[history-line-too-long]');
    JSON.parse(r.stdout);
    // The file is never held: far less than its 64 MB (128 MB as text) stays on the heap.
    expect(process.memoryUsage().heapUsed - heap0).toBeLessThan(48 * 1024 * 1024);
    rmSync(join(dir, name));
  }, 60_000);

  it('a file above the byte budget: history-too-large, exit 1, nothing counted', async () => {
    const f = file('budget-bytes.csv', `load\n${'1\n-1\n'.repeat(500)}`);
    const r = await runWith([f, '--format', 'json'], { historyLimits: { ms: 1e9, bytes: 1000 } });
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('[history-too-large]');
    expect(r.stderr).toContain("the command line's budget");
  });

  it('reading past the time budget (a fake clock, 1 s per read): history-time-budget, exit 1, valid JSON', async () => {
    const f = file('budget-time.csv', `load\n${'1\n-1\n'.repeat(200_000)}`);
    let t = 0;
    const r = await runWith([f, '--format', 'json'], {
      historyLimits: { ms: 5000, bytes: 1e12 },
      clock: () => (t += 1000),
    });
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('[history-time-budget]');
    const j = JSON.parse(r.stdout);
    expect(j.issues.some((i: { code: string }) => i.code === 'history-time-budget')).toBe(true);
    expect(j.summary.samples).toBeLessThan(400_000);
  });
});
