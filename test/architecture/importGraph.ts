/**
 * The import graph of shared-core/src, read from the source text (no dependency): every
 * `import ... from './x'` and `export ... from './x'` between the core's own files.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

export const CORE = resolve(__dirname, '../../shared-core/src');

export function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...sourceFiles(p));
    else if (name.endsWith('.ts')) out.push(p);
  }
  return out;
}

function resolveImport(from: string, spec: string): string | null {
  const base = resolve(dirname(from), spec);
  for (const p of [`${base}.ts`, join(base, 'index.ts')]) if (existsSync(p)) return p;
  return null;
}

/** Relative path (from shared-core/src) -> the relative paths it imports. */
export function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of sourceFiles(CORE)) {
    const text = readFileSync(file, 'utf8');
    const targets = new Set<string>();
    for (const m of text.matchAll(/^(?:import|export)\s[^;]*?\sfrom\s+'(\.[^']+)'/gms)) {
      const to = resolveImport(file, m[1]);
      if (to) targets.add(relative(CORE, to));
    }
    graph.set(relative(CORE, file), [...targets]);
  }
  return graph;
}

/** The strongly connected components with more than one file (or a file importing itself): the circles. */
export function importCircles(graph: Map<string, string[]>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    idx.set(v, index);
    low.set(v, index);
    index++;
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v) ?? 0, low.get(w) ?? 0));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v) ?? 0, idx.get(w) ?? 0));
    }
    if (low.get(v) === idx.get(v)) {
      const comp: string[] = [];
      let w: string | undefined;
      do {
        w = stack.pop();
        if (w === undefined) break;
        on.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(comp.sort());
    }
  };
  for (const v of graph.keys()) if (!idx.has(v)) visit(v);
  return out;
}
