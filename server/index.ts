import path from "node:path";
import { fileURLToPath } from "node:url";
import { parseEnv } from "./env.ts";
import { createDb } from "./db/client.ts";
import { createLogger } from "./lib/logger.ts";
import { createMailer } from "./lib/mailer.ts";
import { startJobs } from "./lib/jobs.ts";
import { createApp } from "./app.ts";
import { createSessionCache } from "./modules/auth/session-cache.ts";
import { closeComputePool } from "./lib/compute/pool.ts";

const env = parseEnv();
const logger = createLogger(env.LOG_LEVEL, { pretty: Boolean(process.stdout.isTTY) });
const { db, sql } = createDb(env.DATABASE_URL);
const mailer = createMailer({ host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM });
const jobs = await startJobs({ databaseUrl: env.DATABASE_URL, logger, mailer });
const clientDir = env.SERVE_CLIENT === "true" ? path.resolve(env.CLIENT_DIR ?? path.join(path.dirname(fileURLToPath(import.meta.url)), "..", "dist", "client")) : undefined;
const sessionCache = createSessionCache({ databaseUrl: env.DATABASE_URL, logger });
const app = createApp({ env, db, logger, jobs, clientDir, sessionCache });

const server = app.listen(env.PORT, env.HOST, () => {
  logger.info(`Eavesight listening on http://${env.HOST}:${env.PORT}`);
  process.send?.({ ready: true });
});
// Node closes an idle keep-alive socket after 5 s; a client or proxy that reuses it at that moment
// gets a reset instead of an answer (bench/largest-analysis-bench.ts met it on a loaded machine).
// Idle sockets stay open longer than common proxies' 60 s, so the other side closes first.
server.keepAliveTimeout = 65_000;
server.headersTimeout = 66_000;

// pg-boss's background loops can reject while the database is briefly down (e.g. marking a job
// failed); on Node 20 an unhandled rejection would end the process. Log it and carry on: the
// loops retry, and requests answer 503 until the database is back.
process.on("unhandledRejection", (err) => logger.error({ err }, "unhandled rejection"));

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, "shutting down");
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  // Stop taking requests, finish the ones in flight, then the jobs, then the pool.
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await jobs.stop().catch(() => {});
  mailer.close();
  await sessionCache.close();
  await closeComputePool();
  await sql.end({ timeout: 5 });
  process.exit(0);
}
process.on("SIGINT", () => void shutdown("SIGINT"));
process.on("SIGTERM", () => void shutdown("SIGTERM"));
