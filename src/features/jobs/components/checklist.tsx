import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import { Badge, SeverityBadge } from "@/components/ui/badge";
import { CameraIcon } from "@/components/ui/icons";
import { toast } from "@/components/ui/toaster";
import { cn } from "@/lib/cn";
import { setTick } from "../api/jobs";
import { jobKeys } from "../api/queries";
import type { JobSheet, JobSheetItem } from "../api/types";
import { uploadJobPhoto } from "../api/upload-job-photo";

/** One step: a big tick target, the step in words, its photos and a camera button. */
function ChecklistRow({ jobId, item, index, isLocked }: { jobId: string; item: JobSheetItem; index: number; isLocked: boolean }) {
  const queryClient = useQueryClient();
  const fileInput = useRef<HTMLInputElement>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const needsPhoto = item.isAirflowChange && item.photos.length === 0;
  // The box follows the hand in the same event (a controlled input waiting for the query cache would spring back).
  const [isChecked, setChecked] = useState(item.isTicked);
  const [serverTicked, setServerTicked] = useState(item.isTicked);
  if (serverTicked !== item.isTicked) {
    // The sheet changed under us (a refetch): follow it (React's "adjust state on a prop change").
    setServerTicked(item.isTicked);
    setChecked(item.isTicked);
  }
  const showTicked = (isTicked: boolean) => {
    setChecked(isTicked);
    queryClient.setQueryData<JobSheet>(jobKeys.sheet(jobId), (sheet) => sheet && { ...sheet, checklist: sheet.checklist.map((i) => (i.id === item.id ? { ...i, isTicked } : i)) });
  };
  const tick = useMutation({
    mutationKey: jobKeys.ticks(jobId),
    mutationFn: ({ isDone }: { isDone: boolean }) => setTick({ jobId, itemId: item.id, isDone }),
    onError: (error, { isDone }) => {
      showTicked(!isDone);
      toast.error(error.message);
    },
    // Ticks in quick succession: only the last one to settle refetches, so an earlier answer never undoes a later tick.
    onSettled: () => {
      if (queryClient.isMutating({ mutationKey: jobKeys.ticks(jobId) }) === 1) void queryClient.invalidateQueries({ queryKey: jobKeys.sheet(jobId) });
    },
  });
  const upload = useMutation({
    mutationFn: (file: File) => uploadJobPhoto({ jobId, itemId: item.id, file }, setProgress),
    onSettled: () => setProgress(null),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.sheet(jobId) }),
    onError: (error) => toast.error(error.message),
  });
  const checkboxId = `step-${item.id}`;
  const hintId = `${checkboxId}-hint`;

  return (
    <li data-item={item.id} className={cn("rounded-md border-2 bg-white p-3", item.isTicked ? "border-ok-600" : "border-ink-300")}>
      <div className="flex items-start gap-3">
        <input
          id={checkboxId}
          type="checkbox"
          className="mt-1 size-7 shrink-0 cursor-pointer accent-ok-600 disabled:cursor-not-allowed"
          checked={isChecked}
          disabled={isLocked || (needsPhoto && !item.isTicked)}
          aria-describedby={hintId}
          onChange={(event) => {
            // The box answers at once, in this event (a roof is no place to wait for a spinner); a refusal puts it back.
            const isDone = event.target.checked;
            void queryClient.cancelQueries({ queryKey: jobKeys.sheet(jobId) });
            showTicked(isDone);
            tick.mutate({ isDone });
          }}
        />
        <label htmlFor={checkboxId} className="min-w-0 flex-1 cursor-pointer text-base text-ink-950">
          <span className="font-semibold tabular-nums">{index + 1}. </span>
          {item.text}
        </label>
      </div>
      <div id={hintId} className="mt-2 flex flex-wrap items-center gap-2 pl-10 text-sm">
        {item.isTicked ? (
          <SeverityBadge severity="ok">Done</SeverityBadge>
        ) : needsPhoto ? (
          <SeverityBadge severity="warning">After-photo needed before ticking</SeverityBadge>
        ) : item.isAirflowChange ? (
          <Badge tone="outline">After-photo taken</Badge>
        ) : (
          <span className="text-ink-700">Photo optional</span>
        )}
      </div>
      {item.photos.length > 0 ? (
        <ul className="mt-2 flex flex-wrap gap-2 pl-10" aria-label={`Photos for step ${index + 1}`}>
          {item.photos.map((p) => (
            <li key={p.id}>
              <a href={p.url} target="_blank" rel="noreferrer" className="block">
                <img src={p.thumbUrl} alt={p.caption ?? `Photo for step ${index + 1}`} className="size-20 rounded border border-ink-300 object-cover" loading="lazy" />
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      {!isLocked ? (
        <div className="mt-2 pl-10">
          <input
            ref={fileInput}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            id={`${checkboxId}-photo`}
            aria-label={`Add a photo for step ${index + 1}`}
            onChange={(event) => {
              const file = event.target.files?.[0];
              event.target.value = "";
              if (file) upload.mutate(file);
            }}
          />
          <button
            type="button"
            className="inline-flex min-h-touch items-center gap-2 rounded-md border border-ink-500 bg-white px-3 text-base font-semibold text-ink-900 hover:bg-ink-50 disabled:opacity-60"
            onClick={() => fileInput.current?.click()}
            disabled={upload.isPending}
            aria-busy={upload.isPending || undefined}
          >
            <CameraIcon className="size-5" />
            {upload.isPending ? `Uploading… ${Math.round((progress ?? 0) * 100)} %` : item.photos.length ? "Add another photo" : "Add photo"}
          </button>
        </div>
      ) : null}
    </li>
  );
}

/** The install checklist generated from the signed scope. */
export function Checklist({ sheet, isLocked }: { sheet: JobSheet; isLocked: boolean }) {
  const done = sheet.checklist.filter((i) => i.isTicked).length;
  return (
    <section aria-labelledby="checklist-title" className="space-y-3">
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="checklist-title" className="text-xl font-semibold">Checklist</h2>
        <p className="text-base font-semibold tabular-nums" aria-live="polite">{done} of {sheet.checklist.length} done</p>
      </div>
      <p className="text-sm text-ink-700">Steps marked with a camera change the attic's airflow: photograph the finished work before ticking them.</p>
      <ol className="space-y-3">
        {sheet.checklist.map((item, i) => <ChecklistRow key={item.id} jobId={sheet.job.id} item={item} index={i} isLocked={isLocked} />)}
      </ol>
    </section>
  );
}
