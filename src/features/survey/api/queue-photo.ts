import { outbox, type OutboxItem } from "@/lib/field/outbox";
import { spaceDraftKey } from "../lib/local-drafts";
import { surveyKeys } from "./queries";

export interface QueuePhotoInput {
  projectId: string;
  file: File;
  spaceId: string;
  ventId?: string;
  findingCode?: string;
  caption?: string;
  /** What it shows, in words ("Vent 2 (ridge vent)"), for the waiting list. */
  attachedTo: string;
}

/**
 * POST /api/projects/:id/photos (multipart) through the device queue: the photo is kept in
 * IndexedDB first, so it survives no signal, a reload or a closed tab, then uploaded with
 * progress. Its id is made here, so an upload sent twice is stored once. A photo of a vent waits
 * until the survey holding that vent has been saved (the server checks the vent exists).
 */
export async function queuePhoto(input: QueuePhotoInput): Promise<OutboxItem> {
  const photoId = crypto.randomUUID();
  const fields: Record<string, string> = { id: photoId, spaceId: input.spaceId };
  if (input.ventId) fields["ventId"] = input.ventId;
  if (input.findingCode) fields["findingCode"] = input.findingCode;
  if (input.caption) fields["caption"] = input.caption;
  return outbox.add({
    id: crypto.randomUUID(),
    group: "photo",
    label: `Photo: ${input.attachedTo}`,
    request: { kind: "upload", path: `/projects/${encodeURIComponent(input.projectId)}/photos`, fields, file: input.file, fileName: input.file.name || "photo.jpg" },
    after: input.ventId ? [spaceDraftKey(input.spaceId)] : [],
    refresh: [surveyKeys.detail(input.projectId)],
    tags: { kind: "photo", projectId: input.projectId, spaceId: input.spaceId, photoId, caption: input.caption ?? "", attachedTo: input.attachedTo },
  });
}
