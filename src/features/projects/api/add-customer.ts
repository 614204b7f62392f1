import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CustomerInput } from "@shared/schemas/projects";
import { apiClient } from "@/lib/api-client";
import { projectKeys } from "./queries";
import type { CustomerSummary } from "./types";

/** POST /api/customers → 201 { customer }: a new customer made while starting a project. */
export async function addCustomer(input: CustomerInput): Promise<CustomerSummary> {
  const { customer } = await apiClient.create<{ customer: CustomerSummary }>("/customers", { ...input });
  return customer;
}

export function useAddCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addCustomer,
    // The customers list lives in its own feature; its keys start with "customers".
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["customers"] }),
        queryClient.invalidateQueries({ queryKey: projectKeys.customerSearches() }),
      ]),
  });
}
