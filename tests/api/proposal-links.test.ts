import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { outboxMessages } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { draftReadyToSend } from "../setup/proposal-fixture.ts";
import { makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 14, item 6: sales resends a proposal (the same link, a new e-mail through the outbox,
 * logged), revokes a link, or issues a new one (the old one stops at once, the new one is mailed).
 * The homeowner on an old link is told what happened in plain words and sees nothing of the
 * proposal. Signed stays signed: after acceptance a link can be withdrawn or replaced, and the new
 * link shows what was signed; nothing about the acceptance changes.
 */

let t: TestApp;
let team: Team;
let bluestem: Team;

const pub = (method: "get" | "post", url: string) => (method === "get" ? t.request().get(url) : t.request().post(url).set("origin", ORIGIN));
const tokenOf = (link: string) => link.split("/p/")[1]!;
const mailsTo = (to: string) => t.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, to));
const detailOf = async (id: string) => (await team.asSales.get(`/api/proposals/${id}`).expect(200)).body;
const eventsOf = async (id: string) => (await detailOf(id)).events as { event: string; tokenId: string | null; userId: string | null; detail: Record<string, unknown> }[];
async function waitForMails(to: string, count: number) {
  const deadline = Date.now() + 15_000;
  for (;;) {
    const rows = await mailsTo(to);
    if (rows.length >= count) return rows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
    if (Date.now() > deadline) throw new Error(`expected ${count} e-mails to ${to}, got ${rows.length}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}
async function sentProposal() {
  const d = await draftReadyToSend(t, team);
  const sent = await send(team.asSales, "post", `/api/proposals/${d.proposalId}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  await waitForMails(d.homeownerEmail, 1);
  return { ...d, link: sent.body.link as string, token: tokenOf(sent.body.link) };
}
const acceptBody = (optionId: string) => ({ optionId, signerName: "Rowan Tessaly", signature: { typed: "Rowan Tessaly" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (links)");
  bluestem = await makeTeam(t, "Bluestem Roofing (links)");
  await send(team.asOwner, "patch", "/api/company", { name: "Tallgrass Exteriors" }).expect(200);
}, 60_000);
afterAll(async () => t?.close());

describe("resend", () => {
  it("when sales resends, then a new e-mail with the same link goes through the outbox, the event is logged, and the link still works", async () => {
    const p = await sentProposal();
    const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const mails = await waitForMails(p.homeownerEmail, 2);
    expect(mails[1]!.text).toContain(p.link);
    expect(mails[1]!.subject).toMatch(/again/i);
    const resent = (await eventsOf(p.proposalId)).filter((e) => e.event === "resent");
    expect(resent).toHaveLength(1);
    expect(resent[0]).toMatchObject({ userId: team.sales.id, tokenId: (await detailOf(p.proposalId)).proposal.link.tokenId, detail: { to: p.homeownerEmail } });
    await pub("get", `/api/public/proposals/${p.token}`).expect(200);
  });

  it("when sales resends to a corrected address, then the customer's address changes and the e-mail goes there, with the same link", async () => {
    const p = await sentProposal();
    const corrected = `corrected-${Date.now()}@homeowner.example`;
    const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`, { recipientEmail: corrected });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const [mail] = await waitForMails(corrected, 1);
    expect(mail!.text).toContain(p.link);
    expect((await eventsOf(p.proposalId)).map((e) => e.event)).toEqual(expect.arrayContaining(["recipient-changed", "resent"]));
  });

  it("when resend is clicked several times at once, then one e-mail goes out; a minute later another may", async () => {
    const p = await sentProposal();
    const answers = await Promise.all([0, 1, 2, 3].map(() => send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`)));
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200]);
    expect(answers.filter((a) => a.body.isQueued)).toHaveLength(1);
    await waitForMails(p.homeownerEmail, 2);
    await new Promise((r) => setTimeout(r, 1_500));
    expect(await t.mailCount(p.homeownerEmail)).toBe(2);
    expect((await eventsOf(p.proposalId)).filter((e) => e.event === "resent")).toHaveLength(1);
    t.clock.offsetMs = 2 * 60_000;
    try {
      const later = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`);
      expect(later.body.isQueued).toBe(true);
      await waitForMails(p.homeownerEmail, 3);
    } finally {
      t.clock.offsetMs = 0;
    }
  });

  it("when the link was revoked, the proposal answered, or it is a draft, then resend answers 409 saying what to do", async () => {
    const p = await sentProposal();
    await send(team.asSales, "post", `/api/proposals/${p.proposalId}/revoke-link`).expect(200);
    const revoked = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`);
    expect(revoked.status).toBe(409);
    expect(revoked.body.error.message).toMatch(/new link/);
    const q = await sentProposal();
    const view = await pub("get", `/api/public/proposals/${q.token}`).expect(200);
    await pub("post", `/api/public/proposals/${q.token}/accept`).send(acceptBody(view.body.options[0].id)).expect(200);
    const accepted = await send(team.asSales, "post", `/api/proposals/${q.proposalId}/resend`);
    expect(accepted.status).toBe(409);
    expect(accepted.body.error.message).toMatch(/new link/);
    const d = await draftReadyToSend(t, team);
    expect((await send(team.asSales, "post", `/api/proposals/${d.proposalId}/resend`)).status).toBe(409);
  });
});

describe("revoke and issue a new link", () => {
  it("when sales revokes a link, then the homeowner's link answers 410 'link-revoked' in plain words with nothing of the proposal, on every public route", async () => {
    const p = await sentProposal();
    await send(team.asSales, "post", `/api/proposals/${p.proposalId}/revoke-link`).expect(200);
    const view = await pub("get", `/api/public/proposals/${p.token}`);
    expect(view.status).toBe(410);
    expect(view.body).toEqual({ error: { code: "link-revoked", message: expect.stringMatching(/withdrawn/), fields: {} } });
    for (const url of [`/api/public/proposals/${p.token}/pdf`, `/api/public/proposals/${p.token}/logo`]) {
      expect((await pub("get", url)).status, url).toBe(410);
    }
    expect((await pub("post", `/api/public/proposals/${p.token}/decline`).send({})).status).toBe(410);
  });

  it("when sales issues a new link, then the old one says it was replaced, the new one works and is mailed, and the event is logged", async () => {
    const p = await sentProposal();
    const before = (await detailOf(p.proposalId)).proposal.link.tokenId;
    // A forged host must not reach the mailed link (it is built from APP_ORIGIN only).
    const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/reissue-link`).set("host", "attacker.example").set("x-forwarded-host", "attacker.example");
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const link = res.body.link as string;
    expect(link).toMatch(new RegExp(`^${ORIGIN}/p/[A-Za-z0-9_-]{40,}$`));
    expect(link).not.toBe(p.link);
    const old = await pub("get", `/api/public/proposals/${p.token}`);
    expect(old.status).toBe(410);
    expect(old.body).toEqual({ error: { code: "link-replaced", message: expect.stringMatching(/new link/), fields: {} } });
    await pub("get", `/api/public/proposals/${tokenOf(link)}`).expect(200);
    const mails = await waitForMails(p.homeownerEmail, 2);
    expect(mails[1]!.text).toContain(link);
    expect(mails[1]!.text).not.toContain(p.token);
    expect(mails[1]!.text).not.toContain("attacker.example");
    const reissued = (await eventsOf(p.proposalId)).find((e) => e.event === "link-reissued")!;
    expect(reissued).toMatchObject({ userId: team.sales.id, tokenId: res.body.proposal.link.tokenId, detail: { previousTokenId: before, to: p.homeownerEmail } });
    expect(res.body.proposal.link).toMatchObject({ isActive: true, revokedAt: null });
    // A resend now carries the new link.
    await send(team.asSales, "post", `/api/proposals/${p.proposalId}/resend`).expect(200);
    const third = (await waitForMails(p.homeownerEmail, 3))[2]!;
    expect(third.text).toContain(link);
  });

  it("when a revoked link is replaced, then the old one still says it was withdrawn and the new one works", async () => {
    const p = await sentProposal();
    await send(team.asSales, "post", `/api/proposals/${p.proposalId}/revoke-link`).expect(200);
    const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/reissue-link`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect((await pub("get", `/api/public/proposals/${p.token}`)).body.error.code).toBe("link-revoked");
    await pub("get", `/api/public/proposals/${tokenOf(res.body.link)}`).expect(200);
  });

  it("when a new link is issued after the homeowner signed, then it shows what was signed and nothing about the acceptance changes", async () => {
    const p = await sentProposal();
    const view = await pub("get", `/api/public/proposals/${p.token}`).expect(200);
    await pub("post", `/api/public/proposals/${p.token}/accept`).send(acceptBody(view.body.options[0].id)).expect(200);
    const signed = (await detailOf(p.proposalId)).proposal;
    await send(team.asSales, "post", `/api/proposals/${p.proposalId}/revoke-link`).expect(200);
    expect((await pub("get", `/api/public/proposals/${p.token}`)).status).toBe(410);
    const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/reissue-link`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const fresh = await pub("get", `/api/public/proposals/${tokenOf(res.body.link)}`).expect(200);
    expect(fresh.body.proposal).toMatchObject({ status: "accepted", acceptedOptionId: view.body.options[0].id, snapshotSha256: signed.snapshotSha256 });
    // Signing again through the new link is refused: it was signed once.
    expect((await pub("post", `/api/public/proposals/${tokenOf(res.body.link)}/accept`).send(acceptBody(view.body.options[0].id))).status).toBe(409);
    const after = (await detailOf(p.proposalId)).proposal;
    expect({ status: after.status, acceptance: after.acceptance, snapshotSha256: after.snapshotSha256, decidedAt: after.decidedAt })
      .toEqual({ status: signed.status, acceptance: signed.acceptance, snapshotSha256: signed.snapshotSha256, decidedAt: signed.decidedAt });
    const mail = await t.waitForMail(p.homeownerEmail, { subjectIncludes: "A new link to your signed proposal" });
    expect(mail.text).toContain(res.body.link);
    expect(mail.text).toMatch(/What you signed is unchanged/);
  });

  it("when the proposal was replaced by a newer revision, declined or expired, then no new link is issued (409 saying what to do)", async () => {
    const p = await sentProposal();
    const version = (await detailOf(p.proposalId)).proposal.version;
    await send(team.asSales, "patch", `/api/proposals/${p.proposalId}`, { version, coverNote: "New prices" }).expect(200);
    const superseded = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/reissue-link`);
    expect(superseded.status).toBe(409);
    expect(superseded.body.error.message).toMatch(/newer revision/);
    const q = await sentProposal();
    await pub("post", `/api/public/proposals/${q.token}/decline`).send({}).expect(200);
    const declined = await send(team.asSales, "post", `/api/proposals/${q.proposalId}/reissue-link`);
    expect(declined.status).toBe(409);
    expect(declined.body.error.message).toMatch(/declined/);
  });

  it("when a reminder was queued with the old link, then it does not mail the replaced link", async () => {
    await send(team.asOwner, "patch", "/api/company", { reminderDays: 1 }).expect(200);
    try {
      const p = await sentProposal();
      const res = await send(team.asSales, "post", `/api/proposals/${p.proposalId}/reissue-link`).expect(200);
      t.clock.offsetMs = 2 * 86_400_000;
      const due = await t.sql`update pgboss.job set start_after = now() where name = 'proposal-reminder' and data->>'proposalId' = ${p.proposalId} and state = 'created' returning id`;
      expect(due).toHaveLength(1);
      await new Promise((r) => setTimeout(r, 3_000));
      const mails = await mailsTo(p.homeownerEmail);
      expect(mails.filter((m) => m.text?.includes(p.token))).toHaveLength(1); // the first e-mail only
      expect(mails.filter((m) => m.subject.startsWith("A reminder"))).toHaveLength(0);
      void res;
    } finally {
      t.clock.offsetMs = 0;
      await send(team.asOwner, "patch", "/api/company", { reminderDays: null }).expect(200);
    }
  });
});

describe("who may", () => {
  it("when an estimator resends, revokes or reissues, then 403; when another company's owner does, then 404 and nothing is sent", async () => {
    const p = await sentProposal();
    for (const action of ["resend", "revoke-link", "reissue-link"]) {
      expect((await send(team.asEstimator, "post", `/api/proposals/${p.proposalId}/${action}`)).status, action).toBe(403);
      expect((await send(bluestem.asOwner, "post", `/api/proposals/${p.proposalId}/${action}`)).status, action).toBe(404);
    }
    await pub("get", `/api/public/proposals/${p.token}`).expect(200);
    expect(await t.mailCount(p.homeownerEmail)).toBe(1);
    expect((await eventsOf(p.proposalId)).map((e) => e.event)).not.toEqual(expect.arrayContaining(["resent"]));
  });
});
