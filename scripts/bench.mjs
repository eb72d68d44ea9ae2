// `npm run bench`: one table of every figure the project tracks, each beside its goal or
// peer. Sections: core evaluation, start-up, extension bundle load, language server, notes at
// scale (1000 and 10,000 checks, many notes on worker threads), rainflow counting, hardening
// (10 MB note, edit storm; only with BENCH_HARDENING=1), bundle sizes. The 1 GB CSV runs only
// with BENCH_1GB=1.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';

const rows = [];
const add = (section, r) => rows.push({ section, ...r });

// Core figures, bundled on the fly (the core is TypeScript used from source).
const out = join(mkdtempSync(join(tmpdir(), 'fn-bench-')), 'core-bench.cjs');
await build({
  entryPoints: ['scripts/bench/coreBench.ts'],
  bundle: true,
  platform: 'node',
  format: 'cjs',
  outfile: out,
  logLevel: 'error',
});
process.stderr.write('bench: core ...\n');
const t0 = performance.now();
const coreRows = JSON.parse(execFileSync(process.execPath, [out], { encoding: 'utf8' }));
for (const r of coreRows) add('core', r);
// Peer of the per-check figure: the same stress-life check with pint quantities (Debian's
// python3-pint, in the system Python); "peer not installed" when it is missing.
{
  const ours = coreRows.find((r) => r.figure === 'evaluation per check (beyond Markdown)')?.value;
  const py = ['/usr/bin/python3', 'python3'].find((p) => spawnSync(p, ['-c', 'import pint']).status === 0);
  const r = py ? spawnSync(py, ['scripts/bench/pint_peer.py', '200'], { encoding: 'utf8' }) : undefined;
  const ms = r && r.status === 0 ? Number(r.stdout.trim()) : Number.NaN;
  if (Number.isFinite(ms)) {
    add('core', { figure: 'peer: Python + pint, same check', value: ms, unit: 'ms/check' });
    add('core', {
      figure: 'peer per check / ours per check',
      value: ms / ours,
      unit: 'x',
      goal: `>= 10x: ${ms / ours >= 10 ? 'met' : `not met (${(10 / (ms / ours)).toFixed(1)}x short)`}`,
    });
  } else
    add('core', {
      figure: 'peer: Python + pint: skipped, python3 with pint not installed (apt install python3-pint)',
      value: Number.NaN,
      unit: '',
    });
}

// Other sections write JSON rows on their last stdout line, when their scripts exist.
for (const [section, script, args] of [
  ['startup', 'scripts/bench-startup.mjs', ['--json']],
  ['extension', 'scripts/bench-extension.mjs', ['--json']],
  ['server', 'scripts/bench-lsp.mjs', ['--json']],
  ['scale', 'scripts/bench-scale.mjs', ['--json']],
  ['rainflow', 'scripts/bench-rainflow.mjs', ['--json']],
  ['hardening', 'scripts/bench-hardening.mjs', ['--json']],
]) {
  if (!existsSync(script)) continue;
  // The 10 MB note and the edit storm (issue 7) take minutes on a loaded machine.
  if (section === 'hardening' && process.env.BENCH_HARDENING !== '1') {
    add(section, {
      figure: 'skipped: set BENCH_HARDENING=1 (10 MB note, edit storm)',
      value: Number.NaN,
      unit: '',
    });
    continue;
  }
  process.stderr.write(`bench: ${section} ...\n`);
  const r = spawnSync(process.execPath, [script, ...args], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  const last = r.stdout.trim().split('\n').pop() ?? '';
  try {
    for (const row of JSON.parse(last)) add(section, row);
  } catch {
    add(section, { figure: `${script} did not report (exit ${r.status})`, value: Number.NaN, unit: '' });
    process.stderr.write(r.stderr);
  }
}

// Bundle sizes.
for (const f of [
  'server/dist/cli.js',
  'server/dist/cycles.js',
  'server/dist/check.js',
  'client/dist/extension.js',
  'client/dist/server.js',
]) {
  if (existsSync(f)) add('bundles', { figure: f, value: statSync(f).size / 1024, unit: 'KiB' });
}
for (const f of readdirSync('.').filter((n) => n.endsWith('.vsix')))
  add('bundles', { figure: f, value: statSync(f).size / 1024, unit: 'KiB' });

add('total', { figure: 'npm run bench, wall time', value: (performance.now() - t0) / 1000, unit: 's' });
const fmt = (x) => (Number.isFinite(x) ? (Math.abs(x) >= 100 ? x.toFixed(0) : x.toPrecision(3)) : 'n/a');
const w = Math.max(...rows.map((r) => r.figure.length)) + 2;
console.log(
  `${'section'.padEnd(10)}${'figure'.padEnd(w)}${'value'.padStart(12)}  ${'unit'.padEnd(9)}goal / peer`,
);
for (const r of rows)
  console.log(
    `${r.section.padEnd(10)}${r.figure.padEnd(w)}${fmt(r.value).padStart(12)}  ${r.unit.padEnd(9)}${[r.goal, r.peer].filter(Boolean).join('; ')}`,
  );
