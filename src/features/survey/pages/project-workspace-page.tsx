import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useLayoutEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { Link } from "react-router";
import { toAtticInput } from "@shared/survey/to-attic-input";
import type { UnitSystem } from "@shared/units/format";
import { tryAnalyzeAttic } from "@shared/ventilation/index";
import { Button } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { ConfirmDialog, Dialog, DialogClose, DialogContent } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { ChevronDownIcon, ChevronLeftIcon, ClipboardIcon, HouseIcon, PlusIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { buttonStyles } from "@/components/ui/button";
import { LoadingBlock } from "@/components/ui/spinner";
import { Tabs, tabId, tabPanelId } from "@/components/ui/tabs";
import { toast } from "@/components/ui/toaster";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { cn } from "@/lib/cn";
import { pendingSpaces, useQueueNewSpace } from "../api/create-space";
import { useDeleteSpace } from "../api/delete-space";
import { surveyKeys, surveyQueries } from "../api/queries";
import type { PhotoRecord, ProjectDetail, ProjectRecord, SpaceRecord } from "../api/types";
import { AnalysisPanel } from "../components/analysis-panel";
import { PhotosPanel } from "../components/photos-panel";
import { ProjectSaver } from "../components/project-saver";
import { SaveStatus } from "@/components/ui/save-status";
import { combineStates } from "../lib/save-states";
import { SpaceEditor } from "../components/space-editor";
import { SpaceSaver, type SpaceSaverInit } from "../components/space-saver";
import type { SaveState } from "@/lib/use-autosave";
import { useIsOnline } from "@/lib/use-is-online";
import { useMediaQuery } from "../hooks/use-media-query";
import { useStableJson } from "../hooks/use-stable-json";
import {
  buildSpace,
  copyVents,
  fingerprint,
  liveSurvey,
  spaceFromServer,
  ventName,
  type Problem,
  type SpaceDraft,
} from "../lib/drafts";
import {
  clearDraft,
  projectDraftKey,
  readDraft,
  readTypicalVents,
  spaceDraftKey,
  writeTypicalVents,
} from "../lib/local-drafts";
import { checkFields, fieldsFromRecord, type ProjectFields } from "../lib/project-fields";

export interface ProjectDetailsSlotProps {
  value: ProjectFields;
  onChange: (patch: Partial<ProjectFields>) => void;
  isReadOnly: boolean;
  errors: Partial<Record<keyof ProjectFields, string>>;
}

export interface ProjectWorkspacePageProps {
  projectId: string;
  unitSystem: UnitSystem;
  canEdit: boolean;
  /** The project details form (from the projects feature, composed by the route). */
  renderDetails: (props: ProjectDetailsSlotProps) => ReactNode;
}

/** The estimator's workspace for one project: details, attic spaces, photos and the live analysis. */
export function ProjectWorkspacePage(props: ProjectWorkspacePageProps) {
  const query = useQuery(surveyQueries.project(props.projectId));
  if (query.isPending && query.fetchStatus === "paused") {
    return (
      <EmptyState
        icon={<ClipboardIcon />}
        title="This project isn't on this device yet"
        description="With no signal, only projects opened here before can be read. Open it once with a connection, and it stays available offline."
        action={
          <Link to={paths.app.projects.getHref()} className="font-semibold text-ember-700 underline underline-offset-4">
            Back to projects
          </Link>
        }
      />
    );
  }
  if (query.isPending) return <LoadingBlock label="Opening the project…" />;
  // A failed refresh keeps the copy already shown (or kept on this device).
  if (query.isError && query.data === undefined) {
    const isMissing = isApiError(query.error) && query.error.status === 404;
    return (
      <EmptyState
        icon={<ClipboardIcon />}
        title={isMissing ? "This project isn't here" : "Couldn't open the project"}
        description={isMissing ? "It may have been removed, or the link is mistyped." : query.error.message}
        action={
          <Link to={paths.app.projects.getHref()} className="font-semibold text-ember-700 underline underline-offset-4">
            Back to projects
          </Link>
        }
      />
    );
  }
  return <Workspace key={props.projectId} detail={query.data!} {...props} />;
}

interface SpaceEntry {
  draft: SpaceDraft;
  init: SpaceSaverInit;
}

function initSpace(record: SpaceRecord, system: UnitSystem): SpaceEntry {
  const fromServer = spaceFromServer(record, system);
  const baseline = fingerprint(buildSpace(fromServer).survey);
  const lastSaved = { sections: record.sections, vents: record.vents, roof: record.roof };
  const local = readDraft<SpaceDraft>(spaceDraftKey(record.id));
  if (!local) return { draft: fromServer, init: { version: record.version, baseline, startInConflict: false, lastSaved } };
  // Edits from this device that were never sent: keep them. If the server moved on meanwhile, ask.
  const isSameAsServer = fingerprint(buildSpace(local.draft).survey) === baseline;
  const startInConflict = local.baseVersion !== record.version && !isSameAsServer;
  return { draft: local.draft, init: { version: startInConflict ? local.baseVersion : record.version, baseline, startInConflict, lastSaved } };
}

function initProject(record: ProjectRecord) {
  const fromServer = fieldsFromRecord(record);
  const baseline = fingerprint(checkFields(fromServer).payload);
  const local = readDraft<ProjectFields>(projectDraftKey(record.id));
  if (!local) return { fields: fromServer, init: { version: record.version, baseline, startInConflict: false } };
  const isSame = fingerprint(checkFields(local.draft).payload) === baseline;
  const startInConflict = local.baseVersion !== record.version && !isSame;
  return { fields: local.draft, init: { version: startInConflict ? local.baseVersion : record.version, baseline, startInConflict } };
}

const SPACE_NAME_IDEAS = ["Main attic", "Garage attic", "Bonus room attic", "Addition attic"];
/** One empty list for every space without typical vents, so the vent editor's props stay equal. */
const NO_TYPICAL_VENTS: string[] = [];

function Workspace({ detail, projectId, unitSystem, canEdit, renderDetails }: ProjectWorkspacePageProps & { detail: ProjectDetail }) {
  const queryClient = useQueryClient();
  const isOnline = useIsOnline();
  const [projectStart] = useState(() => initProject(detail.project));
  const [fields, setFields] = useState(projectStart.fields);
  // The server's spaces, then those created on this device that are still waiting to be sent.
  const [startSpaces] = useState(() => [...detail.spaces, ...pendingSpaces(projectId).filter((p) => !detail.spaces.some((s) => s.id === p.id))]);
  const [entries, setEntries] = useState<SpaceEntry[]>(() => startSpaces.map((s) => initSpace(s, unitSystem)));
  const [activeId, setActiveId] = useState<string | null>(() => startSpaces[0]?.id ?? null);
  const [phoneTab, setPhoneTab] = useState<"survey" | "analysis">("survey");
  // Tailwind's lg: from there up the analysis stands beside the form, below it only on its tab.
  const isSideBySide = useMediaQuery("(min-width: 64rem)");
  const [typical, setTypical] = useState<Record<string, string[]>>(() =>
    Object.fromEntries(startSpaces.map((s) => [s.id, readTypicalVents(s.id)])),
  );
  const [states, setStates] = useState<Record<string, { state: SaveState; problems: Problem[]; retry: () => void }>>({});
  const [resolveRequest, setResolveRequest] = useState(0);
  const [isDetailsOpen, setIsDetailsOpen] = useState(startSpaces.length === 0);
  const [isAdding, setIsAdding] = useState(false);
  const [newName, setNewName] = useState("");
  const [toDelete, setToDelete] = useState<SpaceEntry | null>(null);
  const createSpace = useQueueNewSpace();
  const deleteSpace = useDeleteSpace();
  const photosQuery = useQuery(surveyQueries.project(projectId));
  const photos: PhotoRecord[] = photosQuery.data?.photos ?? detail.photos;

  const checked = useMemo(() => checkFields(fields), [fields]);
  const active = entries.find((e) => e.draft.id === activeId) ?? entries[0] ?? null;
  // For the few handlers that need the whole list when they run, without changing on every edit.
  const entriesRef = useRef(entries);
  useLayoutEffect(() => {
    entriesRef.current = entries;
  });

  const onSpaceState = useCallback((spaceId: string, state: SaveState, problems: Problem[], retry: () => void) => {
    setStates((prev) => ({ ...prev, [spaceId]: { state, problems, retry } }));
  }, []);
  const onProjectState = useCallback((state: SaveState, retry: () => void) => {
    setStates((prev) => ({ ...prev, project: { state, problems: [], retry } }));
  }, []);
  const onProjectSaved = useCallback(
    (project: ProjectRecord) => {
      queryClient.setQueryData<ProjectDetail>(surveyKeys.detail(projectId), (old) => (old ? { ...old, project } : old));
      void queryClient.invalidateQueries({ queryKey: [...surveyKeys.all, "list"] });
    },
    [queryClient, projectId],
  );

  // Stable, and keyed by space id: a keystroke replaces one draft and leaves every other prop as it was.
  const updateDraft = useCallback((spaceId: string, update: (draft: SpaceDraft) => SpaceDraft) => {
    setEntries((list) => list.map((e) => (e.draft.id === spaceId ? { ...e, draft: update(e.draft) } : e)));
  }, []);
  const setDraft = useCallback((draft: SpaceDraft) => updateDraft(draft.id, () => draft), [updateDraft]);
  const setTypicalFor = useCallback((spaceId: string, ids: string[]) => {
    writeTypicalVents(spaceId, ids);
    setTypical((t) => ({ ...t, [spaceId]: ids }));
  }, []);
  const removeEntry = useCallback((spaceId: string) => {
    setEntries((list) => list.filter((e) => e.draft.id !== spaceId));
    setStates(({ [spaceId]: _gone, ...rest }) => rest);
    const next = entriesRef.current.find((e) => e.draft.id !== spaceId)?.draft.id ?? null;
    setActiveId((id) => (id === spaceId ? next : id));
  }, []);
  const copyVentsInto = useCallback(
    (toSpaceId: string, fromSpaceId: string) => {
      const from = entriesRef.current.find((e) => e.draft.id === fromSpaceId);
      if (!from) return;
      const copies = copyVents(from.draft.vents);
      updateDraft(toSpaceId, (draft) => ({ ...draft, vents: [...draft.vents, ...copies] }));
      toast.success(`${copies.length} vent${copies.length === 1 ? "" : "s"} copied from ${from.draft.name}`, {
        description: "Fan checks were not copied: each fan is checked on its own.",
      });
    },
    [updateDraft],
  );
  const askToDelete = useCallback((spaceId: string) => setToDelete(entriesRef.current.find((e) => e.draft.id === spaceId) ?? null), []);
  const patchFields = useCallback((patch: Partial<ProjectFields>) => setFields((f) => ({ ...f, ...patch })), []);

  function addSpace(name: string) {
    createSpace.mutate(
      { projectId, name },
      {
        onSuccess: (space) => {
          setEntries((list) => [...list, initSpace(space, unitSystem)]);
          setActiveId(space.id);
          setIsAdding(false);
          setNewName("");
          toast.success(`${space.name} added`, isOnline ? undefined : { description: "Kept on this device; it is sent when the signal returns." });
        },
        onError: (error) =>
          toast.error("Space not added", {
            description: `${error.message} This device couldn't keep it (storage full or turned off).`,
          }),
      },
    );
  }

  const activeDraft = active?.draft ?? null;
  const { codeBasis, climateZone, moistureRegime, ceilingVaporRetarder, roofColor } = fields;
  const upperShareBase = detail.project.upperShareBase;
  const analysis = useMemo(() => {
    if (!activeDraft) return null;
    const input = toAtticInput({ codeBasis, climateZone, moistureRegime, ceilingVaporRetarder, roofColor, upperShareBase }, liveSurvey(activeDraft));
    return { input, result: tryAnalyzeAttic(input) };
  }, [activeDraft, codeBasis, climateZone, moistureRegime, ceilingVaporRetarder, roofColor, upperShareBase]);

  const allStates = Object.values(states);
  const combined = combineStates(allStates.map((s) => s.state));
  const heldCount = allStates.reduce((n, s) => n + s.problems.length, 0);
  const activeProblems = useStableJson(
    activeDraft ? (states[activeDraft.id]?.problems ?? buildSpace(activeDraft).problems) : [],
  );

  const jumpTo = useCallback((partId: string) => {
    // From the phone's analysis tab back to the entry that needs finishing.
    setPhoneTab("survey");
    setTimeout(() => {
      const el = document.getElementById(`part-${partId}`);
      el?.scrollIntoView({ behavior: "smooth", block: "start" });
      el?.querySelector<HTMLElement>("input, select, textarea")?.focus({ preventScroll: true });
    }, 50);
  }, []);

  const findingOptions = useStableJson(
    analysis?.result.ok
      ? [...new Map(analysis.result.analysis.findings.map((f) => [f.code, f.title])).entries()].map(([value, label]) => ({ value, label }))
      : [],
  );
  // The photos panel shows only the active space's photos, so only its vents and name are needed.
  const activeSpaceId = active?.draft.id ?? null;
  const activeName = active?.draft.name ?? "";
  const activeVents = active?.draft.vents;
  const describeAttachment = useCallback(
    (photo: PhotoRecord) => {
      const space = photo.spaceId === activeSpaceId && activeVents ? { name: activeName, vents: activeVents } : undefined;
      if (photo.ventId) {
        const index = space?.vents.findIndex((v) => v.id === photo.ventId) ?? -1;
        return space && index >= 0 ? ventName(space.vents[index]!, index) : "A vent no longer listed";
      }
      if (photo.findingCode) return findingOptions.find((f) => f.value === photo.findingCode)?.label ?? `Finding: ${photo.findingCode.replace(/-/g, " ")}`;
      return space ? `${space.name} in general` : "The project";
    },
    [activeSpaceId, activeName, activeVents, findingOptions],
  );
  const ventOptions = useMemo(() => (activeVents ?? []).map((v, i) => ({ value: v.id, label: ventName(v, i) })), [activeVents]);
  // Built here only when its inputs change, so typing a length doesn't touch the photos.
  const photosPanel = useMemo(
    () =>
      activeSpaceId ? (
        <PhotosPanel
          projectId={projectId}
          spaceId={activeSpaceId}
          spaceName={activeName || "This space"}
          photos={photos}
          canEdit={canEdit}
          vents={ventOptions}
          findings={findingOptions}
          describeAttachment={describeAttachment}
        />
      ) : null,
    [projectId, activeSpaceId, activeName, photos, canEdit, ventOptions, findingOptions, describeAttachment],
  );
  const otherSpaces = useStableJson(
    entries
      .filter((e) => e.draft.id !== activeSpaceId)
      .map((e) => ({ id: e.draft.id, name: e.draft.name, ventCount: e.draft.vents.length })),
  );
  const detailsForm = useMemo(
    () => (isDetailsOpen ? renderDetails({ value: fields, onChange: patchFields, isReadOnly: !canEdit, errors: checked.errors }) : null),
    [isDetailsOpen, renderDetails, fields, patchFields, canEdit, checked.errors],
  );

  const spaceTabs = entries.map((e) => {
    const s = states[e.draft.id]?.state.kind;
    return { value: e.draft.id, label: e.draft.name.trim() || "Unnamed space", badge: s && s !== "saved" && s !== "saving" ? "· not saved" : undefined };
  });

  return (
    <>
      <PageHeader
        documentTitle={fields.title || "Project"}
        eyebrow={
          <Link to={paths.app.projects.getHref()} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> Projects
          </Link>
        }
        title={fields.title || "Untitled project"}
        description={[detail.customer?.name, fields.siteAddress].filter(Boolean).join(" · ")}
        actions={
          <Link to={paths.app.projectOptions.getHref(projectId)} className={buttonStyles({ variant: "secondary" })}>
            Design options
          </Link>
        }
      />

      <ProjectSaver
        projectId={projectId}
        fields={fields}
        init={projectStart.init}
        isReadOnly={!canEdit}
        resolveRequest={resolveRequest}
        onState={onProjectState}
        onReplace={setFields}
        onSaved={onProjectSaved}
      />
      {entries.map((e) => (
        <SpaceSaver
          key={e.draft.id}
          projectId={projectId}
          draft={e.draft}
          init={e.init}
          unitSystem={unitSystem}
          isReadOnly={!canEdit}
          resolveRequest={resolveRequest}
          onState={onSpaceState}
          onReplaceDraft={setDraft}
          onGone={removeEntry}
        />
      ))}

      {/* Always in view: whether the work is saved, and on phones the survey / analysis switch. */}
      <div className="sticky top-14 z-10 -mx-4 mb-4 border-b border-ink-200 bg-ink-50/95 px-4 backdrop-blur-sm sm:-mx-6 sm:px-6 md:top-16 lg:-mx-8 lg:px-8">
        {canEdit ? (
          <SaveStatus
            state={combined}
            thing="survey"
            keptOn="device"
            isOnline={isOnline}
            heldCount={heldCount}
            onRetry={() => allStates.forEach((s) => s.retry())}
            onResolve={() => setResolveRequest((n) => n + 1)}
          />
        ) : (
          <p className="flex min-h-touch items-center text-sm font-medium text-ink-700 sm:text-base">Read only: owners and estimators change the survey.</p>
        )}
        <Tabs
          label="Survey or analysis"
          idBase="workspace"
          isFullWidth
          className="-mx-1 border-b-0 lg:hidden"
          items={[
            { value: "survey", label: "Survey" },
            {
              value: "analysis",
              label: "Analysis",
              badge: analysis?.result.ok ? `· ${analysis.result.analysis.findings.filter((f) => f.severity === "critical").length} critical` : undefined,
            },
          ]}
          value={phoneTab}
          onChange={(tab) => {
            setPhoneTab(tab);
            // Start the other view at its top, not at the scroll depth of the one left.
            const top = document.getElementById("workspace-top");
            if (top && top.getBoundingClientRect().top < 0) top.scrollIntoView({ block: "start" });
          }}
        />
      </div>
      <div id="workspace-top" className="scroll-mt-40" />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] lg:items-start">
        <div
          role="tabpanel"
          id={tabPanelId("workspace", "survey")}
          aria-labelledby={tabId("workspace", "survey")}
          className={cn("min-w-0 space-y-5", phoneTab !== "survey" && "max-lg:hidden")}
        >
          <Card>
            <button
              type="button"
              aria-expanded={isDetailsOpen}
              onClick={() => setIsDetailsOpen((v) => !v)}
              className="flex min-h-touch w-full items-center justify-between gap-3 px-5 py-4 text-left sm:px-6"
            >
              <span>
                <span className="block text-lg font-semibold text-ink-900">Project details</span>
                <span className="block text-sm text-ink-600">
                  Climate zone {fields.climateZone}
                  {fields.moistureRegime ?? ""} · {fields.roofColor} roof · status {fields.status}
                </span>
              </span>
              <ChevronDownIcon className={cn("size-6 text-ink-600 transition-transform", isDetailsOpen && "rotate-180")} />
            </button>
            {isDetailsOpen ? <CardBody className="border-t border-ink-100">{detailsForm}</CardBody> : null}
          </Card>

          <section aria-labelledby="spaces-title" className="space-y-3">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <h2 id="spaces-title" className="text-xl font-semibold text-ink-900">
                Attic spaces
              </h2>
              {canEdit ? (
                <Button variant="secondary" size="sm" icon={<PlusIcon />} onClick={() => setIsAdding(true)}>
                  Add space
                </Button>
              ) : null}
            </div>
            {entries.length === 0 ? (
              <EmptyState
                headingLevel="h3"
                icon={<HouseIcon />}
                title="No attic spaces yet"
                description="Add one space for each separately vented attic: the main attic, a garage attic, an addition."
                action={
                  canEdit ? (
                    <>
                      <Button icon={<PlusIcon />} onClick={() => addSpace("Main attic")} isLoading={createSpace.isPending}>
                        Add "Main attic"
                      </Button>
                      <Button variant="secondary" onClick={() => setIsAdding(true)}>
                        Another name…
                      </Button>
                    </>
                  ) : null
                }
              />
            ) : (
              <Tabs label="Attic spaces" idBase="spaces" items={spaceTabs} value={active?.draft.id ?? ""} onChange={setActiveId} />
            )}
          </section>

          {active ? (
            <div role="tabpanel" id={tabPanelId("spaces", active.draft.id)} aria-labelledby={tabId("spaces", active.draft.id)}>
              <SpaceEditor
                key={active.draft.id}
                draft={active.draft}
                onUpdate={updateDraft}
                unitSystem={unitSystem}
                isReadOnly={!canEdit}
                typicalIds={typical[active.draft.id] ?? NO_TYPICAL_VENTS}
                onTypicalChange={setTypicalFor}
                otherSpaces={otherSpaces}
                onCopyFrom={copyVentsInto}
                onDelete={askToDelete}
                photos={photosPanel}
              />
            </div>
          ) : null}
        </div>

        <aside
          role="tabpanel"
          id={tabPanelId("workspace", "analysis")}
          aria-labelledby={tabId("workspace", "analysis")}
          aria-label="Analysis"
          className={cn(
            "min-w-0 rounded-lg border border-ink-200 bg-ink-25 p-4 sm:p-5 lg:sticky lg:top-36 lg:max-h-[calc(100dvh-10rem)] lg:overflow-y-auto",
            phoneTab !== "analysis" && "max-lg:hidden",
          )}
        >
          {activeDraft && analysis ? (
            <AnalysisPanel
              spaceName={activeDraft.name || "This space"}
              input={analysis.input}
              result={analysis.result}
              problems={activeProblems}
              unitSystem={unitSystem}
              onJumpTo={jumpTo}
              isShown={isSideBySide || phoneTab === "analysis"}
            />
          ) : (
            <p className="text-base text-ink-700">Add an attic space to see its ventilation check here.</p>
          )}
        </aside>
      </div>

      <Dialog open={isAdding} onOpenChange={setIsAdding}>
        {isAdding ? (
          <DialogContent
            title="Add an attic space"
            description="One for each separately vented attic."
            footer={
              <>
                <DialogClose asChild>
                  <Button variant="secondary" className="w-full sm:w-auto">
                    Cancel
                  </Button>
                </DialogClose>
                <Button
                  className="w-full sm:w-auto"
                  isLoading={createSpace.isPending}
                  disabled={newName.trim() === ""}
                  onClick={() => addSpace(newName.trim())}
                >
                  Add space
                </Button>
              </>
            }
          >
            <form
              onSubmit={(event) => {
                event.preventDefault();
                if (newName.trim()) addSpace(newName.trim());
              }}
              className="space-y-3"
            >
              <TextField label="Name" value={newName} maxLength={120} onChange={(event) => setNewName(event.target.value)} autoFocus />
              <div className="flex flex-wrap gap-2">
                {SPACE_NAME_IDEAS.filter((n) => !entries.some((e) => e.draft.name === n)).map((idea) => (
                  <Button key={idea} variant="ghost" size="sm" className="border border-ink-300" onClick={() => setNewName(idea)}>
                    {idea}
                  </Button>
                ))}
              </div>
            </form>
          </DialogContent>
        ) : null}
      </Dialog>

      <ConfirmDialog
        open={toDelete !== null}
        onOpenChange={(open) => (open ? undefined : setToDelete(null))}
        title={`Delete ${toDelete?.draft.name || "this space"}?`}
        description={`Its measurements, ${toDelete?.draft.vents.length ?? 0} vents and checklist are removed. Its photos stay on the project.`}
        confirmLabel="Delete space"
        confirmVariant="danger"
        isPending={deleteSpace.isPending}
        onConfirm={() => {
          if (!toDelete) return;
          const id = toDelete.draft.id;
          deleteSpace.mutate(
            { projectId, spaceId: id },
            {
              onSuccess: () => {
                clearDraft(spaceDraftKey(id));
                writeTypicalVents(id, []);
                removeEntry(id);
                setToDelete(null);
                toast.success("Space deleted");
                void queryClient.invalidateQueries({ queryKey: surveyKeys.detail(projectId) });
              },
              onError: (error) => toast.error("Space not deleted", { description: error.message }),
            },
          );
        }}
      />
    </>
  );
}
