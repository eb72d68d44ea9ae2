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

  it('keeps the check context, the shared steps, the methods, the criteria and the diagrams below the language', () => {
    // Folders below the block language and the folders above them that they may not import.
    const below = ['context', 'checks', 'methods', 'criteria', 'diagrams'];
    const above = ['language', 'note', 'design', 'session', 'review'];
    const top = (p: string) => p.split('/')[0];
    const offenders = (graph: Map<string, string[]>) =>
      [...graph].flatMap(([from, tos]) =>
        below.includes(top(from))
          ? tos.filter((to) => above.includes(top(to))).map((to) => `${from} -> ${to}`)
          : [],
      );
    // The reader finds an import that runs upwards where there is one.
    expect(offenders(new Map([['checks/x.ts', ['language/types.ts', 'units/format.ts']]]))).toEqual([
      'checks/x.ts -> language/types.ts',
    ]);
    expect(offenders(importGraph())).toEqual([]);
    // The context is the interface a method is written against: it imports no method or shared step.
    const context = [...importGraph()].filter(([from]) => top(from) === 'context');
    expect(context.length).toBeGreaterThanOrEqual(4);
    for (const [from, tos] of context)
      expect(
        tos.filter((to) => ['checks', 'methods'].includes(top(to))),
        from,
      ).toEqual([]);
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
