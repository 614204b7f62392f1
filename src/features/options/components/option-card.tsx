import { Link } from "react-router";
import { OPTION_TYPE_NAMES } from "@shared/design/index";
import { formatCents } from "@shared/pricing/index";
import type { UnitSystem } from "@shared/units/format";
import { Badge } from "@/components/ui/badge";
import { Button, buttonStyles } from "@/components/ui/button";
import { Card, CardBody, CardFooter, CardHeader } from "@/components/ui/card";
import { LockIcon } from "@/components/ui/icons";
import { paths } from "@/config/paths";
import { lockLabel } from "./signed-lock-notice";
import type { ProposalRecord, OptionRecord, SpaceAnalysisRecord } from "../api/types";
import { ComplianceBadge, FindingCounts, VentAreaFigures } from "./analysis-summary";

function SpaceLines({ spaces, unitSystem, isDetailed, onlySpaceId }: { spaces: SpaceAnalysisRecord[]; unitSystem: UnitSystem; isDetailed: boolean; onlySpaceId?: string }) {
  const shown = onlySpaceId ? spaces.filter((s) => s.spaceId === onlySpaceId) : spaces;
  return (
    <div className="space-y-4">
      {shown.map((s) => (
        <div key={s.spaceId} className="space-y-2">
          {spaces.length > 1 ? <h4 className="text-base font-semibold text-ink-900">{s.name}</h4> : null}
          {s.analysis ? (
            <>
              <div className="flex flex-wrap items-center gap-2">
                <ComplianceBadge analysis={s.analysis} />
              </div>
              {isDetailed ? <VentAreaFigures analysis={s.analysis} unitSystem={unitSystem} /> : null}
              <FindingCounts findings={s.analysis.findings} />
            </>
          ) : (
            <p className="text-base text-warning-900">! Not analysed: {s.issues[0]?.message ?? "the survey is incomplete."}</p>
          )}
        </div>
      ))}
    </div>
  );
}

export interface OptionCardProps {
  option: OptionRecord;
  unitSystem: UnitSystem;
  canEdit: boolean;
  onDelete: (option: OptionRecord) => void;
}

/** A saved option in the project's list: what it achieves, what it costs, where to go next. */
export function OptionCard({ option, unitSystem, canEdit, onDelete }: OptionCardProps) {
  const editHref = paths.app.projectOption.getHref(option.projectId, option.id);
  return (
    <Card className="flex flex-col" data-option-card={option.name}>
      <CardHeader>
        <div className="flex flex-wrap items-center gap-2">
          <Badge tone={option.isKept ? "brand" : "outline"}>{option.isKept ? "Offered" : "Draft, not offered"}</Badge>
          {option.origin === "generated" ? <Badge tone="neutral">Suggested</Badge> : null}
          {option.lock ? (
            <Badge tone="neutral" data-option-lock={option.lock.reason}>
              <LockIcon className="size-3.5" /> {lockLabel(option.lock)}
            </Badge>
          ) : null}
        </div>
        <h3 className="text-lg font-semibold text-ink-900">
          <Link to={editHref} className="hover:underline">
            {option.name}
          </Link>
        </h3>
      </CardHeader>
      <CardBody className="flex-1 space-y-4">
        <SpaceLines spaces={option.analysis.spaces} unitSystem={unitSystem} isDetailed={false} />
        {option.lock?.signedPrice ? (
          <p className="text-base">
            <span className="text-ink-700">Total as signed </span>
            <span className="text-xl font-semibold tabular-nums text-ink-900">{formatCents(option.lock.signedPrice.totalCents)}</span>
            <span className="text-sm text-ink-600"> incl. {formatCents(option.lock.signedPrice.taxCents)} tax</span>
          </p>
        ) : (
          <p className="text-base">
            <span className="text-ink-700">Total </span>
            <span className="text-xl font-semibold tabular-nums text-ink-900">{option.price ? formatCents(option.price.totalCents) : "—"}</span>
            {option.price ? <span className="text-sm text-ink-600"> incl. {formatCents(option.price.taxCents)} tax</span> : null}
          </p>
        )}
      </CardBody>
      <CardFooter className="sm:justify-start">
        <Link to={editHref} className={buttonStyles({ variant: "secondary", className: "w-full sm:w-auto" })}>
          {canEdit && !option.lock ? "Edit" : "Open"}
          <span className="sr-only"> {option.name}</span>
        </Link>
        <Link to={paths.app.projectOptionMaterials.getHref(option.projectId, option.id)} className={buttonStyles({ variant: "ghost", className: "w-full sm:w-auto" })}>
          Materials list<span className="sr-only"> for {option.name}</span>
        </Link>
        {canEdit && !option.lock ? (
          <Button variant="ghost" className="w-full text-critical-700 hover:bg-critical-50 sm:ml-auto sm:w-auto" onClick={() => onDelete(option)}>
            Delete<span className="sr-only"> {option.name}</span>
          </Button>
        ) : null}
      </CardFooter>
    </Card>
  );
}

export interface ProposalCardProps {
  proposal: ProposalRecord;
  unitSystem: UnitSystem;
  isKept: boolean;
  isKeeping: boolean;
  onKeep: () => void;
}

/** One suggestion from the generator: why these quantities, what it achieves, what it costs. */
export function ProposalCard({ proposal, unitSystem, isKept, isKeeping, onKeep }: ProposalCardProps) {
  const shownFirst = proposal.option.rationale.slice(0, 3);
  const rest = proposal.option.rationale.slice(3);
  const typeName = OPTION_TYPE_NAMES[proposal.type];
  return (
    <Card className="flex flex-col" data-proposal={proposal.option.name}>
      <CardHeader>
        <p className="text-sm font-medium text-ink-600">
          {proposal.spaceName}
          {typeName !== proposal.option.name ? ` · ${typeName}` : ""}
        </p>
        <h3 className="text-lg font-semibold text-ink-900">{proposal.option.name}</h3>
      </CardHeader>
      <CardBody className="flex-1 space-y-4">
        {shownFirst.length > 0 ? (
          <div className="space-y-2">
            <h4 className="text-base font-semibold text-ink-900">Why this design</h4>
            <ul className="list-disc space-y-1 pl-5 text-base text-ink-800">
              {shownFirst.map((sentence) => (
                <li key={sentence}>{sentence}</li>
              ))}
            </ul>
            {rest.length > 0 ? (
              <details className="rounded-md border border-ink-200 bg-ink-25 px-3 py-1">
                <summary className="min-h-touch cursor-pointer py-2.5 font-medium text-ink-900 md:min-h-0 md:py-2">
                  How each quantity was chosen ({rest.length} more)
                </summary>
                <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
                  {rest.map((sentence) => (
                    <li key={sentence}>{sentence}</li>
                  ))}
                </ul>
              </details>
            ) : null}
          </div>
        ) : null}
        <SpaceLines spaces={proposal.analysis.spaces} unitSystem={unitSystem} isDetailed onlySpaceId={proposal.spaceId} />
        {proposal.price ? (
          <dl className="grid grid-cols-3 gap-2 text-sm">
            <div>
              <dt className="text-ink-600">Subtotal</dt>
              <dd className="font-semibold tabular-nums">{formatCents(proposal.price.subtotalCents)}</dd>
            </div>
            <div>
              <dt className="text-ink-600">Tax</dt>
              <dd className="font-semibold tabular-nums">{formatCents(proposal.price.taxCents)}</dd>
            </div>
            <div>
              <dt className="text-ink-600">Total</dt>
              <dd className="text-lg font-semibold tabular-nums text-ink-900">{formatCents(proposal.price.totalCents)}</dd>
            </div>
          </dl>
        ) : (
          <p className="text-base text-warning-900">! No price: {proposal.priceIssue ?? "a line can't be priced."}</p>
        )}
      </CardBody>
      <CardFooter>
        <Button
          className="w-full sm:w-auto"
          variant={isKept ? "secondary" : "primary"}
          disabled={isKept}
          isLoading={isKeeping}
          loadingText="Keeping…"
          onClick={onKeep}
          aria-label={isKept ? `${proposal.option.name} kept` : `Keep ${proposal.option.name}`}
        >
          {isKept ? "✓ Kept" : "Keep this option"}
        </Button>
      </CardFooter>
    </Card>
  );
}
