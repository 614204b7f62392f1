import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf } from "../../lib/request-context.ts";
import { routesRouter } from "../../lib/routes.ts";
import type { PipelineService } from "./pipeline.service.ts";

const PipelineQuerySchema = z.object({
  days: z.enum(["30", "90", "365"], { error: "days is 30, 90 or 365." }).default("90").transform((d) => Number(d) as 30 | 90 | 365),
});

/** GET /api/pipeline?days=30|90|365 — owner and sales. */
export function pipelineRouter(service: PipelineService) {
  return routesRouter([
    {
      method: "get", path: "/pipeline", access: "pipeline:read",
      handler: async (req, res) => { res.json(await service.overview(actorOf(req), parse(PipelineQuerySchema, req.query).days)); },
    },
  ]);
}
