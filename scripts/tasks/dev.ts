/** `npm run dev`: API with reload on change and the Vite dev server (hot reload) proxying /api. */
import { spawn } from "node:child_process";
import { prepareDatabase, startServer, stopChild, startLocalPayments } from "../lib/environment.ts";
import { startFakeSmtp } from "../lib/fake-smtp.ts";
import { seedDemo } from "../lib/seed.ts";
import { projectRoot, log } from "../lib/paths.ts";

const port = Number(process.env.PORT ?? 3000);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const { databaseUrl, env } = await prepareDatabase("dev");
await seedDemo(databaseUrl);
const smtp = await startFakeSmtp({ port: smtpPort, databaseUrl });
const payments = await startLocalPayments({ appPort: port });
const server = await startServer({ ...env, ...payments.env, PORT: String(port), SMTP_PORT: String(smtpPort), SERVE_CLIENT: "false", APP_ORIGIN: "http://127.0.0.1:5173" }, { watch: true });
const vite = spawn(process.execPath, ["node_modules/vite/bin/vite.js"], { cwd: projectRoot, env: { ...env, PORT: String(port) }, stdio: "inherit" });
log("open http://127.0.0.1:5173");

async function stop() {
  vite.kill("SIGTERM");
  await stopChild(server);
  await smtp.close();
  await payments.close();
  process.exit(0);
}
process.on("SIGINT", () => void stop());
process.on("SIGTERM", () => void stop());
