import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import S3rver from "s3rver";
import sharp from "sharp";
import { createS3Storage, readAll, type Storage } from "../../server/lib/storage/index.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam } from "../setup/survey-fixtures.ts";

const BUCKET = "eavesight-test";
let fake: S3rver;
let dataDir: string;
let endpoint: string;
let storage: Storage;

beforeAll(async () => {
  // The s3rver fake on loopback, on a port the OS picks, with its files in a temp folder.
  dataDir = mkdtempSync(path.join(tmpdir(), "eavesight-s3rver-"));
  fake = new S3rver({ address: "127.0.0.1", port: 0, silent: true, directory: dataDir, configureBuckets: [{ name: BUCKET }] });
  const { port } = await fake.run();
  endpoint = `http://127.0.0.1:${port}`;
  storage = createS3Storage({ bucket: BUCKET, region: "us-east-1", endpoint, accessKeyId: "S3RVER", secretAccessKey: "S3RVER" });
});
afterAll(async () => {
  await fake?.close();
  rmSync(dataDir, { recursive: true, force: true });
});

describe("S3 storage driver", () => {
  it("when bytes are put, then get returns the same bytes, and after delete get returns null", async () => {
    const bytes = Buffer.from(Array.from({ length: 5000 }, (_, i) => i % 251));
    await storage.put("photos/c1/abc.png", bytes, "image/png");
    const object = await storage.get("photos/c1/abc.png");
    expect(object).not.toBeNull();
    expect(object!.sizeBytes).toBe(5000);
    expect((await readAll(object!)).equals(bytes)).toBe(true);
    await storage.delete("photos/c1/abc.png");
    expect(await storage.get("photos/c1/abc.png")).toBeNull();
  });

  it("when a key was never stored, then get returns null and delete does not fail", async () => {
    expect(await storage.get("photos/c1/never.png")).toBeNull();
    await expect(storage.delete("photos/c1/never.png")).resolves.toBeUndefined();
  });

  it("when a key is path-like, then the driver refuses it before any request", async () => {
    await expect(storage.put("../escape.png", Buffer.from("x"), "image/png")).rejects.toThrow(/invalid storage key/);
  });
});

describe("photo upload with STORAGE_DRIVER=s3", () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ envOverrides: { STORAGE_DRIVER: "s3", S3_ENDPOINT: endpoint, S3_BUCKET: BUCKET, S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "S3RVER" } });
  });
  afterAll(async () => t?.close());

  it("when a photo is uploaded, then its bytes and thumbnail live in the bucket and are served from there", async () => {
    const team = await makeTeam(t);
    const project = await createProject(team.asOwner, (await createCustomer(team.asOwner)).id);
    const png = await sharp({ create: { width: 600, height: 300, channels: 3, background: "#246" } }).png().toBuffer();
    const res = await team.asEstimator.post(`/api/projects/${project.id}/photos`).set("origin", ORIGIN).attach("file", png, "roof.png");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const id = res.body.photo.id as string;
    const inBucket = await storage.get(`photos/${team.company.id}/${id}.png`);
    expect(inBucket).not.toBeNull();
    expect(await sharp(await readAll(inBucket!)).metadata()).toMatchObject({ width: 600, height: 300 });
    const thumb = await team.asSales.get(`/api/photos/${id}?thumb=1`).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => done(null, Buffer.concat(chunks)));
    });
    expect(thumb.status).toBe(200);
    expect(thumb.headers["content-type"]).toBe("image/webp");
    expect(await sharp(thumb.body as Buffer).metadata()).toMatchObject({ width: 480, height: 240 });
  });
});
