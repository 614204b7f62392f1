import { AppError, notFound } from "../../lib/errors.ts";
import type { Audit } from "../../lib/audit.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { CatalogItemInput } from "../../../shared/schemas/catalog.ts";
import { catalogItemProblems } from "./catalog-rules.ts";
import { CATALOG_COLUMNS, catalogToCsv, NotCatalogCsvError, parseCatalogCsv, type ImportRowError } from "./catalog-csv.ts";
import { DuplicateSkuError, type CatalogListFilter, type CatalogRepository, type CatalogRow } from "./catalog.repository.ts";

const DUPLICATE_SKU = "Another item of your catalog already uses this code.";

function invalid(fields: Record<string, string>): AppError {
  const [field, message] = Object.entries(fields)[0]!;
  return new AppError("invalid-input", `Please check ${field}: ${message}`, 400, fields);
}

async function uniqueSku<T>(write: Promise<T>): Promise<T> {
  try {
    return await write;
  } catch (err) {
    if (err instanceof DuplicateSkuError) throw new AppError("duplicate-sku", DUPLICATE_SKU, 409, { sku: DUPLICATE_SKU });
    throw err;
  }
}

const inputOf = (row: CatalogRow): CatalogItemInput => {
  const { id: _id, createdAt: _c, updatedAt: _u, ...input } = row;
  return input;
};

export interface ImportResult {
  created: number;
  updated: number;
  errors: ImportRowError[];
}

export function createCatalogService(deps: { repo: CatalogRepository; audit: Audit }) {
  const { repo } = deps;

  async function requireItem(actor: Actor, id: string): Promise<CatalogRow> {
    const item = await repo.find(actor, id);
    if (!item) throw notFound("That catalog item");
    return item;
  }

  return {
    list: async (actor: Actor, filter: CatalogListFilter) => ({ items: await repo.list(actor, filter) }),

    /** Every item of the company, retired ones too (saved options may name them). */
    all: (actor: Actor) => repo.all(actor),

    async create(actor: Actor, input: CatalogItemInput, meta: RequestMeta): Promise<CatalogRow> {
      const problems = catalogItemProblems(input);
      if (Object.keys(problems).length) throw invalid(problems);
      const item = await uniqueSku(repo.insert(actor, input));
      await deps.audit({ event: "catalog-item-created", companyId: actor.companyId, userId: actor.userId, detail: { itemId: item.id, sku: item.sku } }, meta);
      return item;
    },

    /** A patch carries only the fields the caller sent; the rules are checked on the item as it will be. */
    async update(actor: Actor, id: string, patch: Partial<CatalogItemInput>, meta: RequestMeta): Promise<CatalogRow> {
      const current = await requireItem(actor, id);
      const problems = catalogItemProblems({ ...inputOf(current), ...patch });
      if (Object.keys(problems).length) throw invalid(problems);
      const item = await uniqueSku(repo.update(actor, id, patch));
      if (!item) throw notFound("That catalog item");
      await deps.audit({ event: "catalog-item-updated", companyId: actor.companyId, userId: actor.userId, detail: { itemId: id, fields: Object.keys(patch) } }, meta);
      return item;
    },

    async exportCsv(actor: Actor): Promise<string> {
      return catalogToCsv((await repo.all(actor)).map(inputOf));
    },

    /**
     * All rows or none: every row is checked (schema, then the cross-field rules on the item as
     * it would be after the import), and only a file with no bad row is written.
     */
    async importCsv(actor: Actor, csv: string, meta: RequestMeta): Promise<ImportResult> {
      let parsed;
      try {
        parsed = parseCatalogCsv(csv);
      } catch (err) {
        if (err instanceof NotCatalogCsvError) throw new AppError("not-csv", err.message, 400, { file: err.message });
        throw err;
      }
      const existing = new Map((await repo.all(actor)).map((row) => [row.sku.toLowerCase(), inputOf(row)]));
      const errors = [...parsed.errors];
      for (const { row, values, columns } of parsed.rows) {
        const before = existing.get(values.sku.toLowerCase());
        const after = before ? { ...before, ...Object.fromEntries(columns.map((c) => [c, values[c]])) } : values;
        for (const [field, message] of Object.entries(catalogItemProblems(after))) errors.push({ row, field, message });
      }
      if (errors.length) {
        // By row, then in the file's column order, so the report reads like the sheet.
        const columnIndex = (field: string) => (CATALOG_COLUMNS as string[]).indexOf(field);
        errors.sort((a, b) => a.row - b.row || columnIndex(a.field) - columnIndex(b.field));
        return { created: 0, updated: 0, errors };
      }
      if (parsed.rows.length === 0) throw new AppError("not-csv", "The file has a header but no items.", 400, { file: "The file has a header but no items." });
      const { created, updated } = await uniqueSku(repo.importRows(actor, parsed.rows));
      await deps.audit({ event: "catalog-imported", companyId: actor.companyId, userId: actor.userId, detail: { created, updated } }, meta);
      return { created, updated, errors: [] };
    },
  };
}
export type CatalogService = ReturnType<typeof createCatalogService>;
