#!/usr/bin/env node
// The one entry point that runs before dependencies exist: plain JavaScript on purpose
// (Node 20 cannot run TypeScript without tsx, and tsx is a dependency). It installs
// node_modules when they are missing or older than package-lock.json, then hands over
// to the TypeScript task in scripts/tasks/<name>.ts.
import { spawnSync, spawn } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { fileURLToPath } from "node:url";
import path from "node:path";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const task = process.argv[2];
if (!task) {
  console.error("usage: node scripts/bootstrap.mjs <task> [args]");
  process.exit(2);
}

const marker = path.join(root, "node_modules", ".package-lock.json");
const lock = path.join(root, "package-lock.json");
// A patch of a dependency (scripts/patches, applied by patch-package at install) counts as a change too.
const patchDir = path.join(root, "scripts", "patches");
const newestInput = Math.max(statSync(lock).mtimeMs, ...(existsSync(patchDir) ? readdirSync(patchDir).map((f) => statSync(path.join(patchDir, f)).mtimeMs) : []));
const needsInstall = !existsSync(marker) || statSync(marker).mtimeMs < newestInput;
if (needsInstall) {
  console.log("[eavesight] installing dependencies (npm ci)…");
  const r = spawnSync("npm", ["ci", "--no-audit", "--no-fund"], { cwd: root, stdio: "inherit" });
  if (r.status !== 0) {
    console.error("[eavesight] npm ci failed; see the output above.");
    process.exit(r.status ?? 1);
  }
}

const child = spawn(
  process.execPath,
  ["--import", "tsx", path.join(root, "scripts", "tasks", `${task}.ts`), ...process.argv.slice(3)],
  { cwd: root, stdio: "inherit" },
);
// The child receives Ctrl-C from the terminal itself (same process group); just wait for it.
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => child.kill(sig));
child.on("exit", (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
