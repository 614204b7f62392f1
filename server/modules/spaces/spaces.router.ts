import type { Request } from "express";
import { parse } from "../../lib/validate.ts";
import { actorOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { CopyVentsSchema, SpaceCreateSchema, SpaceSaveSchema } from "../../../shared/schemas/survey.ts";
import type { SpacesService } from "./spaces.service.ts";

const ids = (req: Request) => ({ projectId: idParam(req, "id", "That project"), spaceId: idParam(req, "spaceId", "That attic space") });

export function spacesRouter(service: SpacesService) {
  return routesRouter([
    {
      method: "post", path: "/projects/:id/spaces", access: "projects:edit", idParams: ["id"], creates: true,
      handler: async (req, res) => {
        const projectId = idParam(req, "id", "That project");
        const { space, isNew } = await service.create(actorOf(req), projectId, parse(SpaceCreateSchema, req.body));
        res.status(isNew ? 201 : 200).json({ space });
      },
    },
    {
      method: "put", path: "/projects/:id/spaces/:spaceId", access: "projects:edit", idParams: ["id", "spaceId"],
      handler: async (req, res) => {
        const { projectId, spaceId } = ids(req);
        res.json({ space: await service.save(actorOf(req), projectId, spaceId, parse(SpaceSaveSchema, req.body)) });
      },
    },
    {
      method: "delete", path: "/projects/:id/spaces/:spaceId", access: "projects:edit", idParams: ["id", "spaceId"],
      handler: async (req, res) => {
        const { projectId, spaceId } = ids(req);
        await service.remove(actorOf(req), projectId, spaceId);
        res.status(204).end();
      },
    },
    {
      method: "post", path: "/projects/:id/spaces/:spaceId/copy-vents", access: "projects:edit", idParams: ["id", "spaceId"],
      handler: async (req, res) => {
        const { projectId, spaceId } = ids(req);
        const { fromSpaceId } = parse(CopyVentsSchema, req.body);
        res.json({ space: await service.copyVents(actorOf(req), projectId, spaceId, fromSpaceId) });
      },
    },
  ]);
}
