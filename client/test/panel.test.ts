/**
 * The summary panel's page in headless Chromium (the npm package's, through playwright-core),
 * fed with the model the extension builds from the server's summary (made by the server's
 * own function from `evaluateNote` results, diagrams drawn): rows, sorting, diagrams, the
 * messages it posts, keyboard use, the empty state, the content security policy and the
 * theme colours.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DIAGRAM_STYLE } from '@fatigue-notes/core';
import { build } from 'esbuild';
import { type Browser, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTRACT_BLOCK } from '../../test/fixtures/contractBlock';
import { testBrowser } from '../../test/helpers/browser.mjs';
import { DIAGRAM_STYLE_FILE, panelHtml } from '../src/panel/html';
import { buildPanelModel } from '../src/panel/model';
import type { PanelModel } from '../src/panel/protocol';
import type { SummaryCheck } from '../src/summary';
import { serverSummary } from './serverSummary';

const ROOT = resolve(__dirname, '../..');
const OUT = join(ROOT, 'test-output');

// Three checks: one passes, one fails, one has an error (a missing unit).
const NOTE = `# Panel sample

${CONTRACT_BLOCK}
\`\`\`fatigue lever_arm
title: Lever arm, plain section
Sut = 500 MPa
Sy = 300 MPa
surface: hot-rolled
d = 20 mm
feature: none
M_max = 200 N*m
M_min = -100 N*m
criterion: goodman
require: n_f >= 2
\`\`\`

\`\`\`fatigue axle_stub
Sut = 600 MPa
d = 25
M_max = 50 N*m
M_min = -50 N*m
\`\`\`
`;

function summaryChecks(text: string): SummaryCheck[] {
  // What the server's `fatigue/summary` returns: the check records with their diagrams drawn
  // and their diagnostics counted, built by the server's own function.
  return serverSummary(text);
}

describe('summary panel in Chromium', () => {
  let browser: Browser;
  let page: Page;
  let dir: string;
  const cspErrors: string[] = [];
  const checks = summaryChecks(NOTE);
  const model = buildPanelModel({ fileName: 'panel-sample.md' }, checks);

  async function post(m: PanelModel): Promise<void> {
    await page.evaluate(
      (mm) => window.postMessage({ type: 'model', model: mm }, '*'),
      m as unknown as object,
    );
  }

  async function posted(): Promise<Array<Record<string, unknown>>> {
    return page.evaluate(() => (window as unknown as { __posted: Array<Record<string, unknown>> }).__posted);
  }

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'fatigue-panel-'));
    await build({
      entryPoints: [join(ROOT, 'client/src/panel/webview/main.ts')],
      bundle: true,
      format: 'iife',
      platform: 'browser',
      target: 'es2022',
      outfile: join(dir, 'panel.js'),
      logLevel: 'error',
    });
    writeFileSync(join(dir, 'panel.css'), readFileSync(join(ROOT, 'client/media/panel.css')));
    // The diagrams' stylesheet the build writes into dist/ from the core.
    writeFileSync(join(dir, DIAGRAM_STYLE_FILE), DIAGRAM_STYLE);
    const nonce = 'TestNonce0123456789abcdefABCDEF0';
    writeFileSync(
      join(dir, 'panel.html'),
      panelHtml({
        cspSource: 'file:',
        nonce,
        scriptUri: 'panel.js',
        styleUri: 'panel.css',
        diagramStyleUri: DIAGRAM_STYLE_FILE,
      }),
    );
    const { executablePath, args } = await testBrowser();
    browser = await chromium.launch({ executablePath, args });
    page = await browser.newPage({ viewport: { width: 1200, height: 900 } });
    page.on('console', (m) => {
      if (/Content Security Policy|Refused/i.test(m.text())) cspErrors.push(m.text());
    });
    await page.addInitScript(() => {
      const w = window as unknown as {
        __posted: unknown[];
        __state: unknown;
        acquireVsCodeApi: () => unknown;
      };
      w.__posted = [];
      w.__state = undefined;
      w.acquireVsCodeApi = () => ({
        postMessage: (m: unknown) => w.__posted.push(m),
        getState: () => w.__state,
        setState: (s: unknown) => {
          w.__state = s;
        },
      });
    });
    await page.goto(`file://${join(dir, 'panel.html')}`);
    await page.evaluate(() => {
      // A dark theme's variables, as VS Code sets them on the webview's <html>.
      const s = document.documentElement.style;
      s.setProperty('--vscode-editor-background', '#1e1e1e');
      s.setProperty('--vscode-editor-foreground', '#d4d4d4');
      s.setProperty('--vscode-foreground', '#cccccc');
      s.setProperty('--vscode-descriptionForeground', '#9d9d9d');
      s.setProperty('--vscode-charts-blue', 'rgb(55, 148, 255)');
      s.setProperty('--vscode-charts-green', 'rgb(137, 209, 133)');
      s.setProperty('--vscode-charts-orange', 'rgb(209, 134, 22)');
      s.setProperty('--vscode-charts-purple', 'rgb(179, 128, 255)');
      s.setProperty('--vscode-charts-red', 'rgb(241, 76, 76)');
      s.setProperty('--vscode-list-activeSelectionBackground', '#04395e');
      s.setProperty('--vscode-list-inactiveSelectionBackground', '#37373d');
      s.setProperty('--vscode-focusBorder', '#007fd4');
      s.setProperty('--vscode-editorWidget-border', '#454545');
      s.setProperty('--vscode-badge-background', '#616161');
      s.setProperty('--vscode-badge-foreground', '#f8f8f8');
      s.setProperty('--vscode-editorWarning-foreground', '#cca700');
      s.setProperty('--vscode-errorForeground', '#f48771');
      s.setProperty('--vscode-testing-iconPassed', '#73c991');
      s.setProperty('--vscode-font-family', 'system-ui, sans-serif');
      s.setProperty('--vscode-font-size', '13px');
    });
    await page.waitForFunction(() =>
      (window as unknown as { __posted: Array<{ type: string }> }).__posted.some((m) => m.type === 'ready'),
    );
  });

  afterAll(async () => {
    await browser?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('shows the empty state before any note', async () => {
    await post(buildPanelModel(undefined, []));
    await expect(page.locator('#empty')).toBeDefined();
    expect(await page.locator('#empty').isVisible()).toBe(true);
    expect(await page.locator('#empty').textContent()).toContain('No note open');
    expect(await page.locator('#results').isVisible()).toBe(false);
    expect(await page.locator('footer.caution').textContent()).toMatch(
      /qualified engineer.*codes, standards/s,
    );
  });

  it('lists one row per check with id, method, criterion, factors and status', async () => {
    await post(model);
    const rows = page.locator('#rows tr');
    expect(await rows.count()).toBe(3);
    const ids = await page.locator('#rows tr th code').allInnerTexts();
    expect(ids).toEqual(['drive_shaft_fillet', 'lever_arm', 'axle_stub']);
    const first = await rows.nth(0).locator('td').allInnerTexts();
    // The cells are the check's own displays.
    expect(first).toEqual([
      checks[0].title,
      'stress-life',
      'goodman',
      checks[0].values.n_f.display,
      checks[0].values.n_y.display,
      `N_f ${checks[0].values.N_f.display}`,
      '✓ pass',
    ]);
    expect(await rows.nth(1).locator('.status').textContent()).toBe('✗ fail');
    expect(await rows.nth(2).locator('.status').textContent()).toBe('! error');
    expect(await page.locator('#note').textContent()).toBe('panel-sample.md');
  });

  it('draws the Haigh and S-N diagrams of the selected check, coloured by the theme', async () => {
    const figs = page.locator('#detail figure');
    expect(await figs.count()).toBe(2);
    expect(await page.locator('#detail figure[data-kind="haigh"] svg[role="img"]').count()).toBe(1);
    expect(await page.locator('#detail figure[data-kind="sn"] svg[role="img"]').count()).toBe(1);
    expect(await page.locator('#detail figure[data-kind="haigh"] svg title').first().textContent()).toBe(
      'Haigh diagram',
    );
    const stroke = await page
      .locator('#detail polyline[data-key="goodman"]')
      .evaluate((e) => getComputedStyle(e).stroke);
    expect(stroke).toBe('rgb(55, 148, 255)');
    const bg = await page
      .locator('#detail .fn-bg')
      .first()
      .evaluate((e) => getComputedStyle(e).fill);
    expect(bg).toBe('rgb(30, 30, 30)');
    // The derivation lists every value in the check's order, with its source.
    const names = await page.locator('.derivation li code.name').allInnerTexts();
    expect(names).toEqual(checks[0].order.filter((n) => checks[0].values[n]));
    expect(await page.locator('.derivation').textContent()).toContain('Shigley');
    mkdirSync(OUT, { recursive: true });
    await page.screenshot({ path: join(OUT, 'panel-dark.png'), fullPage: true });
    await page.screenshot({ path: join(OUT, 'panel-dark-top.png') });
  });

  it('posts a reveal message when a row is clicked, and shows that check', async () => {
    await page.locator('#rows tr').nth(1).click();
    const msgs = await posted();
    expect(msgs.at(-1)).toEqual({ type: 'reveal', index: 1, key: 'lever_arm' });
    expect(await page.locator('#detail h2').textContent()).toContain('lever_arm');
    expect(await page.locator('#rows tr').nth(1).getAttribute('aria-selected')).toBe('true');
    expect(await page.locator('.requirements li.not-met').textContent()).toContain('n_f >= 2');
  });

  it('is usable by keyboard: arrows move, Enter reveals', async () => {
    await page.locator('#rows tr').nth(0).focus();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    const msgs = await posted();
    expect(msgs.at(-1)).toEqual({ type: 'reveal', index: 2, key: 'axle_stub' });
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-key'))).toBe('axle_stub');
    // The error check has no numbers to draw and says so, and points to its problems.
    expect(await page.locator('#detail').textContent()).toContain('No diagram');
    expect(await page.locator('#detail .problems.has-errors').textContent()).toMatch(/^[1-9]\d* errors?, /);
  });

  it('sorts by a column, empty cells last, and toggles the direction', async () => {
    await page.locator('th[data-col="n_f"] button').click();
    expect(await page.locator('th[data-col="n_f"]').getAttribute('aria-sort')).toBe('ascending');
    expect(await page.locator('#rows tr th code').allInnerTexts()).toEqual([
      'lever_arm',
      'drive_shaft_fillet',
      'axle_stub',
    ]);
    await page.locator('th[data-col="n_f"] button').click();
    expect(await page.locator('th[data-col="n_f"]').getAttribute('aria-sort')).toBe('descending');
    expect(await page.locator('#rows tr th code').allInnerTexts()).toEqual([
      'drive_shaft_fillet',
      'lever_arm',
      'axle_stub',
    ]);
    await page.locator('th[data-col="status"] button').click();
    expect(await page.locator('#rows tr th code').allInnerTexts()).toEqual([
      'axle_stub',
      'lever_arm',
      'drive_shaft_fillet',
    ]);
  });

  it('keeps the selection across a live update of the note', async () => {
    await page.locator('#rows tr[data-key="lever_arm"]').click();
    const edited = NOTE.replace('M_max = 200 N*m', 'M_max = 100 N*m');
    await post(buildPanelModel({ fileName: 'panel-sample.md' }, summaryChecks(edited)));
    expect(await page.locator('#rows tr[aria-selected="true"]').getAttribute('data-key')).toBe('lever_arm');
    expect(await page.locator('#detail h2').textContent()).toContain('lever_arm');
  });

  it('says why when the note has no checks or the server failed', async () => {
    await post(buildPanelModel({ fileName: 'empty.md' }, []));
    expect(await page.locator('#empty').textContent()).toContain('No fatigue checks in this note');
    await post(buildPanelModel({ fileName: 'x.md' }, [], 'The language server did not answer'));
    expect(await page.locator('#empty').textContent()).toContain('did not answer');
  });

  it('selects the check the extension names (the line above a block was clicked)', async () => {
    await page.evaluate(
      (mm) => window.postMessage({ type: 'model', model: mm, select: 'axle_stub' }, '*'),
      model as unknown as object,
    );
    await page.waitForFunction(
      () =>
        document.querySelector('#rows tr[aria-selected="true"]')?.getAttribute('data-key') === 'axle_stub',
    );
    expect(await page.locator('#detail h2').textContent()).toContain('axle_stub');
  });

  it('runs under its content security policy without a violation', () => {
    expect(cspErrors).toEqual([]);
  });
});
