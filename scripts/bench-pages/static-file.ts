// The baseline of the page benchmark: a static file the same server sends (a built CSS file).
import { readdir } from "node:fs/promises";
import path from "node:path";

export async function staticFilePath(distDir: string): Promise<string> {
  const dir = path.join(import.meta.dirname, "../..", distDir, "static/chunks");
  const css = (await readdir(dir)).find((f) => f.endsWith(".css"));
  if (!css) throw new Error(`no CSS file in ${dir}; build first`);
  return `/_next/static/chunks/${css}`;
}
