/**
 * A local stand-in for an SMTP relay: accepts every message on loopback and files it in the
 * outbox_messages table, where the owner's Outbox page and the tests read it. No mail leaves
 * the machine.
 */
import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";
import postgres from "postgres";

const addressText = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a.map((x) => x.text).join(", ") : a?.text) ?? "";

export async function startFakeSmtp(opts: { port: number; databaseUrl: string; quiet?: boolean }) {
  const sql = postgres(opts.databaseUrl, { max: 2, onnotice: () => {} });
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["AUTH", "STARTTLS"],
    authOptional: true,
    banner: "Eavesight local mail catcher",
    size: 30 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const companyHeader = mail.headers.get("x-eavesight-company");
          const companyId = typeof companyHeader === "string" && /^[0-9a-f-]{36}$/.test(companyHeader) ? companyHeader : null;
          await sql`
            insert into outbox_messages (company_id, message_id, from_address, to_address, subject, text, html)
            values (${companyId}, ${mail.messageId ?? null}, ${addressText(mail.from)}, ${addressText(mail.to)},
                    ${mail.subject ?? "(no subject)"}, ${mail.text ?? null}, ${typeof mail.html === "string" ? mail.html : null})`;
          if (!opts.quiet) console.log(`[mail] to ${addressText(mail.to)}: ${mail.subject}`);
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  return {
    port: opts.port,
    async close() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await sql.end({ timeout: 2 });
    },
  };
}
