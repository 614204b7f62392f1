import { queryOptions } from "@tanstack/react-query";
import { isApiError } from "@/lib/api-client";
import { getCrewMembers, getJobs, getJobSheet, getPublicCompletion } from "./jobs";

export const jobKeys = {
  all: ["jobs"] as const,
  list: () => [...jobKeys.all, "list"] as const,
  sheet: (jobId: string) => [...jobKeys.all, "sheet", jobId] as const,
  /** Mutations ticking this job's checklist (to tell when the last one settles). */
  ticks: (jobId: string) => [...jobKeys.all, "ticks", jobId] as const,
  crew: () => [...jobKeys.all, "crew-members"] as const,
  public: (token: string) => [...jobKeys.all, "public", token] as const,
};

export const jobQueries = {
  list: () => queryOptions({ queryKey: jobKeys.list(), queryFn: ({ signal }) => getJobs(signal) }),
  sheet: (jobId: string) => queryOptions({ queryKey: jobKeys.sheet(jobId), queryFn: ({ signal }) => getJobSheet(jobId, signal) }),
  crew: () => queryOptions({ queryKey: jobKeys.crew(), queryFn: ({ signal }) => getCrewMembers(signal) }),
  public: (token: string) =>
    queryOptions({
      queryKey: jobKeys.public(token),
      queryFn: ({ signal }) => getPublicCompletion(token, signal),
      // A 404 is an answer; retrying would spend the public rate limit.
      retry: (count, error) => !(isApiError(error) && error.status < 500) && count < 2,
    }),
};
