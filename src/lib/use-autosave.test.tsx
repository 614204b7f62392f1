// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { act, cleanup, renderHook, waitFor } from "@testing-library/react";
import { onlineManager, QueryClient, QueryClientProvider } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { ApiError } from "./api-client";
import { fingerprint, useAutosave, type AutosaveOptions } from "./use-autosave";

/*
 * The autosave every editor uses: "bad input loses nothing" and "a save never overwrites someone
 * else's newer edit" rest on it. A fake server records each send; waits are on the events
 * themselves (waitFor), never on sleeps.
 */
interface Doc { text: string }
interface Saved { version: number; doc: Doc }

function fakeServer() {
  const sends: { doc: Doc; baseVersion: number }[] = [];
  let version = 1;
  let fail: ApiError | null = null;
  return {
    sends,
    failNextWith: (error: ApiError | null) => (fail = error),
    send: async (doc: Doc, baseVersion: number): Promise<Saved> => {
      sends.push({ doc, baseVersion });
      if (fail) {
        const error = fail;
        fail = null;
        throw error;
      }
      version = baseVersion + 1;
      return { version, doc };
    },
  };
}

function setup(server: ReturnType<typeof fakeServer>, initial: Doc | null, extra: Partial<AutosaveOptions<Doc, Saved>> = {}) {
  const client = new QueryClient();
  const scopeId = `doc:${crypto.randomUUID()}`;
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return renderHook(
    ({ payload, blockedReason }: { payload: Doc | null; blockedReason: string | null }) =>
      useAutosave<Doc, Saved>({
        scopeId,
        payload,
        blockedReason,
        baseline: fingerprint({ text: "saved" }),
        initialVersion: 1,
        send: server.send,
        versionOf: (r) => r.version,
        delayMs: 10,
        ...extra,
      }),
    { wrapper, initialProps: { payload: initial, blockedReason: null as string | null } },
  );
}

afterEach(() => {
  cleanup();
  onlineManager.setOnline(true);
});

describe("useAutosave", () => {
  it("when nothing changed, then nothing is sent and the state is saved", async () => {
    const server = fakeServer();
    const { result } = setup(server, { text: "saved" });
    expect(result.current.state).toEqual({ kind: "saved" });
    expect(result.current.isDirty).toBe(false);
    expect(server.sends).toEqual([]);
  });

  it("when an edit is made, then it is sent once on the version it was based on, and the next edit builds on the new version", async () => {
    const server = fakeServer();
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: { text: "first" }, blockedReason: null });
    await waitFor(() => expect(result.current.state).toEqual({ kind: "saved" }));
    rerender({ payload: { text: "second" }, blockedReason: null });
    await waitFor(() => expect(server.sends).toHaveLength(2));
    await waitFor(() => expect(result.current.state).toEqual({ kind: "saved" }));
    expect(server.sends).toEqual([
      { doc: { text: "first" }, baseVersion: 1 },
      { doc: { text: "second" }, baseVersion: 2 },
    ]);
    expect(result.current.getVersion()).toBe(3);
  });

  it("when the edit can't be sent yet, then the state says why and nothing is sent", async () => {
    const server = fakeServer();
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: null, blockedReason: "Name the space (e.g. Main attic)." });
    expect(result.current.state).toEqual({ kind: "blocked", message: "Name the space (e.g. Main attic)." });
    expect(server.sends).toEqual([]);
  });

  it("when someone else saved first (409), then saving stops in the conflict state until a choice is made, and 'keep mine' sends on their version", async () => {
    const server = fakeServer();
    server.failNextWith(new ApiError(409, "version-conflict", "Someone else saved this space."));
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: { text: "mine" }, blockedReason: null });
    await waitFor(() => expect(result.current.state).toEqual({ kind: "conflict" }));
    rerender({ payload: { text: "mine, more" }, blockedReason: null });
    expect(server.sends).toHaveLength(1);
    expect(result.current.isDirty).toBe(true);

    act(() => result.current.resolve("mine", 7, fingerprint({ text: "theirs" })));
    await waitFor(() => expect(result.current.state).toEqual({ kind: "saved" }));
    expect(server.sends[1]).toEqual({ doc: { text: "mine, more" }, baseVersion: 7 });
  });

  it("when 'take theirs' is chosen after a conflict, then nothing of mine is sent", async () => {
    const server = fakeServer();
    server.failNextWith(new ApiError(409, "version-conflict", "Someone else saved this space."));
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: { text: "mine" }, blockedReason: null });
    await waitFor(() => expect(result.current.state).toEqual({ kind: "conflict" }));
    act(() => result.current.resolve("theirs", 7, fingerprint({ text: "theirs" })));
    rerender({ payload: { text: "theirs" }, blockedReason: null });
    await waitFor(() => expect(result.current.state).toEqual({ kind: "saved" }));
    expect(server.sends).toHaveLength(1);
  });

  it("when the device is offline, then the save waits, says so, and sends the newest edits once the connection is back", async () => {
    const server = fakeServer();
    onlineManager.setOnline(false);
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: { text: "typed in the attic" }, blockedReason: null });
    await waitFor(() => expect(result.current.state).toEqual({ kind: "offline" }));
    rerender({ payload: { text: "typed in the attic, and more" }, blockedReason: null });
    expect(server.sends).toEqual([]);

    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(server.sends.length).toBeGreaterThan(0));
    await waitFor(() => expect(result.current.state).toEqual({ kind: "saved" }));
    expect(server.sends.at(-1)).toEqual({ doc: { text: "typed in the attic, and more" }, baseVersion: expect.any(Number) });
    expect(server.sends[0]).toEqual({ doc: { text: "typed in the attic, and more" }, baseVersion: 1 });
  });

  it("when the server refuses the edit (400), then the edit stays dirty with the server's message and is not lost", async () => {
    const server = fakeServer();
    server.failNextWith(new ApiError(400, "invalid-input", "Please check vents.0.lengthFt: must be more than 0."));
    const { result, rerender } = setup(server, { text: "saved" });
    rerender({ payload: { text: "bad" }, blockedReason: null });
    await waitFor(() => expect(result.current.state.kind).toBe("error"));
    expect(result.current.state).toEqual({ kind: "error", message: "Please check vents.0.lengthFt: must be more than 0.", isNetwork: false });
    expect(result.current.isDirty).toBe(true);
    expect(server.sends).toHaveLength(1);
  });
});
