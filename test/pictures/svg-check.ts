import { DOMParser, onWarningStopParsing, type Document, type Element } from '@xmldom/xmldom';
import { Resvg } from '@resvg/resvg-js';

/**
 * Parses SVG text with two registry parsers, neither ours: resvg's XML
 * reader (roxmltree, strict: it refuses a bare '&', which xmldom lets pass)
 * for well-formedness, then @xmldom/xmldom, stopping at any warning, for
 * the document tree the tests query.
 */
export function parseSvg(svg: string): Document {
  new Resvg(svg);
  return new DOMParser({ onError: onWarningStopParsing }).parseFromString(svg, 'image/svg+xml');
}

/** The root <svg> element. */
export function rootOf(document: Document): Element {
  const root = document.documentElement;
  if (!root || root.localName !== 'svg') throw new Error('no <svg> root');
  return root;
}

/** Every <text> element's content, in document order. */
export function textsOf(document: Document): string[] {
  const nodes = document.getElementsByTagName('text');
  const texts: string[] = [];
  for (let i = 0; i < nodes.length; i++) texts.push(nodes.item(i)!.textContent ?? '');
  return texts;
}

/** Every attribute value and element name in the document, for reference checks. */
export function elementsOf(document: Document): Element[] {
  const all = document.getElementsByTagName('*');
  const out: Element[] = [];
  for (let i = 0; i < all.length; i++) out.push(all.item(i)!);
  return out;
}
