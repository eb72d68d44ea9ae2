/**
 * The tests' browser (test/helpers/browser.mjs): the Chromium inside the npm package
 * @sparticuz/chromium, inflated once per version. Two callers starting at once (as two vitest
 * workers do on a first run) must both get one complete binary, never a half-written one, and
 * leave no staging folder behind. Inflated here into a fresh folder, not the shared cache.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { BROWSER_ARGS, chromiumPackageVersion, testBrowser } from './helpers/browser.mjs';

describe('the tests browser from the npm registry', () => {
  const cacheRoot = mkdtempSync(join(tmpdir(), 'fatigue-notes-browser-test-'));
  afterAll(() => rmSync(cacheRoot, { recursive: true, force: true }));

  it('inflates once for two callers at once, into a folder named after the package version', {
    timeout: 120_000,
  }, async () => {
    const saved = process.env.CHROMIUM;
    delete process.env.CHROMIUM;
    try {
      const [a, b] = await Promise.all([testBrowser({ cacheRoot }), testBrowser({ cacheRoot })]);
      const version = chromiumPackageVersion();
      expect(a.executablePath).toBe(join(cacheRoot, `fatigue-notes-chromium-${version}`, 'chromium'));
      expect(b.executablePath).toBe(a.executablePath);
      expect(readdirSync(cacheRoot)).toEqual([`fatigue-notes-chromium-${version}`]);
      // The package's major version is the Chromium major it ships (the package's own convention).
      const printed = execFileSync(a.executablePath, ['--version'], { encoding: 'utf8' });
      expect(printed).toMatch(new RegExp(`^Chromium ${version.split('.')[0]}\\.`));
    } finally {
      if (saved !== undefined) process.env.CHROMIUM = saved;
    }
  });

  it("launches with no sandbox (tests run as root), no GPU and none of Chromium's own network use", () => {
    for (const flag of [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ])
      expect(BROWSER_ARGS).toContain(flag);
    // Flags that would hide what the report and panel tests check (no fetches, the CSP).
    for (const flag of ['--disable-web-security', '--allow-running-insecure-content', '--single-process'])
      expect(BROWSER_ARGS).not.toContain(flag);
  });
});
