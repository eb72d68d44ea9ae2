/** The `check` command as a subprocess: exit codes, text, JSON (validated by its schema) and SARIF. */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { methods } from '@fatigue-notes/core';
import Ajv from 'ajv';
import { beforeAll, describe, expect, it } from 'vitest';

const root = resolve(__dirname, '../..');
const bin = join(root, 'server/bin/fatigue-notes.js');
const run = (args: string[], cwd = root) =>
  spawnSync(process.execPath, [bin, ...args], { cwd, encoding: 'utf8' });

beforeAll(() => {
  execFileSync(process.execPath, [join(root, 'scripts/build.mjs')], { cwd: root });
});

describe('fatigue-notes check', () => {
  it('samples: exit 0 and a summary line per check', () => {
    const r = run(['check', 'samples']);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/PASS\s+samples\/ferry-ramp-hoist-shafts\.md:\d+ drum_shaft_fillet/);
    expect(r.stdout).toMatch(/check\(s\): \d+ pass, 0 fail, 0 error/);
  });
  it('a note with mistakes: exit 1 and path:line:col severity code message', () => {
    const r = run(['check', 'test/fixtures/mistakes.md']);
    expect(r.status).toBe(1);
    expect(r.stdout).toMatch(/test\/fixtures\/mistakes\.md:5:7 error wrong-dimension /);
  });
  it('a failed requirement alone gives exit 1', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fn-check-'));
    const note = join(dir, 'n.md');
    writeFileSync(
      note,
      [
        '```fatigue weak',
        'Sut = 600 MPa',
        'Sy = 450 MPa',
        'surface: machined',
        'temp = 20 degC',
        'reliability = 0.9',
        'd = 20 mm',
        'feature: none',
        'M_a = 300 N*m',
        'M_m = 0 N*m',
        'criterion: goodman',
        'require: n_f >= 1.5',
        '```',
      ].join('\n'),
    );
    const r = run(['check', note, '--format', 'json']);
    expect(r.status).toBe(1);
    const out = JSON.parse(r.stdout);
    expect(out.files[0].checks[0].status).toBe('fail');
    expect(out.files[0].checks[0].requirements[0]).toEqual({ text: 'n_f >= 1.5', met: false });
  });
  it('usage errors and unreadable paths give exit 2', () => {
    expect(run(['check']).status).toBe(2);
    expect(run(['check', 'samples', '--format', 'xml']).status).toBe(2);
    expect(run(['check', 'no/such/file.md']).status).toBe(2);
    expect(run(['frobnicate']).status).toBe(2);
  });
  it('JSON output validates against server/schema/check-output.schema.json', () => {
    const schema = JSON.parse(readFileSync(join(root, 'server/schema/check-output.schema.json'), 'utf8'));
    const validate = new Ajv({ allErrors: true }).compile(schema);
    for (const target of ['samples', 'test/fixtures/mistakes.md', 'test/fixtures/contract-example.md']) {
      const r = run(['check', target, '--format', 'json']);
      const out = JSON.parse(r.stdout);
      expect(validate(out), JSON.stringify(validate.errors)).toBe(true);
    }
    // The schema names no method: every registered method's name fits its pattern.
    const pattern = new RegExp(schema.definitions.check.properties.method.pattern);
    for (const m of methods()) expect(m.name).toMatch(pattern);
  });
  it('JSON carries the contract fields: SI values, infinite lives, 1-based positions', () => {
    const out = JSON.parse(run(['check', 'test/fixtures/contract-example.md', '--format', 'json']).stdout);
    const c = out.files[0].checks[0];
    expect(c.id).toBe('drive_shaft_fillet');
    expect(c.line).toBe(3);
    expect(c.values.Sut).toEqual({ si: 630e6, display: '630 MPa' });
    expect(c.values.N_f).toEqual({ si: null, infinite: true, display: 'infinite' });
    expect(c.values.Se.si).toBeGreaterThan(1e8);
    const mistakes = JSON.parse(run(['check', 'test/fixtures/mistakes.md', '--format', 'json']).stdout);
    const d = mistakes.files[0].diagnostics.find((x: { code: string }) => x.code === 'wrong-dimension');
    expect(d).toMatchObject({
      line: 5,
      column: 7,
      endLine: 5,
      endColumn: 13,
      severity: 'error',
      check: 'shaft_a',
    });
  });
  it('SARIF 2.1.0 output names every rule and location', () => {
    const out = JSON.parse(run(['check', 'test/fixtures/mistakes.md', '--format', 'sarif']).stdout);
    expect(out.version).toBe('2.1.0');
    const results = out.runs[0].results;
    expect(results.length).toBeGreaterThan(5);
    const ruleIds = new Set(out.runs[0].tool.driver.rules.map((r: { id: string }) => r.id));
    for (const res of results) {
      expect(ruleIds.has(res.ruleId)).toBe(true);
      expect(res.locations[0].physicalLocation.region.startLine).toBeGreaterThanOrEqual(1);
    }
  });
});

describe('fatigue-notes --version', () => {
  it('answers the package version before the bundle loads, the same as the bundle knows', async () => {
    const { VERSION } = await import('../src/cli/version');
    const pkg = JSON.parse(readFileSync(join(root, 'server/package.json'), 'utf8')) as { version: string };
    expect(VERSION).toBe(pkg.version);
    const r = run(['--version']);
    expect(r.status).toBe(0);
    expect(r.stdout).toBe(`${VERSION}\n`);
  });
});
