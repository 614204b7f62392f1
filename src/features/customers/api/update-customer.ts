import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CustomerInput } from "@shared/schemas/projects";
import { apiClient } from "@/lib/api-client";
import { customerKeys } from "./queries";
import type { Customer } from "./types";

/** PATCH /api/customers/:id → { customer } */
export async function updateCustomer({ id, input }: { id: string; input: Partial<CustomerInput> }): Promise<Customer> {
  const { customer } = await apiClient.patch<{ customer: Customer }>(`/customers/${encodeURIComponent(id)}`, { ...input });
  return customer;
}

export function useUpdateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}
