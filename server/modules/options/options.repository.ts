import { and, asc, eq, isNull, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { changeOrders, companies, designOptions, proposals } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { DesignOptionInput } from "../../../shared/schemas/options.ts";

export const optionColumns = {
  id: designOptions.id, projectId: designOptions.projectId, name: designOptions.name, notes: designOptions.notes,
  position: designOptions.position, spaces: designOptions.spaces, laborLines: designOptions.laborLines,
  discount: designOptions.discount, isKept: designOptions.isKept, origin: designOptions.origin,
  rationale: designOptions.rationale, version: designOptions.version,
  createdAt: designOptions.createdAt, updatedAt: designOptions.updatedAt,
};

/** An accepted proposal revision of a project: which options it offered and which one was signed. */
export interface AcceptedRevision {
  proposalId: string;
  revision: number;
  optionIds: string[];
  acceptedOptionId: string | null;
  decidedAt: Date | null;
  /** Each offered option's price as the homeowner saw it (from the frozen snapshot). */
  prices: Record<string, SignedPrice | null>;
}
export interface SignedPrice {
  subtotalCents: number;
  discountCents: number;
  taxCents: number;
  totalCents: number;
}

/** No accepted proposal offered this option: the guard every write to an option carries, so a race with acceptance cannot slip past. */
const notOfferedInAcceptedProposal = sql`not exists (select 1 from ${proposals} where ${proposals.companyId} = ${designOptions.companyId} and ${proposals.status} = 'accepted' and ${proposals.optionIds} @> jsonb_build_array(${designOptions.id}::text))`;

export interface DepositRule {
  kind: "percent" | "amount";
  /** Percent of the total (e.g. 10) or an amount in cents, as the company profile stores it. */
  value: number;
  capCents: number | null;
}

export interface CompanyTerms {
  taxRateBasisPoints: number;
  depositRule: DepositRule | null;
}

export function createOptionsRepository(db: Database) {
  return {
    listForProject: (actor: Actor, projectId: string) =>
      db.select(optionColumns).from(designOptions)
        .where(scoped(designOptions, actor, eq(designOptions.projectId, projectId)))
        .orderBy(asc(designOptions.position), asc(designOptions.createdAt)),

    async find(actor: Actor, id: string) {
      const [row] = await db.select(optionColumns).from(designOptions).where(scoped(designOptions, actor, eq(designOptions.id, id))).limit(1);
      return row ?? null;
    },

    /** The project's accepted revisions, for the option locks. */
    acceptedRevisions: async (actor: Actor, projectId: string): Promise<AcceptedRevision[]> =>
      (await db.select({
        proposalId: proposals.id, revision: proposals.revision, optionIds: proposals.optionIds, acceptance: proposals.acceptance, decidedAt: proposals.decidedAt,
        prices: sql<Record<string, SignedPrice | null> | null>`(select jsonb_object_agg(o->>'id', o->'price') from jsonb_array_elements(${proposals.snapshot}->'options') o)`,
      })
        .from(proposals).where(scoped(proposals, actor, eq(proposals.projectId, projectId), eq(proposals.status, "accepted"))).orderBy(asc(proposals.decidedAt)))
        .map(({ acceptance, prices, ...r }) => ({ ...r, prices: prices ?? {}, acceptedOptionId: acceptance?.optionId ?? null })),

    /** Whether an accepted proposal released this option's materials to the crew, which revision, and the crew's plan frozen when it was sent. */
    async release(actor: Actor, id: string) {
      const [row] = await db
        .select({ releasedAt: designOptions.releasedAt, proposalId: designOptions.releasedByProposalId, revision: proposals.revision, crewPlans: proposals.crewPlans })
        .from(designOptions)
        .leftJoin(proposals, and(eq(proposals.id, designOptions.releasedByProposalId), eq(proposals.companyId, designOptions.companyId)))
        .where(scoped(designOptions, actor, eq(designOptions.id, id))).limit(1);
      return row?.releasedAt && row.proposalId && row.revision !== null
        ? { releasedAt: row.releasedAt, proposalId: row.proposalId, revision: row.revision, plan: row.crewPlans?.[id] ?? null }
        : null;
    },

    /** The signed change orders of an accepted revision, in the order they were signed: they change the crew's list. */
    signedChanges: (actor: Actor, proposalId: string) =>
      db.select({ number: changeOrders.number, lines: changeOrders.lines }).from(changeOrders)
        .where(scoped(changeOrders, actor, eq(changeOrders.proposalId, proposalId), eq(changeOrders.status, "signed")))
        .orderBy(asc(changeOrders.decidedAt), asc(changeOrders.number)),

    /** Adds the option at the end of the project's list. */
    insert: (actor: Actor, projectId: string, input: DesignOptionInput) =>
      db.transaction(async (tx) => {
        const [{ next } = { next: 0 }] = await tx
          .select({ next: sql<number>`coalesce(max(${designOptions.position}) + 1, 0)::int` })
          .from(designOptions).where(scoped(designOptions, actor, eq(designOptions.projectId, projectId)));
        const [row] = await tx.insert(designOptions).values({ ...input, companyId: actor.companyId, projectId, position: next }).returning(optionColumns);
        return row!;
      }),

    /**
     * Applies the patch only if the stored version is still the one the editor saw and no accepted
     * proposal offered the option (one statement).
     */
    async updateIfVersion(actor: Actor, id: string, version: number, patch: Partial<DesignOptionInput>) {
      const [row] = await db
        .update(designOptions)
        .set({ ...patch, version: sql`${designOptions.version} + 1`, updatedAt: new Date() })
        .where(scoped(designOptions, actor, eq(designOptions.id, id), eq(designOptions.version, version), isNull(designOptions.releasedAt), notOfferedInAcceptedProposal))
        .returning(optionColumns);
      return row ?? null;
    },

    /** Deletes an option no accepted proposal offered; false when none was deleted. */
    async remove(actor: Actor, id: string) {
      const rows = await db.delete(designOptions)
        .where(scoped(designOptions, actor, eq(designOptions.id, id), isNull(designOptions.releasedAt), notOfferedInAcceptedProposal))
        .returning({ id: designOptions.id });
      return rows.length > 0;
    },

    /** The company's own row (the tenant itself): its tax rate and deposit rule for pricing. */
    async companyTerms(actor: Actor): Promise<CompanyTerms> {
      const [row] = await db
        .select({ taxRateBasisPoints: companies.taxRateBasisPoints, depositRule: companies.depositRule })
        .from(companies).where(eq(companies.id, actor.companyId)).limit(1);
      return { taxRateBasisPoints: row?.taxRateBasisPoints ?? 0, depositRule: row?.depositRule ?? null };
    },
  };
}
export type OptionsRepository = ReturnType<typeof createOptionsRepository>;
export type OptionRow = NonNullable<Awaited<ReturnType<OptionsRepository["find"]>>>;
