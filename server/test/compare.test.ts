/**
 * `fatigue-notes compare OLD NEW`: fixture notes written in a temp folder, and a small git
 * repository made in the test (`REV:path`). The moved values are checked against exact
 * relations of the methods: for a plain round bar in bending with a fixed Se, the Goodman
 * factor n_f = 1 / (sigma_a/Se + sigma_m/Sut) with sigma = 32 M / (pi d^3) (Budynas &
 * Nisbett, Shigley's MED 10th ed., Eq. 3-28 and Table 6-6) is proportional to d^3.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCompareCommand } from '../src/cli/compare';

const dir = mkdtempSync(join(tmpdir(), 'fatigue-compare-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function shaft(d: string, extra: string[] = []): string {
  return [
    '```fatigue shaft',
    'title: Plain shaft in bending',
    'Sut = 630 MPa',
    'Sy = 530 MPa',
    'surface: machined',
    'temp = 20 degC',
    'reliability = 0.99',
    'kb = 0.85',
    `d = ${d}`,
    'feature: none',
    'rotation: non-rotating',
    'M_max = 600 N*m',
    'M_min = -200 N*m',
    'criterion: goodman',
    'require: n_f >= 1.5',
    ...extra,
    '```',
  ].join('\n');
}

const PIN = [
  '```fatigue pin',
  'Sut = 440 MPa',
  'Sy = 370 MPa',
  'surface: ground',
  'temp = 20 degC',
  'reliability = 0.9',
  'd = 20 mm',
  'feature: none',
  'M_max = 60 N*m',
  'M_min = -60 N*m',
  'criterion: goodman',
  'require: n_f >= 1.6',
  '```',
].join('\n');

const BRACKET = [
  '```fatigue bracket',
  'Sut = 440 MPa',
  'surface: machined',
  'temp = 20 degC',
  'reliability = 0.9',
  'd = 16 mm',
  'feature: none',
  'F_max = 5 kN',
  'F_min = 0 kN',
  'criterion: goodman',
  '```',
].join('\n');

const COVER = BRACKET.replace('fatigue bracket', 'fatigue cover_bolt').replace('d = 16 mm', 'd = 10 mm');

const V1 = `# Shafts\n\n${shaft('35 mm')}\n\n${PIN}\n\n${BRACKET}\n`;
const V2 = `# Shafts\n\nA revision: the shaft is turned down.\n\n${shaft('30 mm')}\n\n${PIN}\n\n${COVER}\n`;

function write(name: string, text: string): string {
  writeFileSync(join(dir, name), text);
  return name;
}

async function run(args: string[], cwd = dir) {
  let stdout = '';
  let stderr = '';
  const code = await runCompareCommand(args, {
    stdout: (s) => {
      stdout += s;
    },
    stderr: (s) => {
      stderr += s;
    },
    cwd,
  });
  return { code, stdout, stderr };
}

describe('compare two files', () => {
  const v1 = write('v1.md', V1);
  const v2 = write('v2.md', V2);

  it('JSON: a requirement that newly fails comes first, checks added/removed/changed/unchanged, exit 1', async () => {
    const r = await run([v1, v2, '--format', 'json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(1);
    const j = JSON.parse(r.stdout);
    expect(j.version).toBe(1);
    expect(j.requirementChanges[0]).toMatchObject({
      check: 'shaft',
      text: 'n_f >= 1.5',
      old: 'met',
      new: 'not met',
      newlyFailing: true,
    });
    expect(j.added.map((c: { key: string }) => c.key)).toEqual(['cover_bolt']);
    expect(j.removed.map((c: { key: string }) => c.key)).toEqual(['bracket']);
    expect(j.unchanged).toEqual(['pin']);
    expect(j.changed.map((c: { key: string }) => c.key)).toEqual(['shaft']);
    const shaftChange = j.changed[0];
    expect(shaftChange).toMatchObject({ oldStatus: 'pass', newStatus: 'fail', oldLine: 3, newLine: 5 });
    expect(j.newlyFailing).toBe(true);
    expect(j.failures.join('\n')).toMatch(/shaft: n_f >= 1\.5 now not met/);
  });

  it('moved values: d 35 -> 30 mm (exact relative change -1/7) and n_f in proportion to d^3 (Shigley Eq. 3-28 with Goodman)', async () => {
    const j = JSON.parse((await run([v1, v2, '--format', 'json'])).stdout);
    const values = j.changed[0].values as Array<{
      name: string;
      kind: string;
      change: string;
      relative: number;
      old: { si: number; display: string };
      new: { si: number; display: string };
    }>;
    const d = values.find((v) => v.name === 'd')!;
    expect(d).toMatchObject({ kind: 'input', change: 'moved' });
    expect(d.old.display).toBe('35 mm');
    expect(d.new.display).toBe('30 mm');
    expect(d.relative).toBeCloseTo(-1 / 7, 12);
    const nf = values.find((v) => v.name === 'n_f')!;
    expect(nf.kind).toBe('result');
    expect(nf.relative).toBeCloseTo((30 / 35) ** 3 - 1, 9);
    // Se did not move (kb stated, no feature): not listed.
    expect(values.find((v) => v.name === 'Se')).toBeUndefined();
    // The stresses moved by (35/30)^3 - 1.
    expect(values.find((v) => v.name === 'sigma_a')!.relative).toBeCloseTo((35 / 30) ** 3 - 1, 9);
  });

  it('text: requirement changes listed first, then added, removed and changed checks', async () => {
    const r = await run([v1, v2]);
    expect(r.code).toBe(1);
    const t = r.stdout;
    const order = ['NOW FAILS', 'Checks added:', 'Checks removed:', 'Checks changed:', 'Unchanged: pin'].map(
      (s) => t.indexOf(s),
    );
    for (const i of order) expect(i).toBeGreaterThan(-1);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    expect(t).toMatch(/d\s+input\s+35 mm -> 30 mm\s+\(-14\.3 %\)/);
    expect(t).toMatch(/Newly failing \(exit 1\):\n {2}shaft: n_f >= 1\.5 now not met/);
  });

  it('a change below the display precision is not a move; identical notes exit 0', async () => {
    const a = write('p1.md', `${shaft('35 mm')}\n`);
    const b = write('p2.md', `${shaft('35.0000001 mm')}\n`);
    const r = await run([a, b, '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.changed).toEqual([]);
    expect(j.unchanged).toEqual(['shaft']);
    const same = await run([v1, v1]);
    expect(same.code).toBe(0);
    expect(same.stdout).toContain('No check moved.');
    expect(same.stdout).toContain('No requirement newly fails.');
  });

  it('the reverse direction: a requirement met again is listed but does not fail (exit 0)', async () => {
    const r = await run([v2, v1, '--format', 'json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.requirementChanges[0]).toMatchObject({
      check: 'shaft',
      old: 'not met',
      new: 'met',
      newlyFailing: false,
    });
  });

  it('a check that goes to error fails the comparison', async () => {
    const broken = write('broken.md', V1.replace('Sut = 630 MPa', 'Sut = 630 mm'));
    const r = await run([v1, broken, '--format', 'json']);
    expect(r.code).toBe(1);
    const j = JSON.parse(r.stdout);
    expect(j.failures).toContain('shaft: pass -> error');
  });

  it('usage errors and unreadable versions exit 2', async () => {
    expect((await run([v1])).code).toBe(2);
    expect((await run([v1, v2, '--format', 'xml'])).code).toBe(2);
    const missing = await run([v1, 'nope.md']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/no such file: nope\.md/);
    expect((await run([v1, '--output=x:y'])).code).toBe(2);
  });
});

describe('compare against a git revision (REV:path)', () => {
  const repo = mkdtempSync(join(tmpdir(), 'fatigue-compare-git-'));
  afterAll(() => rmSync(repo, { recursive: true, force: true }));
  const git = (...args: string[]) =>
    execFileSync('git', ['-c', 'user.name=Test', '-c', 'user.email=test@example.invalid', ...args], {
      cwd: repo,
      stdio: ['ignore', 'pipe', 'pipe'],
    }).toString('utf8');

  it('reads the committed version with git show and compares it with the working copy', async () => {
    git('init', '-q');
    execFileSync('mkdir', ['-p', join(repo, 'notes')]);
    writeFileSync(join(repo, 'notes', 'shafts.md'), V1);
    git('add', 'notes/shafts.md');
    git('commit', '-q', '-m', 'v1');
    writeFileSync(join(repo, 'notes', 'shafts.md'), V2);

    const r = await run(['HEAD:notes/shafts.md', 'notes/shafts.md', '--format', 'json'], repo);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(1);
    const j = JSON.parse(r.stdout);
    expect(j.old).toBe('HEAD:notes/shafts.md');
    expect(j.requirementChanges[0]).toMatchObject({ check: 'shaft', newlyFailing: true });
    expect(j.added.map((c: { key: string }) => c.key)).toEqual(['cover_bolt']);

    // After committing v2, the two revisions compare the same way; a path from the current folder works too.
    git('commit', '-q', '-am', 'v2');
    const revs = await run(['HEAD~1:./shafts.md', 'HEAD:./shafts.md'], join(repo, 'notes'));
    expect(revs.code).toBe(1);
    expect(revs.stdout).toContain('NOW FAILS');
    const same = await run(['HEAD:notes/shafts.md', 'notes/shafts.md'], repo);
    expect(same.code).toBe(0);
  });

  it('an unknown revision or path exits 2 with git’s reason', async () => {
    const r = await run(['no-such-rev:notes/shafts.md', 'notes/shafts.md'], repo);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/cannot read no-such-rev:notes\/shafts\.md from git/);
    const p = await run(['HEAD:notes/missing.md', 'notes/shafts.md'], repo);
    expect(p.code).toBe(2);
  });
});
