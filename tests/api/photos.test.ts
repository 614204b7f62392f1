import { existsSync, readdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { eq } from "drizzle-orm";
import { photos } from "../../server/db/schema/index.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let projectId: string;
let spaceId: string;
let png: Buffer;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  const customer = await createCustomer(team.asOwner, { name: "Ottoline Spade" });
  projectId = (await createProject(team.asOwner, customer.id)).id;
  spaceId = (await createSpace(team.asOwner, projectId, mainAttic)).id;
  png = await sharp({ create: { width: 1000, height: 500, channels: 3, background: "#3a7" } }).png().toBuffer();
});
afterAll(async () => t?.close());

const upload = (agent: Agent, file: Buffer | null, opts: { filename?: string; fields?: Record<string, string>; field?: string; pid?: string } = {}) => {
  let req = agent.post(`/api/projects/${opts.pid ?? projectId}/photos`).set("origin", ORIGIN);
  for (const [k, v] of Object.entries(opts.fields ?? {})) req = req.field(k, v);
  if (file) req = req.attach(opts.field ?? "file", file, { filename: opts.filename ?? "photo.png", contentType: "image/jpeg" });
  return req;
};
/** supertest buffers image bodies only when told to. */
const getBytes = (agent: Agent, url: string) =>
  agent.get(url).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on("data", (c: Buffer) => chunks.push(c));
    res.on("end", () => done(null, Buffer.concat(chunks)));
  });

describe("photo upload", () => {
  it("when a real PNG is uploaded with a caption and a vent, then it is stored, listed on the project and served with a 480 px WebP thumbnail", async () => {
    const res = await upload(team.asEstimator, png, { fields: { spaceId, ventId: "fan-1", findingCode: "powered-with-passive-exhaust", caption: "Gable fan beside the ridge" } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const photo = res.body.photo;
    expect(photo).toMatchObject({ projectId, spaceId, ventId: "fan-1", findingCode: "powered-with-passive-exhaust", caption: "Gable fan beside the ridge", contentType: "image/png", width: 1000, height: 500, uploadedBy: team.estimator.id, url: `/api/photos/${photo.id}`, thumbUrl: `/api/photos/${photo.id}?thumb=1` });
    expect(photo).not.toHaveProperty("storageKey");

    const full = await getBytes(team.asSales, photo.url);
    expect(full.status).toBe(200);
    expect(full.headers["content-type"]).toBe("image/png");
    expect(full.headers["cache-control"]).toBe("no-store");
    expect(await sharp(full.body as Buffer).metadata()).toMatchObject({ format: "png", width: 1000, height: 500 });

    const thumb = await getBytes(team.asSales, photo.thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers["content-type"]).toBe("image/webp");
    expect(thumb.headers["cache-control"]).toBe("no-store");
    expect(await sharp(thumb.body as Buffer).metadata()).toMatchObject({ format: "webp", width: 480, height: 240 });

    const detail = await team.asSales.get(`/api/projects/${projectId}`);
    expect(detail.body.photos.map((p: { id: string }) => p.id)).toContain(photo.id);
  });

  it("when a JPEG carries EXIF orientation and a GPS position, then the stored photo is turned upright and has no metadata at all", async () => {
    const sideways = await sharp({ create: { width: 40, height: 20, channels: 3, background: "#c33" } })
      .jpeg().withExif({ IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 0/1" } }).withMetadata({ orientation: 6 }).toBuffer();
    expect((await sharp(sideways).metadata()).exif).toBeDefined();
    const res = await upload(team.asEstimator, sideways, { filename: "IMG_0001.JPG" });
    expect(res.status).toBe(201);
    expect(res.body.photo).toMatchObject({ contentType: "image/jpeg", width: 20, height: 40 });
    const stored = await getBytes(team.asEstimator, res.body.photo.url);
    const meta = await sharp(stored.body as Buffer).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: 20, height: 40 });
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
  });

  it("when the file is larger than 15 MB, then it answers 413 saying so, and nothing is stored", async () => {
    const before = await t.db.select().from(photos).where(eq(photos.projectId, projectId));
    const big = Buffer.concat([png, Buffer.alloc(15 * 1024 * 1024)]);
    const res = await upload(team.asEstimator, big);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 15 MB/);
    expect(await t.db.select().from(photos).where(eq(photos.projectId, projectId))).toHaveLength(before.length);
  });

  it("when a .jpg name holds text, then it answers 415 with a message, because the bytes are checked, not the name", async () => {
    const res = await upload(team.asEstimator, Buffer.from("I am not a photo, just words in a file.\n".repeat(20)), { filename: "roof.jpg" });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/not a JPEG, PNG, WebP or HEIC photo/);
    expect(res.body.error.fields).toHaveProperty("file");
  });

  it("when a known image type that is not a photo format (a GIF) is sent, then it answers 415", async () => {
    const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: "#000" } }).gif().toBuffer();
    expect((await upload(team.asEstimator, gif, { filename: "a.png" })).status).toBe(415);
  });

  it("when a HEIC photo cannot be converted here, then it answers 415 telling the user to send JPEG", async () => {
    const heicHeader = Buffer.concat([Buffer.from([0, 0, 0, 24]), Buffer.from("ftypheic"), Buffer.alloc(4), Buffer.from("mif1heic"), Buffer.alloc(300)]);
    const res = await upload(team.asEstimator, heicHeader, { filename: "IMG_2044.HEIC" });
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe("heic-not-supported");
    expect(res.body.error.message).toMatch(/JPEG/);
  });

  it("when the bytes start like a PNG but are cut off, then it answers 400 with a message, not 500", async () => {
    const res = await upload(team.asEstimator, png.subarray(0, 64));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/could not be read/);
  });

  it("when the file name is path-like, then the photo is stored under a server-made name inside the storage folder only", async () => {
    const res = await upload(team.asEstimator, png, { filename: "../../escape.png" });
    expect(res.status).toBe(201);
    const [row] = await t.db.select().from(photos).where(eq(photos.id, res.body.photo.id));
    expect(row!.storageKey).toBe(`photos/${team.company.id}/${row!.id}.png`);
    expect(row!.thumbKey).toBe(`photos/${team.company.id}/${row!.id}-thumb.webp`);
    const dir = t.env.STORAGE_DIR;
    expect(readdirSync(path.join(dir, "photos", team.company.id))).toContain(`${row!.id}.png`);
    expect(existsSync(path.resolve(dir, "../../escape.png"))).toBe(false);
    expect(existsSync(path.resolve(dir, "../escape.png"))).toBe(false);
    expect(JSON.stringify(row)).not.toMatch(/escape/);
  });

  describe("fields", () => {
    const cases: [string, Record<string, string>, string, string?][] = [
      ["spaceId is not an id", { spaceId: "main" }, "spaceId"],
      ["spaceId is a space of another project", { spaceId: "other" }, "spaceId"],
      ["ventId is given without a space", { ventId: "fan-1" }, "spaceId"],
      ["ventId is not a vent of the space", { spaceId: "own", ventId: "nope" }, "ventId"],
      ["findingCode is not a code", { findingCode: "Blocked Soffits!" }, "findingCode"],
      ["the caption is too long", { caption: "c".repeat(501) }, "caption"],
      ["an unknown field is sent", { album: "x" }, "album"],
    ];
    for (const [what, fields, field] of cases) {
      it(`when ${what}, then it answers 400 naming ${field}`, async () => {
        let resolved = fields;
        if (fields.spaceId === "own") resolved = { ...fields, spaceId };
        if (fields.spaceId === "other") {
          const customer = await createCustomer(team.asOwner, { name: "Other Space Owner" });
          const other = await createProject(team.asOwner, customer.id);
          resolved = { ...fields, spaceId: (await createSpace(team.asOwner, other.id, mainAttic)).id };
        }
        const res = await upload(team.asEstimator, png, { fields: resolved });
        expect(res.status).toBe(400);
        expect(Object.keys(res.body.error.fields)).toContain(field);
      });
    }

    it("when the multipart body is malformed, then it answers 400 with a message, not 500", async () => {
      const res = await team.asEstimator.post(`/api/projects/${projectId}/photos`).set("origin", ORIGIN)
        .set("content-type", "multipart/form-data; boundary=xyz").send("--xyz\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.png\"\r\n\r\nabc");
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(/could not be read/);
      const noBoundary = await team.asEstimator.post(`/api/projects/${projectId}/photos`).set("origin", ORIGIN).set("content-type", "multipart/form-data").send("x");
      expect(noBoundary.status).toBe(400);
    });

    it("when no file is attached, or it is in another field, then it answers 400 naming file", async () => {
      const none = await upload(team.asEstimator, null, { fields: { caption: "hi" } });
      expect(none.status).toBe(400);
      expect(none.body.error.fields).toHaveProperty("file");
      const wrongField = await upload(team.asEstimator, png, { field: "image" });
      expect(wrongField.status).toBe(400);
      expect(wrongField.body.error.fields).toHaveProperty("file");
      const json = await send(team.asEstimator, "post", `/api/projects/${projectId}/photos`, { caption: "no file" });
      expect(json.status).toBe(400);
    });
  });
});

describe("photo access and edits", () => {
  let photoId: string;
  beforeAll(async () => {
    photoId = (await upload(team.asEstimator, png, { fields: { spaceId, caption: "Before" } })).body.photo.id;
  });

  it("when not signed in, then the photo answers 401; when sales asks, then it is served; sales may not upload", async () => {
    await t.request().get(`/api/photos/${photoId}`).expect(401);
    await team.asSales.get(`/api/photos/${photoId}?thumb=1`).expect(200);
    expect((await upload(team.asSales, png)).status).toBe(403);
    expect((await send(team.asSales, "patch", `/api/photos/${photoId}`, { caption: "x" })).status).toBe(403);
    expect((await send(team.asSales, "delete", `/api/photos/${photoId}`)).status).toBe(403);
  });

  it("when the caption is changed or cleared, then the photo answers with it; a bad caption answers 400", async () => {
    const res = await send(team.asEstimator, "patch", `/api/photos/${photoId}`, { caption: "  Soffit blocked at the north eave " });
    expect(res.body.photo.caption).toBe("Soffit blocked at the north eave");
    expect((await send(team.asEstimator, "patch", `/api/photos/${photoId}`, { caption: "" })).body.photo.caption).toBeNull();
    const bad = await send(team.asEstimator, "patch", `/api/photos/${photoId}`, { caption: 5 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("caption");
    const badQuery = await team.asEstimator.get(`/api/photos/${photoId}?thumb=maybe`);
    expect(badQuery.status).toBe(400);
    expect(badQuery.body.error.fields).toHaveProperty("thumb");
  });

  it("when its space is deleted, then the photo stays on the project with no space", async () => {
    const space = await createSpace(team.asEstimator, projectId, { name: "Short-lived" });
    const photo = (await upload(team.asEstimator, png, { fields: { spaceId: space.id } })).body.photo;
    await send(team.asEstimator, "delete", `/api/projects/${projectId}/spaces/${space.id}`).expect(204);
    const detail = await team.asSales.get(`/api/projects/${projectId}`);
    expect(detail.body.photos.find((p: { id: string }) => p.id === photo.id)).toMatchObject({ spaceId: null });
  });

  it("when a photo is deleted, then its files leave storage and it answers 404", async () => {
    const photo = (await upload(team.asEstimator, png)).body.photo;
    const [row] = await t.db.select().from(photos).where(eq(photos.id, photo.id));
    const file = path.join(t.env.STORAGE_DIR, ...row!.storageKey.split("/"));
    expect(existsSync(file)).toBe(true);
    await send(team.asEstimator, "delete", `/api/photos/${photo.id}`).expect(204);
    expect(existsSync(file)).toBe(false);
    expect(existsSync(path.join(t.env.STORAGE_DIR, ...row!.thumbKey.split("/")))).toBe(false);
    await team.asEstimator.get(photo.url).expect(404);
  });

  it("when another company's user asks for, edits or deletes the photo, then each answers 404 and the photo is untouched", async () => {
    const other = await makeTeam(t);
    expect((await other.asOwner.get(`/api/photos/${photoId}`)).status).toBe(404);
    expect((await other.asOwner.get(`/api/photos/${photoId}?thumb=1`)).status).toBe(404);
    expect((await send(other.asOwner, "patch", `/api/photos/${photoId}`, { caption: "mine now" })).status).toBe(404);
    expect((await send(other.asOwner, "delete", `/api/photos/${photoId}`)).status).toBe(404);
    expect((await upload(other.asOwner, png)).status).toBe(404);
    await team.asEstimator.get(`/api/photos/${photoId}`).expect(200);
  });
});
