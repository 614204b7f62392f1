import { useNavigate } from "react-router";
import { formatCents } from "@shared/pricing/index";
import { Button } from "@/components/ui/button";
import { LockIcon } from "@/components/ui/icons";
import { paths } from "@/config/paths";
import { formatDate } from "@/lib/format-date";
import { useCopyOption } from "../api/copy-option";
import type { OptionLock } from "../api/types";

/** The short label of a lock, for badges: never colour alone, always the words. */
export const lockLabel = (lock: OptionLock) => (lock.reason === "accepted" ? `Signed · rev. ${lock.revision}` : `Offered in signed rev. ${lock.revision}`);

/**
 * Why an option can no longer be edited and what to do instead. Signed work changes only through
 * a change order; an option offered beside the signed one is reworked as a copy.
 */
export function SignedLockNotice({ lock, optionId, projectId, canEdit }: { lock: OptionLock; optionId: string; projectId: string; canEdit: boolean }) {
  const copy = useCopyOption();
  const navigate = useNavigate();
  return (
    <section aria-label="Read-only: signed work" data-option-lock={lock.reason} className="mb-4 flex gap-3 rounded-md border-2 border-ink-900 bg-ink-50 px-4 py-3 text-base text-ink-950">
      <LockIcon className="mt-0.5 size-5 shrink-0" />
      <div className="min-w-0 space-y-2">
        <p className="font-semibold">
          {lock.reason === "accepted" ? "Signed by the homeowner" : "Offered in a signed proposal"} — read-only
          {lock.acceptedAt ? <span className="font-normal"> (proposal rev. {lock.revision}, {formatDate(lock.acceptedAt)})</span> : null}
        </p>
        <p>{lock.message}</p>
        {lock.signedPrice ? (
          <p>
            Total as signed: <span className="font-semibold tabular-nums">{formatCents(lock.signedPrice.totalCents)}</span>
            <span className="text-sm text-ink-700"> incl. {formatCents(lock.signedPrice.taxCents)} tax</span>
          </p>
        ) : null}
        {canEdit ? (
          <div className="flex flex-wrap gap-2">
            <Button
              variant="secondary"
              isLoading={copy.isPending}
              onClick={() => copy.mutate(optionId, { onSuccess: (c) => void navigate(paths.app.projectOption.getHref(projectId, c.id)) })}
            >
              Copy into a new draft
            </Button>
          </div>
        ) : null}
        {copy.isError ? <p role="alert" className="text-critical-700">{copy.error.message}</p> : null}
      </div>
    </section>
  );
}
