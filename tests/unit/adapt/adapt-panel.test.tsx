// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { AdaptPanel } from "@/components/adapt/adapt-panel";
import type { Machine } from "@/lib/bench/machine-rows";
import { formatQuantity } from "@/lib/machining";

import { acrylicContext } from "./adapt-context-fixture";

// The chart is loaded in the browser only (recharts); it is not what these tests look at.
vi.mock("next/dynamic", () => ({ default: () => () => null }));
// The units switch writes the units cookie and asks the router to render the page again.
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => {} }) }));

afterEach(cleanup);

const type = (label: RegExp | string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const adapted = (key: string) => screen.getByTestId(`adapted-${key}`).textContent ?? "";

function typeWeakMachine(maxRpm = "16000", maxFeed = "3000") {
  type(/lowest spindle speed/i, "10000");
  type(/highest spindle speed/i, maxRpm);
  type(/spindle power/i, "0.8");
  type(/highest feed/i, maxFeed);
}

describe("adapt panel", () => {
  it("recomputes the numbers as a machine is typed in, with the steps that changed them", () => {
    render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    typeWeakMachine();
    // n clamped to 16 000 rpm (rule 3); vf = fz·z·n = 0.1·1·16000 = 1600 mm/min (ISO 3002-1).
    expect(adapted("n")).toContain(formatQuantity(16000, "spindleSpeed", "metric"));
    expect(adapted("vf")).toContain(formatQuantity(1600, "feedRate", "metric"));
    const steps = screen.getByRole("list", { name: "Steps" });
    expect(
      within(steps)
        .getAllByRole("listitem")
        .map((li) => li.getAttribute("data-rule")),
    ).toContain("spindle-speed-range");

    type(/highest spindle speed/i, "12000");
    // 0.1 · 1 · 12000 = 1200 mm/min.
    expect(adapted("n")).toContain(formatQuantity(12000, "spindleSpeed", "metric"));
    expect(adapted("vf")).toContain(formatQuantity(1200, "feedRate", "metric"));
  });

  it("shows a warning when the machine's feed limit caps the feed", () => {
    const { container } = render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    // vf would be 1600 mm/min; the machine stops at 1000 → fz = 1000/16000 = 0.0625 mm, still above 0.05.
    typeWeakMachine("16000", "1000");
    expect(adapted("vf")).toContain(formatQuantity(1000, "feedRate", "metric"));
    expect(container.querySelector('[data-warning="feed-capped"]')).not.toBeNull();
  });

  it("shows a message for bad input, never NaN", () => {
    const { container } = render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    typeWeakMachine();
    type("ae (radial depth)", "a lot");
    const ae = screen.getByLabelText("ae (radial depth)");
    expect(ae.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById("override-ae-error")?.textContent).toMatch(/“a lot” is not a length/);
    type(/highest spindle speed/i, "8000");
    expect(
      screen
        .getAllByRole("alert")
        .map((a) => a.textContent)
        .join(" "),
    ).toMatch(/lowest spindle speed is above the highest/i);
    expect(container.textContent).not.toMatch(/NaN|Infinity/);
  });

  it("reads overrides as fractions and inch marks (ae 1/16 = 1.5875 mm)", () => {
    render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    typeWeakMachine();
    type("ae (radial depth)", "1/16");
    expect(adapted("ae")).toContain(formatQuantity(1.5875, "length", "metric"));
    type("ae (radial depth)", '0.0625"');
    expect(adapted("ae")).toContain(formatQuantity(1.5875, "length", "metric"));
  });

  it("starts with the customer's first registered machine and switches units", () => {
    const machine: Machine = {
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
    render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" machines={[machine]} />);
    expect(adapted("n")).toContain(formatQuantity(18000, "spindleSpeed", "metric"));
    fireEvent.click(screen.getByRole("button", { name: "in, hp" }));
    // 1800 mm/min ÷ 25.4 = 70.87 in/min (NIST SP 811).
    expect(adapted("vf")).toContain(formatQuantity(1800, "feedRate", "imperial"));
    expect(adapted("vf")).toContain("in/min");
  });

  it("invites a visitor to type a machine instead of showing errors, and a preset fills it in", () => {
    render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" signInHref="/sign-in" />);
    expect(screen.queryAllByRole("alert")).toHaveLength(0);
    expect(screen.getByText(/Type your machine's limits/)).toBeTruthy();
    expect(adapted("n")).toBe("—");
    // "Light belt-drive router with a trim-router spindle": 10 000–30 000 rpm, so the sheet's 18 000 rpm stays.
    fireEvent.change(screen.getByLabelText("Start from a kind of machine"), { target: { value: "light-trim-router" } });
    expect(adapted("n")).toContain(formatQuantity(18000, "spindleSpeed", "metric"));
    expect(screen.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe("/sign-in");
  });

  it("with straight plunges only in a material that melts, cuts at most D/4 per pass and says why in the steps (common practice)", () => {
    const { container } = render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    typeWeakMachine();
    const rampAp = Number.parseFloat(adapted("ap"));
    fireEvent.click(screen.getByLabelText(/Straight plunge only/));
    // D/4 = 3.175/4 = 0.79375 mm, then scaled for the lighter frame: never deeper than with a ramp.
    expect(Number.parseFloat(adapted("ap"))).toBeLessThanOrEqual(0.79375);
    expect(Number.parseFloat(adapted("ap"))).toBeLessThanOrEqual(rampAp);
    expect(container.querySelector('[data-rule="entry-capability"]')?.textContent).toMatch(/quarter of the cutter diameter/);
    expect(container.querySelector('[data-entry-warning="plunge-only-shallow-passes"]')).not.toBeNull();
    fireEvent.click(screen.getByLabelText(/Ramp in/));
    expect(container.querySelector('[data-rule="entry-capability"]')).toBeNull();
  });

  it("caps the plunge by the Z thrust, recommends a ramp, and requires one where even the cutter's centre needs more thrust", () => {
    const { container } = render(<AdaptPanel context={acrylicContext} vendorSlug="northbeck" />);
    typeWeakMachine();
    fireEvent.click(screen.getByLabelText(/Straight plunge only/));
    // Centre term B·kc·D² = 0.012·100·3.175² ≈ 12.1 N (calibrated thrust model): 20 N leaves a little for the lip.
    type(/Z thrust/, "20");
    const advice = () => container.querySelector("[data-entry-advice]");
    expect(advice()?.querySelector('[data-entry-warning="plunge-thrust-limited"]')).not.toBeNull();
    expect(advice()?.textContent).toMatch(/ramp or helix recommended/i);
    expect(container.querySelector('[data-rule="plunge-feed"]')).not.toBeNull();
    type(/Z thrust/, "10");
    expect(advice()?.querySelector('[data-entry-warning="straight-plunge-refused"]')).not.toBeNull();
    expect(advice()?.textContent).toMatch(/ramp or helix required/i);
  });

  it("shows a ball nose's vc at its effective diameter De = 2·√(ap·(D − ap)) (geometry of a sphere)", () => {
    const ball = {
      ...acrylicContext,
      cutter: { ...acrylicContext.cutter, diameterMm: 6, cornerForm: "ball" as const, cornerRadiusMm: 3 },
      operations: [{ ...acrylicContext.operations[1], axialDepthMm: 0.2, radialDepthMm: 0.3 }],
    };
    // A machine as stiff as the reference keeps the sheet's ap, so De is the sheet's.
    const stiff: Machine = {
      id: "m2",
      name: "Stiff router",
      preset: null,
      rpmMin: 8000,
      rpmMax: 18000,
      powerKw: 2.2,
      maxFeedMmMin: 10000,
      rigidity: 0.8,
      zThrustN: 600,
      spindleKind: "constant-power",
      ratedRpm: null,
      stickoutMm: 20,
      units: "metric",
      updatedAt: "",
    };
    render(<AdaptPanel context={ball} vendorSlug="northbeck" machines={[stiff]} />);
    const de = 2 * Math.sqrt(0.2 * 5.8);
    expect(screen.getByText("vc (cutting speed at De)")).toBeTruthy();
    expect(adapted("de")).toContain(formatQuantity(de, "length", "metric"));
    expect(adapted("vc")).toContain(formatQuantity((Math.PI * de * 18000) / 1000, "cuttingSpeed", "metric"));
  });
});
