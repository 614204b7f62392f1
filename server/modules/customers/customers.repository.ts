import { asc, desc, eq, like, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { customers, projects } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import { containsPattern } from "../../lib/search.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { CustomerInput, CustomerListQuery } from "../../../shared/schemas/projects.ts";

export const customerColumns = {
  id: customers.id, name: customers.name, phone: customers.phone, email: customers.email,
  billingAddress: customers.billingAddress, notes: customers.notes, createdAt: customers.createdAt, updatedAt: customers.updatedAt,
};

const SORT_COLUMNS = { name: sql`lower(${customers.name})`, createdAt: customers.createdAt, updatedAt: customers.updatedAt } as const;

export function createCustomersRepository(db: Database) {
  const projectCount = (actor: Actor) =>
    sql<number>`(select count(*)::int from ${projects} where ${scoped(projects, actor, eq(projects.customerId, customers.id))})`;

  return {
    async list(actor: Actor, query: CustomerListQuery) {
      const where = scoped(customers, actor, query.q ? like(customers.searchText, containsPattern(query.q)) : undefined);
      const order = query.dir === "asc" ? asc : desc;
      const [items, [count]] = await Promise.all([
        db.select({ ...customerColumns, projectCount: projectCount(actor) }).from(customers).where(where)
          .orderBy(order(SORT_COLUMNS[query.sort]), asc(customers.id))
          .limit(query.pageSize).offset((query.page - 1) * query.pageSize),
        db.select({ n: sql<number>`count(*)::int` }).from(customers).where(where),
      ]);
      return { items, total: count?.n ?? 0 };
    },
    async find(actor: Actor, id: string) {
      const [row] = await db.select({ ...customerColumns, projectCount: projectCount(actor) }).from(customers).where(scoped(customers, actor, eq(customers.id, id))).limit(1);
      return row ?? null;
    },
    async insert(actor: Actor, input: CustomerInput) {
      const [row] = await db.insert(customers).values({ ...input, companyId: actor.companyId }).returning(customerColumns);
      return row!;
    },
    async update(actor: Actor, id: string, patch: Partial<CustomerInput>) {
      const [row] = await db.update(customers).set({ ...patch, updatedAt: new Date() }).where(scoped(customers, actor, eq(customers.id, id))).returning(customerColumns);
      return row ?? null;
    },
    /** Deletes only a customer with no projects, in one statement, so a project added meanwhile is never orphaned. */
    async deleteUnused(actor: Actor, id: string): Promise<"deleted" | "in-use" | "missing"> {
      const deleted = await db.delete(customers)
        .where(scoped(customers, actor, eq(customers.id, id), sql`not exists (select 1 from ${projects} where ${projects.customerId} = ${customers.id})`))
        .returning({ id: customers.id });
      if (deleted.length) return "deleted";
      const [exists] = await db.select({ id: customers.id }).from(customers).where(scoped(customers, actor, eq(customers.id, id))).limit(1);
      return exists ? "in-use" : "missing";
    },
  };
}
export type CustomersRepository = ReturnType<typeof createCustomersRepository>;
