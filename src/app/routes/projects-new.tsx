import { useSearchParams } from "react-router";
import { can } from "@shared/schemas/roles";
import { NewProjectPage } from "@/features/projects/pages/new-project-page";
import { NotFoundContent } from "./not-found";
import { useSession } from "@/lib/session";

export function Component() {
  const { user } = useSession();
  const [search] = useSearchParams();
  if (!can(user.role, "projects:edit")) return <NotFoundContent />;
  return <NewProjectPage initialCustomerId={search.get("customerId")} currentUser={user} />;
}
