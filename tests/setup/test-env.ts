/** Settings the test task (scripts/tasks/test.ts) passes down; a clear stop when run another way. */
export function testDatabaseUrl(): string {
  const url = process.env.EAVESIGHT_TEST_DATABASE_URL;
  if (!url) throw new Error("These tests need the test database: run them with `npm test` (or `npm test -- --only api`).");
  return url;
}
export const testSmtpPort = () => Number(process.env.SMTP_PORT ?? 2526);
