import { can } from "@shared/schemas/roles";
import { ProjectsPage } from "@/features/projects/pages/projects-page";
import { useSession } from "@/lib/session";

export function Component() {
  const { user, company } = useSession();
  const firstName = user.name.trim().split(/\s+/)[0];
  return (
    <ProjectsPage
      canCreate={can(user.role, "projects:edit")}
      companyName={company.name}
      greeting={firstName ? `Good to see you, ${firstName}. Every job site, its attic survey and where it stands.` : undefined}
    />
  );
}
