import { and, desc, eq, isNull, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { customers, payments, projects, proposals } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";

/** The only code of the pipeline that calls Drizzle; every query is scoped to the actor's company. */
export function createPipelineRepository(db: Database) {
  return {
    /**
     * The current revision of every proposal (a superseded one is history, not pipeline), with
     * the option totals read out of the frozen snapshot in SQL so the pictures never leave the database.
     */
    currentRevisions: (actor: Pick<Actor, "companyId">) =>
      db
        .select({
          id: proposals.id,
          projectId: proposals.projectId,
          revision: proposals.revision,
          status: proposals.status,
          optionIds: proposals.optionIds,
          validUntil: proposals.validUntil,
          createdAt: proposals.createdAt,
          sentAt: proposals.sentAt,
          viewedAt: proposals.viewedAt,
          decidedAt: proposals.decidedAt,
          tokenExpiresAt: proposals.tokenExpiresAt,
          projectTitle: projects.title,
          customerName: customers.name,
          snapshotTotalsCents: sql<number[] | null>`jsonb_path_query_array(${proposals.snapshot}, '$.options[*].price.totalCents')`,
          /** Deposits confirmed by the payment webhook and not refunded. */
          depositPaidCents: sql<number>`(select coalesce(sum(${payments.amountCents}), 0)::int from ${payments} where ${payments.proposalId} = ${proposals.id} and ${payments.companyId} = ${proposals.companyId} and ${payments.status} = 'paid')`,
          acceptedTotalCents: sql<number | null>`(select (o->'price'->>'totalCents')::int from jsonb_array_elements(${proposals.snapshot}->'options') o where o->>'id' = ${proposals.acceptance}->>'optionId' limit 1)`,
        })
        .from(proposals)
        .innerJoin(projects, and(eq(projects.id, proposals.projectId), eq(projects.companyId, proposals.companyId)))
        .leftJoin(customers, and(eq(customers.id, projects.customerId), eq(customers.companyId, proposals.companyId)))
        .where(scoped(proposals, actor, isNull(proposals.supersededBy)))
        .orderBy(desc(proposals.updatedAt)),
  };
}
export type PipelineRepository = ReturnType<typeof createPipelineRepository>;
export type PipelineRow = Awaited<ReturnType<PipelineRepository["currentRevisions"]>>[number];
