/** A piece of a page's text, or a spoken attribute, with the language it is marked in. */
export interface MarkedText {
  readonly text: string;
  /** The nearest `lang` of the element holding it or of an ancestor. */
  readonly lang: string;
  /** `text` for text nodes, else the attribute's name. */
  readonly kind: string;
}

/** Elements with no end tag (HTML Living Standard, 13.1.2 "Void elements"). */
const VOID = new Set([
  'area',
  'base',
  'br',
  'col',
  'embed',
  'hr',
  'img',
  'input',
  'link',
  'meta',
  'source',
  'track',
  'wbr',
]);
/** Attributes that screen readers speak. */
const SPOKEN = ['aria-label', 'title', 'alt', 'placeholder'];

const decode = (text: string): string =>
  text
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&');

/**
 * Every text node and spoken attribute of a page rendered by hono's JSX, with its language.
 * Enough for these pages: hono escapes "<" in text and attribute values, and the pages have
 * no inline script or style, so every "<" starts a tag.
 */
export function textLanguages(html: string): MarkedText[] {
  const found: MarkedText[] = [];
  const stack: { readonly tag: string; readonly lang: string }[] = [];
  const current = () => stack.at(-1)?.lang ?? '';
  for (const token of html.matchAll(
    /<!--[\s\S]*?-->|<![^>]*>|<\/([a-zA-Z][\w-]*)\s*>|<([a-zA-Z][\w-]*)((?:\s+[^\s=/>]+(?:="[^"]*")?)*)\s*(\/?)>|[^<]+/g,
  )) {
    const [whole, closing, opening, attributes = '', selfClosing] = token;
    if (closing !== undefined) {
      const at = stack.map((s) => s.tag).lastIndexOf(closing.toLowerCase());
      if (at >= 0) stack.length = at;
    } else if (opening !== undefined) {
      const attrs = new Map(
        [...attributes.matchAll(/([^\s=]+)(?:="([^"]*)")?/g)].map((m) => [
          m[1] as string,
          decode(m[2] ?? ''),
        ]),
      );
      const lang = attrs.get('lang') ?? current();
      for (const name of SPOKEN) {
        const value = attrs.get(name);
        if (value) found.push({ text: value, lang, kind: name });
      }
      const tag = opening.toLowerCase();
      if (!VOID.has(tag) && selfClosing !== '/') stack.push({ tag, lang });
    } else if (!whole.startsWith('<') && whole.trim() !== '') {
      found.push({ text: decode(whole), lang: current(), kind: 'text' });
    }
  }
  return found;
}
