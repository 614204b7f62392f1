import { EmptyState } from "@/components/ui/empty-state";
import { HouseIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { useSession } from "@/lib/session";

// Placeholder until the customers work lands.
export function Component() {
  const { user } = useSession();
  const canEdit = user.role !== "sales";
  return (
    <>
      <PageHeader title="Customers" description="Homeowners and their contact details, with every project at their addresses." />
      <EmptyState
        icon={<HouseIcon />}
        title="No customers yet"
        description={
          canEdit
            ? "You'll add customers here with their name, phone, e-mail and site addresses, then start a project for each visit."
            : "Customers your estimators add will appear here with their contact details and projects. Sales can view them."
        }
      />
    </>
  );
}
