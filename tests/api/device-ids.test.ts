import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

/*
 * Field mode (issue 18): a phone with no signal makes the ids of the attic spaces and photos it
 * creates, so later edits can point at them before the server has seen them. Replaying the same
 * creation (a lost answer, a second tab, a key that expired overnight) must land exactly once, and
 * an id can never reach into another project or company.
 */
let t: TestApp;
let team: Team;
let other: Team;
let projectId: string;
let secondProjectId: string;
let png: Buffer;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  other = await makeTeam(t, "Bluestem Roofing");
  const customer = await createCustomer(team.asEstimator, { name: "Ilsa Pembury" });
  projectId = (await createProject(team.asEstimator, customer.id)).id;
  secondProjectId = (await createProject(team.asEstimator, customer.id, { title: "Garage" })).id;
  png = await sharp({ create: { width: 400, height: 300, channels: 3, background: "#a73" } }).png().toBuffer();
});
afterAll(async () => t?.close());

const spacesOf = async (agent: Agent, pid: string) => (await agent.get(`/api/projects/${pid}`).expect(200)).body.spaces as { id: string; name: string }[];
const photosOf = async (agent: Agent, pid: string) => (await agent.get(`/api/projects/${pid}`).expect(200)).body.photos as { id: string }[];
const upload = (agent: Agent, pid: string, fields: Record<string, string>) => {
  let req = agent.post(`/api/projects/${pid}/photos`).set("origin", ORIGIN);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach("file", png, { filename: "attic.png", contentType: "image/png" });
};

describe("attic spaces with an id made on the device", () => {
  it("when a space is created with its own id, then it keeps that id", async () => {
    const id = randomUUID();
    const res = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id, name: "Bonus room attic" });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.space.id).toBe(id);
  });

  it("when the same creation arrives again without its key (expired overnight), then the one space is answered and none is added", async () => {
    const id = randomUUID();
    const first = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id, name: "Garage attic" });
    expect(first.status).toBe(201);
    const again = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id, name: "Garage attic" });
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect(again.body.space.id).toBe(id);
    expect((await spacesOf(team.asEstimator, projectId)).filter((s) => s.id === id)).toHaveLength(1);
  });

  it("when ten copies of one creation arrive at once, then exactly one space exists", async () => {
    const id = randomUUID();
    const answers = await Promise.all(
      Array.from({ length: 10 }, () => send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id, name: "Addition attic" })),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 200, 200, 200, 200, 200, 201]);
    expect((await spacesOf(team.asEstimator, projectId)).filter((s) => s.id === id)).toHaveLength(1);
  });

  it("when the id belongs to a space of another project, then 409 and neither project changes", async () => {
    const existing = await createSpace(team.asEstimator, projectId, { name: "Porch attic" });
    const res = await send(team.asEstimator, "post", `/api/projects/${secondProjectId}/spaces`, { id: existing.id, name: "Stolen" });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("id-taken");
    expect(await spacesOf(team.asEstimator, secondProjectId)).toHaveLength(0);
  });

  it("when the id belongs to another company's space, then 409 that says nothing of it", async () => {
    const theirCustomer = await createCustomer(other.asEstimator, { name: "Corin Haskett" });
    const theirProject = await createProject(other.asEstimator, theirCustomer.id);
    const theirs = await createSpace(other.asEstimator, theirProject.id, { name: "Their attic" });
    const res = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id: theirs.id, name: "Mine" });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("id-taken");
    expect(JSON.stringify(res.body)).not.toContain("Their attic");
    expect((await spacesOf(other.asEstimator, theirProject.id)).map((s) => s.name)).toEqual(["Their attic"]);
  });

  it("when the id is not a UUID, then 400 naming id", async () => {
    const res = await send(team.asEstimator, "post", `/api/projects/${projectId}/spaces`, { id: "space-1", name: "Main attic" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.id).toBeTruthy();
  });
});

describe("photos with an id made on the device", () => {
  it("when the same photo is uploaded twice (the answer was lost), then one photo is stored and both answers name it", async () => {
    const id = randomUUID();
    const first = await upload(team.asEstimator, projectId, { id, caption: "Soffit baffles" });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body.photo.id).toBe(id);
    const again = await upload(team.asEstimator, projectId, { id, caption: "Soffit baffles" });
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect(again.body.photo.id).toBe(id);
    expect((await photosOf(team.asEstimator, projectId)).filter((p) => p.id === id)).toHaveLength(1);
  });

  it("when five copies arrive at once, then exactly one photo is stored", async () => {
    const id = randomUUID();
    const answers = await Promise.all(Array.from({ length: 5 }, () => upload(team.asEstimator, projectId, { id })));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 201]);
    expect((await photosOf(team.asEstimator, projectId)).filter((p) => p.id === id)).toHaveLength(1);
  });

  it("when the id belongs to another company's photo, then 409 and their photo is untouched", async () => {
    const theirCustomer = await createCustomer(other.asEstimator, { name: "Maren Vosk" });
    const theirProject = await createProject(other.asEstimator, theirCustomer.id);
    const theirs = await upload(other.asEstimator, theirProject.id, { caption: "Their ridge" });
    expect(theirs.status).toBe(201);
    const res = await upload(team.asEstimator, projectId, { id: theirs.body.photo.id });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("id-taken");
    expect(JSON.stringify(res.body)).not.toContain("Their ridge");
    expect((await photosOf(other.asEstimator, theirProject.id)).map((p) => p.id)).toEqual([theirs.body.photo.id]);
  });

  it("when the id belongs to a photo of another project of the same company, then 409", async () => {
    const first = await upload(team.asEstimator, projectId, {});
    const res = await upload(team.asEstimator, secondProjectId, { id: first.body.photo.id });
    expect(res.status).toBe(409);
    expect(await photosOf(team.asEstimator, secondProjectId)).toHaveLength(0);
  });

  it("when the id is not a UUID, then 400 naming id", async () => {
    const res = await upload(team.asEstimator, projectId, { id: "photo-1" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.id).toBeTruthy();
  });
});
