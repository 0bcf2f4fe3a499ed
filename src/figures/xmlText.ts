const SPECIAL = /[&<>"']/g;
const ENTITY: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };
// Characters XML 1.0 forbids outright (C0 controls other than tab, newline, return; lone surrogates;
// U+FFFE/U+FFFF): no escape makes them legal, so they become U+FFFD.
// eslint-disable-next-line no-control-regex
const FORBIDDEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

/** Text safe inside an XML element or a quoted attribute (W3C XML 1.0, sections 2.2 and 2.4). */
export function xmlText(text: string): string {
  return text.replace(FORBIDDEN, '\ufffd').replace(SPECIAL, (c) => ENTITY[c] ?? c);
}
