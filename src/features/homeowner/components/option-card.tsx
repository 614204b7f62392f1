import type { SnapshotOption } from "@shared/proposals/types";
import { formatCents } from "@shared/pricing/index";
import { homeownerNotes } from "@shared/proposals/homeowner-words";
import { AirflowPicture } from "@/components/airflow/airflow-picture";
import { Alert } from "@/components/ui/alert";
import { OkIcon, WarningIcon } from "@/components/ui/icons";
import { cn } from "@/lib/cn";
import { providedSentence } from "../lib/nfa-words";

export interface OptionCardProps {
  option: SnapshotOption;
  index: number;
  isChosen?: boolean;
}

/** One option as the homeowner weighs it: what we'd do, what the attic looks like after, the price and deposit. */
export function OptionCard({ option, index, isChosen }: OptionCardProps) {
  const price = option.price;
  return (
    <article
      aria-label={`Option ${index + 1}: ${option.name}`}
      data-option={index + 1}
      className={cn("overflow-hidden rounded-lg border bg-white shadow-card", isChosen ? "border-ok-600 ring-2 ring-ok-600" : "border-ink-200")}
    >
      {isChosen ? (
        <p className="flex items-center gap-1.5 border-b border-ink-100 bg-ok-50 px-4 py-3 text-base font-semibold text-ok-900 sm:px-6">
          <OkIcon className="size-5 text-ok-600" aria-hidden /> The option you accepted
        </p>
      ) : null}
      <div className="space-y-5 px-4 py-5 sm:px-6">
        {price ? (
          <dl className="grid grid-cols-2 gap-3">
            <div className="rounded-md bg-ink-50 px-3 py-2">
              <dt className="text-sm text-ink-700">Total price</dt>
              <dd className="text-2xl font-semibold text-ink-900 tabular-nums">{formatCents(price.totalCents)}</dd>
            </div>
            <div className="rounded-md bg-ink-50 px-3 py-2">
              <dt className="text-sm text-ink-700">Deposit when you sign</dt>
              <dd className="text-2xl font-semibold text-ink-900 tabular-nums">{formatCents(price.depositCents)}</dd>
            </div>
          </dl>
        ) : (
          <p className="text-base text-ink-700">Price to be confirmed.</p>
        )}

        <section aria-label={`What we would do in option ${index + 1}`}>
          <h4 className="mb-2 text-base font-semibold text-ink-900">What we would do</h4>
          <ul className="list-disc space-y-1.5 pl-5 text-base text-ink-800">
            {option.scope.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          {homeownerNotes(option.notes) ? <p className="mt-3 text-base whitespace-pre-line text-ink-800">{homeownerNotes(option.notes)}</p> : null}
        </section>

        {option.hasPoweredFan ? (
          <Alert severity="warning" title="This option includes a powered attic fan">
            It includes a safety test of your gas appliances with the fan running; see “Safety and the rules we follow”.
          </Alert>
        ) : null}

        {option.after.map((space) => (
          <section key={space.spaceId} aria-label={`${space.name} after option ${index + 1}`} className="space-y-3">
            <h4 className="text-base font-semibold text-ink-900">{option.after.length > 1 ? `${space.name} after the work` : "Your attic after the work"}</h4>
            {space.analysis ? (
              <p className="flex items-start gap-2 text-base text-ink-800">
                {space.analysis.compliant ? <OkIcon className="mt-0.5 size-5 shrink-0 text-ok-600" /> : <WarningIcon className="mt-0.5 size-5 shrink-0 text-warning-600" />}
                {providedSentence(space.analysis, "after")}
              </p>
            ) : null}
            {space.picture ? <AirflowPicture picture={space.picture} title={`Airflow in ${space.name} after option ${index + 1}`} /> : null}
          </section>
        ))}

        {price ? (
          <details className="rounded-md border border-ink-200 px-3 py-2">
            <summary className="flex min-h-touch cursor-pointer items-center text-base font-semibold text-ink-900">How the price adds up</summary>
            <table className="mt-2 w-full text-base">
              <tbody>
                {price.lines.map((l, i) => (
                  <tr key={`${l.description}-${i}`} className="border-b border-ink-100">
                    <td className="py-1.5 pr-3 text-ink-800">{l.description}</td>
                    <td className="py-1.5 text-right text-ink-900 tabular-nums">{formatCents(l.totalCents)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <ul className="mt-3 space-y-1 text-sm text-ink-700">
              {price.explanation.map((e) => (
                <li key={e}>{e}</li>
              ))}
            </ul>
          </details>
        ) : null}
      </div>
    </article>
  );
}
