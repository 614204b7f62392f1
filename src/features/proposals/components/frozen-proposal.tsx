import type { ProposalSnapshot } from "@shared/proposals/types";
import { formatCents } from "@shared/pricing/index";
import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { OkIcon } from "@/components/ui/icons";
import { formatDate } from "@/lib/format-date";
import type { ProposalRecord } from "../api/types";

/** A sent revision exactly as frozen: what the homeowner sees and signs. */
export function FrozenProposal({ proposal, snapshot }: { proposal: ProposalRecord; snapshot: ProposalSnapshot }) {
  const acceptedId = proposal.acceptance?.optionId;
  return (
    <div className="space-y-6">
      <Card aria-labelledby="fz-letter">
        <CardHeader>
          <CardTitle id="fz-letter">For {snapshot.customer.name}</CardTitle>
          <CardDescription>
            {snapshot.site.address} · valid until {formatDate(`${snapshot.validUntil}T12:00:00`)} · prepared {formatDate(snapshot.preparedAt)} by {snapshot.seller.name}
          </CardDescription>
        </CardHeader>
        {snapshot.coverNote ? (
          <CardBody>
            <p className="text-base whitespace-pre-line text-ink-800">{snapshot.coverNote}</p>
          </CardBody>
        ) : null}
      </Card>
      {snapshot.options.map((o, i) => (
        <Card key={o.id} aria-labelledby={`fz-opt-${o.id}`} className={acceptedId === o.id ? "ring-2 ring-ok-600" : undefined}>
          <CardHeader>
            <div className="flex flex-wrap items-center gap-2">
              <CardTitle id={`fz-opt-${o.id}`}>
                Option {i + 1}: {o.name}
              </CardTitle>
              {acceptedId === o.id ? (
                <Badge tone="outline" className="text-ok-800">
                  <OkIcon className="size-4 text-ok-600" /> Chosen by the homeowner
                </Badge>
              ) : null}
            </div>
            {o.price ? (
              <CardDescription>
                Total <strong className="text-ink-900">{formatCents(o.price.totalCents)}</strong> · deposit {formatCents(o.price.depositCents)}
              </CardDescription>
            ) : null}
          </CardHeader>
          <CardBody>
            <ul className="list-disc space-y-1 pl-5 text-base text-ink-800">
              {o.scope.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </CardBody>
        </Card>
      ))}
      {snapshot.terms ? (
        <Card aria-labelledby="fz-terms">
          <CardHeader>
            <CardTitle id="fz-terms">Terms</CardTitle>
          </CardHeader>
          <CardBody>
            <p className="text-base whitespace-pre-line text-ink-800">{snapshot.terms}</p>
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
