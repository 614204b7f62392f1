import { useRef, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { CloseIcon, PlusIcon } from "@/components/ui/icons";
import { Select } from "@/components/ui/select";
import { Progress } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { useDeletePhoto } from "../api/delete-photo";
import { useUpdatePhotoCaption } from "../api/update-photo";
import { outbox, type OutboxItem } from "@/lib/field/outbox";
import { useOutbox } from "@/lib/field/use-outbox";
import type { PhotoRecord } from "../api/types";
import { queuePhoto } from "../api/queue-photo";

export interface AttachOption {
  value: string;
  label: string;
}

export interface PhotosPanelProps {
  projectId: string;
  spaceId: string;
  spaceName: string;
  photos: PhotoRecord[];
  /** Saved vents of this space (a photo can point only at a vent the server knows). */
  vents: AttachOption[];
  /** Finding and checklist codes to attach a photo to. */
  findings: AttachOption[];
  canEdit: boolean;
  describeAttachment: (photo: PhotoRecord) => string;
}

const MAX_BYTES = 15 * 1024 * 1024;

/** Photos of this space: take one with the phone camera or choose a file, attach it, caption it. */
export function PhotosPanel({ projectId, spaceId, spaceName, photos, vents, findings, canEdit, describeAttachment }: PhotosPanelProps) {
  const cameraRef = useRef<HTMLInputElement>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [attachTo, setAttachTo] = useState("space");
  const [caption, setCaption] = useState("");
  const [isKeeping, setIsKeeping] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [toDelete, setToDelete] = useState<PhotoRecord | null>(null);
  const remove = useDeletePhoto(projectId);
  const updateCaption = useUpdatePhotoCaption(projectId);
  const [editing, setEditing] = useState<{ id: string; text: string } | null>(null);
  const queue = useOutbox();

  function choose(list: FileList | null) {
    const chosen = list?.[0] ?? null;
    setError(null);
    if (chosen && chosen.size > MAX_BYTES) {
      setError(`That photo is ${(chosen.size / 1024 / 1024).toFixed(1)} MB; the limit is 15 MB. Choose a smaller one.`);
      return;
    }
    setFile(chosen);
  }

  /** Kept on the device first (no signal needed), then uploaded by the device queue. */
  async function upload() {
    if (!file) return;
    setError(null);
    setIsKeeping(true);
    const [kind, id] = attachTo.split(":");
    try {
      await queuePhoto({
        projectId,
        file,
        spaceId,
        ventId: kind === "vent" ? id : undefined,
        findingCode: kind === "finding" ? id : undefined,
        caption: caption.trim() || undefined,
        attachedTo:
          kind === "vent" ? (vents.find((v) => v.value === id)?.label ?? "a vent")
          : kind === "finding" ? (findings.find((f) => f.value === id)?.label ?? "a finding")
          : `${spaceName} in general`,
      });
      toast.success(navigator.onLine ? "Photo added" : "Photo kept on this device", {
        description: navigator.onLine ? undefined : "It uploads when the signal returns.",
      });
      setFile(null);
      setCaption("");
      if (cameraRef.current) cameraRef.current.value = "";
      if (fileRef.current) fileRef.current.value = "";
    } catch (e) {
      setError(`The photo could not be kept on this device: ${e instanceof Error ? e.message : "storage is full or turned off"}.`);
    } finally {
      setIsKeeping(false);
    }
  }

  const waiting = queue.items.filter(
    (i) => i.tags["kind"] === "photo" && i.tags["projectId"] === projectId && i.tags["spaceId"] === spaceId && !photos.some((p) => p.id === i.tags["photoId"]),
  );
  const shown = photos.filter((p) => p.spaceId === spaceId);
  const attachOptions: AttachOption[] = [
    { value: "space", label: `${spaceName} in general` },
    ...vents.map((v) => ({ value: `vent:${v.value}`, label: `Vent: ${v.label}` })),
    ...findings.map((f) => ({ value: `finding:${f.value}`, label: `Finding: ${f.label}` })),
  ];

  return (
    <div className="space-y-4">
      {canEdit ? (
        <div className="space-y-3 rounded-lg border border-ink-200 bg-ink-25 p-4">
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" icon={<PlusIcon />} onClick={() => cameraRef.current?.click()}>
              Take a photo
            </Button>
            <Button variant="ghost" onClick={() => fileRef.current?.click()}>
              Choose a file
            </Button>
            <input
              ref={cameraRef}
              type="file"
              accept="image/*"
              capture="environment"
              className="sr-only"
              tabIndex={-1}
              aria-label="Take a photo with the camera"
              onChange={(event) => choose(event.target.files)}
            />
            <input
              ref={fileRef}
              type="file"
              accept="image/*"
              className="sr-only"
              tabIndex={-1}
              aria-label="Photo file"
              onChange={(event) => choose(event.target.files)}
            />
          </div>
          {file ? (
            <div className="space-y-3">
              <p className="text-sm text-ink-800">
                Chosen: <span className="font-medium break-all">{file.name}</span> ({Math.max(1, Math.round(file.size / 1024))} KB)
              </p>
              <div className="grid gap-3 sm:grid-cols-2">
                <Select label="Attach to" options={attachOptions} value={attachTo} onChange={(event) => setAttachTo(event.target.value)} />
                <TextField label="Caption" isOptional value={caption} maxLength={500} onChange={(event) => setCaption(event.target.value)} />
              </div>
              <div className="flex flex-wrap gap-2">
                <Button onClick={upload} isLoading={isKeeping}>
                  Add photo
                </Button>
                <Button variant="ghost" onClick={() => setFile(null)}>
                  Cancel
                </Button>
              </div>
            </div>
          ) : (
            <p className="text-sm text-ink-700">JPEG, PNG, WebP or HEIC up to 15 MB.</p>
          )}
          {error ? <Alert severity="critical">{error}</Alert> : null}
        </div>
      ) : null}
      {waiting.length > 0 ? (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label={`Photos of ${spaceName} waiting to upload`}>
          {waiting.map((item) => (
            <WaitingPhoto key={item.id} item={item} progress={queue.sending?.id === item.id ? queue.sending.progress : null} canEdit={canEdit} />
          ))}
        </ul>
      ) : null}
      {shown.length === 0 ? (
        waiting.length === 0 ? <p className="text-base text-ink-700">No photos of this space yet.</p> : null
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label={`Photos of ${spaceName}`}>
          {shown.map((photo) => (
            <li key={photo.id} className="overflow-hidden rounded-lg border border-ink-200 bg-white">
              <a href={photo.url} target="_blank" rel="noreferrer" className="block bg-ink-100">
                <img
                  src={photo.thumbUrl}
                  alt={photo.caption || `Photo: ${describeAttachment(photo)}`}
                  loading="lazy"
                  className="aspect-[4/3] w-full object-cover"
                />
              </a>
              <div className="space-y-1 p-2.5">
                {editing?.id === photo.id ? (
                  <form
                    className="space-y-2"
                    onSubmit={(event) => {
                      event.preventDefault();
                      updateCaption.mutate(
                        { photoId: photo.id, caption: editing.text.trim() || null },
                        { onSuccess: () => setEditing(null), onError: (e) => toast.error("Caption not saved", { description: e.message }) },
                      );
                    }}
                  >
                    <TextField label="Caption" value={editing.text} maxLength={500} onChange={(event) => setEditing({ id: photo.id, text: event.target.value })} />
                    <div className="flex gap-2">
                      <Button type="submit" size="sm" isLoading={updateCaption.isPending}>
                        Save
                      </Button>
                      <Button variant="ghost" size="sm" onClick={() => setEditing(null)}>
                        Cancel
                      </Button>
                    </div>
                  </form>
                ) : (
                  <p className="text-sm font-medium text-ink-900">{photo.caption || <span className="text-ink-500">No caption</span>}</p>
                )}
                <p className="text-xs text-ink-600">{describeAttachment(photo)}</p>
                {canEdit && editing?.id !== photo.id ? (
                  <Button variant="ghost" size="sm" className="-ml-2" onClick={() => setEditing({ id: photo.id, text: photo.caption ?? "" })}>
                    Edit caption
                  </Button>
                ) : null}
                {canEdit ? (
                  <Button
                    variant="ghost"
                    size="sm"
                    icon={<CloseIcon />}
                    className="-ml-2 text-critical-700 hover:bg-critical-50"
                    onClick={() => setToDelete(photo)}
                  >
                    Delete
                  </Button>
                ) : null}
              </div>
            </li>
          ))}
        </ul>
      )}
      <ConfirmDialog
        open={toDelete !== null}
        onOpenChange={(open) => (open ? undefined : setToDelete(null))}
        title="Delete this photo?"
        description={toDelete?.caption ? `"${toDelete.caption}" is removed from the project for everyone.` : "It is removed from the project for everyone."}
        confirmLabel="Delete photo"
        confirmVariant="danger"
        isPending={remove.isPending}
        onConfirm={() =>
          toDelete &&
          remove.mutate(toDelete.id, {
            onSuccess: () => {
              setToDelete(null);
              toast.success("Photo deleted");
            },
            onError: (e) => toast.error("Photo not deleted", { description: e.message }),
          })
        }
      />
    </div>
  );
}

/** Picture URLs of waiting photos, one per queue item, let go once the item has left the queue. */
const previewUrls = new Map<string, string>();
function previewUrl(item: OutboxItem): string | null {
  if (item.request.kind !== "upload") return null;
  let url = previewUrls.get(item.id);
  if (!url) {
    url = URL.createObjectURL(item.request.file);
    previewUrls.set(item.id, url);
  }
  return url;
}
outbox.subscribe(() => {
  const ids = new Set(outbox.getState().items.map((i) => i.id));
  for (const [id, url] of previewUrls) {
    if (!ids.has(id)) {
      URL.revokeObjectURL(url);
      previewUrls.delete(id);
    }
  }
});

/** A photo kept on this device that has not reached the server yet: its picture, its state, and for a refused one what to do. */
function WaitingPhoto({ item, progress, canEdit }: { item: OutboxItem; progress: number | null; canEdit: boolean }) {
  const src = previewUrl(item);
  const caption = item.tags["caption"];
  return (
    <li className="overflow-hidden rounded-lg border border-dashed border-ink-400 bg-white">
      <div className="bg-ink-100">
        {src ? <img src={src} alt={caption || item.label} className="aspect-[4/3] w-full object-cover" /> : <div className="aspect-[4/3]" />}
      </div>
      <div className="space-y-1.5 p-2.5">
        <p className="text-sm font-medium text-ink-900">{caption || <span className="text-ink-500">No caption</span>}</p>
        <p className="text-xs text-ink-600">{item.tags["attachedTo"]}</p>
        {item.failure ? (
          <>
            <Alert severity="critical">Not uploaded: {item.failure.message}</Alert>
            {canEdit ? (
              <div className="flex flex-wrap gap-1">
                <Button size="sm" variant="secondary" onClick={() => void outbox.retry(item.id)}>
                  Try again
                </Button>
                <Button size="sm" variant="ghost" className="text-critical-700" onClick={() => void outbox.discard(item.id)}>
                  Remove
                </Button>
              </div>
            ) : null}
          </>
        ) : progress !== null ? (
          <Progress label="Uploading" value={Math.round(progress * 100)} />
        ) : (
          <p className="inline-flex items-center gap-1.5 rounded bg-warning-50 px-2 py-1 text-xs font-semibold text-warning-800">
            <span aria-hidden="true">⏳</span> On this device, waiting to upload
          </p>
        )}
      </div>
    </li>
  );
}
