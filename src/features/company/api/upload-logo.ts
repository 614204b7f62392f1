import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ApiError } from "@/lib/api-client";
import { companyKeys } from "./queries";
import type { CompanyProfile } from "./types";

/** POST /api/company/logo (multipart, field "file"). The api-client speaks JSON only, so this one uses fetch itself. */
export async function uploadLogo(file: File): Promise<CompanyProfile> {
  const body = new FormData();
  body.append("file", file);
  let response: Response;
  try {
    response = await fetch("/api/company/logo", { method: "POST", body, credentials: "same-origin", headers: { accept: "application/json" } });
  } catch {
    throw new ApiError(0, "network", "Can't reach Eavesight. Check your connection and try again.");
  }
  const payload = (await response.json().catch(() => null)) as { company?: CompanyProfile; error?: { code?: string; message?: string; fields?: Record<string, string> } } | null;
  if (!response.ok || !payload?.company) {
    const error = payload?.error;
    throw new ApiError(
      response.status,
      error?.code ?? `http-${response.status}`,
      error?.message ?? (response.status === 413 ? "That logo is too large: at most 2 MB." : "The logo could not be uploaded. Please try again."),
      error?.fields ?? {},
    );
  }
  return payload.company;
}

export function useUploadLogo() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadLogo,
    onSuccess: (company) => queryClient.setQueryData(companyKeys.profile(), company),
  });
}
