export function SafetyFooter() {
  return (
    <footer className="mx-auto mt-16 max-w-7xl border-t border-stone-200 px-4 py-6 text-xs text-stone-600">
      Cutting data on Swarfbook are starting points, not guarantees. Wear eye and hearing protection, run dust extraction, never leave a cut
      unattended, and follow your machine maker&apos;s limits, local codes and workplace rules.
    </footer>
  );
}
