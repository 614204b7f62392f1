import { EmptyState } from "@/components/ui/empty-state";
import { BuildingIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { useSession } from "@/lib/session";

// Placeholder until the company profile work lands. Owner only (guarded in the router).
export function Component() {
  const { company } = useSession();
  return (
    <>
      <PageHeader title="Company profile" description={`How ${company.name} appears on proposals and e-mails.`} />
      <EmptyState
        icon={<BuildingIcon />}
        title="Company details are coming"
        description="You'll set your logo, address, phone, licence number, brand colour and the standard terms printed on every proposal here."
      />
    </>
  );
}
