import { createHash, randomBytes } from "node:crypto";
import { createServer, request as httpRequest, type ClientRequest, type IncomingMessage, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { MAX_CONCURRENT_PUBLIC_UPLOADS, MAX_VERIFY_PDF_BYTES } from "../../server/modules/proposals/uploads.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * Issue 13, item 4: anyone may upload a PDF to check it against the sent proposals, so that upload
 * is capped to what a real proposal PDF can be, answered 413 before its body is read when it says
 * it is larger, hashed as it streams in (never held whole), and only a few run at once.
 */

let t: TestApp;
let server: Server;
let port: number;
let addressCounter = 0;

beforeAll(async () => {
  t = await startTestApp();
  server = createServer(t.app);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  port = (server.address() as AddressInfo).port;
});
afterAll(async () => {
  server?.closeAllConnections();
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  await t?.close();
});

const BOUNDARY = "----eavesight-test-boundary";
const head = Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="proposal.pdf"\r\nContent-Type: application/pdf\r\n\r\n`);
const tail = Buffer.from(`\r\n--${BOUNDARY}--\r\n`);

/** A multipart upload by hand, so a test controls the declared length and when each byte is sent. */
function openUpload(opts: { contentLength?: number } = {}): { req: ClientRequest; response: Promise<{ status: number; headers: IncomingMessage["headers"]; body: { error?: { code: string; message: string } ; sha256?: string; matches?: boolean } }> } {
  const headers: Record<string, string | number> = {
    "content-type": `multipart/form-data; boundary=${BOUNDARY}`, origin: ORIGIN,
    // A fresh address each, so the public rate limits of one test do not touch another.
    "x-forwarded-for": `10.77.${(addressCounter >> 8) & 255}.${addressCounter++ & 255}`,
  };
  if (opts.contentLength !== undefined) headers["content-length"] = opts.contentLength;
  const req = httpRequest({ host: "127.0.0.1", port, method: "POST", path: "/api/public/verify", headers });
  const response = new Promise<{ status: number; headers: IncomingMessage["headers"]; body: never }>((resolve, reject) => {
    req.on("response", (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ status: res.statusCode!, headers: res.headers, body: JSON.parse(Buffer.concat(chunks).toString() || "{}") as never }));
    });
    // The server may close the socket after a 413 while the client still writes: only the answer matters.
    req.on("error", (err) => (req.destroyed ? undefined : reject(err)));
  });
  return { req, response };
}

describe("POST /api/public/verify", () => {
  it("when the declared Content-Length is over the cap, then 413 arrives before any of the body is sent", async () => {
    // A megabyte over: more than any multipart framing could add to a file within the cap.
    const { req, response } = openUpload({ contentLength: MAX_VERIFY_PDF_BYTES + 1024 * 1024 });
    req.flushHeaders(); // headers only: no byte of the body is ever written
    const res = await response;
    expect(res.status).toBe(413);
    expect(res.body.error?.code).toBe("file-too-large");
    expect(res.body.error?.message).toMatch(/proposal PDF/);
    req.destroy();
  });

  it("when a chunked upload (no length declared) runs past the cap, then it answers 413", async () => {
    const { req, response } = openUpload();
    req.write(head);
    const chunk = Buffer.alloc(1024 * 1024, 0x41);
    for (let sent = 0; sent <= MAX_VERIFY_PDF_BYTES; sent += chunk.length) {
      if (req.destroyed || !req.write(chunk)) await new Promise((r) => (req.destroyed ? r(null) : req.once("drain", r)));
      if (req.destroyed) break;
    }
    if (!req.destroyed) req.end(tail);
    const res = await response;
    expect(res.status).toBe(413);
    expect(res.body.error?.code).toBe("file-too-large");
  });

  it("when a file just under the cap is sent, then its SHA-256 (computed as it streamed) is answered", async () => {
    const bytes = randomBytes(MAX_VERIFY_PDF_BYTES - 10);
    const { req, response } = openUpload({ contentLength: head.length + bytes.length + tail.length });
    req.end(Buffer.concat([head, bytes, tail]));
    const res = await response;
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ sha256: createHash("sha256").update(bytes).digest("hex"), matches: false });
  });

  it(`when more than ${MAX_CONCURRENT_PUBLIC_UPLOADS} uploads are in flight, then the extra one answers 503 with Retry-After at once, and the slot is free again afterwards`, async () => {
    const bytes = randomBytes(64 * 1024);
    const length = head.length + bytes.length + tail.length;
    const held = Array.from({ length: MAX_CONCURRENT_PUBLIC_UPLOADS }, () => openUpload({ contentLength: length }));
    for (const h of held) h.req.write(Buffer.concat([head, bytes.subarray(0, 1024)])); // started, not finished
    // Let the server take each one in before the extra arrives.
    await new Promise((r) => setTimeout(r, 500));
    const extra = openUpload({ contentLength: length });
    extra.req.end(Buffer.concat([head, bytes, tail]));
    const refused = await extra.response;
    expect(refused.status).toBe(503);
    expect(refused.headers["retry-after"]).toMatch(/^\d+$/);
    expect(refused.body.error?.code).toBe("busy");

    for (const h of held) h.req.end(Buffer.concat([bytes.subarray(1024), tail]));
    const answers = await Promise.all(held.map((h) => h.response));
    expect(answers.map((a) => a.status)).toEqual(held.map(() => 200));
    const again = openUpload({ contentLength: length });
    again.req.end(Buffer.concat([head, bytes, tail]));
    expect((await again.response).status).toBe(200);
  });

  it("when a client starts an upload and disconnects, then its slot is released", async () => {
    const length = head.length + 1000 + tail.length;
    for (let i = 0; i < MAX_CONCURRENT_PUBLIC_UPLOADS + 2; i++) {
      const { req, response } = openUpload({ contentLength: length });
      response.catch(() => {});
      req.write(head);
      await new Promise((r) => setTimeout(r, 50));
      req.destroy();
    }
    await new Promise((r) => setTimeout(r, 300));
    const bytes = randomBytes(1000);
    const ok = openUpload({ contentLength: length });
    ok.req.end(Buffer.concat([head, bytes, tail]));
    expect((await ok.response).status).toBe(200);
  });
});
