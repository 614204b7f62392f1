/**
 * Size of the client's JavaScript from a fresh `vite build` into a temporary folder: what the first
 * page (sign-in) and the survey workspace load before they can paint — the entry, everything it
 * imports statically, and the route's own chunk with its static imports, read from Vite's manifest
 * — beside the goals of issue 17 (first page ≤ 170 kB gzip, workspace ≤ 250 kB). Also the largest
 * chunks, whether mathjs sits in its own chunk and whether the PDF renderer ever reaches the client.
 * Prints figures; asserts nothing (issue 9: measured in bench/, not in timed tests).
 *
 * `BENCH_CLIENT_ROOT=/path/to/a/checkout` measures another checkout (the baseline) the same way.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { brotliCompressSync, gzipSync } from "node:zlib";

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

const PAGES = [
  { name: "first page (sign-in)", route: "src/app/routes/auth/sign-in.tsx", goalKb: 170 },
  { name: "survey workspace", route: "src/app/routes/projects-detail.tsx", goalKb: 250 },
] as const;

/** A route module's lazy parents in the router (the signed-in shell), found by their source path. */
const SHELL_FOR: Record<string, string[]> = {
  "src/app/routes/projects-detail.tsx": ["src/app/layouts/app-layout.tsx"],
};

const root = path.resolve(process.env.BENCH_CLIENT_ROOT ?? ".");
const outDir = mkdtempSync(path.join(tmpdir(), "eavesight-bundle-"));
try {
  execFileSync(process.execPath, [path.join(root, "node_modules/vite/bin/vite.js"), "build", "--outDir", outDir, "--emptyOutDir", "--manifest", "--logLevel", "error"], {
    stdio: "inherit",
    cwd: root,
  });
  const manifest = JSON.parse(readFileSync(path.join(outDir, ".vite", "manifest.json"), "utf8")) as Record<string, ManifestChunk>;
  const sizes = new Map<string, { gzipKb: number; brotliKb: number; rawKb: number }>();
  const sizeOf = (file: string) => {
    let size = sizes.get(file);
    if (!size) {
      const bytes = readFileSync(path.join(outDir, file));
      size = { rawKb: bytes.length / 1000, gzipKb: gzipSync(bytes, { level: 9 }).length / 1000, brotliKb: brotliCompressSync(bytes).length / 1000 };
      sizes.set(file, size);
    }
    return size;
  };
  const closure = (key: string, seen = new Set<string>()): Set<string> => {
    if (seen.has(key) || !manifest[key]) return seen;
    seen.add(key);
    for (const imported of manifest[key].imports ?? []) closure(imported, seen);
    return seen;
  };
  const entryKey = Object.keys(manifest).find((key) => manifest[key]!.isEntry)!;
  console.log(`client JS measured from ${root}`);
  for (const page of PAGES) {
    const keys = closure(entryKey);
    for (const key of [...(SHELL_FOR[page.route] ?? []), page.route]) {
      if (manifest[key]) closure(key, keys);
    }
    const files = [...keys].map((key) => manifest[key]!.file).filter((file) => file.endsWith(".js"));
    const gzipKb = files.reduce((sum, file) => sum + sizeOf(file).gzipKb, 0);
    const brotliKb = files.reduce((sum, file) => sum + sizeOf(file).brotliKb, 0);
    console.log(`${page.name}: ${gzipKb.toFixed(1)} kB gzip (${brotliKb.toFixed(1)} kB brotli) in ${files.length} JS files — goal ≤ ${page.goalKb} kB gzip`);
  }
  const assets = path.join(outDir, "assets");
  const rows = readdirSync(assets)
    .filter((file) => file.endsWith(".js"))
    .map((file) => {
      const bytes = readFileSync(path.join(assets, file));
      return { file, ...sizeOf(`assets/${file}`), hasPdf: bytes.includes("@react-pdf") || bytes.includes("react-pdf"), hasMathjs: bytes.includes("typed-function") || bytes.includes("mathjs") };
    })
    .sort((a, b) => b.gzipKb - a.gzipKb);
  console.log("largest chunks (gzip kB):");
  for (const row of rows.slice(0, 10)) console.log(`  ${row.gzipKb.toFixed(1).padStart(7)}  ${row.file}${row.hasMathjs ? "  (mathjs)" : ""}`);
  console.log(`all JS: ${rows.reduce((sum, row) => sum + row.gzipKb, 0).toFixed(1)} kB gzip in ${rows.length} files`);
  const withMathjs = rows.filter((row) => row.hasMathjs).map((row) => row.file);
  console.log(`chunks holding mathjs: ${withMathjs.join(", ") || "none"}`);
  const withPdf = rows.filter((row) => row.hasPdf);
  console.log(withPdf.length === 0 ? "PDF renderer in the client bundle: no" : `PDF renderer in the client bundle: YES (${withPdf.map((row) => row.file).join(", ")})`);
} finally {
  rmSync(outDir, { recursive: true, force: true });
}
