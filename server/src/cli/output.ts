/** The `check` command's JSON (contract v1) and SARIF 2.1.0 views of the core's results. */
import type { CheckResult, Diagnostic, NoteResult, Value } from '@fatigue-notes/core';

export interface FileReport {
  path: string;
  result: NoteResult;
}

function jsonValue(v: Value) {
  if (v.infinite) return { si: null, infinite: true, display: v.display };
  return { si: v.si, display: v.display };
}

function jsonDiagnostic(d: Diagnostic) {
  return {
    line: d.range.start.line + 1,
    column: d.range.start.character + 1,
    endLine: d.range.end.line + 1,
    endColumn: d.range.end.character + 1,
    severity: d.severity,
    code: d.code,
    message: d.message,
    check: d.check ?? null,
  };
}

function jsonCheck(c: CheckResult) {
  const values: Record<string, ReturnType<typeof jsonValue>> = {};
  for (const name of c.order) values[name] = jsonValue(c.values[name]);
  return {
    id: c.id,
    title: c.title ?? null,
    line: c.range.start.line + 1,
    method: c.method,
    status: c.status,
    values,
    requirements: c.requirements.map((r) => ({ text: r.text, met: r.met })),
  };
}

/** One file's entry of the JSON output. */
export function jsonFile(r: FileReport) {
  return {
    path: r.path,
    checks: r.result.checks.map(jsonCheck),
    diagnostics: r.result.diagnostics.map(jsonDiagnostic),
  };
}

/** The JSON output of files whose entries are made already (`jsonFile`). */
export function jsonOf(files: Array<ReturnType<typeof jsonFile>>) {
  return { version: 1, files };
}

export function toJson(reports: FileReport[]) {
  return jsonOf(reports.map(jsonFile));
}

const SARIF_LEVEL = { error: 'error', warning: 'warning', information: 'note', hint: 'note' } as const;

/** SARIF needs of a note only its path and diagnostics. */
export interface SarifReport {
  path: string;
  result: Pick<NoteResult, 'diagnostics'>;
}

export function toSarif(reports: SarifReport[], version: string) {
  const rules = new Map<string, { id: string; shortDescription: { text: string } }>();
  const results = [];
  for (const r of reports) {
    for (const d of r.result.diagnostics) {
      if (!rules.has(d.code))
        rules.set(d.code, { id: d.code, shortDescription: { text: d.code.replace(/-/g, ' ') } });
      results.push({
        ruleId: d.code,
        level: SARIF_LEVEL[d.severity],
        message: { text: d.check ? `${d.check}: ${d.message}` : d.message },
        locations: [
          {
            physicalLocation: {
              artifactLocation: { uri: r.path.split('\\').join('/') },
              region: {
                startLine: d.range.start.line + 1,
                startColumn: d.range.start.character + 1,
                endLine: d.range.end.line + 1,
                endColumn: d.range.end.character + 1,
              },
            },
          },
        ],
      });
    }
  }
  return {
    $schema: 'https://json.schemastore.org/sarif-2.1.0.json',
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: 'fatigue-notes',
            version,
            informationUri: 'https://example.invalid/fatigue-notes',
            rules: [...rules.values()],
          },
        },
        results,
      },
    ],
  };
}
