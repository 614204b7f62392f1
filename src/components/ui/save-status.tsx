import { Button } from "@/components/ui/button";
import { CriticalIcon, OkIcon, WarningIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import type { SaveState } from "@/lib/use-autosave";

/**
 * "Saved · Saving… · Not saved: <reason>", in words and icon, announced politely; shared by the
 * editors that autosave with versions (`thing` names what was edited, e.g. "option", "proposal").
 */
export function SaveStatus({ state, thing, onRetry, onResolve }: { state: SaveState; thing: string; onRetry: () => void; onResolve: () => void }) {
  let icon = <OkIcon className="text-ok-600" />;
  let text = "All changes saved";
  let tone = "text-ink-800";
  if (state.kind === "saving") {
    icon = <Spinner className="size-5 text-ink-600" />;
    text = "Saving…";
  } else if (state.kind === "offline") {
    icon = <WarningIcon className="text-warning-600" />;
    text = "Offline: your edits stay on this page and are sent when you're back online";
    tone = "text-warning-900";
  } else if (state.kind === "blocked") {
    icon = <WarningIcon className="text-warning-600" />;
    text = `Not saved yet: ${state.message}`;
    tone = "text-warning-900";
  } else if (state.kind === "error") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = `Not saved: ${state.message}${state.isNetwork ? " Trying again." : ""}`;
    tone = "text-critical-800";
  } else if (state.kind === "conflict") {
    icon = <CriticalIcon className="text-critical-600" />;
    text = `Not saved: someone else saved this ${thing} meanwhile. Choose whose changes to keep.`;
    tone = "text-critical-800";
  }
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
      <p role="status" aria-live="polite" data-save-state={state.kind} className={cn("flex min-h-touch items-center gap-2 py-1 text-sm font-medium sm:text-base", tone)}>
        {icon}
        <span>{text}</span>
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
