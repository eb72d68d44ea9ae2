/**
 * The tests' browser: the headless Chromium shipped inside the npm package @sparticuz/chromium
 * (a devDependency), so that `npm ci && npm test` needs no system browser and no apt step.
 * Used by the panel and report tests and by the real-editor test (test/real-editor/run.mjs).
 *
 * The package keeps its binary brotli-compressed (bin/chromium.br, about 67 MB) and inflates
 * it on first use into the temp folder, about 4 s here. Left to itself it always inflates to
 * `$TMPDIR/chromium`, and reuses whatever file is there, even one half-written by a test
 * worker that is still inflating it. So the package's own `executablePath()` is run in a child
 * process whose TMPDIR is a fresh staging folder, and the finished folder is then renamed to
 * one named after the package version: the rename is atomic, so a caller sees either no
 * folder or a complete one, and two workers starting at once both end up on the same one.
 * Nothing is downloaded: the package fetches only when `executablePath()` is given a URL.
 *
 * `CHROMIUM=/path/to/chromium` overrides the binary (e.g. a system Chromium); the launch
 * flags stay the same.
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, renameSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const PACKAGE = '@sparticuz/chromium';

/**
 * Launch flags for every browser test. `--no-sandbox`: the tests run as root, where Chromium's
 * sandbox cannot start. `--disable-gpu`: there is no GPU; pages are drawn in software. The other
 * five keep Chromium from reaching for the network on its own (the machine's network is closed,
 * and a test must fetch nothing it did not ask for). The package's own `args` list is not used:
 * it is made for serverless hosts and carries `--single-process` (which Playwright does not
 * support), `--disable-web-security` and `--allow-running-insecure-content` (which would hide
 * exactly what the report and panel tests check: that a page fetches nothing and obeys its
 * content security policy), and WebGL on SwiftShader, which no test needs.
 */
export const BROWSER_ARGS = Object.freeze([
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
]);

/** The version of the installed package, read from its package.json. */
export function chromiumPackageVersion() {
  const pkg = join(ROOT, 'node_modules', PACKAGE, 'package.json');
  return JSON.parse(readFileSync(pkg, 'utf8')).version;
}

/**
 * Inflate the package's Chromium into `cacheRoot/name` (which appears, by rename, only once
 * complete); returns the binary. Staging folders left by an interrupted run are removed once
 * they are an hour old.
 */
async function inflateInto(cacheRoot, name) {
  const folder = join(cacheRoot, name);
  for (const f of readdirSync(cacheRoot)) {
    if (!f.startsWith(`${name}-partial-`)) continue;
    const path = join(cacheRoot, f);
    if (Date.now() - statSync(path).mtimeMs > 3_600_000) rmSync(path, { recursive: true, force: true });
  }
  const staging = mkdtempSync(join(cacheRoot, `${name}-partial-`));
  try {
    const script = `const c = (await import(${JSON.stringify(PACKAGE)})).default; process.stdout.write(await c.executablePath());`;
    const { stdout } = await promisify(execFile)(process.execPath, ['--input-type=module', '-e', script], {
      cwd: ROOT,
      env: { ...process.env, TMPDIR: staging },
    });
    if (stdout !== join(staging, 'chromium'))
      throw new Error(`${PACKAGE} inflated to ${stdout}, not ${staging}`);
    try {
      renameSync(staging, folder);
    } catch (e) {
      // Another caller finished first: use its folder, drop this one.
      if (!existsSync(join(folder, 'chromium'))) throw e;
    }
  } finally {
    rmSync(staging, { recursive: true, force: true });
  }
  return join(folder, 'chromium');
}

/**
 * The browser for a test: `{ executablePath, args }` for playwright-core's `chromium.launch` or
 * `launchPersistentContext` (headless, the default there). `cacheRoot` (default: the temp
 * folder) holds `fatigue-notes-chromium-<version>/`.
 *
 * @param {{ cacheRoot?: string }} [options]
 * @returns {Promise<{ executablePath: string, args: string[] }>}
 */
export async function testBrowser(options = {}) {
  const args = [...BROWSER_ARGS];
  if (process.env.CHROMIUM) return { executablePath: process.env.CHROMIUM, args };
  const cacheRoot = options.cacheRoot ?? tmpdir();
  const name = `fatigue-notes-chromium-${chromiumPackageVersion()}`;
  const binary = join(cacheRoot, name, 'chromium');
  const executablePath = existsSync(binary) ? binary : await inflateInto(cacheRoot, name);
  return { executablePath, args };
}
