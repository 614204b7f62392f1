import { asc, eq, inArray, or, sql, like } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { catalogItems } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import { containsPattern } from "../../lib/search.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { CatalogItemInput, CatalogKind } from "../../../shared/schemas/catalog.ts";

export const catalogColumns = {
  id: catalogItems.id, sku: catalogItems.sku, name: catalogItems.name, kind: catalogItems.kind, unit: catalogItems.unit,
  nfaSqInPerUnit: catalogItems.nfaSqInPerUnit, nfaSqInPerFt: catalogItems.nfaSqInPerFt, cfm: catalogItems.cfm,
  soldInLengthFt: catalogItems.soldInLengthFt, materialCostCents: catalogItems.materialCostCents,
  sellPriceCents: catalogItems.sellPriceCents, laborMinutesPerUnit: catalogItems.laborMinutesPerUnit,
  isActive: catalogItems.isActive, createdAt: catalogItems.createdAt, updatedAt: catalogItems.updatedAt,
};

export interface CatalogListFilter {
  q?: string;
  kind?: CatalogKind;
  includeInactive: boolean;
}

/** PostgreSQL's unique_violation, found anywhere in the driver's cause chain. */
function isUniqueViolation(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | null, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (e.code === "23505") return true;
  }
  return false;
}

/** Thrown when a write would give two items of one company the same code (case-insensitive). */
export class DuplicateSkuError extends Error {
  constructor() {
    super("duplicate sku");
  }
}

async function guardUnique<T>(write: Promise<T>): Promise<T> {
  try {
    return await write;
  } catch (err) {
    if (isUniqueViolation(err)) throw new DuplicateSkuError();
    throw err;
  }
}

export function createCatalogRepository(db: Database) {
  return {
    list: (actor: Actor, filter: CatalogListFilter) => {
      const pattern = filter.q ? containsPattern(filter.q) : undefined;
      return db
        .select(catalogColumns)
        .from(catalogItems)
        .where(scoped(
          catalogItems, actor,
          filter.includeInactive ? undefined : eq(catalogItems.isActive, true),
          filter.kind ? eq(catalogItems.kind, filter.kind) : undefined,
          pattern ? or(like(sql`lower(${catalogItems.name})`, pattern), like(sql`lower(${catalogItems.sku})`, pattern)) : undefined,
        ))
        .orderBy(asc(catalogItems.kind), asc(sql`lower(${catalogItems.name})`), asc(catalogItems.id));
    },

    /** Every item, retired ones too: a saved option may still name them. */
    all: (actor: Actor) =>
      db.select(catalogColumns).from(catalogItems).where(scoped(catalogItems, actor)).orderBy(asc(catalogItems.kind), asc(sql`lower(${catalogItems.name})`)),

    async find(actor: Actor, id: string) {
      const [row] = await db.select(catalogColumns).from(catalogItems).where(scoped(catalogItems, actor, eq(catalogItems.id, id))).limit(1);
      return row ?? null;
    },

    findMany: (actor: Actor, ids: string[]) =>
      ids.length === 0 ? Promise.resolve([]) : db.select(catalogColumns).from(catalogItems).where(scoped(catalogItems, actor, inArray(catalogItems.id, ids))),

    async insert(actor: Actor, values: CatalogItemInput) {
      const [row] = await guardUnique(db.insert(catalogItems).values({ ...values, companyId: actor.companyId }).returning(catalogColumns));
      return row!;
    },

    async update(actor: Actor, id: string, patch: Partial<CatalogItemInput>) {
      const [row] = await guardUnique(
        db.update(catalogItems).set({ ...patch, updatedAt: new Date() }).where(scoped(catalogItems, actor, eq(catalogItems.id, id))).returning(catalogColumns),
      );
      return row ?? null;
    },

    /**
     * Writes a whole import in one transaction: new codes are inserted, known ones (matched
     * without regard to case) get the columns the file had. All rows land or none do.
     */
    importRows: (actor: Actor, rows: { values: CatalogItemInput; columns: readonly (keyof CatalogItemInput)[] }[]) =>
      guardUnique(db.transaction(async (tx) => {
        const existing = await tx
          .select({ id: catalogItems.id, skuLower: sql<string>`lower(${catalogItems.sku})` })
          .from(catalogItems).where(scoped(catalogItems, actor)).for("update");
        const idBySku = new Map(existing.map((r) => [r.skuLower, r.id]));
        const fresh: (CatalogItemInput & { companyId: string })[] = [];
        let updated = 0;
        for (const { values, columns } of rows) {
          const id = idBySku.get(values.sku.toLowerCase());
          if (!id) {
            fresh.push({ ...values, companyId: actor.companyId });
            continue;
          }
          // The code is the key: a known item keeps its spelling of it.
          const patch = Object.fromEntries(columns.filter((c) => c !== "sku").map((c) => [c, values[c]])) as Partial<CatalogItemInput>;
          await tx.update(catalogItems).set({ ...patch, updatedAt: new Date() }).where(scoped(catalogItems, actor, eq(catalogItems.id, id)));
          updated++;
        }
        for (let i = 0; i < fresh.length; i += 500) await tx.insert(catalogItems).values(fresh.slice(i, i + 500));
        return { created: fresh.length, updated };
      })),
  };
}
export type CatalogRepository = ReturnType<typeof createCatalogRepository>;
export type CatalogRow = Awaited<ReturnType<CatalogRepository["all"]>>[number];
