// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { OutcomeForm } from "@/components/bench/outcome-form";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => undefined }) }));
afterEach(cleanup);

const current = { rpm: "16000", feedMmMin: "1600", axialDepthMm: "3", radialDepthMm: "6", plungeFeedMmMin: "" };

describe("outcome form", () => {
  it("starts with no answer chosen", () => {
    render(<OutcomeForm vendorSlug="northbeck" setupId="s1" units="metric" current={current} />);
    expect(screen.getAllByRole("radio").some((r) => (r as HTMLInputElement).checked)).toBe(false);
  });

  it("names every from and to box with its quantity and unit", () => {
    render(<OutcomeForm vendorSlug="northbeck" setupId="s1" units="imperial" current={current} />);
    fireEvent.click(screen.getByRole("radio", { name: /after changes/i }));
    expect(screen.getByRole("textbox", { name: "vf (feed rate): from, in in/min" })).toBeTruthy();
    expect(screen.getByRole("textbox", { name: "vf (feed rate): changed to, in in/min" })).toBeTruthy();
    expect(screen.getByRole("textbox", { name: "n (spindle speed): from, in rpm" })).toBeTruthy();
    expect(screen.getByRole("textbox", { name: "ap (axial depth): changed to, in in" })).toBeTruthy();
    const names = screen.getAllByRole("textbox").map((box) => box.getAttribute("aria-label"));
    expect(new Set(names).size).toBe(names.length);
  });
});
