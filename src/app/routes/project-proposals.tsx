import { useParams } from "react-router";
import { ProjectProposalsPage } from "@/features/proposals/pages/project-proposals-page";

/** A project's proposals and the start of a new one. */
export function Component() {
  const { projectId = "" } = useParams();
  return <ProjectProposalsPage key={projectId} projectId={projectId} />;
}
