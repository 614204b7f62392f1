import { and, asc, desc, eq, like, or, sql, type SQL } from "drizzle-orm";
import { alias, type PgColumn } from "drizzle-orm/pg-core";
import type { Database } from "../../db/client.ts";
import { atticSpaces, companies, customers, photos, projects, users } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import { jsonRows } from "../../lib/json-rows.ts";
import { spaceColumns } from "../spaces/spaces.repository.ts";
import { photoColumns } from "../photos/photos.repository.ts";
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

/**
 * The statements the busiest reads send, prepared once per process (Drizzle's `.prepare()`): the
 * SQL is built once and PostgreSQL plans it once per connection; values are bound at execution.
 * Each read is one statement: a project page's project, customer, estimator, spaces and photos
 * come back together, the children as JSON arrays (lib/json-rows.ts).
 */
const companyId = sql.placeholder("companyId");
const projectId = sql.placeholder("projectId");
const company = { companyId };

/** The list's filters; a query uses one statement per combination of the filters it names. */
type ListShape = Pick<ListQuery, "sort" | "dir"> & { hasStatus: boolean; hasEstimator: boolean; hasSearch: boolean };
const listShapeKey = (s: ListShape) => `${s.sort}:${s.dir}:${+s.hasStatus}${+s.hasEstimator}${+s.hasSearch}`;

function prepareStatements(db: Database) {
  // Written over plain columns so the count can run it on aliases of the same tables.
  type Filtered = { companyId: PgColumn; searchText: PgColumn };
  const listFilters = (p: Filtered & { status: PgColumn; estimatorId: PgColumn }, c: Filtered, shape: ListShape): SQL =>
    scoped(
      p, company,
      shape.hasStatus ? eq(p.status, sql.placeholder("status")) : undefined,
      shape.hasEstimator ? eq(p.estimatorId, sql.placeholder("estimatorId")) : undefined,
      shape.hasSearch ? or(like(p.searchText, sql.placeholder("pattern")), like(c.searchText, sql.placeholder("pattern"))) : undefined,
    );
  const countProjects = alias(projects, "count_projects");
  const countCustomers = alias(customers, "count_customers");
  const countQuery = (shape: ListShape) => db
    .select({ n: sql<number>`count(*)::int` })
    .from(countProjects)
    .innerJoin(countCustomers, and(eq(countCustomers.id, countProjects.customerId), eq(countCustomers.companyId, countProjects.companyId)))
    .where(listFilters(countProjects, countCustomers, shape));

  const lists = new Map<string, { page: ReturnType<typeof preparePage>; count: ReturnType<typeof prepareCount> }>();
  const prepareCount = (shape: ListShape) => countQuery(shape).prepare(`projects_count_${listShapeKey(shape)}`);
  function preparePage(shape: ListShape) {
    const order = shape.dir === "asc" ? asc : desc;
    const spaceCount = sql<number>`(select count(*)::int from ${atticSpaces} where ${scoped(atticSpaces, company, eq(atticSpaces.projectId, projects.id))})`;
    // The total rides along as an uncorrelated subquery (computed once), so a page is one statement.
    const total = sql<number>`(${countQuery(shape)})`.mapWith(Number);
    return db
      .select({
        id: projects.id, title: projects.title, siteAddress: projects.siteAddress, status: projects.status,
        customerId: customers.id, customerName: customers.name, estimatorId: users.id, estimatorName: users.name,
        updatedAt: projects.updatedAt, createdAt: projects.createdAt, spaceCount, total,
      })
      .from(projects)
      .innerJoin(customers, and(eq(customers.id, projects.customerId), eq(customers.companyId, projects.companyId)))
      .leftJoin(users, and(eq(users.id, projects.estimatorId), eq(users.companyId, projects.companyId)))
      .where(listFilters(projects, customers, shape))
      .orderBy(order(SORT_COLUMNS[shape.sort]), asc(projects.id))
      .limit(sql.placeholder("limit"))
      .offset(sql.placeholder("offset"))
      .prepare(`projects_page_${listShapeKey(shape)}`);
  }
  const list = (shape: ListShape) => {
    const key = listShapeKey(shape);
    let statements = lists.get(key);
    if (!statements) lists.set(key, (statements = { page: preparePage(shape), count: prepareCount(shape) }));
    return statements;
  };

  const projectCustomerEstimator = {
    ...projectColumns,
    customer: { id: customers.id, name: customers.name, phone: customers.phone, email: customers.email, billingAddress: customers.billingAddress, notes: customers.notes },
    estimator: { id: users.id, name: users.name },
  };
  const spaces = jsonRows(spaceColumns, atticSpaces, scoped(atticSpaces, company, eq(atticSpaces.projectId, projects.id)), [asc(atticSpaces.position), asc(atticSpaces.createdAt)]);
  const projectPhotos = jsonRows(photoColumns, photos, scoped(photos, company, eq(photos.projectId, projects.id)), [asc(photos.createdAt), asc(photos.id)]);
  const detail = db
    .select({ ...projectCustomerEstimator, spaces, photos: projectPhotos })
    .from(projects)
    .innerJoin(customers, and(eq(customers.id, projects.customerId), eq(customers.companyId, projects.companyId)))
    .leftJoin(users, and(eq(users.id, projects.estimatorId), eq(users.companyId, projects.companyId)))
    .where(scoped(projects, company, eq(projects.id, projectId)))
    .prepare("project_detail");
  const withSpaces = db
    .select({ ...projectColumns, spaces })
    .from(projects)
    .where(scoped(projects, company, eq(projects.id, projectId)))
    .prepare("project_with_spaces");
  return { list, detail, withSpaces };
}

export function createProjectsRepository(db: Database) {
  const statements = prepareStatements(db);
  return {
    async list(actor: Actor, query: ListQuery) {
      const shape: ListShape = { sort: query.sort, dir: query.dir, hasStatus: Boolean(query.status), hasEstimator: Boolean(query.estimatorId), hasSearch: Boolean(query.q) };
      const values = {
        companyId: actor.companyId, status: query.status, estimatorId: query.estimatorId, pattern: query.q ? containsPattern(query.q) : undefined,
        limit: query.pageSize, offset: (query.page - 1) * query.pageSize,
      };
      const { page, count } = statements.list(shape);
      const rows = await page.execute(values);
      // A page past the end has no row to carry the total: count apart (rare).
      const total = rows[0]?.total ?? (query.page === 1 ? 0 : ((await count.execute(values))[0]?.n ?? 0));
      const items = rows.map(({ customerId, customerName, estimatorId, estimatorName, total: _total, ...p }) => ({
        ...p,
        customer: { id: customerId, name: customerName },
        estimator: estimatorId ? { id: estimatorId, name: estimatorName! } : null,
      }));
      return { items, total };
    },

    /** A project with its customer, estimator, spaces and photos, in one statement; null when not the caller's. */
    async detail(actor: Actor, id: string) {
      const [row] = await statements.detail.execute({ companyId: actor.companyId, projectId: id });
      return row ?? null;
    },

    /** A project with its spaces (the analysis's inputs), in one statement; null when not the caller's. */
    async findWithSpaces(actor: Actor, id: string) {
      const [row] = await statements.withSpaces.execute({ companyId: actor.companyId, projectId: id });
      return row ?? null;
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
