import { searchSettings } from "@/search/settings";

import type { EngineQuery } from "../engine-types";
import { partConditions } from "./pg-conditions";
import { DOC_COLUMNS } from "./pg-columns";
import { type Fragment, compose, frag, joinFrags } from "./sql-fragment";
import { buildTsQuery, typoWords } from "./ts-query";

const TEXT_WEIGHT = 6;
const NEAR_WEIGHT = 2;
const NEAR_WORDS_PER_TYPO = 3;
const MAX_CUTTERS = 5;
const cols = DOC_COLUMNS.map((c) => `d.${c}`).join(", ");
const FACET_COLS = "d.material_group, d.material_key, d.diameter_mm, d.flutes, d.corner_form, d.machine_class, d.operations";

// Scalar facets in one GROUP BY GROUPING SETS pass; operations (an array) by unnest.
const FACETS_SQL = `select case when grouping(material_group) = 0 then 'materialGroup' when grouping(material_key) = 0 then 'materialKey'
      when grouping(diameter_mm) = 0 then 'diameterMm' when grouping(flutes) = 0 then 'flutes'
      when grouping(corner_form) = 0 then 'cornerForm' else 'machineClass' end as facet,
    coalesce(material_group, material_key, diameter_mm::text, flutes::text, corner_form, machine_class) as value, count(*)::int as count
  from matched group by grouping sets ((material_group), (material_key), (diameter_mm), (flutes), (corner_form), (machine_class))
  union all select 'operations', op, count(*)::int from matched, unnest(operations) as op group by op`;

/**
 * The one round trip of a search: the words of the vendor's index close to each long word
 * (pg_trgm on search_words) join the full-text query; then the matching documents with a score,
 * the requested page, the total, the facet counts over all matches, and cutters whose SKU was typed.
 */
export function buildSearchSql(q: EngineQuery): Fragment {
  // A typed SKU is matched on the cutter_sku column (a boost), not as a slow positional phrase.
  const skuWords = new Set((q.boosts.skus ?? []).map((s) => s.toLowerCase()));
  const textWords = q.words.filter((w) => !skuWords.has(w.toLowerCase()));
  const tsq = buildTsQuery(textWords, q.alternatives, q.prefix && !skuWords.has(q.prefix.toLowerCase()) ? q.prefix : undefined);
  const typos = typoWords(textWords, searchSettings.typoTolerance.minWordSizeForOneTypo).filter((w) => !/\d/.test(w));
  const filters = partConditions(q.filters).map((p) => p.cond);
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

  const where: Fragment[] = [frag("d.vendor_id = ?", q.vendorId), frag("d.kind = 'sheet'"), ...filters];
  // Without a filter, a document must match something typed: a word, a near word, or a parsed part.
  if (filters.length === 0 && anyMatch.length > 0) where.push(compose("($1)", joinFrags(anyMatch, " or ")));

  const skus = [...new Set([...(q.boosts.skus ?? []), ...q.words.filter((w) => /\d/.test(w) && w.length >= 3)].map((s) => s.toUpperCase()))];
  const near = typos.length
    ? frag(
        `(select to_tsquery('simple', string_agg(quote_literal(n.word), ' | ')) from unnest(?::text[]) as t(typo)
          cross join lateral (select w.word from search_words w where w.vendor_id = ? and w.word % t.typo
            order by w.word <-> t.typo limit ${NEAR_WORDS_PER_TYPO}) as n)`,
        typos,
        q.vendorId,
      )
    : frag("null::tsquery");
  return compose(
    `with q as (select to_tsquery('simple', sb_unaccent($1)) as tsq, coalesce($2, ''::tsquery) as near),
matched as (select d.doc_id, d.published_at, ${FACET_COLS}, $3 as score from search_documents d cross join q where $4),
page as (select doc_id, score, published_at from matched order by score desc, published_at desc nulls last, doc_id limit $5),
facet_rows as (${FACETS_SQL}),
cutters as (select ${cols} from search_documents d where $6 order by d.cutter_sku limit ${MAX_CUTTERS})
select (select count(*)::int from matched) as total,
  (select coalesce(json_agg(h order by h.score desc, h.published_at desc nulls last, h.doc_id), '[]'::json)
     from (select ${cols}, p.score from page p join search_documents d on $7 and d.doc_id = p.doc_id) as h) as hits,
  (select coalesce(json_agg(f), '[]'::json) from facet_rows f where f.value is not null) as facets,
  (select coalesce(json_agg(c), '[]'::json) from cutters c) as cutters`,
    frag("?::text", tsq ?? ""),
    near,
    joinFrags(score, " + "),
    joinFrags(where, " and "),
    frag("? offset ?", q.perPage, (q.page - 1) * q.perPage),
    frag(
      "d.vendor_id = ? and d.kind = 'cutter' and (upper(d.cutter_sku) = any(?::text[]) or upper(d.cutter_sku) like any(?::text[]))",
      q.vendorId,
      skus,
      skus.filter((s) => s.length >= 4 && s.includes("-")).map((s) => `${s.replace(/[\\%_]/g, "\\$&")}%`),
    ),
    frag("d.vendor_id = ?", q.vendorId),
  );
}

/**
 * The steps of a search in one statement: step i runs only when every earlier step matched nothing (a
 * one-time filter on already computed totals), so relaxing a search costs no extra round trip.
 */
export function buildSearchStepsSql(queries: readonly EngineQuery[]): Fragment {
  const steps = queries.map(buildSearchSql);
  if (steps.length === 1) return { sql: `select 0 as step, s0.* from (${steps[0].sql}) as s0`, bindings: steps[0].bindings };
  const ctes = joinFrags(steps.map((step, i) => ({ sql: `s${i} as (${step.sql})`, bindings: step.bindings })), ",\n");
  const branches = steps.map((_, i) => {
    const earlierEmpty = Array.from({ length: i }, (__, j) => `(select total from s${j}) = 0`);
    return `select ${i} as step, s${i}.* from s${i}${earlierEmpty.length ? ` where ${earlierEmpty.join(" and ")}` : ""}`;
  });
  return { sql: `with ${ctes.sql}\n${branches.join("\nunion all ")}`, bindings: ctes.bindings };
}
