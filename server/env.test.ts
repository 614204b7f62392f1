import { describe, expect, it } from "vitest";
import { parseEnv } from "./env.ts";

const base = { DATABASE_URL: "postgres://u:p@127.0.0.1:5432/db" };
const productionKeys = { STRIPE_SECRET_KEY: "sk_x", STRIPE_WEBHOOK_SECRET: "whsec_x" };

describe("APP_ORIGIN", () => {
  it("when NODE_ENV is production and APP_ORIGIN is missing, then start-up stops with a message naming it and why", () => {
    expect(() => parseEnv({ ...base, ...productionKeys, NODE_ENV: "production" })).toThrow(/APP_ORIGIN: required in production.*never from request headers/s);
    expect(() => parseEnv({ ...base, ...productionKeys, NODE_ENV: "production", APP_ORIGIN: "" })).toThrow(/APP_ORIGIN: required in production/);
  });

  it("when production has APP_ORIGIN, then it is used as written, without a trailing slash", () => {
    expect(parseEnv({ ...base, ...productionKeys, NODE_ENV: "production", APP_ORIGIN: "https://app.tallgrass.example/" }).APP_ORIGIN).toBe("https://app.tallgrass.example");
  });

  it("when APP_ORIGIN has a path, a query or another scheme, then it is refused with the origin to use instead", () => {
    expect(() => parseEnv({ ...base, APP_ORIGIN: "https://app.tallgrass.example/eavesight" })).toThrow(/origin only.*https:\/\/app\.tallgrass\.example/);
    expect(() => parseEnv({ ...base, APP_ORIGIN: "javascript:alert(1)" })).toThrow(/http:\/\/ or https:\/\//);
    expect(() => parseEnv({ ...base, APP_ORIGIN: "not a url" })).toThrow(/APP_ORIGIN: "not a url" is not a URL/);
  });

  it("when development or tests leave it unset, then it is the server's own http://HOST:PORT", () => {
    expect(parseEnv({ ...base, HOST: "127.0.0.1", PORT: "4100" }).APP_ORIGIN).toBe("http://127.0.0.1:4100");
    expect(parseEnv({ ...base, NODE_ENV: "test", PORT: "4100" }).APP_ORIGIN).toBe("http://127.0.0.1:4100");
  });
});
