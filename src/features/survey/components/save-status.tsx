import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { CriticalIcon, OkIcon, WarningIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import type { SaveState } from "@/lib/use-autosave";

const RANK: Record<SaveState["kind"], number> = { conflict: 6, error: 5, blocked: 4, offline: 3, saving: 2, saved: 1 };

/** The one state to show for the page: the most urgent of the project's and every space's. */
export function combineStates(states: SaveState[]): SaveState {
  return states.reduce<SaveState>((worst, s) => (RANK[s.kind] > RANK[worst.kind] ? s : worst), { kind: "saved" });
}

export interface SaveStatusProps {
  state: SaveState;
  isOnline: boolean;
  /** Entries kept on this device until they are complete. */
  heldCount: number;
  onRetry: () => void;
  /** Reopens the choice after a conflict dialog was closed. */
  onResolve: () => void;
}

/** "Saved · Saving… · Offline · Not saved: <reason>", in words and icon, announced politely. */
export function SaveStatus({ state, isOnline, heldCount, onRetry, onResolve }: SaveStatusProps) {
  let icon = <OkIcon className="text-ok-600" />;
  let text = "Saved";
  let tone = "text-ink-800";
  if (state.kind === "saving") {
    icon = <Spinner className="size-5 text-ink-600" />;
    text = "Saving…";
  } else if (state.kind === "offline") {
    icon = <WarningIcon className="text-warning-600" />;
    text = "Offline: edits are kept on this device and sent when you're back online";
    tone = "text-warning-900";
  } else if (state.kind === "blocked") {
    icon = <WarningIcon className="text-warning-600" />;
    text = `Not saved: ${state.message}`;
    tone = "text-warning-900";
  } else if (state.kind === "error") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = `Not saved: ${state.message}${state.isNetwork ? " Kept on this device; trying again." : ""}`;
    tone = "text-critical-800";
  } else if (state.kind === "conflict") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = "Not saved: someone else saved a newer version. Choose whose changes to keep.";
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
