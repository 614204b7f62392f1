import { JobsPage } from "@/features/jobs";

/** Every role with jobs:read; the crew sees only its own (the server narrows it). */
export function Component() {
  return <JobsPage />;
}
