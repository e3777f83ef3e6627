import { describe, expect, it } from "vitest";

import { describeAuditAction, roleWord } from "@/lib/audit/action-labels";

describe("audit entries and roles as words", () => {
  it("names roles as people say them", () => {
    expect(roleWord("support")).toBe("support staff");
    expect(roleWord("engineer")).toBe("applications engineer");
    expect(roleWord("admin")).toBe("vendor admin");
  });

  it("turns action codes into words, with roles where they matter", () => {
    expect(describeAuditAction("sheet.supersede")).toBe("Sheet superseded");
    expect(describeAuditAction("member.invite", { role: "support" })).toBe("Member invited as support staff");
    expect(describeAuditAction("member.role", { from: "customer", to: "support" })).toBe("Role changed: customer → support staff");
    // An action added later without a label still reads as words, never as a code.
    expect(describeAuditAction("sheet.some_new_thing")).toBe("Sheet some new thing");
  });
});
