import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SignatureInput } from "@shared/proposals/schemas";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { SellerSignature } from "./types";

/** PUT /api/auth/me/signature — typed or drawn (PNG data URL), kept on the profile for every later send. */
export async function saveSignature(input: SignatureInput): Promise<SellerSignature> {
  const { signature } = await apiClient.put<{ signature: SellerSignature }>("/auth/me/signature", input as Record<string, unknown>);
  return signature;
}

export function useSaveSignature() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveSignature,
    onSuccess: (signature) => queryClient.setQueryData(proposalKeys.signature(), signature),
  });
}
