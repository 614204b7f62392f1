import { mkdtemp, mkdir, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { clientRoutes, HASHED_ASSET_CACHE, PAGE_CACHE } from "./delivery.ts";

let dir: string;
let app: express.Express;
beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), "eavesight-delivery-"));
  await mkdir(path.join(dir, "assets"));
  await writeFile(path.join(dir, "index.html"), "<!doctype html><title>x</title>");
  await writeFile(path.join(dir, "sw.js"), "self.addEventListener('fetch', () => {});");
  await writeFile(path.join(dir, "manifest.webmanifest"), "{}");
  await writeFile(path.join(dir, "favicon.svg"), "<svg/>");
  await writeFile(path.join(dir, "assets", "index-abc123.js"), "export {};");
  app = express();
  app.use(clientRoutes(dir));
});
afterAll(async () => rm(dir, { recursive: true, force: true }));

describe("client files' caching (field mode, issue 18)", () => {
  it.each(["/sw.js", "/manifest.webmanifest", "/some/page"])(
    "when %s is asked for, then the browser revalidates it every time, so a new release is seen at once",
    async (url) => {
      const res = await request(app).get(url).expect(200);
      expect(res.headers["cache-control"]).toBe(PAGE_CACHE);
    },
  );

  it("when a hashed asset is asked for, then it is cached for a year", async () => {
    const res = await request(app).get("/assets/index-abc123.js").expect(200);
    expect(res.headers["cache-control"]).toBe(HASHED_ASSET_CACHE);
  });

  it("when another public file is asked for, then it keeps the hour", async () => {
    const res = await request(app).get("/favicon.svg").expect(200);
    expect(res.headers["cache-control"]).toBe("public, max-age=3600");
  });
});
