import { createHash } from "node:crypto";
import type { RequestHandler, Response } from "express";
import { and, eq, lte } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "../db/client.ts";
import { idempotencyKeys } from "../db/schema/index.ts";
import { AppError } from "./errors.ts";
import { runInTransaction } from "./request-transaction.ts";

/** How long a first answer is kept for retries: a day covers a phone that was offline overnight. */
export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
const KeySchema = z.string().regex(/^[\x21-\x7e]{8,200}$/);

type Outcome = { status: number; body: unknown };
type StoredKey = typeof idempotencyKeys.$inferSelect;
class Rollback { constructor(readonly outcome: Outcome) {} }
class Replay { constructor(readonly stored: StoredKey) {} }

/**
 * For creating routes (`creates: true` in their RouteSpec): the handler runs in one transaction,
 * so the row, its audit entry and, when the request carries an `Idempotency-Key`, the first
 * answer are committed together or not at all. The answer is sent only after the commit. A retry
 * with the same key (same user) gets the stored answer, marked `Idempotent-Replayed: true`; the
 * same key with another body is refused (422). A copy arriving while the first is still running
 * waits for it on the key's row, then gets its answer.
 */
export function createsInTransaction(opts: { db: Database; now: () => Date }): RequestHandler {
  return (req, res, next) => {
    const actor = req.actor;
    const header = req.get("idempotency-key");
    if (!actor) return next();
    if (header !== undefined && !KeySchema.safeParse(header).success) {
      const message = "An Idempotency-Key is 8 to 200 visible ASCII characters, new for each submission (a UUID suits).";
      return next(new AppError("invalid-input", message, 400, { "Idempotency-Key": message }));
    }
    const key = header ?? null;
    const requestHash = createHash("sha256").update(`${req.method} ${req.originalUrl}\n${JSON.stringify(req.body ?? null)}`).digest("hex");
    const thisKey = key ? and(eq(idempotencyKeys.userId, actor.userId), eq(idempotencyKeys.key, key)) : undefined;

    // Hold the handler's answer until the transaction has committed.
    const sendJson = res.json.bind(res) as Response["json"];
    let settle!: (outcome: Outcome) => void;
    const answered = new Promise<Outcome>((resolve) => (settle = resolve));
    res.json = (body: unknown) => {
      settle({ status: res.statusCode, body });
      return res;
    };
    const send = (outcome: Outcome, replayed = false) => {
      res.json = sendJson;
      if (replayed) res.set("Idempotent-Replayed", "true");
      res.status(outcome.status);
      sendJson(outcome.body);
    };

    opts.db.transaction(async (tx) => {
      const t = opts.now();
      if (thisKey && key) {
        await tx.delete(idempotencyKeys).where(and(thisKey, lte(idempotencyKeys.expiresAt, t)));
        const claimed = await tx.insert(idempotencyKeys).values({
          userId: actor.userId, key, companyId: actor.companyId, method: req.method, path: req.originalUrl, requestHash,
          statusCode: 0, responseBody: null, createdAt: t, expiresAt: new Date(t.getTime() + IDEMPOTENCY_TTL_MS),
        }).onConflictDoNothing().returning({ key: idempotencyKeys.key });
        if (claimed.length === 0) {
          const [stored] = await tx.select().from(idempotencyKeys).where(thisKey);
          throw new Replay(stored!);
        }
      }
      runInTransaction(tx as unknown as Database, () => next());
      const outcome = await answered;
      // A refused or failed request changes nothing, and its key stays free for the retry.
      if (outcome.status >= 400) throw new Rollback(outcome);
      if (thisKey) await tx.update(idempotencyKeys).set({ statusCode: outcome.status, responseBody: outcome.body }).where(thisKey);
      return outcome;
    }).then(
      (outcome) => send(outcome),
      (err: unknown) => {
        if (err instanceof Rollback) return send(err.outcome);
        if (err instanceof Replay) {
          res.json = sendJson;
          if (err.stored.requestHash !== requestHash) {
            return next(new AppError("idempotency-key-reused", "This Idempotency-Key was already used for a different request. Send a new key with each new submission.", 422));
          }
          return send({ status: err.stored.statusCode, body: err.stored.responseBody }, true);
        }
        // The commit itself failed (the database went away): nothing was saved; the error answer says so.
        res.json = sendJson;
        next(err);
      },
    );
  };
}
