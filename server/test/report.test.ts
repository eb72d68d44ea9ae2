/**
 * `fatigue-notes report`: the HTML written for a note with four checks (a pass, a design-mode
 * solve against a published example, a failing requirement with defaults taken, and a check
 * without requirements), opened in headless Chromium (the npm package's, through
 * test/helpers/browser.mjs): a screenshot and a PDF are produced
 * (test-output/report/), nothing is fetched from anywhere, and the content is asserted.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { evaluateNote } from '@fatigue-notes/core';
import { chromium } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTRACT_BLOCK } from '../../test/fixtures/contractBlock';
import { testBrowser } from '../../test/helpers/browser.mjs';
import { defaultReportPath, runReportCommand } from '../src/cli/report';
import { CAUTIONS } from '../src/report/reportHtml';

const OUT_DIR = resolve(__dirname, '../../test-output/report');
const dir = mkdtempSync(join(tmpdir(), 'fatigue-report-'));

const NOTE = `# Hoist drive: fatigue checks

Loads from the duty cycle of section 3.

${CONTRACT_BLOCK}
Countershaft sized by design mode (Shigley MED 8th ed., Solutions Manual, Problem 7-1 data).

\`\`\`fatigue countershaft_sizing
title: Countershaft diameter for n = 2 (DE-Goodman)
Sut = 100 ksi
Sy = 80 ksi
Se = 30 ksi
Kf = 2.2
Kfs = 1.8
rotation: non-rotating
M_a = 600 lbf*in
M_m = 500 lbf*in
T_a = 400 lbf*in
T_m = 300 lbf*in
surface: machined
feature: none
temp = 70 degF
reliability = 0.5
criterion: goodman
solve: d for n_f = 2
require: n_f >= 2
\`\`\`

\`\`\`fatigue idler_pin
title: Idler pin, plain section
Sut = 440 MPa
Sy = 370 MPa
surface: hot-rolled
d = 20 mm
feature: none
M_max = 120 N*m
M_min = -120 N*m
criterion: gerber
require: n_f >= 5
\`\`\`

\`\`\`fatigue bracket_bolt_preview
Sut = 830 MPa
Sy = 640 MPa
surface: ground
temp = 20 degC
reliability = 0.9
d = 12 mm
feature: none
F_a = 4 kN
F_m = 6 kN
criterion: goodman
\`\`\`
`;

let notePath: string;
let htmlPath: string;
let html: string;
let stdout = '';

beforeAll(async () => {
  notePath = join(dir, 'hoist-drive.md');
  writeFileSync(notePath, NOTE);
  htmlPath = join(dir, 'out', 'hoist-drive-report.html');
  mkdirSync(join(dir, 'out'));
  const code = await runReportCommand(['hoist-drive.md', '-o', 'out/hoist-drive-report.html'], {
    stdout: (s) => {
      stdout += s;
    },
    stderr: (s) => {
      throw new Error(`unexpected stderr: ${s}`);
    },
    cwd: dir,
  });
  expect(code).toBe(0);
  html = readFileSync(htmlPath, 'utf8');
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('report HTML (static)', () => {
  const evaluated = evaluateNote(NOTE);

  it('says what it wrote', () => {
    expect(stdout).toMatch(
      /wrote out\/hoist-drive-report\.html: 4 check\(s\): 2 pass, 1 fail, 0 error, 1 unchecked/,
    );
  });

  it('is self-contained: no external address, no script, no link or import', () => {
    expect(html).not.toMatch(/https?:\/\//i);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/<link\b/i);
    expect(html).not.toMatch(/@import|url\(/i);
    expect(html).not.toMatch(/\bsrc=/i);
  });

  it('has a title block with the note, the date, the tool version and room for the signatures', () => {
    expect(html).toContain('<h1>hoist-drive.md</h1>');
    expect(html).toMatch(/Evaluated<\/dt><dd>\d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    expect(html).toMatch(/fatigue-notes \d+\.\d+\.\d+/);
    expect(html).toContain("Checker's signature");
  });

  it('has one section per check, with its status', () => {
    for (const c of evaluated.checks) {
      expect(html).toContain(`<section class="check" id="check-${c.id}" data-check="${c.id}">`);
    }
    expect(evaluated.checks.map((c) => c.status)).toEqual(['pass', 'pass', 'fail', 'unchecked']);
  });

  it("renders every value of every check as the core displays it, with each result's formula and source", () => {
    const escHtml = (t: string) =>
      t
        .replace(/&/g, '&amp;')
        .replace(/</g, '&lt;')
        .replace(/>/g, '&gt;')
        .replace(/"/g, '&quot;')
        .replace(/'/g, '&#39;');
    for (const c of evaluated.checks) {
      const section = html.slice(html.indexOf(`id="check-${c.id}"`));
      for (const name of c.order) {
        const v = c.values[name];
        expect(section, `${c.id}.${name}`).toContain(`<span class="sym">${name}</span>`);
        expect(section, `${c.id}.${name}`).toContain(`<td class="num">${escHtml(v.display)}</td>`);
        if (v.origin === 'computed' && v.formula) expect(section).toContain(escHtml(v.formula));
        if (v.origin === 'computed' && v.source) expect(section).toContain(escHtml(v.source));
      }
    }
  });

  it('shows the solved diameter of Shigley MED 8th ed., Solutions Manual, Problem 7-1 (DE-Goodman): d = 1.073 in', () => {
    const section = html.slice(html.indexOf('id="check-countershaft_sizing"'));
    expect(section).toContain('<td class="num">1.073 in</td>');
    expect(section).toContain('solved: n_f(d) = 2');
    expect(section).toContain('<span class="origin solved">solved</span>');
  });

  it('lists the requirements with their status', () => {
    expect(html).toContain('<code>n_f &gt;= 5</code>');
    expect(html).toMatch(/<span class="badge notmet">not met<\/span>/);
    expect(html).toContain('No <code>require:</code> line');
  });

  it('has the assumptions register: defaulted values with their assumption, defaulted options and diagnostics, with lines', () => {
    const start = html.indexOf('id="assumptions"');
    const register = html.slice(start, html.indexOf('</section>', start));
    // idler_pin states neither temp nor reliability: kd and ke are defaults, on the block's opening line.
    const idlerLine = NOTE.split('\n').indexOf('```fatigue idler_pin') + 1;
    expect(idlerLine).toBeGreaterThan(40);
    const group = register.slice(register.indexOf('<tr class="group" data-check="idler_pin">'));
    expect(group).toContain(`block at line ${idlerLine}`);
    expect(group).toContain(`<tr><td class="num">${idlerLine}</td><td>value</td><td class="sym">kd = 1</td>`);
    expect(register).toContain('defaulted-temperature');
    expect(register).toContain('defaulted-reliability');
    expect(register).toContain('reliability not stated: 50 %, ke = 1');
    // bracket_bolt_preview: M_m is not the issue; the steel assumption and default options are listed.
    expect(register).toContain('assumed-steel');
    expect(register).toMatch(/load-line = proportional/);
    // Nothing stated is in the register.
    expect(register).not.toContain('Sut = ');
  });

  it('has the diagrams of each stress-life check as inline SVG', () => {
    for (const id of ['drive_shaft_fillet', 'countershaft_sizing', 'idler_pin', 'bracket_bolt_preview']) {
      const start = html.indexOf(`id="check-${id}"`);
      const section = html.slice(start, html.indexOf('</section>', start));
      expect(section, id).toMatch(/<svg [^>]*data-diagram="haigh"/);
      expect(section, id).toMatch(/<svg [^>]*data-diagram="sn"/);
    }
  });

  it('has the cautions', () => {
    for (const c of CAUTIONS) expect(html).toContain(c.replace(/'/g, '&#39;'));
    expect(html).toMatch(/assists a qualified engineer/);
    expect(html).toMatch(/Local codes, standards and licensed engineering practice govern/);
    expect(html).toMatch(/can hurt or kill people/);
  });

  it('writes beside the note by default, and exits 2 on a missing note', async () => {
    expect(defaultReportPath('/a/b/shaft.md')).toBe('/a/b/shaft.html');
    let err = '';
    const code = await runReportCommand(['missing.md'], {
      stdout: () => {},
      stderr: (s) => (err += s),
      cwd: dir,
    });
    expect(code).toBe(2);
    expect(err).toMatch(/cannot read missing\.md/);
    expect(await runReportCommand([], { stdout: () => {}, stderr: () => {}, cwd: dir })).toBe(2);
    expect(await runReportCommand(['hoist-drive.md'], { stdout: () => {}, stderr: () => {}, cwd: dir })).toBe(
      0,
    );
    expect(readFileSync(join(dir, 'hoist-drive.html'), 'utf8')).toContain('<h1>hoist-drive.md</h1>');
  });
});

describe('report in headless Chromium', () => {
  // Chromium start-up, full-page screenshots and the PDF take a while on a loaded machine.
  it('renders, prints to PDF, fetches nothing, and shows every check, value, diagram, the register and the cautions', {
    timeout: 180_000,
  }, async () => {
    mkdirSync(OUT_DIR, { recursive: true });
    const profile = mkdtempSync(join(tmpdir(), 'fatigue-report-chromium-'));
    const { executablePath, args } = await testBrowser();
    const context = await chromium.launchPersistentContext(profile, {
      executablePath,
      headless: true,
      args,
      viewport: { width: 1000, height: 1400 },
    });
    try {
      const page = await context.newPage();
      const requests: string[] = [];
      page.on('request', (r) => requests.push(r.url()));
      const problems: string[] = [];
      page.on('console', (m) => {
        if (m.type() === 'error') problems.push(m.text());
      });
      page.on('pageerror', (e) => problems.push(e.message));
      await page.goto(`file://${htmlPath}`);
      await page.waitForLoadState('load');

      // Nothing but the file itself was requested.
      expect(requests).toEqual([`file://${htmlPath}`]);
      expect(problems).toEqual([]);

      // Content as the reader sees it.
      const text = (await page.locator('body').textContent()) ?? '';
      for (const id of ['drive_shaft_fillet', 'countershaft_sizing', 'idler_pin', 'bracket_bolt_preview'])
        expect(text).toContain(id);
      expect(text).toContain('Assumptions register');
      expect(text).toMatch(/CAUTIONS/i);
      expect(text).toContain('1.073 in');
      expect(await page.locator('section.check').count()).toBe(4);
      expect(await page.locator('section.check svg[data-diagram="haigh"]').count()).toBe(4);
      expect(await page.locator('section.check svg[data-diagram="sn"]').count()).toBe(4);
      expect(await page.locator('table.register tbody tr').count()).toBeGreaterThanOrEqual(6);
      // The SVGs are laid out: each has a real size on the page.
      const boxes = await page.locator('section.check svg').evaluateAll((els) =>
        els.map((e) => {
          const r = e.getBoundingClientRect();
          return [r.width, r.height];
        }),
      );
      for (const [w, h] of boxes) {
        expect(w).toBeGreaterThan(250);
        expect(h).toBeGreaterThan(150);
      }
      // No horizontal overflow on screen: the tables fit the page.
      // (Expressions as text: the test's TypeScript has no DOM library.)
      const overflow = await page.evaluate<number>(
        'document.documentElement.scrollWidth - document.documentElement.clientWidth',
      );
      expect(overflow).toBeLessThanOrEqual(0);

      await page.screenshot({ path: join(OUT_DIR, 'report-top.png') });
      await page.screenshot({ path: join(OUT_DIR, 'report-full.png'), fullPage: true });
      const first = page.locator('#check-countershaft_sizing');
      await first.screenshot({ path: join(OUT_DIR, 'report-check.png') });

      // Print: each check starts on a new page.
      await page.emulateMedia({ media: 'print' });
      const breaks = await page.evaluate<string[]>(
        "[...document.querySelectorAll('section.check')].map((e) => getComputedStyle(e).breakBefore)",
      );
      expect(breaks).toEqual(['page', 'page', 'page', 'page']);
      const pdf = await page.pdf({ path: join(OUT_DIR, 'report.pdf'), format: 'A4', printBackground: true });
      expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page\b/g) ?? []).length;
      // The title page(s), then at least one page per check.
      expect(pages).toBeGreaterThanOrEqual(5);
      expect(readFileSync(join(OUT_DIR, 'report-top.png')).subarray(1, 4).toString('latin1')).toBe('PNG');
    } finally {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    }
  });
});
