/** docs/diagnostics.md names every diagnostic code the sources can emit (keeps the docs true). */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { expect, it } from 'vitest';

function files(dir: string, out: string[] = []): string[] {
  for (const n of readdirSync(dir)) {
    const p = join(dir, n);
    if (statSync(p).isDirectory()) files(p, out);
    else if (p.endsWith('.ts')) out.push(p);
  }
  return out;
}

it('every diagnostic code in shared-core and server is documented', () => {
  const doc = readFileSync('docs/diagnostics.md', 'utf8');
  const codes = new Set<string>();
  for (const f of [...files('shared-core/src'), ...files('server/src')]) {
    const s = readFileSync(f, 'utf8');
    for (const m of s.matchAll(/diag\(\s*'(?:error|warning|information|hint)',\s*'([a-z-]+)'/g))
      codes.add(m[1]);
    for (const m of s.matchAll(/code:\s*'([a-z-]+)'/g)) codes.add(m[1]);
    for (const m of s.matchAll(/ExpressionError\(\s*'([a-z-]+)'/g)) codes.add(m[1]);
  }
  expect(codes.size).toBeGreaterThan(40);
  const missing = [...codes].filter((c) => !doc.includes(`\`${c}\``));
  expect(missing).toEqual([]);
});
