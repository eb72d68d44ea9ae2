/**
 * The extension bundle holds no copy of the core and no mathjs: the language server is the
 * one place that evaluates, and the extension only presents its results. Built here as
 * scripts/build.mjs builds it (minified), and read through esbuild's metafile.
 */
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { DIAGRAM_STYLE } from '@fatigue-notes/core';
import { build } from 'esbuild';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '../..');

describe('extension bundle', () => {
  it('has no input from shared-core/ or mathjs, and stays small', async () => {
    const r = await build({
      entryPoints: [resolve(ROOT, 'client/src/extension.ts')],
      bundle: true,
      platform: 'node',
      target: 'node20',
      format: 'cjs',
      minify: true,
      external: ['vscode'],
      write: false,
      metafile: true,
      outfile: resolve(ROOT, 'client/dist/extension.js'),
      absWorkingDir: ROOT,
      logLevel: 'error',
    });
    const inputs = Object.keys(r.metafile.inputs);
    // The bundle does hold the client and the language client (a test that can fail).
    expect(inputs.some((p) => p.startsWith('client/src/'))).toBe(true);
    expect(inputs.some((p) => p.includes('node_modules/vscode-languageclient/'))).toBe(true);
    expect(inputs.filter((p) => p.startsWith('shared-core/'))).toEqual([]);
    expect(inputs.filter((p) => p.includes('node_modules/mathjs/'))).toEqual([]);
    expect(inputs.filter((p) => /node_modules\/(unified|remark-parse|micromark)/.test(p))).toEqual([]);
    // With the core and mathjs the minified bundle was 1.13 MB; without them about 0.46 MB.
    const bytes = r.outputFiles.find((f) => f.path.endsWith('extension.js'))!.contents.length;
    expect(bytes).toBeLessThan(600 * 1024);
  });

  it("carries the core's diagram style as the stylesheet the build wrote (no drift)", () => {
    const css = resolve(ROOT, 'client/dist/diagrams.css');
    expect(existsSync(css), 'npm run build writes client/dist/diagrams.css').toBe(true);
    expect(readFileSync(css, 'utf8')).toBe(`${DIAGRAM_STYLE.trim()}\n`);
  });
});
