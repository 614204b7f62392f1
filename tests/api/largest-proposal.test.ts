import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { LIMITS } from "../../shared/ventilation/index.ts";
import { OPTION_NOTES_MAX_CHARS, PROPOSAL_LIMITS } from "../../shared/proposals/limits.ts";
import { MAX_VERIFY_PDF_BYTES } from "../../server/modules/proposals/uploads.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 13, item 6: the largest proposal the contracts allow, built through the API and rendered by
 * the real job: every limit at its maximum (spaces, sections, vent rows, options, added items, labour
 * lines, photos, text), with photos, logo and signature made of noise so they compress as badly as a
 * real image can. It must render (it once failed with "unsupported number: Infinity" at ~1,000
 * vents), and its size sets the cap of the public PDF check (item 4): the test prints it and
 * checks the cap leaves at least a quarter of room above it.
 */

let t: TestApp;
let team: Team;
const work = mkdtempSync(path.join(tmpdir(), "eavesight-largest-"));

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Largest Proposal Roofing");
});
afterAll(async () => {
  await t?.close();
  rmSync(work, { recursive: true, force: true });
});

const noise = (width: number, height: number, channels: 3 | 4) => sharp(Buffer.from(Array.from({ length: width * height * channels }, () => Math.floor(Math.random() * 256))), { raw: { width, height, channels } });

const VENT_SHAPES = [
  (i: number) => ({ kind: "soffit-continuous", location: "lower", lengthFt: 20 + (i % 7), nfaSqInPerFt: 9 }),
  (i: number) => ({ kind: "soffit-individual", location: "lower", quantity: 1 + (i % 12), nfaSqInPerUnit: 25 }),
  (i: number) => ({ kind: "ridge", location: "upper", lengthFt: 8 + (i % 9), nfaSqInPerFt: 18 }),
  (i: number) => ({ kind: "box", location: "upper", quantity: 1 + (i % 3), nfaSqInPerUnit: 50, dropBelowRidgeFt: 1 + (i % 4) }),
  (i: number) => ({ kind: "gable-louver", location: "upper", grossWidthIn: 12 + (i % 6), grossHeightIn: 18, covering: { mesh: "1/8", louvers: true } }),
  (_i: number) => ({ kind: "turbine", location: "upper", quantity: 1, nfaSqInPerUnit: 112, dropBelowRidgeFt: 2 }),
];
const longText = (n: number, seed: string) => `${seed} `.repeat(Math.ceil(n / (seed.length + 1))).slice(0, n).trim();

describe("the largest legal proposal", () => {
  it("when every limit is at its maximum, then the proposal renders, and its PDF fits the public check's cap with room to spare", async () => {
    const asOwner = team.asOwner;
    const started = Date.now();
    const phase = (what: string) => console.log(`largest proposal: ${what} at ${((Date.now() - started) / 1000).toFixed(0)} s`);
    // Company: a logo and terms at their limits.
    const logo = await noise(1200, 600, 3).jpeg({ quality: 92 }).toBuffer();
    expect((await asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", logo, "logo.jpg")).status).toBe(200);
    expect((await send(asOwner, "patch", "/api/company", { defaultTerms: longText(PROPOSAL_LIMITS.maxTermsChars, "Warranty and payment terms as agreed."), isCoolingOffNoticeEnabled: true })).status).toBe(200);
    // The seller's drawn signature: a PNG of noise just under 1 MB.
    const signature = await noise(500, 500, 4).png({ compressionLevel: 9 }).toBuffer();
    expect(signature.length).toBeLessThan(1024 * 1024);
    const signed = await send(team.asSales, "put", "/api/auth/me/signature", { drawnPngDataUrl: `data:image/png;base64,${signature.toString("base64")}` });
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);

    phase("company set up");
    const customer = await createCustomer(asOwner, { email: "largest@homeowner.example" });
    const project = await createProject(asOwner, customer.id, { title: longText(200, "Largest") });
    const catalog: string[] = [];
    for (let i = 0; i < 10; i++) {
      const item = await send(asOwner, "post", "/api/catalog", { sku: `MAX-${i}`, name: longText(200, `Vent item ${i}`), kind: i % 2 ? "soffit-individual" : "box", unit: "each", nfaSqInPerUnit: 20 + i, materialCostCents: 500, sellPriceCents: 1_500 });
      expect(item.status, JSON.stringify(item.body)).toBe(201);
      catalog.push(item.body.item.id);
    }

    const spaceIds: string[] = [];
    for (let s = 0; s < LIMITS.maxSpacesPerProject; s++) {
      const body = {
        name: longText(120, `Attic space ${s + 1}`),
        roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 60, eaveLengthFt: 120 },
        sections: Array.from({ length: LIMITS.maxSections }, (_, i) => ({ kind: "rect", lengthFt: 10 + (i % 20), widthFt: 8 + (i % 5) })),
        vents: Array.from({ length: LIMITS.maxVents }, (_, i) => ({ id: `v${i}`, label: longText(200, `Vent ${i} over the north eave`), ...VENT_SHAPES[i % VENT_SHAPES.length]!(i) })),
        site: { atmosphericCombustionAppliance: true, soffitsBlocked: true },
        notes: longText(5_000, "Notes from the attic."),
      };
      const res = await send(asOwner, "post", `/api/projects/${project.id}/spaces`, body);
      expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
      spaceIds.push(res.body.space.id);
    }
    // One past each limit is refused with a clear 400.
    const extraSpace = await send(asOwner, "post", `/api/projects/${project.id}/spaces`, { name: "One too many" });
    expect(extraSpace.status).toBe(400);
    expect(extraSpace.body.error.message).toMatch(new RegExp(`at most ${LIMITS.maxSpacesPerProject} attic spaces`));

    phase("spaces saved");
    const optionIds: string[] = [];
    for (let o = 0; o < PROPOSAL_LIMITS.maxOptions; o++) {
      const res = await send(asOwner, "post", `/api/projects/${project.id}/options`, {
        name: longText(120, `Option ${o + 1}`),
        notes: longText(OPTION_NOTES_MAX_CHARS, "Option notes."),
        spaces: spaceIds.map((spaceId) => ({
          spaceId, ventActions: Object.fromEntries(Array.from({ length: LIMITS.maxVents }, (_, i) => [`v${i}`, i % 3 === 0 ? "remove" : "keep"])),
          added: Array.from({ length: 40 }, (_, i) => ({ id: `a${i}`, catalogItemId: catalog[i % catalog.length]!, quantity: 1 + (i % 9), note: longText(500, "Install note.") })),
        })),
        laborLines: Array.from({ length: 30 }, (_, i) => ({ id: `l${i}`, description: longText(300, `Labour ${i}`), hours: 2, rateCents: 9_500 })),
      });
      expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
      optionIds.push(res.body.option.id);
    }

    phase("options saved");
    const photoIds: string[] = [];
    const photo = await noise(1600, 1200, 3).jpeg({ quality: 95 }).toBuffer();
    for (let p = 0; p < PROPOSAL_LIMITS.maxPhotos; p++) {
      const res = await asOwner.post(`/api/projects/${project.id}/photos`).set("origin", ORIGIN).field("caption", longText(500, `Photo ${p}`)).attach("file", photo, `p${p}.jpg`);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      photoIds.push(res.body.photo.id);
    }

    phase("photos uploaded");
    const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds });
    expect(draft.status, JSON.stringify(draft.body).slice(0, 500)).toBe(201);
    const proposalId: string = draft.body.proposal.id;
    const patched = await send(team.asSales, "patch", `/api/proposals/${proposalId}`, {
      version: draft.body.proposal.version, coverNote: longText(PROPOSAL_LIMITS.maxCoverNoteChars, "Cover note."), photoIds,
      scopes: Object.fromEntries(optionIds.map((id) => [id, Array.from({ length: PROPOSAL_LIMITS.maxScopeLines }, (_, i) => longText(PROPOSAL_LIMITS.maxScopeLineChars, `Scope line ${i}`))])),
    });
    expect(patched.status, JSON.stringify(patched.body).slice(0, 500)).toBe(200);

    // One past each proposal limit is refused with a clear 400, and nothing of the draft changes.
    const version = patched.body.proposal.version;
    const pastLimits: [string, Record<string, unknown>, RegExp][] = [
      ["scope lines", { scopes: { [optionIds[0]!]: Array.from({ length: PROPOSAL_LIMITS.maxScopeLines + 1 }, (_, i) => `Line ${i}`) } }, /At most 25 scope lines/],
      ["a long scope line", { scopes: { [optionIds[0]!]: ["x".repeat(PROPOSAL_LIMITS.maxScopeLineChars + 1)] } }, /at most 300 characters/],
      ["the cover note", { coverNote: "x".repeat(PROPOSAL_LIMITS.maxCoverNoteChars + 1) }, /cover note must be at most 2,000 characters/],
      ["the terms", { terms: "x".repeat(PROPOSAL_LIMITS.maxTermsChars + 1) }, /terms must be at most 10,000 characters/],
    ];
    for (const [what, body, message] of pastLimits) {
      const res = await send(team.asSales, "patch", `/api/proposals/${proposalId}`, { version, ...body });
      expect(res.status, what).toBe(400);
      expect(JSON.stringify(res.body.error), what).toMatch(message);
    }
    const fiveOptions = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [...optionIds, optionIds[0]] });
    expect(fiveOptions.status).toBe(400);
    expect(fiveOptions.body.error.message).toMatch(/At most 4 options in one proposal/);

    phase("draft ready");
    const sent = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`);
    expect(sent.status, JSON.stringify(sent.body).slice(0, 500)).toBe(200);
    phase("sent");
    let render: { status: string; error: string | null } = { status: "queued", error: null };
    const deadline = Date.now() + 300_000;
    while (Date.now() < deadline && render.status !== "ready" && render.status !== "failed") {
      await new Promise((r) => setTimeout(r, 1_000));
      render = (await team.asSales.get(`/api/proposals/${proposalId}/render-status`)).body.render;
    }
    expect(render, "the largest proposal renders").toMatchObject({ status: "ready", error: null });

    phase("rendered");
    const pdf = await team.asSales.get(`/api/proposals/${proposalId}/pdf`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => done(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    const bytes = pdf.body as Buffer;
    const file = path.join(work, "largest.pdf");
    writeFileSync(file, bytes);
    const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [file], { encoding: "utf8" }))?.[1]);
    console.log(`largest legal proposal: ${(bytes.length / 1024 / 1024).toFixed(2)} MiB, ${pages} pages; public check cap ${MAX_VERIFY_PDF_BYTES / 1024 / 1024} MiB`);
    expect(pages).toBeGreaterThan(10);
    expect(bytes.length * 1.25).toBeLessThan(MAX_VERIFY_PDF_BYTES);
  }, 600_000);
});
