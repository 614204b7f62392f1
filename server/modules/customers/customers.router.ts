import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { CustomerInputSchema, CustomerListQuerySchema, CustomerPatchSchema } from "../../../shared/schemas/projects.ts";
import type { CustomersService } from "./customers.service.ts";

const customerId = (req: Parameters<typeof idParam>[0]) => idParam(req, "id", "That customer");

export function customersRouter(service: CustomersService) {
  return routesRouter([
    {
      method: "get", path: "/customers", access: "customers:read",
      handler: async (req, res) => { res.json(await service.list(actorOf(req), parse(CustomerListQuerySchema, req.query))); },
    },
    {
      method: "post", path: "/customers", access: "customers:edit", creates: true,
      handler: async (req, res) => {
        res.status(201).json({ customer: await service.create(actorOf(req), parse(CustomerInputSchema, req.body), metaOf(req)) });
      },
    },
    {
      method: "get", path: "/customers/:id", access: "customers:read", idParams: ["id"],
      handler: async (req, res) => { res.json({ customer: await service.get(actorOf(req), customerId(req)) }); },
    },
    {
      method: "patch", path: "/customers/:id", access: "customers:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = customerId(req);
        res.json({ customer: await service.update(actorOf(req), id, parse(CustomerPatchSchema, req.body)) });
      },
    },
    {
      method: "delete", path: "/customers/:id", access: "customers:edit", idParams: ["id"],
      handler: async (req, res) => {
        await service.remove(actorOf(req), customerId(req), metaOf(req));
        res.status(204).end();
      },
    },
  ]);
}
