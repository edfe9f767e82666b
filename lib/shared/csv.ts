/**
 * CSV as RFC 4180 describes it: CRLF between records, fields with a comma, a double quote or
 * a line break enclosed in double quotes, and a double quote inside a field written twice.
 *
 * Spreadsheets run a cell starting with = + - @ (and tab or carriage return) as a formula
 * (OWASP, "CSV Injection"); such cells get a leading single quote so they stay text.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseFormula(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  const text = typeof value === "number" ? String(value) : neutraliseFormula(value);
  // A semicolon or a tab is quoted too: spreadsheets in many locales split on them when opening a file.
  return /[",;\t\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

export function csvRecord(values: (string | number | null | undefined)[]): string {
  return values.map(csvCell).join(",");
}

/** Leads a downloaded file so spreadsheets read it as UTF-8 and show accents (RFC 4180 leaves the charset to the MIME type; Excel reads the BOM). */
export const UTF8_BOM = "\uFEFF";

/** A whole file: header, then one record per row, each ended by CRLF. */
export function toCsv(header: string[], rows: (string | number | null | undefined)[][]): string {
  return [header, ...rows].map((r) => `${csvRecord(r)}\r\n`).join("");
}
