import express from "express";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { AppError } from "../../lib/errors.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { CATALOG_KINDS, CatalogItemInputSchema, CatalogItemPatchSchema } from "../../../shared/schemas/catalog.ts";
import type { CatalogService } from "./catalog.service.ts";

export const CatalogListQuerySchema = z.object({
  q: z.string().trim().max(100, "Search at most 100 characters.").optional().transform((q) => q || undefined),
  kind: z.enum(CATALOG_KINDS, { error: "Choose one of the catalog kinds." }).optional(),
  includeInactive: z.enum(["true", "false"], { error: "Use true or false." }).optional().transform((v) => v === "true"),
});

const MAX_CSV_BYTES = 1024 * 1024;
const ImportJsonSchema = z.object({ csv: z.string({ error: "Send the file's text as csv." }).max(MAX_CSV_BYTES, "The file is larger than 1 MB.") }).strict();
/** Spreadsheets and browsers label a CSV file in several ways. */
const csvBody = express.text({ type: ["text/csv", "text/plain", "application/csv", "application/vnd.ms-excel"], limit: MAX_CSV_BYTES });

export function catalogRouter(service: CatalogService) {
  return routesRouter([
    {
      method: "get", path: "/catalog", access: "catalog:read",
      handler: async (req, res) => { res.json(await service.list(actorOf(req), parse(CatalogListQuerySchema, req.query))); },
    },
    {
      method: "post", path: "/catalog", access: "catalog:edit", creates: true,
      handler: async (req, res) => {
        res.status(201).json({ item: await service.create(actorOf(req), parse(CatalogItemInputSchema, req.body), metaOf(req)) });
      },
    },
    {
      method: "get", path: "/catalog/export.csv", access: "catalog:read",
      handler: async (req, res) => {
        const csv = await service.exportCsv(actorOf(req));
        // The byte-order mark tells spreadsheets the file is UTF-8 (names like "16×8 in"); import removes it.
        res.type("text/csv; charset=utf-8").attachment("catalog.csv").send(`\uFEFF${csv}`);
      },
    },
    {
      method: "post", path: "/catalog/import", access: "catalog:edit", before: [csvBody],
      handler: async (req, res) => {
        const csv = typeof req.body === "string" ? req.body
          : req.body && typeof req.body === "object" ? parse(ImportJsonSchema, req.body).csv
          : undefined;
        if (csv === undefined) {
          throw new AppError("not-csv", "Send the catalog as a CSV file (Content-Type text/csv) or as JSON { csv }.", 400, { file: "Send a CSV file." });
        }
        const result = await service.importCsv(actorOf(req), csv, metaOf(req));
        if (result.errors.length === 0) {
          res.json(result);
          return;
        }
        const rows = new Set(result.errors.map((e) => e.row)).size;
        const message = `${rows} row${rows > 1 ? "s have" : " has"} problems, so nothing was imported. Fix ${rows > 1 ? "them" : "it"} and import the file again.`;
        res.status(400).json({ ...result, error: { code: "invalid-rows", message, fields: {} } });
      },
    },
    {
      method: "patch", path: "/catalog/:id", access: "catalog:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = idParam(req, "id", "That catalog item");
        const patch = parse(CatalogItemPatchSchema, req.body);
        res.json({ item: await service.update(actorOf(req), id, patch, metaOf(req)) });
      },
    },
  ]);
}
