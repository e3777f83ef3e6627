// Counts the house-style measures the restructure tracks: type casts (`as`, except `as const`), `.first(`/`.raw(`
// calls whose result is `any`, lines over 160 characters, source files over 3 KB. Run: npx tsx scripts/code-metrics.ts
import { readFileSync, statSync } from "node:fs";
import path from "node:path";
import ts from "typescript";

const root = path.resolve(import.meta.dirname, "..");
const configPath = ts.findConfigFile(root, ts.sys.fileExists, "tsconfig.json")!;
const parsed = ts.parseJsonConfigFileContent(ts.readConfigFile(configPath, ts.sys.readFile).config, ts.sys, root);
const ours = (f: string) => !/node_modules|\/\.next|\/\.tmp\/|\/\.data\/|next-env\.d\.ts/.test(f);
const files = parsed.fileNames.filter(ours);
const program = ts.createProgram(files, { ...parsed.options, incremental: false, noEmit: true });
const checker = program.getTypeChecker();

const mentionsAny = (type: ts.Type, depth = 0): boolean => {
  if (type.flags & ts.TypeFlags.Any) return true;
  if (depth > 2) return false;
  const awaited = checker.getAwaitedType(type);
  if (awaited && awaited !== type) return mentionsAny(awaited, depth + 1);
  if (type.isUnion()) return type.types.some((t) => mentionsAny(t, depth + 1));
  if (checker.isArrayType(type)) return mentionsAny(checker.getTypeArguments(type as ts.TypeReference)[0], depth + 1);
  const rows = type.getProperty("rows");
  return rows ? mentionsAny(checker.getTypeOfSymbol(rows), depth + 1) : false;
};

// Product code (what ships) and everything (scripts, seeds, migrations, tests too).
const product = /^(app|components|lib|search|content-schema)\//;
const totals = { product: { casts: 0, anyRows: 0, longLines: 0, bigFiles: 0 }, all: { casts: 0, anyRows: 0, longLines: 0, bigFiles: 0 } };
const count = (rel: string, key: keyof typeof totals.all, by = 1) => {
  totals.all[key] += by;
  if (product.test(rel)) totals.product[key] += by;
};
const castsByFile = new Map<string, number>();
for (const file of files) {
  const source = program.getSourceFile(file);
  if (!source) continue;
  const rel = path.relative(root, file);
  const text = readFileSync(file, "utf8");
  count(rel, "longLines", text.split("\n").filter((line) => line.length > 160).length);
  if (statSync(file).size > 3 * 1024) count(rel, "bigFiles");
  const visit = (node: ts.Node) => {
    if (ts.isAsExpression(node) || ts.isTypeAssertionExpression(node)) {
      const isConst = ts.isTypeReferenceNode(node.type) && node.type.typeName.getText(source) === "const";
      if (!isConst) {
        count(rel, "casts");
        castsByFile.set(rel, (castsByFile.get(rel) ?? 0) + 1);
      }
    }
    if (ts.isCallExpression(node) && ts.isPropertyAccessExpression(node.expression)) {
      const name = node.expression.name.text;
      // A `.raw(` inside a select is a column, not rows: only awaited raw queries count.
      const rows = name === "first" || (name === "raw" && ts.isAwaitExpression(node.parent));
      if (rows && mentionsAny(checker.getTypeAtLocation(node))) count(rel, "anyRows");
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
}

const top = [...castsByFile].sort((a, b) => b[1] - a[1]).slice(0, Number(process.env.TOP ?? 10));
console.log(JSON.stringify({ files: files.length, ...totals, topCasts: Object.fromEntries(top) }, null, 1));
