export function PageSkeleton() {
  return (
    <div aria-label="Loading" className="space-y-3">
      <div className="h-8 w-64 animate-pulse rounded bg-stone-200" />
      <div className="h-32 animate-pulse rounded-lg bg-stone-200/70" />
    </div>
  );
}
