import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
});
afterAll(async () => t?.close());

const ridge = { sku: "RV-18", name: "Ridge vent", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, materialCostCents: 375, sellPriceCents: 1150, laborMinutesPerUnit: 6 };
const box = { sku: "BOX-50", name: "Box vent", kind: "box", unit: "each", nfaSqInPerUnit: 50, materialCostCents: 1250, sellPriceCents: 4800 };

async function createItem(agent: Agent, body: Record<string, unknown>) {
  const res = await send(agent, "post", "/api/catalog", body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.item as { id: string; sku: string } & Record<string, unknown>;
}
const importCsv = (agent: Agent, csv: string | Buffer, type = "text/csv") =>
  agent.post("/api/catalog/import").set("origin", ORIGIN).set("content-type", type).send(csv);
const exportCsv = async (agent: Agent) => {
  const res = await agent.get("/api/catalog/export.csv").expect(200);
  return res.text;
};

describe("catalog", () => {
  it("when the owner adds an item, then it answers 201 with every field and the defaults filled in", async () => {
    const item = await createItem(team.asOwner, ridge);
    expect(item).toMatchObject({ ...ridge, nfaSqInPerUnit: null, cfm: null, isActive: true });
    expect(item.id).toMatch(/^[0-9a-f-]{36}$/);
    const list = await team.asSales.get("/api/catalog").expect(200);
    expect(list.body.items.map((i: { sku: string }) => i.sku)).toContain("RV-18");
  });

  it("when a code is already used (in any case), then it answers 409 duplicate-sku naming sku", async () => {
    const res = await send(team.asOwner, "post", "/api/catalog", { ...box, sku: "dup-1" });
    expect(res.status).toBe(201);
    const again = await send(team.asOwner, "post", "/api/catalog", { ...box, sku: "DUP-1" });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "duplicate-sku", fields: { sku: expect.any(String) } });
    const other = await createItem(team.asOwner, { ...box, sku: "dup-2" });
    const patch = await send(team.asOwner, "patch", `/api/catalog/${other.id}`, { sku: "Dup-1" });
    expect(patch.status).toBe(409);
  });

  it("when an item lacks what the core needs to count it, then it answers 400 naming the field", async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ ...ridge, sku: "X1", nfaSqInPerFt: null }, "nfaSqInPerFt"],
      [{ ...box, sku: "X2", nfaSqInPerUnit: null }, "nfaSqInPerUnit"],
      [{ ...box, sku: "X3", kind: "powered-roof", nfaSqInPerUnit: null }, "cfm"],
      [{ ...box, sku: "X4", kind: "baffle", nfaSqInPerUnit: 50 }, "nfaSqInPerUnit"],
      [{ ...box, sku: "X5", soldInLengthFt: 4 }, "soldInLengthFt"],
      [{ ...box, sku: "X6", sellPriceCents: 12.5 }, "sellPriceCents"],
      [{ ...box, sku: "X7", kind: "skylight" }, "kind"],
      [{ ...box, sku: "has space" }, "sku"],
      [{ ...box, sku: "X8", colour: "red" }, "colour"],
    ];
    for (const [body, field] of cases) {
      const res = await send(team.asOwner, "post", "/api/catalog", body);
      expect(res.status, field).toBe(400);
      expect(Object.keys(res.body.error.fields), field).toContain(field);
    }
  });

  it("when a patch names some fields, then only those change (the schema's defaults do not reset the others)", async () => {
    const item = await createItem(team.asOwner, { ...ridge, sku: "PATCH-1", laborMinutesPerUnit: 9 });
    const res = await send(team.asOwner, "patch", `/api/catalog/${item.id}`, { sellPriceCents: 1299 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.item).toMatchObject({ sellPriceCents: 1299, laborMinutesPerUnit: 9, nfaSqInPerFt: 18, soldInLengthFt: 4, isActive: true, name: "Ridge vent" });
    const bad = await send(team.asOwner, "patch", `/api/catalog/${item.id}`, { nfaSqInPerFt: null });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("nfaSqInPerFt");
  });

  it("when an item is retired, then the list hides it unless includeInactive=true; q and kind filter", async () => {
    const item = await createItem(team.asOwner, { ...box, sku: "RETIRED-1", name: "Old zebra vent" });
    await send(team.asOwner, "patch", `/api/catalog/${item.id}`, { isActive: false }).expect(200);
    const skus = async (query: string) => (await team.asEstimator.get(`/api/catalog${query}`).expect(200)).body.items.map((i: { sku: string }) => i.sku);
    expect(await skus("")).not.toContain("RETIRED-1");
    expect(await skus("?includeInactive=true")).toContain("RETIRED-1");
    expect(await skus("?q=zebra&includeInactive=true")).toEqual(["RETIRED-1"]);
    expect(await skus("?q=rv-1")).toEqual(["RV-18"]);
    expect((await skus("?kind=ridge")).every((s: string) => ["RV-18", "PATCH-1"].includes(s))).toBe(true);
    const bad = await team.asEstimator.get("/api/catalog?kind=skylight");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty("kind");
  });

  describe("roles (catalog:read is everyone; catalog:edit is the owner)", () => {
    it("when an estimator or a salesperson writes the catalog, then 403 and nothing changes", async () => {
      const item = await createItem(team.asOwner, { ...box, sku: "ROLE-1" });
      for (const agent of [team.asEstimator, team.asSales]) {
        expect((await send(agent, "post", "/api/catalog", { ...box, sku: "ROLE-2" })).status).toBe(403);
        expect((await send(agent, "patch", `/api/catalog/${item.id}`, { sellPriceCents: 1 })).status).toBe(403);
        expect((await importCsv(agent, "sku,name,kind,unit,materialCostCents,sellPriceCents\nROLE-3,A,labor,hour,0,1\n")).status).toBe(403);
        await agent.get("/api/catalog").expect(200);
        await agent.get("/api/catalog/export.csv").expect(200);
      }
      const list = (await team.asOwner.get("/api/catalog?q=role-").expect(200)).body.items;
      expect(list.map((i: { sku: string; sellPriceCents: number }) => [i.sku, i.sellPriceCents])).toEqual([["ROLE-1", 4800]]);
    });
  });

  describe("CSV", () => {
    it("when the catalog is exported, then it is text/csv with the schema's fields as columns", async () => {
      const res = await team.asSales.get("/api/catalog/export.csv").expect(200);
      expect(res.headers["content-type"]).toMatch(/^text\/csv/);
      expect(res.headers["content-disposition"]).toMatch(/^attachment; filename="?catalog\.csv"?$/);
      const firstLine = res.text.replace(/^\uFEFF/, "").split("\r\n")[0];
      expect(firstLine).toBe("sku,name,kind,unit,nfaSqInPerUnit,nfaSqInPerFt,cfm,soldInLengthFt,materialCostCents,sellPriceCents,laborMinutesPerUnit,isActive");
    });

    it("when one company's export is imported into another, then the second export equals the first; importing it again updates and creates nothing", async () => {
      const source = await makeTeam(t);
      await createItem(source.asOwner, ridge);
      await createItem(source.asOwner, { ...box, name: 'Box vent, "low profile" — 16×8 in', laborMinutesPerUnit: 45 });
      await createItem(source.asOwner, { sku: "-FORMULA", name: "=SUM(A1:A2)", kind: "labor", unit: "hour", materialCostCents: 0, sellPriceCents: 7500, isActive: false });
      await createItem(source.asOwner, { sku: "FAN-1200", name: "Gable fan", kind: "powered-gable", unit: "each", cfm: 1200, materialCostCents: 9800, sellPriceCents: 32500 });
      const csv = await exportCsv(source.asOwner);
      expect(csv).toContain("'=SUM(A1:A2)"); // a spreadsheet will not run it

      const target = await makeTeam(t);
      const first = await importCsv(target.asOwner, csv);
      expect(first.status, JSON.stringify(first.body)).toBe(200);
      expect(first.body).toEqual({ created: 4, updated: 0, errors: [] });
      expect(await exportCsv(target.asOwner)).toBe(csv);
      const inactive = (await target.asOwner.get("/api/catalog?includeInactive=true").expect(200)).body.items.find((i: { sku: string }) => i.sku === "-FORMULA");
      expect(inactive).toMatchObject({ name: "=SUM(A1:A2)", isActive: false, nfaSqInPerUnit: null });

      const again = await importCsv(target.asOwner, csv);
      expect(again.body).toEqual({ created: 0, updated: 4, errors: [] });
      expect(await exportCsv(target.asOwner)).toBe(csv);
    });

    it("when a file changes prices and adds an item, then known codes (any case) are updated with the columns the file has and new ones created", async () => {
      const co = await makeTeam(t);
      const item = await createItem(co.asOwner, { ...ridge, laborMinutesPerUnit: 7 });
      const csv = "SKU,Name,Kind,Unit,NFA sq in per ft,material_cost_cents,sellPriceCents\r\nrv-18,Ridge vent,ridge,linear-ft,17.5,400,1200\r\nSTRIP-8,Soffit strip,soffit-continuous,linear-ft,9,160,650\r\n";
      const res = await importCsv(co.asOwner, csv);
      expect(res.body).toEqual({ created: 1, updated: 1, errors: [] });
      const items = (await co.asOwner.get("/api/catalog").expect(200)).body.items;
      expect(items.find((i: { id: string }) => i.id === item.id)).toMatchObject({ sku: "RV-18", nfaSqInPerFt: 17.5, materialCostCents: 400, sellPriceCents: 1200, laborMinutesPerUnit: 7, soldInLengthFt: 4 });
      expect(items.find((i: { sku: string }) => i.sku === "STRIP-8")).toMatchObject({ nfaSqInPerFt: 9, laborMinutesPerUnit: 0, isActive: true });
    });

    it("when a file is sent as JSON { csv }, then it imports the same way", async () => {
      const co = await makeTeam(t);
      const res = await send(co.asOwner, "post", "/api/catalog/import", { csv: "sku,name,kind,unit,materialCostCents,sellPriceCents\nLAB-1,Labour,labor,hour,0,7500\n" });
      expect(res.body).toEqual({ created: 1, updated: 0, errors: [] });
    });

    it("when rows are bad, then nothing is imported and every bad row is reported with its row number and field", async () => {
      const co = await makeTeam(t);
      await createItem(co.asOwner, box);
      const before = await exportCsv(co.asOwner);
      const csv = [
        "sku,name,kind,unit,nfaSqInPerUnit,nfaSqInPerFt,materialCostCents,sellPriceCents,isActive",
        "GOOD-1,Fine item,box,each,50,,100,200,true", // row 2: good
        "BAD-1,Skylight,skylight,each,50,,100,200,true", // row 3: unknown kind
        "", // row 4: blank, skipped
        "BAD-2,Ridge,ridge,linear-ft,,abc,100,-5,maybe", // row 5: three bad cells
        "BAD-3,Ridge,ridge,linear-ft,,,100,200,", // row 6: a ridge vent without NFA per foot
        "GOOD-1,Same code again,box,each,50,,100,200,", // row 7: code repeated
        ",,box,each,50,,12.5,200,", // row 8: no code, no name, fractional cents
      ].join("\n");
      const res = await importCsv(co.asOwner, csv);
      expect(res.status).toBe(400);
      expect(res.body).toMatchObject({ created: 0, updated: 0, error: { code: "invalid-rows", message: expect.stringMatching(/5 rows have problems, so nothing was imported/) } });
      const byRow = (res.body.errors as { row: number; field: string; message: string }[]).map((e) => `${e.row} ${e.field}`);
      expect(byRow).toEqual(["3 kind", "5 nfaSqInPerFt", "5 sellPriceCents", "5 isActive", "6 nfaSqInPerFt", "7 sku", "8 sku", "8 name", "8 materialCostCents"]);
      for (const e of res.body.errors) expect(e.message.length).toBeGreaterThan(5);
      expect(await exportCsv(co.asOwner)).toBe(before);
    });

    it("when the body is not a catalog CSV, then it answers a clear 400 and imports nothing", async () => {
      const co = await makeTeam(t);
      const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52]);
      const cases: [string | Buffer, string, RegExp][] = [
        [png, "text/csv", /not a CSV text file/],
        ["", "text/csv", /empty/],
        ["hello there\nthis is a letter", "text/plain", /first row must name the columns/],
        ["sku,name,kind,unit,materialCostCents,sellPriceCents,colour\nA,B,labor,hour,0,1,red", "text/csv", /Unknown column: colour/],
        ["sku,name,kind,unit\nA,B,labor,hour", "text/csv", /needs the columns materialCostCents, sellPriceCents/],
        ["sku,name,kind,unit,materialCostCents,sellPriceCents\n", "text/csv", /no items/],
      ];
      for (const [body, type, message] of cases) {
        const res = await importCsv(co.asOwner, body, type);
        expect(res.status, String(message)).toBe(400);
        expect(res.body.error.code).toBe("not-csv");
        expect(res.body.error.message).toMatch(message);
      }
      const binary = await importCsv(co.asOwner, png, "application/octet-stream");
      expect(binary.status).toBe(400);
      expect(binary.body.error.code).toBe("not-csv");
      const json = await send(co.asOwner, "post", "/api/catalog/import", { file: "x" });
      expect(json.status).toBe(400);
      const big = await importCsv(co.asOwner, `sku,name,kind,unit,materialCostCents,sellPriceCents\n${"A,B,labor,hour,0,1\n".repeat(60_000)}`);
      expect(big.status).toBe(413);
      expect((await co.asOwner.get("/api/catalog?includeInactive=true").expect(200)).body.items).toEqual([]);
    });

    it("when an exported file is read back with papaparse, then its rows are the items", async () => {
      const co = await makeTeam(t);
      await createItem(co.asOwner, ridge);
      const parsed = Papa.parse<Record<string, string>>((await exportCsv(co.asOwner)).replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });
      expect(parsed.data).toEqual([{ sku: "RV-18", name: "Ridge vent", kind: "ridge", unit: "linear-ft", nfaSqInPerUnit: "", nfaSqInPerFt: "18", cfm: "", soldInLengthFt: "4", materialCostCents: "375", sellPriceCents: "1150", laborMinutesPerUnit: "6", isActive: "true" }]);
    });
  });
});
