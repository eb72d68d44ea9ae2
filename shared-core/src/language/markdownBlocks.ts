/**
 * Finds the fatigue blocks of a Markdown note: fenced code blocks whose info string is
 * `fatigue` followed by the check's id. Markdown is parsed by unified + remark-parse, so a
 * fence inside a list, a block quote or an HTML comment is treated exactly as CommonMark
 * says; the block's own lines are then read from the source text to keep exact columns.
 */
import type { Code, Root, RootContent } from 'mdast';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import { nestsTooDeep, scanFatigueFences } from './fenceScan';

/**
 * A check id: a letter or `_`, then letters, digits and `_`; not a name that every
 * JavaScript object has (`constructor`, `__proto__`, `toString` ...), which no table of a
 * note may answer to (`reserved-name`, as for the names of a note).
 */
export const ID_PATTERN = new RegExp(
  `^(?!(?:${Object.getOwnPropertyNames(Object.prototype).join('|')})$)[A-Za-z_][A-Za-z0-9_]*$`,
);

export interface SourceLine {
  /** 0-based line in the document. */
  line: number;
  text: string;
}

export interface BlockSource {
  /** The id text as written (may be invalid), or null when the info string has none. */
  id: string | null;
  /** Everything after `fatigue` in the info string beyond the id, for a diagnostic. */
  extraInfo: string;
  /** 0-based line of the opening fence. */
  openLine: number;
  /** 0-based line of the closing fence, or the last line of the block when it is not closed. */
  closeLine: number;
  closed: boolean;
  /** Character range of the id (or of the info string) on the opening line. */
  idStart: number;
  idEnd: number;
  /** Length of the opening fence line. */
  openLineLength: number;
  /** Content lines, with their document line numbers. */
  lines: SourceLine[];
  /**
   * Set on the first block when the note's blocks were found by the line scan of
   * `fenceScan.ts` instead of the Markdown parser: nesting deeper than the parser is given,
   * or a parser failure. The evaluator reports it on that block.
   */
  fallback?: 'nesting' | 'parser';
}

const parser = unified().use(remarkParse);

/** Split into lines the way LSP counts them (\n, \r\n and \r end a line). */
export function splitLines(text: string): string[] {
  return text.split(/\r\n|\r|\n/);
}

export function findFatigueBlocks(text: string, lines: string[] = splitLines(text)): BlockSource[] {
  if (nestsTooDeep(lines)) return scanned(lines, 'nesting');
  let tree: Root;
  try {
    tree = parser.parse(text) as Root;
  } catch {
    // A parser failure (e.g. its stack) must not hide the note's checks: scan the lines instead.
    return scanned(lines, 'parser');
  }
  const out: BlockSource[] = [];
  // Depth-first, in document order, without recursion (a deep tree must not exhaust the stack).
  const stack: Array<Root | RootContent> = [tree];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (node.type === 'code') {
      const b = fromCode(node, lines);
      if (b) out.push(b);
      continue;
    }
    if ('children' in node) {
      const children = node.children as RootContent[];
      for (let i = children.length - 1; i >= 0; i--) stack.push(children[i]);
    }
  }
  return out;
}

function scanned(lines: string[], why: 'nesting' | 'parser'): BlockSource[] {
  const out: BlockSource[] = [];
  for (const { open, last } of scanFatigueFences(lines)) {
    const b = blockAt(lines, open, last);
    if (b) out.push(b);
  }
  if (out.length > 0) out[0].fallback = why;
  return out;
}

function fromCode(node: Code, lines: string[]): BlockSource | null {
  if (node.lang !== 'fatigue' || !node.position) return null;
  return blockAt(lines, node.position.start.line - 1, node.position.end.line - 1);
}

/** The block whose fence opens on `openLine` and whose last line (closing fence or not) is `lastLine`. */
function blockAt(lines: string[], openLine: number, lastLine: number): BlockSource | null {
  const opening = lines[openLine] ?? '';
  const fence = /^(\s*(?:>\s*)*)(`{3,}|~{3,})/.exec(opening);
  // An indented code block whose first word is `fatigue` is not a fence.
  if (!fence) return null;
  const fenceChars = fence[2];
  const closingRe = new RegExp(`^\\s*(?:>\\s*)*${fenceChars[0]}{${fenceChars.length},}\\s*$`);
  const closed = lastLine > openLine && closingRe.test(lines[lastLine] ?? '');
  const contentEnd = closed ? lastLine - 1 : lastLine;
  // The id is read from the raw line (remark unescapes the info string: `\\!` would shift columns).
  const afterFence = fence[0].length;
  const langAt = opening.indexOf('fatigue', afterFence);
  if (langAt < 0) return null;
  const infoStart = langAt + 'fatigue'.length;
  const rest = opening.slice(infoStart);
  const words = rest.trim() === '' ? [] : rest.trim().split(/\s+/);
  const id = words[0] ?? null;
  let idStart = langAt;
  let idEnd = infoStart;
  if (id) {
    idStart = infoStart + rest.indexOf(id);
    idEnd = idStart + id.length;
  }
  const contentLines: SourceLine[] = [];
  for (let l = openLine + 1; l <= contentEnd; l++) contentLines.push({ line: l, text: lines[l] ?? '' });
  return {
    id,
    extraInfo: words.slice(1).join(' '),
    openLine,
    closeLine: lastLine,
    closed,
    idStart,
    idEnd,
    openLineLength: opening.length,
    lines: contentLines,
  };
}
