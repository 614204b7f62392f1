import type { Request } from "express";
import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { ListQuerySchema, ProjectInputSchema, ProjectPatchSchema } from "../../../shared/schemas/projects.ts";
import type { ProjectsService } from "./projects.service.ts";

const projectId = (req: Request) => idParam(req, "id", "That project");

export function projectsRouter(service: ProjectsService) {
  return routesRouter([
    {
      method: "get", path: "/projects", access: "projects:read",
      handler: async (req, res) => { res.json(await service.list(actorOf(req), parse(ListQuerySchema, req.query))); },
    },
    {
      method: "post", path: "/projects", access: "projects:edit", creates: true,
      handler: async (req, res) => {
        res.status(201).json({ project: await service.create(actorOf(req), parse(ProjectInputSchema, req.body), metaOf(req)) });
      },
    },
    {
      method: "get", path: "/projects/:id", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.detail(actorOf(req), projectId(req))); },
    },
    {
      method: "patch", path: "/projects/:id", access: "projects:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = projectId(req);
        res.json({ project: await service.update(actorOf(req), id, parse(ProjectPatchSchema, req.body)) });
      },
    },
    {
      method: "get", path: "/projects/:id/analysis", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.type("json").send(await service.analysisJson(actorOf(req), projectId(req))); },
    },
  ]);
}
