/**
 * The yardstick for bench/api-load-bench.ts: a bare Express app with one postgres.js pool (the
 * size the app's own pool has) answering each benchmarked route with one comparable hand-written
 * query and nothing else — no session, no helmet, no logging, no validation, no ORM, no analysis.
 * The app's figure divided by this one is what all of that costs on the same machine and data.
 *
 * Started by the load bench as a child process: DATABASE_URL, PORT, BASELINE_COMPANY_ID; it
 * reports `{ ready: true }` over IPC once it listens, as server/index.ts does.
 */
import { createHash } from "node:crypto";
import express from "express";
import postgres from "postgres";

const databaseUrl = process.env.DATABASE_URL;
const port = Number(process.env.PORT);
const companyId = process.env.BASELINE_COMPANY_ID;
if (!databaseUrl || !port || !companyId) throw new Error("baseline-server needs DATABASE_URL, PORT and BASELINE_COMPANY_ID");

// As server/db/client.ts: ten connections, notices off.
const sql = postgres(databaseUrl, { max: 10, onnotice: () => {} });
const app = express();
app.disable("x-powered-by");

// The first page of the default list (updated first), with customer, estimator, space count and total: one statement.
app.get("/api/projects", async (_req, res) => {
  const rows = await sql`
    select p.id, p.title, p.site_address, p.status, p.updated_at, p.created_at,
           json_build_object('id', c.id, 'name', c.name) as customer,
           case when u.id is null then null else json_build_object('id', u.id, 'name', u.name) end as estimator,
           (select count(*)::int from attic_spaces s where s.company_id = p.company_id and s.project_id = p.id) as space_count,
           count(*) over ()::int as total
    from projects p
    join customers c on c.id = p.customer_id and c.company_id = p.company_id
    left join users u on u.id = p.estimator_id and u.company_id = p.company_id
    where p.company_id = ${companyId}
    order by p.updated_at desc, p.id
    limit 25`;
  res.json({ items: rows, total: rows[0]?.total ?? 0, page: 1, pageSize: 25 });
});

// A project with its customer, estimator and attic spaces (survey JSON): one statement. The
// analysis route answers the same data unanalysed, so its ratio includes the core's work.
const projectWithSpaces = async (req: express.Request, res: express.Response) => {
  const [row] = await sql`
    select to_jsonb(p) - 'search_text' - 'company_id' as project,
           json_build_object('id', c.id, 'name', c.name, 'phone', c.phone, 'email', c.email, 'billingAddress', c.billing_address, 'notes', c.notes) as customer,
           case when u.id is null then null else json_build_object('id', u.id, 'name', u.name) end as estimator,
           coalesce((select json_agg(to_jsonb(s) - 'company_id' order by s.position, s.created_at)
                     from attic_spaces s where s.company_id = p.company_id and s.project_id = p.id), '[]') as spaces
    from projects p
    join customers c on c.id = p.customer_id and c.company_id = p.company_id
    left join users u on u.id = p.estimator_id and u.company_id = p.company_id
    where p.company_id = ${companyId} and p.id = ${String(req.params.id)}`;
  if (!row) return void res.status(404).json({ error: { code: "not-found" } });
  res.json({ ...row, photos: [] });
};
app.get("/api/projects/:id", projectWithSpaces);
app.get("/api/projects/:id/analysis", projectWithSpaces);

// The homeowner's page data: the frozen snapshot found by the SHA-256 of the link's token.
app.get("/api/public/proposals/:token", async (req, res) => {
  const tokenHash = createHash("sha256").update(String(req.params.token)).digest("hex");
  const [row] = await sql`
    select revision, status, valid_until, sent_at, decided_at, snapshot_sha256, snapshot
    from proposals where token_hash = ${tokenHash}`;
  if (!row) return void res.status(404).json({ error: { code: "not-found" } });
  const { snapshot, ...proposal } = row;
  res.set("Cache-Control", "no-store").json({ proposal, ...(snapshot as object) });
});

const server = app.listen(port, "127.0.0.1", () => process.send?.({ ready: true }));
process.on("SIGTERM", () => {
  server.close(() => void sql.end({ timeout: 2 }).then(() => process.exit(0)));
});
