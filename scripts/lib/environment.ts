import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { ensureCluster, ensureDatabase, devCluster, testCluster, type ClusterConfig } from "./postgres.ts";
import { runMigrations } from "./migrate.ts";
import { projectRoot, log } from "./paths.ts";
import { startFakePayments } from "./fake-payments.ts";
import { LOCAL_PAYMENT_KEYS } from "../../server/env.ts";

export interface Environment {
  cluster: ClusterConfig;
  databaseUrl: string;
  env: NodeJS.ProcessEnv;
}

/** PostgreSQL up, database present, migrations applied: the common first half of start, dev and test. */
export async function prepareDatabase(kind: "dev" | "test", opts: { recreate?: boolean; database?: string } = {}): Promise<Environment> {
  const cluster = kind === "dev" ? devCluster() : testCluster();
  const info = ensureCluster(cluster);
  const database = opts.database ?? (kind === "dev" ? "eavesight" : "eavesight_test");
  ensureDatabase(cluster, database, { recreate: opts.recreate });
  const databaseUrl = info.appUrl(database);
  await runMigrations(databaseUrl);
  return { cluster, databaseUrl, env: { ...process.env, DATABASE_URL: databaseUrl } };
}

/** A free TCP port on loopback, so several test runs on one machine never collide. */
export async function freePort(): Promise<number> {
  const { createServer } = await import("node:net");
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

/**
 * `vite build` into dist/client, or into `outDir` (a test run builds into a folder of its own, so
 * a second run building at the same time never empties the files the first one is serving).
 */
export function buildClient(opts: { outDir?: string } = {}): void {
  log("building the client (vite build)…");
  const outDirArgs = opts.outDir ? ["--outDir", opts.outDir, "--emptyOutDir"] : [];
  const r = spawnSync(process.execPath, ["node_modules/vite/bin/vite.js", "build", "--logLevel", "warn", ...outDirArgs], { cwd: projectRoot, stdio: "inherit" });
  if (r.status !== 0) throw new Error("vite build failed");
}

/** Starts the API server as a child process and resolves once it listens. */
export function startServer(env: NodeJS.ProcessEnv, opts: { watch?: boolean } = {}): Promise<ChildProcess> {
  const args = opts.watch ? ["--import", "tsx", "--watch", "server/index.ts"] : ["--import", "tsx", "server/index.ts"];
  const child = spawn(process.execPath, args, { cwd: projectRoot, env, stdio: ["ignore", "inherit", "inherit", "ipc"] });
  return new Promise((resolve, reject) => {
    const onExit = (code: number | null) => reject(new Error(`the server exited with code ${code} before it was ready`));
    child.once("exit", onExit);
    child.on("message", (m: { ready?: boolean }) => {
      if (m?.ready) {
        child.off("exit", onExit);
        resolve(child);
      }
    });
  });
}

export function stopChild(child: ChildProcess | undefined, signal: NodeJS.Signals = "SIGTERM"): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once("exit", () => resolve());
    child.kill(signal);
  });
}

/**
 * The local fake payment service (scripts/lib/fake-payments.ts) for a server on `appPort`, and the
 * env that points the server's payment SDK at it. When STRIPE_SECRET_KEY is set without
 * PAYMENTS_API_BASE, the real service is configured and no fake is started (never for tests).
 */
export async function startLocalPayments(opts: { appPort: number; port?: number; quiet?: boolean; isTest?: boolean }) {
  if (!opts.isTest && process.env.STRIPE_SECRET_KEY && !process.env.PAYMENTS_API_BASE) {
    log("payments: using the service STRIPE_SECRET_KEY configures (no local fake)");
    return { env: {} as NodeJS.ProcessEnv, close: async () => {} };
  }
  const fake = await startFakePayments({
    port: opts.port ?? Number(process.env.FAKE_PAYMENTS_PORT ?? 0),
    apiKey: LOCAL_PAYMENT_KEYS.STRIPE_SECRET_KEY, webhookSecret: LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET,
    webhookUrl: `http://127.0.0.1:${opts.appPort}/api/webhooks/payments`, quiet: opts.quiet,
  });
  if (!opts.quiet) log(`fake payment service on ${fake.url} (test payments only; no money moves)`);
  const env: NodeJS.ProcessEnv = { PAYMENTS_API_BASE: fake.url, ...LOCAL_PAYMENT_KEYS };
  return { env, close: () => fake.close() };
}
