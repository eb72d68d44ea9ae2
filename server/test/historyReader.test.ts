/**
 * History files are read only where the language allows (issue 7; docs/language.md: "CSV path
 * inside the workspace"): a real temporary workspace with escapes, links, a folder, a FIFO,
 * a device and a large file.
 */
import { execFileSync } from 'node:child_process';
import {
  closeSync,
  ftruncateSync,
  mkdirSync,
  mkdtempSync,
  openSync,
  realpathSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { historyReader } from '../src/files/historyReader';

let base: string;
let ws: string;
let note: string;

beforeAll(() => {
  base = realpathSync(mkdtempSync(join(tmpdir(), 'fn-hist-')));
  ws = join(base, 'ws');
  mkdirSync(join(ws, 'notes', 'loads'), { recursive: true });
  note = join(ws, 'notes', 'note.md');
  writeFileSync(note, '# note\n');
  writeFileSync(join(ws, 'notes', 'loads', 'ok.csv'), 'time,stress\n0,1\n1,-1\n');
  writeFileSync(join(base, 'secret.csv'), 'time,stress\n0,99\n');
  symlinkSync(join(base, 'secret.csv'), join(ws, 'notes', 'loads', 'out-link.csv'));
  symlinkSync(join(ws, 'notes', 'loads', 'ok.csv'), join(ws, 'notes', 'in-link.csv'));
  symlinkSync(base, join(ws, 'notes', 'dir-link'));
  symlinkSync('/dev/zero', join(ws, 'notes', 'zero.csv'));
  mkdirSync(join(ws, 'notes', 'folder.csv'));
  if (process.platform !== 'win32') execFileSync('mkfifo', [join(ws, 'notes', 'pipe.csv')]);
  // A sparse file of 64 MiB: large on paper, cheap on disk.
  const fd = openSync(join(ws, 'notes', 'huge.csv'), 'w');
  ftruncateSync(fd, 64 * 1024 * 1024);
  closeSync(fd);
});

afterAll(() => rmSync(base, { recursive: true, force: true }));

function read(path: string, allow = true) {
  const chunks: string[] = [];
  const r = historyReader(note, ws, allow).read(path, (c) => chunks.push(c));
  return { r, text: chunks.join(''), chunks };
}

describe('historyReader confines reads to the workspace', () => {
  it('reads a file inside the workspace, relative to the note', () => {
    const { r, text } = read('loads/ok.csv');
    expect(r).toEqual({ ok: true });
    expect(text).toBe('time,stress\n0,1\n1,-1\n');
  });

  it('refuses `..` escapes and absolute paths without reading anything', () => {
    for (const p of [
      '../../secret.csv',
      'loads/../../../secret.csv',
      join(base, 'secret.csv'),
      '/etc/passwd',
      'C:\\x.csv',
    ]) {
      const { r, chunks } = read(p);
      expect(r, p).toMatchObject({ ok: false, code: 'history-outside' });
      expect(chunks).toEqual([]);
    }
  });

  it('`..` that stays inside the workspace is fine', () => {
    expect(read('loads/../loads/ok.csv').r).toEqual({ ok: true });
  });

  it('refuses a link that points outside (a file, a folder, a device)', () => {
    for (const p of ['loads/out-link.csv', 'dir-link/secret.csv', 'zero.csv']) {
      const { r, chunks } = read(p);
      expect(r, p).toMatchObject({ ok: false, code: 'history-outside' });
      expect(chunks).toEqual([]);
    }
  });

  it('follows a link inside the workspace to a file inside it', () => {
    const { r, text } = read('in-link.csv');
    expect(r).toEqual({ ok: true });
    expect(text).toContain('0,1');
  });

  it('refuses a folder', () => {
    expect(read('folder.csv').r).toMatchObject({ ok: false, code: 'history-missing' });
  });

  it.skipIf(process.platform === 'win32')('refuses a FIFO at once, without waiting for a writer', () => {
    const t0 = performance.now();
    const { r } = read('pipe.csv');
    expect(r).toMatchObject({ ok: false, code: 'history-missing' });
    expect(r.ok === false && r.message).toMatch(/not a regular file/);
    expect(performance.now() - t0).toBeLessThan(1000);
  });

  it('a missing file and an untrusted workspace are errors, not exceptions', () => {
    expect(read('loads/none.csv').r).toMatchObject({ ok: false, code: 'history-missing' });
    expect(read('bad\u0000name.csv').r).toMatchObject({ ok: false });
    expect(read('loads/ok.csv', false).r).toMatchObject({ ok: false, code: 'history-untrusted' });
  });

  it('a large file is streamed in chunks of at most 64 KiB: memory does not grow with the file', () => {
    let n = 0;
    let largest = 0;
    let total = 0;
    const heap0 = process.memoryUsage().heapUsed;
    let heapMax = heap0;
    const r = historyReader(note, ws).read('huge.csv', (c) => {
      n++;
      total += c.length;
      largest = Math.max(largest, c.length);
      if (n % 64 === 0) heapMax = Math.max(heapMax, process.memoryUsage().heapUsed);
    });
    expect(r).toEqual({ ok: true });
    expect(total).toBe(64 * 1024 * 1024);
    expect(largest).toBeLessThanOrEqual(64 * 1024);
    expect(n).toBeGreaterThanOrEqual(1024);
    // The chunks are dropped as they go: far less than the file's 64 MiB (128 MiB as UTF-16).
    expect(heapMax - heap0).toBeLessThan(48 * 1024 * 1024);
  });
});
