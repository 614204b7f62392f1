import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CompanyProfilePatch } from "@shared/proposals/schemas";
import { apiClient } from "@/lib/api-client";
import { companyKeys } from "./queries";
import type { CompanyProfile } from "./types";

/** PATCH /api/company. */
export async function updateCompany(patch: CompanyProfilePatch): Promise<CompanyProfile> {
  const { company } = await apiClient.patch<{ company: CompanyProfile }>("/company", patch as Record<string, unknown>);
  return company;
}

export function useUpdateCompany() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCompany,
    onSuccess: (company) => queryClient.setQueryData(companyKeys.profile(), company),
  });
}
