import { Button } from "@/components/ui/button";
import { Dialog, DialogContent } from "@/components/ui/dialog";
import { LoadingBlock } from "@/components/ui/spinner";
import { formatDateTime } from "@/lib/format-date";

export interface ConflictDialogProps {
  open: boolean;
  /** "the project details", "Garage attic". */
  what: string;
  /** What the newer saved copy holds, in a line or two; null while it loads. */
  theirs: { summary: string; savedAt: string } | null;
  mine: string;
  isGone?: boolean;
  onLoadTheirs: () => void;
  onKeepMine: () => void;
  onRemoveHere?: () => void;
  /** Close without choosing; the page keeps saying "Not saved" until a choice is made. */
  onDismiss: () => void;
}

/** Two people saved the same thing: say so plainly and let this person choose. Nothing is dropped silently. */
export function ConflictDialog({ open, what, theirs, mine, isGone, onLoadTheirs, onKeepMine, onRemoveHere, onDismiss }: ConflictDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(next) => (next ? undefined : onDismiss())}>
      <DialogContent
        title={`Someone else changed ${what}`}
        description={
          isGone
            ? "It was deleted on another device while you were editing it here."
            : "A newer version was saved from another device after you started editing. Choose which to keep."
        }
        footer={
          isGone ? (
            <Button variant="danger" className="w-full sm:w-auto" onClick={onRemoveHere}>
              Remove it here too
            </Button>
          ) : (
            <>
              <Button variant="secondary" className="w-full sm:w-auto" onClick={onLoadTheirs} disabled={!theirs}>
                Load their changes
              </Button>
              <Button className="w-full sm:w-auto" onClick={onKeepMine} disabled={!theirs}>
                Keep mine (overwrite)
              </Button>
            </>
          )
        }
      >
        {isGone ? null : theirs ? (
          <dl className="space-y-3 text-base">
            <div>
              <dt className="font-semibold text-ink-900">Their version</dt>
              <dd className="text-ink-800">
                {theirs.summary} <span className="text-ink-600">(saved {formatDateTime(theirs.savedAt)})</span>
              </dd>
            </div>
            <div>
              <dt className="font-semibold text-ink-900">Yours, on this device</dt>
              <dd className="text-ink-800">{mine}</dd>
            </div>
            <dd className="text-sm text-ink-600">
              "Load their changes" replaces your unsent edits here. "Keep mine" saves yours over theirs.
            </dd>
          </dl>
        ) : (
          <LoadingBlock label="Fetching the newer version…" className="py-6" />
        )}
      </DialogContent>
    </Dialog>
  );
}
