/**
 * Project list speed with 5,000 projects in one company: inserts them into a throwaway company
 * in the test database, times the list query (the repository the API uses) with search, sort,
 * filters and paging, prints the median and p95 in ms, then removes the company's rows.
 *
 *   npm run bench -- project-list          (a throwaway database, via scripts/tasks/bench.ts)
 *   node --import tsx bench/project-list-bench.ts   (the test database)
 */
import { randomUUID } from "node:crypto";
import { performance } from "node:perf_hooks";
import { eq, sql as rawSql } from "drizzle-orm";
import { prepareDatabase } from "../scripts/lib/environment.ts";
import { createDb } from "../server/db/client.ts";
import { atticSpaces, companies, customers, projects, users } from "../server/db/schema/index.ts";
import { createProjectsRepository } from "../server/modules/projects/projects.repository.ts";
import type { Actor } from "../server/lib/request-context.ts";
import { ListQuerySchema, PROJECT_STATUSES } from "../shared/schemas/projects.ts";

const PROJECT_COUNT = 5_000;
const CUSTOMER_COUNT = 1_500;
const RUNS = 60;
const WARMUP_RUNS = 5;

const STREETS = ["Wren Street", "Heron Way", "Lark Lane", "Finch Road", "Sweetgrass Avenue", "Thistledown Lane", "Kestrel Ridge Road", "Cattail Court", "Old Mill Crossing", "Quarry Hill Road"];
const FIRST = ["Ada", "Bram", "Cleo", "Dov", "Edda", "Fenn", "Gus", "Hale", "Ines", "Jory", "Kit", "Lorne"];
const LAST = ["Ambry", "Brask", "Corran", "Dunmore", "Essary", "Fallow", "Gristwood", "Harrowgate", "Ilsley", "Jessop", "Kettering", "Lowmoor"];
const WORK = ["attic survey", "ridge vent install", "soffit repair", "gable fan replacement", "reroof and ventilation", "baffle install"];

// A fixed-seed generator, so every run measures the same data.
let seed = 42;
const rand = () => ((seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;

const databaseUrl = process.env.EAVESIGHT_BENCH_DATABASE_URL ?? (await prepareDatabase("test")).databaseUrl;
const { db, sql } = createDb(databaseUrl, { max: 4 });

const [company] = await db.insert(companies).values({ name: "Bench Co", slug: `bench-${randomUUID()}` }).returning();
const companyId = company!.id;
const estimatorIds = Array.from({ length: 4 }, () => randomUUID());
await db.insert(users).values(estimatorIds.map((id, i) => ({ id, companyId, email: `bench-${id}@bench.example`, name: `Bench Estimator ${i + 1}`, role: "estimator" as const, passwordHash: "x" })));
const actor: Actor = { companyId, userId: estimatorIds[0]!, role: "owner", email: "bench@bench.example", name: "Bench" };

try {
  const customerRows = Array.from({ length: CUSTOMER_COUNT }, (_, i) => ({ companyId, name: `${pick(FIRST)} ${pick(LAST)} ${i}`, email: `c${i}@example.com` }));
  const customerIds: string[] = [];
  for (let i = 0; i < customerRows.length; i += 1_000) {
    customerIds.push(...(await db.insert(customers).values(customerRows.slice(i, i + 1_000)).returning({ id: customers.id })).map((r) => r.id));
  }
  const start = Date.now() - 400 * 24 * 3600 * 1000;
  const projectRows = Array.from({ length: PROJECT_COUNT }, (_, i) => {
    const at = new Date(start + rand() * 400 * 24 * 3600 * 1000);
    return {
      companyId, customerId: pick(customerIds), title: `${pick(LAST)} ${pick(WORK)}`, siteAddress: `${1 + Math.floor(rand() * 2000)} ${pick(STREETS)}, Marrow Creek`,
      status: pick(PROJECT_STATUSES), estimatorId: rand() < 0.85 ? pick(estimatorIds) : null, climateZone: 4, codeBasis: "irc-2018" as const,
      createdAt: at, updatedAt: new Date(at.getTime() + rand() * 30 * 24 * 3600 * 1000), notes: i % 10 === 0 ? "Gate code at the side door." : null,
    };
  });
  const projectIds: string[] = [];
  for (let i = 0; i < projectRows.length; i += 1_000) {
    projectIds.push(...(await db.insert(projects).values(projectRows.slice(i, i + 1_000)).returning({ id: projects.id })).map((r) => r.id));
  }
  const spaceRows = projectIds.filter(() => rand() < 0.6).map((projectId) => ({ companyId, projectId, name: "Main attic", roof: { form: "gable" as const, pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null } }));
  for (let i = 0; i < spaceRows.length; i += 1_000) await db.insert(atticSpaces).values(spaceRows.slice(i, i + 1_000));
  await db.execute(rawSql`analyze customers; analyze projects; analyze attic_spaces`);

  const repo = createProjectsRepository(db);
  const scenarios: [string, Record<string, string>][] = [
    ["default (updatedAt desc, page 1)", {}],
    ["search q=wren (title/address/customer)", { q: "wren" }],
    ["search q=kettering + sort title asc", { q: "kettering", sort: "title", dir: "asc" }],
    ["status=lead + estimator + sort customerName", { status: "lead", estimatorId: estimatorIds[1]!, sort: "customerName", dir: "asc" }],
    ["search q=soffit + status=sold + page 3", { q: "soffit", status: "sold", page: "3" }],
    ["deep page 150 of 25, sort createdAt", { sort: "createdAt", page: "150" }],
  ];
  console.log(`project list, ${PROJECT_COUNT.toLocaleString("en-US")} projects / ${CUSTOMER_COUNT.toLocaleString("en-US")} customers in one company, ${RUNS} runs each (items + total):`);
  const medians: number[] = [];
  for (const [label, raw] of scenarios) {
    const query = ListQuerySchema.parse(raw);
    const timesMs: number[] = [];
    let total = 0;
    for (let i = 0; i < WARMUP_RUNS + RUNS; i++) {
      const t0 = performance.now();
      total = (await repo.list(actor, query)).total;
      if (i >= WARMUP_RUNS) timesMs.push(performance.now() - t0);
    }
    timesMs.sort((a, b) => a - b);
    const medianMs = timesMs[Math.floor(timesMs.length / 2)]!;
    const p95Ms = timesMs[Math.floor(timesMs.length * 0.95)]!;
    medians.push(medianMs);
    console.log(`  ${label.padEnd(48)} median ${medianMs.toFixed(2).padStart(6)} ms   p95 ${p95Ms.toFixed(2).padStart(6)} ms   (${total} matches)`);
  }
  console.log(`  worst median: ${Math.max(...medians).toFixed(2)} ms`);
} finally {
  await db.delete(atticSpaces).where(eq(atticSpaces.companyId, companyId));
  await db.delete(projects).where(eq(projects.companyId, companyId));
  await db.delete(customers).where(eq(customers.companyId, companyId));
  await db.delete(users).where(eq(users.companyId, companyId));
  await db.delete(companies).where(eq(companies.id, companyId));
  await sql.end();
}
