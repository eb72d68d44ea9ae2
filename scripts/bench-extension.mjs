// Load time of the extension bundle (client/dist/extension.js): a fresh Node process
// requires it with a stand-in for the `vscode` module, as the extension host does before it
// calls activate(); beside bare `node -e 0` in the same run (medians). The whole activation
// in a real editor (activate() and the language server's start, from the extension's own
// log) is printed by the real-editor test (npm run test:editor). With --json the last stdout
// line is rows for scripts/bench.mjs.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname ?? new URL('.', import.meta.url).pathname, '..');
const BUNDLE = process.env.EXTENSION_BUNDLE ?? join(ROOT, 'client/dist/extension.js');
const RUNS = Number(process.env.BENCH_EXTENSION_RUNS ?? 9);
const json = process.argv.includes('--json');

// Every property of the stand-in is itself: callable, constructible, extendable.
const LOADER = `
const Module = require('node:module');
const any = new Proxy(function () {}, {
  get: (_t, k) => (k === Symbol.toPrimitive ? () => '' : k === 'then' ? undefined : any),
  apply: () => any,
  construct: () => any,
  // esbuild's ESM interop reads the module's prototype: it is the stand-in too.
  getPrototypeOf: () => any,
});
const load = Module._load;
Module._load = function (request, ...rest) {
  return request === 'vscode' ? any : load.call(this, request, ...rest);
};
const t0 = performance.now();
const ext = require(process.argv[1]);
const ms = performance.now() - t0;
if (typeof ext.activate !== 'function') throw new Error('no activate()');
process.stdout.write(String(ms));
`;

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];

function wall(args) {
  const t = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { cwd: ROOT, encoding: 'utf8' });
  const ms = Number(process.hrtime.bigint() - t) / 1e6;
  if (r.status !== 0)
    throw new Error(`exit ${r.status}: ${r.stderr.split('\n').slice(-12).join('\n').slice(-1500)}`);
  return { ms, out: r.stdout };
}

if (!existsSync(BUNDLE)) {
  if (json) console.log('[]');
  else console.log(`${BUNDLE} is not built (npm run build)`);
  process.exit(0);
}
const bare = [];
const whole = [];
const required = [];
for (let i = 0; i < RUNS; i++) {
  bare.push(wall(['-e', '0']).ms);
  const r = wall(['-e', LOADER, BUNDLE]);
  whole.push(r.ms);
  required.push(Number(r.out));
}
const rows = [
  { figure: 'extension bundle: require() (stand-in vscode)', value: median(required), unit: 'ms' },
  {
    figure: 'extension bundle: whole process, beside bare node',
    value: median(whole),
    unit: 'ms',
    peer: `bare node ${median(bare).toFixed(0)} ms`,
  },
];
if (json) console.log(JSON.stringify(rows));
else
  for (const r of rows)
    console.log(`${r.figure.padEnd(52)} ${r.value.toFixed(1).padStart(7)} ms  ${r.peer ?? ''}`);
