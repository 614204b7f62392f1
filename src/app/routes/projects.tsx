import { EmptyState } from "@/components/ui/empty-state";
import { ClipboardIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { useSession } from "@/lib/session";

// Placeholder until the projects work lands: the landing page after sign-in.
export function Component() {
  const { user, company } = useSession();
  const firstName = user.name.trim().split(/\s+/)[0];
  return (
    <>
      <PageHeader
        eyebrow={company.name}
        title="Projects"
        description={firstName ? `Good to see you, ${firstName}. Every job site and its attic survey will be listed here.` : undefined}
      />
      <EmptyState
        icon={<ClipboardIcon />}
        title="No projects yet"
        description="Each project will hold a customer's site address, its attic spaces with measurements, vents and photos, the ventilation check, the design options and the proposal. Project tools are on the way."
      />
    </>
  );
}
