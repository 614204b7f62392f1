import nodemailer from "nodemailer";

export interface OutgoingEmail {
  /** Tags the message so the fake SMTP server files it under the company's Outbox. */
  companyId: string | null;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; path?: string; content?: string; contentType?: string }[];
}

export function createMailer(opts: { host: string; port: number; from: string }) {
  const transport = nodemailer.createTransport({
    host: opts.host,
    port: opts.port,
    secure: false,
    // The local fake speaks plain SMTP on loopback; a real relay is configured by env.
    ignoreTLS: opts.host === "127.0.0.1" || opts.host === "localhost",
    // Bounded, so one attempt always ends well inside the outbox lease (JOBS_RECOVERY_SECONDS,
    // 90 s by default) and a hung relay can never lead a second worker to send the same message.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    async send(mail: OutgoingEmail): Promise<string> {
      const info = await transport.sendMail({
        from: opts.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        attachments: mail.attachments,
        headers: mail.companyId ? { "X-Eavesight-Company": mail.companyId } : {},
      });
      return info.messageId;
    },
    close: () => transport.close(),
  };
}
export type Mailer = ReturnType<typeof createMailer>;
