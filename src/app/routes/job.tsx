import { useParams } from "react-router";
import { JobSheetPage } from "@/features/jobs";

/** One job's sheet; a job not assigned to this crew member answers 404 from the server. */
export function Component() {
  const { jobId = "" } = useParams();
  return <JobSheetPage key={jobId} jobId={jobId} />;
}
