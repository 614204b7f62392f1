import { and, asc, desc, eq, like, or, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { atticSpaces, companies, customers, projects, users } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import { containsPattern } from "../../lib/search.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { ListQuery } from "../../../shared/schemas/projects.ts";
import { CodeBasisSchema, type CodeBasis, type UpperShareBase } from "../../../shared/ventilation/index.ts";

export const projectColumns = {
  id: projects.id, customerId: projects.customerId, title: projects.title, siteAddress: projects.siteAddress,
  status: projects.status, estimatorId: projects.estimatorId, climateZone: projects.climateZone,
  moistureRegime: projects.moistureRegime, codeBasis: projects.codeBasis, ceilingVaporRetarder: projects.ceilingVaporRetarder,
  roofColor: projects.roofColor, notes: projects.notes, version: projects.version,
  createdAt: projects.createdAt, updatedAt: projects.updatedAt,
  /** The company's reading of the 1/300 upper-vent share (profile setting), applied to every analysis. */
  upperShareBase: sql<UpperShareBase>`(select case when ${companies.settings}->>'upperShareBase' = 'provided' then 'provided' else 'required' end from ${companies} where ${companies.id} = ${projects.companyId})`.as("upper_share_base"),
};

/** Columns a caller may write; the rest (id, company, version, timestamps) are the server's. */
export type ProjectWrite = Omit<typeof projects.$inferInsert, "id" | "companyId" | "version" | "searchText" | "createdAt" | "updatedAt">;

const SORT_COLUMNS = {
  updatedAt: projects.updatedAt,
  createdAt: projects.createdAt,
  title: sql`lower(${projects.title})`,
  customerName: sql`lower(${customers.name})`,
  // The enum's order is the pipeline's: lead, surveyed, proposed, sold, lost, completed.
  status: projects.status,
} as const;

export function createProjectsRepository(db: Database) {
  return {
    async list(actor: Actor, query: ListQuery) {
      const pattern = query.q ? containsPattern(query.q) : undefined;
      const where = scoped(
        projects, actor,
        query.status ? eq(projects.status, query.status) : undefined,
        query.estimatorId ? eq(projects.estimatorId, query.estimatorId) : undefined,
        pattern ? or(like(projects.searchText, pattern), like(customers.searchText, pattern)) : undefined,
      );
      const order = query.dir === "asc" ? asc : desc;
      const spaceCount = sql<number>`(select count(*)::int from ${atticSpaces} where ${scoped(atticSpaces, actor, eq(atticSpaces.projectId, projects.id))})`;
      const [rows, [count]] = await Promise.all([
        db
          .select({
            id: projects.id, title: projects.title, siteAddress: projects.siteAddress, status: projects.status,
            customerId: customers.id, customerName: customers.name, estimatorId: users.id, estimatorName: users.name,
            updatedAt: projects.updatedAt, createdAt: projects.createdAt, spaceCount,
          })
          .from(projects)
          .innerJoin(customers, and(eq(customers.id, projects.customerId), eq(customers.companyId, projects.companyId)))
          .leftJoin(users, and(eq(users.id, projects.estimatorId), eq(users.companyId, projects.companyId)))
          .where(where)
          .orderBy(order(SORT_COLUMNS[query.sort]), asc(projects.id))
          .limit(query.pageSize)
          .offset((query.page - 1) * query.pageSize),
        db
          .select({ n: sql<number>`count(*)::int` })
          .from(projects)
          .innerJoin(customers, and(eq(customers.id, projects.customerId), eq(customers.companyId, projects.companyId)))
          .where(where),
      ]);
      const items = rows.map(({ customerId, customerName, estimatorId, estimatorName, ...p }) => ({
        ...p,
        customer: { id: customerId, name: customerName },
        estimator: estimatorId ? { id: estimatorId, name: estimatorName! } : null,
      }));
      return { items, total: count?.n ?? 0 };
    },

    async find(actor: Actor, id: string) {
      const [row] = await db.select(projectColumns).from(projects).where(scoped(projects, actor, eq(projects.id, id))).limit(1);
      return row ?? null;
    },

    async insert(actor: Actor, values: ProjectWrite) {
      const [row] = await db.insert(projects).values({ ...values, companyId: actor.companyId }).returning(projectColumns);
      return row!;
    },

    /**
     * Applies the patch only if the stored version is still the one the editor saw: the check
     * and the write are one statement, so two concurrent saves can never both pass.
     */
    async updateIfVersion(actor: Actor, id: string, version: number, patch: Partial<ProjectWrite>) {
      const [row] = await db
        .update(projects)
        .set({ ...patch, version: sql`${projects.version} + 1`, updatedAt: new Date() })
        .where(scoped(projects, actor, eq(projects.id, id), eq(projects.version, version)))
        .returning(projectColumns);
      return row ?? null;
    },

    async customerExists(actor: Actor, id: string) {
      const [row] = await db.select({ id: customers.id }).from(customers).where(scoped(customers, actor, eq(customers.id, id))).limit(1);
      return Boolean(row);
    },

    async findUser(actor: Actor, id: string) {
      const [row] = await db.select({ id: users.id, name: users.name, isActive: users.isActive }).from(users).where(scoped(users, actor, eq(users.id, id))).limit(1);
      return row ?? null;
    },

    async findCustomer(actor: Actor, id: string) {
      const [row] = await db
        .select({ id: customers.id, name: customers.name, phone: customers.phone, email: customers.email, billingAddress: customers.billingAddress, notes: customers.notes })
        .from(customers).where(scoped(customers, actor, eq(customers.id, id))).limit(1);
      return row ?? null;
    },

    /** The company's own row: the tenant itself, looked up by the actor's company. */
    /** What a new project starts with when the estimator leaves it: the company profile's code edition and climate zone. */
    async projectDefaults(actor: Actor): Promise<{ codeBasis: CodeBasis; climateZone: number }> {
      const [row] = await db.select({ codeBasis: companies.defaultCodeBasis, settings: companies.settings }).from(companies).where(eq(companies.id, actor.companyId)).limit(1);
      const parsed = CodeBasisSchema.safeParse(row?.codeBasis);
      const zone = (row?.settings as { defaultClimateZone?: unknown } | undefined)?.defaultClimateZone;
      return { codeBasis: parsed.success ? parsed.data : "irc-2018", climateZone: typeof zone === "number" && zone >= 1 && zone <= 8 ? zone : 4 };
    },
  };
}
export type ProjectsRepository = ReturnType<typeof createProjectsRepository>;
export type ProjectRow = NonNullable<Awaited<ReturnType<ProjectsRepository["find"]>>>;
