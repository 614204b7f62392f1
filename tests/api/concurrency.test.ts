import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { ORIGIN, TEST_PASSWORD, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, makeTeam, mainAttic, type Team } from "../setup/survey-fixtures.ts";

/** Issue 9, "concurrent edits": parallel conflicting updates either land or get 409, and none is lost. */

let t: TestApp;
let team: Team;
let server: Server;
let cookie: string;
let customerId: string;
const PARALLEL = 50;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Concurrent Roofing");
  server = createServer(t.app);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const res = await request(server).post("/api/auth/sign-in").set("origin", ORIGIN).send({ email: team.owner.email, password: TEST_PASSWORD }).expect(200);
  cookie = (res.headers["set-cookie"] as unknown as string[]).map((c) => c.split(";")[0]).join("; ");
  customerId = (await createCustomer(team.asOwner)).id;
});
afterAll(async () => {
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  await t?.close();
});

const api = () => request(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
const patchProject = (id: string, body: Record<string, unknown>) => api().patch(`/api/projects/${id}`).set("origin", ORIGIN).set("cookie", cookie).send(body);
const putSpace = (projectId: string, spaceId: string, body: Record<string, unknown>) =>
  api().put(`/api/projects/${projectId}/spaces/${spaceId}`).set("origin", ORIGIN).set("cookie", cookie).send(body);
const getProject = async (id: string) => (await api().get(`/api/projects/${id}`).set("cookie", cookie).expect(200)).body;

describe("concurrent edits of one project", () => {
  it("when 50 editors PATCH the same project with the same version at once, three rounds in a row, then exactly one lands per version, the rest get 409, and the stored title is the one that landed", async () => {
    const project = await createProject(team.asOwner, customerId, { title: "Original title" });
    let version = project.version;
    for (let round = 0; round < 3; round++) {
      const titles = Array.from({ length: PARALLEL }, (_, i) => `Round ${round} editor ${i}`);
      const results = await Promise.all(titles.map((title) => patchProject(project.id, { version, title })));
      const statuses = results.map((r) => r.status);
      expect(statuses.filter((s) => s !== 200 && s !== 409), JSON.stringify(statuses)).toEqual([]);
      const landed = results.filter((r) => r.status === 200);
      expect(landed).toHaveLength(1);
      const winner = landed[0]!.body.project as { title: string; version: number };
      expect(winner.version).toBe(version + 1);
      expect(titles).toContain(winner.title);
      // Every refusal says why and hands back the stored row, so the editor can merge rather than lose work.
      for (const r of results.filter((x) => x.status === 409)) {
        expect(r.body.error.code).toBe("stale-version");
        expect(r.body.error.message.length).toBeGreaterThan(0);
        expect(r.body.error.current.version).toBeGreaterThan(version);
      }
      const stored = (await getProject(project.id)).project;
      expect(stored).toMatchObject({ version: version + 1, title: winner.title });
      version = stored.version;
    }
  });

  it("when 50 editors each retry on 409 until their edit lands, then all 50 land exactly once and the version counts every one", async () => {
    const project = await createProject(team.asOwner, customerId, { title: "Retry target" });
    const landedVersions: number[] = [];
    await Promise.all(Array.from({ length: PARALLEL }, async (_, i) => {
      let version = project.version;
      for (let attempt = 0; attempt < 500; attempt++) {
        const res = await patchProject(project.id, { version, title: `Retrying editor ${i}` });
        if (res.status === 200) {
          landedVersions.push(res.body.project.version);
          return;
        }
        expect(res.status, JSON.stringify(res.body)).toBe(409);
        version = res.body.error.current.version;
      }
      throw new Error(`editor ${i} never landed`);
    }));
    // One landing per version, none twice and none skipped.
    expect(landedVersions.sort((a, b) => a - b)).toEqual(Array.from({ length: PARALLEL }, (_, i) => project.version + 1 + i));
    const stored = (await getProject(project.id)).project;
    expect(stored.version).toBe(project.version + PARALLEL);
    expect(stored.title).toMatch(/^Retrying editor \d+$/);
  }, 60_000);
});

describe("concurrent edits of one attic space", () => {
  it("when 50 editors PUT the same space with the same version at once, then exactly one lands, the rest get 409, and the stored survey is the winner's", async () => {
    const project = await createProject(team.asOwner, customerId, { title: "Space race" });
    const space = await createSpace(team.asOwner, project.id, mainAttic);
    const names = Array.from({ length: PARALLEL }, (_, i) => `Attic by editor ${i}`);
    const results = await Promise.all(names.map((name, i) =>
      putSpace(project.id, space.id, { ...mainAttic, name, version: space.version, notes: `note ${i}` })));
    expect(results.map((r) => r.status).filter((s) => s !== 200 && s !== 409)).toEqual([]);
    const landed = results.filter((r) => r.status === 200);
    expect(landed).toHaveLength(1);
    const winner = landed[0]!.body.space as { name: string; notes: string; version: number };
    expect(winner.version).toBe(space.version + 1);
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.error.code).toBe("stale-version");
    const stored = (await getProject(project.id)).spaces.find((s: { id: string }) => s.id === space.id);
    expect(stored).toMatchObject({ version: space.version + 1, name: winner.name, notes: winner.notes });
    expect(names.indexOf(winner.name)).toBe(Number(winner.notes.replace("note ", "")));
  });
});
