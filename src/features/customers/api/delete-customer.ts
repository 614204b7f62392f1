import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { customerKeys } from "./queries";

/** DELETE /api/customers/:id → 204; 409 "customer-has-projects" while projects name them. */
export function deleteCustomer(id: string): Promise<void> {
  return apiClient.delete(`/customers/${encodeURIComponent(id)}`);
}

export function useDeleteCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}
