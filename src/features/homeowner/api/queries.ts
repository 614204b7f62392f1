import { queryOptions } from "@tanstack/react-query";
import { isApiError } from "@/lib/api-client";
import { getPublicProposal } from "./get-public-proposal";

export const homeownerKeys = {
  all: ["public-proposal"] as const,
  view: (token: string) => [...homeownerKeys.all, token] as const,
};

export const homeownerQueries = {
  /** Polls gently only while a PDF is being made, so the download appears without a reload. */
  view: (token: string) =>
    queryOptions({
      queryKey: homeownerKeys.view(token),
      queryFn: ({ signal }) => getPublicProposal(token, signal),
      refetchOnWindowFocus: false,
      // A 404 or 410 is an answer; retrying would only spend the rate limit.
      retry: (count, error) => !(isApiError(error) && error.status < 500) && count < 2,
      refetchInterval: (q) => {
        const p = q.state.data?.proposal;
        if (!p) return false;
        const isWaiting = p.status === "accepted" ? !p.isSignedPdfReady : !p.isPdfReady;
        return isWaiting ? 4_000 : false;
      },
    }),
};
