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
import { HistoryCsvReader } from '@fatigue-notes/core';
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
  const chunks: Buffer[] = [];
  // A chunk is valid during its call only: keep a copy.
  const r = historyReader(note, ws, allow).read(path, (c) => chunks.push(Buffer.from(c)));
  return { r, text: Buffer.concat(chunks).toString('utf8'), chunks };
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

describe('historyReader hands on bytes that the core decodes across its 64 KiB chunks (issue 16)', () => {
  it('a CRLF, a two-byte UTF-8 character and a UTF-16 surrogate pair cut by the 64 KiB boundary read as one', () => {
    const CHUNK = 64 * 1024;
    // UTF-8: the header names a unit with a micro sign; a comment line pads the file so that
    // the CR of a CRLF is the last byte of the first chunk, and the micro sign of a second
    // comment straddles the second boundary.
    const head = 'load_k\u00b5N\r\n';
    const row = '1\r\n-1\r\n';
    let text = head;
    const pad = CHUNK - Buffer.byteLength(text) - Buffer.byteLength('#\r');
    text += `#${'x'.repeat(pad)}\r\n`; // CR at byte CHUNK - 1, LF at byte CHUNK
    const pad2 = 2 * CHUNK - Buffer.byteLength(text) - 2;
    text += `#${'y'.repeat(pad2)}\u00b5\r\n`; // the micro sign's two bytes at 2 CHUNK - 1 and 2 CHUNK
    text += row.repeat(3);
    const bytes = Buffer.from(text, 'utf8');
    expect(bytes[CHUNK - 1]).toBe(13);
    expect(bytes[CHUNK]).toBe(10);
    expect(bytes[2 * CHUNK - 1]).toBe(0xc2);
    writeFileSync(join(ws, 'notes', 'loads', 'split8.csv'), bytes);
    const values: number[] = [];
    const csv = new HistoryCsvReader({ onValue: (x) => values.push(x) });
    expect(historyReader(note, ws).read('loads/split8.csv', (c) => csv.feed(c))).toEqual({ ok: true });
    csv.end();
    expect(values).toEqual([1, -1, 1, -1, 1, -1]);
    expect(csv.header).toEqual(['load_k\u00b5N']);
    expect(csv.blankLineCount).toBe(0);

    // UTF-16 LE with a mark: a surrogate pair (U+1F527) whose halves fall on either side of a boundary.
    const units = `\uFEFFload\n#${'z'.repeat(CHUNK / 2 - 8)}\u{1F527}\n${'2\n-2\n'.repeat(2)}`;
    const le = Buffer.alloc(units.length * 2);
    for (let i = 0; i < units.length; i++) le.writeUInt16LE(units.charCodeAt(i), 2 * i);
    expect(le.readUInt16LE(CHUNK - 2)).toBe(0xd83d); // the high surrogate ends the first chunk
    writeFileSync(join(ws, 'notes', 'loads', 'split16.csv'), le);
    const v16: number[] = [];
    const csv16 = new HistoryCsvReader({ onValue: (x) => v16.push(x) });
    historyReader(note, ws).read('loads/split16.csv', (c) => csv16.feed(c));
    csv16.end();
    expect(v16).toEqual([2, -2, 2, -2]);
    expect(csv16.encoding).toBe('utf-16le-bom');
    expect(csv16.issues.filter((i) => i.severity === 'error')).toEqual([]);
  });
});
