/** `npm start`: the product with demo data on http://127.0.0.1:3000 (PORT overrides). */
import { prepareDatabase, buildClient, startServer, stopChild, startLocalPayments } from "../lib/environment.ts";
import { startFakeSmtp } from "../lib/fake-smtp.ts";
import { seedDemo, DEMO_USERS, DEMO_PASSWORD } from "../lib/seed.ts";
import { log } from "../lib/paths.ts";

const port = Number(process.env.PORT ?? 3000);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);

const { databaseUrl, env } = await prepareDatabase("dev");
await seedDemo(databaseUrl);
buildClient();
const smtp = await startFakeSmtp({ port: smtpPort, databaseUrl });
log(`fake SMTP server on 127.0.0.1:${smtpPort} (messages appear in Settings → Outbox)`);
const payments = await startLocalPayments({ appPort: port });
const server = await startServer({ ...env, ...payments.env, PORT: String(port), SMTP_PORT: String(smtpPort), NODE_ENV: "production",
  // Production refuses to start without it: e-mailed links are built from it alone.
  APP_ORIGIN: process.env.APP_ORIGIN ?? `http://${process.env.HOST ?? "127.0.0.1"}:${port}`,
});

console.log(`
  Eavesight is running:  http://127.0.0.1:${port}

  Demo sign-ins (password for all: ${DEMO_PASSWORD} — demo data only):
${DEMO_USERS.map((u) => `    ${u.role.padEnd(10)} ${u.email}`).join("\n")}

  Ctrl-C stops the app. PostgreSQL keeps running for next time; \`npm run db:stop\` stops it.
`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  await stopChild(server);
  await smtp.close();
  await payments.close();
  log("stopped");
  process.exit(0);
}
process.on("SIGINT", () => void stop());
process.on("SIGTERM", () => void stop());
server.on("exit", (code) => {
  if (!stopping) {
    log(`the server exited (code ${code})`);
    void Promise.all([smtp.close(), payments.close()]).then(() => process.exit(code ?? 1));
  }
});
