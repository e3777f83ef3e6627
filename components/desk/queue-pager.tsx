import { QUEUE_MAX_PAGE } from "@/lib/desk/queue-page";

type Props = { page: number; pageSize: number; shown: number; hasMore: boolean; onPage: (page: number) => void };

/** Which tickets of the queue are shown, and buttons to the page before and after. */
export function QueuePager({ page, pageSize, shown, hasMore, onPage }: Props) {
  if (page === 1 && !hasMore) return null;
  const from = (page - 1) * pageSize + 1;
  const button = "min-h-9 rounded border border-stone-300 bg-white px-3 disabled:opacity-50";
  return (
    <nav aria-label="Queue pages" className="flex flex-wrap items-center justify-between gap-2 text-sm">
      <span className="num text-stone-700">{shown ? `Tickets ${from}–${from + shown - 1}, page ${page}` : `Page ${page}: no tickets`}</span>
      <span className="flex gap-2">
        <button type="button" className={button} disabled={page <= 1} onClick={() => onPage(page - 1)}>
          ← Previous page
        </button>
        <button type="button" className={button} disabled={!hasMore || page >= QUEUE_MAX_PAGE} onClick={() => onPage(page + 1)}>
          Next page →
        </button>
      </span>
    </nav>
  );
}
