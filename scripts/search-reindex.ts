// Rebuilds the search index of every vendor (or `--vendor <slug>`) from the database.
// Run: node --conditions=react-server --import tsx scripts/search-reindex.ts [--vendor northbeck]
import { db } from "@/lib/db/knex";
import { getSearchEngine } from "@/search/engines/choose-engine";
import { reindexVendor } from "@/search/indexing/reindex";

async function main() {
  const at = process.argv.indexOf("--vendor");
  const slug = at === -1 ? undefined : process.argv[at + 1];
  const vendors: { id: string; slug: string }[] = await db("vendors")
    .modify((q) => (slug ? q.where({ slug }) : q))
    .select("id", "slug")
    .orderBy("slug");
  if (slug && vendors.length === 0) throw new Error(`No vendor ${slug}.`);
  const engine = getSearchEngine();
  await engine.configure();
  for (const vendor of vendors) {
    const started = performance.now();
    const { sheets, cutters } = await reindexVendor({ engine, vendorId: vendor.id });
    console.log(
      `${vendor.slug}: ${sheets} sheets, ${cutters} cutters indexed with ${engine.name} in ${Math.round(performance.now() - started)} ms`,
    );
  }
}

main()
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => db.destroy());
