import { AppError, notFound } from "../../lib/errors.ts";
import type { Audit } from "../../lib/audit.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import type { CustomerInput, CustomerListQuery } from "../../../shared/schemas/projects.ts";
import type { CustomersRepository } from "./customers.repository.ts";

const isForeignKeyViolation = (err: unknown) => (err as { code?: string }).code === "23503";

export function createCustomersService(deps: { repo: CustomersRepository; audit: Audit }) {
  const { repo } = deps;
  return {
    async list(actor: Actor, query: CustomerListQuery) {
      const { items, total } = await repo.list(actor, query);
      return { items, total, page: query.page, pageSize: query.pageSize };
    },
    async get(actor: Actor, id: string) {
      const customer = await repo.find(actor, id);
      if (!customer) throw notFound("That customer");
      return customer;
    },
    async create(actor: Actor, input: CustomerInput, meta: RequestMeta) {
      const customer = await repo.insert(actor, input);
      await deps.audit({ event: "customer-created", companyId: actor.companyId, userId: actor.userId, detail: { customerId: customer.id } }, meta);
      return { ...customer, projectCount: 0 };
    },
    async update(actor: Actor, id: string, patch: Partial<CustomerInput>) {
      const updated = await repo.update(actor, id, patch);
      if (!updated) throw notFound("That customer");
      return (await repo.find(actor, id))!;
    },
    async remove(actor: Actor, id: string, meta: RequestMeta) {
      let outcome: Awaited<ReturnType<CustomersRepository["deleteUnused"]>>;
      try {
        outcome = await repo.deleteUnused(actor, id);
      } catch (err) {
        // A project created for this customer between the check and the delete.
        if (!isForeignKeyViolation(err)) throw err;
        outcome = "in-use";
      }
      if (outcome === "missing") throw notFound("That customer");
      if (outcome === "in-use") {
        throw new AppError("customer-has-projects", "This customer has projects. Delete or move their projects first.", 409);
      }
      await deps.audit({ event: "customer-deleted", companyId: actor.companyId, userId: actor.userId, detail: { customerId: id } }, meta);
    },
  };
}
export type CustomersService = ReturnType<typeof createCustomersService>;
