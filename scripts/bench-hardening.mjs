// Hardening figures (issue 7). Prints a table; with --json the last stdout line is the rows
// for scripts/bench.mjs. Times are this machine's (note the load printed at the end).
//
//   10 MB note, CLI      `fatigue-notes check` on a generated 10 MB note: it must finish and print
//   10 MB note, server   open it, then hover another note every 50 ms until the big note's
//                        diagnostics arrive: the hover latency shows whether the server kept
//                        answering while it parsed and evaluated (goal: max well under 1 s)
//   edit storm           1,000 edits in 10 s to a 100-check note: resident memory of the server,
//                        median of the first and of the last quarter of the samples (goal: flat),
//                        and whether its last diagnostics are those of the final text
//
// Usage: node scripts/bench-hardening.mjs [--json] [--mb N] [--skip-cli]
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os, { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';

const ROOT = resolve(import.meta.dirname ?? new URL('.', import.meta.url).pathname, '..');
const args = process.argv.slice(2);
const JSON_OUT = args.includes('--json');
const MB = Number(args[args.indexOf('--mb') + 1]) > 0 ? Number(args[args.indexOf('--mb') + 1]) : 10;
const SKIP_CLI = args.includes('--skip-cli');

/** A stress-life check of the project's conveyor scenario (illustrative loads), number `i`. */
function check(i) {
  const f = ['shoulder-fillet', 'groove', 'none'][i % 3];
  const out = [`## Section ${i}`, '', `Idler shaft ${i} of the conveyor line.`, ''];
  out.push(`\`\`\`fatigue s${i}`, `title: Idler shaft ${i}`, 'material: aisi-1045-cd');
  out.push(`surface: ${['machined', 'ground', 'hot-rolled'][i % 3]}`, 'temp = 30 degC', 'reliability = 0.99');
  out.push(`d = ${30 + (i % 12)} mm`);
  if (f !== 'none') out.push(`D = ${40 + (i % 12)} mm`, 'r = 2 mm');
  out.push(`feature: ${f}`, `M_max = ${150 + (i % 50)} N*m`, `M_min = -${150 + (i % 50)} N*m`);
  out.push(`T_max = ${300 + (i % 40)} N*m`, `T_min = ${300 + (i % 40)} N*m`);
  out.push('criterion: goodman', 'require: n_f >= 1.5, n_y >= 1.2', '```', '');
  return out.join('\n');
}

function note(bytes) {
  const parts = ['# Generated note for the hardening benchmark', ''];
  let size = 0;
  for (let i = 0; size < bytes; i++) {
    const c = check(i);
    parts.push(c);
    size += c.length + 1;
  }
  return parts.join('\n');
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s.length === 0 ? Number.NaN : s[Math.floor((s.length - 1) / 2)];
}

function rssMB(pid) {
  try {
    return Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1]) / 1024;
  } catch {
    return Number.NaN;
  }
}

function rpc(child) {
  let buf = Buffer.alloc(0);
  let nextId = 1;
  const pending = new Map();
  const listeners = [];
  child.stdout.on('data', (chunk) => {
    buf = Buffer.concat([buf, chunk]);
    for (;;) {
      const sep = buf.indexOf('\r\n\r\n');
      if (sep < 0) return;
      const len = Number(/Content-Length: (\d+)/i.exec(buf.subarray(0, sep).toString())?.[1]);
      if (buf.length < sep + 4 + len) return;
      const msg = JSON.parse(buf.subarray(sep + 4, sep + 4 + len).toString('utf8'));
      buf = buf.subarray(sep + 4 + len);
      if (msg.id !== undefined && pending.has(msg.id)) {
        pending.get(msg.id)(msg);
        pending.delete(msg.id);
      } else if (msg.method) for (const l of listeners) l(msg);
    }
  });
  const send = (obj) => {
    const body = Buffer.from(JSON.stringify({ jsonrpc: '2.0', ...obj }), 'utf8');
    child.stdin.write(`Content-Length: ${body.length}\r\n\r\n`);
    child.stdin.write(body);
  };
  return {
    request: (method, params) =>
      new Promise((res) => {
        const id = nextId++;
        pending.set(id, res);
        send({ id, method, params });
      }),
    notify: (method, params) => send({ method, params }),
    on: (fn) => listeners.push(fn),
  };
}

async function startServer(cli) {
  const child = spawn(process.execPath, [cli, 'lsp', '--stdio'], { stdio: ['pipe', 'pipe', 'pipe'] });
  child.stderr.resume();
  const c = rpc(child);
  const published = new Map();
  c.on((msg) => {
    if (msg.method === 'textDocument/publishDiagnostics')
      published.set(`${msg.params.uri}#${msg.params.version}`, { at: performance.now(), params: msg.params });
  });
  await c.request('initialize', {
    processId: process.pid,
    rootUri: pathToFileURL(ROOT).href,
    capabilities: {},
  });
  c.notify('initialized', {});
  const waitFor = (uri, version, timeoutMs = 600_000) =>
    new Promise((res, rej) => {
      const t0 = performance.now();
      const poll = () => {
        const hit = published.get(`${uri}#${version}`);
        if (hit) return res(hit);
        if (performance.now() - t0 > timeoutMs)
          return rej(new Error(`no diagnostics for ${uri} v${version}`));
        setTimeout(poll, 5);
      };
      poll();
    });
  return { child, c, published, waitFor };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'fatigue-notes-hardening-'));
  const rows = [];
  let server;
  try {
    const cli = join(dir, 'cli.js');
    await build({
      entryPoints: ['server/src/cli/main.ts'],
      outfile: cli,
      bundle: true,
      platform: 'node',
      target: 'node20',
      format: 'cjs',
      logLevel: 'warning',
      absWorkingDir: ROOT,
    });
    const big = note(MB * 1024 * 1024);
    const bigPath = join(dir, 'big-note.md');
    writeFileSync(bigPath, big);
    const blocks = (big.match(/^```fatigue /gm) ?? []).length;
    rows.push({
      figure: `${MB} MB note: size / fatigue blocks`,
      value: big.length / 1e6,
      unit: 'MB',
      goal: `${blocks} blocks (evaluated: at most 10,000)`,
    });

    // 1. The command line on the big note.
    if (!SKIP_CLI) {
      const t0 = performance.now();
      const child = spawn(process.execPath, [cli, 'check', bigPath], { stdio: ['ignore', 'pipe', 'pipe'] });
      let out = '';
      let peak = 0;
      child.stdout.on('data', (b) => {
        out += b.toString();
      });
      child.stderr.resume();
      const sampler = setInterval(() => {
        peak = Math.max(peak, rssMB(child.pid) || 0);
      }, 200);
      const code = await new Promise((res) => child.on('exit', res));
      clearInterval(sampler);
      const ms = performance.now() - t0;
      const summary = out.trim().split('\n').pop() ?? '';
      rows.push({
        figure: `${MB} MB note: CLI check, wall time`,
        value: ms / 1000,
        unit: 's',
        goal: `finishes and prints (exit ${code}: ${summary.slice(0, 60)})`,
      });
      rows.push({ figure: `${MB} MB note: CLI check, peak RSS`, value: peak, unit: 'MB' });
    }

    // 2. The server while it evaluates the big note.
    server = await startServer(cli);
    const { c, waitFor, child } = server;
    const small = check(0);
    const smallUri = pathToFileURL(join(dir, 'small.md')).href;
    c.notify('textDocument/didOpen', {
      textDocument: { uri: smallUri, languageId: 'markdown', version: 1, text: small },
    });
    await waitFor(smallUri, 1);
    const hoverLine = small.split('\n').findIndex((l) => l.startsWith('require:'));
    const bigUri = pathToFileURL(bigPath).href;
    const t0 = performance.now();
    c.notify('textDocument/didOpen', {
      textDocument: { uri: bigUri, languageId: 'markdown', version: 1, text: big },
    });
    let done = false;
    const doneAt = waitFor(bigUri, 1).then((p) => {
      done = true;
      return p;
    });
    const smallHover = [];
    const bigHover = [];
    let rssPeak = 0;
    while (!done) {
      let t = performance.now();
      const r = await c.request('textDocument/hover', {
        textDocument: { uri: smallUri },
        position: { line: hoverLine, character: 10 },
      });
      smallHover.push(performance.now() - t);
      if (!r.result) throw new Error('no hover on the small note');
      t = performance.now();
      await c.request('textDocument/hover', {
        textDocument: { uri: bigUri },
        position: { line: 20, character: 10 },
      });
      bigHover.push(performance.now() - t);
      rssPeak = Math.max(rssPeak, rssMB(child.pid) || 0);
      await new Promise((r2) => setTimeout(r2, 50));
    }
    const pub = await doneAt;
    rows.push({
      figure: `${MB} MB note: server open -> diagnostics`,
      value: (pub.at - t0) / 1000,
      unit: 's',
    });
    rows.push({
      figure: `${MB} MB note: hover on another note meanwhile, median`,
      value: median(smallHover),
      unit: 'ms',
      goal: `<= 5 ms (n = ${smallHover.length})`,
    });
    rows.push({
      figure: `${MB} MB note: hover on another note meanwhile, max`,
      value: Math.max(...smallHover),
      unit: 'ms',
      goal: '< 1000 ms: the server kept answering',
    });
    rows.push({
      figure: `${MB} MB note: hover on the big note meanwhile, max`,
      value: Math.max(...bigHover),
      unit: 'ms',
      goal: 'answered from its last evaluated version',
    });
    rows.push({ figure: `${MB} MB note: server peak RSS`, value: rssPeak, unit: 'MB' });
    const t1 = performance.now();
    const rb = await c.request('textDocument/hover', {
      textDocument: { uri: bigUri },
      position: { line: big.split('\n').findIndex((l) => l.startsWith('require:')), character: 10 },
    });
    rows.push({
      figure: `${MB} MB note: hover on it once evaluated`,
      value: performance.now() - t1,
      unit: 'ms',
      goal: rb.result ? 'has a result' : 'NO RESULT',
    });
    c.notify('textDocument/didClose', { textDocument: { uri: bigUri } });
    await c.request('shutdown', null);
    c.notify('exit');
    await new Promise((r2) => (child.exitCode === null ? child.on('exit', r2) : r2()));
    if (child.exitCode === null) child.kill('SIGKILL');
    await storm(cli, dir, rows);
  } finally {
    if (server && server.child.exitCode === null) server.child.kill('SIGKILL');
    rmSync(dir, { recursive: true, force: true });
  }
  rows.push({
    figure: 'machine load (1 min) at the end',
    value: os.loadavg()[0],
    unit: '',
    goal: `${os.cpus().length} CPUs: wall times grow with load`,
  });
  const w = Math.max(...rows.map((r) => r.figure.length));
  for (const r of rows)
    console.log(
      `${r.figure.padEnd(w)}  ${(Number.isFinite(r.value) ? r.value.toPrecision(4) : 'n/a').padStart(10)} ${r.unit.padEnd(3)}  ${r.goal ?? ''}`,
    );
  if (JSON_OUT) console.log(JSON.stringify(rows));
}

/** Edit storm: 1,000 edits in 10 s to a 100-check note, on a fresh server. */
async function storm(cli, dir, rows) {
  const server = await startServer(cli);
  const { c, waitFor, child } = server;
  try {
    const storm = note(0).concat('\n', Array.from({ length: 100 }, (_, i) => check(i)).join('\n'));
    const stormUri = pathToFileURL(join(dir, 'storm.md')).href;
    c.notify('textDocument/didOpen', {
      textDocument: { uri: stormUri, languageId: 'markdown', version: 1, text: storm },
    });
    await waitFor(stormUri, 1);
    const lines = storm.split('\n');
    const targets = lines.map((l, i) => (l.startsWith('M_max = ') ? i : -1)).filter((i) => i >= 0);
    const samples = [];
    const EDITS = 1000;
    const start = performance.now();
    let version = 1;
    for (let k = 0; k < EDITS; k++) {
      const line = targets[(k * 37) % targets.length];
      const text = `M_max = ${100 + (k % 400)} N*m`;
      version++;
      c.notify('textDocument/didChange', {
        textDocument: { uri: stormUri, version },
        contentChanges: [
          { range: { start: { line, character: 0 }, end: { line, character: lines[line].length } }, text },
        ],
      });
      lines[line] = text;
      if (k % 10 === 0) samples.push(rssMB(child.pid));
      const due = start + ((k + 1) * 10_000) / EDITS;
      const wait = due - performance.now();
      if (wait > 0) await new Promise((r2) => setTimeout(r2, wait));
    }
    const stormMs = performance.now() - start;
    const last = await waitFor(stormUri, version, 120_000);
    samples.push(rssMB(child.pid));
    const q = Math.max(1, Math.floor(samples.length / 4));
    const first = median(samples.slice(0, q));
    const lastQ = median(samples.slice(-q));
    rows.push({
      figure: `edit storm: ${EDITS} edits sent in`,
      value: stormMs / 1000,
      unit: 's',
      goal: '10 s',
    });
    rows.push({ figure: 'edit storm: server RSS, first quarter (median)', value: first, unit: 'MB' });
    rows.push({
      figure: 'edit storm: server RSS, last quarter (median)',
      value: lastQ,
      unit: 'MB',
      goal: 'flat: within 20 % of the first quarter',
    });
    rows.push({
      figure: 'edit storm: last / first quarter',
      value: lastQ / first,
      unit: 'x',
      goal: '<= 1.2',
    });
    rows.push({
      figure: 'edit storm: final diagnostics (count)',
      value: last.params.diagnostics.length,
      unit: '',
      goal: `of version ${version} (the final text)`,
    });
    await c.request('shutdown', null);
    c.notify('exit');
  } finally {
    if (child.exitCode === null) child.kill('SIGKILL');
  }
}

await main();
