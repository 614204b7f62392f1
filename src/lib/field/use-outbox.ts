import { useSyncExternalStore } from "react";
import { outbox, type OutboxState } from "./outbox";

/** The device queue, re-rendering when it changes (items added, sent, refused; upload progress). */
export function useOutbox(): OutboxState {
  return useSyncExternalStore(outbox.subscribe, outbox.getState, outbox.getState);
}
