import { useMutation } from "@tanstack/react-query";
import { SpaceRoofSchema } from "@shared/schemas/survey";
import { outbox, type OutboxItem } from "@/lib/field/outbox";
import { surveyKeys } from "./queries";
import type { SpaceRecord } from "./types";

/**
 * POST /api/projects/:id/spaces with an id made on this device, through the device queue: the space
 * exists here at once, with or without signal, and edits and photos can point at it before the
 * server has it. The queue sends it once (its id and Idempotency-Key make a second copy land on
 * the first), before anything queued after it.
 */
export async function queueNewSpace({ projectId, name }: { projectId: string; name: string }): Promise<SpaceRecord> {
  const spaceId = crypto.randomUUID();
  await outbox.add({
    id: crypto.randomUUID(),
    group: "change",
    label: `New attic space "${name}"`,
    request: { kind: "json", path: `/projects/${encodeURIComponent(projectId)}/spaces`, body: { id: spaceId, name }, idempotencyKey: crypto.randomUUID() },
    refresh: [surveyKeys.detail(projectId)],
    tags: { kind: "space", projectId, spaceId, name },
  });
  return pendingSpaceRecord(projectId, spaceId, name);
}

/** What the server will hold right after the creation: version 1, an empty survey. */
function pendingSpaceRecord(projectId: string, id: string, name: string, createdAt = new Date().toISOString()): SpaceRecord {
  return {
    id, projectId, name, position: Number.MAX_SAFE_INTEGER, version: 1, roof: SpaceRoofSchema.parse({}),
    sections: [], vents: [], site: {}, notes: null, createdAt, updatedAt: createdAt,
  };
}

/** The queued creation of a space, if it has not reached the server yet. */
export const pendingCreation = (spaceId: string, items: readonly OutboxItem[] = outbox.getState().items) =>
  items.find((i) => i.tags["kind"] === "space" && i.tags["spaceId"] === spaceId);

/** Spaces of a project created on this device and still waiting to be sent. */
export function pendingSpaces(projectId: string, items: readonly OutboxItem[] = outbox.getState().items): SpaceRecord[] {
  return items
    .filter((i) => i.tags["kind"] === "space" && i.tags["projectId"] === projectId)
    .map((i) => pendingSpaceRecord(projectId, i.tags["spaceId"] ?? "", i.tags["name"] ?? "New space", i.createdAt));
}

/** Saves of a space wait until its creation has arrived. */
export function whenSpaceExists(spaceId: string): Promise<void> {
  const item = pendingCreation(spaceId);
  return item ? outbox.whenSent(item.id) : Promise.resolve();
}

export function useQueueNewSpace() {
  // "always": keeping it on the device needs no signal.
  return useMutation({ mutationFn: queueNewSpace, networkMode: "always" });
}
