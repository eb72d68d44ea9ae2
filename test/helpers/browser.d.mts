/** Types for browser.mjs (plain JavaScript so that test/real-editor/run.mjs can use it under Node 20). */

/** Launch flags for every browser test: no sandbox (root), no GPU, no network of Chromium's own. */
export declare const BROWSER_ARGS: readonly string[];

/** The version of the installed @sparticuz/chromium package. */
export declare function chromiumPackageVersion(): string;

/**
 * The browser for a test: the Chromium inside @sparticuz/chromium, inflated once into
 * `cacheRoot/fatigue-notes-chromium-<version>/` (default: the temp folder), or `$CHROMIUM`.
 */
export declare function testBrowser(options?: { cacheRoot?: string }): Promise<{
  executablePath: string;
  args: string[];
}>;
