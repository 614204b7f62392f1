// @ts-check
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import importX from "eslint-plugin-import-x";
import reactHooks from "eslint-plugin-react-hooks";
import globals from "globals";
import { createTypeScriptImportResolver } from "eslint-import-resolver-typescript";
import { readdirSync } from "node:fs";

/** Each feature folder may import itself, components/, lib/, config/ and shared/: never another feature or the app. */
const features = readdirSync(new URL("./src/features", import.meta.url), { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name);
const featureZones = features.map((name) => ({
  target: `./src/features/${name}`,
  from: ["./src/features", "./src/app"],
  except: [`./${name}`],
  message: "A feature imports only components/, lib/, config/ and shared/; compose features in src/app/routes.",
}));

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", ".var/**", "drizzle/**", "public/**", "tests/setup/frozen-core/*.mjs"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { "import-x": importX },
    settings: {
      "import-x/resolver-next": [createTypeScriptImportResolver({ project: "./tsconfig.json" })],
      // no-cycle parses the files it follows: it must know TypeScript files and their parser.
      "import-x/extensions": [".ts", ".tsx", ".js", ".mjs"],
      "import-x/parsers": { "@typescript-eslint/parser": [".ts", ".tsx"] },
    },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" }],
      "@typescript-eslint/no-explicit-any": "error",
      // Code flows one way: shared → (server | src); features do not reach into each other.
      "no-restricted-imports": "off",
      "import-x/no-cycle": ["error", { ignoreExternal: true }],
      "import-x/no-restricted-paths": ["error", { zones: [
        ...featureZones,
        { target: "./shared", from: ["./src", "./server", "./scripts", "./tests"], message: "shared/ is the pure core: it imports nothing from src/ or server/." },
        { target: "./src", from: "./server", message: "src/ never imports the server." },
        { target: "./server", from: "./src", message: "server/ never imports the client." },
      ] }],
    },
  },
  {
    files: ["shared/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", {
        patterns: [
          { group: ["**/src/**", "**/server/**", "@/*", "@server/*"], message: "shared/ is the pure core: it imports nothing from src/ or server/." },
          { group: ["react", "react-dom", "express", "drizzle-orm", "drizzle-orm/*", "postgres", "node:*"], message: "shared/ is pure TypeScript: no React, Express, Drizzle or Node I/O." },
        ],
      }],
      // Bare built-ins too ("fs", "crypto"), not only the node: prefix.
      "import-x/no-nodejs-modules": "error",
    },
  },
  {
    // One import style in server code (run by Node through tsx): relative imports name their file, extension included.
    files: ["server/**/*.{ts,tsx}"],
    rules: {
      "import-x/extensions": ["error", "always", { ignorePackages: true, checkTypeImports: true }],
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/src/**", "@/*", "react", "react-dom"], message: "server/ never imports the client." }] }],
    },
  },
  {
    // The proposal PDF is written in react-pdf's JSX: React here is a document language, not the client.
    files: ["server/modules/proposals/pdf/**/*.tsx"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/src/**", "@/*", "react-dom"], message: "The PDF never imports the client." }] }],
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/server/**", "@server/*", "express", "drizzle-orm", "postgres"], message: "src/ never imports the server." }] }],
    },
  },
  {
    // Features don't import each other: shared pieces go to components/ or lib/, and routes compose features.
    files: ["src/features/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [
        { group: ["**/server/**", "@server/*", "express", "drizzle-orm", "postgres"], message: "src/ never imports the server." },
        { group: ["@/features/*", "@/app/*"], message: "A feature never imports another feature or the app; compose them in src/app/routes." },
      ] }],
    },
  },
);
