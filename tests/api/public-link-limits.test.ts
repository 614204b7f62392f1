import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * The homeowner link's guessing limit (20 failed look-ups per address in 15 minutes) is counted
 * in PostgreSQL, so it holds across every server process. Two apps built here stand for two
 * processes: each has its own memory, and they share only the database (and one limit namespace,
 * as processes of one deployment do).
 */
let a: TestApp;
let b: TestApp;
beforeAll(async () => {
  const namespace = `limits-${randomUUID()}`;
  a = await startTestApp({ rateLimitNamespace: namespace });
  b = await startTestApp({ rateLimitNamespace: namespace });
});
afterAll(async () => {
  await a?.close();
  await b?.close();
});

let addressCounter = 1;
const nextAddress = () => `10.88.${(addressCounter >> 8) & 255}.${addressCounter++ & 255}`;
const guess = (t: TestApp, address: string, i: number) =>
  request(t.app).get(`/api/public/proposals/guess-${String(i).padStart(26, "0")}`).set("x-forwarded-for", address);

describe("link guessing limit across processes", () => {
  it("when failed look-ups from one address alternate between two processes, then the 21st is refused by either", async () => {
    const address = nextAddress();
    for (let i = 0; i < 20; i++) expect((await guess(i % 2 ? b : a, address, i)).status).toBe(404);
    const fromA = await guess(a, address, 20);
    const fromB = await guess(b, address, 21);
    expect(fromA.status).toBe(429);
    expect(fromB.status).toBe(429);
    expect(fromB.body.error.code).toBe("rate-limited");
  });

  it("when 200 guesses arrive at once through both processes, then at most 20 are looked up", async () => {
    const address = nextAddress();
    const results = await Promise.all(Array.from({ length: 200 }, (_, i) => guess(i % 2 ? b : a, address, i)));
    const lookedUp = results.filter((r) => r.status === 404).length;
    expect(lookedUp).toBeGreaterThanOrEqual(1);
    expect(lookedUp).toBeLessThanOrEqual(20);
    expect(results.filter((r) => r.status === 429)).toHaveLength(200 - lookedUp);
  });

  it("when the window has passed, then the address may look links up again", async () => {
    const address = nextAddress();
    for (let i = 0; i < 21; i++) await guess(a, address, i);
    expect((await guess(b, address, 99)).status).toBe(429);
    a.clock.offsetMs = b.clock.offsetMs = 16 * 60 * 1000;
    try {
      expect((await guess(b, address, 100)).status).toBe(404);
    } finally {
      a.clock.offsetMs = b.clock.offsetMs = 0;
    }
  });

  it("when another address guesses, then its count is its own", async () => {
    const busy = nextAddress();
    for (let i = 0; i < 21; i++) await guess(a, busy, i);
    expect((await guess(b, nextAddress(), 0)).status).toBe(404);
  });
});
