import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../../../lib/machining");
const files = (readdirSync(root, { recursive: true }) as string[]).filter((f) => f.endsWith(".ts"));

// The engine runs in the browser too: it may import only its own files.
describe("lib/machining stays pure", () => {
  it.each(files)("%s imports only relative engine files", (file) => {
    const source = readFileSync(path.join(root, file), "utf8");
    const specifiers = [...source.matchAll(/from\s+"([^"]+)"/g)].map((m) => m[1]);
    expect(specifiers.filter((s) => !s.startsWith("."))).toEqual([]);
    expect(source).not.toMatch(/\b(fetch|process\.|require\()/);
  });
});
