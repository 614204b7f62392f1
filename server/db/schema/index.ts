export * from "./companies.ts";
export * from "./users.ts";
export * from "./sessions.ts";
export * from "./auth-tokens.ts";
export * from "./audit-events.ts";
export * from "./outbox-messages.ts";
