// OWASP, "CSV Injection": a cell that begins with =, +, -, @, a tab or a carriage return is read
// by spreadsheet programs as a formula. Prefixing a single quote makes it text; the text is kept.
const FORMULA_START = /^[=+\-@\t\r]/;

/** A text cell for a CSV export that no spreadsheet will run as a formula. Numbers are left to their own columns. */
export function formulaSafe(text: string | null | undefined): string {
  if (text === null || text === undefined) return '';
  return FORMULA_START.test(text) ? `'${text}` : text;
}
