import { OPTION_TYPE_NAMES } from "@shared/design/index";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate } from "react-router";
import type { UnitSystem } from "@shared/units/format";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { ChartIcon, ChevronLeftIcon, ClipboardIcon, PlusIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { useCreateOption } from "../api/create-option";
import { useDeleteOption } from "../api/delete-option";
import { useGenerateOptions } from "../api/generate-options";
import { optionQueries } from "../api/queries";
import type { GenerateResult, OptionRecord } from "../api/types";
import { OptionCard, ProposalCard } from "../components/option-card";

export interface OptionsPageProps {
  projectId: string;
  unitSystem: UnitSystem;
  canEdit: boolean;
}

/** A project's design options: the saved ones, and the generator's suggestions to keep. */
export function OptionsPage({ projectId, unitSystem, canEdit }: OptionsPageProps) {
  const navigate = useNavigate();
  const projectQuery = useQuery(optionQueries.project(projectId));
  const optionsQuery = useQuery(optionQueries.list(projectId));
  const generate = useGenerateOptions();
  const create = useCreateOption();
  const remove = useDeleteOption();
  const [suggestions, setSuggestions] = useState<GenerateResult | null>(null);
  const [keptIndexes, setKeptIndexes] = useState<Set<number>>(new Set());
  const [keepingIndex, setKeepingIndex] = useState<number | null>(null);
  const [toDelete, setToDelete] = useState<OptionRecord | null>(null);

  if (projectQuery.isPending || optionsQuery.isPending) return <LoadingBlock label="Opening the design options…" />;
  if (projectQuery.isError || optionsQuery.isError) {
    const error = projectQuery.error ?? optionsQuery.error;
    const isMissing = isApiError(error) && error.status === 404;
    return (
      <EmptyState
        icon={<ClipboardIcon />}
        title={isMissing ? "This project isn't here" : "Couldn't open the design options"}
        description={isMissing ? "It may have been removed, or the link is mistyped." : error?.message}
        action={
          <Link to={paths.app.projects.getHref()} className={buttonStyles({ variant: "secondary" })}>
            Back to projects
          </Link>
        }
      />
    );
  }
  const { project, spaces } = projectQuery.data;
  const options = optionsQuery.data;

  function suggest() {
    generate.mutate(
      { projectId },
      {
        onSuccess: (result) => {
          setSuggestions(result);
          setKeptIndexes(new Set());
          if (result.proposals.length === 0) toast.info("No options could be suggested", { description: "The reasons are listed on the page." });
        },
        onError: (error) => toast.error("Couldn't suggest options", { description: error.message }),
      },
    );
  }

  function keep(index: number) {
    const proposal = suggestions?.proposals[index];
    if (!proposal) return;
    setKeepingIndex(index);
    create.mutate(
      { projectId, input: { ...proposal.option, isKept: true } },
      {
        onSuccess: (saved) => {
          setKeptIndexes((prev) => new Set(prev).add(index));
          toast.success(`${saved.name} kept`, { description: "It is saved with the project's options." });
        },
        onError: (error) => toast.error("Not kept", { description: error.message }),
        onSettled: () => setKeepingIndex(null),
      },
    );
  }

  function newOption() {
    create.mutate(
      {
        projectId,
        input: { name: `Option ${options.length + 1}`, notes: null, spaces: [], laborLines: [], discount: { kind: "none" }, isKept: true, origin: "manual", rationale: [] },
      },
      {
        onSuccess: (saved) => void navigate(paths.app.projectOption.getHref(projectId, saved.id)),
        onError: (error) => toast.error("Option not added", { description: error.message }),
      },
    );
  }

  const hasSurvey = spaces.some((s) => s.sections.length > 0);
  return (
    <>
      <PageHeader
        documentTitle={`Design options · ${project.title}`}
        eyebrow={
          <Link to={paths.app.project.getHref(projectId)} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> {project.title}
          </Link>
        }
        title="Design options"
        description={`Ways to fix the ventilation at ${project.siteAddress}, each analysed against the code and priced from the catalog.`}
        actions={
          <>
            {canEdit ? (
              <Button onClick={suggest} isLoading={generate.isPending} loadingText="Working out options…" disabled={!hasSurvey}>
                Suggest options
              </Button>
            ) : null}
            {canEdit ? (
              <Button variant="secondary" icon={<PlusIcon />} onClick={newOption} isLoading={create.isPending && keepingIndex === null}>
                New option
              </Button>
            ) : null}
            <Link to={paths.app.projectProposals.getHref(projectId)} className={buttonStyles({ variant: "secondary" })}>
              Proposals
            </Link>
            {options.length > 0 ? (
              <Link to={paths.app.projectOptionsCompare.getHref(projectId)} className={buttonStyles({ variant: "secondary" })}>
                <ChartIcon /> Compare options
              </Link>
            ) : null}
          </>
        }
      />

      {!hasSurvey ? (
        <Alert severity="info" title="Survey the attic first" className="mb-6">
          Options start from the surveyed attic. Add the attic floor and vents on the{" "}
          <Link to={paths.app.project.getHref(projectId)} className="font-semibold underline underline-offset-4">
            project page
          </Link>
          .
        </Alert>
      ) : null}

      {suggestions ? (
        <section aria-labelledby="suggestions-title" className="mb-10 space-y-4">
          <div className="flex flex-wrap items-end justify-between gap-3">
            <div className="space-y-1">
              <h2 id="suggestions-title" className="text-xl font-semibold text-ink-900">
                Suggested options
              </h2>
              <p className="max-w-reading text-base text-ink-700">
                Worked out from the survey and the catalog, each with one type of exhaust vent. Nothing is saved until you keep it.
              </p>
            </div>
            <Button variant="ghost" onClick={() => setSuggestions(null)}>
              Hide suggestions
            </Button>
          </div>
          {suggestions.proposals.length > 0 ? (
            <div className="grid gap-4 lg:grid-cols-2 2xl:grid-cols-3">
              {suggestions.proposals.map((proposal, index) => (
                <ProposalCard
                  key={`${proposal.spaceId}-${proposal.type}`}
                  proposal={proposal}
                  unitSystem={unitSystem}
                  isKept={keptIndexes.has(index)}
                  isKeeping={keepingIndex === index}
                  onKeep={() => keep(index)}
                />
              ))}
            </div>
          ) : null}
          {suggestions.skipped.length > 0 ? (
            <div className="rounded-lg border border-ink-200 bg-white p-4">
              <h3 className="text-base font-semibold text-ink-900">Not suggested</h3>
              <ul className="mt-2 list-disc space-y-1 pl-5 text-base text-ink-800">
                {suggestions.skipped.map((s) => (
                  <li key={`${s.spaceId}-${s.type}`}>
                    <span className="font-medium">
                      {s.spaceName}, “{OPTION_TYPE_NAMES[s.type]}”:
                    </span>{" "}
                    {s.reason}
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
        </section>
      ) : null}

      <section aria-labelledby="saved-title" className="space-y-4">
        <h2 id="saved-title" className="text-xl font-semibold text-ink-900">
          Saved options <span className="font-normal text-ink-600">({options.length})</span>
        </h2>
        {options.length === 0 ? (
          <EmptyState
            headingLevel="h3"
            icon={<ClipboardIcon />}
            title="No design options yet"
            description={canEdit ? "Suggest options from the survey, or start one by hand." : "The estimator or salesperson adds options here."}
          />
        ) : (
          <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
            {options.map((option) => (
              <OptionCard key={option.id} option={option} unitSystem={unitSystem} canEdit={canEdit} onDelete={setToDelete} />
            ))}
          </div>
        )}
      </section>

      <ConfirmDialog
        open={toDelete !== null}
        onOpenChange={(open) => (open ? undefined : setToDelete(null))}
        title={`Delete ${toDelete?.name ?? "this option"}?`}
        description="It is removed from the project. Proposals already sent keep their own copy."
        confirmLabel="Delete option"
        confirmVariant="danger"
        isPending={remove.isPending}
        onConfirm={() =>
          toDelete &&
          remove.mutate(
            { optionId: toDelete.id, projectId },
            {
              onSuccess: () => {
                toast.success(`${toDelete.name} deleted`);
                setToDelete(null);
              },
              onError: (error) => toast.error("Not deleted", { description: error.message }),
            },
          )
        }
      />
    </>
  );
}
