import { SearchPageClient } from "@/components/search/search-page-client";
import { SearchPageShell } from "@/components/search/search-page-shell";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { searchApiUrl } from "@/lib/swr/search-url";
import { getSearchEngine } from "@/search/engines/choose-engine";
import { runSearch } from "@/search/run/run-search";
import { searchParamsSchema, searchParamsToQuery } from "@/search/run/search-params";

export const metadata = { title: "Search the Library" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function LibrarySearchPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const raw = await searchParams;
  const query = Object.fromEntries(Object.entries(raw).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : [])));
  const { vendor } = await requirePageAccess(
    slug,
    "library.read",
    `/${slug}/library/search${searchParamsToQuery(query) ? `?${searchParamsToQuery(query)}` : ""}`,
  );
  // A malformed link still opens the page: unreadable parameters are dropped, not refused.
  const parsed = searchParamsSchema.safeParse(query);
  const p = parsed.success ? parsed.data : { q: typeof query.q === "string" ? query.q.slice(0, 2000) : "" };
  const first = await runSearch(getSearchEngine(), {
    vendorId: vendor.id,
    q: p.q,
    filters: parsed.success
      ? {
          material: parsed.data.material,
          materialGroup: parsed.data.materialGroup,
          operation: parsed.data.operation,
          diameterMm: parsed.data.diameterMm,
          flutes: parsed.data.flutes,
        }
      : {},
    page: parsed.success ? parsed.data.page : 1,
  });
  const key = searchApiUrl(vendor.slug, searchParamsToQuery(parsed.success ? { ...parsed.data } : { q: p.q }));
  return (
    <>
      <PageHeader
        title="Search the Library"
        lead={`Type a cutter size, a material and a cut, e.g. “1/8 acrylic slot”. Results from ${vendor.name}'s published sheets.`}
      />
      <SearchPageShell fallbackKey={key} fallback={first}>
        <SearchPageClient vendorSlug={vendor.slug} />
      </SearchPageShell>
    </>
  );
}
