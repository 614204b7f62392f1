import type { ChildProcess } from "node:child_process";
import { freePort, startServer, stopChild } from "../../scripts/lib/environment.ts";
import { testDatabaseUrl } from "./test-env.ts";

/**
 * The real server as its own process (server/index.ts, workers included) on the test database,
 * for tests that kill it or pull its database away. Requests go over HTTP with a session cookie.
 */
export interface ServerProcess {
  origin: string;
  child: ChildProcess;
  /** Signs in and returns a fetch bound to the session and this server's Origin. */
  signIn(email: string, password: string): Promise<SessionFetch>;
  stop(signal?: NodeJS.Signals): Promise<void>;
}
export type SessionFetch = (path: string, init?: { method?: string; body?: unknown }) => Promise<{ status: number; body: unknown }>;

export async function startServerProcess(env: Record<string, string> = {}): Promise<ServerProcess> {
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  const child = await startServer({
    ...process.env, NODE_ENV: "test", DATABASE_URL: testDatabaseUrl(), PORT: String(port), APP_ORIGIN: origin,
    SERVE_CLIENT: "false", LOG_LEVEL: "fatal", ...env,
  });
  // The server must never outlive the test file, even when an assertion throws first.
  const onExit = () => child.kill("SIGKILL");
  process.once("exit", onExit);

  async function call(cookie: string | null, path: string, init: { method?: string; body?: unknown } = {}) {
    const res = await fetch(`${origin}${path}`, {
      method: init.method ?? "GET",
      headers: { origin, "content-type": "application/json", ...(cookie ? { cookie } : {}) },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      signal: AbortSignal.timeout(15_000),
    });
    const text = await res.text();
    let body: unknown = text;
    try {
      body = JSON.parse(text);
    } catch {
      // not JSON: keep the text, so a failure message can show it
    }
    return { status: res.status, body, setCookie: res.headers.getSetCookie() };
  }

  return {
    origin,
    child,
    async signIn(email, password) {
      const res = await call(null, "/api/auth/sign-in", { method: "POST", body: { email, password } });
      if (res.status !== 200) throw new Error(`sign-in to the server process failed: ${res.status} ${JSON.stringify(res.body)}`);
      const cookie = res.setCookie.map((c) => c.split(";")[0]).join("; ");
      return async (path, init) => {
        const { status, body } = await call(cookie, path, init);
        return { status, body };
      };
    },
    async stop(signal = "SIGTERM") {
      process.off("exit", onExit);
      await stopChild(child, signal);
    },
  };
}
