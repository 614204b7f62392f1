import { can } from "@shared/schemas/roles";
import { paths } from "@/config/paths";
import { CustomersPage } from "@/features/customers/pages/customers-page";
import { useSession } from "@/lib/session";

export function Component() {
  const { user } = useSession();
  return (
    <CustomersPage canEdit={can(user.role, "customers:edit")} canEditContact={can(user.role, "customers:contact")} newProjectHref={(id) => paths.app.newProject.getHref(id)} />
  );
}
