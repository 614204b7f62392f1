import { randomUUID } from "node:crypto";
import { AppError } from "../../lib/errors.ts";
import { dummyPasswordHash, hashPassword, verifyPassword } from "../../lib/password.ts";
import { hashToken, newToken } from "../../lib/tokens.ts";
import type { Audit } from "../../lib/audit.ts";
import type { Jobs } from "../../lib/jobs.ts";
import type { RequestMeta } from "../../lib/request-context.ts";
import type { AuthRepository } from "./auth.repository.ts";
import { SESSION_ABSOLUTE_MS, type AppLucia } from "./lucia.ts";

/** Sign-in throttling: counted from the audit table, so it holds across server processes. */
export const LOCKOUT_WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_IP = 20;
export const RESET_TTL_MS = 60 * 60 * 1000;

export interface AuthDeps {
  repo: AuthRepository;
  lucia: AppLucia;
  audit: Audit;
  jobs: Jobs;
  /** The configured public origin; mailed links never come from request headers. */
  appOrigin: () => string;
  now?: () => Date;
}

type UserRow = NonNullable<Awaited<ReturnType<AuthRepository["findUserById"]>>>;

export function publicUser(u: UserRow) {
  return { id: u.id, email: u.email, name: u.name, role: u.role, unitSystem: u.unitSystem };
}

export function createAuthService(deps: AuthDeps) {
  const now = deps.now ?? (() => new Date());

  async function me(userId: string) {
    const user = await deps.repo.findUserById(userId);
    if (!user || !user.isActive) throw new AppError("unauthorized", "Please sign in.", 401);
    const company = await deps.repo.findCompany(user.companyId);
    return { user: publicUser(user), company: company! };
  }

  async function throttle(email: string, meta: RequestMeta) {
    const since = new Date(now().getTime() - LOCKOUT_WINDOW_MS);
    const { byEmail, byIp } = await deps.repo.countFailures({ email, ip: meta.ip, since });
    const over =
      byEmail.n >= MAX_FAILURES_PER_ACCOUNT ? byEmail.oldest : byIp.n >= MAX_FAILURES_PER_IP ? byIp.oldest : null;
    if (over) {
      const waitMs = new Date(over).getTime() + LOCKOUT_WINDOW_MS - now().getTime();
      const minutes = Math.max(1, Math.ceil(waitMs / 60_000));
      throw new AppError("rate-limited", `Too many attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`, 429);
    }
  }

  async function createSession(userId: string) {
    return deps.lucia.createSession(userId, { absoluteExpiresAt: new Date(now().getTime() + SESSION_ABSOLUTE_MS) });
  }

  return {
    me,
    createSession,

    async signIn(input: { email: string; password: string }, meta: RequestMeta) {
      await throttle(input.email, meta);
      const user = await deps.repo.findUserByEmail(input.email);
      const ok = user
        ? await verifyPassword(user.passwordHash, input.password)
        : (await verifyPassword(await dummyPasswordHash(), input.password), false);
      if (!user || !ok || !user.isActive) {
        await deps.audit({ event: "sign-in-failed", subjectEmail: input.email, companyId: user?.companyId, userId: user?.id, detail: { reason: !user ? "unknown-email" : !ok ? "wrong-password" : "inactive" } }, meta);
        throw new AppError("invalid-credentials", "That e-mail and password do not match an active account.", 401);
      }
      const session = await createSession(user.id);
      await deps.audit({ event: "sign-in", subjectEmail: input.email, companyId: user.companyId, userId: user.id }, meta);
      return { session, ...(await me(user.id)) };
    },

    async signOut(sessionId: string, userId: string, meta: RequestMeta) {
      await deps.lucia.invalidateSession(sessionId);
      await deps.audit({ event: "sign-out", userId }, meta);
    },

    async signOutEverywhere(userId: string, companyId: string, meta: RequestMeta) {
      await deps.lucia.invalidateUserSessions(userId);
      await deps.audit({ event: "sign-out-everywhere", userId, companyId }, meta);
    },

    async updateMe(userId: string, patch: { name?: string; unitSystem?: "imperial" | "metric" }) {
      await deps.repo.updateUser(userId, patch);
      return me(userId);
    },

    async changePassword(userId: string, sessionId: string, input: { currentPassword: string; newPassword: string }, meta: RequestMeta) {
      const user = await deps.repo.findUserById(userId);
      if (!user || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
        throw new AppError("wrong-password", "Your current password is not right.", 400, { currentPassword: "Your current password is not right." });
      }
      await deps.repo.updateUser(userId, { passwordHash: await hashPassword(input.newPassword) });
      // Other devices signed in with the old password are signed out; this one stays.
      const sessions = await deps.lucia.getUserSessions(userId);
      await Promise.all(sessions.filter((s) => s.id !== sessionId).map((s) => deps.lucia.invalidateSession(s.id)));
      await deps.audit({ event: "password-changed", userId, companyId: user.companyId }, meta);
    },

    /** Same answer whether or not the address exists; only a real account gets mail. */
    async requestReset(email: string, meta: RequestMeta) {
      const user = await deps.repo.findUserByEmail(email);
      await deps.audit({ event: "password-reset-requested", subjectEmail: email, userId: user?.id, companyId: user?.companyId }, meta);
      if (!user || !user.isActive) return;
      const { token, tokenHash } = newToken();
      await deps.repo.insertReset({ userId: user.id, tokenHash, expiresAt: new Date(now().getTime() + RESET_TTL_MS) });
      const link = `${deps.appOrigin()}/reset-password?token=${token}`;
      await deps.jobs.sendEmail({
        companyId: user.companyId,
        to: user.email,
        subject: "Reset your Eavesight password",
        text: `Hello ${user.name},\n\nSomeone (we hope you) asked to reset the password of your Eavesight account. Open this link within one hour to choose a new password:\n\n${link}\n\nIf it was not you, ignore this message; your password stays as it is.`,
      });
    },

    async confirmReset(input: { token: string; password: string }, meta: RequestMeta) {
      const reset = await deps.repo.consumeReset(hashToken(input.token), now());
      if (!reset) throw new AppError("invalid-token", "This reset link is not valid any more. Ask for a new one.", 400);
      const user = await deps.repo.updateUser(reset.userId, { passwordHash: await hashPassword(input.password) });
      await deps.lucia.invalidateUserSessions(reset.userId);
      await deps.audit({ event: "password-reset", userId: reset.userId, companyId: user?.companyId }, meta);
    },

    async getInvite(token: string) {
      const found = await deps.repo.findInviteByHash(hashToken(token));
      const t = now();
      if (!found || found.invite.revokedAt || found.invite.acceptedAt) throw new AppError("invalid-invite", "This invitation is not valid. Ask your company's owner for a new one.", 404);
      if (found.invite.expiresAt <= t) throw new AppError("invite-expired", "This invitation has expired. Ask your company's owner for a new one.", 410);
      return { email: found.invite.email, companyName: found.companyName, role: found.invite.role };
    },

    async acceptInvite(token: string, input: { name: string; password: string }, meta: RequestMeta) {
      const found = await deps.repo.findInviteByHash(hashToken(token));
      if (!found) throw new AppError("invalid-invite", "This invitation is not valid. Ask your company's owner for a new one.", 404);
      const existing = await deps.repo.findUserByEmail(found.invite.email);
      if (existing) throw new AppError("email-taken", "An account with this e-mail already exists. Sign in instead.", 409);
      const invite = await deps.repo.consumeInvite(found.invite.id, now());
      if (!invite) throw new AppError("invite-expired", "This invitation has expired or was already used.", 410);
      const user = await deps.repo.insertUser({
        id: randomUUID(),
        companyId: invite.companyId,
        email: invite.email,
        name: input.name,
        role: invite.role,
        passwordHash: await hashPassword(input.password),
      });
      await deps.audit({ event: "invite-accepted", userId: user.id, companyId: user.companyId, subjectEmail: user.email }, meta);
      const session = await createSession(user.id);
      return { session, ...(await me(user.id)) };
    },
  };
}
export type AuthService = ReturnType<typeof createAuthService>;
