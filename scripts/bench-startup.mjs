// Cold start of the command line and the language server, each beside bare `node -e 0`
// measured in the same run (medians of several whole-process runs). Times are this
// machine's, not assertions. With --json the last stdout line is rows for scripts/bench.mjs.
//
//   --version                 whole process
//   check, one-check note     whole process, text output
//   language server           spawn, initialize, didOpen -> first publishDiagnostics
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const ROOT = resolve(import.meta.dirname ?? new URL('.', import.meta.url).pathname, '..');
const BIN = join(ROOT, 'server/bin/fatigue-notes.js');
const RUNS = Number(process.env.BENCH_STARTUP_RUNS ?? 9);
const json = process.argv.includes('--json');

const dir = mkdtempSync(join(tmpdir(), 'fn-startup-'));
const note = join(dir, 'one.md');
// One check of the project's conveyor scenario (illustrative loads).
const NOTE = [
  '```fatigue idler_shaft',
  'material: aisi-1045-cd',
  'surface: machined',
  'd = 35 mm',
  'D = 42 mm',
  'r = 2 mm',
  'feature: shoulder-fillet',
  'M_max = 180 N*m',
  'M_min = -180 N*m',
  'T_max = 300 N*m',
  'T_min = 300 N*m',
  'require: n_f >= 1.5, n_y >= 1.2',
  '```',
  '',
].join('\n');
writeFileSync(note, NOTE);

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];

function wall(args) {
  const t = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { cwd: ROOT, encoding: 'utf8' });
  const ms = Number(process.hrtime.bigint() - t) / 1e6;
  if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')}: exit ${r.status}\n${r.stderr}`);
  return ms;
}

function frame(msg) {
  const body = Buffer.from(JSON.stringify(msg), 'utf8');
  return Buffer.concat([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`, 'ascii'), body]);
}

/** Milliseconds from spawning the server to the first publishDiagnostics of the opened note. */
function lspFirstDiagnostics() {
  return new Promise((done, fail) => {
    const t0 = process.hrtime.bigint();
    const child = spawn(process.execPath, [BIN, 'lsp', '--stdio'], {
      cwd: ROOT,
      stdio: ['pipe', 'pipe', 'ignore'],
    });
    let buf = Buffer.alloc(0);
    const uri = pathToFileURL(note).href;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      fail(new Error('no diagnostics within 20 s'));
    }, 20_000);
    child.stdout.on('data', (d) => {
      buf = Buffer.concat([buf, d]);
      for (;;) {
        const head = buf.indexOf('\r\n\r\n');
        if (head < 0) return;
        const len = Number(/Content-Length: (\d+)/i.exec(buf.subarray(0, head).toString('ascii'))?.[1]);
        if (buf.length < head + 4 + len) return;
        const msg = JSON.parse(buf.subarray(head + 4, head + 4 + len).toString('utf8'));
        buf = buf.subarray(head + 4 + len);
        if (msg.id === 1) {
          child.stdin.write(frame({ jsonrpc: '2.0', method: 'initialized', params: {} }));
          child.stdin.write(
            frame({
              jsonrpc: '2.0',
              method: 'textDocument/didOpen',
              params: { textDocument: { uri, languageId: 'markdown', version: 1, text: NOTE } },
            }),
          );
        } else if (msg.method === 'textDocument/publishDiagnostics' && msg.params?.uri === uri) {
          const ms = Number(process.hrtime.bigint() - t0) / 1e6;
          clearTimeout(timer);
          child.kill('SIGKILL');
          done(ms);
        }
      }
    });
    child.stdin.write(
      frame({
        jsonrpc: '2.0',
        id: 1,
        method: 'initialize',
        params: { processId: process.pid, rootUri: pathToFileURL(dir).href, capabilities: {} },
      }),
    );
  });
}

const bare = [];
const version = [];
const check = [];
const lsp = [];
for (let i = 0; i < RUNS; i++) {
  // Interleaved, so that a passing load on the machine touches every figure alike.
  bare.push(wall(['-e', '0']));
  version.push(wall([BIN, '--version']));
  check.push(wall([BIN, 'check', note]));
  lsp.push(await lspFirstDiagnostics());
}
const b = median(bare);
const rows = [
  { figure: 'bare node -e 0 (peer)', value: b, unit: 'ms' },
  {
    figure: '--version',
    value: median(version),
    unit: 'ms',
    goal: `<= 1.5x bare: ${(median(version) / b).toFixed(2)}x, ${median(version) / b <= 1.5 ? 'met' : 'not met'}`,
  },
  {
    figure: 'check, one-check note',
    value: median(check),
    unit: 'ms',
    goal: `<= 2.5x bare: ${(median(check) / b).toFixed(2)}x, ${median(check) / b <= 2.5 ? 'met' : 'not met'}`,
  },
  {
    figure: 'language server: start to first diagnostics',
    value: median(lsp),
    unit: 'ms',
    goal: `<= 3x bare: ${(median(lsp) / b).toFixed(2)}x, ${median(lsp) / b <= 3 ? 'met' : 'not met'}`,
  },
];
if (json) console.log(JSON.stringify(rows));
else
  for (const r of rows)
    console.log(`${r.figure.padEnd(46)} ${r.value.toFixed(0).padStart(6)} ms  ${r.goal ?? ''}`);
