import { useQuery, useQueryClient } from "@tanstack/react-query";
import { OPTION_NOTES_MAX_CHARS } from "@shared/proposals/limits";
import { useCallback, useMemo, useState } from "react";
import { Link } from "react-router";
import { catalogLaborHours } from "@shared/design/index";
import { formatCents } from "@shared/pricing/index";
import type { UnitSystem } from "@shared/units/format";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui/card";
import { Checkbox } from "@/components/ui/checkbox";
import { Dialog, DialogContent } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { TextArea, TextField } from "@/components/ui/field";
import { ChevronLeftIcon, ClipboardIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { getOption } from "../api/get-option";
import { optionKeys, optionQueries } from "../api/queries";
import type { CatalogRecord, OptionRecord, ProjectDetail } from "../api/types";
import { updateOption } from "../api/update-option";
import { FindingsList } from "@/components/findings/findings-list";
import { ComplianceBadge, ComplianceReasons, FindingCounts, NotAnalysed, VentAreaFigures } from "../components/analysis-summary";
import { AirflowView } from "../components/airflow-view";
import { PriceSummary } from "../components/price-summary";
import { SaveStatus } from "@/components/ui/save-status";
import { SpacePlanEditor } from "../components/space-plan-editor";
import { TermsEditor } from "../components/terms-editor";
import { SignedLockNotice } from "../components/signed-lock-notice";
import { fingerprint, useAutosave } from "@/lib/use-autosave";
import { buildOption, draftFromOption, type OptionDraft, type OptionPayload } from "../lib/draft";
import { analyzeOptionLive, priceOptionLive, pricingFrom } from "../lib/live";
import { centsToText } from "../lib/money";

export interface OptionEditorPageProps {
  projectId: string;
  optionId: string;
  unitSystem: UnitSystem;
  canEdit: boolean;
}

/** One design option: the work per space, labour and discount, with the analysis and price live. */
export function OptionEditorPage(props: OptionEditorPageProps) {
  const projectQuery = useQuery(optionQueries.project(props.projectId));
  const optionQuery = useQuery(optionQueries.detail(props.optionId));
  const catalogQuery = useQuery(optionQueries.catalog());
  if (projectQuery.isPending || optionQuery.isPending || catalogQuery.isPending) return <LoadingBlock label="Opening the option…" />;
  const error = projectQuery.error ?? optionQuery.error ?? catalogQuery.error;
  if (error || !projectQuery.data || !optionQuery.data || !catalogQuery.data) {
    const isMissing = isApiError(error) && error.status === 404;
    return (
      <EmptyState
        icon={<ClipboardIcon />}
        title={isMissing ? "This option isn't here" : "Couldn't open the option"}
        description={isMissing ? "It may have been deleted, or the link is mistyped." : error?.message}
        action={
          <Link to={paths.app.projectOptions.getHref(props.projectId)} className={buttonStyles({ variant: "secondary" })}>
            Back to the options
          </Link>
        }
      />
    );
  }
  return <Editor key={props.optionId} {...props} detail={projectQuery.data} option={optionQuery.data} catalog={catalogQuery.data} />;
}

interface EditorProps extends OptionEditorPageProps {
  detail: ProjectDetail;
  option: OptionRecord;
  catalog: CatalogRecord[];
}

const payloadFingerprint = (option: OptionPayload, spaces: ProjectDetail["spaces"], catalog: CatalogRecord[]) =>
  fingerprint(buildOption(draftFromOption(option, spaces), catalog).option);

function Editor({ projectId, optionId, unitSystem, canEdit, detail, option, catalog }: EditorProps) {
  const queryClient = useQueryClient();
  const { project, spaces } = detail;
  const [draft, setDraft] = useState<OptionDraft>(() => draftFromOption(option, spaces));
  const [saved, setSaved] = useState<OptionRecord>(option);
  const [conflict, setConflict] = useState<{ isOpen: boolean; theirs: OptionRecord | null }>({ isOpen: false, theirs: null });
  // Signed work is read-only for everyone; the notice says what to do instead.
  const isReadOnly = !canEdit || option.lock !== null;

  const built = useMemo(() => buildOption(draft, catalog), [draft, catalog]);
  const live = useMemo(() => analyzeOptionLive(project, spaces, built.option, catalog), [project, spaces, built.option, catalog]);
  const livePrice = useMemo(() => priceOptionLive(built.option, catalog, pricingFrom(saved.price)), [built.option, catalog, saved.price]);

  const onSaved = useCallback(
    (record: OptionRecord) => {
      setSaved(record);
      queryClient.setQueryData(optionKeys.detail(record.id), record);
      void queryClient.invalidateQueries({ queryKey: optionKeys.list(projectId) });
      void queryClient.invalidateQueries({ queryKey: optionKeys.materials(record.id) });
    },
    [queryClient, projectId],
  );
  const autosave = useAutosave<OptionPayload, OptionRecord>({
    scopeId: `option:${optionId}`,
    payload: isReadOnly || built.problems.length > 0 ? null : built.option,
    blockedReason: isReadOnly ? null : (built.problems[0]?.message ?? null),
    baseline: payloadFingerprint(option, spaces, catalog),
    initialVersion: option.version,
    send: (payload, version) => updateOption(optionId, payload, version),
    versionOf: (r) => r.version,
    onSaved,
  });

  const openConflict = useCallback(() => {
    setConflict({ isOpen: true, theirs: null });
    getOption(optionId)
      .then((theirs) => setConflict({ isOpen: true, theirs }))
      .catch(() => setConflict({ isOpen: false, theirs: null }));
  }, [optionId]);
  const isConflict = autosave.state.kind === "conflict";

  const patch = (p: Partial<OptionDraft>) => setDraft((d) => ({ ...d, ...p }));
  const laborItem = catalog.find((i) => i.kind === "labor" && i.isActive);
  const defaultRate = laborItem ? centsToText(laborItem.sellPriceCents) : "";
  const isPriceCurrent = !autosave.isDirty && fingerprint(built.option) === payloadFingerprint(saved, spaces, catalog);
  const deposit = isPriceCurrent && saved.price ? { cents: saved.price.deposit.depositCents } : null;
  const allCompliant = live.every((s) => !s.after.result.ok || s.after.result.analysis.compliant) && live.some((s) => s.after.result.ok);

  return (
    <>
      <PageHeader
        documentTitle={`${draft.name || "Option"} · ${project.title}`}
        eyebrow={
          <Link to={paths.app.projectOptions.getHref(projectId)} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> Design options · {project.title}
          </Link>
        }
        title={draft.name || "Untitled option"}
        description={project.siteAddress}
        actions={
          <>
            <Link to={paths.app.projectOptionMaterials.getHref(projectId, optionId)} className={buttonStyles({ variant: "secondary" })}>
              Materials list
            </Link>
            <Link to={paths.app.projectOptionsCompare.getHref(projectId)} className={buttonStyles({ variant: "secondary" })}>
              Compare options
            </Link>
          </>
        }
      />
      {option.lock ? (
        <SignedLockNotice lock={option.lock} optionId={optionId} projectId={projectId} canEdit={canEdit} />
      ) : canEdit ? (
        <div className="-mt-3 mb-4">
          <SaveStatus state={autosave.state} thing="option" onRetry={autosave.saveNow} onResolve={openConflict} />
        </div>
      ) : (
        <Alert severity="info" className="mb-4">
          You can look at this option; your role doesn't change design options.
        </Alert>
      )}

      {/* Phones: the result stays in view while editing further down. */}
      <a
        href="#option-results"
        className="sticky top-16 z-10 mb-4 flex min-h-touch items-center justify-between gap-3 rounded-lg border border-ink-200 bg-white px-4 py-2 shadow-card lg:hidden"
        aria-label="Jump to the live results"
      >
        <span className="text-sm font-semibold" data-live-compliance={allCompliant ? "yes" : "no"}>
          {allCompliant ? "✓ Meets the code minimum" : "✗ Does not meet the code minimum"}
        </span>
        <span className="text-base font-semibold tabular-nums">{livePrice.price ? formatCents(livePrice.price.totalCents) : "—"}</span>
      </a>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,30rem)] lg:gap-8">
        <div className="space-y-6">
          <Card>
            <CardHeader>
              <CardTitle>Option</CardTitle>
            </CardHeader>
            <CardBody className="space-y-4">
              <fieldset disabled={isReadOnly} className="space-y-4">
                <TextField
                  label="Name"
                  value={draft.name}
                  error={built.problems.find((p) => p.key === "name")?.message}
                  onChange={(e) => patch({ name: e.target.value })}
                />
                <Checkbox
                  label="Offer this option to the homeowner"
                  description="Options not offered stay here as drafts to compare."
                  checked={draft.isKept}
                  onChange={(e) => patch({ isKept: e.target.checked })}
                />
                <TextArea label="Notes" isOptional rows={3} maxLength={OPTION_NOTES_MAX_CHARS} value={draft.notes} onChange={(e) => patch({ notes: e.target.value })} />
              </fieldset>
              {option.rationale.length > 0 ? (
                <details className="rounded-md border border-ink-200 bg-ink-25 px-3 py-1">
                  <summary className="min-h-touch cursor-pointer py-2.5 font-medium text-ink-900 md:min-h-0 md:py-2">Why the quantities were suggested</summary>
                  <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
                    {option.rationale.map((s) => (
                      <li key={s}>{s}</li>
                    ))}
                  </ul>
                </details>
              ) : null}
            </CardBody>
          </Card>

          {spaces.map((space) => {
            const plan = draft.spaces.find((s) => s.spaceId === space.id);
            if (!plan) return null;
            return (
              <SpacePlanEditor
                key={space.id}
                space={space}
                plan={plan}
                catalog={catalog}
                isReadOnly={isReadOnly}
                onChange={(next) => setDraft((d) => ({ ...d, spaces: d.spaces.map((s) => (s.spaceId === next.spaceId ? next : s)) }))}
              />
            );
          })}
          <TermsEditor draft={draft} isReadOnly={isReadOnly} defaultRate={defaultRate} catalogHours={catalogLaborHours(built.option.spaces, catalog)} onChange={patch} />
        </div>

        <aside id="option-results" aria-label="Live results" className="space-y-6 lg:sticky lg:top-20 lg:max-h-[calc(100dvh-6rem)] lg:self-start lg:overflow-y-auto lg:pr-1">
          {built.problems.length > 0 ? (
            <Alert severity="warning" title="Left out until fixed">
              <ul className="list-disc pl-5">
                {built.problems.map((p) => (
                  <li key={p.key}>{p.message}</li>
                ))}
              </ul>
            </Alert>
          ) : null}
          {live.map((s) => (
            <Card key={s.spaceId} data-live-space={s.name}>
              <CardHeader>
                <CardTitle>After the work · {s.name}</CardTitle>
              </CardHeader>
              <CardBody className="space-y-4">
                {s.after.result.ok ? (
                  <>
                    <ComplianceBadge analysis={s.after.result.analysis} />
                    <ComplianceReasons analysis={s.after.result.analysis} />
                    <VentAreaFigures analysis={s.after.result.analysis} unitSystem={unitSystem} />
                    <div className="space-y-2">
                      <h3 className="text-base font-semibold text-ink-900">Findings</h3>
                      <FindingCounts findings={s.after.result.analysis.findings} />
                      <details className="rounded-md border border-ink-200 bg-white px-3 py-1">
                        <summary className="min-h-touch cursor-pointer py-2.5 font-medium text-ink-900 md:min-h-0 md:py-2">Each finding</summary>
                        <div className="pt-1 pb-3">
                          <FindingsList findings={s.after.result.analysis.findings} emptyText="Nothing to flag in this space after the work." />
                        </div>
                      </details>
                    </div>
                  </>
                ) : (
                  <NotAnalysed result={s.after.result} />
                )}
                <AirflowView spaceName={s.name} before={s.before} after={s.after} />
              </CardBody>
            </Card>
          ))}
          <Card>
            <CardHeader>
              <CardTitle>Price</CardTitle>
            </CardHeader>
            <CardBody>
              <PriceSummary price={livePrice.price} issue={livePrice.issue} deposit={deposit} isDepositPending={!isPriceCurrent} showLines />
            </CardBody>
          </Card>
        </aside>
      </div>

      <Dialog open={isConflict && conflict.isOpen} onOpenChange={(open) => (open ? undefined : setConflict({ isOpen: false, theirs: null }))}>
        <DialogContent
          title="Someone else changed this option"
          description="A newer version was saved after you started editing. Choose which to keep."
          footer={
            <>
              <Button
                variant="secondary"
                className="w-full sm:w-auto"
                disabled={!conflict.theirs}
                onClick={() => {
                  const theirs = conflict.theirs!;
                  setDraft(draftFromOption(theirs, spaces));
                  setSaved(theirs);
                  autosave.resolve("theirs", theirs.version, payloadFingerprint(theirs, spaces, catalog));
                  setConflict({ isOpen: false, theirs: null });
                }}
              >
                Load their changes
              </Button>
              <Button
                className="w-full sm:w-auto"
                disabled={!conflict.theirs}
                onClick={() => {
                  const theirs = conflict.theirs!;
                  autosave.resolve("mine", theirs.version, payloadFingerprint(theirs, spaces, catalog));
                  setConflict({ isOpen: false, theirs: null });
                }}
              >
                Keep mine (overwrite)
              </Button>
            </>
          }
        >
          {conflict.theirs ? (
            <dl className="space-y-3 text-base">
              <div>
                <dt className="font-semibold text-ink-900">Their version</dt>
                <dd className="text-ink-800">
                  {conflict.theirs.name}, total {conflict.theirs.price ? formatCents(conflict.theirs.price.totalCents) : "not priced"}
                </dd>
              </div>
              <div>
                <dt className="font-semibold text-ink-900">Yours, on this page</dt>
                <dd className="text-ink-800">
                  {built.option.name}, total {livePrice.price ? formatCents(livePrice.price.totalCents) : "not priced"}
                </dd>
              </div>
            </dl>
          ) : (
            <LoadingBlock label="Fetching the newer version…" className="py-6" />
          )}
        </DialogContent>
      </Dialog>
    </>
  );
}
