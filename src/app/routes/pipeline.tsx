import { EmptyState } from "@/components/ui/empty-state";
import { ChartIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";

// Placeholder until the proposals work lands. Owner and sales only (guarded in the router).
export function Component() {
  return (
    <>
      <PageHeader title="Pipeline" description="Every proposal by stage: draft, sent, viewed, accepted, declined or expired." />
      <EmptyState
        icon={<ChartIcon />}
        title="No proposals yet"
        description="When a proposal is drafted from a project's design options, it shows up here so you can follow it from sent to signed."
      />
    </>
  );
}
