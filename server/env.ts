import { z } from "zod";

/** Configuration, parsed once and failing fast with a readable list of what is wrong. */
const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default("127.0.0.1"),
  DATABASE_URL: z.string().url(),
  /**
   * Public origin the app is served from (scheme, host, port; no path): every link the product
   * mails is built from it, never from a request's Host, Origin or X-Forwarded-* headers, which
   * anyone can forge. Required in production; elsewhere it defaults to http://HOST:PORT.
   */
  APP_ORIGIN: z.preprocess((v) => (v === "" ? undefined : v), z.string().optional()),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().default(2525),
  MAIL_FROM: z.string().default("Eavesight <no-reply@eavesight.example>"),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  STORAGE_DRIVER: z.enum(["local", "s3"]).default("local"),
  STORAGE_DIR: z.string().default(".var/files"),
  S3_ENDPOINT: z.string().optional(),
  S3_BUCKET: z.string().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  SERVE_CLIENT: z.enum(["true", "false"]).default("true"),
  /**
   * Express's "trust proxy": which hops' X-Forwarded-For to believe. "loopback" suits a proxy on
   * the same host; behind one elsewhere give its address or subnet (e.g. "10.0.0.0/8"), else every
   * homeowner shares the proxy's address and its rate limit. Comma-separated for several; a
   * plain number trusts that many hops.
   */
  TRUST_PROXY: z.string().min(1).default("loopback"),
  /** The built client to serve; dist/client unless a test run built its own copy elsewhere. */
  CLIENT_DIR: z.string().optional(),
  /**
   * How long background work may look stalled before another server takes it over: an unsent
   * outbox e-mail, a PDF render whose server died. Also the e-mail lease, so it must stay above
   * the mailer's worst case (about 50 s). Tests shorten it to watch a recovery happen.
   */
  JOBS_RECOVERY_SECONDS: z.coerce.number().int().min(2).max(3_600).default(90),
  /** Worker threads for analyses and PDFs (server/lib/compute); unset: the cores less one; 0 runs them inline. */
  COMPUTE_THREADS: z.coerce.number().int().min(0).max(64).optional(),
  /** Tasks that may wait for a compute thread before the next is refused as busy (503). */
  COMPUTE_QUEUE: z.coerce.number().int().min(0).max(10_000).default(64),
  /**
   * Where the payment provider's API is, e.g. http://127.0.0.1:4243 for the local fake
   * (scripts/lib/fake-payments.ts); unset means the provider's real API.
   */
  PAYMENTS_API_BASE: z.string().url().optional(),
  /** The provider's secret API key. Development and tests get a placeholder that only the local fake takes. */
  STRIPE_SECRET_KEY: z.string().min(1).optional(),
  /** The signing secret of the webhook endpoint (whsec_…); webhooks signed otherwise are refused. */
  STRIPE_WEBHOOK_SECRET: z.string().min(1).optional(),
});

/**
 * Placeholders for development and tests only: the local fake payment service accepts them;
 * the real service would refuse them. Production must configure its own (or have no online deposits).
 */
export const LOCAL_PAYMENT_KEYS = {
  STRIPE_SECRET_KEY: "sk_test_eavesight_local_fake",
  STRIPE_WEBHOOK_SECRET: "whsec_eavesight_local_fake",
} as const;

/** An origin as browsers write it ("https://app.example.com"), or an error message saying what is wrong. */
export function normalizeOrigin(value: string): { origin: string } | { error: string } {
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    return { error: `"${value}" is not a URL; give the public origin, e.g. https://app.example.com` };
  }
  if (url.protocol !== "http:" && url.protocol !== "https:") return { error: "use an http:// or https:// origin" };
  if ((url.pathname !== "/" && url.pathname !== "") || url.search || url.hash || url.username || url.password) {
    return { error: `give the origin only (scheme, host and port), e.g. ${url.origin}` };
  }
  return { origin: url.origin };
}

const EnvWithPaymentsSchema = EnvSchema.transform((env, ctx) => {
  const withKeys = env.NODE_ENV === "production"
    ? env
    : { ...env, STRIPE_SECRET_KEY: env.STRIPE_SECRET_KEY ?? LOCAL_PAYMENT_KEYS.STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET: env.STRIPE_WEBHOOK_SECRET ?? LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET };
  let appOrigin = `http://${env.HOST}:${env.PORT}`;
  if (env.APP_ORIGIN !== undefined) {
    const parsed = normalizeOrigin(env.APP_ORIGIN);
    if ("error" in parsed) ctx.addIssue({ code: "custom", path: ["APP_ORIGIN"], message: parsed.error });
    else appOrigin = parsed.origin;
  } else if (env.NODE_ENV === "production") {
    ctx.addIssue({
      code: "custom", path: ["APP_ORIGIN"],
      message: "required in production: the public origin users reach the app at (e.g. https://app.example.com). Links in e-mail (password reset, invitations, proposals) are built from it and never from request headers.",
    });
  }
  return { ...withKeys, APP_ORIGIN: appOrigin };
}).superRefine((env, ctx) => {
  if (Boolean(env.STRIPE_SECRET_KEY) !== Boolean(env.STRIPE_WEBHOOK_SECRET)) {
    ctx.addIssue({ code: "custom", path: ["STRIPE_WEBHOOK_SECRET"], message: "set STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET together (or neither, for no online deposits)" });
  }
});

export type Env = z.infer<typeof EnvWithPaymentsSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = EnvWithPaymentsSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join("\n")}`);
  }
  return result.data;
}
