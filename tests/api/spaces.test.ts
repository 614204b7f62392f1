import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { LIMITS } from "../../shared/ventilation/index.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let projectId: string;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  const customer = await createCustomer(team.asOwner, { name: "Linnea Brask" });
  projectId = (await createProject(team.asOwner, customer.id)).id;
});
afterAll(async () => t?.close());

const save = (spaceId: string, body: Record<string, unknown>, pid = projectId) => send(team.asEstimator, "put", `/api/projects/${pid}/spaces/${spaceId}`, body);

describe("attic spaces", () => {
  it("when a space is created with only a name, then it gets a gable 6/12 roof, no sections or vents, and the next position", async () => {
    const first = await createSpace(team.asEstimator, projectId, { name: "Main attic" });
    const second = await createSpace(team.asEstimator, projectId, { name: "Garage attic" });
    expect(first).toMatchObject({ name: "Main attic", version: 1, roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null }, sections: [], vents: [], site: {}, notes: null });
    expect(second.position).toBe((first.position as number) + 1);
  });

  it("when a whole survey is saved with the current version, then it is stored as sent and the version goes up", async () => {
    const space = await createSpace(team.asEstimator, projectId, { name: "Upper attic" });
    const res = await save(space.id, { ...mainAttic, name: "Upper attic", version: 1 });
    expect(res.status).toBe(200);
    expect(res.body.space).toMatchObject({ id: space.id, version: 2, sections: mainAttic.sections, vents: mainAttic.vents, site: mainAttic.site });
    const detail = await team.asSales.get(`/api/projects/${projectId}`);
    expect(detail.body.spaces.find((s: { id: string }) => s.id === space.id)).toMatchObject({ version: 2, vents: mainAttic.vents });
  });

  it("when a save names an old version, then it answers 409 stale-version with the current space and keeps the other edit", async () => {
    const space = await createSpace(team.asEstimator, projectId, { name: "Contested attic" });
    await save(space.id, { ...mainAttic, name: "Contested attic", notes: "First editor", version: 1 }).expect(200);
    const stale = await save(space.id, { ...mainAttic, name: "Contested attic", notes: "Second editor", version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "stale-version", fields: {} });
    expect(stale.body.error.message).toMatch(/Someone else saved/);
    expect(stale.body.error.current).toMatchObject({ id: space.id, version: 2, notes: "First editor" });
  });

  it("when a space is deleted, then it is gone from the project and a save to it answers 404", async () => {
    const space = await createSpace(team.asEstimator, projectId, { name: "Doomed attic" });
    await send(team.asEstimator, "delete", `/api/projects/${projectId}/spaces/${space.id}`).expect(204);
    const detail = await team.asSales.get(`/api/projects/${projectId}`);
    expect(detail.body.spaces.map((s: { id: string }) => s.id)).not.toContain(space.id);
    expect((await save(space.id, { ...mainAttic, version: 1 })).status).toBe(404);
    expect((await send(team.asEstimator, "delete", `/api/projects/${projectId}/spaces/${space.id}`)).status).toBe(404);
  });

  it("when a space is addressed through another project of the same company, then it answers 404", async () => {
    const space = await createSpace(team.asEstimator, projectId, { name: "Wrong door" });
    const customer = await createCustomer(team.asOwner, { name: "Other Project Owner" });
    const otherProject = await createProject(team.asOwner, customer.id);
    expect((await save(space.id, { ...mainAttic, version: 1 }, otherProject.id)).status).toBe(404);
  });

  describe("copy vents", () => {
    // A project has at most LIMITS.maxSpacesPerProject spaces: each group of tests starts its own.
    beforeAll(async () => {
      projectId = (await createProject(team.asOwner, (await createCustomer(team.asOwner, { name: "Linnea Brask" })).id)).id;
    });
    it("when vents are copied from another space, then they are appended with new ids, without the other fan's readings or sections", async () => {
      const source = await createSpace(team.asEstimator, projectId, {
        ...mainAttic, name: "Source attic",
        sections: [{ kind: "rect", id: "s1", lengthFt: 20, widthFt: 20 }],
        vents: [
          { ...mainAttic.vents[0], sectionId: "s1" },
          { ...mainAttic.vents[1], diagnostics: { isBladeFreeToSpin: false } },
        ],
      });
      const target = await createSpace(team.asEstimator, projectId, { name: "Target attic", vents: [mainAttic.vents[2]] });
      const res = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces/${target.id}/copy-vents`, { fromSpaceId: source.id });
      expect(res.status).toBe(200);
      const vents = res.body.space.vents as Record<string, unknown>[];
      expect(res.body.space.version).toBe(2);
      expect(vents.map((v) => v.kind)).toEqual(["soffit-individual", "ridge", "powered-gable"]);
      expect(new Set(vents.map((v) => v.id)).size).toBe(3);
      expect(vents.slice(1).map((v) => v.id)).not.toContain("ridge-1");
      expect(vents[1]).not.toHaveProperty("sectionId");
      expect(vents[2]).not.toHaveProperty("diagnostics");
      expect(vents[2]).toMatchObject({ cfm: 1200, mounting: "gable" });
      // The source is untouched.
      const detail = await team.asSales.get(`/api/projects/${projectId}`);
      expect(detail.body.spaces.find((s: { id: string }) => s.id === source.id).vents[0].id).toBe("ridge-1");
    });

    it("when the source is the target, another project's space, empty or not an id, then it answers 400 naming fromSpaceId", async () => {
      const target = await createSpace(team.asEstimator, projectId, { ...mainAttic, name: "Self copy" });
      const empty = await createSpace(team.asEstimator, projectId, { name: "Empty source" });
      const customer = await createCustomer(team.asOwner, { name: "Elsewhere Person" });
      const elsewhere = await createSpace(team.asEstimator, (await createProject(team.asOwner, customer.id)).id, mainAttic);
      for (const fromSpaceId of [target.id, elsewhere.id, empty.id, "not-an-id"]) {
        const res = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces/${target.id}/copy-vents`, { fromSpaceId });
        expect(res.status, fromSpaceId).toBe(400);
        expect(res.body.error.fields).toHaveProperty("fromSpaceId");
      }
    });
  });

  describe("validation", () => {
    let spaceId: string;
    beforeAll(async () => {
      projectId = (await createProject(team.asOwner, (await createCustomer(team.asOwner, { name: "Linnea Brask" })).id)).id;
      spaceId = (await createSpace(team.asEstimator, projectId, { ...mainAttic, name: "Validation attic" })).id;
    });
    const body = () => ({ ...mainAttic, name: "Validation attic", version: 1 });
    const ridge = mainAttic.vents[0]!;
    const cases: [string, (b: ReturnType<typeof body>) => Record<string, unknown>, string][] = [
      ["the name is blank", (b) => ({ ...b, name: "" }), "name"],
      ["the name is too long", (b) => ({ ...b, name: "n".repeat(121) }), "name"],
      ["the roof form is a dome", (b) => ({ ...b, roof: { ...b.roof, form: "dome" } }), "roof.form"],
      ["the pitch is 30/12", (b) => ({ ...b, roof: { ...b.roof, pitchIn12: 30 } }), "roof.pitchIn12"],
      ["the ridge length is negative", (b) => ({ ...b, roof: { ...b.roof, ridgeLengthFt: -3 } }), "roof.ridgeLengthFt"],
      ["a section has a negative length", (b) => ({ ...b, sections: [{ kind: "rect", lengthFt: -1, widthFt: 10 }] }), "sections.0.lengthFt"],
      ["a section width is text", (b) => ({ ...b, sections: [{ kind: "rect", lengthFt: 10, widthFt: "ten" }] }), "sections.0.widthFt"],
      ["a section is a circle", (b) => ({ ...b, sections: [{ kind: "circle", radiusFt: 5 }] }), "sections.0.kind"],
      ["an outline has two corners", (b) => ({ ...b, sections: [{ kind: "polygon", pointsFt: [[0, 0], [1, 1]] }] }), "sections.0.pointsFt"],
      ["an area is zero", (b) => ({ ...b, sections: [{ kind: "area", areaSqFt: 0 }] }), "sections.0.areaSqFt"],
      ["a vent kind is unknown", (b) => ({ ...b, vents: [{ ...ridge, kind: "chimney" }] }), "vents.0.kind"],
      ["a vent location is unknown", (b) => ({ ...b, vents: [{ ...ridge, location: "middle" }] }), "vents.0.location"],
      ["a powered fan has no cfm", (b) => ({ ...b, vents: [{ id: "f", kind: "powered-roof", location: "upper" }] }), "vents.0.cfm"],
      ["a vent NFA per foot is negative", (b) => ({ ...b, vents: [{ ...ridge, nfaSqInPerFt: -2 }] }), "vents.0.nfaSqInPerFt"],
      ["two vents share an id", (b) => ({ ...b, vents: [ridge, { ...ridge }] }), "vents.1.id"],
      ["a vent names a missing section", (b) => ({ ...b, vents: [{ ...ridge, sectionId: "nope" }] }), "vents.0.sectionId"],
      ["two sections share an id", (b) => ({ ...b, sections: [{ kind: "area", id: "a", areaSqFt: 10 }, { kind: "area", id: "a", areaSqFt: 10 }] }), "sections.1.id"],
      ["a site flag is a word", (b) => ({ ...b, site: { soffitsBlocked: "yes" } }), "site.soffitsBlocked"],
      ["the notes are too long", (b) => ({ ...b, notes: "n".repeat(5001) }), "notes"],
      ["the version is missing", ({ version: _v, ...b }) => b, "version"],
      ["an unknown field is sent", (b) => ({ ...b, colour: "red" }), "colour"],
    ];
    for (const [what, make, field] of cases) {
      it(`when ${what}, then saving answers 400 naming ${field}, and the stored space is unchanged`, async () => {
        const res = await save(spaceId, make(body()));
        expect(res.status).toBe(400);
        expect(res.body.error.code).toBe("invalid-input");
        expect(Object.keys(res.body.error.fields)).toContain(field);
        const detail = await team.asSales.get(`/api/projects/${projectId}`);
        expect(detail.body.spaces.find((s: { id: string }) => s.id === spaceId)).toMatchObject({ version: 1, name: "Validation attic", vents: mainAttic.vents });
      });
    }

    it("when a space is created without a name or with an unknown field, then it answers 400 naming it", async () => {
      const noName = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, {});
      expect(noName.status).toBe(400);
      expect(noName.body.error.fields).toHaveProperty("name");
      const extra = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { name: "X", version: 3 });
      expect(extra.status).toBe(400);
      expect(extra.body.error.fields).toHaveProperty("version");
    });
  });
});

describe("the limit of spaces in a project", () => {
  it(`when a project already has ${LIMITS.maxSpacesPerProject} attic spaces, then another answers 400 naming the limit`, async () => {
    const pid = (await createProject(team.asOwner, (await createCustomer(team.asOwner, { name: "Many Attics" })).id)).id;
    for (let i = 0; i < LIMITS.maxSpacesPerProject; i++) await createSpace(team.asEstimator, pid, { name: `Space ${i + 1}` });
    const extra = await send(team.asEstimator, "post", `/api/projects/${pid}/spaces`, { name: "One too many" });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields.name).toMatch(new RegExp(`At most ${LIMITS.maxSpacesPerProject} attic spaces`));
  });
});
