// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { AdaptPanel } from "@/components/adapt/adapt-panel";
import type { Machine } from "@/lib/bench/machine-rows";
import { formatQuantity } from "@/lib/machining";

import { acrylicContext } from "./adapt-context-fixture";

vi.mock("next/dynamic", () => ({ default: () => () => null }));
// The units switch writes the units cookie and asks the router to render the page again.
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => {} }) }));
afterEach(cleanup);

const base: Machine = {
  id: "m1",
  name: "Garage router",
  preset: null,
  rpmMin: 8000,
  rpmMax: 20000,
  powerKw: 1.5,
  maxFeedMmMin: 5000,
  rigidity: 0.55,
  zThrustN: null,
  spindleKind: "constant-torque",
  ratedRpm: null,
  stickoutMm: 20,
  units: "metric",
  updatedAt: "",
};

describe("adapting a newer version from a saved setup", () => {
  it("starts on the setup's machine with the customer's own changes, and the numbers use them", () => {
    const machines = [base, { ...base, id: "m2", name: "Mill" }];
    const apMm = acrylicContext.operations[0].axialDepthMm / 2;
    render(
      <AdaptPanel
        context={acrylicContext}
        vendorSlug="northbeck"
        machines={machines}
        initialMachineId="m2"
        initialOverrides={{ ae: "", ap: `${apMm} mm`, stickout: "25 mm" }}
      />,
    );
    expect((screen.getByLabelText("Adapt to") as HTMLSelectElement).value).toBe("m2");
    expect((screen.getByLabelText(/ap \(axial depth\)/) as HTMLInputElement).value).toBe(`${apMm} mm`);
    expect((screen.getByLabelText(/Stick-out/) as HTMLInputElement).value).toBe("25 mm");
    expect(screen.getByTestId("adapted-ap").textContent).toContain(formatQuantity(apMm, "length", "metric"));
  });
});
