import { useParams } from "react-router";
import { ComparePage } from "@/features/options/pages/compare-page";
import { useSession } from "@/lib/session";

/** A project's design options side by side. */
export function Component() {
  const { projectId = "" } = useParams();
  const { user } = useSession();
  return <ComparePage key={projectId} projectId={projectId} unitSystem={user.unitSystem} />;
}
