import { useParams } from "react-router";
import { can } from "@shared/schemas/roles";
import { ChangeOrdersPanel } from "@/features/change-orders";
import { DepositStatus } from "@/features/deposits";
import { ProposalPage } from "@/features/proposals/pages/proposal-page";
import { useSession } from "@/lib/session";

/** One proposal revision: the builder while a draft, the frozen record once sent. */
export function Component() {
  const { projectId = "", proposalId = "" } = useParams();
  const { user } = useSession();
  return <ProposalPage
    key={proposalId} projectId={projectId} proposalId={proposalId} canSend={can(user.role, "proposals:send")} userName={user.name} depositStatus={<DepositStatus proposalId={proposalId} />}
    changeOrders={<ChangeOrdersPanel proposalId={proposalId} canDraft={can(user.role, "proposals:draft")} canSend={can(user.role, "proposals:send")} />}
  />;
}
