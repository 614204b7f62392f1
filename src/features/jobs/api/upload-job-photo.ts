import { ApiError } from "@/lib/api-client";
import type { JobPhoto } from "./types";

/**
 * POST /api/jobs/:id/items/:itemId/photos (multipart), with upload progress (a weak signal on a
 * roof makes a 5 MB photo slow). Same shape as the survey's upload.
 */
export function uploadJobPhoto(input: { jobId: string; itemId: string; file: File }, onProgress: (fraction: number) => void): Promise<JobPhoto> {
  return new Promise((resolve, reject) => {
    const body = new FormData();
    body.append("file", input.file);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/jobs/${encodeURIComponent(input.jobId)}/items/${encodeURIComponent(input.itemId)}/photos`);
    xhr.setRequestHeader("accept", "application/json");
    xhr.withCredentials = true;
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      let payload: unknown = null;
      try {
        payload = JSON.parse(xhr.responseText);
      } catch {
        // not JSON: the status message below
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve((payload as { photo: JobPhoto }).photo);
        return;
      }
      const error = (payload as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null)?.error;
      reject(new ApiError(xhr.status, error?.code ?? `http-${xhr.status}`, error?.message ?? "The photo could not be uploaded. Please try again.", error?.fields ?? {}));
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "Can't reach Eavesight. Check your connection and try again."));
    xhr.send(body);
  });
}
