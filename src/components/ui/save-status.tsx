import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { CriticalIcon, OkIcon, WarningIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import type { SaveState } from "@/lib/use-autosave";

export interface SaveStatusProps {
  state: SaveState;
  /** What was edited, for the conflict sentence: "option", "proposal", "survey". */
  thing: string;
  onRetry: () => void;
  /** Reopens the choice after a conflict dialog was closed. */
  onResolve: () => void;
  /** Where unsent edits wait: in this page's memory, or stored on the device (the survey, for work offline). */
  keptOn?: "page" | "device";
  /** When false, an "Offline" badge stands beside the status. */
  isOnline?: boolean;
  /** Entries kept on the device until they are complete (the survey's half-typed vents and sections). */
  heldCount?: number;
}

/**
 * "All changes saved · Saving… · Offline · Not saved: <reason>", in words and icon, announced
 * politely; one for every editor that autosaves with versions.
 */
export function SaveStatus({ state, thing, onRetry, onResolve, keptOn = "page", isOnline = true, heldCount = 0 }: SaveStatusProps) {
  const isOnDevice = keptOn === "device";
  let icon = <OkIcon className="text-ok-600" />;
  let text = "All changes saved";
  let tone = "text-ink-800";
  if (state.kind === "saving") {
    icon = <Spinner className="size-5 text-ink-600" />;
    text = "Saving…";
  } else if (state.kind === "offline") {
    icon = <WarningIcon className="text-warning-600" />;
    text = `Offline: ${isOnDevice ? "edits are kept on this device" : "your edits stay on this page"} and are sent when you're back online`;
    tone = "text-warning-900";
  } else if (state.kind === "blocked") {
    icon = <WarningIcon className="text-warning-600" />;
    text = `Not saved yet: ${state.message}`;
    tone = "text-warning-900";
  } else if (state.kind === "error") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = `Not saved: ${state.message}${state.isNetwork ? (isOnDevice ? " Kept on this device; trying again." : " Trying again.") : ""}`;
    tone = "text-critical-800";
  } else if (state.kind === "conflict") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = `Not saved: someone else saved this ${thing} meanwhile. Choose whose changes to keep.`;
    tone = "text-critical-800";
  }
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
      {!isOnline ? (
        <Badge tone="outline" className="border-warning-600 font-semibold text-warning-900 ring-warning-600">
          <WarningIcon className="size-4 text-warning-600" /> Offline
        </Badge>
      ) : null}
      <p role="status" aria-live="polite" data-save-state={state.kind} className={cn("flex min-h-touch items-center gap-2 py-1 text-sm font-medium sm:text-base", tone)}>
        {icon}
        <span>
          {text}
          {heldCount > 0 && state.kind !== "blocked" ? (
            <span className="font-normal text-ink-700">
              {" "}
              · {heldCount} {heldCount === 1 ? "entry" : "entries"} kept on this device until complete
            </span>
          ) : null}
        </span>
      </p>
      {state.kind === "error" ? (
        <Button variant="secondary" size="sm" onClick={onRetry}>
          Try again now
        </Button>
      ) : state.kind === "conflict" ? (
        <Button variant="secondary" size="sm" onClick={onResolve}>
          Choose whose changes to keep
        </Button>
      ) : null}
    </div>
  );
}
