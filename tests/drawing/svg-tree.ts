import { XMLParser, XMLValidator } from 'fast-xml-parser';

/** An element of a parsed drawing, read by an XML parser from the registry, not by our code. */
export interface Node {
  tag: string;
  attrs: Record<string, string>;
  children: Node[];
  text: string;
}

type Raw = Record<string, unknown>;

function convert(raw: Raw): Node | null {
  const tag = Object.keys(raw).find((k) => k !== ':@');
  if (!tag || tag === '#text') return null;
  const attrs = (raw[':@'] as Record<string, string> | undefined) ?? {};
  const kids = (raw[tag] as Raw[]) ?? [];
  const children = kids.map(convert).filter((n): n is Node => n !== null);
  const text = kids.map((k) => ('#text' in k ? String(k['#text']) : '')).join('');
  return { tag, attrs: Object.fromEntries(Object.entries(attrs).map(([k, v]) => [k.replace(/^@_/, ''), String(v)])), children, text };
}

/** Parses markup as XML; throws with the parser's message when it is not well formed. */
export function parseSvg(markup: string): Node {
  const valid = XMLValidator.validate(markup);
  if (valid !== true) throw new Error(`not well-formed XML: ${valid.err.msg} (line ${valid.err.line})`);
  const parser = new XMLParser({ ignoreAttributes: false, preserveOrder: true, parseAttributeValue: false, parseTagValue: false, trimValues: false });
  const doc = parser.parse(markup) as Raw[];
  const roots = doc.map(convert).filter((n): n is Node => n !== null);
  if (roots.length !== 1) throw new Error(`expected one root element, found ${roots.length}`);
  return roots[0]!;
}

export function all(n: Node, pred: (x: Node) => boolean, out: Node[] = []): Node[] {
  if (pred(n)) out.push(n);
  for (const c of n.children) all(c, pred, out);
  return out;
}

export const withAttr = (root: Node, name: string, value?: string) =>
  all(root, (x) => name in x.attrs && (value === undefined || x.attrs[name] === value));

/** All character data below a node (tspans included). */
export function textOf(n: Node): string {
  return n.text + n.children.map(textOf).join('');
}

export const num = (n: Node, a: string) => {
  const v = Number(n.attrs[a]);
  if (!Number.isFinite(v)) throw new Error(`<${n.tag}> has no numeric ${a}`);
  return v;
};
