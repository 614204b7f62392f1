import type { ZodType } from "zod";
import { z } from "zod";

/** Parses untrusted input with a schema; the error middleware turns a ZodError into a 400. */
export function parse<T>(schema: ZodType<T>, input: unknown): T {
  return schema.parse(input);
}

/** Route ids are uuids; anything else can never match a row, so it is simply not found. */
export const IdParam = z.string().uuid();
