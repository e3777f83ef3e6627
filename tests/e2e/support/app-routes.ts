import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

export type AppRoute = { pattern: string; kind: "page" | "api"; methods: string[]; file: string };

const APP_DIR = path.resolve(import.meta.dirname, "../../../app");
const METHOD_RE =
  /export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b|export\s*\{[^}]*\bas\s+(GET|POST|PUT|PATCH|DELETE)\b/g;

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

/** Every page and route handler of the app, read from the file system so new routes are covered automatically. */
export function listAppRoutes(): AppRoute[] {
  return walk(APP_DIR)
    .filter((file) => /\/(page\.tsx|route\.ts)$/.test(file))
    .map((file) => {
      const rel = path.relative(APP_DIR, path.dirname(file));
      const segments = rel.split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s));
      const pattern = "/" + segments.join("/");
      if (file.endsWith("route.ts")) {
        const source = readFileSync(file, "utf8");
        const methods = [...source.matchAll(METHOD_RE)].map((m) => m[1] ?? m[2]);
        return { pattern, kind: "api" as const, methods: [...new Set(methods)], file };
      }
      return { pattern, kind: "page" as const, methods: ["GET"], file };
    });
}

/**
 * The dynamic segments of a pattern with the segment before each, as keys like "setups/[id]" —
 * the same parameter name can mean different objects under different parents.
 */
export function paramKeysOf(pattern: string): string[] {
  const segments = pattern.split("/").filter(Boolean);
  return segments.flatMap((segment, i) => (/^\[.*\]$/.test(segment) ? [`${segments[i - 1] ?? ""}/${segment}`] : []));
}

export function fillPattern(pattern: string, values: Record<string, string>): string {
  const segments = pattern.split("/");
  return segments
    .map((segment, i) => (/^\[.*\]$/.test(segment) ? encodeURIComponent(values[`${segments[i - 1] ?? ""}/${segment}`]) : segment))
    .join("/");
}
