// Rainflow benchmark: counting throughput on 10 million samples in memory and from a
// 10-million-row CSV, and the peak memory while a 1 GB CSV is streamed from disk and
// counted (goal: at most 200 MB). Prints a table; with --json the last stdout line is the
// rows as JSON for scripts/bench.mjs.
//
// The core's rainflow module (shared-core/src/rainflow) is bundled on the fly with esbuild.
// The CSV files are generated once into os.tmpdir()/fatigue-notes-bench and reused (the
// 1 GB file takes a minute or so to write the first time). Generated data: a seeded,
// mean-reverting random walk (deterministic), not a measured load.
//
// Also: `fatigue-notes cycles --format json --bins 64` on a 1e6-row CSV beside a pure-Python
// rainflow script of the project's own (scripts/bench/rainflow_peer.py, standard library
// only) reading the same file, interleaved runs, medians (goal: at least 10x faster).
//
// The 1 GB case runs only with BENCH_1GB=1 (writing the file takes a minute or more the
// first time); without it the table says it was skipped.
//
// Usage: node scripts/bench-rainflow.mjs [--json] [--skip-1gb]
import { spawn, spawnSync } from 'node:child_process';
import {
  closeSync,
  createReadStream,
  existsSync,
  mkdirSync,
  openSync,
  readFileSync,
  renameSync,
  statSync,
  writeSync,
} from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const DATA = join(tmpdir(), 'fatigue-notes-bench');
const TEN_M = 10_000_000;
const ONE_GB = 1024 ** 3;
const MB = 1024 * 1024;
const SAMPLE_MS = 20;

/** Bundles the core's rainflow module into a CommonJS file (path returned). */
async function bundleCore() {
  const { build } = await import('esbuild');
  mkdirSync(DATA, { recursive: true });
  const out = join(DATA, 'rainflow-core.cjs');
  await build({
    stdin: {
      contents: "export * from './shared-core/src/rainflow/index.ts';",
      resolveDir: ROOT,
      loader: 'ts',
    },
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    outfile: out,
    logLevel: 'error',
  });
  return out;
}

/** mulberry32, a small seeded generator. */
function prng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A mean-reverting random walk with a slow sine: many reversals of every size. */
function signal(seed) {
  const r = prng(seed);
  let x = 0;
  let i = 0;
  return () => {
    x = 0.97 * x + (r() - 0.5) * 2;
    i++;
    return x + 20 * Math.sin(i * 1e-4);
  };
}

/** Writes `rows` data rows (or until `bytes`) of `time,load` to `path`, unless it exists. */
function ensureCsv(path, { rows = Number.POSITIVE_INFINITY, bytes = Number.POSITIVE_INFINITY }) {
  if (existsSync(path)) return;
  const tmp = `${path}.part`;
  const fd = openSync(tmp, 'w');
  const next = signal(1049);
  let written = 0;
  let n = 0;
  const header = 'time [s],load [kN]\n';
  writeSync(fd, header);
  written += header.length;
  const parts = [];
  let size = 0;
  while (n < rows && written + size < bytes) {
    const line = `${(n * 0.001).toFixed(3)},${next().toFixed(4)}\n`;
    parts.push(line);
    size += line.length;
    n++;
    if (size >= 4 * MB) {
      writeSync(fd, parts.join(''));
      written += size;
      parts.length = 0;
      size = 0;
    }
  }
  if (parts.length > 0) writeSync(fd, parts.join(''));
  closeSync(fd);
  renameSync(tmp, path);
}

/** Counts a CSV streamed from disk with the bundled core; samples this process's memory. */
async function countCsv(core, path) {
  const peak = { rss: 0, heapUsed: 0, external: 0, arrayBuffers: 0 };
  const sample = () => {
    const m = process.memoryUsage();
    for (const k of Object.keys(peak)) if (m[k] > peak[k]) peak[k] = m[k];
  };
  const timer = setInterval(sample, SAMPLE_MS);
  const counter = new core.RainflowCounter();
  const reader = new core.HistoryCsvReader({ column: 2, onValue: (x) => counter.push(x) });
  const t0 = process.hrtime.bigint();
  for await (const chunk of createReadStream(path, { encoding: 'utf8', highWaterMark: 64 * 1024 })) {
    reader.feed(chunk);
  }
  reader.end();
  const res = counter.finish();
  const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
  clearInterval(timer);
  sample();
  return { rows: reader.valueCount, cycles: res.totalCycles, residue: res.residue.length, seconds, peak };
}

/** Peak RSS of a child process: VmRSS sampled from /proc, and the kernel's VmHWM. */
function runMeasured(args) {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, args, { stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout.on('data', (d) => {
      out += d;
      if (out.length > MB) out = out.slice(-MB);
    });
    let rss = 0;
    let hwm = 0;
    const poll = () => {
      try {
        const s = readFileSync(`/proc/${child.pid}/status`, 'utf8');
        const r = /VmRSS:\s+(\d+) kB/.exec(s);
        const h = /VmHWM:\s+(\d+) kB/.exec(s);
        if (r) rss = Math.max(rss, Number(r[1]) * 1024);
        if (h) hwm = Math.max(hwm, Number(h[1]) * 1024);
      } catch {
        // the process has ended, or /proc is not there
      }
    };
    const timer = setInterval(poll, SAMPLE_MS);
    const t0 = process.hrtime.bigint();
    child.on('error', fail);
    child.on('exit', (code) => {
      clearInterval(timer);
      done({ code, out, rss, hwm, seconds: Number(process.hrtime.bigint() - t0) / 1e9 });
    });
  });
}

async function childMode(corePath, csvPath) {
  const core = createRequire(import.meta.url)(corePath);
  const r = await countCsv(core, csvPath);
  process.stdout.write(`${JSON.stringify(r)}\n`);
}

async function main() {
  const json = process.argv.includes('--json');
  const skip1gb = process.argv.includes('--skip-1gb') || process.env.BENCH_1GB !== '1';
  const log = (s) => process.stderr.write(`${s}\n`);
  const rows = [];
  const add = (figure, value, unit, goal) => rows.push({ figure, value, unit, ...(goal ? { goal } : {}) });

  const corePath = await bundleCore();
  const core = createRequire(import.meta.url)(corePath);

  // 0. One million rows: the command line beside the Python peer, whole processes, same file.
  {
    const csv1m = join(DATA, 'rows-1M.csv');
    log('rainflow: cycles --format json --bins 64 on a 1e6-row CSV, beside the Python peer ...');
    ensureCsv(csv1m, { rows: 1_000_000 });
    const cli = join(ROOT, 'server/bin/fatigue-notes.js');
    const peer = join(ROOT, 'scripts/bench/rainflow_peer.py');
    const hasPython = spawnSync('python3', ['-c', '0']).status === 0;
    const wall = (cmd, args) => {
      const t = process.hrtime.bigint();
      const r = spawnSync(cmd, args, { stdio: ['ignore', 'ignore', 'pipe'] });
      if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')}: exit ${r.status}\n${r.stderr}`);
      return Number(process.hrtime.bigint() - t) / 1e9;
    };
    const ours = [];
    const theirs = [];
    for (let k = 0; k < 3; k++) {
      ours.push(
        wall(process.execPath, [cli, 'cycles', csv1m, '--column', '2', '--format', 'json', '--bins', '64']),
      );
      if (hasPython) theirs.push(wall('python3', [peer, csv1m, '64']));
    }
    const med = (xs) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];
    const r = await runMeasured([cli, 'cycles', csv1m, '--column', '2', '--format', 'json', '--bins', '64']);
    add('1e6-row CSV, CLI cycles --format json --bins 64: time', med(ours), 's');
    add('1e6-row CSV, same: peak RSS (VmHWM)', r.hwm / MB, 'MiB');
    if (hasPython) {
      const ratio = med(theirs) / med(ours);
      add('1e6-row CSV, peer: pure-Python E1049 rainflow script, same output', med(theirs), 's');
      add(
        '1e6-row CSV, peer time / CLI time',
        ratio,
        'x',
        `>= 10x faster: ${ratio >= 10 ? 'met' : `not met (${(10 / ratio).toFixed(1)}x short)`}`,
      );
    } else add('1e6-row CSV, Python peer: peer not installed (python3)', Number.NaN, '');
  }

  // 1. In memory: 10 million samples in a Float64Array.
  log('rainflow: 10 million samples in memory ...');
  const xs = new Float64Array(TEN_M);
  const next = signal(42);
  for (let i = 0; i < TEN_M; i++) xs[i] = next();
  let cycles = 0;
  const counter = new core.RainflowCounter({
    onCycle: (_r, _m, c) => {
      cycles += c;
    },
  });
  const t0 = process.hrtime.bigint();
  counter.pushMany(xs);
  const res = counter.finish();
  const s = Number(process.hrtime.bigint() - t0) / 1e9;
  add('10M samples in memory: counting time', s, 's');
  add('10M samples in memory: throughput', TEN_M / s / 1e6, 'M samples/s');
  if (Math.abs(cycles - res.totalCycles) > 1e-6)
    throw new Error('the onCycle counts do not add up to the total');
  add('10M samples in memory: cycles counted', res.totalCycles / 1e6, 'M cycles');

  // 2. A 10-million-row CSV streamed from disk, in this process.
  const csv10 = join(DATA, 'rows-10M.csv');
  log(`rainflow: 10-million-row CSV (${csv10}) ...`);
  ensureCsv(csv10, { rows: TEN_M });
  const size10 = statSync(csv10).size;
  const c10 = await countCsv(core, csv10);
  add('10M-row CSV streamed: counting time', c10.seconds, 's');
  add('10M-row CSV streamed: throughput', c10.rows / c10.seconds / 1e6, 'M rows/s');
  add('10M-row CSV streamed: read rate', size10 / MB / c10.seconds, 'MiB/s');

  // 3. The same file through the command line (`cycles --bins 20`: one pass, histogram out).
  log('rainflow: fatigue-notes cycles on the 10-million-row CSV ...');
  const cli = join(ROOT, 'server/bin/fatigue-notes.js');
  if (existsSync(join(ROOT, 'server/dist/cli.js'))) {
    const r = await runMeasured([cli, 'cycles', csv10, '--column', '2', '--bins', '20']);
    add('10M-row CSV, CLI cycles --bins 20: time', r.seconds, 's');
    add('10M-row CSV, CLI cycles --bins 20: peak RSS', r.hwm / MB, 'MiB');
  } else add('CLI not built (npm run build)', Number.NaN, '');

  // 4. Peak memory while a 1 GB CSV is streamed from disk and counted (fresh process).
  if (!skip1gb) {
    const csv1g = join(DATA, 'history-1GB.csv');
    log(`rainflow: 1 GB CSV (${csv1g}; written once, then reused) ...`);
    ensureCsv(csv1g, { bytes: ONE_GB });
    const size = statSync(csv1g).size;
    const r = await runMeasured([fileURLToPath(import.meta.url), '--child', corePath, csv1g]);
    const c = JSON.parse(r.out.trim().split('\n').pop());
    add(
      `1 GB CSV (${(size / 1e9).toFixed(2)} GB, ${(c.rows / 1e6).toFixed(1)}M rows) counted: time`,
      c.seconds,
      's',
    );
    add('1 GB CSV: read rate', size / MB / c.seconds, 'MiB/s');
    add('1 GB CSV: peak RSS, kernel VmHWM', r.hwm / MB, 'MiB', '<= 200 MB');
    add('1 GB CSV: peak RSS, sampled VmRSS', r.rss / MB, 'MiB', '<= 200 MB');
    add('1 GB CSV: peak RSS, process.memoryUsage', c.peak.rss / MB, 'MiB', '<= 200 MB');
    add('1 GB CSV: peak heap used, process.memoryUsage', c.peak.heapUsed / MB, 'MiB');
    add('1 GB CSV: residue held at the end', c.residue, 'points');
    if (existsSync(join(ROOT, 'server/dist/cli.js'))) {
      log('rainflow: fatigue-notes cycles --bins 20 on the 1 GB CSV ...');
      const q = await runMeasured([cli, 'cycles', csv1g, '--column', '2', '--bins', '20']);
      add('1 GB CSV, CLI cycles --bins 20 (2 passes: > 2^21 cycles): time', q.seconds, 's');
      add('1 GB CSV, CLI cycles --bins 20: peak RSS (VmHWM)', q.hwm / MB, 'MiB', '<= 200 MB');
    }
  } else
    add(
      '1 GB CSV: skipped (BENCH_1GB=1 runs it; writing the file takes a minute or more)',
      Number.NaN,
      '',
      '<= 200 MB',
    );

  if (json) {
    process.stdout.write(`${JSON.stringify(rows)}\n`);
    return;
  }
  const fmt = (x) => (Number.isFinite(x) ? (Math.abs(x) >= 100 ? x.toFixed(0) : x.toPrecision(3)) : 'n/a');
  const w = Math.max(...rows.map((r) => r.figure.length)) + 2;
  console.log(`${'figure'.padEnd(w)}${'value'.padStart(10)}  ${'unit'.padEnd(13)}goal`);
  for (const r of rows)
    console.log(`${r.figure.padEnd(w)}${fmt(r.value).padStart(10)}  ${r.unit.padEnd(13)}${r.goal ?? ''}`);
}

const i = process.argv.indexOf('--child');
if (i >= 0) await childMode(process.argv[i + 1], process.argv[i + 2]);
else await main();
