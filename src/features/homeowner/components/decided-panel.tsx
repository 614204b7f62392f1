import { useEffect, useRef } from "react";
import { OkIcon } from "@/components/ui/icons";
import { formatDateTime } from "@/lib/format-date";
import type { PublicProposal } from "../api/types";
import type { DepositSlotProps } from "./deposit-slot";
import { PdfLink } from "./pdf-link";

export type RenderDeposit = (props: DepositSlotProps) => React.ReactNode;

/**
 * The outcome, where the decision was: "Thank you — accepted" with the deposit and the signed copy,
 * or the decline. Right after signing it takes the focus and scrolls into view, so the homeowner
 * sees it where their eyes are instead of the bottom of a form that is gone.
 */
export function DecidedPanel({ token, view, renderDeposit, isJustDecided }: { token: string; view: PublicProposal; renderDeposit?: RenderDeposit; isJustDecided: boolean }) {
  const headingRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (!isJustDecided || !headingRef.current) return;
    headingRef.current.scrollIntoView({ block: "start" });
    headingRef.current.focus({ preventScroll: true });
  }, [isJustDecided]);

  const p = view.proposal;
  if (p.status === "accepted") {
    const index = view.options.findIndex((o) => o.id === p.acceptedOptionId);
    const option = view.options[index];
    return (
      <section aria-labelledby="thanks-title" className="scroll-mt-4 space-y-4 rounded-lg border-2 border-ok-600 bg-ok-50 p-5" data-decided="accepted">
        <h2 id="thanks-title" ref={headingRef} tabIndex={-1} className="flex scroll-mt-4 items-center gap-2 text-2xl font-semibold text-ok-900 focus:outline-none">
          <OkIcon className="size-7 text-ok-600" aria-hidden /> Thank you — accepted
        </h2>
        <p className="text-lg text-ink-900">
          You accepted option {index + 1}
          {option ? `, “${option.name}”` : ""}
          {p.decidedAt ? ` on ${formatDateTime(p.decidedAt)}` : ""}. {view.seller.name} of {view.company.name} will be in touch to schedule the work.
        </p>
        {option && renderDeposit
          ? renderDeposit({
              token,
              status: "accepted",
              acceptedOption: { id: option.id, name: option.name, totalCents: option.price?.totalCents ?? 0, depositCents: option.price?.depositCents ?? 0 },
              company: { name: view.company.name, phone: view.company.phone, email: view.company.email },
            })
          : null}
        <PdfLink token={token} view={view} />
      </section>
    );
  }
  if (p.status === "declined") {
    return (
      <section aria-labelledby="declined-title" className="space-y-2 rounded-lg border border-ink-300 bg-white p-5" data-decided="declined">
        <h2 id="declined-title" ref={headingRef} tabIndex={-1} className="scroll-mt-4 text-2xl font-semibold text-ink-900 focus:outline-none">
          You declined this proposal
        </h2>
        <p className="text-lg text-ink-800">Thank you for letting {view.company.name} know. If you change your mind, contact them for a new proposal.</p>
      </section>
    );
  }
  return null;
}
