import { useQuery } from "@tanstack/react-query";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { teamQueries } from "../api/queries";
import { InviteForm } from "../components/invite-form";
import { MembersTable } from "../components/members-table";
import { PendingInvites } from "../components/pending-invites";

export interface TeamPageProps {
  /** The signed-in owner's id (passed in by the route so this feature doesn't reach into auth). */
  currentUserId: string;
}

export function TeamPage({ currentUserId }: TeamPageProps) {
  const team = useQuery(teamQueries.list());

  return (
    <>
      <PageHeader
        title="Team"
        description="Who can sign in to your company's Eavesight, and what each person may do."
      />
      <div className="space-y-8">
        <InviteForm />
        {team.isPending ? (
          <LoadingBlock label="Loading your team…" />
        ) : team.isError ? (
          <Alert severity="critical" title="Couldn't load the team">
            <p>{team.error.message}</p>
            <Button variant="secondary" size="sm" className="mt-3" onClick={() => team.refetch()} isLoading={team.isFetching}>
              Try again
            </Button>
          </Alert>
        ) : (
          <>
            <section aria-labelledby="members-title" className="space-y-3">
              <h2 id="members-title" className="text-lg font-semibold text-ink-900">
                People <span className="font-normal text-ink-600">({team.data.users.length})</span>
              </h2>
              <MembersTable users={team.data.users} currentUserId={currentUserId} />
            </section>
            <section aria-labelledby="invites-title" className="space-y-3">
              <h2 id="invites-title" className="text-lg font-semibold text-ink-900">
                Waiting to accept <span className="font-normal text-ink-600">({team.data.invites.length})</span>
              </h2>
              <PendingInvites invites={team.data.invites} />
            </section>
          </>
        )}
      </div>
    </>
  );
}
