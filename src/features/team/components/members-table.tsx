import { useState } from "react";
import { Badge, SeverityBadge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { Select } from "@/components/ui/select";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { toast } from "@/components/ui/toaster";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/authorization";
import { formatDate } from "@/lib/format-date";
import { useChangeRole } from "../api/change-role";
import { useDeactivateUser } from "../api/deactivate-user";
import type { TeamUser } from "../api/types";

const roleOptions = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export interface MembersTableProps {
  users: TeamUser[];
  /** The signed-in owner: they can't demote or deactivate themselves here. */
  currentUserId: string;
}

export function MembersTable({ users, currentUserId }: MembersTableProps) {
  const changeRole = useChangeRole();
  const deactivate = useDeactivateUser();
  const [toDeactivate, setToDeactivate] = useState<TeamUser | null>(null);

  const sorted = [...users].sort(
    (a, b) => Number(b.isActive) - Number(a.isActive) || a.name.localeCompare(b.name) || a.email.localeCompare(b.email),
  );

  function onRoleChange(user: TeamUser, role: Role) {
    changeRole.mutate(
      { userId: user.id, role },
      {
        onSuccess: () => toast.success(`${user.name || user.email} is now ${ROLE_LABELS[role]}`),
        onError: (error) => toast.error("Role not changed", { description: error.message }),
      },
    );
  }

  return (
    <>
      <TableContainer>
        <Table>
          <caption className="sr-only">People in your company</caption>
          <THead>
            <tr>
              <Th>Name</Th>
              <Th>Role</Th>
              <Th>Status</Th>
              <Th>Added</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </THead>
          <TBody>
            {sorted.map((user) => {
              const isSelf = user.id === currentUserId;
              const isChanging = changeRole.isPending && changeRole.variables?.userId === user.id;
              const displayName = user.name || user.email;
              return (
                <Tr key={user.id} className={user.isActive ? undefined : "text-ink-600"}>
                  <Td className="min-w-0">
                    <div className="flex flex-wrap items-center gap-2">
                      <span className="font-semibold text-ink-900">{displayName}</span>
                      {isSelf ? <Badge tone="outline">You</Badge> : null}
                    </div>
                    <div className="text-sm break-all text-ink-600">{user.email}</div>
                  </Td>
                  <Td label="Role" className="md:w-48">
                    {isSelf || !user.isActive ? (
                      <Badge tone={user.role === "owner" ? "brand" : "neutral"}>{ROLE_LABELS[user.role]}</Badge>
                    ) : (
                      <Select
                        label={`Role for ${displayName}`}
                        isLabelHidden
                        options={roleOptions}
                        value={user.role}
                        disabled={isChanging}
                        aria-busy={isChanging || undefined}
                        onChange={(event) => onRoleChange(user, event.target.value as Role)}
                        className="max-md:max-w-64"
                      />
                    )}
                  </Td>
                  <Td label="Status" isHalfOnPhone>
                    {user.isActive ? (
                      <SeverityBadge severity="ok">Active</SeverityBadge>
                    ) : (
                      <Badge tone="neutral">Deactivated</Badge>
                    )}
                  </Td>
                  <Td label="Added" isHalfOnPhone className="whitespace-nowrap">
                    {formatDate(user.createdAt)}
                  </Td>
                  <Td className="md:text-right">
                    {user.isActive && !isSelf ? (
                      <Button
                        variant="ghost"
                        size="sm"
                        className="text-critical-700 hover:bg-critical-50 max-md:w-full max-md:border max-md:border-ink-300"
                        onClick={() => setToDeactivate(user)}
                        aria-label={`Deactivate ${displayName}`}
                      >
                        Deactivate
                      </Button>
                    ) : null}
                  </Td>
                </Tr>
              );
            })}
          </TBody>
        </Table>
      </TableContainer>
      <ConfirmDialog
        open={toDeactivate !== null}
        onOpenChange={(open) => (open ? undefined : setToDeactivate(null))}
        title={`Deactivate ${toDeactivate?.name || toDeactivate?.email || "this person"}?`}
        description="They are signed out on every device right away and can't sign in again. Their projects, surveys and proposals stay with the company."
        confirmLabel="Deactivate"
        confirmVariant="danger"
        isPending={deactivate.isPending}
        onConfirm={() => {
          if (!toDeactivate) return;
          const name = toDeactivate.name || toDeactivate.email;
          deactivate.mutate(toDeactivate.id, {
            onSuccess: () => {
              setToDeactivate(null);
              toast.success(`${name} is deactivated`);
            },
            onError: (error) => toast.error("Not deactivated", { description: error.message }),
          });
        }}
      />
    </>
  );
}
