/**
 * The parameters of the notifications the server takes, checked before anything acts on
 * them (issue 16). A notification has no answer, so a malformed one (a `didOpen` whose
 * text is `null`, a change without a version, a range of strings ...) is logged with what
 * is wrong and otherwise ignored: the open documents stay as they were. The shapes are
 * those of the Language Server Protocol 3.17 (`DidOpenTextDocumentParams`,
 * `DidChangeTextDocumentParams`, `DidCloseTextDocumentParams`,
 * `DidChangeConfigurationParams`, `DidChangeWorkspaceFoldersParams`).
 */
export type Checked<T> = { ok: true; value: T } | { ok: false; why: string };

export interface OpenParams {
  uri: string;
  languageId: string;
  version: number;
  text: string;
}

export interface ChangeParams {
  uri: string;
  version: number;
  changes: Array<{ range?: LspRange; text: string }>;
}

interface LspRange {
  start: { line: number; character: number };
  end: { line: number; character: number };
}

/** A change batch longer than this is refused (no editor sends one; it would only cost memory). */
const MAX_CHANGES = 100_000;

const fail = (why: string): { ok: false; why: string } => ({ ok: false, why });

function describe(x: unknown): string {
  if (x === null) return 'null';
  if (Array.isArray(x)) return 'an array';
  return typeof x === 'string'
    ? 'a string'
    : typeof x === 'object'
      ? 'an object'
      : `${typeof x} ${String(x)}`;
}

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/** LSP's `integer`: a whole number in -2^31 .. 2^31 - 1. */
function isInteger(x: unknown): x is number {
  return typeof x === 'number' && Number.isInteger(x) && x >= -2147483648 && x <= 2147483647;
}

/** LSP's `uinteger`: a whole number in 0 .. 2^31 - 1. */
function isUinteger(x: unknown): x is number {
  return isInteger(x) && x >= 0;
}

function textDocumentOf(p: unknown): Checked<Record<string, unknown>> {
  if (!isObject(p)) return fail(`the params must be an object, not ${describe(p)}`);
  const td = p.textDocument;
  if (!isObject(td)) return fail(`textDocument must be an object, not ${describe(td)}`);
  if (typeof td.uri !== 'string' || td.uri === '')
    return fail(`textDocument.uri must be a string, not ${describe(td.uri)}`);
  return { ok: true, value: td };
}

function position(x: unknown, what: string): Checked<{ line: number; character: number }> {
  if (!isObject(x)) return fail(`${what} must be an object, not ${describe(x)}`);
  if (!isUinteger(x.line)) return fail(`${what}.line must be a whole number >= 0, not ${describe(x.line)}`);
  if (!isUinteger(x.character))
    return fail(`${what}.character must be a whole number >= 0, not ${describe(x.character)}`);
  return { ok: true, value: { line: x.line, character: x.character } };
}

export function openParams(p: unknown): Checked<OpenParams> {
  const td = textDocumentOf(p);
  if (!td.ok) return td;
  const { uri, languageId, version, text } = td.value;
  if (typeof text !== 'string') return fail(`textDocument.text must be a string, not ${describe(text)}`);
  if (!isInteger(version))
    return fail(`textDocument.version must be a whole number, not ${describe(version)}`);
  if (languageId !== undefined && typeof languageId !== 'string')
    return fail(`textDocument.languageId must be a string, not ${describe(languageId)}`);
  return { ok: true, value: { uri: uri as string, languageId: languageId ?? 'markdown', version, text } };
}

export function changeParams(p: unknown): Checked<ChangeParams> {
  const td = textDocumentOf(p);
  if (!td.ok) return td;
  const { uri, version } = td.value;
  if (!isInteger(version))
    return fail(`textDocument.version must be a whole number, not ${describe(version)}`);
  const list = (p as Record<string, unknown>).contentChanges;
  if (!Array.isArray(list)) return fail(`contentChanges must be an array, not ${describe(list)}`);
  if (list.length > MAX_CHANGES)
    return fail(`contentChanges has ${list.length} changes, more than ${MAX_CHANGES}`);
  const changes: ChangeParams['changes'] = [];
  for (let i = 0; i < list.length; i++) {
    const c = list[i];
    const at = `contentChanges[${i}]`;
    if (!isObject(c)) return fail(`${at} must be an object, not ${describe(c)}`);
    if (typeof c.text !== 'string') return fail(`${at}.text must be a string, not ${describe(c.text)}`);
    if (c.range === undefined) {
      changes.push({ text: c.text });
      continue;
    }
    if (!isObject(c.range)) return fail(`${at}.range must be an object, not ${describe(c.range)}`);
    const start = position(c.range.start, `${at}.range.start`);
    if (!start.ok) return start;
    const end = position(c.range.end, `${at}.range.end`);
    if (!end.ok) return end;
    const s = start.value;
    const e = end.value;
    if (e.line < s.line || (e.line === s.line && e.character < s.character))
      return fail(`${at}.range ends before it starts`);
    changes.push({ range: { start: s, end: e }, text: c.text });
  }
  return { ok: true, value: { uri: uri as string, version, changes } };
}

export function closeParams(p: unknown): Checked<{ uri: string }> {
  const td = textDocumentOf(p);
  if (!td.ok) return td;
  return { ok: true, value: { uri: td.value.uri as string } };
}

/** `workspace/didChangeConfiguration`: the settings may be anything (`readSettings` takes what it knows). */
export function configurationParams(p: unknown): Checked<{ settings: unknown }> {
  if (!isObject(p)) return fail(`the params must be an object, not ${describe(p)}`);
  return { ok: true, value: { settings: p.settings } };
}

export function workspaceFoldersParams(p: unknown): Checked<{ added: string[]; removed: string[] }> {
  if (!isObject(p)) return fail(`the params must be an object, not ${describe(p)}`);
  const event = p.event ?? p; // the protocol's { event: { added, removed } }, or the event itself
  if (!isObject(event)) return fail(`event must be an object, not ${describe(event)}`);
  const uris = (name: 'added' | 'removed'): Checked<string[]> => {
    const list = event[name];
    if (!Array.isArray(list)) return fail(`event.${name} must be an array, not ${describe(list)}`);
    const out: string[] = [];
    for (let i = 0; i < list.length; i++) {
      const f = list[i];
      if (!isObject(f) || typeof f.uri !== 'string')
        return fail(`event.${name}[${i}] must be a folder { uri, name }, not ${describe(f)}`);
      out.push(f.uri);
    }
    return { ok: true, value: out };
  };
  const added = uris('added');
  if (!added.ok) return added;
  const removed = uris('removed');
  if (!removed.ok) return removed;
  return { ok: true, value: { added: added.value, removed: removed.value } };
}
