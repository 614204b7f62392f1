import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { Link } from "react-router";
import { formatCents } from "@shared/pricing/index";
import type { UnitSystem } from "@shared/units/format";
import { Badge } from "@/components/ui/badge";
import { buttonStyles } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { EmptyState } from "@/components/ui/empty-state";
import { ChevronLeftIcon, ClipboardIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { optionQueries } from "../api/queries";
import type { CatalogRecord, OptionRecord, ProjectDetail } from "../api/types";
import { ComplianceBadge, FindingCounts, NotAnalysed, VentAreaFigures } from "../components/analysis-summary";
import { AirflowBeforeAfter } from "../components/airflow-before-after";
import { AirflowView } from "../components/airflow-view";
import { DEFAULT_ESTIMATE_CONDITIONS, type EstimateConditions } from "@shared/airflow-model/index";
import { analyzeOptionLive } from "../lib/live";

export interface ComparePageProps {
  projectId: string;
  unitSystem: UnitSystem;
}

/** The project's options side by side (a sideways scroller of cards on phones). */
export function ComparePage({ projectId, unitSystem }: ComparePageProps) {
  const projectQuery = useQuery(optionQueries.project(projectId));
  const optionsQuery = useQuery(optionQueries.list(projectId));
  const catalogQuery = useQuery(optionQueries.catalog());
  const conditionsQuery = useQuery(optionQueries.estimateConditions());
  const conditions = conditionsQuery.data ?? DEFAULT_ESTIMATE_CONDITIONS;
  const [hidden, setHidden] = useState<Set<string>>(new Set());

  if (projectQuery.isPending || optionsQuery.isPending || catalogQuery.isPending) return <LoadingBlock label="Lining up the options…" />;
  if (!projectQuery.data || !optionsQuery.data || !catalogQuery.data) {
    const error = projectQuery.error ?? optionsQuery.error ?? catalogQuery.error;
    return <EmptyState icon={<ClipboardIcon />} title="Couldn't load the options" description={error?.message} />;
  }
  const { project } = projectQuery.data;
  const options = optionsQuery.data;
  const shown = options.filter((o) => !hidden.has(o.id));

  return (
    <>
      <PageHeader
        documentTitle={`Compare options · ${project.title}`}
        eyebrow={
          <Link to={paths.app.projectOptions.getHref(projectId)} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> Design options · {project.title}
          </Link>
        }
        title="Compare options"
        description="What each option achieves against the code, and what it costs."
      />
      {options.length === 0 ? (
        <EmptyState icon={<ClipboardIcon />} title="No options to compare" description="Add or keep design options first." />
      ) : (
        <>
          <fieldset className="mb-6">
            <legend className="mb-1 text-base font-medium text-ink-900">Options shown</legend>
            <div className="flex flex-wrap gap-x-6">
              {options.map((o) => (
                <Checkbox
                  key={o.id}
                  label={o.name}
                  checked={!hidden.has(o.id)}
                  onChange={(e) =>
                    setHidden((prev) => {
                      const next = new Set(prev);
                      if (e.target.checked) next.delete(o.id);
                      else next.add(o.id);
                      return next;
                    })
                  }
                />
              ))}
            </div>
          </fieldset>
          <p className={shown.length > 3 ? "mb-2 text-sm text-ink-600" : "mb-2 text-sm text-ink-600 md:hidden"}>
            Swipe or scroll sideways to see each option.
          </p>
          <div
            role="region"
            aria-label="Options side by side"
            tabIndex={0}
            className="relative -mx-4 flex snap-x snap-mandatory gap-4 overflow-x-auto px-4 pb-4 sm:mx-0 sm:px-0"
          >
            {shown.map((option) => (
              <CompareCard
                key={option.id}
                option={option}
                detail={projectQuery.data}
                catalog={catalogQuery.data}
                unitSystem={unitSystem}
                count={shown.length}
                conditions={conditions}
                isDefaultConditions={!conditionsQuery.data}
              />
            ))}
          </div>
        </>
      )}
    </>
  );
}

interface CompareCardProps {
  option: OptionRecord;
  detail: ProjectDetail;
  catalog: CatalogRecord[];
  unitSystem: UnitSystem;
  count: number;
  conditions: EstimateConditions;
  isDefaultConditions: boolean;
}

function CompareCard({ option, detail, catalog, unitSystem, count, conditions, isDefaultConditions }: CompareCardProps) {
  // The picture needs the core's input for the attic after the work, so it is rebuilt here from the same shared code.
  const live = useMemo(() => analyzeOptionLive(detail.project, detail.spaces, option, catalog), [detail, option, catalog]);
  const price = option.price;
  return (
    <article
      aria-labelledby={`compare-${option.id}`}
      data-compare-option={option.name}
      className="w-[85vw] max-w-[30rem] shrink-0 snap-start space-y-5 rounded-lg border border-ink-200 bg-white p-5 shadow-card sm:w-[26rem]"
      style={count <= 3 ? { flex: "1 1 0", maxWidth: "none", minWidth: "min(85vw, 22rem)" } : undefined}
    >
      <header className="space-y-1">
        <Badge tone={option.isKept ? "brand" : "outline"}>{option.isKept ? "Offered" : "Draft, not offered"}</Badge>
        <h2 id={`compare-${option.id}`} className="text-xl font-semibold text-ink-900">
          <Link to={paths.app.projectOption.getHref(option.projectId, option.id)} className="hover:underline">
            {option.name}
          </Link>
        </h2>
      </header>

      {option.analysis.spaces.map((s) => {
        const l = live.find((x) => x.spaceId === s.spaceId);
        return (
          <section key={s.spaceId} className="space-y-3" aria-label={`${s.name} in ${option.name}`}>
            <h3 className="text-base font-semibold text-ink-900">{s.name}</h3>
            {s.analysis ? (
              <>
                <ComplianceBadge analysis={s.analysis} />
                <VentAreaFigures analysis={s.analysis} unitSystem={unitSystem} />
                <FindingCounts findings={s.analysis.findings} />
              </>
            ) : l && !l.after.result.ok ? (
              <NotAnalysed result={l.after.result} />
            ) : null}
            {l ? <AirflowBeforeAfter spaceName={s.name} before={l.before.input} after={l.after.input} conditions={conditions} isDefaultConditions={isDefaultConditions} /> : null}
            {l ? <AirflowView spaceName={s.name} after={l.after} hasToggle={false} /> : null}
          </section>
        );
      })}

      <section className="space-y-1" aria-label={`Price of ${option.name}`}>
        <h3 className="text-base font-semibold text-ink-900">Price</h3>
        {price ? (
          <dl className="text-base">
            {[
              ["Subtotal", formatCents(price.subtotalCents)],
              ...(price.discountCents > 0 ? [["Discount", `−${formatCents(price.discountCents)}`]] : []),
              ["Tax", formatCents(price.taxCents)],
            ].map(([label, value]) => (
              <div key={label} className="flex justify-between gap-3 py-0.5">
                <dt className="text-ink-700">{label}</dt>
                <dd className="tabular-nums">{value}</dd>
              </div>
            ))}
            <div className="flex justify-between gap-3 border-t border-ink-200 pt-2 text-lg font-semibold">
              <dt>Total</dt>
              <dd className="tabular-nums" data-testid="compare-total">
                {formatCents(price.totalCents)}
              </dd>
            </div>
            <div className="flex justify-between gap-3 py-0.5">
              <dt className="text-ink-700">Deposit at signing</dt>
              <dd className="tabular-nums">{formatCents(price.deposit.depositCents)}</dd>
            </div>
          </dl>
        ) : (
          <p className="text-base text-warning-900">! Not priced: {option.priceIssue}</p>
        )}
      </section>
      <Link to={paths.app.projectOptionMaterials.getHref(option.projectId, option.id)} className={buttonStyles({ variant: "ghost", className: "w-full" })}>
        Materials list<span className="sr-only"> for {option.name}</span>
      </Link>
    </article>
  );
}
