/**
 * The yardstick for bench/api-load-bench.ts: a bare Express app with one postgres.js pool (the
 * size the app's own pool has) answering each benchmarked route with one hand-written query and
 * nothing else — no session, no helmet, no logging, no validation, no ORM — and the same JSON the
 * app answers (the bench compares them before it measures). The analysis runs the same core
 * function as the app, so its ratio is the cost of everything around the core. The app's figure
 * divided by this one is what all of that costs on the same machine and data.
 *
 * Started by the load bench as a child process: DATABASE_URL, PORT, BASELINE_COMPANY_ID; it
 * reports `{ ready: true }` over IPC once it listens, as server/index.ts does.
 */
import { createHash } from "node:crypto";
import express from "express";
import postgres from "postgres";
import { analyzeSpace } from "../server/modules/projects/analyze-space.ts";

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
    select p.id, p.title, p.site_address as "siteAddress", p.status, p.updated_at as "updatedAt", p.created_at as "createdAt",
           (select count(*)::int from attic_spaces s where s.company_id = p.company_id and s.project_id = p.id) as "spaceCount",
           json_build_object('id', c.id, 'name', c.name) as customer,
           case when u.id is null then null else json_build_object('id', u.id, 'name', u.name) end as estimator,
           count(*) over ()::int as total
    from projects p
    join customers c on c.id = p.customer_id and c.company_id = p.company_id
    left join users u on u.id = p.estimator_id and u.company_id = p.company_id
    where p.company_id = ${companyId}
    order by p.updated_at desc, p.id
    limit 25`;
  const total = rows[0]?.total ?? 0;
  res.json({ items: rows.map(({ total: _total, ...item }) => item), total, page: 1, pageSize: 25 });
});

// Timestamps inside JSON as JavaScript writes them (milliseconds, UTC, "Z").
const iso = (column: string) => sql.unsafe(`to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`);
const projectColumns = sql`p.id, p.customer_id as "customerId", p.title, p.site_address as "siteAddress", p.status, p.estimator_id as "estimatorId",
  p.climate_zone as "climateZone", p.moisture_regime as "moistureRegime", p.code_basis as "codeBasis", p.ceiling_vapor_retarder as "ceilingVaporRetarder",
  p.roof_color as "roofColor", p.notes, p.version, p.created_at as "createdAt", p.updated_at as "updatedAt"`;
const spacesJson = sql`coalesce((select json_agg(json_build_object('id', s.id, 'projectId', s.project_id, 'name', s.name, 'position', s.position, 'version', s.version,
    'roof', s.roof, 'sections', s.sections, 'vents', s.vents, 'site', s.site, 'notes', s.notes, 'createdAt', ${iso("s.created_at")}, 'updatedAt', ${iso("s.updated_at")})
    order by s.position, s.created_at) from attic_spaces s where s.company_id = p.company_id and s.project_id = p.id), '[]')`;

// A project with its customer, estimator, attic spaces (survey JSON) and photos: one statement.
app.get("/api/projects/:id", async (req, res) => {
  const [row] = await sql`
    select ${projectColumns},
           json_build_object('id', c.id, 'name', c.name, 'phone', c.phone, 'email', c.email, 'billingAddress', c.billing_address, 'notes', c.notes) as customer,
           case when u.id is null then null else json_build_object('id', u.id, 'name', u.name) end as estimator,
           ${spacesJson} as spaces,
           coalesce((select json_agg(json_build_object('id', f.id, 'projectId', f.project_id, 'spaceId', f.space_id, 'ventId', f.vent_id, 'findingCode', f.finding_code,
               'caption', f.caption, 'contentType', f.content_type, 'sizeBytes', f.size_bytes, 'width', f.width, 'height', f.height, 'uploadedBy', f.uploaded_by,
               'createdAt', ${iso("f.created_at")}, 'url', '/api/photos/' || f.id, 'thumbUrl', '/api/photos/' || f.id || '?thumb=1') order by f.created_at, f.id)
             from photos f where f.company_id = p.company_id and f.project_id = p.id), '[]') as photos
    from projects p
    join customers c on c.id = p.customer_id and c.company_id = p.company_id
    left join users u on u.id = p.estimator_id and u.company_id = p.company_id
    where p.company_id = ${companyId} and p.id = ${String(req.params.id)}`;
  if (!row) return void res.status(404).json({ error: { code: "not-found" } });
  const { customer, estimator, spaces, photos, ...project } = row;
  res.json({ project, customer, estimator, spaces, photos });
});

// The project's spaces through the same core function the app calls: one statement, then the core.
app.get("/api/projects/:id/analysis", async (req, res) => {
  const [row] = await sql`select ${projectColumns}, ${spacesJson} as spaces from projects p where p.company_id = ${companyId} and p.id = ${String(req.params.id)}`;
  if (!row) return void res.status(404).json({ error: { code: "not-found" } });
  const { spaces, ...project } = row;
  res.json({ spaces: (spaces as Parameters<typeof analyzeSpace>[1][]).map((space) => analyzeSpace(project as Parameters<typeof analyzeSpace>[0], space)) });
});

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
