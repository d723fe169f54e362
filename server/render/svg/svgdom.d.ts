/**
 * svgdom ships no types; this declares only the parts Canwright uses. Its window and document
 * are a headless DOM, typed here as the browser's so @svgdotjs/svg.js accepts them.
 */
declare module 'svgdom' {
  /** A window whose document's root is an empty <svg> element. */
  export function createSVGWindow(): Window;
  export function createDocument(namespaceURI: string | null, qualifiedName: string, doctype?: DocumentType | null): Document;
  /** svgdom's strict XML parser (sax underneath): appends the parsed nodes to `into`; throws on malformed XML. */
  export function HTMLParser(xml: string, into: Node): void;
}
