/**
 * `check --jobs N`: the notes are evaluated on N worker threads and printed in the order of
 * the files. The output of several notes must be byte for byte the same with one and with two
 * workers, in every format, and each file's JSON entry must be the one recorded for that note
 * in test/golden/json/ (the golden test's record, made on the main thread alone).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const root = resolve(__dirname, '../..');
const bin = join(root, 'server/bin/fatigue-notes.js');
const run = (args: string[]) => spawnSync(process.execPath, [bin, ...args], { cwd: root, encoding: 'utf8' });
const NOTES = ['samples', 'test/fixtures'];

beforeAll(() => {
  execFileSync(process.execPath, [join(root, 'scripts/build.mjs')], { cwd: root });
});

describe('fatigue-notes check --jobs', () => {
  for (const format of ['json', 'text', 'sarif']) {
    it(`${format}: the same bytes and exit code with 1 and 2 workers`, () => {
      const one = run(['check', ...NOTES, '--format', format, '--jobs', '1']);
      const two = run(['check', ...NOTES, '--format', format, '--jobs', '2']);
      expect(one.stderr).toBe('');
      expect(two.stderr).toBe('');
      // mistakes.md and withheld.md hold errors: exit 1 either way.
      expect(one.status).toBe(1);
      expect(two.status).toBe(one.status);
      expect(two.stdout.length).toBeGreaterThan(1000);
      expect(two.stdout).toBe(one.stdout);
    });
  }
  it('with 2 workers every file entry is the golden record of that note, in file order', () => {
    const out = JSON.parse(run(['check', ...NOTES, '--format', 'json', '--jobs', '2']).stdout);
    const paths = out.files.map((f: { path: string }) => f.path);
    expect(paths).toEqual([...paths].sort());
    expect(paths.length).toBeGreaterThanOrEqual(10);
    for (const f of out.files) {
      const golden = JSON.parse(
        readFileSync(join(root, 'test/golden/json', `${f.path.replace(/[\\/]/g, '__')}.json`), 'utf8'),
      );
      expect(f).toStrictEqual(golden.files[0]);
    }
  });
  it('a bad --jobs is a usage error', () => {
    for (const v of ['0', 'x', '1.5', '-2']) {
      const r = run(['check', 'samples', '--jobs', v]);
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/--jobs must be a whole number/);
    }
  });
});
