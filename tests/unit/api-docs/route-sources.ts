import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import type { z } from "zod";

import type { ApiOperation } from "@/lib/api-docs/api-operation";

export const ROOT = path.resolve(import.meta.dirname, "../../..");
const API_DIR = path.join(ROOT, "app/api/v1");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

export type RouteHandler = { method: string; path: string; file: string; chunk: string; source: string };

/** Every exported handler under app/api/v1, with the source text of its own export (for per-method checks). */
export function listApiHandlers(): RouteHandler[] {
  return walk(API_DIR)
    .filter((file) => file.endsWith(`${path.sep}route.ts`))
    .flatMap((file) => {
      const source = readFileSync(file, "utf8");
      const apiPath =
        "/" +
        path
          .relative(path.join(ROOT, "app"), path.dirname(file))
          .split(path.sep)
          .map((s) => s.replace(/^\[(\w+)\]$/, "{$1}"))
          .join("/");
      const chunks = source.split(/(?=^export\s+const\s)/m).filter((c) => c.startsWith("export"));
      return chunks.flatMap((chunk) => {
        const names = chunk.match(/^export\s+const\s+(?:\{([^}]+)\}|(\w+))/)!;
        const exported = (names[1] ?? names[2]).split(",").map((n) => n.trim());
        return exported
          .filter((n): n is (typeof METHODS)[number] => (METHODS as readonly string[]).includes(n))
          .map((method) => ({ method, path: apiPath, file, chunk, source }));
      });
    });
}

/** `import { a, b as c } from "m"` → [{ name: a, local: a, module: m }, …] */
function importsOf(source: string): { name: string; local: string; module: string }[] {
  return [...source.matchAll(/import\s*\{([^}]+)\}\s*from\s*"([^"]+)"/g)].flatMap((m) =>
    m[1]
      .split(",")
      .map((part) => {
        const [name, local] = part.trim().split(/\s+as\s+/);
        return { name: name.replace(/^type\s+/, ""), local: local ?? name.replace(/^type\s+/, ""), module: m[2] };
      })
      .filter((i) => i.name),
  );
}

const parses = (text: string, local: string) =>
  new RegExp(`parseInput\\(\\s*${local}\\b|\\b${local}\\s*\\.\\s*(?:safeParse|parse|parseAsync|safeParseAsync)\\(`).test(text);

/**
 * What is wrong between a handler and its documented operation: a schema the document shows that the handler does
 * not parse with (the same object, imported from the same module), a JSON body without a documented schema, and
 * a permission or rate limit that differs.
 */
export async function driftProblems(op: ApiOperation, handler: RouteHandler): Promise<string[]> {
  const problems: string[] = [];
  const where = `${op.method} ${op.path}`;
  const parsedInFile = op.parsedIn ? path.join(ROOT, op.parsedIn) : handler.file;
  const parsedInSource = op.parsedIn ? readFileSync(parsedInFile, "utf8") : handler.chunk;
  const parsedInImports = importsOf(op.parsedIn ? parsedInSource : handler.source);
  if (op.parsedIn) {
    const moduleName = `@/${op.parsedIn.replace(/\.tsx?$/, "")}`;
    if (!importsOf(handler.source).some((i) => i.module === moduleName))
      problems.push(`${where}: the handler does not import ${moduleName}, where the document says it parses`);
  }
  const schemas = [op.body, op.query, ...(op.alsoParses ?? [])].filter((s): s is z.ZodType => Boolean(s));
  for (const schema of schemas) {
    let found = false;
    for (const imp of parsedInImports) {
      const modulePath = imp.module.startsWith("@/")
        ? path.join(ROOT, imp.module.slice(2))
        : imp.module.startsWith(".")
          ? path.resolve(path.dirname(parsedInFile), imp.module)
          : null;
      if (!modulePath || !parses(parsedInSource, imp.local)) continue;
      const mod = (await import(/* @vite-ignore */ modulePath)) as Record<string, unknown>;
      if (mod[imp.name] === schema) found = true;
    }
    if (!found) problems.push(`${where}: the handler does not parse with the schema object the document shows`);
  }
  if (/\breadJson\(/.test(handler.chunk) && !op.body)
    problems.push(`${where}: the handler reads a JSON body the document does not describe`);
  const permission = handler.chunk.match(/permission:\s*"([\w.]+)"/)?.[1];
  if (permission !== op.permission)
    problems.push(`${where}: the handler requires ${permission ?? "no permission"}, the document says ${op.permission ?? "none"}`);
  const rate = handler.chunk.match(/limit:\s*(\d+),\s*windowSeconds:\s*(\d+)/);
  const documented = op.rateLimit ? `${op.rateLimit.limit}/${op.rateLimit.windowSeconds}` : "the default";
  const actual = rate ? `${rate[1]}/${rate[2]}` : "the default";
  if (documented !== actual) problems.push(`${where}: the handler's rate limit is ${actual}, the document says ${documented}`);
  return problems;
}
