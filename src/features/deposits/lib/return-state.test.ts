import { describe, expect, it } from "vitest";
import { checkoutReturnOf } from "./return-state";

describe("checkoutReturnOf", () => {
  it("when the address says success or cancel, then that is the return; anything else is none", () => {
    expect(checkoutReturnOf("?deposit=success")).toBe("success");
    expect(checkoutReturnOf("?x=1&deposit=cancel")).toBe("cancel");
    expect(checkoutReturnOf("?deposit=paid")).toBeNull();
    expect(checkoutReturnOf("")).toBeNull();
  });
});
