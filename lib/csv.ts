// Text fields of CSV exports. Spreadsheets run a cell that starts with = + - @ (or a tab or carriage return)
// as a formula, so such text is written with a leading apostrophe: shown as typed, never run (OWASP's
// advice on CSV injection, cited from memory).
const FORMULA_START = /^[=+\-@\t\r]/;

/** One text field, quoted for RFC 4180 and kept from running as a formula. */
export function csvText(text: string): string {
  const safe = FORMULA_START.test(text) ? `'${text}` : text;
  return `"${safe.replace(/"/g, '""')}"`;
}
