import { z } from "zod";

/**
 * Checks every request carries before its own contract is applied: written once here, applied by the
 * server to every route's body and query string (server/lib/validate.ts), so no route can forget them.
 *
 * - Control characters: PostgreSQL refuses NUL in text and JSONB (SQLSTATE 22021 / 22P05), and the
 *   others (escape, backspace, bell…) only hide or garble text on a screen, in a PDF or in an e-mail.
 *   Tab, line feed and carriage return stay allowed: notes and terms have lines.
 * - Nesting: no contract goes deeper than a handful of levels; a body nested thousands deep is refused
 *   before any code walks it recursively.
 */
// eslint-disable-next-line no-control-regex
export const CONTROL_CHARACTER = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;
export const CONTROL_CHARACTER_MESSAGE = "Remove the control character (an invisible code such as NUL or escape) from this text.";
/** The deepest legal request is a survey vent's field (body → vents → [i] → field), four levels. */
export const MAX_INPUT_DEPTH = 12;
export const TOO_DEEP_MESSAGE = `The request is nested more than ${MAX_INPUT_DEPTH} levels deep.`;

/** Largest value of a PostgreSQL `integer` column (2³¹ − 1): versions, counts, cents. */
export const INT32_MAX = 2_147_483_647;

export interface InputProblem {
  path: (string | number)[];
  message: string;
}

/** The first control character or over-deep nesting in a JSON-like value, walked without recursion. */
export function findInputProblem(value: unknown): InputProblem | null {
  const stack: { value: unknown; path: (string | number)[] }[] = [{ value, path: [] }];
  while (stack.length > 0) {
    const { value: v, path } = stack.pop()!;
    if (typeof v === "string") {
      if (CONTROL_CHARACTER.test(v)) return { path, message: CONTROL_CHARACTER_MESSAGE };
      continue;
    }
    if (v === null || typeof v !== "object") continue;
    if (path.length >= MAX_INPUT_DEPTH) return { path: path.slice(0, MAX_INPUT_DEPTH), message: TOO_DEEP_MESSAGE };
    if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i--) stack.push({ value: v[i], path: [...path, i] });
      continue;
    }
    // Only plain parsed objects: a Buffer (a raw webhook body) is bytes, not text.
    const proto = Object.getPrototypeOf(v) as unknown;
    if (proto !== Object.prototype && proto !== null) continue;
    const entries = Object.entries(v);
    for (let i = entries.length - 1; i >= 0; i--) {
      const [key, child] = entries[i]!;
      if (CONTROL_CHARACTER.test(key)) return { path, message: CONTROL_CHARACTER_MESSAGE };
      stack.push({ value: child, path: [...path, key] });
    }
  }
  return null;
}

/**
 * Any request value passes through this before its route's own schema: a 400 whose field is the path
 * of the first offending text (e.g. `vents.0.id`).
 */
export const SafeInputSchema = z.unknown().superRefine((value, ctx) => {
  const problem = findInputProblem(value);
  if (problem) ctx.addIssue({ code: "custom", path: problem.path, message: problem.message });
});

/** The version a patch was based on: a whole number that fits the `integer` column. */
export const versionField = (what: string) =>
  z.number({ error: `The version of the ${what} you edited is required.` }).int(`The version of the ${what} is a whole number.`)
    .min(1, `The version of the ${what} is at least 1.`).max(INT32_MAX, `The version of the ${what} is not one this ${what} ever had.`);
