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

/** The same files as bytes, for input paths that read raw request bodies. */
export function hostileCorpusBytes(kind: string): Array<[string, Uint8Array]> {
  const dir = path.join(ROOT, kind);
  return readdirSync(dir)
    .filter((name) => !name.startsWith("."))
    .sort()
    .map((name) => [name, new Uint8Array(readFileSync(path.join(dir, name)))]);
}
