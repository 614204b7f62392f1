import pino from "pino";

export function createLogger(level: string, opts: { pretty?: boolean } = {}) {
  return pino({
    level,
    // Readable lines on a terminal (npm start); JSON lines everywhere else.
    ...(opts.pretty ? { transport: { target: "pino-pretty", options: { colorize: true, ignore: "pid,hostname", translateTime: "HH:MM:ss" } } } : {}),
    redact: { paths: ["req.headers.cookie", "req.headers.authorization", "res.headers['set-cookie']"], censor: "[redacted]" },
  });
}
export type Logger = ReturnType<typeof createLogger>;
