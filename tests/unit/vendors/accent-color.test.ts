import { describe, expect, it } from "vitest";

import { accentColorSchema } from "@/content-schema/vendor";
import { explainAccentColor } from "@/lib/vendors/explain-accent-color";

describe("an invalid accent colour says why", () => {
  it.each([
    ["2f5d8a", "Start the colour with #, like #2f5d8a."],
    ["#2f5", "Write all six digits: #22ff55 instead of #2f5."],
    ["#2f5d8", "A colour has six hex digits after #; this has 5. For example #2f5d8a."],
    ["#2g5d8a", "“g” is not a hex digit; a colour uses only 0–9 and a–f, like #2f5d8a."],
    ["", "Give a colour: # and six hex digits, like #2f5d8a."],
  ])("%s", (input, why) => {
    expect(explainAccentColor(input)).toBe(why);
    expect(accentColorSchema.safeParse(input).error?.issues[0]?.message).toBe(why);
  });

  it("accepts a colour", () => {
    expect(explainAccentColor("#2F5D8A")).toBeNull();
    expect(accentColorSchema.safeParse("#2f5d8a").success).toBe(true);
  });
});
