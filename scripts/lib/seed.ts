/**
 * Demo data in the invented scenario of the design: Tallgrass Exteriors of Marrow Creek, and a
 * second company, Bluestem Roofing, to show that tenants never see each other. Idempotent:
 * rows are found by their natural keys and only missing ones are added.
 */
import { randomUUID } from "node:crypto";
import { sql as rawSql } from "drizzle-orm";
import { createDb, type Database } from "../../server/db/client.ts";
import { companies, users } from "../../server/db/schema/index.ts";
import { hashPassword } from "../../server/lib/password.ts";
import type { Role } from "../../shared/schemas/roles.ts";
import { log } from "./paths.ts";

export const DEMO_PASSWORD = "eavesight-demo";

export const DEMO_USERS: { company: string; email: string; name: string; role: Role }[] = [
  { company: "tallgrass", email: "owner@tallgrass.example", name: "Wren Halloway", role: "owner" },
  { company: "tallgrass", email: "estimator@tallgrass.example", name: "Dale Okafor", role: "estimator" },
  { company: "tallgrass", email: "sales@tallgrass.example", name: "Priya Lindqvist", role: "sales" },
  { company: "bluestem", email: "owner@bluestem.example", name: "Marcus Tealby", role: "owner" },
];

const DEMO_COMPANIES = [
  {
    slug: "tallgrass", name: "Tallgrass Exteriors", addressLine: "410 Sawmill Road, Marrow Creek", phone: "(555) 014-2290",
    email: "office@tallgrass.example", licenseNumber: "MC-RC-20417", taxRateBasisPoints: 725,
    depositRule: { kind: "percent" as const, value: 10, capCents: 100_000 },
    defaultTerms: "Work is guaranteed for five years against defects in workmanship. Materials carry their makers' warranties. Balance due on completion.",
  },
  {
    slug: "bluestem", name: "Bluestem Roofing", addressLine: "88 Prairie Lane, Marrow Creek", phone: "(555) 014-7781",
    email: "hello@bluestem.example", licenseNumber: "MC-RC-31102", taxRateBasisPoints: 725,
    depositRule: { kind: "percent" as const, value: 10, capCents: 100_000 }, defaultTerms: null,
  },
];

export async function seedAccounts(db: Database): Promise<Record<string, string>> {
  const companyIds: Record<string, string> = {};
  for (const c of DEMO_COMPANIES) {
    await db.insert(companies).values(c).onConflictDoNothing({ target: companies.slug });
    const [row] = await db.select({ id: companies.id }).from(companies).where(rawSql`${companies.slug} = ${c.slug}`);
    companyIds[c.slug] = row!.id;
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const u of DEMO_USERS) {
    const [existing] = await db.select({ id: users.id }).from(users).where(rawSql`lower(${users.email}) = ${u.email}`);
    if (existing) continue;
    await db.insert(users).values({ id: randomUUID(), companyId: companyIds[u.company]!, email: u.email, name: u.name, role: u.role, passwordHash });
  }
  return companyIds;
}

export async function seedDemo(databaseUrl: string): Promise<void> {
  const { db, sql } = createDb(databaseUrl, { max: 2 });
  try {
    await seedAccounts(db);
    log("demo data seeded (Tallgrass Exteriors, Bluestem Roofing)");
  } finally {
    await sql.end();
  }
}
