/**
 * Completion inside fatigue blocks: reserved names (meaning and dimension), option keys and
 * their values, material keys with their properties, units after a number (the check's
 * unit system first), the members of another check after `other_id.`, the results of the
 * check after `require:`; outside blocks, snippets for a new check of each method.
 */
import {
  type CheckResult,
  DIM_LABEL,
  findMaterial,
  formatNumber,
  INPUT_NAMES,
  MATERIALS,
  methods,
  nameInfo,
  OPTIONS,
  optionInfo,
  type Position,
  RESULT_NAMES,
  unitChoices,
  wordOwners,
} from '@fatigue-notes/core';
import {
  type CompletionItem,
  CompletionItemKind,
  InsertTextFormat,
  MarkupKind,
  type Range,
} from 'vscode-languageserver/node';
import { checkAt, checksAbove, isContentLine, type NoteView } from './locate';

export const COMPLETION_TRIGGERS = ['.', ':', ' '];

const STATEMENT_KEYWORDS: Array<{ word: string; doc: string }> = [
  { word: 'require', doc: 'acceptance criteria, e.g. `require: n_f >= 1.5, n_y >= 1.2`' },
  { word: 'solve', doc: 'design mode: `solve: d for n_f = 2` finds the input that gives the target' },
  {
    word: 'spectrum',
    doc: 'one load level of a spectrum: `spectrum: M_a = 300 N*m, M_m = 100 N*m, n = 2e4`',
  },
];

export function completionsAt(view: NoteView, pos: Position): CompletionItem[] {
  if (pos.line < 0 || pos.line >= view.lineCount) return [];
  const text = view.line(pos.line);
  if (pos.character > text.length) return [];
  const check = checkAt(view.result, pos.line);
  const quote = /^\s*(?:>\s?)*/.exec(text)?.[0] ?? '';
  const prefix = text.slice(quote.includes('>') ? quote.length : 0, pos.character);
  if (!check || !isContentLine(check, pos.line))
    return /^\s*[`~]*[A-Za-z-]*$/.test(prefix) ? snippets(pos, prefix) : [];
  const replace = (partial: string): Range => ({
    start: { line: pos.line, character: pos.character - partial.length },
    end: pos,
  });

  // `other_id.` then a member.
  const member = /([A-Za-z_][A-Za-z0-9_]*)\.([A-Za-z0-9_]*)$/.exec(prefix);
  if (member && !/^[0-9]/.test(member[1])) {
    const other = view.result.checks.find((c) => c.id === member[1]);
    if (!other) return [];
    return other.order.map((name) => {
      const v = other.values[name];
      return {
        label: name,
        kind: CompletionItemKind.Field,
        detail: `${v.display} · ${v.meaning}`,
        textEdit: { range: replace(member[2]), newText: name },
      };
    });
  }

  // `key: value`
  const option = /^\s*([A-Za-z_][A-Za-z0-9_-]*)\s*:\s*([A-Za-z0-9_-]*)$/.exec(prefix);
  if (option && option[1] !== 'require' && option[1] !== 'solve' && option[1] !== 'spectrum') {
    const [, key, partial] = option;
    if (key === 'material') return materials(replace(partial));
    const info = optionInfo(key, check.method);
    const values = info?.values;
    if (!values) return [];
    return Object.entries(values).map(([word, meaning], i) => ({
      label: word,
      kind: CompletionItemKind.EnumMember,
      detail: info.default === word ? 'default' : undefined,
      documentation: meaning,
      sortText: String(i).padStart(3, '0'),
      textEdit: { range: replace(partial), newText: word },
    }));
  }

  // `require: n_f >= 1.5, ` then a result of this check.
  const req = /^\s*require\s*:(?:.*,)?\s*([A-Za-z_][A-Za-z0-9_]*)?$/.exec(prefix);
  if (req) {
    const partial = req[1] ?? '';
    return check.order
      .filter((n) => check.values[n].origin !== 'stated')
      .map((name) => {
        const v = check.values[name];
        return {
          label: name,
          kind: CompletionItemKind.Value,
          detail: `${v.display} · ${v.meaning}`,
          textEdit: { range: replace(partial), newText: name },
        };
      });
  }

  // A unit after a number: `d = 35 ` or `spectrum: M_a = 300 `.
  const unit = /(?:^|[^A-Za-z0-9_.])[0-9]+(?:\.[0-9]*)?(?:[eE][+-]?[0-9]+)?\s+([A-Za-z]*)$/.exec(prefix);
  if (unit && prefix.includes('=')) {
    const nameMatch = /([A-Za-z_][A-Za-z0-9_]*)\s*=[^=,]*$/.exec(prefix);
    const dim = nameMatch ? nameInfo(nameMatch[1], check.method)?.dim : undefined;
    return unitChoices(dim, check.unitSystem).map((u, i) => ({
      label: u.unit,
      kind: CompletionItemKind.Unit,
      detail: `${u.meaning} (${u.system})`,
      sortText: String(i).padStart(3, '0'),
      textEdit: { range: replace(unit[1]), newText: u.unit },
    }));
  }

  // Inside an expression: names stated above in this check, and checks above.
  const expr = /=\s*[^#]*?([A-Za-z_][A-Za-z0-9_]*)?$/.exec(prefix);
  if (expr && prefix.includes('=')) {
    const partial = expr[1] ?? '';
    const items: CompletionItem[] = [];
    for (const name of check.order) {
      const v = check.values[name];
      if (v.origin !== 'stated' || !v.range || v.range.start.line >= pos.line) continue;
      items.push({
        label: name,
        kind: CompletionItemKind.Variable,
        detail: `${v.display} · ${v.meaning}`,
        textEdit: { range: replace(partial), newText: name },
      });
    }
    for (const c of checksAbove(view.result, pos.line))
      items.push({
        label: c.id as string,
        kind: CompletionItemKind.Module,
        detail: c.title ?? 'check above',
        documentation: 'another check: follow with `.` and one of its inputs or results',
        textEdit: { range: replace(partial), newText: c.id as string },
      });
    return items;
  }

  // Start of a statement: reserved names, option keys, keywords.
  const start = /^\s*([A-Za-z_][A-Za-z0-9_-]*)?$/.exec(prefix);
  if (start) return statementStarts(check, replace(start[1] ?? ''));
  return [];
}

function statementStarts(check: CheckResult, range: Range): CompletionItem[] {
  const items: CompletionItem[] = [];
  const statedNames = new Set(check.order.filter((n) => check.values[n].origin === 'stated'));
  // The shared words and the check's own method's words; another method's words are not offered.
  const mine = (name: string) => wordOwners(name)?.includes(check.method) ?? true;
  for (const [name, shared] of Object.entries(INPUT_NAMES)) {
    if (statedNames.has(name) || !mine(name)) continue;
    const info = nameInfo(name, check.method) ?? shared;
    items.push({
      label: name,
      kind: CompletionItemKind.Variable,
      detail: DIM_LABEL[info.dim],
      documentation: info.meaning,
      sortText: `1${name}`,
      textEdit: { range, newText: `${name} = ` },
    });
  }
  for (const [name, shared] of Object.entries(RESULT_NAMES)) {
    if (statedNames.has(name) || name in INPUT_NAMES || !mine(name)) continue;
    const info = nameInfo(name, check.method) ?? shared;
    items.push({
      label: name,
      kind: CompletionItemKind.Variable,
      detail: `${DIM_LABEL[info.dim]} · result (stating it overrides the tool's value)`,
      documentation: info.meaning,
      sortText: `3${name}`,
      textEdit: { range, newText: `${name} = ` },
    });
  }
  for (const key of Object.keys(OPTIONS)) {
    const info = optionInfo(key, check.method);
    if (!info || !mine(key)) continue;
    items.push({
      label: `${key}:`,
      filterText: key,
      kind: CompletionItemKind.Property,
      detail: 'option',
      documentation: info.values
        ? `${info.meaning}: ${Object.keys(info.values).join(', ')}${info.default ? ` (default ${info.default})` : ''}`
        : info.meaning,
      sortText: `2${key}`,
      textEdit: { range, newText: `${key}: ` },
    });
  }
  for (const k of STATEMENT_KEYWORDS)
    items.push({
      label: `${k.word}:`,
      filterText: k.word,
      kind: CompletionItemKind.Keyword,
      documentation: k.doc,
      sortText: `0${k.word}`,
      textEdit: { range, newText: `${k.word}: ` },
    });
  return items;
}

function materials(range: Range): CompletionItem[] {
  return MATERIALS.map((m) => {
    const mpa = (x: number) => `${formatNumber(x / 1e6, 4)} MPa`;
    const found = findMaterial(m.key);
    return {
      label: m.key,
      kind: CompletionItemKind.Constant,
      detail: `${m.name}, ${m.condition}: Sut ${mpa(m.Sut)}, Sy ${mpa(m.Sy)}`,
      documentation: {
        kind: MarkupKind.Markdown,
        value: [
          `**${m.name}** (${m.class}, ${m.condition})`,
          `Sut = ${mpa(m.Sut)} · Sy = ${mpa(m.Sy)} · E = ${formatNumber(m.E / 1e9, 4)} GPa`,
          m.enduranceLimit
            ? 'has an endurance limit'
            : `no endurance limit: Sf = ${mpa(m.Sf_ref ?? 0)} at ${m.N_ref} cycles`,
          `*Source:* ${(found ?? m).source}`,
        ].join('\n\n'),
      },
      textEdit: { range, newText: m.key },
    };
  });
}

function snippets(pos: Position, prefix: string): CompletionItem[] {
  const partial = /[`~]*[A-Za-z-]*$/.exec(prefix)?.[0] ?? '';
  const range: Range = { start: { line: pos.line, character: pos.character - partial.length }, end: pos };
  // One snippet per registered method, as the method declares it.
  return methods().map((m) => ({
    label: m.snippet.label,
    filterText: '```fatigue ' + m.name,
    kind: CompletionItemKind.Snippet,
    detail: `new \`method: ${m.name}\` check (replace the placeholders)`,
    insertTextFormat: InsertTextFormat.Snippet,
    textEdit: { range, newText: m.snippet.body().join('\n') },
  }));
}
