import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { log } from "./paths.ts";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

/** Debian packages the tests need, each with the program that shows it is installed. */
const TEST_PACKAGES: { pkg: string; program: string }[] = [
  { pkg: "chromium", program: CHROMIUM_PATH },
  // pdftotext and pdftoppm read the rendered PDFs in the API and browser tests.
  { pkg: "poppler-utils", program: "/usr/bin/pdftotext" },
];

/**
 * Debian's Chromium and poppler-utils for the tests; installed with apt-get when missing (never
 * downloaded by a test tool). Each package is checked on its own: a machine may have one and not the other.
 */
export function ensureChromium(): void {
  const missing = TEST_PACKAGES.filter((p) => !existsSync(p.program)).map((p) => p.pkg);
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) throw new Error(`Missing test tools. Install them: sudo apt-get install -y ${missing.join(" ")}`);
  log(`installing Debian's ${missing.join(" and ")} (apt-get)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  for (const args of [["update"], ["install", "-y", "--no-install-recommends", ...missing]]) {
    const r = spawnSync("apt-get", args, { stdio: "inherit", env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(" ")} failed`);
  }
}
