import type { AssignJobInput } from "@shared/jobs/schemas";
import { apiClient } from "@/lib/api-client";
import type { JobList, JobSheet, ProjectJob, PublicCompletion } from "./types";

const enc = encodeURIComponent;

/** GET /api/jobs — a crew member's own jobs; the office's all, and sold work awaiting a crew. */
export const getJobs = (signal?: AbortSignal) => apiClient.get<JobList>("/jobs", { signal });

/** GET /api/jobs/:id */
export const getJobSheet = (jobId: string, signal?: AbortSignal) => apiClient.get<JobSheet>(`/jobs/${enc(jobId)}`, { signal });

/** GET /api/crew-members — who can be given a job. */
export const getCrewMembers = async (signal?: AbortSignal) => (await apiClient.get<{ crew: { id: string; name: string }[] }>("/crew-members", { signal })).crew;

/** PUT /api/projects/:id/job — assign (or move) the project's job. */
export const assignJob = ({ projectId, input }: { projectId: string; input: AssignJobInput }) => apiClient.put<ProjectJob>(`/projects/${enc(projectId)}/job`, { ...input });

/** PUT /api/jobs/:id/items/:itemId — tick or untick one step; answers the whole sheet. */
export const setTick = ({ jobId, itemId, isDone }: { jobId: string; itemId: string; isDone: boolean }) =>
  apiClient.put<JobSheet>(`/jobs/${enc(jobId)}/items/${enc(itemId)}`, { isDone });

/** POST /api/jobs/:id/complete */
export const completeJob = (jobId: string) => apiClient.post<{ sheet: JobSheet; isHomeownerEmailed: boolean }>(`/jobs/${enc(jobId)}/complete`, {});

/** GET /api/public/completion/:token */
export const getPublicCompletion = (token: string, signal?: AbortSignal) => apiClient.get<PublicCompletion>(`/public/completion/${enc(token)}`, { signal });

/** POST /api/public/completion/:token/balance/checkout → the provider's payment page for the balance. */
export const startBalanceCheckout = (token: string) =>
  apiClient.post<{ url: string; amountCents: number; currency: string }>(`/public/completion/${enc(token)}/balance/checkout`, {});
