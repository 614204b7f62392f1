import { Button } from "@/components/ui/button";
import { Dialog, DialogContent } from "@/components/ui/dialog";
import { LoadingBlock } from "@/components/ui/spinner";
import { formatDateTime } from "@/lib/format-date";
import type { Side, SpaceDifference } from "../lib/merge-space";

export interface PartChoices {
  differences: SpaceDifference[];
  choices: Record<string, Side>;
  onChoose: (key: string, side: Side) => void;
  /** Save the chosen side of every part. */
  onSave: () => void;
}

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
  /** Part by part: each differing part with both versions, to keep either. */
  parts?: PartChoices;
}

/** Two people saved the same thing: say so plainly and let this person choose. Nothing is dropped silently. */
export function ConflictDialog({ open, what, theirs, mine, isGone, onLoadTheirs, onKeepMine, onRemoveHere, onDismiss, parts }: ConflictDialogProps) {
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
          ) : parts && theirs ? (
            <>
              <Button variant="secondary" className="w-full sm:w-auto" onClick={onLoadTheirs}>
                All of theirs
              </Button>
              <Button variant="secondary" className="w-full sm:w-auto" onClick={onKeepMine}>
                All of mine
              </Button>
              <Button className="w-full sm:w-auto" onClick={parts.onSave}>
                Save my choices
              </Button>
            </>
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
        {isGone ? null : theirs && parts ? (
          <PartList theirsSavedAt={theirs.savedAt} parts={parts} />
        ) : theirs ? (
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

/** Each part that differs, with both versions side by side; the estimator picks one of each. */
function PartList({ theirsSavedAt, parts }: { theirsSavedAt: string; parts: PartChoices }) {
  if (parts.differences.length === 0) {
    return <p className="text-base text-ink-800">Both versions hold the same survey now. Save to carry on.</p>;
  }
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-700">
        Their version was saved {formatDateTime(theirsSavedAt)}. For each part that differs, choose the one to keep. Yours are chosen
        until you change them.
      </p>
      <ul className="space-y-3" aria-label="Parts that differ">
        {parts.differences.map((d) => (
          <li key={d.key}>
            <fieldset className="rounded-md border border-ink-200 p-3" data-part={d.key}>
              <legend className="px-1 text-base font-semibold text-ink-900">{d.label}</legend>
              {(["mine", "theirs"] as const).map((side) => (
                <label key={side} className="flex min-h-touch cursor-pointer items-start gap-3 rounded-md px-1 py-2 hover:bg-ink-50">
                  <input
                    type="radio"
                    name={`part-${d.key}`}
                    className="mt-1 size-5 shrink-0 accent-ember-600"
                    checked={(parts.choices[d.key] ?? "mine") === side}
                    onChange={() => parts.onChoose(d.key, side)}
                  />
                  <span>
                    <span className="block text-sm font-semibold text-ink-700">{side === "mine" ? "Yours, on this device" : "Theirs, saved"}</span>
                    <span className="block text-base text-ink-900">{side === "mine" ? d.mine : d.theirs}</span>
                  </span>
                </label>
              ))}
            </fieldset>
          </li>
        ))}
      </ul>
    </div>
  );
}
