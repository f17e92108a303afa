/**
 * A small XML serializer for the SVG tree svg.js builds. Browsers, jsdom, happy-dom and svgdom
 * each serialise differently (self-closing tags, which characters they escape in attributes),
 * so we write the bytes ourselves: same tree in, same bytes out, whichever DOM built it.
 */

/** The minimal node shape every DOM provides. */
interface NodeLike {
  nodeType: number;
  nodeName: string;
  localName?: string | null;
  textContent: string | null;
  childNodes: ArrayLike<NodeLike>;
  attributes?: ArrayLike<{ name: string; value: string }>;
}

// XML 1.0 forbids most C0 control characters even when escaped; drop them from text.
// eslint-disable-next-line no-control-regex
const INVALID_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g;

// Anything either escape function changes; most values (numbers, path data, ids) have none,
// and testing once is far cheaper than the chain of replacements.
// eslint-disable-next-line no-control-regex
const NEEDS_ESCAPE = /[\u0000-\u001F&<>"\uFFFE\uFFFF]/;

/** Escapes text content: &, <, > (and drops characters XML cannot hold). */
export function escapeXmlText(s: string): string {
  if (!NEEDS_ESCAPE.test(s)) return s;
  return s.replace(INVALID_XML, '').replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/** Escapes an attribute value for double quotes. */
export function escapeXmlAttr(s: string): string {
  if (!NEEDS_ESCAPE.test(s)) return s;
  return escapeXmlText(s).replace(/"/g, '&quot;').replace(/\n/g, '&#10;').replace(/\t/g, '&#9;').replace(/\r/g, '&#13;');
}

/**
 * Serialises an element tree. `rootAttrs` are written first on the root (e.g. xmlns) and any
 * xmlns* attributes the DOM put there are dropped, so namespace handling cannot differ.
 */
export function serializeXml(node: NodeLike, rootAttrs: [string, string][] = []): string {
  const parts: string[] = [];
  const walk = (n: NodeLike, isRoot: boolean) => {
    if (n.nodeType === 3) {
      parts.push(escapeXmlText(n.textContent ?? ''));
      return;
    }
    if (n.nodeType !== 1) return;
    const name = n.localName || n.nodeName;
    parts.push('<', name);
    if (isRoot) for (const [k, v] of rootAttrs) parts.push(' ', k, '="', escapeXmlAttr(v), '"');
    const attrs = n.attributes ?? [];
    for (let i = 0; i < attrs.length; i++) {
      const a = attrs[i]!;
      if (isRoot && (a.name === 'xmlns' || a.name.startsWith('xmlns:') || rootAttrs.some(([k]) => k === a.name))) continue;
      parts.push(' ', a.name, '="', escapeXmlAttr(a.value), '"');
    }
    const kids = n.childNodes;
    if (kids.length === 0) {
      parts.push('/>');
      return;
    }
    parts.push('>');
    for (let i = 0; i < kids.length; i++) walk(kids[i]!, false);
    parts.push('</', name, '>');
  };
  walk(node, true);
  return parts.join('');
}
