import { readFileSync } from "node:fs";
import path from "node:path";
import madge from "madge";
import { beforeAll, describe, expect, it } from "vitest";

// The arrows of the house (DEVELOPERS.md, "Layers"): app → components → lib; lib never imports components or
// app; components never import route folders (pages hand actions down as props); the pure modules (the engine,
// search parsing and its vocabulary) reach nothing that needs a server; and no import cycle anywhere.
const root = path.resolve(import.meta.dirname, "../../..");
const PURE = [/^lib\/machining\//, /^search\/parse\//, /^search\/vocabulary\//];
const SERVER_PACKAGES = /^(server-only|next|next\/.*|knex|pg|pg-boss|nodemailer|@aws-sdk\/.*|node:.*|fs|path|crypto)$/;
const SERVER_FILES = /^lib\/db\//;

type Graph = Record<string, string[]>;
let graph: Graph = {};
let cycles: string[][] = [];

beforeAll(async () => {
  const result = await madge(["app", "components", "lib", "search", "content-schema"], {
    baseDir: root,
    fileExtensions: ["ts", "tsx"],
    tsConfig: path.join(root, "tsconfig.json"),
    // Type-only imports count: a type cycle is still a cycle for the reader.
    detectiveOptions: { ts: { skipTypeImports: false }, tsx: { skipTypeImports: false } },
    excludeRegExp: [/\.d\.ts$/, /node_modules/],
  });
  graph = result.obj();
  cycles = result.circular();
}, 120_000);

const arrows = (from: RegExp, to: RegExp) =>
  Object.entries(graph).flatMap(([file, deps]) => (from.test(file) ? deps.filter((d) => to.test(d)).map((d) => `${file} → ${d}`) : []));

const bareImports = (file: string) =>
  [...readFileSync(path.join(root, file), "utf8").matchAll(/(?:from|import)\s+"([^"]+)"/g)]
    .map((m) => m[1])
    .filter((s) => !s.startsWith(".") && !s.startsWith("@/"));

describe("layering", () => {
  it("reads the whole tree", () => {
    expect(Object.keys(graph).length).toBeGreaterThan(300);
    // Relative and "@/" imports both resolve (a broken resolver would find no arrows at all).
    expect(graph["lib/adapt/readapt-setup.ts"]).toContain("lib/adapt/readapt-operation.ts");
    expect(graph["lib/bench/page-data.ts"]).toContain("lib/adapt/page-data.ts");
  });

  it("components never import route folders", () => {
    expect(arrows(/^components\//, /^app\//)).toEqual([]);
  });

  it("lib never imports components or route folders", () => {
    expect(arrows(/^lib\//, /^(components|app)\//)).toEqual([]);
  });

  it("the pure modules reach no database, Next.js or server-only code, even through other files", () => {
    const offending: string[] = [];
    for (const start of Object.keys(graph).filter((f) => PURE.some((p) => p.test(f)))) {
      const seen = new Set<string>([start]);
      const queue = [start];
      while (queue.length) {
        const file = queue.shift()!;
        if (SERVER_FILES.test(file)) offending.push(`${start} reaches ${file}`);
        for (const spec of bareImports(file)) if (SERVER_PACKAGES.test(spec)) offending.push(`${start} reaches "${spec}" in ${file}`);
        for (const dep of graph[file] ?? []) {
          if (seen.has(dep)) continue;
          seen.add(dep);
          queue.push(dep);
        }
      }
    }
    expect([...new Set(offending)]).toEqual([]);
  });

  it("has no import cycles", () => {
    expect(cycles.map((cycle) => cycle.join(" → "))).toEqual([]);
  });
});
