import { describe, expect, it } from "vitest";
import { verifyPageUrl } from "./public-paths";

describe("verifyPageUrl", () => {
  it("when the origin has no trailing slash or one, then the address is the same", () => {
    expect(verifyPageUrl("https://app.tallgrass.example")).toBe("https://app.tallgrass.example/verify");
    expect(verifyPageUrl("https://app.tallgrass.example/")).toBe("https://app.tallgrass.example/verify");
  });
});
