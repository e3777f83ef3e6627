import { describe, expect, it } from "vitest";

import { parseQueueFilters } from "@/lib/desk/queue-filters";
import { parseQueuePage, QUEUE_MAX_PAGE, queueSearch } from "@/lib/desk/queue-page";

describe("Desk queue page in the address", () => {
  it("reads a page number, and page 1 for anything else", () => {
    expect(parseQueuePage("3")).toBe(3);
    expect(parseQueuePage(["4", "5"])).toBe(4);
    for (const bad of [undefined, "", "0", "-2", "2.5", "two", String(QUEUE_MAX_PAGE + 1)]) expect(parseQueuePage(bad)).toBe(1);
    expect(parseQueuePage(String(QUEUE_MAX_PAGE))).toBe(QUEUE_MAX_PAGE);
  });

  it("writes filters and page, leaving page 1 out, and reads back what it wrote", () => {
    const filters = parseQueueFilters({ status: "new,answered", q: "melting" });
    expect(queueSearch(filters, 1)).toBe("status=new%2Canswered&q=melting");
    const search = new URLSearchParams(queueSearch(filters, 7));
    expect(parseQueuePage(search.get("page"))).toBe(7);
    expect(parseQueueFilters(Object.fromEntries(search))).toEqual(filters);
    expect(queueSearch({}, 1)).toBe("");
  });
});
