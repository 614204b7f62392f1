import Papa from "papaparse";
import { CatalogItemInputSchema, type CatalogItemInput } from "../../../shared/schemas/catalog.ts";

/** The CSV's columns are exactly the item's schema fields, in the schema's order. */
export const CATALOG_COLUMNS = Object.keys(CatalogItemInputSchema.shape) as (keyof CatalogItemInput)[];
const REQUIRED_COLUMNS: readonly (keyof CatalogItemInput)[] = ["sku", "name", "kind", "unit", "materialCostCents", "sellPriceCents"];
const NULLABLE_NUMBER_COLUMNS = new Set<string>(["nfaSqInPerUnit", "nfaSqInPerFt", "cfm", "soldInLengthFt"]);
const NUMBER_COLUMNS = new Set<string>(["materialCostCents", "sellPriceCents", "laborMinutesPerUnit"]);
export const MAX_IMPORT_ROWS = 5_000;

export interface ImportRowError {
  /** Row of the file as a spreadsheet numbers it: the header is row 1, the first item row 2. */
  row: number;
  /** A column name, or "_" for the row as a whole. */
  field: string;
  message: string;
}

export interface ParsedImport {
  rows: { row: number; values: CatalogItemInput; columns: (keyof CatalogItemInput)[] }[];
  errors: ImportRowError[];
}

/** Why a file cannot be read as a catalog CSV at all (answered as a 400 for the whole file). */
export class NotCatalogCsvError extends Error {}

/** A spreadsheet escapes a cell that starts like a formula with a quote; export does it, import undoes it. */
const FORMULA_START = /^'[=+\-@\t\r]/;

export function catalogToCsv(items: readonly CatalogItemInput[]): string {
  const data = items.map((item) => CATALOG_COLUMNS.map((c) => {
    const value = item[c];
    return value === null || value === undefined ? "" : String(value);
  }));
  // escapeFormulae: a name like "=HYPERLINK(...)" must not run when the file is opened in a spreadsheet.
  return Papa.unparse({ fields: CATALOG_COLUMNS, data }, { escapeFormulae: true, newline: "\r\n" });
}

/** Header cells match the schema's names ignoring case, spaces, dashes and underscores ("Sell price cents" → sellPriceCents). */
const squash = (s: string) => s.toLowerCase().replace(/[\s_-]/g, "");
const COLUMN_BY_SQUASHED = new Map(CATALOG_COLUMNS.map((c) => [squash(c), c]));

const NUMBER_TEXT = /^-?(\d+(\.\d*)?|\.\d+)$/;

function cellValue(column: keyof CatalogItemInput, raw: string): { value?: unknown; error?: string } {
  const text = raw.trim();
  if (NULLABLE_NUMBER_COLUMNS.has(column)) {
    if (text === "") return { value: null };
    return NUMBER_TEXT.test(text) ? { value: Number(text) } : { error: `"${text.slice(0, 40)}" is not a number.` };
  }
  if (NUMBER_COLUMNS.has(column)) {
    if (text === "") return { value: undefined };
    return NUMBER_TEXT.test(text) ? { value: Number(text) } : { error: `"${text.slice(0, 40)}" is not a number.` };
  }
  if (column === "isActive") {
    if (text === "") return { value: undefined };
    const lower = text.toLowerCase();
    if (["true", "yes", "1"].includes(lower)) return { value: true };
    if (["false", "no", "0"].includes(lower)) return { value: false };
    return { error: "Use true or false." };
  }
  return { value: FORMULA_START.test(text) ? text.slice(1) : text };
}

/**
 * Reads a catalog CSV (header row first) and validates every row with the item schema. A row's
 * problems are all reported, each with its row number and column; nothing is written here.
 * Throws NotCatalogCsvError when the text is not a catalog CSV at all.
 */
export function parseCatalogCsv(input: string): ParsedImport {
  const text = input.replace(/^\uFEFF/, "");
  if (text.trim() === "") throw new NotCatalogCsvError("The file is empty.");
  if (text.includes("\u0000")) throw new NotCatalogCsvError("This is not a CSV text file; save the sheet as CSV (comma-separated values) and try again.");
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false, delimiter: "" });
  const [header = [], ...records] = parsed.data;
  const columns = header.map((h) => COLUMN_BY_SQUASHED.get(squash(h)));
  const unknown = header.filter((h, i) => columns[i] === undefined && h.trim() !== "");
  if (!columns.includes("sku")) {
    throw new NotCatalogCsvError(`The first row must name the columns, e.g. ${CATALOG_COLUMNS.join(",")}.`);
  }
  if (unknown.length) throw new NotCatalogCsvError(`Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.slice(0, 10).join(", ")}. The columns are ${CATALOG_COLUMNS.join(", ")}.`);
  const seen = new Set<string>();
  for (const c of columns) {
    if (c === undefined) continue;
    if (seen.has(c)) throw new NotCatalogCsvError(`The column ${c} appears twice.`);
    seen.add(c);
  }
  const missing = REQUIRED_COLUMNS.filter((c) => !seen.has(c));
  if (missing.length) throw new NotCatalogCsvError(`The file needs the column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}.`);
  if (records.length > MAX_IMPORT_ROWS) throw new NotCatalogCsvError(`A file can hold at most ${MAX_IMPORT_ROWS.toLocaleString("en-US")} items.`);

  const errors: ImportRowError[] = [];
  // papaparse's own complaints (an unclosed quote) are reported on their row.
  const parseErrorRows = new Map<number, string>();
  for (const e of parsed.errors) if (e.row !== undefined && e.row !== null) parseErrorRows.set(e.row, e.message);

  const rows: ParsedImport["rows"] = [];
  const firstRowOfSku = new Map<string, number>();
  const present = [...seen] as (keyof CatalogItemInput)[];
  records.forEach((cells, index) => {
    const row = index + 2;
    if (cells.every((c) => c.trim() === "")) return;
    const before = errors.length;
    const parseError = parseErrorRows.get(index + 1);
    if (parseError) errors.push({ row, field: "_", message: `This row could not be read: ${parseError}.` });
    if (cells.length > header.length) errors.push({ row, field: "_", message: `This row has ${cells.length} cells but the header names ${header.length} columns.` });
    const candidate: Record<string, unknown> = {};
    const badCells = new Set<string>();
    columns.forEach((column, i) => {
      if (column === undefined) return;
      const { value, error } = cellValue(column, cells[i] ?? "");
      if (error) {
        errors.push({ row, field: column, message: error });
        badCells.add(column);
      } else if (value !== undefined) candidate[column] = value;
    });
    const result = CatalogItemInputSchema.safeParse(candidate);
    if (!result.success) {
      const reported = new Set<string>();
      for (const issue of result.error.issues) {
        const field = String(issue.path[0] ?? "_");
        if (badCells.has(field) || reported.has(field)) continue;
        reported.add(field);
        errors.push({ row, field, message: issue.message });
      }
    }
    if (errors.length > before || !result.success) return;
    const skuKey = result.data.sku.toLowerCase();
    const first = firstRowOfSku.get(skuKey);
    if (first !== undefined) {
      errors.push({ row, field: "sku", message: `Row ${first} already has the code ${result.data.sku}.` });
      return;
    }
    firstRowOfSku.set(skuKey, row);
    rows.push({ row, values: result.data, columns: present });
  });
  return { rows, errors };
}
