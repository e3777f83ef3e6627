import { searchSettings } from "@/search/settings";

import type { EngineQuery, QueryParts } from "../engine-types";
import { DOC_COLUMNS } from "./pg-columns";
import { partConditions } from "./pg-conditions";
import { widestConditions } from "./pg-widest";
import { compose, frag, joinFrags, type Fragment } from "./sql-fragment";
import { buildTsQuery, typoWords } from "./ts-query";

const TEXT_WEIGHT = 6;
const NEAR_WEIGHT = 2;
const NEAR_WORDS_PER_TYPO = 3;
const MAX_CUTTERS = 5;
// published_at leaves as the ISO 8601 text JavaScript's toISOString writes (UTC, milliseconds), so hits need no date parsing.
const ISO_PUBLISHED_AT = `to_char(d.published_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as published_at`;
const cols = DOC_COLUMNS.map((c) => (c === "published_at" ? ISO_PUBLISHED_AT : `d.${c}`)).join(", ");
const FACET_COLS = "d.material_group, d.material_key, d.diameter_mm, d.flutes, d.corner_form, d.machine_class, d.operations";

// Scalar facets in one GROUP BY GROUPING SETS pass; operations (an array) by unnest.
const FACETS_SQL = `select case when grouping(material_group) = 0 then 'materialGroup' when grouping(material_key) = 0 then 'materialKey'
      when grouping(diameter_mm) = 0 then 'diameterMm' when grouping(flutes) = 0 then 'flutes'
      when grouping(corner_form) = 0 then 'cornerForm' else 'machineClass' end as facet,
    coalesce(material_group, material_key, diameter_mm::text, flutes::text, corner_form, machine_class) as value, count(*)::int as count
  from matched group by grouping sets ((material_group), (material_key), (diameter_mm), (flutes), (corner_form), (machine_class))
  union all select 'operations', op, count(*)::int from matched, unnest(operations) as op group by op`;

/** The parts of a search that do not depend on its filters: the text query, the score, what "matches something" means, the cutters. */
function searchParts(q: EngineQuery) {
  // A typed SKU is matched on the cutter_sku column (a boost), not as a slow positional phrase.
  const skuWords = new Set((q.boosts.skus ?? []).map((s) => s.toLowerCase()));
  const textWords = q.words.filter((w) => !skuWords.has(w.toLowerCase()));
  const tsq = buildTsQuery(textWords, q.alternatives, q.prefix && !skuWords.has(q.prefix.toLowerCase()) ? q.prefix : undefined);
  const typos = typoWords(textWords, searchSettings.typoTolerance.minWordSizeForOneTypo).filter((w) => !/\d/.test(w));
  const boosts = partConditions(q.boosts);

  const score: Fragment[] = [frag("0")];
  const anyMatch: Fragment[] = [];
  if (tsq) {
    score.push(frag(`ts_rank_cd(d.search_vector, q.tsq, 32) * ${TEXT_WEIGHT}`));
    if (typos.length) score.push(frag(`ts_rank_cd(d.search_vector, q.near, 32) * ${NEAR_WEIGHT}`));
    anyMatch.push(frag(typos.length ? "d.search_vector @@ (q.tsq || q.near)" : "d.search_vector @@ q.tsq"));
  }
  for (const b of boosts) score.push(compose(`(case when $1 then ${b.weight} else 0 end)`, b.cond));
  anyMatch.push(...boosts.map((b) => b.cond));

  const skus = [
    ...new Set([...(q.boosts.skus ?? []), ...q.words.filter((w) => /\d/.test(w) && w.length >= 3)].map((s) => s.toUpperCase())),
  ];
  const near = typos.length
    ? frag(
        `(select to_tsquery('simple', string_agg(quote_literal(n.word), ' | ')) from unnest(?::text[]) as t(typo)
          cross join lateral (select w.word from search_words w where w.vendor_id = ? and w.word % t.typo
            order by w.word <-> t.typo limit ${NEAR_WORDS_PER_TYPO}) as n)`,
        typos,
        q.vendorId,
      )
    : frag("null::tsquery");
  return {
    /** The `q` CTE: the full-text query and the index words near each long typed word. */
    queryCte: compose(
      "q as (select to_tsquery('simple', sb_unaccent($1)) as tsq, coalesce($2, ''::tsquery) as near)",
      frag("?::text", tsq ?? ""),
      near,
    ),
    score: joinFrags(score, " + "),
    /** Without a filter, a document must match something typed: a word, a near word, or a parsed part. */
    anyMatch: anyMatch.length > 0 ? compose("($1)", joinFrags(anyMatch, " or ")) : undefined,
    cutters: frag(
      "d.vendor_id = ? and d.kind = 'cutter' and (upper(d.cutter_sku) = any(?::text[]) or upper(d.cutter_sku) like any(?::text[]))",
      q.vendorId,
      skus,
      skus.filter((s) => s.length >= 4 && s.includes("-")).map((s) => `${s.replace(/[\\%_]/g, "\\$&")}%`),
    ),
  };
}

type Parts = ReturnType<typeof searchParts>;

/** What a document must meet for one step beside its vendor and kind; undefined when anything goes. */
function stepCondition(filters: QueryParts, parts: Parts): Fragment | undefined {
  const conds = partConditions(filters).map((p) => p.cond);
  return conds.length ? joinFrags(conds, " and ") : parts.anyMatch;
}

/** From `matched` (doc_id, published_at, facet columns, score) on: the page, the total, facet counts and typed cutters. */
function resultsFrom(q: EngineQuery, parts: Parts, head: string, columns: string): Fragment {
  return compose(
    `page as (select doc_id, score, published_at from matched order by score desc, published_at desc nulls last, doc_id limit $1),
facet_rows as (${FACETS_SQL}),
cutters as (select ${cols} from search_documents d where $2 order by d.cutter_sku limit ${MAX_CUTTERS})
select ${head}(select count(*)::int from matched) as total,
  (select coalesce(json_agg(h order by h.score desc, h.published_at desc nulls last, h.doc_id), '[]'::json)
     from (select ${columns}, p.score from page p join search_documents d on $3 and d.doc_id = p.doc_id) as h) as hits,
  (select coalesce(json_agg(f), '[]'::json) from facet_rows f where f.value is not null) as facets,
  (select coalesce(json_agg(c), '[]'::json) from cutters c) as cutters`,
    frag("? offset ?", q.perPage, (q.page - 1) * q.perPage),
    parts.cutters,
    frag("d.vendor_id = ?", q.vendorId),
  );
}

/** The vendor's search index version (see the search_index_versions migration) as text; 0 before its first change. */
const seenCte = (vendorId: string) =>
  frag("seen as (select coalesce((select v.version from search_index_versions v where v.vendor_id = ?), 0)::text as version)", vendorId);

function stepSql(q: EngineQuery, known?: { version: string }): Fragment {
  const parts = searchParts(q);
  const filters = partConditions(q.filters).map((p) => p.cond);
  const where: Fragment[] = [frag("d.vendor_id = ?", q.vendorId), frag("d.kind = 'sheet'"), ...filters];
  if (filters.length === 0 && parts.anyMatch) where.push(parts.anyMatch);
  if (!known)
    return compose(
      `with $1,
matched as (select d.doc_id, d.published_at, ${FACET_COLS}, $2 as score from search_documents d cross join q where $3),
$4`,
      parts.queryCte,
      parts.score,
      joinFrags(where, " and "),
      resultsFrom(q, parts, "", cols),
    );
  return compose(
    `with $1, $2,
matched as (select d.doc_id, d.published_at, ${FACET_COLS}, $3 as score from search_documents d cross join q
  where $4 and (select version from seen) = $5),
$6`,
    parts.queryCte,
    seenCte(q.vendorId),
    parts.score,
    joinFrags(where, " and "),
    frag("?::text", known.version),
    resultsFrom(q, parts, "(select version from seen) as version, ", cols),
  );
}

/**
 * The statement of one step of a search: the words of the vendor's index close to each long word
 * (pg_trgm on search_words) join the full-text query; then the matching documents with a score,
 * the requested page, the total, the facet counts over all matches, and cutters whose SKU was typed.
 */
export function buildSearchSql(q: EngineQuery): Fragment {
  return stepSql(q);
}

/**
 * The same statement, searched only while the vendor's search index is still at `version` (it answers the version
 * it read, and nothing matched when that differs): for a step known to be the first that matched anything when the
 * index was at that version, so the steps before it need not be searched again.
 */
export function buildKnownStepSql(q: EngineQuery, version: string): Fragment {
  return stepSql(q, { version });
}

/**
 * Conditions every document meeting one of the later steps meets (an index-friendly outer bound): the widest
 * form of the filters all of them share; a step without filters adds whatever matches something typed.
 */
function laterBound(filters: readonly QueryParts[], conds: readonly (Fragment | undefined)[], parts: Parts): Fragment[] {
  const withFilters = filters.filter((f) => partConditions(f).length > 0);
  const widest = widestConditions(withFilters);
  if (withFilters.length === filters.length) return widest;
  // Some step has no filter: it takes what matches something typed, or everything when nothing was typed.
  if (conds.some((c) => c === undefined) || !parts.anyMatch) return [];
  if (withFilters.length === 0) return [parts.anyMatch];
  return widest.length ? [compose("($1 or $2)", joinFrags(widest, " and "), parts.anyMatch)] : [];
}

/**
 * Steps of a search (strictest first, differing only in their filters) in one statement, answering the first
 * that matches anything, as running them one by one would: one pass over the vendor's documents within the widest
 * bound of the steps marks each (by id alone) with the first step it meets; the lowest mark is the step answered
 * (the last step when nothing matched), and the documents bearing it are read again for their score, facets and
 * the page. Answers that step's index in `queries` and the vendor's search index version beside the results. Used
 * for every step of a search whose first step's own statement matched nothing.
 */
export function buildFirstMatchingStepSql(queries: readonly EngineQuery[]): Fragment {
  const [first] = queries;
  const parts = searchParts(first);
  const conds = queries.map((s) => stepCondition(s.filters, parts));
  const marks = joinFrags(
    conds.map((c, i) => compose(`when $1 then ${i}`, c ?? frag("true"))),
    " ",
  );
  const bound = laterBound(
    queries.map((s) => s.filters),
    conds,
    parts,
  );
  return compose(
    `with $1, $7,
marked as (select * from (select d.doc_id, case $2 end as step from search_documents d cross join q where $3) as l where l.step is not null),
chosen as (select coalesce(min(step), ${queries.length - 1}) as step from marked),
matched as (select d.doc_id, d.published_at, ${FACET_COLS}, $4 as score
  from marked l join search_documents d on $5 and d.doc_id = l.doc_id cross join q where l.step = (select step from chosen)),
$6`,
    parts.queryCte,
    marks,
    joinFrags([frag("d.vendor_id = ? and d.kind = 'sheet'", first.vendorId), ...bound], " and "),
    parts.score,
    frag("d.vendor_id = ?", first.vendorId),
    resultsFrom(first, parts, "(select step from chosen) as step, (select version from seen) as version, ", cols),
    seenCte(first.vendorId),
  );
}
