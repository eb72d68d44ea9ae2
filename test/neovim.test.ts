/**
 * A second, independent LSP client: Neovim (Debian's 0.7, built-in LSP client) started
 * headless on a sample note. A Lua script attaches the server, waits for diagnostics,
 * asks for a hover, and writes both to a file that this test reads. The expected values
 * come from the core (`evaluateNote` of the same note). Skipped only when `nvim` is absent.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { evaluateNote } from '@fatigue-notes/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCli, ROOT } from '../server/test/helpers/lspProcess';

const nvim = spawnSync('nvim', ['--version'], { encoding: 'utf8' });
const hasNvim = nvim.status === 0;
const SKIPPED = 'skipped: nvim not on PATH (apt-get install neovim)';
if (!hasNvim) console.warn(`neovim.test.ts: Neovim as LSP client ${SKIPPED}`);

const FIXTURE = join(ROOT, 'server/test/fixtures/conveyor-note.md');

function lua(s: string): string {
  return JSON.stringify(s); // a JSON string is a valid Lua string literal for these paths
}

describe.skipIf(!hasNvim)(`Neovim as LSP client${hasNvim ? '' : ` (${SKIPPED})`}`, () => {
  let dir = '';
  let dispose = () => {};
  let output: string[] = [];
  const text = readFileSync(FIXTURE, 'utf8');
  const lines = text.split('\n');
  const hoverLine = lines.findIndex((l) => l.startsWith('require: n_f >= 1.5, n_y'));

  beforeAll(async () => {
    const built = await buildCli();
    dispose = built.dispose;
    dir = mkdtempSync(join(tmpdir(), 'fatigue-notes-nvim-'));
    const note = join(dir, 'conveyor-note.md');
    copyFileSync(FIXTURE, note);
    const out = join(dir, 'received.txt');
    const script = join(dir, 'client.lua');
    writeFileSync(
      script,
      `
local lines = {}
vim.cmd('edit ' .. vim.fn.fnameescape(${lua(note)}))
local buf = vim.api.nvim_get_current_buf()
local id = vim.lsp.start_client({
  name = 'fatigue-notes',
  cmd = { ${lua(process.execPath)}, ${lua(built.script)}, 'lsp', '--stdio' },
  root_dir = ${lua(dir)},
})
vim.lsp.buf_attach_client(buf, id)
local ok = vim.wait(30000, function() return #vim.diagnostic.get(buf) > 0 end, 50)
if not ok then table.insert(lines, 'timeout waiting for diagnostics') end
for _, d in ipairs(vim.diagnostic.get(buf)) do
  local code = d.code or (d.user_data and d.user_data.lsp and d.user_data.lsp.code) or '?'
  table.insert(lines, string.format('diag %d %d %s %s', d.lnum, d.col, tostring(code), d.message))
end
local params = { textDocument = vim.lsp.util.make_text_document_params(buf), position = { line = ${hoverLine}, character = 10 } }
local res = vim.lsp.buf_request_sync(buf, 'textDocument/hover', params, 20000)
for _, r in pairs(res or {}) do
  if r.error then table.insert(lines, 'hover-error ' .. vim.inspect(r.error)) end
  if r.result and r.result.contents then
    local v = r.result.contents.value or vim.inspect(r.result.contents)
    for s in string.gmatch(v, '[^\\n]+') do table.insert(lines, 'hover ' .. s) end
  end
end
vim.fn.writefile(lines, ${lua(out)})
vim.lsp.stop_client(id)
vim.wait(2000, function() return vim.lsp.get_client_by_id(id) == nil end, 50)
vim.cmd('qa!')
`,
    );
    const run = spawnSync(
      'nvim',
      ['--headless', '-n', '-u', 'NONE', '-i', 'NONE', '-c', `luafile ${script}`],
      {
        cwd: dir,
        encoding: 'utf8',
        timeout: 90_000,
        killSignal: 'SIGKILL',
        env: { ...process.env, XDG_STATE_HOME: dir, XDG_DATA_HOME: dir, XDG_CONFIG_HOME: dir },
      },
    );
    if (!existsSync(out))
      throw new Error(
        `nvim wrote nothing (status ${run.status}, signal ${run.signal}): ${run.stderr}${run.stdout}`,
      );
    output = readFileSync(out, 'utf8').split('\n');
  }, 120_000);

  afterAll(() => {
    dispose();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('receives the core diagnostics of the note', () => {
    const expected = evaluateNote(text)
      .diagnostics.map((d) => `diag ${d.range.start.line} ${d.range.start.character} ${d.code} ${d.message}`)
      .sort();
    const got = output.filter((l) => l.startsWith('diag ')).sort();
    expect(got).toEqual(expected);
  });

  it('receives a hover with the derivation of n_f', () => {
    const nf = evaluateNote(text).checks[0].values.n_f;
    const hover = output.filter((l) => l.startsWith('hover ')).join('\n');
    expect(hover).toContain(`**${nf.display}**`);
    expect(hover).toContain(nf.formula as string);
    expect(output.some((l) => l.startsWith('hover-error') || l.startsWith('timeout'))).toBe(false);
  });
});
