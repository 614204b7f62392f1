import { ApiError } from "@/lib/api-client";
import type { PhotoRecord } from "./types";

export interface UploadPhotoInput {
  projectId: string;
  file: File;
  spaceId?: string;
  ventId?: string;
  findingCode?: string;
  caption?: string;
}

/**
 * POST /api/projects/:id/photos (multipart). XMLHttpRequest rather than fetch because only it
 * reports upload progress, which matters on a weak phone signal with a 5 MB photo.
 */
export function uploadPhoto(
  input: UploadPhotoInput,
  onProgress: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<PhotoRecord> {
  return new Promise((resolve, reject) => {
    const body = new FormData();
    for (const key of ["spaceId", "ventId", "findingCode", "caption"] as const) {
      const value = input[key];
      if (value) body.append(key, value);
    }
    body.append("file", input.file);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/projects/${encodeURIComponent(input.projectId)}/photos`);
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
        // not JSON: fall through to the status message
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve((payload as { photo: PhotoRecord }).photo);
        return;
      }
      const error = (payload as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null)?.error;
      reject(
        new ApiError(
          xhr.status,
          error?.code ?? `http-${xhr.status}`,
          error?.message ?? (xhr.status === 413 ? "That photo is too large to upload." : "The photo could not be uploaded. Please try again."),
          error?.fields ?? {},
        ),
      );
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "Can't reach Eavesight. Check your connection and try again."));
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.onabort = () => reject(new DOMException("Upload cancelled", "AbortError"));
    xhr.send(body);
  });
}
