import { useParams } from "react-router";
import { can } from "@shared/schemas/roles";
import { ProjectDetailsFields } from "@/features/projects/components/project-details-fields";
import { ProjectWorkspacePage } from "@/features/survey/pages/project-workspace-page";
import { useSession } from "@/lib/session";

/** The project page: the survey workspace, with the project details form from the projects feature. */
export function Component() {
  const { projectId = "" } = useParams();
  const { user } = useSession();
  return (
    <ProjectWorkspacePage
      projectId={projectId}
      unitSystem={user.unitSystem}
      canEdit={can(user.role, "projects:edit")}
      renderDetails={(props) => <ProjectDetailsFields {...props} />}
    />
  );
}
