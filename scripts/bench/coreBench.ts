/**
 * Core figures: remark alone vs full evaluation of a 1000-check note, per-check evaluation
 * cost, and the mathjs peers (evaluate() on every input line; compiled expressions).
 * Bundled and run by scripts/bench.mjs; prints JSON rows on stdout.
 */
import { readFileSync } from 'node:fs';
import { all, create } from 'mathjs';
import { type BlockSource, evaluateNote, findFatigueBlocks } from '../../shared-core/src';
import { BlockSequence } from '../../shared-core/src/note/noteLoop';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(f: () => void, reps: number): number {
  const t: number[] = [];
  for (let i = 0; i < reps; i++) {
    const t0 = performance.now();
    f();
    t.push(performance.now() - t0);
  }
  return median(t);
}

const sample = readFileSync('test/fixtures/contract-example.md', 'utf8');
const block = sample.slice(sample.indexOf('```fatigue'));
const parts: string[] = [];
for (let i = 0; i < 1000; i++)
  parts.push(
    `## Check ${i}\n\nProse about check ${i}.\n\n${block.replace('drive_shaft_fillet', `check_${i}`)}`,
  );
const note = parts.join('\n');

const rows: Array<{ figure: string; value: number; unit: string; goal?: string; peer?: string }> = [];
const remark = time(() => findFatigueBlocks(note), 3);
const full = time(() => evaluateNote(note), 3);
rows.push({ figure: 'remark-parse alone, 1000-check note', value: remark, unit: 'ms' });
rows.push({ figure: 'full evaluation, 1000-check note', value: full, unit: 'ms' });
rows.push({ figure: 'full evaluation / remark alone (in-process)', value: full / remark, unit: 'x' });
// Per check beyond Markdown: the loop over the note's blocks alone (blocks found once), median
// of 5, wall and CPU time. The difference full - remark is too noisy on a loaded machine.
function perCheck(blocks: BlockSource[]): { wall: number; cpu: number } {
  const walls: number[] = [];
  const cpus: number[] = [];
  for (let r = 0; r < 5; r++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    const seq = new BlockSequence({});
    for (let i = 0; i < blocks.length; i++) seq.add(seq.evaluate(blocks[i], i));
    walls.push((performance.now() - t0) / blocks.length);
    const c = process.cpuUsage(c0);
    cpus.push((c.user + c.system) / 1000 / blocks.length);
  }
  return { wall: median(walls), cpu: median(cpus) };
}
const same = perCheck(findFatigueBlocks(note));
rows.push({
  figure: 'evaluation per check (beyond Markdown)',
  value: same.wall,
  unit: 'ms',
  goal: '<= 0.06',
});
rows.push({ figure: '  same, CPU time (GC threads included)', value: same.cpu, unit: 'ms' });
// The same checks with their numbers varied (d, loads): no two checks share those lines.
const varied = parts
  .map((p, i) =>
    p
      .replace('d = 35 mm', `d = ${(30 + (i % 97) * 0.1).toFixed(1)} mm`)
      .replace('M_max = 180 N*m', `M_max = ${150 + i} N*m`)
      .replace('T_max = 250 N*m', `T_max = ${200 + (i % 50)} N*m`)
      .replace('T_min = 250 N*m', `T_min = ${200 + (i % 50)} N*m`),
  )
  .join('\n');
const v = perCheck(findFatigueBlocks(varied));
rows.push({
  figure: 'evaluation per check, numbers varied per check',
  value: v.wall,
  unit: 'ms',
});

const one = `${block}`;
rows.push({
  figure: 'evaluateNote of one check (incl. Markdown)',
  value: time(() => evaluateNote(one), 200),
  unit: 'ms',
});

// Peers: mathjs on the same input lines.
const math = create(all);
math.createUnit('ksi', '1000 psi');
const inputs = block
  .split('\n')
  .filter((l) => /^[A-Za-z_]\w*\s*=/.test(l))
  .map((l) => l.slice(l.indexOf('=') + 1).trim());
const peerEval =
  time(() => {
    for (let k = 0; k < 100; k++) for (const e of inputs) math.evaluate(e);
  }, 5) / 100;
rows.push({ figure: 'peer: mathjs evaluate() on every input line', value: peerEval, unit: 'ms/check' });
const compiled = inputs.map((e) => math.compile(e));
const peerCompiled =
  time(() => {
    for (let k = 0; k < 100; k++) for (const c of compiled) c.evaluate({});
  }, 5) / 100;
rows.push({ figure: 'peer: mathjs compiled expressions', value: peerCompiled, unit: 'ms/check' });
process.stdout.write(`${JSON.stringify(rows)}\n`);
