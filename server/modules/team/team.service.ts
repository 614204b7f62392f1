import { AppError, notFound } from "../../lib/errors.ts";
import { newToken } from "../../lib/tokens.ts";
import type { Audit } from "../../lib/audit.ts";
import type { Jobs } from "../../lib/jobs.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { Role } from "../../../shared/schemas/roles.ts";
import type { TeamRepository } from "./team.repository.ts";

export const INVITE_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export function createTeamService(deps: { repo: TeamRepository; audit: Audit; jobs: Jobs; appOrigin: () => string; companyName: (id: string) => Promise<string>; now?: () => Date }) {
  const now = deps.now ?? (() => new Date());

  async function guardLastOwner(actor: Actor, userId: string) {
    const target = await deps.repo.findUser(actor, userId);
    if (!target) throw notFound("That user");
    if (target.role === "owner" && target.isActive && (await deps.repo.countActiveOwners(actor)) <= 1) {
      throw new AppError("last-owner", "A company needs at least one active owner. Make someone else owner first.", 409);
    }
    return target;
  }

  return {
    async list(actor: Actor) {
      const [users, invites] = await Promise.all([deps.repo.listUsers(actor), deps.repo.listOpenInvites(actor, now())]);
      return { users, invites };
    },

    async invite(actor: Actor, input: { email: string; role: Role }, meta: RequestMeta) {
      if (await deps.repo.emailInUse(input.email)) {
        throw new AppError("email-taken", "Someone already has an account with this e-mail.", 409, { email: "Someone already has an account with this e-mail." });
      }
      await deps.repo.revokeOpenInvitesFor(actor, input.email, now());
      const { token, tokenHash } = newToken();
      const invite = await deps.repo.insertInvite({
        companyId: actor.companyId, email: input.email, role: input.role, tokenHash, invitedBy: actor.userId,
        expiresAt: new Date(now().getTime() + INVITE_TTL_MS),
      });
      const company = await deps.companyName(actor.companyId);
      const link = `${deps.appOrigin()}/invite/${token}`;
      await deps.jobs.sendEmail({
        companyId: actor.companyId,
        to: input.email,
        subject: `${actor.name} invited you to ${company} on Eavesight`,
        text: `Hello,\n\n${actor.name} invited you to join ${company} on Eavesight as ${input.role}.\nOpen this link within 7 days to choose your name and password:\n\n${link}\n\nIf you did not expect this, ignore the message.`,
      });
      await deps.audit({ event: "invite-sent", companyId: actor.companyId, userId: actor.userId, subjectEmail: input.email, detail: { role: input.role, inviteId: invite.id } }, meta);
      return invite;
    },

    async revokeInvite(actor: Actor, id: string, meta: RequestMeta) {
      const row = await deps.repo.revokeInvite(actor, id, now());
      if (!row) throw notFound("That invitation");
      await deps.audit({ event: "invite-revoked", companyId: actor.companyId, userId: actor.userId, detail: { inviteId: id } }, meta);
    },

    async changeRole(actor: Actor, userId: string, role: Role, meta: RequestMeta) {
      const target = role === "owner" ? await deps.repo.findUser(actor, userId) : await guardLastOwner(actor, userId);
      if (!target) throw notFound("That user");
      const user = await deps.repo.updateUser(actor, userId, { role });
      await deps.audit({ event: "role-changed", companyId: actor.companyId, userId: actor.userId, detail: { target: userId, from: target.role, to: role } }, meta);
      return user!;
    },

    async deactivate(actor: Actor, userId: string, meta: RequestMeta) {
      await guardLastOwner(actor, userId);
      const user = await deps.repo.updateUser(actor, userId, { isActive: false });
      // Their sessions end at once, not at expiry.
      await deps.repo.deleteSessions(userId);
      await deps.audit({ event: "user-deactivated", companyId: actor.companyId, userId: actor.userId, detail: { target: userId } }, meta);
      return user!;
    },

    async reactivate(actor: Actor, userId: string, meta: RequestMeta) {
      const user = await deps.repo.updateUser(actor, userId, { isActive: true });
      if (!user) throw notFound("That user");
      await deps.audit({ event: "user-reactivated", companyId: actor.companyId, userId: actor.userId, detail: { target: userId } }, meta);
      return user;
    },
  };
}
export type TeamService = ReturnType<typeof createTeamService>;
