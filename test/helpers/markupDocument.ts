import { DOMParser } from '@xmldom/xmldom';
import { expect } from 'vitest';

/** Parses markup with xmldom, collecting every complaint; the caller says which ones may pass. */
function parseWith(text: string, type: 'image/svg+xml' | 'text/html'): { doc: Document; errors: string[] } {
  const errors: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => errors.push(`${level}: ${message}`) }).parseFromString(text, type);
  return { doc: doc as unknown as Document, errors };
}

/** An exported SVG as a document; fails the test on any parser complaint, warnings included. */
export function parseSvg(svg: string): Document {
  const { doc, errors } = parseWith(svg, 'image/svg+xml');
  expect(errors).toEqual([]);
  return doc;
}

/** An exported HTML report as a document; fails the test on parser errors (warnings pass). */
export function parseHtml(html: string): Document {
  const { doc, errors } = parseWith(html, 'text/html');
  expect(errors.filter((e) => !e.startsWith('warning'))).toEqual([]);
  return doc;
}

/** The elements an SVG drew for one kind of mark (their data-mark attribute). */
export function marks(doc: Document, kind: string): Element[] {
  return Array.from(doc.getElementsByTagName('*')).filter((e) => e.getAttribute('data-mark') === kind);
}

/** Whether some element has this id (xmldom's documents have no getElementById for HTML). */
export function hasId(doc: Document, id: string): boolean {
  return Array.from(doc.getElementsByTagName('*')).some((x) => x.getAttribute('id') === id);
}

/** The element with this id; fails the test when there is none. */
export function byId(doc: Document, id: string): Element {
  const e = Array.from(doc.getElementsByTagName('*')).find((x) => x.getAttribute('id') === id);
  if (e === undefined) throw new Error(`no element #${id}`);
  return e;
}
