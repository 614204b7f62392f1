import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let other: Team;
let projectId: string;
let proposalId: string;
let token: string;
let includedId: string;
let leftOutId: string;
let foreignId: string;
let logo: Buffer;

const image = (color: string, width = 900, height = 600) => sharp({ create: { width, height, channels: 3, background: color } }).png().toBuffer();

async function upload(agent: Agent, pid: string, caption: string) {
  const res = await agent.post(`/api/projects/${pid}/photos`).set("origin", ORIGIN).field("caption", caption)
    .attach("file", await image("#5a7d3c"), { filename: "attic.png", contentType: "image/png" });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.photo.id as string;
}

/** supertest buffers image bodies only when told to. */
const getBytes = (url: string) =>
  t.request().get(url).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on("data", (c: Buffer) => chunks.push(c));
    res.on("end", () => done(null, Buffer.concat(chunks)));
  }) as unknown as Promise<{ status: number; headers: Record<string, string>; body: Buffer }>;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Fernbrook Roofing (test)");
  other = await makeTeam(t, "Other Eaves Co (test)");
  const customer = await createCustomer(team.asOwner, { name: "Idris Calloway", email: `idris-${Date.now()}@homeowner.example` });
  projectId = (await createProject(team.asOwner, customer.id)).id;
  await createSpace(team.asOwner, projectId, mainAttic);
  const option = await send(team.asOwner, "post", `/api/projects/${projectId}/options`, { name: "Keep it as it is", spaces: [] });
  expect(option.status, JSON.stringify(option.body)).toBe(201);

  includedId = await upload(team.asOwner, projectId, "Soffit vents painted shut");
  leftOutId = await upload(team.asOwner, projectId, "Not for the homeowner");
  const otherCustomer = await createCustomer(other.asOwner, { name: "Wren Halloway" });
  const otherProject = (await createProject(other.asOwner, otherCustomer.id)).id;
  foreignId = await upload(other.asOwner, otherProject, "Another company's attic");

  logo = await image("#1f4e6b", 240, 80);
  expect((await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", logo, "logo.png")).status).toBe(200);
  expect((await send(team.asOwner, "put", "/api/auth/me/signature", { typed: "Test owner" })).status).toBe(200);

  const created = await send(team.asOwner, "post", `/api/projects/${projectId}/proposals`, { optionIds: [option.body.option.id] });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  proposalId = created.body.proposal.id;
  const patched = await send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: created.body.proposal.version, photoIds: [includedId] });
  expect(patched.status, JSON.stringify(patched.body)).toBe(200);
  const sent = await send(team.asOwner, "post", `/api/proposals/${proposalId}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  token = (sent.body.link as string).split("/p/")[1]!;
});
afterAll(async () => t?.close());

describe("the homeowner's images", () => {
  it("when the homeowner's page is read, then it lists the included photo with its caption and says there is a logo", async () => {
    const res = await t.request().get(`/api/public/proposals/${token}`).expect(200);
    expect(res.body.company.hasLogo).toBe(true);
    expect(res.body.photos).toEqual([{ id: includedId, caption: "Soffit vents painted shut", findingCode: null }]);
  });

  it("when an included photo is asked for, then it is served privately, full size or as a WebP thumbnail", async () => {
    const full = await getBytes(`/api/public/proposals/${token}/photos/${includedId}`);
    expect(full.status).toBe(200);
    expect(full.headers["content-type"]).toMatch(/^image\//);
    expect(full.headers["cache-control"]).toMatch(/^private/);
    expect((await sharp(full.body).metadata()).width).toBeGreaterThan(480);
    const thumb = await getBytes(`/api/public/proposals/${token}/photos/${includedId}?thumb=1`);
    expect(thumb.status).toBe(200);
    expect(thumb.headers["content-type"]).toBe("image/webp");
    expect(thumb.headers["cache-control"]).toMatch(/^private/);
    expect((await sharp(thumb.body).metadata()).width).toBeLessThanOrEqual(480);
  });

  it("when the logo is asked for, then the bytes frozen with the proposal are served", async () => {
    const res = await getBytes(`/api/public/proposals/${token}/logo`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("image/png");
    expect(res.body.equals(logo)).toBe(true);
  });

  it("when a photo of the same company that the proposal does not include is asked for, then it answers 404 with no bytes", async () => {
    const res = await t.request().get(`/api/public/proposals/${token}/photos/${leftOutId}`);
    expect(res.status).toBe(404);
    expect(res.headers["content-type"]).toMatch(/json/);
    expect((await t.request().get(`/api/public/proposals/${token}/photos/${leftOutId}?thumb=1`)).status).toBe(404);
  });

  it("when another company's photo id is asked for through this link, then it answers 404", async () => {
    expect((await t.request().get(`/api/public/proposals/${token}/photos/${foreignId}`)).status).toBe(404);
    expect((await t.request().get(`/api/public/proposals/${token}/photos/${foreignId}?thumb=1`)).status).toBe(404);
  });

  it("when the token is wrong, then the photo and the logo answer 404", async () => {
    const wrong = `${token.slice(0, -4)}${token.endsWith("AAAA") ? "BBBB" : "AAAA"}`;
    expect((await t.request().get(`/api/public/proposals/${wrong}/photos/${includedId}`)).status).toBe(404);
    expect((await t.request().get(`/api/public/proposals/${wrong}/logo`)).status).toBe(404);
    expect((await t.request().get(`/api/public/proposals/not-a-token/photos/${includedId}`)).status).toBe(404);
  });

  it("when the photo id or the thumb flag is malformed, then it answers a clear 4xx, never a 5xx", async () => {
    expect((await t.request().get(`/api/public/proposals/${token}/photos/not-a-uuid`)).status).toBe(404);
    const badThumb = await t.request().get(`/api/public/proposals/${token}/photos/${includedId}?thumb=maybe`);
    expect(badThumb.status).toBe(400);
    expect(badThumb.body.error.fields).toHaveProperty("thumb");
  });

  it("when the proposal is revised, then the old link's images answer 410 with no data", async () => {
    const detail = (await team.asOwner.get(`/api/proposals/${proposalId}`).expect(200)).body.proposal;
    const revised = await send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: detail.version, coverNote: "Updated after the second visit." });
    expect(revised.status, JSON.stringify(revised.body)).toBe(200);
    const photo = await t.request().get(`/api/public/proposals/${token}/photos/${includedId}`);
    expect(photo.status).toBe(410);
    expect(photo.headers["content-type"]).toMatch(/json/);
    expect((await t.request().get(`/api/public/proposals/${token}/logo`)).status).toBe(410);
  });
});
