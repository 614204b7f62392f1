import type { Request } from "express";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { DesignOptionInputSchema, DesignOptionPatchSchema } from "../../../shared/schemas/options.ts";
import type { OptionsService } from "./options.service.ts";

/** Which spaces to generate for; all spaces of the project when left out. */
export const GenerateOptionsSchema = z.object({
  spaceIds: z.array(z.string().uuid("Choose one of this project's attic spaces.")).max(20).optional(),
}).strict();

const projectId = (req: Request) => idParam(req, "id", "That project");
const optionId = (req: Request) => idParam(req, "id", "That design option");

export function optionsRouter(service: OptionsService) {
  return routesRouter([
    {
      method: "get", path: "/projects/:id/options", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.json({ options: await service.list(actorOf(req), projectId(req)) }); },
    },
    {
      method: "post", path: "/projects/:id/options", access: "options:edit", idParams: ["id"], creates: true,
      handler: async (req, res) => {
        const id = projectId(req);
        res.status(201).json({ option: await service.create(actorOf(req), id, parse(DesignOptionInputSchema, req.body)) });
      },
    },
    {
      method: "post", path: "/projects/:id/options/generate", access: "options:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = projectId(req);
        res.json(await service.generate(actorOf(req), id, parse(GenerateOptionsSchema, req.body ?? {})));
      },
    },
    {
      method: "get", path: "/options/:id", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.json({ option: await service.get(actorOf(req), optionId(req)) }); },
    },
    {
      method: "patch", path: "/options/:id", access: "options:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = optionId(req);
        const { version, ...patch } = parse(DesignOptionPatchSchema, req.body);
        res.json({ option: await service.update(actorOf(req), id, version, patch) });
      },
    },
    {
      method: "delete", path: "/options/:id", access: "options:edit", idParams: ["id"],
      handler: async (req, res) => {
        await service.remove(actorOf(req), optionId(req));
        res.status(204).end();
      },
    },
    {
      method: "get", path: "/options/:id/materials", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.materials(actorOf(req), optionId(req))); },
    },
  ]);
}
