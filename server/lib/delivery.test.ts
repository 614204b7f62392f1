import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { brotliCompressSync, gzipSync } from "node:zlib";
import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { clientRoutes, compressAnswers } from "./delivery.ts";

/** Reads a response body as bytes (superagent has already undone the Content-Encoding). */
const rawBody = ((res: NodeJS.ReadableStream, callback: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on("data", (chunk: Buffer) => chunks.push(chunk));
  res.on("end", () => callback(null, Buffer.concat(chunks)));
}) as unknown as Parameters<request.Test["parse"]>[0];

const SCRIPT = `export const message = ${JSON.stringify("attic ".repeat(400))};\n`;
const PAGE = `<!doctype html><html><head><script type="module" src="/assets/index-Ab12Cd34.js"></script></head><body>${"<p>Eavesight</p>".repeat(100)}</body></html>`;

let dir: string;
let app: express.Express;
beforeAll(() => {
  // A built client as vite-plugin-compression2 leaves it: each asset beside its .br and .gz.
  dir = mkdtempSync(path.join(tmpdir(), "eavesight-client-"));
  mkdirSync(path.join(dir, "assets"));
  const asset = path.join(dir, "assets", "index-Ab12Cd34.js");
  writeFileSync(asset, SCRIPT);
  writeFileSync(`${asset}.br`, brotliCompressSync(SCRIPT));
  writeFileSync(`${asset}.gz`, gzipSync(SCRIPT));
  writeFileSync(path.join(dir, "index.html"), PAGE);
  writeFileSync(path.join(dir, "index.html.br"), brotliCompressSync(PAGE));
  writeFileSync(path.join(dir, "favicon.svg"), "<svg/>");
  app = express();
  app.use(compressAnswers());
  app.get("/api/big", (_req, res) => {
    res.json({ rows: Array.from({ length: 200 }, (_, i) => ({ id: i, name: `Project ${i}` })) });
  });
  app.get("/api/small", (_req, res) => {
    res.json({ ok: true });
  });
  app.use(clientRoutes(dir));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("static client files", () => {
  it("when the browser accepts brotli, then a hashed asset is the pre-compressed .br file, cached for a year", async () => {
    const res = await request(app).get("/assets/index-Ab12Cd34.js").set("accept-encoding", "gzip, deflate, br").buffer(true).parse(rawBody).expect(200);
    expect(res.headers["content-encoding"]).toBe("br");
    expect(res.headers["content-type"]).toMatch(/javascript/);
    expect(res.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    // On the wire: the size of the .br file; decoded: the script.
    expect(Number(res.headers["content-length"])).toBe(brotliCompressSync(SCRIPT).length);
    expect((res.body as Buffer).toString()).toBe(SCRIPT);
  });

  it("when the browser accepts only gzip, then the .gz file is sent", async () => {
    const res = await request(app).get("/assets/index-Ab12Cd34.js").set("accept-encoding", "gzip").buffer(true).parse(rawBody).expect(200);
    expect(res.headers["content-encoding"]).toBe("gzip");
    expect(Number(res.headers["content-length"])).toBe(gzipSync(SCRIPT).length);
    expect((res.body as Buffer).toString()).toBe(SCRIPT);
  });

  it("when the browser accepts no compression, then the plain file is sent", async () => {
    const res = await request(app).get("/assets/index-Ab12Cd34.js").set("accept-encoding", "identity").buffer(true).parse(rawBody).expect(200);
    expect(res.headers["content-encoding"]).toBeUndefined();
    expect((res.body as Buffer).toString()).toBe(SCRIPT);
  });

  it("when a page of the app is opened, then index.html is sent compressed and revalidated on every visit", async () => {
    for (const url of ["/", "/projects/123", "/index.html"]) {
      const res = await request(app).get(url).set("accept-encoding", "br").buffer(true).parse(rawBody).expect(200);
      expect(res.headers["cache-control"], url).toBe("no-cache");
      expect(res.headers["content-encoding"], url).toBe("br");
      expect((res.body as Buffer).toString(), url).toBe(PAGE);
    }
  });

  it("when an unhashed public file is asked for, then it is cached for an hour only", async () => {
    const res = await request(app).get("/favicon.svg").expect(200);
    expect(res.headers["cache-control"]).toBe("public, max-age=3600");
  });
});

describe("JSON answers", () => {
  it("when an answer is over 1 kB, then it is compressed with what the client accepts", async () => {
    const brotli = await request(app).get("/api/big").set("accept-encoding", "br").buffer(true).parse(rawBody).expect(200);
    expect(brotli.headers["content-encoding"]).toBe("br");
    expect(JSON.parse((brotli.body as Buffer).toString()).rows).toHaveLength(200);
    const gzip = await request(app).get("/api/big").set("accept-encoding", "gzip").buffer(true).parse(rawBody).expect(200);
    expect(gzip.headers["content-encoding"]).toBe("gzip");
    expect(JSON.parse((gzip.body as Buffer).toString()).rows).toHaveLength(200);
  });

  it("when an answer is under 1 kB, then it is sent as it is", async () => {
    const res = await request(app).get("/api/small").set("accept-encoding", "br, gzip").expect(200);
    expect(res.headers["content-encoding"]).toBeUndefined();
    expect(res.body).toEqual({ ok: true });
  });
});
