import { afterAll, describe, expect, it } from "vitest";
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ESLint } from "eslint";

/**
 * The import boundaries of STYLE.md ("code flows one way") are lint rules, so a wrong arrow fails
 * `npm test`. Each case lints a small file placed where the wrong import would live.
 */
const root = path.resolve(import.meta.dirname, "../..");
const eslint = new ESLint({ cwd: root });

async function rulesBroken(relativePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, relativePath) });
  return (result?.messages ?? []).map((m) => m.ruleId ?? m.message);
}

const probeDir = path.join(root, "shared", `zz-lint-probe-${process.pid}`);
afterAll(() => rmSync(probeDir, { recursive: true, force: true }));

describe("import boundaries", { timeout: 60_000 }, () => {
  it("when a feature imports another feature by a relative path, then lint fails", async () => {
    const broken = await rulesBroken("src/features/catalog/lib/probe.ts", 'import { x } from "../../proposals/lib/deposit";\nexport const y = x;\n');
    expect(broken).toContain("import-x/no-restricted-paths");
  });

  it("when a feature imports the app, then lint fails", async () => {
    const broken = await rulesBroken("src/features/catalog/lib/probe.ts", 'import { router } from "../../../app/router";\nexport const y = router;\n');
    expect(broken).toContain("import-x/no-restricted-paths");
  });

  it("when a feature imports components/, lib/ and shared/, then lint passes", async () => {
    const broken = await rulesBroken("src/features/catalog/lib/probe.ts", 'import { cn } from "@/lib/cn";\nimport { analyzeAttic } from "@shared/ventilation";\nexport const y = [cn, analyzeAttic];\n');
    expect(broken).toEqual([]);
  });

  it("when shared/ imports a bare Node built-in or the server, then lint fails", async () => {
    expect(await rulesBroken("shared/units/probe.ts", 'import { readFileSync } from "fs";\nexport const y = readFileSync;\n')).toContain("import-x/no-nodejs-modules");
    expect(await rulesBroken("shared/units/probe.ts", 'import { createApp } from "../../server/app.ts";\nexport const y = createApp;\n')).toContain("import-x/no-restricted-paths");
  });

  it("when server code imports a relative file without its extension, then lint fails", async () => {
    expect(await rulesBroken("server/lib/probe.ts", 'import { AppError } from "./errors";\nexport const y = AppError;\n')).toContain("import-x/extensions");
    expect(await rulesBroken("server/lib/probe.ts", 'import { AppError } from "./errors.ts";\nexport const y = AppError;\n')).toEqual([]);
  });

  it("when two modules import each other, then lint reports the cycle", async () => {
    mkdirSync(probeDir, { recursive: true });
    writeFileSync(path.join(probeDir, "a.ts"), 'import { b } from "./b";\nexport const a = 1;\nexport const c = b;\n');
    writeFileSync(path.join(probeDir, "b.ts"), 'import { a } from "./a";\nexport const b = a;\n');
    const [result] = await eslint.lintFiles([path.join(probeDir, "a.ts")]);
    expect(result?.messages.map((m) => m.ruleId)).toContain("import-x/no-cycle");
  });
});
