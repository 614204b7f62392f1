import { useQueryClient } from "@tanstack/react-query";
import { memo, useEffect, useState } from "react";
import { surveyQueries } from "../api/queries";
import { saveProject } from "../api/save-project";
import type { ProjectRecord } from "../api/types";
import { useAutosave, type SaveState } from "@/lib/use-autosave";
import { fingerprint } from "../lib/drafts";
import { clearDraft, projectDraftKey, writeDraft } from "../lib/local-drafts";
import { checkFields, fieldsFromRecord, type ProjectFields } from "../lib/project-fields";
import { ConflictDialog } from "./conflict-dialog";

export interface ProjectSaverProps {
  projectId: string;
  fields: ProjectFields;
  init: { version: number; baseline: string; startInConflict: boolean };
  isReadOnly: boolean;
  resolveRequest: number;
  onState: (state: SaveState, retry: () => void) => void;
  onReplace: (fields: ProjectFields) => void;
  onSaved: (project: ProjectRecord) => void;
}

const describe = (f: ProjectFields) => `"${f.title}", climate zone ${f.climateZone}${f.moistureRegime ?? ""}, status ${f.status}.`;

/** Saves the project details in the background, with the same rules as a space. */
export const ProjectSaver = memo(function ProjectSaver({ projectId, fields, init, isReadOnly, resolveRequest, onState, onReplace, onSaved }: ProjectSaverProps) {
  const queryClient = useQueryClient();
  const checked = checkFields(fields);
  const { state, isDirty, saveNow, resolve, getVersion } = useAutosave({
    scopeId: `project:${projectId}`,
    payload: isReadOnly ? null : checked.payload,
    blockedReason: isReadOnly ? null : checked.blockedReason,
    baseline: init.baseline,
    initialVersion: init.version,
    startInConflict: init.startInConflict,
    send: (payload, version) => saveProject(projectId, { ...payload, version }),
    versionOf: (project: ProjectRecord) => project.version,
    onSaved: (project) => onSaved(project),
  });

  const mustKeep = isDirty || checked.payload === null || state.kind === "conflict";
  useEffect(() => {
    if (isReadOnly) return;
    if (mustKeep) writeDraft(projectDraftKey(projectId), getVersion(), fields);
    else clearDraft(projectDraftKey(projectId));
  }, [fields, mustKeep, isReadOnly, projectId, getVersion]);

  const stateKey = JSON.stringify(state);
  useEffect(() => onState(JSON.parse(stateKey) as SaveState, saveNow), [stateKey, onState, saveNow]);

  const [theirs, setTheirs] = useState<ProjectRecord | null>(null);
  const [dismissedAt, setDismissedAt] = useState<number | null>(null);
  const isConflict = state.kind === "conflict";
  useEffect(() => {
    if (!isConflict) return;
    let isCurrent = true;
    void queryClient
      .fetchQuery({ ...surveyQueries.project(projectId), staleTime: 0 })
      .then((detail) => (isCurrent ? setTheirs(detail.project) : undefined))
      .catch(() => undefined);
    return () => {
      isCurrent = false;
    };
  }, [isConflict, queryClient, projectId]);

  if (!isConflict) return null;
  return (
    <ConflictDialog
      open={dismissedAt === null || resolveRequest > dismissedAt}
      what="the project details"
      theirs={theirs ? { summary: describe(fieldsFromRecord(theirs)), savedAt: theirs.updatedAt } : null}
      mine={describe(fields)}
      onDismiss={() => setDismissedAt(resolveRequest)}
      onLoadTheirs={() => {
        if (!theirs) return;
        const next = fieldsFromRecord(theirs);
        resolve("theirs", theirs.version, fingerprint(checkFields(next).payload));
        onReplace(next);
        setTheirs(null);
      }}
      onKeepMine={() => {
        if (!theirs) return;
        resolve("mine", theirs.version, fingerprint(checkFields(fieldsFromRecord(theirs)).payload));
        setTheirs(null);
      }}
    />
  );
});
