import { afterEach, describe, expect, it, vi } from "vitest";
import { apiClient, ApiError } from "./api-client.ts";

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

describe("apiClient.create", () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  it("when the first answer is 503 and the connection then drops, then it retries with the same Idempotency-Key and returns the created row", async () => {
    vi.useFakeTimers();
    const fetchMock = vi.fn()
      .mockResolvedValueOnce(json(503, { error: { code: "unavailable", message: "briefly unavailable" } }))
      .mockRejectedValueOnce(new TypeError("network down"))
      .mockResolvedValueOnce(json(201, { customer: { id: "c1" } }));
    vi.stubGlobal("fetch", fetchMock);
    const result = apiClient.create<{ customer: { id: string } }>("/customers", { name: "Prairie Household" });
    await vi.runAllTimersAsync();
    expect(await result).toEqual({ customer: { id: "c1" } });
    expect(fetchMock).toHaveBeenCalledTimes(3);
    const keys = fetchMock.mock.calls.map(([, init]) => (init as RequestInit & { headers: Record<string, string> }).headers["idempotency-key"]);
    expect(keys[0]).toMatch(/^[0-9a-f-]{36}$/);
    expect(new Set(keys).size).toBe(1);
  });

  it("when two submissions are made, then each has its own key", async () => {
    const fetchMock = vi.fn().mockImplementation(async () => json(201, { ok: true }));
    vi.stubGlobal("fetch", fetchMock);
    await apiClient.create("/customers", { name: "A" });
    await apiClient.create("/customers", { name: "A" });
    const keys = fetchMock.mock.calls.map(([, init]) => (init as RequestInit & { headers: Record<string, string> }).headers["idempotency-key"]);
    expect(keys[0]).not.toBe(keys[1]);
  });

  it("when the answer is a refusal (400), then it is not retried", async () => {
    const fetchMock = vi.fn().mockResolvedValue(json(400, { error: { code: "invalid-input", message: "Enter the customer's name.", fields: { name: "Enter the customer's name." } } }));
    vi.stubGlobal("fetch", fetchMock);
    await expect(apiClient.create("/customers", { name: "" })).rejects.toBeInstanceOf(ApiError);
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it("when the server stays unavailable, then it gives up after three tries with the 503's message", async () => {
    vi.useFakeTimers();
    const fetchMock = vi.fn().mockImplementation(async () => json(503, { error: { code: "unavailable", message: "The service is briefly unavailable." } }));
    vi.stubGlobal("fetch", fetchMock);
    const result = apiClient.create("/customers", { name: "B" });
    const settled = expect(result).rejects.toMatchObject({ status: 503, message: "The service is briefly unavailable." });
    await vi.runAllTimersAsync();
    await settled;
    expect(fetchMock).toHaveBeenCalledTimes(3);
  });
});
