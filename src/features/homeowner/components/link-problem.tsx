import { Button } from "@/components/ui/button";
import { InfoIcon, WarningIcon } from "@/components/ui/icons";
import { PublicHeader } from "./public-header";

export type LinkProblemKind = "superseded" | "revoked" | "replaced" | "expired" | "not-found" | "rate-limited" | "unreachable";

const WORDS: Record<LinkProblemKind, { title: string; body: string[] }> = {
  superseded: {
    title: "This proposal has been replaced by a newer one",
    body: [
      "The company updated the proposal after sending this link, so this copy is no longer the one to sign.",
      "Look for a newer e-mail from them, or ask them for the new link.",
    ],
  },
  revoked: {
    title: "This link was withdrawn",
    body: [
      "The company that sent it has withdrawn this link, so it no longer opens the proposal.",
      "If you still need it, contact them: they can send you a new link. Anything you already signed stays as it was.",
    ],
  },
  replaced: {
    title: "This link was replaced by a new one",
    body: [
      "The company sent you a new link by e-mail, so this one no longer opens the proposal.",
      "Use the link in their newest e-mail, or contact them. Anything you already signed stays as it was.",
    ],
  },
  expired: {
    title: "This proposal has expired",
    body: ["Its validity date has passed, so it can no longer be accepted here.", "If you are still interested, contact the company that sent it: they can send you an up-to-date proposal."],
  },
  "not-found": {
    title: "We can't find this proposal",
    body: ["The link may be incomplete (e-mail programs sometimes cut long links), or it may have been withdrawn.", "Try opening it again from the e-mail, or contact the company that sent it."],
  },
  "rate-limited": {
    title: "Please wait a few minutes",
    body: ["There were too many attempts from this connection. Wait a little, then open the link from the e-mail again."],
  },
  unreachable: {
    title: "The proposal could not be loaded",
    body: ["This may be a problem with the connection. Check that you are online and try again in a moment."],
  },
};

/** A friendly page for a link that doesn't open a proposal: why, and what to do next. */
export function LinkProblem({ kind, onRetry }: { kind: LinkProblemKind; onRetry?: () => void }) {
  const words = WORDS[kind];
  const Icon = kind === "superseded" || kind === "replaced" ? InfoIcon : WarningIcon;
  return (
    <div className="min-h-dvh bg-ink-25">
      <PublicHeader companyName={null} />
      <main className="mx-auto max-w-xl px-4 py-12 sm:px-6" data-link-problem={kind}>
        <title>{`${words.title} · Proposal`}</title>
        <div className="rounded-lg border border-ink-200 bg-white p-6 shadow-card">
          <Icon className="mb-4 size-8 text-ink-700" />
          <h1 className="text-2xl font-semibold text-ink-900">{words.title}</h1>
          <div className="mt-3 space-y-3 text-lg text-ink-800">
            {words.body.map((p) => (
              <p key={p}>{p}</p>
            ))}
          </div>
          {onRetry ? (
            <Button variant="secondary" onClick={onRetry} className="mt-6">
              Try again
            </Button>
          ) : null}
        </div>
      </main>
    </div>
  );
}
