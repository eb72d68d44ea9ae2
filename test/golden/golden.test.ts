/**
 * The `check --format json` of every sample, fixture and contract note, held byte for byte
 * against the files in test/golden/json/. A change that moves a number must update these
 * files on purpose (`npx vitest run test/golden -u`) and say in CHANGELOG.md which notes
 * moved and why; refactors and speed work must leave them untouched.
 */
import { readdirSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { evaluateFile } from '../../server/src/cli/check';
import { toJson } from '../../server/src/cli/output';

const root = resolve(__dirname, '../..');
const FOLDERS = ['samples', 'test/fixtures', 'server/test/fixtures', 'test/real-editor/workspace'];

function notes(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name.endsWith('.md')) out.push(p);
    }
  };
  for (const f of FOLDERS) walk(join(root, f));
  return out;
}

describe('check JSON of every sample and fixture stays as recorded', () => {
  for (const file of notes()) {
    const rel = relative(root, file);
    it(rel, async () => {
      const json = `${JSON.stringify(toJson([{ path: rel, result: evaluateFile(file) }]), null, 2)}\n`;
      await expect(json).toMatchFileSnapshot(`json/${rel.replace(/[\\/]/g, '__')}.json`);
    });
  }
});
