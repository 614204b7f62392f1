import { PipelinePage } from "@/features/pipeline/pages/pipeline-page";

/** Owner and sales only (guarded in the router). */
export function Component() {
  return <PipelinePage />;
}
