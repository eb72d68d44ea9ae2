/**
 * A small, strict XML reader for the tests: it fails on a malformed document (unclosed or
 * mismatched tags, unquoted or duplicate attributes, stray `<` or `&`), which is the point
 * of parsing the diagrams rather than matching strings.
 */
export interface XmlNode {
  name: string;
  attrs: Record<string, string>;
  children: XmlNode[];
  text: string;
}

const ENTITY: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(s: string): string {
  if (/&(?!(amp|lt|gt|quot|apos|#\d+|#x[0-9a-f]+);)/i.test(s))
    throw new Error(`bare & in ${JSON.stringify(s)}`);
  return s.replace(/&(#x[0-9a-f]+|#\d+|\w+);/gi, (_, e: string) =>
    e[0] === '#'
      ? String.fromCodePoint(
          e[1] === 'x' || e[1] === 'X' ? Number.parseInt(e.slice(2), 16) : Number(e.slice(1)),
        )
      : ENTITY[e],
  );
}

export function parseXml(src: string): XmlNode {
  let i = 0;
  const root: XmlNode = { name: '#root', attrs: {}, children: [], text: '' };
  const stack: XmlNode[] = [root];
  while (i < src.length) {
    const lt = src.indexOf('<', i);
    const textEnd = lt === -1 ? src.length : lt;
    const text = src.slice(i, textEnd);
    if (text.includes('>')) throw new Error(`stray > at ${i}`);
    stack[stack.length - 1].text += decode(text);
    if (lt === -1) break;
    const gt = src.indexOf('>', lt);
    if (gt === -1) throw new Error(`unterminated tag at ${lt}`);
    const tag = src.slice(lt + 1, gt);
    i = gt + 1;
    if (tag.startsWith('/')) {
      const name = tag.slice(1).trim();
      const open = stack.pop();
      if (!open || open.name !== name) throw new Error(`</${name}> closes <${open?.name}>`);
      continue;
    }
    if (tag.startsWith('?') || tag.startsWith('!')) continue;
    const selfClosing = tag.endsWith('/');
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const m = /^([A-Za-z_][\w:.-]*)/.exec(body);
    if (!m) throw new Error(`bad tag <${tag}>`);
    const node: XmlNode = { name: m[1], attrs: {}, children: [], text: '' };
    let rest = body.slice(m[1].length);
    const attrRe = /^\s+([A-Za-z_][\w:.-]*)="([^"<]*)"/;
    for (;;) {
      const a = attrRe.exec(rest);
      if (!a) break;
      if (a[1] in node.attrs) throw new Error(`duplicate attribute ${a[1]} in <${m[1]}>`);
      node.attrs[a[1]] = decode(a[2]);
      rest = rest.slice(a[0].length);
    }
    if (rest.trim() !== '') throw new Error(`cannot read attributes of <${tag}>: ${JSON.stringify(rest)}`);
    stack[stack.length - 1].children.push(node);
    if (!selfClosing) stack.push(node);
  }
  if (stack.length !== 1) throw new Error(`unclosed <${stack[stack.length - 1].name}>`);
  if (root.children.length !== 1) throw new Error(`expected one root element, got ${root.children.length}`);
  return root.children[0];
}

export function walk(node: XmlNode, visit: (n: XmlNode) => void): void {
  visit(node);
  for (const c of node.children) walk(c, visit);
}

export function findAll(node: XmlNode, pred: (n: XmlNode) => boolean): XmlNode[] {
  const out: XmlNode[] = [];
  walk(node, (n) => {
    if (pred(n)) out.push(n);
  });
  return out;
}

/** All text under a node. */
export function textOf(node: XmlNode): string {
  return node.text + node.children.map(textOf).join('');
}

export function hasClass(n: XmlNode, cls: string): boolean {
  return (n.attrs.class ?? '').split(/\s+/).includes(cls);
}

/**
 * The data-to-pixel mapping of an axis, read back from its labelled ticks
 * (`fn-tick-x` / `fn-tick-y` texts with their `data-value`): independent of the code that drew it.
 */
export function axisFromTicks(svg: XmlNode, axis: 'x' | 'y', log: boolean): (pixel: number) => number {
  const ticks = findAll(svg, (n) => n.name === 'text' && hasClass(n, `fn-tick-${axis}`)).map((n) => ({
    value: Number(n.attrs['data-value']),
    // y labels sit 4 px below their tick line (baseline offset).
    pixel: axis === 'x' ? Number(n.attrs.x) : Number(n.attrs.y) - 4,
  }));
  if (ticks.length < 2) throw new Error(`axis ${axis} has ${ticks.length} labelled ticks`);
  const a = ticks[0];
  const b = ticks[ticks.length - 1];
  const f = (v: number) => (log ? Math.log10(v) : v);
  const k = (f(b.value) - f(a.value)) / (b.pixel - a.pixel);
  return (pixel: number) => {
    const v = f(a.value) + (pixel - a.pixel) * k;
    return log ? 10 ** v : v;
  };
}
