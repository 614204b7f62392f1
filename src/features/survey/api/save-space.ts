import type { SpaceSurvey } from "@shared/schemas/survey";
import { apiClient } from "@/lib/api-client";
import { whenSpaceExists } from "./create-space";
import type { SpaceRecord } from "./types";

/** PUT /api/projects/:id/spaces/:spaceId — the whole survey of one space, with its version (409 when stale). */
export async function saveSpace(projectId: string, spaceId: string, survey: SpaceSurvey, version: number): Promise<SpaceRecord> {
  // A space made on this device with no signal: its creation goes first.
  await whenSpaceExists(spaceId);
  const { space } = await apiClient.put<{ space: SpaceRecord }>(
    `/projects/${encodeURIComponent(projectId)}/spaces/${encodeURIComponent(spaceId)}`,
    { ...survey, version },
  );
  return space;
}
