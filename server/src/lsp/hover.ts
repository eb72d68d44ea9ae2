/**
 * Hover: the derivation of a value (formula, inputs with their displayed values, terms,
 * result, source, notes, the stated value beside the tool's own, assumption); the meaning
 * of an option and what it drives; another check's value for `other_id.name`; and, on a
 * diagnostic, what to do about it. Everything shown comes from the core's records.
 */
import {
  type CheckResult,
  DIM_LABEL,
  type Diagnostic,
  findMaterial,
  formatNumber,
  headlineValues,
  nameInfo,
  OPTIONS,
  optionInfo,
  type Position,
  type Value,
  wordOwners,
} from '@fatigue-notes/core';
import { type Hover, MarkupKind, type Range } from 'vscode-languageserver/node';
import { checkAt, checkById, contains, type NoteView, statementOn, type Word, wordAt } from './locate';

export function hoverAt(view: NoteView, pos: Position): Hover | null {
  if (pos.line < 0 || pos.line >= view.lineCount) return null;
  const check = checkAt(view.result, pos.line);
  if (!check) return null;
  const digits = view.settings.significantDigits;
  const text = view.line(pos.line);
  const sections: string[] = [];
  let range: Range | undefined;

  if (pos.line === check.headerRange.start.line) {
    if (contains(check.headerRange, pos)) {
      sections.push(checkSummary(check));
      range = check.headerRange;
    }
  } else {
    const word = wordAt(text, pos.character);
    const stmt = statementOn(pos.line, text);
    if (word) {
      const part = describeWord(view, check, word, pos, stmt, digits);
      if (part) {
        sections.push(part.markdown);
        range = part.range;
      }
    }
  }
  const diags = check.diagnostics.filter((d) => contains(d.range, pos));
  if (diags.length > 0) sections.push(diags.map(whatToDo).join('\n\n---\n\n'));
  if (sections.length === 0) return null;
  const hover: Hover = { contents: { kind: MarkupKind.Markdown, value: sections.join('\n\n---\n\n') } };
  if (range) hover.range = range;
  return hover;
}

function describeWord(
  view: NoteView,
  check: CheckResult,
  word: Word,
  pos: Position,
  stmt: ReturnType<typeof statementOn>,
  digits: number,
): { markdown: string; range: Range } | undefined {
  const line = pos.line;
  const wordRange = (start: number, end: number): Range => ({
    start: { line, character: start },
    end: { line, character: end },
  });
  // `other_id.name`
  if (word.check && word.member) {
    const other = checkById(view.result, word.check.text);
    const onCheck = pos.character <= word.check.end;
    if (!other)
      return {
        markdown: `No check \`${word.check.text}\` in this note: a reference names a check above this one.`,
        range: wordRange(word.start, word.end),
      };
    if (onCheck) return { markdown: checkSummary(other), range: wordRange(word.check.start, word.check.end) };
    const v = other.values[word.member.text];
    const where = `from check \`${other.id}\`${other.title ? ` (${other.title})` : ''}, line ${other.range.start.line + 1}`;
    if (!v)
      return {
        markdown: `Check \`${other.id}\` has no input or result \`${word.member.text}\`.`,
        range: wordRange(word.member.start, word.member.end),
      };
    return { markdown: `${derivation(v, digits)}\n\n*${where}*`, range: wordRange(word.start, word.end) };
  }
  // Option key or value.
  if (stmt && stmt.kind === 'option') {
    const key = stmt.key.text;
    if (word.start >= stmt.key.range.start.character && word.end <= stmt.key.range.end.character)
      return { markdown: optionKeyDoc(key, check, line), range: stmt.key.range };
    if (word.start >= stmt.value.range.start.character)
      return { markdown: optionValueDoc(key, stmt.value.text), range: stmt.value.range };
  }
  const name = word.text;
  const v = check.values[name];
  if (stmt && stmt.kind === 'require') {
    const req = check.requirements.find((r) => contains(r.range, pos));
    if (req && v) {
      const verdict = req.met === null ? 'not evaluated' : req.met ? 'met' : '**not met**';
      return {
        markdown: `Requirement \`${req.text}\`: ${verdict} (${name} = ${req.actualDisplay}, required ${req.op} ${req.targetDisplay})\n\n${derivation(v, digits)}`,
        range: wordRange(word.start, word.end),
      };
    }
  }
  const owners = wordOwners(name);
  const foreign = owners && !owners.includes(check.method);
  const whose = foreign
    ? ` A word of ${owners.map((m) => `\`method: ${m}\``).join(' or ')} checks: this check does not read it.`
    : '';
  if (v)
    return {
      markdown: `${derivation(v, digits)}${whose ? `\n\n${whose.trim()}` : ''}`,
      range: wordRange(word.start, word.end),
    };
  const info = nameInfo(name, check.method);
  const elsewhere = whose || ' Not available in this check.';
  if (info)
    return {
      markdown: `**\`${name}\`**: ${info.meaning} (${DIM_LABEL[info.dim]}).${elsewhere}`,
      range: wordRange(word.start, word.end),
    };
  return undefined;
}

/** The derivation of one value, as Markdown. */
export function derivation(v: Value, digits = 4): string {
  const out: string[] = [];
  out.push(`**\`${v.name}\`** = **${v.display}** · ${v.meaning}`);
  if (v.unused) out.push(`*Not used:* ${v.unused}.`);
  if (v.origin === 'stated' && v.tool) {
    out.push(
      `Stated in the note: \`${v.expression ?? v.display}\` = **${v.display}**, used in place of what fatigue-notes would compute: **${v.tool.display}** (${v.tool.basis}, ${v.tool.why})` +
        (v.tool.formula ? `, from \`${v.tool.formula}\`` : '') +
        (v.tool.source ? ` (${v.tool.source})` : ''),
    );
  } else if (v.origin === 'stated') {
    out.push(`Stated in the note: \`${v.expression ?? v.display}\``);
  } else if (v.origin === 'library') out.push('From the material library.');
  else if (v.origin === 'default') out.push('Default value (not stated in the note).');
  if (v.formula) out.push(`\`${v.formula}\``);
  if (v.inputs && v.inputs.length > 0)
    out.push(`with ${v.inputs.map((i) => `${i.name} = ${i.display}`).join(', ')}`);
  if (v.terms && v.terms.length > 0)
    out.push(
      `terms: ${v.terms.map((t) => `${t.name} = ${formatNumber(t.value, digits)}${t.unit ? ` ${t.unit}` : ''}`).join(' · ')}`,
    );
  if (v.notes && v.notes.length > 0) out.push(v.notes.map((n) => `- ${n}`).join('\n'));
  if (v.assumption) out.push(`*Assumed:* ${v.assumption}`);
  if (v.source) out.push(`*Source:* ${v.source}`);
  return out.join('\n\n');
}

export function checkSummary(c: CheckResult): string {
  const head = `**${c.id ?? '(check without id)'}**${c.title ? ` — ${c.title}` : ''}`;
  const key = headlineValues(c).map((v) => `${v.name} = ${v.display}`);
  const reqs = c.requirements.map((r) => `${r.met === true ? '✓' : r.met === false ? '✗' : '?'} ${r.text}`);
  const lines = [
    head,
    `${c.method}${c.criterion ? `, ${c.criterion}` : ''} · status **${c.status}** · units ${c.unitSystem}`,
  ];
  if (key.length > 0) lines.push(key.join(' · '));
  if (reqs.length > 0) lines.push(reqs.join(' · '));
  return lines.join('\n\n');
}

function optionKeyDoc(key: string, check: CheckResult, line: number): string {
  const info = optionInfo(key, check.method);
  if (!info) return `\`${key}:\` is not an option of a fatigue check.`;
  const out = [`**\`${key}:\`** ${info.meaning}`];
  if (info.values)
    out.push(
      Object.entries(info.values)
        .map(([w, m]) => `- \`${w}\`${info.default === w ? ' (default)' : ''}: ${m}`)
        .join('\n'),
    );
  const driven = check.order
    .map((n) => check.values[n])
    .filter((v) => v.origin !== 'stated' && v.range && v.range.start.line === line);
  if (driven.length > 0)
    out.push(
      `Drives here: ${driven.map((v) => `${v.name} = ${v.display} (${v.meaning}${v.unused ? '; not used' : ''})`).join(', ')}`,
    );
  return out.join('\n\n');
}

function optionValueDoc(key: string, word: string): string {
  if (key === 'material') {
    const m = findMaterial(word);
    if (!m) return `\`${word}\` is not a key of the material library.`;
    const mpa = (x: number) => `${formatNumber(x / 1e6, 4)} MPa`;
    const props = [
      `Sut = ${mpa(m.Sut)}`,
      `Sy = ${mpa(m.Sy)}`,
      `E = ${formatNumber(m.E / 1e9, 4)} GPa`,
      m.enduranceLimit
        ? 'has an endurance limit'
        : `no endurance limit: Sf = ${mpa(m.Sf_ref ?? 0)} at ${m.N_ref} cycles`,
    ];
    if (m.K_IC) props.push(`K_IC = ${formatNumber(m.K_IC / 1e6, 4)} MPa*m^0.5`);
    return `**${m.name}** (${m.class}, ${m.condition})\n\n${props.join(' · ')}\n\n*Source:* ${m.source}`;
  }
  const info = OPTIONS[key];
  const meaning = info?.values?.[word];
  if (meaning) return `**\`${key}: ${word}\`**: ${meaning}`;
  if (info?.values)
    return `\`${word}\` is not a value of \`${key}:\` (one of ${Object.keys(info.values).join(', ')})`;
  return `**\`${key}:\`** ${info?.meaning ?? ''}`;
}

function whatToDo(d: Diagnostic): string {
  const out = [`**${d.severity}** \`${d.code}\`: ${d.message}`];
  if (d.fixes && d.fixes.length > 0)
    out.push(`Quick fix${d.fixes.length > 1 ? 'es' : ''}: ${d.fixes.map((f) => f.title).join('; ')}`);
  if (d.severity !== 'error')
    out.push(`To silence this kind of message: set \`fatigueNotes.lints\` to \`{ "${d.code}": false }\`.`);
  return out.join('\n\n');
}
