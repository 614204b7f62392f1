import { apiClient } from "@/lib/api-client";
import type { ProjectListParams, ProjectPage } from "./types";

/** GET /api/projects — one page, searched, filtered and sorted by the server (fast at thousands of projects). */
export function getProjects(params: ProjectListParams, signal?: AbortSignal): Promise<ProjectPage> {
  const search = new URLSearchParams({
    sort: params.sort,
    dir: params.dir,
    page: String(params.page),
    pageSize: String(params.pageSize),
  });
  if (params.q.trim()) search.set("q", params.q.trim());
  if (params.status) search.set("status", params.status);
  if (params.estimatorId) search.set("estimatorId", params.estimatorId);
  return apiClient.get<ProjectPage>(`/projects?${search.toString()}`, { signal });
}
