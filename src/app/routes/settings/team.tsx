import { TeamPage } from "@/features/team/pages/team-page";
import { useSession } from "@/lib/session";

export function Component() {
  const { user } = useSession();
  return <TeamPage currentUserId={user.id} />;
}
