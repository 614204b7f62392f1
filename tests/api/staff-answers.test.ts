import { createHash, randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import type { RouteInfo } from "../../server/lib/routes.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam, type Agent, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 13, item 9: staff answers are never kept by a browser or a proxy (shared tablets and office
 * machines: Decision 6), and a company logo is re-encoded like a photo, so what a homeowner's PDF
 * and page show is only pixels: no EXIF (GPS), no bytes smuggled after the image.
 */

let t: TestApp;
let team: Team;
let projectId: string;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Header Roofing");
  projectId = (await createProject(team.asOwner, (await createCustomer(team.asOwner)).id)).id;
});
afterAll(async () => t?.close());

const getBytes = (agent: Agent, url: string) =>
  agent.get(url).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on("data", (c: Buffer) => chunks.push(c));
    res.on("end", () => done(null, Buffer.concat(chunks)));
  });

describe("Cache-Control on staff answers", () => {
  it("when any staff GET route answers (data, a refusal or not found), then it says no-store", async () => {
    const staffGets = (t.app.locals.routes as RouteInfo[]).filter((r) => r.method === "get" && r.access !== "public");
    expect(staffGets.length).toBeGreaterThan(15);
    for (const route of staffGets) {
      const url = route.path.replace(/:(\w+)/g, (_m, p: string) => (p === "id" && route.path.startsWith("/api/projects/") ? projectId : randomUUID()));
      for (const agent of [team.asOwner, t.request()]) {
        const res = await agent.get(url).set("origin", ORIGIN);
        expect(res.status, `${url} → ${res.status}`).toBeLessThan(500);
        expect(res.headers["cache-control"], `${url} → ${res.status}`).toBe("no-store");
      }
    }
  });

  it("when a staff member opens a photo or the company logo, then the image is not kept either", async () => {
    const png = await sharp({ create: { width: 60, height: 30, channels: 3, background: "#3a7" } }).png().toBuffer();
    const photo = await team.asOwner.post(`/api/projects/${projectId}/photos`).set("origin", ORIGIN).attach("file", png, "p.png");
    expect(photo.status, JSON.stringify(photo.body)).toBe(201);
    expect((await getBytes(team.asOwner, photo.body.photo.url)).headers["cache-control"]).toBe("no-store");
    expect((await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", png, "logo.png")).status).toBe(200);
    const logo = await getBytes(team.asOwner, "/api/company/logo");
    expect(logo.status).toBe(200);
    expect(logo.headers["cache-control"]).toBe("no-store");
  });
});

describe("logo uploads are re-encoded", () => {
  it("when a JPEG logo carries EXIF with a GPS position and extra bytes after the image, then the stored logo has neither and its hash is of the stored bytes", async () => {
    const jpeg = await sharp({ create: { width: 300, height: 100, channels: 3, background: "#1f5c4a" } })
      .jpeg().withExif({ IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 0/1" } }).toBuffer();
    expect((await sharp(jpeg).metadata()).exif).toBeDefined();
    const smuggled = Buffer.concat([jpeg, Buffer.from("<script>alert('logo')</script>")]);
    const res = await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", smuggled, "logo.jpg");
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const stored = (await getBytes(team.asOwner, "/api/company/logo")).body as Buffer;
    const meta = await sharp(stored).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: 300, height: 100 });
    expect(meta.exif).toBeUndefined();
    expect(stored.includes(Buffer.from("<script>"))).toBe(false);
    expect(res.body.company.logo.sha256).toBe(createHash("sha256").update(stored).digest("hex"));
  });

  it("when a PNG logo is very large, then it is scaled down to what a letterhead needs, keeping its transparency", async () => {
    const big = await sharp({ create: { width: 4000, height: 1000, channels: 4, background: { r: 20, g: 60, b: 40, alpha: 0 } } }).png().toBuffer();
    const res = await team.asOwner.post("/api/company/logo").set("origin", ORIGIN).attach("file", big, "logo.png");
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const meta = await sharp((await getBytes(team.asOwner, "/api/company/logo")).body as Buffer).metadata();
    expect(meta).toMatchObject({ format: "png", width: 1200, height: 300, hasAlpha: true });
  });
});
