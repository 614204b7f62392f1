import { apiClient } from "@/lib/api-client";
import type { SellerSignature } from "./types";

/** GET /api/auth/me/signature — the signature saved on the signed-in user's profile, or null. */
export async function getSignature(signal?: AbortSignal): Promise<SellerSignature | null> {
  const { signature } = await apiClient.get<{ signature: SellerSignature | null }>("/auth/me/signature", { signal });
  return signature;
}
