const NEEDS_QUOTES = /[",\r\n]/;

/**
 * One CSV field per RFC 4180 (Shafranovich 2005, section 2, rules 5-7): a field holding a comma, a
 * double quote or a line break is enclosed in double quotes, and a double quote inside it is
 * doubled. Other fields are written as they are.
 */
export function csvField(value: string): string {
  return NEEDS_QUOTES.test(value) ? `"${value.replaceAll('"', '""')}"` : value;
}

/** One CSV record: the fields joined by commas and ended by CRLF (RFC 4180, section 2, rule 1). */
export function csvRecord(fields: readonly string[]): string {
  return fields.map(csvField).join(',') + '\r\n';
}
