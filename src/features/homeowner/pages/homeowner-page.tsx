import { useQuery } from "@tanstack/react-query";
import { COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION } from "@shared/diagnostics/cautions";
import { AirflowPicture } from "@/components/airflow/airflow-picture";
import { Alert } from "@/components/ui/alert";
import { SeverityBadge } from "@/components/ui/badge";
import { buttonStyles } from "@/components/ui/button";
import { OkIcon } from "@/components/ui/icons";
import { LoadingBlock } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { formatDate, formatDateTime } from "@/lib/format-date";
import { publicLogoSrc, publicPdfHref } from "../api/get-public-proposal";
import { homeownerQueries } from "../api/queries";
import type { PublicProposal } from "../api/types";
import { AcceptForm } from "../components/accept-form";
import { DeclineForm } from "../components/decline-form";
import type { DepositSlotProps } from "../components/deposit-slot";
import { LinkProblem, type LinkProblemKind } from "../components/link-problem";
import { OptionCard } from "../components/option-card";
import { PhotoGallery } from "../components/photo-gallery";
import { PublicHeader } from "../components/public-header";
import { nfaSentences, providedSentence } from "../lib/nfa-words";

function problemOf(error: unknown): LinkProblemKind {
  if (!isApiError(error)) return "unreachable";
  if (error.status === 410) return error.code === "superseded" ? "superseded" : "expired";
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

function PdfLink({ token, view }: { token: string; view: PublicProposal }) {
  const isSigned = view.proposal.status === "accepted";
  const isReady = isSigned ? view.proposal.isSignedPdfReady : view.proposal.isPdfReady;
  if (!isReady) {
    return (
      <p role="status" className="text-base text-ink-700">
        {isSigned ? "Your signed copy is being prepared; it will appear here in a moment and is also e-mailed to you." : "The PDF is being prepared; the download appears here in a moment."}
      </p>
    );
  }
  return (
    <a href={publicPdfHref(token)} download className={buttonStyles({ variant: isSigned ? "primary" : "secondary", size: "lg", className: "w-full sm:w-auto" })}>
      {isSigned ? "Download your signed copy (PDF)" : "Download the proposal (PDF)"}
    </a>
  );
}

function Decided({ token, view, renderDeposit }: { token: string; view: PublicProposal; renderDeposit?: RenderDeposit }) {
  const p = view.proposal;
  if (p.status === "accepted") {
    const index = view.options.findIndex((o) => o.id === p.acceptedOptionId);
    const option = view.options[index];
    return (
      <section aria-labelledby="thanks-title" className="space-y-4 rounded-lg border-2 border-ok-600 bg-ok-50 p-5" data-decided="accepted">
        <h2 id="thanks-title" className="flex items-center gap-2 text-2xl font-semibold text-ok-900">
          <OkIcon className="size-7 text-ok-600" /> Thank you — accepted
        </h2>
        <p className="text-lg text-ink-900">
          You accepted option {index + 1}
          {option ? `, “${option.name}”` : ""}
          {p.decidedAt ? ` on ${formatDateTime(p.decidedAt)}` : ""}. {view.seller.name} of {view.company.name} will be in touch to schedule the work.
        </p>
        <PdfLink token={token} view={view} />
        {option && renderDeposit
          ? renderDeposit({
              token,
              status: "accepted",
              acceptedOption: { id: option.id, name: option.name, totalCents: option.price?.totalCents ?? 0, depositCents: option.price?.depositCents ?? 0 },
              company: { name: view.company.name, phone: view.company.phone, email: view.company.email },
            })
          : null}
      </section>
    );
  }
  if (p.status === "declined") {
    return (
      <section aria-labelledby="declined-title" className="space-y-2 rounded-lg border border-ink-300 bg-white p-5" data-decided="declined">
        <h2 id="declined-title" className="text-2xl font-semibold text-ink-900">
          You declined this proposal
        </h2>
        <p className="text-lg text-ink-800">Thank you for letting {view.company.name} know. If you change your mind, contact them for a new proposal.</p>
      </section>
    );
  }
  return null;
}

/** What the route puts where the deposit goes once accepted (the deposits feature's block); features don't import each other. */
export type RenderDeposit = (props: DepositSlotProps) => React.ReactNode;

/** The homeowner's page: what we found, the picture, the options, and a clear way to accept one or decline. */
export function HomeownerPage({ token, renderDeposit }: { token: string; renderDeposit?: RenderDeposit }) {
  const query = useQuery(homeownerQueries.view(token));
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
  const isOpen = view.proposal.status === "sent" || view.proposal.status === "viewed";
  const fanCautions = view.cautions.filter((c) => c === FAN_SAFETY_CAUTION || c === COMBUSTION_SAFETY_CAUTION);
  const findings = view.before.flatMap((s) => (s.analysis?.findings ?? []).map((f) => ({ ...f, space: s.name })));
  const hasFanAnywhere = view.before.some((s) => s.analysis?.hasPoweredFan) || view.options.some((o) => o.hasPoweredFan);

  return (
    <div className="min-h-dvh bg-ink-25">
      <title>{`Your proposal from ${view.company.name}`}</title>
      <PublicHeader companyName={view.company.name} phone={view.company.phone} logoSrc={view.company.hasLogo ? publicLogoSrc(token) : null} />
      <main className="mx-auto max-w-3xl space-y-10 px-4 py-8 sm:px-6 sm:py-10">
        <div className="space-y-3">
          <p className="text-base font-medium text-ink-600">
            Proposal for {view.site.address} · valid until {formatDate(`${view.proposal.validUntil}T12:00:00`)}
          </p>
          <h1 className="text-3xl font-semibold tracking-tight text-ink-900">Hello {view.customer.firstName},</h1>
          {view.coverNote ? <p className="text-lg whitespace-pre-line text-ink-800">{view.coverNote}</p> : null}
          <p className="text-base text-ink-700">
            From {view.seller.name}, {view.company.name}
            {view.seller.email ? (
              <>
                {" "}
                ·{" "}
                <a className="font-medium text-ember-700 underline underline-offset-4" href={`mailto:${view.seller.email}`}>
                  {view.seller.email}
                </a>
              </>
            ) : null}
          </p>
        </div>

        <Decided token={token} view={view} renderDeposit={renderDeposit} />

        {view.proposal.status === "expired" ? <Alert severity="warning" title="This proposal has expired">Contact {view.company.name} for an up-to-date one.</Alert> : null}

        <Section id="found-title" title="What we found">
          <div className="space-y-3 text-lg text-ink-800">
            {view.explanation.map((p) => (
              <p key={p}>{p}</p>
            ))}
          </div>
          {findings.length > 0 ? (
            <ul className="space-y-3">
              {findings.map((f) => (
                <li key={`${f.space}-${f.code}`} className="space-y-2 rounded-md border border-ink-200 bg-white p-4">
                  <SeverityBadge severity={f.severity}>{f.severity === "critical" ? "Needs fixing" : f.severity === "warning" ? "Worth fixing" : "Good to know"}</SeverityBadge>
                  <p className="text-lg font-semibold text-ink-900">{f.title}</p>
                  {f.severity === "critical" ? (
                    <p className="text-base text-ink-700">{f.detail}</p>
                  ) : (
                    <details>
                      <summary className="flex min-h-touch cursor-pointer items-center text-base font-semibold text-ember-700">The details</summary>
                      <p className="text-base text-ink-700">{f.detail}</p>
                    </details>
                  )}
                </li>
              ))}
            </ul>
          ) : null}
        </Section>

        {view.photos.length > 0 ? (
          <Section id="photos-title" title={view.photos.length === 1 ? "A photo from the survey" : "Photos from the survey"}>
            <p className="text-base text-ink-700">Tap a photo to see it full size.</p>
            <PhotoGallery token={token} photos={view.photos} />
          </Section>
        ) : null}

        {view.before.map((space) => (
          <Section key={space.spaceId} id={`today-${space.spaceId}`} title={view.before.length > 1 ? `${space.name} today` : "How air moves through your attic today"}>
            {space.picture ? <AirflowPicture picture={space.picture} title={`Airflow in ${space.name} today`} /> : <p className="text-base text-ink-700">{space.issues.join(" ")}</p>}
            {space.analysis ? (
              <div className="space-y-3 rounded-lg border border-ink-200 bg-white p-4 sm:p-5">
                <h3 className="text-lg font-semibold text-ink-900">How much venting the code asks for</h3>
                {nfaSentences(space.analysis).map((s) => (
                  <p key={s} className="text-base text-ink-800">
                    {s}
                  </p>
                ))}
                <p className="text-base font-medium text-ink-900">{providedSentence(space.analysis, "today")}</p>
                {space.analysis.requirement.reasons.length > 0 ? (
                  <details>
                    <summary className="flex min-h-touch cursor-pointer items-center text-base font-semibold text-ember-700">Why this amount applies to your house</summary>
                    <ul className="mt-1 list-disc space-y-1 pl-5 text-base text-ink-700">
                      {space.analysis.requirement.reasons.map((r) => (
                        <li key={r}>{r}</li>
                      ))}
                    </ul>
                  </details>
                ) : null}
              </div>
            ) : null}
          </Section>
        ))}

        <Section id="options-title" title={view.options.length === 1 ? "What we propose" : `Your ${view.options.length} options`}>
          {view.options.length > 1 ? <p className="text-lg text-ink-800">Each option fixes the problems above in its own way. You choose one.</p> : null}
          <div className="space-y-6">
            {view.options.map((o, i) => (
              <OptionCard key={o.id} option={o} index={i} fanCautions={fanCautions} isChosen={view.proposal.acceptedOptionId === o.id} />
            ))}
          </div>
        </Section>

        {view.proposal.status !== "accepted" ? (
          <Section id="pdf-title" title="The proposal as a PDF">
            <p className="text-base text-ink-700">The same proposal in one document, to keep or print.</p>
            <PdfLink token={token} view={view} />
          </Section>
        ) : null}

        {isOpen ? (
          <Section id="decide-title" title="Your decision">
            <div className="space-y-8 rounded-lg border border-ink-200 bg-white p-4 shadow-card sm:p-6">
              <AcceptForm token={token} view={view} />
              <div className="space-y-3 border-t border-ink-100 pt-6">
                <p className="text-base text-ink-700">Not right for you? You can say no; nothing else will happen.</p>
                <DeclineForm token={token} companyName={view.company.name} />
              </div>
            </div>
          </Section>
        ) : null}

        <Section id="safety-title" title="Safety and the rules we follow">
          {hasFanAnywhere ? (
            <Alert severity="warning" title="About powered attic fans">
              A powered attic fan can pull air out of the rooms below and draw exhaust from a gas furnace or water heater back into the house. We check for this as part of the work.
            </Alert>
          ) : null}
          <ul className="list-disc space-y-2 pl-5 text-base text-ink-800">
            {view.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </Section>

        {view.terms ? (
          <Section id="terms-title" title="Terms">
            <p className="text-base whitespace-pre-line text-ink-800">{view.terms}</p>
          </Section>
        ) : null}

        {view.coolingOff.isEnabled ? (
          <Section id="cancel-title" title="Your right to cancel">
            <div className="space-y-2 rounded-md border border-ink-300 bg-white p-4 text-base text-ink-800" data-cooling-off>
              {view.coolingOff.notice.map((p, i) => (
                <p key={`${i}-${p.slice(0, 20)}`} className={p === p.toUpperCase() ? "pt-2 font-semibold text-ink-900" : undefined}>
                  {p}
                </p>
              ))}
            </div>
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
        </div>
      </footer>
    </div>
  );
}
