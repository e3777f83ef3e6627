import { describe, expect, it } from "vitest";

import { AREAS, can, PERMISSIONS } from "@/lib/auth/permissions";
import { ROLES } from "@/lib/auth/roles";

describe("permissions", () => {
  it("keeps customers out of staff areas and staff out of what their role does not do", () => {
    expect(can("customer", "sheets.publish")).toBe(false);
    expect(can("customer", "desk.use")).toBe(false);
    expect(can("support", "sheets.publish")).toBe(false);
    expect(can("engineer", "members.manage")).toBe(false);
    expect(can("admin", "members.manage")).toBe(true);
    expect(can(null, "library.read")).toBe(false);
  });

  it("names only known roles and gives every area a permission", () => {
    for (const roles of Object.values(PERMISSIONS)) for (const role of roles) expect(ROLES).toContain(role);
    for (const area of AREAS) expect(PERMISSIONS).toHaveProperty(area.permission);
  });
});
