import { describe, expect, it } from "vitest";

import { expandSnippet } from "@/lib/desk/expand-snippet";
import { parseQueueFilters, queueFiltersToSearch } from "@/lib/desk/queue-filters";
import { contentDisposition, displayFileName } from "@/lib/tickets/attachments/display-file-name";
import { firstResponseDueAt } from "@/lib/tickets/first-response-due";

describe("snippets", () => {
  it("fills known placeholders and leaves unknown ones visible", () => {
    expect(
      expandSnippet("Hi {{customer.name}}, re #{{ ticket.number }} and {{sheet.title}}", {
        "customer.name": "Riley",
        "ticket.number": "7",
      }),
    ).toBe("Hi Riley, re #7 and {{sheet.title}}");
  });
});

describe("first-response target", () => {
  it("adds the vendor's hours for the priority", () => {
    const created = new Date("2026-12-01T10:00:00Z");
    const hours = { low: 72, normal: 24, high: 8, urgent: 2 };
    expect(firstResponseDueAt(created, "urgent", { firstResponseHours: hours }).toISOString()).toBe("2026-12-01T12:00:00.000Z");
    expect(firstResponseDueAt(created, "low", { firstResponseHours: hours }).toISOString()).toBe("2026-12-04T10:00:00.000Z");
  });
});

describe("queue filters", () => {
  it("round-trips through the query string and drops junk", () => {
    const f = parseQueueFilters({ status: "new,answered", priority: "urgent", assignee: "me", tag: "Melting", overdue: "true" });
    expect(f).toEqual({ status: ["new", "answered"], priority: ["urgent"], assignee: "me", tag: "melting", overdue: true });
    expect(parseQueueFilters(Object.fromEntries(new URLSearchParams(queueFiltersToSearch(f))))).toEqual(f);
    expect(parseQueueFilters({ assignee: "'; drop table", materialId: "x" })).toEqual({});
  });
});

describe("download names", () => {
  const png = { kind: "image" as const, contentType: "image/png", extension: "png" };
  it("takes the extension from the sniffed type and strips paths and quotes", () => {
    expect(displayFileName("..\\..\\photo.txt", png)).toBe("photo.png");
    expect(displayFileName('a"b<c>.png', png)).toBe("abc.png");
    expect(displayFileName("", png)).toBe("file.png");
  });
  it("writes an ASCII fallback and the UTF-8 name", () => {
    expect(contentDisposition("attachment", "Späne.png")).toBe(`attachment; filename="Sp_ne.png"; filename*=UTF-8''Sp%C3%A4ne.png`);
  });
});
