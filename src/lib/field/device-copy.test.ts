import type { PersistedClient } from "@tanstack/react-query-persist-client";
import { describe, expect, it } from "vitest";
import { isKept, trimToBudget } from "./device-copy";

type Query = PersistedClient["clientState"]["queries"][number];
const query = (queryKey: unknown[], dataUpdatedAt: number, data: unknown = { filler: "x".repeat(100) }): Query =>
  ({ queryKey, queryHash: JSON.stringify(queryKey), state: { data, dataUpdatedAt, status: "success" } }) as unknown as Query;
const client = (queries: Query[]): PersistedClient => ({ timestamp: 0, buster: "", clientState: { queries, mutations: [] } });
const keysOf = (c: PersistedClient) => c.clientState.queries.map((q) => q.queryKey[2] ?? q.queryKey.join("/"));

describe("what the device copy keeps", () => {
  it("when a query is the session, a project, the project list, the catalog or the estimate conditions, then it is kept", () => {
    for (const key of [["auth", "me"], ["projects", "detail", "p1"], ["projects", "list", {}], ["catalog", "list", {}], ["users", "estimators"], ["company", "estimate-conditions"]]) {
      expect(isKept(key), JSON.stringify(key)).toBe(true);
    }
  });

  it("when a query is a proposal, payments, the mail outbox, the team or a homeowner's page, then it is not kept", () => {
    for (const key of [["proposals", "detail", "x"], ["deposits", "x"], ["outbox"], ["team"], ["public-proposal", "token"], ["company"], ["options", "list", "p1"], ["auth", "me", "signature"]]) {
      expect(isKept(key), JSON.stringify(key)).toBe(false);
    }
  });
});

describe("trimToBudget", () => {
  it("when more projects than allowed are kept, then the most recently fetched stay, and the session always", () => {
    const trimmed = trimToBudget(client([query(["auth", "me"], 1), query(["projects", "detail", "old"], 10), query(["projects", "detail", "new"], 30), query(["projects", "detail", "mid"], 20)]), 1_000_000, 2);
    expect(keysOf(trimmed)).toEqual(["auth/me", "new", "mid"]);
  });

  it("when the copy would pass its size bound, then the oldest queries are left out until it fits", () => {
    const big = { filler: "x".repeat(1_000) };
    const queries = [query(["auth", "me"], 1), ...[1, 2, 3, 4, 5].map((n) => query(["projects", "detail", `p${n}`], n * 10, big))];
    const sizeOfOne = JSON.stringify(queries[1]).length;
    const trimmed = trimToBudget(client(queries), JSON.stringify(queries[0]).length + sizeOfOne * 3 + 10, 25);
    expect(keysOf(trimmed)).toEqual(["auth/me", "p3", "p4", "p5"]);
    expect(JSON.stringify(trimmed.clientState.queries).length).toBeLessThan(JSON.stringify(queries[0]).length + sizeOfOne * 3 + 10);
  });

  it("when queued mutations are in the cache, then none is kept (changes wait in the device queue, not here)", () => {
    const c = client([query(["auth", "me"], 1)]);
    c.clientState.mutations = [{ mutationKey: ["autosave"], state: {} } as unknown as PersistedClient["clientState"]["mutations"][number]];
    expect(trimToBudget(c).clientState.mutations).toEqual([]);
  });
});
