import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { draftReadyToSend } from "../setup/proposal-fixture.ts";
import { makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 14, item 5: a homeowner can check a PDF they hold. The check's address (built from
 * APP_ORIGIN, never from a request header) is printed in the footer of every page and on the
 * signing certificate; the check says which document it is (revision or change order, sent or
 * signed copy), whose it is and when it was signed, and says nothing at all when it does not match.
 */

let t: TestApp;
let team: Team;
let other: Team;
const work = mkdtempSync(path.join(tmpdir(), "eavesight-verify-"));
const VERIFY_URL = `${ORIGIN}/verify`;
const ATTACKER = "attacker.example";

const sha = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");
const pdfPages = (bytes: Buffer, name: string): string[] => {
  const file = path.join(work, `${name}.pdf`);
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" }).split("\f").filter((p) => p.trim());
};
async function getPdf(req: ReturnType<Agent["get"]>): Promise<Buffer> {
  const res = await req.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on("data", (c: Buffer) => chunks.push(c));
    r.on("end", () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  return res.body as Buffer;
}
async function waitFor<T>(what: string, read: () => Promise<T>, isDone: (v: T) => boolean, timeoutMs = 60_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (isDone(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not happen in time: ${JSON.stringify(value).slice(0, 300)}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
const detailOf = async (id: string) => (await team.asSales.get(`/api/proposals/${id}`).expect(200)).body;
const verify = (hash: string) => t.request().get(`/api/public/verify?sha256=${hash}`).expect(200).then((r) => r.body);
const upload = (bytes: Buffer) => t.request().post("/api/public/verify").set("origin", ORIGIN).attach("file", bytes, "copy.pdf");
/** Headers a forged request could carry; none of them may reach a printed address. */
const forged = (req: ReturnType<Agent["post"]>) => req.set("host", ATTACKER).set("x-forwarded-host", ATTACKER).set("x-forwarded-proto", "https").set("referer", `https://${ATTACKER}/`);

let proposalId: string;
let token: string;
let sentPdf: Buffer;
let signedPdf: Buffer;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (verify)");
  other = await makeTeam(t, "Bluestem Roofing (verify)");
  await send(team.asOwner, "patch", "/api/company", { name: "Tallgrass Exteriors" }).expect(200);
  ({ proposalId } = await draftReadyToSend(t, team));
  const sent = await forged(send(team.asSales, "post", `/api/proposals/${proposalId}/send`));
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  token = (sent.body.link as string).split("/p/")[1]!;
  await waitFor("the sent PDF", () => detailOf(proposalId), (d) => d.proposal.render.status === "ready");
  sentPdf = await getPdf(team.asSales.get(`/api/proposals/${proposalId}/pdf?kind=original`));
}, 120_000);
afterAll(async () => t?.close());

describe("the check's address in the PDFs", () => {
  it("when a proposal is sent (with forged host headers), then every page's footer prints the check's address from APP_ORIGIN", () => {
    const pages = pdfPages(sentPdf, "sent");
    expect(pages.length).toBeGreaterThan(0);
    for (const [i, page] of pages.entries()) expect(page, `page ${i + 1}`).toContain(VERIFY_URL);
    expect(pages.join("\n")).not.toContain(ATTACKER);
  });

  it("when the homeowner signs, then the signing certificate says where to check a copy, with the same address", async () => {
    const view = (await t.request().get(`/api/public/proposals/${token}`).expect(200)).body;
    const accepted = await forged(t.request().post(`/api/public/proposals/${token}/accept`).set("origin", ORIGIN)).send({
      optionId: view.options[0].id, signerName: "Rowan Tessaly", signature: { typed: "Rowan Tessaly" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION },
    });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    await waitFor("the signed PDF", () => detailOf(proposalId), (d) => d.proposal.signedRender.status === "ready");
    signedPdf = await getPdf(team.asSales.get(`/api/proposals/${proposalId}/pdf?kind=signed`));
    const pages = pdfPages(signedPdf, "signed");
    const certificate = pages.find((p) => p.includes("Signing certificate"))!;
    expect(certificate).toMatch(new RegExp(`Check a copy[^\\n]*\\n?[^\\n]*${VERIFY_URL.replace(/[./]/g, "\\$&")}`));
    for (const page of pages) expect(page).toContain(VERIFY_URL);
    expect(pages.join("\n")).not.toContain(ATTACKER);
  }, 120_000);
});

describe("GET and POST /api/public/verify", () => {
  it("when the signed copy is checked, then it is named as the signed original, with its revision, company and signing time", async () => {
    const d = await detailOf(proposalId);
    const answer = await verify(sha(signedPdf));
    expect(answer).toEqual({
      sha256: sha(signedPdf), matches: true,
      document: {
        kind: "signed", companyName: "Tallgrass Exteriors", revision: 1, changeOrderNumber: null, status: "accepted",
        sentAt: d.proposal.sentAt, signedAt: d.proposal.acceptance.acceptedAt, decidedAt: d.proposal.decidedAt, isSuperseded: false,
      },
    });
    expect((await upload(signedPdf)).body).toEqual(answer);
  });

  it("when the copy as sent is checked after signing, then it matches as the unsigned copy and says when the proposal was signed", async () => {
    const d = await detailOf(proposalId);
    expect(await verify(sha(sentPdf))).toMatchObject({ matches: true, document: { kind: "sent", revision: 1, status: "accepted", signedAt: d.proposal.acceptance.acceptedAt } });
  });

  it("when a revision is replaced by a newer one, then its copy says so and has no signing time", async () => {
    const { proposalId: id } = await draftReadyToSend(t, team);
    await send(team.asSales, "post", `/api/proposals/${id}/send`).expect(200);
    await waitFor("the sent PDF", () => detailOf(id), (d) => d.proposal.render.status === "ready");
    const pdf = await getPdf(team.asSales.get(`/api/proposals/${id}/pdf?kind=original`));
    const version = (await detailOf(id)).proposal.version;
    await send(team.asSales, "patch", `/api/proposals/${id}`, { version, coverNote: "New prices" }).expect(200);
    expect(await verify(sha(pdf))).toMatchObject({ matches: true, document: { kind: "sent", revision: 1, isSuperseded: true, signedAt: null } });
  }, 120_000);

  it("when a change order's PDF is checked, then it names the change order and its revision, signed or not", async () => {
    const draft = await send(team.asSales, "post", `/api/proposals/${proposalId}/change-orders`, {
      reason: "Rotted decking found under the ridge", lines: [{ id: "l1", action: "add", description: "Replace rotted decking", quantity: 16, unit: "sq ft", unitPriceCents: 450 }],
    });
    expect(draft.status, JSON.stringify(draft.body)).toBe(201);
    const sent = await send(team.asSales, "post", `/api/change-orders/${draft.body.changeOrder.id}/send`);
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    const pdf = await getPdf(team.asSales.get(`/api/change-orders/${draft.body.changeOrder.id}/pdf`));
    const before = await verify(sha(pdf));
    expect(before).toMatchObject({ matches: true, document: { kind: "change-order", changeOrderNumber: 1, revision: 1, status: "sent", companyName: "Tallgrass Exteriors", signedAt: null } });
    const coToken = (sent.body.link as string).split("/c/")[1]!;
    const signed = await t.request().post(`/api/public/change-orders/${coToken}/sign`).set("origin", ORIGIN)
      .send({ signerName: "Rowan Tessaly", signature: { typed: "Rowan Tessaly" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);
    const after = await verify(sha(pdf));
    expect(after.document).toMatchObject({ status: "signed", signedAt: signed.body.changeOrder.decidedAt });
  });

  it("when a file matches nothing, then the answer is only its fingerprint and 'no match', the same for any company's caller", async () => {
    const tampered = Buffer.from(signedPdf);
    const middle = tampered.length >> 1;
    tampered[middle] = tampered[middle]! ^ 0x01;
    const anonymous = await upload(tampered);
    expect(anonymous.status).toBe(200);
    expect(anonymous.body).toEqual({ sha256: sha(tampered), matches: false });
    // Signed in to another company changes nothing: the check never reads who asks.
    const fromOther = await other.asOwner.get(`/api/public/verify?sha256=${sha(tampered)}`).expect(200);
    expect(fromOther.body).toEqual(anonymous.body);
  });
});
