import { onlineManager } from "@tanstack/react-query";
import { useSyncExternalStore } from "react";

/** Whether the browser has a connection, as TanStack Query sees it (it pauses mutations when not). */
export function useIsOnline(): boolean {
  return useSyncExternalStore(
    (onChange) => onlineManager.subscribe(onChange),
    () => onlineManager.isOnline(),
    () => true,
  );
}
