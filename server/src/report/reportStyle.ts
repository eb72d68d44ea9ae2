/**
 * Style sheet of the HTML report: a plain document for the screen and A4 pages in print
 * (Chromium's print-to-PDF), one check per page where it fits. No web fonts, no images,
 * nothing fetched: system fonts and inline SVG only.
 */
export const REPORT_STYLE = `
:root {
  --ink: #1d232b;
  --muted: #5b6573;
  --rule: #cfd5dd;
  --soft: #f3f5f8;
  --pass: #1f7a44;
  --fail: #b3261e;
  --error: #8a1c7c;
  --unchecked: #5b6573;
  --caution: #8a5a00;
}
* { box-sizing: border-box; }
html { background: #e9ecf0; }
body {
  margin: 0 auto;
  max-width: 210mm;
  background: #fff;
  color: var(--ink);
  font: 10.5pt/1.4 system-ui, -apple-system, "Segoe UI", "Helvetica Neue", Arial, sans-serif;
  padding: 14mm 14mm 18mm;
}
h1, h2, h3 { line-height: 1.2; margin: 0; }
h1 { font-size: 19pt; font-weight: 650; }
h2 { font-size: 14pt; font-weight: 650; margin: 0 0 2mm; }
h3 { font-size: 10.5pt; font-weight: 650; margin: 5mm 0 1.5mm; text-transform: uppercase; letter-spacing: 0.04em; color: var(--muted); }
p { margin: 0 0 2mm; }
h4.table-title { font-size: 9.5pt; font-weight: 650; margin: 4mm 0 1mm; }
table.extra td { font-variant-numeric: tabular-nums; }
code, .sym { font-family: ui-monospace, "SFMono-Regular", "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 0.92em; }
.muted { color: var(--muted); }
.small { font-size: 8.5pt; }

/* Title block */
.title-block { border: 1.5px solid var(--ink); display: grid; grid-template-columns: 1fr 62mm; margin-bottom: 5mm; }
.title-block .main { padding: 4mm 5mm; border-right: 1px solid var(--ink); }
.title-block .kicker { font-size: 8.5pt; letter-spacing: 0.12em; text-transform: uppercase; color: var(--muted); margin-bottom: 1mm; }
.title-block dl { display: grid; grid-template-columns: auto 1fr; gap: 0.6mm 4mm; margin: 3mm 0 0; font-size: 9pt; }
.title-block dt { color: var(--muted); }
.title-block dd { margin: 0; overflow-wrap: anywhere; }
.signatures { display: grid; grid-template-rows: repeat(3, 1fr); font-size: 8.5pt; }
.signatures div { border-bottom: 1px solid var(--ink); padding: 1.5mm 3mm 7mm; color: var(--muted); }
.signatures div:last-child { border-bottom: 0; }

.tally { display: inline-flex; gap: 3mm; flex-wrap: wrap; }

/* Status badges */
.badge { display: inline-block; border-radius: 3px; padding: 0.2mm 1.8mm; font-size: 8pt; font-weight: 700; letter-spacing: 0.06em; color: #fff; text-transform: uppercase; white-space: nowrap; vertical-align: 0.1em; }
.badge.pass { background: var(--pass); }
.badge.fail { background: var(--fail); }
.badge.error { background: var(--error); }
.badge.unchecked { background: var(--unchecked); }
.badge.met { background: var(--pass); }
.badge.notmet { background: var(--fail); }
.badge.noteval { background: var(--unchecked); }
.origin { display: inline-block; border: 1px solid var(--rule); border-radius: 3px; padding: 0 1.2mm; font-size: 7.5pt; color: var(--muted); white-space: nowrap; }
.origin.default { border-color: var(--caution); color: var(--caution); }
.origin.solved { border-color: #2f6db5; color: #2f6db5; }

/* Cautions */
.cautions { border-left: 3px solid var(--caution); background: #fbf6ec; padding: 2.5mm 4mm; margin: 0 0 5mm; font-size: 9pt; }
.cautions h3 { margin: 0 0 1mm; color: var(--caution); }
.cautions ul { margin: 0; padding-left: 4.5mm; }

/* Tables */
table { width: 100%; border-collapse: collapse; font-size: 9pt; margin: 0 0 2mm; }
th, td { text-align: left; vertical-align: top; padding: 1.1mm 1.8mm; border-bottom: 1px solid var(--rule); }
th { font-size: 8pt; font-weight: 650; color: var(--muted); text-transform: uppercase; letter-spacing: 0.04em; border-bottom: 1.5px solid var(--ink); }
tr { break-inside: avoid; }
td.num { white-space: nowrap; font-variant-numeric: tabular-nums; }
td.sym { overflow-wrap: anywhere; }
td.name .sym { font-weight: 600; }
td.reqs code { white-space: nowrap; }
table.inputs, table.results, table.register, table.summary, table.diagnostics, table.requirements { table-layout: fixed; }
col.c-name { width: 21%; }
col.c-value { width: 13%; }
col.c-origin { width: 11%; }
col.c-check { width: 20%; }
col.c-line { width: 7%; }
col.c-kind { width: 9%; }
tr.group th { text-transform: none; letter-spacing: 0; font-size: 9pt; color: var(--ink); background: var(--soft); border-bottom: 1px solid var(--rule); padding-top: 1.6mm; }
col.c-taken { width: 20%; }
col.c-code { width: 15%; }
col.c-sev { width: 11%; }
col.c-status { width: 15%; }
col.c-where { width: 10%; }
col.c-reqs { width: 26%; }
.derivation .formula { font-family: ui-monospace, "SFMono-Regular", "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 8.6pt; overflow-wrap: anywhere; }
.derivation .with, .derivation .terms, .derivation .src, .derivation .note { font-size: 8pt; color: var(--muted); overflow-wrap: anywhere; }
.derivation .note { color: var(--caution); }
.derivation .src::before { content: "Source: "; font-weight: 600; }
.derivation .tool { font-size: 8pt; color: var(--muted); }

/* Checks */
.check { margin-top: 9mm; padding-top: 4mm; border-top: 2px solid var(--ink); }
.check-head { display: flex; justify-content: space-between; align-items: baseline; gap: 4mm; }
.check-head .where { font-size: 8.5pt; color: var(--muted); white-space: nowrap; }
.check-meta { font-size: 9pt; color: var(--muted); margin: 0 0 1mm; }
.diagrams { display: grid; grid-template-columns: 1fr 1fr; gap: 3mm; margin: 1mm 0 2mm; break-inside: avoid; }
.diagrams figure { margin: 0; border: 1px solid var(--rule); padding: 1mm; }
.diagrams svg { width: 100%; height: auto; display: block; }
.sev-error { color: var(--fail); font-weight: 650; }
.sev-warning { color: var(--caution); font-weight: 650; }
.sev-information, .sev-hint { color: var(--muted); }
.empty { color: var(--muted); font-style: italic; font-size: 9pt; }
footer { margin-top: 8mm; padding-top: 2mm; border-top: 1px solid var(--rule); font-size: 8pt; color: var(--muted); }
a { color: inherit; }

@page { size: A4; margin: 12mm 11mm 14mm; }
@media print {
  html { background: #fff; }
  body { max-width: none; padding: 0; font-size: 9.5pt; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
  .check { break-before: page; margin-top: 0; }
  h2, h3, .check-head { break-after: avoid; }
  table { break-inside: auto; }
  thead { display: table-header-group; }
  .title-block, .cautions, figure { break-inside: avoid; }
  a { text-decoration: none; }
}
`;
