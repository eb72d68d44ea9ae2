/**
 * The layering of the core, read from the source (common practice, no source): the import
 * graph of shared-core/src has no circle, and no file outside a method's own folder names the
 * method: every view reads the registry (methods/registry.ts).
 */
import { readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { methods } from '../../shared-core/src';
import { CORE, importCircles, importGraph, sourceFiles } from './importGraph';

const ROOT = resolve(__dirname, '../..');

describe('layers of the core', () => {
  it('has no import circle in shared-core/src', () => {
    const graph = importGraph();
    // The reader itself finds a circle where there is one (an independent check of the search).
    expect(
      importCircles(
        new Map([
          ['a.ts', ['b.ts']],
          ['b.ts', ['c.ts']],
          ['c.ts', ['a.ts']],
          ['d.ts', ['a.ts']],
        ]),
      ),
    ).toEqual([['a.ts', 'b.ts', 'c.ts']]);
    expect(graph.size).toBeGreaterThan(100);
    expect(importCircles(graph)).toEqual([]);
  });

  it('names a method only in its own folder (and in tests)', () => {
    const names = methods().map((m) => m.name);
    expect(names.length).toBeGreaterThanOrEqual(3);
    const files = ['shared-core/src', 'server/src', 'client/src'].flatMap((d) => sourceFiles(join(ROOT, d)));
    const offenders: string[] = [];
    for (const file of files) {
      const rel = relative(ROOT, file);
      const text = readFileSync(file, 'utf8');
      for (const name of names) {
        const own = relative(ROOT, join(CORE, 'methods', name));
        if (rel.startsWith(`${own}/`)) continue;
        const quoted = new RegExp(`['"\`]${name}['"\`]`);
        if (quoted.test(text)) offenders.push(`${rel}: '${name}'`);
      }
    }
    expect(offenders).toEqual([]);
  });
});
