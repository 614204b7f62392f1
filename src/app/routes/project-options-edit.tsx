import { useParams } from "react-router";
import { can } from "@shared/schemas/roles";
import { OptionEditorPage } from "@/features/options/pages/option-editor-page";
import { useSession } from "@/lib/session";

/** One design option, edited with its analysis and price live. */
export function Component() {
  const { projectId = "", optionId = "" } = useParams();
  const { user } = useSession();
  return <OptionEditorPage key={optionId} projectId={projectId} optionId={optionId} unitSystem={user.unitSystem} canEdit={can(user.role, "options:edit")} />;
}
