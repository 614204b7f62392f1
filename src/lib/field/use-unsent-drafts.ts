import { useSyncExternalStore } from "react";
import { countUnsentDrafts, DRAFTS_CHANGED_EVENT } from "./waiting";

function subscribe(onChange: () => void) {
  window.addEventListener(DRAFTS_CHANGED_EVENT, onChange);
  window.addEventListener("storage", onChange); // another tab
  return () => {
    window.removeEventListener(DRAFTS_CHANGED_EVENT, onChange);
    window.removeEventListener("storage", onChange);
  };
}

/** How many records have edits on this device that the server has not got yet. */
export function useUnsentDraftCount(): number {
  return useSyncExternalStore(subscribe, countUnsentDrafts, () => 0);
}
