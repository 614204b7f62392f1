import type { ChangeOrderDraftInput, ChangeOrderSignInput } from "@shared/change-orders/schemas";
import { apiClient } from "@/lib/api-client";
import type { ChangeOrderHistory, ChangeOrderRecord, PublicChangeOrder } from "./types";

/** GET /api/proposals/:id/change-orders */
export const getChangeOrders = (proposalId: string, signal?: AbortSignal) =>
  apiClient.get<ChangeOrderHistory>(`/proposals/${encodeURIComponent(proposalId)}/change-orders`, { signal });

/** POST /api/proposals/:id/change-orders → 201 { changeOrder } (a draft). */
export const createChangeOrder = async ({ proposalId, input }: { proposalId: string; input: ChangeOrderDraftInput }) =>
  (await apiClient.post<{ changeOrder: ChangeOrderRecord }>(`/proposals/${encodeURIComponent(proposalId)}/change-orders`, { ...input })).changeOrder;

/** POST /api/change-orders/:id/send → { changeOrder, link } */
export const sendChangeOrder = (id: string) => apiClient.post<{ changeOrder: ChangeOrderRecord; link: string }>(`/change-orders/${encodeURIComponent(id)}/send`, {});

/** GET /api/public/change-orders/:token */
export const getPublicChangeOrder = (token: string, signal?: AbortSignal) => apiClient.get<PublicChangeOrder>(`/public/change-orders/${encodeURIComponent(token)}`, { signal });

/** POST /api/public/change-orders/:token/sign */
export const signChangeOrder = ({ token, input }: { token: string; input: ChangeOrderSignInput }) =>
  apiClient.post<PublicChangeOrder>(`/public/change-orders/${encodeURIComponent(token)}/sign`, input as unknown as Record<string, unknown>);

/** POST /api/public/change-orders/:token/decline */
export const declineChangeOrder = ({ token, reason }: { token: string; reason: string | null }) =>
  apiClient.post<PublicChangeOrder>(`/public/change-orders/${encodeURIComponent(token)}/decline`, { reason });
