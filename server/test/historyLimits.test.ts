/**
 * Histories on the command line (issue 16): the budget of `check` for a history file
 * (docs/language.md, "Limits"), and history files in UTF-16 read from disk as the UTF-8 one
 * is. The expectations are the documented rules of the project; the damage itself is the
 * ASTM E1049-85 (Reapproved 2017) Fig. 6 history, which must count the same in any encoding.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCheckCommand } from '../src/cli/check';
import { CLI_HISTORY_LIMITS } from '../src/cli/historyLimits';
import type { Io } from '../src/cli/io';

const dir = mkdtempSync(join(tmpdir(), 'fn-limits-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const FIG6 = [-2, 1, -3, 5, -1, 3, -4, 4, -2];
const CSV = `time [s],stress\n${FIG6.map((x, i) => `${i * 0.1},${x}`).join('\n')}\n`;

function noteFor(csv: string): string {
  return [
    '# n',
    '',
    '```fatigue h',
    'method: damage',
    'Sut = 600 MPa',
    'Sy = 450 MPa',
    'Se_prime = 200 MPa',
    'f = 0.9',
    'ka = 1',
    'kb = 1',
    'kc = 1',
    'kd = 1',
    'ke = 1',
    'feature: none',
    'criterion: goodman',
    'miner: elementary',
    `history: ${csv}`,
    'history-column: stress',
    'history-load: stress',
    'history_scale = 50 MPa',
    '```',
    '',
  ].join('\n');
}

async function check(note: string, extra: Partial<Io> = {}) {
  let stdout = '';
  let stderr = '';
  const code = await runCheckCommand([note, '--format', 'json'], {
    ...extra,
    stdout: (s) => {
      stdout += s;
    },
    stderr: (s) => {
      stderr += s;
    },
    cwd: dir,
  });
  const json = stdout ? JSON.parse(stdout) : undefined;
  const c = json?.files[0].checks[0];
  const diagnostics = json?.files[0].diagnostics ?? [];
  return { code, stderr, c, diagnostics };
}

function utf16(text: string, bigEndian: boolean, bom: boolean): Buffer {
  const units = (bom ? '\uFEFF' : '') + text;
  const out = Buffer.alloc(units.length * 2);
  for (let i = 0; i < units.length; i++)
    bigEndian ? out.writeUInt16BE(units.charCodeAt(i), 2 * i) : out.writeUInt16LE(units.charCodeAt(i), 2 * i);
  return out;
}

describe('history files of a note on the command line (issue 16)', () => {
  it('UTF-16 LE/BE with and without a byte-order mark, and CR-only lines: the same D as the UTF-8 file (ASTM E1049-85 (2017) Fig. 6 counted)', async () => {
    writeFileSync(join(dir, 'u8.csv'), CSV);
    writeFileSync(join(dir, 'u8.md'), noteFor('u8.csv'));
    const base = await check('u8.md');
    expect(base.code, base.stderr).toBe(0);
    const D = base.c.values.D_sum.si;
    expect(D).toBeGreaterThan(0);
    const files: Array<[string, Buffer | string]> = [
      ['le.csv', utf16(CSV, false, true)],
      ['be.csv', utf16(CSV, true, true)],
      ['le-nobom.csv', utf16(CSV, false, false)],
      ['be-nobom.csv', utf16(CSV, true, false)],
      ['cr.csv', CSV.replace(/\n/g, '\r')],
    ];
    for (const [name, body] of files) {
      writeFileSync(join(dir, name), body);
      writeFileSync(join(dir, `${name}.md`), noteFor(name));
      const r = await check(`${name}.md`);
      expect(r.code, `${name}: ${r.stderr}`).toBe(0);
      expect(r.c.values.D_sum.si, name).toBe(D);
      expect(r.c.values.cycles_counted.si, name).toBe(4);
    }
  });

  it('a history above the byte budget: history-too-large on the history line, no D, exit 1', async () => {
    writeFileSync(join(dir, 'big.csv'), CSV);
    writeFileSync(join(dir, 'big.md'), noteFor('big.csv'));
    const r = await check('big.md', { historyLimits: { ms: 1e9, bytes: 40 } });
    expect(r.code).toBe(1);
    const d = r.diagnostics.find((x: { code: string }) => x.code === 'history-too-large');
    expect(d, JSON.stringify(r.diagnostics)).toBeDefined();
    expect(d.severity).toBe('error');
    expect(d.message).toContain("the command line's budget");
    expect(d.line).toBe(17); // `history: big.csv` (1-based)
    expect(r.c.values.D_sum).toBeUndefined();
  });

  it('the default budget is the one docs/language.md states: 120 s per check, 1 GiB per file', () => {
    expect(CLI_HISTORY_LIMITS).toEqual({ ms: 120_000, bytes: 1024 ** 3 });
    const doc = readFileSync(resolve(__dirname, '../../docs/language.md'), 'utf8');
    const limits = doc.slice(doc.indexOf('## Limits'));
    expect(limits).toContain('most 120 s');
    expect(limits).toContain('at most 1 GiB');
    expect(limits).toContain('1,048,576 characters');
  });
});
