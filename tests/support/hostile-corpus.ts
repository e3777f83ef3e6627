import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

const ROOT = path.resolve(import.meta.dirname, "../fixtures/hostile");

/** Every file of one hostile-input corpus (`tests/fixtures/hostile/<kind>/`) as [file name, content]. */
export function hostileCorpus(kind: string): Array<[string, string]> {
  const dir = path.join(ROOT, kind);
  return readdirSync(dir)
    .filter((name) => !name.startsWith("."))
    .sort()
    .map((name) => [name, readFileSync(path.join(dir, name), "utf8")]);
}
