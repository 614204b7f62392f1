import { randomUUID } from "node:crypto";
import { AppError } from "../../lib/errors.ts";
import { dummyPasswordHash, hashPassword, verifyPassword } from "../../lib/password.ts";
import { hashToken, newToken } from "../../lib/tokens.ts";
import type { Audit } from "../../lib/audit.ts";
import { createQueues, type Jobs } from "../../lib/jobs.ts";
import type { RequestMeta } from "../../lib/request-context.ts";
import type { AttemptKind, AuthRepository } from "./auth.repository.ts";
import { SESSION_ABSOLUTE_MS, type AppLucia } from "./lucia.ts";

/**
 * Limits on guarded attempts, counted atomically in PostgreSQL before any password is checked
 * (auth.repository.ts `reserveAttempt`), so they hold under a parallel burst and across every
 * server process. Sign-ins that succeed stop counting; reset requests always count.
 */
export const LOCKOUT_WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_IP = 20;
export const RESET_TTL_MS = 60 * 60 * 1000;
export const RESET_WINDOW_MS = 60 * 60 * 1000;
export const MAX_RESETS_PER_ACCOUNT = 3;
export const MAX_RESETS_PER_IP = 10;

/** The queue whose job makes and mails a reset link; queued alike for known and unknown addresses. */
export const RESET_QUEUE = "password-reset";
interface ResetJob {
  email: string;
  /** The configured origin of the server that took the request (never a request header). */
  origin: string;
}

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

  /** Records one attempt if the account and the address are under their limits; else 429 with the wait. */
  async function reserveAttempt(kind: AttemptKind, account: string, meta: RequestMeta, limits: { windowMs: number; maxPerAccount: number; maxPerIp: number }) {
    const t = now();
    const result = await deps.repo.reserveAttempt({
      kind, account, ip: meta.ip, now: t, since: new Date(t.getTime() - limits.windowMs),
      maxPerAccount: limits.maxPerAccount, maxPerIp: limits.maxPerIp,
    });
    if (result.blocked) {
      const waitMs = new Date(result.oldest).getTime() + limits.windowMs - t.getTime();
      const minutes = Math.max(1, Math.ceil(waitMs / 60_000));
      throw new AppError("rate-limited", `Too many attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`, 429);
    }
    return result.id;
  }
  const signInLimits = { windowMs: LOCKOUT_WINDOW_MS, maxPerAccount: MAX_FAILURES_PER_ACCOUNT, maxPerIp: MAX_FAILURES_PER_IP };

  /** Makes the reset link and mails it; for an unknown or inactive address it does nothing. */
  async function sendResetLink(job: ResetJob) {
    const user = await deps.repo.findUserByEmail(job.email);
    if (!user || !user.isActive) return;
    const { token, tokenHash } = newToken();
    const t = now();
    await deps.repo.replaceReset({ userId: user.id, tokenHash, createdAt: t, expiresAt: new Date(t.getTime() + RESET_TTL_MS) });
    await deps.jobs.sendEmail({
      companyId: user.companyId,
      to: user.email,
      subject: "Reset your Eavesight password",
      text: `Hello ${user.name},\n\nSomeone (we hope you) asked to reset the password of your Eavesight account. Open this link within one hour to choose a new password:\n\n${job.origin}/reset-password?token=${token}\n\nIf it was not you, ignore this message; your password stays as it is. Only the newest link you asked for works.`,
    });
  }

  const boss = deps.jobs.boss;
  const setUp = async () => {
    await createQueues(boss, [RESET_QUEUE]);
    if (!deps.jobs.runsWorkers) return;
    await boss.work<ResetJob>(RESET_QUEUE, { pollingIntervalSeconds: 0.5 }, async (batch) => {
      for (const job of batch) await sendResetLink(job.data);
    });
  };
  // Awaited by every enqueue; a failed set-up (the database away at start) is tried again by the next.
  let ready: Promise<void> = setUp();
  ready.catch(() => {});
  const queueReady = () => ready.catch(() => (ready = setUp()));

  async function createSession(userId: string) {
    return deps.lucia.createSession(userId, { absoluteExpiresAt: new Date(now().getTime() + SESSION_ABSOLUTE_MS) });
  }

  return {
    me,
    createSession,

    async signIn(input: { email: string; password: string }, meta: RequestMeta) {
      const attemptId = await reserveAttempt("sign-in", input.email, meta, signInLimits);
      const user = await deps.repo.findUserByEmail(input.email);
      const ok = user
        ? await verifyPassword(user.passwordHash, input.password)
        : (await verifyPassword(await dummyPasswordHash(), input.password), false);
      if (!user || !ok || !user.isActive) {
        await deps.audit({ event: "sign-in-failed", subjectEmail: input.email, companyId: user?.companyId, userId: user?.id, detail: { reason: !user ? "unknown-email" : !ok ? "wrong-password" : "inactive" } }, meta);
        throw new AppError("invalid-credentials", "That e-mail and password do not match an active account.", 401);
      }
      await deps.repo.markAttemptSucceeded(attemptId, now());
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
      // A stolen session must not be able to guess the current password either.
      const attemptId = await reserveAttempt("password-change", userId, meta, signInLimits);
      const user = await deps.repo.findUserById(userId);
      if (!user || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
        await deps.audit({ event: "password-change-failed", userId, companyId: user?.companyId }, meta);
        throw new AppError("wrong-password", "Your current password is not right.", 400, { currentPassword: "Your current password is not right." });
      }
      await deps.repo.markAttemptSucceeded(attemptId, now());
      await deps.repo.updateUser(userId, { passwordHash: await hashPassword(input.newPassword) });
      // Other devices signed in with the old password are signed out; this one stays.
      const sessions = await deps.lucia.getUserSessions(userId);
      await Promise.all(sessions.filter((s) => s.id !== sessionId).map((s) => deps.lucia.invalidateSession(s.id)));
      await deps.audit({ event: "password-changed", userId, companyId: user.companyId }, meta);
    },

    /**
     * Same answer, and the same work, whether or not the address has an account: count the
     * request against the limits, write the audit entry, queue the job. Only the job looks the
     * address up (and mails a link when it is a real, active account), so neither the answer
     * nor its timing tells an address with an account from one without.
     */
    async requestReset(email: string, meta: RequestMeta) {
      await reserveAttempt("password-reset", email, meta, { windowMs: RESET_WINDOW_MS, maxPerAccount: MAX_RESETS_PER_ACCOUNT, maxPerIp: MAX_RESETS_PER_IP });
      await deps.audit({ event: "password-reset-requested", subjectEmail: email }, meta);
      await queueReady();
      await boss.send(RESET_QUEUE, { email, origin: deps.appOrigin() } satisfies ResetJob, { retryLimit: 5, retryDelay: 2, retryBackoff: true });
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
        // A newcomer starts in the units the company works in; each person can change their own.
        unitSystem: await deps.repo.companyUnitSystem(invite.companyId),
      });
      await deps.audit({ event: "invite-accepted", userId: user.id, companyId: user.companyId, subjectEmail: user.email }, meta);
      const session = await createSession(user.id);
      return { session, ...(await me(user.id)) };
    },
  };
}
export type AuthService = ReturnType<typeof createAuthService>;
