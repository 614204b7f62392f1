import { queryOptions } from "@tanstack/react-query";
import { getProject } from "./get-project";
import { getProjectAnalysis } from "./get-project-analysis";
import { getProjectOptions } from "./get-project-options";
import { getProjectProposals } from "./get-project-proposals";
import { getProposal } from "./get-proposal";
import { getRenderStatus } from "./get-render-status";
import { getSignature } from "./get-signature";

export const proposalKeys = {
  all: ["proposals"] as const,
  lists: () => [...proposalKeys.all, "list"] as const,
  list: (projectId: string) => [...proposalKeys.lists(), projectId] as const,
  details: () => [...proposalKeys.all, "detail"] as const,
  detail: (proposalId: string) => [...proposalKeys.details(), proposalId] as const,
  render: (proposalId: string) => [...proposalKeys.all, "render", proposalId] as const,
  signature: () => ["auth", "me", "signature"] as const,
  project: (projectId: string) => [...proposalKeys.all, "project", projectId] as const,
  projectOptions: (projectId: string) => [...proposalKeys.all, "project-options", projectId] as const,
  projectAnalysis: (projectId: string) => [...proposalKeys.all, "project-analysis", projectId] as const,
};

const isInProgress = (status: string | undefined) => status === "queued" || status === "rendering";

export const proposalQueries = {
  list: (projectId: string) => queryOptions({ queryKey: proposalKeys.list(projectId), queryFn: ({ signal }) => getProjectProposals(projectId, signal) }),
  /** The builder starts its draft from this; focus refetches would only refresh the read-only parts. */
  detail: (proposalId: string) =>
    queryOptions({ queryKey: proposalKeys.detail(proposalId), queryFn: ({ signal }) => getProposal(proposalId, signal), refetchOnWindowFocus: false }),
  /** Polls every 1.5 s while the PDF is queued or rendering, then stops. */
  render: (proposalId: string) =>
    queryOptions({
      queryKey: proposalKeys.render(proposalId),
      queryFn: ({ signal }) => getRenderStatus(proposalId, signal),
      refetchInterval: (query) => (isInProgress(query.state.data?.status) ? 1_500 : false),
      staleTime: 0,
    }),
  signature: () => queryOptions({ queryKey: proposalKeys.signature(), queryFn: ({ signal }) => getSignature(signal), staleTime: 5 * 60_000 }),
  project: (projectId: string) => queryOptions({ queryKey: proposalKeys.project(projectId), queryFn: ({ signal }) => getProject(projectId, signal) }),
  projectOptions: (projectId: string) =>
    queryOptions({ queryKey: proposalKeys.projectOptions(projectId), queryFn: ({ signal }) => getProjectOptions(projectId, signal) }),
  projectAnalysis: (projectId: string) =>
    queryOptions({ queryKey: proposalKeys.projectAnalysis(projectId), queryFn: ({ signal }) => getProjectAnalysis(projectId, signal) }),
};
