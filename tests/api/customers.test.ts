import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
});
afterAll(async () => t?.close());

describe("customers", () => {
  it("when an estimator creates, reads, edits and deletes a customer, then each step answers the saved record", async () => {
    const created = await createCustomer(team.asEstimator, { name: "Hollis Ambry", phone: "(555) 014-0001", email: "hollis@example.com", billingAddress: "9 Fen Road, Marrow Creek", notes: "Dog in the yard." });
    expect(created).toMatchObject({ name: "Hollis Ambry", phone: "(555) 014-0001", email: "hollis@example.com", projectCount: 0 });

    const read = await team.asSales.get(`/api/customers/${created.id}`).expect(200);
    expect(read.body.customer).toMatchObject({ id: created.id, billingAddress: "9 Fen Road, Marrow Creek", notes: "Dog in the yard." });

    const patched = await send(team.asEstimator, "patch", `/api/customers/${created.id}`, { phone: null, email: "" }).expect(200);
    expect(patched.body.customer).toMatchObject({ name: "Hollis Ambry", phone: null, email: null });

    await send(team.asEstimator, "delete", `/api/customers/${created.id}`).expect(204);
    await team.asEstimator.get(`/api/customers/${created.id}`).expect(404);
  });

  it("when a customer has a project, then deleting them answers 409 and keeps them", async () => {
    const customer = await createCustomer(team.asOwner, { name: "Marguerite Osk" });
    await createProject(team.asOwner, customer.id);
    const res = await send(team.asOwner, "delete", `/api/customers/${customer.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "customer-has-projects" });
    expect(res.body.error.message).toMatch(/has projects/);
    const kept = await team.asOwner.get(`/api/customers/${customer.id}`).expect(200);
    expect(kept.body.customer.projectCount).toBe(1);
  });

  it("when sales tries to create or delete a customer, then it is refused with 403", async () => {
    const customer = await createCustomer(team.asOwner, { name: "Sales Cannot Delete" });
    expect((await send(team.asSales, "post", "/api/customers", { name: "X" })).status).toBe(403);
    expect((await send(team.asSales, "delete", `/api/customers/${customer.id}`)).status).toBe(403);
    await team.asSales.get("/api/customers").expect(200);
  });

  it("when sales corrects a customer's contact details, then they are saved (sales fix an e-mail address before sending)", async () => {
    const customer = await createCustomer(team.asOwner, { name: "Sales Can Correct" });
    const res = await send(team.asSales, "patch", `/api/customers/${customer.id}`, { email: "corrected@homeowner.example", phone: "(555) 014-0000" });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.customer).toMatchObject({ email: "corrected@homeowner.example", phone: "(555) 014-0000" });
  });

  it("when not signed in, then the customer routes answer 401", async () => {
    await t.request().get("/api/customers").expect(401);
    await t.request().post("/api/customers").set("origin", ORIGIN).send({ name: "X" }).expect(401);
  });

  describe("validation", () => {
    const cases: [string, Record<string, unknown>, string][] = [
      ["name is missing", {}, "name"],
      ["name is blank", { name: "   " }, "name"],
      ["name is too long", { name: "n".repeat(201) }, "name"],
      ["name is not text", { name: 42 }, "name"],
      ["phone is too long", { name: "A", phone: "5".repeat(41) }, "phone"],
      ["email is not an e-mail address", { name: "A", email: "not-an-address" }, "email"],
      ["billing address is too long", { name: "A", billingAddress: "a".repeat(501) }, "billingAddress"],
      ["notes are too long", { name: "A", notes: "a".repeat(5001) }, "notes"],
      ["an unknown field is sent", { name: "A", colour: "red" }, "colour"],
    ];
    for (const [what, body, field] of cases) {
      it(`when ${what}, then creating answers 400 naming ${field}`, async () => {
        const res = await send(team.asEstimator, "post", "/api/customers", body);
        expect(res.status).toBe(400);
        expect(res.body.error.code).toBe("invalid-input");
        expect(Object.keys(res.body.error.fields)).toContain(field);
        expect(res.body.error.message).toBeTruthy();
      });
    }

    it("when a patch carries a bad field, then it answers 400 naming it and the customer is unchanged", async () => {
      const customer = await createCustomer(team.asEstimator, { name: "Unchanged Person" });
      const res = await send(team.asEstimator, "patch", `/api/customers/${customer.id}`, { name: "", email: "nope" });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toHaveProperty("name");
      expect(res.body.error.fields).toHaveProperty("email");
      expect((await team.asEstimator.get(`/api/customers/${customer.id}`)).body.customer.name).toBe("Unchanged Person");
    });

    it("when the list query is malformed, then it answers 400 naming the parameter", async () => {
      for (const [query, field] of [["sort=shoeSize", "sort"], ["dir=sideways", "dir"], ["page=0", "page"], ["pageSize=1000", "pageSize"]] as const) {
        const res = await team.asSales.get(`/api/customers?${query}`);
        expect(res.status, query).toBe(400);
        expect(res.body.error.fields).toHaveProperty(field);
      }
    });

    it("when the id in the path is not a uuid, then it answers 404 like any unknown id", async () => {
      const res = await team.asSales.get("/api/customers/..%2F..%2Fetc");
      expect(res.status).toBe(404);
    });
  });

  describe("list", () => {
    let listTeam: Team;
    beforeAll(async () => {
      listTeam = await makeTeam(t);
      for (const [name, email] of [["Beatrix Lowe", "bea@example.com"], ["Anselm Lowery", null], ["Cordelia Marsh", "cmarsh@example.com"], ["Dorian 100% Pike", null]] as const) {
        await createCustomer(listTeam.asOwner, { name, email });
      }
    });

    it("when searching part of a name or e-mail, case-insensitively, then only the matches come back", async () => {
      const byName = await listTeam.asSales.get("/api/customers?q=LOWE").expect(200);
      expect(byName.body.items.map((c: { name: string }) => c.name)).toEqual(["Anselm Lowery", "Beatrix Lowe"]);
      expect(byName.body.total).toBe(2);
      const byEmail = await listTeam.asSales.get("/api/customers?q=cmarsh@").expect(200);
      expect(byEmail.body.items.map((c: { name: string }) => c.name)).toEqual(["Cordelia Marsh"]);
    });

    it("when the search holds % or _, then they are matched literally, not as wildcards", async () => {
      const res = await listTeam.asSales.get(`/api/customers?q=${encodeURIComponent("0%")}`).expect(200);
      expect(res.body.items.map((c: { name: string }) => c.name)).toEqual(["Dorian 100% Pike"]);
      expect((await listTeam.asSales.get("/api/customers?q=_").expect(200)).body.total).toBe(0);
    });

    it("when sorting by name descending with a page size of 2, then pages follow one another with the total", async () => {
      const page1 = await listTeam.asSales.get("/api/customers?sort=name&dir=desc&pageSize=2&page=1").expect(200);
      const page2 = await listTeam.asSales.get("/api/customers?sort=name&dir=desc&pageSize=2&page=2").expect(200);
      expect(page1.body).toMatchObject({ total: 4, page: 1, pageSize: 2 });
      expect([...page1.body.items, ...page2.body.items].map((c: { name: string }) => c.name)).toEqual(["Dorian 100% Pike", "Cordelia Marsh", "Beatrix Lowe", "Anselm Lowery"]);
    });
  });
});
