import { queryOptions } from "@tanstack/react-query";
import { isApiError } from "@/lib/api-client";
import { getProposalPayments } from "./get-proposal-payments";
import { getPublicDeposit } from "./get-public-deposit";

export const depositKeys = {
  all: ["deposits"] as const,
  public: (token: string) => [...depositKeys.all, "public", token] as const,
  staff: (proposalId: string) => [...depositKeys.all, "proposal", proposalId] as const,
};

export const depositQueries = {
  /** `pollMs` while waiting for the payment service's confirmation; false otherwise. */
  public: (token: string, pollMs: number | false = false) =>
    queryOptions({
      queryKey: depositKeys.public(token),
      queryFn: ({ signal }) => getPublicDeposit(token, signal),
      refetchOnWindowFocus: true,
      // A 404 or 410 is an answer (the page above already explains the link); retrying would spend the rate limit.
      retry: (count, error) => !(isApiError(error) && error.status < 500) && count < 2,
      refetchInterval: pollMs,
    }),
  staff: (proposalId: string, pollMs: number | false = false) =>
    queryOptions({
      queryKey: depositKeys.staff(proposalId),
      queryFn: ({ signal }) => getProposalPayments(proposalId, signal),
      refetchInterval: pollMs,
    }),
};
