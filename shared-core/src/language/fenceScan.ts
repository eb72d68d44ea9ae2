/**
 * The fallback finder of fatigue fences, for notes that the Markdown parser must not be given
 * (issue 7: untrusted notes): block quotes or lists nested deeper than `MAX_NESTING`
 * (remark-parse recurses per level and grows quadratically with such nesting), or a parser
 * failure. It reads line by line: an opening fence (``` or ~~~, three or more) after
 * optional indentation and `>` markers whose info string starts with `fatigue`, closed by the
 * next line of the same fence character at least as long. It knows nothing of lists, HTML
 * or indented code, so results in such notes are approximate; the evaluator says so.
 */

/** Deepest nesting of block quotes and list items handed to the Markdown parser. */
export const MAX_NESTING = 100;

/**
 * Nesting depth a line opens, estimated from its leading container markers: each `>` and
 * each list marker (`-`, `*`, `+`, `1.`, `1)`) counts one level, and the indentation before
 * a marker one level per two columns (a list nested by indentation). Reads only the prefix.
 */
export function nestingOf(line: string): number {
  let depth = 0;
  let i = 0;
  let white = 0;
  const n = line.length;
  while (i < n) {
    const c = line.charCodeAt(i);
    if (c === 32 || c === 9) {
      white += c === 9 ? 4 : 1;
      i++;
      continue;
    }
    let marker = 0;
    if (c === 62 /* > */) marker = 1;
    else if ((c === 45 || c === 42 || c === 43) /* - * + */ && isBlank(line, i + 1)) marker = 1;
    else if (c >= 48 && c <= 57) {
      let j = i;
      while (j < n && j - i < 9 && line.charCodeAt(j) >= 48 && line.charCodeAt(j) <= 57) j++;
      const d = line.charCodeAt(j);
      if ((d === 46 || d === 41) /* . ) */ && isBlank(line, j + 1)) marker = j + 1 - i;
    }
    if (marker === 0) break;
    depth += 1 + (white >> 1);
    white = 0;
    i += marker;
  }
  return depth;
}

function isBlank(line: string, i: number): boolean {
  if (i >= line.length) return true;
  const c = line.charCodeAt(i);
  return c === 32 || c === 9;
}

/** True when some line nests deeper than `MAX_NESTING`. */
export function nestsTooDeep(lines: readonly string[]): boolean {
  for (const l of lines) if (l.length > MAX_NESTING && nestingOf(l) > MAX_NESTING) return true;
  return false;
}

const OPEN = /^([ \t]*(?:>[ \t]*)*)(`{3,}|~{3,})[ \t]*fatigue(?:[ \t]|$)/;

/** Opening and last lines of the fatigue fences, found line by line. */
export function scanFatigueFences(lines: readonly string[]): Array<{ open: number; last: number }> {
  const out: Array<{ open: number; last: number }> = [];
  for (let l = 0; l < lines.length; l++) {
    const m = OPEN.exec(lines[l]);
    if (!m) continue;
    const fence = m[2];
    if (fence[0] === '`' && lines[l].indexOf('`', m[0].length) >= 0) continue; // not a fence (CommonMark)
    const closing = new RegExp(`^[ \\t]*(?:>[ \\t]*)*${fence[0]}{${fence.length},}[ \\t]*$`);
    let last = lines.length - 1;
    for (let k = l + 1; k < lines.length; k++)
      if (closing.test(lines[k])) {
        last = k;
        break;
      }
    out.push({ open: l, last });
    l = last;
  }
  return out;
}
