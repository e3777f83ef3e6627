/** The search box of the vendor shell: a plain GET form, so it works before any script loads. */
export function ShellSearchBox({ vendorSlug }: { vendorSlug: string }) {
  return (
    <form role="search" action={`/${vendorSlug}/library/search`} method="get" className="min-w-48 flex-1 sm:max-w-xs">
      <label htmlFor="shell-search" className="sr-only">
        Search the Library
      </label>
      <input
        id="shell-search"
        name="q"
        type="search"
        maxLength={200}
        autoComplete="off"
        placeholder="Search sheets: 1/8 acrylic slot"
        className="min-h-10 w-full rounded border border-black/20 bg-white/95 px-3 text-sm text-stone-900 placeholder:text-stone-500"
      />
    </form>
  );
}
