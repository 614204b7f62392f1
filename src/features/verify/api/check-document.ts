import { useMutation } from "@tanstack/react-query";
import { ApiError, apiClient } from "@/lib/api-client";
import type { VerifyAnswer } from "./types";

/** The server's cap on an uploaded copy (server/modules/proposals/uploads.ts); hashing on the device has none. */
const MAX_UPLOAD_BYTES = 12 * 1024 * 1024;

/** The file's SHA-256 as hex, computed here, or null where the browser offers no Web Crypto (an http page off localhost). */
export async function sha256OnDevice(file: Blob): Promise<string | null> {
  if (!globalThis.crypto?.subtle) return null;
  const digest = await crypto.subtle.digest("SHA-256", await file.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, "0")).join("");
}

/** POST /api/public/verify (multipart, field "file"): the server hashes the bytes as they stream in and keeps nothing. */
async function uploadForCheck(file: File): Promise<VerifyAnswer> {
  if (file.size > MAX_UPLOAD_BYTES) throw new ApiError(413, "file-too-large", "That file is larger than any proposal we send (12 MB), so it can't be one of ours.");
  const body = new FormData();
  body.append("file", file);
  let response: Response;
  try {
    response = await fetch("/api/public/verify", { method: "POST", body, credentials: "omit", headers: { accept: "application/json" } });
  } catch {
    throw new ApiError(0, "network", "The check could not reach the server. Check that you are online and try again.");
  }
  const payload = (await response.json().catch(() => null)) as (VerifyAnswer & { error?: { code?: string; message?: string } }) | null;
  if (!response.ok || !payload || payload.error) {
    throw new ApiError(response.status, payload?.error?.code ?? `http-${response.status}`, payload?.error?.message ?? "The file could not be checked. Please try again in a moment.");
  }
  return payload;
}

/**
 * Checks a PDF against the record. Where the browser can, the fingerprint is computed on the device
 * and only it is sent (GET ?sha256=), so the document itself never leaves the phone; otherwise the
 * file is uploaded and hashed by the server.
 */
export async function checkDocument(file: File): Promise<VerifyAnswer> {
  const sha256 = await sha256OnDevice(file);
  if (sha256 === null) return uploadForCheck(file);
  return apiClient.get<VerifyAnswer>(`/public/verify?sha256=${sha256}`);
}

export function useCheckDocument() {
  return useMutation({ mutationFn: checkDocument });
}
