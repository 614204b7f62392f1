import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { companies } from "../../server/db/schema/index.ts";
import { SpaceSurveySchema } from "../../shared/schemas/survey.ts";
import { toAtticInput } from "../../shared/survey/to-attic-input.ts";
import { analyzeAttic } from "../../shared/ventilation/index.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let customerId: string;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  customerId = (await createCustomer(team.asOwner, { name: "Percival Yarrow" })).id;
});
afterAll(async () => t?.close());

describe("projects", () => {
  it("when a project is created without a code basis, then it takes the company's default", async () => {
    await t.db.update(companies).set({ defaultCodeBasis: "irc-2012" }).where(eq(companies.id, team.company.id));
    try {
      const project = await createProject(team.asEstimator, customerId);
      expect(project).toMatchObject({ codeBasis: "irc-2012", status: "lead", version: 1, ceilingVaporRetarder: "none", roofColor: "medium", estimatorId: null });
      const explicit = await createProject(team.asEstimator, customerId, { codeBasis: "strict-150" });
      expect(explicit.codeBasis).toBe("strict-150");
    } finally {
      await t.db.update(companies).set({ defaultCodeBasis: "irc-2018" }).where(eq(companies.id, team.company.id));
    }
  });

  it("when a project is read, then it comes with its customer, estimator, spaces in order and photos", async () => {
    const project = await createProject(team.asOwner, customerId, { estimatorId: team.estimator.id, notes: "Side gate code 4411." });
    const garage = await createSpace(team.asEstimator, project.id, { name: "Garage attic" });
    const main = await createSpace(team.asEstimator, project.id);
    const res = await team.asSales.get(`/api/projects/${project.id}`).expect(200);
    expect(res.body.project).toMatchObject({ id: project.id, version: 1, notes: "Side gate code 4411.", estimatorId: team.estimator.id });
    expect(res.body.customer).toMatchObject({ id: customerId, name: "Percival Yarrow" });
    expect(res.body.estimator).toEqual({ id: team.estimator.id, name: team.estimator.name });
    expect(res.body.spaces.map((s: { id: string; position: number }) => [s.id, s.position])).toEqual([[garage.id, 0], [main.id, 1]]);
    expect(res.body.spaces[0]).toMatchObject({ name: "Garage attic", version: 1, sections: [], vents: [], site: {}, notes: null, roof: { form: "gable", pitchIn12: 6 } });
    expect(res.body.spaces[1].vents).toHaveLength(3);
    expect(res.body.photos).toEqual([]);
  });

  it("when a patch names the current version, then it saves and the version goes up by one", async () => {
    const project = await createProject(team.asEstimator, customerId);
    const res = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 1, status: "surveyed", climateZone: 5, moistureRegime: "B", roofColor: "dark" });
    expect(res.status).toBe(200);
    expect(res.body.project).toMatchObject({ status: "surveyed", climateZone: 5, moistureRegime: "B", roofColor: "dark", version: 2, title: "Attic survey" });
  });

  it("when a patch names an old version, then it answers 409 stale-version with the current project, and nothing is overwritten", async () => {
    const project = await createProject(team.asEstimator, customerId);
    await send(team.asOwner, "patch", `/api/projects/${project.id}`, { version: 1, title: "Saved first" }).expect(200);
    const stale = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 1, title: "Saved second" });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "stale-version", message: "Someone else saved this project since you opened it.", fields: {} });
    expect(stale.body.error.current).toMatchObject({ id: project.id, title: "Saved first", version: 2 });
    // The UI's "overwrite" is a patch based on the current version.
    const overwrite = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 2, title: "Saved second" });
    expect(overwrite.body.project).toMatchObject({ title: "Saved second", version: 3 });
  });

  it("when ten saves race on the same version, then exactly one lands and the others get 409", async () => {
    const project = await createProject(team.asEstimator, customerId);
    const results = await Promise.all(
      Array.from({ length: 10 }, (_, i) => send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 1, title: `Racer ${i}` })),
    );
    expect(results.filter((r) => r.status === 200)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(9);
    const winner = results.find((r) => r.status === 200)!.body.project.title;
    expect((await team.asOwner.get(`/api/projects/${project.id}`)).body.project).toMatchObject({ title: winner, version: 2 });
  });

  it("when the customer or estimator belongs to another company, then it answers 400 naming the field", async () => {
    const other = await makeTeam(t);
    const theirCustomer = await createCustomer(other.asOwner, { name: "Not Yours" });
    const res = await send(team.asEstimator, "post", "/api/projects", { customerId: theirCustomer.id, title: "X", siteAddress: "Y", climateZone: 4, estimatorId: other.estimator.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("customerId");
    expect(res.body.error.fields).toHaveProperty("estimatorId");
    const project = await createProject(team.asEstimator, customerId);
    const patch = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 1, customerId: theirCustomer.id });
    expect(patch.status).toBe(400);
    expect(patch.body.error.fields).toHaveProperty("customerId");
  });

  describe("roles (shared/schemas/roles.ts: projects:edit is owner and estimator; sales reads)", () => {
    it("when sales reads projects, their analysis and users, then it may; when sales edits, then 403", async () => {
      const project = await createProject(team.asEstimator, customerId);
      const space = await createSpace(team.asEstimator, project.id);
      await team.asSales.get("/api/projects").expect(200);
      await team.asSales.get(`/api/projects/${project.id}`).expect(200);
      await team.asSales.get(`/api/projects/${project.id}/analysis`).expect(200);
      expect((await send(team.asSales, "post", "/api/projects", { customerId, title: "X", siteAddress: "Y", climateZone: 4 })).status).toBe(403);
      expect((await send(team.asSales, "patch", `/api/projects/${project.id}`, { version: 1, title: "X" })).status).toBe(403);
      expect((await send(team.asSales, "post", `/api/projects/${project.id}/spaces`, { name: "X" })).status).toBe(403);
      expect((await send(team.asSales, "put", `/api/projects/${project.id}/spaces/${space.id}`, { name: "X", roof: {}, sections: [], vents: [], version: 1 })).status).toBe(403);
      expect((await send(team.asSales, "delete", `/api/projects/${project.id}/spaces/${space.id}`)).status).toBe(403);
      expect((await team.asSales.get(`/api/projects/${project.id}`)).body.project.version).toBe(1);
    });

    it("when the owner edits a project, then it may", async () => {
      const project = await createProject(team.asEstimator, customerId);
      await send(team.asOwner, "patch", `/api/projects/${project.id}`, { version: 1, status: "lost" }).expect(200);
    });
  });

  describe("validation", () => {
    const good = () => ({ customerId, title: "T", siteAddress: "A", climateZone: 4 });
    const cases: [string, Record<string, unknown>, string][] = [
      ["customerId is not an id", { customerId: "abc" }, "customerId"],
      ["customerId is missing", { customerId: undefined }, "customerId"],
      ["title is blank", { title: "" }, "title"],
      ["title is too long", { title: "t".repeat(201) }, "title"],
      ["siteAddress is blank", { siteAddress: " " }, "siteAddress"],
      ["status is unknown", { status: "abandoned" }, "status"],
      ["estimatorId is not an id", { estimatorId: "dale" }, "estimatorId"],
      ["climateZone is 9", { climateZone: 9 }, "climateZone"],
      ["climateZone is 4.5", { climateZone: 4.5 }, "climateZone"],
      ["climateZone is text", { climateZone: "4" }, "climateZone"],
      ["moistureRegime is D", { moistureRegime: "D" }, "moistureRegime"],
      ["codeBasis is unknown", { codeBasis: "irc-1990" }, "codeBasis"],
      ["ceilingVaporRetarder is unknown", { ceilingVaporRetarder: "class-V" }, "ceilingVaporRetarder"],
      ["roofColor is unknown", { roofColor: "plaid" }, "roofColor"],
      ["notes are too long", { notes: "n".repeat(5001) }, "notes"],
      ["an unknown field is sent", { colour: "red" }, "colour"],
    ];
    for (const [what, change, field] of cases) {
      it(`when ${what}, then creating answers 400 naming ${field}`, async () => {
        const res = await send(team.asEstimator, "post", "/api/projects", { ...good(), ...change });
        expect(res.status).toBe(400);
        expect(res.body.error.code).toBe("invalid-input");
        expect(Object.keys(res.body.error.fields)).toContain(field);
      });
    }

    it("when a patch has no version or a bad field, then it answers 400 naming it and the project is unchanged", async () => {
      const project = await createProject(team.asEstimator, customerId);
      const noVersion = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { title: "New" });
      expect(noVersion.status).toBe(400);
      expect(noVersion.body.error.fields).toHaveProperty("version");
      for (const [body, field] of [[{ version: 1, climateZone: 0 }, "climateZone"], [{ version: 1, status: "x" }, "status"], [{ version: "1" }, "version"], [{ version: 1, title: "" }, "title"]] as const) {
        const res = await send(team.asEstimator, "patch", `/api/projects/${project.id}`, body);
        expect(res.status, JSON.stringify(body)).toBe(400);
        expect(res.body.error.fields).toHaveProperty(field);
      }
      expect((await team.asOwner.get(`/api/projects/${project.id}`)).body.project).toMatchObject({ version: 1, title: "Attic survey" });
    });

    it("when the list query is malformed, then it answers 400 naming the parameter", async () => {
      for (const [query, field] of [["status=abandoned", "status"], ["estimatorId=dale", "estimatorId"], ["sort=colour", "sort"], ["dir=up", "dir"], ["page=-1", "page"], ["pageSize=101", "pageSize"], [`q=${"q".repeat(201)}`, "q"]] as const) {
        const res = await team.asSales.get(`/api/projects?${query}`);
        expect(res.status, query).toBe(400);
        expect(res.body.error.fields).toHaveProperty(field);
      }
    });

    it("when the body is not JSON, then it answers 400, not 500", async () => {
      const res = await team.asEstimator.post("/api/projects").set("origin", "http://127.0.0.1:3999").set("content-type", "application/json").send("{not json");
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(/not valid JSON/);
    });
  });
});

describe("analysis", () => {
  it("when a space has a powered gable fan by a ridge vent and little soffit intake, then the server's answer is exactly the shared core's", async () => {
    const project = await createProject(team.asEstimator, customerId, { roofColor: "dark" });
    const space = await createSpace(team.asEstimator, project.id);
    const empty = await createSpace(team.asEstimator, project.id, { name: "Porch attic" });

    const res = await team.asSales.get(`/api/projects/${project.id}/analysis`).expect(200);
    const detail = (await team.asSales.get(`/api/projects/${project.id}`)).body;
    const stored = detail.spaces.find((s: { id: string }) => s.id === space.id);
    const direct = analyzeAttic(toAtticInput(detail.project, SpaceSurveySchema.parse(stored)));

    expect(res.body.spaces).toHaveLength(2);
    expect(res.body.spaces[0]).toEqual({ spaceId: space.id, name: "Main attic", analysis: JSON.parse(JSON.stringify(direct)), issues: [] });
    const codes = res.body.spaces[0].analysis.findings.map((f: { code: string }) => f.code);
    expect(codes).toContain("powered-with-passive-exhaust");
    expect(codes).toContain("fan-intake-short");
    expect(res.body.spaces[1]).toMatchObject({ spaceId: empty.id, analysis: null });
    expect(res.body.spaces[1].issues).toEqual([{ path: "sections", message: expect.stringMatching(/Add at least one section/) }]);
  });

  it("when the project's code basis changes, then the analysis follows it (computed, never stored)", async () => {
    const project = await createProject(team.asEstimator, customerId, { codeBasis: "irc-2018" });
    await createSpace(team.asEstimator, project.id);
    const before = (await team.asSales.get(`/api/projects/${project.id}/analysis`)).body.spaces[0].analysis.requirement.codeBasis;
    await send(team.asEstimator, "patch", `/api/projects/${project.id}`, { version: 1, codeBasis: "strict-150" }).expect(200);
    const after = (await team.asSales.get(`/api/projects/${project.id}/analysis`)).body.spaces[0].analysis.requirement;
    expect(before).toBe("irc-2018");
    expect(after).toMatchObject({ codeBasis: "strict-150", ratio: 150 });
  });

  it("when the owner chooses the local reading of the 40–50 % split, then every analysis of the company's projects uses it, and a bad value answers 400 (IRC 2018 R806.2 condition 2 [SOURCES.md S4])", async () => {
    const other = await makeTeam(t);
    const project = await createProject(team.asEstimator, customerId, { codeBasis: "irc-2021" });
    const space = await createSpace(team.asEstimator, project.id, { name: "Heavy ridge" });
    // 1,500 sq ft; ridge 400 > 50 % of the 720 sq in required, but 33 % of the 1,200 provided.
    await send(team.asEstimator, "put", `/api/projects/${project.id}/spaces/${space.id}`, {
      name: "Heavy ridge", roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
      sections: [{ kind: "area", areaSqFt: 1500 }],
      vents: [{ id: "s", kind: "soffit-continuous", location: "lower", nfaSqIn: 800 }, { id: "r", kind: "ridge", location: "upper", nfaSqIn: 400 }],
      site: {}, notes: null, version: 1,
    }).expect(200);
    const literal = (await team.asSales.get(`/api/projects/${project.id}/analysis`)).body.spaces[0].analysis;
    expect(literal.requirement).toMatchObject({ ratio: 150, upperShareBase: "required" });
    expect((await team.asSales.get(`/api/projects/${project.id}`)).body.project.upperShareBase).toBe("required");

    const bad = await send(team.asOwner, "patch", "/api/company", { upperShareBase: "whatever" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("upperShareBase");
    await send(team.asOwner, "patch", "/api/company", { upperShareBase: "provided" }).expect(200);
    expect((await team.asOwner.get("/api/company")).body.company.upperShareBase).toBe("provided");
    const local = (await team.asSales.get(`/api/projects/${project.id}/analysis`)).body.spaces[0].analysis;
    expect(local.requirement).toMatchObject({ ratio: 300, upperShareBase: "provided" });
    expect(local.compliant).toBe(true);
    // Another company keeps the literal reading.
    expect((await other.asOwner.get("/api/company")).body.company.upperShareBase).toBe("required");
    await send(team.asOwner, "patch", "/api/company", { upperShareBase: "required" }).expect(200);
  });
});

describe("users", () => {
  it("when asked for estimators, then only active estimators of the caller's company come back", async () => {
    const inactive = await t.makeUser(team.company.id, "estimator", { isActive: false });
    const other = await makeTeam(t);
    const res = await team.asSales.get("/api/users?role=estimator").expect(200);
    expect(res.body).toEqual([{ id: team.estimator.id, name: team.estimator.name, role: "estimator" }]);
    expect(res.body.map((u: { id: string }) => u.id)).not.toContain(inactive.id);
    expect(res.body.map((u: { id: string }) => u.id)).not.toContain(other.estimator.id);
    const all = await team.asSales.get("/api/users").expect(200);
    expect(all.body.map((u: { role: string }) => u.role).sort()).toEqual(["estimator", "owner", "sales"]);
    const bad = await team.asSales.get("/api/users?role=janitor");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("role");
  });
});

describe("project list", () => {
  let list: Team;
  const ids: Record<string, string> = {};
  beforeAll(async () => {
    list = await makeTeam(t);
    const second = await t.makeUser(list.company.id, "estimator");
    const alder = await createCustomer(list.asOwner, { name: "Alder Quince" });
    const brio = await createCustomer(list.asOwner, { name: "Brio Fenwick" });
    const rows = [
      ["p1", alder.id, "Cedar attic", "1 Wren Street, Marrow Creek", "lead", list.estimator.id],
      ["p2", alder.id, "Barn loft", "22 Heron Way, Marrow Creek", "sold", second.id],
      ["p3", brio.id, "Attic reroof", "3 Wren Street, Marrow Creek", "lead", null],
      ["p4", brio.id, "Dormer vents", "40 Lark Lane, Marrow Creek", "surveyed", list.estimator.id],
      ["p5", brio.id, "Eave repair", "5 Finch Road, Marrow Creek", "lead", list.estimator.id],
    ] as const;
    for (const [key, customer, title, siteAddress, status, estimatorId] of rows) {
      ids[key] = (await createProject(list.asOwner, customer, { title, siteAddress, status, estimatorId })).id;
    }
    await createSpace(list.asOwner, ids.p4!);
    await createSpace(list.asOwner, ids.p4!, { name: "Garage attic" });
    ids.second = second.id;
  });
  const titles = (body: { items: { title: string }[] }) => body.items.map((p) => p.title);

  it("when listing with no filters, then it is newest-updated first with the customer, estimator and space count", async () => {
    const res = await list.asSales.get("/api/projects").expect(200);
    expect(res.body).toMatchObject({ total: 5, page: 1, pageSize: 25 });
    // p4 was touched last, by its spaces.
    expect(titles(res.body)).toEqual(["Dormer vents", "Eave repair", "Attic reroof", "Barn loft", "Cedar attic"]);
    expect(res.body.items[0]).toMatchObject({
      id: ids.p4, siteAddress: "40 Lark Lane, Marrow Creek", status: "surveyed", spaceCount: 2,
      customer: { name: "Brio Fenwick" }, estimator: { id: list.estimator.id, name: list.estimator.name },
    });
    expect(res.body.items[2]).toMatchObject({ estimator: null, spaceCount: 0 });
    expect(Object.keys(res.body.items[0]).sort()).toEqual(["createdAt", "customer", "estimator", "id", "siteAddress", "spaceCount", "status", "title", "updatedAt"]);
  });

  it("when searching, then title, site address and customer name all match, case-insensitively", async () => {
    expect(titles((await list.asSales.get("/api/projects?q=ATTIC&sort=title&dir=asc")).body)).toEqual(["Attic reroof", "Cedar attic"]);
    expect(titles((await list.asSales.get("/api/projects?q=wren street&sort=title&dir=asc")).body)).toEqual(["Attic reroof", "Cedar attic"]);
    expect(titles((await list.asSales.get("/api/projects?q=fenwick&sort=title&dir=asc")).body)).toEqual(["Attic reroof", "Dormer vents", "Eave repair"]);
    expect((await list.asSales.get("/api/projects?q=nothing-like-this")).body).toMatchObject({ items: [], total: 0 });
  });

  it("when filtering by status and estimator, then only those come back, with the filtered total", async () => {
    const leads = (await list.asSales.get("/api/projects?status=lead&sort=title&dir=asc")).body;
    expect(titles(leads)).toEqual(["Attic reroof", "Cedar attic", "Eave repair"]);
    expect(leads.total).toBe(3);
    const mine = (await list.asSales.get(`/api/projects?estimatorId=${list.estimator.id}&status=lead&sort=title&dir=asc`)).body;
    expect(titles(mine)).toEqual(["Cedar attic", "Eave repair"]);
    expect(titles((await list.asSales.get(`/api/projects?estimatorId=${ids.second}`)).body)).toEqual(["Barn loft"]);
  });

  it("when sorting by customer name or status, then ties keep a stable order", async () => {
    const byCustomer = (await list.asSales.get("/api/projects?sort=customerName&dir=asc")).body.items.map((p: { customer: { name: string } }) => p.customer.name);
    expect(byCustomer).toEqual(["Alder Quince", "Alder Quince", "Brio Fenwick", "Brio Fenwick", "Brio Fenwick"]);
    const byStatus = (await list.asSales.get("/api/projects?sort=status&dir=desc")).body.items.map((p: { status: string }) => p.status);
    expect(byStatus).toEqual(["sold", "surveyed", "lead", "lead", "lead"]);
  });

  it("when paging by 2, then the pages partition the list and a page past the end is empty with the total", async () => {
    const pages = await Promise.all([1, 2, 3, 4].map((page) => list.asSales.get(`/api/projects?sort=title&dir=asc&pageSize=2&page=${page}`)));
    expect(pages.map((p) => titles(p.body))).toEqual([["Attic reroof", "Barn loft"], ["Cedar attic", "Dormer vents"], ["Eave repair"], []]);
    expect(pages[3]!.body).toMatchObject({ total: 5, page: 4, pageSize: 2 });
  });
});
