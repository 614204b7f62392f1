import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { log } from "./paths.ts";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

/** Debian's Chromium for the browser tests; installed with apt-get when missing (never downloaded by a test tool). */
export function ensureChromium(): void {
  if (existsSync(CHROMIUM_PATH)) return;
  if (process.getuid?.() !== 0) throw new Error(`Chromium not found at ${CHROMIUM_PATH}. Install it: sudo apt-get install -y chromium`);
  log("installing Debian's chromium and poppler-utils (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  for (const args of [["update"], ["install", "-y", "--no-install-recommends", "chromium", "poppler-utils"]]) {
    const r = spawnSync("apt-get", args, { stdio: "inherit", env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(" ")} failed`);
  }
}
