/**
 * The one CSV writer every export uses (RFC 4180: CRLF line ends; a field with a comma, quote or
 * line break quoted, quotes doubled). A cell that starts with = + - @, a tab or a carriage return
 * is prefixed with an apostrophe so a spreadsheet never runs it as a formula (the OWASP advice on
 * CSV injection): names and messages come from users.
 */

const FORMULA_START = /^[=+\-@\t\r]/;

/** One field, neutralised against formula injection and quoted when it needs it. */
export function csvField(value: string): string {
  const safe = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Lines of fields as CSV text, each line ended by CRLF. */
export function csvText(lines: readonly (readonly string[])[]): string {
  return lines.map((l) => l.map(csvField).join(',')).join('\r\n') + '\r\n';
}
