// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { AdaptedCard } from "@/components/support/adapted-card";
import type { TicketCard } from "@/content-schema/ticket-card";
import { formatQuantity } from "@/lib/machining";

afterEach(cleanup);

const numbers = {
  rpm: 16000,
  feedMmMin: 1600,
  chipLoadMm: 0.1,
  maxChipThicknessMm: 0.1,
  cuttingSpeedMpm: 150.8,
  axialDepthMm: 3,
  radialDepthMm: 3,
  plungeFeedMmMin: 400,
  mrrCm3Min: 14.4,
  powerKw: 0.2,
  torqueNm: 0.1,
  forceN: 20,
  deflectionMm: 0.01,
};
const card: TicketCard = {
  sheetVersionId: "00000000-0000-4000-8000-000000000001",
  sheetSlug: "acrylic",
  versionNumber: 2,
  title: "Cast acrylic, 1/8 in",
  machine: { id: "00000000-0000-4000-8000-000000000002", name: "Desk router", units: "metric" },
  operations: [
    {
      label: "Slot",
      kind: "slot",
      // 0.1 mm/tooth = 1800 / (1 · 18000); vc = π · 3.175 · 18000 / 1000 = 179.5 m/min.
      reference: {
        rpm: 18000,
        feedMmMin: 1800,
        axialDepthMm: 3,
        radialDepthMm: 3.175,
        chipLoadMm: 0.1,
        cuttingSpeedMpm: 179.5,
        plungeFeedMmMin: 450,
      },
      adapted: numbers,
      steps: [
        {
          rule: "spindle-speed-range",
          title: "Spindle speed range",
          field: "rpm",
          quantity: "spindleSpeed",
          before: 18000,
          after: 16000,
          why: "The machine tops out at 16 000 rpm.",
          source: "common practice",
        },
      ],
      warnings: [],
    },
  ],
  cautions: [],
  computedAt: "2026-12-02T07:00:00.000Z",
};

describe("embedded sheet card", () => {
  it("shows the sheet's own fz, vc and plunge feed with units, and counts one step as one step", () => {
    render(<AdaptedCard card={card} vendorSlug="northbeck" />);
    const table = screen.getByRole("table");
    expect(table.textContent).not.toContain("—");
    expect(table.textContent).toContain(formatQuantity(0.1, "chipLoad", "metric"));
    expect(table.textContent).toContain(formatQuantity(179.5, "cuttingSpeed", "metric"));
    expect(table.textContent).toContain(formatQuantity(450, "feedRate", "metric"));
    expect(screen.getByText(/How these numbers were found/).textContent).toBe("How these numbers were found (1 step)");
  });

  it("says when an older card did not store the sheet's fz and vc", () => {
    const old = {
      ...card,
      operations: [{ ...card.operations[0], reference: { rpm: 18000, feedMmMin: 1800, axialDepthMm: 3, radialDepthMm: 3.175 } }],
    };
    render(<AdaptedCard card={old} vendorSlug="northbeck" />);
    expect(screen.getByRole("table").textContent).not.toContain("—");
    expect(screen.getByRole("table").textContent).toContain("not stored");
  });
});
