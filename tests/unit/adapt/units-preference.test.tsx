// @vitest-environment jsdom
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

import { AdaptPanel } from "@/components/adapt/adapt-panel";
import { UnitsToggle } from "@/components/library/units-toggle";
import { formatQuantity, type UnitSystem } from "@/lib/machining";
import { UNITS_COOKIE, unitsFromCookie } from "@/lib/ui/units-cookie";

import { acrylicContext } from "./adapt-context-fixture";

// One units preference: the Library's toggle and the adapt panel's switch both write the units cookie, and the
// page (rendered again from the cookie) hands both the same units. Neither keeps a choice of its own.

const refresh = vi.fn();
vi.mock("next/dynamic", () => ({ default: () => () => null }));
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));

afterEach(cleanup);
beforeEach(() => {
  refresh.mockClear();
  document.cookie = `${UNITS_COOKIE}=; path=/; max-age=0`;
});

const cookieUnits = () => unitsFromCookie(document.cookie.match(new RegExp(`${UNITS_COOKIE}=(\\w+)`))?.[1]);
const pressed = (name: string) => screen.getByRole("button", { name }).getAttribute("aria-pressed");
const type = (label: RegExp, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });

/** The Library sheet page as the server renders it for a cookie: its toggle and the adapt panel. */
const page = (units: UnitSystem) => (
  <>
    <UnitsToggle units={units} />
    <AdaptPanel context={acrylicContext} vendorSlug="northbeck" units={units} />
  </>
);

function typeMachine() {
  type(/lowest spindle speed/i, "10000");
  type(/highest spindle speed/i, "16000");
  type(/spindle power/i, "0.8");
  type(/highest feed/i, "3000");
}

describe("units preference", () => {
  it("the panel's switch sets the page's cookie, and the panel follows the page's toggle back", () => {
    const view = render(page("metric"));
    typeMachine();
    fireEvent.click(screen.getByRole("button", { name: "in, hp" }));
    expect(cookieUnits()).toBe("imperial");
    expect(refresh).toHaveBeenCalledTimes(1);

    // The page comes back from the server in imperial: both switches say so.
    view.rerender(page("imperial"));
    expect(pressed("Imperial (in)")).toBe("true");
    expect(pressed("in, hp")).toBe("true");

    fireEvent.click(screen.getByRole("button", { name: "Metric (mm)" }));
    expect(cookieUnits()).toBe("metric");
    view.rerender(page("metric"));
    // vf = fz·z·n = 0.1·1·16000 = 1600 mm/min (ISO 3002-1), in the page's units again.
    expect(pressed("mm, kW")).toBe("true");
    expect(screen.getByTestId("adapted-vf").textContent).toContain(formatQuantity(1600, "feedRate", "metric"));
    expect(screen.getByTestId("adapted-vf").textContent).toContain("mm/min");
  });

  it("names the cookie in one place only", () => {
    const root = path.resolve(import.meta.dirname, "../../..");
    const walk = (dir: string): string[] =>
      readdirSync(dir).flatMap((name) => {
        const file = path.join(dir, name);
        return statSync(file).isDirectory() ? walk(file) : /\.tsx?$/.test(name) ? [file] : [];
      });
    const naming = ["app", "components", "lib"]
      .flatMap((dir) => walk(path.join(root, dir)))
      .filter((file) => readFileSync(file, "utf8").includes(`"${UNITS_COOKIE}"`))
      .map((file) => path.relative(root, file));
    expect(naming).toEqual(["lib/ui/units-cookie.ts"]);
  });
});
