import { useQueryClient } from "@tanstack/react-query";
import { memo, useEffect, useMemo, useState } from "react";
import type { SpaceRoof } from "@shared/schemas/survey";
import type { UnitSystem } from "@shared/units/format";
import type { Section, Vent } from "@shared/ventilation/index";
import { surveyKeys, surveyQueries } from "../api/queries";
import { saveSpace } from "../api/save-space";
import type { ProjectDetail, SpaceRecord } from "../api/types";
import { useAutosave, type SaveState } from "@/lib/use-autosave";
import { buildSpace, fingerprint, spaceFromServer, type Problem, type SpaceDraft } from "../lib/drafts";
import { clearDraft, spaceDraftKey, writeDraft } from "../lib/local-drafts";
import { mergeSpace, spaceDifferences, type Side } from "../lib/merge-space";
import { ConflictDialog } from "./conflict-dialog";

export interface SpaceSaverInit {
  version: number;
  baseline: string;
  startInConflict: boolean;
  lastSaved: { sections: Section[]; vents: Vent[]; roof: SpaceRoof };
}

export interface SpaceSaverProps {
  projectId: string;
  draft: SpaceDraft;
  init: SpaceSaverInit;
  unitSystem: UnitSystem;
  isReadOnly: boolean;
  /** Conflict choice requested from the status line. */
  resolveRequest: number;
  onState: (spaceId: string, state: SaveState, problems: Problem[], retry: () => void) => void;
  onReplaceDraft: (draft: SpaceDraft) => void;
  onGone: (spaceId: string) => void;
}

const describe = (s: { name: string; sections: unknown[]; vents: unknown[] }) =>
  `"${s.name}" with ${s.sections.length} section${s.sections.length === 1 ? "" : "s"} and ${s.vents.length} vent${s.vents.length === 1 ? "" : "s"}.`;

/** Saves one attic space in the background; renders only the conflict dialog when needed. */
export const SpaceSaver = memo(function SpaceSaver({ projectId, draft, init, unitSystem, isReadOnly, resolveRequest, onState, onReplaceDraft, onGone }: SpaceSaverProps) {
  const queryClient = useQueryClient();
  const [lastSaved, setLastSaved] = useState(init.lastSaved);
  const built = useMemo(() => buildSpace(draft, lastSaved), [draft, lastSaved]);
  const autosave = useAutosave({
    scopeId: `space:${draft.id}`,
    payload: isReadOnly ? null : built.survey,
    blockedReason: isReadOnly ? null : built.blockedReason,
    baseline: init.baseline,
    initialVersion: init.version,
    startInConflict: init.startInConflict,
    send: (survey, version) => saveSpace(projectId, draft.id, survey, version),
    versionOf: (space: SpaceRecord) => space.version,
    onSaved: (space) => {
      setLastSaved({ sections: space.sections, vents: space.vents, roof: space.roof });
      // The device copy then opens on what was saved, also after a reload with no signal.
      queryClient.setQueryData<ProjectDetail>(surveyKeys.detail(projectId), (old) =>
        old ? { ...old, spaces: old.spaces.some((s) => s.id === space.id) ? old.spaces.map((s) => (s.id === space.id ? space : s)) : [...old.spaces, space] } : old,
      );
    },
  });
  const { state, isDirty, saveNow, resolve, getVersion } = autosave;

  // Unsent edits and unfinished entries stay in this browser until the server has them.
  const mustKeep = isDirty || built.problems.length > 0 || state.kind === "conflict";
  useEffect(() => {
    if (isReadOnly) return;
    if (mustKeep) writeDraft(spaceDraftKey(draft.id), getVersion(), draft);
    else clearDraft(spaceDraftKey(draft.id));
  }, [draft, mustKeep, isReadOnly, getVersion]);

  const stateKey = JSON.stringify(state);
  const problemsKey = JSON.stringify(built.problems);
  useEffect(() => {
    onState(draft.id, JSON.parse(stateKey) as SaveState, JSON.parse(problemsKey) as Problem[], saveNow);
  }, [draft.id, stateKey, problemsKey, onState, saveNow]);

  // The newer copy, fetched when a conflict shows.
  const [theirs, setTheirs] = useState<SpaceRecord | null | "gone">(null);
  // Closed without choosing at request n; the status line's button raises the request to reopen it.
  const [dismissedAt, setDismissedAt] = useState<number | null>(null);
  const [choices, setChoices] = useState<Record<string, Side>>({});
  const isDialogOpen = dismissedAt === null || resolveRequest > dismissedAt;
  const isConflict = state.kind === "conflict";
  useEffect(() => {
    if (!isConflict) return;
    let isCurrent = true;
    void queryClient
      .fetchQuery({ ...surveyQueries.project(projectId), staleTime: 0 })
      .then((detail) => {
        if (isCurrent) setTheirs(detail.spaces.find((s) => s.id === draft.id) ?? "gone");
      })
      .catch(() => undefined);
    return () => {
      isCurrent = false;
    };
  }, [isConflict, queryClient, projectId, draft.id]);

  if (!isConflict) return null;
  const server = theirs && theirs !== "gone" ? theirs : null;
  const differences = server ? spaceDifferences(draft, server, unitSystem) : [];
  return (
    <ConflictDialog
      open={isDialogOpen}
      what={draft.name || "this attic space"}
      theirs={server ? { summary: describe(server), savedAt: server.updatedAt } : null}
      mine={describe(draft)}
      isGone={theirs === "gone"}
      onDismiss={() => setDismissedAt(resolveRequest)}
      onRemoveHere={() => {
        clearDraft(spaceDraftKey(draft.id));
        onGone(draft.id);
      }}
      onLoadTheirs={() => {
        if (!server) return;
        const next = spaceFromServer(server, unitSystem);
        setLastSaved({ sections: server.sections, vents: server.vents, roof: server.roof });
        resolve("theirs", server.version, fingerprint(buildSpace(next).survey));
        onReplaceDraft(next);
        setTheirs(null);
      }}
      onKeepMine={() => {
        if (!server) return;
        resolve("mine", server.version, fingerprint(buildSpace(spaceFromServer(server, unitSystem)).survey));
        setTheirs(null);
      }}
      parts={{
        differences,
        choices,
        onChoose: (key, side) => setChoices((c) => ({ ...c, [key]: side })),
        onSave: () => {
          if (!server) return;
          // The chosen parts become this device's draft, saved over their version.
          onReplaceDraft(mergeSpace(draft, server, choices, unitSystem));
          setLastSaved({ sections: server.sections, vents: server.vents, roof: server.roof });
          resolve("mine", server.version, fingerprint(buildSpace(spaceFromServer(server, unitSystem)).survey));
          setTheirs(null);
          setChoices({});
        },
      }}
    />
  );
});
