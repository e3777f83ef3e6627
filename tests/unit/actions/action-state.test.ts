import { describe, expect, it } from "vitest";

import { sentList } from "@/lib/actions/action-state";

describe("sentList", () => {
  it("is undefined before a form was sent back, so the form's own defaults stand", () => {
    expect(sentList({ ok: false }, "kinds")).toBeUndefined();
  });

  it("gives a checkbox group as sent: several ticked, one ticked, none ticked", () => {
    const state = { ok: false, values: { vendor: "northbeck", kinds: "profile" }, lists: { materialIds: ["a", "b"] } };
    expect(sentList(state, "materialIds")).toEqual(["a", "b"]);
    expect(sentList(state, "kinds")).toEqual(["profile"]);
    expect(sentList(state, "machineClassIds")).toEqual([]);
  });
});
