import { describe, expect, it } from "vitest";
import { returnPath } from "@/lib/page-path";

describe("returnPath: where sign-in sends a visitor back to", () => {
  it("keeps the page's own path inside the section", () => {
    expect(returnPath("/account", "/account/orders")).toBe("/account/orders");
    expect(returnPath("/account", "/account")).toBe("/account");
    expect(returnPath("/review", "/review/builds")).toBe("/review/builds");
  });

  it("falls back to the section for anything else", () => {
    expect(returnPath("/account", null)).toBe("/account");
    expect(returnPath("/account", "")).toBe("/account");
    expect(returnPath("/account", "/accounting")).toBe("/account");
    expect(returnPath("/account", "/review")).toBe("/account");
    expect(returnPath("/account", "//evil.example/account/x")).toBe("/account");
    expect(returnPath("/account", "/account/\\evil")).toBe("/account");
    expect(returnPath("/account", "/account/a\nb")).toBe("/account");
  });
});
