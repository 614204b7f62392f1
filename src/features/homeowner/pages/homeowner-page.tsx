import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { AirflowPicture } from "@/components/airflow/airflow-picture";
import { Alert } from "@/components/ui/alert";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { formatDate } from "@/lib/format-date";
import { publicLogoSrc } from "../api/get-public-proposal";
import { homeownerQueries } from "../api/queries";
import { AcceptForm } from "../components/accept-form";
import { DecidedPanel, type RenderDeposit } from "../components/decided-panel";
import { DeclineForm } from "../components/decline-form";
import { FindingList } from "../components/finding-list";
import { Folded } from "../components/folded";
import { LinkProblem, type LinkProblemKind } from "../components/link-problem";
import { OptionCard } from "../components/option-card";
import { OptionChoices } from "../components/option-choices";
import { PdfLink } from "../components/pdf-link";
import { PhotoGallery } from "../components/photo-gallery";
import { PublicHeader } from "../components/public-header";
import { nfaSentences, providedSentence } from "../lib/nfa-words";

export type { RenderDeposit };

function problemOf(error: unknown): LinkProblemKind {
  if (!isApiError(error)) return "unreachable";
  if (error.status === 410) {
    if (error.code === "superseded") return "superseded";
    if (error.code === "link-revoked") return "revoked";
    if (error.code === "link-replaced") return "replaced";
    return "expired";
  }
  if (error.status === 404) return "not-found";
  if (error.status === 429) return "rate-limited";
  return "unreachable";
}

function Section({ id, title, children }: { id: string; title: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-4">
      <h2 id={id} className="text-2xl font-semibold tracking-tight text-ink-900">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** Moves the keyboard and the eyes to the form once an option is chosen above it. */
function focusAcceptForm() {
  requestAnimationFrame(() => {
    const heading = document.getElementById("accept-title");
    heading?.scrollIntoView({ block: "start", behavior: "smooth" });
    heading?.focus({ preventScroll: true });
  });
}

/**
 * The homeowner's page, in the order they decide: the options side by side with price and what
 * each fixes (and the form to accept one, right there); then why (what we found, the airflow
 * picture); then the details folded away (each option in full, photos, safety, terms, the right
 * to cancel). After signing, the confirmation and the deposit take the decision's place.
 */
export function HomeownerPage({ token, renderDeposit }: { token: string; renderDeposit?: RenderDeposit }) {
  const query = useQuery(homeownerQueries.view(token));
  const [chosenId, setChosenId] = useState("");
  const [isJustDecided, setIsJustDecided] = useState(false);
  if (query.isPending) {
    return (
      <div className="min-h-dvh bg-ink-25">
        <PublicHeader companyName={null} />
        <LoadingBlock label="Opening your proposal…" />
      </div>
    );
  }
  if (query.isError) return <LinkProblem kind={problemOf(query.error)} onRetry={problemOf(query.error) === "unreachable" ? () => void query.refetch() : undefined} />;

  const view = query.data;
  const status = view.proposal.status;
  const isOpen = status === "sent" || status === "viewed";
  const isDecided = status === "accepted" || status === "declined";
  const findings = view.before.flatMap((s) => (s.analysis?.findings ?? []).map((f) => ({ ...f, space: view.before.length > 1 ? s.name : undefined })));
  const optionCount = view.options.length;
  const choose = (id: string) => {
    setChosenId(id);
    focusAcceptForm();
  };

  return (
    <div className="min-h-dvh bg-ink-25">
      <title>{`Your proposal from ${view.company.name}`}</title>
      <PublicHeader companyName={view.company.name} phone={view.company.phone} logoSrc={view.company.hasLogo ? publicLogoSrc(token) : null} />
      <main className="mx-auto max-w-3xl space-y-10 px-4 py-6 sm:px-6 sm:py-10">
        <div className="space-y-2">
          <p className="text-base font-medium text-ink-600">
            Proposal for {view.site.address} · valid until {formatDate(`${view.proposal.validUntil}T12:00:00`)}
          </p>
          <h1 className="text-3xl font-semibold tracking-tight text-ink-900">Hello {view.customer.firstName},</h1>
          {isOpen ? (
            <p className="text-lg text-ink-800">
              {optionCount === 1
                ? `Here is what ${view.seller.name} of ${view.company.name} proposes for your attic, with the price and what it fixes.`
                : `Here are ${optionCount} ways to fix your attic from ${view.seller.name} of ${view.company.name}, side by side with the price and what each fixes.`}
            </p>
          ) : null}
        </div>

        <DecidedPanel token={token} view={view} renderDeposit={renderDeposit} isJustDecided={isJustDecided} />

        {status === "expired" ? <Alert severity="warning" title="This proposal has expired">Contact {view.company.name} for an up-to-date one.</Alert> : null}

        <Section id="options-title" title={optionCount === 1 ? "What we propose" : `Your ${optionCount} options`}>
          <OptionChoices options={view.options} before={view.before} chosenId={chosenId || null} acceptedId={view.proposal.acceptedOptionId} onChoose={isOpen ? choose : undefined} />
          {view.options.some((o) => o.hasPoweredFan) ? (
            <p className="text-base text-ink-800">
              <strong>About powered attic fans:</strong> a powered fan can pull exhaust from a gas water heater or furnace back into the house. An option with one includes a safety test
              of your gas appliances with the fan running; see “Safety” below.
            </p>
          ) : null}
          {isOpen ? (
            <div className="space-y-6 rounded-lg border border-ink-200 bg-white p-4 shadow-card sm:p-6" data-decision>
              {chosenId ? (
                <AcceptForm token={token} view={view} optionId={chosenId} onOptionChange={setChosenId} onAccepted={() => setIsJustDecided(true)} />
              ) : (
                <p className="text-base text-ink-800">Choose an option above to accept and sign it here. You can read everything below first.</p>
              )}
              <div className="space-y-3 border-t border-ink-100 pt-5">
                <p className="text-base text-ink-700">Not right for you? You can say no; nothing else will happen.</p>
                <DeclineForm token={token} companyName={view.company.name} onDeclined={() => setIsJustDecided(true)} />
              </div>
            </div>
          ) : null}
        </Section>

        {view.coverNote ? (
          <Section id="note-title" title={`A note from ${view.seller.name}`}>
            <p className="text-lg whitespace-pre-line text-ink-800">{view.coverNote}</p>
          </Section>
        ) : null}

        <Section id="found-title" title="What we found">
          {view.explanation[0] ? <p className="text-lg text-ink-800">{view.explanation[0]}</p> : null}
          <FindingList findings={findings} />
        </Section>

        {view.before.map((space) => (
          <Section key={space.spaceId} id={`today-${space.spaceId}`} title={view.before.length > 1 ? `${space.name} today` : "How air moves through your attic today"}>
            {space.picture ? <AirflowPicture picture={space.picture} title={`Airflow in ${space.name} today`} /> : <p className="text-base text-ink-700">{space.issues.join(" ")}</p>}
            {space.analysis ? (
              <>
                <p className="text-base font-medium text-ink-900">{providedSentence(space.analysis, "today")}</p>
                <Folded summary="How much venting the code asks for">
                  {nfaSentences(space.analysis).map((s) => (
                    <p key={s} className="text-base text-ink-800">
                      {s}
                    </p>
                  ))}
                  {space.analysis.requirement.reasons.length > 0 ? (
                    <ul className="list-disc space-y-1 pl-5 text-base text-ink-700" aria-label="Why this amount applies to your house">
                      {space.analysis.requirement.reasons.map((r) => (
                        <li key={r}>{r}</li>
                      ))}
                    </ul>
                  ) : null}
                </Folded>
              </>
            ) : null}
          </Section>
        ))}

        <Section id="details-title" title="The details">
          <div className="space-y-3">
            {view.options.map((o, i) => (
              <Folded key={o.id} summary={`Option ${i + 1} in full: ${o.name}`}>
                <OptionCard option={o} index={i} isChosen={view.proposal.acceptedOptionId === o.id} />
              </Folded>
            ))}
            {view.photos.length > 0 ? (
              <Folded summary={view.photos.length === 1 ? "A photo from the survey" : `Photos from the survey (${view.photos.length})`}>
                <p className="text-base text-ink-700">Tap a photo to see it full size.</p>
                <PhotoGallery token={token} photos={view.photos} />
              </Folded>
            ) : null}
            <Folded summary="Safety and the rules we follow">
              <ul className="list-disc space-y-2 pl-5 text-base text-ink-800" data-cautions>
                {view.cautions.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </Folded>
            {view.terms ? (
              <Folded summary="Terms">
                <p className="text-base whitespace-pre-line text-ink-800">{view.terms}</p>
              </Folded>
            ) : null}
            {view.coolingOff.isEnabled ? (
              <Folded summary="Your right to cancel" id="right-to-cancel">
                <div className="space-y-2 text-base text-ink-800" data-cooling-off>
                  {view.coolingOff.notice.map((p, i) => (
                    <p key={`${i}-${p.slice(0, 20)}`} className={p === p.toUpperCase() ? "pt-2 font-semibold text-ink-900" : undefined}>
                      {p}
                    </p>
                  ))}
                </div>
              </Folded>
            ) : null}
          </div>
        </Section>

        {!isDecided ? (
          <Section id="pdf-title" title="The proposal as a PDF">
            <p className="text-base text-ink-700">The same proposal in one document, to keep or print.</p>
            <PdfLink token={token} view={view} />
          </Section>
        ) : null}
      </main>
      <footer className="border-t border-ink-200 bg-white">
        <div className="mx-auto max-w-3xl space-y-1 px-4 py-6 text-base text-ink-700 sm:px-6">
          <p className="font-semibold text-ink-900">{view.company.name}</p>
          {view.company.addressLine ? <p>{view.company.addressLine}</p> : null}
          <p className="flex flex-wrap gap-x-4">
            {view.company.phone ? <a className="underline underline-offset-4" href={`tel:${view.company.phone.replace(/[^\d+]/g, "")}`}>{view.company.phone}</a> : null}
            {view.company.email ? <a className="underline underline-offset-4" href={`mailto:${view.company.email}`}>{view.company.email}</a> : null}
          </p>
          {view.company.licenseNumber ? <p>Licence {view.company.licenseNumber}</p> : null}
          <p className="text-sm text-ink-600">Revision {view.proposal.revision}{view.proposal.sentAt ? ` · sent ${formatDate(view.proposal.sentAt)}` : ""}</p>
          <p className="text-sm text-ink-600">
            Holding a copy of the PDF?{" "}
            <a className="inline-flex min-h-touch items-center underline underline-offset-4" href={paths.publicVerify.getHref()}>
              Check that it is the original
            </a>
          </p>
        </div>
      </footer>
    </div>
  );
}
