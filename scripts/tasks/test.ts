/**
 * `npm test`: the whole suite as CI runs it. Bootstraps a throwaway PostgreSQL cluster and
 * database, the fake SMTP server and (for the browser tests) the built app, then runs
 * type-check, lint, unit + API tests, end-to-end tests in Debian's Chromium, and the stress
 * tests (faults on purpose).
 * Every step runs even if an earlier one failed; the last line sums them up.
 * `npm test -- --only unit,api` runs a subset.
 */
import { spawn } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import { prepareDatabase, buildClient, startServer, stopChild, freePort, startLocalPayments } from "../lib/environment.ts";
import { dropDatabase, listDatabases, testCluster } from "../lib/postgres.ts";
import { startFakeSmtp } from "../lib/fake-smtp.ts";
import { seedDemo } from "../lib/seed.ts";
import { ensureChromium } from "../lib/chromium.ts";
import { projectRoot, log } from "../lib/paths.ts";

const started = Date.now();
// `--only unit,api` or `--only=unit,api` runs a subset; no flag runs everything.
const onlyIndex = process.argv.indexOf("--only");
const onlyArg = process.argv.find((a) => a.startsWith("--only="))?.slice(7) ?? (onlyIndex >= 0 ? process.argv[onlyIndex + 1] : undefined);
const only = onlyArg ? new Set(onlyArg.split(",")) : null;
/** Anything else on the command line is handed to vitest as file filters, e.g. `npm test -- --only api catalog`. */
const fileFilters = process.argv.slice(2).filter((a, i, all) => !a.startsWith("--only") && all[i - 1] !== "--only");
const wants = (step: string) => !only || only.has(step);

const results: { step: string; ok: boolean; summary: string }[] = [];
const reportDir = path.join(projectRoot, ".var", "test-reports");
rmSync(reportDir, { recursive: true, force: true });
mkdirSync(reportDir, { recursive: true });

/** Runs a step as a child without blocking this process: the fake SMTP server lives here. */
function run(step: string, args: string[], env: NodeJS.ProcessEnv): Promise<{ status: number | null }> {
  log(`── ${step} ──`);
  const child = spawn(process.execPath, args, { cwd: projectRoot, env, stdio: "inherit" });
  return new Promise((resolve) => child.on("exit", (status) => resolve({ status })));
}

async function vitest(step: string, projects: string[], env: NodeJS.ProcessEnv) {
  const out = path.join(reportDir, `${step}.json`);
  const r = await run(step, [
    "node_modules/vitest/vitest.mjs", "run", ...projects.flatMap((p) => ["--project", p]),
    ...fileFilters, "--reporter=default", "--reporter=json", `--outputFile.json=${out}`,
  ], env);
  let summary = r.status === 0 ? "passed" : "FAILED";
  if (existsSync(out)) {
    const j = JSON.parse(readFileSync(out, "utf8")) as { numPassedTests: number; numFailedTests: number; numTotalTests: number };
    summary = `${j.numPassedTests}/${j.numTotalTests} passed${j.numFailedTests ? `, ${j.numFailedTests} failed` : ""}`;
  }
  results.push({ step, ok: r.status === 0, summary });
}

// Each run gets its own database and ports, so two runs on one machine never disturb each other;
// databases left by runs that died are dropped here.
const testPort = Number(process.env.EAVESIGHT_TEST_PORT ?? (await freePort()));
const smtpPort = Number(process.env.EAVESIGHT_TEST_SMTP_PORT ?? (await freePort()));
const database = `eavesight_test_${process.pid}`;
// This run's own client build: another run building at the same time cannot empty it. (Not under
// .var: express.static and sendFile refuse paths through a dot-folder.)
const clientDir = path.join(projectRoot, "dist", `client-test-${process.pid}`);
const { databaseUrl, env: baseEnv } = await prepareDatabase("test", { recreate: true, database });
for (const name of listDatabases(testCluster())) {
  const pid = Number(/^eavesight_test_(\d+)$/.exec(name)?.[1]);
  if (pid && pid !== process.pid && !isAlive(pid)) dropDatabase(testCluster(), name);
}
for (const name of existsSync(path.dirname(clientDir)) ? readdirSync(path.dirname(clientDir)) : []) {
  const pid = Number(/^client-test-(\d+)$/.exec(name)?.[1]);
  if (pid && pid !== process.pid && !isAlive(pid)) rmSync(path.join(path.dirname(clientDir), name), { recursive: true, force: true });
}
function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}
await seedDemo(databaseUrl);
const smtp = await startFakeSmtp({ port: smtpPort, databaseUrl, quiet: true });
const env: NodeJS.ProcessEnv = {
  ...baseEnv, NODE_ENV: "test", SMTP_PORT: String(smtpPort), LOG_LEVEL: "warn",
  EAVESIGHT_TEST_DATABASE_URL: databaseUrl,
};

try {
  if (wants("typecheck")) {
    const r = await run("typecheck", ["node_modules/typescript/bin/tsc", "--noEmit", "-p", "."], env);
    results.push({ step: "typecheck", ok: r.status === 0, summary: r.status === 0 ? "no errors" : "errors" });
  }
  if (wants("lint")) {
    const r = await run("lint", ["node_modules/eslint/bin/eslint.js", "--max-warnings=0", "."], env);
    results.push({ step: "lint", ok: r.status === 0, summary: r.status === 0 ? "clean" : "problems" });
  }
  // The API tests read rendered PDFs with poppler-utils; the browser tests need Chromium.
  if (wants("api") || wants("e2e")) ensureChromium();
  if (wants("unit") || wants("api")) {
    await vitest("unit+api", [...(wants("unit") ? ["unit"] : []), ...(wants("api") ? ["api"] : [])], env);
  }
  if (wants("e2e")) {
    buildClient({ outDir: clientDir });
    const payments = await startLocalPayments({ appPort: testPort, quiet: true, isTest: true });
    const server = await startServer({ ...env, ...payments.env, PORT: String(testPort), APP_ORIGIN: `http://127.0.0.1:${testPort}`, LOG_LEVEL: "error", CLIENT_DIR: clientDir });
    try {
      // E2E_CLIENT_DIR: the field-mode test publishes a "new version" of the service worker there.
      await vitest("e2e", ["e2e"], { ...env, ...payments.env, E2E_BASE_URL: `http://127.0.0.1:${testPort}`, E2E_CLIENT_DIR: clientDir });
    } finally {
      await stopChild(server);
      await payments.close();
    }
  }
  // Last, because it stops the shared test cluster on purpose: servers killed mid-send,
  // PostgreSQL restarted under load. `npm run test:stress` runs this step alone.
  if (wants("stress")) await vitest("stress", ["stress"], env);
} finally {
  await smtp.close();
  dropDatabase(testCluster(), database);
  rmSync(clientDir, { recursive: true, force: true });
}

const seconds = Math.round((Date.now() - started) / 1000);
const ok = results.length > 0 && results.every((r) => r.ok);
console.log("\n" + results.map((r) => `  ${r.ok ? "ok  " : "FAIL"}  ${r.step.padEnd(10)} ${r.summary}`).join("\n"));
console.log(`\neavesight test: ${ok ? "PASS" : "FAIL"} — ${results.map((r) => `${r.step} ${r.ok ? "ok" : "failed"}`).join(", ")} — ${seconds}s`);
process.exit(ok ? 0 : 1);
