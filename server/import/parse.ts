import Papa from "papaparse";
import { hasNul } from "../../lib/fields";
import { MAX_IMPORT_COLUMNS } from "../../lib/import-fields";
import { HttpError } from "../http/errors";

/** A pour log of years fits in far less; a file this large is not a log. */
export const MAX_IMPORT_BYTES = 2 * 1024 * 1024;
export const MAX_IMPORT_ROWS = 5000;

const refuse = (message: string) => new HttpError(400, message, { file: message });

/**
 * The file as a header and rows of text cells, or a 400 that says what is wrong with it. Papaparse
 * (RFC 4180 with the quirks spreadsheets write) finds the delimiter; the checks before it turn away
 * what is not text at all.
 */
export function readCsv(bytes: Buffer): { headers: string[]; rows: string[][] } {
  if (bytes.length === 0) throw refuse("The file is empty.");
  if (bytes.length > MAX_IMPORT_BYTES) throw refuse("The file is larger than 2 MB; split the log into years.");
  const text = new TextDecoder("utf-8", { fatal: false }).decode(bytes).replace(/^\uFEFF/, "");
  // A NUL byte or invalid UTF-8 means a binary file (a spreadsheet's own format, a photo), not CSV.
  if (hasNul(text) || text.includes("\uFFFD"))
    throw refuse("This is not a CSV file. Save the spreadsheet as CSV (UTF-8) and try again.");
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: "greedy" });
  const rows = parsed.data.map((r) => r.map((cell) => cell.trim()));
  if (!rows.length || rows[0].every((h) => h === "")) throw refuse("The file is empty.");
  const [headers, ...body] = rows;
  if (headers.length < 2)
    throw refuse("Only one column was found: this does not look like CSV. Use commas or semicolons between values.");
  if (headers.length > MAX_IMPORT_COLUMNS) throw refuse(`More than ${MAX_IMPORT_COLUMNS} columns.`);
  const broken = parsed.errors.find((e) => e.code === "MissingQuotes" || e.code === "InvalidQuotes");
  if (broken) throw refuse(`Row ${(broken.row ?? 0) + 1} has a quote that is never closed.`);
  if (!body.length) throw refuse("The file has a header but no rows.");
  if (body.length > MAX_IMPORT_ROWS)
    throw refuse(`More than ${MAX_IMPORT_ROWS.toLocaleString("en-US")} rows; split the file.`);
  return { headers, rows: body };
}
