import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CustomerInput } from "@shared/schemas/projects";
import { apiClient } from "@/lib/api-client";
import { customerKeys } from "./queries";
import type { Customer } from "./types";

/** POST /api/customers → 201 { customer } */
export async function createCustomer(input: CustomerInput): Promise<Customer> {
  const { customer } = await apiClient.create<{ customer: Customer }>("/customers", { ...input });
  return customer;
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}
