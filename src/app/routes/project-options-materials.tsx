import { useParams } from "react-router";
import { MaterialsPage } from "@/features/options/pages/materials-page";

/** The crew's printable materials list for one design option. */
export function Component() {
  const { projectId = "", optionId = "" } = useParams();
  return <MaterialsPage key={optionId} projectId={projectId} optionId={optionId} />;
}
