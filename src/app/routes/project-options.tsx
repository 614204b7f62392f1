import { useParams } from "react-router";
import { can } from "@shared/schemas/roles";
import { OptionsPage } from "@/features/options/pages/options-page";
import { useSession } from "@/lib/session";

/** A project's design options and the generator's suggestions. */
export function Component() {
  const { projectId = "" } = useParams();
  const { user } = useSession();
  return <OptionsPage key={projectId} projectId={projectId} unitSystem={user.unitSystem} canEdit={can(user.role, "options:edit")} />;
}
