/** Stands in for one Field-results section while its query runs; the rest of the page is already shown. */
export function SectionSkeleton({ label, rows = 4 }: { label: string; rows?: number }) {
  return (
    <div role="status" aria-label={`Loading ${label}`} className="space-y-2 rounded-md border border-stone-200 bg-white p-4">
      {Array.from({ length: rows }, (_, i) => (
        <div key={i} className="h-5 animate-pulse rounded bg-stone-200/70" style={{ width: `${90 - i * 12}%` }} />
      ))}
    </div>
  );
}
