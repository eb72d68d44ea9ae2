/**
 * Note bytes as the command line reads them (issue 7): bytes that are not UTF-8 become
 * U+FFFD (WHATWG Encoding Standard, UTF-8 decoder with replacement; from memory), a UTF-8 byte-order mark
 * is dropped, UTF-16 with a BOM is decoded, and CRLF notes give the ranges of LF notes.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { evaluateNote } from '@fatigue-notes/core';
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateFile } from '../src/cli/check';
import { decodeNote } from '../src/files/decode';

const NOTE = [
  '# Note',
  '',
  '```fatigue s',
  'Sut = 630 MPa',
  'Sy = 530 mm',
  'd = 35 mm',
  'M_a = 10 N*m',
  '```',
  '',
].join('\n');

const dir = mkdtempSync(join(tmpdir(), 'fn-bytes-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, bytes: Uint8Array): string {
  const p = join(dir, name);
  writeFileSync(p, bytes);
  return p;
}

describe('decodeNote', () => {
  it('invalid UTF-8 bytes become U+FFFD, one per maximal bad subsequence, and never throw', () => {
    const bytes = Uint8Array.from([0x61, 0xff, 0x62, 0xc3, 0x28, 0xe2, 0x82, 0x63, 0xf0, 0x9f, 0x98]);
    // 0xFF: one; 0xC3 then '(': one; E2 82 then 'c': one; F0 9F 98 at the end: one.
    expect(decodeNote(bytes)).toBe('a\uFFFDb\uFFFD(\uFFFDc\uFFFD');
  });

  it('drops a UTF-8 byte-order mark and decodes UTF-16 LE and BE with one', () => {
    const utf8 = new TextEncoder().encode(NOTE);
    expect(decodeNote(Uint8Array.from([0xef, 0xbb, 0xbf, ...utf8]))).toBe(NOTE);
    const le = Buffer.from(NOTE, 'utf16le');
    expect(decodeNote(Uint8Array.from([0xff, 0xfe, ...le]))).toBe(NOTE);
    const be = Buffer.from(le);
    be.swap16();
    expect(decodeNote(Uint8Array.from([0xfe, 0xff, ...be]))).toBe(NOTE);
  });
});

describe('evaluateFile on odd bytes', () => {
  const want = evaluateNote(NOTE);

  it('a BOM and CRLF line ends give the results of the plain LF note', () => {
    const bytes = new TextEncoder().encode(`\uFEFF${NOTE.replace(/\n/g, '\r\n')}`);
    expect(evaluateFile(file('bom-crlf.md', bytes))).toStrictEqual(want);
  });

  it('junk bytes in the prose leave the check alone; junk bytes in the block are errors on their line', () => {
    const enc = (s: string) => Array.from(new TextEncoder().encode(s));
    const lines = NOTE.split('\n');
    const bytes = Uint8Array.from([
      ...enc(`${lines[0]} `),
      0xff,
      0xfe,
      0x00,
      0x80,
      ...enc(`\n${lines.slice(1, 6).join('\n')}\n`),
      ...enc('junk = '),
      0xc0,
      0xaf,
      ...enc(`\n${lines.slice(6).join('\n')}`),
    ]);
    const r = evaluateFile(file('junk.md', bytes));
    expect(r.checks).toHaveLength(1);
    expect(r.checks[0].values.d.si).toBeCloseTo(0.035, 12);
    const junk = r.diagnostics.find((d) => d.range.start.line === 6);
    expect(junk?.severity).toBe('error');
    expect(r.diagnostics.map((d) => d.code)).not.toContain('internal');
  });

  it('a file of random bytes is read and evaluated without an exception', () => {
    let seed = 7;
    const rnd = () => {
      seed = (seed * 1103515245 + 12345) & 0x7fffffff;
      return seed & 0xff;
    };
    const bytes = Uint8Array.from({ length: 256 * 1024 }, rnd);
    const r = evaluateFile(file('random.md', bytes));
    expect(r.diagnostics.map((d) => d.code)).not.toContain('internal');
  });
});
