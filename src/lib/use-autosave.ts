/** Autosave with optimistic versions, shared by every editor (survey, options, proposals). */
import { onlineManager, useMutation } from "@tanstack/react-query";
import { useCallback, useEffect, useLayoutEffect, useRef, useState } from "react";
import { isApiError } from "@/lib/api-client";

/** A stable text form for comparing what was sent with what is there now. */
export const fingerprint = (value: unknown): string => JSON.stringify(value);

export type SaveState =
  | { kind: "saved" }
  | { kind: "saving" }
  | { kind: "offline" }
  | { kind: "blocked"; message: string }
  | { kind: "error"; message: string; isNetwork: boolean }
  | { kind: "conflict" };

export interface AutosaveOptions<P, R> {
  /** One save queue per record ("space:<id>"): saves of a record run one after another. */
  scopeId: string;
  /** What to send now, or null when nothing can be sent (see `blockedReason`). */
  payload: P | null;
  blockedReason: string | null;
  /** Fingerprint of what the server holds now (nothing to send when the payload matches it). */
  baseline: string;
  /** The server version the editing started from. */
  initialVersion: number;
  /** Start in the conflict state (edits on this device were based on an older version). */
  startInConflict?: boolean;
  send: (payload: P, version: number) => Promise<R>;
  versionOf: (result: R) => number;
  onSaved?: (result: R, sentFingerprint: string) => void;
  delayMs?: number;
}

const isConflict = (error: unknown) => isApiError(error) && error.status === 409;
const isTransient = (error: unknown) => isApiError(error) && (error.status === 0 || error.status >= 500);

/**
 * Saves a record about `delayMs` after the last change, one save at a time, each naming the
 * version it was based on. A TanStack mutation with networkMode "online" does the sending, so
 * offline saves pause and go out when the connection returns; a 409 stops saving until the
 * person chooses whose edit wins.
 */
export function useAutosave<P, R>(options: AutosaveOptions<P, R>) {
  const { scopeId, payload, blockedReason, baseline, initialVersion, delayMs = 800 } = options;
  const [acknowledged, setAcknowledged] = useState(baseline);
  const [isInConflict, setIsInConflict] = useState(options.startInConflict ?? false);
  const versionRef = useRef(initialVersion);
  // What the server has acknowledged, readable from timers: a timer that fires after the save it
  // was set for has landed must not send the same content again.
  const acknowledgedRef = useRef(baseline);
  const acknowledge = useCallback((value: string) => {
    acknowledgedRef.current = value;
    setAcknowledged(value);
  }, []);
  const inFlightRef = useRef(false);
  const conflictRef = useRef(isInConflict);
  const latest = useRef(options);
  useLayoutEffect(() => {
    latest.current = options;
    conflictRef.current = isInConflict;
  });

  const mutation = useMutation({
    mutationKey: ["autosave", scopeId],
    scope: { id: `autosave:${scopeId}` },
    networkMode: "online",
    retry: (failureCount, error) => isTransient(error) && failureCount < 3,
    retryDelay: (attempt) => Math.min(1000 * 2 ** attempt, 8000),
    // Reads the newest payload when it actually runs, so a save that waited offline sends the latest edits.
    mutationFn: async () => {
      const current = latest.current.payload;
      if (current === null) throw new Error("Nothing to send.");
      const sent = fingerprint(current);
      const result = await latest.current.send(current, versionRef.current);
      return { result, sent };
    },
    onSuccess: ({ result, sent }) => {
      versionRef.current = latest.current.versionOf(result);
      acknowledge(sent);
      latest.current.onSaved?.(result, sent);
    },
    onError: (error) => {
      if (isConflict(error)) {
        conflictRef.current = true;
        setIsInConflict(true);
      }
    },
    onSettled: () => {
      inFlightRef.current = false;
    },
  });
  const { mutate } = mutation;

  const run = useCallback(() => {
    const { payload: current } = latest.current;
    if (current === null || conflictRef.current || inFlightRef.current) return;
    if (fingerprint(current) === acknowledgedRef.current) return;
    inFlightRef.current = true;
    mutate();
  }, [mutate]);

  const current = payload === null ? null : fingerprint(payload);
  const isDirty = current !== null && current !== acknowledged;

  useEffect(() => {
    if (!isDirty || isInConflict) return;
    const timer = setTimeout(run, delayMs);
    return () => clearTimeout(timer);
  }, [current, isDirty, isInConflict, run, delayMs]);

  // A save that failed on a dropped connection goes again when the connection is back, and every 15 s.
  const isNetworkFailure = mutation.isError && isTransient(mutation.error);
  useEffect(() => {
    if (!isNetworkFailure || !isDirty) return;
    const timer = setInterval(run, 15_000);
    const unsubscribe = onlineManager.subscribe((isOnline) => (isOnline ? run() : undefined));
    return () => {
      clearInterval(timer);
      unsubscribe();
    };
  }, [isNetworkFailure, isDirty, run]);

  let state: SaveState;
  if (isInConflict) state = { kind: "conflict" };
  else if (mutation.isPaused) state = { kind: "offline" };
  else if (mutation.isPending) state = { kind: "saving" };
  else if (payload === null && blockedReason) state = { kind: "blocked", message: blockedReason };
  else if (mutation.isError && isDirty) {
    state = { kind: "error", message: mutation.error.message, isNetwork: isTransient(mutation.error) };
  } else if (isDirty) state = { kind: "saving" };
  else state = { kind: "saved" };

  /** Whose edit wins after a conflict. "theirs": the caller replaces its draft with `serverFingerprint`'s record. */
  const resolve = useCallback(
    (choice: "theirs" | "mine", serverVersion: number, serverFingerprint: string) => {
      versionRef.current = serverVersion;
      conflictRef.current = false;
      setIsInConflict(false);
      mutation.reset();
      if (choice === "theirs") acknowledge(serverFingerprint);
      else {
        acknowledge(serverFingerprint);
        setTimeout(run, 0);
      }
    },
    [mutation, run, acknowledge],
  );

  return {
    state,
    isDirty,
    saveNow: run,
    resolve,
    /** The server version these edits build on (for the unsent copy kept on the device). */
    getVersion: () => versionRef.current,
  };
}
