import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql as rawSql } from "drizzle-orm";
import { companies } from "../../server/db/schema/index.ts";
import { applyOption } from "../../shared/design/index.ts";
import { priceOption } from "../../shared/pricing/index.ts";
import { OptionSpaceSchema } from "../../shared/schemas/options.ts";
import type { CatalogItem } from "../../shared/schemas/catalog.ts";
import { SpaceSurveySchema } from "../../shared/schemas/survey.ts";
import { toAtticInput } from "../../shared/survey/to-attic-input.ts";
import { analyzeAttic } from "../../shared/ventilation/index.ts";
import { DEMO_CATALOG, DEMO_OPTION_NAMES, DEMO_PASSWORD, DEMO_PROJECTS, FAN_AND_RIDGE_TITLE, seedDemo } from "../../scripts/lib/seed.ts";
import { testDatabaseUrl } from "../setup/test-env.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, makeTeam, mainAttic, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let customerId: string;
const items: Record<string, CatalogItem> = {};

async function addItem(agent: Agent, body: Record<string, unknown>) {
  const res = await send(agent, "post", "/api/catalog", body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.item as CatalogItem;
}

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  await t.db.update(companies).set({ taxRateBasisPoints: 825, depositRule: { kind: "percent", value: 10, capCents: 50_000 } }).where(eq(companies.id, team.company.id));
  customerId = (await createCustomer(team.asOwner, { name: "Hollis Brambleworth" })).id;
  items.ridge = await addItem(team.asOwner, { sku: "RV", name: "Ridge vent", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, materialCostCents: 375, sellPriceCents: 1150, laborMinutesPerUnit: 6 });
  items.strip = await addItem(team.asOwner, { sku: "STRIP", name: "Soffit strip", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, materialCostCents: 160, sellPriceCents: 650 });
  items.seal = await addItem(team.asOwner, { sku: "SEAL", name: "Seal a gable fan opening", kind: "seal-gable-opening", unit: "each", materialCostCents: 2200, sellPriceCents: 12500 });
  items.retired = await addItem(team.asOwner, { sku: "OLD", name: "Old box vent", kind: "box", unit: "each", nfaSqInPerUnit: 50, materialCostCents: 100, sellPriceCents: 200, isActive: false });
});
afterAll(async () => t?.close());

/** The fan-and-ridge attic with the fan taken out and intake added at the eaves. */
const fanOut = (spaceId: string) => ({
  name: "Ridge and soffit (remove fan)",
  notes: "Fan circuit disconnected at the junction box.",
  spaces: [{
    spaceId,
    ventActions: { "fan-1": "remove" },
    added: [
      { id: "strip", catalogItemId: items.strip!.id, quantity: 48 },
      { id: "seal", catalogItemId: items.seal!.id, quantity: 1 },
    ],
  }],
  laborLines: [{ id: "l1", description: "Haul away the old fan", hours: 0.5, rateCents: 7500 }],
  discount: { kind: "percent", basisPoints: 500 },
});

async function projectWithAttic() {
  const project = await createProject(team.asEstimator, customerId);
  const space = await createSpace(team.asEstimator, project.id, mainAttic);
  return { project, space };
}

describe("design options", () => {
  it("when an option is created, then it answers 201 with version 1, its analysis per space and its price", async () => {
    const { project, space } = await projectWithAttic();
    const res = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const option = res.body.option;
    expect(option).toMatchObject({
      projectId: project.id, name: "Ridge and soffit (remove fan)", version: 1, position: 0, isKept: true, origin: "manual", rationale: [],
      discount: { kind: "percent", basisPoints: 500 }, notes: "Fan circuit disconnected at the junction box.", priceIssue: null,
    });
    expect(option.analysis.spaces).toHaveLength(1);
    expect(option.analysis.spaces[0]).toMatchObject({ spaceId: space.id, name: "Main attic", issues: [] });
    expect(option.analysis.spaces[0].analysis.compliant).toBe(true);
    expect(option.price.totalCents).toBeGreaterThan(0);
    expect(Number.isInteger(option.price.totalCents)).toBe(true);
  });

  it("when an option is read, then its analysis equals the shared core's on the attic after the work, and its price the pricing module's with the company's tax and deposit", async () => {
    const { project, space } = await projectWithAttic();
    const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
    const option = (await team.asSales.get(`/api/options/${created.id}`).expect(200)).body.option;

    const catalog = (await team.asSales.get("/api/catalog?includeInactive=true").expect(200)).body.items as CatalogItem[];
    const detail = (await team.asSales.get(`/api/projects/${project.id}`).expect(200)).body;
    const survey = SpaceSurveySchema.parse(detail.spaces[0]);
    const expected = analyzeAttic(toAtticInput(detail.project, applyOption(survey, OptionSpaceSchema.parse(option.spaces[0]), catalog)));
    expect(option.analysis.spaces[0].analysis).toEqual(JSON.parse(JSON.stringify(expected)));
    expect(expected.findings.map((f) => f.code)).not.toContain("powered-with-passive-exhaust");

    const price = priceOption(option, catalog, {
      taxRateBasisPoints: 825, isLaborTaxed: true,
      deposit: { request: { kind: "percent", basisPoints: 1000 }, capCents: 50_000, capBasisPoints: null },
    });
    expect(option.price).toEqual(JSON.parse(JSON.stringify(price)));
    expect(option.price.taxRateBasisPoints).toBe(825);
    expect(option.price.lines.map((l: { description: string; totalCents: number }) => [l.description, l.totalCents])).toEqual([
      ["Soffit strip", 48 * 650], ["Seal a gable fan opening", 12500], ["Haul away the old fan", 3750],
    ]);

    const list = (await team.asSales.get(`/api/projects/${project.id}/options`).expect(200)).body.options;
    expect(list).toHaveLength(1);
    expect(list[0]).toEqual(option);
  });

  it("when the option leaves a space out, then that space is analysed as surveyed", async () => {
    const { project, space } = await projectWithAttic();
    const garage = await createSpace(team.asEstimator, project.id, { name: "Garage attic", sections: [{ kind: "rect", lengthFt: 20, widthFt: 20 }] });
    const option = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
    expect(option.analysis.spaces.map((s: { spaceId: string }) => s.spaceId)).toEqual([space.id, garage.id]);
    const surveyed = (await team.asEstimator.get(`/api/projects/${project.id}/analysis`).expect(200)).body.spaces[1];
    expect(option.analysis.spaces[1]).toEqual(surveyed);
  });

  it("when options are listed, then they come in the order they were made, each with its version", async () => {
    const { project, space } = await projectWithAttic();
    for (const name of ["First", "Second", "Third"]) {
      await send(team.asSales, "post", `/api/projects/${project.id}/options`, { ...fanOut(space.id), name }).expect(201);
    }
    const list = (await team.asEstimator.get(`/api/projects/${project.id}/options`).expect(200)).body.options;
    expect(list.map((o: { name: string; position: number; version: number }) => [o.name, o.position, o.version])).toEqual([["First", 0, 1], ["Second", 1, 1], ["Third", 2, 1]]);
  });

  it("when a patch names the current version, then only the fields sent change and the version goes up by one", async () => {
    const { project, space } = await projectWithAttic();
    const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
    const res = await send(team.asSales, "patch", `/api/options/${created.id}`, { version: 1, name: "Renamed", isKept: false });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.option).toMatchObject({ name: "Renamed", isKept: false, version: 2, notes: created.notes, discount: created.discount, laborLines: created.laborLines, spaces: created.spaces });
    const spaces = [{ ...created.spaces[0], added: [{ id: "strip", catalogItemId: items.strip!.id, quantity: 16 }] }];
    const smaller = await send(team.asSales, "patch", `/api/options/${created.id}`, { version: 2, spaces });
    expect(smaller.body.option.version).toBe(3);
    expect(smaller.body.option.price.lines.map((l: { totalCents: number }) => l.totalCents)).toEqual([16 * 650, 3750]);
  });

  it("when a patch names an old version, then it answers 409 stale-version with the current option, and nothing is overwritten", async () => {
    const { project, space } = await projectWithAttic();
    const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
    await send(team.asOwner, "patch", `/api/options/${created.id}`, { version: 1, name: "Saved first" }).expect(200);
    const stale = await send(team.asEstimator, "patch", `/api/options/${created.id}`, { version: 1, name: "Saved second" });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "stale-version", message: "Someone else saved this design option since you opened it.", fields: {} });
    expect(stale.body.error.current).toMatchObject({ id: created.id, name: "Saved first", version: 2 });
    expect(stale.body.error.current.analysis.spaces).toHaveLength(1);
    expect((await team.asEstimator.get(`/api/options/${created.id}`)).body.option).toMatchObject({ name: "Saved first", version: 2 });
    const racers = await Promise.all(Array.from({ length: 8 }, (_, i) => send(team.asEstimator, "patch", `/api/options/${created.id}`, { version: 2, name: `Racer ${i}` })));
    expect(racers.filter((r) => r.status === 200)).toHaveLength(1);
    expect(racers.filter((r) => r.status === 409)).toHaveLength(7);
  });

  it("when an option is deleted, then it answers 204 and is gone", async () => {
    const { project, space } = await projectWithAttic();
    const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
    await send(team.asSales, "delete", `/api/options/${created.id}`).expect(204);
    expect((await team.asSales.get(`/api/options/${created.id}`)).status).toBe(404);
    expect((await send(team.asSales, "delete", `/api/options/${created.id}`)).status).toBe(404);
    expect((await team.asSales.get(`/api/projects/${project.id}/options`)).body.options).toEqual([]);
  });

  describe("validation", () => {
    it("when an added item is not an active item of this company, then 400 names the field", async () => {
      const { project, space } = await projectWithAttic();
      const other = await makeTeam(t);
      const theirs = await addItem(other.asOwner, { sku: "THEIRS", name: "Their ridge vent", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, materialCostCents: 1, sellPriceCents: 2 });
      for (const catalogItemId of [theirs.id, items.retired!.id, "6c1f1b9e-36b5-4b8a-9a55-4b7f1a1f0000"]) {
        const body = { name: "X", spaces: [{ spaceId: space.id, added: [{ id: "a", catalogItemId, quantity: 2 }] }] };
        const res = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, body);
        expect(res.status).toBe(400);
        expect(res.body.error.fields).toEqual({ "spaces.0.added.0.catalogItemId": "Choose an active item of your catalog." });
      }
    });

    it("when a space is not a space of the project, or a vent not a vent of the space, then 400 names the field", async () => {
      const { project, space } = await projectWithAttic();
      const elsewhere = await projectWithAttic();
      const cases: [Record<string, unknown>[], string][] = [
        [[{ spaceId: elsewhere.space.id }], "spaces.0.spaceId"],
        [[{ spaceId: space.id }, { spaceId: space.id }], "spaces.1.spaceId"],
        [[{ spaceId: space.id, ventActions: { "no-such-vent": "remove" } }], "spaces.0.ventActions.no-such-vent"],
        [[{ spaceId: space.id, added: [{ id: "a", catalogItemId: items.strip!.id, quantity: 8, replacesVentId: "nope" }] }], "spaces.0.added.0.replacesVentId"],
        [[{ spaceId: space.id, added: [{ id: "a", catalogItemId: items.seal!.id, quantity: 1.5 }] }], "spaces.0.added.0.quantity"],
        [[{ spaceId: space.id, added: [{ id: "a", catalogItemId: items.seal!.id, quantity: 1 }, { id: "a", catalogItemId: items.seal!.id, quantity: 1 }] }], "spaces.0.added.1.id"],
      ];
      for (const [spaces, field] of cases) {
        const res = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, { name: "X", spaces });
        expect(res.status, field).toBe(400);
        expect(Object.keys(res.body.error.fields), field).toEqual([field]);
      }
      const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
      const patch = await send(team.asEstimator, "patch", `/api/options/${created.id}`, { version: 1, spaces: [{ spaceId: elsewhere.space.id }] });
      expect(patch.status).toBe(400);
      expect(patch.body.error.fields).toHaveProperty("spaces.0.spaceId");
    });

    it("when the body breaks the schema, then 400 names the field and nothing is saved", async () => {
      const { project, space } = await projectWithAttic();
      const cases: [Record<string, unknown>, string][] = [
        [{ name: "" }, "name"],
        [{ name: "X", discount: { kind: "percent", basisPoints: 20_000 } }, "discount.basisPoints"],
        [{ name: "X", spaces: [{ spaceId: "abc" }] }, "spaces.0.spaceId"],
        [{ name: "X", spaces: [{ spaceId: space.id, added: [{ id: "a", catalogItemId: items.strip!.id, quantity: -1 }] }] }, "spaces.0.added.0.quantity"],
        [{ name: "X", laborLines: [{ id: "l", description: "Work", hours: 1, rateCents: 12.5 }] }, "laborLines.0.rateCents"],
        [{ name: "X", version: 3 }, "version"],
      ];
      for (const [body, field] of cases) {
        const res = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, body);
        expect(res.status, field).toBe(400);
        expect(Object.keys(res.body.error.fields), field).toContain(field);
      }
      const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
      const noVersion = await send(team.asEstimator, "patch", `/api/options/${created.id}`, { name: "Y" });
      expect(noVersion.status).toBe(400);
      expect(noVersion.body.error.fields).toHaveProperty("version");
      expect((await team.asEstimator.get(`/api/projects/${project.id}/options`)).body.options).toHaveLength(1);
    });

    it("when an item the option already uses is retired, then the option still reads and can still be saved", async () => {
      const { project, space } = await projectWithAttic();
      const item = await addItem(team.asOwner, { sku: "SOON-OLD", name: "Soon retired strip", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, materialCostCents: 100, sellPriceCents: 500 });
      const body = { name: "Uses it", spaces: [{ spaceId: space.id, added: [{ id: "a", catalogItemId: item.id, quantity: 10 }] }] };
      const created = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, body).expect(201)).body.option;
      await send(team.asOwner, "patch", `/api/catalog/${item.id}`, { isActive: false }).expect(200);
      const read = (await team.asEstimator.get(`/api/options/${created.id}`).expect(200)).body.option;
      expect(read.price.lines[0]).toMatchObject({ catalogItemId: item.id, totalCents: 5000 });
      await send(team.asEstimator, "patch", `/api/options/${created.id}`, { version: 1, spaces: body.spaces }).expect(200);
    });
  });

  describe("roles (options:edit is every role; reading needs projects:read)", () => {
    it("when sales and estimators make and edit options, then they may", async () => {
      const { project, space } = await projectWithAttic();
      const created = (await send(team.asSales, "post", `/api/projects/${project.id}/options`, fanOut(space.id)).expect(201)).body.option;
      await send(team.asEstimator, "patch", `/api/options/${created.id}`, { version: 1, notes: "Checked" }).expect(200);
      await send(team.asOwner, "patch", `/api/options/${created.id}`, { version: 2, notes: null }).expect(200);
    });
  });
});

interface PerVent { kind: string; location: string; isPowered: boolean; nfaSqIn: number }
interface Analysis { compliant: boolean; fan: unknown; findings: { code: string }[]; provided: { intakeSqIn: number; exhaustSqIn: number; perVent: PerVent[] } }
interface Proposal { spaceId: string; type: string; option: Record<string, unknown> & { spaces: { spaceId: string }[]; origin: string; rationale: string[] }; analysis: { spaces: { spaceId: string; analysis: Analysis }[] }; price: { totalCents: number } }

/** What every proposal must be: compliant, one passive exhaust type, no powered fan, intake ≥ exhaust. */
function expectSoundProposal(proposal: Proposal, spaceId: string) {
  const space = proposal.analysis.spaces.find((s) => s.spaceId === spaceId)!;
  expect(space.analysis.compliant, proposal.type).toBe(true);
  const exhaustKinds = new Set(space.analysis.provided.perVent.filter((v) => v.location === "upper" && !v.isPowered && v.nfaSqIn > 0).map((v) => v.kind));
  expect(exhaustKinds.size, proposal.type).toBe(1);
  expect(space.analysis.provided.perVent.some((v) => v.isPowered), proposal.type).toBe(false);
  expect(space.analysis.fan, proposal.type).toBeNull();
  expect(space.analysis.provided.intakeSqIn, proposal.type).toBeGreaterThanOrEqual(space.analysis.provided.exhaustSqIn);
  expect(space.analysis.findings.map((f) => f.code), proposal.type).not.toContain("powered-with-passive-exhaust");
  expect(Number.isInteger(proposal.price.totalCents)).toBe(true);
}

describe("the generator and the materials list", () => {
  const fanAndRidge = DEMO_PROJECTS.find((p) => p.title === FAN_AND_RIDGE_TITLE)!;

  async function demoLikeCompany() {
    const co = await makeTeam(t);
    for (const item of DEMO_CATALOG) await addItem(co.asOwner, item);
    const customer = await createCustomer(co.asOwner, { name: "Fenwick Ashdown" });
    // The demo's basis and attic, under a title of its own (the demo test counts the demo's titles).
    const { climateZone, moistureRegime, codeBasis, ceilingVaporRetarder, roofColor } = fanAndRidge;
    const project = await createProject(co.asEstimator, customer.id, { climateZone, moistureRegime, codeBasis, ceilingVaporRetarder, roofColor, title: "Fan beside a ridge vent" });
    const space = await createSpace(co.asEstimator, project.id, fanAndRidge.spaces[0]!);
    return { co, project, space };
  }

  it("when options are generated for the fan-and-ridge attic, then every proposal is compliant with one exhaust type and nothing is saved; a kept one saves as shown", async () => {
    const { co, project, space } = await demoLikeCompany();
    const res = await send(co.asSales, "post", `/api/projects/${project.id}/options/generate`, {});
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(200);
    const proposals = res.body.proposals as Proposal[];
    expect(proposals.map((p) => p.type)).toContain("ridge-and-continuous-soffit");
    for (const proposal of proposals) {
      expect(proposal.spaceId).toBe(space.id);
      expect(proposal.option.spaces.map((s) => s.spaceId)).toEqual([space.id]);
      expect(proposal.option.origin).toBe("generated");
      expect(proposal.option.rationale.length).toBeGreaterThan(0);
      expectSoundProposal(proposal, space.id);
    }
    expect(Array.isArray(res.body.skipped)).toBe(true);
    expect((await co.asSales.get(`/api/projects/${project.id}/options`).expect(200)).body.options).toEqual([]);

    const kept = await send(co.asSales, "post", `/api/projects/${project.id}/options`, { ...proposals[0]!.option, isKept: true });
    expect(kept.status, JSON.stringify(kept.body).slice(0, 500)).toBe(201);
    expect(kept.body.option.analysis).toEqual(proposals[0]!.analysis);
    expect(kept.body.option.price).toEqual(proposals[0]!.price);
  });

  it("when a space cannot be analysed yet, then it is skipped with the reason; an unknown space id answers 400", async () => {
    const { co, project } = await demoLikeCompany();
    const empty = await createSpace(co.asEstimator, project.id, { name: "Bonus room attic" });
    const res = await send(co.asEstimator, "post", `/api/projects/${project.id}/options/generate`, { spaceIds: [empty.id] });
    expect(res.status).toBe(200);
    expect(res.body.proposals).toEqual([]);
    expect(res.body.skipped.length).toBeGreaterThan(0);
    expect(res.body.skipped[0]).toMatchObject({ spaceId: empty.id, spaceName: "Bonus room attic", reason: expect.stringMatching(/can't be analysed/) });
    const bad = await send(co.asEstimator, "post", `/api/projects/${project.id}/options/generate`, { spaceIds: ["6c1f1b9e-36b5-4b8a-9a55-4b7f1a1f0000"] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("spaceIds.0");
  });

  it("when the crew's list is read, then ridge vent is rounded up to whole 4 ft pieces and the removal work carries its caution", async () => {
    const { project, space } = await projectWithAttic();
    const body = {
      name: "Ridge",
      spaces: [{
        spaceId: space.id, ventActions: { "fan-1": "remove" },
        added: [{ id: "r", catalogItemId: items.ridge!.id, quantity: 38 }, { id: "s", catalogItemId: items.strip!.id, quantity: 20 }, { id: "s2", catalogItemId: items.strip!.id, quantity: 20 }],
      }],
    };
    const option = (await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, body).expect(201)).body.option;
    const res = await team.asSales.get(`/api/options/${option.id}/materials`).expect(200);
    expect(res.body.option).toEqual({ id: option.id, name: "Ridge", version: 1, projectId: project.id });
    expect(res.body.project).toMatchObject({ id: project.id, title: "Attic survey" });
    expect(res.body.spaces).toEqual([{ id: space.id, name: "Main attic" }]);
    const lines = res.body.materials.items.map((i: { sku: string; quantity: number; buyCount: number; buyUnit: string }) => [i.sku, i.quantity, i.buyCount, i.buyUnit]);
    expect(lines).toEqual([["RV", 38, 10, "pieces of 4 ft"], ["STRIP", 40, 5, "pieces of 8 ft"]]);
    const removal = res.body.materials.work.find((w: { description: string }) => /^Remove powered gable fan/.test(w.description));
    expect(removal.caution).toEqual(expect.any(String));
    expect(removal.description).toMatch(/licensed electrician/);
  });

  describe("the demo (seeded into the test database)", () => {
    it("when the fan-and-ridge demo is opened, then it has its two saved options and the first meets the code with nothing short-circuiting", async () => {
      const demo = await t.signIn("estimator@tallgrass.example", DEMO_PASSWORD);
      const list = await demo.get(`/api/projects?q=${encodeURIComponent("gable fan and ridge")}`).expect(200);
      const project = list.body.items.find((p: { title: string }) => p.title === FAN_AND_RIDGE_TITLE);
      const options = (await demo.get(`/api/projects/${project.id}/options`).expect(200)).body.options;
      expect(options.map((o: { name: string }) => o.name)).toEqual([...DEMO_OPTION_NAMES]);
      const [first, second] = options;
      expect(first.analysis.spaces[0].analysis.compliant).toBe(true);
      expect(first.analysis.spaces[0].analysis.findings.map((f: { code: string }) => f.code)).not.toContain("powered-with-passive-exhaust");
      expect(first.price.taxRateBasisPoints).toBe(725);
      expect(first.price.deposit.depositCents).toBeGreaterThan(0);
      expect(second.analysis.spaces[0].analysis.findings.map((f: { code: string }) => f.code)).toContain("backdraft-risk");

      const generated = await send(demo, "post", `/api/projects/${project.id}/options/generate`, {});
      expect(generated.status).toBe(200);
      expect(generated.body.proposals.length).toBeGreaterThan(0);
      for (const proposal of generated.body.proposals) expectSoundProposal(proposal, proposal.spaceId);

      const materials = (await demo.get(`/api/options/${first.id}/materials`).expect(200)).body.materials;
      const ridgeLine = materials.items.find((i: { kind: string }) => i.kind === "ridge" || i.kind === "soffit-continuous");
      expect(ridgeLine.buyUnit).toMatch(/^pieces of \d+ ft$/);
    });

    it("when the seed runs again, then it adds no catalog item and no option (idempotent)", async () => {
      const count = async () => (await t.db.execute<{ n: number }>(rawSql`select (select count(*) from catalog_items)::int + (select count(*) from design_options)::int as n`))[0]!.n;
      const before = await count();
      await seedDemo(testDatabaseUrl());
      expect(await count()).toBe(before);
    });
  });
});
