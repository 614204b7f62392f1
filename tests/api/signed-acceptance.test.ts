import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { designOptions, projects, proposalEvents, proposals } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { makeTeam, send, type Team } from "../setup/survey-fixtures.ts";
import { draftReadyToSend } from "../setup/proposal-fixture.ts";

/**
 * Issue 14, "atomic acceptance": the signature, the accepted event, the project's "sold" status
 * and the crew release are one transaction, and a salesperson revising the proposal at the same
 * moment gets a clean 409 (never a 500). The SIGKILL case is tests/stress/acceptance-crash.test.ts.
 */
let t: TestApp;
let team: Team;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (acceptance test)");
});
afterAll(async () => t?.close());

async function sentProposal() {
  const { proposalId, projectId } = await draftReadyToSend(t, team);
  const sent = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  const token = (sent.body.link as string).split("/p/")[1]!;
  const optionId = (await team.asSales.get(`/api/proposals/${proposalId}`)).body.proposal.optionIds[0] as string;
  return { proposalId, projectId, token, optionId, version: sent.body.proposal.version as number };
}

const accept = (token: string, optionId: string) =>
  t.request().post(`/api/public/proposals/${token}/accept`).set("origin", ORIGIN)
    .send({ optionId, signerName: "Rowan Tessaly", signature: { typed: "Rowan Tessaly" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });

describe("acceptance is one transaction", () => {
  it("when the homeowner accepts, then the status, the accepted event, the sold project and the crew release are all there", async () => {
    const p = await sentProposal();
    const res = await accept(p.token, p.optionId);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const [row] = await t.db.select().from(proposals).where(eq(proposals.id, p.proposalId));
    const events = await t.db.select().from(proposalEvents).where(and(eq(proposalEvents.proposalId, p.proposalId), eq(proposalEvents.event, "accepted")));
    const [project] = await t.db.select().from(projects).where(eq(projects.id, p.projectId));
    const [option] = await t.db.select().from(designOptions).where(eq(designOptions.id, p.optionId));
    expect(row).toMatchObject({ status: "accepted", signedRenderStatus: expect.stringMatching(/queued|rendering|ready/) });
    expect(events).toHaveLength(1);
    expect(project?.status).toBe("sold");
    expect(option?.releasedByProposalId).toBe(p.proposalId);
    expect(option?.releasedAt?.toISOString()).toBe(row!.decidedAt!.toISOString());
  });

  it("when staff revise the proposal while the homeowner accepts it, then one wins and the other gets a clean 409 or 410, never a 500", async () => {
    const outcomes: string[] = [];
    for (let round = 0; round < 4; round++) {
      const p = await sentProposal();
      const [revise, accepted] = await Promise.all([
        send(team.asSales, "patch", `/api/proposals/${p.proposalId}`, { version: p.version, coverNote: `New note ${round}` }),
        accept(p.token, p.optionId),
      ]);
      outcomes.push(`${revise.status}/${accepted.status}`);
      expect([revise.status, accepted.status], `${JSON.stringify(revise.body.error)} ${JSON.stringify(accepted.body.error)}`).not.toContain(500);
      const [row] = await t.db.select().from(proposals).where(eq(proposals.id, p.proposalId));
      if (accepted.status === 200) {
        expect(revise.status, JSON.stringify(revise.body)).toBe(409);
        expect(revise.body.error.code).toMatch(/accepted-locked|stale-version/);
        expect(row).toMatchObject({ status: "accepted", supersededBy: null });
      } else {
        expect(revise.status, JSON.stringify(revise.body)).toBe(200);
        expect([409, 410]).toContain(accepted.status);
        expect(row!.status).not.toBe("accepted");
        expect(row!.supersededBy).toBe(revise.body.proposal.id);
      }
    }
    expect(outcomes).toHaveLength(4);
  }, 120_000);

  it("when the revise reads the proposal before the acceptance commits, then it answers 409, never a 500", async () => {
    // The losing revise, made deterministic: the version it names is the one before the acceptance.
    const p = await sentProposal();
    const [before] = await t.db.select().from(proposals).where(eq(proposals.id, p.proposalId));
    expect((await accept(p.token, p.optionId)).status).toBe(200);
    const repo = (await import("../../server/modules/proposals/proposals.repository.ts")).createProposalsRepository(t.db);
    expect(await repo.reviseFrom({ companyId: team.company.id }, before!, { coverNote: "too late" })).toBeNull();
    const revisions = await t.db.select().from(proposals).where(eq(proposals.seriesId, before!.seriesId));
    expect(revisions).toHaveLength(1);
  });
});
