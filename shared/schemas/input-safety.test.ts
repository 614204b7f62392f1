import { describe, expect, it } from "vitest";
import { CONTROL_CHARACTER_MESSAGE, findInputProblem, MAX_INPUT_DEPTH, SafeInputSchema, TOO_DEEP_MESSAGE, versionField } from "./input-safety.ts";

describe("findInputProblem", () => {
  it("when a nested string holds NUL, escape or a C1 control, then it names that field's path", () => {
    expect(findInputProblem({ vents: [{ id: "ok" }, { id: "r\u0000" }] })).toEqual({ path: ["vents", 1, "id"], message: CONTROL_CHARACTER_MESSAGE });
    expect(findInputProblem({ phone: "555\u001b[31m" })?.path).toEqual(["phone"]);
    expect(findInputProblem({ name: "a\u0085b" })?.path).toEqual(["name"]);
    expect(findInputProblem({ notes: "x\u007f" })?.path).toEqual(["notes"]);
  });

  it("when an object key holds a control character, then the problem is placed on its parent", () => {
    expect(findInputProblem({ scopes: { "a\u0000": ["x"] } })?.path).toEqual(["scopes"]);
  });

  it("when text holds tabs, line feeds, carriage returns and non-Latin letters, then there is no problem", () => {
    expect(findInputProblem({ notes: "Gate 4411\r\n\tDog — ne pas déranger 🏠", list: [1, true, null] })).toBeNull();
  });

  it("when a value is nested deeper than the limit (even 100,000 levels), then it is refused without overflowing the stack", () => {
    let deep: unknown = "x";
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(findInputProblem(deep)).toEqual({ path: Array(MAX_INPUT_DEPTH).fill(0), message: TOO_DEEP_MESSAGE });
    let ok: unknown = "x";
    for (let i = 0; i < MAX_INPUT_DEPTH; i++) ok = { a: ok };
    expect(findInputProblem(ok)).toBeNull();
  });

  it("when the value is a Buffer (a raw webhook body), then its bytes are not read as text", () => {
    expect(findInputProblem(Buffer.from([0, 1, 2]))).toBeNull();
  });
});

describe("SafeInputSchema and versionField", () => {
  it("when parsed, then a ZodError carries the path and message for the API's field errors", () => {
    const r = SafeInputSchema.safeParse({ q: "a\u0000" });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({ path: ["q"], message: CONTROL_CHARACTER_MESSAGE });
  });

  it("when a version passes 2^31 − 1 (PostgreSQL integer), then it is refused; 2^31 − 1 itself is accepted", () => {
    const v = versionField("project");
    expect(v.safeParse(2_147_483_647).success).toBe(true);
    expect(v.safeParse(2_147_483_648).success).toBe(false);
    expect(v.safeParse(0).success).toBe(false);
  });
});
