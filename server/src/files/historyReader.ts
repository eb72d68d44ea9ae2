/**
 * Reads history files for `method: damage` on behalf of the core: only files inside the
 * workspace, links resolved before the check, read in 64 KiB chunks of bytes so that memory
 * does not grow with the file (one buffer, reused: a chunk is valid during its call only). Only regular files are read: a directory, a FIFO or a device is
 * refused, and the file is opened without blocking and checked again once open, so that a
 * FIFO put in its place between the check and the open cannot hang the server.
 */
import { closeSync, constants, fstatSync, openSync, readSync, realpathSync, statSync } from 'node:fs';
import { dirname, isAbsolute, relative, resolve, sep } from 'node:path';
import type { HistoryChunkReader } from '@fatigue-notes/core';

export function isInside(root: string, target: string): boolean {
  const rel = relative(root, target);
  return rel === '' || (!rel.startsWith('..') && !isAbsolute(rel) && !rel.startsWith(`..${sep}`));
}

export function historyReader(notePath: string, workspaceRoot: string, allowRead = true): HistoryChunkReader {
  return {
    read(relativePath, onChunk) {
      if (!allowRead)
        return {
          ok: false,
          code: 'history-untrusted',
          message: 'history files are not read in an untrusted workspace',
        };
      if (isAbsolute(relativePath) || /^[A-Za-z]:[\\/]/.test(relativePath))
        return {
          ok: false,
          code: 'history-outside',
          message: 'the history path must be relative to the note',
        };
      let root: string;
      try {
        root = realpathSync(workspaceRoot);
      } catch {
        return { ok: false, code: 'history-missing', message: 'the workspace folder cannot be read' };
      }
      const wanted = resolve(dirname(notePath), relativePath);
      if (!isInside(resolve(workspaceRoot), wanted))
        return {
          ok: false,
          code: 'history-outside',
          message: `\`${relativePath}\` is outside the workspace: nothing of it is read`,
        };
      let real: string;
      try {
        real = realpathSync(wanted);
      } catch {
        return { ok: false, code: 'history-missing', message: `history file \`${relativePath}\` not found` };
      }
      if (!isInside(root, real))
        return {
          ok: false,
          code: 'history-outside',
          message: `\`${relativePath}\` links to a file outside the workspace: nothing of it is read`,
        };
      let fd: number;
      try {
        if (!statSync(real).isFile()) return notAFile(relativePath);
        fd = openSync(real, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
      } catch (e) {
        return {
          ok: false,
          code: 'history-missing',
          message: `cannot read \`${relativePath}\`: ${(e as Error).message}`,
        };
      }
      try {
        if (!fstatSync(fd).isFile()) return notAFile(relativePath);
        // The bytes as they are: the core's history reader decodes them (UTF-8, UTF-16 with
        // or without a byte-order mark), across chunk boundaries.
        const buf = Buffer.allocUnsafe(64 * 1024);
        for (;;) {
          const n = readSync(fd, buf, 0, buf.length, null);
          if (n === 0) break;
          onChunk(buf.subarray(0, n));
        }
      } finally {
        closeSync(fd);
      }
      return { ok: true };
    },
  };
}

function notAFile(relativePath: string): { ok: false; code: string; message: string } {
  return {
    ok: false,
    code: 'history-missing',
    message: `\`${relativePath}\` is not a regular file (a folder, a pipe or a device is not read)`,
  };
}

/** The workspace of a note for the command line: the closest folder above it with `.git`, else its own folder. */
export function workspaceOf(notePath: string): string {
  let dir = dirname(resolve(notePath));
  for (;;) {
    try {
      statSync(resolve(dir, '.git'));
      return dir;
    } catch {
      const up = dirname(dir);
      if (up === dir) return dirname(resolve(notePath));
      dir = up;
    }
  }
}
