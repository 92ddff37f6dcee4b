import { describe, expect, it } from "vitest";
import { can, canInShop, roleOf } from "@/lib/auth/roles";

describe("one role vocabulary", () => {
  it("grants site permissions through the access-control statements", () => {
    const table: [string, Parameters<typeof can>[1], boolean][] = [
      ["member", { build: "save" }, true], ["member", { build: "moderate" }, false], ["member", { part: "review" }, false],
      ["member", { build: "delete-any" }, false], ["member", { user: "list" }, false], ["member", { part: "submit" }, true],
      ["moderator", { build: "moderate" }, true], ["moderator", { part: "review" }, true], ["moderator", { build: "delete-any" }, false],
      ["moderator", { user: "ban" }, false], ["admin", { build: "delete-any" }, true], ["admin", { user: "ban" }, true], ["admin", { part: "review" }, true],
    ];
    for (const [role, permission, ok] of table) expect(can(role, permission), `${role} ${JSON.stringify(permission)}`).toBe(ok);
  });

  it("reads unknown or missing roles as member, never more", () => {
    expect(roleOf("root")).toBe("member");
    expect(roleOf("__proto__")).toBe("member");
    expect(roleOf(null)).toBe("member");
    expect(can("superuser", { build: "moderate" })).toBe(false);
  });

  it("grants shop permissions to owners and staff, and nothing to non-members", () => {
    expect(canInShop("owner", { organization: "update" })).toBe(true);
    expect(canInShop("staff", { organization: "update" })).toBe(false);
    expect(canInShop("staff", { inventory: "update" })).toBe(true);
    expect(canInShop("staff,owner", { member: "delete" })).toBe(true);
    expect(canInShop(null, { inventory: "read" })).toBe(false);
    expect(canInShop("toString", { inventory: "read" })).toBe(false);
  });

  it("keeps people, keys and money decisions with the owner; staff run stock, quotes and orders", () => {
    const table: [string | null, Parameters<typeof canInShop>[1], boolean][] = [
      ["owner", { members: "manage" }, true], ["staff", { members: "manage" }, false], ["staff", { members: "read" }, true], [null, { members: "read" }, false],
      ["owner", { apiKey: "manage" }, true], ["staff", { apiKey: "manage" }, false], ["member", { apiKey: "manage" }, false],
      ["staff", { inventory: "read" }, true], ["owner", { inventory: "update" }, true],
      ["owner", { quote: "answer" }, true], ["staff", { quote: "answer" }, true], [null, { quote: "answer" }, false],
      ["owner", { order: "read" }, true], ["staff", { order: "read" }, true], ["staff", { order: "ship" }, true], ["staff", { order: "refund" }, true],
      ["admin", { order: "refund" }, false], ["", { order: "read" }, false], ["staff , owner", { apiKey: "manage" }, true],
    ];
    for (const [role, permission, ok] of table) expect(canInShop(role, permission), `${role} ${JSON.stringify(permission)}`).toBe(ok);
  });
});
