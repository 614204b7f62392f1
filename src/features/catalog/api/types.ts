import type { CatalogItem, CatalogKind } from "@shared/schemas/catalog";

/** A catalog item as GET /api/catalog answers it. Money is integer cents. */
export interface CatalogRecord extends CatalogItem {
  createdAt: string;
  updatedAt: string;
}

export interface CatalogListParams {
  q: string;
  kind: CatalogKind | "";
  includeInactive: boolean;
}

export interface ImportRowError {
  /** Spreadsheet row: the header is row 1. */
  row: number;
  /** Column name, or "_" for the whole row. */
  field: string;
  message: string;
}

export interface ImportResult {
  created: number;
  updated: number;
  errors: ImportRowError[];
  /** The server's one-line summary when rows were rejected. */
  message: string | null;
}
