/**
 * Gzip size of the client's JavaScript: the entry (first route) and each lazy chunk, from a fresh
 * `vite build` into a temporary folder. Also checks that the PDF renderer never reaches the client.
 * Prints figures; asserts nothing (issue 9: measured in bench/, not in timed tests).
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";

const outDir = mkdtempSync(path.join(tmpdir(), "eavesight-bundle-"));
try {
  execFileSync(process.execPath, ["node_modules/vite/bin/vite.js", "build", "--outDir", outDir, "--emptyOutDir", "--logLevel", "error"], { stdio: "inherit" });
  const html = readFileSync(path.join(outDir, "index.html"), "utf8");
  const entry = /<script type="module"[^>]*src="\/assets\/([^"]+)"/.exec(html)?.[1];
  const assets = path.join(outDir, "assets");
  const rows = readdirSync(assets)
    .filter((f) => f.endsWith(".js"))
    .map((f) => {
      const bytes = readFileSync(path.join(assets, f));
      return { file: f, rawKb: bytes.length / 1024, gzipKb: gzipSync(bytes).length / 1024, hasPdf: bytes.includes("@react-pdf") || bytes.includes("react-pdf") };
    })
    .sort((a, b) => b.gzipKb - a.gzipKb);
  const entryRow = rows.find((r) => r.file === entry);
  console.log(`entry (first route): ${entry} — ${entryRow?.gzipKb.toFixed(1)} kB gzip (${entryRow?.rawKb.toFixed(1)} kB raw)`);
  console.log("largest chunks (gzip kB):");
  for (const r of rows.slice(0, 12)) console.log(`  ${r.gzipKb.toFixed(1).padStart(7)}  ${r.file}`);
  console.log(`all JS: ${rows.reduce((n, r) => n + r.gzipKb, 0).toFixed(1)} kB gzip in ${rows.length} files`);
  const withPdf = rows.filter((r) => r.hasPdf);
  console.log(withPdf.length === 0 ? "PDF renderer in the client bundle: no" : `PDF renderer in the client bundle: YES (${withPdf.map((r) => r.file).join(", ")})`);
} finally {
  rmSync(outDir, { recursive: true, force: true });
}
