import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import type { ProjectInputSchema } from "@shared/schemas/projects";
import { apiClient } from "@/lib/api-client";
import { projectKeys } from "./queries";
import type { Project } from "./types";

export type NewProjectInput = z.input<typeof ProjectInputSchema>;

/** POST /api/projects → 201 { project }. Without codeBasis the company default applies. */
export async function createProject(input: NewProjectInput): Promise<Project> {
  const { project } = await apiClient.create<{ project: Project }>("/projects", { ...input });
  return project;
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all }),
  });
}
