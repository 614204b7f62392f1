import PgBoss from "pg-boss";
import type { Logger } from "./logger.ts";
import type { Mailer, OutgoingEmail } from "./mailer.ts";

export const QUEUES = { email: "email-send" } as const;

export interface Jobs {
  /** Queues an e-mail, sent at least once (with retries); proposal e-mails keep their own outbox instead. */
  sendEmail(mail: OutgoingEmail): Promise<void>;
  /** Hands a message to the SMTP relay now; for workers that keep their own outbox (proposal e-mails). */
  deliverNow(mail: OutgoingEmail): Promise<string>;
  boss: PgBoss;
  /** Whether this process runs workers; modules that add queues register theirs only then. */
  runsWorkers: boolean;
  stop(): Promise<void>;
}

/**
 * Background work on pg-boss, in the same PostgreSQL: a request only enqueues; workers in
 * any server process pick the job up, with retries.
 */
export async function startJobs(opts: { databaseUrl: string; logger: Logger; mailer: Mailer; runWorkers?: boolean }): Promise<Jobs> {
  const boss = new PgBoss({ connectionString: opts.databaseUrl, max: 4 });
  boss.on("error", (err) => opts.logger.warn({ err: { message: err.message } }, "job queue error"));
  await boss.start();
  await createQueues(boss, [QUEUES.email]);

  if (opts.runWorkers !== false) {
    await boss.work<OutgoingEmail>(QUEUES.email, { pollingIntervalSeconds: 0.5 }, async (batch) => {
      for (const job of batch) {
        const messageId = await opts.mailer.send(job.data);
        opts.logger.info({ job: job.id, messageId, to: job.data.to }, "e-mail sent");
      }
    });
  }

  return {
    boss,
    runsWorkers: opts.runWorkers !== false,
    async sendEmail(mail) {
      await boss.send(QUEUES.email, mail, { retryLimit: 5, retryDelay: 2, retryBackoff: true });
    },
    deliverNow: (mail) => opts.mailer.send(mail),
    async stop() {
      await boss.stop({ graceful: true, timeout: 5_000 });
    },
  };
}

/**
 * Creates queues that may not exist yet. Two processes starting on a fresh database can create
 * the same queue at once and PostgreSQL then ends one with a deadlock (40P01): try again.
 */
export async function createQueues(boss: PgBoss, names: readonly string[]): Promise<void> {
  for (const name of names) {
    for (let attempt = 1; ; attempt++) {
      try {
        await boss.createQueue(name);
        break;
      } catch (err) {
        if ((err as { code?: string }).code !== "40P01" || attempt >= 5) throw err;
        await new Promise((r) => setTimeout(r, 50 * attempt + Math.random() * 100));
      }
    }
  }
}
