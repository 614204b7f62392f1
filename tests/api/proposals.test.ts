import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync, readdirSync, copyFileSync, mkdirSync } from "node:fs";
import { createHash } from "node:crypto";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";
import { eq } from "drizzle-orm";
import { outboxMessages, proposalEvents, proposals, projects } from "../../server/db/schema/index.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createProject, createSpace, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let projectId: string;
let optionIds: string[];
const homeowner = `rowan-${Date.now()}@homeowner.example`;
let signaturePng: Buffer;
const work = mkdtempSync(path.join(tmpdir(), "eavesight-pdf-"));

/** A 1,500 sq ft attic with a gable fan next to a ridge vent: 1/150 asks 1,440 sq in. */
const fanAndRidgeAttic = {
  name: "Main attic",
  roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 50, eaveLengthFt: 100 },
  sections: [{ kind: "rect", lengthFt: 50, widthFt: 30 }],
  vents: [
    { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 20, nfaSqInPerFt: 18 },
    { id: "fan-1", kind: "powered-gable", location: "upper", dropBelowRidgeFt: 2, cfm: 1200, mounting: "gable" },
    { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 50 },
  ],
  site: { atmosphericCombustionAppliance: true },
  notes: null,
};

async function catalogItem(agent: Agent, body: Record<string, unknown>) {
  const res = await send(agent, "post", "/api/catalog", { materialCostCents: 100, ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.item.id as string;
}

const pdfText = (bytes: Buffer, name: string) => {
  const file = path.join(work, `${name}.pdf`);
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
};

async function getPdf(req: ReturnType<Agent["get"]>) {
  const res = await req.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on("data", (c: Buffer) => chunks.push(c));
    r.on("end", () => cb(null, Buffer.concat(chunks)));
  });
  return res as typeof res & { body: Buffer };
}

async function waitFor<T>(what: string, read: () => Promise<T>, isDone: (v: T) => boolean, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (isDone(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not happen in time: ${JSON.stringify(value).slice(0, 400)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

const renderReady = (agent: Agent, id: string) =>
  waitFor("render", async () => (await agent.get(`/api/proposals/${id}/render-status`)).body.render, (r) => r.status === "ready" || r.status === "failed");

async function draft(agent: Agent, ids = optionIds) {
  const res = await send(agent, "post", `/api/projects/${projectId}/proposals`, { optionIds: ids });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.proposal as { id: string; version: number; scopes: Record<string, { lines: string[] }> };
}

async function sendAndGetToken(agent: Agent, id: string) {
  const res = await send(agent, "post", `/api/proposals/${id}/send`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return { link: res.body.link as string, token: (res.body.link as string).split("/p/")[1]!, proposal: res.body.proposal };
}

const acceptBody = (optionId: string, extra: Record<string, unknown> = {}) => ({
  optionId, signerName: "Rowan Tessaly", signature: { typed: "Rowan Tessaly" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION }, ...extra,
});
const pub = (method: "get" | "post", url: string) => (method === "get" ? t.request().get(url) : t.request().post(url).set("origin", ORIGIN));

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (test)");
  signaturePng = await sharp({ create: { width: 300, height: 90, channels: 4, background: { r: 255, g: 255, b: 255, alpha: 0 } } })
    .composite([{ input: Buffer.from('<svg width="300" height="90"><path d="M10 60 C 60 10, 90 90, 140 40 S 230 70, 290 30" stroke="#123" stroke-width="4" fill="none"/></svg>'), top: 0, left: 0 }])
    .png().toBuffer();
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Rowan Tessaly", email: homeowner, phone: "555-0142" });
  projectId = (await createProject(team.asEstimator, customer.body.customer.id, { title: "Fan and ridge attic", codeBasis: "strict-150", siteAddress: "12 Quarry Hill Road, Marrow Creek" })).id;
  const space = await createSpace(team.asEstimator, projectId, fanAndRidgeAttic);
  const ridge = await catalogItem(team.asOwner, { sku: "RV-4", name: "Shingle-over ridge vent, 4 ft", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, sellPriceCents: 750 });
  const soffit = await catalogItem(team.asOwner, { sku: "RSV-4", name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, sellPriceCents: 600 });
  const strip = await catalogItem(team.asOwner, { sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, sellPriceCents: 400 });
  const seal = await catalogItem(team.asOwner, { sku: "SEAL-G", name: "Seal a gable opening from inside", kind: "seal-gable-opening", unit: "each", sellPriceCents: 6_500 });
  const opt1 = await send(team.asEstimator, "post", `/api/projects/${projectId}/options`, {
    name: "Seal the fan, more soffit vents",
    spaces: [{ spaceId: space.id, ventActions: {}, siteFixes: { sealsGableFan: true }, added: [{ id: "a1", catalogItemId: soffit, quantity: 12 }] }],
  });
  const opt2 = await send(team.asEstimator, "post", `/api/projects/${projectId}/options`, {
    name: "Ridge and soffit, fan removed",
    spaces: [{ spaceId: space.id, ventActions: { "fan-1": "remove", "ridge-1": "remove" }, added: [
      { id: "a1", catalogItemId: ridge, quantity: 48 }, { id: "a2", catalogItemId: strip, quantity: 96 }, { id: "a3", catalogItemId: seal, quantity: 1 },
    ] }],
    laborLines: [{ id: "l1", description: "Haul away the old fan and vents", hours: 1, rateCents: 9_500 }],
    discount: { kind: "percent", basisPoints: 500 },
  });
  expect(opt1.status, JSON.stringify(opt1.body)).toBe(201);
  expect(opt2.status, JSON.stringify(opt2.body)).toBe(201);
  optionIds = [opt1.body.option.id, opt2.body.option.id];
  const profile = await send(team.asOwner, "patch", "/api/company", {
    name: "Tallgrass Exteriors", licenseNumber: "MC-RC-20417", addressLine: "400 Mill Street, Marrow Creek", phone: "555-0100", email: "office@tallgrass.example",
    taxRateBasisPoints: 825, depositRule: { kind: "percent", value: 10, capCents: 100_000 }, isCoolingOffNoticeEnabled: true, reminderDays: 3,
    defaultTerms: "Half the balance is due when work starts and the rest on completion. Workmanship is guaranteed for five years.",
  });
  expect(profile.status, JSON.stringify(profile.body)).toBe(200);
});
afterAll(async () => t?.close());

describe("company profile and the seller's signature", () => {
  it("when the owner reads and changes the profile, then the proposal settings round-trip and others may not", async () => {
    const res = await team.asOwner.get("/api/company").expect(200);
    expect(res.body.company).toMatchObject({ name: "Tallgrass Exteriors", licenseNumber: "MC-RC-20417", taxRateBasisPoints: 825, depositRule: { kind: "percent", value: 10, capCents: 100_000 }, isCoolingOffNoticeEnabled: true, reminderDays: 3, logo: null });
    expect((await team.asSales.get("/api/company")).status).toBe(403);
    const bad = await send(team.asOwner, "patch", "/api/company", { taxRateBasisPoints: 8.25, depositRule: { kind: "percent", value: 150, capCents: null } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("taxRateBasisPoints");
  });

  it("when a logo is uploaded, then only real PNG or JPEG bytes are taken", async () => {
    const logo = await sharp({ create: { width: 240, height: 80, channels: 3, background: "#1f5c4a" } }).png().toBuffer();
    const ok = await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", logo, "logo.png");
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    // Re-encoded (issue 13): the hash is of the stored pixels, not of the upload.
    expect(ok.body.company.logo).toMatchObject({ contentType: "image/png", sha256: expect.stringMatching(/^[0-9a-f]{64}$/) });
    const fake = await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", Buffer.from("<svg></svg>"), "logo.png");
    expect(fake.status).toBe(415);
  });

  it("when a seller saves a drawn signature, then a non-PNG or both kinds at once are refused with a clear 400", async () => {
    const notPng = await send(team.asSales, "put", "/api/auth/me/signature", { drawnPngDataUrl: `data:image/png;base64,${Buffer.from("GIF89a not a png").toString("base64")}` });
    expect(notPng.status).toBe(400);
    expect(notPng.body.error.message).toMatch(/not a PNG/);
    const both = await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test sales", drawnPngDataUrl: `data:image/png;base64,${signaturePng.toString("base64")}` });
    expect(both.status).toBe(400);
    const ok = await send(team.asSales, "put", "/api/auth/me/signature", { drawnPngDataUrl: `data:image/png;base64,${signaturePng.toString("base64")}` });
    expect(ok.status).toBe(200);
    expect((await team.asSales.get("/api/auth/me/signature")).body.signature.drawnPngDataUrl).toMatch(/^data:image\/png;base64,/);
  });
});

describe("proposals: draft, render, send, the homeowner's link, acceptance", () => {
  let proposalId: string;
  let token: string;
  let sentPdf: Buffer;

  it("when a draft is made from two options, then each gets a plain scope of work and the estimator may edit it", async () => {
    const p = await draft(team.asEstimator);
    proposalId = p.id;
    expect(p.scopes[optionIds[0]!]!.lines).toEqual([
      "Seal the gable fan to its opening so it draws air only from the attic.",
      "Add 12 round soffit vents (4 in) to the soffits, spaced evenly along the eaves.",
    ]);
    expect(p.scopes[optionIds[1]!]!.lines).toContain("Remove the gable-mounted fan.");
    expect(p.scopes[optionIds[1]!]!.lines).toContain("Seal the gable opening from inside the attic.");
    expect(p.scopes[optionIds[1]!]!.lines).toContain("Install 48 ft of shingle-over ridge vent along the ridge, opening the vent slot in the roof deck where there is none.");
    const patched = await send(team.asEstimator, "patch", `/api/proposals/${p.id}`, { version: p.version, coverNote: "Thank you for having us out to look at the attic." });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect(patched.body.proposal).toMatchObject({ status: "draft", version: 2, coverNote: "Thank you for having us out to look at the attic." });
    const stale = await send(team.asEstimator, "patch", `/api/proposals/${p.id}`, { version: 1, coverNote: "Lost" });
    expect(stale.status).toBe(409);
    const wrongOption = await send(team.asEstimator, "post", `/api/projects/${projectId}/proposals`, { optionIds: ["00000000-0000-4000-8000-000000000000"] });
    expect(wrongOption.status).toBe(400);
  });

  it("when the draft is rendered, then a job makes the PDF and it reads right as text", async () => {
    const queued = await send(team.asSales, "post", `/api/proposals/${proposalId}/render`);
    expect(queued.status, JSON.stringify(queued.body)).toBe(202);
    expect(["queued", "rendering", "ready"]).toContain(queued.body.proposal.render.status);
    const render = await renderReady(team.asSales, proposalId);
    expect(render, JSON.stringify(render)).toMatchObject({ status: "ready" });
    const pdf = await getPdf(team.asSales.get(`/api/proposals/${proposalId}/pdf`));
    expect(pdf.status).toBe(200);
    expect(pdf.headers["content-type"]).toBe("application/pdf");
    expect(createHash("sha256").update(pdf.body).digest("hex")).toBe(render.pdfSha256);
    const text = pdfText(pdf.body, "draft");
    expect(text).toContain("Rowan Tessaly");
    expect(text).toContain("Tallgrass Exteriors");
    expect(text).toContain("MC-RC-20417");
    expect(text).toContain("1,440 sq in");
    expect(text).toContain("1,500 sq ft");
    expect(text).toMatch(/Page 1 of \d+/);
    expect(text).toContain("Not yet signed (draft)");
  });

  it("when sending without a signature on the profile, then it is refused; with one, the e-mail with the link arrives once", async () => {
    const noSig = await send(team.asOwner, "post", `/api/proposals/${proposalId}/send`);
    expect(noSig.status).toBe(409);
    expect(noSig.body.error.code).toBe("signature-required");
    const sent = await sendAndGetToken(team.asSales, proposalId);
    token = sent.token;
    expect(sent.proposal).toMatchObject({ status: "sent", link: { isActive: true } });
    expect(sent.proposal.snapshotSha256).toMatch(/^[0-9a-f]{64}$/);
    expect(token.length).toBeGreaterThanOrEqual(22);
    const mail = await t.waitForMail(homeowner, { subjectIncludes: "proposal" });
    expect(mail.text).toContain(sent.link);
    expect(mail.text).toContain("Rowan");
    const again = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`);
    expect(again.status).toBe(409);
    const row = (await t.db.select().from(proposals).where(eq(proposals.id, proposalId)))[0]!;
    expect(row.tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(token);
    const render = await renderReady(team.asSales, proposalId);
    expect(render.status).toBe("ready");
    await new Promise((r) => setTimeout(r, 1_500));
    expect(await t.mailCount(homeowner)).toBe(1);
  });

  it("when the sent PDF is read, then it carries the analysis, the prices, the cautions and the cancellation notice", async () => {
    const pdf = await getPdf(team.asSales.get(`/api/proposals/${proposalId}/pdf`));
    sentPdf = pdf.body;
    const text = pdfText(sentPdf, "sent");
    const options = (await team.asSales.get(`/api/projects/${projectId}/options`)).body.options as { price: { totalCents: number } }[];
    const totals = options.map((o) => o.price.totalCents);
    const money = (c: number) => `$${Math.floor(c / 100).toLocaleString("en-US")}.${String(c % 100).padStart(2, "0")}`;
    for (const total of totals) expect(text).toContain(money(total));
    expect(text).toContain("1,440 sq in");
    expect(text).toMatch(/natural-draft gas water heater/);
    expect(text).toMatch(/fall\s+protection/);
    expect(text).toMatch(/licensed\s+electrician/);
    // The homeowner's copy carries no technician's instructions (those are on the survey and the crew's sheet).
    expect(text).not.toMatch(/bring\s+water|work\s+early\s+in\s+the\s+day/);
    expect(text).toContain("NOTICE OF CANCELLATION");
    expect(text).toContain("Signed electronically when sent");
    expect(text).toContain("Remove the gable-mounted fan.");
    expect(text).toContain("Seal the gable opening from inside the attic.");
    // Pages 1–2 as pictures for a person to look at.
    const shots = path.resolve(".var/screenshots");
    mkdirSync(shots, { recursive: true });
    execFileSync("pdftoppm", ["-png", "-r", "60", path.join(work, "sent.pdf"), path.join(work, "proposal")]);
    for (const f of readdirSync(work).filter((f) => f.startsWith("proposal") && f.endsWith(".png"))) copyFileSync(path.join(work, f), path.join(shots, f));
  });

  it("when the homeowner opens the link, then the frozen view is answered, 'viewed' is recorded once, and the PDF downloads", async () => {
    const first = await pub("get", `/api/public/proposals/${token}`);
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    expect(first.body.customer).toEqual({ firstName: "Rowan" });
    expect(first.body.proposal).toMatchObject({ status: "viewed", revision: 1, isPdfReady: true });
    expect(first.body.options).toHaveLength(2);
    expect(first.body.options[1].price.totalCents).toBeGreaterThan(0);
    expect(first.body.before[0].analysis.requirement.totalSqIn).toBe(1440);
    expect(first.body.before[0].picture.shapes.length).toBeGreaterThan(0);
    expect(first.body.options[1].after[0].picture).toBeTruthy();
    expect(first.body.esign.version).toBe(ESIGN_CONSENT_VERSION);
    expect(first.body.coolingOff.isEnabled).toBe(true);
    expect(JSON.stringify(first.body)).not.toMatch(/storageKey|tokenHash|@homeowner/);
    await pub("get", `/api/public/proposals/${token}`).expect(200);
    const events = await t.db.select().from(proposalEvents).where(eq(proposalEvents.proposalId, proposalId));
    expect(events.filter((e) => e.event === "viewed")).toHaveLength(1);
    const pdf = await getPdf(pub("get", `/api/public/proposals/${token}/pdf`));
    expect(pdf.status).toBe(200);
    expect(pdf.body.equals(sentPdf)).toBe(true);
  });

  it("when a copy of the PDF is verified, then the true one matches and a tampered one does not", async () => {
    const sha = createHash("sha256").update(sentPdf).digest("hex");
    expect((await pub("get", `/api/public/verify?sha256=${sha}`)).body).toMatchObject({ matches: true, document: { kind: "sent", revision: 1 } });
    const tampered = Buffer.from(sentPdf);
    const middle = Math.floor(tampered.length / 2);
    tampered[middle] = tampered[middle]! ^ 0x01;
    const upload = await t.request().post("/api/public/verify").set("origin", ORIGIN).attach("file", tampered, "proposal.pdf");
    expect(upload.status).toBe(200);
    expect(upload.body.matches).toBe(false);
    const good = await t.request().post("/api/public/verify").set("origin", ORIGIN).attach("file", sentPdf, "proposal.pdf");
    expect(good.body.matches).toBe(true);
    expect((await pub("get", "/api/public/verify?sha256=abc")).status).toBe(400);
  });

  it("when the homeowner sends bad input, then each gets a clear 400 and nothing is accepted", async () => {
    const url = `/api/public/proposals/${token}/accept`;
    const longName = await pub("post", url).send(acceptBody(optionIds[1]!, { signerName: "R".repeat(10_000) }));
    expect(longName.status).toBe(400);
    expect(longName.body.error.message).toMatch(/at most 120 characters/);
    const control = await pub("post", url).send(acceptBody(optionIds[1]!, { signerName: "Rowan\u0000Tessaly" }));
    expect(control.status).toBe(400);
    const wrongOption = await pub("post", url).send(acceptBody("00000000-0000-4000-8000-000000000000"));
    expect(wrongOption.status).toBe(400);
    expect(wrongOption.body.error.fields.optionId).toMatch(/options in this proposal/);
    const huge = await pub("post", url).send(acceptBody(optionIds[1]!, { signature: { drawnPngDataUrl: `data:image/png;base64,${"A".repeat(20 * 1024 * 1024)}` } }));
    expect(huge.status).toBe(400);
    expect(huge.body.error.message).toMatch(/too large/);
    const fakePng = await pub("post", url).send(acceptBody(optionIds[1]!, { signature: { drawnPngDataUrl: `data:image/png;base64,${Buffer.from("<script>alert(1)</script>").toString("base64")}` } }));
    expect(fakePng.status).toBe(400);
    expect(fakePng.body.error.message).toMatch(/not a PNG/);
    const noConsent = await pub("post", url).send(acceptBody(optionIds[1]!, { consent: { esign: false, consentTextVersion: ESIGN_CONSENT_VERSION } }));
    expect(noConsent.status).toBe(400);
    expect(noConsent.body.error.message).toMatch(/sign electronically/);
    const view = await pub("get", `/api/public/proposals/${token}`);
    expect(view.body.proposal.status).toBe("viewed");
  });

  it("when the homeowner accepts option 2 with a drawn signature, then the trail, the signed PDF, the e-mails and the project follow", async () => {
    const res = await pub("post", `/api/public/proposals/${token}/accept`).set("user-agent", "HomeownerPhone/1.0")
      .send(acceptBody(optionIds[1]!, { signature: { drawnPngDataUrl: `data:image/png;base64,${signaturePng.toString("base64")}` } }));
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.proposal).toMatchObject({ status: "accepted", acceptedOptionId: optionIds[1] });
    const again = await pub("post", `/api/public/proposals/${token}/accept`).send(acceptBody(optionIds[0]!));
    expect(again.status).toBe(409);

    const detail = await waitFor("signed PDF", async () => (await team.asSales.get(`/api/proposals/${proposalId}`)).body, (b) => b.proposal.signedRender.status === "ready" || b.proposal.signedRender.status === "failed");
    expect(detail.proposal.signedRender.status).toBe("ready");
    expect(detail.events.map((e: { event: string }) => e.event)).toEqual(expect.arrayContaining(["created", "sent", "pdf-created", "viewed", "accepted", "signed-pdf-created"]));
    const accepted = detail.events.find((e: { event: string }) => e.event === "accepted");
    expect(accepted).toMatchObject({
      userAgent: "HomeownerPhone/1.0", consentTextVersion: ESIGN_CONSENT_VERSION, tokenId: detail.proposal.link.tokenId,
      snapshotSha256: detail.proposal.snapshotSha256, pdfSha256: createHash("sha256").update(sentPdf).digest("hex"),
    });
    expect(accepted.ip).toBeTruthy();
    expect(new Date(accepted.at).toISOString()).toBe(accepted.at.endsWith("Z") ? accepted.at : new Date(accepted.at).toISOString());
    const [project] = await t.db.select({ status: projects.status }).from(projects).where(eq(projects.id, projectId));
    expect(project!.status).toBe("sold");

    const signed = await getPdf(team.asSales.get(`/api/proposals/${proposalId}/pdf?kind=signed`));
    expect(createHash("sha256").update(signed.body).digest("hex")).toBe(detail.proposal.signedRender.pdfSha256);
    const text = pdfText(signed.body, "signed");
    expect(text).toContain("Signing certificate");
    expect(text).toContain(detail.proposal.snapshotSha256);
    expect(text).toContain("Drawn on screen");
    expect(text).toContain("HomeownerPhone/1.0");
    expect((await pub("get", `/api/public/verify?sha256=${detail.proposal.signedRender.pdfSha256}`)).body).toMatchObject({ matches: true, document: { kind: "signed" } });
    mkdirSync(path.resolve(".var/screenshots"), { recursive: true });
    execFileSync("pdftoppm", ["-png", "-r", "60", "-f", "1", "-l", "1", path.join(work, "signed.pdf"), path.resolve(".var/screenshots/signed-first")]);
    const lastPage = text.match(/Page \d+ of (\d+)/)![1]!;
    execFileSync("pdftoppm", ["-png", "-r", "60", "-f", lastPage, "-l", lastPage, path.join(work, "signed.pdf"), path.resolve(".var/screenshots/signed-certificate")]);

    const copy = await t.waitForMail(homeowner, { subjectIncludes: "signed proposal" });
    expect(copy.text).toContain(detail.proposal.signedRender.pdfSha256);
    await t.waitForMail(team.sales.email, { subjectIncludes: "Accepted" });
    // A retried job must not mail again.
    await (t.app.locals.proposalJobs as { enqueueSignedRender: (t: { companyId: string }, id: string) => Promise<void> }).enqueueSignedRender({ companyId: team.company.id }, proposalId);
    await new Promise((r) => setTimeout(r, 2_500));
    expect(await t.mailCount(homeowner)).toBe(2);
    expect(await t.mailCount(team.sales.email)).toBe(1);
  });

  it("when option 2 is accepted, then its materials list says released with the revision and option 1's does not", async () => {
    const accepted = (await team.asSales.get(`/api/proposals/${proposalId}`).expect(200)).body.proposal;
    const released = (await team.asEstimator.get(`/api/options/${optionIds[1]}/materials`).expect(200)).body;
    expect(released.release).toMatchObject({ proposalId, revision: accepted.revision });
    expect(new Date(released.release.releasedAt).toISOString()).toBe(new Date(accepted.decidedAt).toISOString());
    expect(released.materials.items.length).toBeGreaterThan(0);
    const other = (await team.asEstimator.get(`/api/options/${optionIds[0]}/materials`).expect(200)).body;
    expect(other.release).toBeNull();
  });

  it("when someone edits an accepted proposal, then it answers 409 and the record of events cannot be changed", async () => {
    const current = (await team.asSales.get(`/api/proposals/${proposalId}`)).body.proposal;
    const res = await send(team.asSales, "patch", `/api/proposals/${proposalId}`, { version: current.version, coverNote: "Changed after signing" });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("accepted-locked");
    await expect(t.db.update(proposalEvents).set({ event: "forged" }).where(eq(proposalEvents.proposalId, proposalId))).rejects.toThrow();
    await expect(t.db.delete(proposalEvents).where(eq(proposalEvents.proposalId, proposalId))).rejects.toThrow();
  });
});

describe("revisions, typed signatures, refusals", () => {
  it("when a sent proposal is changed, then a new draft revision is made and the old link says it was replaced, with no data", async () => {
    const p = await draft(team.asSales, [optionIds[0]!]);
    const { token } = await sendAndGetToken(team.asSales, p.id);
    const sentRow = (await team.asSales.get(`/api/proposals/${p.id}`)).body.proposal;
    const res = await send(team.asSales, "patch", `/api/proposals/${p.id}`, { version: sentRow.version, coverNote: "Updated prices." });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.revisedFrom).toBe(p.id);
    expect(res.body.proposal).toMatchObject({ status: "draft", revision: 2, seriesId: p.id, coverNote: "Updated prices." });
    const old = await pub("get", `/api/public/proposals/${token}`);
    expect(old.status).toBe(410);
    expect(old.body.error).toMatchObject({ code: "superseded", supersededByRevision: true });
    expect(Object.keys(old.body)).toEqual(["error"]);
    expect((await pub("get", `/api/public/proposals/${token}/pdf`)).status).toBe(410);
    expect((await team.asSales.get(`/api/proposals/${p.id}`)).body.proposal.supersededBy).toBe(res.body.proposal.id);
    const list = (await team.asSales.get(`/api/projects/${projectId}/proposals`)).body.proposals as { id: string }[];
    expect(list.map((x) => x.id)).toEqual(expect.arrayContaining([p.id, res.body.proposal.id]));
  });

  it("when the homeowner signs by typing, with markup in the name, then it is kept as plain text", async () => {
    const p = await draft(team.asSales, [optionIds[0]!]);
    const { token } = await sendAndGetToken(team.asSales, p.id);
    const name = "<script>alert('x')</script> Rowan";
    const res = await pub("post", `/api/public/proposals/${token}/accept`).send(acceptBody(optionIds[0]!, { signerName: name, signature: { typed: name } }));
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const detail = await waitFor("signed PDF", async () => (await team.asSales.get(`/api/proposals/${p.id}`)).body, (b) => b.proposal.signedRender.status === "ready" || b.proposal.signedRender.status === "failed");
    expect(detail.proposal.acceptance).toMatchObject({ signerName: name, signature: { typed: name, isDrawn: false } });
    const signed = await getPdf(team.asSales.get(`/api/proposals/${p.id}/pdf?kind=signed`));
    expect(pdfText(signed.body, "typed")).toContain("<script>alert('x')</script> Rowan");
  });

  it("when a link is wrong, revoked or expired, then it answers 404, 410 and 410 with no data; the sweep marks it expired", async () => {
    expect((await pub("get", "/api/public/proposals/not-a-real-token-at-all-000000")).status).toBe(404);
    const p = await draft(team.asSales, [optionIds[0]!]);
    const { token } = await sendAndGetToken(team.asSales, p.id);
    await send(team.asSales, "post", `/api/proposals/${p.id}/revoke-link`).expect(200);
    const revoked = await pub("get", `/api/public/proposals/${token}`);
    // The holder had the link: they are told it was withdrawn (proposal-links.test.ts), and nothing more.
    expect(revoked.status).toBe(410);
    expect(revoked.body.error.code).toBe("link-revoked");
    expect(Object.keys(revoked.body)).toEqual(["error"]);

    const q = await draft(team.asSales, [optionIds[0]!]);
    const { token: token2 } = await sendAndGetToken(team.asSales, q.id);
    t.clock.offsetMs = 40 * 86_400_000;
    try {
      const expired = await pub("get", `/api/public/proposals/${token2}`);
      expect(expired.status).toBe(410);
      expect(expired.body.error.code).toBe("expired");
      expect((await pub("post", `/api/public/proposals/${token2}/accept`).send(acceptBody(optionIds[0]!))).status).toBe(410);
      const jobs = t.app.locals.proposalJobs as { sweep: (now: Date) => Promise<number> };
      expect(await jobs.sweep(new Date(Date.now() + 40 * 86_400_000))).toBeGreaterThanOrEqual(1);
    } finally {
      t.clock.offsetMs = 0;
    }
    const expiredRow = (await team.asSales.get(`/api/proposals/${q.id}`)).body;
    expect(expiredRow.proposal.status).toBe("expired");
    expect(expiredRow.events.map((e: { event: string }) => e.event)).toContain("expired");
  });

  it("when a sent proposal is still unopened after the company's reminder days, then the queued reminder mails the homeowner once", async () => {
    const p = await draft(team.asSales, [optionIds[0]!]);
    const { link } = await sendAndGetToken(team.asSales, p.id);
    const reminders = async () => (await t.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, homeowner))).filter((m) => m.subject.startsWith("A reminder") && Boolean(m.text?.includes(link)));
    // The reminder was queued for 3 days later (the profile's reminderDays); move the clock past
    // that and make the job due now, as pg-boss would once the days had passed.
    t.clock.offsetMs = 4 * 86_400_000;
    try {
      const due = await t.sql`update pgboss.job set start_after = now() where name = 'proposal-reminder' and data->>'proposalId' = ${p.id} and state = 'created' returning id`;
      expect(due).toHaveLength(1);
      await waitFor("the reminder e-mail", reminders, (rows) => rows.length > 0);
      const detail = (await team.asSales.get(`/api/proposals/${p.id}`)).body;
      expect(detail.events.map((e: { event: string }) => e.event)).toContain("reminded");
      // A second run of the same reminder (a retried job) sends nothing more.
      const jobs = t.app.locals.proposalJobs as { runReminder: (data: { companyId: string; proposalId: string; to: string; link: string }) => Promise<void> };
      await jobs.runReminder({ companyId: team.company.id, proposalId: p.id, to: homeowner, link });
      await new Promise((r) => setTimeout(r, 1_500));
      expect(await reminders()).toHaveLength(1);
    } finally {
      t.clock.offsetMs = 0;
    }
  });

  it("when someone declines, then the reason is recorded and the proposal can no longer be accepted", async () => {
    const p = await draft(team.asSales, [optionIds[0]!]);
    const { token } = await sendAndGetToken(team.asSales, p.id);
    const res = await pub("post", `/api/public/proposals/${token}/decline`).send({ reason: "We are selling the house." });
    expect(res.status).toBe(200);
    expect(res.body.proposal.status).toBe("declined");
    expect((await pub("post", `/api/public/proposals/${token}/accept`).send(acceptBody(optionIds[0]!))).status).toBe(409);
  });

  it("when link look-ups keep failing from one address, then they are rate-limited with 429", async () => {
    let last = 0;
    for (let i = 0; i < 30 && last !== 429; i++) {
      last = (await pub("get", `/api/public/proposals/guessing-${String(i).padStart(24, "0")}`)).status;
    }
    expect(last).toBe(429);
    const limited = await pub("get", "/api/public/proposals/guessing-again-000000000000000");
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe("rate-limited");
  });
});
