// Language-server benchmark on a generated note of 1000 checks. Prints a table; times are
// this machine's, not assertions. Run from the repository root: `node scripts/bench-lsp.mjs`.
//
//   full evaluation   evaluateNote on the whole note, and its ratio to remark-parse alone
//                     on the same text (goal: ratio at most 1.5)
//   one-block edit    didChange of one block's line -> publishDiagnostics of that version,
//                     over stdio (goal: median at most 20 ms)
//   hover             textDocument/hover round trip (goal: median at most 5 ms)
//   memory            resident set of the server process after the big note
//
// With --json the last stdout line is the figures as rows for scripts/bench.mjs.
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import os, { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import remarkParse from 'remark-parse';
import { unified } from 'unified';

const ROOT = resolve(import.meta.dirname ?? new URL('.', import.meta.url).pathname, '..');
const CHECKS = Number(process.env.BENCH_CHECKS ?? 1000);
const EDITS = Number(process.env.BENCH_EDITS ?? 40);
const HOVERS = Number(process.env.BENCH_HOVERS ?? 60);

/** A note of `n` stress-life checks of the project's conveyor scenario (illustrative loads). */
function generateNote(n) {
  const out = ['# Conveyor line: generated benchmark note', ''];
  const features = ['shoulder-fillet', 'groove', 'none'];
  const surfaces = ['machined', 'ground', 'hot-rolled'];
  for (let i = 0; i < n; i++) {
    const f = features[i % features.length];
    out.push(`## Section ${i}`, '', `Idler shaft ${i} of the conveyor line.`, '');
    out.push(`\`\`\`fatigue s${i}`, `title: Idler shaft ${i}`);
    if (i > 0 && i % 7 === 0) out.push(`Sut = s${i - 1}.Sut`, `Sy = s${i - 1}.Sy`);
    else out.push('material: aisi-1045-cd');
    out.push(`surface: ${surfaces[i % surfaces.length]}`, 'temp = 30 degC', 'reliability = 0.99');
    out.push(`d = ${30 + (i % 12)} mm`);
    if (f !== 'none') out.push(`D = ${40 + (i % 12)} mm`, 'r = 2 mm');
    out.push(`feature: ${f}`);
    out.push(`M_max = ${150 + (i % 50)} N*m`, `M_min = -${150 + (i % 50)} N*m`);
    out.push(`T_max = ${300 + (i % 40)} N*m`, `T_min = ${300 + (i % 40)} N*m`);
    out.push('criterion: goodman', 'require: n_f >= 1.5, n_y >= 1.2', '```', '');
  }
  return out.join('\n');
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s.length === 0 ? Number.NaN : s[Math.floor((s.length - 1) / 2)];
}

async function bundle(dir) {
  const common = {
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'cjs',
    logLevel: 'warning',
    absWorkingDir: ROOT,
  };
  const cli = join(dir, 'cli.js');
  const core = join(dir, 'core.cjs');
  await build({ ...common, entryPoints: ['server/src/cli/main.ts'], outfile: cli });
  await build({
    ...common,
    stdin: {
      contents:
        "export * from './shared-core/src/index'; export { NoteSession } from './shared-core/src/session';",
      resolveDir: ROOT,
      loader: 'ts',
    },
    outfile: core,
  });
  return { cli, core };
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

function rssMB(pid) {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1]);
    return kb / 1024;
  } catch {
    return Number.NaN;
  }
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'fatigue-notes-bench-'));
  let child;
  try {
    const { cli, core } = await bundle(dir);
    const { evaluateNote, NoteSession } = createRequire(import.meta.url)(core);
    const text = generateNote(CHECKS);
    const lines = text.split('\n');

    // Full evaluation against remark alone (best of 3 each, after one warm-up).
    const parser = unified().use(remarkParse);
    parser.parse(text);
    evaluateNote(text);
    const remarkRuns = [];
    const fullRuns = [];
    for (let i = 0; i < 3; i++) {
      let t = performance.now();
      parser.parse(text);
      remarkRuns.push(performance.now() - t);
      t = performance.now();
      evaluateNote(text);
      fullRuns.push(performance.now() - t);
    }
    const remarkMs = Math.min(...remarkRuns);
    const fullMs = Math.min(...fullRuns);

    // The incremental session in-process (no protocol): wall and CPU time of a one-block edit.
    const session = new NoteSession({});
    session.update(text);
    const sessionLines = text.split('\n');
    const mid = sessionLines.findIndex((l, i) => i > sessionLines.length / 2 && l.startsWith('M_max = '));
    const sessionWall = [];
    const sessionCpu = [];
    for (let i = 0; i < EDITS; i++) {
      const before = sessionLines[mid];
      sessionLines[mid] = `M_max = ${300 + i} N*m`;
      const next = sessionLines.join('\n');
      const change = {
        range: { start: { line: mid, character: 0 }, end: { line: mid, character: before.length } },
        text: sessionLines[mid],
      };
      const c0 = process.cpuUsage();
      const t = performance.now();
      session.update(next, [change]);
      sessionWall.push(performance.now() - t);
      const c1 = process.cpuUsage(c0);
      sessionCpu.push((c1.user + c1.system) / 1000);
    }

    // The server over stdio.
    child = spawn(process.execPath, [cli, 'lsp', '--stdio'], { stdio: ['pipe', 'pipe', 'inherit'] });
    const c = rpc(child);
    const published = new Map();
    const waiters = [];
    c.on((msg) => {
      if (msg.method !== 'textDocument/publishDiagnostics') return;
      published.set(msg.params.version, performance.now());
      for (const w of waiters.splice(0)) w();
    });
    const waitVersion = (v) =>
      new Promise((res) => {
        const check = () => (published.has(v) ? res(published.get(v)) : waiters.push(check));
        check();
      });
    await c.request('initialize', {
      processId: process.pid,
      rootUri: pathToFileURL(ROOT).href,
      capabilities: {},
    });
    c.notify('initialized', {});
    const uri = pathToFileURL(join(dir, 'bench-note.md')).href;
    let t0 = performance.now();
    c.notify('textDocument/didOpen', { textDocument: { uri, languageId: 'markdown', version: 1, text } });
    const openedAt = await waitVersion(1);
    const openMs = openedAt - t0;
    const rssAfterOpen = rssMB(child.pid);

    // One-block edits in the middle of the note: a number changed, then a line added and removed.
    const target = lines.findIndex((l, i) => i > lines.length / 2 && l.startsWith('M_max = '));
    let version = 1;
    const editMs = [];
    const lineEditMs = [];
    for (let i = 0; i < EDITS; i++) {
      version++;
      const value = `M_max = ${200 + i} N*m`;
      const line = lines[target];
      t0 = performance.now();
      c.notify('textDocument/didChange', {
        textDocument: { uri, version },
        contentChanges: [
          {
            range: { start: { line: target, character: 0 }, end: { line: target, character: line.length } },
            text: value,
          },
        ],
      });
      editMs.push((await waitVersion(version)) - t0);
      lines[target] = value;
    }
    for (let i = 0; i < EDITS / 2; i++) {
      version++;
      t0 = performance.now();
      c.notify('textDocument/didChange', {
        textDocument: { uri, version },
        contentChanges: [
          {
            range: { start: { line: target, character: 0 }, end: { line: target, character: 0 } },
            text: 'kmisc = 0.95\n',
          },
        ],
      });
      lineEditMs.push((await waitVersion(version)) - t0);
      version++;
      t0 = performance.now();
      c.notify('textDocument/didChange', {
        textDocument: { uri, version },
        contentChanges: [
          {
            range: { start: { line: target, character: 0 }, end: { line: target + 1, character: 0 } },
            text: '',
          },
        ],
      });
      lineEditMs.push((await waitVersion(version)) - t0);
    }

    // Hovers on `n_f` of require lines all over the note.
    const requireLines = lines.map((l, i) => (l.startsWith('require: n_f') ? i : -1)).filter((i) => i >= 0);
    const hoverMs = [];
    for (let i = 0; i < HOVERS; i++) {
      const line = requireLines[Math.floor((i * requireLines.length) / HOVERS)];
      t0 = performance.now();
      const r = await c.request('textDocument/hover', {
        textDocument: { uri },
        position: { line, character: 10 },
      });
      hoverMs.push(performance.now() - t0);
      if (!r.result) throw new Error(`no hover on line ${line}`);
    }
    const rssEnd = rssMB(child.pid);
    await c.request('shutdown', null);
    c.notify('exit');

    const rows = [
      ['note', `${CHECKS} checks, ${lines.length} lines, ${(text.length / 1024).toFixed(0)} KiB`, ''],
      ['remark-parse alone', `${remarkMs.toFixed(0)} ms`, 'best of 3'],
      ['full evaluation (evaluateNote)', `${fullMs.toFixed(0)} ms`, 'best of 3'],
      ['full / remark ratio', (fullMs / remarkMs).toFixed(2), 'goal <= 1.5'],
      [
        'one-block edit, session in-process, median',
        `${median(sessionWall).toFixed(1)} ms`,
        `CPU ${median(sessionCpu).toFixed(1)} ms`,
      ],
      ['open -> first diagnostics (stdio)', `${openMs.toFixed(0)} ms`, ''],
      [
        'one-block edit -> diagnostics, median',
        `${median(editMs).toFixed(1)} ms`,
        `goal <= 20 ms (n = ${editMs.length})`,
      ],
      ['  same, max', `${Math.max(...editMs).toFixed(1)} ms`, ''],
      [
        'line added/removed -> diagnostics, median',
        `${median(lineEditMs).toFixed(1)} ms`,
        `later checks move (n = ${lineEditMs.length})`,
      ],
      ['hover, median', `${median(hoverMs).toFixed(2)} ms`, `goal <= 5 ms (n = ${hoverMs.length})`],
      ['server memory (RSS) after open', `${rssAfterOpen.toFixed(0)} MB`, ''],
      ['server memory (RSS) at the end', `${rssEnd.toFixed(0)} MB`, ''],
      [
        'machine load (1 min) at the end',
        os.loadavg()[0].toFixed(1),
        `${os.cpus().length} CPUs: wall times grow with load`,
      ],
    ];
    const json = [
      { figure: `note: ${CHECKS} checks`, value: text.length / 1024, unit: 'KiB' },
      { figure: 'remark-parse alone (best of 3)', value: remarkMs, unit: 'ms' },
      { figure: 'full evaluation, evaluateNote (best of 3)', value: fullMs, unit: 'ms' },
      { figure: 'full evaluation / remark alone', value: fullMs / remarkMs, unit: 'x', goal: '<= 1.5' },
      { figure: 'one-block edit, session in-process, median', value: median(sessionWall), unit: 'ms' },
      { figure: 'one-block edit, session in-process, CPU median', value: median(sessionCpu), unit: 'ms' },
      { figure: 'open -> first diagnostics (stdio)', value: openMs, unit: 'ms' },
      {
        figure: 'one-block edit -> diagnostics, median',
        value: median(editMs),
        unit: 'ms',
        goal: '<= 20 ms',
      },
      { figure: 'one-block edit -> diagnostics, max', value: Math.max(...editMs), unit: 'ms' },
      { figure: 'line added/removed -> diagnostics, median', value: median(lineEditMs), unit: 'ms' },
      { figure: 'hover, median', value: median(hoverMs), unit: 'ms', goal: '<= 5 ms' },
      { figure: 'server RSS after open', value: rssAfterOpen, unit: 'MB' },
      { figure: 'server RSS at the end', value: rssEnd, unit: 'MB' },
    ];
    if (process.argv.includes('--json')) {
      for (const [a, b, n] of rows) console.log(`${a}  ${b}  ${n}`);
      console.log(JSON.stringify(json));
      return;
    }
    const w0 = Math.max(...rows.map((r) => r[0].length));
    const w1 = Math.max(...rows.map((r) => r[1].length));
    console.log(`${'measure'.padEnd(w0)}  ${'value'.padEnd(w1)}  note`);
    console.log(`${'-'.repeat(w0)}  ${'-'.repeat(w1)}  ----`);
    for (const [a, b, n] of rows) console.log(`${a.padEnd(w0)}  ${b.padEnd(w1)}  ${n}`);
  } finally {
    if (child && child.exitCode === null) child.kill('SIGKILL');
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
