import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { MailIcon } from "@/components/ui/icons";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { toast } from "@/components/ui/toaster";
import { ROLE_LABELS } from "@/lib/authorization";
import { formatDate } from "@/lib/format-date";
import { useCancelInvite } from "../api/cancel-invite";
import type { TeamInvite } from "../api/types";

function isExpired(invite: TeamInvite, now: number): boolean {
  return new Date(invite.expiresAt).getTime() <= now;
}

export function PendingInvites({ invites }: { invites: TeamInvite[] }) {
  const cancel = useCancelInvite();
  const [toCancel, setToCancel] = useState<TeamInvite | null>(null);
  const [now] = useState(() => Date.now());

  if (invites.length === 0) {
    return (
      <EmptyState
        icon={<MailIcon />}
        headingLevel="h3"
        title="No invites waiting"
        description="When you invite someone, the invite waits here until they accept it or it expires."
        className="py-8 sm:py-10"
      />
    );
  }

  return (
    <>
      <TableContainer>
        <Table>
          <caption className="sr-only">Invites not yet accepted</caption>
          <THead>
            <tr>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Sent</Th>
              <Th>Expires</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </THead>
          <TBody>
            {invites.map((invite) => {
              const expired = isExpired(invite, now);
              return (
                <Tr key={invite.id}>
                  <Td className="font-semibold break-all">{invite.email}</Td>
                  <Td label="Role">
                    <Badge>{ROLE_LABELS[invite.role]}</Badge>
                  </Td>
                  <Td label="Sent" isHalfOnPhone className="whitespace-nowrap">
                    {formatDate(invite.createdAt)}
                  </Td>
                  <Td label="Expires" isHalfOnPhone className="whitespace-nowrap">
                    {expired ? <Badge tone="outline">Expired</Badge> : formatDate(invite.expiresAt)}
                  </Td>
                  <Td className="md:text-right">
                    <Button
                      variant="ghost"
                      size="sm"
                      onClick={() => setToCancel(invite)}
                      aria-label={`Cancel the invite to ${invite.email}`}
                      className="max-md:w-full max-md:border max-md:border-ink-300"
                    >
                      {expired ? "Remove" : "Cancel invite"}
                    </Button>
                  </Td>
                </Tr>
              );
            })}
          </TBody>
        </Table>
      </TableContainer>
      <ConfirmDialog
        open={toCancel !== null}
        onOpenChange={(open) => (open ? undefined : setToCancel(null))}
        title={`Cancel the invite to ${toCancel?.email ?? ""}?`}
        description="The link in their e-mail stops working. You can invite them again at any time."
        confirmLabel="Cancel invite"
        cancelLabel="Keep it"
        confirmVariant="danger"
        isPending={cancel.isPending}
        onConfirm={() => {
          if (!toCancel) return;
          const email = toCancel.email;
          cancel.mutate(toCancel.id, {
            onSuccess: () => {
              setToCancel(null);
              toast.success(`Invite to ${email} cancelled`);
            },
            onError: (error) => toast.error("Invite not cancelled", { description: error.message }),
          });
        }}
      />
    </>
  );
}
