import { readFileSync } from "node:fs";
import path from "node:path";
import madge from "madge";
import { describe, expect, it } from "vitest";

// What the browser downloads for a Library sheet page is the client modules the page names and everything they
// import statically (types and `import()` aside: a dynamic import is a separate, later download). These checks
// keep the heavy parts where they belong: the engine, zod, recharts and next-auth never in the page's first
// load; zod and recharts not in the adapt panel's own download either (the chart loads when it comes into view).
const root = path.resolve(import.meta.dirname, "../../..");

/** The client components a Library sheet page names (layouts, error boundaries, the sheet view). */
const SHEET_PAGE_FIRST_LOAD = [
  "app/error.tsx",
  "app/global-error.tsx",
  "app/[vendor]/error.tsx",
  "components/shell/sign-out-button.tsx",
  "components/library/units-toggle.tsx",
  "components/adapt/lazy-adapt-panel.tsx",
];

async function staticClosure(entries: string[]) {
  const result = await madge(entries, {
    baseDir: root,
    fileExtensions: ["ts", "tsx"],
    tsConfig: path.join(root, "tsconfig.json"),
    detectiveOptions: {
      ts: { skipTypeImports: true, skipAsyncImports: true },
      tsx: { skipTypeImports: true, skipAsyncImports: true },
    },
    excludeRegExp: [/\.d\.ts$/, /node_modules/],
  });
  return Object.keys(result.obj());
}

/** Packages a file imports for its values (not `import type`, not `import()`). */
const valueImports = (file: string) =>
  [...readFileSync(path.join(root, file), "utf8").matchAll(/^(?:import|export)\s+(?!type\s)[^;]*?\sfrom\s+"([^"]+)"/gm)].map((m) => m[1]);

const reaching = (files: string[], pkg: RegExp) =>
  files.flatMap((file) =>
    valueImports(file)
      .filter((spec) => pkg.test(spec))
      .map((spec) => `${file} imports "${spec}"`),
  );

describe("client weight of a Library sheet page", () => {
  it("the first load reaches neither the engine, zod, recharts nor next-auth", async () => {
    const files = await staticClosure(SHEET_PAGE_FIRST_LOAD);
    expect(files).toContain("components/adapt/lazy-adapt-panel.tsx");
    expect(files.filter((f) => f.startsWith("lib/machining/"))).toEqual([]);
    expect(files).not.toContain("components/adapt/adapt-panel.tsx");
    expect(reaching(files, /^(zod|recharts|next-auth)(\/|$)/)).toEqual([]);
  }, 60_000);

  it("the adapt panel's own download carries the engine but neither zod nor recharts", async () => {
    const files = await staticClosure(["components/adapt/adapt-panel.tsx"]);
    expect(files.some((f) => f.startsWith("lib/machining/"))).toBe(true);
    expect(reaching(files, /^(zod|recharts)(\/|$)/)).toEqual([]);
  }, 60_000);
});
