/**
 * The reviewer's report of a note as one self-contained HTML document: a title block with
 * room for the signatures, the cautions, a summary of every check, the assumptions
 * register, then one section per check (requirements, inputs, results with their
 * derivations, diagrams, diagnostics).
 *
 * A view of the core's records only: every number is a `Value.display` (or a diagram the
 * core drew from the check's data); nothing is computed here. Pure: the date, the tool
 * version and the note's name come in as arguments. No script, no external address: CSS
 * and SVG are inline.
 */

import type { AssumptionEntry } from '@fatigue-notes/core';
import {
  type CheckResult,
  checkDiagrams,
  DIAGRAM_STYLE,
  type Diagnostic,
  formatNumber,
  type NoteResult,
  type RequirementResult,
  shownNames,
  type Value,
} from '@fatigue-notes/core';
import { REPORT_STYLE } from './reportStyle';

export interface ReportInput {
  /** The note's name as shown (e.g. `notes/shaft.md`). */
  noteName: string;
  result: NoteResult;
  register: AssumptionEntry[];
  toolVersion: string;
  /** When the note was evaluated, already formatted (e.g. `2025-03-01 14:05 UTC`). */
  runDate: string;
}

/** The cautions the product states wherever it shows results. */
export const CAUTIONS: readonly string[] = [
  'This tool assists a qualified engineer; it does not replace one. A competent person must review and sign every check.',
  'Results depend on the stated inputs and on the published methods named beside each result; wrong inputs give wrong answers.',
  'Local codes, standards and licensed engineering practice govern over anything in this report.',
  'Fatigue failures can hurt or kill people: check loads, materials, geometry and the assumptions listed below.',
];

/** Significant digits of the intermediate terms (the values themselves come displayed by the core). */
const TERM_DIGITS = 5;

function esc(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** Escaped text with its `code` spans (as the tool's messages write them) set in code type. */
function prose(text: string): string {
  return esc(text).replace(/`([^`]+)`/g, '<code>$1</code>');
}

/** Escaped identifier that may break after its underscores in a narrow column. */
function breakable(id: string): string {
  return esc(id).replace(/_/g, '_<wbr>');
}

/** Id of the HTML anchor of a check (ids are identifiers; a check without one is named by its line). */
function anchorOf(c: CheckResult): string {
  return c.id ? `check-${c.id}` : `check-line-${c.range.start.line + 1}`;
}

function checkName(c: CheckResult): string {
  return c.id ?? '(no id)';
}

function badge(status: string): string {
  return `<span class="badge ${esc(status)}">${esc(status)}</span>`;
}

function requirementBadge(r: RequirementResult): string {
  if (r.met === true) return '<span class="badge met">met</span>';
  if (r.met === false) return '<span class="badge notmet">not met</span>';
  return '<span class="badge noteval">not evaluated</span>';
}

function isSolved(v: Value): boolean {
  return /^(solved|closest): /.test(v.formula ?? '');
}

function originLabel(v: Value): string {
  if (isSolved(v)) return '<span class="origin solved">solved</span>';
  const text = {
    stated: 'stated',
    library: 'library',
    default: 'default',
    reference: 'other check',
    computed: 'computed',
  }[v.origin];
  return `<span class="origin ${esc(v.origin)}">${esc(text)}</span>`;
}

function line(n: number): string {
  return `line ${n}`;
}

function titleBlock(input: ReportInput): string {
  const checks = input.result.checks;
  const tally = { pass: 0, fail: 0, error: 0, unchecked: 0 };
  for (const c of checks) tally[c.status]++;
  const tallyHtml = (Object.keys(tally) as Array<keyof typeof tally>)
    .filter((k) => tally[k] > 0)
    .map((k) => `<span>${badge(k)} ${tally[k]}</span>`)
    .join('');
  return `<header class="title-block">
  <div class="main">
    <div class="kicker">Fatigue check report</div>
    <h1>${esc(input.noteName)}</h1>
    <dl>
      <dt>Evaluated</dt><dd>${esc(input.runDate)}</dd>
      <dt>Tool</dt><dd>fatigue-notes ${esc(input.toolVersion)}</dd>
      <dt>Checks</dt><dd>${checks.length}: <span class="tally">${tallyHtml}</span></dd>
      <dt>Assumptions</dt><dd>${input.register.length} listed in the register</dd>
    </dl>
  </div>
  <div class="signatures">
    <div>Prepared by / date</div>
    <div>Checked by / date</div>
    <div>Checker's signature</div>
  </div>
</header>`;
}

function cautions(): string {
  return `<section class="cautions" aria-label="Cautions">
  <h3>Cautions</h3>
  <ul>${CAUTIONS.map((c) => `<li>${esc(c)}</li>`).join('')}</ul>
</section>`;
}

function summaryTable(checks: CheckResult[]): string {
  if (checks.length === 0) return '<p class="empty">The note has no fatigue check blocks.</p>';
  const rows = checks.map((c) => {
    // The method's headline results (its registry entry), dimensions found by `solve:` first.
    const key = shownNames(c)
      .headline.filter((n) => isSolved(c.values[n]) || c.values[n].origin === 'computed')
      .map((n) => `<span class="sym">${esc(n)}</span>&nbsp;=&nbsp;${esc(c.values[n].display)}`)
      .join(', ');
    const reqs = c.requirements.map((r) => `${requirementBadge(r)} <code>${esc(r.text)}</code>`).join('<br>');
    return `<tr><td class="name"><a class="sym" href="#${anchorOf(c)}">${breakable(checkName(c))}</a><div class="small muted">${esc(c.title ?? '')}</div></td><td class="num">${c.range.start.line + 1}</td><td>${badge(c.status)}</td><td>${key || '<span class="muted">none</span>'}</td><td class="reqs">${reqs || '<span class="muted">no require: line</span>'}</td></tr>`;
  });
  return `<table class="summary">
<colgroup><col class="c-check"><col class="c-line"><col class="c-status"><col><col class="c-reqs"></colgroup>
<thead><tr><th>Check</th><th>Line</th><th>Status</th><th>Key results</th><th>Requirements</th></tr></thead>
<tbody>${rows.join('\n')}</tbody>
</table>`;
}

function registerTable(register: AssumptionEntry[]): string {
  if (register.length === 0)
    return '<p class="empty">Nothing was taken by default: every value the checks used is stated in the note or read from the material library.</p>';
  const kind = { 'default-value': 'value', 'default-option': 'option', diagnostic: 'note' } as const;
  const rows: string[] = [];
  let group = -1;
  for (const e of register) {
    if (e.checkLine !== group) {
      group = e.checkLine;
      const anchor = e.check ? `check-${e.check}` : `check-line-${e.checkLine}`;
      rows.push(
        `<tr class="group" data-check="${esc(e.check ?? '')}"><th colspan="5"><a class="sym" href="#${anchor}">${breakable(e.check ?? '(no id)')}</a> <span class="muted">block at line ${e.checkLine}</span></th></tr>`,
      );
    }
    rows.push(
      `<tr><td class="num">${e.line}</td><td>${kind[e.kind]}</td><td class="sym">${e.name ? `${esc(e.name)}${e.display ? ` = ${esc(e.display)}` : ''}` : ''}</td><td>${prose(e.text)}</td><td class="sym small muted">${e.codes.map(esc).join(', ')}</td></tr>`,
    );
  }
  return `<table class="register">
<colgroup><col class="c-line"><col class="c-kind"><col class="c-taken"><col><col class="c-code"></colgroup>
<thead><tr><th>Line</th><th>Kind</th><th>Taken</th><th>Assumption</th><th>Code</th></tr></thead>
<tbody>${rows.join('\n')}</tbody>
</table>`;
}

function requirementsTable(c: CheckResult): string {
  if (c.requirements.length === 0)
    return '<p class="empty">No <code>require:</code> line: the check is evaluated but not judged.</p>';
  const rows = c.requirements.map(
    (r) =>
      `<tr><td><code>${esc(r.text)}</code></td><td class="num">${esc(r.actualDisplay)}</td><td class="num">${esc(r.op)} ${esc(r.targetDisplay)}</td><td class="num">${line(r.range.start.line + 1)}</td><td>${requirementBadge(r)}</td></tr>`,
  );
  return `<table class="requirements">
<colgroup><col><col class="c-value"><col class="c-value"><col class="c-where"><col class="c-status"></colgroup>
<thead><tr><th>Requirement</th><th>Value</th><th>Required</th><th>Where</th><th>Status</th></tr></thead>
<tbody>${rows.join('')}</tbody>
</table>`;
}

function notUsed(v: Value): string {
  return v.unused ? `<div class="note">Not used: ${esc(v.unused)}.</div>` : '';
}

function derivation(v: Value): string {
  const parts: string[] = [];
  if (v.unused) parts.push(notUsed(v));
  if (v.formula) parts.push(`<div class="formula">${esc(v.formula)}</div>`);
  if (v.inputs && v.inputs.length > 0)
    parts.push(
      `<div class="with">with ${v.inputs.map((i) => `${esc(i.name)} = ${esc(i.display)}`).join(', ')}</div>`,
    );
  if (v.terms && v.terms.length > 0)
    parts.push(
      `<div class="terms">terms: ${v.terms.map((t) => `${esc(t.name)} = ${esc(formatNumber(t.value, TERM_DIGITS))}${t.unit ? ` ${esc(t.unit)}` : ''}`).join(', ')}</div>`,
    );
  if (v.source) parts.push(`<div class="src">${esc(v.source)}</div>`);
  for (const n of v.notes ?? []) parts.push(`<div class="note">${esc(n)}</div>`);
  if (v.assumption) parts.push(`<div class="note">Assumed: ${esc(v.assumption)}</div>`);
  if (v.tool)
    parts.push(
      `<div class="tool">The note states this value; the tool would compute ${esc(v.tool.display)} from <code>${esc(v.tool.formula)}</code> (${esc(v.tool.source)}).</div>`,
    );
  return parts.join('');
}

function inputCell(v: Value): string {
  if (v.origin === 'stated') {
    const asWritten =
      v.expression && v.expression !== v.display
        ? `<div class="with">as written: <code>${esc(v.expression)}</code></div>`
        : '';
    const tool = v.tool
      ? `<div class="tool">The tool would compute ${esc(v.tool.display)} from <code>${esc(v.tool.formula)}</code> (${esc(v.tool.source)}).</div>`
      : '';
    return `${notUsed(v)}${asWritten}${tool}`;
  }
  return derivation(v);
}

function valueRows(c: CheckResult, names: string[], inputs: boolean): string {
  return names
    .map((n) => {
      const v = c.values[n];
      const where = v.range ? `<div class="small muted">${line(v.range.start.line + 1)}</div>` : '';
      return `<tr><td class="name"><span class="sym">${esc(n)}</span><div class="small muted">${esc(v.meaning)}</div></td><td class="num">${esc(v.display)}</td><td>${originLabel(v)}${where}</td><td class="derivation">${inputs ? inputCell(v) : derivation(v)}</td></tr>`;
    })
    .join('\n');
}

function valuesTables(c: CheckResult): string {
  const inputNames = c.order.filter((n) => {
    const v = c.values[n];
    return v && (v.origin !== 'computed' || isSolved(v));
  });
  const resultNames = c.order.filter((n) => {
    const v = c.values[n];
    return v && v.origin === 'computed' && !isSolved(v);
  });
  const head = (what: string) =>
    `<colgroup><col class="c-name"><col class="c-value"><col class="c-origin"><col></colgroup><thead><tr><th>${what}</th><th>Value</th><th>Origin</th><th>Derivation and source</th></tr></thead>`;
  const inputs =
    inputNames.length > 0
      ? `<table class="inputs">${head('Input')}<tbody>${valueRows(c, inputNames, true)}</tbody></table>`
      : '<p class="empty">No inputs were read.</p>';
  const results =
    resultNames.length > 0
      ? `<table class="results">${head('Result')}<tbody>${valueRows(c, resultNames, false)}</tbody></table>`
      : '<p class="empty">No results: see the diagnostics.</p>';
  return `<h3>Inputs</h3>${inputs}<h3>Results</h3>${results}`;
}

/** The diagrams the core drew, without the SVG namespace address (HTML's parser supplies it). */
function diagrams(c: CheckResult): string {
  const list = checkDiagrams(c, { unitSystem: c.unitSystem, embedStyle: false, width: 520 });
  if (list.length === 0) return '';
  const figures = list.map(
    (d) => `<figure data-kind="${esc(d.kind)}">${d.svg.replace(/\s+xmlns(:[a-z]+)?="[^"]*"/g, '')}</figure>`,
  );
  return `<h3>Diagrams</h3><div class="diagrams">${figures.join('')}</div>`;
}

function extraTables(c: CheckResult): string {
  if (!c.tables || c.tables.length === 0) return '';
  return c.tables
    .map(
      (t) =>
        `<h4 class="table-title">${prose(t.title)}</h4><table class="extra"><thead><tr>${t.columns.map((h) => `<th>${esc(h)}</th>`).join('')}</tr></thead><tbody>${t.rows
          .map((r) => `<tr>${r.map((x) => `<td>${esc(x)}</td>`).join('')}</tr>`)
          .join('')}</tbody></table>`,
    )
    .join('');
}

function diagnosticsTable(list: Diagnostic[]): string {
  if (list.length === 0) return '<p class="empty">No diagnostics.</p>';
  const order = { error: 0, warning: 1, information: 2, hint: 3 };
  const sorted = [...list].sort(
    (a, b) => order[a.severity] - order[b.severity] || a.range.start.line - b.range.start.line,
  );
  const rows = sorted.map(
    (d) =>
      `<tr><td class="sev-${d.severity}">${esc(d.severity)}</td><td class="num">${d.range.start.line + 1}:${d.range.start.character + 1}</td><td class="sym small">${esc(d.code)}</td><td>${prose(d.message)}</td></tr>`,
  );
  return `<table class="diagnostics"><colgroup><col class="c-sev"><col class="c-line"><col class="c-code"><col></colgroup><thead><tr><th>Severity</th><th>Line</th><th>Code</th><th>Message</th></tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

function checkSection(c: CheckResult): string {
  const meta = [
    `method ${c.method}`,
    c.criterion ? `criterion ${c.criterion}` : '',
    `units ${c.unitSystem === 'US' ? 'US customary' : 'SI'}`,
  ]
    .filter(Boolean)
    .join(' · ');
  return `<section class="check" id="${anchorOf(c)}" data-check="${esc(c.id ?? '')}">
  <div class="check-head"><h2><span class="sym">${esc(checkName(c))}</span> ${badge(c.status)}</h2><span class="where">lines ${c.range.start.line + 1}–${c.range.end.line + 1}</span></div>
  ${c.title ? `<p><strong>${esc(c.title)}</strong></p>` : ''}
  <p class="check-meta">${esc(meta)}</p>
  <h3>Requirements</h3>
  ${requirementsTable(c)}
  ${diagrams(c)}
  <h3>Diagnostics</h3>
  ${diagnosticsTable(c.diagnostics)}
  ${valuesTables(c)}
  ${extraTables(c)}
</section>`;
}

/** Diagnostics of the note that belong to no check (rare: e.g. a note-level problem). */
function looseDiagnostics(result: NoteResult): string {
  const inChecks = new Set(result.checks.flatMap((c) => c.diagnostics));
  const loose = result.diagnostics.filter((d) => !inChecks.has(d));
  if (loose.length === 0) return '';
  return `<h2>Other diagnostics</h2>${diagnosticsTable(loose)}`;
}

export function buildReportHtml(input: ReportInput): string {
  const checks = input.result.checks;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="fatigue-notes ${esc(input.toolVersion)}">
<title>Fatigue check report: ${esc(input.noteName)}</title>
<style>${REPORT_STYLE}${DIAGRAM_STYLE}</style>
</head>
<body>
${titleBlock(input)}
${cautions()}
<section class="overview">
<h2>Summary</h2>
${summaryTable(checks)}
</section>
<section class="assumptions" id="assumptions">
<h2>Assumptions register</h2>
<p class="small muted">Every value and option the tool took by default rather than read from the note, with the line it applies to. State them in the note to remove them from this list.</p>
${registerTable(input.register)}
</section>
${looseDiagnostics(input.result)}
${checks.map((c) => checkSection(c)).join('\n')}
<footer>Generated by fatigue-notes ${esc(input.toolVersion)} on ${esc(input.runDate)} from ${esc(input.noteName)}. Every value above is the tool's record of the evaluation; the formula and the published source are given beside each result. ${esc(CAUTIONS[0])}</footer>
</body>
</html>
`;
}
