import { queryOptions } from "@tanstack/react-query";
import { isApiError } from "@/lib/api-client";
import { getChangeOrders, getPublicChangeOrder } from "./change-orders";

export const changeOrderKeys = {
  all: ["change-orders"] as const,
  forProposal: (proposalId: string) => [...changeOrderKeys.all, "proposal", proposalId] as const,
  public: (token: string) => [...changeOrderKeys.all, "public", token] as const,
};

export const changeOrderQueries = {
  forProposal: (proposalId: string) => queryOptions({ queryKey: changeOrderKeys.forProposal(proposalId), queryFn: ({ signal }) => getChangeOrders(proposalId, signal) }),
  public: (token: string) =>
    queryOptions({
      queryKey: changeOrderKeys.public(token),
      queryFn: ({ signal }) => getPublicChangeOrder(token, signal),
      // A 404 is an answer; retrying would spend the public rate limit.
      retry: (count, error) => !(isApiError(error) && error.status < 500) && count < 2,
    }),
};
