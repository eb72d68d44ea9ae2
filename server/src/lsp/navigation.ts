/**
 * Navigation: go to definition, find references and rename, for check ids (the id after
 * `fatigue` and every `id.name` that reads it) and for the names of a check (its own
 * statements and every `id.name` elsewhere in the note). Reserved names are the block
 * language's vocabulary and are not renamed.
 */
import {
  type CheckResult,
  ID_PATTERN,
  INPUT_NAMES,
  isReservedWord,
  type Position,
  type Range,
  RESULT_NAMES,
  stripComment,
} from '@fatigue-notes/core';
import type { Location, TextEdit, WorkspaceEdit } from 'vscode-languageserver/node';
import { checkAt, checkById, contains, isContentLine, type NoteView, statementOn, wordAt } from './locate';

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** What a position names: a check, or one name of a check. */
export interface Target {
  check: CheckResult;
  member?: string;
  /** The text under the cursor that a rename replaces. */
  range: Range;
}

export class RenameRefused extends Error {}

export function targetAt(view: NoteView, pos: Position): Target | undefined {
  if (pos.line < 0 || pos.line >= view.lineCount) return undefined;
  const here = checkAt(view.result, pos.line);
  if (!here) return undefined;
  if (pos.line === here.headerRange.start.line)
    return here.id && contains(here.headerRange, pos) ? { check: here, range: here.headerRange } : undefined;
  if (!isContentLine(here, pos.line)) return undefined;
  const text = view.line(pos.line);
  const word = wordAt(text, pos.character);
  if (!word) return undefined;
  const r = (start: number, end: number): Range => ({
    start: { line: pos.line, character: start },
    end: { line: pos.line, character: end },
  });
  if (word.check && word.member) {
    const other = checkById(view.result, word.check.text);
    if (!other) return undefined;
    if (pos.character <= word.check.end) return { check: other, range: r(word.check.start, word.check.end) };
    return { check: other, member: word.member.text, range: r(word.member.start, word.member.end) };
  }
  if (!NAME.test(word.text)) return undefined;
  const stmt = statementOn(pos.line, text);
  if (stmt?.kind === 'option') return undefined;
  if (!here.id || !here.values[word.text]) return undefined;
  return { check: here, member: word.text, range: r(word.start, word.end) };
}

/** One `id.member` in the note. */
interface Reference {
  line: number;
  id: string;
  member: string;
  idStart: number;
  memberStart: number;
}

const REF = /([A-Za-z_][A-Za-z0-9_]*)\.([A-Za-z_][A-Za-z0-9_]*)/g;

function referencesIn(view: NoteView): Reference[] {
  const out: Reference[] = [];
  for (const c of view.result.checks) {
    for (let line = c.range.start.line + 1; line < c.insertLine; line++) {
      const text = stripComment(view.line(line));
      if (!text.includes('.')) continue;
      for (const m of text.matchAll(REF)) {
        const at = m.index ?? 0;
        if (at > 0 && /[A-Za-z0-9_.]/.test(text[at - 1])) continue;
        out.push({ line, id: m[1], member: m[2], idStart: at, memberStart: at + m[1].length + 1 });
      }
    }
  }
  return out;
}

/** Where a name of a check is written in that check itself: its statement and its uses. */
function ownUses(view: NoteView, check: CheckResult, name: string): Range[] {
  const out: Range[] = [];
  const re = new RegExp(`(?<![A-Za-z0-9_.])${name}(?![A-Za-z0-9_])`, 'g');
  for (let line = check.range.start.line + 1; line < check.insertLine; line++) {
    const raw = view.line(line);
    const stmt = statementOn(line, raw);
    if (!stmt || stmt.kind === 'option' || stmt.kind === 'bad') continue;
    const text = stripComment(raw);
    for (const m of text.matchAll(re)) {
      const at = m.index ?? 0;
      // After a number, a symbol is a unit (`250 N` is newtons, not the life N).
      if (/[0-9.]\s*$/.test(text.slice(0, at))) continue;
      if (text[at + name.length] === '.') continue;
      out.push({ start: { line, character: at }, end: { line, character: at + name.length } });
    }
  }
  return out;
}

function idRanges(view: NoteView, id: string): Range[] {
  return referencesIn(view)
    .filter((r) => r.id === id)
    .map((r) => ({
      start: { line: r.line, character: r.idStart },
      end: { line: r.line, character: r.idStart + id.length },
    }));
}

function memberRanges(view: NoteView, id: string, member: string): Range[] {
  return referencesIn(view)
    .filter((r) => r.id === id && r.member === member)
    .map((r) => ({
      start: { line: r.line, character: r.memberStart },
      end: { line: r.line, character: r.memberStart + member.length },
    }));
}

export function definitionAt(view: NoteView, pos: Position): Location | null {
  const t = targetAt(view, pos);
  if (!t) return null;
  if (!t.member) return { uri: view.uri, range: t.check.headerRange };
  const v = t.check.values[t.member];
  const r = v?.range && isContentLine(t.check, v.range.start.line) ? v.range : t.check.headerRange;
  return { uri: view.uri, range: r };
}

export function referencesAt(view: NoteView, pos: Position, includeDeclaration: boolean): Location[] {
  const t = targetAt(view, pos);
  if (!t?.check.id) return [];
  const ranges: Range[] = [];
  if (!t.member) {
    if (includeDeclaration) ranges.push(t.check.headerRange);
    ranges.push(...idRanges(view, t.check.id));
  } else {
    for (const u of ownUses(view, t.check, t.member)) {
      const stmt = statementOn(u.start.line, view.line(u.start.line));
      const isDeclaration = stmt?.kind === 'assign' && stmt.name.range.start.character === u.start.character;
      if (includeDeclaration || !isDeclaration) ranges.push(u);
    }
    ranges.push(...memberRanges(view, t.check.id, t.member));
  }
  return ranges.map((range) => ({ uri: view.uri, range }));
}

/** The range a rename would replace, or a refusal with the reason. */
export function prepareRenameAt(view: NoteView, pos: Position): Range {
  const t = targetAt(view, pos);
  if (!t?.check.id) throw new RenameRefused('only a check id or a name of the note can be renamed');
  if (t.member && (t.member in INPUT_NAMES || t.member in RESULT_NAMES))
    throw new RenameRefused(`\`${t.member}\` is a reserved name of the block language: it cannot be renamed`);
  if (t.member && t.check.values[t.member]?.origin !== 'stated')
    throw new RenameRefused(`\`${t.member}\` is not stated in \`${t.check.id}\``);
  return t.range;
}

export function renameAt(view: NoteView, pos: Position, newName: string): WorkspaceEdit {
  prepareRenameAt(view, pos);
  const t = targetAt(view, pos) as Target;
  const id = t.check.id as string;
  const edits: TextEdit[] = [];
  if (!t.member) {
    if (isReservedWord(newName))
      throw new RenameRefused(
        `\`${newName}\` is reserved (every JavaScript object has it): it cannot be a check id`,
      );
    if (!ID_PATTERN.test(newName)) throw new RenameRefused(`\`${newName}\` is not a valid check id`);
    if (newName !== id && checkById(view.result, newName))
      throw new RenameRefused(`a check named \`${newName}\` already exists`);
    edits.push({ range: t.check.headerRange, newText: newName });
    for (const r of idRanges(view, id)) edits.push({ range: r, newText: newName });
  } else {
    if (!NAME.test(newName)) throw new RenameRefused(`\`${newName}\` is not a valid name`);
    if (isReservedWord(newName))
      throw new RenameRefused(
        `\`${newName}\` is reserved (every JavaScript object has it): it cannot be a name in a note`,
      );
    if (newName in INPUT_NAMES || newName in RESULT_NAMES)
      throw new RenameRefused(`\`${newName}\` is a reserved name with its own meaning`);
    if (newName !== t.member && t.check.values[newName])
      throw new RenameRefused(`\`${id}\` already has a \`${newName}\``);
    for (const r of ownUses(view, t.check, t.member)) edits.push({ range: r, newText: newName });
    for (const r of memberRanges(view, id, t.member)) edits.push({ range: r, newText: newName });
  }
  return { changes: { [view.uri]: edits } };
}
