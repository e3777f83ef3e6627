import { describe, expect, it } from "vitest";

import { validateGeneratedSource } from "@/lib/families/validate-generated";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { buildSheetSource } from "@/tests/factories/sheet-source";

// Generated sheets skip re-parsing a body they have seen; the answer must be the one the full check gives.
describe("validateGeneratedSource", () => {
  it("answers like validateSheetSource, for a valid sheet and for a body with a component that is not allowed, seen twice", () => {
    const good = buildSheetSource();
    const bad = buildSheetSource({ body: "## Notes\n\n<Script>alert(1)</Script>\n" });
    for (const source of [good, bad, good, bad]) {
      const full = validateSheetSource(source);
      const fast = validateGeneratedSource(source);
      expect(fast.ok).toBe(full.ok);
      expect(fast.issues).toEqual(full.issues);
    }
    expect(validateGeneratedSource(bad).ok).toBe(false);
  });
});
