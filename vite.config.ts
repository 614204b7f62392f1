import { fileURLToPath } from "node:url";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression } from "vite-plugin-compression2";
import { defineConfig } from "vitest/config";

const alias = {
  "@shared": fileURLToPath(new URL("./shared", import.meta.url)),
  "@": fileURLToPath(new URL("./src", import.meta.url)),
};

const apiPort = Number(process.env.PORT ?? 3000);

export default defineConfig({
  // Each built JS, CSS and HTML file over 1 kB also as .br and .gz, served by server/lib/delivery.ts.
  plugins: [react(), tailwindcss(), compression({ algorithms: ["brotliCompress", "gzip"], threshold: 1024 })],
  resolve: { alias },
  build: { outDir: "dist/client", sourcemap: true, chunkSizeWarningLimit: 900 },
  server: {
    host: "127.0.0.1",
    port: 5173,
    proxy: { "/api": `http://127.0.0.1:${apiPort}` },
  },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          include: ["shared/**/*.test.ts", "server/**/*.test.ts", "src/**/*.test.{ts,tsx}", "tests/unit/**/*.test.ts"],
          environment: "node",
          // A guard against a hang, not a speed check: property tests of 1,000 runs pass 5 s on a busy machine.
          testTimeout: 20_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "api",
          include: ["tests/api/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          // Faults on purpose: servers killed, PostgreSQL stopped under load. One file at a time.
          name: "stress",
          include: ["tests/stress/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
