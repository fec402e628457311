/**
 * The few pieces of SVG syntax the drawings need, built as strings so the same code runs in
 * the browser, on the server and in a report. Only presentation attributes are written: the
 * app's Content-Security-Policy forbids inline styles, so there is no way to emit `style`.
 */
export type AttrValue = string | number | undefined | null | false;
export type Attrs = Record<string, AttrValue>;

const XML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/** Text and attribute values; also drops characters XML 1.0 cannot hold at all. */
export function escapeXml(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/g, '').replace(/[&<>"']/g, (c) => XML_ESCAPES[c]!);
}

/** A coordinate or length rounded to 0.01 of a drawing unit, without "-0". */
export function num(v: number): string {
  const r = Math.round(v * 100) / 100;
  return String(Object.is(r, -0) ? 0 : r);
}

const ATTR_NAME = /^[a-zA-Z_:][-a-zA-Z0-9_:.]*$/;

function attrs(a: Attrs): string {
  let out = '';
  for (const [k, v] of Object.entries(a)) {
    if (v === undefined || v === null || v === false) continue;
    if (!ATTR_NAME.test(k) || k.toLowerCase() === 'style' || k.toLowerCase().startsWith('on')) {
      throw new Error(`attribute "${k}" is not allowed in a drawing`);
    }
    out += ` ${k}="${escapeXml(typeof v === 'number' ? num(v) : v)}"`;
  }
  return out;
}

/** An element; children are markup already built (use `text` for words). */
export function el(tag: string, a: Attrs = {}, children: string | readonly string[] = ''): string {
  const body = typeof children === 'string' ? children : children.join('');
  return body ? `<${tag}${attrs(a)}>${body}</${tag}>` : `<${tag}${attrs(a)}/>`;
}

/** Escaped character data. */
export function text(words: string): string {
  return escapeXml(words);
}

export interface DocumentParts {
  width: number;
  height: number;
  title: string;
  desc: string;
  body: readonly string[];
  /** Prefix for the title and desc ids, unique on the page that shows the drawing. */
  idPrefix: string;
  /** Extra attributes on the root, e.g. data-scale for a reader that measures the drawing. */
  rootAttrs?: Attrs;
}

/** A standalone SVG document: namespace, viewBox, role, title and description first. */
export function svgDocument(d: DocumentParts): string {
  return el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      viewBox: `0 0 ${num(d.width)} ${num(d.height)}`,
      width: d.width,
      height: d.height,
      role: 'img',
      'aria-labelledby': `${d.idPrefix}-title ${d.idPrefix}-desc`,
      ...d.rootAttrs,
    },
    [el('title', { id: `${d.idPrefix}-title` }, text(d.title)), el('desc', { id: `${d.idPrefix}-desc` }, text(d.desc)), ...d.body],
  );
}
