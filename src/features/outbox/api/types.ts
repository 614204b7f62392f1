/** One e-mail the app sent (to the local fake SMTP server in development and tests). */
export interface OutboxMessage {
  id: string;
  to: string;
  from: string;
  subject: string;
  text: string | null;
  html: string | null;
  createdAt: string;
}
