import Link from "next/link";

const LINKS = [
  ["", "Overview"],
  ["/sheets", "Sheets"],
  ["/families", "Families"],
  ["/cutters", "Cutters"],
  ["/materials", "Materials"],
  ["/machine-classes", "Machine classes"],
  ["/field", "Field results"],
] as const;

export function DraftingNav({ vendorSlug }: { vendorSlug: string }) {
  return (
    <nav aria-label="Drafting" className="no-print mb-6 flex flex-wrap gap-1 border-b border-stone-200 pb-2 text-sm">
      {LINKS.map(([href, label]) => (
        <Link
          key={href}
          href={`/${vendorSlug}/drafting${href}`}
          className="rounded px-3 py-2 font-medium text-stone-700 hover:bg-stone-200"
        >
          {label}
        </Link>
      ))}
      <Link href={`/${vendorSlug}/tokens`} className="ml-auto rounded px-3 py-2 text-stone-700 hover:bg-stone-200">
        API tokens
      </Link>
    </nav>
  );
}
